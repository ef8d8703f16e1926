/**
 * Private kernels of the work-coil impedance model: the split of each turn's cross-section into
 * coaxial ring cells, and the cells' partial inductance matrix (not exported from the package).
 *
 * Each cell is a coaxial ring whose cross-section (in the r–z half-plane) is an annular sector
 * of the turn's tube or wire (in local polar coordinates about the turn centre), a rectangle of
 * a strip, or a whole round bundle (litz). The current density is uniform over each cell; the
 * cell's resistance is the exact DC resistance of its ring, $2\pi\rho / \int dA/r$, so the
 * parallel cells of one turn give the ring's exact DC resistance.
 *
 * Mutual inductance of two cells: Maxwell's formula between the centroids, plus, for cells
 * closer than 1.5 × the sum of their sizes, the two-dimensional correction
 * $\mu_0\sqrt{r_ir_j}\,(\ln d_{ij} - \ln g_{ij})$ with $g_{ij}$ the geometric mean distance of the
 * two cross-sections (exact logarithmic potential of a polygon, integrated by Gauss–Legendre
 * over the other cell). Self-inductance of a cell: $\mu_0 r\,(\ln(8r/g_{ii}) - 2)$ with its own
 * geometric mean distance (Maxwell's thin-ring form; the neglected terms are
 * $O((s/r)^2)$ of the cell's self term, s its size).
 *
 * Size: the cell builder (sectors, rectangles, mirror images) and the partial-inductance
 * integrals over those cells share the cell layout and its quadrature rules.
 *
 * @packageDocumentation
 */
import { maxwellOverMu0 } from "../inductance/kernels.js";
import { MU_0 } from "../units/index.js";
import { gaussLegendreRule } from "./kernels.js";

/** One turn's cross-section, in local coordinates (u radial, v axial) about the turn centre. */
export type CrossSection =
  | { readonly kind: "annulus"; readonly inner: number; readonly outer: number }
  | { readonly kind: "rectangle"; readonly width: number; readonly height: number } // width along u, height along v
  | { readonly kind: "disc"; readonly radius: number }; // one cell of uniform current (homogenised litz)

/** Discretisation controls (all lengths in metres). */
export interface CellControls {
  /** Thickness of the cells at the conductor surface [m]. */
  readonly surfaceLayer: number;
  /** Growth ratio of the layer thickness away from a surface, ≥ 1. */
  readonly growth: number;
  /** Number of angular sectors of the outermost ring of an annulus (even). */
  readonly sectors: number;
  /** Deepest layer below the surface that gets cells [m] (Infinity: the whole cross-section). */
  readonly maxDepth: number;
}

/** The cells of a coil. Arrays are indexed by cell. */
export interface CellSet {
  readonly n: number;
  readonly turns: number;
  /** Turn index of each cell. */
  readonly turn: Int32Array;
  /** Centroid radius and axial position [m]. */
  readonly r: Float64Array;
  readonly z: Float64Array;
  /** Cross-section area [m²]. */
  readonly area: Float64Array;
  /** $\int dA/r$ over the cross-section [m]; the cell's ring resistance is $2\pi\rho$ over it. */
  readonly inverseRadius: Float64Array;
  /** Largest extent of the cross-section [m]. */
  readonly size: Float64Array;
  /** Index of the mirror image cell under z → −z, or −1 when the set has no such symmetry. */
  readonly mirror: Int32Array;
  /** Polygon of each cell (for the logarithmic potential): vertices polyStart[i]..polyStart[i+1]. */
  readonly polyStart: Int32Array;
  readonly polyR: Float64Array;
  readonly polyZ: Float64Array;
  readonly polyArea: Float64Array;
  /** Gauss points of each cell: gaussStart[i]..gaussStart[i+1], weights summing to the area. */
  readonly gaussStart: Int32Array;
  readonly gaussR: Float64Array;
  readonly gaussZ: Float64Array;
  readonly gaussW: Float64Array;
  /** Four coarse points (2×2 Gauss) per cell: index 4i..4i+3. */
  readonly coarseR: Float64Array;
  readonly coarseZ: Float64Array;
  readonly coarseW: Float64Array;
}

