/**
 * The finite-element core of `fluxwright/field`: assembly of the time-harmonic $A_\varphi$
 * equation on quadratic isoparametric triangles, the solid-turn constraints by a Schur
 * complement, and evaluation of fields and losses. Internal.
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";
import { factorComplexSymmetric, latticeNestedDissection } from "../special/index.js";
import { buildLatticeMesh, unmapPoint } from "./mesh.js";
import type { LatticeMesh, MeshShape } from "./mesh.js";
import type { EffectiveCurve } from "./effective-curve.js";

/** A body of the discrete problem. */
export interface SolverBody {
  readonly shape: MeshShape;
  /** Conductivity used for eddy currents [S/m] (0: none; stranded blocks are 0). */
  readonly sigma: number;
  /** Relative permeability. */
  readonly mur: number;
  /** What it is. */
  readonly role: "region" | "solid" | "stranded";
  /** Coil index (turns) or region index. */
  readonly owner: number;
  /** Turns in a stranded block (1 for a solid turn or a stranded single turn). */
  readonly count: number;
  /** Resistivity of a stranded block's conductor [Ω·m] (for its DC resistance). */
  readonly resistivity: number;
  /** Saturating material: its effective curve (then `mur` is the value the mesh is sized for). */
  readonly curve?: EffectiveCurve;
}

/** The discrete problem. */
export interface SolverProblem {
  readonly frequency: number;
  readonly bodies: readonly SolverBody[];
  readonly coilCount: number;
  readonly regionCount: number;
  readonly blockHalfSizes: readonly number[];
  /** Bounding box of all bodies. */
  readonly extent: { rMax: number; zMin: number; zMax: number };
}

/** Mesh-size parameters of one solve. */
export interface Discretisation {
  readonly density: number;
}

/** One solution: the impedance matrix and what is needed to evaluate fields. */
export interface SolverSolution {
  readonly mesh: LatticeMesh;
  /** Impedance matrix, coil-major: Z[c·n + d] = voltage on coil c per ampere in coil d. */
  readonly zRe: Float64Array;
  readonly zIm: Float64Array;
  /** DC resistance of each coil's stranded part [Ω]. */
  readonly strandedResistance: Float64Array;
  /** Vector potential per unit current of each coil (lattice-sized, coil-major). */
  readonly aRe: Float64Array[];
  readonly aIm: Float64Array[];
  /** Φ = V/(2π) of each solid body per unit current of each coil (body-indexed). */
  readonly phiRe: Float64Array[];
  readonly phiIm: Float64Array[];
  /** Uniform current density per ampere of each stranded body [A/m² per A] (body-indexed, 0 else). */
  readonly strandDensity: Float64Array;
  readonly omega: number;
  readonly nodes: number;
  readonly elements: number;
}

// 7-point degree-5 rule on the reference triangle (Dunavant 1985), weights summing to 1.
const QA = [1 / 3, 0.059715871789770, 0.470142064105115, 0.470142064105115, 0.797426985353087, 0.101286507323456, 0.101286507323456];
const QB = [1 / 3, 0.470142064105115, 0.059715871789770, 0.470142064105115, 0.101286507323456, 0.797426985353087, 0.101286507323456];
const QW = [0.225, 0.132394152788506, 0.132394152788506, 0.132394152788506, 0.125939180544827, 0.125939180544827, 0.125939180544827];
const NQ = 7;

/** Shape functions of the six-node triangle and their derivatives at (xi, eta). */
function shape(xi: number, eta: number, N: Float64Array, dx: Float64Array, de: Float64Array): void {
  const l1 = 1 - xi - eta;
  const l2 = xi;
  const l3 = eta;
  N[0] = l1 * (2 * l1 - 1);
  N[1] = l2 * (2 * l2 - 1);
  N[2] = l3 * (2 * l3 - 1);
  N[3] = 4 * l1 * l2;
  N[4] = 4 * l2 * l3;
  N[5] = 4 * l3 * l1;
  // d/dxi: dl1 = -1, dl2 = 1, dl3 = 0
  dx[0] = -(4 * l1 - 1);
  dx[1] = 4 * l2 - 1;
  dx[2] = 0;
  dx[3] = 4 * (l1 - l2);
  dx[4] = 4 * l3;
  dx[5] = -4 * l3;
  // d/deta: dl1 = -1, dl2 = 0, dl3 = 1
  de[0] = -(4 * l1 - 1);
  de[1] = 0;
  de[2] = 4 * l3 - 1;
  de[3] = -4 * l2;
  de[4] = 4 * l2;
  de[5] = 4 * (l1 - l3);
}

