/**
 * The symbolic half of {@link factorComplexSymmetric}: checks of the matrix and the ordering,
 * the elimination tree, supernodes and the row structure of each front, the storage layout of
 * $L$, the postorder of the supernodal tree and the size of the update-matrix stack. Internal to
 * `special/`.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger } from "../core/index.js";
import type { ComplexSparseMatrix } from "./sparse-ldl.js";

/** The structure of a factor, fixed before any arithmetic. */
export interface SymbolicFactor {
  readonly n: number;
  /** `P[k]` is the original index placed k-th; `Pinv` its inverse. */
  readonly P: Int32Array;
  readonly Pinv: Int32Array;
  /** Number of supernodes. */
  readonly ns: number;
  /** First column of each supernode (length ns + 1, last n). */
  readonly superStart: readonly number[];
  /** Start of each front's rows in `frontRows` (length ns + 1). */
  readonly frontStart: Int32Array;
  /** Each front's rows: its own columns, then the rows below (ascending). */
  readonly frontRows: Int32Array;
  /** Children of each supernode as linked lists. */
  readonly childHead: Int32Array;
  readonly childNext: Int32Array;
  /**
   * L and D by supernode: column k of supernode s at blockStart[s] + 2·k·m, rows in frontRows
   * order, complex values interleaved (re, im); the diagonal entry holds D.
   */
  readonly blockStart: Float64Array;
  readonly blockSize: number;
  /** Entries of L below the diagonal. */
  readonly total: number;
  /** Rows of the largest front. */
  readonly maxFront: number;
  /** Postorder of the supernodal tree (children before parents, each subtree contiguous). */
  readonly post: Int32Array;
  /** Largest size of the stack of update matrices waiting for their parent (doubles). */
  readonly maxStack: number;
}

/** Checks the compressed-column arrays and their entries (throws {@link InputError}). */
export function checkMatrix(where: string, matrix: ComplexSparseMatrix): void {
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
}

/** The permutation and its inverse from an ordering (natural order when omitted). */
function readOrdering(where: string, n: number, ordering: Int32Array | undefined): { P: Int32Array; Pinv: Int32Array } {
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
  return { P, Pinv };
}

/** Elimination tree (`parent`) and column counts of L (`lnz`) of the permuted matrix. */
function eliminationTree(matrix: ComplexSparseMatrix, P: Int32Array, Pinv: Int32Array): { parent: Int32Array; lnz: Int32Array } {
  const n = matrix.size;
  const Ap = matrix.columnStarts;
  const Ai = matrix.rowIndices;
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
  return { parent, lnz };
}

/** Supernodes, the row structure of each front and the supernodal tree. */
function frontStructure(where: string, matrix: ComplexSparseMatrix, P: Int32Array, Pinv: Int32Array, parent: Int32Array, lnz: Int32Array) {
  const n = matrix.size;
  const Ap = matrix.columnStarts;
  const Ai = matrix.rowIndices;
  // Supernodes: column j joins j − 1 when j is j − 1's parent and the structures nest exactly
  // (the column below j − 1 is {j} ∪ the column below j).
  const superOf = new Int32Array(n);
  const superStart: number[] = [0];
  for (let j = 1; j < n; j++) {
    if (!(parent[j - 1] === j && lnz[j - 1] === lnz[j]! + 1)) superStart.push(j);
    superOf[j] = superStart.length - 1;
  }
  const ns = superStart.length;
  superStart.push(n);
  // Row structure of each front: its own columns, then the rows below (ascending).
  const frontStart = new Int32Array(ns + 1);
  for (let s = 0; s < ns; s++) {
    const f = superStart[s]!;
    const l = superStart[s + 1]! - 1;
    frontStart[s + 1] = frontStart[s]! + (l - f + 1) + lnz[l]!;
  }
  const frontRows = new Int32Array(frontStart[ns]!);
  const childHead = new Int32Array(ns).fill(-1);
  const childNext = new Int32Array(ns).fill(-1);
  const mark = new Int32Array(n).fill(-1);
  let maxFront = 0;
  for (let s = 0; s < ns; s++) {
    const f = superStart[s]!;
    const l = superStart[s + 1]! - 1;
    const width = l - f + 1;
    const base = frontStart[s]!;
    const m = frontStart[s + 1]! - base;
    maxFront = Math.max(maxFront, m);
    let len = width;
    for (let c = f; c <= l; c++) {
      frontRows[base + c - f] = c;
      mark[c] = s;
    }
    for (let c = f; c <= l; c++) {
      const cc = P[c]!;
      for (let p = Ap[cc]!; p < Ap[cc + 1]!; p++) {
        const i = Pinv[Ai[p]!]!;
        if (i > l && mark[i] !== s) {
          mark[i] = s;
          frontRows[base + len++] = i;
        }
      }
    }
    for (let ch = childHead[s]!; ch >= 0; ch = childNext[ch]!) {
      const cb = frontStart[ch]!;
      const cw = superStart[ch + 1]! - superStart[ch]!;
      for (let q = cb + cw; q < frontStart[ch + 1]!; q++) {
        const i = frontRows[q]!;
        if (i > l && mark[i] !== s) {
          mark[i] = s;
          frontRows[base + len++] = i;
        }
      }
    }
    if (len !== m) throw new InputError(where, "matrix", s, "", "a structurally symmetric pattern (both triangles stored)");
    frontRows.subarray(base + width, base + m).sort();
    if (parent[l]! >= 0) {
      const ps = superOf[parent[l]!]!;
      childNext[s] = childHead[ps]!;
      childHead[ps] = s;
    }
  }
  return { ns, superStart, frontStart, frontRows, childHead, childNext, maxFront };
}

