import { describe, it, expect } from "vitest";
import { integrateToInfinity, besselJ0, InputError } from "../../src/index.js";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
// The default relative tolerance of integrateToInfinity; the TSDoc states the same bound.
const TOL = 1e-10;

describe("integrateToInfinity (interval-by-interval Gauss–Kronrod with Wynn ε)", () => {
  const sinc = (x: number): number => (x === 0 ? 1 : Math.sin(x) / x);

  it("∫₀^∞ sin x / x = π/2, with and without the half-period as interval length (Dirichlet integral, closed form)", () => {
    const a = integrateToInfinity(sinc, 0, { intervalLength: Math.PI });
    const b = integrateToInfinity(sinc, 0);
    expect(rel(a.value, Math.PI / 2)).toBeLessThan(TOL);
    expect(rel(b.value, Math.PI / 2)).toBeLessThan(TOL);
    expect(a.converged && b.converged).toBe(true);
  });

  it("∫₀^∞ e^(−x) = 1 and ∫₁^∞ x^(−2) = 1 (closed forms; algebraic tail by geometric intervals)", () => {
    expect(rel(integrateToInfinity((x) => Math.exp(-x), 0).value, 1)).toBeLessThan(TOL);
    expect(rel(integrateToInfinity((x) => 1 / (x * x), 1).value, 1)).toBeLessThan(TOL);
  });

  it("∫₀^∞ dx/(1 + x²) = π/2 (closed form)", () => {
    expect(rel(integrateToInfinity((x) => 1 / (1 + x * x), 0).value, Math.PI / 2)).toBeLessThan(TOL);
  });

  it("∫₀^∞ e^(−0.01x) cos x dx = 0.01/(1 + 0.0001), a slowly damped oscillation (closed form)", () => {
    const r = integrateToInfinity((x) => Math.exp(-0.01 * x) * Math.cos(x), 0);
    expect(rel(r.value, 0.01 / 1.0001)).toBeLessThan(TOL);
    expect(r.errorEstimate).toBeGreaterThan(0);
  });

  it("∫₀^∞ cos x /(1 + x²) dx = π/(2e) (closed form, Fourier transform of the Lorentzian)", () => {
    const r = integrateToInfinity((x) => Math.cos(x) / (1 + x * x), 0);
    expect(rel(r.value, Math.PI / (2 * Math.E))).toBeLessThan(TOL);
  });

  it("∫₀^∞ J₀(x) dx = 1, an oscillatory integrand decaying only as x^(−1/2) (closed form, DLMF §10.22, from memory)", () => {
    const r = integrateToInfinity(besselJ0, 0, { intervalLength: Math.PI });
    expect(rel(r.value, 1)).toBeLessThan(TOL);
    expect(r.converged).toBe(true);
  });

  it("reports converged: false when the intervals are far too short for the integrand's scale", () => {
    const r = integrateToInfinity((x) => Math.sin(0.001 * x) / (1 + 0.001 * x), 0, { intervalLength: 1, maxIntervals: 50 });
    expect(r.converged).toBe(false);
  });

  it("returns converged: false for a non-finite integrand", () => {
    expect(integrateToInfinity(() => Infinity, 0).converged).toBe(false);
  });

  it("throws InputError on a non-finite lower limit and bad options", () => {
    expect(() => integrateToInfinity(sinc, Infinity)).toThrow(InputError);
    expect(() => integrateToInfinity(sinc, 0, { intervalLength: 0 })).toThrow(InputError);
    expect(() => integrateToInfinity(sinc, 0, { maxIntervals: 2 })).toThrow(InputError);
    expect(() => integrateToInfinity(sinc, 0, { relativeTolerance: -1 })).toThrow(InputError);
    expect(() => integrateToInfinity(sinc, 0, { maxSubintervals: 0 })).toThrow(InputError);
  });
});
