/**
 * The current-fed (choke-fed) push-pull parallel-resonant inverter, the self-oscillating
 * circuit of small induction heaters: operating point by first-harmonic analysis of the
 * ideal centre-tapped case.
 *
 * @packageDocumentation
 */
import { FIG_COIL_CURRENT_RMS, FIG_DYNAMIC_RESISTANCE, FIG_FREQUENCY, FIG_OMEGA, FIG_SUPPLY_CURRENT, FIG_TANK_VOLTAGE_PEAK, FIG_TANK_VOLTAGE_RMS, currentFedFigures } from "./current-fed-figures.js";
import { InputError, requireKnownKeys, requireObject, requirePositive, voltageCaution, type Caution, type ValidityNote } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const CURRENT_FED_FIELDS: readonly string[] = Object.freeze(["supplyVoltage", "inductance", "capacitance", "coilResistance", "chokeInductance"]);

/**
 * Options of {@link currentFedParallelInverter}.
 *
 * @category Inverters
 */
export interface CurrentFedParallelInverterOptions {
  /** DC supply voltage $V_\mathrm{dc}$ [V], > 0. */
  readonly supplyVoltage: number;
  /** Inductance of the whole (centre-tapped) work coil, end to end [H], > 0. */
  readonly inductance: number;
  /** Tank capacitance across the whole coil [F], > 0. */
  readonly capacitance: number;
  /** Series resistance of the whole coil, copper plus reflected workpiece [Ω], > 0 and < √(L/C). */
  readonly coilResistance: number;
  /**
   * Inductance of the supply choke [H], > 0. Optional: when omitted the choke is taken as
   * infinite (ripple-free supply current) and no ripple is reported.
   */
  readonly chokeInductance?: number;
}

/**
 * Operating point of the ideal current-fed push-pull parallel-resonant inverter
 * ({@link currentFedParallelInverter}).
 *
 * @category Inverters
 */
export interface CurrentFedParallelInverter {
  /** Operating frequency: the tank's zero-phase frequency $f_\varphi$ [Hz]. */
  readonly frequency: number;
  /** Peak tank voltage across the whole coil, $\hat V = \pi V_\mathrm{dc}$ [V]. */
  readonly tankVoltagePeak: number;
  /** RMS tank voltage, $\pi V_\mathrm{dc}/\sqrt2$ [V]. */
  readonly tankVoltageRms: number;
  /** Peak voltage across the off switch, equal to the tank peak $\pi V_\mathrm{dc}$ [V]. */
  readonly switchVoltagePeak: number;
  /** Peak voltage of the coil centre tap above the switch common rail, $\pi V_\mathrm{dc}/2$ [V]. */
  readonly centreTapVoltagePeak: number;
  /** Average (DC) supply current $I_\mathrm{dc} = \pi^2 V_\mathrm{dc}/(2R_d)$ [A]. */
  readonly supplyCurrent: number;
  /** Power delivered into the tank, $\hat V^2/(2R_d) = V_\mathrm{dc} I_\mathrm{dc}$ [W]. */
  readonly power: number;
  /** First-harmonic RMS capacitor current $\omega C\hat V/\sqrt2$ [A]. */
  readonly capacitorCurrentRms: number;
  /**
   * RMS capacitor current including the odd harmonics of the square-wave drive current (they flow
   * almost entirely in the capacitor): $\sqrt{I_{C1}^2 + \tfrac{2}{\pi^2}I_\mathrm{dc}^2(\pi^2/48 + 1/16)}$ [A].
   */
  readonly capacitorCurrentRmsWithHarmonics: number;
  /** Tank circulating current: the first-harmonic RMS current that circulates between coil and capacitor (= `capacitorCurrentRms`) [A]. */
  readonly circulatingCurrentRms: number;
  /** RMS coil current $\hat V/(\sqrt2\,|R + j\omega L|)$ [A]. */
  readonly coilCurrentRms: number;
  /** Ratio of circulating (capacitor) RMS current to DC supply current, $\sqrt2\,Q/\pi$. */
  readonly circulatingToSupplyRatio: number;
  /** Coil quality factor at the operating frequency, $Q = \omega_\varphi L/R$. */
  readonly qualityFactor: number;
  /** Dynamic resistance of the tank at the operating frequency, $R_d = L/(RC)$ [Ω]. */
  readonly dynamicResistance: number;
  /** Peak-to-peak ripple of the choke current $0.6614\,V_\mathrm{dc}/(\omega L_\mathrm{ch})$ [A], or `null` for an infinite choke. */
  readonly chokeRipplePeakToPeak: number | null;
  /** Hazards (tank voltage above extra-low voltage), as {@link Caution} records. */
  readonly cautions: readonly Caution[];
  /** Where the ideal model is stretched (low Q, large choke ripple). */
  readonly validity: readonly ValidityNote[];
}

