/**
 * The result types of the heater study ({@link studyHeater}): its options, the study record and
 * the records of its parts (heat-up, temperature scan, impedance sweep, field model).
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import type { LumpedEnergyBalance } from "../thermal/index.js";
import type { CoilProperties, HeaterLosses, HeaterOperatingPoint } from "./operating-point.js";
import type { ResolvedHeaterDescription, ResolvedRectangle } from "./read-description.js";

/**
 * Options of {@link studyHeater}: which of the slower parts of the study to run.
 *
 * @category Heater study
 */
export interface StudyHeaterOptions {
  /** Run the electro-thermal heat-up to the target temperature (default `true`). */
  readonly heatUp?: boolean;
  /** Compute the operating point over part temperature from start to past the Curie point (default `true`). */
  readonly temperatureScan?: boolean;
  /** Compute the tank impedance against frequency with and without the part (default `true`). */
  readonly impedanceSweep?: boolean;
  /**
   * Run the surface/core (radial) model for bars and tubes in a solenoid with the heat-up
   * (default `true`; always run when the part's `targetLocation` is `"surface"` or `"core"`).
   */
  readonly radialHeatUp?: boolean;
  /** Operating points of the initial temperature grid of the power curve, an integer ≥ 4 (default: one per 50 K, 6 … 24, plus clusters at the Curie transition and the specific-heat peak); adaptive refinement adds up to 48 more. */
  readonly heatUpPoints?: number;
  /**
   * How the coil's impedance and the part's coupling are computed: `"closed-form"` (default, the
   * fast closed forms and the coil-impedance model) or `"field"` (the axisymmetric field solver
   * `solveAxisymmetricField`, solved at anchor temperatures: slower, seconds per anchor; see
   * {@link HeaterFieldSummary}).
   */
  readonly model?: "closed-form" | "field";
}

/**
 * Samples of the field solution at the start temperature (model `"field"`), at the operating
 * point's coil current: what the report draws.
 *
 * @category Heater study
 */
export interface HeaterFieldPicture {
  /** Part temperature of the solution [K]. */
  readonly temperature: number;
  /** Frequency of the solution [Hz]. */
  readonly frequency: number;
  /** RMS coil current the samples are scaled to [A]. */
  readonly coilCurrentRms: number;
  /** Radii of the |B| grid [m], ascending from the axis. */
  readonly r: readonly number[];
  /** Axial positions of the |B| grid [m], ascending. */
  readonly z: readonly number[];
  /** |B| (RMS, $\sqrt{|B_r|^2 + |B_z|^2}$) at each grid node, row by row (z major) [T]. */
  readonly fluxDensity: readonly number[];
  /** Power density in the part [W/m³], per part rectangle, on cells graded towards its surfaces: cell edges in r and z and the value at each cell centre (z major). */
  readonly powerDensity: readonly {
    /** Cell edges in r [m]. */
    readonly r: readonly number[];
    /** Cell edges in z [m]. */
    readonly z: readonly number[];
    /** Power density at each cell centre, z major [W/m³]. */
    readonly values: readonly number[];
  }[];
  /** The turns' cross-sections (circles: centre r, z and outer and inner radius) [m]. */
  readonly turns: readonly {
    /** Radius of the centre [m]. */
    readonly r: number;
    /** Axial position of the centre [m]. */
    readonly z: number;
    /** Outer radius of the cross-section [m]. */
    readonly radius: number;
    /** Bore radius (tube), 0 for a solid conductor [m]. */
    readonly innerRadius: number;
  }[];
  /** The part's cross-section as r–z rectangles [m]. */
  readonly part: readonly ResolvedRectangle[];
  /** Other regions (concentrators) as r–z rectangles [m]. */
  readonly passive: readonly ResolvedRectangle[];
}

/**
 * What the field model did (model `"field"`).
 *
 * @category Heater study
 */
export interface HeaterFieldSummary {
  /** The anchor temperatures where the field was solved, with the operating frequency and the part's permeability there and the solutions it took. */
  readonly anchors: readonly {
    /** Part temperature [K]. */
    readonly temperature: number;
    /** Frequency of the (last) field solution there [Hz]. */
    readonly frequency: number;
    /** The part's relative permeability in it. */
    readonly relativePermeability: number;
    /** Field solutions run at this anchor. */
    readonly solves: number;
  }[];
  /** Field solutions run in all (empty coil and loaded). */
  readonly solves: number;
  /** Wall time spent in field solutions [s]. */
  readonly seconds: number;
  /** Largest mesh solved [nodes]. */
  readonly largestMesh: number;
  /** Largest estimated relative error of a solution's impedance. */
  readonly largestEstimatedError: number;
  /** The field picture at the start temperature. */
  readonly picture: HeaterFieldPicture | null;
}

/**
 * Surface and core temperature of a bar or tube during the heat-up, from
 * {@link inductionRadialHeatUp} driven by the study's operating points at the surface temperature.
 *
 * @category Heater study
 */
