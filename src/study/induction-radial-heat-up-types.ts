/**
 * The types of {@link inductionRadialHeatUp}: the part, the drive and the state it is read
 * from, the options and the result.
 *
 * @packageDocumentation
 */
import type { Caution } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import type { RadialHeatUpResult } from "../thermal/index.js";
import type { LongCoil } from "../workpiece/index.js";

/**
 * The part of {@link inductionRadialHeatUp}: a solid bar or a tube, coaxial with the coil and
 * at least as long.
 *
 * @category Study
 */
export type RadialHeatedPart =
  | {
      /** Discriminant. */
      readonly shape: "bar";
      /** Bar radius [m], > 0 and ≤ coil innerRadius. */
      readonly radius: number;
    }
  | {
      /** Discriminant. */
      readonly shape: "tube";
      /** Outer radius [m], > innerRadius and ≤ coil innerRadius. */
      readonly radius: number;
      /** Bore radius [m], ≥ 0 and < radius (the bore surface is insulated). */
      readonly innerRadius: number;
    };

/**
 * What {@link InductionRadialHeatUpOptions.driveAt} receives.
 *
 * @category Study
 */
export interface InductionRadialState {
  /** Time [s]. */
  readonly time: number;
  /** Surface temperature [K]. */
  readonly surfaceTemperature: number;
  /** Core (axis, or bore surface of a tube) temperature [K]. */
  readonly coreTemperature: number;
  /** Volume-mean temperature [K]. */
  readonly meanTemperature: number;
}

/**
 * The drive returned by {@link InductionRadialHeatUpOptions.driveAt}.
 *
 * @category Study
 */
export interface InductionRadialDrive {
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** RMS coil current [A], ≥ 0: sets the field amplitude (hence μr(H)) and, without `power`, the power. */
  readonly coilCurrentRms: number;
  /**
   * Factor on the power of every shell [-], ≥ 0 (default 1): the ratio of a better coupling
   * model's power (e.g. a finite coil's) to the long coil's at the same state; the distribution
   * by depth stays that of the layered solution.
   */
  readonly powerFactor?: number;
}

/**
 * Options of {@link inductionRadialHeatUp}. The drive is one of: `frequency` with
 * `coilCurrentRms` (a constant current), `frequency` with `power` (the current adjusted to hold
 * the absorbed power), or `driveAt` (frequency and current from the state, e.g. an inverter's
 * operating point).
 *
 * @category Study
 */
export interface InductionRadialHeatUpOptions {
  /** The part, see {@link RadialHeatedPart}. */
  readonly part: RadialHeatedPart;
  /** Material: resistivity ρ(T), permeability μr(T, H), specific heat, conductivity, density. */
  readonly material: ConductiveMaterial;
  /** The long coil around the part, see {@link LongCoil}. */
  readonly coil: LongCoil;
  /**
   * Length of part that shares the absorbed power and loses heat from its mantle [m], > 0
   * (default `coil.length`); a part longer than the coil, with axial conduction evening out the
   * power, is modelled by its whole length (an axial average).
   */
  readonly heatedLength?: number;
  /** Frequency [Hz], > 0 (with `coilCurrentRms` or `power`). */
  readonly frequency?: number;
  /** Constant RMS coil current [A], ≥ 0. */
  readonly coilCurrentRms?: number;
  /** Constant power absorbed by the part [W], ≥ 0 (the current follows the load). */
  readonly power?: number;
  /** Frequency and RMS coil current from the part's state (called at each re-solve of the field). */
  readonly driveAt?: (state: InductionRadialState) => InductionRadialDrive;
  /** Convection coefficient at the outer surface [W/(m²·K)], ≥ 0. */
  readonly convectionCoefficient: number;
  /** Emissivity of the outer surface [-], 0 … 1. */
  readonly emissivity: number;
  /** Temperature of the surroundings [K], > 0. */
  readonly ambientTemperature: number;
  /** Uniform starting temperature [K], > 0 (default: `ambientTemperature`). */
  readonly initialTemperature?: number;
  /** Longest time simulated [s], > 0 (heating and soak together). */
  readonly duration: number;
  /** Target temperature [K], > 0: the heating stops when the `targetLocation` temperature reaches it. */
  readonly targetTemperature?: number;
  /** What the target applies to: `"mean"` (default, as the lumped model), `"surface"` or `"core"`. */
  readonly targetLocation?: "mean" | "surface" | "core";
  /** After the heating stops, soak until surface and core are within this band [K], > 0. */
  readonly soakBand?: number;
  /** Temperature whose reach into the part is wanted (hardening depth) [K], > 0. */
  readonly hardeningTemperature?: number;
  /** Cells across the radius or wall (integer, 8 … 400; default 60). */
  readonly cells?: number;
  /** Local error allowed per time step [K], > 0 (default 0.2 K). */
  readonly temperatureTolerance?: number;
  /** Largest time step [s], > 0 (default `duration`/200). */
  readonly maxTimeStep?: number;
  /**
   * The field is re-solved when a node's temperature has moved by more than this since the
   * last solve [K], > 0 (default 2 K).
   */
  readonly resolveStep?: number;
}

/**
 * Result of {@link inductionRadialHeatUp}: the thermal result of `radialHeatUp` (per unit heated
 * surface for its energy balance) plus the electrical history and the balance in joules.
 *
 * @category Study
 */
export interface InductionRadialHeatUpResult extends RadialHeatUpResult {
  /** Electrical history, one entry per field solution. */
  readonly electrical: {
    /** Times [s]. */
    readonly times: number[];
    /** Power absorbed by the part [W]. */
    readonly power: number[];
    /** Frequency [Hz]. */
    readonly frequency: number[];
    /** RMS coil current [A]. */
    readonly coilCurrentRms: number[];
    /** Resistance reflected into the coil [Ω]. */
    readonly reflectedResistance: number[];
    /** Inductance change of the coil [H]. */
    readonly inductanceChange: number[];
    /** Relative permeability of the outer shell [-]. */
    readonly surfacePermeability: number[];
    /**
     * Reflected resistance of the part at one uniform temperature, the surface's, with the outer
     * shell's permeability ({@link barInLongCoil} / {@link tubeInLongCoil}) [Ω]: against
     * `reflectedResistance` it measures what a uniform-temperature model misses.
     */
    readonly uniformReflectedResistance: number[];
  };
  /** Energy balance of the part over `heatedLength`, in joules: electrical input, stored, lost to the surroundings. */
  readonly partEnergy: {
    /** Electrical energy absorbed by the part [J]. */
    readonly input: number;
    /** Heat stored [J]. */
    readonly stored: number;
    /** Heat lost by convection and radiation [J]. */
    readonly lost: number;
    /** `input − stored − lost` [J] (rounding only). */
    readonly imbalance: number;
  };
  /** Number of times the field was re-solved for new temperatures. */
  readonly fieldSolutions: number;
  /** Number of field evaluations in the permeability fixed points (≥ `fieldSolutions`). */
  readonly fieldIterations: number;
  /** Hot-surface caution (ISO 13732-1 thresholds) when the surface exceeds 65 °C. */
  readonly cautions: Caution[];
}
