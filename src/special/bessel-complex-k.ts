/**
 * Modified Bessel functions of the second kind K₀, K₁ of complex argument (Re z ≥ 0), their
 * exponentially scaled forms, and the four scaled functions I₀, I₁, K₀, K₁ from one evaluation.
 *
 * @packageDocumentation
 */
import { besselIKScaled } from "./bessel-core.js";
import type { Complex } from "./complex.js";

const nanComplex = (): Complex => ({ re: NaN, im: NaN });

/**
 * Modified Bessel function of the second kind K₀(z) of complex argument, Re z ≥ 0.
 *
 * $$
 * K_0(z) = \int_0^\infty e^{-z\cosh t}\,dt \quad (\mathrm{Re}\,z > 0)
 * $$
 *
 * Domain: Re z ≥ 0, z ≠ 0 (K₀(0) = +∞; NaN for Re z < 0, beyond the principal branch this
 * module supports). Underflows for Re z ≳ 745 (use {@link besselK0ComplexScaled}).
 * Accuracy ≤ 5e-15 relative to |K₀(z)| vs mpmath (envelope-relative near zeros on the
 * imaginary axis, where K₀ is a Hankel function).
 *
 * @param z - argument, Re z ≥ 0 [dimensionless]
 * @returns K₀(z)
 * @see NIST DLMF 10.31.2, 10.40.2; Thompson & Barnett (1987) (CF2)
 * @example
 * ```ts
 * import { besselK0Complex, complex } from "fluxwright";
 * console.log(besselK0Complex(complex(1, 0)).re); // ≈ 0.4210244382
 * ```
 * @category Bessel functions
 */
export function besselK0Complex(z: Complex): Complex {
  const s = besselK0ComplexScaled(z);
  return unscaleK(s, z);
}

/**
 * Modified Bessel function of the second kind K₁(z) of complex argument, Re z ≥ 0.
 *
 * $$
 * K_1(z) = -K_0'(z) = \int_0^\infty e^{-z\cosh t}\cosh t\,dt \quad (\mathrm{Re}\,z > 0)
 * $$
 *
 * Domain: Re z ≥ 0, z ≠ 0 (K₁(0) = +∞; NaN for Re z < 0). Accuracy as {@link besselK0Complex}.
 *
 * @param z - argument, Re z ≥ 0 [dimensionless]
 * @returns K₁(z)
 * @see NIST DLMF 10.32.8, 10.40.2
 * @example
 * ```ts
 * import { besselK1Complex, complex } from "fluxwright";
 * console.log(besselK1Complex(complex(1, 0)).re); // ≈ 0.6019072302
 * ```
 * @category Bessel functions
 */
export function besselK1Complex(z: Complex): Complex {
  const s = besselK1ComplexScaled(z);
  return unscaleK(s, z);
}

function unscaleK(s: Complex, z: Complex): Complex {
  if (!Number.isFinite(s.re)) return s;
  // e^{−z}·s
  const e = Math.exp(-z.re);
  const c = Math.cos(z.im) * e;
  const n = -Math.sin(z.im) * e;
  return { re: s.re * c - s.im * n, im: s.re * n + s.im * c };
}

/**
 * Exponentially scaled $e^{z} K_0(z)$, finite for every Re z ≥ 0, z ≠ 0.
 *
 * $$
 * \tilde K_0(z) = e^{z} K_0(z) \sim \sqrt{\pi/(2z)}\quad(|z| \to \infty)
 * $$
 *
 * Accuracy ≤ 5e-15 relative to the modulus vs mpmath.
 *
 * @param z - argument, Re z ≥ 0 [dimensionless]
 * @returns e^{z} K₀(z); +∞ at z = 0, NaN for Re z < 0
 * @see NIST DLMF 10.40.2
 * @example
 * ```ts
 * import { besselK0ComplexScaled, complex } from "fluxwright";
 * console.log(besselK0ComplexScaled(complex(1e6, 0)).re); // ≈ 0.0012533139807
 * ```
 * @category Bessel functions
 */
export function besselK0ComplexScaled(z: Complex): Complex {
  if (!(z.re >= 0)) return nanComplex();
  if (z.re === 0 && z.im === 0) return { re: Infinity, im: 0 };
  const o = besselIKScaled(z.re, z.im, true);
  return { re: o.k0r, im: o.k0i };
}

