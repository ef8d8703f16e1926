/**
 * Exact periodic steady state of the ideal parallel-resonant (PRC) and LCC (series–parallel)
 * converters with an inductive output filter, with the first-harmonic values beside it.
 *
 * @packageDocumentation
 */
import type { ValidityNote, Caution } from "../core/index.js";
import { lccFirstHarmonic, lccSteadyState } from "./lcc-kernel.js";
import {
  INDUCTIVE_TESTED,
  normalisedParallelPoint,
  readParallelConverterOptions,
  tankVoltageCautions,
  testedDomainText,
  testedDomainValidity,
} from "./parallel-converter.js";
import { hardSwitchingCaution, noSteadyStateError } from "./steady-state-notes.js";

/**
 * Options of {@link parallelResonantOperatingPoint}.
 *
 * @category Converters
 */
export interface ParallelResonantOperatingPointOptions {
  /** `"half"`: the tank sees ±V_in/2; `"full"`: ±V_in. */
  readonly bridge: "half" | "full";
  /** DC input voltage V_in [V], > 0. */
  readonly inputVoltage: number;
  /** Transformer turns ratio n = primary/secondary turns, > 0. */
  readonly turnsRatio: number;
  /** Series resonant inductance L_r [H], > 0. */
  readonly resonantInductance: number;
  /** Parallel capacitance C_p across the transformer primary (rectifier input) [F], > 0. */
  readonly parallelCapacitance: number;
  /** Switching frequency f_s [Hz], > 0. */
  readonly switchingFrequency: number;
  /** Load resistance R_load [Ω], > 0. */
  readonly loadResistance: number;
}

/**
 * Options of {@link lccOperatingPoint}: those of {@link parallelResonantOperatingPoint} and the
 * series capacitance.
 *
 * @category Converters
 */
export interface LccOperatingPointOptions extends ParallelResonantOperatingPointOptions {
  /** Series resonant capacitance C_s [F], > 0 (a split pair of a half bridge: their sum). */
  readonly seriesCapacitance: number;
}

/**
 * First-harmonic values beside the exact ones ({@link ParallelConverterOperatingPoint.firstHarmonic}).
 *
 * @category Converters
 */
export interface ParallelConverterFirstHarmonic {
  /** FHA gain M (the value of {@link parallelResonantGain} / {@link lccGain}). */
  readonly gain: number;
  /** FHA output voltage [V]. */
  readonly outputVoltage: number;
  /** FHA RMS resonant current [A]. */
  readonly resonantCurrentRms: number;
  /** FHA peak resonant current [A]. */
  readonly resonantCurrentPeak: number;
  /** FHA resonant current at the switching instant [A]. */
  readonly turnOffCurrent: number;
  /** FHA peak AC voltage of the series capacitor [V] (0 for the parallel-resonant converter). */
  readonly seriesCapacitorVoltagePeak: number;
  /** FHA peak voltage of the parallel capacitor [V]. */
  readonly parallelCapacitorVoltagePeak: number;
}

/**
 * The exact steady state of an ideal parallel-resonant or LCC converter with an inductive
 * output filter.
 *
 * @category Converters
 */