/**
 * Layer boundaries across [0, t], graded from both faces (twoSided) or from the face at 0 only
 * (down to maxDepth): N layers of geometric thickness h0·q^k, with N the count the ratio `growth`
 * needs to cover the depth from the first thickness `first`, and then q ≤ growth fitted so that
 * the layers cover it exactly (smooth in the inputs, so results converge smoothly as `first`
 * shrinks).
 */
export function gradedLayers(t: number, first: number, growth: number, twoSided: boolean, maxDepth: number): number[] {
  const reach = twoSided ? t / 2 : Math.min(t, maxDepth);
  const h0 = Math.min(first, reach);
  let steps: number[];
  if (growth <= 1 + 1e-12) {
    const count = Math.max(1, Math.round(reach / h0));
    steps = new Array<number>(count).fill(reach / count);
  } else {
    const count = Math.max(1, Math.ceil(Math.log(1 + (reach * (growth - 1)) / h0) / Math.log(growth)));
    // find q in [1, growth] with h0 (q^N − 1)/(q − 1) = reach; if even q = 1 overshoots, uniform layers
    if (count * h0 >= reach) {
      steps = new Array<number>(count).fill(reach / count);
    } else {
      let lo = 1;
      let hi = growth;
      for (let it = 0; it < 80; it++) {
        const q = 0.5 * (lo + hi);
        const sum = (h0 * (Math.pow(q, count) - 1)) / (q - 1);
        if (sum > reach) hi = q;
        else lo = q;
      }
      const q = 0.5 * (lo + hi);
      steps = [];
      let h = h0;
      for (let k = 0; k < count; k++) {
        steps.push(h);
        h *= q;
      }
    }
  }
  const bounds = [0];
  let x = 0;
  for (let k = 0; k < steps.length; k++) {
    x = k === steps.length - 1 ? reach : x + steps[k]!;
    bounds.push(x);
  }
  if (twoSided) {
    const half = bounds.slice();
    for (let k = half.length - 2; k >= 0; k--) bounds.push(t - half[k]!);
  }
  return bounds;
}

const GAUSS_ORDER = 4;
/** Largest chord sagitta of a cell polygon as a fraction of the cell's radial thickness (times 2). */
const CHORD_SAG = 0.2;
const GAUSS = gaussLegendreRule(GAUSS_ORDER);
const COARSE = gaussLegendreRule(2);
const FINE = gaussLegendreRule(8);

/**
 * A growable column of numbers: a Float64Array that doubles when full. Every column of the
 * builder has the same element kind and shape from the first cell on (plain arrays would change
 * their elements kind from small integers to doubles at the first fraction, which the optimised
 * code of the cell builders would then have to handle).
 */
class Column {
  data = new Float64Array(256);
  length = 0;
  push(x: number): void {
    if (this.length === this.data.length) {
      const grown = new Float64Array(2 * this.data.length);
      grown.set(this.data);
      this.data = grown;
    }
    this.data[this.length++] = x;
  }
  /** The value at index i (< length). */
  at(i: number): number {
    return this.data[i]!;
  }
  toFloat64(): Float64Array {
    return this.data.slice(0, this.length);
  }
  toInt32(): Int32Array {
    return Int32Array.from(this.data.subarray(0, this.length));
  }
}

interface Builder {
  readonly turn: Column;
  readonly r: Column;
  readonly z: Column;
  readonly area: Column;
  readonly inverseRadius: Column;
  readonly size: Column;
  readonly polyStart: Column;
  readonly polyR: Column;
  readonly polyZ: Column;
  readonly polyArea: Column;
  readonly gaussStart: Column;
  readonly gaussR: Column;
  readonly gaussZ: Column;
  readonly gaussW: Column;
  readonly coarseR: Column;
  readonly coarseZ: Column;
  readonly coarseW: Column;
  /** local (u, v) centroid of each cell, to find mirror images */
  readonly localU: Column;
  readonly localV: Column;
}

function newBuilder(): Builder {
  const c = (): Column => new Column();
  const b: Builder = {
    turn: c(), r: c(), z: c(), area: c(), inverseRadius: c(), size: c(),
    polyStart: c(), polyR: c(), polyZ: c(), polyArea: c(),
    gaussStart: c(), gaussR: c(), gaussZ: c(), gaussW: c(),
    coarseR: c(), coarseZ: c(), coarseW: c(),
    localU: c(), localV: c(),
  };
  b.polyStart.push(0);
  b.gaussStart.push(0);
  return b;
}

