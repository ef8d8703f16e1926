/**
 * Private solver of the work-coil impedance model (not exported from the package): the cells'
 * impedance matrix $Z = R + j\omega(L + \Delta M)$, the series constraint (every turn carries the
 * same total current; the cells of one turn are in parallel, at the turn's voltage) and the
 * part's reflected coupling $\Delta M$ from the Dodd–Deeds kernels.
 *
 * Size: the folded cell system, its series solve and the part kernels (quadrature in α, factored
 * kernel, reflection coefficients) are one solver; each piece is a short function.
 *
 * @packageDocumentation
 */
import { besselI0Scaled, besselI1Scaled, besselJ1, besselK0Scaled, besselK1Scaled } from "../special/index.js";
import { complexSymmetricFactor, complexSymmetricSolve } from "../special/complex-symmetric-solve.js";
import { MU_0 } from "../units/index.js";

/** Message of the internal error for a coil impedance matrix that cannot be factored (workCoilImpedance turns it into an InputError). */
export const SINGULAR_COIL_MATRIX = "internal: the coil impedance matrix is singular";
/** Start of every "… matrix is singular" internal error of the coil model (workCoilImpedance turns them into an InputError). */
export const SINGULAR_MATRIX_START = "internal: the ";
import type { CellSet } from "./work-coil-cells.js";
import { reflectionInto } from "./coil-over-plate.js";
import type { LayerArrays } from "./coil-over-plate.js";
import { rodReflectionScaledFrom } from "./encircling-coil.js";
import { gaussLegendreRule } from "./kernels.js";

/** The reduced (mirror-folded) unknowns of a cell set. */
export interface Reduction {
  /** Number of reduced unknowns. */
  readonly m: number;
  /** Number of turn groups (a turn and its mirror image). */
  readonly groups: number;
  /** Cells of each reduced unknown: members[memberStart[a] .. memberStart[a+1]]. */
  readonly memberStart: Int32Array;
  readonly members: Int32Array;
  /** Turn group of each reduced unknown. */
  readonly group: Int32Array;
  /** Series-constraint coefficient c_a = |orbit a| / |turn group|. */
  readonly coefficient: Float64Array;
}

/** Folds cells with their mirror images (when `useMirror` and the set has them), else identity. */
export function reduction(cells: CellSet, useMirror: boolean): Reduction {
  const n = cells.n;
  const mirrorOk = useMirror && cells.mirror[0]! >= 0;
  const memberStart: number[] = [0];
  const members: number[] = [];
  const group: number[] = [];
  const coefficient: number[] = [];
  const T = cells.turns;
  for (let i = 0; i < n; i++) {
    const t = cells.turn[i]!;
    if (!mirrorOk) {
      members.push(i);
      memberStart.push(members.length);
      group.push(t);
      coefficient.push(t < 0 ? 0 : 1);
      continue;
    }
    const mi = cells.mirror[i]!;
    if (mi < i) continue; // represented by its mirror
    members.push(i);
    if (mi !== i) members.push(mi);
    memberStart.push(members.length);
    if (t < 0) {
      // a part cell: a closed loop of its own, no source
      group.push(-1);
      coefficient.push(0);
      continue;
    }
    const tg = Math.min(t, T - 1 - t);
    const groupSize = t === T - 1 - t ? 1 : 2;
    group.push(tg);
    coefficient.push((mi !== i ? 2 : 1) / groupSize);
  }
  const groups = mirrorOk ? Math.ceil(T / 2) : T;
  return {
    m: group.length,
    groups,
    memberStart: Int32Array.from(memberStart),
    members: Int32Array.from(members),
    group: Int32Array.from(group),
    coefficient: Float64Array.from(coefficient),
  };
}

/** Sum of a full n×n matrix over the orbits: Â_ab = Σ_{i∈a} Σ_{j∈b} A_ij (written into out, m×m). */
export function foldMatrix(red: Reduction, n: number, a: Float64Array, out: Float64Array): void {
  const m = red.m;
  const ms = red.memberStart;
  const mem = red.members;
  for (let p = 0; p < m; p++) {
    for (let q = 0; q <= p; q++) {
      let s = 0;
      for (let x = ms[p]!; x < ms[p + 1]!; x++) {
        const row = mem[x]! * n;
        for (let y = ms[q]!; y < ms[q + 1]!; y++) s += a[row + mem[y]!]!;
      }
      out[p * m + q] = s;
      out[q * m + p] = s;
    }
  }
}