const QN: Float64Array[] = [];
const QDX: Float64Array[] = [];
const QDE: Float64Array[] = [];
for (let q = 0; q < NQ; q++) {
  const N = new Float64Array(6);
  const dx = new Float64Array(6);
  const de = new Float64Array(6);
  shape(QA[q]!, QB[q]!, N, dx, de);
  QN.push(N);
  QDX.push(dx);
  QDE.push(de);
}

/** Per-element geometric data at the quadrature points, written into caller buffers. */
interface ElementPoints {
  /** r at each point. */
  readonly r: Float64Array;
  /** weight·|det J| (area weight) at each point. */
  readonly w: Float64Array;
  /** d N_i/dr, d N_i/dz at each point (q·6 + i). */
  readonly nr: Float64Array;
  readonly nz: Float64Array;
}

function elementPoints(mesh: LatticeMesh, t: number, out: ElementPoints): void {
  const T = mesh.triangles;
  const o = t * 6;
  for (let q = 0; q < NQ; q++) {
    const dx = QDX[q]!;
    const de = QDE[q]!;
    const N = QN[q]!;
    let rx = 0;
    let re = 0;
    let zx = 0;
    let ze = 0;
    let rq = 0;
    for (let i = 0; i < 6; i++) {
      const n = T[o + i]!;
      const rn = mesh.r[n]!;
      const zn = mesh.z[n]!;
      rx += dx[i]! * rn;
      re += de[i]! * rn;
      zx += dx[i]! * zn;
      ze += de[i]! * zn;
      rq += N[i]! * rn;
    }
    const det = rx * ze - re * zx;
    out.r[q] = rq;
    out.w[q] = 0.5 * QW[q]! * Math.abs(det);
    // [dN/dr, dN/dz] = J^{-T} [dN/dxi, dN/deta], J = [[rx, zx], [re, ze]]
    for (let i = 0; i < 6; i++) {
      out.nr[q * 6 + i] = (ze * dx[i]! - zx * de[i]!) / det;
      out.nz[q * 6 + i] = (-re * dx[i]! + rx * de[i]!) / det;
    }
  }
}

function newPoints(): ElementPoints {
  return { r: new Float64Array(NQ), w: new Float64Array(NQ), nr: new Float64Array(NQ * 6), nz: new Float64Array(NQ * 6) };
}

/** The assembled finite-element system of one mesh (before the solid-turn constraints). */
export interface AssembledSystem {
  readonly mesh: LatticeMesh;
  readonly omega: number;
  /** Unknown number of each lattice node, −1 where A = 0. */
  readonly unknownOf: Int32Array;
  /** Number of unknowns. */
  readonly size: number;
  /** K = S + jωM in compressed columns (full pattern). */
  readonly columnStarts: Int32Array;
  readonly rowIndices: Int32Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** Fill-reducing order of the unknowns. */
  readonly ordering: Int32Array;
  readonly bodyVec: readonly (Float64Array | null)[];
  readonly bodyConductance: Float64Array;
  readonly bodyArea: Float64Array;
  readonly bodyRArea: Float64Array;
}

