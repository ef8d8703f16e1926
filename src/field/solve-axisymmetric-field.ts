/**
 * `solveAxisymmetricField`: the time-harmonic eddy-current field of coaxial coils, parts and
 * concentrators in the r–z half-plane by quadratic finite elements — the refinement of the mesh
 * to the accuracy asked for, and the result (impedances, losses, the field at a point). The
 * types are in `field-types.ts`, the reading of the options in `read-field-problem.ts`.
 *
 * @packageDocumentation
 */
import { requireFinite, requireKnownKeys, requireNonNegative, requireObject } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import type { Complex } from "../special/index.js";
import { bodyLosses, fieldAtProbe, impedanceChange, probe } from "./field-evaluation.js";
import type {
  AxisymmetricFieldCoilResult,
  AxisymmetricFieldPoint,
  AxisymmetricFieldResult,
  FieldFluxDensity,
  SolveAxisymmetricFieldOptions,
} from "./field-types.js";
import { readProblem } from "./read-field-problem.js";
import { MAX_SATURATION_ITERATIONS, solveSaturating } from "./saturation.js";
import { solveOnce } from "./solver.js";
import type { SolverProblem, SolverSolution } from "./solver-types.js";

export type {
  AxisymmetricFieldCoil,
  AxisymmetricFieldCoilResult,
  AxisymmetricFieldPoint,
  AxisymmetricFieldResult,
  FieldCircle,
  FieldCurvePoint,
  FieldFluxDensity,
  FieldMagnetisation,
  FieldMeshSize,
  FieldRectangle,
  FieldRegion,
  FieldRegionResult,
  FieldSaturationResult,
  FieldShape,
  FieldWindingBlock,
  SolveAxisymmetricFieldOptions,
} from "./field-types.js";

/** The fixed point of the saturating regions stops at a residual of accuracy / this. */
const SATURATION_TOLERANCE_DIVISOR = 10;
const POINT_KEYS = ["r", "z"] as const;
/** Densest mesh tried (element sizes ∝ 1/density); the heat-up's starting refinement uses it too. */
export const MAX_DENSITY = 4;
/** Largest mesh the refinement goes to (lattice nodes; a mesh about twice the last one is predicted). */
export const MAX_NODES = 300_000;
/** Ratio of element sizes between successive meshes. */
const REFINE = Math.SQRT2;

