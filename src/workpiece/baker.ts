/**
 * Baker's power functions P and Q of a solid round bar in a uniform axial field.
 *
 * @packageDocumentation
 */
import { requireFinite, InputError } from "../core/index.js";
import { bakerPQ } from "./kernels.js";

/**
 * Baker's power-transfer functions of a solid round bar: active (`p`) and reactive (`q`)
 * power per unit of bar surface, each divided by the value for a flat half-space of the
 * same material in the same surface field. Both tend to 1 as the bar becomes thick against
 * the skin depth.
 *
 * @category Workpiece
 */
export interface BakerFunctions {
  /** Active-power function $P$ [-], in [0, 1). */
  readonly p: number;
  /** Reactive-power function $Q$ [-], > 0 (it tends to the ratio itself for a thin bar). */
  readonly q: number;
}

/**
 * Baker's power functions $P$ and $Q$ of a solid round bar of radius $a$ in a uniform axial
 * AC field (the bar in a long coil), against **ratio = a/δ, bar radius over skin depth**
 * $\delta = \sqrt{2\rho/(\omega\mu_0\mu_r)}$. (Some handbooks tabulate against
 * $m = \sqrt{2}\,a/\delta$ instead — divide their abscissa by √2 before comparing.)
 *
 * With $k = (1+j)/\delta$ the field in the bar is $H_0 I_0(kr)/I_0(ka)$ and the surface
 * impedance $Z_s = \rho k\, I_1(ka)/I_0(ka)$; normalised by the half-space value $\rho/\delta$:
 *
 * $$
 * P + jQ = (1+j)\frac{I_1((1+j)a/\delta)}{I_0((1+j)a/\delta)}
 *   = \sqrt{2}\,\frac{(\mathrm{ber}\,m\,\mathrm{ber}'m + \mathrm{bei}\,m\,\mathrm{bei}'m)
 *     + j(\mathrm{ber}\,m\,\mathrm{bei}'m - \mathrm{bei}\,m\,\mathrm{ber}'m)}{\mathrm{ber}^2 m + \mathrm{bei}^2 m},
 * \quad m = \sqrt{2}\,a/\delta.
 * $$
 *
 * So the power per metre of bar is $P' = 2\pi a\,(\rho/\delta)\,H_0^2\,P$ (H₀ RMS). Limits:
 * $P \approx (a/\delta)^3/4$ and $Q \approx a/\delta$ as $a/\delta \to 0$;
 * $P \to 1 - \delta/(2a)$, $Q \to 1$ as $a/\delta \to \infty$ (see
 * {@link bakerFunctionsAsymptotic}). $P$ passes 0.5 near $a/\delta = 1.5$ and is 0.81 at
 * $a/\delta = 2.5$: below that the bar is nearly transparent to the field.
 *
 * Hard domain (throws {@link InputError}): ratio a finite number ≥ 0. ratio = 0 gives p = q = 0.
 *
 * Evaluated by a Taylor series (ratio ≤ 0.3, so that P keeps its digits), the continued
 * fraction of $I_1/I_0$ (0.3 < ratio < 20) and 19 terms of its asymptotic series (ratio ≥ 20).
 *
 * Accuracy: ≤ 1e-15 relative to |P + jQ| and ≤ 5e-15 relative in P vs mpmath modified Bessel
 * functions of complex argument (fixture `test/fixtures/workpiece/baker.json`, cross-checked
 * there against mpmath's Kelvin functions) for 1e-3 ≤ ratio ≤ 1e3.
 *
 * @param ratio - bar radius over skin depth a/δ [-], ≥ 0 (NOT √2·a/δ)
 * @returns the functions `p` and `q` [-]
 * @throws {@link InputError} when ratio is negative or not finite
 * @see R. M. Baker, "Classical heat-flow problems applied to induction billet heating",
 *   AIEE paper, 1957 (title and year from memory) — the P and Q functions; E. J. Davies,
 *   *Conduction and Induction Heating*, Peter Peregrinus 1990 (the same functions).
 * @example
 * ```ts
 * import { bakerFunctions } from "fluxwright";
 * const { p, q } = bakerFunctions(2.5); // radius = 2.5 skin depths
 * console.log(p.toFixed(4), q.toFixed(4)); // 0.8077 1.0240
 * ```
 * @category Workpiece
 */
export function bakerFunctions(ratio: number): BakerFunctions {
  const u = requireFinite("bakerFunctions", "ratio", ratio, "");
  if (u < 0) throw new InputError("bakerFunctions", "ratio", ratio, "", "a finite number ≥ 0");
  if (u === 0) return { p: 0, q: 0 };
  const { p, q } = bakerPQ(u);
  return { p, q };
}

/**
 * High-frequency asymptote of Baker's functions (ratio = a/δ as in {@link bakerFunctions}),
 * from the asymptotic series $I_1(z)/I_0(z) \sim 1 - \tfrac{1}{2z} - \tfrac{1}{8z^2} - \tfrac{1}{8z^3}$:
 *
 * $$
 * P \approx 1 - \frac{1}{2u} - \frac{1}{16u^2},\qquad Q \approx 1 + \frac{1}{16u^2} + \frac{1}{16u^3},\qquad u = a/\delta.
 * $$
 *
 * Hard domain: ratio a finite number > 0. Validity: ratio ≥ 2.5, where it is within 2.2 % of
 * the exact functions (≤ 5e-4 for ratio ≥ 4, ≤ 1e-5 for ratio ≥ 10; tested against
 * {@link bakerFunctions}).
 *
 * @param ratio - bar radius over skin depth a/δ [-], > 0
 * @returns approximate `p` and `q` [-]
 * @throws {@link InputError} when ratio is not a finite number > 0
 * @see R. M. Baker (1957), as {@link bakerFunctions}; asymptotic series of $I_1/I_0$: NIST DLMF §10.40.
 * @example
 * ```ts
 * import { bakerFunctionsAsymptotic } from "fluxwright";
 * console.log(bakerFunctionsAsymptotic(10).p.toFixed(4)); // 0.9494
 * ```
 * @category Workpiece
 */
export function bakerFunctionsAsymptotic(ratio: number): BakerFunctions {
  const u = requireFinite("bakerFunctionsAsymptotic", "ratio", ratio, "");
  if (!(u > 0)) throw new InputError("bakerFunctionsAsymptotic", "ratio", ratio, "", "a finite number > 0");
  const v = 1 / u;
  return { p: 1 - v / 2 - (v * v) / 16, q: 1 + (v * v) / 16 + (v * v * v) / 16 };
}