export interface HeaterRadialHeatUp {
  /** Times [s]. */
  readonly times: readonly number[];
  /** Surface temperature at each time [K]. */
  readonly surfaceTemperatures: readonly number[];
  /** Core (axis, or bore of a tube) temperature at each time [K]. */
  readonly coreTemperatures: readonly number[];
  /** Volume-mean temperature at each time [K]. */
  readonly meanTemperatures: readonly number[];
  /** Times the surface, core and mean reach the target [s] (`null` when not reached). */
  readonly timeToSurfaceTarget: number | null;
  /** See `timeToSurfaceTarget`. */
  readonly timeToCoreTarget: number | null;
  /** See `timeToSurfaceTarget`. */
  readonly timeToMeanTarget: number | null;
  /** Time the heating stops (the `targetLocation` temperature at target) [s], or `null`. */
  readonly heatingTime: number | null;
  /** Surface minus core temperature when the heating stops [K], or `null`. */
  readonly surfaceCoreDifferenceAtTarget: number | null;
  /** Soak band [K] (`null`: no soak asked). */
  readonly soakBand: number | null;
  /** Time from switching off until surface and core are within the band [s], or `null`. */
  readonly soakTime: number | null;
  /** Hardening temperature [K] (`null`: not asked). */
  readonly hardeningTemperature: number | null;
  /** Depth below the surface whose peak temperature reached the hardening temperature [m], or `null`. */
  readonly hardeningDepth: number | null;
  /** Largest relative difference between the power with the radial profile and with the part uniform at its surface temperature [-] (what a uniform-temperature model misses). */
  readonly uniformPowerDeviation: number;
}

/**
 * Geometry-derived facts about the part.
 *
 * @category Heater study
 */
export interface HeaterPartFacts {
  /** Mass [kg] (volume × the material's density). */
  readonly mass: number;
  /** Surface area losing heat [m²]. */
  readonly surfaceArea: number;
  /** Volume [m³]. */
  readonly volume: number;
  /** Curie temperature of the material [K], `null` for non-magnetic materials. */
  readonly curieTemperature: number | null;
}

/**
 * A span of part temperature where the heater has no operating point (the study counts no
 * power there and never interpolates across it).
 *
 * @category Heater study
 */
export interface HeaterUnsolvedBand {
  /** Lowest temperature of the band [K] (located to within 0.5 K). */
  readonly from: number;
  /** Highest temperature of the band [K] (located to within 0.5 K; the top of the studied range when it runs off it). */
  readonly to: number;
  /** `true` when the current-fed tank cannot oscillate there for any permeability the part can take (the switches latch on). */
  readonly noOscillation: boolean;
  /** Why the operating point fails (the limit the design hits). */
  readonly reason: string;
}

/**
 * The electro-thermal heat-up: the lumped heat-up of the thermal module, driven by the part
 * power of the operating point re-solved as the part heats (through the Curie point).
 *
 * @category Heater study
 */
export interface HeaterHeatUp {
  /** Time for the `targetLocation` temperature to reach the target [s], `null` when it is not reached. */
  readonly timeToTarget: number | null;
  /** What the target applies to: `"mean"` (lumped model), `"surface"` or `"core"` (radial model). */
  readonly targetLocation: "mean" | "surface" | "core";
  /** Surface and core temperature of a bar or tube (radial model); `null` for other parts or when not run. */
  readonly radial: HeaterRadialHeatUp | null;
  /** Whether the target is reached. */
  readonly reachable: boolean;
  /** Temperature at the end of the simulated span [K]. */
  readonly finalTemperature: number;
  /** Temperature the part would settle at with this heater [K], from the power curve over the material's whole range (independent of the target); `null` when it lies above that range. */
  readonly steadyStateTemperature: number | null;
  /** Time the part crosses its Curie temperature [s], `null` when it does not. */
  readonly curieCrossingTime: number | null;
  /** Sample times [s] (the integrator's steps). */
  readonly times: readonly number[];
  /** Part temperature at each time [K]. */
  readonly temperatures: readonly number[];
  /** Operating frequency at each time [Hz]. */
  readonly frequencies: readonly number[];
  /** Power into the part at each time [W]. */
  readonly partPowers: readonly number[];
  /** Power drawn from the supply at each time [W]. */
  readonly inputPowers: readonly number[];
  /** Energy drawn from the supply over the heat-up [J]. */
  readonly supplyEnergy: number;
  /** Charge drawn from the supply over the heat-up [C] (divide by 3600 for A·h). */
  readonly supplyCharge: number;
  /** The thermal module's energy balance of the part [J]. */
  readonly energy: LumpedEnergyBalance;
  /** Biot number at the hottest point (`null` when unknown). */
  readonly biotNumber: number | null;
  /** The temperatures at which operating points were solved (the heat-up grid) [K]. */
  readonly gridTemperatures: readonly number[];
  /** Bands of temperature without an operating point (no power counted there), lowest first. */
  readonly unsolvedBands: readonly HeaterUnsolvedBand[];
  /** The temperature span over which the part power was solved [K]: from the start to the top of the material's range, independent of the target. */
  readonly powerCurveRange: readonly [number, number];
}

