/**
 * Study the battery-powered shrink-fit heater for a steel bearing race (the demo study file),
 * then check the numbers a designer would look at first. Scenario and design numbers are our
 * own (invented for the demo); the expectations are common practice for a 1 kg steel ring.
 *
 * Run: npx tsx docs/examples/study-bearing-race.ts
 */
import { readFileSync } from "node:fs";
import { formatQuantity, studyHeater, toCelsius } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";

const file = new URL("./study-bearing-race.json", import.meta.url);
const study = studyHeater(JSON.parse(readFileSync(file, "utf8")) as HeaterDescription);
const op = study.operating;

console.log(study.title);
console.log(`  frequency: empty ${formatQuantity(study.emptyCoil.frequency, "Hz")}, with the ring ${formatQuantity(op.frequency, "Hz")}`);
console.log(`  power into the ring: ${formatQuantity(op.losses.part, "W")} of ${formatQuantity(op.inputPower, "W")} drawn (${(100 * op.efficiency).toFixed(1)} %)`);
console.log(`  time to ${toCelsius(study.description.part.targetTemperature).toFixed(0)} °C: ${study.heatUp?.timeToTarget?.toFixed(1)} s`);
console.log(`  cautions: ${study.cautions.map((c) => c.code).join(", ")}`);

// the losses by place add up to what the battery delivers
const sum = (Object.values(op.losses) as number[]).reduce((a, b) => a + b, 0);
if (Math.abs(sum - op.inputPower) > 1e-9 * op.inputPower) throw new Error(`energy balance off: ${sum} vs ${op.inputPower}`);
// a few hundred watts to a few kilowatts into a 1 kg ring, above 70 % efficient (common practice)
if (!(study.part.mass > 0.9 && study.part.mass < 1.1)) throw new Error(`ring mass ${study.part.mass}`);
if (!(op.losses.part > 300 && op.losses.part < 5000)) throw new Error(`part power ${op.losses.part}`);
if (!(op.efficiency > 0.7)) throw new Error(`efficiency ${op.efficiency}`);
// π × 48 V ≈ 150 V peak across the tank: above extra-low voltage, so the study must say so
if (!study.cautions.some((c) => c.code === "voltage-above-extra-low")) throw new Error("missing voltage caution");
