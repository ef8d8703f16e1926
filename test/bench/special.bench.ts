import { bench, describe } from "vitest";
import {
  ellipticK,
  ellipticE,
  kelvinFunctions,
  besselJ0,
  besselK0,
  besselI1OverI0Complex,
  integrateAdaptive,
} from "../../src/special/index.js";

const N = 4096;
// Deterministic pseudo-random inputs (LCG), prepared before timing.
let seed = 12345;
const random = (): number => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
};
const mValues = Float64Array.from({ length: N }, () => 1 - 10 ** (-6 * random())); // 0 ≤ m < 1, many near 1
const kelvinX = Float64Array.from({ length: N }, () => 10 ** (-2 + 5 * random())); // 0.01 … 1000, log-uniform
const besselX = Float64Array.from({ length: N }, () => 10 ** (-2 + 4 * random()));
const ratioZ = Array.from({ length: N }, () => {
  const r = 10 ** (-1 + 5 * random());
  return { re: r, im: r };
});

function check(v: number): void {
  if (Number.isNaN(v)) throw new Error("NaN in benchmark");
}

describe("special functions", () => {
  bench(
    "ellipticK + ellipticE, 4096 parameters",
    () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += ellipticK(mValues[i]!) + ellipticE(mValues[i]!);
      check(s);
    },
    { time: 300 },
  );

  bench(
    "kelvinFunctions (all eight), 4096 arguments 0.01…1000",
    () => {
      let s = 0;
      for (let i = 0; i < N; i++) {
        const k = kelvinFunctions(kelvinX[i]!);
        s += k.ber + k.bei + k.ker + k.kei + k.berPrime + k.beiPrime + k.kerPrime + k.keiPrime;
      }
      check(s);
    },
    { time: 300 },
  );

  bench(
    "besselJ0 + besselK0, 4096 arguments 0.01…100",
    () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += besselJ0(besselX[i]!) + besselK0(besselX[i]!);
      check(s);
    },
    { time: 300 },
  );

  bench(
    "besselI1OverI0Complex on the skin-effect ray, 4096 arguments",
    () => {
      let s = 0;
      for (let i = 0; i < N; i++) s += besselI1OverI0Complex(ratioZ[i]!).re;
      check(s);
    },
    { time: 300 },
  );

  bench(
    "integrateAdaptive of e^(−x²)cos 5x on [0, 2]",
    () => {
      check(integrateAdaptive((x) => Math.exp(-x * x) * Math.cos(5 * x), 0, 2).value);
    },
    { time: 300 },
  );
});