/** Signed area of a polygon (counter-clockwise positive). */
function polygonArea(xs: number[], ys: number[]): number {
  let s = 0;
  const m = xs.length;
  for (let k = 0; k < m; k++) {
    const k1 = (k + 1) % m;
    s += xs[k]! * ys[k1]! - xs[k1]! * ys[k]!;
  }
  return s / 2;
}

/**
 * Adds one annular-sector cell (local radii s1 < s2, angles t1 < t2; s1 = 0 with a full turn of
 * angle: a disc) of turn `turn` centred at (rc, zc).
 */
function addSector(b: Builder, turn: number, rc: number, zc: number, s1: number, s2: number, t1: number, t2: number): void {
  // Gauss points in (s, θ), weight s ds dθ (for the near-field integrals)
  for (let i = 0; i < GAUSS_ORDER; i++) {
    const s = 0.5 * (s1 + s2) + 0.5 * (s2 - s1) * GAUSS.nodes[i]!;
    const ws = 0.5 * (s2 - s1) * GAUSS.weights[i]!;
    for (let k = 0; k < GAUSS_ORDER; k++) {
      const t = 0.5 * (t1 + t2) + 0.5 * (t2 - t1) * GAUSS.nodes[k]!;
      const wt = 0.5 * (t2 - t1) * GAUSS.weights[k]!;
      b.gaussR.push(rc + s * Math.cos(t));
      b.gaussZ.push(zc + s * Math.sin(t));
      b.gaussW.push(ws * wt * s);
    }
  }
  // area, ∫dA/r and centroid by 8-point Gauss in s and in θ pieces of at most π/8
  // (the cells' DC resistances then sum to the ring's exact one within 1e-14)
  let area = 0;
  let inv = 0;
  let mu = 0;
  let mv = 0;
  const pieces = Math.max(1, Math.ceil((t2 - t1) / (Math.PI / 8)));
  const dtp = (t2 - t1) / pieces;
  for (let i = 0; i < 8; i++) {
    const s = 0.5 * (s1 + s2) + 0.5 * (s2 - s1) * FINE.nodes[i]!;
    const ws = 0.5 * (s2 - s1) * FINE.weights[i]!;
    for (let piece = 0; piece < pieces; piece++) {
      const ta = t1 + piece * dtp;
      for (let k = 0; k < 8; k++) {
        const t = ta + 0.5 * dtp * (1 + FINE.nodes[k]!);
        const w = ws * 0.5 * dtp * FINE.weights[k]! * s;
        const u = s * Math.cos(t);
        area += w;
        inv += w / (rc + u);
        mu += w * u;
        mv += w * s * Math.sin(t);
      }
    }
  }
  // exact area and ∫dA/r of the sector would differ from the Gauss sums by < 1e-12 here
  b.gaussStart.push(b.gaussR.length);
  for (let i = 0; i < 2; i++) {
    const s = 0.5 * (s1 + s2) + 0.5 * (s2 - s1) * COARSE.nodes[i]!;
    const ws = 0.5 * (s2 - s1) * COARSE.weights[i]!;
    for (let k = 0; k < 2; k++) {
      const t = 0.5 * (t1 + t2) + 0.5 * (t2 - t1) * COARSE.nodes[k]!;
      const wt = 0.5 * (t2 - t1) * COARSE.weights[k]!;
      b.coarseR.push(rc + s * Math.cos(t));
      b.coarseZ.push(zc + s * Math.sin(t));
      b.coarseW.push(ws * wt * s);
    }
  }
  const cu = mu / area;
  const cv = mv / area;
  b.turn.push(turn);
  b.r.push(rc + cu);
  b.z.push(zc + cv);
  b.area.push(area);
  b.inverseRadius.push(inv);
  b.localU.push(cu);
  b.localV.push(cv);
  const span = t2 - t1;
  const chord = span >= Math.PI ? 2 * s2 : 2 * s2 * Math.sin(span / 2);
  b.size.push(Math.max(s2 - s1, chord, s1 === 0 ? s2 : 0));
  // polygon: outer arc (counter-clockwise), then inner arc back (or the centre)
  // chords of at most 15°, their vertices pushed out by √(φ/sin φ) so that each chord's
  // triangle has the area of its circular sector (polygon area = sector area, centroid within
  // O(φ⁴) of the sector's)
  const m = Math.max(1, Math.ceil(span / Math.min(Math.PI / 12, 2 * Math.sqrt((CHORD_SAG * (s2 - s1)) / s2))));
  const phi = span / m;
  const stretch = Math.sqrt(phi / Math.sin(phi));
  const full = span >= 2 * Math.PI - 1e-12;
  const xs: number[] = [];
  const ys: number[] = [];
  const last = full ? m - 1 : m;
  for (let k = 0; k <= last; k++) {
    const t = t1 + phi * k;
    const s = k === 0 || k === m ? s2 : s2 * stretch;
    xs.push(rc + s * Math.cos(t));
    ys.push(zc + s * Math.sin(t));
  }
  if (!full) {
    if (s1 > 0) {
      for (let k = m; k >= 0; k--) {
        const t = t1 + phi * k;
        const s = k === 0 || k === m ? s1 : s1 * stretch;
        xs.push(rc + s * Math.cos(t));
        ys.push(zc + s * Math.sin(t));
      }
    } else {
      xs.push(rc);
      ys.push(zc);
    }
  }
  if (full && s1 > 0) {
    throw new Error("internal: a full annulus cell is not a simple polygon");
  }
  for (let k = 0; k < xs.length; k++) {
    b.polyR.push(xs[k]!);
    b.polyZ.push(ys[k]!);
  }
  b.polyStart.push(b.polyR.length);
  b.polyArea.push(polygonArea(xs, ys));
}

