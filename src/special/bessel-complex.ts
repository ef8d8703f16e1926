/**
 * Bessel functions of complex argument: here J₀, J₁, I₀, I₁ and their exponentially scaled
 * forms; K₀, K₁ and the four scaled functions at once in bessel-complex-k.ts, the
 * overflow-free ratio I₁/I₀ in bessel-complex-ratio.ts (re-exported from here).
 *
 * @packageDocumentation
 */
import { besselIKScaled, type ScaledBesselIK } from "./bessel-core.js";
import type { Complex } from "./complex.js";

export {
  besselIKComplexScaled,
  besselK0Complex,
  besselK0ComplexScaled,
  besselK1Complex,
  besselK1ComplexScaled,
  type ScaledBesselIKComplex,
} from "./bessel-complex-k.js";
export { besselI1OverI0Complex, besselI1OverI0ComplexInto } from "./bessel-complex-ratio.js";

/** The engine at z for I (any z, by the reflection I_ν(−z) = (−1)^ν I_ν(z)); I only. */
function iScaledAnywhere(zr: number, zi: number): ScaledBesselIK {
  if (zr < 0) {
    const o = besselIKScaled(-zr, -zi, false);
    o.i1r = -o.i1r;
    o.i1i = -o.i1i;
    return o;
  }
  return besselIKScaled(zr, zi, false);
}

/**
 * Modified Bessel function of the first kind I₀(z) of complex argument.
 *
 * $$
 * I_0(z) = \sum_{k=0}^\infty \frac{(z^2/4)^k}{(k!)^2}
 * $$
 *
 * Domain: every complex z; overflows to ∞ for |Re z| ≳ 713 (use
 * {@link besselI0ComplexScaled}). Method: series for |z| ≤ 1.5, continued fractions
 * CF1/CF2 with the Wronskian for 1.5 < |z| < 19, Hankel expansion with both exponentials
 * beyond. Accuracy ≤ 5e-15 relative to |I₀(z)| vs mpmath, except near zeros on and close
 * to the imaginary axis (where I₀(iy) = J₀(y)), where the error is ≤ 5e-15 of the local
 * envelope $e^{|\mathrm{Re}\,z|}/\sqrt{2\pi|z|}$ (fixture test/fixtures/special/bessel-complex.json).
 *
 * @param z - argument [dimensionless]
 * @returns I₀(z)
 * @see NIST DLMF 10.25.2, 10.40.5; I. J. Thompson & A. R. Barnett, Comput. Phys. Commun. 47:245 (1987)
 * @example
 * ```ts
 * import { besselI0Complex, complex } from "fluxwright";
 * const v = besselI0Complex(complex(1, 1));
 * console.log(v.re); // ≈ 0.93760847681
 * console.log(v.im); // ≈ 0.49652994761
 * ```
 * @category Bessel functions
 */
export function besselI0Complex(z: Complex): Complex {
  const o = iScaledAnywhere(z.re, z.im);
  const e = Math.exp(Math.abs(z.re));
  return { re: o.i0r * e, im: o.i0i * e };
}

/**
 * Modified Bessel function of the first kind I₁(z) of complex argument.
 *
 * $$
 * I_1(z) = \frac{z}{2}\sum_{k=0}^\infty \frac{(z^2/4)^k}{k!\,(k+1)!}
 * $$
 *
 * Domain: every complex z; overflows for |Re z| ≳ 713. Accuracy as {@link besselI0Complex}
 * (≤ 5e-15 relative to |I₁|, or to the envelope near zeros).
 *
 * @param z - argument [dimensionless]
 * @returns I₁(z)
 * @see NIST DLMF 10.25.2, 10.40.5
 * @example
 * ```ts
 * import { besselI1Complex, complex } from "fluxwright";
 * console.log(besselI1Complex(complex(2, 0)).re); // ≈ 1.590636855
 * ```
 * @category Bessel functions
 */
export function besselI1Complex(z: Complex): Complex {
  const o = iScaledAnywhere(z.re, z.im);
  const e = Math.exp(Math.abs(z.re));
  return { re: o.i1r * e, im: o.i1i * e };
}