/**
 * Folded cell resistances: R̂_a = Σ_{i∈a} 2πρ/∫dA/r (diagonal), ρ = coilResistivity for coil
 * cells and partResistivity for part cells (turn −1).
 */
export function foldResistance(red: Reduction, cells: CellSet, coilResistivity: number, partResistivity: number): Float64Array {
  const out = new Float64Array(red.m);
  for (let p = 0; p < red.m; p++) {
    let s = 0;
    for (let x = red.memberStart[p]!; x < red.memberStart[p + 1]!; x++) {
      const i = red.members[x]!;
      s += ((cells.turn[i]! < 0 ? partResistivity : coilResistivity) * 2 * Math.PI) / cells.inverseRadius[i]!;
    }
    out[p] = s;
  }
  return out;
}

/** Result of one solve. */
export interface CoilSolution {
  /** Terminal impedance [Ω]. */
  readonly re: number;
  readonly im: number;
  /** Copper loss per A² (Σ R_i |I_i|² over the coil's cells) [Ω]. */
  readonly copper: number;
  /** Loss per A² in the part's own cells (volume-modelled parts only, else 0) [Ω]. */
  readonly partCells: number;
  /** Copper loss of each turn per A² [Ω]. */
  readonly turnCopper: Float64Array;
  /** Largest over smallest cell current density magnitude (a crowding measure). */
  readonly crowding: number;
}

/**
 * Solves the series-connected turns: Ẑ x = C u, Cᵀ x = 1, Z = Σ u. The matrix (zRe, zIm, m×m,
 * overwritten by its factors) is the folded impedance matrix.
 */
export function solveSeries(red: Reduction, cells: CellSet, zRe: Float64Array, zIm: Float64Array, rFold: Float64Array): CoilSolution {
  const m = red.m;
  const g = red.groups;
  // keep the diagonal resistances for the copper loss
  if (!complexSymmetricFactor(m, zRe, zIm)) throw new Error(SINGULAR_COIL_MATRIX);
  const xRe = new Float64Array(m * g);
  const xIm = new Float64Array(m * g);
  for (let a = 0; a < m; a++) if (red.group[a]! >= 0) xRe[red.group[a]! * m + a] = red.coefficient[a]!;
  complexSymmetricSolve(m, zRe, zIm, xRe, xIm, g);
  // S = Cᵀ X (g×g, complex symmetric)
  const sRe = new Float64Array(g * g);
  const sIm = new Float64Array(g * g);
  for (let col = 0; col < g; col++) {
    for (let a = 0; a < m; a++) {
      const row = red.group[a]!;
      if (row < 0) continue;
      const c = red.coefficient[a]!;
      sRe[row * g + col] = sRe[row * g + col]! + c * xRe[col * m + a]!;
      sIm[row * g + col] = sIm[row * g + col]! + c * xIm[col * m + a]!;
    }
  }
  const uRe = new Float64Array(g).fill(1);
  const uIm = new Float64Array(g);
  if (!complexSymmetricFactor(g, sRe, sIm)) throw new Error("internal: the turn matrix is singular");
  complexSymmetricSolve(g, sRe, sIm, uRe, uIm, 1);
  let zr = 0;
  let zi = 0;
  for (let k = 0; k < g; k++) {
    zr += uRe[k]!;
    zi += uIm[k]!;
  }
  // cell currents x = X u (each member of an orbit carries x_a)
  const turnCopper = new Float64Array(cells.turns);
  let copper = 0;
  let partCells = 0;
  let jMax = 0;
  let jMin = Infinity;
  for (let a = 0; a < m; a++) {
    let ir = 0;
    let ii = 0;
    for (let k = 0; k < g; k++) {
      const xr = xRe[k * m + a]!;
      const xi = xIm[k * m + a]!;
      ir += xr * uRe[k]! - xi * uIm[k]!;
      ii += xr * uIm[k]! + xi * uRe[k]!;
    }
    const i2 = ir * ir + ii * ii;
    const loss = rFold[a]! * i2;
    if (red.group[a]! < 0) {
      partCells += loss;
      continue;
    }
    copper += loss;
    const ms = red.memberStart;
    const count = ms[a + 1]! - ms[a]!;
    for (let x = ms[a]!; x < ms[a + 1]!; x++) {
      const cell = red.members[x]!;
      const t = cells.turn[cell]!;
      turnCopper[t] = turnCopper[t]! + loss / count;
      const jd = Math.sqrt(i2) / cells.area[cell]!;
      if (jd > jMax) jMax = jd;
      if (jd < jMin) jMin = jd;
    }
  }
  return { re: zr, im: zi, copper, partCells, turnCopper, crowding: jMin > 0 ? jMax / jMin : Infinity };
}