/** Solves the problem once on the mesh of the given density. */
export function solveOnce(problem: SolverProblem, disc: Discretisation, reluctivity?: Float64Array): SolverSolution {
  const sys = assembleSystem(problem, disc, reluctivity);
  const { mesh, omega, unknownOf, bodyVec, bodyConductance, bodyArea, bodyRArea } = sys;
  const n = sys.size;
  const bodies = problem.bodies;
  const nb = bodies.length;
  const nc = problem.coilCount;
  const nLat = mesh.r.length;
  const nTri = mesh.triangleCell.length;
  const factor = factorComplexSymmetric({ size: n, columnStarts: sys.columnStarts, rowIndices: sys.rowIndices, re: sys.re, im: sys.im }, sys.ordering);

  // Stranded sources: uniform current density count·I/area.
  const strandDensity = new Float64Array(nb);
  const strandedResistance = new Float64Array(nc);
  for (let bi = 0; bi < nb; bi++) {
    const b = bodies[bi]!;
    if (b.role !== "stranded") continue;
    strandDensity[bi] = b.count / bodyArea[bi]!;
    // R = ρ (count/S)² · 2π ∫ r dS
    strandedResistance[b.owner] =
      strandedResistance[b.owner]! + b.resistivity * strandDensity[bi]! * strandDensity[bi]! * 2 * Math.PI * bodyRArea[bi]!;
  }
  const solidList: number[] = [];
  for (let bi = 0; bi < nb; bi++) if (bodies[bi]!.role === "solid") solidList.push(bi);
  const ns = solidList.length;
  // X_k = K⁻¹ c_k for each solid body
  const toUnknown = (vec: Float64Array, re: Float64Array): void => {
    for (let L = 0; L < nLat; L++) {
      const u = unknownOf[L]!;
      if (u >= 0) re[u] = vec[L]!;
    }
  };
  const xRe: Float64Array[] = [];
  const xIm: Float64Array[] = [];
  if (ns > 0) {
    // all solid-turn right-hand sides in one pass over the factor
    const blockRe = new Float64Array(ns * n);
    const blockIm = new Float64Array(ns * n);
    solidList.forEach((bi, a) => {
      const re = blockRe.subarray(a * n, (a + 1) * n);
      toUnknown(bodyVec[bi]!, re);
      xRe.push(re);
      xIm.push(blockIm.subarray(a * n, (a + 1) * n));
    });
    factor.solveMany(blockRe, blockIm, ns);
  }
  // Cᵀ X (ns × ns) and the Schur matrix G − jω CᵀX
  const dotLat = (vec: Float64Array, re: Float64Array, im: Float64Array): [number, number] => {
    let sr = 0;
    let si = 0;
    for (let L = 0; L < nLat; L++) {
      const u = unknownOf[L]!;
      if (u < 0) continue;
      const v = vec[L]!;
      if (v === 0) continue;
      sr += v * re[u]!;
      si += v * im[u]!;
    }
    return [sr, si];
  };
  const sRe = new Float64Array(ns * ns);
  const sIm = new Float64Array(ns * ns);
  for (let a = 0; a < ns; a++) {
    for (let b = 0; b < ns; b++) {
      const [cr, ci] = dotLat(bodyVec[solidList[a]!]!, xRe[b]!, xIm[b]!);
      // −jω(cr + j ci) = ω ci − jω cr
      sRe[a * ns + b] = omega * ci + (a === b ? bodyConductance[solidList[a]!]! : 0);
      sIm[a * ns + b] = -omega * cr;
    }
  }
  const luS = ns > 0 ? complexLu(sRe, sIm, ns) : null;

  const zRe = new Float64Array(nc * nc);
  const zIm = new Float64Array(nc * nc);
  const aRe: Float64Array[] = [];
  const aIm: Float64Array[] = [];
  const phiRe: Float64Array[] = [];
  const phiIm: Float64Array[] = [];
  for (let c = 0; c < nc; c++) {
    // a0 = K⁻¹ f (stranded sources of coil c, unit current)
    const f = new Float64Array(n);
    const fi = new Float64Array(n);
    let anyStranded = false;
    for (let bi = 0; bi < nb; bi++) {
      const b = bodies[bi]!;
      if (b.role !== "stranded" || b.owner !== c) continue;
      anyStranded = true;
      const vec = bodyVec[bi]!;
      const J = strandDensity[bi]!;
      for (let L = 0; L < nLat; L++) {
        const u = unknownOf[L]!;
        if (u >= 0) f[u] = f[u]! + J * vec[L]!;
      }
    }
    if (anyStranded) factor.solve(f, fi);
    // Schur right-hand side: I + jω Cᵀ a0
    const rhsRe = new Float64Array(ns);
    const rhsIm = new Float64Array(ns);
    for (let a = 0; a < ns; a++) {
      const bi = solidList[a]!;
      const [cr, ci] = anyStranded ? dotLat(bodyVec[bi]!, f, fi) : [0, 0];
      rhsRe[a] = (bodies[bi]!.owner === c ? 1 : 0) - omega * ci;
      rhsIm[a] = omega * cr;
    }
    if (luS) luS.solve(rhsRe, rhsIm);
    // A = a0 + Σ X_k Φ_k
    const Are = new Float64Array(nLat);
    const Aim = new Float64Array(nLat);
    for (let L = 0; L < nLat; L++) {
      const u = unknownOf[L]!;
      if (u < 0) continue;
      let vr = f[u]!;
      let vi = fi[u]!;
      for (let a = 0; a < ns; a++) {
        const xr = xRe[a]![u]!;
        const xi = xIm[a]![u]!;
        vr += xr * rhsRe[a]! - xi * rhsIm[a]!;
        vi += xr * rhsIm[a]! + xi * rhsRe[a]!;
      }
      Are[L] = vr;
      Aim[L] = vi;
    }
    const pr = new Float64Array(nb);
    const pi = new Float64Array(nb);
    for (let a = 0; a < ns; a++) {
      pr[solidList[a]!] = rhsRe[a]!;
      pi[solidList[a]!] = rhsIm[a]!;
    }
    aRe.push(Are);
    aIm.push(Aim);
    phiRe.push(pr);
    phiIm.push(pi);
    // voltages on every coil d per ampere in coil c
    for (let bi = 0; bi < nb; bi++) {
      const b = bodies[bi]!;
      if (b.role === "region") continue;
      const dcoil = b.owner;
      let vr: number;
      let vi: number;
      if (b.role === "solid") {
        vr = 2 * Math.PI * pr[bi]!;
        vi = 2 * Math.PI * pi[bi]!;
      } else {
        // jω · count · (2π/S) ∫ r A dS
        const vec = bodyVec[bi]!;
        let sr = 0;
        let si = 0;
        for (let L = 0; L < nLat; L++) {
          const v = vec[L]!;
          if (v === 0) continue;
          sr += v * Are[L]!;
          si += v * Aim[L]!;
        }
        const k = 2 * Math.PI * strandDensity[bi]!;
        vr = -omega * k * si;
        vi = omega * k * sr;
      }
      zRe[dcoil * nc + c] = zRe[dcoil * nc + c]! + vr;
      zIm[dcoil * nc + c] = zIm[dcoil * nc + c]! + vi;
    }
    zRe[c * nc + c] = zRe[c * nc + c]! + strandedResistance[c]!;
  }
  return {
    mesh,
    zRe,
    zIm,
    strandedResistance,
    aRe,
    aIm,
    phiRe,
    phiIm,
    strandDensity,
    omega,
    nodes: nLat,
    elements: nTri,
  };
}

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