/**
 * Solves the time-harmonic eddy-current field of coaxial coils, parts and concentrators
 * (axisymmetric; linear materials, or saturating steel given by its B–H curve) by quadratic
 * finite elements, and returns each coil's impedance, the losses in every body and the field.
 *
 * The unknown is the azimuthal vector potential $A_\varphi(r, z)$ (RMS phasor) with
 * $\mathbf B = \nabla\times(A_\varphi\hat\varphi)$:
 * $$\nabla\times\left(\frac{1}{\mu}\nabla\times A_\varphi\hat\varphi\right) + j\omega\sigma A_\varphi\hat\varphi = J_s\hat\varphi ,$$
 * weak form $\int\nu\,(B_rB_r' + B_zB_z')\,r\,dr\,dz + j\omega\int\sigma A A'\,r\,dr\,dz = \int J_sA'\,r\,dr\,dz$
 * with $B_r = -\partial_zA$, $B_z = \partial_rA + A/r$, $A = 0$ on the axis. A solid turn $k$
 * carries $J = \sigma(-j\omega A + V_k/2\pi r)$ with one unknown voltage $V_k$ per turn and
 * its total current fixed (the turns in series); a stranded shape carries a uniform
 * $J = nI/S$. Terminal voltage: $\sum_k V_k$ over solid turns, plus
 * $j\omega\,n\,\frac{2\pi}{S}\int rA\,dS + R_{dc}I$ over stranded shapes; impedances are
 * voltage over current with the other coils open-circuited.
 *
 * Method: six-node isoparametric triangles on a graded grid whose lines follow every
 * rectangle edge and are bent into circles around each round conductor; the element size at
 * a conductor's surface is half a skin depth (and a third of its smallest dimension), growing
 * geometrically away from it; along an edge of a part at distance D from the nearest coil (of
 * size S) the surface size grows as $(D/S)^{1.5}$ (the far edge's share of the error stays no
 * larger than a near one's); the outer boundary ($A = 0$) lies at least 12 times the size of
 * the arrangement away. The sparse system is factorised once ({@link factorComplexSymmetric},
 * nested-dissection order); the solid-turn voltages come from a small dense Schur complement.
 * The mesh is refined by $\sqrt2$ in element size until the self-resistance and
 * self-reactance of every coil change by less than `accuracy` between the last two meshes;
 * that change is `estimatedError`.
 *
 * Saturating steel (`magnetisation: { curve }`): each element gets the effective permeability
 * of the fundamental harmonic, $\mu_\mathrm{eff}(\hat H) = \hat B_1(\hat H)/\hat H$ with
 * $\hat B_1(\hat H) = \frac{4}{\pi}\int_0^{\pi/2} B(\hat H\sin\theta)\sin\theta\,d\theta$ (the
 * fundamental of B when H is sinusoidal; a real permeability), at the peak field of its
 * centroid, $\hat H = \nu\sqrt2\,(|B_r|^2 + |B_z|^2)^{1/2}$. The reluctivities are found by a
 * fixed-point iteration on $\ln\nu$ with Anderson mixing (each step one linear solve) on
 * each mesh of the refinement, starting from the previous mesh's values; it stops when the
 * first-order change of the complex power one more update would make,
 * $\omega\sum_t|\Delta\nu_t|\,|B_t|^2V_t/|S|$, is below accuracy/10. That bound is
 * `saturation.residual` and is added to `estimatedError`; the meshes are sized for the
 * unsaturated permeability (the skin depth at the saturation front).
 *
 * @param options - frequency, coils, regions and accuracy ({@link SolveAxisymmetricFieldOptions})
 * @returns per-coil impedances and losses, per-region losses, `fieldAt`, `powerDensityAt`,
 *   the mesh size and the estimated error ({@link AxisymmetricFieldResult})
 * @throws {@link InputError} for non-positive frequency or resistivity, a negative current,
 *   accuracy outside [1e-4, 0.1], relative permeability < 1, a B–H curve with fewer than 2
 *   points, non-positive or non-increasing H or B, or given together with
 *   `relativePermeability`, malformed shapes, overlapping
 *   bodies, a round conductor whose bounding square touches another body or the axis,
 *   duplicate names, a winding block with `model: "solid"`, and unknown option keys
 * @remarks Validity: isotropic materials with constant ρ and either constant μr or a single-valued
 *   B–H curve (no hysteresis loss; harmonics of the field are not solved, only their effect on
 *   the fundamental through the effective permeability); every turn is a closed
 *   coaxial ring (helical pitch ignored). A round conductor reserves its bounding square: other
 *   bodies may touch neither it nor the axis (close-wound round turns need a small gap, or
 *   rectangles). When the finest mesh (density 4) does not reach `accuracy`, the note
 *   `"accuracy-not-reached"` is returned; so it is when the next mesh would exceed about
 *   300 000 nodes (memory and time bound); `"saturation-not-converged"` (and
 *   `saturation.converged: false`) when the iteration for saturating regions has not reached
 *   its bound after 60 solves on a mesh. Not yet covered: the coupled heat conduction.
 *   Saturating solves cost one linear solve per iteration: 4–10 per mesh.
 *
 *   Saturating steel (measured, test/field/saturation.test.ts): the effective-permeability
 *   idealisation itself (no hysteresis, fundamental only) gives the power into a saturated
 *   surface up to 10 % low and its reactance up to 30 % high against a time-domain solution of
 *   the nonlinear diffusion in a half-space with the static curve (−4.6 % and +15 % for a
 *   steel at 100 kA/m, −7.9 % and +27 % in the step-curve limit of MacLean and Agarwal); the
 *   solver's surface impedance of a saturated 20 mm bar agrees with the 1-D solution of the
 *   same idealisation within 2 % (0.1 % R, 0.7 % X measured).
 *
 *   Accuracy (measured, test/field): against the exact closed forms the actual error was below
 *   `estimatedError` in every case checked, and ΔR, ΔX within 0.5 % at accuracy 1e-3 — coil
 *   over a plate (Dodd & Deeds, TEAM 15 problem 1 coil), coil around a long rod (Dodd, Deeds &
 *   Luquire), bar in a long coil (exact Bessel solution, μr 1 and 100, a/δ = 0.5, 2, 10),
 *   stranded coils in air (filament sums), solid round rings (Kelvin-function limit).
 * @see C. V. Dodd, W. E. Deeds, "Analytical solutions to eddy-current probe-coil problems",
 *   J. Appl. Phys. 39 (1968) 2829–2838 (the $A_\varphi$ formulation); O. C. Zienkiewicz,
 *   R. L. Taylor, The Finite Element Method, vol. 1, ch. 8 (isoparametric quadratic triangles);
 *   D. A. Dunavant, Int. J. Numer. Meth. Eng. 21 (1985) 1129–1148 (7-point quadrature);
 *   P. P. Silvester, R. L. Ferrari, Finite Elements for Electrical Engineers, 3rd ed. (1996),
 *   ch. 9 (axisymmetric eddy currents with voltage-driven solid conductors).
 * @example
 * ```ts
 * import { solveAxisymmetricField } from "fluxwright";
 * // a 3-turn copper pancake (4 mm round tube) 3 mm above a 10 mm steel plate, 20 kHz
 * const field = solveAxisymmetricField({
 *   frequency: 20e3,
 *   coils: [{
 *     name: "pancake", current: 100, resistivity: 1.75e-8, model: "solid",
 *     turns: [20e-3, 28e-3, 36e-3].map((r) => ({ kind: "circle" as const, r, z: 5e-3, radius: 2e-3, innerRadius: 1.2e-3 })),
 *   }],
 *   regions: [{ name: "plate", shape: { kind: "rectangle", rMin: 0, rMax: 0.08, zMin: -10e-3, zMax: 0 },
 *               resistivity: 2e-7, relativePermeability: 1 }],
 *   accuracy: 1e-2,
 * });
 * console.log(field.coils.pancake.inductance.toExponential(1)); // ≈ 2.6e-7
 * console.log(field.regions.plate.losses.toFixed(0)); // ≈ 33
 * ```
 * @category Field
 */
