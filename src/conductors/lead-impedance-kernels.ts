/**
 * The field kernels of {@link leadImpedance} for round conductors: the surface log-derivatives
 * of a rod or tube and of a return tube (complex Bessel ratios), the multipole solution of a
 * round pair with its proximity effect, and the DC limits.
 *
 * @packageDocumentation
 */
import { besselIKComplexScaled } from "../special/index.js";
import { besselIKRatiosComplex } from "../special/internal.js";
import { complexGeneralSolve } from "../special/complex-symmetric-solve.js";
import { MU_0 } from "../units/index.js";

/** Series truncation target of the round-pair multipole expansion (relative). */
const SERIES_TOLERANCE = 1e-15;
/** Most multipole orders used (spacing within 0.0009 d of touching needs more; noted). */
export const MAX_ORDERS = 400;

export const TWO_PI = 2 * Math.PI;

/**
 * Radial log-derivative $P_m = r\,u_m'(r)/u_m(r)$ at the outer surface r = a of a round conductor
 * (solid, or a tube of bore radius ri with no current in the bore), for m = 0 … n, written into
 * (pRe, pIm). γ = (1 + j)/δ. u_m solves $u'' + u'/r - (m^2/r^2 + γ^2) u = 0$ in the metal with
 * the bore's condition $r u' = m u$ at ri. Ratios only, so nothing overflows.
 */
export function surfaceLogDerivatives(a: number, ri: number, delta: number, n: number, pRe: Float64Array, pIm: Float64Array): void {
  const za = a / delta; // z = (1 + j) r/δ: re = im = r/δ
  const iaRe = new Float64Array(n + 1);
  const iaIm = new Float64Array(n + 1);
  const kaRe = new Float64Array(n + 1);
  const kaIm = new Float64Array(n + 1);
  besselIKRatiosComplex(za, za, n, iaRe, iaIm, kaRe, kaIm);
  if (!(ri > 0)) {
    for (let m = 0; m <= n; m++) {
      // P = m + z I_{m+1}/I_m, z = za(1 + j)
      pRe[m] = m + za * (iaRe[m]! - iaIm[m]!);
      pIm[m] = za * (iaRe[m]! + iaIm[m]!);
    }
    return;
  }
  const zi = ri / delta;
  const iiRe = new Float64Array(n + 1);
  const iiIm = new Float64Array(n + 1);
  const kiRe = new Float64Array(n + 1);
  const kiIm = new Float64Array(n + 1);
  besselIKRatiosComplex(zi, zi, n, iiRe, iiIm, kiRe, kiIm);
  // X_0 = I_0(zi) K_0(za) / (I_0(za) K_0(zi)) from the scaled order-0 values
  const bi = besselIKComplexScaled({ re: zi, im: zi });
  const ba = besselIKComplexScaled({ re: za, im: za });
  // scaled: I = e^{Re z} Ĩ, K = e^{-z} K̃ ⇒ factor e^{Re zi - Re za + zi - za} = e^{2(zi - za)} · e^{j(zi - za)}
  const magnitude = Math.exp(2 * (zi - za));
  const phase = zi - za;
  let xRe: number;
  let xIm: number;
  {
    // num = Ĩ0(zi) K̃0(za), den = Ĩ0(za) K̃0(zi)
    const nr = bi.i0r * ba.k0r - bi.i0i * ba.k0i;
    const ni = bi.i0r * ba.k0i + bi.i0i * ba.k0r;
    const dr = ba.i0r * bi.k0r - ba.i0i * bi.k0i;
    const di = ba.i0r * bi.k0i + ba.i0i * bi.k0r;
    const d2 = dr * dr + di * di;
    const qr = (nr * dr + ni * di) / d2;
    const qi = (ni * dr - nr * di) / d2;
    const c = magnitude * Math.cos(phase);
    const s = magnitude * Math.sin(phase);
    xRe = qr * c - qi * s;
    xIm = qr * s + qi * c;
  }
  for (let m = 0; m <= n; m++) {
    if (m > 0) {
      // X_m = X_{m-1} · [rI(zi)/rI(za)] · [rK(za)/rK(zi)] at order m − 1
      const a1r = iiRe[m - 1]!, a1i = iiIm[m - 1]!;
      const b1r = iaRe[m - 1]!, b1i = iaIm[m - 1]!;
      const a2r = kaRe[m - 1]!, a2i = kaIm[m - 1]!;
      const b2r = kiRe[m - 1]!, b2i = kiIm[m - 1]!;
      const numR = a1r * a2r - a1i * a2i;
      const numI = a1r * a2i + a1i * a2r;
      const denR = b1r * b2r - b1i * b2i;
      const denI = b1r * b2i + b1i * b2r;
      const d2 = denR * denR + denI * denI;
      const fr = (numR * denR + numI * denI) / d2;
      const fi = (numI * denR - numR * denI) / d2;
      const t = xRe * fr - xIm * fi;
      xIm = xRe * fi + xIm * fr;
      xRe = t;
    }
    // ρ1 = rI_m(zi)/rK_m(zi) · X_m ; ρ2 = ρ1 · rK_m(za)
    const d2 = kiRe[m]! * kiRe[m]! + kiIm[m]! * kiIm[m]!;
    const gr = (iiRe[m]! * kiRe[m]! + iiIm[m]! * kiIm[m]!) / d2;
    const gi = (iiIm[m]! * kiRe[m]! - iiRe[m]! * kiIm[m]!) / d2;
    const r1r = gr * xRe - gi * xIm;
    const r1i = gr * xIm + gi * xRe;
    const r2r = r1r * kaRe[m]! - r1i * kaIm[m]!;
    const r2i = r1r * kaIm[m]! + r1i * kaRe[m]!;
    // P = m + z (rI_m(za) − ρ2)/(1 + ρ1), z = za(1 + j)
    const ur = iaRe[m]! - r2r;
    const ui = iaIm[m]! - r2i;
    const wr = za * (ur - ui);
    const wi = za * (ur + ui);
    const vr = 1 + r1r;
    const vi = r1i;
    const v2 = vr * vr + vi * vi;
    pRe[m] = m + (wr * vr + wi * vi) / v2;
    pIm[m] = (wi * vr - wr * vi) / v2;
  }
}

