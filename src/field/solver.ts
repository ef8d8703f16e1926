/**
 * The finite-element core of `fluxwright/field`: one solve of a problem on the mesh of a given
 * density — the sparse system factorised once, the solid-turn constraints by a Schur
 * complement, the impedance matrix and the per-coil solutions. Meshing and assembly are in
 * `assembly.ts`, the element in `quadratic-triangle.ts`, evaluation of a solution in
 * `field-evaluation.ts`. Internal.
 *
 * @packageDocumentation
 */
import { factorComplexSymmetric } from "../special/index.js";
import type { ComplexSymmetricFactor } from "../special/index.js";
import { factorComplexDense, solveComplexFactored } from "../special/internal.js";
import { assembleSystem } from "./assembly.js";
import type { AssembledSystem, Discretisation, SolverProblem, SolverSolution } from "./solver-types.js";


/** Solves the problem once on the mesh of the given density. */
export function solveOnce(problem: SolverProblem, disc: Discretisation, reluctivity?: Float64Array): SolverSolution {
  const sys = assembleSystem(problem, disc, reluctivity);
  const { mesh, omega } = sys;
  const nc = problem.coilCount;
  const factor = factorComplexSymmetric({ size: sys.size, columnStarts: sys.columnStarts, rowIndices: sys.rowIndices, re: sys.re, im: sys.im }, sys.ordering);
  const { strandDensity, strandedResistance } = strandedSources(problem, sys);
  const solid = solidTurnResponses(problem, sys, factor);
  const luS = solid.list.length > 0 ? complexLu(...schurMatrix(sys, solid)) : null;
  const zRe = new Float64Array(nc * nc);
  const zIm = new Float64Array(nc * nc);
  const aRe: Float64Array[] = [];
  const aIm: Float64Array[] = [];
  const phiRe: Float64Array[] = [];
  const phiIm: Float64Array[] = [];
  for (let c = 0; c < nc; c++) {
    const one = solveCoil(problem, sys, factor, solid, luS, strandDensity, c);
    aRe.push(one.aRe);
    aIm.push(one.aIm);
    phiRe.push(one.phiRe);
    phiIm.push(one.phiIm);
    addCoilVoltages(problem, sys, strandDensity, one, c, zRe, zIm);
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
    nodes: mesh.r.length,
    elements: mesh.triangleCell.length,
  };
}

/**
 * The uniform current density per ampere of each stranded body, count/area [A/m² per A]
 * (body-indexed, 0 for the others), and each coil's DC resistance of its stranded part,
 * $R = \rho\,(n/S)^2\,2\pi\int r\,dS$ [Ω].
 */
function strandedSources(problem: SolverProblem, sys: AssembledSystem): { strandDensity: Float64Array; strandedResistance: Float64Array } {
  const { bodyArea, bodyRArea } = sys;
  const bodies = problem.bodies;
  const nb = bodies.length;
  const strandDensity = new Float64Array(nb);
  const strandedResistance = new Float64Array(problem.coilCount);
  for (let bi = 0; bi < nb; bi++) {
    const b = bodies[bi]!;
    if (b.role !== "stranded") continue;
    strandDensity[bi] = b.count / bodyArea[bi]!;
    // R = ρ (count/S)² · 2π ∫ r dS
    strandedResistance[b.owner] =
      strandedResistance[b.owner]! + b.resistivity * strandDensity[bi]! * strandDensity[bi]! * 2 * Math.PI * bodyRArea[bi]!;
  }
  return { strandDensity, strandedResistance };
}

/** The solid turns (body numbers) and $X_k = K^{-1}c_k$ for each (unknown-indexed). */
interface SolidTurns {
  readonly list: readonly number[];
  readonly xRe: readonly Float64Array[];
  readonly xIm: readonly Float64Array[];
}

/** Solves $K X_k = c_k$ for every solid turn k, all right-hand sides in one pass over the factor. */
function solidTurnResponses(problem: SolverProblem, sys: AssembledSystem, factor: ComplexSymmetricFactor): SolidTurns {
  const { unknownOf, bodyVec } = sys;
  const n = sys.size;
  const bodies = problem.bodies;
  const nb = bodies.length;
  const nLat = sys.mesh.r.length;
  const list: number[] = [];
  for (let bi = 0; bi < nb; bi++) if (bodies[bi]!.role === "solid") list.push(bi);
  const ns = list.length;
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
    list.forEach((bi, a) => {
      const re = blockRe.subarray(a * n, (a + 1) * n);
      toUnknown(bodyVec[bi]!, re);
      xRe.push(re);
      xIm.push(blockIm.subarray(a * n, (a + 1) * n));
    });
    factor.solveMany(blockRe, blockIm, ns);
  }
  return { list, xRe, xIm };
}

