/**
 * The continued-fraction region of the modified-Bessel engine, between the power series and the
 * asymptotic expansions (|z| from 1.5 to 19): e^{z}K₀, e^{z}K₁ by Steed's CF2 (Thompson & Barnett
 * 1987), I₁/I₀ by CF1 (modified Lentz), and I₀ from the Wronskian I₀K₁ + I₁K₀ = 1/z. No power
 * series is used where it would cancel.
 *
 * @packageDocumentation
 */
import { IK_I0I, IK_I0R, IK_I1I, IK_I1R, IK_K0I, IK_K0R, IK_K1I, IK_K1R } from "./bessel-ik-layout.js";

const PI = Math.PI;
/** Convergence of the continued fractions: one unit roundoff. */
const EPS_CF = 1.1102230246251565e-16;
const TINY = 1e-30;

/** Scaled I₀, I₁, K₀, K₁ at z = zr + i·zi (Re z ≥ 0), r = |z|, into out[`IK_*`]. */
export function continuedFractionRegion(zr: number, zi: number, r: number, out: Float64Array): void {
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
  fromWronskian(zr, zi, k0r, k0i, k1r, k1i, fr, fi, out);
}

/**
 * The last step of the continued-fraction region: I₀ from the Wronskian I₀K₁ + I₁K₀ = 1/z with
 * the scaled K₀, K₁ (k0, k1) and f = I₁/I₀, then I₁ = f·I₀; writes all eight values into out.
 */
function fromWronskian(zr: number, zi: number, k0r: number, k0i: number, k1r: number, k1i: number, fr: number, fi: number, out: Float64Array): void {
  // e^{−Re z} I0 = e^{i Im z} / (z (K1s + f·K0s))
  const tr = k1r + (fr * k0r - fi * k0i);
  const ti = k1i + (fr * k0i + fi * k0r);
  const wr = zr * tr - zi * ti;
  const wi = zr * ti + zi * tr;
  const cz = Math.cos(zi);
  const sz = Math.sin(zi);
  const den = wr * wr + wi * wi;
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
