/**
 * Private reduced (Galerkin) model of the work-coil impedance (not exported from the package):
 * the coil's cell system projected on the empty coil's responses over a frequency band, for the
 * fast path `PreparedWorkCoil.reduce` — building the basis, and evaluating the empty and loaded
 * terminal impedance by the Woodbury identity in preallocated scratch arrays.
 *
 * Size: the reduced model's build and its allocation-free evaluation share one scratch layout.
 *
 * @packageDocumentation
 */
import { complexGeneralSolve, complexSymmetricFactor, complexSymmetricSolve } from "../special/complex-symmetric-solve.js";
import { symmetricEigen } from "../special/symmetric-eigen.js";
import type { ReducedWorkCoilResult } from "./work-coil-impedance.js";
import { SINGULAR_COIL_MATRIX, emptyImpedanceInto, kernelCore, partCoefficients, pivotedGramSchmidt } from "./work-coil-model.js";
import type { Mesh, PartKernel, PartMaterial, Reduction } from "./work-coil-model.js";

/** Relative truncation of the reduced basis, per normalised response (measured: R, L, ΔL within 2e-4 and ΔR within 1e-3 of the full solve on the scenario coils). */
const BASIS_TOLERANCE = 1e-2;

/**
 * The reduced (Galerkin) model of one mesh and part kernel, diagonalised: with the basis scaled
 * so that the reduced resistance is the identity, $Z_r = I + j\omega L_r$ and
 * $L_r = U\Lambda U^\mathsf{T}$; P = Uᵀ Vᵀ B and G = Uᵀ Vᵀ Q.
 */
export interface ReducedModel {
  readonly k: number;
  readonly g: number;
  readonly r: number;
  /** Eigenvalues of the reduced inductance [s] (per unit of the scaled resistance). */
  readonly lambda: Float64Array;
  /** P (k × g, row-major). */
  readonly P: Float64Array;
  /** G (k × r, row-major). */
  readonly G: Float64Array;
  /** Work arrays of an evaluation (sized once: evaluations allocate nothing else of their size). */
  readonly scratch: ReducedScratch;
}

/** Work arrays of {@link reducedImpedances} for a model of sizes k, g, r. */
interface ReducedScratch {
  readonly coefficients: Float64Array;
  readonly mRe: Float64Array;
  readonly mIm: Float64Array;
  readonly dRe: Float64Array;
  readonly dIm: Float64Array;
  readonly s0Re: Float64Array;
  readonly s0Im: Float64Array;
  readonly sRe: Float64Array;
  readonly sIm: Float64Array;
  readonly eRe: Float64Array;
  readonly eIm: Float64Array;
  readonly hRe: Float64Array;
  readonly hIm: Float64Array;
  readonly nRe: Float64Array;
  readonly nIm: Float64Array;
  readonly aRe: Float64Array;
  readonly aIm: Float64Array;
  readonly yRe: Float64Array;
  readonly yIm: Float64Array;
  readonly emptyRe: Float64Array;
  readonly emptyIm: Float64Array;
  readonly loadedRe: Float64Array;
  readonly loadedIm: Float64Array;
  readonly wRe: Float64Array;
  readonly wIm: Float64Array;
}

function reducedScratch(k: number, g: number, r: number, nodes: number): ReducedScratch {
  const f = (n: number): Float64Array => new Float64Array(n);
  return {
    coefficients: f(2 * nodes),
    mRe: f(r * r),
    mIm: f(r * r),
    dRe: f(k),
    dIm: f(k),
    s0Re: f(g * g),
    s0Im: f(g * g),
    sRe: f(g * g),
    sIm: f(g * g),
    eRe: f(g * r),
    eIm: f(g * r),
    hRe: f(r * r),
    hIm: f(r * r),
    nRe: f(r * r),
    nIm: f(r * r),
    aRe: f(r * r),
    aIm: f(r * r),
    yRe: f(r * g),
    yIm: f(r * g),
    emptyRe: f(g),
    emptyIm: f(g),
    loadedRe: f(g),
    loadedIm: f(g),
    wRe: f(r),
    wIm: f(r),
  };
}

