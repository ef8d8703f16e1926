/**
 * A low-voltage pancake-coil warmer for a 4 mm steel plate: impedance seen at the coil, power
 * for a given current, the frequency at which the plate stops raising the inductance, and
 * the two methods (Dodd & Deeds quadrature, truncated-region series) agreeing. Coil sizes are
 * invented for the example.
 *
 * Run: npx tsx docs/examples/workpiece-plate-warmer.ts
 */
import {
  brentRoot,
  celsius,
  coilOverPlate,
  coilOverPlateTruncatedRegion,
  lowCarbonSteel,
  powerInPart,
  relativePermeabilityAt,
  resistivityAt,
} from "../../src/index.js";

function check(name: string, ok: boolean): void {
  console.log(`${ok ? "ok  " : "FAIL"} ${name}`);
  if (!ok) throw new Error(name);
}

const coil = { innerRadius: 0.01, outerRadius: 0.06, liftOff: 0.005, length: 0.006, turns: 16 };
const t = celsius(20);
const plate = {
  thickness: 0.004,
  resistivity: resistivityAt(lowCarbonSteel, t),
  relativePermeability: relativePermeabilityAt(lowCarbonSteel, { temperature: t, fieldStrengthPeak: 5e4 }),
};

const r = coilOverPlate({ coil, plate, frequency: 25e3 });
console.log(`air-core L0 ${(r.emptyCoilInductance * 1e6).toFixed(2)} µH, with plate ${(r.inductance * 1e6).toFixed(2)} µH`);
console.log(`reflected resistance ${(r.reflectedResistance * 1e3).toFixed(1)} mΩ, skin depth ${(r.skinDepth * 1e3).toFixed(3)} mm`);
const power = powerInPart({ coilCurrentRms: 60, reflectedResistance: r.reflectedResistance });
console.log(`power into the plate at 60 A RMS: ${power.toFixed(0)} W`);
check("at 25 kHz shielding wins: the plate lowers the inductance", r.inductanceChange < 0);
check("the plate is many skin depths thick at 25 kHz", plate.thickness > 10 * r.skinDepth);

// the crossover: below it the magnetic plate raises L (parallel-tank frequency falls)
const crossover = 10 ** brentRoot((lf) => coilOverPlate({ coil, plate, frequency: 10 ** lf }).inductanceChange, 0, 6);
console.log(`inductance-change crossover: ${crossover.toFixed(0)} Hz`);
check("below the crossover ΔL > 0", coilOverPlate({ coil, plate, frequency: crossover / 3 }).inductanceChange > 0);
check("above the crossover ΔL < 0", coilOverPlate({ coil, plate, frequency: crossover * 3 }).inductanceChange < 0);

// a non-magnetic plate of the same size never raises L
const hot = { ...plate, resistivity: resistivityAt(lowCarbonSteel, celsius(900)), relativePermeability: 1 };
check("above Curie the plate lowers L at every frequency", [10, 1e3, 1e5].every((f) => coilOverPlate({ coil, plate: hot, frequency: f }).inductanceChange < 0));

// two methods
const tree = coilOverPlateTruncatedRegion({ coil, plate, frequency: 25e3 });
const diff = Math.hypot(tree.reflectedResistance - r.reflectedResistance, tree.reactanceChange - r.reactanceChange) / Math.hypot(r.reflectedResistance, r.reactanceChange);
console.log(`Dodd & Deeds vs truncated region: ${diff.toExponential(1)} of |ΔZ|`);
check("the two methods agree to 3e-6", diff < 3e-6);
