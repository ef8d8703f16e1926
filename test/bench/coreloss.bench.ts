import { bench, describe } from "vitest";
import { igseLoss, steinmetzLoss, trapezoidalFluxWaveform } from "../../src/coreloss/index.js";

const N = 1024;
const rnd = (lo: number, hi: number): number => lo + (hi - lo) * Math.random();
const trapezoids = Array.from({ length: N }, () =>
  trapezoidalFluxWaveform({ fluxDensityPeak: rnd(0.01, 0.3), frequency: rnd(1e4, 5e5), dutyCycle: rnd(0.1, 0.95) }),
);
const minorLoops = Array.from({ length: N }, () => {
  const a = rnd(0.05, 0.2);
  return { period: 1e-5, time: [0, 3e-6, 4e-6, 5e-6, 8e-6, 1e-5], fluxDensity: [-a, 0.2 * a, -0.2 * a, 0.4 * a, a, -a] };
});
const coefficients = Array.from({ length: N }, () => ({ k: rnd(0.5, 5), alpha: rnd(1.1, 1.8), beta: rnd(2.1, 2.9) }));

let i = 0;
const check = (x: number): void => {
  if (Number.isNaN(x)) throw new Error("NaN");
};

describe("coreloss", () => {
  bench(
    "igseLoss, 4-segment trapezoid",
    () => {
      const w = trapezoids[i & (N - 1)] as (typeof trapezoids)[number];
      const c = coefficients[i++ & (N - 1)] as (typeof coefficients)[number];
      check(igseLoss({ k: c.k, alpha: c.alpha, beta: c.beta, period: w.period, flux: w }));
    },
    { time: 300 },
  );
  bench(
    "igseLoss, 5 segments with a minor loop",
    () => {
      const w = minorLoops[i & (N - 1)] as (typeof minorLoops)[number];
      const c = coefficients[i++ & (N - 1)] as (typeof coefficients)[number];
      check(igseLoss({ k: c.k, alpha: c.alpha, beta: c.beta, period: w.period, flux: w }));
    },
    { time: 300 },
  );
  bench(
    "steinmetzLoss",
    () => {
      const c = coefficients[i++ & (N - 1)] as (typeof coefficients)[number];
      check(steinmetzLoss({ k: c.k, alpha: c.alpha, beta: c.beta, frequency: 1e5 + i, fluxDensityPeak: 0.1 }));
    },
    { time: 300 },
  );
});