export interface ParallelConverterOperatingPoint {
  /** Output voltage V_out [V]. */
  readonly outputVoltage: number;
  /** Gain M = n V_out / V_b (V_b = V_in/2 half bridge, V_in full bridge). */
  readonly gain: number;
  /** Output current V_out/R_load [A] (the filter inductor's current). */
  readonly outputCurrent: number;
  /** Output power V_out²/R_load [W]. */
  readonly outputPower: number;
  /** Power drawn from the input, from the bridge current waveform [W] (equals outputPower: the circuit is lossless). */
  readonly inputPower: number;
  /** Resonant frequency f_r [Hz]: 1/(2π√(L_r C_p)) for the PRC, 1/(2π√(L_r C_s)) for the LCC. */
  readonly resonantFrequency: number;
  /** f_n = f_s/f_r. */
  readonly normalisedFrequency: number;
  /** Q = √(L_r/C)/R_ac with C = C_p (PRC) or C_s (LCC), R_ac = π²n²R_load/8. */
  readonly qualityFactor: number;
  /** A = C_p/C_s (0 for the parallel-resonant converter). */
  readonly capacitanceRatio: number;
  /** RMS resonant current [A]. */
  readonly resonantCurrentRms: number;
  /** Peak resonant current [A]. */
  readonly resonantCurrentPeak: number;
  /** Resonant current when a switch turns off, positive when it lags the bridge voltage (ZVS possible) [A]. */
  readonly turnOffCurrent: number;
  /** Peak AC voltage of the series capacitor [V] (0 for the PRC; a single capacitor of a half bridge also carries V_in/2 DC). */
  readonly seriesCapacitorVoltagePeak: number;
  /** Peak voltage of the parallel capacitor (transformer primary) [V]. */
  readonly parallelCapacitorVoltagePeak: number;
  /** RMS voltage of the parallel capacitor [V]. */
  readonly parallelCapacitorVoltageRms: number;
  /** Peak reverse voltage of a rectifier diode (full-bridge rectifier) [V]: the secondary voltage peak. */
  readonly diodeVoltagePeak: number;
  /** Fraction of the period during which all four rectifier diodes conduct and clamp C_p at zero (0 in the continuous mode). */
  readonly clampedFraction: number;
  /** True when turnOffCurrent > 0 (inductive current at turn-off: the switches can turn on at zero voltage). */
  readonly zeroVoltageSwitching: boolean;
  /**
   * The circuit modes of the positive half period in order: P (C_p voltage positive, the
   * rectifier passes +I_out), N (negative), Z (C_p clamped at zero, all diodes conduct), e.g.
   * "NP" or "PN" in the continuous mode, "NZP", "ZPZ" or "ZPNZ" with clamped intervals.
   */
  readonly conductionMode: string;
  /** The first-harmonic values for the same circuit. */
  readonly firstHarmonic: ParallelConverterFirstHarmonic;
  /** Hazards (voltages above extra-low voltage, hard switching). */
  readonly cautions: readonly Caution[];
  /** Notes when the point lies outside the domain checked against the time-domain simulation. */
  readonly validity: readonly ValidityNote[];
}

const fha = new Float64Array(8);

function operatingPoint(where: string, options: LccOperatingPointOptions | ParallelResonantOperatingPointOptions, lcc: boolean): ParallelConverterOperatingPoint {
  const { circuit, switchingFrequency: fs } = readParallelConverterOptions(where, options, lcc, "before-load");
  const { inputVoltage: vin, bridgeVoltage: vb, turnsRatio: n, loadResistance: rl } = circuit;
  const { a, zp, theta, zeta, resonantImpedance, fr, fn } = normalisedParallelPoint(circuit, fs);
  const rac = (Math.PI * Math.PI * n * n * rl) / 8;
  const q = resonantImpedance / rac;
  const solution = lccSteadyState(a, zeta, theta);
  if (solution === null) {
    throw noSteadyStateError(where, fs, `f_n = ${fn.toPrecision(4)}, Q = ${q.toPrecision(4)}${lcc ? `, A = ${a.toPrecision(4)}` : ""}`, testedDomainText(INDUCTIVE_TESTED, false));
  }
  const ib = vb / zp;
  const m = solution.gain;
  const vout = (m * vb) / n;
  const iout = vout / rl;
  const turnOffCurrent = -solution.j0 * ib;

  lccFirstHarmonic(a, zeta, theta, fha);
  const fhaGain = fha[3] ?? 0;
  const firstHarmonic: ParallelConverterFirstHarmonic = {
    gain: fhaGain,
    outputVoltage: (fhaGain * vb) / n,
    resonantCurrentRms: ((fha[4] ?? 0) * ib) / Math.SQRT2,
    resonantCurrentPeak: (fha[4] ?? 0) * ib,
    turnOffCurrent: (fha[7] ?? 0) * ib,
    seriesCapacitorVoltagePeak: (fha[5] ?? 0) * vb,
    parallelCapacitorVoltagePeak: (fha[6] ?? 0) * vb,
  };
  const seriesPeak = lcc ? solution.seriesPeak * vb : 0;
  const parallelPeak = solution.parallelPeak * vb;

  const cautions: Caution[] = tankVoltageCautions(vin, solution.parallelRms * vb, lcc ? seriesPeak : null);
  if (!(turnOffCurrent > 0)) {
    cautions.push(hardSwitchingCaution(turnOffCurrent, " (capacitive operation, below the tank's zero-phase frequency)", "Raise the switching frequency."));
  }
  const validity = testedDomainValidity(INDUCTIVE_TESTED, lcc, 0, fn, q, a);
  return {
    outputVoltage: vout,
    gain: m,
    outputCurrent: iout,
    outputPower: vout * iout,
    inputPower: vb * ib * solution.inputMean,
    resonantFrequency: fr,
    normalisedFrequency: fn,
    qualityFactor: q,
    capacitanceRatio: a,
    resonantCurrentRms: solution.resonantRms * ib,
    resonantCurrentPeak: solution.resonantPeak * ib,
    turnOffCurrent,
    seriesCapacitorVoltagePeak: seriesPeak,
    parallelCapacitorVoltagePeak: parallelPeak,
    parallelCapacitorVoltageRms: solution.parallelRms * vb,
    diodeVoltagePeak: parallelPeak / n,
    clampedFraction: solution.clampedFraction,
    zeroVoltageSwitching: turnOffCurrent > 0,
    conductionMode: solution.sequence,
    firstHarmonic,
    cautions,
    validity,
  };
}