/** Centroid (r, z) of triangle t (mean of its three corner nodes). */
export function centroid(mesh: LatticeMesh, t: number): [number, number] {
  const T = mesh.triangles;
  const a = T[t * 6]!;
  const b = T[t * 6 + 1]!;
  const c = T[t * 6 + 2]!;
  return [(mesh.r[a]! + mesh.r[b]! + mesh.r[c]!) / 3, (mesh.z[a]! + mesh.z[b]! + mesh.z[c]!) / 3];
}

/**
 * Meshes the problem at the given density and assembles the finite-element system.
 * `reluctivity`, when given, holds the relative reluctivity $\nu_r = 1/\mu_r$ of each triangle
 * (the mesh of a density is the same on every call, so triangle numbers carry over).
 */
export function assembleSystem(problem: SolverProblem, disc: Discretisation, reluctivity?: Float64Array): AssembledSystem {
  const omega = 2 * Math.PI * problem.frequency;
  const bodies = problem.bodies;
  const mesh = meshFor(problem, disc);
  const { ni, nj, triangles, triangleCell, cellBody } = mesh;
  const nLat = ni * nj;
  const nTri = triangleCell.length;
  // unknown numbering: A = 0 on the axis and the outer box
  const unknownOf = new Int32Array(nLat).fill(-1);
  let n = 0;
  for (let i = 1; i < ni - 1; i++) for (let j = 1; j < nj - 1; j++) unknownOf[i * nj + j] = n++;

  // material of each triangle
  const triBody = new Int32Array(nTri);
  for (let t = 0; t < nTri; t++) triBody[t] = cellBody[triangleCell[t]!]!;

  // Assemble K = S + jωM (full pattern, triplets per column), sources and solid-turn vectors.
  const nb = bodies.length;
  const P = newPoints();
  const kRe = new Float64Array(36);
  const kIm = new Float64Array(36);
  const gR = new Float64Array(6);
  const gZ = new Float64Array(6);
  const colCount = new Int32Array(n + 1);
  for (let t = 0; t < nTri; t++) {
    for (let a = 0; a < 6; a++) {
      const ua = unknownOf[triangles[t * 6 + a]!]!;
      if (ua < 0) continue;
      for (let b = 0; b < 6; b++) if (unknownOf[triangles[t * 6 + b]!]! >= 0) colCount[ua + 1]!++;
    }
  }
  for (let k = 0; k < n; k++) colCount[k + 1] = colCount[k + 1]! + colCount[k]!;
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
  const order = latticeNestedDissection({ columns: ni, rows: nj, step: 2, unknownOf });
  return { mesh, omega, unknownOf, size: n, columnStarts: Ap, rowIndices: Ai, re: Axr, im: Axi, ordering: order, bodyVec, bodyConductance, bodyArea, bodyRArea };
}

