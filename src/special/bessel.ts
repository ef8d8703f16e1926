/**
 * Bessel functions of real argument: J₀, J₁, Y₀, Y₁, I₀, I₁, K₀, K₁ and the exponentially
 * scaled forms of I and K.
 *
 * All are evaluated by the complex engine of this module (power series, Steed's continued
 * fractions with the Wronskian, Hankel asymptotic expansions), using
 * J_ν(x) = i^ν I_ν(−ix) and K_ν(−ix) = (π/2)·i^{ν+1} H_ν^{(1)}(x) (DLMF 10.27.6, 10.27.8).
 *
 * @packageDocumentation
 */
import { besselIKScaled } from "./bessel-core.js";

const TWO_OVER_PI = 0.6366197723675814;

/**
 * Bessel function of the first kind of order zero, J₀(x).
 *
 * $$
 * J_0(x) = \frac{1}{\pi}\int_0^\pi \cos(x \sin\theta)\,d\theta
 * $$
 *
 * Domain: every real x (even function); NaN for NaN. Accuracy ≤ 5e-15 vs mpmath relative to
 * max(|J₀(x)|, envelope $\sqrt{2/(\pi x)}$ capped at 1), i.e. relative away from zeros and
 * absolute-to-envelope near them (fixture test/fixtures/special/bessel-real.json, 0 ≤ x ≤ 1e6).
 *
 * @param x - argument [dimensionless]
 * @returns J₀(x) [dimensionless]
 * @see NIST DLMF 10.9.1; A&S 9.1.18
 * @example
 * ```ts
 * import { besselJ0 } from "fluxwright";
 * console.log(besselJ0(1)); // ≈ 0.7651976866
 * ```
 * @category Bessel functions
 */
export function besselJ0(x: number): number {
  return besselIKScaled(0, -Math.abs(x), false).i0r;
}

/**
 * Bessel function of the first kind of order one, J₁(x).
 *
 * $$
 * J_1(x) = \frac{1}{\pi}\int_0^\pi \cos(\theta - x \sin\theta)\,d\theta
 * $$
 *
 * Domain: every real x (odd function). Accuracy ≤ 5e-15 vs mpmath relative to
 * max(|J₁(x)|, envelope) as {@link besselJ0}.
 *
 * @param x - argument [dimensionless]
 * @returns J₁(x) [dimensionless]
 * @see NIST DLMF 10.9.1; A&S 9.1.21
 * @example
 * ```ts
 * import { besselJ1 } from "fluxwright";
 * console.log(besselJ1(1)); // ≈ 0.4400505857
 * ```
 * @category Bessel functions
 */
export function besselJ1(x: number): number {
  const v = 0 - besselIKScaled(0, -Math.abs(x), false).i1i;
  return x < 0 ? -v : v;
}

/**
 * Bessel function of the second kind of order zero, Y₀(x), x > 0.
 *
 * $$
 * Y_0(x) = \frac{2}{\pi}\left(\ln\frac{x}{2} + \gamma\right) J_0(x) + \dots, \qquad
 * Y_0(x) = -\tfrac{2}{\pi}\,\mathrm{Re}\,K_0(-ix)
 * $$
 *
 * Domain: x > 0; Y₀(0) = −∞; NaN for x < 0. Accuracy ≤ 5e-15 vs mpmath relative to
 * max(|Y₀(x)|, envelope), as {@link besselJ0}.
 *
 * @param x - argument, x > 0 [dimensionless]
 * @returns Y₀(x) [dimensionless]
 * @see NIST DLMF 10.8.2, 10.27.8; A&S 9.1.13
 * @example
 * ```ts
 * import { besselY0 } from "fluxwright";
 * console.log(besselY0(1)); // ≈ 0.0882569642
 * ```
 * @category Bessel functions
 */
export function besselY0(x: number): number {
  if (x === 0) return -Infinity;
  if (!(x > 0)) return NaN;
  const o = besselIKScaled(0, -x, true);
  // K0(−ix) = e^{ix}·(e^{−ix}K0(−ix))
  return -TWO_OVER_PI * (Math.cos(x) * o.k0r - Math.sin(x) * o.k0i);
}

