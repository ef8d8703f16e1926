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
 * @packageDocumentation
 */

/** Euler–Mascheroni constant γ. */
const EULER_GAMMA = 0.5772156649015329;
const LN2 = 0.6931471805599453;
const PI = Math.PI;
/** Below this modulus: power series. */
export const SERIES_RADIUS = 1.5;
/** From this modulus on: asymptotic expansions. */
export const ASYMPTOTIC_RADIUS = 19;
const EPS = 1e-17;
/** Convergence of the continued fractions: one unit roundoff. */
const EPS_CF = 1.1102230246251565e-16;
const TINY = 1e-30;

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

/** Positions in the array written by {@link besselIKScaledInto}. */
export const IK_I0R = 0;
export const IK_I0I = 1;
export const IK_I1R = 2;
export const IK_I1I = 3;
export const IK_K0R = 4;
export const IK_K0I = 5;
export const IK_K1R = 6;
export const IK_K1I = 7;

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

function seriesRegion(zr: number, zi: number, r: number, withK: boolean, out: Float64Array): void {
  // w = z²/4
  const wr = 0.25 * (zr * zr - zi * zi);
  const wi = 0.5 * zr * zi;
  // I0 = Σ t_k, t_k = t_{k−1}·w/k²;  I1 = (z/2) Σ u_k, u_k = u_{k−1}·w/(k(k+1)).
  // K0 = −(ln(z/2) + γ) I0 + Σ H_k t_k
  // K1 = 1/z + ln(z/2) I1 − (z/4) Σ (2H_k + 1/(k+1) − 2γ) u_k
  let tr = 1;
  let ti = 0;
  let ur = 1;
  let ui = 0;
  let i0r = 1;
  let i0i = 0;
  let s1r = 1;
  let s1i = 0;
  let hk = 0; // harmonic number H_k
  let kr0 = 0; // Σ H_k t_k
  let ki0 = 0;
  let kr1 = 1 - 2 * EULER_GAMMA; // Σ (2H_k + 1/(k+1) − 2γ) u_k, k = 0 term
  let ki1 = 0;
  for (let k = 1; k < 40; k++) {
    const f0 = 1 / (k * k);
    const t2r = (tr * wr - ti * wi) * f0;
    ti = (tr * wi + ti * wr) * f0;
    tr = t2r;
    const f1 = 1 / (k * (k + 1));
    const u2r = (ur * wr - ui * wi) * f1;
    ui = (ur * wi + ui * wr) * f1;
    ur = u2r;
    hk += 1 / k;
    i0r += tr;
    i0i += ti;
    s1r += ur;
    s1i += ui;
    if (withK) {
      kr0 += hk * tr;
      ki0 += hk * ti;
      const c = 2 * hk + 1 / (k + 1) - 2 * EULER_GAMMA;
      kr1 += c * ur;
      ki1 += c * ui;
    }
    if (Math.abs(tr) + Math.abs(ti) < EPS * (Math.abs(i0r) + Math.abs(i0i)) && Math.abs(ur) + Math.abs(ui) < EPS) break;
  }
  const i1r = 0.5 * (zr * s1r - zi * s1i);
  const i1i = 0.5 * (zr * s1i + zi * s1r);
  // e^{−Re z} scaling of I
  const es = Math.exp(-zr);
  out[IK_I0R] = i0r * es;
  out[IK_I0I] = i0i * es;
  out[IK_I1R] = i1r * es;
  out[IK_I1I] = i1i * es;
  if (!withK) {
    out[IK_K0R] = NaN;
    out[IK_K0I] = NaN;
    out[IK_K1R] = NaN;
    out[IK_K1I] = NaN;
    return;
  }
  // L = ln(z/2)
  const lr = Math.log(r) - LN2;
  const li = Math.atan2(zi, zr);
  const gr = lr + EULER_GAMMA;
  const k0r = -(gr * i0r - li * i0i) + kr0;
  const k0i = -(gr * i0i + li * i0r) + ki0;
  // 1/z, divided by r twice so that r² cannot underflow for tiny |z|
  const izr = zr / r / r;
  const izi = -zi / r / r;
  const k1r = izr + (lr * i1r - li * i1i) - 0.25 * (zr * kr1 - zi * ki1);
  const k1i = izi + (lr * i1i + li * i1r) - 0.25 * (zr * ki1 + zi * kr1);
  // e^{z} scaling of K
  const ez = Math.exp(zr);
  const c = Math.cos(zi) * ez;
  const s = Math.sin(zi) * ez;
  out[IK_K0R] = k0r * c - k0i * s;
  out[IK_K0I] = k0r * s + k0i * c;
  out[IK_K1R] = k1r * c - k1i * s;
  out[IK_K1I] = k1r * s + k1i * c;
}

