import { bench, describe } from "vitest";
import {
  dowellFactor,
  roundWireAcRatio,
  roundWireWindingAcRatio,
  roundWireWindingAcRatioFerreira,
  litzAcRatio,
  litzWindingAcRatio,
  tubeAcResistance,
  skinDepth,
} from "../../src/index.js";

// Inputs prepared beforehand: log-uniform over the documented domains, fixed pseudo-random sequence.
const N = 4096;
let seed = 20261201;
const random = (): number => ((seed = (seed * 1103515245 + 12345) >>> 0) / 4294967296);
const logUniform = (lo: number, hi: number): number => lo * (hi / lo) ** random();
const rho = 1.7241e-8;
const deltas = Float64Array.from({ length: N }, () => logUniform(1e-6, 1e4));
const layers = Int32Array.from({ length: N }, () => 1 + Math.floor(random() * 20));
const freqs = Float64Array.from({ length: N }, () => logUniform(1, 1e8));
const diameters = Float64Array.from({ length: N }, () => logUniform(1e-5, 1e-2));
let i = 0;
let sink = 0;
const check = (v: number): void => {
  if (Number.isNaN(v)) throw new Error("NaN in benchmark");
  sink += v;
};

describe("conductors", () => {
  bench("skinDepth", () => {
    i = (i + 1) & (N - 1);
    check(skinDepth({ resistivity: rho, frequency: freqs[i] ?? 1 }));
  }, { time: 300 });
  bench("dowellFactor (Δ log-uniform 1e-6…1e4, m 1…20)", () => {
    i = (i + 1) & (N - 1);
    check(dowellFactor({ penetrationRatio: deltas[i] ?? 1, layers: layers[i] ?? 1 }));
  }, { time: 300 });
  bench("roundWireAcRatio (d 10 µm…10 mm, f 1 Hz…100 MHz)", () => {
    i = (i + 1) & (N - 1);
    check(roundWireAcRatio({ diameter: diameters[i] ?? 1, frequency: freqs[i] ?? 1, resistivity: rho }));
  }, { time: 300 });
  bench("roundWireWindingAcRatio", () => {
    i = (i + 1) & (N - 1);
    check(roundWireWindingAcRatio({ wireDiameter: 0.5e-3, frequency: freqs[i] ?? 1, resistivity: rho, layers: layers[i] ?? 1, turnsPerLayer: 10, windowBreadth: 6e-3 }));
  }, { time: 300 });
  bench("roundWireWindingAcRatioFerreira", () => {
    i = (i + 1) & (N - 1);
    check(roundWireWindingAcRatioFerreira({ wireDiameter: 0.5e-3, frequency: freqs[i] ?? 1, resistivity: rho, layers: layers[i] ?? 1, turnsPerLayer: 10, windowBreadth: 6e-3 }));
  }, { time: 300 });
  bench("litzWindingAcRatio", () => {
    i = (i + 1) & (N - 1);
    check(litzWindingAcRatio({ strands: 100, strandDiameter: 0.1e-3, turns: layers[i] ?? 1, windowBreadth: 0.02, frequency: freqs[i] ?? 1, resistivity: rho }));
  }, { time: 300 });
  const construction = { strands: 400, strandDiameter: 0.071e-3, strandOuterDiameter: 0.08e-3, bundleLevels: [20, 20] };
  bench("litzAcRatio (with winding field)", () => {
    i = (i + 1) & (N - 1);
    check(litzAcRatio({ construction, frequency: freqs[i] ?? 1, resistivity: rho, turns: 12, windowBreadth: 0.03 }));
  }, { time: 300 });
  bench("tubeAcResistance (6 × 1 mm)", () => {
    i = (i + 1) & (N - 1);
    check(tubeAcResistance({ outerDiameter: 6e-3, wallThickness: 1e-3, frequency: freqs[i] ?? 1, resistivity: rho }));
  }, { time: 300 });
});

export { sink };
