/**
 * Private numerical kernels of the inductance module: Maxwell's mutual inductance of coaxial
 * circular filaments and Nagaoka's coefficient. Not part of the public surface.
 *
 * Why not `ellipticK`/`ellipticE` directly: Maxwell's bracket $(1 - m/2)K - E$ is $O(m^2)$ for
 * far filaments and Nagaoka's $E - k$ is $O(k'^2 \ln k')$ for short coils; formed from K and E
 * they lose all digits at the domain edges. Each kernel splits its domain so that every piece
 * is a short polynomial (Estrin's scheme) with at most one logarithm and one square root:
 *
 * - Maxwell's near filaments (m > 0.7, where the bracket is only mildly conditioned): the Cephes
 *   polynomials for K and E in the complementary parameter $m_1$ (S. L. Moshier, Cephes Math
 *   Library 2.8, ellpk.c and ellpe.c, as in src/special/elliptic.ts), with $m_1$ formed directly
 *   from the geometry, one $\ln m_1$ shared by K and E, and their four polynomials merged
 *   beforehand into the two polynomials of the bracket (exact combination of the published
 *   coefficients, rounded once);
 * - everywhere else (far filaments, long and short coils) the bracket itself as a convergent
 *   series of one-signed terms, replaced on its piece by a Chebyshev economisation (truncation
 *   below 3e-16 relative), so nothing cancels.
 *
 * Straight-line code without loops, in pieces small enough for the JavaScript engine to inline
 * into the caller (each piece stays under V8's 460-byte bytecode inlining limit, and a public
 * function with all its pieces under the 920-byte cumulative limit): a call that is not inlined
 * costs more than the arithmetic, as its double result has to be boxed. The coefficients come
 * from test/fixtures/inductance/kernels-coefficients.py (mpmath). The public functions are
 * cross-checked against mpmath fixtures and against `ellipticK`/`ellipticE` in the tests.
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";

/** μ₀ π/2 [H/m]: the current-sheet solenoid is $L = (\mu_0\pi/2)\,N^2 a\,(d/l)\,K_N$. */
export const MU_0_HALF_PI = (MU_0 * Math.PI) / 2;

/**
 * Maxwell's mutual inductance of two coaxial circular filaments divided by μ₀ [m].
 *
 * $M/\mu_0 = \sqrt{s}\,[(1 - m/2)K(m) - E(m)]$, $s = (a+b)^2 + z^2$, $m = 4ab/s$,
 * $m_1 = 1 - m = ((a-b)^2 + z^2)/s$ formed directly.
 *
 * - m > 0.7 ($m_1$ < 0.3): the bracket is $P(m_1) - \ln(m_1)\,Q(m_1)$, P and Q the Cephes
 *   polynomials of K and E combined as $P = \tfrac{1+m_1}{2}P_K - P_E$,
 *   $Q = \tfrac{1+m_1}{2}Q_K - m_1 Q_E$; the bracket loses at most a factor ≈ 10 to
 *   cancellation there (m = 0.7).
 * - m ≤ 0.7: the quadratic transformation of
 *   $(1-m/2)K - E = \frac{\pi m^2}{32}\, {}_2F_1(\tfrac32,\tfrac32;3;m)$ (DLMF 15.8.13, $c = 2b$) gives
 *   $M/\mu_0 = \frac{\pi}{8}\,u^2\sqrt{D}\;{}_2F_1(\tfrac34,\tfrac54;2;u^2)$ with
 *   $D = a^2 + b^2 + z^2$ and $u = 2ab/D = m/(2-m) \le 7/13$; the ${}_2F_1$ (≥ 1, positive
 *   series) by a degree-15 polynomial on $0 \le u^2 \le 49/169$.
 *
 * Returns Infinity for coincident filaments (a = b, z = 0).
 */
export function maxwellOverMu0(a: number, b: number, z: number): number {
  const sum = a + b;
  const dif = a - b;
  const z2 = z * z;
  const s = sum * sum + z2;
  const q = dif * dif + z2;
  return q < 0.3 * s ? maxwellNear(s, q) : maxwellFar(a, b, s, q);
}

