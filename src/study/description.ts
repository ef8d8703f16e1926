/**
 * The heater description: everything a study needs to know about one induction-heater design
 * (supply, inverter, coil and its conductor, capacitor bank, optional flux concentrator, the
 * part to heat and its surroundings). Quantities are SI numbers; study files may also give
 * them as text with units (`"30 mm"`, `"4.7 µF"`, `"20 °C"`), see {@link readHeaterDescription}.
 *
 * @packageDocumentation
 */
import type { CoreMaterial } from "../materials/index.js";
import type { HeaterCoil } from "./description-coil.js";
import type { HeaterFieldConcentrator, HeaterPart } from "./description-part.js";

export type {
  SolidConductorDescription,
  LitzConductorDescription,
  TubeConductorDescription,
  HeaterConductor,
  RoundPairLeadsDescription,
  FlatPairLeadsDescription,
  CoaxialLeadsDescription,
  HeaterLeadsDescription,
  SolenoidCoilDescription,
  PancakeCoilDescription,
  HeaterCoil,
} from "./description-coil.js";
export type {
  PartCommon,
  BarPartDescription,
  TubePartDescription,
  RingPartDescription,
  PlatePartDescription,
  HeaterRectangle,
  RectanglesPartDescription,
  HeaterFieldConcentrator,
  HeaterPart,
} from "./description-part.js";

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