/** Adds one rectangular cell [u1, u2] × [v1, v2] (local) of turn `turn` centred at (rc, zc). */
function addRectangle(b: Builder, turn: number, rc: number, zc: number, u1: number, u2: number, v1: number, v2: number): void {
  for (let i = 0; i < GAUSS_ORDER; i++) {
    const u = 0.5 * (u1 + u2) + 0.5 * (u2 - u1) * GAUSS.nodes[i]!;
    const wu = 0.5 * (u2 - u1) * GAUSS.weights[i]!;
    for (let k = 0; k < GAUSS_ORDER; k++) {
      const v = 0.5 * (v1 + v2) + 0.5 * (v2 - v1) * GAUSS.nodes[k]!;
      b.gaussR.push(rc + u);
      b.gaussZ.push(zc + v);
      b.gaussW.push(wu * 0.5 * (v2 - v1) * GAUSS.weights[k]!);
    }
  }
  // exact: area, ∫dA/r = h ln(r2/r1), first moment
  const area = (u2 - u1) * (v2 - v1);
  const inv = (v2 - v1) * Math.log((rc + u2) / (rc + u1));
  const mu = 0.5 * (u2 * u2 - u1 * u1) * (v2 - v1);
  b.gaussStart.push(b.gaussR.length);
  for (let i = 0; i < 2; i++) {
    const u = 0.5 * (u1 + u2) + 0.5 * (u2 - u1) * COARSE.nodes[i]!;
    const wu = 0.5 * (u2 - u1) * COARSE.weights[i]!;
    for (let k = 0; k < 2; k++) {
      const v = 0.5 * (v1 + v2) + 0.5 * (v2 - v1) * COARSE.nodes[k]!;
      b.coarseR.push(rc + u);
      b.coarseZ.push(zc + v);
      b.coarseW.push(wu * 0.5 * (v2 - v1) * COARSE.weights[k]!);
    }
  }
  const cu = mu / area;
  const cv = 0.5 * (v1 + v2);
  b.turn.push(turn);
  b.r.push(rc + cu);
  b.z.push(zc + cv);
  b.area.push(area);
  b.inverseRadius.push(inv);
  b.localU.push(cu);
  b.localV.push(cv);
  b.size.push(Math.hypot(u2 - u1, v2 - v1));
  const xs = [rc + u1, rc + u2, rc + u2, rc + u1];
  const ys = [zc + v1, zc + v1, zc + v2, zc + v2];
  for (let k = 0; k < 4; k++) {
    b.polyR.push(xs[k]!);
    b.polyZ.push(ys[k]!);
  }
  b.polyStart.push(b.polyR.length);
  b.polyArea.push(polygonArea(xs, ys));
}

