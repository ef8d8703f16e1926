/**
 * `solveAxisymmetricField`: the time-harmonic eddy-current field of coaxial coils, parts and
 * concentrators in the r–z half-plane by quadratic finite elements.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireFinite,
  requireInRange,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import type { Complex } from "../special/index.js";
import type { MeshShape } from "./mesh.js";
import { MU_0 } from "../units/index.js";
import { effectiveCurve } from "./effective-curve.js";
import type { CurvePoint } from "./effective-curve.js";
import { bodyLosses, fieldAtProbe, probe } from "./field-evaluation.js";
import { solveOnce } from "./solver.js";
import { MAX_SATURATION_ITERATIONS, solveSaturating } from "./saturation.js";
import type { SolverBody, SolverProblem, SolverSolution } from "./solver-types.js";

/**
 * A rectangle of the r–z half-plane (a ring of rectangular cross-section in 3-D).
 *
 * @category Field
 */
export interface FieldRectangle {
  /** Discriminant. */
  readonly kind: "rectangle";
  /** Inner radius [m], ≥ 0 (0: the body reaches the axis). */
  readonly rMin: number;
  /** Outer radius [m], > rMin. */
  readonly rMax: number;
  /** Lower axial coordinate [m]. */
  readonly zMin: number;
  /** Upper axial coordinate [m], > zMin. */
  readonly zMax: number;
}

/**
 * A circle of the r–z half-plane (a ring of round wire, or of round tube with `innerRadius`).
 *
 * @category Field
 */
export interface FieldCircle {
  /** Discriminant. */
  readonly kind: "circle";
  /** Radius of the centre [m], > radius (the ring must not touch the axis). */
  readonly r: number;
  /** Axial coordinate of the centre [m]. */
  readonly z: number;
  /** Outer radius of the cross-section [m], > 0. */
  readonly radius: number;
  /** Bore radius of a tube [m], in [0, radius); 0 or omitted for a solid round conductor. */
  readonly innerRadius?: number;
}

/**
 * A cross-section shape in the r–z half-plane.
 *
 * @category Field
 */
export type FieldShape = FieldRectangle | FieldCircle;

/**
 * A stranded winding block: `count` turns sharing one cross-section with uniform current density.
 *
 * @category Field
 */
export interface FieldWindingBlock {
  /** Cross-section of the whole block. */
  readonly shape: FieldShape;
  /** Number of turns, an integer ≥ 1. */
  readonly count: number;
}

/**
 * Flux density at a point: RMS phasors of its radial and axial components [T].
 *
 * @category Field
 */
export interface FieldFluxDensity {
  /** Radial component $B_r$ [T, RMS phasor]. */
  readonly br: Complex;
  /** Axial component $B_z$ [T, RMS phasor]. */
  readonly bz: Complex;
}

/**
 * Losses of one region.
 *
 * @category Field
 */
export interface FieldRegionResult {
  /** Time-average eddy-current loss [W] (0 for a non-conductor). */
  readonly losses: number;
}

/**
 * Size of a finite-element mesh.
 *
 * @category Field
 */
export interface FieldMeshSize {
  /** Nodes of the quadratic triangles (including those on the outer boundary and the axis). */
  readonly nodes: number;
  /** Quadratic triangles. */
  readonly elements: number;
}

/**
 * A coil: turns in series carrying the same current.
 *
 * @category Field
 */
export interface AxisymmetricFieldCoil {
  /** Name (unique among the coils), the key of its result. */
  readonly name: string;
  /** RMS current through every turn [A], ≥ 0 (0: an open-circuited coil, e.g. to read a mutual impedance). */
  readonly current: number;
  /**
   * Each turn's cross-section (a list, one shape per turn), or a stranded winding block of
   * `count` turns sharing one cross-section (`model: "stranded"` only).
   */
  readonly turns: readonly FieldShape[] | FieldWindingBlock;
  /** Resistivity of the conductor [Ω·m], > 0. */
  readonly resistivity: number;
  /**
   * `"solid"`: each turn is a solid conductor whose current distribution is solved (skin and
   * proximity effect), the turns in series; `"stranded"`: uniform current density over each
   * shape (litz, fine-wire bundles; fill factor 1 for the DC resistance).
   */
  readonly model: "solid" | "stranded";
}

