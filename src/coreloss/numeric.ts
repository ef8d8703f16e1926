/**
 * Small numerical helpers used inside the core-loss module only (not exported publicly):
 * the logarithm of the gamma function and a least-squares solver.
 *
 * @packageDocumentation
 */

/** Lanczos coefficients, g = 7, n = 9 (the widely published set; ≈ 1e-15 relative). */
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059,
  12.507343278686905, -0.13857109526572012, 9.9843695780195716e-6, 1.5056327351493116e-7,
] as const;

/**
 * ln Γ(x) for x > 0 by the Lanczos approximation (g = 7, n = 9), about 1e-15 relative
 * on (0.5, 10]; reflection is not needed here (callers pass x ≥ 0.5).
 *
 * @param x - argument, > 0
 * @returns ln Γ(x)
 */
export function logGamma(x: number): number {
  if (x < 0.5) {
    // Γ(x) Γ(1 − x) = π / sin(πx), for 0 < x < 0.5
    return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  }
  const z = x - 1;
  let a = LANCZOS[0];
  const t = z + 7.5;
  for (let i = 1; i < 9; i++) a += (LANCZOS[i] as number) / (z + i);
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}

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
