/**
 * Exact periodic steady state of the ideal parallel-resonant (PRC) and LCC (series–parallel)
 * converters with a capacitive output filter, with the first-harmonic values (RC load model)
 * beside it.
 *
 * @packageDocumentation
 */
import { voltageCaution, type Caution, type ValidityNote } from "../core/index.js";
import { capacitiveFirstHarmonic, capacitiveSteadyState } from "./capacitive-filter-kernel.js";
import type { LccOperatingPointOptions, ParallelResonantOperatingPointOptions } from "./lcc-operating-point.js";
import {
  normalisedParallelPoint,
  readParallelConverterOptions,
  tankVoltageCautions,
  testedDomainText,
  testedDomainValidity,
  type ParallelConverterCircuit,
} from "./parallel-converter.js";
import type { StateAndGainStart, StateAndGainSteadyState } from "./periodic-newton.js";
import { hardSwitchingCaution, noSteadyStateError } from "./steady-state-notes.js";

/**
 * First-harmonic values beside the exact ones ({@link CapacitiveFilterOperatingPoint.firstHarmonic}),
 * from the RC load model: the rectifier and the parallel capacitor, driven by a sinusoidal
 * current, replaced by their equivalent series resistance and capacitance at the fundamental.
 *
 * @category Converters
 */
export interface CapacitiveFilterFirstHarmonic {
  /** FHA gain M. */
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
  /** Angle of each half cycle during which the rectifier is off and C_p swings between ∓nV_out [rad], in (0, π). */
  readonly nonConductionAngle: number;
  /** Series resistance of the equivalent load (primary side) [Ω]. */
  readonly equivalentResistance: number;
  /** Series capacitance of the equivalent load (primary side) [F]. */
  readonly equivalentCapacitance: number;
}

/**
 * The exact steady state of an ideal parallel-resonant or LCC converter with a capacitive
 * output filter.
 *
 * @category Converters
 */
export interface CapacitiveFilterOperatingPoint {
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
  /** Resonant frequency f_r [Hz]: 1/(2π√(L_r C_p)) for the PRC, 1/(2π√(L_r C_s)) for the LCC. */
  readonly resonantFrequency: number;
  /** f_n = f_s/f_r. */
  readonly normalisedFrequency: number;
  /** Q = √(L_r/C)/R_ac with C = C_p (PRC) or C_s (LCC) and R_ac = 8n²R_load/π² (capacitive-filter definition). */
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
  /** Peak voltage of the parallel capacitor (transformer primary) [V]: nV_out whenever the rectifier conducts. */
  readonly parallelCapacitorVoltagePeak: number;
  /** RMS voltage of the parallel capacitor [V]. */
  readonly parallelCapacitorVoltageRms: number;
  /** Peak reverse voltage of a rectifier diode (full-bridge rectifier) [V]: V_out. */
  readonly diodeVoltagePeak: number;
  /** RMS of the rectifier's output current (secondary side, into the output capacitor and load) [A]. */
  readonly rectifierCurrentRms: number;
  /** Peak of the rectifier's output current (secondary side) [A]. */
  readonly rectifierCurrentPeak: number;
  /** RMS ripple current of the output capacitor, √(I_rect,rms² − I_out²) [A]. */
  readonly outputCapacitorCurrentRms: number;
  /** Fraction of the period during which the rectifier conducts and holds C_p at ±nV_out. */
  readonly conductionFraction: number;
  /** True when turnOffCurrent > 0 (inductive current at turn-off: the switches can turn on at zero voltage). */
  readonly zeroVoltageSwitching: boolean;
  /**
   * The circuit modes of the positive half period in order: P (rectifier conducts, C_p at
   * +nV_out), N (at −nV_out), O (rectifier off, C_p swinging), e.g. "NOP" or "OPO".
   */
  readonly conductionMode: string;
  /** The first-harmonic values for the same circuit (RC load model). */
  readonly firstHarmonic: CapacitiveFilterFirstHarmonic;
  /** Hazards (voltages above extra-low voltage, hard switching). */
  readonly cautions: readonly Caution[];
  /** Notes when the point lies outside the domain checked against the time-domain simulation. */
  readonly validity: readonly ValidityNote[];
}

