import { describe, it, expect } from "vitest";
import { integrateAdaptive, InputError } from "../../src/index.js";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("integrateAdaptive (Gauss–Kronrod 7–15, QUADPACK nodes and weights)", () => {
  it("the 15-point Kronrod rule is exact for x^k, k ≤ 22, on one panel (closed form 1/(k+1))", () => {
    for (let k = 0; k <= 22; k++) {
      const r = integrateAdaptive((x) => x ** k, 0, 1, { maxSubintervals: 1 });
      expect(rel(r.value, 1 / (k + 1))).toBeLessThan(1e-15);
      expect(r.evaluations).toBe(15);
    }
  });

  it("integrates sin over [0, π] to 2 (closed form)", () => {
    const r = integrateAdaptive(Math.sin, 0, Math.PI);
    expect(rel(r.value, 2)).toBeLessThan(1e-15);
    expect(r.converged).toBe(true);
  });

  it("handles integrable endpoint singularities: ∫₀¹ x^(−1/2) = 2 and ∫₀¹ ln x = −1 (closed forms)", () => {
    const a = integrateAdaptive((x) => 1 / Math.sqrt(x), 0, 1);
    const b = integrateAdaptive(Math.log, 0, 1);
    expect(rel(a.value, 2)).toBeLessThan(1e-12);
    expect(rel(b.value, -1)).toBeLessThan(1e-12);
    expect(a.converged && b.converged).toBe(true);
  });

  it("integrates the oscillatory ∫₀² e^(−x²) cos 5x dx to 1e-15 (mpmath quad, 30 digits: 0.00213559279918463351…)", () => {
    // mpmath: mp.quad(lambda x: mp.exp(-x**2)*mp.cos(5*x), [0, 2]) at 30 digits.
    const r = integrateAdaptive((x) => Math.exp(-x * x) * Math.cos(5 * x), 0, 2);
    expect(Math.abs(r.value - 0.0021355927991846335)).toBeLessThan(1e-15);
  });

  it("reports an error estimate that bounds the true error", () => {
    const r = integrateAdaptive((x) => Math.exp(x), 0, 3, { relativeTolerance: 1e-6 });
    expect(Math.abs(r.value - Math.expm1(3))).toBeLessThanOrEqual(r.errorEstimate);
  });

  it("reverses sign for b < a and gives 0 for a = b", () => {
    expect(integrateAdaptive(Math.exp, 1, 0).value).toBeCloseTo(-Math.expm1(1), 14);
    expect(integrateAdaptive(Math.exp, 1, 1)).toEqual({ value: 0, errorEstimate: 0, evaluations: 0, converged: true });
  });

  it("returns converged: false when the subinterval limit is too small or f is not finite", () => {
    const r = integrateAdaptive((x) => 1 / Math.sqrt(x), 0, 1, { maxSubintervals: 3 });
    expect(r.converged).toBe(false);
    expect(integrateAdaptive(() => NaN, 0, 1).converged).toBe(false);
  });

  it("throws InputError on non-finite limits and bad options", () => {
    expect(() => integrateAdaptive(Math.sin, 0, Infinity)).toThrow(InputError);
    expect(() => integrateAdaptive(Math.sin, NaN, 1)).toThrow(InputError);
    expect(() => integrateAdaptive(Math.sin, 0, 1, { relativeTolerance: -1 })).toThrow(InputError);
    expect(() => integrateAdaptive(Math.sin, 0, 1, { absoluteTolerance: NaN })).toThrow(InputError);
    expect(() => integrateAdaptive(Math.sin, 0, 1, { relativeTolerance: 0 })).toThrow(InputError);
    expect(() => integrateAdaptive(Math.sin, 0, 1, { maxSubintervals: 1.5 })).toThrow(InputError);
  });
});
