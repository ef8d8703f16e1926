/**
 * Mesh of the r–z half-plane for the axisymmetric field solver: a graded tensor-product grid
 * whose lines pass through every rectangle edge and every circle's bounding square, mapped
 * near each circle so that the square rings of grid nodes become circles (an O-grid blended
 * back to the square grid at the edge of the circle's block), then split into quadratic
 * (six-node, isoparametric) triangles. Internal to `fluxwright/field`.
 *
 * @packageDocumentation
 */

/** A body of the problem as the mesher sees it. */
export type MeshShape =
  | { readonly kind: "rectangle"; readonly rMin: number; readonly rMax: number; readonly zMin: number; readonly zMax: number }
  | { readonly kind: "circle"; readonly r: number; readonly z: number; readonly radius: number; readonly innerRadius: number };

/** One body with its mesh sizes: `surfaceSize` at its boundary, `interiorSize` inside. */
export interface MeshBody {
  readonly shape: MeshShape;
  /** Element size wanted at the body's boundary [m] (skin depth and geometry). */
  readonly surfaceSize: number;
  /** Sizes along a rectangle's edges rMin, rMax, zMin, zMax [m] (default `surfaceSize` on each). */
  readonly edgeSizes?: readonly [number, number, number, number] | undefined;
}

/** A circle's block: the square around it in which grid nodes are moved. */
interface Block {
  readonly cr: number;
  readonly cz: number;
  readonly a: number;
  readonly ai: number;
  readonly s: number;
}

/** The mapped lattice of quadratic-triangle nodes. */
export interface LatticeMesh {
  /** r of the cell lines (parametric). */
  readonly rLines: Float64Array;
  /** z of the cell lines (parametric). */
  readonly zLines: Float64Array;
  /** Lattice points along r (2·cells + 1) and z. */
  readonly ni: number;
  readonly nj: number;
  /** Physical coordinates of lattice point (i, j) at index i·nj + j. */
  readonly r: Float64Array;
  readonly z: Float64Array;
  /** Body index of each cell (ci·cellsZ + cj), −1 for air. */
  readonly cellBody: Int32Array;
  /** Triangles: 6 lattice indices each (3 vertices, then midsides 12, 23, 31). */
  readonly triangles: Int32Array;
  /** Cell of each triangle. */
  readonly triangleCell: Int32Array;
  readonly blocks: readonly Block[];
}

/** One wanted grid line: a position, the element size wanted there, protected if it must be kept exactly. */
interface Mark {
  readonly x: number;
  readonly h: number;
  readonly keep: boolean;
}

/**
 * Grid lines along one direction: every kept mark is a line; between kept lines, lines are
 * spaced by the size function $h(x) = \min_k\,[h_k + (g-1)|x - x_k|]$ (geometric grading at
 * rate g away from every mark).
 */
export function gradedLines(marks: readonly Mark[], growth: number, lo: number, hi: number): Float64Array {
  const g1 = growth - 1;
  const size = (x: number): number => {
    let h = Infinity;
    for (const m of marks) {
      const v = m.h + g1 * Math.abs(x - m.x);
      if (v < h) h = v;
    }
    return h;
  };
  const kept = marks
    .filter((m) => m.keep && m.x >= lo && m.x <= hi)
    .map((m) => m.x)
    .concat([lo, hi])
    .sort((a, b) => a - b);
  const fixed: number[] = [];
  for (const x of kept) {
    if (fixed.length === 0 || x - fixed[fixed.length - 1]! > 1e-12 * Math.max(1, Math.abs(x))) fixed.push(x);
  }
  const out: number[] = [fixed[0]!];
  const xs: number[] = [];
  const phi: number[] = [];
  for (let k = 0; k + 1 < fixed.length; k++) {
    const a = fixed[k]!;
    const b = fixed[k + 1]!;
    // integrate 1/h by marching with steps of h/8 (the size changes by ≤ (g−1)/8 per step)
    xs.length = 0;
    phi.length = 0;
    let x = a;
    let acc = 0;
    xs.push(a);
    phi.push(0);
    while (x < b) {
      const h0 = size(x);
      const step = Math.min(h0 / 8, b - x);
      const hm = size(x + step / 2);
      acc += step / hm;
      x += step;
      if (b - x < 1e-9 * step) x = b;
      xs.push(x);
      phi.push(acc);
    }
    const n = Math.max(1, Math.round(acc));
    let q = 0;
    for (let m = 1; m < n; m++) {
      const target = (acc * m) / n;
      while (phi[q + 1]! < target) q++;
      const t = (target - phi[q]!) / (phi[q + 1]! - phi[q]!);
      out.push(xs[q]! + t * (xs[q + 1]! - xs[q]!));
    }
    out.push(b);
  }
  return Float64Array.from(out);
}

