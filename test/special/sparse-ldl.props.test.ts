import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { factorComplexSymmetric, latticeNestedDissection } from "../../src/index.js";

// Invariants: any permutation gives the same solution (to round-off); the residual of A x = b
// is at round-off level for matrices with positive definite Hermitian part.

/** 9-point lattice matrix S + jM with S = graph Laplacian + shift (SPD), M ≥ 0 diagonal-dominant. */
function build(nx: number, ny: number, weights: number[], shift: number) {
  const n = nx * ny;
  const cols = Array.from({ length: n }, () => new Map<number, [number, number]>());
  const add = (i: number, j: number, re: number, im: number): void => {
    const v = cols[j]!.get(i) ?? [0, 0];
    cols[j]!.set(i, [v[0] + re, v[1] + im]);
  };
  let w = 0;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const k = i * ny + j;
      add(k, k, shift, weights[w++ % weights.length]!);
      for (const [di, dj] of [[1, 0], [0, 1], [1, 1], [1, -1]] as const) {
        const ii = i + di;
        const jj = j + dj;
        if (ii >= nx || jj < 0 || jj >= ny) continue;
        const l = ii * ny + jj;
        const c = 0.1 + weights[w++ % weights.length]!;
        const m = 0.3 * weights[w++ % weights.length]!;
        add(k, k, c, m);
        add(l, l, c, m);
        add(k, l, -c, -m);
        add(l, k, -c, -m);
      }
    }
  }
  const starts = [0];
  const rows: number[] = [];
  const re: number[] = [];
  const im: number[] = [];
  for (let j = 0; j < n; j++) {
    for (const [i, v] of cols[j]!) {
      rows.push(i);
      re.push(v[0]);
      im.push(v[1]);
    }
    starts.push(rows.length);
  }
  return { size: n, columnStarts: Int32Array.from(starts), rowIndices: Int32Array.from(rows), re: Float64Array.from(re), im: Float64Array.from(im) };
}

describe("factorComplexSymmetric properties", () => {
  it("natural and nested-dissection orders give the same solution with a round-off residual", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 25 }),
        fc.integer({ min: 1, max: 25 }),
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 5, maxLength: 40 }),
        fc.double({ min: 1e-6, max: 1, noNaN: true }),
        (nx, ny, weights, shift) => {
          const A = build(nx, ny, weights, shift);
          const n = A.size;
          const br = Float64Array.from({ length: n }, (_, i) => Math.sin(1 + i));
          const bi = Float64Array.from({ length: n }, (_, i) => Math.cos(3 * i));
          const x1r = Float64Array.from(br);
          const x1i = Float64Array.from(bi);
          factorComplexSymmetric(A).solve(x1r, x1i);
          const x2r = Float64Array.from(br);
          const x2i = Float64Array.from(bi);
          factorComplexSymmetric(A, latticeNestedDissection({ columns: nx, rows: ny })).solve(x2r, x2i);
          let num = 0;
          let xnorm = 0;
          let bnorm = 0;
          let diff = 0;
          let anorm = 0;
          for (let j = 0; j < n; j++) {
            let col = 0;
            for (let p = A.columnStarts[j]!; p < A.columnStarts[j + 1]!; p++) col += Math.hypot(A.re[p]!, A.im[p]!);
            anorm = Math.max(anorm, col);
          }
          const rr = Float64Array.from(br);
          const ri = Float64Array.from(bi);
          for (let j = 0; j < n; j++) {
            for (let p = A.columnStarts[j]!; p < A.columnStarts[j + 1]!; p++) {
              const i = A.rowIndices[p]!;
              rr[i] = rr[i]! - (A.re[p]! * x2r[j]! - A.im[p]! * x2i[j]!);
              ri[i] = ri[i]! - (A.re[p]! * x2i[j]! + A.im[p]! * x2r[j]!);
            }
          }
          for (let i = 0; i < n; i++) {
            num = Math.max(num, Math.hypot(rr[i]!, ri[i]!));
            xnorm = Math.max(xnorm, Math.hypot(x2r[i]!, x2i[i]!));
            bnorm = Math.max(bnorm, Math.hypot(br[i]!, bi[i]!));
            diff = Math.max(diff, Math.hypot(x1r[i]! - x2r[i]!, x1i[i]! - x2i[i]!) / Math.max(1e-300, Math.hypot(x2r[i]!, x2i[i]!)));
          }
          // normwise backward error ‖r‖/(‖A‖‖x‖ + ‖b‖) at round-off; the forward difference between
          // the two orders grows with the condition number (≈ 1/shift for the Laplacian part)
          expect(num / (anorm * xnorm + bnorm)).toBeLessThan(1e-13);
          expect(diff).toBeLessThan(1e-8 / Math.min(1, shift * 1e3));
        },
      ),
      { seed: 4242, numRuns: 60 },
    );
  });
});