export function solveAxisymmetricField(options: SolveAxisymmetricFieldOptions): AxisymmetricFieldResult {
  const { problem, coilNames, regionNames, currents, accuracy } = readProblem(options);
  const I = currents.map((re) => ({ re, im: 0 }));
  const refined = refineToAccuracy(problem, I, accuracy);
  const { solution: sol, estimate, saturation: last, saturating, nuTolerance } = refined;
  const losses = bodyLosses(problem, sol, I);
  const coils = coilResults(problem, sol, coilNames, currents, losses);
  const regions: Record<string, { losses: number }> = {};
  regionNames.forEach((name, k) => {
    let p = 0;
    problem.bodies.forEach((b, bi) => {
      if (b.role === "region" && b.owner === k) p += losses[bi]!;
    });
    regions[name] = { losses: p };
  });
  const validity: ValidityNote[] = [];
  if (estimate > accuracy) {
    validity.push({
      code: "accuracy-not-reached",
      message: `the finest mesh tried (${sol.nodes} nodes) changes the impedance by ${estimate.toExponential(1)} relative, above the accuracy asked for`,
      value: estimate,
      limit: accuracy,
    });
  }
  if (saturating && !last.converged) {
    validity.push({
      code: "saturation-not-converged",
      message: `the effective-permeability iteration stopped after ${last.iterations} solves (limit ${MAX_SATURATION_ITERATIONS}) with an impedance still changing by up to ${last.residual.toExponential(1)} relative per update`,
      value: last.residual,
      limit: nuTolerance,
    });
  }
  return {
    coils,
    regions,
    fieldAt(point: AxisymmetricFieldPoint) {
      return fluxDensityAt(problem, sol, I, point);
    },
    powerDensityAt(point: AxisymmetricFieldPoint) {
      return powerDensityAt(problem, sol, I, currents, point);
    },
    mesh: { nodes: sol.nodes, elements: sol.elements },
    estimatedError: estimate + last.residual,
    validity,
    saturation: saturating
      ? { method: "first-harmonic effective permeability", iterations: last.iterations, residual: last.residual, converged: last.converged }
      : { method: "linear", iterations: 1, residual: 0, converged: true },
  };
}

/** How the saturation iteration of the last mesh ended. */
interface SaturationState {
  readonly iterations: number;
  readonly residual: number;
  readonly largestChange: number;
  readonly converged: boolean;
}

/**
 * Solves on meshes refined by √2 in element size until every coil's self-resistance and
 * self-reactance change by less than `accuracy` between the last two (or the densest or largest
 * mesh is reached); saturating problems iterate on each mesh from the previous one's
 * reluctivities.
 */
function refineToAccuracy(
  problem: SolverProblem,
  I: readonly { re: number; im: number }[],
  accuracy: number,
): { solution: SolverSolution; estimate: number; saturation: SaturationState; saturating: boolean; nuTolerance: number } {
  const nc = problem.coilCount;
  // starting density from the measured convergence (impedance error ≈ 2.5e-3·density⁻⁴ on the checks)
  let density = Math.min(MAX_DENSITY / REFINE, Math.max(0.7, Math.pow(1e-3 / accuracy, 0.25)));
  const saturating = problem.bodies.some((b) => b.curve !== undefined);
  // saturating regions: the fixed point is converged to well below the accuracy asked for
  const nuTolerance = accuracy / SATURATION_TOLERANCE_DIVISOR;
  let last: SaturationState = { iterations: 0, residual: 0, largestChange: 0, converged: true };
  let previous: { solution: SolverSolution; nu: Float64Array } | undefined;
  const solveAt = (d: number): SolverSolution => {
    if (!saturating) return solveOnce(problem, { density: d });
    const r = solveSaturating(problem, d, I, nuTolerance, previous);
    last = { iterations: r.iterations, residual: r.residual, largestChange: r.largestChange, converged: r.converged };
    previous = { solution: r.solution, nu: r.nu };
    return r.solution;
  };
  let coarse = solveAt(density);
  density *= REFINE;
  let fine = solveAt(density);
  let estimate = impedanceChange(coarse, fine, nc);
  while (estimate > accuracy && density * REFINE <= MAX_DENSITY * 1.0001 && 2.2 * fine.nodes <= MAX_NODES) {
    density *= REFINE;
    coarse = fine;
    fine = solveAt(density);
    estimate = impedanceChange(coarse, fine, nc);
  }
  return { solution: fine, estimate, saturation: last, saturating, nuTolerance };
}

