/**
 * The ratio I₁(z)/I₀(z) of complex argument without overflow, as an object and written into an
 * array (the hot-path form).
 *
 * @packageDocumentation
 */
import { IK_I0I, IK_I0R, IK_I1I, IK_I1R, besselIKScaledInto } from "./bessel-core.js";
import type { Complex } from "./complex.js";

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
