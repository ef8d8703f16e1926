/**
 * The heater description as {@link readHeaterDescription} returns it: every quantity an SI
 * number, defaults filled in, material ids replaced by their property sets.
 *
 * @packageDocumentation
 */
import type { ConductiveMaterial, CoreMaterial } from "../materials/index.js";

/** The supply with every field resolved to SI numbers. @category Heater study */
export interface ResolvedSupply {
  /** Source kind. */
  readonly kind: "battery" | "dc-bus";
  /** Open-circuit voltage [V]. */
  readonly voltage: number;
  /** Internal resistance [Ω]. */
  readonly internalResistance: number;
  /** Current limit [A], `null` when none was given. */
  readonly currentLimit: number | null;
}

/** A resolved current-fed parallel inverter. @category Heater study */
export interface ResolvedCurrentFedInverter {
  /** Topology tag. */
  readonly kind: "current-fed-parallel";
  /** Choke inductance [H]. */
  readonly chokeInductance: number;
  /** Switch on-resistance [Ω]. */
  readonly switchOnResistance: number;
  /** Switch voltage rating [V], `null` when not given. */
  readonly switchVoltageRating: number | null;
}

/** A resolved voltage-fed series inverter. @category Heater study */
export interface ResolvedSeriesInverter {
  /** Topology tag. */
  readonly kind: "voltage-fed-series";
  /** Bridge type. */
  readonly bridge: "half" | "full";
  /** Frequency control. */
  readonly control: "fixed" | "power-tracking";
  /** Fixed switching frequency [Hz] (`null` with power tracking). */
  readonly frequency: number | null;
  /** Target power [W] (`null` at fixed frequency). */
  readonly targetPower: number | null;
  /** Switch on-resistance [Ω]. */
  readonly switchOnResistance: number;
  /** Switch voltage rating [V], `null` when not given. */
  readonly switchVoltageRating: number | null;
}

/** A resolved inverter. @category Heater study */
export type ResolvedInverter = ResolvedCurrentFedInverter | ResolvedSeriesInverter;

/** A resolved solid round wire. @category Heater study */
export interface ResolvedSolidConductor {
  /** Conductor type tag. */
  readonly kind: "solid";
  /** Wire diameter [m]. */
  readonly diameter: number;
  /** Conductor material. */
  readonly material: ConductiveMaterial;
}

/** A resolved litz wire. @category Heater study */
export interface ResolvedLitzConductor {
  /** Conductor type tag. */
  readonly kind: "litz";
  /** Number of strands. */
  readonly strands: number;
  /** Strand diameter [m]. */
  readonly strandDiameter: number;
  /** Bundle outer diameter [m]. */
  readonly outerDiameter: number;
  /** Conductor material. */
  readonly material: ConductiveMaterial;
}

/** A resolved hollow tube. @category Heater study */
export interface ResolvedTubeConductor {
  /** Conductor type tag. */
  readonly kind: "tube";
  /** Outer diameter [m]. */
  readonly outerDiameter: number;
  /** Wall thickness [m]. */
  readonly wallThickness: number;
  /** Conductor material. */
  readonly material: ConductiveMaterial;
}

/** A resolved conductor. @category Heater study */
export type ResolvedConductor = ResolvedSolidConductor | ResolvedLitzConductor | ResolvedTubeConductor;

/** Resolved round-pair leads (the coil conductor continued). @category Heater study */
export interface ResolvedRoundPairLeads {
  /** Lead shape tag. */
  readonly shape: "round-pair";
  /** Centre-to-centre spacing [m]. */
  readonly spacing: number;
}

/** Resolved flat bus-bar leads. @category Heater study */
export interface ResolvedFlatPairLeads {
  /** Lead shape tag. */
  readonly shape: "flat-pair";
  /** Bar width [m]. */
  readonly width: number;
  /** Bar thickness [m]. */
  readonly thickness: number;
  /** Gap between the broad faces [m]. */
  readonly gap: number;
  /** Bar material. */
  readonly material: ConductiveMaterial;
}

/** Resolved coaxial leads. @category Heater study */
export interface ResolvedCoaxialLeads {
  /** Lead shape tag. */
  readonly shape: "coaxial";
  /** Outer diameter of the inner conductor [m]. */
  readonly innerDiameter: number;
  /** Wall thickness of the inner conductor [m]; innerDiameter/2 for a solid rod. */
  readonly innerWallThickness: number;
  /** Inner diameter of the return tube [m]. */
  readonly returnInnerDiameter: number;
  /** Wall thickness of the return tube [m]. */
  readonly returnWallThickness: number;
  /** Material of both conductors. */
  readonly material: ConductiveMaterial;
}

/** Resolved lead cross-section. @category Heater study */
export type ResolvedLeads = ResolvedRoundPairLeads | ResolvedFlatPairLeads | ResolvedCoaxialLeads;

/** Fields every resolved coil has. @category Heater study */
export interface ResolvedCoilCommon {
  /** Number of turns. */
  readonly turns: number;
  /** The conductor. */
  readonly conductor: ResolvedConductor;
  /** Lead length (both leads together) [m]. */
  readonly leadLength: number;
  /** Cross-section of the leads, or `null` (leads as an isolated conductor, resistance only). */
  readonly leads: ResolvedLeads | null;
  /** Conductor working temperature [K]. */
  readonly temperature: number;
}

/** A resolved solenoid coil. @category Heater study */
export interface ResolvedSolenoidCoil extends ResolvedCoilCommon {
  /** Coil shape tag. */
  readonly shape: "solenoid";
  /** Radius to the conductor centres [m]. */
  readonly radius: number;
  /** Winding length [m]. */
  readonly length: number;
}

