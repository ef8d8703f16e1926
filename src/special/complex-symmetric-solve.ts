/**
 * Dense complex symmetric linear systems $A x = b$ ($A = A^\mathsf{T}$, not Hermitian) by the
 * $LDL^\mathsf{T}$ factorisation without pivoting, on split real/imaginary `Float64Array`s.
 *
 * The impedance matrices of coupled conductors, $Z = R + j\omega L$, are complex symmetric
 * (reciprocity) with a positive definite real part (every current pattern dissipates power)
 * and, for inductance matrices of filaments, a positive definite imaginary part. For such
 * matrices the factorisation exists without pivoting and is backward stable (Higham 1998,
 * Theorem 2.2: growth factor ≤ 3 when both parts are definite; with only the real part
 * definite the pivots stay away from zero). Internal kernel of the library (not exported from
 * the package); tests in test/special/complex-symmetric-solve.test.ts.
 *
 * @see N. J. Higham, "Factorizing complex symmetric matrices with positive definite real and
 *   imaginary parts", Math. Comp. 67 (1998) 1591–1599.
 * @packageDocumentation
 */

/**
 * In-place $LDL^\mathsf{T}$ factorisation of the n×n complex symmetric matrix held row-major in
 * (re, im) (only the lower triangle, j ≤ i, is read). On return the strict lower triangle holds
 * L (unit diagonal implied) and the diagonal holds D. Returns false when a pivot is zero or not
 * finite (the matrix is not of the kind above), true otherwise. Cost n³/6 complex
 * multiply-adds, blocked by 32 columns for cache reuse; allocates 64·n doubles of scratch.
 */
export function complexSymmetricFactor(n: number, re: Float64Array, im: Float64Array): boolean {
  // blocked left-looking LDLᵀ: for a block of NB columns [j0, j1), first subtract the
  // contributions of all columns k < j0 (row i of L is reused for every column of the block,
  // W_ck = L_ck D_k held contiguously), then factor the block column by column.
  const NB = 32;
  const wRe = new Float64Array(NB * n);
  const wIm = new Float64Array(NB * n);
  for (let j0 = 0; j0 < n; j0 += NB) {
    const j1 = Math.min(n, j0 + NB);
    const nb = j1 - j0;
    if (j0 > 0) {
      for (let c = 0; c < nb; c++) {
        const row = (j0 + c) * n;
        const o = c * n;
        for (let k = 0; k < j0; k++) {
          const lr = re[row + k]!;
          const li = im[row + k]!;
          const dr = re[k * n + k]!;
          const di = im[k * n + k]!;
          wRe[o + k] = lr * dr - li * di;
          wIm[o + k] = lr * di + li * dr;
        }
      }
      for (let i = j0; i < n; i++) {
        const rowI = i * n;
        const cMax = Math.min(nb, i - j0 + 1);
        for (let c = 0; c < cMax; c++) {
          const o = c * n;
          let sr = 0;
          let si = 0;
          for (let k = 0; k < j0; k++) {
            const lr = re[rowI + k]!;
            const li = im[rowI + k]!;
            const xr = wRe[o + k]!;
            const xi = wIm[o + k]!;
            sr += lr * xr - li * xi;
            si += lr * xi + li * xr;
          }
          re[rowI + j0 + c] = re[rowI + j0 + c]! - sr;
          im[rowI + j0 + c] = im[rowI + j0 + c]! - si;
        }
      }
    }
    // the block itself (contributions of columns j0 ≤ k < j)
    for (let j = j0; j < j1; j++) {
      const rowJ = j * n;
      for (let k = j0; k < j; k++) {
        const lr = re[rowJ + k]!;
        const li = im[rowJ + k]!;
        const dr = re[k * n + k]!;
        const di = im[k * n + k]!;
        wRe[k] = lr * dr - li * di;
        wIm[k] = lr * di + li * dr;
      }
      let sr = re[rowJ + j]!;
      let si = im[rowJ + j]!;
      for (let k = j0; k < j; k++) {
        const lr = re[rowJ + k]!;
        const li = im[rowJ + k]!;
        sr -= lr * wRe[k]! - li * wIm[k]!;
        si -= lr * wIm[k]! + li * wRe[k]!;
      }
      const mag = sr * sr + si * si;
      if (!(mag > 0) || !Number.isFinite(mag)) return false;
      re[rowJ + j] = sr;
      im[rowJ + j] = si;
      const invRe = sr / mag;
      const invIm = -si / mag;
      for (let i = j + 1; i < n; i++) {
        const rowI = i * n;
        let ar = re[rowI + j]!;
        let ai = im[rowI + j]!;
        for (let k = j0; k < j; k++) {
          const lr = re[rowI + k]!;
          const li = im[rowI + k]!;
          ar -= lr * wRe[k]! - li * wIm[k]!;
          ai -= lr * wIm[k]! + li * wRe[k]!;
        }
        re[rowI + j] = ar * invRe - ai * invIm;
        im[rowI + j] = ar * invIm + ai * invRe;
      }
    }
  }
  return true;
}

/**
 * Solves $A X = B$ in place for m right-hand sides stored column after column in (bRe, bIm)
 * (each of length n), given the factors of {@link complexSymmetricFactor}. Cost m·n²
 * complex multiply-adds; allocates nothing.
 */