/** A quadrature rule over the separation constant α. */
export interface AlphaRule {
  readonly nodes: Float64Array;
  readonly weights: Float64Array;
}

const PANEL = 8;
/** Upper limit of the α integrals in units of 1/(nearest cell's distance to the part): e^{−2·10} ≈ 2e-9 of the nearest pair's kernel. */
const TOP = 10;
const PANEL_RULE = gaussLegendreRule(PANEL);

/**
 * Gauss–Legendre panels: geometric grading from `width` down to `floor` (material and geometry
 * scales near α = 0), then panels of `width` up to `top`.
 */
export function alphaRule(width: number, floor: number, top: number): AlphaRule {
  const nodes: number[] = [];
  const weights: number[] = [];
  const panel = (lo: number, hi: number): void => {
    const half = 0.5 * (hi - lo);
    const mid = 0.5 * (hi + lo);
    for (let i = 0; i < PANEL; i++) {
      nodes.push(mid + half * PANEL_RULE.nodes[i]!);
      weights.push(half * PANEL_RULE.weights[i]!);
    }
  };
  let lo = width;
  let levels = 0;
  while (lo / 2 > floor && levels < 60) {
    panel(lo / 2, lo);
    lo /= 2;
    levels++;
  }
  panel(0, lo);
  let x = width;
  while (x < top) {
    const hi = Math.min(x + width, top);
    panel(x, hi);
    x = hi;
  }
  return { nodes: Float64Array.from(nodes), weights: Float64Array.from(weights) };
}

/** Long coaxial rod or tube (bar/tube part): outer radius a, bore a1, kk = ωμ0μr/ρ, μr. */
export interface RodPart {
  readonly kind: "rod";
  readonly radius: number;
  readonly innerRadius: number;
  readonly kk: number;
  readonly mur: number;
}

/** Plate below the coil: top face at z = top, layers as in coilOverPlate. */
export interface PlatePart {
  readonly kind: "plate";
  readonly top: number;
  readonly layers: LayerArrays;
}

/** Material scale of the reflection coefficient near α = 0 (the grading floor is an eighth of it). */
export function rodScale(p: RodPart, rMax: number): number {
  let scale = Math.min(Math.sqrt(p.kk) / p.mur, 1 / (p.mur * p.radius), 1 / rMax);
  if (p.innerRadius > 0) {
    const t = p.radius - p.innerRadius;
    scale = Math.min(scale, (p.kk * t) / (2 * p.mur), 1 / (p.mur * t));
  }
  return scale;
}

/** Part geometry for the kernel columns (material-free). */
export type PartGeometry = { readonly kind: "rod"; readonly radius: number } | { readonly kind: "plate"; readonly top: number };

/**
 * The part's kernel in factored form: ΔM = Q (C diag(c(α)) Cᵀ) Qᵀ over the folded unknowns, with
 * Q (m × r, orthonormal columns) spanning the cell kernel vectors of every α node (cos and, for
 * an unfolded rod, sin columns; weights folded in as √w), C = Qᵀ F (r × columns), and c(α) the
 * material's reflection coefficient times the kernel's constant. Material-independent: built
 * once per coil mesh and part geometry.
 */
