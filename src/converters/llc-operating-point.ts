/**
 * Exact periodic steady state of the ideal LLC and series-resonant converters, with the
 * first-harmonic values beside it.
 *
 * @packageDocumentation
 */
import {
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
  type Caution,
  type ValidityNote,
} from "../core/index.js";
import { extraLowVoltageCaution } from "../core/extra-low-voltage.js";
import { fhaSeed, llcSteadyState } from "./llc-kernel.js";
import { hardSwitchingCaution, noSteadyStateError, outsideTestedDomainNote } from "./steady-state-notes.js";

/**
 * Options of {@link llcOperatingPoint}.
 *
 * @category Converters
 */
export interface LlcOperatingPointOptions {
  /** `"half"`: the tank sees ±V_in/2; `"full"`: ±V_in. */
  readonly bridge: "half" | "full";
  /** DC input voltage V_in [V], > 0. */
  readonly inputVoltage: number;
  /** Transformer turns ratio n = primary/secondary turns, > 0. */
  readonly turnsRatio: number;
  /** Series resonant inductance L_r [H], > 0 (leakage included). */
  readonly resonantInductance: number;
  /** Series resonant capacitance C_r [F], > 0 (a split pair of a half bridge: their sum). */
  readonly resonantCapacitance: number;
  /** Magnetising inductance L_m [H], > 0 (primary side). */
  readonly magnetisingInductance: number;
  /** Switching frequency f_s [Hz], > 0. */
  readonly switchingFrequency: number;
  /** Load resistance R_load [Ω], > 0. */
  readonly loadResistance: number;
  /** `"centre-tap"` (diodes see 2V_out) or `"full-bridge"` (V_out); default `"full-bridge"`. Waveforms are the same. */
  readonly rectifier?: "centre-tap" | "full-bridge";
  /** Dead time between the switches of a leg [s], ≥ 0; with switchCapacitance, sets the ZVS test. */
  readonly deadTime?: number;
  /** Output capacitance of one switch (charge-equivalent) [F], ≥ 0. */
  readonly switchCapacitance?: number;
}

/**
 * Options of {@link seriesResonantOperatingPoint}: those of {@link llcOperatingPoint} without
 * the magnetising inductance.
 *
 * @category Converters
 */
export type SeriesResonantOperatingPointOptions = Omit<LlcOperatingPointOptions, "magnetisingInductance">;

/**
 * First-harmonic values beside the exact ones ({@link LlcOperatingPoint.firstHarmonic}).
 *
 * @category Converters
 */
export interface ConverterFirstHarmonic {
  /** FHA gain M. */
  readonly gain: number;
  /** FHA output voltage [V]. */
  readonly outputVoltage: number;
  /** FHA RMS resonant current [A]. */
  readonly resonantCurrentRms: number;
  /** FHA peak resonant current [A]. */
  readonly resonantCurrentPeak: number;
  /** FHA peak magnetising current [A] (0 without a magnetising branch). */
  readonly magnetisingCurrentPeak: number;
  /** FHA resonant current at the switching instant [A] (> 0 helps ZVS). */
  readonly turnOffCurrent: number;
  /** FHA peak AC voltage of the resonant capacitor [V]. */
  readonly capacitorVoltagePeak: number;
  /** FHA RMS current of one rectifier diode [A] (half-sine). */
  readonly rectifierCurrentRms: number;
}

/**
 * The exact steady state of an ideal LLC or series-resonant converter.
 *
 * @category Converters
 */