/** Domains checked against the time-domain simulation (fixture prc-lcc-capacitive-steady-state.json). */
const PRC_TESTED = { fnMin: 0.7, fnMax: 1.8, qMin: 0.2, qMax: 3, aMin: 0, aMax: 0 } as const;
const LCC_TESTED = { fnMin: 0.55, fnMax: 2.4, qMin: 0.4, qMax: 2.5, aMin: 0.25, aMax: 2 } as const;

function testedDomain(lcc: boolean): string {
  return testedDomainText(lcc ? LCC_TESTED : PRC_TESTED, lcc);
}

const fha = new Float64Array(9);

/**
 * The operating point of a checked circuit at f_s, or null with no consistent periodic
 * solution; `start` continues from a previous solution. Internal (used by the sweep).
 */
export function capacitiveOperatingPointOf(
  c: ParallelConverterCircuit, fs: number, start?: StateAndGainStart,
): { point: CapacitiveFilterOperatingPoint; solution: StateAndGainSteadyState } | null {
  const { lcc, bridgeVoltage: vb, turnsRatio: n, loadResistance: rl } = c;
  const { a, zp, theta, zeta, resonantImpedance, fr, fn } = normalisedParallelPoint(c, fs);
  const solved = capacitiveSteadyState(a, zeta, theta, start);
  if (solved === null) return null;
  const solution = solved.state;
  const rac = (8 * n * n * rl) / (Math.PI * Math.PI);
  const q = resonantImpedance / rac;
  const ib = vb / zp;
  const m = solution.gain;
  const vout = (m * vb) / n;
  const iout = vout / rl;
  const turnOffCurrent = -solution.j0 * ib;
  const rectRms = solved.rectifierRms * ib * n;

  capacitiveFirstHarmonic(a, zeta, theta, fha);
  const fhaGain = fha[3] ?? 0;
  const omega = 2 * Math.PI * fs;
  const xe = (fha[8] ?? 0) * zp;
  const firstHarmonic: CapacitiveFilterFirstHarmonic = {
    gain: fhaGain,
    outputVoltage: (fhaGain * vb) / n,
    resonantCurrentRms: ((fha[4] ?? 0) * ib) / Math.SQRT2,
    resonantCurrentPeak: (fha[4] ?? 0) * ib,
    turnOffCurrent: -(fha[0] ?? 0) * ib,
    seriesCapacitorVoltagePeak: (fha[5] ?? 0) * vb,
    nonConductionAngle: fha[6] ?? 0,
    equivalentResistance: (fha[7] ?? 0) * zp,
    equivalentCapacitance: 1 / (omega * Math.max(-xe, Number.MIN_VALUE)),
  };
  const seriesPeak = lcc ? solution.seriesPeak * vb : 0;
  const parallelPeak = solution.parallelPeak * vb;

  const cautions: Caution[] = tankVoltageCautions(c.inputVoltage, solution.parallelRms * vb, lcc ? seriesPeak : null);
  const out = voltageCaution({ voltage: vout, waveform: "dc", location: "converter output" });
  if (out !== null) cautions.push(out);
  if (!(turnOffCurrent > 0)) {
    cautions.push(hardSwitchingCaution(turnOffCurrent, " (capacitive operation)", "Raise the switching frequency."));
  }
  // the fixture's edge points sit on the limits: compare with a rounding margin
  const validity = testedDomainValidity(lcc ? LCC_TESTED : PRC_TESTED, lcc, 1e-9, fn, q, a);
  const point: CapacitiveFilterOperatingPoint = {
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
    diodeVoltagePeak: vout,
    rectifierCurrentRms: rectRms,
    rectifierCurrentPeak: solved.rectifierPeak * ib * n,
    outputCapacitorCurrentRms: Math.sqrt(Math.max(0, rectRms * rectRms - iout * iout)),
    conductionFraction: solution.clampedFraction,
    zeroVoltageSwitching: turnOffCurrent > 0,
    conductionMode: solution.sequence,
    firstHarmonic,
    cautions,
    validity,
  };
  return { point, solution };
}

function operatingPoint(where: string, options: LccOperatingPointOptions | ParallelResonantOperatingPointOptions, lcc: boolean): CapacitiveFilterOperatingPoint {
  const { circuit, switchingFrequency: fs } = readParallelConverterOptions(where, options, lcc, "after-load");
  const solved = capacitiveOperatingPointOf(circuit, fs);
  if (solved === null) {
    const { fn } = normalisedParallelPoint(circuit, fs);
    throw noSteadyStateError(where, fs, `f_n = ${fn.toPrecision(4)} with a capacitive output filter`, testedDomain(lcc));
  }
  return solved.point;
}

