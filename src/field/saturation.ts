/**
 * Saturating regions of the field solver: the fixed point of the per-element effective
 * reluctivity (first-harmonic effective permeability) on one mesh, and the choice of the
 * permeability the meshes are sized for. Internal to `fluxwright/field`.
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";
import { andersonStep } from "../special/internal.js";
import { meshFor } from "./assembly.js";
import { centroid, probe, triangleFluxDensityPeak } from "./field-evaluation.js";
import { solveOnce } from "./solver.js";
import type { SolverProblem, SolverSolution } from "./solver-types.js";

/** Fixed-point iterations allowed per mesh for saturating regions. */
export const MAX_SATURATION_ITERATIONS = 60;

/** Result of the fixed point on one mesh. */
export interface SaturatingSolve {
  readonly solution: SolverSolution;
  /** Relative reluctivity of every triangle (1/μr; 1 in air). */
  readonly nu: Float64Array;
  /** Linear solves on this mesh. */
  readonly iterations: number;
  /**
   * Bound on the relative change of the complex power (and so of the impedance of a single
   * driven coil) that one more full update of the reluctivities would make (first order):
   * $\omega\sum_t |\Delta\nu_t|\,|B_t|^2 V_t \,/\, |S|$.
   */
  readonly residual: number;
  /** Largest relative change of any element's reluctivity in the last update (diagnostic). */
  readonly largestChange: number;
  /** Whether `residual` fell below the tolerance within {@link MAX_SATURATION_ITERATIONS}. */
  readonly converged: boolean;
}

/**
 * Fixed point of the per-element effective reluctivity on the mesh of density `density`.
 *
 * The map: solve the linear problem with reluctivities $\nu_t$, read the peak flux density
 * $\hat B_t$ at each element's centroid, the peak field strength $\hat H_t = \nu_t\hat B_t$,
 * and the effective curve's reluctivity there, $g_t = \mu_0\hat H_t/\hat B_1(\hat H_t)$. The
 * iteration runs on $x_t = \ln\nu_t$ with Anderson mixing of depth one (weights: each element's
 * share of the magnetic energy), a damped plain step when mixing fails or the residual grows,
 * steps limited to a factor $e^{\pm 1.5}$ and $\nu$ kept between $1/\mu_{r,\max}$ and 1.
 *
 * Stopping: the first-order change of the complex power $S = \sum_c V_cI_c^*$ that the
 * remaining update $g - \nu$ would make is $\delta S = -j\omega\int\delta\nu\,\mathbf B\cdot\mathbf B\,dV$
 * (variation of the energy functional with the currents held), bounded by
 * $\omega\sum_t |g_t - \nu_t|\,|B_t|^2V_t$; the iteration stops when that bound, relative to $|S|$, is
 * below `tolerance`. A sequence converging with ratio q is that bound times $1/(1-q)$ away from
 * its limit; the tolerance is set well below the accuracy asked for to cover it.
 */
