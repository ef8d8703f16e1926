/**
 * Meshing and assembly of the field solver: the mesh of a problem at a given density (element
 * sizes from the skin depth and the geometry) and the finite-element system of the
 * time-harmonic $A_\varphi$ equation on it, $K = S + j\omega M$ in compressed columns with the
 * per-body source and constraint vectors. Internal.
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";
import { latticeNestedDissection } from "../special/index.js";
import { buildLatticeMesh } from "./mesh.js";
import type { LatticeMesh } from "./mesh.js";
import { NQ, QN, elementPoints, newPoints } from "./quadratic-triangle.js";
import type { AssembledSystem, Discretisation, SolverBody, SolverProblem } from "./solver-types.js";


/** Exponent of the edge-size growth with distance from the coils (see {@link regionEdgeSizes}). */
const EDGE_DISTANCE_POWER = 1.5;

/**
 * Element sizes wanted along the four edges (rMin, rMax, zMin, zMax) of a conducting region's
 * rectangle: the skin-depth size `h` where a coil is near, growing as $(D/S)^{1.5}$ with the
 * distance D of the edge from the nearest coil (S: that coil's size), capped by the geometric
 * size. Far from every coil the field, and the power an under-resolved skin layer would
 * misplace, fall as $(S/D)^6$ in air; the error of quadratic elements grows as $(h/\delta)^4$,
 * so this size keeps a far edge's share of the error no larger than a near one's. Undefined
 * (one size everywhere) for coil turns and non-conducting regions.
 */
function regionEdgeSizes(problem: SolverProblem, b: SolverBody, h: number, hGeom: number): [number, number, number, number] | undefined {
  const s = b.shape;
  if (b.role !== "region" || b.sigma === 0 || s.kind !== "rectangle") return undefined;
  const coilBoxes: [number, number, number, number][] = [];
  for (const c of problem.bodies) {
    if (c.role === "region") continue;
    const cs = c.shape;
    const bx: [number, number, number, number] =
      cs.kind === "rectangle" ? [cs.rMin, cs.rMax, cs.zMin, cs.zMax] : [cs.r - cs.radius, cs.r + cs.radius, cs.z - cs.radius, cs.z + cs.radius];
    const k = c.owner;
    const cur = coilBoxes[k];
    coilBoxes[k] = cur ? [Math.min(cur[0], bx[0]), Math.max(cur[1], bx[1]), Math.min(cur[2], bx[2]), Math.max(cur[3], bx[3])] : bx;
  }
  // edges as segments [r0, r1, z0, z1]
  const edges: [number, number, number, number][] = [
    [s.rMin, s.rMin, s.zMin, s.zMax],
    [s.rMax, s.rMax, s.zMin, s.zMax],
    [s.rMin, s.rMax, s.zMin, s.zMin],
    [s.rMin, s.rMax, s.zMax, s.zMax],
  ];
  const out: [number, number, number, number] = [h, h, h, h];
  edges.forEach((e, k) => {
    let factor = Infinity;
    for (const c of coilBoxes) {
      if (!c) continue;
      const dr = Math.max(0, c[0] - e[1], e[0] - c[1]);
      const dz = Math.max(0, c[2] - e[3], e[2] - c[3]);
      const dist = Math.hypot(dr, dz);
      const size = Math.max(c[1] - c[0], c[3] - c[2]);
      factor = Math.min(factor, Math.max(1, Math.pow(dist / size, EDGE_DISTANCE_POWER)));
    }
    if (Number.isFinite(factor)) out[k] = Math.max(h, Math.min(h * factor, hGeom));
  });
  return out;
}

/** The mesh of the problem at the given density (the same on every call). */
export function meshFor(problem: SolverProblem, disc: Discretisation): LatticeMesh {
  const omega = 2 * Math.PI * problem.frequency;
  const d = disc.density;
  const bodies = problem.bodies;
  const growth = 1 + 0.45 / d;
  // Mesh sizes: skin depth and geometry of each body.
  const meshBodies = bodies.map((b) => {
    const s = b.shape;
    const dim = s.kind === "rectangle" ? Math.min(s.rMax - s.rMin, s.zMax - s.zMin) : s.innerRadius > 0 ? s.radius - s.innerRadius : s.radius;
    let h = dim / (3 * d);
    if (b.sigma > 0) {
      const delta = Math.sqrt(2 / (omega * MU_0 * b.mur * b.sigma));
      h = Math.min(h, (0.5 * delta) / d);
    }
    return { shape: s, surfaceSize: h, edgeSizes: regionEdgeSizes(problem, b, h, dim / (3 * d)) };
  });
  const ext = problem.extent;
  const size = Math.max(ext.rMax, ext.zMax - ext.zMin);
  const far = 12 * size * Math.max(1, d);
  const zc = 0.5 * (ext.zMin + ext.zMax);
  const mesh = buildLatticeMesh(meshBodies, problem.blockHalfSizes, growth, {
    rOuter: ext.rMax + far,
    zLow: zc - 0.5 * (ext.zMax - ext.zMin) - far,
    zHigh: zc + 0.5 * (ext.zMax - ext.zMin) + far,
    farSize: far / 3,
    density: d,
  });
  return mesh;
}
/**
 * Meshes the problem at the given density and assembles the finite-element system.
 * `reluctivity`, when given, holds the relative reluctivity $\nu_r = 1/\mu_r$ of each triangle
 * (the mesh of a density is the same on every call, so triangle numbers carry over).
 */
