/**
 * The power-series region of the modified-Bessel engine: |z| ≤ 1.5, or |z| ≤ 2 with
 * |Im z| ≥ |Re z| (A&S 9.6.10, 9.6.11, 9.6.13), where the series cancel little.
 *
 * @packageDocumentation
 */
import { EPS, IK_I0I, IK_I0R, IK_I1I, IK_I1R, IK_K0I, IK_K0R, IK_K1I, IK_K1R } from "./bessel-ik-layout.js";

/** Euler–Mascheroni constant γ. */
const EULER_GAMMA = 0.5772156649015329;
const LN2 = 0.6931471805599453;

/** Scaled I₀, I₁ (and K₀, K₁ when `withK`, else NaN) at z = zr + i·zi, r = |z|, into out[`IK_*`]. */
export function seriesRegion(zr: number, zi: number, r: number, withK: boolean, out: Float64Array): void {
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
