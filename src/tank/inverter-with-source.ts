/**
 * The two inverters fed from a real source (open-circuit voltage behind an internal
 * resistance), with their switches' conduction loss and currents, and a capacitor's
 * equivalent series resistance from its dissipation factor.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { currentFedParallelInverter } from "./current-fed-inverter.js";
import type { CurrentFedParallelInverter } from "./current-fed-inverter.js";
import { frequencyForPower, seriesInverter } from "./series-inverter.js";
import type { SeriesInverter } from "./series-inverter.js";

/**
 * Options of {@link capacitorSeriesResistance}.
 *
 * @category Tanks
 */
export interface CapacitorSeriesResistanceOptions {
  /** Capacitance [F], > 0. */
  readonly capacitance: number;
  /** Dissipation factor tan δ [-], ≥ 0. */
  readonly dissipationFactor: number;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
}

/**
 * Equivalent series resistance of a capacitor from its dissipation factor:
 *
 * $$ R_\mathrm{ESR} = \frac{\tan\delta}{\omega C} $$
 *
 * so that $I^2R_\mathrm{ESR}$ is its dielectric loss at RMS current $I$ (the definition of
 * tan δ as the ratio of loss to reactive power, $P = Q\tan\delta$).
 *
 * Hard domain (throws {@link InputError}): capacitance > 0, dissipationFactor ≥ 0,
 * frequency > 0; unknown keys. Validity: tan δ at this frequency (it varies with frequency and
 * temperature; datasheets give it at 1 or 10 kHz). Accuracy: exact (definition).
 *
 * @param options - see {@link CapacitorSeriesResistanceOptions}
 * @returns the equivalent series resistance [Ω]
 * @throws {@link InputError} for values outside the hard domain
 * @see IEC 60384-1:2021, Fixed capacitors for use in electronic equipment, §4.8 (tangent of loss
 *   angle) — from memory.
 * @example
 * ```ts
 * import { capacitorSeriesResistance } from "fluxwright";
 * console.log(capacitorSeriesResistance({ capacitance: 1e-6, dissipationFactor: 0.001, frequency: 50e3 })); // ≈ 0.0031831
 * ```
 * @category Tanks
 */
export function capacitorSeriesResistance(options: CapacitorSeriesResistanceOptions): number {
  const where = "capacitorSeriesResistance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, ["capacitance", "dissipationFactor", "frequency"]);
  const c = requirePositive(where, "capacitance", options.capacitance, "F");
  const d = requireNonNegative(where, "dissipationFactor", options.dissipationFactor, "");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  return d / (2 * Math.PI * f * c);
}

/**
 * What the source and the switches see, common to both inverters fed from a source.
 *
 * @category Inverters
 */
export interface InverterSourceSide {
  /** Open-circuit voltage of the source [V]. */
  readonly sourceVoltage: number;
  /** Internal resistance of the source [Ω]. */
  readonly sourceResistance: number;
  /** Voltage at the inverter input (the source's terminal voltage, less any series switch drop) [V], > 0. */
  readonly inputVoltage: number;
  /** Source terminal voltage $V_s - R_sI$ [V], > 0. */
  readonly terminalVoltage: number;
  /** DC current drawn from the source [A]. */
  readonly sourceCurrent: number;
  /** Power drawn from the source, $V_sI$ [W]. */
  readonly sourcePower: number;
  /** Loss in the source's internal resistance, $R_sI^2$ [W]. */
  readonly sourceLoss: number;
  /** Conduction loss of all switches together [W]. */
  readonly switchConductionLoss: number;
  /** Peak current through one switch [A]. */
  readonly switchCurrentPeak: number;
  /** RMS current through one switch [A]. */
  readonly switchCurrentRms: number;
}

/**
 * Options of {@link seriesInverterWithSource}: the tank as in {@link seriesInverter}, the
 * source, and exactly one of `switchingFrequency` (fixed frequency) or `power` (the frequency
 * that delivers this power, as {@link frequencyForPower}).
 *
 * @category Inverters
 */