/** Adds the cells of one turn's cross-section. Returns nothing; cells are appended to b. */
function addTurn(b: Builder, turn: number, rc: number, zc: number, section: CrossSection, ctl: CellControls): void {
  if (section.kind === "disc") {
    addSector(b, turn, rc, zc, 0, section.radius, -Math.PI, Math.PI);
    return;
  }
  if (section.kind === "rectangle") {
    const uB = gradedLayers(section.width, ctl.surfaceLayer, ctl.growth, true, Infinity);
    const vB = gradedLayers(section.height, ctl.surfaceLayer, ctl.growth, true, Infinity);
    const u0 = -section.width / 2;
    const v0 = -section.height / 2;
    for (let i = 0; i + 1 < uB.length; i++) {
      for (let k = 0; k + 1 < vB.length; k++) {
        addRectangle(b, turn, rc, zc, u0 + uB[i]!, u0 + uB[i + 1]!, v0 + vB[k]!, v0 + vB[k + 1]!);
      }
    }
    return;
  }
  const { inner, outer } = section;
  const wall = outer - inner;
  // layer boundaries as radii, from the outer surface inwards
  let radii: number[];
  if (inner > 0) {
    const d = gradedLayers(wall, ctl.surfaceLayer, ctl.growth, true, Infinity);
    radii = d.map((x) => outer - x);
  } else {
    const d = gradedLayers(outer, ctl.surfaceLayer, ctl.growth, false, Math.min(ctl.maxDepth, outer));
    radii = d.map((x) => outer - x);
    if (radii[radii.length - 1]! > outer * 1e-9) radii.push(0); // the unmeshed core: one more ring/disc, see below
  }
  // radii descending: outer … inner (or 0)
  for (let k = 0; k + 1 < radii.length; k++) {
    const s2 = radii[k]!;
    const s1 = Math.max(0, radii[k + 1]!);
    const h = s2 - s1;
    const mid = 0.5 * (s1 + s2);
    // sectors: at most ctl.sectors; arcs no longer than ~4 × the layer thickness inside
    let m = Math.min(ctl.sectors, Math.max(1, 2 * Math.round((Math.PI * mid) / (4 * h))));
    if (s1 === 0) m = m >= 4 ? Math.min(m, 4) : 1;
    if (m === 1 && s1 > 0) m = 2; // a full annulus is split in two (cells are simple polygons)
    if (m % 2 === 1) m += 1;
    const dt = (2 * Math.PI) / m;
    for (let q = 0; q < m; q++) {
      // sector boundaries at −π + q·dt: symmetric under θ → −θ (z → −z)
      addSector(b, turn, rc, zc, s1, s2, -Math.PI + q * dt, -Math.PI + (q + 1) * dt);
    }
  }
}

/** A rectangular block of part cells in the r–z plane, split at the given boundaries (absolute r and z). */
export interface PartBlock {
  readonly rBounds: readonly number[];
  readonly zBounds: readonly number[];
}

/**
 * Cells of all turns (the same cross-section for every turn, centres given as arrays), then the
 * cells of an optional conducting part (turn index −1). With `mirrorSymmetric`, every cell's
 * image under z → −z is found (turn t ↔ turn T−1−t); if any is missing, no mirror is recorded.
 */
export function buildCells(
  centresR: readonly number[],
  centresZ: readonly number[],
  section: CrossSection,
  ctl: CellControls,
  mirrorSymmetric: boolean,
  part?: PartBlock,
): CellSet {
  const b = newBuilder();
  const turns = centresR.length;
  const firstCell: number[] = [];
  for (let t = 0; t < turns; t++) {
    firstCell.push(b.r.length);
    addTurn(b, t, centresR[t]!, centresZ[t]!, section, ctl);
  }
  const coilCells = b.r.length;
  if (part !== undefined) addPartBlock(b, part);
  const n = b.r.length;
  const mirror = new Int32Array(n).fill(-1);
  if (mirrorSymmetric) {
    mirrorTurnCells(b, firstCell, coilCells / turns, mirror);
    mirrorPartCells(b, coilCells, mirror);
    if (mirror.some((m) => m < 0)) mirror.fill(-1);
  }
  return cellSetOf(b, turns, mirror);
}

