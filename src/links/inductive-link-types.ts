/**
 * The options and results of {@link inductiveLink} (types only).
 *
 * @packageDocumentation
 */
import type { Caution } from "../core/index.js";

/**
 * The compensation of an inductive link, primary side first: series (S), parallel (P), or the
 * LCC network (series filter inductor, parallel capacitor, series capacitor).
 *
 * @category Inductive links
 */
export type LinkCompensation = "series-series" | "series-parallel" | "parallel-series" | "parallel-parallel" | "lcc-series" | "double-lcc";

/**
 * Options of {@link inductiveLink}.
 *
 * @category Inductive links
 */
export interface InductiveLinkOptions {
  /** Primary coil inductance L₁ [H], > 0. */
  readonly primaryInductance: number;
  /** Secondary coil inductance L₂ [H], > 0. */
  readonly secondaryInductance: number;
  /** Mutual inductance M [H], 0 < M < √(L₁L₂). */
  readonly mutualInductance: number;
  /** Primary coil AC resistance R₁ [Ω], ≥ 0. */
  readonly primaryResistance: number;
  /** Secondary coil AC resistance R₂ [Ω], ≥ 0. */
  readonly secondaryResistance: number;
  /** Operating frequency [Hz], > 0. */
  readonly frequency: number;
  /** Compensation, primary side first. */
  readonly compensation: LinkCompensation;
  /** Load resistance R_L [Ω], > 0 (the AC resistance the secondary network feeds). */
  readonly loadResistance: number;
  /** RMS voltage of the sinusoidal source [V], > 0. */
  readonly sourceVoltage: number;
  /** Primary compensating capacitor (series or parallel; in an LCC the series one) [F], > 0; default: sized for a real input impedance. */
  readonly primaryCapacitance?: number;
  /** Secondary compensating capacitor [F], > 0; default: resonant with L₂ (LCC: with L₂ − L_f2). */
  readonly secondaryCapacitance?: number;
  /** Filter inductor of a primary LCC network L_f1 [H], 0 < L_f1 < L₁; required for "lcc-series" and "double-lcc". */
  readonly primaryFilterInductance?: number;
  /** Filter inductor of a secondary LCC network L_f2 [H], 0 < L_f2 < L₂; required for "double-lcc". */
  readonly secondaryFilterInductance?: number;
}

/**
 * One capacitor of a link and its stresses.
 *
 * @category Inductive links
 */
export interface LinkCapacitor {
  /** Which capacitor: "primary", "secondary", "primary-filter" (LCC parallel capacitor), "secondary-filter". */
  readonly name: string;
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** RMS voltage across it [V]. */
  readonly voltageRms: number;
  /** RMS current through it [A]. */
  readonly currentRms: number;
}

/**
 * The steady state of an inductive link ({@link inductiveLink}).
 *
 * @category Inductive links
 */
export interface InductiveLink {
  /** Power into the load over power from the source. */
  readonly efficiency: number;
  /** Power into the load [W]. */
  readonly outputPower: number;
  /** Power from the source [W]. */
  readonly inputPower: number;
  /** Impedance seen by the source [Ω]. */
  readonly inputImpedance: {
    /** Resistance [Ω]. */
    readonly re: number;
    /** Reactance [Ω], > 0 inductive. */
    readonly im: number;
  };
  /** RMS source current [A]. */
  readonly inputCurrentRms: number;
  /** RMS current of the primary coil [A]. */
  readonly primaryCurrentRms: number;
  /** RMS current of the secondary coil [A]. */
  readonly secondaryCurrentRms: number;
  /** RMS load voltage [V]. */
  readonly loadVoltageRms: number;
  /** Coupling coefficient k = M/√(L₁L₂). */
  readonly couplingCoefficient: number;
  /** The capacitors (sized or given) and their stresses. */
  readonly capacitors: readonly LinkCapacitor[];
  /** Hazards: capacitor or coil voltages above extra-low voltage. */
  readonly cautions: readonly Caution[];
}
