import { bench, describe } from "vitest";
import {
  loopMutualInductance,
  multilayerCoilInductance,
  nagaokaCoefficient,
  solenoidInductance,
  spiralCoilInductance,
} from "../../src/inductance/index.js";

// random inputs over the valid domain, prepared beforehand (fixed generator for repeatability)
let seed = 12345;
const random = (): number => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
};
const logUniform = (lo: number, hi: number): number => Math.exp(Math.log(lo) + random() * (Math.log(hi) - Math.log(lo)));
const N = 4096;
const radius = Float64Array.from({ length: N }, () => logUniform(1e-3, 1));
const length = Float64Array.from({ length: N }, () => logUniform(1e-3, 1));
const distance = Float64Array.from({ length: N }, () => logUniform(1e-6, 1));
const turns = Float64Array.from({ length: N }, () => Math.ceil(logUniform(1, 1000)));
const check = (v: number): void => {
  if (Number.isNaN(v)) throw new Error("NaN in benchmark");
};

describe("inductance", () => {
  let i = 0;
  bench(
    "solenoidInductance (current sheet)",
    () => {
      i = (i + 1) & (N - 1);
      check(solenoidInductance({ radius: radius[i]!, length: length[i]!, turns: turns[i]! }));
    },
    { time: 300 },
  );
  bench(
    "nagaokaCoefficient",
    () => {
      i = (i + 1) & (N - 1);
      check(nagaokaCoefficient(radius[i]! / length[i]!));
    },
    { time: 300 },
  );
  bench(
    "loopMutualInductance",
    () => {
      i = (i + 1) & (N - 1);
      check(loopMutualInductance({ radius1: radius[i]!, radius2: length[i]!, axialDistance: distance[i]! }));
    },
    { time: 300 },
  );
  bench(
    "spiralCoilInductance, 30 turns",
    () => {
      i = (i + 1) & (N - 1);
      const inner = radius[i]!;
      check(spiralCoilInductance({ innerRadius: inner, outerRadius: 2 * inner, turns: 30, wireDiameter: inner / 40 }));
    },
    { time: 300 },
  );
  bench(
    "multilayerCoilInductance",
    () => {
      i = (i + 1) & (N - 1);
      const inner = radius[i]!;
      check(multilayerCoilInductance({ innerRadius: inner, outerRadius: 1.5 * inner, length: inner, turns: 100 }));
    },
    { time: 300, iterations: 3 },
  );
});