/**
 * The exact periodic steady state of the ideal parallel-resonant converter with an inductive
 * output filter: ideal switches (the bridge applies ±V_b), series L_r, parallel C_p across an
 * ideal transformer of turns ratio n, an ideal diode bridge and a stiff filter inductor (the
 * rectifier sinks the constant current $I_\mathrm{out}/n$ with the sign of the capacitor
 * voltage $v_p$) into a stiff output capacitor. Three circuit modes: P ($v_p > 0$), N
 * ($v_p < 0$) and Z ($v_p$ clamped at zero while $|i_r| < I_\mathrm{out}/n$, all four diodes
 * conducting — the discontinuous-capacitor-voltage mode of heavy loads). The output voltage is
 * the rectified mean, $nV_\mathrm{out} = \langle|v_p|\rangle$. The steady state is the
 * half-wave antisymmetric boundary-value problem
 * $$ x(T/2) = -x(0),\qquad \frac{2}{T}\int_0^{T/2}|v_p|\,dt = nV_\mathrm{out},\qquad I_\mathrm{out} = V_\mathrm{out}/R_\mathrm{load} $$
 * for $x = (i_r, v_p)$, solved by Newton's method through an exact event-driven propagation
 * (closed-form solution of each mode, mode changes at exact crossings), not by integrating
 * cycles. The first-harmonic values ({@link parallelResonantGain}) are returned beside it.
 *
 * Definitions: $f_r = 1/(2\pi\sqrt{L_rC_p})$, $f_n = f_s/f_r$, $R_\mathrm{ac} = \pi^2n^2R_\mathrm{load}/8$,
 * $Q = \sqrt{L_r/C_p}/R_\mathrm{ac}$, $M = nV_\mathrm{out}/V_b$.
 *
 * @param options - {@link ParallelResonantOperatingPointOptions} (V, H, F, Hz, Ω)
 * @returns the {@link ParallelConverterOperatingPoint} (V, A, W)
 * @throws {@link InputError} for a non-positive or non-finite value, an unknown option key or
 *   option value, or a point where no consistent periodic solution is found (not met in the
 *   tested domain)
 * @remarks Accuracy: gain, output voltage, currents and capacitor voltages within 1e-6 relative
 * of a time-domain simulation of the same circuit taken to periodic steady state (scipy,
 * fixture test/fixtures/converters/prc-lcc-steady-state.json: 0.6 ≤ f_n ≤ 1.6,
 * 0.2 ≤ Q ≤ 2.5, modes NP, PN, NZP, ZPZ, ZPNZ); the boundary conditions are met to ≤ 1e-10; input power
 * equals output power to 1e-9 (lossless circuit). FHA error: the FHA gain is within 1.2 % of the
 * exact one for |f_n − 1| ≤ 0.02, 3.1 % for ≤ 0.05 and 6.4 % for ≤ 0.1 (0.2 ≤ Q ≤ 1, tested),
 * equal to it at f_n = 1 in the continuous mode (both 8/(π²Q)), and off by more in the clamped
 * mode (e.g. 16 % at Q = 1, f_n = 0.6). Validity: ideal components — no losses, no
 * diode drop, no output ripple, the filter inductor's current constant (its ripple neglected).
 * Outside the tested domain a `validity` note is added.
 * @see R. L. Steigerwald, "A comparison of half-bridge resonant converter topologies", IEEE
 *   Trans. Power Electron. 3(2), 174–182 (1988) (the PRC with an LC output filter, R_ac = π²R/8);
 *   R. Oruganti and F. C. Lee, "State-plane analysis of parallel resonant converter", IEEE PESC
 *   1985, 56–73 (the exact modes, including the clamped-capacitor interval; from memory).
 * @example
 * ```ts
 * import { parallelResonantOperatingPoint } from "fluxwright";
 * const op = parallelResonantOperatingPoint({
 *   bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6,
 *   parallelCapacitance: 25e-9, switchingFrequency: 110e3, loadResistance: 12,
 * });
 * console.log(op.conductionMode); // NP
 * console.log(op.outputVoltage.toFixed(3)); // 112.346
 * console.log(op.firstHarmonic.outputVoltage.toFixed(3)); // 115.626
 * ```
 * @category Converters
 */
