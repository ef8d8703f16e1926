/**
 * Ratios of consecutive modified Bessel functions of complex argument against mpmath at 40
 * digits (fixture from mpmath, test/fixtures/toolkit/generate_bessel_ratios.py). The tolerance is
 * the accuracy stated in src/special/bessel-orders.ts.
 */
import { describe, expect, it } from "vitest";
import data from "../fixtures/toolkit/bessel-ratios.json" with { type: "json" };
import { besselIKRatiosComplex } from "../../src/special/internal.js";

const RTOL = data.meta.rtol;

describe("besselIKRatiosComplex", () => {
  it("matches mpmath for n ≤ 60, 1e-6 ≤ |z| ≤ 1e4 (fixture from mpmath)", () => {
    const n = data.nMax;
    const iRe = new Float64Array(n + 1);
    const iIm = new Float64Array(n + 1);
    const kRe = new Float64Array(n + 1);
    const kIm = new Float64Array(n + 1);
    let worst = 0;
    for (const c of data.cases) {
      expect(besselIKRatiosComplex(c.z[0]!, c.z[1]!, n, iRe, iIm, kRe, kIm)).toBe(true);
      for (let k = 0; k <= n; k++) {
        const [ir, ii] = c.iRatio[k]!;
        const [kr, ki] = c.kRatio[k]!;
        const ei = Math.hypot(iRe[k]! - ir!, iIm[k]! - ii!) / Math.hypot(ir!, ii!);
        const ek = Math.hypot(kRe[k]! - kr!, kIm[k]! - ki!) / Math.hypot(kr!, ki!);
        worst = Math.max(worst, ei, ek);
      }
    }
    expect(worst).toBeLessThanOrEqual(RTOL);
  });
});