/**
 * Builds the reduced basis: at frequencies spread geometrically over [fMin, fMax] (one per
 * half octave, at least three), the empty coil's responses to unit turn voltages and to the
 * part kernel's field modes, Z₀(ω)⁻¹[B | Q] — with them, the loaded solution at those
 * frequencies lies exactly in the span (Woodbury). Their real and imaginary parts, in
 * power-normalised variables √R·I, are orthonormalised by pivoted Gram–Schmidt (tolerance
 * 1e-7), and the cell system is projected on them.
 */
export function buildReduced(mesh: Mesh, kernel: PartKernel, fMin: number, fMax: number): ReducedModel {
  const m = mesh.red.m;
  const g = mesh.red.groups;
  const r = kernel.r;
  const sqrtR = new Float64Array(m);
  for (let a = 0; a < m; a++) sqrtR[a] = Math.sqrt(mesh.R[a]!);
  const { snapshots, columns } = snapshotColumns(mesh, kernel, sqrtR, fMin, fMax);
  const { q: basis, r: k } = pivotedGramSchmidt(m, columns, snapshots, BASIS_TOLERANCE);
  // V = R^(−1/2) basis; L_r = Vᵀ L V, B_r = Vᵀ B, F_r = Vᵀ Q
  const v = new Float64Array(k * m);
  for (let p = 0; p < k; p++) for (let a = 0; a < m; a++) v[p * m + a] = basis[p * m + a]! / sqrtR[a]!;
  const L = projectedInductance(mesh.L, v, m, k);
  const B = new Float64Array(k * g);
  for (let p = 0; p < k; p++) {
    for (let a = 0; a < m; a++) {
      const grp = mesh.red.group[a]!;
      if (grp >= 0) B[p * g + grp] = B[p * g + grp]! + v[p * m + a]! * mesh.red.coefficient[a]!;
    }
  }
  const F = new Float64Array(k * r);
  for (let p = 0; p < k; p++) {
    for (let s = 0; s < r; s++) F[p * r + s] = columnDot(v, p * m, kernel.q, s * m, m);
  }
  const { values: lambda, vectors: u } = symmetricEigen(k, L);
  const P = new Float64Array(k * g);
  const G = new Float64Array(k * r);
  rotateRows(u, k, B, g, P);
  rotateRows(u, k, F, r, G);
  return { k, g, r, lambda, P, G, scratch: reducedScratch(k, g, r, kernel.rule.nodes.length) };
}

/** A reduced model without its work arrays: numbers and typed arrays only, which cross a thread boundary by structured clone bit for bit. */
export type ReducedModelData = Omit<ReducedModel, "scratch">;

/** A reduced model from its data (another thread's {@link buildReduced}), with fresh work arrays for a kernel rule of `nodes` nodes. */
export function reducedModelFrom(d: ReducedModelData, nodes: number): ReducedModel {
  return { k: d.k, g: d.g, r: d.r, lambda: d.lambda, P: d.P, G: d.G, scratch: reducedScratch(d.k, d.g, d.r, nodes) };
}

/** Σ x[xo + i]·y[yo + i] over i < m, in order. */
function columnDot(x: Float64Array, xo: number, y: Float64Array, yo: number, m: number): number {
  let sum = 0;
  for (let a = 0; a < m; a++) sum += x[xo + a]! * y[yo + a]!;
  return sum;
}

/**
 * The reduced basis's snapshots: at `count` frequencies spread geometrically over the band, the
 * empty coil's responses Z₀(ω)⁻¹[B | Q], each normalised in the power norm and written as
 * √R·I (real and imaginary part: two columns of length m each).
 */
