/**
 * Benchmarks of the heater study (one core): a single operating point, a full electro-thermal
 * heat-up, and an optimisation over 10⁴ candidates. Inputs vary between calls; a NaN fails the run.
 */
import { bench, describe } from "vitest";
import { readFileSync } from "node:fs";
import { optimizeHeater, studyHeater } from "../../src/index.js";
import type { HeaterConductor, HeaterDescription } from "../../src/index.js";

const race = JSON.parse(readFileSync(new URL("../../docs/examples/study-bearing-race.json", import.meta.url), "utf8")) as HeaterDescription & {
  supply: Record<string, unknown>;
};
// random supply voltages prepared beforehand (36–60 V)
let seed = 12345;
const random = (): number => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
const plate = JSON.parse(readFileSync(new URL("../../docs/examples/study-plate-warmer.json", import.meta.url), "utf8")) as Record<string, unknown> & {
  supply: Record<string, unknown>;
};
const plateVariants = Array.from({ length: 8 }, (_, i) => ({ ...plate, supply: { ...plate.supply, voltage: 24 + 0.25 * i } }));
const variants = Array.from({ length: 64 }, () => ({ ...race, supply: { ...race.supply, voltage: 36 + 24 * random() } }));
let k = 0;
const check = (x: number): void => {
  if (!Number.isFinite(x)) throw new Error("NaN in study benchmark");
};

/** 10 turns × 48 E24 capacitances × 21 conductors = 10 080 candidates. */
export const OPTIMISER_CONDUCTORS: HeaterConductor[] = [
  ...[4, 5, 6, 8, 10].flatMap((d) => [0.5, 0.8, 1].map((w) => ({ kind: "tube" as const, outerDiameter: d * 1e-3, wallThickness: w * 1e-3 }))),
  ...[2, 2.5, 3, 3.5, 4, 4.5].map((d) => ({ kind: "solid" as const, diameter: d * 1e-3 })),
];

describe("heater study", () => {
  bench("studyHeater, single operating point (bearing race)", () => {
    const s = studyHeater(variants[k++ % variants.length] as HeaterDescription, { heatUp: false, temperatureScan: false, impedanceSweep: false });
    check(s.operating.frequency);
  }, { time: 300 });
  bench("studyHeater with the electro-thermal heat-up to target (bearing race)", () => {
    const s = studyHeater(variants[k++ % variants.length] as HeaterDescription, { temperatureScan: false, impedanceSweep: false });
    check(s.heatUp?.timeToTarget ?? Number.NaN);
  }, { time: 300 });
  bench("studyHeater with the heat-up (plate warmer: pancake over a steel plate)", () => {
    const s = studyHeater(plateVariants[k++ % plateVariants.length] as HeaterDescription, { temperatureScan: false, impedanceSweep: false });
    check(s.heatUp?.finalTemperature ?? Number.NaN);
  }, { time: 300, iterations: 2 });
  bench("optimizeHeater over 10 080 candidates (bearing race)", () => {
    const r = optimizeHeater(race, {
      targetPower: 1500,
      limits: { minFrequency: 20e3, tankVoltagePeak: 200 },
      search: { turns: [3, 4, 5, 6, 7, 8, 9, 10, 11, 12], capacitanceSeries: "E24", minCapacitance: 0.5e-6, maxCapacitance: 47e-6, conductors: OPTIMISER_CONDUCTORS },
    });
    if (r.evaluated < 1e4) throw new Error(`only ${r.evaluated} candidates`);
  }, { time: 300, iterations: 1 });
});
