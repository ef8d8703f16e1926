/**
 * The voltage-fed series-resonant inverter (half or full bridge) by first-harmonic
 * approximation, and the inverse problem: the switching frequency for a target power.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES, InputError, requireKnownKeys, requireObject, requireOneOf, requirePositive, voltageCaution, type Caution } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const FREQUENCY_FOR_POWER_FIELDS: readonly string[] = Object.freeze(["supplyVoltage", "bridge", "inductance", "capacitance", "resistance", "power"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SERIES_INVERTER_FIELDS: readonly string[] = Object.freeze(["supplyVoltage", "bridge", "inductance", "capacitance", "resistance", "switchingFrequency"]);

/**
 * Options of {@link seriesInverter}.
 *
 * @category Inverters
 */
export interface SeriesInverterOptions {
  /** DC link voltage $V_\mathrm{dc}$ [V], > 0. */
  readonly supplyVoltage: number;
  /** `"half"`: the tank sees a square wave of ±V/2 (fundamental $2V_\mathrm{dc}/\pi$); `"full"`: ±V (fundamental $4V_\mathrm{dc}/\pi$). */
  readonly bridge: "half" | "full";
  /** Tank inductance (work coil plus any series inductor) [H], > 0. */
  readonly inductance: number;
  /** Series capacitance [F], > 0 (for a half bridge with split capacitors, their sum). */
  readonly capacitance: number;
  /** Total series resistance: coil, reflected workpiece, capacitor ESR [Ω], > 0. */
  readonly resistance: number;
  /** Switching frequency [Hz], > 0. */
  readonly switchingFrequency: number;
}

/**
 * First-harmonic operating point of a voltage-fed series-resonant inverter ({@link seriesInverter}).
 *
 * @category Inverters
 */
export interface SeriesInverter {
  /** Switching frequency [Hz]. */
  readonly switchingFrequency: number;
  /** Undamped resonant frequency of the series tank [Hz]. */
  readonly resonantFrequency: number;
  /** Switching frequency over resonant frequency. */
  readonly frequencyRatio: number;
  /** Quality factor of the series tank $Z_0/R$. */
  readonly qualityFactor: number;
  /** Peak of the fundamental of the bridge output voltage [V]. */
  readonly fundamentalVoltagePeak: number;
  /** Peak tank current (fundamental) [A]. */
  readonly currentPeak: number;
  /** RMS tank current (fundamental) [A]. */
  readonly currentRms: number;
  /** Phase of the tank impedance at the switching frequency [rad]; > 0 means the current lags (inductive). */
  readonly phase: number;
  /** Output power into the tank resistance [W]. */
  readonly power: number;
  /** Average current drawn from the DC link [A], `power / supplyVoltage`. */
  readonly supplyCurrent: number;
  /** Peak voltage across the series capacitor (AC part) [V]. */
  readonly capacitorVoltagePeak: number;
  /** RMS voltage across the series capacitor (AC part) [V]. */
  readonly capacitorVoltageRms: number;
  /** Whether the switches turn on at zero voltage: the tank is inductive (above resonance, `phase > 0`). */
  readonly zeroVoltageSwitching: boolean;
  /** The ZVS margin as a phase angle: equal to `phase` [rad]; negative when switching is capacitive (hard). */
  readonly zeroVoltageSwitchingMargin: number;
  /**
   * Tank current at the commutation instant, $\hat I\sin\varphi$ [A]: positive means it flows
   * into the switching node and charges its capacitance (ZVS); the larger, the faster.
   */
  readonly switchedCurrent: number;
  /** Hazards: capacitive (hard) switching, tank voltage above extra-low voltage. */
  readonly cautions: readonly Caution[];
}

function fundamentalPeak(bridge: "half" | "full", supplyVoltage: number): number {
  return ((bridge === "half" ? 2 : 4) * supplyVoltage) / Math.PI;
}