/** ∫ over the half cycle where the choke discharges: π·cos θ1 − π + 2θ1, θ1 = asin(2/π). */
const RIPPLE_FACTOR = (() => {
  const t1 = Math.asin(2 / Math.PI);
  return Math.PI * Math.cos(t1) - Math.PI + 2 * t1;
})();

const figures = new Float64Array(7);

/** Σ over odd n ≥ 3 of n²/(n² − 1)²: the capacitor share of the drive harmonics. */
const HARMONIC_SUM = (Math.PI * Math.PI) / 48 + 1 / 16;

/**
 * Operating point of the ideal current-fed push-pull parallel-resonant inverter: a DC supply
 * feeds the centre tap of the work coil through a choke, two switches ground the coil ends
 * alternately, commutating at the zero crossings of the tank voltage (the self-oscillating
 * "cross-coupled" heater). The capacitor is across the whole coil.
 *
 * Derivation (ideal switches, tightly coupled centre-tapped coil, large choke). While one end is
 * grounded, the centre tap sits at half the tank voltage, so $v_\mathrm{ct}(t) = |v(t)|/2$. The
 * choke's average voltage is zero in steady state, hence with $v = \hat V\sin\omega t$:
 *
 * $$
 * V_\mathrm{dc} = \overline{v_\mathrm{ct}} = \frac{\hat V}{2}\cdot\frac{2}{\pi}
 * \quad\Longrightarrow\quad \hat V = \pi V_\mathrm{dc}.
 * $$
 *
 * The off switch sees the whole tank voltage, peak $\pi V_\mathrm{dc}$. Referred to the whole
 * coil the drive is a square-wave current of amplitude $I_\mathrm{dc}/2$ whose fundamental,
 * $2I_\mathrm{dc}/\pi$, is in phase with $v$ (zero-crossing commutation ⇒ the tank runs at its
 * zero-phase frequency, where its impedance is $R_d = L/(RC)$):
 *
 * $$
 * \hat V = R_d\,\frac{2I_\mathrm{dc}}{\pi} \Rightarrow I_\mathrm{dc} = \frac{\pi^2 V_\mathrm{dc}}{2R_d},\qquad
 * \frac{I_{C,\mathrm{rms}}}{I_\mathrm{dc}} = \frac{\omega C\hat V/\sqrt2}{\pi\hat V/(2R_d)} = \frac{\sqrt2\,\omega L}{\pi R} = \frac{\sqrt2\,Q}{\pi}.
 * $$
 *
 * @param options - see {@link CurrentFedParallelInverterOptions}
 * @returns the {@link CurrentFedParallelInverter} operating point (Hz, V, A, W)
 * @throws {@link InputError} when a value is not a finite number > 0, or when
 * coilResistance ≥ √(L/C): the tank then has no zero-phase frequency and cannot self-oscillate.
 * Validity: ideal switches and coupling; coil Q ≥ 3 (a validity note is added below 3) and a
 * choke large enough that its ripple is small (a note above 20 % of the supply current).
 * Accuracy vs a time-domain simulation of the ideal circuit: the deviations grow as about
 * $0.12/Q^2$ (tank peak), $0.14/Q^2$ (frequency) and $0.32/Q^2$ (supply current, power), so all
 * are within 1 % for Q ≥ 6 (tested at Q = 7, 20, 71); `capacitorCurrentRmsWithHarmonics` is
 * within 0.3 % there, while the first-harmonic `capacitorCurrentRms` is low by the factor
 * $1/\sqrt{1 + 0.268/Q^2}$.
 * @see M. K. Kazimierczuk and D. Czarkowski, Resonant Power Converters, 2nd ed., Wiley 2011,
 * chapter on the Class D current-source (current-driven) resonant inverter — from memory, no
 * page; N. Mohan, T. Undeland, W. Robbins, Power Electronics, 3rd ed., Wiley 2003, §9 (resonant
 * converters, current-source parallel-resonant inverter) — from memory.
 * @example
 * ```ts
 * import { currentFedParallelInverter } from "fluxwright";
 * const op = currentFedParallelInverter({ supplyVoltage: 24, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
 * console.log(op.tankVoltagePeak); // ≈ 75.398
 * console.log(op.supplyCurrent); // ≈ 2.3687
 * console.log(op.cautions[0]?.code); // voltage-above-extra-low
 * ```
 * @category Inverters
 */
