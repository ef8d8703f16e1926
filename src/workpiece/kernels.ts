/**
 * Private numerical kernels of the workpiece module (not exported from the package):
 * the radial coil integral $\int_0^x t J_1(t)\,dt$ and the scaled tail $e^x\int_x^\infty tK_1(t)\,dt$.
 *
 * @packageDocumentation
 */
import { besselJ0, besselJ1 } from "../special/index.js";
import { gaussLegendreRule } from "../special/internal.js";

/**
 * Re-exported from the numerical toolkit for the work-coil files, which import it from here.
 * New code imports it from `special/internal.ts`.
 */
export { gaussLegendreRule };

const STRUVE_RULE = gaussLegendreRule(20);

/**
 * $\int_0^x t J_1(t)\,dt$ for x ≥ 0, ≤ 2e-14 absolute (times max(1, √x)).
 *
 * x ≤ 10: the power series $\sum_k (-1)^k x^{2k+3}/(2^{2k+1}k!(k+1)!(2k+3))$.
 * x > 10 (asymptotic series of the same integrals from x = 30): $1 + \tfrac{\pi x}{2}[J_1(x)S_0(x) - J_0(x)S_1(x)]$ with $S_\nu = \mathbf{H}_\nu - Y_\nu$
 * (Struve minus Neumann; the Wronskian removes $Y$), from their Laplace integrals
 * $S_0 = \tfrac{2}{\pi}\int_0^\infty e^{-x\sinh u}du$, $S_1 = \tfrac{2x}{\pi}\int_0^\infty e^{-x\sinh u}\cosh^2u\,du$
 * by 20-point Gauss–Legendre on $[0, \operatorname{asinh}(40/x)]$, tabulated once as Chebyshev series on [10, 30].
 */
export function besselJ1Moment(x: number): number {
  if (x <= 10) {
    const x2 = x * x;
    // term_k = (-1)^k x^(2k+3) / (2^(2k+1) k! (k+1)!), divided by (2k+3) when summed
    let t = (x2 * x) / 2;
    let sum = t / 3;
    for (let k = 1; k < 60; k++) {
      t *= -x2 / (4 * k * (k + 1));
      const add = t / (2 * k + 3);
      sum += add;
      if (Math.abs(add) < 1e-17 * Math.abs(sum) && k > 3) break;
    }
    return sum;
  }
  if (x >= 30) {
    // asymptotic series of the Laplace integrals: terms ((2k-1)!!)^2 / x^(2k+1) and
    // (2k-3)!!(2k-1)!! / x^(2k+1), alternating; 13 terms reach 1e-14 at x = 30
    const inv2 = 1 / (x * x);
    let a0 = 1 / x; // k = 0 term of the S0 sum
    let a1 = 1 / x; // k = 0 term of the S1 sum
    let sum0 = a0;
    let sum1 = a1;
    for (let k = 1; k <= 13; k++) {
      a0 *= -((2 * k - 1) * (2 * k - 1)) * inv2;
      a1 *= k === 1 ? inv2 : -((2 * k - 3) * (2 * k - 1)) * inv2;
      sum0 += a0;
      sum1 += a1;
    }
    const s0 = (2 / Math.PI) * sum0;
    const s1 = ((2 * x) / Math.PI) * sum1;
    return 1 + ((Math.PI * x) / 2) * (besselJ1(x) * s0 - besselJ0(x) * s1);
  }
  // 10 < x < 30: Chebyshev interpolants of x·S0(x) and S1(x) (built once from the Laplace
  // integrals by Gauss–Legendre quadrature, see struveLaplace)
  const y = (x - 20) / 10;
  const s0 = chebyshevValue(CHEB_S0, y) / x;
  const s1 = chebyshevValue(CHEB_S1, y);
  return 1 + ((Math.PI * x) / 2) * (besselJ1(x) * s0 - besselJ0(x) * s1);
}

