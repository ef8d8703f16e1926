/**
 * Internal engine for the modified Bessel functions I₀, I₁, K₀, K₁ of complex argument
 * z with Re z ≥ 0, in exponentially scaled form. Every public Bessel and Kelvin function
 * of this module is built on it.
 *
 * Three regions by |z|:
 * - |z| ≤ 1.5, or |z| ≤ 2 with |Im z| ≥ |Re z|: power series (A&S 9.6.10, 9.6.11, 9.6.13),
 *   which cancel little there;
 * - elsewhere below |z| = 19: K₀, K₁ by Steed's continued fraction CF2 (Thompson & Barnett 1987),
 *   I₁/I₀ by the continued fraction CF1 (modified Lentz), and I₀ from the Wronskian
 *   I₀K₁ + I₁K₀ = 1/z. No power series is used where it would cancel;
 * - |z| ≥ 19: the Hankel asymptotic expansions (DLMF 10.40.1, 10.40.2, 10.40.5) including
 *   the exponentially small second exponential of I, which matters off the real axis (for
 *   z = x·e^{iπ/4}, at |z| = 19 it is 5e-12 relative). The smallest term of the series is
 *   about e^{−2|z|} ≤ 3e-17 there.
 *
 * Each region has its own file (bessel-ik-series.ts, bessel-ik-continued-fraction.ts,
 * bessel-ik-asymptotic.ts); the output layout is in bessel-ik-layout.ts.
 *
 * @packageDocumentation
 */

import { asymptoticRegion } from "./bessel-ik-asymptotic.js";
import { continuedFractionRegion } from "./bessel-ik-continued-fraction.js";
import { IK_I0I, IK_I0R, IK_I1I, IK_I1R, IK_K0I, IK_K0R, IK_K1I, IK_K1R, type ScaledBesselIK } from "./bessel-ik-layout.js";
import { seriesRegion } from "./bessel-ik-series.js";

/** Below this modulus: power series. */
export const SERIES_RADIUS = 1.5;
/** From this modulus on: asymptotic expansions. */
export const ASYMPTOTIC_RADIUS = 19;

export { IK_I0I, IK_I0R, IK_I1I, IK_I1R, IK_K0I, IK_K0R, IK_K1I, IK_K1R } from "./bessel-ik-layout.js";
export type { ScaledBesselIK } from "./bessel-ik-layout.js";

/** Scratch of {@link besselIKScaled}: the object is built from it. */
const scratch = new Float64Array(8);

/**
 * Scaled I₀, I₁ (and K₀, K₁ when `withK`) at z = zr + i·zi with zr ≥ 0, |z| > 0 for K.
 * K fields are NaN when `withK` is false and the region does not need them.
 */
export function besselIKScaled(zr: number, zi: number, withK: boolean): ScaledBesselIK {
  besselIKScaledInto(zr, zi, withK, scratch);
  return {
    i0r: scratch[IK_I0R]!,
    i0i: scratch[IK_I0I]!,
    i1r: scratch[IK_I1R]!,
    i1i: scratch[IK_I1I]!,
    k0r: scratch[IK_K0R]!,
    k0i: scratch[IK_K0I]!,
    k1r: scratch[IK_K1R]!,
    k1i: scratch[IK_K1I]!,
  };
}

/**
 * {@link besselIKScaled} without allocation: writes i0r, i0i, i1r, i1i, k0r, k0i, k1r, k1i into
 * out[0 … 7] (indices `IK_*`); the same numbers, bit for bit. The I values do not depend on
 * `withK`, so one call with `withK` true serves every one of the four functions at z.
 */
export function besselIKScaledInto(zr: number, zi: number, withK: boolean, out: Float64Array): void {
  const az = Math.abs(zr) + Math.abs(zi);
  const r = az < 1e150 && az > 1e-150 ? Math.sqrt(zr * zr + zi * zi) : Math.hypot(zr, zi);
  // Steed's CF2 converges poorly near the imaginary axis for |z| < 2 (Numerical Recipes uses it
  // only from x = 2 on the real line of J and Y); there the series cancels little, so use it.
  if (r <= SERIES_RADIUS || (r <= 2 && Math.abs(zi) >= Math.abs(zr))) seriesRegion(zr, zi, r, withK, out);
  else if (r < ASYMPTOTIC_RADIUS) continuedFractionRegion(zr, zi, r, out);
  else asymptoticRegion(zr, zi, r, out);
}