export function assembleSystem(problem: SolverProblem, disc: Discretisation, reluctivity?: Float64Array): AssembledSystem {
  const omega = 2 * Math.PI * problem.frequency;
  const mesh = meshFor(problem, disc);
  const { ni, nj } = mesh;
  // unknown numbering: A = 0 on the axis and the outer box
  const unknownOf = new Int32Array(ni * nj).fill(-1);
  let n = 0;
  for (let i = 1; i < ni - 1; i++) for (let j = 1; j < nj - 1; j++) unknownOf[i * nj + j] = n++;
  const colCount = columnStarts(mesh, unknownOf, n);
  const elements = integrateElements(problem, mesh, omega, unknownOf, colCount, reluctivity);
  const { Ap, Ai, Axr, Axi } = compressColumns(colCount, n, elements);
  const order = latticeNestedDissection({ columns: ni, rows: nj, step: 2, unknownOf });
  const { bodyVec, bodyConductance, bodyArea, bodyRArea } = elements;
  return { mesh, omega, unknownOf, size: n, columnStarts: Ap, rowIndices: Ai, re: Axr, im: Axi, ordering: order, bodyVec, bodyConductance, bodyArea, bodyRArea };
}

/** Start of each column's triplets (length n + 1): every element adds a full 6 × 6 block over its unknowns. */
function columnStarts(mesh: LatticeMesh, unknownOf: Int32Array, n: number): Int32Array {
  const { triangles, triangleCell } = mesh;
  const nTri = triangleCell.length;
  const colCount = new Int32Array(n + 1);
  for (let t = 0; t < nTri; t++) {
    for (let a = 0; a < 6; a++) {
      const ua = unknownOf[triangles[t * 6 + a]!]!;
      if (ua < 0) continue;
      for (let b = 0; b < 6; b++) if (unknownOf[triangles[t * 6 + b]!]! >= 0) colCount[ua + 1]!++;
    }
  }
  for (let k = 0; k < n; k++) colCount[k + 1] = colCount[k + 1]! + colCount[k]!;
  return colCount;
}

/** The element contributions as triplets per column (rows unsorted, duplicates not summed) and the per-body integrals. */
interface ElementIntegrals {
  readonly tRow: Int32Array;
  readonly tRe: Float64Array;
  readonly tIm: Float64Array;
  /** c_k = ∫σN (solid), s_b = ∫ r N (stranded), over the lattice; null for regions. */
  readonly bodyVec: (Float64Array | null)[];
  /** ∫σ/r dS (solid). */
  readonly bodyConductance: Float64Array;
  readonly bodyArea: Float64Array;
  /** ∫ r dS. */
  readonly bodyRArea: Float64Array;
}

/**
 * Integrates every element: $K = S + j\omega M$ with $S_{ab} = \int\nu\,(B_{r,a}B_{r,b} + B_{z,a}B_{z,b})\,r\,dS$
 * and $M_{ab} = \int\sigma N_aN_b\,r\,dS$, written as triplets into the column slots of
 * `colCount`, and the source and solid-turn vectors of each body.
 */
