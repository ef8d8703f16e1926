/**
 * The original Steinmetz equation for sinusoidal flux, and its temperature factor.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { SteinmetzCoefficients, SteinmetzTemperatureTerm } from "../materials/index.js";
import { givenName, renamedOption } from "../core/renamed.js";
import type { WithPeakFluxDensity } from "./waveforms.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TERM_FIELDS: readonly string[] = Object.freeze(["referenceTemperature", "linear", "quadratic"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const STEINMETZ_FIELDS: readonly string[] = Object.freeze(["frequency", "fluxDensityPeak", "k", "alpha", "beta", "peakFluxDensity"]);

/**
 * Options of {@link steinmetzLoss}: Steinmetz coefficients (SI) and the sinusoidal operating
 * point.
 *
 * @category Core loss
 */
export interface SteinmetzLossOptions extends SteinmetzCoefficients {
  /** Frequency of the sinusoidal flux [Hz], > 0. */
  readonly frequency: number;
  /** Peak (amplitude) flux density $\hat B$ [T], ≥ 0 (half the peak-to-peak swing). */
  readonly fluxDensityPeak: number;
}

/**
 * Validates Steinmetz coefficients: k > 0, α > 0, β > 0.
 *
 * @param where - calling function
 * @param o - the options holding k, alpha, beta
 */
export function checkSteinmetzCoefficients(where: string, o: SteinmetzCoefficients): void {
  requirePositive(where, "k", o.k, "W/m³");
  requirePositive(where, "alpha", o.alpha, "");
  requirePositive(where, "beta", o.beta, "");
}

/**
 * Core-loss density under sinusoidal flux by the Steinmetz equation:
 * $$
 * P_v = k\, f^{\alpha}\, \hat B^{\beta}
 * $$
 * with coefficients in SI (f in Hz, $\hat B$ in T, $P_v$ in W/m³).
 *
 * Hard domain (throws {@link InputError}): k, α, β, f not finite numbers > 0; $\hat B$ not a
 * finite number ≥ 0. Validity: the frequency, flux and temperature ranges over which the
 * coefficients were fitted (e.g. a {@link CoreMaterial}'s ranges); sinusoidal flux only (use
 * {@link igseLoss} for other waveforms). Accuracy: exact evaluation of the formula (≤ 1e-15
 * relative); the model itself is typically within 10–25 % of measurement inside its fitted
 * range (common practice).
 *
 * @param options - coefficients and operating point
 * @returns loss density [W/m³], ≥ 0
 * @throws {@link InputError} on bad input
 * @see C. P. Steinmetz, "On the law of hysteresis", Trans. AIEE 9 (1892) 3–64.
 * @example
 * ```ts
 * import { steinmetzLoss } from "fluxwright";
 * // invented example coefficients
 * console.log(steinmetzLoss({ k: 2.5, alpha: 1.45, beta: 2.55, frequency: 100e3, fluxDensityPeak: 0.1 })); // ≈ 125297
 * ```
 * @category Core loss
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name peakFluxDensity is accepted until 1.0
export function steinmetzLoss(options: SteinmetzLossOptions | WithPeakFluxDensity<SteinmetzLossOptions>): number {
  const where = "steinmetzLoss";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, STEINMETZ_FIELDS);
  checkSteinmetzCoefficients(where, options);
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const b = requireNonNegative(where, givenName(options, "fluxDensityPeak", "peakFluxDensity"), renamedOption(where, "", options, "fluxDensityPeak", "peakFluxDensity"), "T");
  if (b === 0) return 0;
  const direct = options.k * Math.pow(f, options.alpha) * Math.pow(b, options.beta);
  if (direct > 0 && direct < Infinity) return direct;
  // a factor left the double range: the product in logarithms gives every representable result
  const logLoss = Math.log(options.k) + options.alpha * Math.log(f) + options.beta * Math.log(b);
  const loss = Math.exp(logLoss);
  if (loss === Infinity) {
    throw new InputError(where, "frequency", f, "Hz", `a frequency for which (with fluxDensityPeak ${b} T) the loss density k·f^α·B^β, e^${logLoss.toPrecision(4)} W/m³, lies within the double-precision range`);
  }
  return loss;
}

/**
 * The quadratic temperature factor of a Steinmetz fit (see {@link SteinmetzTemperatureTerm}):
 * $$
 * F(T) = 1 + c_1\,(T - T_{\mathrm{ref}}) + c_2\,(T - T_{\mathrm{ref}})^2
 * $$
 * Multiply a loss density from {@link steinmetzLoss} or {@link igseLoss} by it.
 *
 * Hard domain (throws {@link InputError}): a term with non-finite fields or a reference
 * temperature ≤ 0; `temperature` not a finite number > 0; a factor ≤ 0 at that temperature
 * (the quadratic has left the region where it can describe a loss). Validity: the
 * temperature range of the fit. Accuracy: exact evaluation (≤ 1e-15 relative).
 *
 * @param term - the temperature term (reference [K], c₁ [1/K], c₂ [1/K²])
 * @param temperature - core temperature [K], > 0
 * @returns the factor [-], > 0
 * @throws {@link InputError} on bad input or a non-positive factor
 * @see Common ferrite-datasheet form $c_{t0} - c_{t1}\theta + c_{t2}\theta^2$ (common practice).
 * @example
 * ```ts
 * import { steinmetzTemperatureFactor } from "fluxwright";
 * // invented example term with its minimum at 363.15 K
 * const term = { referenceTemperature: 373.15, linear: 2e-3, quadratic: 1e-4 };
 * console.log(steinmetzTemperatureFactor(term, 363.15)); // 0.99
 * ```
 * @category Core loss
 */
export function steinmetzTemperatureFactor(term: SteinmetzTemperatureTerm, temperature: number): number {
  const where = "steinmetzTemperatureFactor";
  requireObject(where, "term", term);
  requireKnownKeys(where, "term", term, TERM_FIELDS);
  const ref = requirePositive(where, "term.referenceTemperature", term.referenceTemperature, "K");
  const c1 = requireFinite(where, "term.linear", term.linear, "1/K");
  const c2 = requireFinite(where, "term.quadratic", term.quadratic, "1/K²");
  const t = requirePositive(where, "temperature", temperature, "K");
  const d = t - ref;
  const f = 1 + c1 * d + c2 * d * d;
  if (!(f > 0)) requirePositive(where, "temperature factor at temperature", f, "");
  return f;
}
