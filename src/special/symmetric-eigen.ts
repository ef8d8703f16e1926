/**
 * Eigenvalues and eigenvectors of a dense real symmetric matrix by the cyclic Jacobi method
 * (internal kernel, not exported from the package; tests in test/special/symmetric-eigen.test.ts).
 *
 * Each sweep zeroes every off-diagonal element once with a plane rotation; convergence is
 * quadratic once the off-diagonal part is small, and the eigenvalues come out to high relative
 * accuracy for well-scaled matrices. Cost about 6–10 sweeps of 3n³ multiply-adds: meant for the
 * small matrices (n ≲ 300) of reduced models.
 *
 * @see G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed. (2013), §8.5 (Jacobi methods).
 * @packageDocumentation
 */

/**
 * Eigen-decomposition $A = U\,\mathrm{diag}(\lambda)\,U^\mathsf{T}$ of the n×n symmetric matrix `a`
 * (row-major; only read). Returns the eigenvalues (unsorted) and U column-major (eigenvector i
 * at i·n), orthonormal to rounding.
 */
export function symmetricEigen(n: number, a: Float64Array): { values: Float64Array; vectors: Float64Array } {
  const w = Float64Array.from(a.subarray(0, n * n));
  const v = new Float64Array(n * n);
  for (let i = 0; i < n; i++) v[i * n + i] = 1;
  let scale = 0;
  for (let i = 0; i < n * n; i++) scale = Math.max(scale, Math.abs(w[i]!));
  for (let sweep = 0; sweep < 60; sweep++) {
    let off = 0;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) off = Math.max(off, Math.abs(w[p * n + q]!));
    if (off <= 1e-17 * scale || scale === 0) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = w[p * n + q]!;
        if (apq === 0) continue;
        const app = w[p * n + p]!;
        const aqq = w[q * n + q]!;
        // rotation angle: t = tan θ, the smaller root of t² + 2τt − 1 = 0
        const tau = (aqq - app) / (2 * apq);
        const t = (tau >= 0 ? 1 : -1) / (Math.abs(tau) + Math.sqrt(1 + tau * tau));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = t * c;
        // A ← Jᵀ A J on rows/columns p, q
        for (let k = 0; k < n; k++) {
          const akp = w[k * n + p]!;
          const akq = w[k * n + q]!;
          w[k * n + p] = c * akp - s * akq;
          w[k * n + q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = w[p * n + k]!;
          const aqk = w[q * n + k]!;
          w[p * n + k] = c * apk - s * aqk;
          w[q * n + k] = s * apk + c * aqk;
        }
        w[p * n + q] = 0;
        w[q * n + p] = 0;
        for (let k = 0; k < n; k++) {
          const vkp = v[p * n + k]!;
          const vkq = v[q * n + k]!;
          v[p * n + k] = c * vkp - s * vkq;
          v[q * n + k] = s * vkp + c * vkq;
        }
      }
    }
  }
  const values = new Float64Array(n);
  for (let i = 0; i < n; i++) values[i] = w[i * n + i]!;
  return { values, vectors: v };
}