/**
 * Order-0 log-derivative at the inner face r = b of a return tube whose outer face c has no
 * field outside it: $P = b\,u'(b)/u(b)$, u = K₀(γr) + μ I₀(γr) with u'(c) = 0. Re P < 0.
 */
export function returnTubeLogDerivative(b: number, c: number, delta: number): [number, number] {
  const zb = b / delta;
  const zc = c / delta;
  const ibRe = new Float64Array(1), ibIm = new Float64Array(1), kbRe = new Float64Array(1), kbIm = new Float64Array(1);
  const icRe = new Float64Array(1), icIm = new Float64Array(1), kcRe = new Float64Array(1), kcIm = new Float64Array(1);
  besselIKRatiosComplex(zb, zb, 0, ibRe, ibIm, kbRe, kbIm);
  besselIKRatiosComplex(zc, zc, 0, icRe, icIm, kcRe, kcIm);
  const bb = besselIKComplexScaled({ re: zb, im: zb });
  const bc = besselIKComplexScaled({ re: zc, im: zc });
  // Y = I0(zb) K0(zc) / (I0(zc) K0(zb)); scaling factor e^{Re zb - Re zc + zb - zc}
  const nr = bb.i0r * bc.k0r - bb.i0i * bc.k0i;
  const ni = bb.i0r * bc.k0i + bb.i0i * bc.k0r;
  const dr = bc.i0r * bb.k0r - bc.i0i * bb.k0i;
  const di = bc.i0r * bb.k0i + bc.i0i * bb.k0r;
  let d2 = dr * dr + di * di;
  const qr = (nr * dr + ni * di) / d2;
  const qi = (ni * dr - nr * di) / d2;
  const magnitude = Math.exp(2 * (zb - zc));
  const yr = magnitude * (qr * Math.cos(zb - zc) - qi * Math.sin(zb - zc));
  const yi = magnitude * (qr * Math.sin(zb - zc) + qi * Math.cos(zb - zc));
  // σ1 = rK0(zc)/rI0(zc) · Y
  d2 = icRe[0]! * icRe[0]! + icIm[0]! * icIm[0]!;
  const gr = (kcRe[0]! * icRe[0]! + kcIm[0]! * icIm[0]!) / d2;
  const gi = (kcIm[0]! * icRe[0]! - kcRe[0]! * icIm[0]!) / d2;
  const s1r = gr * yr - gi * yi;
  const s1i = gr * yi + gi * yr;
  // P = z (σ1 rI0(zb) − rK0(zb)) / (1 + σ1), z = zb(1 + j)
  const ur = s1r * ibRe[0]! - s1i * ibIm[0]! - kbRe[0]!;
  const ui = s1r * ibIm[0]! + s1i * ibRe[0]! - kbIm[0]!;
  const wr = zb * (ur - ui);
  const wi = zb * (ur + ui);
  const vr = 1 + s1r;
  const vi = s1i;
  const v2 = vr * vr + vi * vi;
  return [(wr * vr + wi * vi) / v2, (wi * vr - wr * vi) / v2];
}