/**
 * Postorder of the supernodal tree (children before parents, each subtree contiguous), so the
 * update matrices waiting for their parent form a stack.
 */
function postorder(ns: number, superStart: readonly number[], parent: Int32Array, childHead: Int32Array, childNext: Int32Array): Int32Array {
  const post = new Int32Array(ns);
  {
    const stack = new Int32Array(ns);
    const nextChild = Int32Array.from(childHead);
    let np = 0;
    for (let root = ns - 1; root >= 0; root--) {
      const l = superStart[root + 1]! - 1;
      if (parent[l]! >= 0) continue;
      let top = 0;
      stack[top++] = root;
      while (top > 0) {
        const v = stack[top - 1]!;
        const c = nextChild[v]!;
        if (c >= 0) {
          nextChild[v] = childNext[c]!;
          stack[top++] = c;
        } else {
          top--;
          post[np++] = v;
        }
      }
    }
  }
  return post;
}

/** Largest size of the update-matrix stack over the postorder. */
function updateStackSize(ns: number, post: Int32Array, superStart: readonly number[], frontStart: Int32Array, childHead: Int32Array, childNext: Int32Array): number {
  let maxStack = 0;
  {
    let used = 0;
    for (let q = 0; q < ns; q++) {
      const s = post[q]!;
      for (let ch = childHead[s]!; ch >= 0; ch = childNext[ch]!) {
        const nr = frontStart[ch + 1]! - frontStart[ch]! - (superStart[ch + 1]! - superStart[ch]!);
        used -= 2 * nr * nr;
      }
      const nr = frontStart[s + 1]! - frontStart[s]! - (superStart[s + 1]! - superStart[s]!);
      used += 2 * nr * nr;
      maxStack = Math.max(maxStack, used);
    }
  }
  return maxStack;
}

/** The structure of the factor of `matrix` in `ordering` (throws {@link InputError} on bad input). */
export function analyseComplexSymmetric(where: string, matrix: ComplexSparseMatrix, ordering: Int32Array | undefined): SymbolicFactor {
  checkMatrix(where, matrix);
  const n = matrix.size;
  const { P, Pinv } = readOrdering(where, n, ordering);
  const { parent, lnz } = eliminationTree(matrix, P, Pinv);
  const { ns, superStart, frontStart, frontRows, childHead, childNext, maxFront } = frontStructure(where, matrix, P, Pinv, parent, lnz);
  let total = 0;
  let blockSize = 0;
  const blockStart = new Float64Array(ns + 1);
  for (let s = 0; s < ns; s++) {
    const w = superStart[s + 1]! - superStart[s]!;
    const m = frontStart[s + 1]! - frontStart[s]!;
    total += (w * (w - 1)) / 2 + w * (m - w);
    blockStart[s] = blockSize;
    blockSize += 2 * m * w;
  }
  blockStart[ns] = blockSize;
  const post = postorder(ns, superStart, parent, childHead, childNext);
  const maxStack = updateStackSize(ns, post, superStart, frontStart, childHead, childNext);
  return { n, P, Pinv, ns, superStart, frontStart, frontRows, childHead, childNext, blockStart, blockSize, total, maxFront, post, maxStack };
}