/**
 * The exact periodic steady state of the ideal parallel-resonant converter with a capacitive
 * output filter: ideal switches (the bridge applies ±V_b), series L_r, parallel C_p across an
 * ideal transformer of turns ratio n, an ideal diode bridge feeding a stiff output capacitor
 * directly (no filter inductor). While the rectifier conducts it holds the capacitor voltage
 * $v_p$ at $\pm nV_\mathrm{out}$ and takes the whole resonant current (C_p carries none); while
 * $|v_p| < nV_\mathrm{out}$ it is off and L_r resonates with C_p. Three circuit modes: P
 * ($v_p = +nV_\mathrm{out}$, $i_r \ge 0$), N ($v_p = -nV_\mathrm{out}$, $i_r \le 0$) and O
 * (rectifier off). The load balance is the rectified mean current,
 * $\frac{1}{T}\int_\mathrm{P,N}|i_r|\,dt = V_\mathrm{out}/(nR_\mathrm{load})$. The steady state is
 * the half-wave antisymmetric boundary-value problem
 * $$ x(T/2) = -x(0),\qquad \frac{2}{T}\int_{0}^{T/2}|i_r|\,[\mathrm{P,N}]\,dt = \frac{V_\mathrm{out}}{nR_\mathrm{load}} $$
 * for $x = (i_r, v_p)$, solved by Newton's method through an exact event-driven propagation
 * (closed-form solution of each mode, mode changes at exact crossings), not by integrating
 * cycles.
 *
 * First harmonic beside it (the RC load model): a sinusoidal current $I_m\sin\omega t$ into
 * C_p and the clamping rectifier leaves C_p swinging for the non-conduction angle $\varphi$
 * with $\tan^2(\varphi/2) = 2\omega C_p n^2R_\mathrm{load}/\pi$; at the fundamental the pair is
 * a series $R_e = \frac{2}{\pi^2}(1+\cos\varphi)^2n^2R_\mathrm{load}$ and
 * $X_e = -(2\varphi - \sin 2\varphi)/(2\pi\omega C_p)$, and
 * $nV_\mathrm{out} = (1+\cos\varphi)\,n^2R_\mathrm{load}\,I_m/\pi$ — the tank is solved as a
 * phasor divider into $R_e + jX_e$.
 *
 * Definitions: $f_r = 1/(2\pi\sqrt{L_rC_p})$, $f_n = f_s/f_r$,
 * $R_\mathrm{ac} = 8n^2R_\mathrm{load}/\pi^2$, $Q = \sqrt{L_r/C_p}/R_\mathrm{ac}$,
 * $M = nV_\mathrm{out}/V_b$.
 *
 * @param options - {@link ParallelResonantOperatingPointOptions} (V, H, F, Hz, Ω)
 * @returns the {@link CapacitiveFilterOperatingPoint} (V, A, W)
 * @throws {@link InputError} for a non-positive or non-finite value, an unknown option key or
 *   option value, or a point where no consistent periodic solution is found (not met in the
 *   tested domain)
 * @remarks Accuracy: gain, output voltage, currents and capacitor voltages within 1e-6 relative
 * of a time-domain simulation of the same circuit taken to periodic steady state (scipy,
 * fixture test/fixtures/converters/prc-lcc-capacitive-steady-state.json: 0.7 ≤ f_n ≤ 1.8,
 * 0.2 ≤ Q ≤ 3, modes NOP, OPO, ONO); the boundary conditions are met to ≤ 1e-10;
 * input power equals output power to 1e-9 (lossless circuit). FHA error (RC load model): the
 * FHA gain is within 2.4 % of the exact one for 0.8 ≤ f_n ≤ 1.2 and 3.8 % for
 * 0.7 ≤ f_n ≤ 1.6 (0.5 ≤ Q ≤ 3, tested). Validity: ideal components — no losses, no diode
 * drop, no output ripple (the output capacitor is stiff). Outside the tested domain a
 * `validity` note is added.
 * @see R. L. Steigerwald, "A comparison of half-bridge resonant converter topologies", IEEE
 *   Trans. Power Electron. 3(2), 174–182 (1988) (first-harmonic analysis of the parallel and
 *   series–parallel converters); G. Ivensky, A. Kats and S. Ben-Yaakov, "An RC load model of
 *   parallel and series-parallel resonant DC-DC converters with capacitive output filter",
 *   IEEE Trans. Power Electron. 14(3), 515–521 (1999) (the RC load model; from memory, derived
 *   again here).
 * @example
 * ```ts
 * import { parallelResonantOperatingPointCapacitiveFilter } from "fluxwright";
 * const op = parallelResonantOperatingPointCapacitiveFilter({
 *   bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6,
 *   parallelCapacitance: 25e-9, switchingFrequency: 110e3, loadResistance: 12,
 * });
 * console.log(op.conductionMode); // NOP
 * console.log(op.outputVoltage.toFixed(3)); // 78.274
 * console.log(op.firstHarmonic.outputVoltage.toFixed(3)); // 78.936
 * ```
 * @category Converters
 */
