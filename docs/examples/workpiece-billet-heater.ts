/**
 * A billet heater: a 40 mm low-carbon steel bar in a long water-cooled copper coil, checked
 * cold (magnetic) and hot (above Curie), with the frequency chosen by the a/δ rule of thumb.
 * The coil and bar sizes are invented for the example.
 *
 * Run: npx tsx docs/examples/workpiece-billet-heater.ts
 */
import {
  ANNEALED_COPPER_RESISTIVITY,
  bakerFunctions,
  barInLongCoil,
  celsius,
  coilEfficiency,
  lowCarbonSteel,
  MU_0,
  powerInPart,
  resistivityAt,
  workpieceCouplingAtTemperature,
} from "../../src/index.js";

function check(name: string, ok: boolean): void {
  console.log(`${ok ? "ok  " : "FAIL"} ${name}`);
  if (!ok) throw new Error(name);
}

const radius = 0.02; // bar radius [m]
const coil = { innerRadius: 0.03, length: 0.5, turns: 24 };

// 1. Frequency from the rule of thumb a/δ ≥ 2.5, applied to the HOT bar (above Curie the
//    permeability is 1 and the skin depth is largest): f = (a/δ)² ρ / (π μ0 μr a²).
const rhoHot = resistivityAt(lowCarbonSteel, celsius(1000));
const frequency = (2.5 ** 2 * rhoHot) / (Math.PI * MU_0 * radius * radius);
console.log(`hot resistivity ${rhoHot.toExponential(3)} Ω·m → frequency ≥ ${(frequency / 1e3).toFixed(2)} kHz`);

// 2. Coupling cold and hot at that frequency, coil resistance of a copper current sheet
const rhoCu = ANNEALED_COPPER_RESISTIVITY * 1.08; // ~40 °C
const deltaCu = Math.sqrt(rhoCu / (Math.PI * frequency * MU_0));
const coilResistance = ((coil.turns ** 2) / coil.length) * 2 * Math.PI * coil.innerRadius * (rhoCu / deltaCu);
const part = { kind: "bar" as const, radius, coil };
const cold = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(20), part, frequency, fieldStrengthPeak: 5e4, coilResistance });
const hot = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(1000), part, frequency, coilResistance });
console.log(`cold: μr ${cold.relativePermeability.toFixed(1)}, Rr ${cold.reflectedResistance.toExponential(3)} Ω, ΔL ${cold.inductanceChange.toExponential(3)} H, η ${cold.efficiency!.toFixed(3)}`);
console.log(`hot:  μr ${hot.relativePermeability.toFixed(1)}, Rr ${hot.reflectedResistance.toExponential(3)} Ω, ΔL ${hot.inductanceChange.toExponential(3)} H, η ${hot.efficiency!.toFixed(3)}`);

check("hot bar is non-magnetic (Curie)", hot.relativePermeability === 1);
check("hot bar sits at a/δ = 2.5", Math.abs(radius / hot.skinDepth - 2.5) < 1e-9);
// at 4.6 kHz the cold bar is ~30 skin depths thick: shielding wins even while magnetic, but its
// (μr-weighted) reactance still offsets more of the lost flux than the hot bar's does
check("both lower the inductance at this frequency, the hot bar more", cold.inductanceChange < 0 && hot.inductanceChange < cold.inductanceChange);
check("so a parallel tank's frequency rises as the bar passes Curie", hot.inductanceChange < cold.inductanceChange);
check("efficiency stays above 0.8 hot (steel, a/δ = 2.5)", hot.efficiency! > 0.8);

// 3. The same hot result from Baker's P directly: Rr = N²/ℓ · 2πa · ρ/δ · P(a/δ)
const { p } = bakerFunctions(2.5);
const byHand = ((coil.turns ** 2) / coil.length) * 2 * Math.PI * radius * (rhoHot / hot.skinDepth) * p;
check("reflected resistance equals N²/ℓ 2πa (ρ/δ) P", Math.abs(byHand / hot.reflectedResistance - 1) < 1e-12);
check("coilEfficiency agrees", Math.abs(coilEfficiency({ coilResistance, reflectedResistance: hot.reflectedResistance }) - hot.efficiency!) < 1e-15);

// 4. Power into the hot bar at 800 A RMS coil current, and the same call without the helper
const power = powerInPart({ coilCurrentRms: 800, reflectedResistance: hot.reflectedResistance });
console.log(`power into the hot bar at 800 A: ${(power / 1e3).toFixed(1)} kW`);
const direct = barInLongCoil({ coil, bar: { radius, resistivity: rhoHot, relativePermeability: 1 }, frequency });
check("barInLongCoil gives the same hot coupling", direct.reflectedResistance === hot.reflectedResistance);
check("the 0.5 m coil is long enough for the long-coil idealisation", direct.validity.length === 0);