export interface SeriesInverterWithSourceOptions {
  /** Open-circuit source voltage [V], > 0. */
  readonly sourceVoltage: number;
  /** Source internal resistance [Ω], ≥ 0. */
  readonly sourceResistance: number;
  /** Half or full bridge, as {@link seriesInverter}. */
  readonly bridge: "half" | "full";
  /** Tank inductance [H], > 0. */
  readonly inductance: number;
  /** Series capacitance [F], > 0. */
  readonly capacitance: number;
  /** Tank series resistance without the switches [Ω], > 0. */
  readonly resistance: number;
  /** On-resistance of one switch [Ω], ≥ 0 (default 0): one (half bridge) or two (full bridge) are in the current path. */
  readonly switchOnResistance?: number;
  /** Fixed switching frequency [Hz], > 0. */
  readonly switchingFrequency?: number;
  /** Power into the tank (including the switches' conduction loss) [W], > 0. */
  readonly power?: number;
}

/**
 * Result of {@link seriesInverterWithSource}: the {@link SeriesInverter} operating point at the
 * inverter input voltage, and the source side.
 *
 * @category Inverters
 */
export interface SeriesInverterWithSource extends SeriesInverter, InverterSourceSide {
  /** Tank resistance including the switches in the current path [Ω]. */
  readonly tankResistance: number;
}

const SERIES_KEYS = [
  "sourceVoltage",
  "sourceResistance",
  "bridge",
  "inductance",
  "capacitance",
  "resistance",
  "switchOnResistance",
  "switchingFrequency",
  "power",
] as const;

/**
 * A voltage-fed series-resonant inverter ({@link seriesInverter}, first-harmonic
 * approximation) fed from a source of open-circuit voltage $V_s$ behind an internal
 * resistance $R_s$, solved in closed form. The bridge draws $I = P/V_\mathrm{in}$ and
 * $V_\mathrm{in} = V_s - R_sI$.
 *
 * At a fixed frequency the tank current is proportional to $V_\mathrm{in}$, so
 * $I = gV_\mathrm{in}$ with $g = P(1\,\mathrm{V})$ and
 *
 * $$ V_\mathrm{in} = \frac{V_s}{1 + R_s g}. $$
 *
 * For a target power $P$ (the frequency then comes from {@link frequencyForPower} at
 * $V_\mathrm{in}$), $V_\mathrm{in}(V_s - V_\mathrm{in}) = R_sP$ and the higher root is taken:
 *
 * $$ V_\mathrm{in} = \tfrac12\left(V_s + \sqrt{V_s^2 - 4R_sP}\right), $$
 *
 * which needs $P \le V_s^2/(4R_s)$, the most any load can draw from such a source.
 * The switches: the tank current flows through one (half bridge) or two (full bridge) of them
 * at a time; each switch carries it for half a period: peak $\hat I$, RMS $I_\mathrm{rms}/\sqrt2$.
 *
 * Hard domain (throws {@link InputError}): as {@link seriesInverter}; sourceResistance ≥ 0,
 * switchOnResistance ≥ 0; exactly one of switchingFrequency and power; unknown keys. The
 * impossible design throws with the limit it hits: a power above $V_s^2/(4R_s)$ (the source
 * cannot deliver it) or above the tank's power at resonance at $V_\mathrm{in}$.
 * Validity and accuracy: those of {@link seriesInverter} (first harmonic); the source side is
 * exact: $V_sI = R_sI^2 + P$ to rounding (tested to 1e-12), and the terminal voltage is > 0.
 *
 * @param options - see {@link SeriesInverterWithSourceOptions}
 * @returns the operating point and the source side (V, A, W, Hz)
 * @throws {@link InputError} for values outside the hard domain or an impossible target power
 * @see R. W. Erickson and D. Maksimović, Fundamentals of Power Electronics, 2nd ed., Kluwer 2001,
 *   Ch. 19 "Resonant Conversion", Fig. 19.1 (tank tuned to the fundamental, sinusoidal waveforms); the source side is Ohm's law.
 * @example
 * ```ts
 * import { seriesInverterWithSource } from "fluxwright";
 * const op = seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.5, bridge: "full",
 *   inductance: 20e-6, capacitance: 1.5e-6, resistance: 0.3, power: 100 });
 * console.log(op.inputVoltage); // ≈ 21.695
 * console.log(op.sourcePower - op.sourceLoss); // ≈ 100
 * ```
 * @category Inverters
 */