/** Dense complex LU with partial pivoting (small Schur systems). */
function complexLu(mr: Float64Array, mi: Float64Array, n: number): { solve(br: Float64Array, bi: Float64Array): void } {
  const ar = Float64Array.from(mr);
  const ai = Float64Array.from(mi);
  const piv = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = -1;
    for (let i = k; i < n; i++) {
      const m = Math.hypot(ar[i * n + k]!, ai[i * n + k]!);
      if (m > best) {
        best = m;
        p = i;
      }
    }
    piv[k] = p;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const tr = ar[k * n + j]!;
        const ti = ai[k * n + j]!;
        ar[k * n + j] = ar[p * n + j]!;
        ai[k * n + j] = ai[p * n + j]!;
        ar[p * n + j] = tr;
        ai[p * n + j] = ti;
      }
    }
    const dr = ar[k * n + k]!;
    const di = ai[k * n + k]!;
    const den = dr * dr + di * di;
    for (let i = k + 1; i < n; i++) {
      const xr = ar[i * n + k]!;
      const xi = ai[i * n + k]!;
      const lr = (xr * dr + xi * di) / den;
      const li = (xi * dr - xr * di) / den;
      ar[i * n + k] = lr;
      ai[i * n + k] = li;
      for (let j = k + 1; j < n; j++) {
        const ur = ar[k * n + j]!;
        const ui = ai[k * n + j]!;
        ar[i * n + j] = ar[i * n + j]! - (lr * ur - li * ui);
        ai[i * n + j] = ai[i * n + j]! - (lr * ui + li * ur);
      }
    }
  }
  return {
    solve(br: Float64Array, bi: Float64Array): void {
      for (let k = 0; k < n; k++) {
        const p = piv[k]!;
        if (p !== k) {
          const tr = br[k]!;
          const ti = bi[k]!;
          br[k] = br[p]!;
          bi[k] = bi[p]!;
          br[p] = tr;
          bi[p] = ti;
        }
      }
      for (let i = 0; i < n; i++) {
        let sr = br[i]!;
        let si = bi[i]!;
        for (let j = 0; j < i; j++) {
          sr -= ar[i * n + j]! * br[j]! - ai[i * n + j]! * bi[j]!;
          si -= ar[i * n + j]! * bi[j]! + ai[i * n + j]! * br[j]!;
        }
        br[i] = sr;
        bi[i] = si;
      }
      for (let i = n - 1; i >= 0; i--) {
        let sr = br[i]!;
        let si = bi[i]!;
        for (let j = i + 1; j < n; j++) {
          sr -= ar[i * n + j]! * br[j]! - ai[i * n + j]! * bi[j]!;
          si -= ar[i * n + j]! * bi[j]! + ai[i * n + j]! * br[j]!;
        }
        const dr = ar[i * n + i]!;
        const di = ai[i * n + i]!;
        const den = dr * dr + di * di;
        br[i] = (sr * dr + si * di) / den;
        bi[i] = (si * dr - sr * di) / den;
      }
    },
  };
}

