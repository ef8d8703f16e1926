/**
 * Private numerical kernels of the inductance module: Maxwell's mutual inductance of coaxial
 * circular filaments and Nagaoka's coefficient, both written on the arithmetic–geometric mean
 * (the iterated Gauss/Landen transformation) so that no difference of nearly equal elliptic
 * integrals is ever formed. Not part of the public surface.
 *
 * Why not `ellipticK`/`ellipticE` directly: Maxwell's bracket $(1 - m/2)K - E$ is $O(m^2)$ for
 * far filaments and Nagaoka's $E - k$ is $O(k'^2 \ln k')$ for short coils; formed from K and E
 * they lose all digits at the domain edges. The AGM gives each bracket as a sum of positive
 * terms. The public functions are cross-checked against `ellipticK`/`ellipticE` in the tests.
 *
 * @packageDocumentation
 */

const HALF_PI = Math.PI / 2;

/**
 * Maxwell's mutual inductance of two coaxial circular filaments divided by μ₀ [m].
 *
 * $M/\mu_0 = \frac{4ab}{\sqrt{s}}\,K(m)\sum_{n\ge1}2^{n-1}(c_n/k)^2$, with
 * $s = (a+b)^2 + z^2$, $m = k^2 = 4ab/s$, $k' = \sqrt{((a-b)^2+z^2)/s}$ and the AGM sequence
 * $a_0 = 1$, $b_0 = k'$, $c_1 = (1-k')/2 = m/(2(1+k'))$, $c_{n+1} = c_n^2/(4a_{n+1})$; this is
 * $\sqrt{ab}\,(2/k)\,[(1 - m/2)K - E]$ without cancellation.
 * Returns Infinity for coincident filaments (a = b, z = 0).
 */
export function maxwellOverMu0(a: number, b: number, z: number): number {
  const sum = a + b;
  const dif = a - b;
  const s = sum * sum + z * z;
  const rs = Math.sqrt(s);
  const kp = Math.sqrt(dif * dif + z * z) / rs;
  if (kp === 0) return Infinity;
  const k = (2 * Math.sqrt(a * b)) / rs;
  let an = 0.5 * (1 + kp);
  let bn = Math.sqrt(kp);
  let c = (0.5 * k * k) / (1 + kp); // c_1
  let ch = (0.5 * k) / (1 + kp); // c_1 / k
  let w = 1;
  let acc = ch * ch;
  while (c > 1e-4 * an) {
    const a2 = 0.5 * (an + bn);
    bn = Math.sqrt(an * bn);
    const q = 0.25 / a2;
    c = c * c * q;
    ch = k * ch * ch * q;
    an = a2;
    w += w;
    acc += w * ch * ch;
  }
  // one more step needs no square root: with c_n ≤ 1e-4 a_n, c_{n+1} ≤ 2.5e-9 a and the
  // terms after it (c_{n+2} ~ 1e-18 a) are below double precision
  const agm = 0.5 * (an + bn);
  const chLast = (k * ch * ch * 0.25) / agm;
  acc += 2 * w * chLast * chLast;
  return ((4 * a * b) / rs) * (HALF_PI / agm) * acc;
}

/**
 * Nagaoka's coefficient for x = diameter/length > 0 (finite), cancellation-free.
 *
 * $K_N = \frac{4}{3\pi k'}\left[\frac{k'^2}{k^2}(K - E) + E - k\right]$, $k = x/\sqrt{1+x^2}$,
 * $k' = 1/\sqrt{1+x^2}$. With the AGM of (1, k'): $(K - E)/m = K\,(1/2 + \sum_{n\ge1}2^{n-1}(c_n/k)^2)$.
 * For x ≤ 1, $E = K - m\,(K-E)/m$ and E − k has no cancellation. For x > 1 the bracket is
 * written as $\frac{k'^2}{k^2}(K-E) + (E - 1) + \frac{k'^2}{1+k}$ with, from Legendre's relation and
 * the complementary AGM of (1, k) ($c'_1 = (1-k)/2$, $c'_0 = k'$),
 * $E - 1 = -\sum_{n\ge1}c'_n + K\sum_{n\ge0}2^{n-1}c_n'^2$: every term positive or dominated.
 */
export function nagaokaKernel(x: number): number {
  if (x > 1e100) {
    // short-coil limit, relative error O(k'^2 ln k') < 1e-190
    return (2 * (Math.log(4 * x) - 0.5)) / (Math.PI * x);
  }
  const h = Math.sqrt(x * x + 1);
  const k = x / h;
  const kp = 1 / h;
  if (kp < 1e-100) {
    // short-coil limit, relative error O(k'^2 ln k') < 1e-190
    return (2 * kp * (Math.log(4 / kp) - 0.5)) / Math.PI;
  }
  const m = k * k;
  const m1 = kp * kp;
  // AGM of (1, k'): K(m) and sum 2^{n-1} (c_n/k)^2, n >= 1
  let an = 0.5 * (1 + kp);
  let bn = Math.sqrt(kp);
  let c = (0.5 * m) / (1 + kp);
  let ch = (0.5 * k) / (1 + kp);
  let w = 1;
  let acc = ch * ch;
  while (c > 1e-4 * an) {
    const a2 = 0.5 * (an + bn);
    bn = Math.sqrt(an * bn);
    const q = 0.25 / a2;
    c = c * c * q;
    ch = k * ch * ch * q;
    an = a2;
    w += w;
    acc += w * ch * ch;
  }
  // final step without a square root (see maxwellOverMu0)
  const agmLast = 0.5 * (an + bn);
  const chLast = (k * ch * ch * 0.25) / agmLast;
  acc += 2 * w * chLast * chLast;
  const bigK = HALF_PI / agmLast;
  const kMinusEOverM = bigK * (0.5 + acc);
  let bracket: number;
  if (x <= 1) {
    const e = bigK - m * kMinusEOverM;
    bracket = m1 * kMinusEOverM + (e - k);
  } else {
    // complementary AGM of (1, k): sums of c'_n (n >= 1) and 2^{n-1} c'_n^2 (n >= 0)
    let ap = 0.5 * (1 + k);
    let bp = Math.sqrt(k);
    let cp = (0.5 * m1) / (1 + k);
    let sumC = cp;
    let wp = 1;
    let sumC2 = 0.5 * m1 + cp * cp;
    while (cp > 1e-4 * ap) {
      const a2 = 0.5 * (ap + bp);
      bp = Math.sqrt(ap * bp);
      cp = (cp * cp * 0.25) / a2;
      ap = a2;
      wp += wp;
      sumC += cp;
      sumC2 += wp * cp * cp;
    }
    // final step without a square root
    const cpLast = (cp * cp * 0.25) / (0.5 * (ap + bp));
    sumC += cpLast;
    sumC2 += 2 * wp * cpLast * cpLast;
    const eMinusOne = bigK * sumC2 - sumC;
    bracket = m1 * kMinusEOverM + eMinusOne + m1 / (1 + k);
  }
  return (4 * bracket) / (3 * Math.PI * kp);
}
