/**
 * The options and results of {@link llcDesign} (types only).
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import type { LlcOperatingPoint } from "./llc-operating-point.js";

/**
 * Options of {@link llcDesign}.
 *
 * @category Converters
 */
export interface LlcDesignOptions {
  /** DC input voltage range [V]: 0 < min ≤ nominal ≤ max. The converter runs at f_r at the nominal input. */
  readonly inputVoltage: {
    /** Lowest input [V], > 0. */
    readonly min: number;
    /** Nominal input [V] (gain 1, switching at f_r). */
    readonly nominal: number;
    /** Highest input [V]. */
    readonly max: number;
  };
  /** Regulated output voltage [V], > 0. */
  readonly outputVoltage: number;
  /** Full-load output power [W], > 0. */
  readonly outputPower: number;
  /** Resonant frequency f_r of L_r and C_r [Hz], > 0 (kept exactly after the capacitor is picked). */
  readonly resonantFrequency: number;
  /** `"half"` (tank driven with ±V_in/2) or `"full"` (±V_in). */
  readonly bridge: "half" | "full";
  /** L_n = L_m/L_r, 3 ≤ L_n ≤ 10; default 6. */
  readonly inductanceRatio?: number;
  /** Required ratio of the first-harmonic peak gain to the largest gain needed (at the lowest input, full load), 1 ≤ margin ≤ 2; default 1.1. */
  readonly gainMargin?: number;
  /** Light-load corner as a fraction of full power, 0.05 ≤ fraction < 1; default 0.2. */
  readonly lightLoadFraction?: number;
  /** E-series the resonant capacitor is picked from (the nearest value at or above the ideal one); default `"E24"`. */
  readonly capacitorSeries?: "E12" | "E24" | "E96";
  /** Rectifier (sets the diode voltage only): default `"full-bridge"`. */
  readonly rectifier?: "centre-tap" | "full-bridge";
  /** Dead time [s], ≥ 0: with switchCapacitance, the ZVS test at each corner. */
  readonly deadTime?: number;
  /** Output capacitance of one switch [F], ≥ 0. */
  readonly switchCapacitance?: number;
}

/**
 * One corner of the operating range of an {@link llcDesign}.
 *
 * @category Converters
 */
export interface LlcDesignCorner {
  /** Input voltage [V]. */
  readonly inputVoltage: number;
  /** Load as a fraction of full power. */
  readonly loadFraction: number;
  /** Load resistance [Ω]. */
  readonly loadResistance: number;
  /** Gain needed for the output voltage, M = nV_out/V_b. */
  readonly requiredGain: number;
  /** Switching frequency that gives the output voltage [Hz], from the exact steady state (the first-harmonic one when the exact solve did not settle, see `method`). */
  readonly switchingFrequency: number;
  /** f_s/f_r. */
  readonly normalisedFrequency: number;
  /** The first-harmonic estimate of the same frequency [Hz] (null when the FHA gain cannot reach the required gain). */
  readonly switchingFrequencyFirstHarmonic: number | null;
  /** `"exact"` (the piecewise-linear steady state) or `"first-harmonic"` (the exact solve did not settle). */
  readonly method: "exact" | "first-harmonic";
  /** The exact operating point at the switching frequency (null when `method` is "first-harmonic"). */
  readonly operatingPoint: LlcOperatingPoint | null;
  /** Zero-voltage switching at this corner (exact point; the FHA current at turn-off otherwise). */
  readonly zeroVoltageSwitching: boolean;
}

/**
 * The result of {@link llcDesign}.
 *
 * @category Converters
 */
export interface LlcDesign {
  /** Transformer turns ratio n = primary/secondary turns (gain 1 at the nominal input). */
  readonly turnsRatio: number;
  /** Resonant inductance L_r [H] (leakage included). */
  readonly resonantInductance: number;
  /** Resonant capacitance C_r [F], an E-series value. */
  readonly resonantCapacitance: number;
  /** Magnetising inductance L_m [H]. */
  readonly magnetisingInductance: number;
  /** Resonant frequency 1/(2π√(L_rC_r)) [Hz] (equals the requested one). */
  readonly resonantFrequency: number;
  /** L_n = L_m/L_r. */
  readonly inductanceRatio: number;
  /** Full-load Q = √(L_r/C_r)/R_ac with the picked capacitor. */
  readonly qualityFactor: number;
  /** Full-load resistance V_out²/P [Ω]. */
  readonly loadResistance: number;
  /** First-harmonic peak gain at full load over the largest gain needed (≥ the requested margin unless a caution says otherwise). */
  readonly gainMargin: number;
  /** Normalised frequency of the first-harmonic peak gain at full load (the lower edge of the inductive region). */
  readonly peakGainFrequency: number;
  /** Switching-frequency range over all corners [Hz]. */
  readonly frequencyRange: {
    /** Lowest switching frequency [Hz]. */
    readonly min: number;
    /** Highest switching frequency [Hz]. */
    readonly max: number;
  };
  /** Every corner: (min, nominal, max input) × (full, light load). */
  readonly corners: readonly LlcDesignCorner[];
  /** Zero-voltage switching at every corner. */
  readonly zeroVoltageSwitching: boolean;
  /** Hazards and shortfalls (input voltage, capacitor voltage, hard switching, uncovered range). */
  readonly cautions: readonly Caution[];
  /** Notes where the design leaves the domain the exact solver was checked on. */
  readonly validity: readonly ValidityNote[];
}

