/**
 * Component stresses of a series or parallel tank under a sinusoidal drive.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { ParallelTank } from "./parallel-tank.js";
import type { SeriesTank } from "./series-tank.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const DRIVE_FIELDS: readonly string[] = Object.freeze(["frequency", "voltageRms", "currentRms"]);

/**
 * The sinusoidal drive of {@link tankStresses}: a frequency and exactly one of `voltageRms`
 * (across the tank terminals) or `currentRms` (into the tank terminals).
 *
 * @category Tanks
 */
export interface TankDrive {
  /** Drive frequency [Hz], > 0. */
  readonly frequency: number;
  /** RMS voltage across the tank terminals [V], > 0. Give this or `currentRms`. */
  readonly voltageRms?: number;
  /** RMS current into the tank terminals [A], > 0. Give this or `voltageRms`. */
  readonly currentRms?: number;
}

/**
 * Voltages, currents, powers and stored energy of a driven tank ({@link tankStresses}).
 * Sinusoidal steady state: peak values are √2 × RMS.
 *
 * @category Tanks
 */
export interface TankStresses {
  /** Drive frequency [Hz]. */
  readonly frequency: number;
  /** RMS voltage across the tank terminals [V]. */
  readonly driveVoltageRms: number;
  /** RMS current into the tank terminals (line current) [A]. */
  readonly driveCurrentRms: number;
  /** Phase of the tank impedance [rad], in (−π/2, π/2); > 0 inductive (current lags). */
  readonly phase: number;
  /** Real power into the tank [W]; equals `coilLossPower + parallelResistancePower`. */
  readonly power: number;
  /** RMS voltage across the capacitor [V]. */
  readonly capacitorVoltageRms: number;
  /** Peak voltage across the capacitor [V]. */
  readonly capacitorVoltagePeak: number;
  /** RMS current through the capacitor [A]. */
  readonly capacitorCurrentRms: number;
  /** Peak current through the capacitor [A]. */
  readonly capacitorCurrentPeak: number;
  /** Reactive power the capacitor bank handles, $V_C I_C$ [var]. */
  readonly capacitorReactivePower: number;
  /** RMS current through the coil [A]. */
  readonly coilCurrentRms: number;
  /** Peak current through the coil [A]. */
  readonly coilCurrentPeak: number;
  /** RMS voltage across the coil (inductance with its series resistance) [V]. */
  readonly coilVoltageRms: number;
  /** Power dissipated in the coil's series resistance [W]. */
  readonly coilLossPower: number;
  /** Power dissipated in the parallel resistance of a parallel tank [W] (0 when there is none). */
  readonly parallelResistancePower: number;
  /**
   * The largest value over a cycle of the energy stored in the coil and capacitor,
   * $\max_t\left(\tfrac12 L i_L^2 + \tfrac12 C v_C^2\right)$ [J]; at resonance it is constant over the
   * cycle and equals $\tfrac12 L \hat I_L^2 = \tfrac12 C \hat V_C^2$.
   */
  readonly storedEnergyPeak: number;
}

/**
 * Stresses of a series or parallel tank driven by a sinusoidal voltage or current: capacitor
 * voltage (peak, RMS) and current, the reactive power the capacitor bank must be rated for, coil
 * current, real power and peak stored energy.
 *
 * Phasor analysis. Series tank: $I = V/Z$, $V_C = I/(\omega C)$. Parallel tank:
 * $I_C = j\omega C V$, $I_L = V/(R + j\omega L)$, $I = V\,Y$. Stored energy maximum over a cycle
 * with phasors $\hat I_L$, $\hat V_C$ (peak):
 *
 * $$
 * W_\mathrm{max} = \tfrac14\left(L|\hat I_L|^2 + C|\hat V_C|^2\right)
 *   + \tfrac14\left|L \hat I_L^2 + C \hat V_C^2\right|
 * $$
 *
 * @param tank - a {@link SeriesTank} or {@link ParallelTank} result
 * @param drive - frequency [Hz] > 0 and exactly one of voltageRms [V] > 0 or currentRms [A] > 0
 * @returns the {@link TankStresses} (V, A, W, var, J, rad)
 * @throws {@link InputError} when the tank is not a tank result, the frequency is not > 0, both
 * or neither drive amplitudes are given or one is not > 0, or a voltage is imposed on a lossless
 * parallel tank exactly at its resonance (infinite impedance is not a finite operating point).
 * Validity: sinusoidal steady state, linear components (no harmonics; for square-wave inverters
 * use {@link seriesInverter} / {@link currentFedParallelInverter}).
 * Accuracy: exact phasor algebra; power balance to ≤ 1e-12 relative in the tests.
 * @see C. K. Alexander and M. N. O. Sadiku, Fundamentals of Electric Circuits, 5th ed.,
 * McGraw-Hill 2013, §11.6–11.7 (complex and reactive power), §14.5 (voltages at series resonance, $QV$).
 * @example
 * ```ts
 * import { seriesTank, tankStresses } from "fluxwright";
 * const tank = seriesTank({ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 });
 * const s = tankStresses(tank, { frequency: tank.undampedFrequency, voltageRms: 10 });
 * console.log(s.coilCurrentRms); // ≈ 20
 * console.log(s.capacitorVoltageRms); // ≈ 200
 * console.log(s.power); // ≈ 200
 * ```
 * @category Tanks
 */
