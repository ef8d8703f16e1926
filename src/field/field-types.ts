/**
 * The public types of {@link solveAxisymmetricField}: shapes, coils, regions, B–H curves, the
 * options and the result.
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import type { Complex } from "../special/index.js";

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
