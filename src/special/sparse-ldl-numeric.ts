/**
 * The numeric half of {@link factorComplexSymmetric}: the multifrontal factorisation (each
 * front assembled from $A$ and its children's update matrices, its own columns eliminated by a
 * dense $LDL^{\mathsf T}$, the Schur complement passed to the parent) and the triangular sweeps
 * of a solve. Internal to `special/`.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { ComplexSparseMatrix } from "./sparse-ldl.js";
import type { SymbolicFactor } from "./sparse-ldl-symbolic.js";

/** Adds the entries of A's columns f…l on and below the diagonal into the front F (m rows). */
function assembleOriginal(matrix: ComplexSparseMatrix, sym: SymbolicFactor, F: Float64Array, loc: Int32Array, f: number, l: number, m: number): void {
  const Ap = matrix.columnStarts;
  const Ai = matrix.rowIndices;
  const Axr = matrix.re;
  const Axi = matrix.im;
  const { P, Pinv } = sym;
  for (let c = f; c <= l; c++) {
    const cc = P[c]!;
    const col = c - f;
    for (let p = Ap[cc]!; p < Ap[cc + 1]!; p++) {
      const i = Pinv[Ai[p]!]!;
      if (i < c) continue;
      const at = 2 * (loc[i]! * m + col);
      F[at] = F[at]! + Axr[p]!;
      F[at + 1] = F[at + 1]! + Axi[p]!;
    }
  }
}

/** Adds the children's update matrices of supernode s into F; returns the stack top once they are popped. */
function assembleChildren(sym: SymbolicFactor, F: Float64Array, loc: Int32Array, s: number, m: number, updateStack: Float64Array, updateAt: Float64Array, stackTop: number): number {
  const { childHead, childNext, frontStart, superStart, frontRows } = sym;
  let popTo = stackTop;
  for (let ch = childHead[s]!; ch >= 0; ch = childNext[ch]!) {
    const U = updateStack;
    const uo = updateAt[ch]!;
    popTo = Math.min(popTo, uo);
    const cb = frontStart[ch]! + superStart[ch + 1]! - superStart[ch]!;
    const nr = frontStart[ch + 1]! - cb;
    for (let x = 0; x < nr; x++) {
      const gx = loc[frontRows[cb + x]!]! * m;
      for (let y = 0; y <= x; y++) {
        const at = 2 * (gx + loc[frontRows[cb + y]!]!);
        const u = uo + 2 * (x * nr + y);
        F[at] = F[at]! + U[u]!;
        F[at + 1] = F[at + 1]! + U[u + 1]!;
      }
    }
  }
  return popTo;
}

/**
 * Dense partial LDLᵀ of the front's own w columns (row-major lower triangle of F, m rows): the
 * panel [F11; F21] by rank-1 steps restricted to those columns. `f` is the first column (for the
 * message on a zero pivot).
 */
function eliminatePanel(where: string, F: Float64Array, t: Float64Array, m: number, w: number, f: number): void {
  for (let k = 0; k < w; k++) {
    const dk = 2 * (k * m + k);
    const dr = F[dk]!;
    const di = F[dk + 1]!;
    const den = dr * dr + di * di;
    if (!(den > 0) || !Number.isFinite(den)) {
      throw new InputError(where, "matrix", f + k, "", "a matrix with non-zero pivots (positive definite Hermitian part)");
    }
    const ir = dr / den;
    const ii = -di / den;
    for (let i = k + 1; i < m; i++) {
      const at = 2 * (i * m + k);
      const xr = F[at]!;
      const xi = F[at + 1]!;
      t[2 * i] = xr;
      t[2 * i + 1] = xi;
      F[at] = xr * ir - xi * ii;
      F[at + 1] = xr * ii + xi * ir;
    }
    for (let i = k + 1; i < m; i++) {
      const at = 2 * (i * m + k);
      const lr = F[at]!;
      const li = F[at + 1]!;
      const row = 2 * i * m;
      const jEnd = Math.min(i, w - 1);
      for (let j = k + 1; j <= jEnd; j++) {
        const tr = t[2 * j]!;
        const ti = t[2 * j + 1]!;
        F[row + 2 * j] = F[row + 2 * j]! - (lr * tr - li * ti);
        F[row + 2 * j + 1] = F[row + 2 * j + 1]! - (lr * ti + li * tr);
      }
    }
  }
}