/**
 * Exponentially scaled $e^{-|\mathrm{Re}\,z|} I_0(z)$, finite for every z.
 *
 * $$
 * \tilde I_0(z) = e^{-|\mathrm{Re}\,z|}\, I_0(z)
 * $$
 *
 * Accuracy ≤ 5e-15 relative to the modulus (envelope near zeros) vs mpmath.
 *
 * @param z - argument [dimensionless]
 * @returns e^{−|Re z|} I₀(z)
 * @see NIST DLMF 10.40.5
 * @example
 * ```ts
 * import { besselI0ComplexScaled, complex } from "fluxwright";
 * console.log(Number.isFinite(besselI0ComplexScaled(complex(5000, 5000)).re)); // true
 * ```
 * @category Bessel functions
 */
export function besselI0ComplexScaled(z: Complex): Complex {
  const o = iScaledAnywhere(z.re, z.im);
  return { re: o.i0r, im: o.i0i };
}

/**
 * Exponentially scaled $e^{-|\mathrm{Re}\,z|} I_1(z)$, finite for every z.
 *
 * $$
 * \tilde I_1(z) = e^{-|\mathrm{Re}\,z|}\, I_1(z)
 * $$
 *
 * Accuracy ≤ 5e-15 relative to the modulus (envelope near zeros) vs mpmath.
 *
 * @param z - argument [dimensionless]
 * @returns e^{−|Re z|} I₁(z)
 * @see NIST DLMF 10.40.5
 * @example
 * ```ts
 * import { besselI1ComplexScaled, complex } from "fluxwright";
 * console.log(besselI1ComplexScaled(complex(0, 0)).re); // 0
 * ```
 * @category Bessel functions
 */
export function besselI1ComplexScaled(z: Complex): Complex {
  const o = iScaledAnywhere(z.re, z.im);
  return { re: o.i1r, im: o.i1i };
}

/**
 * Bessel function of the first kind J₀(z) of complex argument, via $J_0(z) = I_0(-iz)$.
 *
 * $$
 * J_0(z) = \sum_{k=0}^\infty \frac{(-z^2/4)^k}{(k!)^2}
 * $$
 *
 * Domain: every complex z; overflows for |Im z| ≳ 713. Accuracy ≤ 5e-15 relative to |J₀(z)|,
 * or to the envelope $e^{|\mathrm{Im}\,z|}/\sqrt{2\pi|z|}$ near zeros, vs mpmath.
 *
 * @param z - argument [dimensionless]
 * @returns J₀(z)
 * @see NIST DLMF 10.27.6 (J in terms of I), 10.2.2
 * @example
 * ```ts
 * import { besselJ0Complex, complex } from "fluxwright";
 * console.log(besselJ0Complex(complex(2.404825557695773, 0)).re); // ≈ 0
 * ```
 * @category Bessel functions
 */
export function besselJ0Complex(z: Complex): Complex {
  return besselI0Complex({ re: z.im, im: -z.re });
}

/**
 * Bessel function of the first kind J₁(z) of complex argument, via $J_1(z) = i\,I_1(-iz)$.
 *
 * $$
 * J_1(z) = \frac{z}{2}\sum_{k=0}^\infty \frac{(-z^2/4)^k}{k!\,(k+1)!}
 * $$
 *
 * Domain: every complex z; overflows for |Im z| ≳ 713. Accuracy as {@link besselJ0Complex}.
 *
 * @param z - argument [dimensionless]
 * @returns J₁(z)
 * @see NIST DLMF 10.27.6, 10.2.2
 * @example
 * ```ts
 * import { besselJ1Complex, complex } from "fluxwright";
 * console.log(besselJ1Complex(complex(1, 0)).re); // ≈ 0.4400505857
 * ```
 * @category Bessel functions
 */
export function besselJ1Complex(z: Complex): Complex {
  const v = besselI1Complex({ re: z.im, im: -z.re });
  return { re: -v.im, im: v.re };
}