function snapshotColumns(mesh: Mesh, kernel: PartKernel, sqrtR: Float64Array, fMin: number, fMax: number): { snapshots: Float64Array; columns: number } {
  const { red } = mesh;
  const m = red.m;
  const g = red.groups;
  const r = kernel.r;
  const count = Math.max(3, 1 + Math.ceil(2 * Math.log2(fMax / fMin)));
  const rhs = g + r;
  const snapshots = new Float64Array(count * 2 * rhs * m);
  let col = 0;
  for (let s = 0; s < count; s++) {
    const f = count === 1 ? fMin : fMin * Math.pow(fMax / fMin, s / (count - 1));
    const { xRe, xIm } = emptyResponses(mesh, kernel, 2 * Math.PI * f);
    for (let c = 0; c < rhs; c++) {
      normalisedSnapshot(mesh.R, sqrtR, xRe, xIm, c * m, m, snapshots, col * m);
      col += 2;
    }
  }
  return { snapshots, columns: col };
}

/**
 * One response x (at xo, length m) as two snapshot columns at so (real part, then imaginary
 * part): √R·x normalised in the power norm Σ R|x|² (every response, large or small, counts
 * alike against the basis tolerance).
 */
function normalisedSnapshot(resistance: Float64Array, sqrtR: Float64Array, xRe: Float64Array, xIm: Float64Array, xo: number, m: number, snapshots: Float64Array, so: number): void {
  let norm = 0;
  for (let a = 0; a < m; a++) norm += resistance[a]! * (xRe[xo + a]! ** 2 + xIm[xo + a]! ** 2);
  const inv = norm > 0 ? 1 / Math.sqrt(norm) : 0;
  for (let a = 0; a < m; a++) {
    snapshots[so + a] = inv * sqrtR[a]! * xRe[xo + a]!;
    snapshots[so + m + a] = inv * sqrtR[a]! * xIm[xo + a]!;
  }
}

/** The empty coil's cell currents Z₀(ω)⁻¹[B | Q] for unit turn voltages and the kernel's modes (m × (g + r), column-major). */
function emptyResponses(mesh: Mesh, kernel: PartKernel, omega: number): { xRe: Float64Array; xIm: Float64Array } {
  const { red } = mesh;
  const m = red.m;
  const rhs = red.groups + kernel.r;
  const zRe = new Float64Array(m * m);
  const zIm = new Float64Array(m * m);
  emptyImpedanceInto(m, mesh.L, mesh.R, omega, zRe, zIm);
  if (!complexSymmetricFactor(m, zRe, zIm)) throw new Error(SINGULAR_COIL_MATRIX);
  const xRe = new Float64Array(m * rhs);
  const xIm = new Float64Array(m * rhs);
  sourceColumnsInto(red, kernel, xRe);
  complexSymmetricSolve(m, zRe, zIm, xRe, xIm, rhs);
  return { xRe, xIm };
}

/** The right-hand sides [B | Q] (m × (g + r), column-major) into the zeroed x: unit turn voltages, then the kernel's modes. */
function sourceColumnsInto(red: Reduction, kernel: PartKernel, x: Float64Array): void {
  const m = red.m;
  const g = red.groups;
  for (let a = 0; a < m; a++) if (red.group[a]! >= 0) x[red.group[a]! * m + a] = red.coefficient[a]!;
  for (let p = 0; p < kernel.r; p++) for (let a = 0; a < m; a++) x[(g + p) * m + a] = kernel.q[p * m + a]!;
}

/** Vᵀ L V (k × k, symmetric) for the m × m matrix L and the k columns of V (column p at p·m). */
function projectedInductance(l: Float64Array, v: Float64Array, m: number, k: number): Float64Array {
  const lv = new Float64Array(k * m); // L V, column p at p·m
  for (let p = 0; p < k; p++) {
    for (let a = 0; a < m; a++) lv[p * m + a] = columnDot(l, a * m, v, p * m, m);
  }
  const out = new Float64Array(k * k);
  for (let p = 0; p < k; p++) {
    for (let q = 0; q <= p; q++) out[p * k + q] = out[q * k + p] = columnDot(v, p * m, lv, q * m, m);
  }
  return out;
}