export interface LlcOperatingPoint {
  /** Output voltage V_out [V]. */
  readonly outputVoltage: number;
  /** Gain M = n V_out / V_b (V_b = V_in/2 half bridge, V_in full bridge). */
  readonly gain: number;
  /** Output current V_out/R_load [A]. */
  readonly outputCurrent: number;
  /** Output power V_out²/R_load [W]. */
  readonly outputPower: number;
  /** Power drawn from the input, from the bridge current waveform [W] (equals outputPower: the circuit is lossless). */
  readonly inputPower: number;
  /** Resonant frequency f_r = 1/(2π√(L_r C_r)) [Hz]. */
  readonly resonantFrequency: number;
  /** f_n = f_s/f_r. */
  readonly normalisedFrequency: number;
  /** L_n = L_m/L_r (Infinity for the series-resonant converter). */
  readonly inductanceRatio: number;
  /** Q = √(L_r/C_r)/R_ac, R_ac = 8n²R_load/π². */
  readonly qualityFactor: number;
  /** RMS resonant current [A]. */
  readonly resonantCurrentRms: number;
  /** Peak resonant current [A]. */
  readonly resonantCurrentPeak: number;
  /** Peak magnetising current [A]. */
  readonly magnetisingCurrentPeak: number;
  /** Resonant current when a switch turns off, positive when it flows so as to discharge the incoming switch (ZVS) [A]; exactly 0 when it is below 1e-12 of the peak (the series-resonant converter's current resting at zero). */
  readonly turnOffCurrent: number;
  /** Peak AC voltage of the resonant capacitor [V] (a single capacitor of a half bridge also carries V_in/2 DC). */
  readonly capacitorVoltagePeak: number;
  /** RMS current of one rectifier diode [A]. */
  readonly rectifierCurrentRms: number;
  /** RMS current of the secondary winding (full-bridge rectifier; each half of a centre-tap winding carries rectifierCurrentRms) [A]. */
  readonly secondaryCurrentRms: number;
  /** Peak reverse voltage of a rectifier diode [V]. */
  readonly diodeVoltagePeak: number;
  /**
   * Zero-voltage switching: turnOffCurrent > 0 and, when deadTime and switchCapacitance are
   * given, turnOffCurrent × deadTime ≥ 2 switchCapacitance × V_in (the charge that swings the
   * leg's two switch capacitances, taking the current as constant over the dead time).
   */
  readonly zeroVoltageSwitching: boolean;
  /**
   * The circuit modes of one half period in order: P (rectifier conducts forward), N (rectifier
   * conducts reversed), O (rectifier off, L_m in the resonance), e.g. "PO" below resonance,
   * "NP" above, "P" exactly at f_r.
   */
  readonly conductionMode: string;
  /** The first-harmonic values for the same circuit. */
  readonly firstHarmonic: ConverterFirstHarmonic;
  /** Hazards (voltages above extra-low voltage, hard switching). */
  readonly cautions: readonly Caution[];
  /** Notes when the point lies outside the domain where the solver was validated. */
  readonly validity: readonly ValidityNote[];
}

const LLC_KEYS = [
  "bridge", "inputVoltage", "turnsRatio", "resonantInductance", "resonantCapacitance", "magnetisingInductance",
  "switchingFrequency", "loadResistance", "rectifier", "deadTime", "switchCapacitance",
] as const;
const SRC_KEYS = LLC_KEYS.filter((k) => k !== "magnetisingInductance");

const fha = new Float64Array(9);

