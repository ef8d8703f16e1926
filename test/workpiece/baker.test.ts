import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { bakerFunctions, bakerFunctionsAsymptotic, InputError } from "../../src/index.js";
import baker from "../fixtures/workpiece/baker.json" with { type: "json" };
import diffusion from "../fixtures/workpiece/diffusion.json" with { type: "json" };

describe("bakerFunctions", () => {
  it("matches mpmath Bessel functions of complex argument to 1e-13 (fixture baker.json, Kelvin cross-check in the generator)", () => {
    for (const c of baker.cases) {
      const r = bakerFunctions(c.ratio);
      const scale = Math.hypot(c.p, c.q);
      expect(Math.abs(r.p - c.p)).toBeLessThanOrEqual(1e-13 * scale);
      expect(Math.abs(r.q - c.q)).toBeLessThanOrEqual(1e-13 * scale);
    }
  });

  it("matches the numerical 1-D field-diffusion solution of a solid bar (fixture diffusion.json)", () => {
    for (const c of diffusion.cases.bar) {
      const r = bakerFunctions(c.radiusOverSkinDepth);
      expect(Math.abs(r.p - c.p)).toBeLessThanOrEqual(1e-12 * Math.hypot(c.p, c.q));
      expect(Math.abs(r.q - c.q)).toBeLessThanOrEqual(1e-12 * Math.hypot(c.p, c.q));
    }
  });

  it("has the thin-bar limits P = u^3/4, Q = u and the value 0 at u = 0 (series of I1/I0)", () => {
    expect(bakerFunctions(0)).toEqual({ p: 0, q: 0 });
    const r = bakerFunctions(1e-4);
    expect(r.p / (1e-12 / 4)).toBeCloseTo(1, 6);
    expect(r.q / 1e-4).toBeCloseTo(1, 6);
  });

  it("tends to 1 for a thick bar and agrees with its asymptote to the documented accuracy", () => {
    const big = bakerFunctions(1e6);
    expect(big.p).toBeCloseTo(1, 5);
    expect(big.q).toBeCloseTo(1, 5);
    for (const [u, tol] of [[2.5, 2.2e-2], [4, 5e-4], [10, 1e-5]] as const) {
      for (let v = u; v < 1000; v *= 1.02) {
        const e = bakerFunctions(v);
        const a = bakerFunctionsAsymptotic(v);
        expect(Math.abs(a.p - e.p) / e.p).toBeLessThanOrEqual(tol);
        expect(Math.abs(a.q - e.q) / e.q).toBeLessThanOrEqual(tol);
      }
    }
  });

  it("P rises monotonically with the ratio and stays below 1", () => {
    fc.assert(
      fc.property(fc.double({ min: Math.log(1e-3), max: Math.log(1e4), noNaN: true, noDefaultInfinity: true }).map(Math.exp), (u) => {
        const a = bakerFunctions(u);
        const b = bakerFunctions(u * 1.01);
        return a.p >= 0 && a.p < 1 && b.p > a.p && a.q > 0;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("throws InputError for negative or non-finite ratios", () => {
    expect(() => bakerFunctions(-1)).toThrow(InputError);
    expect(() => bakerFunctions(Number.NaN)).toThrow(InputError);
    expect(() => bakerFunctions(Infinity)).toThrow(InputError);
    expect(() => bakerFunctionsAsymptotic(0)).toThrow(InputError);
  });
});