/** A resolved pancake coil. @category Heater study */
export interface ResolvedPancakeCoil extends ResolvedCoilCommon {
  /** Coil shape tag. */
  readonly shape: "pancake";
  /** Radius of the innermost turn's centre [m]. */
  readonly innerRadius: number;
  /** Radius of the outermost turn's centre [m]. */
  readonly outerRadius: number;
  /** Gap from the conductor face to the part [m]. */
  readonly liftOff: number;
}

/** A resolved coil. @category Heater study */
export type ResolvedCoil = ResolvedSolenoidCoil | ResolvedPancakeCoil;

/** A resolved capacitor bank. @category Heater study */
export interface ResolvedCapacitorBank {
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** Dissipation factor tan δ. */
  readonly dissipationFactor: number;
  /** RMS voltage rating [V] or `null`. */
  readonly voltageRatingRms: number | null;
  /** RMS current rating [A] or `null`. */
  readonly currentRatingRms: number | null;
}

/** A resolved concentrator. @category Heater study */
export interface ResolvedConcentrator {
  /** Core material (with its id). */
  readonly material: CoreMaterial;
  /** The material id as written. */
  readonly materialId: string;
  /** Flux cross-section [m²]. */
  readonly crossSectionArea: number;
  /** Volume [m³]. */
  readonly volume: number;
}

/** Fields every resolved part has. @category Heater study */
export interface ResolvedPartCommon {
  /** The material set. */
  readonly material: ConductiveMaterial;
  /** Start temperature [K]. */
  readonly startTemperature: number;
  /** Target temperature [K]. */
  readonly targetTemperature: number;
  /** Emissivity. */
  readonly emissivity: number;
  /** What the target applies to (absent: `"mean"`). */
  readonly targetLocation?: "mean" | "surface" | "core";
  /** Soak band [K] (absent: no soak). */
  readonly soakBand?: number;
  /** Hardening temperature [K] (absent: none). */
  readonly hardeningTemperature?: number;
  /**
   * A part given as r–z rectangles (`shape: "rectangles"` in the description): its
   * cross-section [m]. The part's shape fields then describe its bounding bar, tube or plate,
   * which the closed-form surrogate of the field model uses.
   */
  readonly rectangles?: readonly ResolvedRectangle[];
}

/** A resolved r–z rectangle [m]. @category Heater study */
export interface ResolvedRectangle {
  /** Inner radius [m]. */
  readonly rMin: number;
  /** Outer radius [m]. */
  readonly rMax: number;
  /** Lower axial position [m]. */
  readonly zMin: number;
  /** Upper axial position [m]. */
  readonly zMax: number;
}

/** A resolved flux concentrator of the field model. @category Heater study */
export interface ResolvedFieldConcentrator {
  /** Name. */
  readonly name: string;
  /** Cross-section [m]. */
  readonly rectangles: readonly ResolvedRectangle[];
  /** Relative permeability. */
  readonly relativePermeability: number;
  /** Resistivity [Ω·m], `null` for a non-conductor. */
  readonly resistivity: number | null;
}


/** A resolved bar. @category Heater study */
export interface ResolvedBarPart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "bar";
  /** Radius [m]. */
  readonly radius: number;
  /** Length [m]. */
  readonly length: number;
}

/** A resolved tube. @category Heater study */
export interface ResolvedTubePart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "tube";
  /** Outer radius [m]. */
  readonly outerRadius: number;
  /** Wall thickness [m]. */
  readonly wallThickness: number;
  /** Length [m]. */
  readonly length: number;
}

/** A resolved ring. @category Heater study */
export interface ResolvedRingPart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "ring";
  /** Outer radius [m]. */
  readonly outerRadius: number;
  /** Inner radius [m]. */
  readonly innerRadius: number;
  /** Axial height [m]. */
  readonly height: number;
}

/** A resolved plate. @category Heater study */
export interface ResolvedPlatePart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "plate";
  /** Length [m]. */
  readonly length: number;
  /** Width [m]. */
  readonly width: number;
  /** Thickness [m]. */
  readonly thickness: number;
}

/** A resolved part. @category Heater study */
export type ResolvedPart = ResolvedBarPart | ResolvedTubePart | ResolvedRingPart | ResolvedPlatePart;

/** Resolved surroundings. @category Heater study */
export interface ResolvedEnvironment {
  /** Ambient temperature [K]. */
  readonly ambientTemperature: number;
  /** Convection coefficient [W/(m²·K)]. */
  readonly convectionCoefficient: number;
}

/**
 * A heater description with every quantity an SI number, every default filled in and every
 * material id replaced by its property set: what {@link readHeaterDescription} returns.
 *
 * @category Heater study
 */
export interface ResolvedHeaterDescription {
  /** Title for reports. */
  readonly title: string;
  /** Supply. */
  readonly supply: ResolvedSupply;
  /** Inverter. */
  readonly inverter: ResolvedInverter;
  /** Coil. */
  readonly coil: ResolvedCoil;
  /** Capacitor bank. */
  readonly capacitor: ResolvedCapacitorBank;
  /** Concentrator or `null`. */
  readonly concentrator: ResolvedConcentrator | null;
  /** Flux concentrators as r–z rectangles (field model); absent when none are given. */
  readonly concentrators?: readonly ResolvedFieldConcentrator[];
  /** Part. */
  readonly part: ResolvedPart;
  /** Environment. */
  readonly environment: ResolvedEnvironment;
}

/** Outer diameter of a resolved conductor [m]. */
export function conductorOuterDiameter(conductor: ResolvedConductor): number {
  return conductor.kind === "solid" ? conductor.diameter : conductor.outerDiameter;
}