export interface PartKernel {
  readonly geometry: PartGeometry;
  readonly rule: AlphaRule;
  /** Columns per α node: 2 for an unfolded rod (cos, sin), else 1. */
  readonly perNode: number;
  readonly r: number;
  /** Q, column-major (column q at q·m). */
  readonly q: Float64Array;
  /** C, row-major r × (perNode · K). */
  readonly c: Float64Array;
}

/** Relative truncation of the kernel columns' span (ΔM relative error of the same order). */
const KERNEL_TOLERANCE = 1e-8;

/**
 * Builds the factored part kernel for a geometry; `floor` is the lowest α scale the material
 * needs resolved (the rule is graded down to it).
 */
export function partKernel(red: Reduction, cells: CellSet, geometry: PartGeometry, floor: number): PartKernel {
  const m = red.m;
  const { rMax, zExt, gapMin } = coilReach(cells, geometry);
  const folded = red.members.length !== red.m; // mirror folding: the sin part cancels
  // the grading stops at 1e-6/rMax at the lowest (kernel columns grow as α^(−1/2) towards 0)
  floor = Math.max(floor, 1e-6 / rMax);
  const width = geometry.kind === "rod" ? Math.min((2 * Math.PI) / zExt, 2 / gapMin) : Math.min((2 * Math.PI) / rMax, 2 / gapMin);
  const rule = alphaRule(width, Math.min(floor, 1 / rMax) / 8, TOP / gapMin);
  const K = rule.nodes.length;
  const perNode = geometry.kind === "rod" && !folded ? 2 : 1;
  const cols = perNode * K;
  const f = new Float64Array(cols * m); // column-major
  if (geometry.kind === "rod") rodColumns(red, cells, rule, geometry.radius, perNode, f);
  else plateColumns(red, cells, rule, geometry.top, f);
  // the span is truncated in a norm that weighs each column by min(1, α r_max): the reflection
  // coefficients vanish as α² towards α = 0, where the columns themselves grow as α^(−1/2)
  const scaled = Float64Array.from(f);
  for (let col = 0; col < cols; col++) {
    const s = Math.min(1, rule.nodes[Math.floor(col / perNode)]! * rMax);
    for (let a = 0; a < m; a++) scaled[col * m + a] = scaled[col * m + a]! * s;
  }
  const { q, r } = pivotedGramSchmidt(m, cols, scaled, KERNEL_TOLERANCE);
  // C = Qᵀ F (row-major r × cols), from the original columns
  const c = new Float64Array(r * cols);
  for (let p = 0; p < r; p++) {
    for (let col = 0; col < cols; col++) c[p * cols + col] = dot(q, p * m, f, col * m, m);
  }
  return { geometry, rule, perNode, r, q, c };
}

/**
 * The coil cells' reach towards the part: largest outer radius, axial extent (at least the
 * gap) and the smallest distance of a cell centre to the part's surface.
 */
function coilReach(cells: CellSet, geometry: PartGeometry): { rMax: number; zExt: number; gapMin: number } {
  let rMax = 0;
  let zMin = Infinity;
  let zMax = -Infinity;
  let gapMin = Infinity;
  const rod = geometry.kind === "rod";
  const surface = geometry.kind === "rod" ? geometry.radius : geometry.top;
  for (let i = 0; i < cells.n; i++) {
    if (cells.turn[i]! < 0) continue;
    rMax = Math.max(rMax, cells.r[i]! + cells.size[i]!);
    zMin = Math.min(zMin, cells.z[i]!);
    zMax = Math.max(zMax, cells.z[i]!);
    gapMin = Math.min(gapMin, (rod ? cells.r[i]! : cells.z[i]!) - surface);
  }
  return { rMax, zExt: Math.max(zMax - zMin, gapMin), gapMin };
}

/** Σ a[ao + i]·b[bo + i] over i < m, in order. */
function dot(a: Float64Array, ao: number, b: Float64Array, bo: number, m: number): number {
  let sum = 0;
  for (let i = 0; i < m; i++) sum += a[ao + i]! * b[bo + i]!;
  return sum;
}

