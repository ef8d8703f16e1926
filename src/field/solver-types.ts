/**
 * The discrete problem of the field solver and what a solution holds: the bodies with their
 * materials and roles, the assembled system, the per-coil solution. Internal.
 *
 * @packageDocumentation
 */
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
