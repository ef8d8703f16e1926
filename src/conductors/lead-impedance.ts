/**
 * Series impedance of a go-and-return lead (the run between a work coil and its capacitor
 * bank): two parallel round conductors, two flat bus bars facing each other, or a coaxial lead.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { besselIKComplexScaled, cCoth } from "../special/index.js";
import { besselIKRatiosComplex } from "../special/internal.js";
import { complexGeneralSolve } from "../special/complex-symmetric-solve.js";
import { MU_0 } from "../units/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const OPTION_FIELDS: readonly string[] = Object.freeze(["lead", "length", "frequency", "resistivity"]);
const ROUND_FIELDS: readonly string[] = Object.freeze(["shape", "diameter", "wallThickness", "spacing"]);
const FLAT_FIELDS: readonly string[] = Object.freeze(["shape", "width", "thickness", "gap"]);
const COAXIAL_FIELDS: readonly string[] = Object.freeze(["shape", "innerDiameter", "innerWallThickness", "returnInnerDiameter", "returnWallThickness"]);

/**
 * Two parallel round conductors (solid wire or tube) carrying the current out and back.
 *
 * @category Conductors
 */
export interface RoundPairLead {
  /** Geometry tag. */
  readonly shape: "round-pair";
  /** Outer diameter of each conductor [m], > 0. */
  readonly diameter: number;
  /** Wall thickness of a tube [m], > 0 and ≤ diameter/2 (omitted or diameter/2: solid). */
  readonly wallThickness?: number;
  /** Centre-to-centre spacing of the two conductors [m], > diameter (they must not touch). */
  readonly spacing: number;
}

/**
 * Two flat bus bars of equal rectangular section, broad faces towards each other (strip line).
 *
 * @category Conductors
 */
export interface FlatPairLead {
  /** Geometry tag. */
  readonly shape: "flat-pair";
  /** Width of each bar (the broad face) [m], > 0. */
  readonly width: number;
  /** Thickness of each bar [m], > 0. */
  readonly thickness: number;
  /** Gap between the facing broad faces [m], > 0. */
  readonly gap: number;
}

/**
 * A coaxial lead: a round inner conductor (wire or tube) inside a return tube.
 *
 * @category Conductors
 */
export interface CoaxialLead {
  /** Geometry tag. */
  readonly shape: "coaxial";
  /** Outer diameter of the inner conductor [m], > 0. */
  readonly innerDiameter: number;
  /** Wall thickness of the inner conductor if it is a tube [m], > 0 and ≤ innerDiameter/2 (omitted: solid). */
  readonly innerWallThickness?: number;
  /** Inner diameter of the return tube [m], > innerDiameter. */
  readonly returnInnerDiameter: number;
  /** Wall thickness of the return tube [m], > 0. */
  readonly returnWallThickness: number;
}

/**
 * A lead's cross-section.
 *
 * @category Conductors
 */
export type LeadGeometry = RoundPairLead | FlatPairLead | CoaxialLead;

/** Options of {@link leadImpedance}. @category Conductors */
export interface LeadImpedanceOptions {
  /** The cross-section of the go-and-return pair. */
  readonly lead: LeadGeometry;
  /** Length of the run (each of the two conductors is this long) [m], > 0. */
  readonly length: number;
  /** Frequency of the sinusoidal current [Hz], > 0. */
  readonly frequency: number;
  /** Resistivity of the conductors (non-magnetic) [Ω·m], > 0. */
  readonly resistivity: number;
}

/**
 * Result of {@link leadImpedance}: the loop's series impedance $R + j\omega L$ at the frequency.
 *
 * @category Conductors
 */
export interface LeadImpedance {
  /** Series inductance of the loop (out and back) [H]. */
  readonly inductance: number;
  /** AC resistance of the loop (both conductors) [Ω]. */
  readonly resistance: number;
  /** DC resistance of the loop [Ω]. */
  readonly dcResistance: number;
  /** Inductance of the loop as δ → 0 (current on the surfaces only) [H]; the DC value lies above it. */
  readonly highFrequencyInductance: number;
  /** Where the model leaves its tested range (empty inside it). */
  readonly validity: readonly ValidityNote[];
}