/** Local evaluation of the solution at a point: element, shape values and derivatives. */
export interface PointProbe {
  readonly triangle: number;
  readonly N: Float64Array;
  readonly dNr: Float64Array;
  readonly dNz: Float64Array;
  readonly r: number;
}

/** Finds the element holding (r, z) and the shape functions there, or null outside the mesh. */
export function probe(mesh: LatticeMesh, r: number, z: number): PointProbe | null {
  const { rLines, zLines } = mesh;
  const cz = zLines.length - 1;
  const pp = new Float64Array(2);
  unmapPoint(mesh, r, z, pp);
  const x = pp[0]!;
  const y = pp[1]!;
  if (x < rLines[0]! || x > rLines[rLines.length - 1]! || y < zLines[0]! || y > zLines[cz]!) return null;
  const ci = Math.min(rLines.length - 2, upperBound(rLines, x) - 1);
  const cj = Math.min(cz - 1, upperBound(zLines, y) - 1);
  const N = new Float64Array(6);
  const dx = new Float64Array(6);
  const de = new Float64Array(6);
  const T = mesh.triangles;
  let best: PointProbe | null = null;
  let bestOut = Infinity;
  for (const t of [2 * (ci * cz + cj), 2 * (ci * cz + cj) + 1]) {
    // Newton on the isoparametric map from the centroid
    let xi = 1 / 3;
    let eta = 1 / 3;
    for (let it = 0; it < 20; it++) {
      shape(xi, eta, N, dx, de);
      let rq = 0;
      let zq = 0;
      let rx = 0;
      let re = 0;
      let zx = 0;
      let ze = 0;
      for (let i = 0; i < 6; i++) {
        const n = T[t * 6 + i]!;
        rq += N[i]! * mesh.r[n]!;
        zq += N[i]! * mesh.z[n]!;
        rx += dx[i]! * mesh.r[n]!;
        re += de[i]! * mesh.r[n]!;
        zx += dx[i]! * mesh.z[n]!;
        ze += de[i]! * mesh.z[n]!;
      }
      const det = rx * ze - re * zx;
      const fr = r - rq;
      const fz = z - zq;
      // [r; z] = J^T [dxi; deta] with J^T = [[rx, re], [zx, ze]]
      const dxi = (ze * fr - re * fz) / det;
      const deta = (-zx * fr + rx * fz) / det;
      xi += dxi;
      eta += deta;
      if (Math.abs(dxi) + Math.abs(deta) < 1e-13) break;
    }
    shape(xi, eta, N, dx, de);
    let rx = 0;
    let re = 0;
    let zx = 0;
    let ze = 0;
    for (let i = 0; i < 6; i++) {
      const n = T[t * 6 + i]!;
      rx += dx[i]! * mesh.r[n]!;
      re += de[i]! * mesh.r[n]!;
      zx += dx[i]! * mesh.z[n]!;
      ze += de[i]! * mesh.z[n]!;
    }
    const det = rx * ze - re * zx;
    const out = Math.max(0, -xi, -eta, xi + eta - 1);
    if (out < bestOut && Number.isFinite(out)) {
      bestOut = out;
      const dNr = new Float64Array(6);
      const dNz = new Float64Array(6);
      for (let i = 0; i < 6; i++) {
        dNr[i] = (ze * dx[i]! - zx * de[i]!) / det;
        dNz[i] = (-re * dx[i]! + rx * de[i]!) / det;
      }
      best = { triangle: t, N: Float64Array.from(N), dNr, dNz, r };
    }
  }
  return best;
}