/**
 * The operating point against part temperature, over the same adaptively sampled power curve
 * the heat-up uses (from the start temperature to the top of the material's range).
 *
 * @category Heater study
 */
export interface HeaterTemperatureScan {
  /** Part temperatures [K]. */
  readonly temperatures: readonly number[];
  /** Operating frequency [Hz]. */
  readonly frequencies: readonly number[];
  /** Power into the part [W]. */
  readonly partPowers: readonly number[];
  /** Power from the supply [W]. */
  readonly inputPowers: readonly number[];
  /** Overall efficiency (part / input). */
  readonly efficiencies: readonly number[];
  /** Relative permeability used for the part. */
  readonly relativePermeabilities: readonly number[];
  /** Inductance at the coil terminals [H]. */
  readonly inductances: readonly number[];
  /** Bands of temperature without an operating point, lowest first (their points are left out above). */
  readonly unsolvedBands: readonly HeaterUnsolvedBand[];
  /** RMS coil current [A]. */
  readonly coilCurrentsRms: readonly number[];
  /** Peak tank (coil) voltage [V]. */
  readonly tankVoltagesPeak: readonly number[];
}

/**
 * Tank impedance seen by the inverter against frequency, empty and loaded (at the start
 * temperature).
 *
 * @category Heater study
 */
export interface HeaterImpedanceSweep {
  /** Frequencies [Hz] (log-spaced). */
  readonly frequencies: readonly number[];
  /** |Z| of the tank with the empty coil [Ω]. */
  readonly magnitudeEmpty: readonly number[];
  /** Phase of Z with the empty coil [rad]. */
  readonly phaseEmpty: readonly number[];
  /** |Z| with the part in place [Ω]. */
  readonly magnitudeLoaded: readonly number[];
  /** Phase with the part in place [rad]. */
  readonly phaseLoaded: readonly number[];
}

/**
 * The result of {@link studyHeater}.
 *
 * @category Heater study
 */
export interface HeaterStudy {
  /** Title from the description. */
  readonly title: string;
  /** The resolved description the study ran on (SI numbers, defaults filled). */
  readonly description: ResolvedHeaterDescription;
  /** The coil's own properties (inductance, conductor length, DC resistance). */
  readonly coil: CoilProperties;
  /** Mass, area and Curie temperature of the part. */
  readonly part: HeaterPartFacts;
  /** Operating point with the empty coil (no part). */
  readonly emptyCoil: HeaterOperatingPoint;
  /** Operating point with the part at its start temperature. */
  readonly operating: HeaterOperatingPoint;
  /** Operating point with the part at its target temperature (`null` when the inverter cannot run there). */
  readonly atTarget: HeaterOperatingPoint | null;
  /** Operating frequency with the part at its start temperature [Hz] (= `operating.frequency`). */
  readonly frequency: number;
  /** Operating frequency with the empty coil [Hz] (= `emptyCoil.frequency`). */
  readonly emptyCoilFrequency: number;
  /**
   * The same value as `emptyCoilFrequency` [Hz].
   *
   * @deprecated Use `emptyCoilFrequency`; this field goes at 1.0.
   */
  readonly frequencyWithoutPart: number;
  /** Power into the part at its start temperature [W] (= `operating.losses.part`). */
  readonly partPower: number;
  /** Power drawn from the supply at the start temperature [W] (= `operating.inputPower`). */
  readonly inputPower: number;
  /** Losses by place at the start temperature [W] (= `operating.losses`); they add up to `inputPower`. */
  readonly losses: HeaterLosses;
  /** Part power over input power at the start temperature (= `operating.efficiency`). */
  readonly efficiency: number;
  /** Time to the target temperature [s] (= `heatUp.timeToTarget`; `null` when not computed or not reached). */
  readonly timeToTarget: number | null;
  /** Frequency with the cold part minus frequency with the empty coil [Hz]. */
  readonly frequencyShift: number;
  /** Frequency at the target minus frequency at the start [Hz]: the drift during heat-up (`null` without a target point). */
  readonly frequencyDrift: number | null;
  /** The electro-thermal heat-up (`null` when not requested). */
  readonly heatUp: HeaterHeatUp | null;
  /** Operating point against part temperature (`null` when not requested). */
  readonly temperatureScan: HeaterTemperatureScan | null;
  /** Tank impedance against frequency (`null` when not requested). */
  readonly impedance: HeaterImpedanceSweep | null;
  /** Hazards and rating checks, most serious first; each message defers to local codes. */
  readonly cautions: readonly Caution[];
  /** Every approximation used and why, one note per code. */
  readonly validity: readonly ValidityNote[];
  /** The model of the coil's impedance and the part's coupling: `"closed-form"` (default) or `"field"`. */
  readonly model: "closed-form" | "field";
  /** What the field model did, with the field picture (`null` with the closed-form model). */
  readonly field: HeaterFieldSummary | null;
}
