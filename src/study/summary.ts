/**
 * The headline numbers of a study, as one flat record (rows of sweeps and optimiser tables).
 *
 * @packageDocumentation
 */
import type { HeaterOperatingPoint } from "./operating-point.js";

/**
 * Headline numbers of a heater design at its cold operating point (plus the heat-up time
 * when it was computed).
 *
 * @category Heater study
 */
export interface HeaterSummary {
  /** Operating frequency with the cold part [Hz]. */
  readonly frequency: number;
  /** Frequency of the empty coil [Hz]. */
  readonly emptyCoilFrequency: number;
  /** Power into the part [W]. */
  readonly partPower: number;
  /** Power from the supply [W]. */
  readonly inputPower: number;
  /** Part power over input power. */
  readonly efficiency: number;
  /** Coil efficiency R_reflected / (R_reflected + R_coil). */
  readonly coilEfficiency: number;
  /** Peak coil (tank) voltage [V]. */
  readonly tankVoltagePeak: number;
  /** RMS coil current [A]. */
  readonly coilCurrentRms: number;
  /** RMS capacitor-bank voltage [V]. */
  readonly capacitorVoltageRms: number;
  /** RMS capacitor-bank current [A]. */
  readonly capacitorCurrentRms: number;
  /** DC supply current [A]. */
  readonly supplyCurrent: number;
  /** Peak switch voltage [V]. */
  readonly switchVoltagePeak: number;
  /** Time to the target temperature [s]; `null` when not computed or not reached. */
  readonly timeToTarget: number | null;
}

/** Builds a summary from the cold and empty-coil operating points. */
export function summarise(operating: HeaterOperatingPoint, empty: HeaterOperatingPoint, timeToTarget: number | null): HeaterSummary {
  return {
    frequency: operating.frequency,
    emptyCoilFrequency: empty.frequency,
    partPower: operating.losses.part,
    inputPower: operating.inputPower,
    efficiency: operating.efficiency,
    coilEfficiency: operating.coilEfficiency,
    tankVoltagePeak: operating.tankVoltagePeak,
    coilCurrentRms: operating.coilCurrentRms,
    capacitorVoltageRms: operating.capacitorVoltageRms,
    capacitorCurrentRms: operating.capacitorCurrentRms,
    supplyCurrent: operating.supplyCurrent,
    switchVoltagePeak: operating.switchVoltagePeak,
    timeToTarget,
  };
}
