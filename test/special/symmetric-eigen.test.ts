import { describe, expect, it } from "vitest";
import { symmetricEigen } from "../../src/special/symmetric-eigen.js";
import { complexGeneralSolve } from "../../src/special/complex-symmetric-solve.js";

describe("symmetricEigen (cyclic Jacobi)", () => {
  it("finds the eigenvalues of the tridiagonal matrix tridiag(−1, 2, −1): 2 − 2cos(kπ/(n+1)) (closed form)", () => {
    const n = 12;
    const a = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      a[i * n + i] = 2;
      if (i > 0) a[i * n + i - 1] = a[(i - 1) * n + i] = -1;
    }
    const { values, vectors } = symmetricEigen(n, a);
    const sorted = Array.from(values).sort((x, y) => x - y);
    for (let k = 1; k <= n; k++) expect(Math.abs(sorted[k - 1]! - (2 - 2 * Math.cos((k * Math.PI) / (n + 1))))).toBeLessThan(1e-14);
    // A u = λ u and Uᵀ U = I
    for (let i = 0; i < n; i++) {
      for (let r = 0; r < n; r++) {
        let s = 0;
        for (let c = 0; c < n; c++) s += a[r * n + c]! * vectors[i * n + c]!;
        expect(Math.abs(s - values[i]! * vectors[i * n + r]!)).toBeLessThan(1e-13);
      }
      for (let j = 0; j < n; j++) {
        let d = 0;
        for (let r = 0; r < n; r++) d += vectors[i * n + r]! * vectors[j * n + r]!;
        expect(Math.abs(d - (i === j ? 1 : 0))).toBeLessThan(1e-14);
      }
    }
  });
});

describe("complexGeneralSolve", () => {
  it("solves a non-symmetric system that needs pivoting: [[0, 1], [1+i, 2]] x = [1, 3+i] has x = [1, 1]", () => {
    const re = Float64Array.from([0, 1, 1, 2]);
    const im = Float64Array.from([0, 0, 1, 0]);
    const bRe = Float64Array.from([1, 3]);
    const bIm = Float64Array.from([0, 1]);
    expect(complexGeneralSolve(2, re, im, bRe, bIm)).toBe(true);
    expect(Math.abs(bRe[0]! - 1) + Math.abs(bRe[1]! - 1) + Math.abs(bIm[0]!) + Math.abs(bIm[1]!)).toBeLessThan(1e-15);
  });

  it("reports a singular matrix", () => {
    expect(complexGeneralSolve(2, Float64Array.from([1, 2, 2, 4]), new Float64Array(4), new Float64Array(2), new Float64Array(2))).toBe(false);
  });
});