function continuedFractionRegion(zr: number, zi: number, r: number, out: Float64Array): void {
  // ---- CF2 (Steed): e^{z}K0(z) and e^{z}K1(z), here for ν = 0.
  // b = 2(1 + z)
  let br = 2 * (1 + zr);
  const bi = 2 * zi;
  // d = 1/b
  let den = br * br + bi * bi;
  let dr = br / den;
  let di = -bi / den;
  let hr = dr;
  let hi = di;
  let delhr = dr;
  let delhi = di;
  let q1r = 0;
  let q1i = 0;
  let q2r = 1;
  let q2i = 0;
  const a1 = 0.25;
  let qr = a1;
  let qi = 0;
  let c = a1;
  let a = -a1;
  let sr = 1 + qr * delhr;
  let si = qr * delhi;
  for (let i = 1; i < 2000; i++) {
    a -= 2 * i;
    c = (-a * c) / (i + 1);
    // qnew = (q1 − b·q2)/a
    const qnr = (q1r - (br * q2r - bi * q2i)) / a;
    const qni = (q1i - (br * q2i + bi * q2r)) / a;
    q1r = q2r;
    q1i = q2i;
    q2r = qnr;
    q2i = qni;
    qr += c * qnr;
    qi += c * qni;
    br += 2;
    // d = 1/(b + a·d)
    const er = br + a * dr;
    const ei = bi + a * di;
    den = er * er + ei * ei;
    dr = er / den;
    di = -ei / den;
    // delh = (b·d − 1)·delh
    const fr = br * dr - bi * di - 1;
    const fi = br * di + bi * dr;
    const nr = fr * delhr - fi * delhi;
    delhi = fr * delhi + fi * delhr;
    delhr = nr;
    hr += delhr;
    hi += delhi;
    // dels = q·delh
    const dsr = qr * delhr - qi * delhi;
    const dsi = qr * delhi + qi * delhr;
    sr += dsr;
    si += dsi;
    if (Math.abs(dsr) + Math.abs(dsi) < EPS_CF * (Math.abs(sr) + Math.abs(si))) break;
  }
  hr *= a1;
  hi *= a1;
  // sqrt(π/(2z)) = sqrt(π/2)/sqrt(z)
  const sqr = Math.sqrt(0.5 * (r + zr)); // √z, Re z ≥ 0
  const sqi = zi / (2 * sqr);
  const sqm = r;
  const pr = (Math.sqrt(PI / 2) * sqr) / sqm;
  const pi = (-Math.sqrt(PI / 2) * sqi) / sqm;
  // k0 = p / s
  den = sr * sr + si * si;
  const k0r = (pr * sr + pi * si) / den;
  const k0i = (pi * sr - pr * si) / den;
  // k1 = k0·(z + 0.5 − h)/z
  const mr = zr + 0.5 - hr;
  const mi = zi - hi;
  const rz = r * r;
  const gr = (mr * zr + mi * zi) / rz;
  const gi = (mi * zr - mr * zi) / rz;
  const k1r = k0r * gr - k0i * gi;
  const k1i = k0r * gi + k0i * gr;

  // ---- CF1 (modified Lentz): f = I1/I0 = 1/(2/z + 1/(4/z + 1/(6/z + …)))
  const invr = zr / rz;
  const invi = -zi / rz;
  let fr = TINY;
  let fi = 0;
  let cr = fr;
  let ci = 0;
  let Dr = 0;
  let Di = 0;
  for (let k = 1; k < 10000; k++) {
    const bkr = 2 * k * invr;
    const bki = 2 * k * invi;
    // D = 1/(b + D)
    let xr = bkr + Dr;
    const xi = bki + Di;
    if (xr === 0 && xi === 0) xr = TINY;
    let xd = xr * xr + xi * xi;
    Dr = xr / xd;
    Di = -xi / xd;
    // C = b + 1/C
    xd = cr * cr + ci * ci;
    cr = bkr + cr / xd;
    ci = bki - ci / xd;
    if (cr === 0 && ci === 0) cr = TINY;
    // Δ = C·D
    const delr = cr * Dr - ci * Di;
    const deli = cr * Di + ci * Dr;
    const nf = fr * delr - fi * deli;
    fi = fr * deli + fi * delr;
    fr = nf;
    if (Math.abs(delr - 1) + Math.abs(deli) < 2 * EPS_CF) break;
  }
  // e^{−Re z} I0 = e^{i Im z} / (z (K1s + f·K0s))
  const tr = k1r + (fr * k0r - fi * k0i);
  const ti = k1i + (fr * k0i + fi * k0r);
  const wr = zr * tr - zi * ti;
  const wi = zr * ti + zi * tr;
  const cz = Math.cos(zi);
  const sz = Math.sin(zi);
  den = wr * wr + wi * wi;
  const i0r = (cz * wr + sz * wi) / den;
  const i0i = (sz * wr - cz * wi) / den;
  out[IK_I0R] = i0r;
  out[IK_I0I] = i0i;
  out[IK_I1R] = fr * i0r - fi * i0i;
  out[IK_I1I] = fr * i0i + fi * i0r;
  out[IK_K0R] = k0r;
  out[IK_K0I] = k0i;
  out[IK_K1R] = k1r;
  out[IK_K1I] = k1i;
}