/**
 * Bessel function of the second kind of order one, Y₁(x), x > 0.
 *
 * $$
 * Y_1(x) = -\tfrac{2}{\pi}\,\mathrm{Im}\,K_1(-ix)
 * $$
 *
 * Domain: x > 0; Y₁(0) = −∞; NaN for x < 0. Accuracy ≤ 5e-15 vs mpmath relative to
 * max(|Y₁(x)|, envelope), as {@link besselJ0}.
 *
 * @param x - argument, x > 0 [dimensionless]
 * @returns Y₁(x) [dimensionless]
 * @see NIST DLMF 10.8.1, 10.27.8; A&S 9.1.11
 * @example
 * ```ts
 * import { besselY1 } from "fluxwright";
 * console.log(besselY1(1)); // ≈ -0.7812128213
 * ```
 * @category Bessel functions
 */
export function besselY1(x: number): number {
  if (x === 0) return -Infinity;
  if (!(x > 0)) return NaN;
  const o = besselIKScaled(0, -x, true);
  return -TWO_OVER_PI * (Math.sin(x) * o.k1r + Math.cos(x) * o.k1i);
}

/**
 * Modified Bessel function of the first kind of order zero, I₀(x).
 *
 * $$
 * I_0(x) = \sum_{k=0}^\infty \frac{(x/2)^{2k}}{(k!)^2}
 * $$
 *
 * Domain: every real x (even); overflows to +∞ for |x| ≳ 713.9 (use
 * {@link besselI0Scaled}). Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument [dimensionless]
 * @returns I₀(x) ≥ 1 [dimensionless]
 * @see NIST DLMF 10.25.2, 10.40.1; A&S 9.6.12
 * @example
 * ```ts
 * import { besselI0 } from "fluxwright";
 * console.log(besselI0(1)); // ≈ 1.266065878
 * ```
 * @category Bessel functions
 */
export function besselI0(x: number): number {
  const a = Math.abs(x);
  return besselIKScaled(a, 0, false).i0r * Math.exp(a);
}

/**
 * Modified Bessel function of the first kind of order one, I₁(x).
 *
 * $$
 * I_1(x) = \frac{x}{2}\sum_{k=0}^\infty \frac{(x/2)^{2k}}{k!\,(k+1)!}
 * $$
 *
 * Domain: every real x (odd); overflows for |x| ≳ 713.9. Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument [dimensionless]
 * @returns I₁(x) [dimensionless]
 * @see NIST DLMF 10.25.2, 10.40.1; A&S 9.6.10
 * @example
 * ```ts
 * import { besselI1 } from "fluxwright";
 * console.log(besselI1(1)); // ≈ 0.5651591040
 * ```
 * @category Bessel functions
 */
export function besselI1(x: number): number {
  const a = Math.abs(x);
  const v = besselIKScaled(a, 0, false).i1r * Math.exp(a);
  return x < 0 ? -v : v;
}

/**
 * Exponentially scaled $e^{-|x|} I_0(x)$, finite for every real x.
 *
 * $$
 * \tilde I_0(x) = e^{-|x|} I_0(x) \sim \frac{1}{\sqrt{2\pi |x|}}
 * $$
 *
 * Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument [dimensionless]
 * @returns e^{−|x|} I₀(x) [dimensionless]
 * @see NIST DLMF 10.40.1
 * @example
 * ```ts
 * import { besselI0Scaled } from "fluxwright";
 * console.log(besselI0Scaled(0)); // 1
 * ```
 * @category Bessel functions
 */
export function besselI0Scaled(x: number): number {
  return besselIKScaled(Math.abs(x), 0, false).i0r;
}