/** Parametric → physical position inside a circle's block (identity outside every block). */
function mapPoint(blocks: readonly Block[], x: number, y: number, out: Float64Array): void {
  out[0] = x;
  out[1] = y;
  for (const b of blocks) {
    const dx = x - b.cr;
    const dy = y - b.cz;
    const rho = Math.max(Math.abs(dx), Math.abs(dy));
    if (rho >= b.s) continue;
    const len = Math.hypot(dx, dy);
    if (len === 0) return;
    const w = blendWeight(b, rho);
    const f = 1 - w + (w * rho) / len;
    out[0] = b.cr + dx * f;
    out[1] = b.cz + dy * f;
    return;
  }
}

/** Weight of the circular shape at square radius rho: 1 on and between the circles, 0 at the block edge. */
function blendWeight(b: Block, rho: number): number {
  if (rho >= b.a) return (b.s - rho) / (b.s - b.a);
  if (rho >= b.ai && b.ai > 0) return 1;
  const inner = b.ai > 0 ? b.ai : b.a;
  return rho / inner;
}

/** Physical → parametric position (inverse of the block map; bisection along the ray). */
export function unmapPoint(mesh: LatticeMesh, r: number, z: number, out: Float64Array): void {
  out[0] = r;
  out[1] = z;
  for (const b of mesh.blocks) {
    const dx = r - b.cr;
    const dy = z - b.cz;
    if (Math.max(Math.abs(dx), Math.abs(dy)) >= b.s) continue;
    const len = Math.hypot(dx, dy);
    if (len === 0) return;
    const c = Math.max(Math.abs(dx), Math.abs(dy)) / len;
    // |p'| = rho·[(1 − w)/c + w], increasing in rho
    let lo = 0;
    let hi = b.s;
    for (let it = 0; it < 64; it++) {
      const mid = 0.5 * (lo + hi);
      const w = blendWeight(b, mid);
      if (mid * ((1 - w) / c + w) < len) lo = mid;
      else hi = mid;
    }
    const rho = 0.5 * (lo + hi);
    const scale = rho / c / len;
    out[0] = b.cr + dx * scale;
    out[1] = b.cz + dy * scale;
    return;
  }
}

/**
 * Builds the mesh. `density` scales every size (sizes ∝ 1/density), `growth` is the grading
 * rate; the box [0, rOuter] × [zLow, zHigh] has A = 0 on its outer sides.
 */