/** Maxwell's M/μ₀ for m > 0.7 from s and q = (a − b)² + z² (see {@link maxwellOverMu0}). */
function maxwellNear(s: number, q: number): number {
  const y = q / s; // m1 (0 for coincident filaments: the log term gives Infinity)
  const lg = Math.log(y);
  const y2 = y * y;
  const y4 = y2 * y2;
  const y8 = y4 * y4;
  const p = -0.3068528194400547 + y * 0.298286795139539 + y2 * (0.006924173841134051 + y * 0.001079796106620137) + y4 * (0.00029557013454656876 + y * -9.405635618299016e-05 + y2 * (-0.0012420013197296834 + y * -0.0023685395732517397)) + y8 * (0.00022825879554930965 + y * 0.002618263764495433 + y2 * (0.0010555674750315012 + y * 6.899143230313662e-05));
  const r = 0.25 + y * 0.0625000000000471 + y2 * (0.0039062501283688555 + y * 0.0009766037796376799) + y4 * (0.0003846404353479222 + y * 0.00026556098124887195 + y2 * (0.0008377416517270811 + y * 0.002810789568953233)) + y8 * (0.004206722451484684 + y * 0.0024177559539052306 + y2 * (0.00043900081982774 + y * 1.4703947752429925e-05));
  return Math.sqrt(s) * (p - lg * r);
}

/** Maxwell's M/μ₀ for m ≤ 0.7 (see {@link maxwellOverMu0}). */
function maxwellFar(a: number, b: number, s: number, q: number): number {
  const d = 0.5 * (s + q); // a^2 + b^2 + z^2
  const u = (2 * a * b) / d;
  const w = u * u;
  const w2 = w * w;
  const w4 = w2 * w2;
  const w8 = w4 * w4;
  const f = 1.0 + w * 0.4687500000000013 + w2 * (0.30761718749962375 + w * 0.22911071781682635) + w4 * (0.1825726006049989 + w * 0.15176357187032483 + w2 * (0.12985486772338584 + w * 0.11351733495053568)) + w8 * (0.10033895017838654 + w * 0.09427407681237636 + w2 * (0.060003226063299595 + w * 0.17439281183384298) + w4 * (-0.24183789319710083 + w * 0.7325223972032289 + w2 * (-0.835324423320378 + w * 0.661637754479639)));
  // (pi/8) u^2 sqrt(D) F, with u sqrt(D) formed first (no underflow of u^2 for far filaments)
  return 0.39269908169872414 * u * (u * Math.sqrt(d)) * f;
}

/**
 * Nagaoka's coefficient for x = diameter/length > 0 (finite), cancellation-free.
 *
 * $K_N = \frac{4}{3\pi k'}\,B$, $B = \frac{k'^2}{k^2}(K - E) + E - k$, $k = x/\sqrt{1+x^2}$,
 * $k' = 1/\sqrt{1+x^2}$, $m = k^2$, $m_1 = k'^2 = 1/(1+x^2)$.
 *
 * - x < 1.4919 (m < 0.69, long coils): $B = \tfrac{3\pi}{4} - k - m\,S(m)$, where
 *   $(1-m)(K-E)/m + E = \tfrac{3\pi}{4} - m\,S(m)$ from the hypergeometric series of K and E
 *   (A&S 17.3.11, 17.3.12); S has positive Taylor coefficients
 *   $s_j = \tfrac{\pi}{2}\,a_{j+1}(2j+3)\bigl(\tfrac{1}{2j+1} - \tfrac{1}{2j+4}\bigr)$,
 *   $a_j = ((1/2)_j/j!)^2$; economised to degree 23 in $m - 0.34505$ (truncation below 3e-16 relative). B > 0.75
 *   here, so the subtraction costs nothing.
 * - x ≥ 1.4919 ($m_1$ ≤ 0.31, short coils): $B/m_1 = A(m_1) + \ln(1/k')\,C(m_1) + 1/(1+k)$ from the
 *   logarithmic expansions of K and E about m = 1 (DLMF 19.12.1, 19.12.2): every term
 *   positive; A and C economised to degree 12 and 15 in $m_1 - 0.15505$ (truncation below
 *   3e-16 and 1e-16 relative). Written with 1/x, so no
 *   square of x overflows for any finite x (the short-coil limit
 *   $K_N \to \tfrac{2}{\pi x}[\ln(4x) - \tfrac12]$ is reached smoothly).
 */