/**
 * Exponentially scaled $e^{z} K_1(z)$, finite for every Re z ≥ 0, z ≠ 0.
 *
 * $$
 * \tilde K_1(z) = e^{z} K_1(z)
 * $$
 *
 * Accuracy ≤ 5e-15 relative to the modulus vs mpmath.
 *
 * @param z - argument, Re z ≥ 0 [dimensionless]
 * @returns e^{z} K₁(z); +∞ at z = 0, NaN for Re z < 0
 * @see NIST DLMF 10.40.2
 * @example
 * ```ts
 * import { besselK1ComplexScaled, complex } from "fluxwright";
 * console.log(besselK1ComplexScaled(complex(1e6, 0)).re); // ≈ 0.0012533146073
 * ```
 * @category Bessel functions
 */
export function besselK1ComplexScaled(z: Complex): Complex {
  if (!(z.re >= 0)) return nanComplex();
  if (z.re === 0 && z.im === 0) return { re: Infinity, im: 0 };
  const o = besselIKScaled(z.re, z.im, true);
  return { re: o.k1r, im: o.k1i };
}

/**
 * The four exponentially scaled modified Bessel functions $e^{-\mathrm{Re}\,z} I_0(z)$,
 * $e^{-\mathrm{Re}\,z} I_1(z)$, $e^{z} K_0(z)$, $e^{z} K_1(z)$ at one argument with Re z ≥ 0, from one
 * evaluation of the engine behind {@link besselI0ComplexScaled} and {@link besselK0ComplexScaled}
 * (a quarter of the cost of the four separate calls): what a transfer matrix across a
 * cylindrical shell needs at each radius.
 *
 * $$
 * \tilde I_\nu(z) = e^{-\mathrm{Re}\,z} I_\nu(z),\qquad \tilde K_\nu(z) = e^{z} K_\nu(z)\qquad (\nu = 0, 1)
 * $$
 *
 * Domain: Re z ≥ 0, z ≠ 0 (NaN fields otherwise, as the separate kernels). Accuracy: identical
 * to the separate functions (same computation), ≤ 5e-15 relative to the modulus vs mpmath.
 *
 * @param z - argument, Re z ≥ 0, z ≠ 0 [dimensionless]
 * @returns real and imaginary parts of the four scaled functions
 * @see NIST DLMF 10.40.1, 10.40.2; Thompson & Barnett (1987)
 * @example
 * ```ts
 * import { besselIKComplexScaled, complex } from "fluxwright";
 * const b = besselIKComplexScaled(complex(1, 0));
 * console.log(b.k0r); // ≈ 1.1444630798
 * ```
 * @category Bessel functions
 */
export function besselIKComplexScaled(z: Complex): ScaledBesselIKComplex {
  if (!(z.re >= 0) || (z.re === 0 && z.im === 0)) {
    return { i0r: NaN, i0i: NaN, i1r: NaN, i1i: NaN, k0r: NaN, k0i: NaN, k1r: NaN, k1i: NaN };
  }
  return besselIKScaled(z.re, z.im, true);
}

/**
 * Result of {@link besselIKComplexScaled}: real (`r`) and imaginary (`i`) parts of the scaled
 * $I_0, I_1, K_0, K_1$.
 *
 * @category Bessel functions
 */
export interface ScaledBesselIKComplex {
  /** Re of $e^{-\mathrm{Re}\,z} I_0(z)$. */
  i0r: number;
  /** Im of $e^{-\mathrm{Re}\,z} I_0(z)$. */
  i0i: number;
  /** Re of $e^{-\mathrm{Re}\,z} I_1(z)$. */
  i1r: number;
  /** Im of $e^{-\mathrm{Re}\,z} I_1(z)$. */
  i1i: number;
  /** Re of $e^{z} K_0(z)$. */
  k0r: number;
  /** Im of $e^{z} K_0(z)$. */
  k0i: number;
  /** Re of $e^{z} K_1(z)$. */
  k1r: number;
  /** Im of $e^{z} K_1(z)$. */
  k1i: number;
}
