/**
 * The part to heat in a heater description (bar, tube, ring, plate, or r–z rectangles for the
 * field model) and the field model's concentrators given as r–z rectangles. Part of the
 * study-file format (see description.ts).
 *
 * @packageDocumentation
 */
import type { ConductiveMaterial } from "../materials/index.js";
import type { PartMaterialId, QuantityInput } from "./description.js";

/** Fields shared by every part shape. @category Heater study */
export interface PartCommon {
  /** Material id from the materials catalogue (`"lowCarbonSteel"`, `"mediumCarbonSteel"`, `"austeniticStainless"`, …), or in code a material set such as the exported `lowCarbonSteel`. */
  readonly material: PartMaterialId | ConductiveMaterial;
  /** Temperature at the start of heating [K], > 0; default the ambient temperature. */
  readonly startTemperature?: QuantityInput;
  /** Temperature to reach [K], > start temperature. */
  readonly targetTemperature: QuantityInput;
  /** Surface emissivity in (0, 1]; default the material's typical value. */
  readonly emissivity?: number;
  /**
   * What `targetTemperature` applies to: `"mean"` (the lumped part temperature, default),
   * `"surface"` or `"core"` (bars and tubes: the electro-thermal radial model).
   */
  readonly targetLocation?: "mean" | "surface" | "core";
  /** Bars and tubes: after the target, soak until surface and core are within this difference [K] (e.g. `"25 K"`). */
  readonly soakBand?: QuantityInput;
  /** Bars and tubes: temperature whose depth of reach into the part is reported (hardening depth) [K]. */
  readonly hardeningTemperature?: QuantityInput;
}

/**
 * A solid round bar, coaxial inside a solenoid.
 *
 * @category Heater study
 */
export interface BarPartDescription extends PartCommon {
  /** Part shape tag. */
  readonly shape: "bar";
  /** Bar radius [m], > 0. */
  readonly radius: QuantityInput;
  /** Bar length [m], > 0. */
  readonly length: QuantityInput;
}

/**
 * A tube, coaxial inside a solenoid.
 *
 * @category Heater study
 */
export interface TubePartDescription extends PartCommon {
  /** Part shape tag. */
  readonly shape: "tube";
  /** Outer radius [m], > 0. */
  readonly outerRadius: QuantityInput;
  /** Wall thickness [m], > 0 and < outerRadius. */
  readonly wallThickness: QuantityInput;
  /** Tube length [m], > 0. */
  readonly length: QuantityInput;
}

/**
 * A ring (short tube, e.g. a bearing race), coaxial inside a solenoid.
 *
 * @category Heater study
 */
export interface RingPartDescription extends PartCommon {
  /** Part shape tag. */
  readonly shape: "ring";
  /** Outer radius [m], > 0. */
  readonly outerRadius: QuantityInput;
  /** Inner (bore) radius [m], > 0 and < outerRadius. */
  readonly innerRadius: QuantityInput;
  /** Axial height (width) of the ring [m], > 0. */
  readonly height: QuantityInput;
  /** Only `"mean"` for a ring (surface and core targets need the radial model of bars and tubes). */
  readonly targetLocation?: "mean";
  /** Not for a ring (bars and tubes only). */
  readonly soakBand?: never;
  /** Not for a ring (bars and tubes only). */
  readonly hardeningTemperature?: never;
}

/**
 * A flat rectangular plate, under a pancake coil.
 *
 * @category Heater study
 */
export interface PlatePartDescription extends PartCommon {
  /** Part shape tag. */
  readonly shape: "plate";
  /** Plate length [m], > 0. */
  readonly length: QuantityInput;
  /** Plate width [m], > 0. */
  readonly width: QuantityInput;
  /** Plate thickness [m], > 0. */
  readonly thickness: QuantityInput;
  /** Only `"mean"` for a plate (surface and core targets need the radial model of bars and tubes). */
  readonly targetLocation?: "mean";
  /** Not for a plate (bars and tubes only). */
  readonly soakBand?: never;
  /** Not for a plate (bars and tubes only). */
  readonly hardeningTemperature?: never;
}

/**
 * A rectangle of the r–z half-plane (a ring of rectangular cross-section about the coil's
 * axis). Axial positions are measured from the middle of a solenoid's winding, or from the face
 * a pancake coil's lift-off is measured to (the pancake's turns lie above z = lift-off).
 *
 * @category Heater study
 */
export interface HeaterRectangle {
  /** Inner radius [m], ≥ 0 (0: reaches the axis). */
  readonly rMin: QuantityInput;
  /** Outer radius [m], > rMin. */
  readonly rMax: QuantityInput;
  /** Lower axial position [m] (may be negative). */
  readonly zMin: QuantityInput;
  /** Upper axial position [m], > zMin (may be negative). */
  readonly zMax: QuantityInput;
}

/**
 * A part of any axisymmetric shape, as a set of r–z rectangles that do not overlap (a stepped
 * shaft, a flanged hub, a part with a bore). Needs the field model
 * (`studyHeater(…, { model: "field" })`).
 *
 * @category Heater study
 */
export interface RectanglesPartDescription extends PartCommon {
  /** Part shape tag. */
  readonly shape: "rectangles";
  /** The part's cross-section: at least one rectangle, none overlapping another. */
  readonly rectangles: readonly HeaterRectangle[];
}

/**
 * A flux concentrator (or any passive magnetic or conducting body) as a set of r–z rectangles,
 * for the field model.
 *
 * @category Heater study
 */
export interface HeaterFieldConcentrator {
  /** A name for reports (default `concentrator1`, `concentrator2`, …). */
  readonly name?: string;
  /** Its cross-section, at least one rectangle. */
  readonly rectangles: readonly HeaterRectangle[];
  /** Relative permeability (linear), in [1, 1e6]. */
  readonly relativePermeability: number;
  /** Resistivity [Ω·m], > 0; omit for a non-conductor (a ferrite, a laminated or powder core). */
  readonly resistivity?: QuantityInput;
}

/**
 * The part to heat.
 *
 * @category Heater study
 */
export type HeaterPart = BarPartDescription | TubePartDescription | RingPartDescription | PlatePartDescription | RectanglesPartDescription;