export function seriesInverterWithSource(options: SeriesInverterWithSourceOptions): SeriesInverterWithSource {
  const where = "seriesInverterWithSource";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, SERIES_KEYS);
  const vs = requirePositive(where, "sourceVoltage", options.sourceVoltage, "V");
  const rs = requireNonNegative(where, "sourceResistance", options.sourceResistance, "Ω");
  const bridge = requireOneOf(where, "bridge", options.bridge, ["half", "full"] as const);
  const inductance = requirePositive(where, "inductance", options.inductance, "H");
  const capacitance = requirePositive(where, "capacitance", options.capacitance, "F");
  const resistance = requirePositive(where, "resistance", options.resistance, "Ω");
  const ron = options.switchOnResistance === undefined ? 0 : requireNonNegative(where, "switchOnResistance", options.switchOnResistance, "Ω");
  const hasF = options.switchingFrequency !== undefined;
  const hasP = options.power !== undefined;
  if (hasF === hasP) throw new InputError(where, "options", options, "", "exactly one of switchingFrequency and power");
  const inPath = bridge === "full" ? 2 : 1;
  const tankResistance = resistance + inPath * ron;
  const tank = { bridge, inductance, capacitance, resistance: tankResistance };
  let vin: number;
  let op: SeriesInverter;
  if (hasF) {
    const fs = requirePositive(where, "switchingFrequency", options.switchingFrequency, "Hz");
    const unit = seriesInverter({ ...tank, supplyVoltage: 1, switchingFrequency: fs });
    vin = vs / (1 + rs * unit.supplyCurrent);
    op = seriesInverter({ ...tank, supplyVoltage: vin, switchingFrequency: fs });
  } else {
    const p = requirePositive(where, "power", options.power, "W");
    if (rs > 0) {
      const maxSource = (vs * vs) / (4 * rs);
      if (p > maxSource) {
        throw new InputError(where, "power", p, "W", `a finite number ≤ ${maxSource} (the most a ${Number(vs.toPrecision(4))} V source behind ${Number(rs.toPrecision(4))} Ω delivers to any load, V²/4R)`);
      }
      vin = 0.5 * (vs + Math.sqrt(Math.max(0, vs * vs - 4 * rs * p)));
    } else {
      vin = vs;
    }
    const v1 = ((bridge === "half" ? 2 : 4) * vin) / Math.PI;
    const maxTank = (v1 * v1) / (2 * tankResistance);
    if (p > maxTank) {
      throw new InputError(where, "power", p, "W", `a finite number ≤ ${maxTank} (the tank's power at resonance with ${Number(vin.toPrecision(4))} V at the inverter input)`);
    }
    const fs = frequencyForPower({ ...tank, supplyVoltage: vin, power: p });
    op = seriesInverter({ ...tank, supplyVoltage: vin, switchingFrequency: fs });
  }
  const current = op.supplyCurrent;
  return {
    ...op,
    tankResistance,
    sourceVoltage: vs,
    sourceResistance: rs,
    inputVoltage: vin,
    terminalVoltage: vin,
    sourceCurrent: current,
    sourcePower: vs * current,
    sourceLoss: rs * current * current,
    switchConductionLoss: op.currentRms * op.currentRms * inPath * ron,
    switchCurrentPeak: op.currentPeak,
    switchCurrentRms: op.currentRms / Math.SQRT2,
  };
}

/**
 * Options of {@link currentFedParallelInverterWithSource}: the tank as in
 * {@link currentFedParallelInverter} and the source.
 *
 * @category Inverters
 */
export interface CurrentFedParallelInverterWithSourceOptions {
  /** Open-circuit source voltage [V], > 0. */
  readonly sourceVoltage: number;
  /** Source internal resistance [Ω], ≥ 0. */
  readonly sourceResistance: number;
  /** On-resistance of one switch [Ω], ≥ 0 (default 0); one conducts at a time, in series with the supply current. */
  readonly switchOnResistance?: number;
  /** Whole-coil inductance [H], > 0. */
  readonly inductance: number;
  /** Tank capacitance [F], > 0. */
  readonly capacitance: number;
  /** Coil branch series resistance [Ω], > 0 and < √(L/C). */
  readonly coilResistance: number;
  /** Choke inductance [H], > 0 (optional: infinite when omitted). */
  readonly chokeInductance?: number;
}