/** x·S0(x) and S1(x), S_ν = H_ν − Y_ν, from their Laplace integrals by 20-point Gauss–Legendre (x ≥ 10: ≤ 1e-13). */
function struveLaplace(x: number): [number, number] {
  const upper = Math.asinh(40 / x);
  const half = upper / 2;
  const nodes = STRUVE_RULE.nodes;
  const weights = STRUVE_RULE.weights;
  let s0 = 0;
  let s1 = 0;
  for (let i = 0; i < 20; i++) {
    const u = half * (nodes[i]! + 1);
    const e = Math.exp(-x * Math.sinh(u)) * weights[i]!;
    const c = Math.cosh(u);
    s0 += e;
    s1 += e * c * c;
  }
  return [((2 * x) / Math.PI) * half * s0, ((2 * x) / Math.PI) * half * s1];
}

const CHEB_DEGREE = 28;

/** Chebyshev coefficients on [10, 30] of one component of struveLaplace. */
function chebyshevFit(component: 0 | 1): Float64Array {
  const n = CHEB_DEGREE + 1;
  const values = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const y = Math.cos((Math.PI * (k + 0.5)) / n);
    values[k] = struveLaplace(20 + 10 * y)[component];
  }
  const c = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    let sum = 0;
    for (let k = 0; k < n; k++) sum += values[k]! * Math.cos((Math.PI * j * (k + 0.5)) / n);
    c[j] = ((j === 0 ? 1 : 2) / n) * sum;
  }
  return c;
}

/** Clenshaw evaluation of a Chebyshev series at y in [-1, 1]. */
function chebyshevValue(c: Float64Array, y: number): number {
  let b1 = 0;
  let b2 = 0;
  const y2 = 2 * y;
  for (let j = c.length - 1; j >= 1; j--) {
    const b0 = y2 * b1 - b2 + c[j]!;
    b2 = b1;
    b1 = b0;
  }
  return y * b1 - b2 + c[0]!;
}

const CHEB_S0 = chebyshevFit(0);
const CHEB_S1 = chebyshevFit(1);

/**
 * $\int_0^x t J_1(t)\,dt / x^3$, finite at x = 0 (value 1/6); used where the coil integral is
 * divided by powers of the separation constant.
 */
export function besselJ1MomentOverCube(x: number): number {
  if (x < 1) {
    const x2 = x * x;
    let t = 0.5;
    let sum = t / 3;
    for (let k = 1; k < 30; k++) {
      t *= -x2 / (4 * k * (k + 1));
      const add = t / (2 * k + 3);
      sum += add;
      if (Math.abs(add) < 1e-17 * Math.abs(sum)) break;
    }
    return sum;
  }
  return besselJ1Moment(x) / (x * x * x);
}

/** Coefficients c_n of I1(z)/I0(z) ~ Σ c_n z^(−n) (from y' = 1 − y/z − y²: c_{n+1} = ((n−1)c_n − Σ_{i=1}^{n} c_i c_{n+1−i})/2). */
const RATIO_ASYMPTOTIC = ((): Float64Array => {
  const c = new Float64Array(19);
  c[0] = 1;
  for (let n = 0; n < 18; n++) {
    let s = 0;
    for (let i = 1; i <= n; i++) s += c[i]! * c[n + 1 - i]!;
    c[n + 1] = ((n - 1) * c[n]! - s) / 2;
  }
  return c;
})();

/** Taylor coefficients b_m (odd m = 2k+1) of I1(z)/I0(z) (from (m+1) b_m = −Σ_{i+j=m−1} b_i b_j). */
const RATIO_SERIES = ((): Float64Array => {
  const b = new Float64Array(48); // b[m], odd m used
  b[1] = 0.5;
  for (let m = 3; m < 48; m += 2) {
    let s = 0;
    for (let i = 1; i <= m - 2; i += 2) s += b[i]! * b[m - 1 - i]!;
    b[m] = -s / (m + 1);
  }
  return b;
})();

