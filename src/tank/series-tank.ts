/**
 * The series RLC tank: resonance, quality factor and bandwidth.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { TankNetwork } from "./network-types.js";
import { requireRepresentable, tankNetworkUnchecked } from "./tank-network-internal.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SERIES_TANK_FIELDS: readonly string[] = Object.freeze(["inductance", "capacitance", "resistance"]);

/**
 * Options of {@link seriesTank}.
 *
 * @category Tanks
 */
export interface SeriesTankOptions {
  /** Inductance of the coil [H], > 0. */
  readonly inductance: number;
  /** Capacitance [F], > 0. */
  readonly capacitance: number;
  /** Total series resistance (coil, capacitor ESR, reflected load) [Ω], > 0. */
  readonly resistance: number;
}

/**
 * Resonance figures of a series RLC tank, as returned by {@link seriesTank}.
 * For a series tank the undamped frequency is also the zero-phase frequency and the
 * frequency of minimum impedance (and of maximum current for a voltage drive).
 *
 * @category Tanks
 */
export interface SeriesTank {
  /** Discriminator: `"series-tank"`. */
  readonly kind: "series-tank";
  /** Inductance [H]. */
  readonly inductance: number;
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** Series resistance [Ω]. */
  readonly resistance: number;
  /** Undamped (natural) frequency $f_0 = 1/(2\pi\sqrt{LC})$ [Hz]; also zero phase and minimum impedance. */
  readonly undampedFrequency: number;
  /** Characteristic impedance $Z_0 = \sqrt{L/C}$ [Ω]. */
  readonly characteristicImpedance: number;
  /** Quality factor $Q = Z_0/R = \omega_0 L/R$ (dimensionless). */
  readonly qualityFactor: number;
  /** Half-power (−3 dB) bandwidth $f_2 - f_1 = R/(2\pi L) = f_0/Q$ [Hz] (exact for the series tank). */
  readonly bandwidth: number;
  /** Lower half-power frequency $f_1$ [Hz] (exact). */
  readonly lowerHalfPowerFrequency: number;
  /** Upper half-power frequency $f_2$ [Hz] (exact); $f_1 f_2 = f_0^2$. */
  readonly upperHalfPowerFrequency: number;
  /**
   * Frequency of the free (ringing) response $f_d = f_0\sqrt{1 - 1/(4Q^2)}$ [Hz], or `null` when
   * $Q \le 1/2$: the tank is then critically or over-damped and does not ring ("no resonance" of
   * the free response; the forced response still has its minimum impedance at $f_0$).
   */
  readonly dampedFrequency: number | null;
  /** The same tank as a composable network, for {@link tankImpedance}. */
  readonly network: TankNetwork;
}

/**
 * Resonance figures of a series RLC tank: undamped frequency, characteristic impedance,
 * quality factor, exact half-power bandwidth and the damped ringing frequency.
 *
 * $$
 * f_0 = \frac{1}{2\pi\sqrt{LC}},\quad Z_0 = \sqrt{L/C},\quad Q = \frac{Z_0}{R},\quad
 * \Delta f = \frac{R}{2\pi L},\quad f_{1,2} = \sqrt{f_0^2 + \left(\frac{R}{4\pi L}\right)^2} \mp \frac{R}{4\pi L}
 * $$
 *
 * @param options - `inductance` [H] > 0, `capacitance` [F] > 0, `resistance` [Ω] > 0
 * @returns the {@link SeriesTank} figures (frequencies in Hz, impedances in Ω)
 * @throws {@link InputError} when an input is not a finite number > 0 (hard domain).
 * Validity: lumped, linear, frequency-independent components; any finite positive values.
 * Accuracy: closed forms, exact to rounding (≤ 1e-12 relative in the tests).
 * @see C. K. Alexander and M. N. O. Sadiku, Fundamentals of Electric Circuits, 5th ed.,
 * McGraw-Hill 2013, §14.5 "Series resonance" (ω0, Q, bandwidth B = R/L).
 * @example
 * ```ts
 * import { seriesTank } from "fluxwright";
 * const tank = seriesTank({ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 });
 * console.log(tank.undampedFrequency); // ≈ 15915.49
 * console.log(tank.qualityFactor); // ≈ 20
 * console.log(tank.bandwidth); // ≈ 795.77
 * ```
 * @category Tanks
 */
export function seriesTank(options: SeriesTankOptions): SeriesTank {
  const where = "seriesTank";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SERIES_TANK_FIELDS);
  const inductance = requirePositive(where, "inductance", options.inductance, "H");
  const capacitance = requirePositive(where, "capacitance", options.capacitance, "F");
  const resistance = requirePositive(where, "resistance", options.resistance, "Ω");
  // square roots taken separately: L·C and L/C may leave the double range when ω0 and Z0 do not
  const rootL = Math.sqrt(inductance);
  const rootC = Math.sqrt(capacitance);
  const omega0 = 1 / rootL / rootC;
  const characteristicImpedance = rootL / rootC;
  const qualityFactor = characteristicImpedance / resistance;
  const alpha = resistance / (2 * inductance); // neper frequency [1/s]
  const root = Math.hypot(omega0, alpha);
  const twoPi = 2 * Math.PI;
  // f1 = (root - alpha)/2π written without cancellation: (root² − α²)/(root + α) = ω0²/(root + α).
  const lower = (omega0 * (omega0 / (root + alpha))) / twoPi;
  const upper = (root + alpha) / twoPi;
  const dampedSquared = 1 - 1 / (4 * qualityFactor * qualityFactor);
  return requireRepresentable(where, {
    kind: "series-tank",
    inductance,
    capacitance,
    resistance,
    undampedFrequency: omega0 / twoPi,
    characteristicImpedance,
    qualityFactor,
    bandwidth: resistance / (twoPi * inductance),
    lowerHalfPowerFrequency: lower,
    upperHalfPowerFrequency: upper,
    dampedFrequency: dampedSquared > 0 ? (omega0 / twoPi) * Math.sqrt(dampedSquared) : null,
    network: tankNetworkUnchecked("series", inductance, resistance, capacitance, null),
  });
}
