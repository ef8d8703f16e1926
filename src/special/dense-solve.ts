/**
 * A small dense linear solver: Gaussian elimination with partial (row) pivoting, in place, for
 * the few-unknown systems of the piecewise-linear converter solvers (periodic boundary
 * conditions, Newton steps).
 *
 * @packageDocumentation
 */

/**
 * Solves $A x = b$ for a small dense square matrix by Gaussian elimination with partial
 * pivoting (the row with the largest pivot magnitude is swapped up at each step). Works in
 * place and allocates nothing: `matrix` is overwritten by its LU factors, `rhs` by the solution.
 *
 * A kernel: no input checks. A singular (or numerically singular) matrix gives non-finite
 * entries; the function then returns `false`.
 *
 * @param n - the order of the system (n ≥ 1)
 * @param matrix - row-major $n\times n$ matrix (length ≥ n²), overwritten
 * @param rhs - right-hand side (length ≥ n), overwritten by the solution
 * @returns `true` when every pivot was non-zero and the solution is finite
 * @remarks Accuracy: backward stable in practice (partial pivoting, Golub & Van Loan §3.4);
 * tests: ≤ 1e-13 relative vs numpy.linalg.solve (LAPACK gesv) on the systems of
 * `test/fixtures/special/dense-solve.json` (condition numbers up to 1e4).
 * @see G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., Johns Hopkins 2013,
 *   Algorithm 3.4.1 (Gaussian elimination with partial pivoting).
 * @example
 * ```ts
 * import { solveDense } from "fluxwright";
 * const a = Float64Array.from([2, 1, 1, 3]);
 * const b = Float64Array.from([3, 5]);
 * solveDense(2, a, b);
 * console.log(b[0], b[1]); // 0.8 1.4
 * ```
 * @category Linear algebra
 */
export function solveDense(n: number, matrix: Float64Array, rhs: Float64Array): boolean {
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(matrix[k * n + k] ?? 0);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(matrix[i * n + k] ?? 0);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (!(best > 0)) return false;
    if (p !== k) {
      for (let c = 0; c < n; c++) {
        const t = matrix[k * n + c] ?? 0;
        matrix[k * n + c] = matrix[p * n + c] ?? 0;
        matrix[p * n + c] = t;
      }
      const t = rhs[k] ?? 0;
      rhs[k] = rhs[p] ?? 0;
      rhs[p] = t;
    }
    const pivot = matrix[k * n + k] ?? 0;
    for (let i = k + 1; i < n; i++) {
      const f = (matrix[i * n + k] ?? 0) / pivot;
      if (f === 0) continue;
      matrix[i * n + k] = f;
      for (let c = k + 1; c < n; c++) matrix[i * n + c] = (matrix[i * n + c] ?? 0) - f * (matrix[k * n + c] ?? 0);
      rhs[i] = (rhs[i] ?? 0) - f * (rhs[k] ?? 0);
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = rhs[i] ?? 0;
    for (let c = i + 1; c < n; c++) s -= (matrix[i * n + c] ?? 0) * (rhs[c] ?? 0);
    const x = s / (matrix[i * n + i] ?? 0);
    if (!Number.isFinite(x)) return false;
    rhs[i] = x;
  }
  return true;
}

/**
 * The LU factorisation of {@link solveDense} alone, for several right-hand sides with one
 * matrix (chord Newton steps): `matrix` is overwritten by the factors, `pivots[k]` records the
 * row swapped with row k. Returns false for a zero pivot. Internal kernel, no input checks.
 *
 * @param n - order of the system
 * @param matrix - row-major n×n matrix, overwritten by its LU factors
 * @param pivots - length ≥ n, receives the pivot rows
 * @returns true when every pivot is non-zero
 */
export function factorDense(n: number, matrix: Float64Array, pivots: Int32Array): boolean {
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(matrix[k * n + k] ?? 0);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(matrix[i * n + k] ?? 0);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (!(best > 0)) return false;
    pivots[k] = p;
    if (p !== k) {
      for (let c = 0; c < n; c++) {
        const t = matrix[k * n + c] ?? 0;
        matrix[k * n + c] = matrix[p * n + c] ?? 0;
        matrix[p * n + c] = t;
      }
    }
    const pivot = matrix[k * n + k] ?? 0;
    for (let i = k + 1; i < n; i++) {
      const f = (matrix[i * n + k] ?? 0) / pivot;
      matrix[i * n + k] = f;
      if (f === 0) continue;
      for (let c = k + 1; c < n; c++) matrix[i * n + c] = (matrix[i * n + c] ?? 0) - f * (matrix[k * n + c] ?? 0);
    }
  }
  return true;
}

/**
 * Solves with the factors of {@link factorDense} in place (`rhs` becomes the solution); false
 * when the solution is not finite.
 *
 * @param n - order of the system
 * @param lu - the factors from factorDense
 * @param pivots - the pivot rows from factorDense
 * @param rhs - right-hand side, overwritten by the solution
 * @returns true when the solution is finite
 */
export function solveFactored(n: number, lu: Float64Array, pivots: Int32Array, rhs: Float64Array): boolean {
  // whole rows were swapped during the factorisation (multipliers included): permute first,
  // then forward substitution with the unit lower factor
  for (let k = 0; k < n; k++) {
    const p = pivots[k] ?? k;
    if (p !== k) {
      const t = rhs[k] ?? 0;
      rhs[k] = rhs[p] ?? 0;
      rhs[p] = t;
    }
  }
  for (let k = 0; k < n; k++) {
    const rk = rhs[k] ?? 0;
    for (let i = k + 1; i < n; i++) rhs[i] = (rhs[i] ?? 0) - (lu[i * n + k] ?? 0) * rk;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = rhs[i] ?? 0;
    for (let c = i + 1; c < n; c++) s -= (lu[i * n + c] ?? 0) * (rhs[c] ?? 0);
    const x = s / (lu[i * n + i] ?? 0);
    if (!Number.isFinite(x)) return false;
    rhs[i] = x;
  }
  return true;
}