/**
 * One point of a B–H curve.
 *
 * @category Field
 */
export interface FieldCurvePoint {
  /** Field strength H [A/m], > 0. */
  readonly fieldStrength: number;
  /** Flux density B [T], > 0. */
  readonly fluxDensity: number;
}

/**
 * A saturating material: its (anhysteretic, single-valued) B–H curve.
 *
 * @category Field
 */
export interface FieldMagnetisation {
  /**
   * Points of the curve, H and B both strictly increasing and positive (at least 2); the curve
   * runs straight from the origin to the first point, between the points, and beyond the last
   * point with slope μ0 (full saturation).
   */
  readonly curve: readonly FieldCurvePoint[];
}

/**
 * How the saturating regions were solved.
 *
 * @category Field
 */
export interface FieldSaturationResult {
  /**
   * The method: `"linear"` when no region has a B–H curve (one solve per mesh), else the
   * effective permeability of the fundamental harmonic, per element.
   */
  readonly method: "linear" | "first-harmonic effective permeability";
  /** Linear solves on the finest mesh (1 for linear materials; the fixed-point steps otherwise). */
  readonly iterations: number;
  /**
   * Bound on the relative impedance change one more update of the element permeabilities
   * would make (first order; see {@link solveAxisymmetricField}); part of `estimatedError`.
   */
  readonly residual: number;
  /**
   * Whether `residual` fell below accuracy/10 within 60 solves per mesh; when not, `validity`
   * holds `"saturation-not-converged"`.
   */
  readonly converged: boolean;
}

/**
 * A part, a concentrator or any other passive body.
 *
 * @category Field
 */
export interface FieldRegion {
  /** Name (unique among the regions), the key of its result. */
  readonly name: string;
  /** Cross-section. */
  readonly shape: FieldShape;
  /** Resistivity [Ω·m], > 0; omitted for a non-conductor (a ferrite, an insulator). */
  readonly resistivity?: number;
  /** Relative permeability [-], ≥ 1 (linear); default 1. Not together with `magnetisation`. */
  readonly relativePermeability?: number;
  /** Saturating steel: the B–H curve instead of a fixed permeability. */
  readonly magnetisation?: FieldMagnetisation;
}

/**
 * Options of {@link solveAxisymmetricField}.
 *
 * @category Field
 */
export interface SolveAxisymmetricFieldOptions {
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** The coils, at least one. */
  readonly coils: readonly AxisymmetricFieldCoil[];
  /** Parts and concentrators; default none. */
  readonly regions?: readonly FieldRegion[];
  /** Target relative error of each coil's resistance and reactance, in [1e-4, 0.1]; default 1e-3. */
  readonly accuracy?: number;
}

/**
 * A point of the r–z half-plane.
 *
 * @category Field
 */
export interface AxisymmetricFieldPoint {
  /** Radius [m], ≥ 0. */
  readonly r: number;
  /** Axial coordinate [m]. */
  readonly z: number;
}

/**
 * What one coil's terminals see.
 *
 * @category Field
 */
export interface AxisymmetricFieldCoilResult {
  /** Self-resistance [Ω]: conductor loss and the losses it induces, with the other coils open. */
  readonly resistance: number;
  /** Self-inductance [H], with the other coils open. */
  readonly inductance: number;
  /** Self-impedance $R + j\omega L$ [Ω]. */
  readonly impedance: Complex;
  /** Mutual impedance to each other coil [Ω]: voltage here per ampere there. */
  readonly mutualImpedance: Readonly<Record<string, Complex>>;
  /** Terminal voltage with every coil at its current [V RMS phasor, current as reference]. */
  readonly voltage: Complex;
  /** Time-average loss in this coil's own conductor with every coil at its current [W]. */
  readonly losses: number;
}

/**
 * Result of {@link solveAxisymmetricField}.
 *
 * @category Field
 */