export function parallelResonantOperatingPointCapacitiveFilter(options: ParallelResonantOperatingPointOptions): CapacitiveFilterOperatingPoint {
  return operatingPoint("parallelResonantOperatingPointCapacitiveFilter", options, false);
}

/**
 * The exact periodic steady state of the ideal LCC (series–parallel) resonant converter with a
 * capacitive output filter: {@link parallelResonantOperatingPointCapacitiveFilter} with a
 * series capacitor C_s in the tank. The modes (P, N clamped at $\pm nV_\mathrm{out}$; O with
 * L_r, C_s and C_p resonating), the boundary-value problem and its solution are the same, with
 * the series capacitor voltage as a third state. The first-harmonic values use the same RC
 * load model, with C_s in the divider.
 *
 * Definitions: $f_r = 1/(2\pi\sqrt{L_rC_s})$, $f_n = f_s/f_r$, $A = C_p/C_s$,
 * $R_\mathrm{ac} = 8n^2R_\mathrm{load}/\pi^2$, $Q = \sqrt{L_r/C_s}/R_\mathrm{ac}$,
 * $M = nV_\mathrm{out}/V_b$.
 *
 * @param options - {@link LccOperatingPointOptions} (V, H, F, Hz, Ω)
 * @returns the {@link CapacitiveFilterOperatingPoint} (V, A, W)
 * @throws {@link InputError} as {@link parallelResonantOperatingPointCapacitiveFilter}
 * @remarks Accuracy: within 1e-6 relative of the time-domain simulation (fixture
 * prc-lcc-capacitive-steady-state.json: 0.25 ≤ A ≤ 2, 0.55 ≤ f_n ≤ 2.4, 0.4 ≤ Q ≤ 2.5, modes
 * NOP, OPO, ONO, OPONO, PON, and a fixed-component sweep of 105–240 kHz); power conserved to
 * 1e-9. FHA error (RC load model):
 * within 3.5 % of the exact gain for 1 ≤ f_n ≤ 1.6, 6.8 % for 0.8 ≤ f_n ≤ 1.2 and 12.1 % for
 * 0.7 ≤ f_n ≤ 1.6 (0.25 ≤ A ≤ 2, 0.5 ≤ Q ≤ 3, tested) — worst below resonance at small A.
 * Validity: ideal components, as {@link parallelResonantOperatingPointCapacitiveFilter}.
 * @see G. Ivensky, A. Kats and S. Ben-Yaakov, IEEE Trans. Power Electron. 14(3), 515–521 (1999)
 *   (RC load model of the series–parallel converter with a capacitive output filter; from
 *   memory, derived again here); R. L. Steigerwald, IEEE Trans. Power Electron. 3(2), 174–182
 *   (1988).
 * @example
 * ```ts
 * import { lccOperatingPointCapacitiveFilter } from "fluxwright";
 * const op = lccOperatingPointCapacitiveFilter({
 *   bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, seriesCapacitance: 25e-9,
 *   parallelCapacitance: 25e-9, switchingFrequency: 150e3, loadResistance: 12,
 * });
 * console.log(op.conductionMode); // NOP
 * console.log(op.outputVoltage.toFixed(3)); // 95.931
 * console.log(op.firstHarmonic.outputVoltage.toFixed(3)); // 96.512
 * ```
 * @category Converters
 */
export function lccOperatingPointCapacitiveFilter(options: LccOperatingPointOptions): CapacitiveFilterOperatingPoint {
  return operatingPoint("lccOperatingPointCapacitiveFilter", options, true);
}