/**
 * Largest error of the flat-pair (strip-line) model of {@link leadImpedance} against the 2-D
 * finite-element reference for width ≥ 5 × gap and thickness ≤ width/2
 * (test/fixtures/leads/fem-flat.json): inductance and resistance, relative.
 *
 * @category Conductors
 */
export const FLAT_PAIR_ACCURACY: {
  /** Largest relative error of the inductance. */
  readonly inductance: number;
  /** Largest relative error of the resistance. */
  readonly resistance: number;
} = { inductance: 0.22, resistance: 0.16 };
/** Width/gap from which the flat-pair accuracy above holds. */
const FLAT_PAIR_MIN_ASPECT = 5;
/** Series truncation target of the round-pair multipole expansion (relative). */
const SERIES_TOLERANCE = 1e-15;
/** Most multipole orders used (spacing within 0.0009 d of touching needs more; noted). */
const MAX_ORDERS = 400;

const TWO_PI = 2 * Math.PI;

/**
 * Radial log-derivative $P_m = r\,u_m'(r)/u_m(r)$ at the outer surface r = a of a round conductor
 * (solid, or a tube of bore radius ri with no current in the bore), for m = 0 … n, written into
 * (pRe, pIm). γ = (1 + j)/δ. u_m solves $u'' + u'/r - (m^2/r^2 + γ^2) u = 0$ in the metal with
 * the bore's condition $r u' = m u$ at ri. Ratios only, so nothing overflows.
 */