/**
 * Result of {@link currentFedParallelInverterWithSource}: the
 * {@link CurrentFedParallelInverter} operating point at the inverter input voltage, and the
 * source side.
 *
 * @category Inverters
 */
export interface CurrentFedParallelInverterWithSource extends CurrentFedParallelInverter, InverterSourceSide {}

/**
 * The current-fed push-pull parallel inverter ({@link currentFedParallelInverter}) fed from a
 * source of open-circuit voltage $V_s$ behind $R_s$, with the conducting switch's
 * on-resistance $R_\mathrm{on}$ in series with the supply current. The ideal inverter draws
 * $I = V_\mathrm{in}\pi^2/(2R_d)$, a resistance $R_\mathrm{in} = 2R_d/\pi^2$ at its input, so
 *
 * $$ I = \frac{V_s}{R_\mathrm{in} + R_s + R_\mathrm{on}},\qquad V_\mathrm{in} = IR_\mathrm{in} > 0. $$
 *
 * Each switch carries the supply current for half a period: RMS $I/\sqrt2$, peak $I$ plus half
 * the choke ripple.
 *
 * Hard domain (throws {@link InputError}): as {@link currentFedParallelInverter} (including
 * coilResistance < √(L/C): otherwise the tank cannot oscillate and the switches would latch on);
 * sourceResistance ≥ 0, switchOnResistance ≥ 0; unknown keys.
 * Validity and accuracy: those of {@link currentFedParallelInverter}; the source side is exact:
 * $V_sI = R_sI^2 + R_\mathrm{on}I^2 + P$ to rounding (tested to 1e-12).
 *
 * @param options - see {@link CurrentFedParallelInverterWithSourceOptions}
 * @returns the operating point and the source side (V, A, W, Hz)
 * @throws {@link InputError} for values outside the hard domain
 * @see M. K. Kazimierczuk and D. Czarkowski, Resonant Power Converters, 2nd ed., Wiley 2011
 *   (current-driven Class D inverter) — from memory; the source side is Ohm's law.
 * @example
 * ```ts
 * import { currentFedParallelInverterWithSource } from "fluxwright";
 * const op = currentFedParallelInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.05,
 *   switchOnResistance: 0.01, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
 * console.log(op.inputVoltage); // ≈ 23.859
 * ```
 * @category Inverters
 */
export function currentFedParallelInverterWithSource(options: CurrentFedParallelInverterWithSourceOptions): CurrentFedParallelInverterWithSource {
  const where = "currentFedParallelInverterWithSource";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, [
    "sourceVoltage",
    "sourceResistance",
    "switchOnResistance",
    "inductance",
    "capacitance",
    "coilResistance",
    "chokeInductance",
  ]);
  const vs = requirePositive(where, "sourceVoltage", options.sourceVoltage, "V");
  const rs = requireNonNegative(where, "sourceResistance", options.sourceResistance, "Ω");
  const ron = options.switchOnResistance === undefined ? 0 : requireNonNegative(where, "switchOnResistance", options.switchOnResistance, "Ω");
  const tank = { inductance: options.inductance, capacitance: options.capacitance, coilResistance: options.coilResistance };
  const unit = currentFedParallelInverter({ ...tank, supplyVoltage: 1 });
  const inputResistance = 1 / unit.supplyCurrent;
  const current = vs / (inputResistance + rs + ron);
  const vin = current * inputResistance;
  const op = currentFedParallelInverter(
    options.chokeInductance === undefined ? { ...tank, supplyVoltage: vin } : { ...tank, supplyVoltage: vin, chokeInductance: options.chokeInductance },
  );
  return {
    ...op,
    sourceVoltage: vs,
    sourceResistance: rs,
    inputVoltage: vin,
    terminalVoltage: vs - rs * current,
    sourceCurrent: op.supplyCurrent,
    sourcePower: vs * op.supplyCurrent,
    sourceLoss: rs * op.supplyCurrent * op.supplyCurrent,
    switchConductionLoss: op.supplyCurrent * op.supplyCurrent * ron,
    switchCurrentPeak: op.supplyCurrent + (op.chokeRipplePeakToPeak ?? 0) / 2,
    switchCurrentRms: op.supplyCurrent / Math.SQRT2,
  };
}