export function parallelResonantOperatingPoint(options: ParallelResonantOperatingPointOptions): ParallelConverterOperatingPoint {
  return operatingPoint("parallelResonantOperatingPoint", options, false);
}

/**
 * The exact periodic steady state of the ideal LCC (series–parallel) resonant converter with an
 * inductive output filter: {@link parallelResonantOperatingPoint} with a series capacitor C_s
 * in the tank. The modes, the boundary-value problem and its solution are the same, with the
 * series capacitor voltage as a third state.
 *
 * Definitions (as {@link lccGain}): $f_r = 1/(2\pi\sqrt{L_rC_s})$, $f_n = f_s/f_r$,
 * $A = C_p/C_s$, $R_\mathrm{ac} = \pi^2n^2R_\mathrm{load}/8$, $Q = \sqrt{L_r/C_s}/R_\mathrm{ac}$,
 * $M = nV_\mathrm{out}/V_b$.
 *
 * @param options - {@link LccOperatingPointOptions} (V, H, F, Hz, Ω)
 * @returns the {@link ParallelConverterOperatingPoint} (V, A, W)
 * @throws {@link InputError} as {@link parallelResonantOperatingPoint}
 * @remarks Accuracy: within 1e-6 relative of the time-domain simulation (fixture
 * prc-lcc-steady-state.json: 0.25 ≤ A ≤ 2, 0.6 ≤ f_n ≤ 1.6, 0.2 ≤ Q ≤ 2.5); power conserved to
 * 1e-9. FHA error: the FHA gain ({@link lccGain}) is within 4.5 % of the exact one for A = 2,
 * 1.7 % for A = 1 at f_n = 1.1, but up to 22 % over 0.25 ≤ A ≤ 2, 1 ≤ f_n ≤ 1.6, 0.2 ≤ Q ≤ 1
 * (worst at small A, where clamped intervals appear; tested) — it does not approach the exact
 * value at light load, so use the exact solution for design. Validity: ideal components, as
 * {@link parallelResonantOperatingPoint}.
 * @see R. L. Steigerwald, IEEE Trans. Power Electron. 3(2), 174–182 (1988) (series–parallel
 *   converter, FHA); A. K. S. Bhat, "Analysis and design of a series-parallel resonant converter",
 *   IEEE Trans. Power Electron. 8(1), 1–11 (1993) (the exact modes with an inductive output
 *   filter; from memory).
 * @example
 * ```ts
 * import { lccOperatingPoint } from "fluxwright";
 * const op = lccOperatingPoint({
 *   bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, seriesCapacitance: 25e-9,
 *   parallelCapacitance: 25e-9, switchingFrequency: 150e3, loadResistance: 12,
 * });
 * console.log(op.conductionMode); // NP
 * console.log(op.outputVoltage.toFixed(3)); // 127.756
 * console.log(op.firstHarmonic.outputVoltage.toFixed(3)); // 130.448
 * ```
 * @category Converters
 */
export function lccOperatingPoint(options: LccOperatingPointOptions): ParallelConverterOperatingPoint {
  return operatingPoint("lccOperatingPoint", options, true);
}