/** A rod's kernel columns √w·Σ r K₁(αr) e^(−α(r−a)) (cos αz, sin αz) per α node and folded unknown, into f. */
function rodColumns(red: Reduction, cells: CellSet, rule: AlphaRule, radius: number, perNode: number, f: Float64Array): void {
  const m = red.m;
  const ms = red.memberStart;
  for (let k = 0; k < rule.nodes.length; k++) {
    const alpha = rule.nodes[k]!;
    const sw = Math.sqrt(rule.weights[k]!);
    for (let a = 0; a < m; a++) {
      let sc = 0;
      let ss = 0;
      for (let x = ms[a]!; x < ms[a + 1]!; x++) {
        const i = red.members[x]!;
        const r = cells.r[i]!;
        const g = r * besselK1Scaled(alpha * r) * Math.exp(-alpha * (r - radius));
        const z = cells.z[i]!;
        sc += g * Math.cos(alpha * z);
        ss += g * Math.sin(alpha * z);
      }
      f[perNode * k * m + a] = sw * sc;
      if (perNode === 2) f[(2 * k + 1) * m + a] = sw * ss;
    }
  }
}

/** A plate's kernel columns √w·Σ r J₁(αr) e^(−α(z−top)) per α node and folded unknown, into f. */
function plateColumns(red: Reduction, cells: CellSet, rule: AlphaRule, top: number, f: Float64Array): void {
  const m = red.m;
  const ms = red.memberStart;
  for (let k = 0; k < rule.nodes.length; k++) {
    const alpha = rule.nodes[k]!;
    const sw = Math.sqrt(rule.weights[k]!);
    for (let a = 0; a < m; a++) {
      let sc = 0;
      for (let x = ms[a]!; x < ms[a + 1]!; x++) {
        const i = red.members[x]!;
        const r = cells.r[i]!;
        sc += r * besselJ1(alpha * r) * Math.exp(-alpha * (cells.z[i]! - top));
      }
      f[k * m + a] = sw * sc;
    }
  }
}

/**
 * Column-pivoted modified Gram–Schmidt on `cols` columns of length m (column-major, not
 * modified): an orthonormal basis Q of their span, stopping when every remaining column's
 * norm is below `tol` times the largest column norm.
 */
export function pivotedGramSchmidt(m: number, cols: number, a: Float64Array, tol: number): { q: Float64Array; r: number } {
  const work = Float64Array.from(a);
  const norm2 = new Float64Array(cols);
  let largest = 0;
  for (let col = 0; col < cols; col++) {
    const s = squaredNorm(work, col * m, m);
    norm2[col] = s;
    largest = Math.max(largest, s);
  }
  const q = new Float64Array(Math.min(m, cols) * m);
  let r = 0;
  const limit = tol * tol * largest;
  while (r < Math.min(m, cols)) {
    const best = largestAbove(norm2, cols, limit);
    if (best < 0) break;
    // normalise, re-orthogonalise once against the basis (twice is enough)
    const vo = best * m;
    for (let pass = 0; pass < 2; pass++) {
      for (let p = 0; p < r; p++) subtractProjection(q, p * m, work, vo, m);
    }
    const nv = squaredNorm(work, vo, m);
    norm2[best] = 0;
    if (!(nv > limit)) continue;
    const inv = 1 / Math.sqrt(nv);
    for (let i = 0; i < m; i++) q[r * m + i] = work[vo + i]! * inv;
    // remove the new direction from the remaining columns
    for (let col = 0; col < cols; col++) {
      if (norm2[col] === 0) continue;
      const d = subtractProjection(q, r * m, work, col * m, m);
      norm2[col] = Math.max(0, norm2[col]! - d * d);
    }
    r++;
  }
  return { q: q.subarray(0, r * m), r };
}

/** Σ x[o + i]² over i < m, in order. */
function squaredNorm(x: Float64Array, o: number, m: number): number {
  let s = 0;
  for (let i = 0; i < m; i++) s += x[o + i]! ** 2;
  return s;
}

/** Index of the largest of norm2[0 … cols) above `limit` (the first of equals), or −1. */
function largestAbove(norm2: Float64Array, cols: number, limit: number): number {
  let best = -1;
  let bestN = limit;
  for (let col = 0; col < cols; col++) {
    if (norm2[col]! > bestN) {
      bestN = norm2[col]!;
      best = col;
    }
  }
  return best;
}

