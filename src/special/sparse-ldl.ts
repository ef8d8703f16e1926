/**
 * Sparse direct solution of complex symmetric systems $A x = b$ ($A = A^{\mathsf T}$, not
 * Hermitian), as they arise from time-harmonic eddy-current finite elements: an up-looking
 * $LDL^{\mathsf T}$ factorisation without pivoting after a fill-reducing symmetric permutation,
 * and nested-dissection orderings for unknowns on a rectangular lattice.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger } from "../core/index.js";

/**
 * A square sparse matrix in compressed-column form with complex entries; for
 * {@link factorComplexSymmetric} the full symmetric pattern (both triangles) is stored.
 *
 * @category Linear algebra
 */
export interface ComplexSparseMatrix {
  /** Number of rows and columns, ≥ 1. */
  readonly size: number;
  /** Start of each column in `rowIndices`/`re`/`im` (length `size + 1`, non-decreasing, first 0). */
  readonly columnStarts: Int32Array;
  /** Row index of each stored entry, in [0, size). Duplicates within a column are summed. */
  readonly rowIndices: Int32Array;
  /** Real parts of the stored entries. */
  readonly re: Float64Array;
  /** Imaginary parts of the stored entries. */
  readonly im: Float64Array;
}

/**
 * The factor $PAP^{\mathsf T} = LDL^{\mathsf T}$ returned by {@link factorComplexSymmetric}.
 *
 * @category Linear algebra
 */
export interface ComplexSymmetricFactor {
  /** Order of the matrix. */
  readonly size: number;
  /** Entries of $L$ below the diagonal (the fill of the factorisation). */
  readonly factorNonzeros: number;
  /** Complex multiply–adds spent in the numeric factorisation. */
  readonly operations: number;
  /**
   * Solves $A x = b$ with the factor. `re`/`im` hold $b$ on entry and $x$ on return (length
   * `size`); no other memory is allocated.
   */
  solve(re: Float64Array, im: Float64Array): void;
}

/**
 * Factorises a complex symmetric sparse matrix as $PAP^{\mathsf T} = LDL^{\mathsf T}$ (unit lower
 * triangular $L$, diagonal $D$, no pivoting), row by row ("up-looking", each row of $L$ found by
 * a sparse triangular solve along the elimination tree).
 *
 * $$PAP^{\mathsf T} = LDL^{\mathsf T},\qquad x = P^{\mathsf T}L^{-\mathsf T}D^{-1}L^{-1}Pb$$
 *
 * No pivoting is needed (and none is done) when the Hermitian part $(A + A^{\mathsf H})/2$ is
 * positive definite, the case of a finite-element matrix $S + j\omega M$ with $S$ symmetric
 * positive definite and $M$ symmetric positive semidefinite: every pivot then has a positive
 * real part.
 *
 * @param matrix - the matrix, both triangles stored ({@link ComplexSparseMatrix})
 * @param ordering - optional fill-reducing order: `ordering[k]` is the original index placed
 *   k-th (a permutation of 0…size−1), e.g. from {@link latticeNestedDissection}; natural order when omitted
 * @returns the factor, with a `solve` method
 * @throws {@link InputError} when the arrays are inconsistent, the ordering is not a
 *   permutation, or a zero pivot occurs (a singular matrix or one that needs pivoting)
 * @remarks Accuracy: backward stable for matrices with positive definite Hermitian part;
 *   the tests solve random such systems and finite-element matrices to a residual below 1e-12
 *   relative. Work: the count of multiply–adds is returned in `operations`.
 * @see T. A. Davis, "Algorithm 849: A concise sparse Cholesky factorization package", ACM Trans.
 *   Math. Software 31 (2005) 587–591 (the up-looking LDLᵀ with the elimination tree).
 * @example
 * ```ts
 * import { factorComplexSymmetric } from "fluxwright";
 * // [[4, 1+1j], [1+1j, 3]] x = [1, 0]
 * const A = {
 *   size: 2,
 *   columnStarts: Int32Array.from([0, 2, 4]),
 *   rowIndices: Int32Array.from([0, 1, 0, 1]),
 *   re: Float64Array.from([4, 1, 1, 3]),
 *   im: Float64Array.from([0, 1, 1, 0]),
 * };
 * const f = factorComplexSymmetric(A);
 * const re = Float64Array.from([1, 0]);
 * const im = Float64Array.from([0, 0]);
 * f.solve(re, im);
 * console.log(re[0].toFixed(6), im[0].toFixed(6)); // 0.243243 0.040541
 * ```
 * @category Linear algebra
 */