export interface AxisymmetricFieldResult {
  /** Per coil, by name. */
  readonly coils: Readonly<Record<string, AxisymmetricFieldCoilResult>>;
  /** Per region, by name: time-average eddy-current loss [W] (0 for non-conductors). */
  readonly regions: Readonly<Record<string, FieldRegionResult>>;
  /**
   * Flux density at a point [T, RMS phasors]: radial and axial components. Zero outside the
   * solution box (which extends at least 12 times the size of the arrangement beyond it).
   * Point values of B are derivatives of the element solution (linear in each element): less
   * accurate than the impedance — within 2 % in the checks at accuracy 1e-3 (1.2 % measured on
   * the axis of a thick coil in air).
   */
  fieldAt(point: AxisymmetricFieldPoint): FieldFluxDensity;
  /**
   * Time-average power density of the eddy (or coil) current at a point [W/m³]; within 1 % of
   * the exact value at the surface of a bar in a long coil at accuracy 3e-3.
   */
  powerDensityAt(point: AxisymmetricFieldPoint): number;
  /** Size of the finest mesh solved: lattice nodes and quadratic triangles. */
  readonly mesh: FieldMeshSize;
  /**
   * Estimated relative error of the coils' resistance and reactance (the larger of the two,
   * over all coils): the change between the last two meshes.
   */
  readonly estimatedError: number;
  /** Where the result may fall short (e.g. `"accuracy-not-reached"`, `"saturation-not-converged"`). */
  readonly validity: readonly ValidityNote[];
  /** How the materials were solved: `method` `"linear"` (no iteration) or the saturation iteration. */
  readonly saturation: FieldSaturationResult;
}

const WHERE = "solveAxisymmetricField";
const OPTION_KEYS = ["frequency", "coils", "regions", "accuracy"] as const;
const COIL_KEYS = ["name", "current", "turns", "resistivity", "model"] as const;
const REGION_KEYS = ["name", "shape", "resistivity", "relativePermeability", "magnetisation"] as const;
const MAGNETISATION_KEYS = ["curve"] as const;
const CURVE_POINT_KEYS = ["fieldStrength", "fluxDensity"] as const;
/** The fixed point of the saturating regions stops at a residual of accuracy / this. */
const SATURATION_TOLERANCE_DIVISOR = 10;
const RECT_KEYS = ["kind", "rMin", "rMax", "zMin", "zMax"] as const;
const CIRCLE_KEYS = ["kind", "r", "z", "radius", "innerRadius"] as const;
const BLOCK_KEYS = ["shape", "count"] as const;
const POINT_KEYS = ["r", "z"] as const;
/** Densest mesh tried (element sizes ∝ 1/density). */
const MAX_DENSITY = 4;
/** Largest mesh the refinement goes to (lattice nodes; a mesh about twice the last one is predicted). */
const MAX_NODES = 300_000;
/** Ratio of element sizes between successive meshes. */
const REFINE = Math.SQRT2;

function checkShape(path: string, value: unknown): MeshShape {
  const o = requireObject(WHERE, path, value);
  const kind = requireOneOf(WHERE, `${path}.kind`, o.kind, ["rectangle", "circle"] as const);
  if (kind === "rectangle") {
    requireKnownKeys(WHERE, path, o, RECT_KEYS);
    const rMin = requireNonNegative(WHERE, `${path}.rMin`, o.rMin, "m");
    const rMax = requireFinite(WHERE, `${path}.rMax`, o.rMax, "m");
    if (!(rMax > rMin)) throw new InputError(WHERE, `${path}.rMax`, rMax, "m", `a finite number > rMin = ${rMin}`);
    const zMin = requireFinite(WHERE, `${path}.zMin`, o.zMin, "m");
    const zMax = requireFinite(WHERE, `${path}.zMax`, o.zMax, "m");
    if (!(zMax > zMin)) throw new InputError(WHERE, `${path}.zMax`, zMax, "m", `a finite number > zMin = ${zMin}`);
    return { kind, rMin, rMax, zMin, zMax };
  }
  requireKnownKeys(WHERE, path, o, CIRCLE_KEYS);
  const radius = requirePositive(WHERE, `${path}.radius`, o.radius, "m");
  const r = requirePositive(WHERE, `${path}.r`, o.r, "m");
  if (!(r > radius)) throw new InputError(WHERE, `${path}.r`, r, "m", `a number > radius = ${radius} (clear of the axis)`);
  const z = requireFinite(WHERE, `${path}.z`, o.z, "m");
  const innerRadius = o.innerRadius === undefined ? 0 : requireInRange(WHERE, `${path}.innerRadius`, o.innerRadius, "m", 0, radius, "[)");
  return { kind, r, z, radius, innerRadius };
}