/**
 * Operating point of a voltage-fed series-resonant inverter by first-harmonic approximation
 * (FHA): the bridge's square-wave output is replaced by its fundamental, of peak
 * $V_1 = 2V_\mathrm{dc}/\pi$ (half bridge) or $4V_\mathrm{dc}/\pi$ (full bridge):
 *
 * $$
 * Z = R + j\left(\omega L - \frac{1}{\omega C}\right),\quad \hat I = \frac{V_1}{|Z|},\quad
 * \varphi = \arg Z,\quad P = \frac{V_1^2 R}{2|Z|^2},\quad I_\mathrm{sw} = \hat I\sin\varphi
 * $$
 *
 * @param options - see {@link SeriesInverterOptions}
 * @returns the {@link SeriesInverter} operating point (W, A, V, rad)
 * @throws {@link InputError} when a value is not a finite number > 0 or bridge is not "half"/"full".
 * Validity: FHA needs a tank that filters the harmonics: Q ≥ 3 and 0.8 ≤ f/f0 ≤ 1.5.
 * Accuracy (FHA error): power within 1 % and RMS current within 0.5 % of a time-domain
 * simulation of the ideal half bridge for Q ≥ 3 and 0.8 ≤ f/f0 ≤ 1.5 (tested; FHA reads low, the
 * harmonics carry the rest). The switched current is cruder: the drive harmonics add a current
 * that helps ZVS even at resonance, about $(V_1/Z_0)\sum_{n\,\mathrm{odd}\ge3} r/(n^2r^2-1)$ with
 * $r = f/f_0$ (0.25 $V_1/Z_0$ at resonance), so the full waveform differs from $\hat I\sin\varphi$
 * by up to $0.35\,V_1/Z_0$ there (tested); treat it as a conservative indicator.
 * @see R. W. Erickson and D. Maksimović, Fundamentals of Power Electronics, 2nd ed., Kluwer 2001,
 * Ch. 19 "Resonant conversion", §19.1 sinusoidal approximation and §19.4 zero-voltage switching
 * (from memory, no page).
 * @example
 * ```ts
 * import { seriesInverter } from "fluxwright";
 * const op = seriesInverter({ supplyVoltage: 325, bridge: "half", inductance: 100e-6, capacitance: 0.2e-6, resistance: 4, switchingFrequency: 38e3 });
 * console.log(op.zeroVoltageSwitching); // true
 * console.log(op.power); // ≈ 3479
 * ```
 * @category Inverters
 */
export function seriesInverter(options: SeriesInverterOptions): SeriesInverter {
  const where = "seriesInverter";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SERIES_INVERTER_FIELDS);
  const supplyVoltage = requirePositive(where, "supplyVoltage", options.supplyVoltage, "V");
  const bridge = requireOneOf(where, "bridge", options.bridge, ["half", "full"] as const);
  const L = requirePositive(where, "inductance", options.inductance, "H");
  const C = requirePositive(where, "capacitance", options.capacitance, "F");
  const R = requirePositive(where, "resistance", options.resistance, "Ω");
  const fs = requirePositive(where, "switchingFrequency", options.switchingFrequency, "Hz");
  const omega = 2 * Math.PI * fs;
  const x = omega * L - 1 / (omega * C);
  const zMag = Math.hypot(R, x);
  const v1 = fundamentalPeak(bridge, supplyVoltage);
  const currentPeak = v1 / zMag;
  const phase = Math.atan2(x, R);
  const power = 0.5 * currentPeak * currentPeak * R;
  const capacitorVoltagePeak = currentPeak / (omega * C);
  const f0 = 1 / (2 * Math.PI * Math.sqrt(L * C));
  const cautions: Caution[] = [];
  if (!(phase > 0)) {
    cautions.push({
      code: "capacitive-switching",
      severity: "warning",
      message: `The switching frequency is at or below resonance (tank phase ${((phase * 180) / Math.PI).toFixed(1)}°): the switches turn on hard with diode reverse recovery, which can destroy them. Switch above resonance. ${DEFER_TO_CODES}`,
      value: phase,
      limit: 0,
      unit: "rad",
      source: "common practice (series-resonant inverters run above resonance for zero-voltage switching)",
    });
  }
  const capacitorVoltageRms = capacitorVoltagePeak / Math.SQRT2;
  const voltage = voltageCaution({ voltage: capacitorVoltageRms, waveform: "ac", location: "tank capacitor" });
  if (voltage !== null) cautions.push(voltage);

  return {
    switchingFrequency: fs,
    resonantFrequency: f0,
    frequencyRatio: fs / f0,
    qualityFactor: Math.sqrt(L / C) / R,
    fundamentalVoltagePeak: v1,
    currentPeak,
    currentRms: currentPeak / Math.SQRT2,
    phase,
    power,
    supplyCurrent: power / supplyVoltage,
    capacitorVoltagePeak,
    capacitorVoltageRms,
    zeroVoltageSwitching: phase > 0,
    zeroVoltageSwitchingMargin: phase,
    switchedCurrent: currentPeak * Math.sin(phase),
    cautions,
  };
}

