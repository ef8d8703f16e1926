/**
 * The heater description: everything a study needs to know about one induction-heater design
 * (supply, inverter, coil and its conductor, capacitor bank, optional flux concentrator, the
 * part to heat and its surroundings). Quantities are SI numbers; study files may also give
 * them as text with units (`"30 mm"`, `"4.7 µF"`, `"20 °C"`), see {@link readHeaterDescription}.
 *
 * @packageDocumentation
 */
import type { ConductiveMaterial, CoreMaterial } from "../materials/index.js";

/**
 * A quantity as written in a study file: an SI number, or text with a unit that
 * `parseQuantity` reads (`"4.7 µF"`, `"30 mm"`, `"850 °C"`).
 *
 * @category Heater study
 */
export type QuantityInput = number | string;

/**
 * Ids of the conductor materials of the catalogue a coil may be wound from.
 *
 * @category Heater study
 */
export type ConductorMaterialId = "copper" | "aluminium" | "silver";

/**
 * Ids of the workpiece materials of the catalogue (`conductiveMaterials`).
 *
 * @category Heater study
 */
export type PartMaterialId =
  | ConductorMaterialId
  | "lowCarbonSteel"
  | "mediumCarbonSteel"
  | "austeniticStainless"
  | "ferriticStainless"
  | "aluminiumAlloy"
  | "brass"
  | "titaniumAlloy";

/**
 * Ids of the (invented example) core materials a concentrator may be made of.
 *
 * @category Heater study
 */
export type ConcentratorMaterialId = "inventedExampleFerrite" | "inventedExampleIronPowder";

/**
 * The DC source feeding the inverter.
 *
 * @category Heater study
 */
export interface HeaterSupply {
  /** `"battery"` (a pack, whose internal resistance matters) or `"dc-bus"` (a rectified or bench supply). */
  readonly kind: "battery" | "dc-bus";
  /** Open-circuit (no-load) voltage [V], > 0. */
  readonly voltage: QuantityInput;
  /** Internal (source) resistance [Ω], ≥ 0; default 0. */
  readonly internalResistance?: QuantityInput;
  /** Largest current the source may deliver [A], > 0; exceeding it raises a caution. Optional. */
  readonly currentLimit?: QuantityInput;
}

/**
 * The self-oscillating, choke-fed push-pull inverter driving a parallel tank at its zero-phase
 * frequency (the common small-heater topology).
 *
 * @category Heater study
 */
export interface CurrentFedParallelInverterDescription {
  /** Topology tag. */
  readonly kind: "current-fed-parallel";
  /** Inductance of the feed choke [H], > 0. */
  readonly chokeInductance: QuantityInput;
  /** On-state resistance of each switch [Ω], ≥ 0 (MOSFET R_DS(on) at working temperature). */
  readonly switchOnResistance: QuantityInput;
  /** Voltage rating of the switches [V], > 0; a caution is raised when the peak exceeds 80 % of it. Optional. */
  readonly switchVoltageRating?: QuantityInput;
}

/**
 * Fields every voltage-fed series inverter has.
 *
 * @category Heater study
 */
export interface SeriesInverterCommon {
  /** Topology tag. */
  readonly kind: "voltage-fed-series";
  /** `"half"` or `"full"` bridge. */
  readonly bridge: "half" | "full";
  /** On-state resistance of each switch [Ω], ≥ 0. */
  readonly switchOnResistance: QuantityInput;
  /** Voltage rating of the switches [V], > 0. Optional. */
  readonly switchVoltageRating?: QuantityInput;
}

/**
 * A voltage-fed bridge switching at a fixed frequency: the frequency is required.
 *
 * @category Heater study
 */
export interface FixedFrequencySeriesInverterDescription extends SeriesInverterCommon {
  /** Run at `frequency`. */
  readonly control: "fixed";
  /** Switching frequency [Hz], > 0. */
  readonly frequency: QuantityInput;
  /** Not with fixed-frequency control. */
  readonly targetPower?: never;
}

/**
 * A voltage-fed bridge that finds the frequency (above resonance, zero-voltage switching side)
 * delivering a target power: the power is required.
 *
 * @category Heater study
 */