function operatingPoint(where: string, options: LlcOperatingPointOptions | SeriesResonantOperatingPointOptions, series: boolean): LlcOperatingPoint {
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, series ? SRC_KEYS : LLC_KEYS);
  const bridge = requireOneOf(where, "bridge", options.bridge, ["half", "full"] as const);
  const vin = requirePositive(where, "inputVoltage", options.inputVoltage, "V");
  const n = requirePositive(where, "turnsRatio", options.turnsRatio, "");
  const lr = requirePositive(where, "resonantInductance", options.resonantInductance, "H");
  const cr = requirePositive(where, "resonantCapacitance", options.resonantCapacitance, "F");
  const lm = series ? Infinity : requirePositive(where, "magnetisingInductance", (options as LlcOperatingPointOptions).magnetisingInductance, "H");
  const fs = requirePositive(where, "switchingFrequency", options.switchingFrequency, "Hz");
  const rl = requirePositive(where, "loadResistance", options.loadResistance, "Ω");
  const rectifier = options.rectifier === undefined ? "full-bridge" : requireOneOf(where, "rectifier", options.rectifier, ["centre-tap", "full-bridge"] as const);
  const deadTime = options.deadTime === undefined ? undefined : requireNonNegative(where, "deadTime", options.deadTime, "s");
  const switchCapacitance = options.switchCapacitance === undefined ? undefined : requireNonNegative(where, "switchCapacitance", options.switchCapacitance, "F");

  const vb = bridge === "half" ? vin / 2 : vin;
  const zr = Math.sqrt(lr / cr);
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
  const fn = fs / fr;
  const lam = lr / lm;
  const rac = (8 * n * n * rl) / (Math.PI * Math.PI);
  const q = zr / rac;
  const solution = llcSteadyState(lam, q, fn);
  if (solution === null) {
    throw noSteadyStateError(where, fs, `f_n = ${fn.toPrecision(4)}, L_n = ${(1 / lam).toPrecision(4)}, Q = ${q.toPrecision(4)}`, "0.45 ≤ f_n ≤ 1.6, 3 ≤ L_n ≤ 10, 0.15 ≤ Q ≤ 1");
  }
  const ib = vb / zr;
  const m = solution.gain;
  const vout = (m * vb) / n;
  const iout = vout / rl;
  // a current at rounding level (the series-resonant converter's current rests at zero before
  // the switches change over) is zero: no charge for the switch capacitances
  const turnOffCurrent = Math.abs(solution.j0) <= 1e-12 * solution.resonantPeak ? 0 : -solution.j0 * ib;
  let zvs = turnOffCurrent > 0;
  if (zvs && deadTime !== undefined && switchCapacitance !== undefined) {
    zvs = turnOffCurrent * deadTime >= 2 * switchCapacitance * vin;
  }
  const secondaryRms = n * solution.rectifierRms * ib;
  const capacitorVoltagePeak = solution.capacitorPeak * vb;

  fhaSeed(lam, q, fn, fha);
  const fhaGain = fha[3] ?? 0;
  const firstHarmonic: ConverterFirstHarmonic = {
    gain: fhaGain,
    outputVoltage: (fhaGain * vb) / n,
    resonantCurrentRms: ((fha[4] ?? 0) * ib) / Math.SQRT2,
    resonantCurrentPeak: (fha[4] ?? 0) * ib,
    magnetisingCurrentPeak: (fha[6] ?? 0) * ib,
    turnOffCurrent: (fha[7] ?? 0) * ib,
    capacitorVoltagePeak: (fha[5] ?? 0) * vb,
    rectifierCurrentRms: (n * (fha[8] ?? 0) * ib) / 2,
  };

  const cautions: Caution[] = [];
  const dc = extraLowVoltageCaution(vin, "dc", "converter input");
  if (dc !== null) cautions.push(dc);
  const ac = extraLowVoltageCaution(capacitorVoltagePeak / Math.SQRT2, "ac", "resonant capacitor (AC part, RMS of a sine of the same peak)");
  if (ac !== null) cautions.push(ac);
  if (!zvs) {
    const circumstance = deadTime !== undefined && switchCapacitance !== undefined ? " and its charge over the dead time does not swing the switch capacitances" : "";
    cautions.push(hardSwitchingCaution(turnOffCurrent, circumstance, "Raise the switching frequency or the magnetising current."));
  }
  const validity: ValidityNote[] = [];
  const ln = 1 / lam;
  if (fn < 0.45 || fn > 1.6 || q < 0.15 || q > 1 || (!series && (ln < 3 || ln > 10))) {
    validity.push(outsideTestedDomainNote("0.45 ≤ f_n ≤ 1.6, 0.15 ≤ Q ≤ 1, 3 ≤ L_n ≤ 10", "1e-9"));
  }
  return {
    outputVoltage: vout,
    gain: m,
    outputCurrent: iout,
    outputPower: vout * iout,
    inputPower: vb * ib * solution.inputMean,
    resonantFrequency: fr,
    normalisedFrequency: fn,
    inductanceRatio: ln,
    qualityFactor: q,
    resonantCurrentRms: solution.resonantRms * ib,
    resonantCurrentPeak: solution.resonantPeak * ib,
    magnetisingCurrentPeak: series ? 0 : solution.magnetisingPeak * ib,
    turnOffCurrent,
    capacitorVoltagePeak,
    rectifierCurrentRms: secondaryRms / Math.SQRT2,
    secondaryCurrentRms: secondaryRms,
    diodeVoltagePeak: rectifier === "centre-tap" ? 2 * vout : vout,
    zeroVoltageSwitching: zvs,
    conductionMode: solution.sequence,
    firstHarmonic,
    cautions,
    validity,
  };
}

