/**
 * Least squares of an overdetermined system by Householder QR. Part of the library's own
 * numerical toolkit (`special/internal.ts`), not exported from the package.
 *
 * Accuracy (measured against mpmath's qr_solve at 30 digits, `test/fixtures/toolkit/`): the
 * solution within 3e-15 relative for the fixture's well-conditioned systems of 6 × 2 to 40 × 5
 * (2.0e-15 measured).
 *
 * @packageDocumentation
 */

/**
 * Least-squares solution of the overdetermined system A x ≈ b by Householder QR
 * (m rows ≥ p columns, A row-major). Returns `undefined` when A is rank-deficient
 * (a diagonal of R below `rankTolerance` times the largest).
 *
 * @param a - the m × p matrix, row-major (overwritten)
 * @param b - the right-hand side, length m (overwritten)
 * @param m - rows
 * @param p - columns
 * @param rankTolerance - relative size below which a pivot counts as zero
 * @returns the p solution values, or undefined when rank-deficient
 */
export function leastSquaresQr(a: Float64Array, b: Float64Array, m: number, p: number, rankTolerance = 1e-12): Float64Array | undefined {
  const diag = new Float64Array(p);
  let maxDiag = 0;
  for (let k = 0; k < p; k++) {
    let norm = 0;
    for (let i = k; i < m; i++) norm = Math.hypot(norm, a[i * p + k] as number);
    if (norm === 0) {
      diag[k] = 0;
      continue;
    }
    const akk = a[k * p + k] as number;
    const alpha = akk > 0 ? -norm : norm;
    // v = x − alpha e1, stored in column k rows k..m−1
    a[k * p + k] = akk - alpha;
    let vnorm2 = 0;
    for (let i = k; i < m; i++) vnorm2 += (a[i * p + k] as number) ** 2;
    if (vnorm2 > 0) {
      for (let j = k + 1; j < p; j++) {
        let s = 0;
        for (let i = k; i < m; i++) s += (a[i * p + k] as number) * (a[i * p + j] as number);
        const f = (2 * s) / vnorm2;
        for (let i = k; i < m; i++) a[i * p + j] = (a[i * p + j] as number) - f * (a[i * p + k] as number);
      }
      let s = 0;
      for (let i = k; i < m; i++) s += (a[i * p + k] as number) * (b[i] as number);
      const f = (2 * s) / vnorm2;
      for (let i = k; i < m; i++) b[i] = (b[i] as number) - f * (a[i * p + k] as number);
    }
    diag[k] = alpha;
    if (Math.abs(alpha) > maxDiag) maxDiag = Math.abs(alpha);
  }
  for (let k = 0; k < p; k++) if (!(Math.abs(diag[k] as number) > rankTolerance * maxDiag)) return undefined;
  const x = new Float64Array(p);
  for (let k = p - 1; k >= 0; k--) {
    let s = b[k] as number;
    for (let j = k + 1; j < p; j++) s -= (a[k * p + j] as number) * (x[j] as number);
    x[k] = s / (diag[k] as number);
  }
  return x;
}