/** A validated B–H curve: at least 2 points, H and B positive and strictly increasing, μr ≤ 1e6. */
function checkCurve(path: string, value: unknown): CurvePoint[] {
  const o = requireKnownKeys(WHERE, path, requireObject(WHERE, path, value), MAGNETISATION_KEYS);
  if (!Array.isArray(o.curve) || o.curve.length < 2) {
    throw new InputError(WHERE, `${path}.curve`, o.curve, "", "an array of at least 2 points { fieldStrength, fluxDensity }");
  }
  const out: CurvePoint[] = [];
  (o.curve as unknown[]).forEach((raw, k) => {
    const pp = `${path}.curve[${k}]`;
    const p = requireKnownKeys(WHERE, pp, requireObject(WHERE, pp, raw), CURVE_POINT_KEYS);
    const fieldStrength = requirePositive(WHERE, `${pp}.fieldStrength`, p.fieldStrength, "A/m");
    const fluxDensity = requirePositive(WHERE, `${pp}.fluxDensity`, p.fluxDensity, "T");
    const prev = out[k - 1];
    if (prev && !(fieldStrength > prev.fieldStrength)) {
      throw new InputError(WHERE, `${pp}.fieldStrength`, fieldStrength, "A/m", `a value > the previous point's ${prev.fieldStrength} (strictly increasing)`);
    }
    if (prev && !(fluxDensity > prev.fluxDensity)) {
      throw new InputError(WHERE, `${pp}.fluxDensity`, fluxDensity, "T", `a value > the previous point's ${prev.fluxDensity} (strictly increasing)`);
    }
    if (!(fluxDensity / (MU_0 * fieldStrength) <= 1e6)) {
      throw new InputError(WHERE, `${pp}.fluxDensity`, fluxDensity, "T", `a point with B/(μ0·H) ≤ 1e6`);
    }
    out.push({ fieldStrength, fluxDensity });
  });
  return out;
}

/** Axis-aligned bounding square/rectangle of a shape (the region the mesher reserves). */
function box(s: MeshShape): [number, number, number, number] {
  return s.kind === "rectangle" ? [s.rMin, s.rMax, s.zMin, s.zMax] : [s.r - s.radius, s.r + s.radius, s.z - s.radius, s.z + s.radius];
}

/** Gap between two boxes in the ∞-norm (negative when they overlap with positive area). */
function boxGap(a: [number, number, number, number], b: [number, number, number, number]): number {
  const gr = Math.max(b[0] - a[1], a[0] - b[1]);
  const gz = Math.max(b[2] - a[3], a[2] - b[3]);
  if (gr < 0 && gz < 0) return Math.max(gr, gz);
  return Math.max(gr, gz);
}