/** out = Uᵀ-rotated rows: out[i, c] = Σ_p u[i, p]·x[p, c] (u k × k, x and out k × w, row-major). */
function rotateRows(u: Float64Array, k: number, x: Float64Array, w: number, out: Float64Array): void {
  for (let i = 0; i < k; i++) {
    for (let c = 0; c < w; c++) {
      let sum = 0;
      for (let p = 0; p < k; p++) sum += u[i * k + p]! * x[p * w + c]!;
      out[i * w + c] = sum;
    }
  }
}

/** The solution u of S u = 1 (S g×g complex symmetric, overwritten) into (uRe, uIm): the turn voltages at 1 A; returns Σu, the impedance. */
function turnVoltages(g: number, sRe: Float64Array, sIm: Float64Array, uRe: Float64Array, uIm: Float64Array): [number, number] {
  uRe.fill(1);
  uIm.fill(0);
  if (!complexSymmetricFactor(g, sRe, sIm)) throw new Error("internal: the reduced turn matrix is singular");
  complexSymmetricSolve(g, sRe, sIm, uRe, uIm, 1);
  let zr = 0;
  let zi = 0;
  for (let c = 0; c < g; c++) {
    zr += uRe[c]!;
    zi += uIm[c]!;
  }
  return [zr, zi];
}

/**
 * Copper loss at 1 A of the reduced solution x = D(P u − G Y u) (the reduced resistance is the
 * identity, so the loss is Σ|x|²); Y (r × g) is omitted for the empty coil.
 */
function reducedCopper(model: ReducedModel, dRe: Float64Array, dIm: Float64Array, uRe: Float64Array, uIm: Float64Array, yRe: Float64Array | null, yIm: Float64Array | null): number {
  const { k, g, r, P, G } = model;
  const wRe = model.scratch.wRe;
  const wIm = model.scratch.wIm;
  wRe.fill(0);
  wIm.fill(0);
  if (yRe !== null && yIm !== null) {
    for (let q = 0; q < r; q++) {
      let sr = 0;
      let si = 0;
      for (let c = 0; c < g; c++) {
        const ar = yRe[c * r + q]!;
        const ai = yIm[c * r + q]!;
        sr += ar * uRe[c]! - ai * uIm[c]!;
        si += ar * uIm[c]! + ai * uRe[c]!;
      }
      wRe[q] = sr;
      wIm[q] = si;
    }
  }
  let copper = 0;
  for (let i = 0; i < k; i++) {
    let sr = 0;
    let si = 0;
    for (let c = 0; c < g; c++) {
      sr += P[i * g + c]! * uRe[c]!;
      si += P[i * g + c]! * uIm[c]!;
    }
    for (let q = 0; q < r; q++) {
      sr -= G[i * r + q]! * wRe[q]!;
      si -= G[i * r + q]! * wIm[q]!;
    }
    const xr = dRe[i]! * sr - dIm[i]! * si;
    const xi = dRe[i]! * si + dIm[i]! * sr;
    copper += xr * xr + xi * xi;
  }
  return copper;
}

/** Results of {@link reducedImpedances}: empty R, X; loaded R, X; loaded copper loss at 1 A. */
const IMPEDANCES = new Float64Array(5);

/**
 * Empty and loaded terminal impedance of the reduced model at omega with the kernel core
 * M (r×r, in the model's scratch): with D = (I + jωΛ)⁻¹, S₀ = Pᵀ D P, and by the Woodbury
 * identity S = S₀ − E (I + N H)⁻¹ N Eᵀ, N = jωM, H = Gᵀ D G, E = Pᵀ D G; Z = 1ᵀ S⁻¹ 1; and the
 * loaded coil's copper loss at 1 A. Writes [empty R, empty X, loaded R, loaded X, copper] into
 * `out`; works in the model's scratch arrays (no allocation of the model's size).
 */
