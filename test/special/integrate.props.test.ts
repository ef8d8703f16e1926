import { describe, it } from "vitest";
import fc from "fast-check";
import { integrateAdaptive, integrateToInfinity } from "../../src/special/index.js";

const coef = fc.double({ min: -10, max: 10, noNaN: true, noDefaultInfinity: true });
const rate = fc.double({ min: 0.1, max: 10, noNaN: true, noDefaultInfinity: true });

describe("quadrature invariants", () => {
  it("integrateAdaptive is additive over adjacent intervals", () => {
    fc.assert(
      fc.property(coef, coef, rate, (a, m, k) => {
        const f = (x: number): number => Math.exp(-k * x * x) * Math.cos(a * x);
        const whole = integrateAdaptive(f, -1, 2).value;
        const split = integrateAdaptive(f, -1, m / 10).value + integrateAdaptive(f, m / 10, 2).value;
        return Math.abs(whole - split) <= 1e-12 * (1 + Math.abs(whole));
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("integrateAdaptive is exact for polynomials up to degree 22 on any interval", () => {
    fc.assert(
      fc.property(coef, coef, coef, (c0, c1, b) => {
        const r = integrateAdaptive((x) => c0 + c1 * x ** 9, 0, b, { maxSubintervals: 1 });
        const exact = c0 * b + (c1 * b ** 10) / 10;
        return Math.abs(r.value - exact) <= 1e-13 * (Math.abs(c0 * b) + Math.abs((c1 * b ** 10) / 10) + 1e-300);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("integrateToInfinity gives ∫₀^∞ e^{−kx} cos(ωx) dx = k/(k² + ω²) to 1e-9 when asked for 1e-8 (closed form)", () => {
    fc.assert(
      fc.property(rate, fc.double({ min: 0, max: 5, noNaN: true, noDefaultInfinity: true }), (k, w) => {
        const r = integrateToInfinity((x) => Math.exp(-k * x) * Math.cos(w * x), 0, { relativeTolerance: 1e-8 });
        const exact = k / (k * k + w * w);
        return r.converged && Math.abs(r.value - exact) <= 1e-9 * exact;
      }),
      { seed: 1, numRuns: 100 },
    );
  });
});
