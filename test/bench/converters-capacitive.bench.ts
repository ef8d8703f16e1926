import { bench, describe } from "vitest";
import { lccFrequencySweep, lccOperatingPointCapacitiveFilter, parallelResonantOperatingPointCapacitiveFilter } from "../../src/index.js";

// Inputs prepared beforehand over the tested domain of the capacitive-filter solvers, fixed pseudo-random sequence.
let seed = 20261204;
const random = (): number => ((seed = (seed * 1103515245 + 12345) >>> 0) / 4294967296);
const logUniform = (lo: number, hi: number): number => lo * (hi / lo) ** random();
const lr = 100e-6;
const c = 25e-9;
const fr = 1 / (2 * Math.PI * Math.sqrt(lr * c));
const z = Math.sqrt(lr / c);
/** R_load for Q = √(L_r/C)/R_ac, R_ac = 8n²R/π² (n = 4). */
const loadFor = (q: number): number => (Math.PI * Math.PI * z) / (q * 8 * 16);
const lccPoints = Array.from({ length: 256 }, () => ({
  bridge: "half" as const, inputVoltage: 400, turnsRatio: 4, resonantInductance: lr, seriesCapacitance: c,
  parallelCapacitance: logUniform(0.25, 2) * c, switchingFrequency: logUniform(0.7, 1.8) * fr, loadResistance: loadFor(logUniform(0.3, 3)),
}));
const prcPoints = Array.from({ length: 256 }, () => ({
  bridge: "half" as const, inputVoltage: 400, turnsRatio: 4, resonantInductance: lr, parallelCapacitance: c,
  switchingFrequency: logUniform(0.7, 1.8) * fr, loadResistance: loadFor(logUniform(0.3, 3)),
}));
const frequencies = Array.from({ length: 100 }, (_, k) => fr * (0.8 + 0.012 * k));
let i = 0;
let sink = 0;
const check = (v: number): void => {
  if (Number.isNaN(v)) throw new Error("NaN in benchmark");
  sink += v;
};

describe("converters with a capacitive output filter", () => {
  bench("parallelResonantOperatingPointCapacitiveFilter (tested domain, 256 points)", () => {
    i = (i + 1) & 255;
    check(parallelResonantOperatingPointCapacitiveFilter(prcPoints[i] ?? prcPoints[0]!).gain);
  }, { time: 300 });
  bench("lccOperatingPointCapacitiveFilter (tested domain, 256 points)", () => {
    i = (i + 1) & 255;
    check(lccOperatingPointCapacitiveFilter(lccPoints[i] ?? lccPoints[0]!).gain);
  }, { time: 300 });
  bench("lccFrequencySweep, capacitive filter (100 points, 0.8…2 f_r)", () => {
    const sweep = lccFrequencySweep({ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: lr, seriesCapacitance: c, parallelCapacitance: c, loadResistance: 12, frequencies, outputFilter: "capacitive" });
    check(sweep.unsolvedCount);
  }, { time: 300 });
});
export { sink };