function upperBound(a: Float64Array, x: number): number {
  let lo = 0;
  let hi = a.length;
  while (lo < hi) {
    const m = (lo + hi) >> 1;
    if (a[m]! <= x) lo = m + 1;
    else hi = m;
  }
  return Math.max(1, lo);
}

/** Time-average losses [W] per body with the given coil currents (complex RMS phasors). */
export function bodyLosses(
  problem: SolverProblem,
  sol: SolverSolution,
  currents: readonly { re: number; im: number }[],
): Float64Array {
  const { mesh, omega } = sol;
  const bodies = problem.bodies;
  const nb = bodies.length;
  const out = new Float64Array(nb);
  const nc = problem.coilCount;
  // total A and Φ
  const nLat = mesh.r.length;
  const Ar = new Float64Array(nLat);
  const Ai = new Float64Array(nLat);
  const Pr = new Float64Array(nb);
  const Pi = new Float64Array(nb);
  for (let c = 0; c < nc; c++) {
    const I = currents[c]!;
    for (let L = 0; L < nLat; L++) {
      Ar[L] = Ar[L]! + I.re * sol.aRe[c]![L]! - I.im * sol.aIm[c]![L]!;
      Ai[L] = Ai[L]! + I.re * sol.aIm[c]![L]! + I.im * sol.aRe[c]![L]!;
    }
    for (let b = 0; b < nb; b++) {
      Pr[b] = Pr[b]! + I.re * sol.phiRe[c]![b]! - I.im * sol.phiIm[c]![b]!;
      Pi[b] = Pi[b]! + I.re * sol.phiIm[c]![b]! + I.im * sol.phiRe[c]![b]!;
    }
  }
  const P = newPoints();
  const T = mesh.triangles;
  const nTri = mesh.triangleCell.length;
  for (let t = 0; t < nTri; t++) {
    const bi = mesh.cellBody[mesh.triangleCell[t]!]!;
    if (bi < 0) continue;
    const body = bodies[bi]!;
    if (body.sigma === 0) continue;
    elementPoints(mesh, t, P);
    let sum = 0;
    for (let q = 0; q < NQ; q++) {
      const N = QN[q]!;
      let ar = 0;
      let ai = 0;
      for (let a = 0; a < 6; a++) {
        const n = T[t * 6 + a]!;
        ar += N[a]! * Ar[n]!;
        ai += N[a]! * Ai[n]!;
      }
      const r = P.r[q]!;
      // E = −jωA + Φ/r
      let er = omega * ai;
      let ei = -omega * ar;
      if (body.role === "solid") {
        er += Pr[bi]! / r;
        ei += Pi[bi]! / r;
      }
      sum += P.w[q]! * (er * er + ei * ei) * r;
    }
    out[bi] = out[bi]! + 2 * Math.PI * body.sigma * sum;
  }
  // stranded: R_dc |I|²
  for (let bi = 0; bi < nb; bi++) {
    const b = bodies[bi]!;
    if (b.role !== "stranded") continue;
    const I = currents[b.owner]!;
    const J = sol.strandDensity[bi]!;
    // ρ J² 2π ∫ r dS |I|², with ∫ r dS recovered from R of this body: recompute by quadrature
    let rArea = 0;
    for (let t = 0; t < nTri; t++) {
      if (mesh.cellBody[mesh.triangleCell[t]!] !== bi) continue;
      elementPoints(mesh, t, P);
      for (let q = 0; q < NQ; q++) rArea += P.w[q]! * P.r[q]!;
    }
    out[bi] = b.resistivity * J * J * 2 * Math.PI * rArea * (I.re * I.re + I.im * I.im);
  }
  return out;
}

