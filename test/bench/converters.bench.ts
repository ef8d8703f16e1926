import { bench, describe } from "vitest";
import { inductiveLink, lccOperatingPoint, lccSplitting, llcGain, llcOperatingPoint } from "../../src/index.js";

// Inputs prepared beforehand over the documented (tested) domains, fixed pseudo-random sequence.
const N = 4096;
let seed = 20261204;
const random = (): number => ((seed = (seed * 1103515245 + 12345) >>> 0) / 4294967296);
const logUniform = (lo: number, hi: number): number => lo * (hi / lo) ** random();
const gains = Array.from({ length: N }, () => ({ inductanceRatio: logUniform(2, 20), qualityFactor: logUniform(0.05, 3), normalisedFrequency: logUniform(0.3, 3) }));
const lr = 60e-6;
const cr = 24e-9;
const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
const zr = Math.sqrt(lr / cr);
const points = Array.from({ length: 256 }, () => ({
  bridge: "half" as const, inputVoltage: 390, turnsRatio: 8, resonantInductance: lr, resonantCapacitance: cr,
  magnetisingInductance: logUniform(3, 10) * lr, switchingFrequency: logUniform(0.45, 1.6) * fr,
  loadResistance: (Math.PI * Math.PI * zr) / (8 * 64 * logUniform(0.15, 1)),
}));
const compensations = ["series-series", "series-parallel", "parallel-series", "parallel-parallel"] as const;
const links = Array.from({ length: N }, (_, i) => ({
  primaryInductance: logUniform(5e-6, 500e-6), secondaryInductance: logUniform(5e-6, 500e-6), mutualInductance: 0,
  primaryResistance: logUniform(0.01, 1), secondaryResistance: logUniform(0.01, 1), frequency: logUniform(20e3, 7e6),
  compensation: compensations[i & 3] ?? "series-series", loadResistance: logUniform(1, 100), sourceVoltage: 10,
})).map((o) => ({ ...o, mutualInductance: logUniform(0.01, 0.5) * Math.sqrt(o.primaryInductance * o.secondaryInductance) }));
const cs = 25e-9;
const frLcc = 1 / (2 * Math.PI * Math.sqrt(100e-6 * cs));
const lccPoints = Array.from({ length: 256 }, () => ({
  bridge: "half" as const, inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, seriesCapacitance: cs,
  parallelCapacitance: logUniform(0.25, 2) * cs, switchingFrequency: logUniform(0.6, 1.6) * frLcc,
  loadResistance: (8 * Math.sqrt(100e-6 / cs)) / (Math.PI * Math.PI * 16 * logUniform(0.2, 2.5)),
}));
const splits = Array.from({ length: 64 }, (_, j) => ({
  compensation: j % 2 === 0 ? "lcc-series" as const : "double-lcc" as const, primaryInductance: 60e-6, secondaryInductance: 40e-6,
  mutualInductance: logUniform(0.05, 0.5) * Math.sqrt(60e-6 * 40e-6), primaryFilterInductance: logUniform(5e-6, 20e-6),
  ...(j % 2 === 0 ? {} : { secondaryFilterInductance: logUniform(4e-6, 16e-6) }),
  primaryResistance: 0.05, secondaryResistance: 0.05, loadResistance: logUniform(1, 20), resonantFrequency: 100e3,
}));
let i = 0;
let sink = 0;
const check = (v: number): void => {
  if (Number.isNaN(v)) throw new Error("NaN in benchmark");
  sink += v;
};

describe("converters and links", () => {
  bench("llcGain (L_n 2…20, Q 0.05…3, f_n 0.3…3)", () => {
    i = (i + 1) & (N - 1);
    check(llcGain(gains[i] ?? gains[0]!));
  }, { time: 300 });
  bench("llcOperatingPoint (tested domain, 256 points)", () => {
    i = (i + 1) & (N - 1);
    check(llcOperatingPoint(points[i & 255] ?? points[0]!).gain);
  }, { time: 300 });
  bench("lccOperatingPoint (tested domain, 256 points)", () => {
    i = (i + 1) & (N - 1);
    check(lccOperatingPoint(lccPoints[i & 255] ?? lccPoints[0]!).gain);
  }, { time: 300 });
  bench("lccSplitting (both LCC compensations, 64 links)", () => {
    i = (i + 1) & (N - 1);
    check(lccSplitting(splits[i & 63] ?? splits[0]!).criticalCoupling);
  }, { time: 300 });
  bench("inductiveLink (S/P compensations)", () => {
    i = (i + 1) & (N - 1);
    check(inductiveLink(links[i] ?? links[0]!).efficiency);
  }, { time: 300 });
});
export { sink };