/** Each coil's impedances, terminal voltage and own conductor loss, by name. */
function coilResults(
  problem: SolverProblem,
  sol: SolverSolution,
  coilNames: readonly string[],
  currents: readonly number[],
  losses: Float64Array,
): Record<string, AxisymmetricFieldCoilResult> {
  const nc = problem.coilCount;
  const omega = sol.omega;
  const coils: Record<string, AxisymmetricFieldCoilResult> = {};
  coilNames.forEach((name, c) => {
    const k = c * nc + c;
    const mutualImpedance: Record<string, Complex> = {};
    let vr = 0;
    let vi = 0;
    coilNames.forEach((other, d) => {
      const zr = sol.zRe[c * nc + d]!;
      const zi = sol.zIm[c * nc + d]!;
      if (d !== c) mutualImpedance[other] = { re: zr, im: zi };
      vr += zr * currents[d]!;
      vi += zi * currents[d]!;
    });
    let own = 0;
    problem.bodies.forEach((b, bi) => {
      if (b.role !== "region" && b.owner === c) own += losses[bi]!;
    });
    coils[name] = {
      resistance: sol.zRe[k]!,
      inductance: sol.zIm[k]! / omega,
      impedance: { re: sol.zRe[k]!, im: sol.zIm[k]! },
      mutualImpedance,
      voltage: { re: vr, im: vi },
      losses: own,
    };
  });
  return coils;
}

/** A point of `fieldAt` or `powerDensityAt`, checked. */
function readPoint(fn: string, point: AxisymmetricFieldPoint): { r: number; z: number } {
  const p = requireKnownKeys(fn, "point", requireObject(fn, "point", point), POINT_KEYS);
  return { r: requireNonNegative(fn, "point.r", p.r, "m"), z: requireFinite(fn, "point.z", p.z, "m") };
}

/** The flux density at a point (zero outside the solution box). */
function fluxDensityAt(problem: SolverProblem, sol: SolverSolution, I: readonly { re: number; im: number }[], point: AxisymmetricFieldPoint): FieldFluxDensity {
  const { r, z } = readPoint("fieldAt", point);
  const pr = probe(sol.mesh, r, z);
  if (pr === null) return { br: { re: 0, im: 0 }, bz: { re: 0, im: 0 } };
  const f = fieldAtProbe(problem, sol, I, pr);
  // B_r = −∂A/∂z, B_z = ∂A/∂r + A/r (→ 2∂A/∂r on the axis)
  const tiny = r < 1e-12 * Math.max(1, problem.extent.rMax);
  return {
    br: { re: -f.dzR, im: -f.dzI },
    bz: tiny ? { re: 2 * f.drR, im: 2 * f.drI } : { re: f.drR + f.ar / r, im: f.drI + f.ai / r },
  };
}

/** The time-average power density of the eddy or coil current at a point [W/m³]. */
function powerDensityAt(
  problem: SolverProblem,
  sol: SolverSolution,
  I: readonly { re: number; im: number }[],
  currents: readonly number[],
  point: AxisymmetricFieldPoint,
): number {
  const omega = sol.omega;
  const { r, z } = readPoint("powerDensityAt", point);
  const pr = probe(sol.mesh, r, z);
  if (pr === null) return 0;
  const f = fieldAtProbe(problem, sol, I, pr);
  if (f.body < 0) return 0;
  const b = problem.bodies[f.body]!;
  if (b.role === "stranded") {
    const J = sol.strandDensity[f.body]! * currents[b.owner]!;
    return b.resistivity * J * J;
  }
  if (b.sigma === 0) return 0;
  let er = omega * f.ai;
  let ei = -omega * f.ar;
  if (b.role === "solid" && r > 0) {
    er += f.phiR / r;
    ei += f.phiI / r;
  }
  return b.sigma * (er * er + ei * ei);
}