export function factorComplexSymmetric(matrix: ComplexSparseMatrix, ordering?: Int32Array): ComplexSymmetricFactor {
  const where = "factorComplexSymmetric";
  const n = matrix.size;
  requireInteger(where, "matrix.size", n, 1);
  const Ap = matrix.columnStarts;
  const Ai = matrix.rowIndices;
  const Axr = matrix.re;
  const Axi = matrix.im;
  if (Ap.length !== n + 1 || Ap[0] !== 0) {
    throw new InputError(where, "matrix.columnStarts", Ap.length, "", `length size + 1 = ${n + 1} starting at 0`);
  }
  const nnz = Ap[n]!;
  if (Ai.length < nnz || Axr.length < nnz || Axi.length < nnz) {
    throw new InputError(where, "matrix.rowIndices", Ai.length, "", `at least ${nnz} entries`);
  }
  for (let k = 0; k < n; k++) {
    if (Ap[k + 1]! < Ap[k]!) throw new InputError(where, "matrix.columnStarts", Ap[k + 1], "", "non-decreasing");
  }
  for (let p = 0; p < nnz; p++) {
    const i = Ai[p]!;
    if (!(i >= 0 && i < n)) throw new InputError(where, "matrix.rowIndices", i, "", `in [0, ${n})`);
    if (!Number.isFinite(Axr[p]!) || !Number.isFinite(Axi[p]!)) {
      throw new InputError(where, "matrix.re/im", Number.NaN, "", "finite entries");
    }
  }
  const P = new Int32Array(n);
  const Pinv = new Int32Array(n).fill(-1);
  if (ordering === undefined) {
    for (let k = 0; k < n; k++) {
      P[k] = k;
      Pinv[k] = k;
    }
  } else {
    if (ordering.length !== n) throw new InputError(where, "ordering", ordering.length, "", `a permutation of length ${n}`);
    for (let k = 0; k < n; k++) {
      const o = ordering[k]!;
      if (!(o >= 0 && o < n) || Pinv[o] !== -1) throw new InputError(where, "ordering", o, "", "a permutation of 0…size−1");
      P[k] = o;
      Pinv[o] = k;
    }
  }

  // Symbolic: elimination tree and column counts of L.
  const parent = new Int32Array(n);
  const flag = new Int32Array(n);
  const lnz = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    parent[k] = -1;
    flag[k] = k;
    lnz[k] = 0;
    const kk = P[k]!;
    for (let p = Ap[kk]!; p < Ap[kk + 1]!; p++) {
      let i = Pinv[Ai[p]!]!;
      if (i < k) {
        for (; flag[i] !== k; i = parent[i]!) {
          if (parent[i] === -1) parent[i] = k;
          lnz[i]!++;
          flag[i] = k;
        }
      }
    }
  }
  const Lp = new Int32Array(n + 1);
  for (let k = 0; k < n; k++) Lp[k + 1] = Lp[k]! + lnz[k]!;
  const total = Lp[n]!;
  const Li = new Int32Array(total);
  const Lxr = new Float64Array(total);
  const Lxi = new Float64Array(total);
  const Dr = new Float64Array(n);
  const Di = new Float64Array(n);
  const Yr = new Float64Array(n);
  const Yi = new Float64Array(n);
  const pattern = new Int32Array(n);
  let operations = 0;

  // Numeric: row k of L from a sparse triangular solve with the rows above.
  for (let k = 0; k < n; k++) {
    Yr[k] = 0;
    Yi[k] = 0;
    let top = n;
    flag[k] = k;
    lnz[k] = 0;
    const kk = P[k]!;
    for (let p = Ap[kk]!; p < Ap[kk + 1]!; p++) {
      let i = Pinv[Ai[p]!]!;
      if (i <= k) {
        Yr[i] = Yr[i]! + Axr[p]!;
        Yi[i] = Yi[i]! + Axi[p]!;
        let len = 0;
        for (; flag[i] !== k; i = parent[i]!) {
          pattern[len++] = i;
          flag[i] = k;
        }
        while (len > 0) pattern[--top] = pattern[--len]!;
      }
    }
    let dr = Yr[k]!;
    let di = Yi[k]!;
    Yr[k] = 0;
    Yi[k] = 0;
    for (; top < n; top++) {
      const i = pattern[top]!;
      const yr = Yr[i]!;
      const yi = Yi[i]!;
      Yr[i] = 0;
      Yi[i] = 0;
      const p2 = Lp[i]! + lnz[i]!;
      let p = Lp[i]!;
      for (; p < p2; p++) {
        const j = Li[p]!;
        const lr = Lxr[p]!;
        const li = Lxi[p]!;
        Yr[j] = Yr[j]! - (lr * yr - li * yi);
        Yi[j] = Yi[j]! - (lr * yi + li * yr);
      }
      operations += p2 - Lp[i]! + 1;
      // l_ki = y_i / d_i
      const er = Dr[i]!;
      const ei = Di[i]!;
      const den = er * er + ei * ei;
      const lr = (yr * er + yi * ei) / den;
      const li = (yi * er - yr * ei) / den;
      dr -= lr * yr - li * yi;
      di -= lr * yi + li * yr;
      Li[p] = k;
      Lxr[p] = lr;
      Lxi[p] = li;
      lnz[i]!++;
    }
    if (!(dr * dr + di * di > 0) || !Number.isFinite(dr) || !Number.isFinite(di)) {
      throw new InputError(where, "matrix", k, "", "a matrix with non-zero pivots (positive definite Hermitian part)");
    }
    Dr[k] = dr;
    Di[k] = di;
  }

  const wr = new Float64Array(n);
  const wi = new Float64Array(n);
  return {
    size: n,
    factorNonzeros: total,
    operations,
    solve(re: Float64Array, im: Float64Array): void {
      for (let k = 0; k < n; k++) {
        wr[k] = re[P[k]!]!;
        wi[k] = im[P[k]!]!;
      }
      for (let j = 0; j < n; j++) {
        const xr = wr[j]!;
        const xi = wi[j]!;
        if (xr === 0 && xi === 0) continue;
        for (let p = Lp[j]!; p < Lp[j + 1]!; p++) {
          const i = Li[p]!;
          const lr = Lxr[p]!;
          const li = Lxi[p]!;
          wr[i] = wr[i]! - (lr * xr - li * xi);
          wi[i] = wi[i]! - (lr * xi + li * xr);
        }
      }
      for (let j = 0; j < n; j++) {
        const er = Dr[j]!;
        const ei = Di[j]!;
        const den = er * er + ei * ei;
        const xr = wr[j]!;
        const xi = wi[j]!;
        wr[j] = (xr * er + xi * ei) / den;
        wi[j] = (xi * er - xr * ei) / den;
      }
      for (let j = n - 1; j >= 0; j--) {
        let xr = wr[j]!;
        let xi = wi[j]!;
        for (let p = Lp[j]!; p < Lp[j + 1]!; p++) {
          const i = Li[p]!;
          const lr = Lxr[p]!;
          const li = Lxi[p]!;
          xr -= lr * wr[i]! - li * wi[i]!;
          xi -= lr * wi[i]! + li * wr[i]!;
        }
        wr[j] = xr;
        wi[j] = xi;
      }
      for (let k = 0; k < n; k++) {
        re[P[k]!] = wr[k]!;
        im[P[k]!] = wi[k]!;
      }
    },
  };
}