function asymptoticRegion(zr: number, zi: number, r: number, out: Float64Array): void {
  // 1/z
  const rz = r * r;
  const ur = zr / rz;
  const ui = -zi / rz;
  // S0± = Σ (∓1)^k a_k(0) z^{−k}, S1± likewise with a_k(1);
  // a_k(ν) = a_{k−1}(ν)·(4ν² − (2k − 1)²)/(8k).
  let p0r = 1; // a_k(0) z^{-k}
  let p0i = 0;
  let p1r = 1;
  let p1i = 0;
  let e0r = 1; // even-k partial sums
  let e0i = 0;
  let o0r = 0; // odd-k partial sums
  let o0i = 0;
  let e1r = 1;
  let e1i = 0;
  let o1r = 0;
  let o1i = 0;
  // Two terms per pass (odd k, then even k); a_k(ν) z^{−k} from the previous term.
  const kmax = Math.min(80, Math.floor(2 * r));
  for (let k = 1; k <= kmax; k += 2) {
    let m = (2 * k - 1) * (2 * k - 1);
    let g0 = -m / (8 * k);
    let g1 = (4 - m) / (8 * k);
    let nr = (p0r * ur - p0i * ui) * g0;
    p0i = (p0r * ui + p0i * ur) * g0;
    p0r = nr;
    nr = (p1r * ur - p1i * ui) * g1;
    p1i = (p1r * ui + p1i * ur) * g1;
    p1r = nr;
    o0r += p0r;
    o0i += p0i;
    o1r += p1r;
    o1i += p1i;
    m = (2 * k + 1) * (2 * k + 1);
    g0 = -m / (8 * (k + 1));
    g1 = (4 - m) / (8 * (k + 1));
    nr = (p0r * ur - p0i * ui) * g0;
    p0i = (p0r * ui + p0i * ur) * g0;
    p0r = nr;
    nr = (p1r * ur - p1i * ui) * g1;
    p1i = (p1r * ui + p1i * ur) * g1;
    p1r = nr;
    e0r += p0r;
    e0i += p0i;
    e1r += p1r;
    e1i += p1i;
    if (Math.abs(p0r) + Math.abs(p0i) + Math.abs(p1r) + Math.abs(p1i) < EPS) break;
  }
  // S+ = even + odd, S− = even − odd
  const s0pr = e0r + o0r;
  const s0pi = e0i + o0i;
  const s0mr = e0r - o0r;
  const s0mi = e0i - o0i;
  const s1pr = e1r + o1r;
  const s1pi = e1i + o1i;
  const s1mr = e1r - o1r;
  const s1mi = e1i - o1i;
  // √z
  const qr = Math.sqrt(0.5 * (r + zr)); // √z, Re z ≥ 0
  const qi = zi / (2 * qr);
  const qm = r;
  // K: √(π/2) / √z · S+
  const kr = (Math.sqrt(PI / 2) * qr) / qm;
  const ki = (-Math.sqrt(PI / 2) * qi) / qm;
  // I: 1/√(2π) / √z · (e^{i Im z} S− + σ i e^{−2 Re z − i Im z}(±) S+)
  const ir = kr / PI;
  const ii = ki / PI;
  const cz = Math.cos(zi);
  const sz = Math.sin(zi);
  let a0r = cz * s0mr - sz * s0mi;
  let a0i = cz * s0mi + sz * s0mr;
  let a1r = cz * s1mr - sz * s1mi;
  let a1i = cz * s1mi + sz * s1mr;
  if (zi !== 0) {
    const sigma = zi > 0 ? 1 : -1;
    const ex = Math.exp(-2 * zr);
    // σ i e^{−i Im z}·ex = σ ex (sin(Im z) + i cos(Im z))
    const tr = sigma * ex * sz;
    const ti = sigma * ex * cz;
    const b0r = tr * s0pr - ti * s0pi;
    const b0i = tr * s0pi + ti * s0pr;
    const b1r = tr * s1pr - ti * s1pi;
    const b1i = tr * s1pi + ti * s1pr;
    a0r += b0r;
    a0i += b0i;
    a1r -= b1r; // ν = 1 carries e^{±iπ} = −1
    a1i -= b1i;
  }
  out[IK_I0R] = ir * a0r - ii * a0i;
  out[IK_I0I] = ir * a0i + ii * a0r;
  out[IK_I1R] = ir * a1r - ii * a1i;
  out[IK_I1I] = ir * a1i + ii * a1r;
  out[IK_K0R] = kr * s0pr - ki * s0pi;
  out[IK_K0I] = kr * s0pi + ki * s0pr;
  out[IK_K1R] = kr * s1pr - ki * s1pi;
  out[IK_K1I] = kr * s1pi + ki * s1pr;
}