/** Below this r/δ every conductor carries its DC (uniform) current to O((r/δ)⁴) ≤ 1e-12. */
export const DC_LIMIT = 1e-3;

/**
 * Internal inductance per metre [H/m] of a round wall ri ≤ r ≤ ro carrying a uniform current
 * whose field is zero on the `zeroSide` face ("inner": a rod or tube, field outside it;
 * "outer": a return tube, field inside it): $\frac{\mu_0}{2\pi}\int (H/H_\mathrm{face})^2 dr/r$.
 */
export function wallInductanceDc(ri: number, ro: number, zeroSide: "inner" | "outer"): number {
  const w = ro * ro - ri * ri;
  if (zeroSide === "inner") {
    if (ri === 0) return MU_0 / (8 * Math.PI);
    // ∫ (r² − ri²)²/r dr / w²
    return (MU_0 / (TWO_PI * w * w)) * ((ro ** 4 - ri ** 4) / 4 - ri * ri * w + ri ** 4 * Math.log(ro / ri));
  }
  // ∫ (ro² − r²)²/r dr / w²
  return (MU_0 / (TWO_PI * w * w)) * (ro ** 4 * Math.log(ro / ri) - ro * ro * w + (ro ** 4 - ri ** 4) / 4);
}

/** 1/P as (re, im). */
export function reciprocal(re: number, im: number): [number, number] {
  const d2 = re * re + im * im;
  return [re / d2, -im / d2];
}

/** Multipole orders needed for the pair at half-spacing ratio D/(2a). */
export function ordersFor(spacing: number, radius: number): number {
  const h = spacing / 2;
  // the image point of the equivalent line source inside a conductor, relative to its radius
  const ratio = (h - Math.sqrt(Math.max(h * h - radius * radius, 0))) / radius;
  if (!(ratio > 0) || ratio >= 1) return MAX_ORDERS;
  // the impedance's truncation error falls as ratio^(2N) (the strengths and their coupling each as ratio^N)
  return Math.min(MAX_ORDERS, Math.max(2, Math.ceil(Math.log(SERIES_TOLERANCE) / (2 * Math.log(ratio))) + 2));
}

/** Per-metre impedance (re, im) of a round pair: Z' = 2jω(μ0/2π)[ln(D/a) + 1/P_0 − Σ β_n q^n]. */
export function roundPairPerMetre(a: number, ri: number, spacing: number, delta: number, omega: number, orders: number): [number, number] {
  const n = orders;
  const pRe = new Float64Array(n + 1);
  const pIm = new Float64Array(n + 1);
  surfaceLogDerivatives(a, ri, delta, n, pRe, pIm);
  const q = a / spacing;
  // matrix rows m = 1..n, columns k = 1..n: (P_m + m) δ_mk − (P_m − m) C(k+m−1, m) q^{k+m}
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  const bRe = new Float64Array(n);
  const bIm = new Float64Array(n);
  // T[k][m] = C(k+m−1, m) q^{k+m}, built by T(k, m) = T(k, m−1) · q (k+m−1)/m, T(k, 0) = q^k
  const col = new Float64Array(n + 1);
  let qk = 1;
  for (let k = 1; k <= n; k++) {
    qk *= q;
    let t = qk;
    for (let m = 1; m <= n; m++) {
      t *= (q * (k + m - 1)) / m;
      col[m] = t;
    }
    for (let m = 1; m <= n; m++) {
      const i = (m - 1) * n + (k - 1);
      re[i] = -(pRe[m]! - m) * col[m]!;
      im[i] = -pIm[m]! * col[m]!;
    }
  }
  let qm = 1;
  for (let m = 1; m <= n; m++) {
    qm *= q;
    const i = (m - 1) * n + (m - 1);
    re[i] = re[i]! + pRe[m]! + m;
    im[i] = im[i]! + pIm[m]!;
    // rhs q^m (P_m/m − 1)
    bRe[m - 1] = qm * (pRe[m]! / m - 1);
    bIm[m - 1] = (qm * pIm[m]!) / m;
  }
  if (!complexGeneralSolve(n, re, im, bRe, bIm)) return [NaN, NaN];
  let sRe = 0;
  let sIm = 0;
  qm = 1;
  for (let m = 1; m <= n; m++) {
    qm *= q;
    sRe += bRe[m - 1]! * qm;
    sIm += bIm[m - 1]! * qm;
  }
  const [iRe, iIm] = reciprocal(pRe[0]!, pIm[0]!);
  const bracketRe = Math.log(spacing / a) + iRe - sRe;
  const bracketIm = iIm - sIm;
  // 2jω μ0/(2π) · bracket
  const k = (2 * omega * MU_0) / TWO_PI;
  return [-k * bracketIm, k * bracketRe];
}