/** Continued-fraction start beyond |z| (measured: 14 already reaches 2e-16). */
const TAIL = 20;

/**
 * Baker's p + jq = (1+j) I1(z)/I0(z) at z = (1+j)u, u ≥ 0 (radius over skin depth), ≤ 5e-16
 * relative to |p + jq|, and p and q − u (`qExcess`) without cancellation for small u.
 *
 * u ≤ 0.3: Taylor series, with (1+j) z^(2k+1) = (2j)^(k+1) u^(2k+1) split into p and q;
 * 0.3 < u < 30: backward recurrence of the continued fraction r_n = 1/(2n/z + r_{n+1}),
 * 2n/z = (n/u)(1 − j), from n = |z| + 20; u ≥ 20: 19 terms of the asymptotic series
 * (the second exponential is e^(−2u) < 1e-17 relative there).
 */
export function bakerPQ(u: number): { p: number; q: number; qExcess: number } {
  if (u <= 0.3) {
    // (2j)^(k+1): k = 0 → 2j, 1 → −4, 2 → −8j, 3 → 16, ...
    const u2 = u * u;
    let q = 0; // all q terms but the first, which is exactly u
    let pow = u * u * u * u * u; // u^(2k+1), from k = 2
    let mag = 8; // |(2j)^(k+1)|, from k = 2
    // k = 1 term: p = −4 b_3 u³ = u³/4
    let p = -4 * RATIO_SERIES[3]! * u * u * u;
    for (let k = 2; k < 23; k++) {
      const term = RATIO_SERIES[2 * k + 1]! * mag * pow;
      switch (k & 3) {
        case 0:
          q += term;
          break;
        case 1:
          p -= term;
          break;
        case 2:
          q -= term;
          break;
        default:
          p += term;
      }
      pow *= u2;
      mag *= 2;
      if (Math.abs(term) < 1e-18 * u) break;
    }
    return { p, q: u + q, qExcess: q };
  }
  let rRe: number;
  let rIm: number;
  if (u < 20) {
    rRe = 0;
    rIm = 0;
    const top = Math.ceil(1.4142135623730951 * u) + TAIL;
    const inv = 1 / u;
    for (let n = top; n >= 1; n--) {
      const dRe = n * inv + rRe;
      const dIm = -n * inv + rIm;
      const d2 = dRe * dRe + dIm * dIm;
      rRe = dRe / d2;
      rIm = -dIm / d2;
    }
  } else {
    // w = 1/z = (1 − j)/(2u); Horner in w
    const wRe = 0.5 / u;
    const wIm = -0.5 / u;
    rRe = 0;
    rIm = 0;
    for (let n = 18; n >= 0; n--) {
      const tRe = rRe * wRe - rIm * wIm + RATIO_ASYMPTOTIC[n]!;
      rIm = rRe * wIm + rIm * wRe;
      rRe = tRe;
    }
  }
  // (1 + j) r
  const q = rRe + rIm;
  return { p: rRe - rIm, q, qExcess: q - u };
}

/**
 * $e^{x}\int_x^\infty tK_1(t)\,dt$ for x > 0, from
 * $\int_x^\infty tK_1 = \int_0^\infty e^{-x\cosh u}\,(x\cosh u + 1)/\cosh u\,du$ by the trapezoid
 * rule (even analytic integrand: exponential convergence), ≤ 1e-14 relative. The winding
 * moment of the coils encircling a rod (`encircling-coil.ts`, `encircling-coil-prepared.ts`).
 */
export function besselK1MomentTailScaled(x: number): number {
  const h = Math.min(0.25, 0.7 / Math.sqrt(x));
  let sum = 0.5 * (x + 1);
  for (let k = 1; k < 2000; k++) {
    const u = k * h;
    const c = Math.cosh(u);
    const e = Math.exp(-x * (c - 1));
    const term = (e * (x * c + 1)) / c;
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return sum * h;
}
