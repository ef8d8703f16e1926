import { describe, it, expect } from "vitest";
import ellipk from "@stdlib/math-base-special-ellipk";
import ellipe from "@stdlib/math-base-special-ellipe";
import {
  ellipticK,
  ellipticE,
  ellipticKFromComplement,
  ellipticEFromComplement,
} from "../../src/special/index.js";
import data from "../fixtures/special/elliptic.json" with { type: "json" };
import comp from "../fixtures/special/elliptic-complement.json" with { type: "json" };

const relErr = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("ellipticK and ellipticE (parameter m = k²)", () => {
  it("match the mpmath fixture to 1e-15 relative for every m < 1 (fixture from mpmath, generate.py)", () => {
    const tol = data.meta.rtol;
    let worstK = 0;
    let worstE = 0;
    for (const c of data.cases) {
      worstK = Math.max(worstK, relErr(ellipticK(c.m), c.K));
      worstE = Math.max(worstE, relErr(ellipticE(c.m), c.E));
    }
    expect(worstK).toBeLessThanOrEqual(tol);
    expect(worstE).toBeLessThanOrEqual(tol);
  });

  it("complement forms match mpmath down to m₁ = 1e-300 (fixture from mpmath, generate.py)", () => {
    const tol = comp.meta.rtol;
    for (const c of comp.cases) {
      expect(relErr(ellipticKFromComplement(c.m1), c.K)).toBeLessThanOrEqual(tol);
      expect(relErr(ellipticEFromComplement(c.m1), c.E)).toBeLessThanOrEqual(tol);
    }
  });

  it("agree with @stdlib ellipk/ellipe over -5 ≤ m < 1 (general-purpose reference library)", () => {
    for (let i = 0; i < 600; i++) {
      const m = -5 + (6 * i) / 600;
      expect(relErr(ellipticK(m), ellipk(m))).toBeLessThan(1e-14);
      expect(relErr(ellipticE(m), ellipe(m))).toBeLessThan(1e-14);
    }
  });

  it("take the exact end values K(0) = E(0) = π/2, K(1) = ∞, E(1) = 1", () => {
    expect(ellipticK(0)).toBe(Math.PI / 2);
    expect(ellipticE(0)).toBe(Math.PI / 2);
    expect(ellipticK(1)).toBe(Infinity);
    expect(ellipticE(1)).toBe(1);
    expect(ellipticKFromComplement(0)).toBe(Infinity);
    expect(ellipticEFromComplement(0)).toBe(1);
  });

  it("reproduce the lemniscatic closed forms K(1/2) = Γ(1/4)²/(4√π) and E(1/2) (values from mpmath, 25 digits)", () => {
    // K(1/2) = 1.854074677301371918…, E(1/2) = 1.350643881047675502… (mpmath ellipk/ellipe).
    expect(ellipticK(0.5)).toBeCloseTo(1.854074677301372, 15);
    expect(ellipticE(0.5)).toBeCloseTo(1.3506438810476755, 15);
  });

  it("return NaN above m = 1 and for NaN input (kernel, no throw)", () => {
    expect(ellipticK(1.5)).toBeNaN();
    expect(ellipticE(1.5)).toBeNaN();
    expect(ellipticK(NaN)).toBeNaN();
    expect(ellipticE(NaN)).toBeNaN();
    expect(ellipticKFromComplement(-0.1)).toBeNaN();
    expect(ellipticEFromComplement(2)).toBeNaN();
  });
});
