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
 *   below 4e-17 relative), so nothing cancels.
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
 * - x² < 2 (m < 2/3, long coils): $B = \tfrac{3\pi}{4} - k - m\,S(m)$, where
 *   $(1-m)(K-E)/m + E = \tfrac{3\pi}{4} - m\,S(m)$ from the hypergeometric series of K and E
 *   (A&S 17.3.11, 17.3.12); S has positive Taylor coefficients
 *   $s_j = \tfrac{\pi}{2}\,a_{j+1}(2j+3)\bigl(\tfrac{1}{2j+1} - \tfrac{1}{2j+4}\bigr)$,
 *   $a_j = ((1/2)_j/j!)^2$; economised to degree 23 in $m - 0.3335$. B ≥ 0.77 here, so the
 *   subtraction costs nothing.
 * - x² ≥ 2 ($m_1$ ≤ 1/3, short coils): $B/m_1 = A(m_1) + \ln(1/k')\,C(m_1) + 1/(1+k)$ from the
 *   logarithmic expansions of K and E about m = 1 (DLMF 19.12.1, 19.12.2): every term
 *   positive; A and C economised to degree 13 and 16 in $m_1 - 0.167$. Written with 1/x, so no
 *   square of x overflows for any finite x (the short-coil limit
 *   $K_N \to \tfrac{2}{\pi x}[\ln(4x) - \tfrac12]$ is reached smoothly).
 */
export function nagaokaKernel(x: number): number {
  return x * x < 2 ? nagaokaLong(x) : nagaokaShort(x);
}

/** Nagaoka's coefficient for (d/l)² < 2 (m < 2/3; see {@link nagaokaKernel}). */
function nagaokaLong(x: number): number {
  const h2 = 1 + x * x;
  const h = Math.sqrt(h2);
  const m = (x * x) / h2;
  const t = m - 0.3335;
  const t2 = t * t;
  const t4 = t2 * t2;
  const t8 = t4 * t4;
  const t16 = t8 * t8;
  const sm = 0.9560710930468841 + t * 0.2590011773182561 + t2 * (0.15705611113659862 + t * 0.12609303367184382) + t4 * (0.11731497408796154 + t * 0.11957891796487662 + t2 * (0.12969581966516575 + t * 0.14714028545286184)) + t8 * (0.17271643628705455 + t * 0.20822186988874075 + t2 * (0.25647620288380035 + t * 0.32158600607253546) + t4 * (0.40916341850956434 + t * 0.5257382510516792 + t2 * (0.6845269932380227 + t * 0.9272085895635541))) + t16 * (1.230705856502284 + t * 1.2808526157231537 + t2 * (1.7030895289714985 + t * 5.497751438976406) + t4 * (7.575053288427824 + t * -7.716805726976903 + t2 * (-10.946701264093734 + t * 43.94008939278641)) + t8 * 61.23631319568136);
  return 0.4244131815783876 * (2.356194490192345 - x / h - m * sm) * h; // 4/(3 pi) B / k'
}

/** Nagaoka's coefficient for (d/l)² ≥ 2 (m₁ ≤ 1/3; see {@link nagaokaKernel}). */
function nagaokaShort(x: number): number {
  // written with 1/x so that no square of x overflows for any finite x
  const r = 1 / x;
  const r2 = r * r;
  const g = Math.sqrt(1 + r2); // 1/k
  const h = x * g; // 1/k'
  const y = r2 / (1 + r2); // m1
  const l = Math.log(h); // ln(1/k')
  const t = y - 0.167;
  const t2 = t * t;
  const t4 = t2 * t2;
  const t8 = t4 * t4;
  const t16 = t8 * t8;
  const sa = 0.8466509468998403 + t * 0.11021537240772296 + t2 * (0.04719343687211496 + t * 0.028749520457891208) + t4 * (0.020802162863004736 + t * 0.01667280065744257 + t2 * (0.014301529198231976 + t * 0.012875047509565694)) + t8 * (0.012018875371086393 + t * 0.011538537647231667 + t2 * (0.011277527717135345 + t * 0.011275136523108478) + t4 * (0.012787644415744067 + t * 0.013182839810712301));
  const sc = 1.6837098658156304 + t * 1.2931076892785531 + t2 * (1.3737874436619024 + t * 1.5565037318428048) + t4 * (1.806429707417708 + t * 2.120987244134749 + t2 * (2.5065699959256733 + t * 2.974149482435503)) + t8 * (3.5383012863210177 + t * 4.217162161492637 + t2 * (5.033008019892142 + t * 6.015794610202404) + t4 * (7.192196439747171 + t * 8.482187701631261 + t2 * (10.151565939308602 + t * 14.645186765461931))) + t16 * 17.54153721589115;
  return (0.4244131815783876 * (sa + l * sc + g / (g + 1))) / h; // 4/(3 pi) (B/m1) m1/k'
}