/** $\sum_L v_L\,x_{u(L)}$ over the lattice nodes that are unknowns (a lattice vector against an unknown vector). */
function dotLattice(unknownOf: Int32Array, nLat: number, vec: Float64Array, re: Float64Array, im: Float64Array): [number, number] {
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
}

/** The Schur matrix of the solid-turn voltages, $G - j\omega C^{\mathsf T}X$ (ns × ns, row-major), and its order. */
function schurMatrix(sys: AssembledSystem, solid: SolidTurns): [Float64Array, Float64Array, number] {
  const { unknownOf, bodyVec, bodyConductance, omega } = sys;
  const { list, xRe, xIm } = solid;
  const ns = list.length;
  const nLat = sys.mesh.r.length;
  const sRe = new Float64Array(ns * ns);
  const sIm = new Float64Array(ns * ns);
  for (let a = 0; a < ns; a++) {
    for (let b = 0; b < ns; b++) {
      const [cr, ci] = dotLattice(unknownOf, nLat, bodyVec[list[a]!]!, xRe[b]!, xIm[b]!);
      // −jω(cr + j ci) = ω ci − jω cr
      sRe[a * ns + b] = omega * ci + (a === b ? bodyConductance[list[a]!]! : 0);
      sIm[a * ns + b] = -omega * cr;
    }
  }
  return [sRe, sIm, ns];
}

/** The solution per ampere in one coil: vector potential (lattice-sized) and solid-body Φ (body-indexed). */
interface CoilSolution {
  readonly aRe: Float64Array;
  readonly aIm: Float64Array;
  readonly phiRe: Float64Array;
  readonly phiIm: Float64Array;
}

/**
 * The field of one ampere in coil c with the other coils open: $a_0 = K^{-1}f$ from the coil's
 * stranded sources, the solid-turn Φ from the Schur system with right-hand side
 * $I + j\omega C^{\mathsf T}a_0$, and $A = a_0 + \sum_k X_k\Phi_k$.
 */
function solveCoil(
  problem: SolverProblem,
  sys: AssembledSystem,
  factor: ComplexSymmetricFactor,
  solid: SolidTurns,
  luS: DenseComplexLu | null,
  strandDensity: Float64Array,
  c: number,
): CoilSolution {
  const { unknownOf, bodyVec, omega } = sys;
  const n = sys.size;
  const bodies = problem.bodies;
  const nb = bodies.length;
  const nLat = sys.mesh.r.length;
  const { list: solidList, xRe, xIm } = solid;
  const ns = solidList.length;
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
    const [cr, ci] = anyStranded ? dotLattice(unknownOf, nLat, bodyVec[bi]!, f, fi) : [0, 0];
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
  return { aRe: Are, aIm: Aim, phiRe: pr, phiIm: pi };
}

/**
 * Adds the voltage on every coil d per ampere in coil c to column c of the impedance matrix:
 * $2\pi\Phi$ of each solid turn, $j\omega\,n\,\frac{2\pi}{S}\int rA\,dS$ of each stranded shape.
 */
function addCoilVoltages(
  problem: SolverProblem,
  sys: AssembledSystem,
  strandDensity: Float64Array,
  one: CoilSolution,
  c: number,
  zRe: Float64Array,
  zIm: Float64Array,
): void {
  const { bodyVec, omega } = sys;
  const bodies = problem.bodies;
  const nb = bodies.length;
  const nc = problem.coilCount;
  const nLat = sys.mesh.r.length;
  const { aRe: Are, aIm: Aim, phiRe: pr, phiIm: pi } = one;
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
}

/** A factorised small dense complex matrix. */
interface DenseComplexLu {
  /** Overwrites (br, bi) with the solution. */
  solve(br: Float64Array, bi: Float64Array): void;
}

/** Dense complex LU with partial pivoting (small Schur systems), from the shared toolkit. */
function complexLu(mr: Float64Array, mi: Float64Array, n: number): DenseComplexLu {
  const ar = Float64Array.from(mr);
  const ai = Float64Array.from(mi);
  const piv = new Int32Array(n);
  factorComplexDense(n, ar, ai, piv);
  return {
    solve: (br, bi) => {
      solveComplexFactored(n, ar, ai, piv, br, bi);
    },
  };
}
