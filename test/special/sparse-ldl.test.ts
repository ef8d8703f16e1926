import { describe, it, expect } from "vitest";
import { factorComplexSymmetric, InputError, latticeNestedDissection } from "../../src/index.js";

// Outside reference: the definition A x = b, checked by the residual computed here in plain
// complex arithmetic, and a dense Gaussian elimination written in the test.

/** Deterministic pseudo-random numbers (LCG, fixed seed). */
function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

/** A random complex symmetric matrix S + jM on a 5-point lattice stencil (S SPD, M ≥ 0), CSC full pattern. */
function latticeMatrix(nx: number, ny: number, seed: number) {
  const rand = rng(seed);
  const n = nx * ny;
  const cols = Array.from({ length: n }, () => new Map<number, [number, number]>());
  const add = (i: number, j: number, re: number, im: number) => {
    const m = cols[j]!;
    const v = m.get(i) ?? [0, 0];
    m.set(i, [v[0] + re, v[1] + im]);
  };
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const k = i * ny + j;
      add(k, k, 0.1, rand());
      for (const [di, dj] of [[1, 0], [0, 1], [1, 1]] as const) {
        if (i + di >= nx || j + dj >= ny) continue;
        const l = (i + di) * ny + j + dj;
        const w = 0.5 + rand();
        const m = 0.2 * rand();
        add(k, k, w, m);
        add(l, l, w, m);
        add(k, l, -w, -m);
        add(l, k, -w, -m);
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

function residual(A: ReturnType<typeof latticeMatrix>, xr: Float64Array, xi: Float64Array, br: Float64Array, bi: Float64Array): number {
  const rr = Float64Array.from(br);
  const ri = Float64Array.from(bi);
  for (let j = 0; j < A.size; j++) {
    for (let p = A.columnStarts[j]!; p < A.columnStarts[j + 1]!; p++) {
      const i = A.rowIndices[p]!;
      rr[i] = rr[i]! - (A.re[p]! * xr[j]! - A.im[p]! * xi[j]!);
      ri[i] = ri[i]! - (A.re[p]! * xi[j]! + A.im[p]! * xr[j]!);
    }
  }
  let num = 0;
  let den = 0;
  for (let i = 0; i < A.size; i++) {
    num += rr[i]! ** 2 + ri[i]! ** 2;
    den += br[i]! ** 2 + bi[i]! ** 2;
  }
  return Math.sqrt(num / den);
}

describe("factorComplexSymmetric", () => {
  it("solves a 30×40 lattice system to a relative residual below 1e-12, natural and nested-dissection order", () => {
    const A = latticeMatrix(30, 40, 7);
    const rand = rng(3);
    const br = Float64Array.from({ length: A.size }, () => rand() - 0.5);
    const bi = Float64Array.from({ length: A.size }, () => rand() - 0.5);
    const nd = latticeNestedDissection({ columns: 30, rows: 40 });
    const natural = factorComplexSymmetric(A);
    const dissected = factorComplexSymmetric(A, nd);
    for (const f of [natural, dissected]) {
      const xr = Float64Array.from(br);
      const xi = Float64Array.from(bi);
      f.solve(xr, xi);
      expect(residual(A, xr, xi, br, bi)).toBeLessThan(1e-12);
    }
    // the dissection order fills less than the banded natural order
    expect(dissected.factorNonzeros).toBeLessThan(natural.factorNonzeros);
  });

  it("agrees with dense Gaussian elimination (written here) on a 6×5 lattice within 1e-12", () => {
    const A = latticeMatrix(6, 5, 11);
    const n = A.size;
    const dr = new Float64Array(n * n);
    const di = new Float64Array(n * n);
    for (let j = 0; j < n; j++) {
      for (let p = A.columnStarts[j]!; p < A.columnStarts[j + 1]!; p++) {
        dr[A.rowIndices[p]! * n + j] = A.re[p]!;
        di[A.rowIndices[p]! * n + j] = A.im[p]!;
      }
    }
    const br = Float64Array.from({ length: n }, (_, i) => Math.sin(i + 1));
    const bi = Float64Array.from({ length: n }, (_, i) => Math.cos(2 * i));
    const yr = Float64Array.from(br);
    const yi = Float64Array.from(bi);
    for (let k = 0; k < n; k++) {
      for (let i = k + 1; i < n; i++) {
        const den = dr[k * n + k]! ** 2 + di[k * n + k]! ** 2;
        const lr = (dr[i * n + k]! * dr[k * n + k]! + di[i * n + k]! * di[k * n + k]!) / den;
        const li = (di[i * n + k]! * dr[k * n + k]! - dr[i * n + k]! * di[k * n + k]!) / den;
        for (let j = k; j < n; j++) {
          dr[i * n + j] = dr[i * n + j]! - (lr * dr[k * n + j]! - li * di[k * n + j]!);
          di[i * n + j] = di[i * n + j]! - (lr * di[k * n + j]! + li * dr[k * n + j]!);
        }
        yr[i] = yr[i]! - (lr * yr[k]! - li * yi[k]!);
        yi[i] = yi[i]! - (lr * yi[k]! + li * yr[k]!);
      }
    }
    for (let i = n - 1; i >= 0; i--) {
      let sr = yr[i]!;
      let si = yi[i]!;
      for (let j = i + 1; j < n; j++) {
        sr -= dr[i * n + j]! * yr[j]! - di[i * n + j]! * yi[j]!;
        si -= dr[i * n + j]! * yi[j]! + di[i * n + j]! * yr[j]!;
      }
      const den = dr[i * n + i]! ** 2 + di[i * n + i]! ** 2;
      yr[i] = (sr * dr[i * n + i]! + si * di[i * n + i]!) / den;
      yi[i] = (si * dr[i * n + i]! - sr * di[i * n + i]!) / den;
    }
    const xr = Float64Array.from(br);
    const xi = Float64Array.from(bi);
    factorComplexSymmetric(A, latticeNestedDissection({ columns: 6, rows: 5 })).solve(xr, xi);
    for (let i = 0; i < n; i++) {
      expect(Math.abs(xr[i]! - yr[i]!)).toBeLessThan(1e-12 * Math.hypot(yr[i]!, yi[i]!) + 1e-14);
      expect(Math.abs(xi[i]! - yi[i]!)).toBeLessThan(1e-12 * Math.hypot(yr[i]!, yi[i]!) + 1e-14);
    }
  });

  it("solveMany: three right-hand sides at once leave a relative residual below 1e-12 each", () => {
    const A = latticeMatrix(23, 17, 5);
    const n = A.size;
    const rand = rng(9);
    const br = Float64Array.from({ length: 3 * n }, () => rand() - 0.5);
    const bi = Float64Array.from({ length: 3 * n }, () => rand() - 0.5);
    const xr = Float64Array.from(br);
    const xi = Float64Array.from(bi);
    factorComplexSymmetric(A, latticeNestedDissection({ columns: 23, rows: 17 })).solveMany(xr, xi, 3);
    for (let c = 0; c < 3; c++) {
      const part = (v: Float64Array) => v.subarray(c * n, (c + 1) * n);
      expect(residual(A, part(xr), part(xi), part(br), part(bi))).toBeLessThan(1e-12);
    }
    expect(() => {
      factorComplexSymmetric(A).solveMany(xr, xi, 4);
    }).toThrow(InputError);
  });

  it("throws InputError for a zero pivot, a bad ordering and inconsistent arrays", () => {
    const zero = { size: 1, columnStarts: Int32Array.from([0, 1]), rowIndices: Int32Array.from([0]), re: Float64Array.from([0]), im: Float64Array.from([0]) };
    expect(() => factorComplexSymmetric(zero)).toThrow(InputError);
    const A = latticeMatrix(2, 2, 1);
    expect(() => factorComplexSymmetric(A, Int32Array.from([0, 0, 1, 2]))).toThrow(InputError);
    expect(() => factorComplexSymmetric({ ...A, columnStarts: Int32Array.from([0, 1]) })).toThrow(InputError);
  });
});

describe("latticeNestedDissection", () => {
  it("is a permutation of the unknowns, skips fixed points, and puts the first separator last", () => {
    const nx = 21;
    const ny = 13;
    const unknownOf = new Int32Array(nx * ny).fill(-1);
    let n = 0;
    for (let i = 1; i < nx - 1; i++) for (let j = 1; j < ny - 1; j++) unknownOf[i * ny + j] = n++;
    const order = latticeNestedDissection({ columns: nx, rows: ny, step: 2, unknownOf });
    expect(order.length).toBe(n);
    expect(new Set(order).size).toBe(n);
    // the last ny−2 unknowns are the middle column i = 10 (an even line, step 2)
    const last = Array.from(order.slice(n - (ny - 2)));
    expect(last).toEqual(Array.from({ length: ny - 2 }, (_, j) => unknownOf[10 * ny + j + 1]!));
  });
  it("throws InputError for bad sizes", () => {
    expect(() => latticeNestedDissection({ columns: 0, rows: 3 })).toThrow(InputError);
    expect(() => latticeNestedDissection({ columns: 2, rows: 2, unknownOf: Int32Array.from([0, 1]) })).toThrow(InputError);
  });
});
