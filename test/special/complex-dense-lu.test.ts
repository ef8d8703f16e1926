/**
 * The complex dense LU kernel against numpy.linalg.solve (LAPACK zgesv; fixture and generator in
 * test/fixtures/toolkit/). The tolerance is the accuracy stated in the kernel's file header.
 */
import { describe, expect, it } from "vitest";
import data from "../fixtures/toolkit/complex-dense-lu.json" with { type: "json" };
import { factorComplexDense, solveComplexFactored } from "../../src/special/internal.js";

describe("factorComplexDense + solveComplexFactored", () => {
  it("solutions within 1e-12 of the largest component of numpy.linalg.solve (LAPACK zgesv), orders 1–12, condition up to 1e4", () => {
    expect(data.cases.length).toBeGreaterThan(15);
    for (const c of data.cases) {
      const re = Float64Array.from(c.re);
      const im = Float64Array.from(c.im);
      const pivots = new Int32Array(c.n);
      factorComplexDense(c.n, re, im, pivots);
      const xr = Float64Array.from(c.bRe);
      const xi = Float64Array.from(c.bIm);
      solveComplexFactored(c.n, re, im, pivots, xr, xi);
      const scale = Math.max(...c.xRe.map((v, i) => Math.hypot(v, c.xIm[i]!)));
      for (let i = 0; i < c.n; i++) {
        expect(Math.hypot(xr[i]! - c.xRe[i]!, xi[i]! - c.xIm[i]!) / scale).toBeLessThanOrEqual(1e-12);
      }
    }
  });

  it("one factorisation serves several right-hand sides (each checked by its residual A·x − b, computed here)", () => {
    const c = data.cases.find((k) => k.n === 6)!;
    const re = Float64Array.from(c.re);
    const im = Float64Array.from(c.im);
    const pivots = new Int32Array(6);
    factorComplexDense(6, re, im, pivots);
    for (let r = 0; r < 3; r++) {
      const br = Float64Array.from({ length: 6 }, (_, i) => Math.cos(i + r));
      const bi = Float64Array.from({ length: 6 }, (_, i) => Math.sin(2 * i - r));
      const xr = Float64Array.from(br);
      const xi = Float64Array.from(bi);
      solveComplexFactored(6, re, im, pivots, xr, xi);
      for (let i = 0; i < 6; i++) {
        let sr = 0;
        let si = 0;
        for (let j = 0; j < 6; j++) {
          const ar = c.re[i * 6 + j]!;
          const ai = c.im[i * 6 + j]!;
          sr += ar * xr[j]! - ai * xi[j]!;
          si += ar * xi[j]! + ai * xr[j]!;
        }
        expect(Math.hypot(sr - br[i]!, si - bi[i]!)).toBeLessThanOrEqual(1e-12);
      }
    }
  });
});