/** Boxes of at most this many lattice points are ordered naturally (dissection stops). */
const SMALL_BOX = 6;

/**
 * Options of {@link latticeNestedDissection}.
 *
 * @category Linear algebra
 */
export interface LatticeNestedDissectionOptions {
  /** Lattice points along the first index (i = 0…columns−1), ≥ 1. */
  readonly columns: number;
  /** Lattice points along the second index (j = 0…rows−1), ≥ 1. */
  readonly rows: number;
  /**
   * Separator spacing, ≥ 1: lattice lines whose index is a multiple of `step` separate the
   * unknowns on either side (1 for a 5- or 9-point stencil, 2 for quadratic elements on a grid of
   * cells two lattice points wide). Default 1.
   */
  readonly step?: number;
  /**
   * Unknown number of lattice point (i, j) at `unknownOf[i·rows + j]`, or −1 for a point that
   * is not an unknown (a fixed boundary value). Default: every point, numbered `i·rows + j`.
   */
  readonly unknownOf?: Int32Array;
}

/**
 * A fill-reducing ordering for unknowns on a rectangular lattice by geometric nested
 * dissection: the box of lattice points is split by a lattice line across its longer side,
 * both halves are ordered first (recursively), the separating line last.
 *
 * $$|L| = O(n\log n),\qquad \text{work} = O(n^{3/2})$$
 * for $n$ unknowns on a square lattice (George 1973), against $O(n^{3/2})$ and $O(n^2)$ for a
 * banded order.
 *
 * @param options - lattice size, separator step and the unknown numbering ({@link LatticeNestedDissectionOptions})
 * @returns `ordering[k]` = unknown placed k-th, for {@link factorComplexSymmetric}
 * @throws {@link InputError} for non-integer or non-positive sizes, a wrong-length `unknownOf`,
 *   or unknown numbers that are not 0…count−1 each once
 * @remarks Accuracy: an ordering only; it changes the fill, not the solution.
 * @see A. George, "Nested dissection of a regular finite element mesh", SIAM J. Numer. Anal. 10
 *   (1973) 345–363.
 * @example
 * ```ts
 * import { latticeNestedDissection } from "fluxwright";
 * const order = latticeNestedDissection({ columns: 3, rows: 3 });
 * console.log(Array.from(order).join(" ")); // 0 1 2 6 7 8 3 4 5
 * ```
 * @category Linear algebra
 */
