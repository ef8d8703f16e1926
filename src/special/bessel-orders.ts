/**
 * Ratios of consecutive modified Bessel functions of integer order and complex argument,
 * $I_{n+1}(z)/I_n(z)$ and $K_{n+1}(z)/K_n(z)$ for n = 0 … N (Re z > 0): what a multipole
 * (cylindrical-harmonic) expansion of the field in and around round conductors needs. Ratios,
 * not values, so that no order overflows or underflows at small or large |z| (the values
 * themselves span hundreds of decades over n ≤ 60 at |z| = 1e-6).
 *
 * Method: $K_1/K_0$ and $I_1/I_0$ from the scaled order-0/1 engine ({@link besselIKComplexScaled});
 * K ratios by the forward recurrence $K_{n+1}/K_n = K_{n-1}/K_n + 2n/z$ (K's stable
 * direction, DLMF 10.29.1); I ratios by the continued fraction
 * $I_{n+1}/I_n = 1/(2(n+1)/z + I_{n+2}/I_{n+1})$ run backwards from an order
 * max(N, |z|) + 40 (DLMF 10.33.1; the form of Miller's algorithm). Accuracy: ≤ 1e-13 relative
 * vs mpmath for 1e-6 ≤ |z| ≤ 1e4 on the rays arg z = 0 and π/4, n ≤ 60 (fixture
 * test/fixtures/toolkit/bessel-ratios.json).
 *
 * @packageDocumentation
 */
import { besselIKComplexScaled } from "./bessel-complex.js";

/** Extra orders above max(N, |z|) where the backward continued fraction starts. */
const MILLER_MARGIN = 40;

/**
 * Fill `iRe, iIm` with $I_{n+1}(z)/I_n(z)$ and `kRe, kIm` with $K_{n+1}(z)/K_n(z)$ for
 * n = 0 … nMax (arrays of length ≥ nMax + 1). Re z > 0; returns `false` (arrays untouched
 * beyond NaN) when the order-0/1 kernels fail.
 */
export function besselIKRatiosComplex(
  zRe: number,
  zIm: number,
  nMax: number,
  iRe: Float64Array,
  iIm: Float64Array,
  kRe: Float64Array,
  kIm: Float64Array,
): boolean {
  const b = besselIKComplexScaled({ re: zRe, im: zIm });
  if (!Number.isFinite(b.i0r) || !Number.isFinite(b.k0r)) return false;
  const m2 = zRe * zRe + zIm * zIm;
  const wRe = zRe / m2; // 1/z
  const wIm = -zIm / m2;
  // K1/K0 (same scaling factor e^z on both)
  let d2 = b.k0r * b.k0r + b.k0i * b.k0i;
  let rRe = (b.k1r * b.k0r + b.k1i * b.k0i) / d2;
  let rIm = (b.k1i * b.k0r - b.k1r * b.k0i) / d2;
  kRe[0] = rRe;
  kIm[0] = rIm;
  for (let n = 1; n <= nMax; n++) {
    // K_{n+1}/K_n = 1/(K_n/K_{n-1}) + 2n/z
    d2 = rRe * rRe + rIm * rIm;
    const nextRe = rRe / d2 + 2 * n * wRe;
    const nextIm = -rIm / d2 + 2 * n * wIm;
    rRe = nextRe;
    rIm = nextIm;
    kRe[n] = rRe;
    kIm[n] = rIm;
  }
  // I ratios backwards
  const start = nMax + Math.ceil(Math.sqrt(m2)) + MILLER_MARGIN;
  rRe = 0;
  rIm = 0;
  for (let n = start; n >= 1; n--) {
    const dRe = 2 * (n + 1) * wRe + rRe;
    const dIm = 2 * (n + 1) * wIm + rIm;
    d2 = dRe * dRe + dIm * dIm;
    rRe = dRe / d2;
    rIm = -dIm / d2;
    if (n <= nMax) {
      iRe[n] = rRe;
      iIm[n] = rIm;
    }
  }
  // I1/I0 from the engine (more accurate near the real axis than the continued fraction's end)
  d2 = b.i0r * b.i0r + b.i0i * b.i0i;
  iRe[0] = (b.i1r * b.i0r + b.i1i * b.i0i) / d2;
  iIm[0] = (b.i1i * b.i0r - b.i1r * b.i0i) / d2;
  return true;
}
