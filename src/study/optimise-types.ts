/**
 * The goal, limits, search space and result types of {@link optimiseHeater}.
 *
 * @packageDocumentation
 */
import type { HeaterConductor, HeaterDescription, QuantityInput } from "./description.js";
import type { HeaterSummary } from "./summary.js";

/**
 * Upper (and for frequency, lower) limits a design must respect. All optional.
 *
 * @category Heater study
 */
export interface HeaterLimits {
  /** Largest peak tank (coil) voltage [V]. */
  readonly tankVoltagePeak?: QuantityInput;
  /** Largest RMS coil current [A]. */
  readonly coilCurrentRms?: QuantityInput;
  /** Largest DC supply current [A]. */
  readonly supplyCurrent?: QuantityInput;
  /** Largest RMS capacitor-bank voltage [V]. */
  readonly capacitorVoltageRms?: QuantityInput;
  /** Largest RMS capacitor-bank current [A]. */
  readonly capacitorCurrentRms?: QuantityInput;
  /** Largest peak switch voltage [V]. */
  readonly switchVoltagePeak?: QuantityInput;
  /** Lowest operating frequency [Hz] (e.g. 20 kHz to stay above hearing). */
  readonly minFrequency?: QuantityInput;
  /** Highest operating frequency [Hz]. */
  readonly maxFrequency?: QuantityInput;
  /**
   * Former short form of `tankVoltagePeak` [V]; giving both is refused.
   *
   * @deprecated Use `tankVoltagePeak`; this name goes at 1.0.
   */
  readonly maxVoltage?: QuantityInput;
  /**
   * Former short form of `coilCurrentRms` [A]; giving both is refused.
   *
   * @deprecated Use `coilCurrentRms`; this name goes at 1.0.
   */
  readonly maxCurrent?: QuantityInput;
}

/**
 * Where {@link optimiseHeater} looks. Each list replaces the base description's value; absent
 * lists get a default range around it.
 *
 * @category Heater study
 */
export interface HeaterSearchSpace {
  /** Turn counts to try (integers ≥ 1); default from half to twice the base turns. */
  readonly turns?: readonly number[];
  /** IEC 60063 series for the capacitance: `"E12"` (default) or `"E24"`. */
  readonly capacitanceSeries?: "E12" | "E24";
  /** Smallest capacitance [F]; default a quarter of the base. */
  readonly minCapacitance?: QuantityInput;
  /** Largest capacitance [F]; default four times the base. */
  readonly maxCapacitance?: QuantityInput;
  /** Conductors to try; default the base conductor only. */
  readonly conductors?: readonly HeaterConductor[];
  /** Switching frequencies to try [Hz] (fixed-frequency series inverters only); default the base frequency. */
  readonly frequencies?: readonly QuantityInput[];
}

/**
 * What {@link optimiseHeater} aims for: exactly one of `targetPower` or `targetTime`.
 *
 * @category Heater study
 */
export interface HeaterGoal {
  /** Power into the cold part [W]. */
  readonly targetPower?: QuantityInput;
  /** Heat-up time from start to target temperature [s]. */
  readonly targetTime?: QuantityInput;
  /** Limits every reported design respects. */
  readonly limits?: HeaterLimits;
  /** The search space. */
  readonly search?: HeaterSearchSpace;
  /** How many of the best designs to return, 1 … 50 (default 5). */
  readonly keep?: number;
}

/**
 * One design found by {@link optimiseHeater}.
 *
 * @category Heater study
 */
export interface HeaterCandidate {
  /** Turns. */
  readonly turns: number;
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** The conductor. */
  readonly conductor: HeaterConductor;
  /** Switching frequency [Hz] for fixed-frequency series inverters, else `null`. */
  readonly switchingFrequency: number | null;
  /** Headline numbers (time to target for the finalists of a time goal). */
  readonly summary: HeaterSummary;
  /** Distance from the goal, |ln(achieved / target)| (0 is a perfect hit). */
  readonly score: number;
  /** The complete description of this design, ready for {@link studyHeater}. */
  readonly description: HeaterDescription;
}

/**
 * Why candidates were rejected: one entry per reason, with a count.
 *
 * @category Heater study
 */
export interface HeaterRejection {
  /** The reason, e.g. `"tank voltage above limit"` or the description problem. */
  readonly reason: string;
  /** How many candidates failed for it (a candidate may count under several limits). */
  readonly count: number;
}

/**
 * The result of {@link optimiseHeater}.
 *
 * @category Heater study
 */
export interface HeaterOptimisation {
  /** Candidates evaluated. */
  readonly evaluated: number;
  /** Candidates within every limit. */
  readonly feasible: number;
  /** The best designs, closest to the goal first. */
  readonly best: readonly HeaterCandidate[];
  /** Why the others failed, most common first. */
  readonly rejected: readonly HeaterRejection[];
  /**
   * What makes the ranking misleading, in words (empty when nothing does): e.g. a part-power
   * goal for a power-tracking inverter, whose tank power the searched variables do not change.
   */
  readonly warnings: readonly string[];
}

/**
 * Options of {@link optimiseHeater} that do not change its result.
 *
 * @category Heater study
 */
export interface HeaterSearchOptions {
  /** Called now and then with candidates evaluated so far and the total (for progress displays). */
  readonly onProgress?: (evaluated: number, total: number) => void;
}