/** v −= (qᵀv) q for the unit column q at qo and the column v at vo (length m) of x; returns qᵀv. */
function subtractProjection(q: Float64Array, qo: number, x: Float64Array, vo: number, m: number): number {
  const d = dot(q, qo, x, vo, m);
  for (let i = 0; i < m; i++) x[vo + i] = x[vo + i]! - d * q[qo + i]!;
  return d;
}

/** Material of a kernel part at one frequency (rod: bore radius a1, kk, μr; plate: layers). */
export type PartMaterial =
  | { readonly kind: "rod"; readonly innerRadius: number; readonly kk: number; readonly mur: number }
  | { readonly kind: "plate"; readonly layers: LayerArrays };

/**
 * The material-independent Bessel factors of a rod kernel's reflection coefficient at every α
 * node: exponentially scaled I0, I1, K0, K1 at α·a and, for a tube of bore a1, the air bore's
 * ratio α I0(α a1)/I1(α a1) (0 for a bar).
 */
interface RodNodeFactors {
  readonly innerRadius: number;
  readonly i0: Float64Array;
  readonly i1: Float64Array;
  readonly k0: Float64Array;
  readonly k1: Float64Array;
  readonly bore: Float64Array;
}

/** The rod factors by kernel, for the bore radius last used (a part geometry keeps one bore). */
const rodFactors = new WeakMap<PartKernel, RodNodeFactors>();

function rodFactorsOf(kernel: PartKernel, radius: number, innerRadius: number): RodNodeFactors {
  const known = rodFactors.get(kernel);
  if (known !== undefined && known.innerRadius === innerRadius) return known;
  const nodes = kernel.rule.nodes;
  const K = nodes.length;
  const f: RodNodeFactors = { innerRadius, i0: new Float64Array(K), i1: new Float64Array(K), k0: new Float64Array(K), k1: new Float64Array(K), bore: new Float64Array(K) };
  const solid = innerRadius < 1e-9 * radius;
  for (let k = 0; k < K; k++) {
    const alpha = nodes[k]!;
    const x = alpha * radius;
    f.i0[k] = besselI0Scaled(x);
    f.i1[k] = besselI1Scaled(x);
    f.k0[k] = besselK0Scaled(x);
    f.k1[k] = besselK1Scaled(x);
    f.bore[k] = solid ? 0 : (alpha * besselI0Scaled(alpha * innerRadius)) / besselI1Scaled(alpha * innerRadius);
  }
  rodFactors.set(kernel, f);
  return f;
}

/** Scratch of {@link partCoefficients} (one reflection coefficient). */
const COEFFICIENT = new Float64Array(2);

/**
 * c(α_k) times the kernel constant for every node (re, im), into out (length 2K). For a rod the
 * material-independent Bessel factors are computed once per kernel and bore
 * ({@link rodReflectionScaledFrom}: bit-identical to evaluating them each time); allocates
 * nothing after the first call.
 */
export function partCoefficients(kernel: PartKernel, material: PartMaterial, out: Float64Array): void {
  const cc = COEFFICIENT;
  const K = kernel.rule.nodes.length;
  if (material.kind === "rod" && kernel.geometry.kind === "rod") {
    const a = kernel.geometry.radius;
    const f = rodFactorsOf(kernel, a, material.innerRadius);
    const factor = 2 * MU_0;
    for (let k = 0; k < K; k++) {
      rodReflectionScaledFrom(kernel.rule.nodes[k]!, a, material.innerRadius, material.kk, material.mur, f.i0[k]!, f.i1[k]!, f.k0[k]!, f.k1[k]!, f.bore[k]!, cc);
      out[2 * k] = cc[0]! * factor;
      out[2 * k + 1] = cc[1]! * factor;
    }
    return;
  }
  if (material.kind !== "plate") throw new Error("internal: part material and kernel differ");
  for (let k = 0; k < K; k++) {
    reflectionInto(kernel.rule.nodes[k]!, material.layers, cc);
    const factor = Math.PI * MU_0;
    out[2 * k] = cc[0]! * factor;
    out[2 * k + 1] = cc[1]! * factor;
  }
}

