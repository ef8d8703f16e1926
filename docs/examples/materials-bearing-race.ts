/**
 * Material data for a shrink-fit heater for a steel bearing race: how resistivity,
 * permeability and specific heat of the race change between room temperature and the Curie
 * point, and the heat needed to reach the fitting temperature.
 *
 * Run: npx tsx docs/examples/materials-bearing-race.ts
 */
import { celsius, mediumCarbonSteel, relativePermeabilityAt, resistivityAt, specificEnthalpyChange, specificHeatAt } from "../../src/index.js";

function expectClose(name: string, value: number, expected: number, rtol: number): void {
  console.log(`${name} = ${value.toPrecision(6)}`);
  if (!(Math.abs(value / expected - 1) <= rtol)) throw new Error(`${name}: got ${value}, expected ${expected}`);
}

const steel = mediumCarbonSteel;

// resistivity rises about sevenfold from 20 °C to 800 °C (table, typical values)
expectClose("resistivity at 20 °C [Ω·m]", resistivityAt(steel, celsius(20)), 1.6e-7, 1e-12);
expectClose("resistivity at 800 °C [Ω·m]", resistivityAt(steel, celsius(800)), 1.111e-6, 1e-12);

// permeability in a strong surface field (20 kA/m) at 20 °C: 1 + 599 Ms/(Ms + 599 H), Ms = 1.9 T/μ0;
// and none above the Curie point
const mu20 = relativePermeabilityAt(steel, { temperature: celsius(20), fieldStrengthPeak: 20e3 });
expectClose("relative permeability at 20 °C, 20 kA/m", mu20, 68.1267, 1e-5);
const mu780 = relativePermeabilityAt(steel, { temperature: celsius(780), fieldStrengthPeak: 20e3 });
console.log(`relative permeability at 780 °C = ${mu780}`);
if (mu780 !== 1) throw new Error("permeability above Curie must be exactly 1");

// heat to raise a 2.4 kg race from 20 °C to 200 °C (shrink fit): ∫ m c(T) dT (trapezoid rule)
const mass = 2.4;
let energy = 0;
const steps = 1800;
const a = celsius(20);
const b = celsius(200);
const h = (b - a) / steps;
for (let i = 0; i < steps; i++) energy += 0.5 * h * mass * (specificHeatAt(steel, a + i * h) + specificHeatAt(steel, a + (i + 1) * h));
// EN 1993-1-2 cubic integrated in closed form: 2.4 × 88 191.15 J/kg
expectClose("heat to 200 °C [J]", energy, 2.4 * 88191.1512, 1e-6);

// the same heat from the exact integral of the specific-heat model
const exact = mass * specificEnthalpyChange(steel, { fromTemperature: a, toTemperature: b });
expectClose("heat to 200 °C, exact integral [J]", exact, 2.4 * 88191.1512, 1e-12);

// through the Curie range the carbon-steel peak costs extra: 700 → 800 °C
const throughCurie = specificEnthalpyChange(steel, { fromTemperature: celsius(700), toTemperature: celsius(800) });
console.log(`heat per kg from 700 °C to 800 °C = ${(throughCurie / 1e3).toFixed(1)} kJ/kg (a flat 650 J/(kg·K) would give 65 kJ/kg)`);
if (!(throughCurie > 2 * 65e3)) throw new Error("the specific-heat peak should more than double the heat through 700–800 °C");
