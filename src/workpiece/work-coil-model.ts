/**
 * Private solver of the work-coil impedance model (not exported from the package): the cells'
 * impedance matrix $Z = R + j\omega(L + \Delta M)$, the series constraint (every turn carries the
 * same total current; the cells of one turn are in parallel, at the turn's voltage) and the
 * part's reflected coupling $\Delta M$ from the Dodd–Deeds kernels.
 *
 * @packageDocumentation
 */
import { besselJ1, besselK1Scaled } from "../special/index.js";
import { complexSymmetricFactor, complexSymmetricSolve } from "../special/complex-symmetric-solve.js";
import { MU_0 } from "../units/index.js";
import type { CellSet } from "./work-coil-cells.js";
import { reflectionInto } from "./coil-over-plate.js";
import type { LayerArrays } from "./coil-over-plate.js";
import { rodReflectionScaled } from "./encircling-coil.js";
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
  if (!complexSymmetricFactor(m, zRe, zIm)) throw new Error("internal: the coil impedance matrix is singular");
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

/**
 * Adds the part's reflected coupling jω ΔM to the folded matrix (zRe, zIm, m×m) at angular
 * frequency omega. Rod: ΔM_ij = 2μ0 ∫ C̃(α) G_i G_j cos(α(z_i − z_j)) dα with
 * G = r K1s(αr) e^{−α(r − a)}; plate: ΔM_ij = πμ0 ∫ Γ(α) H_i H_j dα, H = r J1(αr) e^{−α h}.
 * The cell kernels are taken at the cell centroids. Returns the number of α nodes used.
 */
export function addPartCoupling(
  red: Reduction,
  cells: CellSet,
  part: RodPart | PlatePart,
  omega: number,
  zRe: Float64Array,
  zIm: Float64Array,
): number {
  const m = red.m;
  const n = cells.n;
  let rMax = 0;
  let zMin = Infinity;
  let zMax = -Infinity;
  let gapMin = Infinity;
  for (let i = 0; i < n; i++) {
    rMax = Math.max(rMax, cells.r[i]! + cells.size[i]!);
    zMin = Math.min(zMin, cells.z[i]!);
    zMax = Math.max(zMax, cells.z[i]!);
    const d = part.kind === "rod" ? cells.r[i]! - part.radius : cells.z[i]! - part.top;
    gapMin = Math.min(gapMin, d);
  }
  const folded = red.members.length !== red.m; // mirror folding: the sin part cancels
  const cc = new Float64Array(2);
  let rule: AlphaRule;
  if (part.kind === "rod") {
    const zExt = Math.max(zMax - zMin, gapMin);
    rule = alphaRule(Math.min((2 * Math.PI) / zExt, 2 / gapMin), rodScale(part, rMax) / 8, TOP / gapMin);
  } else {
    let scale = 1 / rMax;
    const lay = part.layers;
    for (let i = 0; i < lay.k.length; i++) {
      scale = Math.min(scale, Math.sqrt(lay.k[i]!) / lay.mu[i]!);
      const t = lay.t[i]!;
      if (t < Infinity) scale = Math.min(scale, (lay.k[i]! * t) / (2 * lay.mu[i]!), 1 / (lay.mu[i]! * t));
    }
    rule = alphaRule(Math.min((2 * Math.PI) / rMax, 2 / gapMin), scale / 8, TOP / gapMin);
  }
  const K = rule.nodes.length;
  const fc = new Float64Array(m);
  const fs = new Float64Array(m);
  const ms = red.memberStart;
  for (let k = 0; k < K; k++) {
    const alpha = rule.nodes[k]!;
    let factor: number;
    if (part.kind === "rod") {
      rodReflectionScaled(alpha, part.radius, part.innerRadius, part.kk, part.mur, cc);
      factor = 2 * MU_0 * rule.weights[k]!;
    } else {
      reflectionInto(alpha, part.layers, cc);
      factor = Math.PI * MU_0 * rule.weights[k]!;
    }
    const cRe = cc[0]! * factor;
    const cIm = cc[1]! * factor;
    if (!(Math.abs(cRe) + Math.abs(cIm) > 0)) continue;
    let any = false;
    for (let a = 0; a < m; a++) {
      let sc = 0;
      let ss = 0;
      for (let x = ms[a]!; x < ms[a + 1]!; x++) {
        const i = red.members[x]!;
        const r = cells.r[i]!;
        if (part.kind === "rod") {
          const g = r * besselK1Scaled(alpha * r) * Math.exp(-alpha * (r - part.radius));
          const z = cells.z[i]!;
          sc += g * Math.cos(alpha * z);
          ss += g * Math.sin(alpha * z);
        } else {
          sc += r * besselJ1(alpha * r) * Math.exp(-alpha * (cells.z[i]! - part.top));
        }
      }
      fc[a] = sc;
      fs[a] = ss;
      if (sc !== 0 || ss !== 0) any = true;
    }
    if (!any) continue;
    // jω (cRe + j cIm) F Fᵀ: real part −ω cIm, imaginary ω cRe
    const pr = -omega * cIm;
    const pi = omega * cRe;
    const useSin = part.kind === "rod" && !folded;
    for (let a = 0; a < m; a++) {
      const fa = fc[a]!;
      const sa = fs[a]!;
      const row = a * m;
      for (let b = 0; b <= a; b++) {
        const v = fa * fc[b]! + (useSin ? sa * fs[b]! : 0);
        zRe[row + b] = zRe[row + b]! + pr * v;
        zIm[row + b] = zIm[row + b]! + pi * v;
      }
    }
  }
  // mirror the lower triangle to the upper (the factorisation reads the lower only, but keep it whole)
  for (let a = 0; a < m; a++) {
    for (let b = 0; b < a; b++) {
      zRe[b * m + a] = zRe[a * m + b]!;
      zIm[b * m + a] = zIm[a * m + b]!;
    }
  }
  return K;
}