/** The cells of a part block (turn −1). */
function addPartBlock(b: Builder, { rBounds, zBounds }: PartBlock): void {
  for (let i = 0; i + 1 < rBounds.length; i++) {
    for (let k = 0; k + 1 < zBounds.length; k++) {
      addRectangle(b, -1, 0, 0, rBounds[i]!, rBounds[i + 1]!, zBounds[k]!, zBounds[k + 1]!);
    }
  }
}

/** Turn t mirrors to turn T−1−t (its centre at −z); within the turn, the cell with local (u, v) to (u, −v); −1 where none is found. */
function mirrorTurnCells(b: Builder, firstCell: readonly number[], perTurn: number, mirror: Int32Array): void {
  const turns = firstCell.length;
  for (let t = 0; t < turns; t++) {
    const tm = turns - 1 - t;
    for (let i = firstCell[t]!; i < firstCell[t]! + perTurn; i++) {
      const u = b.localU.at(i);
      const v = b.localV.at(i);
      let best = -1;
      let bestD = Infinity;
      for (let j = firstCell[tm]!; j < firstCell[tm]! + perTurn; j++) {
        const d = Math.abs(b.localU.at(j) - u) + Math.abs(b.localV.at(j) + v);
        if (d < bestD) {
          bestD = d;
          best = j;
        }
      }
      mirror[i] = bestD <= 1e-9 * b.size.at(i) ? best : -1;
    }
  }
}

/** The part cells' images under z → −z; −1 where none is found. */
function mirrorPartCells(b: Builder, coilCells: number, mirror: Int32Array): void {
  const n = b.r.length;
  for (let i = coilCells; i < n; i++) {
    let best = -1;
    let bestD = Infinity;
    for (let j = coilCells; j < n; j++) {
      const d = Math.abs(b.r.at(j) - b.r.at(i)) + Math.abs(b.z.at(j) + b.z.at(i));
      if (d < bestD) {
        bestD = d;
        best = j;
      }
    }
    mirror[i] = bestD <= 1e-9 * b.size.at(i) ? best : -1;
  }
}

function cellSetOf(b: Builder, turns: number, mirror: Int32Array): CellSet {
  return {
    n: b.r.length,
    turns,
    turn: b.turn.toInt32(),
    r: b.r.toFloat64(),
    z: b.z.toFloat64(),
    area: b.area.toFloat64(),
    inverseRadius: b.inverseRadius.toFloat64(),
    size: b.size.toFloat64(),
    mirror,
    polyStart: b.polyStart.toInt32(),
    polyR: b.polyR.toFloat64(),
    polyZ: b.polyZ.toFloat64(),
    polyArea: b.polyArea.toFloat64(),
    gaussStart: b.gaussStart.toInt32(),
    gaussR: b.gaussR.toFloat64(),
    gaussZ: b.gaussZ.toFloat64(),
    gaussW: b.gaussW.toFloat64(),
    coarseR: b.coarseR.toFloat64(),
    coarseZ: b.coarseZ.toFloat64(),
    coarseW: b.coarseW.toFloat64(),
  };
}

/**
 * $\int_P \ln|x - p|\,dA$ over the polygon of cell j (vertices counter-clockwise) at the point
 * p = (pr, pz), by the divergence theorem: $\ln|u| = \nabla\cdot(u(\ln|u| - 1/2)/2)$, and on a
 * straight edge $u\cdot n = h$ is constant, with
 * $\int \ln\sqrt{h^2 + t^2}\,dt = t\ln\sqrt{h^2+t^2} - t + h\arctan(t/h)$.
 */