/** Copies the front's w eliminated columns into the factor's storage at `ob`. */
function storeColumns(F: Float64Array, Lb: Float64Array, ob: number, m: number, w: number): void {
  for (let k = 0; k < w; k++) {
    for (let i = k; i < m; i++) {
      const at = 2 * (i * m + k);
      const to = ob + 2 * (k * m + i);
      Lb[to] = F[at]!;
      Lb[to + 1] = F[at + 1]!;
    }
  }
}

/** T = L21·D (row x of the panel at 2·x·w); L21 rows are F[w + x, 0…w). */
function panelTimesD(F: Float64Array, T: Float64Array, m: number, w: number, nr: number): void {
  for (let x = 0; x < nr; x++) {
    const row = 2 * (w + x) * m;
    for (let k = 0; k < w; k++) {
      const lr = F[row + 2 * k]!;
      const li = F[row + 2 * k + 1]!;
      const er = F[2 * (k * m + k)]!;
      const ei = F[2 * (k * m + k) + 1]!;
      T[2 * (x * w + k)] = lr * er - li * ei;
      T[2 * (x * w + k) + 1] = lr * ei + li * er;
    }
  }
}

/** The update matrix U = F22 − L21·D·L21ᵀ (lower triangle, nr rows) at offset uo, as contiguous dot products over the panel. */
function schurComplement(F: Float64Array, T: Float64Array, U: Float64Array, uo: number, m: number, w: number, nr: number): void {
  const w2 = 2 * w;
  for (let x = 0; x < nr; x++) {
    const rowF = 2 * (w + x) * m;
    const rowU = uo + 2 * x * nr;
    let y = 0;
    // two entries of row x at a time (the row of L21 loaded once for both)
    for (; y + 1 <= x; y += 2) {
      const rowT = 2 * y * w;
      const rowT2 = rowT + w2;
      let sr = F[rowF + 2 * (w + y)]!;
      let si = F[rowF + 2 * (w + y) + 1]!;
      let s2r = F[rowF + 2 * (w + y) + 2]!;
      let s2i = F[rowF + 2 * (w + y) + 3]!;
      for (let k = 0; k < w2; k += 2) {
        const lr = F[rowF + k]!;
        const li = F[rowF + k + 1]!;
        const tr = T[rowT + k]!;
        const ti = T[rowT + k + 1]!;
        const ur = T[rowT2 + k]!;
        const ui = T[rowT2 + k + 1]!;
        sr -= lr * tr - li * ti;
        si -= lr * ti + li * tr;
        s2r -= lr * ur - li * ui;
        s2i -= lr * ui + li * ur;
      }
      U[rowU + 2 * y] = sr;
      U[rowU + 2 * y + 1] = si;
      U[rowU + 2 * y + 2] = s2r;
      U[rowU + 2 * y + 3] = s2i;
    }
    for (; y <= x; y++) {
      const rowT = 2 * y * w;
      let sr = F[rowF + 2 * (w + y)]!;
      let si = F[rowF + 2 * (w + y) + 1]!;
      for (let k = 0; k < w2; k += 2) {
        const lr = F[rowF + k]!;
        const li = F[rowF + k + 1]!;
        const tr = T[rowT + k]!;
        const ti = T[rowT + k + 1]!;
        sr -= lr * tr - li * ti;
        si -= lr * ti + li * tr;
      }
      U[rowU + 2 * y] = sr;
      U[rowU + 2 * y + 1] = si;
    }
  }
}