/** The r × r complex core M = C diag(c) Cᵀ (c per node, repeated for the node's columns). */
export function kernelCore(kernel: PartKernel, coefficients: Float64Array, mRe: Float64Array, mIm: Float64Array): void {
  const r = kernel.r;
  const per = kernel.perNode;
  const cols = per * kernel.rule.nodes.length;
  const c = kernel.c;
  mRe.fill(0);
  mIm.fill(0);
  for (let p = 0; p < r; p++) {
    for (let q = 0; q <= p; q++) {
      let sr = 0;
      let si = 0;
      const op = p * cols;
      const oq = q * cols;
      for (let col = 0; col < cols; col++) {
        const v = c[op + col]! * c[oq + col]!;
        const node = per === 2 ? col >> 1 : col;
        sr += v * coefficients[2 * node]!;
        si += v * coefficients[2 * node + 1]!;
      }
      mRe[p * r + q] = mRe[q * r + p] = sr;
      mIm[p * r + q] = mIm[q * r + p] = si;
    }
  }
}

/**
 * Adds jω Q M Qᵀ (the part's reflected coupling) to the folded matrix (zRe, zIm, m×m).
 */
export function addKernel(m: number, kernel: PartKernel, mRe: Float64Array, mIm: Float64Array, omega: number, zRe: Float64Array, zIm: Float64Array): void {
  const r = kernel.r;
  const q = kernel.q;
  // T = Q M (m × r, complex), then Z += jω T Qᵀ
  const tRe = new Float64Array(m * r);
  const tIm = new Float64Array(m * r);
  for (let a = 0; a < m; a++) {
    for (let p = 0; p < r; p++) {
      let sr = 0;
      let si = 0;
      for (let s = 0; s < r; s++) {
        const v = q[s * m + a]!;
        sr += v * mRe[s * r + p]!;
        si += v * mIm[s * r + p]!;
      }
      tRe[a * r + p] = sr;
      tIm[a * r + p] = si;
    }
  }
  for (let a = 0; a < m; a++) {
    for (let b = 0; b <= a; b++) {
      let sr = 0;
      let si = 0;
      for (let p = 0; p < r; p++) {
        const v = q[p * m + b]!;
        sr += tRe[a * r + p]! * v;
        si += tIm[a * r + p]! * v;
      }
      // jω (sr + j si) = −ω si + j ω sr
      zRe[a * m + b] = zRe[a * m + b]! - omega * si;
      zIm[a * m + b] = zIm[a * m + b]! + omega * sr;
      if (b !== a) {
        zRe[b * m + a] = zRe[a * m + b]!;
        zIm[b * m + a] = zIm[a * m + b]!;
      }
    }
  }
}

/** Material scale of a plate's reflection coefficient near α = 0 (as rodScale). */
export function plateScale(lay: LayerArrays): number {
  let scale = Infinity;
  for (let i = 0; i < lay.k.length; i++) {
    scale = Math.min(scale, Math.sqrt(lay.k[i]!) / lay.mu[i]!);
    const t = lay.t[i]!;
    if (t < Infinity) scale = Math.min(scale, (lay.k[i]! * t) / (2 * lay.mu[i]!), 1 / (lay.mu[i]! * t));
  }
  return scale;
}

/** The coil's cells and folded matrices, for one mesh. */
export interface Mesh {
  readonly cells: CellSet;
  readonly red: Reduction;
  /** Folded inductance matrix (m×m) [H]. */
  readonly L: Float64Array;
  /** Folded resistances (diagonal) [Ω]. */
  readonly R: Float64Array;
}

/** The folded cell impedance of the empty coil, diag(rDiag) + jωL, into zeroed zRe, zIm (m × m). */
export function emptyImpedanceInto(m: number, l: Float64Array, rDiag: Float64Array, omega: number, zRe: Float64Array, zIm: Float64Array): void {
  for (let a = 0; a < m; a++) zRe[a * m + a] = rDiag[a]!;
  for (let k = 0; k < m * m; k++) zIm[k] = omega * l[k]!;
}