export function buildLatticeMesh(
  bodies: readonly MeshBody[],
  blockHalfSizes: readonly number[],
  growth: number,
  box: { rOuter: number; zLow: number; zHigh: number; farSize: number; density: number },
): LatticeMesh {
  const rMarks: Mark[] = [];
  const zMarks: Mark[] = [];
  const blocks: Block[] = [];
  rMarks.push({ x: 0, h: Infinity, keep: true });
  rMarks.push({ x: box.rOuter, h: box.farSize, keep: true });
  zMarks.push({ x: box.zLow, h: box.farSize, keep: true });
  zMarks.push({ x: box.zHigh, h: box.farSize, keep: true });
  bodies.forEach((body, k) => {
    const s = body.shape;
    const h = body.surfaceSize;
    if (s.kind === "rectangle") {
      const e = body.edgeSizes ?? [h, h, h, h];
      rMarks.push({ x: s.rMin, h: s.rMin > 0 ? e[0] : Infinity, keep: true }, { x: s.rMax, h: e[1], keep: true });
      zMarks.push({ x: s.zMin, h: e[2], keep: true }, { x: s.zMax, h: e[3], keep: true });
    } else {
      const a = s.radius;
      const ai = s.innerRadius;
      const d = box.density;
      const tangential = Math.min(h, a / 3 / d);
      for (const off of [-a, a]) {
        rMarks.push({ x: s.r + off, h: tangential, keep: true });
        zMarks.push({ x: s.z + off, h: tangential, keep: true });
      }
      if (ai > 0) {
        const hi = Math.min(h, ai / 2 / d);
        for (const off of [-ai, ai]) {
          rMarks.push({ x: s.r + off, h: hi, keep: true });
          zMarks.push({ x: s.z + off, h: hi, keep: true });
        }
      }
      rMarks.push({ x: s.r, h: a / 2.5 / d, keep: false });
      zMarks.push({ x: s.z, h: a / 2.5 / d, keep: false });
      blocks.push({ cr: s.r, cz: s.z, a, ai, s: blockHalfSizes[k]! });
    }
  });
  const rLines = gradedLines(rMarks, growth, 0, box.rOuter);
  const zLines = gradedLines(zMarks, growth, box.zLow, box.zHigh);
  const cr = rLines.length - 1;
  const cz = zLines.length - 1;
  const ni = 2 * cr + 1;
  const nj = 2 * cz + 1;
  const r = new Float64Array(ni * nj);
  const z = new Float64Array(ni * nj);
  const tmp = new Float64Array(2);
  for (let i = 0; i < ni; i++) {
    const x = i % 2 === 0 ? rLines[i / 2]! : 0.5 * (rLines[(i - 1) / 2]! + rLines[(i + 1) / 2]!);
    for (let j = 0; j < nj; j++) {
      const y = j % 2 === 0 ? zLines[j / 2]! : 0.5 * (zLines[(j - 1) / 2]! + zLines[(j + 1) / 2]!);
      mapPoint(blocks, x, y, tmp);
      r[i * nj + j] = tmp[0]!;
      z[i * nj + j] = tmp[1]!;
    }
  }
  // classify cells by their parametric centre
  const cellBody = new Int32Array(cr * cz).fill(-1);
  for (let ci = 0; ci < cr; ci++) {
    const x = 0.5 * (rLines[ci]! + rLines[ci + 1]!);
    for (let cj = 0; cj < cz; cj++) {
      const y = 0.5 * (zLines[cj]! + zLines[cj + 1]!);
      for (let k = 0; k < bodies.length; k++) {
        const s = bodies[k]!.shape;
        let inside: boolean;
        if (s.kind === "rectangle") inside = x > s.rMin && x < s.rMax && y > s.zMin && y < s.zMax;
        else {
          const rho = Math.max(Math.abs(x - s.r), Math.abs(y - s.z));
          inside = rho < s.radius && rho > s.innerRadius;
        }
        if (inside) {
          cellBody[ci * cz + cj] = k;
          break;
        }
      }
    }
  }
  // split each cell along the diagonal that gives the larger smallest angle
  const triangles = new Int32Array(cr * cz * 2 * 6);
  const triangleCell = new Int32Array(cr * cz * 2);
  let t = 0;
  for (let ci = 0; ci < cr; ci++) {
    for (let cj = 0; cj < cz; cj++) {
      const I = 2 * ci;
      const J = 2 * cj;
      const A = I * nj + J;
      const B = (I + 2) * nj + J;
      const C = (I + 2) * nj + J + 2;
      const D = I * nj + J + 2;
      const mAB = (I + 1) * nj + J;
      const mBC = (I + 2) * nj + J + 1;
      const mCD = (I + 1) * nj + J + 2;
      const mDA = I * nj + J + 1;
      const mid = (I + 1) * nj + J + 1;
      const qAC = Math.min(minAngle(r, z, A, B, C), minAngle(r, z, A, C, D));
      const qBD = Math.min(minAngle(r, z, A, B, D), minAngle(r, z, B, C, D));
      const cell = ci * cz + cj;
      const put = (p: number, q: number, s: number, pq: number, qs: number, sp: number): void => {
        const o = t * 6;
        triangles[o] = p;
        triangles[o + 1] = q;
        triangles[o + 2] = s;
        triangles[o + 3] = pq;
        triangles[o + 4] = qs;
        triangles[o + 5] = sp;
        triangleCell[t] = cell;
        t++;
      };
      if (qAC >= qBD) {
        put(A, B, C, mAB, mBC, mid);
        put(A, C, D, mid, mCD, mDA);
      } else {
        put(A, B, D, mAB, mid, mDA);
        put(B, C, D, mBC, mCD, mid);
      }
    }
  }
  return { rLines, zLines, ni, nj, r, z, cellBody, triangles, triangleCell, blocks };
}

/** Smallest sine of the interior angles of the straight triangle p, q, s (0 when degenerate, small for angles near 0 or π). */
function minAngle(r: Float64Array, z: Float64Array, p: number, q: number, s: number): number {
  const ax = r[q]! - r[p]!;
  const ay = z[q]! - z[p]!;
  const bx = r[s]! - r[q]!;
  const by = z[s]! - z[q]!;
  const cx = r[p]! - r[s]!;
  const cy = z[p]! - z[s]!;
  const la = Math.hypot(ax, ay);
  const lb = Math.hypot(bx, by);
  const lc = Math.hypot(cx, cy);
  const area2 = Math.abs(ax * by - ay * bx);
  if (area2 === 0) return 0;
  // sin of each angle = 2·area / (product of adjacent sides)
  const sp = area2 / (la * lc);
  const sq = area2 / (la * lb);
  const ss = area2 / (lb * lc);
  return Math.min(sp, sq, ss);
}