/** Validated problem: bodies, names, block sizes. */
export function readProblem(options: SolveAxisymmetricFieldOptions): {
  problem: SolverProblem;
  coilNames: string[];
  regionNames: string[];
  currents: number[];
  accuracy: number;
} {
  requireKnownKeys(WHERE, "", options, OPTION_KEYS);
  const frequency = requirePositive(WHERE, "frequency", options.frequency, "Hz");
  const accuracy = options.accuracy === undefined ? 1e-3 : requireInRange(WHERE, "accuracy", options.accuracy, "", 1e-4, 0.1);
  if (!Array.isArray(options.coils) || options.coils.length === 0) {
    throw new InputError(WHERE, "coils", options.coils, "", "a non-empty array of coils");
  }
  const regionsIn: unknown = options.regions === undefined ? [] : options.regions;
  if (!Array.isArray(regionsIn)) throw new InputError(WHERE, "regions", regionsIn, "", "an array of regions");
  const bodies: SolverBody[] = [];
  const coilNames: string[] = [];
  const currents: number[] = [];
  (options.coils as readonly unknown[]).forEach((raw, c) => {
    const path = `coils[${c}]`;
    const o = requireKnownKeys(WHERE, path, requireObject(WHERE, path, raw), COIL_KEYS);
    if (typeof o.name !== "string" || o.name === "" || coilNames.includes(o.name)) {
      throw new InputError(WHERE, `${path}.name`, o.name, "", "a non-empty name, unique among the coils");
    }
    coilNames.push(o.name);
    currents.push(requireNonNegative(WHERE, `${path}.current`, o.current, "A"));
    const resistivity = requirePositive(WHERE, `${path}.resistivity`, o.resistivity, "Ω·m");
    const model = requireOneOf(WHERE, `${path}.model`, o.model, ["solid", "stranded"] as const);
    if (Array.isArray(o.turns)) {
      const turns = o.turns as unknown[];
      if (turns.length === 0) throw new InputError(WHERE, `${path}.turns`, turns, "", "at least one turn");
      turns.forEach((t, k) => {
        const shape = checkShape(`${path}.turns[${k}]`, t);
        bodies.push({
          shape,
          sigma: model === "solid" ? 1 / resistivity : 0,
          mur: 1,
          role: model,
          owner: c,
          count: 1,
          resistivity,
        });
      });
    } else {
      const b = requireKnownKeys(WHERE, `${path}.turns`, requireObject(WHERE, `${path}.turns`, o.turns), BLOCK_KEYS);
      if (model !== "stranded") {
        throw new InputError(WHERE, `${path}.turns`, "{ shape, count }", "", 'a list of turn shapes (a winding block needs model "stranded")');
      }
      const count = b.count;
      if (typeof count !== "number" || !Number.isInteger(count) || count < 1) {
        throw new InputError(WHERE, `${path}.turns.count`, count, "", "an integer ≥ 1");
      }
      bodies.push({ shape: checkShape(`${path}.turns.shape`, b.shape), sigma: 0, mur: 1, role: "stranded", owner: c, count, resistivity });
    }
  });
  const regionNames: string[] = [];
  (regionsIn as unknown[]).forEach((raw, k) => {
    const path = `regions[${k}]`;
    const o = requireKnownKeys(WHERE, path, requireObject(WHERE, path, raw), REGION_KEYS);
    if (typeof o.name !== "string" || o.name === "" || regionNames.includes(o.name)) {
      throw new InputError(WHERE, `${path}.name`, o.name, "", "a non-empty name, unique among the regions");
    }
    regionNames.push(o.name);
    const shape = checkShape(`${path}.shape`, o.shape);
    const sigma = o.resistivity === undefined ? 0 : 1 / requirePositive(WHERE, `${path}.resistivity`, o.resistivity, "Ω·m");
    if (o.magnetisation !== undefined) {
      if (o.relativePermeability !== undefined) {
        throw new InputError(WHERE, `${path}.magnetisation`, "with relativePermeability", "", "either relativePermeability or magnetisation, not both");
      }
      const curve = effectiveCurve(checkCurve(`${path}.magnetisation`, o.magnetisation));
      bodies.push({ shape, sigma, mur: curve.maxRelativePermeability, role: "region", owner: k, count: 1, resistivity: sigma > 0 ? 1 / sigma : 0, curve });
      return;
    }
    const mur = o.relativePermeability === undefined ? 1 : requireInRange(WHERE, `${path}.relativePermeability`, o.relativePermeability, "", 1, 1e6);
    bodies.push({ shape, sigma, mur, role: "region", owner: k, count: 1, resistivity: sigma > 0 ? 1 / sigma : 0 });
  });
  // Overlaps, and the free square around each circle where the mesher bends the grid.
  const boxes = bodies.map((b) => box(b.shape));
  const label = (i: number): string => {
    const b = bodies[i]!;
    return b.role === "region" ? `regions[${b.owner}]` : `coils[${b.owner}]`;
  };
  const blockHalfSizes = bodies.map(() => 0);
  for (let i = 0; i < bodies.length; i++) {
    const si = bodies[i]!.shape;
    let clearance = si.kind === "circle" ? si.r - si.radius : Infinity;
    for (let j = 0; j < bodies.length; j++) {
      if (j === i) continue;
      const g = boxGap(boxes[i]!, boxes[j]!);
      const sj = bodies[j]!.shape;
      if (g < 0) {
        throw new InputError(WHERE, label(j), "overlap", "", `a body clear of ${label(i)} (bodies must not overlap${si.kind === "circle" || sj.kind === "circle" ? "; a round conductor reserves its bounding square" : ""})`);
      }
      if (si.kind === "circle") clearance = Math.min(clearance, sj.kind === "circle" ? g / 2 : g / 2);
    }
    if (si.kind === "circle") {
      if (!(clearance > 1e-3 * si.radius)) {
        throw new InputError(WHERE, label(i), clearance, "m", `a round conductor whose bounding square keeps a gap > ${1e-3 * si.radius} m (radius/1000) from other bodies and the axis`);
      }
      blockHalfSizes[i] = si.radius + Math.min(clearance, 2 * si.radius);
    }
  }
  let rMax = 0;
  let zMin = Infinity;
  let zMax = -Infinity;
  for (const b of boxes) {
    rMax = Math.max(rMax, b[1]);
    zMin = Math.min(zMin, b[2]);
    zMax = Math.max(zMax, b[3]);
  }
  const problem: SolverProblem = {
    frequency,
    bodies,
    coilCount: coilNames.length,
    regionCount: regionNames.length,
    blockHalfSizes,
    extent: { rMax, zMin, zMax },
  };
  return { problem, coilNames, regionNames, currents, accuracy };
}