export function nagaokaKernel(x: number): number {
  return x < 1.4919 ? nagaokaLong(x) : nagaokaShort(x);
}

/** Nagaoka's coefficient for d/l < 1.4919 (m < 0.69; see {@link nagaokaKernel}). */
export function nagaokaLong(x: number): number {
  const h2 = 1 + x * x;
  const h = Math.sqrt(h2);
  const m = (x * x) / h2;
  const t = m - 0.34505;
  const t2 = t * t;
  const t4 = t2 * t2;
  const t8 = t4 * t4;
  const t16 = t8 * t8;
  const sm = 0.9590837047194352 + t * 0.26268037070110795 + t2 * (0.16152101315742387 + t * 0.13167659712366814) + t4 * (0.1244883383673799 + t * 0.12899442807968234 + t2 * (0.14226520767949688 + t * 0.16414865578612947)) + t8 * (0.19598515710231504 + t * 0.24034926720466793 + t2 * (0.3012321929835644 + t * 0.3842123010082375) + t4 * (0.4955887544224622 + t * 0.6494353871200212 + t2 * (0.8954930650086271 + t * 1.2004043325863039))) + t16 * (1.153883788557394 + t * 1.5416391748048446 + t2 * (6.187864198552359 + t * 8.66147216599344) + t4 * (-10.741264313079158 + t * -15.43544606561676 + t2 * (51.105886578628116 + t * 72.32003816991339)));
  return 0.4244131815783876 * (2.356194490192345 - x / h - m * sm) * h; // 4/(3 pi) B / k'
}

/** Nagaoka's coefficient for d/l ≥ 1.4919 (m₁ ≤ 0.31; see {@link nagaokaKernel}). */
export function nagaokaShort(x: number): number {
  // written with 1/x so that no square of x overflows for any finite x
  const r = 1 / x;
  const r2 = r * r;
  const g = Math.sqrt(1 + r2); // 1/k
  const h = x * g; // 1/k'
  const y = r2 / (1 + r2); // m1
  const l = Math.log(h); // ln(1/k')
  const t = y - 0.15505;
  const t2 = t * t;
  const t4 = t2 * t2;
  const t8 = t4 * t4;
  const sa = 0.8453405638997589 + t * 0.10909962546128875 + t2 * (0.0461803099589993 + t * 0.027778507178635375) + t4 * (0.019835845239756726 + t * 0.015684868614220755 + t2 * (0.013270984165494593 + t * 0.011783576880728905)) + t8 * (0.01084713856138556 + t * 0.010243629020940673 + t2 * (0.00991597609422959 + t * 0.010622289970347348) + t4 * 0.010655930251862684);
  const sc = 1.6684507893803635 + t * 1.2609288692879321 + t2 * (1.3194991183063987 + t * 1.473101741402828) + t4 * (1.6848971731298088 + t * 1.9498576137992527 + t2 * (2.271346664794516 + t * 2.6565762752363704)) + t8 * (3.1154487403560265 + t * 3.6603900661565687 + t2 * (4.3074466173040005 + t * 5.072779918213321) + t4 * (5.928810371880571 + t * 6.9917083542647145 + t2 * (9.525896176421567 + t * 11.244464659243857)));
  return (0.4244131815783876 * (sa + l * sc + g / (g + 1))) / h; // 4/(3 pi) (B/m1) m1/k'
}