/**
 * Exponentially scaled $e^{-|x|} I_1(x)$, finite for every real x (odd).
 *
 * $$
 * \tilde I_1(x) = e^{-|x|} I_1(x)
 * $$
 *
 * Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument [dimensionless]
 * @returns e^{−|x|} I₁(x) [dimensionless]
 * @see NIST DLMF 10.40.1
 * @example
 * ```ts
 * import { besselI1Scaled } from "fluxwright";
 * console.log(besselI1Scaled(1)); // ≈ 0.2079104153
 * ```
 * @category Bessel functions
 */
export function besselI1Scaled(x: number): number {
  const v = besselIKScaled(Math.abs(x), 0, false).i1r;
  return x < 0 ? -v : v;
}

/**
 * Modified Bessel function of the second kind of order zero, K₀(x), x > 0.
 *
 * $$
 * K_0(x) = \int_0^\infty e^{-x\cosh t}\,dt
 * $$
 *
 * Domain: x > 0; K₀(0) = +∞; NaN for x < 0. Underflows to 0 beyond x ≈ 745 (use
 * {@link besselK0Scaled}). Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument, x > 0 [dimensionless]
 * @returns K₀(x) > 0 [dimensionless]
 * @see NIST DLMF 10.32.9, 10.40.2; A&S 9.6.13
 * @example
 * ```ts
 * import { besselK0 } from "fluxwright";
 * console.log(besselK0(1)); // ≈ 0.4210244382
 * ```
 * @category Bessel functions
 */
export function besselK0(x: number): number {
  if (x === 0) return Infinity;
  if (!(x > 0)) return NaN;
  return besselIKScaled(x, 0, true).k0r * Math.exp(-x);
}

/**
 * Modified Bessel function of the second kind of order one, K₁(x), x > 0.
 *
 * $$
 * K_1(x) = \int_0^\infty e^{-x\cosh t}\cosh t\,dt
 * $$
 *
 * Domain: x > 0; K₁(0) = +∞; NaN for x < 0. Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument, x > 0 [dimensionless]
 * @returns K₁(x) > 0 [dimensionless]
 * @see NIST DLMF 10.32.8, 10.40.2; A&S 9.6.11
 * @example
 * ```ts
 * import { besselK1 } from "fluxwright";
 * console.log(besselK1(1)); // ≈ 0.6019072302
 * ```
 * @category Bessel functions
 */
export function besselK1(x: number): number {
  if (x === 0) return Infinity;
  if (!(x > 0)) return NaN;
  return besselIKScaled(x, 0, true).k1r * Math.exp(-x);
}

/**
 * Exponentially scaled $e^{x} K_0(x)$, finite for every x > 0.
 *
 * $$
 * \tilde K_0(x) = e^{x} K_0(x) \sim \sqrt{\frac{\pi}{2x}}
 * $$
 *
 * Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument, x > 0 [dimensionless]
 * @returns e^{x} K₀(x) [dimensionless]; +∞ at 0, NaN for x < 0
 * @see NIST DLMF 10.40.2
 * @example
 * ```ts
 * import { besselK0Scaled } from "fluxwright";
 * console.log(besselK0Scaled(1)); // ≈ 1.144463080
 * ```
 * @category Bessel functions
 */
export function besselK0Scaled(x: number): number {
  if (x === 0) return Infinity;
  if (!(x > 0)) return NaN;
  return besselIKScaled(x, 0, true).k0r;
}

/**
 * Exponentially scaled $e^{x} K_1(x)$, finite for every x > 0.
 *
 * $$
 * \tilde K_1(x) = e^{x} K_1(x)
 * $$
 *
 * Accuracy ≤ 5e-15 relative vs mpmath.
 *
 * @param x - argument, x > 0 [dimensionless]
 * @returns e^{x} K₁(x) [dimensionless]; +∞ at 0, NaN for x < 0
 * @see NIST DLMF 10.40.2
 * @example
 * ```ts
 * import { besselK1Scaled } from "fluxwright";
 * console.log(besselK1Scaled(1)); // ≈ 1.636153486
 * ```
 * @category Bessel functions
 */
export function besselK1Scaled(x: number): number {
  if (x === 0) return Infinity;
  if (!(x > 0)) return NaN;
  return besselIKScaled(x, 0, true).k1r;
}
