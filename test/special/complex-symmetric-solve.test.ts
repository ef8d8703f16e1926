import { describe, expect, it } from "vitest";
import { complexSymmetricFactor, complexSymmetricSolve } from "../../src/special/complex-symmetric-solve.js";

/** Deterministic pseudo-random numbers in [0, 1) (fixed seed). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 4294967296);
}

describe("complexSymmetricFactor / complexSymmetricSolve", () => {
  it("solves a 2×2 system worked by hand: [[2+i, 1],[1, 3]] x = [3+i, 4] has x = [1, 1]", () => {
    const re = Float64Array.from([2, 1, 1, 3]);
    const im = Float64Array.from([1, 0, 0, 0]);
    expect(complexSymmetricFactor(2, re, im)).toBe(true);
    const bRe = Float64Array.from([3, 4]);
    const bIm = Float64Array.from([1, 0]);
    complexSymmetricSolve(2, re, im, bRe, bIm);
    expect(bRe[0]).toBeCloseTo(1, 14);
    expect(bRe[1]).toBeCloseTo(1, 14);
    expect(Math.abs(bIm[0]!) + Math.abs(bIm[1]!)).toBeLessThan(1e-15);
  });

  it("leaves a residual below 1e-12 of |b| for impedance-like matrices R + jωL of sizes across the 32-column blocking", () => {
    const rand = lcg(7);
    for (const n of [1, 5, 31, 32, 33, 70, 130]) {
      // L: a Gram matrix (positive definite), R: positive diagonal
      const k = n + 3;
      const g = new Float64Array(n * k);
      for (let i = 0; i < n * k; i++) g[i] = rand() - 0.5;
      const aRe = new Float64Array(n * n);
      const aIm = new Float64Array(n * n);
      for (let i = 0; i < n; i++) {
        for (let j = 0; j <= i; j++) {
          let s = 0;
          for (let q = 0; q < k; q++) s += g[i * k + q]! * g[j * k + q]!;
          aIm[i * n + j] = aIm[j * n + i] = 3 * s;
        }
        aRe[i * n + i] = 0.01 + rand();
      }
      const fRe = Float64Array.from(aRe);
      const fIm = Float64Array.from(aIm);
      expect(complexSymmetricFactor(n, fRe, fIm)).toBe(true);
      const m = 2;
      const bRe = new Float64Array(n * m);
      const bIm = new Float64Array(n * m);
      for (let i = 0; i < n * m; i++) {
        bRe[i] = rand();
        bIm[i] = rand();
      }
      const xRe = Float64Array.from(bRe);
      const xIm = Float64Array.from(bIm);
      complexSymmetricSolve(n, fRe, fIm, xRe, xIm, m);
      for (let c = 0; c < m; c++) {
        let worst = 0;
        let norm = 0;
        for (let i = 0; i < n; i++) {
          let sr = 0;
          let si = 0;
          for (let j = 0; j < n; j++) {
            const ar = aRe[i * n + j]!;
            const ai = aIm[i * n + j]!;
            sr += ar * xRe[c * n + j]! - ai * xIm[c * n + j]!;
            si += ar * xIm[c * n + j]! + ai * xRe[c * n + j]!;
          }
          worst = Math.max(worst, Math.hypot(sr - bRe[c * n + i]!, si - bIm[c * n + i]!));
          norm = Math.max(norm, Math.hypot(bRe[c * n + i]!, bIm[c * n + i]!));
        }
        expect(worst).toBeLessThan(1e-12 * norm * Math.max(1, n / 10));
      }
    }
  });

  it("reports a zero pivot instead of dividing by it", () => {
    expect(complexSymmetricFactor(2, Float64Array.from([0, 1, 1, 0]), new Float64Array(4))).toBe(false);
  });
});
