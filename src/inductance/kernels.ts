/**
 * Private numerical kernels of the inductance module: Maxwell's mutual inductance of coaxial
 * circular filaments and Nagaoka's coefficient. Not part of the public surface.
 *
 * Why not `ellipticK`/`ellipticE` directly: Maxwell's bracket $(1 - m/2)K - E$ is $O(m^2)$ for
 * far filaments and Nagaoka's $E - k$ is $O(k'^2 \ln k')$ for short coils; formed from K and E
 * they lose all digits at the domain edges. Each kernel splits its domain so that every piece
 * is a short polynomial (Estrin's scheme) with at most one logarithm and one square root:
 *
 * - where the bracket is only mildly conditioned, the Cephes polynomials for K and E in the
 *   complementary parameter $m_1$ (S. L. Moshier, Cephes Math Library 2.8, ellpk.c and ellpe.c,
 *   as in src/special/elliptic.ts), with $m_1$ formed directly from the geometry, one shared
 *   $\ln m_1$, and the polynomials of K and E merged beforehand into the two polynomials of the
 *   bracket (exact rational combination of the published coefficients, rounded once);
 * - at the ill-conditioned edges (far filaments, long and short coils) the bracket itself as a
 *   convergent series, replaced by its Chebyshev economisation on the piece (truncation below
 *   1e-17 relative), so nothing cancels.
 *
 * Straight-line code without loops and small enough for the JavaScript engine to inline into the
 * caller (each kernel stays under V8's 460-byte bytecode inlining limit; a call that is not
 * inlined costs more than the arithmetic, as the result has to be boxed). The coefficients come
 * from test/fixtures/inductance/kernels-coefficients.py (mpmath). The public functions are
 * cross-checked against mpmath fixtures and against `ellipticK`/`ellipticE` in the tests.
 *
 * @packageDocumentation
 */

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
 * - m ≤ 0.7: the quadratic transformation of $(1-m/2)K - E = \frac{\pi m^2}{32}\,
 *   {}_2F_1(\tfrac32,\tfrac32;3;m)$ (DLMF 15.8.13, $c = 2b$) gives
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
  if (q < 0.3 * s) {
    const y = q / s; // m1 (0 for coincident filaments: the log term gives Infinity)
    const lg = Math.log(y);
    const y2 = y * y;
    const y4 = y2 * y2;
    const y8 = y4 * y4;
    const p = -0.3068528194400547 + y * 0.298286795139539 + y2 * (0.006924173841134051 + y * 0.001079796106620137) + y4 * (0.00029557013454656876 + y * -9.405635618299016e-05 + y2 * (-0.0012420013197296834 + y * -0.0023685395732517397)) + y8 * (0.00022825879554930965 + y * 0.002618263764495433 + y2 * (0.0010555674750315012 + y * 6.899143230313662e-05));
    const r = 0.25 + y * 0.0625000000000471 + y2 * (0.0039062501283688555 + y * 0.0009766037796376799) + y4 * (0.0003846404353479222 + y * 0.00026556098124887195 + y2 * (0.0008377416517270811 + y * 0.002810789568953233)) + y8 * (0.004206722451484684 + y * 0.0024177559539052306 + y2 * (0.00043900081982774 + y * 1.4703947752429925e-05));
    return Math.sqrt(s) * (p - lg * r);
  }
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
 * - x < 0.5 (m < 0.2): $B = \tfrac{3\pi}{4} - k - m\,S(m)$, where
 *   $(1-m)(K-E)/m + E = \tfrac{3\pi}{4} - m\,S(m)$ from the hypergeometric series of K and E
 *   (A&S 17.3.11, 17.3.12); S has positive Taylor coefficients
 *   $s_j = \tfrac{\pi}{2}\,a_{j+1}(2j+3)\bigl(\tfrac{1}{2j+1} - \tfrac{1}{2j+4}\bigr)$,
 *   $a_j = ((1/2)_j/j!)^2$; degree-11 polynomial.
 * - 0.5 ≤ x < 3: $x^2 B = P(m_1) - \ln(m_1)\,Q(m_1) + (1 - m_1)/(1 + k)$ with
 *   $P = P_K - 1 + (1 - 2m_1)(P_E - 1)/m_1$ and $Q = Q_K + (1 - 2m_1)Q_E$ merged from the Cephes
 *   polynomials (K − E loses at most a factor ≈ 10 at m = 0.2).
 * - 3 ≤ x ≤ 1e100 ($m_1$ ≤ 0.1, short coils): $B/m_1 = A(m_1) + \ln(1/k')\,C(m_1) + 1/(1+k)$ from
 *   the logarithmic expansions of K and E about m = 1 (DLMF 19.12.1, 19.12.2): every term
 *   positive; A and C of degree 9 and 10.
 * - x > 1e100: the short-coil limit $K_N = \tfrac{2}{\pi x}[\ln(4x) - \tfrac12]$ (relative
 *   error $O(k'^2\ln k')$ < 1e-190).
 */
export function nagaokaKernel(x: number): number {
  const h2 = 1 + x * x;
  const h = Math.sqrt(h2);
  const k = x / h;
  if (x < 0.5) {
    const m = (x * x) / h2;
    const m2 = m * m;
    const m4 = m2 * m2;
    const m8 = m4 * m4;
    const sm = 0.8835729338221293 + m * 0.18407769454628634 + m2 * (0.08053399136176698 + m * 0.04530037034912355) + m4 * (0.029067727620330476 + m * 0.020243880661528258 + m2 * (0.01490666130007895 + m * 0.011499556714457368)) + m8 * (0.008623263550673794 + m * 0.009506896382495621 + m2 * (-0.00044791180299237236 + m * 0.015450949647582536));
    return 0.4244131815783876 * (2.356194490192345 - k - m * sm) * h; // 4/(3 pi) B / k'
  }
  const y = 1 / h2; // m1
  const y2 = y * y;
  const y4 = y2 * y2;
  const y8 = y4 * y4;
  if (x < 3) {
    const lg = Math.log(y);
    const p = 0.8294415416808815 + y * -0.7329155762790266 + y2 * (-0.060893442997345185 + y * -0.017156710630373512) + y4 * (-0.006762951728452241 + y * -0.0012049405267255471 + y2 * (0.002062081929771376 + y * -0.0029241078553440825)) + y8 * (-0.00689281127747762 + y * -0.002583960025912272 + y2 * -0.00016912228999575336);
    const r = 0.7499999999998883 + y * -0.28125000028014135 + y2 * (-0.058593836296023 + y * -0.025641199485227237) + y4 * (-0.014575363397581488 + y * -0.010669335209435213 + y2 * (-0.011558771819975111 + y * -0.011781286233916749)) + y8 * (-0.006061978835213305 + y * -0.0010722756398635685 + y2 * -3.6183084210437325e-05);
    return (0.4244131815783876 * (p - lg * r + (1 - y) / (1 + k)) * h) / (x * x);
  }
  if (x > 1e100) return (2 * (Math.log(4 * x) - 0.5)) / (Math.PI * x);
  const l = 0.5 * Math.log(h2); // ln(1/k')
  const sa = 0.829441541679836 + y * 0.0965259635498987 + y2 * (0.035632093105750065 + y * 0.018451474058071446) + y4 * (0.011270740304019807 + y * 0.0075964989800479015 + y2 * (0.0054634356384193495 + y * 0.004160126210299141)) + y8 * (0.002903933316943511 + y * 0.0039524060242047705);
  const sb = 1.5 + y * 0.9374999999999862 + y2 * (0.8203125000055129 + y * 0.7690429678933359) + y4 * (0.7402039255412064 + y * 0.7216956101009301 + y2 * (0.7089017812020323 + y * 0.6976591454217972)) + y8 * (0.7113726785514908 + y * 0.5491178576569319 + y2 * 1.203588673697082);
  return 0.4244131815783876 * y * (sa + l * sb + 1 / (1 + k)) * h;
}