export function polygonLogPotential(cells: CellSet, j: number, pr: number, pz: number): number {
  const start = cells.polyStart[j]!;
  const end = cells.polyStart[j + 1]!;
  const xs = cells.polyR;
  const ys = cells.polyZ;
  // per edge A→B (unit direction e, length ℓ, h = (A − p)×e, t = (· − p)·e):
  // (h/2) [ (t_B ln|B − p| − t_A ln|A − p|) + |h| ∠(A, B) − (3/2) ℓ ],
  // the angle ∠ = atan2(|h| ℓ, h² + t_A t_B) that AB subtends at p; one logarithm per vertex
  let ax = xs[start]! - pr;
  let ay = ys[start]! - pz;
  const qa = ax * ax + ay * ay;
  let la = qa > 0 ? 0.5 * Math.log(qa) : 0;
  const lFirst = la;
  const axFirst = ax;
  const ayFirst = ay;
  let sum = 0;
  for (let k = start; k < end; k++) {
    let bx: number;
    let by: number;
    let lb: number;
    if (k + 1 < end) {
      bx = xs[k + 1]! - pr;
      by = ys[k + 1]! - pz;
      const qb = bx * bx + by * by;
      lb = qb > 0 ? 0.5 * Math.log(qb) : 0;
    } else {
      bx = axFirst;
      by = ayFirst;
      lb = lFirst;
    }
    const ex = bx - ax;
    const ey = by - ay;
    const len = Math.sqrt(ex * ex + ey * ey);
    if (len > 0) {
      const tx = ex / len;
      const ty = ey / len;
      // outward normal of a counter-clockwise polygon: (ty, −tx)
      const h = ax * ty - ay * tx;
      const t1 = ax * tx + ay * ty;
      const t2 = bx * tx + by * ty;
      const ah = Math.abs(h);
      sum += (h / 2) * (t2 * lb - t1 * la + ah * Math.atan2(ah * len, h * h + t1 * t2) - 1.5 * len);
    }
    ax = bx;
    ay = by;
    la = lb;
  }
  return sum;
}

/** Mean of ln|x − y| for x in cell i, y in cell j: $\ln g_{ij}$. */
export function logMeanDistance(cells: CellSet, i: number, j: number): number {
  let s = 0;
  let w = 0;
  for (let p = cells.gaussStart[i]!; p < cells.gaussStart[i + 1]!; p++) {
    const wp = cells.gaussW[p]!;
    s += wp * polygonLogPotential(cells, j, cells.gaussR[p]!, cells.gaussZ[p]!);
    w += wp;
  }
  return s / (w * cells.polyArea[j]!);
}

/** Mean of ln|x − y| by 2×2 Gauss points in each cell (cells at least half their sizes apart). */
function logMeanDistanceCoarse(cells: CellSet, i: number, j: number): number {
  let s = 0;
  const { coarseR, coarseZ, coarseW } = cells;
  for (let p = 4 * i; p < 4 * i + 4; p++) {
    const pr = coarseR[p]!;
    const pz = coarseZ[p]!;
    let inner = 0;
    for (let q = 4 * j; q < 4 * j + 4; q++) {
      const dr = pr - coarseR[q]!;
      const dz = pz - coarseZ[q]!;
      inner += coarseW[q]! * Math.log(dr * dr + dz * dz);
    }
    s += coarseW[p]! * inner;
  }
  return (0.5 * s) / (cells.area[i]! * cells.area[j]!);
}

/** Near-field threshold: cells closer than this many times the mean of their sizes get the GMD correction. */
const NEAR = 3;

/**
 * Partial inductance matrix of the cells [H], row-major n×n, symmetric. Cost: n²/2 Maxwell
 * kernels plus 16 polygon potentials per near pair.
 */
export function cellInductanceMatrix(cells: CellSet): Float64Array {
  const n = cells.n;
  const L = new Float64Array(n * n);
  const { r, z, size } = cells;
  for (let i = 0; i < n; i++) {
    const ri = r[i]!;
    const zi = z[i]!;
    const lnG = logMeanDistance(cells, i, i);
    L[i * n + i] = MU_0 * ri * (Math.log(8 * ri) - lnG - 2);
    for (let j = i + 1; j < n; j++) {
      const rj = r[j]!;
      const dz = zi - z[j]!;
      let m = maxwellOverMu0(ri, rj, Math.abs(dz));
      const dr = ri - rj;
      const d = Math.sqrt(dr * dr + dz * dz);
      const reach = size[i]! + size[j]!;
      if (d < 0.5 * NEAR * reach) {
        // overlapping bounding circles: exact polygon potential; else 2×2 Gauss point pairs
        // (measured: the same resistance within 1e-4 as 4×4 pairs)
        const g = d < 0.75 * reach ? logMeanDistance(cells, i, j) : logMeanDistanceCoarse(cells, i, j);
        m += Math.sqrt(ri * rj) * (Math.log(d) - g);
      }
      const v = MU_0 * m;
      L[i * n + j] = v;
      L[j * n + i] = v;
    }
  }
  return L;
}