export function tankStresses(tank: SeriesTank | ParallelTank, drive: TankDrive): TankStresses {
  const where = "tankStresses";
  requireObject(where, "tank", tank);
  requireObject(where, "drive", drive);
  requireKnownKeys(where, "drive", drive, DRIVE_FIELDS);
  const kind = (tank as { kind?: unknown }).kind;
  if (kind !== "series-tank" && kind !== "parallel-tank") {
    throw new InputError(where, "tank", tank, "", "a result of seriesTank or parallelTank");
  }
  const frequency = requirePositive(where, "drive.frequency", drive.frequency, "Hz");
  const hasV = drive.voltageRms !== undefined;
  const hasI = drive.currentRms !== undefined;
  if (hasV === hasI) {
    throw new InputError(where, "drive", drive, "", "an object with exactly one of voltageRms or currentRms");
  }
  const omega = 2 * Math.PI * frequency;
  const L = requirePositive(where, "tank.inductance", tank.inductance, "H");
  const C = requirePositive(where, "tank.capacitance", tank.capacitance, "F");
  const xl = omega * L;
  const xc = 1 / (omega * C);

  if (tank.kind === "series-tank") {
    const R = requirePositive(where, "tank.resistance", tank.resistance, "Ω");
    const x = xl - xc;
    const zMag = Math.hypot(R, x);
    const current = hasV
      ? requirePositive(where, "drive.voltageRms", drive.voltageRms, "V") / zMag
      : requirePositive(where, "drive.currentRms", drive.currentRms, "A");
    const voltage = current * zMag;
    const vc = current * xc;
    // Phasors (peak) with the current as reference: I = √2·I, V_C = −j·√2·V_C.
    const ip = Math.SQRT2 * current;
    const vcp = Math.SQRT2 * vc;
    // L·I² (real, positive) + C·V_C² (V_C² = −vcp², real negative).
    const wA = L * ip * ip;
    const wB = C * vcp * vcp;
    const power = current * current * R;
    return {
      frequency,
      driveVoltageRms: voltage,
      driveCurrentRms: current,
      phase: Math.atan2(x, R),
      power,
      capacitorVoltageRms: vc,
      capacitorVoltagePeak: vcp,
      capacitorCurrentRms: current,
      capacitorCurrentPeak: ip,
      capacitorReactivePower: vc * current,
      coilCurrentRms: current,
      coilCurrentPeak: ip,
      coilVoltageRms: current * Math.hypot(R, xl),
      coilLossPower: power,
      parallelResistancePower: 0,
      storedEnergyPeak: 0.25 * (wA + wB) + 0.25 * Math.abs(wA - wB),
    };
  }

  const R = tank.coilResistance;
  const Rp = tank.parallelResistance;
  // Admittance Y = G + jB of the parallel tank.
  const zl2 = R * R + xl * xl;
  const g = R / zl2 + (Rp === null ? 0 : 1 / Rp);
  const b = 1 / xc - xl / zl2;
  const yMag = Math.hypot(g, b);
  let voltage: number;
  if (hasV) {
    voltage = requirePositive(where, "drive.voltageRms", drive.voltageRms, "V");
  } else {
    const current = requirePositive(where, "drive.currentRms", drive.currentRms, "A");
    if (yMag === 0) {
      throw new InputError(where, "drive.frequency", frequency, "Hz", "a frequency at which the tank impedance is finite");
    }
    voltage = current / yMag;
  }
  const lineCurrent = voltage * yMag;
  const ic = voltage / xc;
  const il = voltage / Math.sqrt(zl2);
  const vp = Math.SQRT2 * voltage;
  // Phasors (peak) with the voltage as reference: V_C = vp (real), I_L = vp/(R + jX_L).
  const ilRe = (vp * R) / zl2;
  const ilIm = (-vp * xl) / zl2;
  const wRe = L * (ilRe * ilRe - ilIm * ilIm) + C * vp * vp;
  const wIm = L * 2 * ilRe * ilIm;
  const coilLossPower = il * il * R;
  const parallelResistancePower = Rp === null ? 0 : (voltage * voltage) / Rp;
  return {
    frequency,
    driveVoltageRms: voltage,
    driveCurrentRms: lineCurrent,
    // Z = 1/Y: its phase is −arg(Y).
    phase: Math.atan2(-b, g),
    power: coilLossPower + parallelResistancePower,
    capacitorVoltageRms: voltage,
    capacitorVoltagePeak: vp,
    capacitorCurrentRms: ic,
    capacitorCurrentPeak: Math.SQRT2 * ic,
    capacitorReactivePower: voltage * ic,
    coilCurrentRms: il,
    coilCurrentPeak: Math.SQRT2 * il,
    coilVoltageRms: voltage,
    coilLossPower,
    parallelResistancePower,
    storedEnergyPeak: 0.25 * (L * 2 * il * il + C * vp * vp) + 0.25 * Math.hypot(wRe, wIm),
  };
}