function integrateElements(
  problem: SolverProblem,
  mesh: LatticeMesh,
  omega: number,
  unknownOf: Int32Array,
  colCount: Int32Array,
  reluctivity: Float64Array | undefined,
): ElementIntegrals {
  const bodies = problem.bodies;
  const { triangles, triangleCell, cellBody } = mesh;
  const nLat = unknownOf.length;
  const nTri = triangleCell.length;
  const n = colCount.length - 1;
  // material of each triangle
  const triBody = new Int32Array(nTri);
  for (let t = 0; t < nTri; t++) triBody[t] = cellBody[triangleCell[t]!]!;
  const nb = bodies.length;
  const P = newPoints();
  const kRe = new Float64Array(36);
  const kIm = new Float64Array(36);
  const gR = new Float64Array(6);
  const gZ = new Float64Array(6);
  const fill = colCount.slice(0, n);
  const total = colCount[n]!;
  const tRow = new Int32Array(total);
  const tRe = new Float64Array(total);
  const tIm = new Float64Array(total);
  // per-body vectors over the lattice: c_k = ∫σN (solid), s_b = ∫ r N (stranded), and scalars
  const bodyVec: (Float64Array | null)[] = bodies.map((b) => (b.role === "region" ? null : new Float64Array(nLat)));
  const bodyConductance = new Float64Array(nb); // ∫σ/r dS (solid)
  const bodyArea = new Float64Array(nb);
  const bodyRArea = new Float64Array(nb); // ∫ r dS
  for (let t = 0; t < nTri; t++) {
    elementPoints(mesh, t, P);
    const bi = triBody[t]!;
    const body = bi >= 0 ? bodies[bi]! : null;
    const nu = reluctivity ? reluctivity[t]! / MU_0 : 1 / (MU_0 * (body ? body.mur : 1));
    const sig = body ? body.sigma : 0;
    kRe.fill(0);
    kIm.fill(0);
    for (let q = 0; q < NQ; q++) {
      const r = P.r[q]!;
      const w = P.w[q]!;
      const N = QN[q]!;
      const invR = 1 / r;
      // B of each shape function: B_r = −∂N/∂z, B_z = ∂N/∂r + N/r
      for (let a = 0; a < 6; a++) {
        gR[a] = -P.nz[q * 6 + a]!;
        gZ[a] = P.nr[q * 6 + a]! + N[a]! * invR;
      }
      const ks = w * nu * r;
      const km = w * omega * sig * r;
      for (let a = 0; a < 6; a++) {
        const bra = gR[a]!;
        const bza = gZ[a]!;
        const o = a * 6;
        for (let b = a; b < 6; b++) kRe[o + b] = kRe[o + b]! + ks * (bra * gR[b]! + bza * gZ[b]!);
        if (km > 0) {
          const na = km * N[a]!;
          for (let b = a; b < 6; b++) kIm[o + b] = kIm[o + b]! + na * N[b]!;
        }
      }
      if (body) {
        bodyArea[bi] = bodyArea[bi]! + w;
        bodyRArea[bi] = bodyRArea[bi]! + w * r;
        if (body.role === "solid") bodyConductance[bi] = bodyConductance[bi]! + (w * sig) / r;
        const vec = bodyVec[bi];
        if (vec) {
          for (let a = 0; a < 6; a++) {
            const node = triangles[t * 6 + a]!;
            vec[node] = vec[node]! + (body.role === "solid" ? w * sig * N[a]! : w * r * N[a]!);
          }
        }
      }
    }
    for (let a = 0; a < 6; a++) {
      for (let b = 0; b < a; b++) {
        kRe[a * 6 + b] = kRe[b * 6 + a]!;
        kIm[a * 6 + b] = kIm[b * 6 + a]!;
      }
    }
    for (let a = 0; a < 6; a++) {
      const ua = unknownOf[triangles[t * 6 + a]!]!;
      if (ua < 0) continue;
      for (let b = 0; b < 6; b++) {
        const ub = unknownOf[triangles[t * 6 + b]!]!;
        if (ub < 0) continue;
        const p = fill[ub]!++;
        tRow[p] = ua;
        tRe[p] = kRe[a * 6 + b]!;
        tIm[p] = kIm[a * 6 + b]!;
      }
    }
  }
  return { tRow, tRe, tIm, bodyVec, bodyConductance, bodyArea, bodyRArea };
}

/** Compressed columns of the triplets: rows in order of first appearance in each column, duplicates summed. */
function compressColumns(
  colCount: Int32Array,
  n: number,
  elements: ElementIntegrals,
): { Ap: Int32Array; Ai: Int32Array; Axr: Float64Array; Axi: Float64Array } {
  const { tRow, tRe, tIm } = elements;
  const total = colCount[n]!;
  // compress: sort rows in each column and sum duplicates
  const Ap = new Int32Array(n + 1);
  const Ai = new Int32Array(total);
  const Axr = new Float64Array(total);
  const Axi = new Float64Array(total);
  let nz = 0;
  const mark = new Int32Array(n).fill(-1);
  for (let col = 0; col < n; col++) {
    const start = nz;
    for (let p = colCount[col]!; p < colCount[col + 1]!; p++) {
      const row = tRow[p]!;
      const at = mark[row]!;
      if (at >= start) {
        Axr[at] = Axr[at]! + tRe[p]!;
        Axi[at] = Axi[at]! + tIm[p]!;
      } else {
        mark[row] = nz;
        Ai[nz] = row;
        Axr[nz] = tRe[p]!;
        Axi[nz] = tIm[p]!;
        nz++;
      }
    }
    Ap[col + 1] = nz;
  }
  return { Ap, Ai, Axr, Axi };
}
