/**
 * Safety checks for a low-voltage pancake-coil plate warmer: the field at a distance against
 * the ICNIRP 2010 reference levels, and the cautions a design report should carry. The coil,
 * current and voltages are invented for this example.
 *
 * Run: npx tsx docs/examples/safety-cautions.ts
 */
import { fieldOnAxis, fieldNearCoil, exposureCheck, safetyCautions, celsius, DEFER_TO_CODES } from "../../src/index.js";

// Pancake coil: 12 turns from 15 mm to 75 mm radius, 60 A RMS at 40 kHz (invented example).
const coil = { kind: "flatSpiral" as const, innerEdgeRadius: 0.015, outerEdgeRadius: 0.075, turns: 12 };
const currentRms = 60;
const frequency = 40e3;

const centre = fieldOnAxis({ coil, current: currentRms, axialPosition: 0 });
console.log(`flux density at the coil centre: ${(centre * 1e3).toFixed(2)} mT RMS`);

// Where does the field on the axis fall to the public reference level (27 µT)?
let distance = 0;
while (fieldOnAxis({ coil, current: currentRms, axialPosition: distance }) > 27e-6) distance += 0.005;
console.log(`on the axis the field falls below 27 µT at about ${(distance * 100).toFixed(1)} cm`);
if (!(distance > 0.2 && distance < 1)) throw new Error(`unexpected distance ${distance}`);

// An operator's hand 30 cm to the side, in the coil plane:
const side = fieldNearCoil(coil, currentRms, { radialDistance: 0.3, axialPosition: 0 });
const check = exposureCheck({ fluxDensityRms: side.magnitude, frequency, population: "occupational" });
console.log(`30 cm to the side: ${(side.magnitude * 1e6).toFixed(1)} µT, ${(check.ratio * 100).toFixed(0)} % of the occupational level`);
if (check.exceeded) throw new Error("30 cm to the side should be within the occupational level");

const cautions = safetyCautions({
  tankVoltageRms: 95,
  supplyVoltageDc: 24,
  capacitance: 2e-6,
  capacitorVoltagePeak: 135,
  surfaceTemperature: celsius(180),
  frequency,
  fluxDensityRms: centre,
  population: "occupational",
});
for (const c of cautions) console.log(`[${c.severity}] ${c.code}: ${c.message}`);
const codes = cautions.map((c) => c.code);
for (const expected of ["voltage-above-extra-low", "hot-surface-burn", "field-above-reference-level"]) {
  if (!codes.includes(expected)) throw new Error(`missing caution ${expected}`);
}
if (!cautions.every((c) => c.message.endsWith(DEFER_TO_CODES))) throw new Error("every caution must defer to codes");
