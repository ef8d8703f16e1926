/**
 * Evaluation of a field solution: the element and shape functions at a point, the vector
 * potential and its derivatives there, the losses of every body and the flux density of the
 * saturating elements. Internal.
 *
 * @packageDocumentation
 */
import { unmapPoint } from "./mesh.js";
import type { LatticeMesh } from "./mesh.js";
import { NQ, QN, elementPoints, newPoints, shape } from "./quadratic-triangle.js";
import type { SolverProblem, SolverSolution } from "./solver-types.js";


/** Centroid (r, z) of triangle t (mean of its three corner nodes). */
export function centroid(mesh: LatticeMesh, t: number): [number, number] {
  const T = mesh.triangles;
  const a = T[t * 6]!;
  const b = T[t * 6 + 1]!;
  const c = T[t * 6 + 2]!;
  return [(mesh.r[a]! + mesh.r[b]! + mesh.r[c]!) / 3, (mesh.z[a]! + mesh.z[b]! + mesh.z[c]!) / 3];
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

/** Largest relative change of any coil's self-resistance or self-reactance between two solutions. */
export function impedanceChange(a: SolverSolution, b: SolverSolution, nc: number): number {
  let e = 0;
  for (let c = 0; c < nc; c++) {
    const k = c * nc + c;
    e = Math.max(e, Math.abs(a.zRe[k]! - b.zRe[k]!) / Math.abs(b.zRe[k]!), Math.abs(a.zIm[k]! - b.zIm[k]!) / Math.abs(b.zIm[k]!));
  }
  return e;
}