/**
 * Options of {@link frequencyForPower}.
 *
 * @category Inverters
 */
export interface FrequencyForPowerOptions {
  /** DC link voltage [V], > 0. */
  readonly supplyVoltage: number;
  /** Bridge type, as in {@link SeriesInverterOptions}. */
  readonly bridge: "half" | "full";
  /** Tank inductance [H], > 0. */
  readonly inductance: number;
  /** Series capacitance [F], > 0. */
  readonly capacitance: number;
  /** Total series resistance [Ω], > 0. */
  readonly resistance: number;
  /** Target output power [W], > 0 and ≤ the power at resonance $V_1^2/(2R)$. */
  readonly power: number;
}

/**
 * The switching frequency, on the inductive (zero-voltage-switching) side of resonance, at which
 * a voltage-fed series-resonant inverter delivers a target power (first-harmonic approximation,
 * as {@link seriesInverter}). The FHA power equation gives the reactance, then a quadratic in ω:
 *
 * $$
 * X = \sqrt{\frac{V_1^2 R}{2P} - R^2},\qquad L\omega^2 - X\omega - \frac1C = 0
 * \Rightarrow \omega = \frac{X + \sqrt{X^2 + 4L/C}}{2L}
 * $$
 *
 * @param options - see {@link FrequencyForPowerOptions}
 * @returns the switching frequency [Hz], ≥ the resonant frequency
 * @throws {@link InputError} when a value is not a finite number > 0, bridge is invalid, or the
 * target power exceeds the maximum $V_1^2/(2R)$ delivered at resonance.
 * Validity and accuracy: as {@link seriesInverter} (closed form; {@link seriesInverter} at the
 * returned frequency gives back the target power to ≤ 1e-9 relative).
 * @see R. W. Erickson and D. Maksimović, Fundamentals of Power Electronics, 2nd ed., Kluwer 2001,
 * Ch. 19 "Resonant Conversion".
 * @example
 * ```ts
 * import { frequencyForPower, seriesInverter } from "fluxwright";
 * const tank = { supplyVoltage: 325, bridge: "half", inductance: 100e-6, capacitance: 0.2e-6, resistance: 4 } as const;
 * const f = frequencyForPower({ ...tank, power: 2000 });
 * console.log(seriesInverter({ ...tank, switchingFrequency: f }).power); // ≈ 2000
 * ```
 * @category Inverters
 */
export function frequencyForPower(options: FrequencyForPowerOptions): number {
  const where = "frequencyForPower";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FREQUENCY_FOR_POWER_FIELDS);
  const supplyVoltage = requirePositive(where, "supplyVoltage", options.supplyVoltage, "V");
  const bridge = requireOneOf(where, "bridge", options.bridge, ["half", "full"] as const);
  const L = requirePositive(where, "inductance", options.inductance, "H");
  const C = requirePositive(where, "capacitance", options.capacitance, "F");
  const R = requirePositive(where, "resistance", options.resistance, "Ω");
  const power = requirePositive(where, "power", options.power, "W");
  const v1 = fundamentalPeak(bridge, supplyVoltage);
  const maxPower = (v1 * v1) / (2 * R);
  if (power > maxPower) {
    throw new InputError(where, "power", power, "W", `a finite number ≤ ${maxPower} (the power at resonance)`);
  }
  const x = R * Math.sqrt(Math.max(0, maxPower / power - 1));
  const omega = (x + Math.sqrt(x * x + (4 * L) / C)) / (2 * L);
  return omega / (2 * Math.PI);
}