/** Largest relative change of any coil's self-resistance or self-reactance between two solutions. */
function change(a: SolverSolution, b: SolverSolution, nc: number): number {
  let e = 0;
  for (let c = 0; c < nc; c++) {
    const k = c * nc + c;
    e = Math.max(e, Math.abs(a.zRe[k]! - b.zRe[k]!) / Math.abs(b.zRe[k]!), Math.abs(a.zIm[k]! - b.zIm[k]!) / Math.abs(b.zIm[k]!));
  }
  return e;
}

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
  const read = readProblem(options);
  const { coilNames, regionNames, currents, accuracy } = read;
  const problem = read.problem;
  const nc = problem.coilCount;
  // starting density from the measured convergence (impedance error ≈ 2.5e-3·density⁻⁴ on the checks)
  let density = Math.min(MAX_DENSITY / REFINE, Math.max(0.7, Math.pow(1e-3 / accuracy, 0.25)));
  const I = currents.map((re) => ({ re, im: 0 }));
  const saturating = problem.bodies.some((b) => b.curve !== undefined);
  // saturating regions: the fixed point is converged to well below the accuracy asked for
  const nuTolerance = accuracy / SATURATION_TOLERANCE_DIVISOR;
  let last = { iterations: 0, residual: 0, largestChange: 0, converged: true };
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
  let estimate = change(coarse, fine, nc);
  while (estimate > accuracy && density * REFINE <= MAX_DENSITY * 1.0001 && 2.2 * fine.nodes <= MAX_NODES) {
    density *= REFINE;
    coarse = fine;
    fine = solveAt(density);
    estimate = change(coarse, fine, nc);
  }
  const sol = fine;
  const losses = bodyLosses(problem, sol, I);
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
      message: `the finest mesh tried (${fine.nodes} nodes) changes the impedance by ${estimate.toExponential(1)} relative, above the accuracy asked for`,
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
  const readPoint = (fn: string, point: AxisymmetricFieldPoint): { r: number; z: number } => {
    const p = requireKnownKeys(fn, "point", requireObject(fn, "point", point), POINT_KEYS);
    return { r: requireNonNegative(fn, "point.r", p.r, "m"), z: requireFinite(fn, "point.z", p.z, "m") };
  };
  return {
    coils,
    regions,
    fieldAt(point: AxisymmetricFieldPoint) {
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
    },
    powerDensityAt(point: AxisymmetricFieldPoint) {
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
    },
    mesh: { nodes: sol.nodes, elements: sol.elements },
    estimatedError: estimate + last.residual,
    validity,
    saturation: saturating
      ? { method: "first-harmonic effective permeability", iterations: last.iterations, residual: last.residual, converged: last.converged }
      : { method: "linear", iterations: 1, residual: 0, converged: true },
  };
}