export function solveSaturating(
  problem: SolverProblem,
  density: number,
  currents: readonly { re: number; im: number }[],
  tolerance: number,
  start?: { solution: SolverSolution; nu: Float64Array },
): SaturatingSolve {
  const bodies = problem.bodies;
  const nc = problem.coilCount;
  const mesh = meshFor(problem, { density });
  const nTri = mesh.triangleCell.length;
  // saturating triangles and their bodies
  const list: number[] = [];
  const nu = new Float64Array(nTri);
  for (let t = 0; t < nTri; t++) {
    const bi = mesh.cellBody[mesh.triangleCell[t]!]!;
    nu[t] = bi < 0 ? 1 : 1 / bodies[bi]!.mur;
    if (bi >= 0 && bodies[bi]!.curve !== undefined) list.push(t);
  }
  const m = list.length;
  if (start) {
    // the previous mesh's reluctivity at each new element's centroid
    const old = start.solution.mesh;
    for (const t of list) {
      const bi = mesh.cellBody[mesh.triangleCell[t]!]!;
      const [rc, zc] = centroid(mesh, t);
      const pr = probe(old, rc, zc);
      if (pr !== null && old.cellBody[old.triangleCell[pr.triangle]!] === bi) nu[t] = start.nu[pr.triangle]!;
    }
  }
  const nuMin = new Float64Array(m);
  for (let k = 0; k < m; k++) {
    const curve = bodies[mesh.cellBody[mesh.triangleCell[list[k]!]!]!]!.curve!;
    nuMin[k] = 1 / curve.maxRelativePermeability;
  }
  const x = new Float64Array(m);
  const g = new Float64Array(m);
  const xPrev = new Float64Array(m);
  const gPrev = new Float64Array(m);
  const scale = new Float64Array(m);
  const next = new Float64Array(m);
  for (let k = 0; k < m; k++) x[k] = Math.log(nu[list[k]!]!);
  const bPeak = new Float64Array(nTri);
  const volume = new Float64Array(nTri);
  let solution = solveOnce(problem, { density }, nu);
  let iterations = 1;
  let residual: number;
  let largestChange: number;
  let previousResidual = Infinity;
  let havePrevious = false;
  let damping = 0.7;
  for (;;) {
    triangleFluxDensityPeak(problem, solution, currents, bPeak, volume);
    // complex power S = Σ_c V_c I_c* with V_c = Σ_d Z_cd I_d
    let sRe = 0;
    let sIm = 0;
    for (let c = 0; c < nc; c++) {
      let vr = 0;
      let vi = 0;
      for (let d = 0; d < nc; d++) {
        const zr = solution.zRe[c * nc + d]!;
        const zi = solution.zIm[c * nc + d]!;
        vr += zr * currents[d]!.re - zi * currents[d]!.im;
        vi += zr * currents[d]!.im + zi * currents[d]!.re;
      }
      sRe += vr * currents[c]!.re + vi * currents[c]!.im;
      sIm += vi * currents[c]!.re - vr * currents[c]!.im;
    }
    const sAbs = Math.hypot(sRe, sIm);
    let bound = 0;
    largestChange = 0;
    for (let k = 0; k < m; k++) {
      const t = list[k]!;
      const bi = mesh.cellBody[mesh.triangleCell[t]!]!;
      const curve = bodies[bi]!.curve!;
      const target = curve.reluctivityAtField((nu[t]! * bPeak[t]!) / MU_0);
      g[k] = Math.log(target);
      largestChange = Math.max(largestChange, Math.abs(target / nu[t]! - 1));
      // |Δν| |B_rms|² V, ν in m/H
      const energyWeight = (0.5 * bPeak[t]! * bPeak[t]! * volume[t]!) / MU_0;
      bound += Math.abs(target - nu[t]!) * energyWeight;
      scale[k] = 1 / Math.sqrt(nu[t]! * energyWeight + 1e-300);
    }
    residual = sAbs > 0 ? (solution.omega * bound) / sAbs : 0;
    if (residual <= tolerance || iterations >= MAX_SATURATION_ITERATIONS) break;
    // next iterate in ln ν
    let mixed = false;
    if (havePrevious && residual < 2 * previousResidual) mixed = andersonStep(m, x, g, xPrev, gPrev, scale, next);
    if (!mixed) {
      if (residual >= previousResidual) damping = Math.max(0.2, damping * 0.6);
      for (let k = 0; k < m; k++) next[k] = x[k]! + damping * (g[k]! - x[k]!);
    }
    xPrev.set(x);
    gPrev.set(g);
    havePrevious = true;
    previousResidual = residual;
    for (let k = 0; k < m; k++) {
      const step = Math.max(-1.5, Math.min(1.5, next[k]! - x[k]!));
      x[k] = Math.min(0, Math.max(Math.log(nuMin[k]!), x[k]! + step));
      nu[list[k]!] = Math.exp(x[k]!);
    }
    solution = solveOnce(problem, { density }, nu);
    iterations++;
  }
  return { solution, nu, iterations, residual, largestChange, converged: residual <= tolerance };
}
