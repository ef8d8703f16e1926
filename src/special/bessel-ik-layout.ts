/**
 * The output layout of the modified-Bessel engine (`besselIKScaledInto` in bessel-core.ts) and the
 * tolerance its regions share: one place that the dispatcher and each region read.
 *
 * @packageDocumentation
 */

/** Relative size of the last term kept by the power and asymptotic series. */
export const EPS = 1e-17;

/**
 * Scaled modified Bessel functions at z (Re z ≥ 0):
 * i0 = e^{−Re z} I₀(z), i1 = e^{−Re z} I₁(z), k0 = e^{z} K₀(z), k1 = e^{z} K₁(z).
 */
export interface ScaledBesselIK {
  i0r: number;
  i0i: number;
  i1r: number;
  i1i: number;
  k0r: number;
  k0i: number;
  k1r: number;
  k1i: number;
}

/** Positions in the array written by `besselIKScaledInto`. */
export const IK_I0R = 0;
export const IK_I0I = 1;
export const IK_I1R = 2;
export const IK_I1I = 3;
export const IK_K0R = 4;
export const IK_K0I = 5;
export const IK_K1R = 6;
export const IK_K1I = 7;