function reducedImpedances(model: ReducedModel, omega: number, out: Float64Array): void {
  const w = model.scratch;
  emptyProjections(model, omega);
  woodburySystem(model, omega);
  if (model.r > 0 && !complexGeneralSolve(model.r, w.aRe, w.aIm, w.yRe, w.yIm, model.g)) throw new Error("internal: the reduced part system is singular");
  loadedTurnMatrix(model);
  const [er, ei] = turnVoltages(model.g, w.s0Re, w.s0Im, w.emptyRe, w.emptyIm);
  const [lr, li] = turnVoltages(model.g, w.sRe, w.sIm, w.loadedRe, w.loadedIm);
  out[0] = er;
  out[1] = ei;
  out[2] = lr;
  out[3] = li;
  out[4] = reducedCopper(model, w.dRe, w.dIm, w.loadedRe, w.loadedIm, w.yRe, w.yIm);
}

/**
 * D = (I + jωΛ)⁻¹, S₀ = Pᵀ D P, E = Pᵀ D G and H = Gᵀ D G into the model's scratch. One loop
 * nest per function: V8 compiles a long first call in the middle of its loop (on-stack
 * replacement), and code after that loop, without type feedback yet, sent the optimised code
 * back to the interpreter on every call until it was compiled again (up to about a hundred
 * times per thread, `node --trace-deopt`).
 */
function emptyProjections(model: ReducedModel, omega: number): void {
  const w = model.scratch;
  resolventDiagonal(model, omega);
  w.s0Re.fill(0);
  w.s0Im.fill(0);
  w.eRe.fill(0);
  w.eIm.fill(0);
  w.hRe.fill(0);
  w.hIm.fill(0);
  accumulateProjections(model);
  mirrorLower(w.hRe, w.hIm, model.r);
}

/** D = (I + jωΛ)⁻¹ (diagonal) into the model's scratch. */
function resolventDiagonal(model: ReducedModel, omega: number): void {
  const { k, lambda } = model;
  const { dRe, dIm } = model.scratch;
  for (let i = 0; i < k; i++) {
    const x = omega * lambda[i]!;
    const den = 1 + x * x;
    dRe[i] = 1 / den;
    dIm[i] = -x / den;
  }
}

/** S₀ += Pᵀ D P, E += Pᵀ D G and the lower triangle of H += Gᵀ D G, in the model's scratch. */
function accumulateProjections(model: ReducedModel): void {
  const { k, g, r, P, G } = model;
  const { dRe, dIm, s0Re, s0Im, eRe, eIm, hRe, hIm } = model.scratch;
  for (let i = 0; i < k; i++) {
    const dr = dRe[i]!;
    const di = dIm[i]!;
    for (let c = 0; c < g; c++) {
      const pc = P[i * g + c]!;
      for (let e = 0; e < g; e++) {
        const v = pc * P[i * g + e]!;
        s0Re[c * g + e] = s0Re[c * g + e]! + dr * v;
        s0Im[c * g + e] = s0Im[c * g + e]! + di * v;
      }
      for (let t = 0; t < r; t++) {
        const v = pc * G[i * r + t]!;
        eRe[c * r + t] = eRe[c * r + t]! + dr * v;
        eIm[c * r + t] = eIm[c * r + t]! + di * v;
      }
    }
    for (let s = 0; s < r; s++) {
      const gs = G[i * r + s]!;
      for (let t = 0; t <= s; t++) {
        const v = gs * G[i * r + t]!;
        hRe[s * r + t] = hRe[s * r + t]! + dr * v;
        hIm[s * r + t] = hIm[s * r + t]! + di * v;
      }
    }
  }
}

