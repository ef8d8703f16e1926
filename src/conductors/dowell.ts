/**
 * Dowell's AC resistance factor of a layered (foil or equivalent-foil) winding.
 *
 * @packageDocumentation
 */
import { requireInteger, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const DOWELL_FIELDS: readonly string[] = Object.freeze(["penetrationRatio", "layers"]);

/** Options of {@link dowellFactor}. @category Conductors */
export interface DowellFactorOptions {
  /**
   * Penetration ratio Δ = h/δ [-]: layer (foil) thickness over skin depth, finite and > 0.
   * Computed stably from 1e-6 to 1e4 and beyond.
   */
  readonly penetrationRatio: number;
  /** Number of layers m in the winding portion (from zero to maximum field), an integer ≥ 1. */
  readonly layers: number;
}

// Series in t = Δ⁴ for Δ ≤ 1 (coefficients from the Taylor series of sinh, sin, cosh, cos):
//   Δ·ς1(Δ) = P1(t)/Q1(t),  P1 = Σ 16^k t^k/(4k+1)!,  Q1 = Σ 2·16^k t^k/(4k+2)!
//   Δ·ς2(Δ) = t·R2(t)/S2(t), R2 = Σ t^k/(4k+3)!,       S2 = Σ t^k/(4k)!
// Truncated where the next term is below 1e-18 relative at t = 1; coefficients inlined below.

/**
 * Dowell's AC-to-DC resistance ratio $F_R$ of a winding portion of m foil layers, each of
 * thickness h, carrying a sinusoidal current in a one-dimensional field (field parallel to the
 * layers, rising from zero to its maximum across the portion):
 *
 * $$
 * F_R = \Delta \left[ \varsigma_1(\Delta) + \frac{2(m^2 - 1)}{3}\, \varsigma_2(\Delta) \right],
 * \quad \varsigma_1 = \frac{\sinh 2\Delta + \sin 2\Delta}{\cosh 2\Delta - \cos 2\Delta},
 * \quad \varsigma_2 = \frac{\sinh \Delta - \sin \Delta}{\cosh \Delta + \cos \Delta}
 * $$
 *
 * with Δ = h/δ. The first term is the skin effect of one layer, the second the proximity
 * effect of the other layers' field. Evaluation: power series in Δ⁴ for Δ ≤ 1 (no
 * cancellation in sinh Δ − sin Δ), exponentially scaled forms for Δ > 1 (no overflow of
 * sinh 2Δ), and the exact limit ς₁ = ς₂ = 1 beyond Δ = 40 (where e^{−Δ} < 1e-17). Limits:
 * $F_R \to 1 + (5m^2 - 1)\Delta^4/45$ as Δ → 0 and $F_R \to \Delta (2m^2 + 1)/3$ as Δ → ∞.
 *
 * Hard domain (throws {@link InputError}): penetrationRatio finite and > 0; layers an
 * integer ≥ 1. Validity of the model: layers much wider than thick and filling the window
 * breadth (one-dimensional field), sinusoidal current, equal current in every layer; for round
 * wire see {@link roundWireWindingAcRatio}.
 *
 * Accuracy: ≤ 1e-14 relative against an mpmath evaluation of the same formula at 50 digits
 * over Δ = 1e-6 … 1e4, m = 1 … 30; the formula agrees with an independent 1-D finite-difference
 * field solution of a foil stack to 1e-6 (test fixtures).
 *
 * @param options - {@link DowellFactorOptions}: penetration ratio Δ = h/δ [-], layers m [-]
 * @returns $F_R = R_\mathrm{ac}/R_\mathrm{dc}$ [-], ≥ 1
 * @throws {@link InputError} on a bad penetration ratio or layer count
 * @see P. L. Dowell, "Effects of eddy currents in transformer windings", Proc. IEE 113(8), 1387–1394 (1966) (the layer formula; equation numbering not checked).
 * @see R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed. (2001), §13.4 (same result in the ς₁, ς₂ form).
 * @example
 * ```ts
 * import { dowellFactor } from "fluxwright";
 * console.log(dowellFactor({ penetrationRatio: 1, layers: 1 })); // ≈ 1.0856
 * console.log(dowellFactor({ penetrationRatio: 1, layers: 3 })); // ≈ 1.9400
 * ```
 * @category Conductors
 */
export function dowellFactor(options: DowellFactorOptions): number {
  requireObject("dowellFactor", "options", options);
  for (const key in options) {
    // constant-name comparisons: a few ns on this hot path
    if (key !== "penetrationRatio" && key !== "layers") requireKnownKeys("dowellFactor", "", options, DOWELL_FIELDS);
  }
  const delta = options.penetrationRatio;
  const layers = options.layers;
  if (typeof delta !== "number" || !(delta > 0) || delta === Infinity) {
    requirePositive("dowellFactor", "penetrationRatio", delta, "");
  }
  requireInteger("dowellFactor", "layers", layers, 1);
  return dowellFactorKernel(delta, layers);
}

/**
 * Dowell's factor without input checks (Δ > 0, m ≥ 1 assumed). Internal kernel shared by the
 * winding models of this module.
 *
 * @param delta - Δ = h/δ
 * @param layers - m
 * @returns F_R
 * @internal
 */
export function dowellFactorKernel(delta: number, layers: number): number {
  return dowellLayerKernel(delta, (2 * (layers * layers - 1)) / 3);
}

/**
 * Dowell's layer factor with a general proximity weight, $\Delta[\varsigma_1 + w\,\varsigma_2]$
 * (Δ > 0, w finite, unchecked). With $w = 2(m^2-1)/3$ it is {@link dowellFactorKernel}; one
 * layer whose surface magnetomotive forces are a and c (signed) has $w = 2ac/(c-a)^2$.
 *
 * @param delta - Δ = h/δ
 * @param proximityWeight - w
 * @returns the factor
 * @internal
 */
export function dowellLayerKernel(delta: number, proximityWeight: number): number {
  if (delta <= 1) {
    const t = delta * delta * delta * delta;
    const p1 = 1 + t * (0.13333333333333333 + t * (0.0007054673721340388 + t * (6.577784355562133e-07 + t * (1.8425166262078804e-10 + t * (2.0523716248486557e-14 + t * (1.0816187746237974e-18))))));
    const q1 = 1 + t * (0.044444444444444446 + t * (0.00014109347442680775 + t * (9.39683479366019e-08 + t * (2.0472406957865337e-11 + t * (1.8657923862260506e-15 + t * (8.320144420183057e-20))))));
    const r2 = 0.16666666666666666 + t * (0.0001984126984126984 + t * (2.505210838544172e-08 + t * (7.647163731819816e-13 + t * (8.22063524662433e-18))));
    const s2 = 1 + t * (0.041666666666666664 + t * (2.48015873015873e-05 + t * (2.08767569878681e-09 + t * (4.779477332387385e-14 + t * (4.110317623312165e-19)))));
    return p1 / q1 + proximityWeight * ((t * r2) / s2);
  }
  if (delta > 40) return delta * (1 + proximityWeight);
  // Scaled by e^{-2Δ} and e^{-Δ}: no overflow, no cancellation for Δ > 1.
  const q = Math.exp(-delta);
  const e = q * q;
  const s = Math.sin(delta);
  const c = Math.cos(delta);
  const sin2 = 2 * s * c;
  const cos2 = c * c - s * s;
  const sigma1 = (1 - e * e + 2 * e * sin2) / (1 + e * e - 2 * e * cos2);
  const sigma2 = (1 - e - 2 * q * s) / (1 + e + 2 * q * c);
  return delta * (sigma1 + proximityWeight * sigma2);
}
