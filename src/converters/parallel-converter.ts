/**
 * What the operating points of the parallel-resonant (PRC) and LCC converters share, with an
 * inductive output filter ({@link lccOperatingPoint}), a capacitive one
 * ({@link lccOperatingPointCapacitiveFilter}) and in the sweep: reading and checking the
 * options, the normalised point the kernels solve, the tank's voltage cautions and the text of
 * a tested domain. Internal.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requireOneOf, requirePositive, voltageCaution, type Caution, type ValidityNote } from "../core/index.js";
import type { LccOperatingPointOptions } from "./lcc-operating-point.js";
import { outsideTestedDomainNote } from "./steady-state-notes.js";

/** Option keys of the parallel-resonant operating points. */
export const PRC_KEYS = [
  "bridge", "inputVoltage", "turnsRatio", "resonantInductance", "parallelCapacitance", "switchingFrequency", "loadResistance",
] as const;
/** Option keys of the LCC operating points. */
export const LCC_KEYS = [...PRC_KEYS, "seriesCapacitance"] as const;

/** Checked circuit of a PRC (cs = Infinity) or LCC. */
export interface ParallelConverterCircuit {
  readonly lcc: boolean;
  readonly inputVoltage: number;
  readonly bridgeVoltage: number;
  readonly turnsRatio: number;
  readonly resonantInductance: number;
  readonly parallelCapacitance: number;
  readonly seriesCapacitance: number;
  readonly loadResistance: number;
}

/**
 * Where the switching frequency is checked among the circuit's fields: before the load
 * resistance (the inductive-filter functions), after it (the capacitive-filter functions), or
 * not at all (the sweep). A doubly bad input names the first bad field in this order, as each
 * function always has.
 */
export type FrequencyCheck = "before-load" | "after-load" | "none";

/**
 * Validates the circuit part of the options, and the switching frequency where `frequency`
 * says (NaN for "none"); not the object or its keys.
 */
export function checkParallelConverterCircuit(
  where: string, options: Partial<LccOperatingPointOptions>, lcc: boolean, frequency: FrequencyCheck,
): { circuit: ParallelConverterCircuit; switchingFrequency: number } {
  const bridge = requireOneOf(where, "bridge", options.bridge, ["half", "full"] as const);
  const vin = requirePositive(where, "inputVoltage", options.inputVoltage, "V");
  const turnsRatio = requirePositive(where, "turnsRatio", options.turnsRatio, "");
  const resonantInductance = requirePositive(where, "resonantInductance", options.resonantInductance, "H");
  const parallelCapacitance = requirePositive(where, "parallelCapacitance", options.parallelCapacitance, "F");
  const seriesCapacitance = lcc ? requirePositive(where, "seriesCapacitance", options.seriesCapacitance, "F") : Infinity;
  const early = frequency === "before-load" ? requirePositive(where, "switchingFrequency", options.switchingFrequency, "Hz") : NaN;
  const loadResistance = requirePositive(where, "loadResistance", options.loadResistance, "Ω");
  const switchingFrequency = frequency === "after-load" ? requirePositive(where, "switchingFrequency", options.switchingFrequency, "Hz") : early;
  const circuit: ParallelConverterCircuit = {
    lcc,
    inputVoltage: vin,
    bridgeVoltage: bridge === "half" ? vin / 2 : vin,
    turnsRatio,
    resonantInductance,
    parallelCapacitance,
    seriesCapacitance,
    loadResistance,
  };
  return { circuit, switchingFrequency };
}

/**
 * Reads the options of a single-point PRC or LCC function: an object with only the known keys,
 * the circuit and the switching frequency (checked where `frequency` says).
 */
export function readParallelConverterOptions(
  where: string, options: Partial<LccOperatingPointOptions>, lcc: boolean, frequency: "before-load" | "after-load",
): { circuit: ParallelConverterCircuit; switchingFrequency: number } {
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, lcc ? LCC_KEYS : PRC_KEYS);
  return checkParallelConverterCircuit(where, options, lcc, frequency);
}