export function complexSymmetricSolve(
  n: number,
  re: Float64Array,
  im: Float64Array,
  bRe: Float64Array,
  bIm: Float64Array,
  m = 1,
): void {
  for (let c = 0; c < m; c++) {
    const o = c * n;
    // forward: L y = b
    for (let i = 0; i < n; i++) {
      const row = i * n;
      let sr = bRe[o + i]!;
      let si = bIm[o + i]!;
      for (let k = 0; k < i; k++) {
        const lr = re[row + k]!;
        const li = im[row + k]!;
        const yr = bRe[o + k]!;
        const yi = bIm[o + k]!;
        sr -= lr * yr - li * yi;
        si -= lr * yi + li * yr;
      }
      bRe[o + i] = sr;
      bIm[o + i] = si;
    }
    // diagonal: z = D⁻¹ y
    for (let i = 0; i < n; i++) {
      const dr = re[i * n + i]!;
      const di = im[i * n + i]!;
      const mag = dr * dr + di * di;
      const yr = bRe[o + i]!;
      const yi = bIm[o + i]!;
      bRe[o + i] = (yr * dr + yi * di) / mag;
      bIm[o + i] = (yi * dr - yr * di) / mag;
    }
    // backward: Lᵀ x = z, row-oriented (x_i final, then removed from the earlier unknowns)
    for (let i = n - 1; i > 0; i--) {
      const row = i * n;
      const xr = bRe[o + i]!;
      const xi = bIm[o + i]!;
      for (let k = 0; k < i; k++) {
        const lr = re[row + k]!;
        const li = im[row + k]!;
        bRe[o + k] = bRe[o + k]! - (lr * xr - li * xi);
        bIm[o + k] = bIm[o + k]! - (lr * xi + li * xr);
      }
    }
  }
}

/**
 * Solves $A X = B$ for a general dense complex n×n matrix (row-major, overwritten) by Gaussian
 * elimination with partial pivoting; m right-hand sides column after column in (bRe, bIm),
 * overwritten by X. Returns false for a singular matrix. Cost n³/3 + m·n² complex
 * multiply-adds; for the small systems of reduced models.
 */
export function complexGeneralSolve(
  n: number,
  re: Float64Array,
  im: Float64Array,
  bRe: Float64Array,
  bIm: Float64Array,
  m = 1,
): boolean {
  for (let j = 0; j < n; j++) {
    // pivot: largest modulus in column j at or below the diagonal
    let p = j;
    let best = -1;
    for (let i = j; i < n; i++) {
      const v = re[i * n + j]! ** 2 + im[i * n + j]! ** 2;
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (!(best > 0) || !Number.isFinite(best)) return false;
    if (p !== j) {
      for (let k = 0; k < n; k++) {
        const tr = re[j * n + k]!;
        const ti = im[j * n + k]!;
        re[j * n + k] = re[p * n + k]!;
        im[j * n + k] = im[p * n + k]!;
        re[p * n + k] = tr;
        im[p * n + k] = ti;
      }
      for (let c = 0; c < m; c++) {
        const tr = bRe[c * n + j]!;
        const ti = bIm[c * n + j]!;
        bRe[c * n + j] = bRe[c * n + p]!;
        bIm[c * n + j] = bIm[c * n + p]!;
        bRe[c * n + p] = tr;
        bIm[c * n + p] = ti;
      }
    }
    const dr = re[j * n + j]!;
    const di = im[j * n + j]!;
    const mag = dr * dr + di * di;
    const invRe = dr / mag;
    const invIm = -di / mag;
    for (let i = j + 1; i < n; i++) {
      const ar = re[i * n + j]!;
      const ai = im[i * n + j]!;
      const fr = ar * invRe - ai * invIm;
      const fi = ar * invIm + ai * invRe;
      if (fr === 0 && fi === 0) continue;
      for (let k = j + 1; k < n; k++) {
        const xr = re[j * n + k]!;
        const xi = im[j * n + k]!;
        re[i * n + k] = re[i * n + k]! - (fr * xr - fi * xi);
        im[i * n + k] = im[i * n + k]! - (fr * xi + fi * xr);
      }
      for (let c = 0; c < m; c++) {
        const xr = bRe[c * n + j]!;
        const xi = bIm[c * n + j]!;
        bRe[c * n + i] = bRe[c * n + i]! - (fr * xr - fi * xi);
        bIm[c * n + i] = bIm[c * n + i]! - (fr * xi + fi * xr);
      }
    }
  }
  for (let c = 0; c < m; c++) {
    for (let i = n - 1; i >= 0; i--) {
      let sr = bRe[c * n + i]!;
      let si = bIm[c * n + i]!;
      for (let k = i + 1; k < n; k++) {
        const ar = re[i * n + k]!;
        const ai = im[i * n + k]!;
        const xr = bRe[c * n + k]!;
        const xi = bIm[c * n + k]!;
        sr -= ar * xr - ai * xi;
        si -= ar * xi + ai * xr;
      }
      const dr = re[i * n + i]!;
      const di = im[i * n + i]!;
      const mag = dr * dr + di * di;
      bRe[c * n + i] = (sr * dr + si * di) / mag;
      bIm[c * n + i] = (si * dr - sr * di) / mag;
    }
  }
  return true;
}
