/**
 * Bessel functions J₀, J₁, I₀, I₁, K₀, K₁ of complex argument, their exponentially scaled
 * forms and the overflow-free ratio I₁/I₀.
 *
 * @packageDocumentation
 */
import { IK_I0I, IK_I0R, IK_I1I, IK_I1R, besselIKScaled, besselIKScaledInto, type ScaledBesselIK } from "./bessel-core.js";
import type { Complex } from "./complex.js";

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

const nanComplex = (): Complex => ({ re: NaN, im: NaN });

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

/**
 * The ratio I₁(z)/I₀(z) of complex argument, computed from the scaled functions so that it
 * never overflows: the quantity behind the internal impedance of a round conductor or bar
 * in an axial field, where z = (1 + i)·r/δ reaches 10⁴ and more.
 *
 * $$
 * \frac{I_1(z)}{I_0(z)} \to 1 - \frac{1}{2z} + O(z^{-2}) \quad (\mathrm{Re}\,z \to \infty)
 * $$
 *
 * Domain: every complex z except the zeros of I₀ (on the imaginary axis), where the ratio
 * has poles. Odd in z. Accuracy ≤ 5e-15 relative vs mpmath for Re z ≥ 0 away from the
 * imaginary axis (fixture test/fixtures/special/bessel-complex.json).
 *
 * @param z - argument [dimensionless]
 * @returns I₁(z)/I₀(z) [dimensionless]
 * @see NIST DLMF 10.40.1
 * @example
 * ```ts
 * import { besselI1OverI0Complex, complex } from "fluxwright";
 * const r = besselI1OverI0Complex(complex(1e4, 1e4));
 * console.log(r.re.toFixed(6), r.im.toFixed(6)); // 0.999975 0.000025
 * ```
 * @category Bessel functions
 */
export function besselI1OverI0Complex(z: Complex): Complex {
  besselI1OverI0ComplexInto(z.re, z.im, ratioOut);
  return { re: ratioOut[0]!, im: ratioOut[1]! };
}

const ratioOut = new Float64Array(2);
const ratioScratch = new Float64Array(8);

/**
 * {@link besselI1OverI0Complex} at z = zr + i·zi without allocation: writes the real and
 * imaginary parts into out[0], out[1] (the same numbers, bit for bit). Internal (`special/internal`).
 */
export function besselI1OverI0ComplexInto(zr: number, zi: number, out: Float64Array): void {
  const o = ratioScratch;
  // I for any z, by the reflection I_ν(−z) = (−1)^ν I_ν(z), as iScaledAnywhere
  let s = 1;
  if (zr < 0) {
    besselIKScaledInto(-zr, -zi, false, o);
    s = -1;
  } else {
    besselIKScaledInto(zr, zi, false, o);
  }
  const i0r = o[IK_I0R]!;
  const i0i = o[IK_I0I]!;
  const i1r = s === 1 ? o[IK_I1R]! : -o[IK_I1R]!;
  const i1i = s === 1 ? o[IK_I1I]! : -o[IK_I1I]!;
  const d = i0r * i0r + i0i * i0i;
  if (Math.abs(i0r) >= Math.abs(i0i)) {
    const t = i0i / i0r;
    const den = i0r + i0i * t;
    out[0] = (i1r + i1i * t) / den;
    out[1] = (i1i - i1r * t) / den;
    return;
  }
  out[0] = (i1r * i0r + i1i * i0i) / d;
  out[1] = (i1i * i0r - i1r * i0i) / d;
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