/** A circuit at a switching frequency in the kernels' normalised units, with f_r and f_n. */
export interface NormalisedParallelPoint {
  /** a = C_p/C_s (0 for the PRC). */
  readonly a: number;
  /** Z_p = √(L_r/C_p) [Ω]: the unit of current is V_b/Z_p. */
  readonly zp: number;
  /** Half period Θ = π f_p/f_s, f_p = 1/(2π√(L_r C_p)). */
  readonly theta: number;
  /** ζ = Z_p/(n²R_load). */
  readonly zeta: number;
  /** √(L_r/C) with C = C_s (LCC) or C_p (PRC) [Ω]: Q = this / R_ac. */
  readonly resonantImpedance: number;
  /** f_r = 1/(2π√(L_r C)) [Hz]. */
  readonly fr: number;
  /** f_n = f_s/f_r. */
  readonly fn: number;
}

/** The normalised point of a checked circuit at f_s [Hz]. */
export function normalisedParallelPoint(c: ParallelConverterCircuit, fs: number): NormalisedParallelPoint {
  const { lcc, turnsRatio: n, resonantInductance: lr, parallelCapacitance: cp, seriesCapacitance: cs, loadResistance: rl } = c;
  const zp = Math.sqrt(lr / cp);
  const fp = 1 / (2 * Math.PI * Math.sqrt(lr * cp));
  const cr = lcc ? cs : cp;
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
  return {
    a: lcc ? cp / cs : 0,
    zp,
    theta: (Math.PI * fp) / fs,
    zeta: zp / (n * n * rl),
    resonantImpedance: Math.sqrt(lr / cr),
    fr,
    fn: fs / fr,
  };
}

/**
 * The voltage cautions of a PRC or LCC tank, in this order: the DC input, the parallel
 * capacitor (RMS), and for the LCC the series capacitor (its AC peak as the RMS of a sine).
 *
 * @param inputVoltage - V_in [V]
 * @param parallelRms - RMS voltage of the parallel capacitor [V]
 * @param seriesPeak - peak AC voltage of the series capacitor [V], or null for the PRC
 */
export function tankVoltageCautions(inputVoltage: number, parallelRms: number, seriesPeak: number | null): Caution[] {
  const cautions: Caution[] = [];
  const dc = voltageCaution({ voltage: inputVoltage, waveform: "dc", location: "converter input" });
  if (dc !== null) cautions.push(dc);
  const acP = voltageCaution({ voltage: parallelRms, waveform: "ac", location: "parallel capacitor and transformer primary (RMS)" });
  if (acP !== null) cautions.push(acP);
  if (seriesPeak !== null) {
    const acS = voltageCaution({ voltage: seriesPeak / Math.SQRT2, waveform: "ac", location: "series capacitor (AC part, RMS of a sine of the same peak)" });
    if (acS !== null) cautions.push(acS);
  }
  return cautions;
}

/** A domain checked against a time-domain simulation. */
export interface TestedDomain {
  readonly fnMin: number;
  readonly fnMax: number;
  readonly qMin: number;
  readonly qMax: number;
  readonly aMin: number;
  readonly aMax: number;
}

/**
 * The domain of the inductive-filter PRC and LCC operating points ({@link lccOperatingPoint},
 * and the inductive points of the sweep) checked against their time-domain simulation (fixture
 * prc-lcc-steady-state.json).
 */
export const INDUCTIVE_TESTED: TestedDomain = { fnMin: 0.6, fnMax: 1.6, qMin: 0.2, qMax: 2.5, aMin: 0.25, aMax: 2 };

/** The domain as text, e.g. "0.6 ≤ f_n ≤ 1.6, 0.2 ≤ Q ≤ 2.5, 0.25 ≤ A ≤ 2" (A only with `ratio`). */
export function testedDomainText(t: TestedDomain, ratio: boolean): string {
  return `${t.fnMin} ≤ f_n ≤ ${t.fnMax}, ${t.qMin} ≤ Q ≤ ${t.qMax}${ratio ? `, ${t.aMin} ≤ A ≤ ${t.aMax}` : ""}`;
}

/**
 * The validity notes of a point: none inside the tested domain `t`, else the note that it lies
 * outside (boundary conditions met to 1e-10). Each limit is widened by the relative `margin`
 * (0: none); A = C_p/C_s is tested only with `ratio` (the LCC).
 */
export function testedDomainValidity(t: TestedDomain, ratio: boolean, margin: number, fn: number, q: number, a: number): ValidityNote[] {
  const lo = 1 - margin;
  const hi = 1 + margin;
  const outside = fn < t.fnMin * lo || fn > t.fnMax * hi || q < t.qMin * lo || q > t.qMax * hi || (ratio && (a < t.aMin * lo || a > t.aMax * hi));
  return outside ? [outsideTestedDomainNote(testedDomainText(t, ratio), "1e-10")] : [];
}
