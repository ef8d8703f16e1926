import { bench, describe } from "vitest";
import { eCore, gappedInductor, inductorDesign, inventedExampleFerrite } from "../../src/index.js";

const N = 1024;
const rnd = (lo: number, hi: number): number => lo + (hi - lo) * Math.random();
const cores = Array.from({ length: N }, () => ({
  effectiveArea: rnd(2e-5, 4e-4),
  effectivePathLength: rnd(0.03, 0.15),
  relativePermeability: rnd(1000, 3000),
  legShape: "rectangular" as const,
  legWidth: rnd(0.005, 0.02),
  legDepth: rnd(0.005, 0.02),
  windowHeight: rnd(0.015, 0.04),
  saturationFluxDensity: 0.35,
}));
const gaps = Float64Array.from({ length: N }, () => rnd(5e-5, 1.5e-3));
const turns = Float64Array.from({ length: N }, () => 1 + Math.floor(rnd(0, 80)));

let i = 0;
const check = (x: number): void => {
  if (Number.isNaN(x)) throw new Error("NaN");
};

describe("cores", () => {
  bench(
    "gappedInductor, Mühlethaler fringing",
    () => {
      const k = i++ & (N - 1);
      check(gappedInductor({ core: cores[k]!, turns: turns[k]!, gapLength: gaps[k]!, fringing: "muhlethaler", current: 3 }).inductance);
    },
    { time: 300 },
  );
  const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
  const designs = Array.from({ length: 64 }, () => ({
    inductance: rnd(50e-6, 150e-6),
    frequency: rnd(50e3, 200e3),
    core,
    material: inventedExampleFerrite,
    current: { kind: "triangular" as const, average: rnd(2, 6), ripple: rnd(0.5, 2), dutyCycle: rnd(0.2, 0.8) },
    conductor: { kind: "litz" as const, strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
    ambientTemperature: 313.15,
  }));
  bench(
    "inductorDesign, E core, litz, triangular current (target ≤ 1 ms)",
    () => {
      check(inductorDesign(designs[i++ & 63]!).totalLoss);
    },
    { time: 500 },
  );
});