/**
 * The exact periodic steady state of the ideal LLC resonant converter: ideal switches (the
 * bridge applies ±V_b, V_b = V_in/2 for a half bridge, V_in for a full bridge), series L_r and
 * C_r, magnetising inductance L_m across an ideal transformer of turns ratio n, ideal rectifier
 * diodes and a stiff output capacitor (V_out constant over the period). The circuit is
 * piecewise linear with three modes — rectifier forward (P: $v_{L_m} = +nV_\mathrm{out}$),
 * reversed (N: $-nV_\mathrm{out}$) and off (O: $i_r = i_m$, $L_r + L_m$ resonate with $C_r$) — each
 * with a closed-form solution. The steady state is half-wave antisymmetric, so it is the
 * boundary-value problem
 * $$ x(T/2) = -x(0),\qquad \frac{2}{T}\int_0^{T/2} n\,|i_r - i_m|\,dt = \frac{V_\mathrm{out}}{R_\mathrm{load}} $$
 * for $x = (i_r, v_{C_r}, i_m)$ and V_out. For the mode sequence the physics picks, the
 * switching instants and the state are found by Newton's method on the closed-form segment
 * maps; the sequence is confirmed by an exact event-driven propagation of the solution (no
 * cycle-by-cycle integration). The first-harmonic values are returned beside the exact ones.
 *
 * Definitions: $f_r = 1/(2\pi\sqrt{L_rC_r})$, $f_n = f_s/f_r$, $L_n = L_m/L_r$,
 * $R_\mathrm{ac} = 8n^2R_\mathrm{load}/\pi^2$, $Q = \sqrt{L_r/C_r}/R_\mathrm{ac}$, $M = nV_\mathrm{out}/V_b$.
 *
 * @param options - {@link LlcOperatingPointOptions} (V, H, F, Hz, Ω, s)
 * @returns the {@link LlcOperatingPoint} (V, A, W)
 * @throws {@link InputError} for a non-positive or non-finite value, an unknown option key or
 *   option value, or a point where no consistent periodic solution is found (not met in the
 *   tested domain)
 * @remarks Accuracy: gain, currents and capacitor voltage within 1e-6 relative of a
 * time-domain simulation of the same circuit taken to periodic steady state (scipy, fixture
 * test/fixtures/converters/llc-steady-state.json: 3 ≤ L_n ≤ 10 and the series-resonant limit,
 * 0.15 ≤ Q ≤ 1, 0.45 ≤ f_n ≤ 1.6, modes PO, NP, P, OPO, PON, NOP…); the boundary conditions are
 * met to ≤ 1e-9. Input power equals output power to 1e-9 (lossless circuit). Validity: ideal
 * components — no winding, switch or diode losses, no diode drop, no output ripple; the dead
 * time and switch capacitance enter only the ZVS test. Outside the tested domain a `validity`
 * note is added.
 * @see R. L. Steigerwald, IEEE Trans. Power Electron. 3(2), 174–182 (1988) (FHA, R_ac);
 *   X. Fang, H. Hu, Z. J. Shen, I. Batarseh, "Operation mode analysis and peak gain approximation
 *   of the LLC resonant converter", IEEE Trans. Power Electron. 27(4), 1985–1995 (2012) (the
 *   P/N/O modes and their sequences; from memory).
 * @example
 * ```ts
 * import { llcOperatingPoint } from "fluxwright";
 * const op = llcOperatingPoint({
 *   bridge: "half", inputVoltage: 390, turnsRatio: 8, resonantInductance: 60e-6,
 *   resonantCapacitance: 24e-9, magnetisingInductance: 360e-6, switchingFrequency: 110e3, loadResistance: 5,
 * });
 * console.log(op.conductionMode); // PO
 * console.log(op.outputVoltage.toFixed(3)); // 26.769
 * console.log(op.firstHarmonic.outputVoltage.toFixed(3)); // 26.288
 * ```
 * @category Converters
 */
export function llcOperatingPoint(options: LlcOperatingPointOptions): LlcOperatingPoint {
  return operatingPoint("llcOperatingPoint", options, false);
}

/**
 * The exact periodic steady state of the ideal series-resonant converter (capacitive output
 * filter): {@link llcOperatingPoint} without a magnetising branch ($L_m \to \infty$). Below
 * resonance the tank current rests at zero between pulses (mode O), and at light load the
 * gain clamps at exactly M = 1 (the FHA gain cannot show this).
 *
 * @param options - {@link SeriesResonantOperatingPointOptions} (V, H, F, Hz, Ω, s)
 * @returns the {@link LlcOperatingPoint} (magnetisingCurrentPeak 0, inductanceRatio Infinity)
 * @throws {@link InputError} as {@link llcOperatingPoint}
 * @remarks Accuracy: within 1e-6 relative of the time-domain simulation (fixture
 * llc-steady-state.json, series-resonant cases 0.3 ≤ Q ≤ 1, 0.45 ≤ f_n ≤ 1.5). Validity: ideal
 * components, as {@link llcOperatingPoint}.
 * @see R. W. Erickson and D. Maksimović, Fundamentals of Power Electronics, 2nd ed. (2001),
 *   ch. 19 (exact analysis of the series resonant converter; from memory).
 * @example
 * ```ts
 * import { seriesResonantOperatingPoint } from "fluxwright";
 * const op = seriesResonantOperatingPoint({
 *   bridge: "full", inputVoltage: 48, turnsRatio: 2, resonantInductance: 20e-6,
 *   resonantCapacitance: 100e-9, switchingFrequency: 130e3, loadResistance: 6,
 * });
 * console.log(op.conductionMode); // NP
 * console.log(op.gain.toFixed(4)); // 0.9505
 * ```
 * @category Converters
 */
export function seriesResonantOperatingPoint(options: SeriesResonantOperatingPointOptions): LlcOperatingPoint {
  return operatingPoint("seriesResonantOperatingPoint", options, true);
}