/** The total A (complex) and Φ at a probe, for the given currents. */
export function fieldAtProbe(
  problem: SolverProblem,
  sol: SolverSolution,
  currents: readonly { re: number; im: number }[],
  pr: PointProbe,
): { ar: number; ai: number; drR: number; drI: number; dzR: number; dzI: number; body: number; phiR: number; phiI: number } {
  const T = sol.mesh.triangles;
  let ar = 0;
  let ai = 0;
  let drR = 0;
  let drI = 0;
  let dzR = 0;
  let dzI = 0;
  for (let c = 0; c < problem.coilCount; c++) {
    const I = currents[c]!;
    const Aa = sol.aRe[c]!;
    const Ab = sol.aIm[c]!;
    for (let a = 0; a < 6; a++) {
      const n = T[pr.triangle * 6 + a]!;
      const vr = I.re * Aa[n]! - I.im * Ab[n]!;
      const vi = I.re * Ab[n]! + I.im * Aa[n]!;
      ar += pr.N[a]! * vr;
      ai += pr.N[a]! * vi;
      drR += pr.dNr[a]! * vr;
      drI += pr.dNr[a]! * vi;
      dzR += pr.dNz[a]! * vr;
      dzI += pr.dNz[a]! * vi;
    }
  }
  const body = sol.mesh.cellBody[sol.mesh.triangleCell[pr.triangle]!]!;
  let phiR = 0;
  let phiI = 0;
  if (body >= 0 && problem.bodies[body]!.role === "solid") {
    for (let c = 0; c < problem.coilCount; c++) {
      const I = currents[c]!;
      phiR += I.re * sol.phiRe[c]![body]! - I.im * sol.phiIm[c]![body]!;
      phiI += I.re * sol.phiIm[c]![body]! + I.im * sol.phiRe[c]![body]!;
    }
  }
  return { ar, ai, drR, drI, dzR, dzI, body, phiR, phiI };
}

/**
 * Peak flux density $\hat B = \sqrt2\,(|B_r|^2 + |B_z|^2)^{1/2}$ [T] at the centroid of every
 * triangle of a saturating body (0 elsewhere), for the given coil currents; with `volume`, also
 * each such triangle's ring volume $2\pi\int r\,dA$ [m³].
 */
export function triangleFluxDensityPeak(
  problem: SolverProblem,
  sol: SolverSolution,
  currents: readonly { re: number; im: number }[],
  out: Float64Array,
  volume?: Float64Array,
): void {
  const { mesh } = sol;
  const T = mesh.triangles;
  const nTri = mesh.triangleCell.length;
  const nc = problem.coilCount;
  const P = newPoints();
  const N = QN[0]!;
  for (let t = 0; t < nTri; t++) {
    out[t] = 0;
    const bi = mesh.cellBody[mesh.triangleCell[t]!]!;
    if (bi < 0 || problem.bodies[bi]!.curve === undefined) continue;
    elementPoints(mesh, t, P);
    if (volume) {
      let v = 0;
      for (let q = 0; q < NQ; q++) v += P.w[q]! * P.r[q]!;
      volume[t] = 2 * Math.PI * v;
    }
    const r = P.r[0]!;
    let brR = 0;
    let brI = 0;
    let bzR = 0;
    let bzI = 0;
    for (let a = 0; a < 6; a++) {
      const n = T[t * 6 + a]!;
      let vr = 0;
      let vi = 0;
      for (let c = 0; c < nc; c++) {
        const I = currents[c]!;
        vr += I.re * sol.aRe[c]![n]! - I.im * sol.aIm[c]![n]!;
        vi += I.re * sol.aIm[c]![n]! + I.im * sol.aRe[c]![n]!;
      }
      const gr = -P.nz[a]!;
      const gz = P.nr[a]! + N[a]! / r;
      brR += gr * vr;
      brI += gr * vi;
      bzR += gz * vr;
      bzI += gz * vi;
    }
    out[t] = Math.SQRT2 * Math.sqrt(brR * brR + brI * brI + bzR * bzR + bzI * bzI);
  }
}