export function currentFedParallelInverter(options: CurrentFedParallelInverterOptions): CurrentFedParallelInverter {
  const where = "currentFedParallelInverter";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, CURRENT_FED_FIELDS);
  const supplyVoltage = requirePositive(where, "supplyVoltage", options.supplyVoltage, "V");
  const L = requirePositive(where, "inductance", options.inductance, "H");
  const C = requirePositive(where, "capacitance", options.capacitance, "F");
  const R = requirePositive(where, "coilResistance", options.coilResistance, "Ω");
  const choke =
    options.chokeInductance === undefined ? null : requirePositive(where, "chokeInductance", options.chokeInductance, "H");
  const fig = figures;
  if (!currentFedFigures(supplyVoltage, L, C, R, fig)) {
    throw new InputError(where, "coilResistance", R, "Ω", `a finite number < √(L/C) = ${Math.sqrt(L / C)} (otherwise the tank has no zero-phase frequency)`);
  }
  const omega = fig[FIG_OMEGA]!;
  const frequency = fig[FIG_FREQUENCY]!;
  const dynamicResistance = fig[FIG_DYNAMIC_RESISTANCE]!;
  const tankVoltagePeak = fig[FIG_TANK_VOLTAGE_PEAK]!;
  const supplyCurrent = fig[FIG_SUPPLY_CURRENT]!;
  const power = supplyVoltage * supplyCurrent;
  const capacitorCurrentRms = (omega * C * tankVoltagePeak) / Math.SQRT2;
  const harmonicMeanSquare = ((2 * supplyCurrent * supplyCurrent) / (Math.PI * Math.PI)) * HARMONIC_SUM;
  const qualityFactor = (omega * L) / R;
  const tankVoltageRms = fig[FIG_TANK_VOLTAGE_RMS]!;
  const chokeRipple = choke === null ? null : (RIPPLE_FACTOR * supplyVoltage) / (omega * choke);

  const cautions: Caution[] = [];
  const voltage = voltageCaution({ voltage: tankVoltageRms, waveform: "ac", location: "resonant tank" });
  if (voltage !== null) cautions.push(voltage);

  const validity: ValidityNote[] = [];
  if (qualityFactor < 3) {
    validity.push({
      code: "low-tank-q",
      message: "Coil Q below 3: the tank voltage departs from a sine wave and the first-harmonic operating point loses accuracy.",
      value: qualityFactor,
      limit: 3,
    });
  }
  if (chokeRipple !== null && chokeRipple > 0.2 * supplyCurrent) {
    validity.push({
      code: "large-choke-ripple",
      message: "Choke ripple above 20 % of the supply current: the drive is no longer a square-wave current source.",
      value: chokeRipple / supplyCurrent,
      limit: 0.2,
    });
  }
  return {
    frequency,
    tankVoltagePeak,
    tankVoltageRms,
    switchVoltagePeak: tankVoltagePeak,
    centreTapVoltagePeak: tankVoltagePeak / 2,
    supplyCurrent,
    power,
    capacitorCurrentRms,
    capacitorCurrentRmsWithHarmonics: Math.sqrt(capacitorCurrentRms * capacitorCurrentRms + harmonicMeanSquare),
    circulatingCurrentRms: capacitorCurrentRms,
    coilCurrentRms: fig[FIG_COIL_CURRENT_RMS]!,
    circulatingToSupplyRatio: capacitorCurrentRms / supplyCurrent,
    qualityFactor,
    dynamicResistance,
    chokeRipplePeakToPeak: chokeRipple,
    cautions,
    validity,
  };
}

