/**
 * LU factorisation with partial pivoting of a small dense complex matrix, kept for repeated
 * solves (the field solver's Schur complement of the solid-conductor turns: one factorisation,
 * one solve per coil).
 *
 * Accuracy: backward stable in practice (partial pivoting on the complex modulus; Golub & Van
 * Loan §3.4 carries over to complex arithmetic); the test reads ≤ 1e-12 relative (in the
 * largest solution component) against numpy.linalg.solve (LAPACK zgesv) on the systems of
 * `test/fixtures/toolkit/complex-dense-lu.json` (orders 1–12, condition numbers up to about 1e4).
 *
 * `complexGeneralSolve` (complex-symmetric-solve.ts) runs the same elimination for the reduced
 * models, with squared-modulus pivots, reciprocal multipliers and the right-hand sides carried
 * along. The two are kept apart on purpose: basing either on the other changes rounding in its
 * callers by more than 1e-14 relative (measured on 2026-12-04: the field solver's results by up
 * to 2.3e-11 with this file on the other's arithmetic; workCoilImpedance by up to 1.8e-13 the
 * other way round).
 *
 * @see G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., Johns Hopkins 2013,
 *   Algorithm 3.4.1 (Gaussian elimination with partial pivoting).
 * @packageDocumentation
 */

/**
 * Factors the row-major complex matrix `(re, im)` in place into unit-lower L (multipliers below
 * the diagonal) and U (on and above it), swapping whole rows; `pivots[k]` is the row swapped
 * with row k. Internal kernel, no input checks: a zero pivot leaves non-finite factors, which
 * {@link solveComplexFactored} then passes on to the solution.
 *
 * @param n - order of the system
 * @param re - real parts, row-major n×n, overwritten by the factors
 * @param im - imaginary parts, likewise
 * @param pivots - length ≥ n, receives the pivot rows
 */
export function factorComplexDense(n: number, re: Float64Array, im: Float64Array, pivots: Int32Array): void {
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = -1;
    for (let i = k; i < n; i++) {
      const m = Math.hypot(re[i * n + k]!, im[i * n + k]!);
      if (m > best) {
        best = m;
        p = i;
      }
    }
    pivots[k] = p;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const tr = re[k * n + j]!;
        const ti = im[k * n + j]!;
        re[k * n + j] = re[p * n + j]!;
        im[k * n + j] = im[p * n + j]!;
        re[p * n + j] = tr;
        im[p * n + j] = ti;
      }
    }
    const dr = re[k * n + k]!;
    const di = im[k * n + k]!;
    const den = dr * dr + di * di;
    for (let i = k + 1; i < n; i++) {
      const xr = re[i * n + k]!;
      const xi = im[i * n + k]!;
      const lr = (xr * dr + xi * di) / den;
      const li = (xi * dr - xr * di) / den;
      re[i * n + k] = lr;
      im[i * n + k] = li;
      for (let j = k + 1; j < n; j++) {
        const ur = re[k * n + j]!;
        const ui = im[k * n + j]!;
        re[i * n + j] = re[i * n + j]! - (lr * ur - li * ui);
        im[i * n + j] = im[i * n + j]! - (lr * ui + li * ur);
      }
    }
  }
}

/**
 * Solves with the factors of {@link factorComplexDense}, in place: `(br, bi)` becomes the
 * solution. Internal kernel, no input checks.
 *
 * @param n - order of the system
 * @param re - real parts of the factors
 * @param im - imaginary parts of the factors
 * @param pivots - the pivot rows from factorComplexDense
 * @param br - real parts of the right-hand side, overwritten by the solution
 * @param bi - imaginary parts, likewise
 */
export function solveComplexFactored(n: number, re: Float64Array, im: Float64Array, pivots: Int32Array, br: Float64Array, bi: Float64Array): void {
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) {
      const tr = br[k]!;
      const ti = bi[k]!;
      br[k] = br[p]!;
      bi[k] = bi[p]!;
      br[p] = tr;
      bi[p] = ti;
    }
  }
  for (let i = 0; i < n; i++) {
    let sr = br[i]!;
    let si = bi[i]!;
    for (let j = 0; j < i; j++) {
      sr -= re[i * n + j]! * br[j]! - im[i * n + j]! * bi[j]!;
      si -= re[i * n + j]! * bi[j]! + im[i * n + j]! * br[j]!;
    }
    br[i] = sr;
    bi[i] = si;
  }
  for (let i = n - 1; i >= 0; i--) {
    let sr = br[i]!;
    let si = bi[i]!;
    for (let j = i + 1; j < n; j++) {
      sr -= re[i * n + j]! * br[j]! - im[i * n + j]! * bi[j]!;
      si -= re[i * n + j]! * bi[j]! + im[i * n + j]! * br[j]!;
    }
    const dr = re[i * n + i]!;
    const di = im[i * n + i]!;
    const den = dr * dr + di * di;
    br[i] = (sr * dr + si * di) / den;
    bi[i] = (si * dr - sr * di) / den;
  }
}