export interface PowerTrackingSeriesInverterDescription extends SeriesInverterCommon {
  /** Find the frequency delivering `targetPower`. */
  readonly control: "power-tracking";
  /** Power into the tank [W], > 0. */
  readonly targetPower: QuantityInput;
  /** Not with power tracking (the study finds it). */
  readonly frequency?: never;
}

/**
 * A voltage-fed half or full bridge driving a series tank at a fixed switching frequency, or at
 * the frequency (above resonance, zero-voltage switching side) that delivers a target power.
 * The type requires the frequency with `control: "fixed"` and the power with
 * `control: "power-tracking"`.
 *
 * @category Heater study
 */
export type SeriesInverterDescription = FixedFrequencySeriesInverterDescription | PowerTrackingSeriesInverterDescription;

/**
 * The inverter topology and its switches.
 *
 * @category Heater study
 */
export type HeaterInverter = CurrentFedParallelInverterDescription | SeriesInverterDescription;

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
 * The cross-section of the leads between coil and capacitor bank. With it the study adds the
 * leads' inductance in series with the coil and takes their resistance with skin and
 * proximity effect (`leadImpedance`); the run is half of `leadLength` (which counts both leads).
 *
 * @category Heater study
 */
export type HeaterLeadsDescription = RoundPairLeadsDescription | FlatPairLeadsDescription;

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

/**
 * The resonant capacitor bank, as one equivalent capacitor.
 *
 * @category Heater study
 */
export interface HeaterCapacitorBank {
  /** Total capacitance [F], > 0. */
  readonly capacitance: QuantityInput;
  /** Dissipation factor tan δ at the working frequency, in [0, 0.1]; default 0.0005 (polypropylene film, common practice). */
  readonly dissipationFactor?: number;
  /** RMS voltage rating of the bank [V], > 0. Optional; checked when given. */
  readonly voltageRatingRms?: QuantityInput;
  /** RMS current rating of the bank [A], > 0. Optional; checked when given. */
  readonly currentRatingRms?: QuantityInput;
}

/**
 * A ferrite or powder-core flux concentrator behind a pancake coil. Its loss is estimated with
 * the core-loss module from the flux it carries; its effect on inductance and coupling is not
 * modelled (a validity note says so).
 *
 * @category Heater study
 */
export interface HeaterConcentrator {
  /** Core material id: `"inventedExampleFerrite"` or `"inventedExampleIronPowder"` (invented example sets), or in code a core material set. */
  readonly material: ConcentratorMaterialId | CoreMaterial;
  /** Cross-section the coil's flux passes through [m²], > 0. */
  readonly crossSectionArea: QuantityInput;
  /** Volume of magnetic material [m³], > 0. */
  readonly volume: QuantityInput;
}

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

/**
 * The surroundings of the part.
 *
 * @category Heater study
 */
export interface HeaterEnvironment {
  /** Ambient air temperature [K], > 0; default 20 °C. */
  readonly ambientTemperature?: QuantityInput;
  /** Convection coefficient [W/(m²·K)], ≥ 0; default 10 (still air, common practice). */
  readonly convectionCoefficient?: QuantityInput;
}

/**
 * One induction-heater design, as passed to {@link studyHeater} or written in a study file.
 *
 * @category Heater study
 */
export interface HeaterDescription {
  /** In a study file: the address of the study-file schema, for editors; ignored by the study. */
  readonly $schema?: string;
  /** A name for reports. */
  readonly title?: string;
  /** Free text for the reader of a study file; ignored by the study. */
  readonly notes?: string;
  /** The DC source. */
  readonly supply: HeaterSupply;
  /** The inverter. */
  readonly inverter: HeaterInverter;
  /** The work coil. */
  readonly coil: HeaterCoil;
  /** The capacitor bank. */
  readonly capacitor: HeaterCapacitorBank;
  /** An optional flux concentrator (pancake coils). */
  readonly concentrator?: HeaterConcentrator;
  /** Flux concentrators as r–z rectangles with their permeability (field model only). */
  readonly concentrators?: readonly HeaterFieldConcentrator[];
  /** The part to heat. */
  readonly part: HeaterPart;
  /** Surroundings; defaults apply when absent. */
  readonly environment?: HeaterEnvironment;
}