/** The numeric factor of `matrix` with structure `sym`: L and D by supernode, and the multiply–adds spent. */
export function factorNumeric(where: string, matrix: ComplexSparseMatrix, sym: SymbolicFactor): { Lb: Float64Array; operations: number } {
  const { n, ns, post, superStart, frontStart, frontRows, blockStart, blockSize, maxFront, maxStack } = sym;
  const updateStack = new Float64Array(maxStack);
  const updateAt = new Float64Array(ns);
  let stackTop = 0;
  const Lb = new Float64Array(blockSize);
  const F = new Float64Array(2 * maxFront * maxFront);
  const t = new Float64Array(2 * maxFront);
  let maxPanel = 0;
  for (let s = 0; s < ns; s++) maxPanel = Math.max(maxPanel, (superStart[s + 1]! - superStart[s]!) * (frontStart[s + 1]! - frontStart[s]!));
  const T = new Float64Array(2 * maxPanel);
  const loc = new Int32Array(n);
  let operations = 0;
  for (let q = 0; q < ns; q++) {
    const s = post[q]!;
    const f = superStart[s]!;
    const l = superStart[s + 1]! - 1;
    const w = l - f + 1;
    const base = frontStart[s]!;
    const m = frontStart[s + 1]! - base;
    for (let a = 0; a < m; a++) loc[frontRows[base + a]!] = a;
    F.fill(0, 0, 2 * m * m);
    assembleOriginal(matrix, sym, F, loc, f, l, m);
    stackTop = assembleChildren(sym, F, loc, s, m, updateStack, updateAt, stackTop);
    eliminatePanel(where, F, t, m, w, f);
    storeColumns(F, Lb, blockStart[s]!, m, w);
    const nr = m - w;
    operations += (w * (w - 1) * (3 * m - 2 * w - 1)) / 6 + (nr * (nr + 1) * w) / 2;
    if (nr > 0) {
      panelTimesD(F, T, m, w, nr);
      updateAt[s] = stackTop;
      schurComplement(F, T, updateStack, stackTop, m, w, nr);
      stackTop += 2 * nr * nr;
    }
  }
  return { Lb, operations };
}

/** Forward, diagonal and backward sweeps with factor `Lb` on the permuted vectors held in x (stride `count`, interleaved). */
export function sweepFactor(sym: SymbolicFactor, Lb: Float64Array, x: Float64Array, count: number): void {
  const { ns, superStart, frontStart, frontRows, blockStart } = sym;
  const q = 2 * count;
  for (let s = 0; s < ns; s++) {
    const w = superStart[s + 1]! - superStart[s]!;
    const base = frontStart[s]!;
    const m = frontStart[s + 1]! - base;
    const ob = blockStart[s]!;
    for (let k = 0; k < w; k++) {
      const ok = frontRows[base + k]! * q;
      const colk = ob + 2 * k * m;
      for (let i = k + 1; i < m; i++) {
        const lr = Lb[colk + 2 * i]!;
        const li = Lb[colk + 2 * i + 1]!;
        const oi = frontRows[base + i]! * q;
        for (let c = 0; c < q; c += 2) {
          const vr = x[ok + c]!;
          const vi = x[ok + c + 1]!;
          x[oi + c] = x[oi + c]! - (lr * vr - li * vi);
          x[oi + c + 1] = x[oi + c + 1]! - (lr * vi + li * vr);
        }
      }
    }
  }
  for (let s = 0; s < ns; s++) {
    const w = superStart[s + 1]! - superStart[s]!;
    const m = frontStart[s + 1]! - frontStart[s]!;
    const ob = blockStart[s]!;
    for (let k = 0; k < w; k++) {
      const er = Lb[ob + 2 * (k * m + k)]!;
      const ei = Lb[ob + 2 * (k * m + k) + 1]!;
      const den = er * er + ei * ei;
      const ok = (superStart[s]! + k) * q;
      for (let c = 0; c < q; c += 2) {
        const vr = x[ok + c]!;
        const vi = x[ok + c + 1]!;
        x[ok + c] = (vr * er + vi * ei) / den;
        x[ok + c + 1] = (vi * er - vr * ei) / den;
      }
    }
  }
  for (let s = ns - 1; s >= 0; s--) {
    const w = superStart[s + 1]! - superStart[s]!;
    const base = frontStart[s]!;
    const m = frontStart[s + 1]! - base;
    const ob = blockStart[s]!;
    for (let k = w - 1; k >= 0; k--) {
      const ok = frontRows[base + k]! * q;
      const colk = ob + 2 * k * m;
      for (let i = k + 1; i < m; i++) {
        const lr = Lb[colk + 2 * i]!;
        const li = Lb[colk + 2 * i + 1]!;
        const oi = frontRows[base + i]! * q;
        for (let c = 0; c < q; c += 2) {
          const vr = x[oi + c]!;
          const vi = x[oi + c + 1]!;
          x[ok + c] = x[ok + c]! - (lr * vr - li * vi);
          x[ok + c + 1] = x[ok + c + 1]! - (lr * vi + li * vr);
        }
      }
    }
  }
}