/** Copies the lower triangle of the r × r matrices re, im onto the upper one. */
function mirrorLower(re: Float64Array, im: Float64Array, r: number): void {
  for (let s = 0; s < r; s++) {
    for (let t = 0; t < s; t++) {
      re[t * r + s] = re[s * r + t]!;
      im[t * r + s] = im[s * r + t]!;
    }
  }
}

/** N = jωM, A = I + N H and the right-hand sides Y = N Eᵀ (r × g, column c at c·r) into the model's scratch. */
function woodburySystem(model: ReducedModel, omega: number): void {
  const { g, r } = model;
  const { mRe, mIm, eRe, eIm, hRe, hIm, nRe, nIm, aRe, aIm, yRe, yIm } = model.scratch;
  for (let q = 0; q < r * r; q++) {
    nRe[q] = -omega * mIm[q]!;
    nIm[q] = omega * mRe[q]!;
  }
  for (let s = 0; s < r; s++) {
    for (let t = 0; t < r; t++) {
      let sr = s === t ? 1 : 0;
      let si = 0;
      for (let q = 0; q < r; q++) {
        const xr = nRe[s * r + q]!;
        const xi = nIm[s * r + q]!;
        const yr = hRe[q * r + t]!;
        const yi = hIm[q * r + t]!;
        sr += xr * yr - xi * yi;
        si += xr * yi + xi * yr;
      }
      aRe[s * r + t] = sr;
      aIm[s * r + t] = si;
    }
  }
  for (let c = 0; c < g; c++) {
    for (let s = 0; s < r; s++) {
      let sr = 0;
      let si = 0;
      for (let q = 0; q < r; q++) {
        const xr = nRe[s * r + q]!;
        const xi = nIm[s * r + q]!;
        const er = eRe[c * r + q]!;
        const ei = eIm[c * r + q]!;
        sr += xr * er - xi * ei;
        si += xr * ei + xi * er;
      }
      yRe[c * r + s] = sr;
      yIm[c * r + s] = si;
    }
  }
}

/** S = S₀ − E (I + N H)⁻¹ N Eᵀ (with Y = (I + N H)⁻¹ N Eᵀ solved) into the model's scratch. */
function loadedTurnMatrix(model: ReducedModel): void {
  const { g, r } = model;
  const { s0Re, s0Im, eRe, eIm, yRe, yIm, sRe, sIm } = model.scratch;
  sRe.set(s0Re);
  sIm.set(s0Im);
  for (let c = 0; c < g; c++) {
    for (let e = 0; e < g; e++) {
      let sr = 0;
      let si = 0;
      for (let q = 0; q < r; q++) {
        const er = eRe[c * r + q]!;
        const ei = eIm[c * r + q]!;
        const xr = yRe[e * r + q]!;
        const xi = yIm[e * r + q]!;
        sr += er * xr - ei * xi;
        si += er * xi + ei * xr;
      }
      sRe[c * g + e] = sRe[c * g + e]! - sr;
      sIm[c * g + e] = sIm[c * g + e]! - si;
    }
  }
}

export function evaluateReduced(model: ReducedModel, kernel: PartKernel, omega: number, material: PartMaterial, outside: boolean): ReducedWorkCoilResult {
  const w = model.scratch;
  partCoefficients(kernel, material, w.coefficients);
  kernelCore(kernel, w.coefficients, w.mRe, w.mIm);
  const out = IMPEDANCES;
  reducedImpedances(model, omega, out);
  const e0 = out[0]!;
  const e1 = out[1]!;
  const z0 = out[2]!;
  const z1 = out[3]!;
  const copper = out[4]!;
  return {
    resistance: z0,
    copperResistance: copper,
    partResistance: z0 - copper,
    inductance: z1 / omega,
    reflectedResistance: z0 - e0,
    inductanceChange: (z1 - e1) / omega,
    emptyResistance: e0,
    emptyInductance: e1 / omega,
    outsideTrainedRange: outside,
  };
}