export function latticeNestedDissection(options: LatticeNestedDissectionOptions): Int32Array {
  const where = "latticeNestedDissection";
  const nx = options.columns;
  const ny = options.rows;
  const step = options.step ?? 1;
  requireInteger(where, "columns", nx, 1);
  requireInteger(where, "rows", ny, 1);
  requireInteger(where, "step", step, 1);
  let map = options.unknownOf;
  if (map === undefined) {
    map = new Int32Array(nx * ny);
    for (let k = 0; k < nx * ny; k++) map[k] = k;
  } else if (map.length !== nx * ny) {
    throw new InputError(where, "unknownOf", map.length, "", `length columns·rows = ${nx * ny}`);
  }
  let count = 0;
  for (let k = 0; k < map.length; k++) if (map[k]! >= 0) count++;
  const out = new Int32Array(count);
  const seen = new Uint8Array(count);
  let pos = 0;
  const umap = map;
  const emit = (i0: number, i1: number, j0: number, j1: number): void => {
    for (let i = i0; i <= i1; i++) {
      for (let j = j0; j <= j1; j++) {
        const u = umap[i * ny + j]!;
        if (u < 0) continue;
        if (u >= count || seen[u] === 1) throw new InputError(where, "unknownOf", u, "", `each of 0…${count - 1} once`);
        seen[u] = 1;
        out[pos++] = u;
      }
    }
  };
  const recurse = (i0: number, i1: number, j0: number, j1: number): void => {
    const wi = i1 - i0 + 1;
    const wj = j1 - j0 + 1;
    if (wi <= 0 || wj <= 0) return;
    if (wi * wj <= SMALL_BOX) {
      emit(i0, i1, j0, j1);
      return;
    }
    if (wi >= wj) {
      const m = Math.round((i0 + i1) / 2 / step) * step;
      if (m <= i0 || m >= i1) {
        emit(i0, i1, j0, j1);
        return;
      }
      recurse(i0, m - 1, j0, j1);
      recurse(m + 1, i1, j0, j1);
      emit(m, m, j0, j1);
    } else {
      const m = Math.round((j0 + j1) / 2 / step) * step;
      if (m <= j0 || m >= j1) {
        emit(i0, i1, j0, j1);
        return;
      }
      recurse(i0, i1, j0, m - 1);
      recurse(i0, i1, m + 1, j1);
      emit(i0, i1, m, m);
    }
  };
  recurse(0, nx - 1, 0, ny - 1);
  if (pos !== count) throw new InputError(where, "unknownOf", pos, "", `unknown numbers 0…${count - 1}`);
  return out;
}
