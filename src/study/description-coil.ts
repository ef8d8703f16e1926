/**
 * The work coil of a heater description: its conductor (solid, litz, tube), its leads and its
 * shape (solenoid or pancake). Part of the study-file format (see description.ts).
 *
 * @packageDocumentation
 */
import type { ConductiveMaterial } from "../materials/index.js";
import type { ConductorMaterialId, QuantityInput } from "./description.js";

/**
 * A solid round wire.
 *
 * @category Heater study
 */
export interface SolidConductorDescription {
  /** Conductor type tag. */
  readonly kind: "solid";
  /** Wire diameter [m], > 0. */
  readonly diameter: QuantityInput;
  /** Conductor material id from the materials catalogue (`"copper"`, `"aluminium"`, `"silver"`) or a material set; default `"copper"`. */
  readonly material?: ConductorMaterialId | ConductiveMaterial;
}

/**
 * A litz wire of equal round strands.
 *
 * @category Heater study
 */
export interface LitzConductorDescription {
  /** Conductor type tag. */
  readonly kind: "litz";
  /** Number of strands, integer ≥ 1. */
  readonly strands: number;
  /** Diameter of one strand (bare copper) [m], > 0. */
  readonly strandDiameter: QuantityInput;
  /** Outer diameter of the bundle [m], > 0; default from a packing factor of 0.5 (common practice). */
  readonly outerDiameter?: QuantityInput;
  /** Conductor material id or a material set; default `"copper"`. */
  readonly material?: ConductorMaterialId | ConductiveMaterial;
}

/**
 * A hollow round tube (water-cooled work coils).
 *
 * @category Heater study
 */
export interface TubeConductorDescription {
  /** Conductor type tag. */
  readonly kind: "tube";
  /** Outer diameter of the tube [m], > 0. */
  readonly outerDiameter: QuantityInput;
  /** Wall thickness [m], > 0 and less than half the outer diameter. */
  readonly wallThickness: QuantityInput;
  /** Conductor material id or a material set; default `"copper"`. */
  readonly material?: ConductorMaterialId | ConductiveMaterial;
}

/**
 * The conductor a coil is wound from.
 *
 * @category Heater study
 */
export type HeaterConductor = SolidConductorDescription | LitzConductorDescription | TubeConductorDescription;

/**
 * Leads that are two parallel round conductors: the coil's own conductor (tube, solid wire or
 * litz bundle) continued side by side from the coil to the capacitor bank.
 *
 * @category Heater study
 */
export interface RoundPairLeadsDescription {
  /** Lead shape tag. */
  readonly shape: "round-pair";
  /** Centre-to-centre spacing of the two conductors [m], > the conductor's outer diameter. */
  readonly spacing: QuantityInput;
}

/**
 * Leads that are two flat bus bars, broad faces towards each other.
 *
 * @category Heater study
 */
export interface FlatPairLeadsDescription {
  /** Lead shape tag. */
  readonly shape: "flat-pair";
  /** Width of each bar (the broad face) [m], > 0. */
  readonly width: QuantityInput;
  /** Thickness of each bar [m], > 0. */
  readonly thickness: QuantityInput;
  /** Gap between the facing broad faces [m], > 0. */
  readonly gap: QuantityInput;
  /** Bar material id or a material set; default the coil conductor's material. */
  readonly material?: ConductorMaterialId | ConductiveMaterial;
}

/**
 * A coaxial lead: a round inner conductor (rod or tube) inside a return tube, the current going
 * out in one and back in the other. The cable is half of `leadLength` long (which counts the
 * path out and back, as for a pair).
 *
 * @category Heater study
 */
export interface CoaxialLeadsDescription {
  /** Lead shape tag. */
  readonly shape: "coaxial";
  /** Outer diameter of the inner conductor [m], > 0. */
  readonly innerDiameter: QuantityInput;
  /** Wall thickness of the inner conductor if it is a tube [m], > 0 and ≤ innerDiameter/2; omitted: a solid rod. */
  readonly innerWallThickness?: QuantityInput;
  /** Inner diameter of the return tube [m], > innerDiameter. */
  readonly returnInnerDiameter: QuantityInput;
  /** Wall thickness of the return tube [m], > 0. */
  readonly returnWallThickness: QuantityInput;
  /** Material id or a material set of both conductors; default the coil conductor's material. */
  readonly material?: ConductorMaterialId | ConductiveMaterial;
}

/**
 * The cross-section of the leads between coil and capacitor bank. With it the study adds the
 * leads' inductance in series with the coil and takes their resistance with skin and
 * proximity effect (`leadImpedance`); the run is half of `leadLength` (which counts both leads,
 * or a coaxial cable's path out and back).
 *
 * @category Heater study
 */
export type HeaterLeadsDescription = RoundPairLeadsDescription | FlatPairLeadsDescription | CoaxialLeadsDescription;

/**
 * A single-layer solenoid (helical work coil) around the part.
 *
 * @category Heater study
 */
export interface SolenoidCoilDescription {
  /** Coil shape tag. */
  readonly shape: "solenoid";
  /** Radius to the conductor centres [m], > 0. */
  readonly radius: QuantityInput;
  /** Winding length = turns × pitch [m], > 0. */
  readonly length: QuantityInput;
  /** Number of turns, integer ≥ 1. */
  readonly turns: number;
  /** The conductor. */
  readonly conductor: HeaterConductor;
  /** Length of the leads between coil and capacitor bank (both together) [m], ≥ 0; default 0. */
  readonly leadLength?: QuantityInput;
  /**
   * Cross-section of the leads; needs `leadLength` > 0. Omitted: the leads count only as
   * resistance, an isolated conductor of `leadLength` (no inductance).
   */
  readonly leads?: HeaterLeadsDescription;
  /** Working temperature of the conductor [K], > 0; default 40 °C (common practice for a cooled coil). */
  readonly temperature?: QuantityInput;
}

/**
 * A flat spiral (pancake) coil under or over a plate.
 *
 * @category Heater study
 */
export interface PancakeCoilDescription {
  /** Coil shape tag. */
  readonly shape: "pancake";
  /** Radius of the innermost turn's conductor centre [m], > 0. */
  readonly innerRadius: QuantityInput;
  /** Radius of the outermost turn's conductor centre [m], > innerRadius. */
  readonly outerRadius: QuantityInput;
  /** Number of turns, integer ≥ 1. */
  readonly turns: number;
  /** Gap from the conductor's face to the part's surface [m], ≥ 0. */
  readonly liftOff: QuantityInput;
  /** The conductor. */
  readonly conductor: HeaterConductor;
  /** Length of the leads (both together) [m], ≥ 0; default 0. */
  readonly leadLength?: QuantityInput;
  /**
   * Cross-section of the leads; needs `leadLength` > 0. Omitted: the leads count only as
   * resistance, an isolated conductor of `leadLength` (no inductance).
   */
  readonly leads?: HeaterLeadsDescription;
  /** Working temperature of the conductor [K], > 0; default 40 °C. */
  readonly temperature?: QuantityInput;
}

/**
 * The work coil.
 *
 * @category Heater study
 */
export type HeaterCoil = SolenoidCoilDescription | PancakeCoilDescription;