function surfaceLogDerivatives(a: number, ri: number, delta: number, n: number, pRe: Float64Array, pIm: Float64Array): void {
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
function returnTubeLogDerivative(b: number, c: number, delta: number): [number, number] {
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
const DC_LIMIT = 1e-3;

/**
 * Internal inductance per metre [H/m] of a round wall ri ≤ r ≤ ro carrying a uniform current
 * whose field is zero on the `zeroSide` face ("inner": a rod or tube, field outside it;
 * "outer": a return tube, field inside it): $\frac{\mu_0}{2\pi}\int (H/H_\mathrm{face})^2 dr/r$.
 */
function wallInductanceDc(ri: number, ro: number, zeroSide: "inner" | "outer"): number {
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
function reciprocal(re: number, im: number): [number, number] {
  const d2 = re * re + im * im;
  return [re / d2, -im / d2];
}

/** Multipole orders needed for the pair at half-spacing ratio D/(2a). */
function ordersFor(spacing: number, radius: number): number {
  const h = spacing / 2;
  // the image point of the equivalent line source inside a conductor, relative to its radius
  const ratio = (h - Math.sqrt(Math.max(h * h - radius * radius, 0))) / radius;
  if (!(ratio > 0) || ratio >= 1) return MAX_ORDERS;
  // the impedance's truncation error falls as ratio^(2N) (the strengths and their coupling each as ratio^N)
  return Math.min(MAX_ORDERS, Math.max(2, Math.ceil(Math.log(SERIES_TOLERANCE) / (2 * Math.log(ratio))) + 2));
}

/** Per-metre impedance (re, im) of a round pair: Z' = 2jω(μ0/2π)[ln(D/a) + 1/P_0 − Σ β_n q^n]. */
function roundPairPerMetre(a: number, ri: number, spacing: number, delta: number, omega: number, orders: number): [number, number] {
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

/**
 * Series impedance $R + j\omega L$ of a go-and-return lead at a frequency, with skin and
 * proximity effect, for three cross-sections.
 *
 * **Round pair** (two solid wires or tubes, outer radius a, centre spacing D), exact: the 2-D
 * eddy-current field expanded in cylindrical harmonics of order m inside the metal
 * ($I_m(\gamma r)$, $K_m(\gamma r)$, γ = (1 + j)/δ) and outside each conductor (multipoles
 * $\cos m\theta/r^m$ re-expanded about the other centre by the binomial series), matched at the
 * surfaces. With $P_m = a u_m'(a)/u_m(a)$ the surface log-derivative of the metal's solution
 * of order m and q = a/D, the multipole strengths β solve
 *
 * $$
 * (P_m + m)\,\beta_m - (P_m - m)\sum_{k\ge1}\binom{k+m-1}{m} q^{k+m}\beta_k = q^m\Big(\frac{P_m}{m} - 1\Big),
 * \qquad Z = \frac{j\omega\mu_0\ell}{\pi}\Big[\ln\frac{D}{a} + \frac{1}{P_0} - \sum_k \beta_k q^k\Big]
 * $$
 *
 * truncated where the image-point ratio, squared, has decayed to 1e-15. Limits it reproduces: DC,
 * $L = \frac{\mu_0\ell}{\pi}\big(\ln\frac{D}{a} + \frac14\big)$ for solid wire (internal
 * μ0/(8π) per conductor); δ → 0, $L \to \frac{\mu_0\ell}{\pi}\,\mathrm{acosh}\frac{D}{2a}$ and
 * $R \to \frac{\rho\,\ell}{\pi a \delta}\,\frac{D/2a}{\sqrt{(D/2a)^2 - 1}}$ (conformal map).
 *
 * **Coaxial**, exact (axisymmetric): $Z = \frac{j\omega\mu_0\ell}{2\pi}\big[\frac{1}{P_a} + \ln\frac{b}{a} - \frac{1}{P_b}\big]$,
 * $P_a$ the inner conductor's order-0 log-derivative, $P_b$ the return tube's at its inner face.
 *
 * **Flat pair** (bus bars of width w, thickness t, facing gap g): the strip-line model (field
 * uniform between the broad faces, zero outside; each bar's current on its inner face with the
 * 1-D skin effect of a slab) on an effective width $w_e = wF$ that carries the edge fringing,
 * $F = 1 + \frac{g}{\pi w}\big(1 + \ln\frac{2\pi w}{g}\big)$ (Palmer's parallel-plate edge
 * correction, through the duality $L' = \mu_0\varepsilon_0/C'$):
 * $Z = j\omega\mu_0\ell\,g/w_e + \frac{2\rho\gamma\ell}{w_e}\coth\gamma t$ (R not below R_dc). Exact
 * as w/g → ∞; an approximation otherwise: against the 2-D finite-element reference
 * (fixture fem-flat.json: w/g = 5–10, t/g = 0.5–1, t/δ = 0.5 and 4) it reads high by up to
 * 21 % in L (most near DC, where the uniform current's internal inductance is below the
 * slab's) and up to 15 % in R ({@link FLAT_PAIR_ACCURACY}); for w < 5 g or t > w/2 a
 * `validity` note (at w = 2 g: 46 % in L).
 *
 * Hard domain (throws {@link InputError}): every length, the frequency and the resistivity
 * finite and > 0; round pair: spacing > diameter, wallThickness ≤ diameter/2; coaxial:
 * returnInnerDiameter > innerDiameter, innerWallThickness ≤ innerDiameter/2. Validity: straight
 * parallel run much longer than its spacing (end effects ignored), non-magnetic metal, no
 * other conductors near.
 *
 * Accuracy: round pair and coaxial ≤ 1e-9 relative vs mpmath (the cylindrical-harmonic
 * solution at 30 digits, written independently, and the DC, δ → 0 and coaxial closed forms;
 * fixture test/fixtures/leads/series.json) for 1.05 ≤ D/d ≤ 10, 0.1 ≤ d/δ ≤ 30, and within
 * 0.3 % of the 2-D finite-element reference (scikit-fem P2, fixtures fem-round.json and
 * fem-tube.json, whose own discretisation error is ≤ 0.12 %) over 1.05 ≤ D/d ≤ 2 and
 * 0.5 ≤ d/δ ≤ 20; below r/δ = 1e-3 the uniform-current values (exact to 1e-12). Flat pair as
 * above.
 *
 * @param options - {@link LeadImpedanceOptions}
 * @returns loop inductance and resistance ({@link LeadImpedance})
 * @throws {@link InputError} on bad input
 * @see S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication Electronics, 3rd ed., Wiley 1994, Table 5.11a (two-wire line: L and R with the proximity factor).
 * @see W. R. Smythe, Static and Dynamic Electricity, 3rd ed., McGraw-Hill 1968, §10.09 (eddy currents in parallel cylinders by cylindrical harmonics).
 * @see S. A. Schelkunoff, "The electromagnetic theory of coaxial transmission lines and cylindrical shields", Bell Syst. Tech. J. 13, 532–579 (1934).
 * @see NIST Digital Library of Mathematical Functions, 10.23.7 (Graf's addition theorem) and 4.6.7 (binomial series).
 * @example
 * ```ts
 * import { leadImpedance } from "fluxwright";
 * // 0.4 m run of two 6 mm × 1 mm copper tubes at 12 mm centres, 50 kHz
 * const z = leadImpedance({ lead: { shape: "round-pair", diameter: 6e-3, wallThickness: 1e-3, spacing: 12e-3 }, length: 0.4, frequency: 50e3, resistivity: 1.7241e-8 });
 * console.log(z.inductance); // ≈ 2.2e-7
 * console.log(z.resistance); // ≈ 3.0e-3
 * ```
 * @category Conductors
 */
export function leadImpedance(options: LeadImpedanceOptions): LeadImpedance {
  const where = "leadImpedance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, OPTION_FIELDS);
  const length = requirePositive(where, "length", options.length, "m");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const lead = requireObject(where, "lead", options.lead);
  const shape = requireOneOf(where, "lead.shape", lead.shape, ["round-pair", "flat-pair", "coaxial"] as const);
  const omega = TWO_PI * frequency;
  const delta = Math.sqrt(resistivity / (Math.PI * frequency * MU_0));
  const validity: ValidityNote[] = [];
  let perMetre: [number, number];
  let dcPerMetre: number;
  let highFrequencyPerMetre: number;
  if (shape === "round-pair") {
    requireKnownKeys(where, "lead", lead, ROUND_FIELDS);
    const diameter = requirePositive(where, "lead.diameter", lead.diameter, "m");
    const a = diameter / 2;
    const wall = lead.wallThickness === undefined ? a : requirePositive(where, "lead.wallThickness", lead.wallThickness, "m");
    if (wall > a * (1 + 1e-12)) throw new InputError(where, "lead.wallThickness", wall, "m", `≤ diameter/2 = ${a}`);
    const spacing = requirePositive(where, "lead.spacing", lead.spacing, "m");
    if (!(spacing > diameter)) throw new InputError(where, "lead.spacing", spacing, "m", `> diameter = ${diameter} (the conductors must not touch)`);
    const ri = Math.max(0, a - wall);
    const orders = ordersFor(spacing, a);
    if (orders >= MAX_ORDERS) {
      validity.push({
        code: "lead-nearly-touching",
        message: `The conductors nearly touch (spacing/diameter = ${spacing / diameter}): the multipole series is cut at ${MAX_ORDERS} orders, so the proximity effect is resolved less accurately than 1e-15.`,
        value: spacing / diameter,
        limit: 1.0009,
      });
    }
    dcPerMetre = (2 * resistivity) / (Math.PI * (a * a - ri * ri));
    perMetre = a / delta < DC_LIMIT
      ? [dcPerMetre, omega * ((MU_0 / Math.PI) * Math.log(spacing / a) + 2 * wallInductanceDc(ri, a, "inner"))]
      : roundPairPerMetre(a, ri, spacing, delta, omega, orders);
    highFrequencyPerMetre = (MU_0 / Math.PI) * Math.acosh(spacing / diameter);
  } else if (shape === "coaxial") {
    requireKnownKeys(where, "lead", lead, COAXIAL_FIELDS);
    const innerDiameter = requirePositive(where, "lead.innerDiameter", lead.innerDiameter, "m");
    const a = innerDiameter / 2;
    const wall = lead.innerWallThickness === undefined ? a : requirePositive(where, "lead.innerWallThickness", lead.innerWallThickness, "m");
    if (wall > a * (1 + 1e-12)) throw new InputError(where, "lead.innerWallThickness", wall, "m", `≤ innerDiameter/2 = ${a}`);
    const returnInnerDiameter = requirePositive(where, "lead.returnInnerDiameter", lead.returnInnerDiameter, "m");
    if (!(returnInnerDiameter > innerDiameter)) throw new InputError(where, "lead.returnInnerDiameter", returnInnerDiameter, "m", `> innerDiameter = ${innerDiameter}`);
    const returnWall = requirePositive(where, "lead.returnWallThickness", lead.returnWallThickness, "m");
    const ri = Math.max(0, a - wall);
    const b = returnInnerDiameter / 2;
    const c = b + returnWall;
    dcPerMetre = resistivity / (Math.PI * (a * a - ri * ri)) + resistivity / (Math.PI * (c * c - b * b));
    const pa = new Float64Array(1);
    const paIm = new Float64Array(1);
    surfaceLogDerivatives(a, ri, delta, 0, pa, paIm);
    const [iaRe, iaIm] = reciprocal(pa[0]!, paIm[0]!);
    const [pbRe, pbIm] = returnTubeLogDerivative(b, c, delta);
    const [ibRe, ibIm] = reciprocal(pbRe, pbIm);
    const bracketRe = iaRe + Math.log(b / a) - ibRe;
    const bracketIm = iaIm - ibIm;
    const k = (omega * MU_0) / TWO_PI;
    perMetre = c / delta < DC_LIMIT
      ? [dcPerMetre, omega * (wallInductanceDc(ri, a, "inner") + (MU_0 / TWO_PI) * Math.log(b / a) + wallInductanceDc(b, c, "outer"))]
      : [-k * bracketIm, k * bracketRe];
    highFrequencyPerMetre = (MU_0 / TWO_PI) * Math.log(b / a);
  } else {
    requireKnownKeys(where, "lead", lead, FLAT_FIELDS);
    const width = requirePositive(where, "lead.width", lead.width, "m");
    const thickness = requirePositive(where, "lead.thickness", lead.thickness, "m");
    const gap = requirePositive(where, "lead.gap", lead.gap, "m");
    // the field between the bars with the fringing at the two edges, through the duality
    // L' = μ0ε0/C' and Palmer's edge correction of the parallel-plate capacitance: the strip
    // line of effective width w·F for the field and for each bar's face current
    const fringe = 1 + (gap / (Math.PI * width)) * (1 + Math.log((2 * Math.PI * width) / gap));
    const effectiveWidth = width * fringe;
    // internal impedance of one bar, field on one broad face: (ργ/w) coth(γ t), γ = (1 + j)/δ
    const u = thickness / delta;
    const ct = cCoth({ re: u, im: u });
    const s = resistivity / (effectiveWidth * delta);
    // (1 + j) · coth
    const zr = s * (ct.re - ct.im);
    const zi = s * (ct.re + ct.im);
    perMetre = [2 * zr, omega * MU_0 * (gap / effectiveWidth) + 2 * zi];
    dcPerMetre = (2 * resistivity) / (width * thickness);
    highFrequencyPerMetre = (MU_0 * gap) / effectiveWidth;
    if (width < FLAT_PAIR_MIN_ASPECT * gap || thickness > width / 2) {
      validity.push({
        code: "flat-pair-narrow",
        message: `The bars are not wide against their gap and thickness (width/gap = ${width / gap}, thickness/width = ${thickness / width}): the strip-line model assumes the field nearly confined between the broad faces (46 % high in L at width = 2 × gap); its tested accuracy (${FLAT_PAIR_ACCURACY.inductance * 100} % in L, ${FLAT_PAIR_ACCURACY.resistance * 100} % in R) holds for width ≥ ${FLAT_PAIR_MIN_ASPECT} × gap and thickness ≤ width/2.`,
        value: width / gap,
        limit: FLAT_PAIR_MIN_ASPECT,
      });
    }
  }
  const resistance = Math.max(perMetre[0], dcPerMetre) * length;
  const inductance = (perMetre[1] / omega) * length;
  return { inductance, resistance, dcResistance: dcPerMetre * length, highFrequencyInductance: highFrequencyPerMetre * length, validity };
}
