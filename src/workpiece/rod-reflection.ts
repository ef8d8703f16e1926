/**
 * The rod's and tube's reflection kernels of the Dodd–Deeds–Luquire solution, shared by
 * {@link encirclingCoilOverRod}, its prepared form and the work-coil impedance model
 * (re-exported from encircling-coil.ts).
 *
 * @packageDocumentation
 */
import {
  besselI0ComplexScaled,
  besselI0Scaled,
  besselI1ComplexScaled,
  besselI1Scaled,
  besselK0ComplexScaled,
  besselK0Scaled,
  besselK1ComplexScaled,
  besselK1Scaled,
} from "../special/index.js";
import { IK_I0I, IK_I0R, IK_I1I, IK_I1R, IK_K0I, IK_K0R, IK_K1I, IK_K1R, besselI1OverI0ComplexInto, besselIKScaledInto } from "../special/internal.js";

/**
 * The rod's reflection coefficient of the Dodd–Deeds–Luquire solution, exponentially scaled:
 * writes $\tilde C = e^{-2\alpha a}C$ into out[0] (real) and out[1] (imaginary), with
 * $C = (\alpha I_0(\alpha a) - R\,I_1(\alpha a))/(\alpha K_0(\alpha a) + R\,K_1(\alpha a))$ and R the
 * rod's surface ratio $(1/\mu_r)(1/r)\,\partial_r(rA)/A$ at r = a (solid rod, or tube of bore
 * radius a1 with an air bore). kk = ωμ0μr/ρ. A filament pair (r_i, z_i), (r_j, z_j) outside the
 * rod then couples through the reflected mutual inductance
 * $\Delta M_{ij} = 2\mu_0 r_i r_j \int_0^\infty C\,K_1(\alpha r_i) K_1(\alpha r_j)\cos(\alpha(z_i - z_j))\,d\alpha$.
 * A tube wall with $2\,\mathrm{Re}\,\beta\,(a - a_1) > 40$ is taken as a solid rod (the bore's
 * terms are below e^{−40} of the rod's): within 1e-13 relative of the full wall formula
 * (test/workpiece/part-kernel-cache.test.ts).
 * Internal kernel shared by {@link encirclingCoilOverRod} and the work-coil impedance model.
 */
export function rodReflectionScaled(alpha: number, a: number, a1: number, kk: number, mur: number, out: Float64Array): void {
  const ik = ikScratch;
  const x = alpha * a;
  const x1 = alpha * a1;
  // a bore below 1e-9 of the radius changes nothing measurable (its effect goes as (a1/a)²)
  let rAir = 0;
  if (a1 >= 1e-9 * a) {
    if (x1 > 0) {
      // one evaluation for both (the same numbers as besselI0Scaled, besselI1Scaled)
      besselIKScaledInto(x1, 0, false, ik);
      rAir = (alpha * ik[IK_I0R]!) / ik[IK_I1R]!;
    } else {
      rAir = (alpha * besselI0Scaled(x1)) / besselI1Scaled(x1);
    }
  }
  if (x > 0) {
    // one evaluation for all four (the same numbers as the four scaled real functions)
    besselIKScaledInto(x, 0, true, ik);
    rodReflectionScaledFrom(alpha, a, a1, kk, mur, ik[IK_I0R]!, ik[IK_I1R]!, ik[IK_K0R]!, ik[IK_K1R]!, rAir, out);
  } else {
    rodReflectionScaledFrom(alpha, a, a1, kk, mur, besselI0Scaled(x), besselI1Scaled(x), besselK0Scaled(x), besselK1Scaled(x), rAir, out);
  }
}

/** Wall thickness in units of 1/(2 Re β) beyond which a tube's bore is invisible (e^{−40} ≈ 4e-18). */
const THICK_WALL = 40;

/**
 * {@link rodReflectionScaled} with the material-independent factors given: the exponentially
 * scaled $I_0, I_1, K_0, K_1$ at $\alpha a$ (`besselI0Scaled` … of `src/special`) and, for a
 * tube, the air bore's ratio $\alpha I_0(\alpha a_1)/I_1(\alpha a_1)$ (ignored for a bar, a1 <
 * 1e-9·a). A caller that evaluates many materials on the same α nodes and geometry (the
 * work-coil model's part kernel) computes them once; the result is bit-identical.
 */
export function rodReflectionScaledFrom(alpha: number, a: number, a1: number, kk: number, mur: number, i0: number, i1: number, k0: number, k1: number, rAir: number, out: Float64Array): void {
  const b2 = alpha * alpha;
  const rr = Math.hypot(b2, kk);
  const bRe = Math.sqrt(0.5 * (rr + b2));
  const bIm = kk / (2 * bRe);
  const ik = ikScratch;
  let rRe: number;
  let rIm: number;
  // a bore below 1e-9 of the radius changes nothing measurable (its effect goes as (a1/a)²); a
  // wall with 2·Re β·(a − a1) > 40 shields the bore: the bore's terms carry e^{2 Re β (a1 − a)} <
  // e^{−40} ≈ 4e-18 against the solid rod's, so the solid-rod ratio is the tube's to rounding
  if (a1 < 1e-9 * a || 2 * bRe * (a - a1) > THICK_WALL) {
    besselI1OverI0ComplexInto(bRe * a, bIm * a, ik);
    const wRe = ik[0]!;
    const wIm = ik[1]!;
    // β / (μr w)
    const ww = wRe * wRe + wIm * wIm;
    rRe = (bRe * wRe + bIm * wIm) / (ww * mur);
    rIm = (bIm * wRe - bRe * wIm) / (ww * mur);
  } else {
    // tube: air bore ratio α I0(α a1)/I1(α a1) (given), wall I1/K1 combination
    tubeSurfaceRatioInto(bRe, bIm, a, a1, mur, rAir, ik);
    rRe = ik[0]!;
    rIm = ik[1]!;
  }
  // C̃ = (α I0 − R I1)/(α K0 + R K1) (scaled; true C = e^{2x} C̃)
  const nRe = alpha * i0 - rRe * i1;
  const nIm = -rIm * i1;
  const dRe = alpha * k0 + rRe * k1;
  const dIm = rIm * k1;
  const dd = dRe * dRe + dIm * dIm;
  out[0] = (nRe * dRe + nIm * dIm) / dd;
  out[1] = (nIm * dRe - nRe * dIm) / dd;
}

/** Bessel values of the reflection kernels, reused call after call (the kernels allocate nothing). */
const ikScratch = new Float64Array(8);
const ratioScratch = new Float64Array(2);

/**
 * Tube wall: (1/μr)(1/r) d(rA)/dr / A at the outer surface, the bore matched to the air solution
 * (num = β I0/μr − rAir I1, den = β K0/μr + rAir K1 at the bore; R = β (I0 − s K0) / (μr (I1 + s K1)) at
 * the surface, with the scale factor e^{Re z1 + z1 − z2 − Re z2}, z = β r): [Re R, Im R].
 */
export function tubeSurfaceRatio(bRe: number, bIm: number, a: number, a1: number, mur: number, rAir: number): [number, number] {
  tubeSurfaceRatioInto(bRe, bIm, a, a1, mur, rAir, ratioScratch);
  return [ratioScratch[0]!, ratioScratch[1]!];
}

/**
 * {@link tubeSurfaceRatio} without allocation: writes Re R, Im R into out[0], out[1] (out may
 * be the 8-element Bessel scratch of the caller: it is written last). Bessel functions at
 * z1 = β a1 and z2 = β a, one evaluation of I₀, I₁, K₀, K₁ each (the same numbers as the four
 * complex functions, which evaluate the same engine four times); z with Re z ≤ 0 (not reached
 * for kk > 0, where Re β > 0) goes through the public functions and their edge cases.
 */
export function tubeSurfaceRatioInto(bRe: number, bIm: number, a: number, a1: number, mur: number, rAir: number, out: Float64Array): void {
  const f = tubeScratch;
  besselIKAt(bRe * a1, bIm * a1, f);
  const nRe = (bRe * f[IK_I0R]! - bIm * f[IK_I0I]!) / mur - rAir * f[IK_I1R]!;
  const nIm = (bRe * f[IK_I0I]! + bIm * f[IK_I0R]!) / mur - rAir * f[IK_I1I]!;
  const dRe = (bRe * f[IK_K0R]! - bIm * f[IK_K0I]!) / mur + rAir * f[IK_K1R]!;
  const dIm = (bRe * f[IK_K0I]! + bIm * f[IK_K0R]!) / mur + rAir * f[IK_K1I]!;
  const dd = dRe * dRe + dIm * dIm;
  let sRe = (nRe * dRe + nIm * dIm) / dd;
  let sIm = (nIm * dRe - nRe * dIm) / dd;
  const mag = Math.exp(2 * bRe * (a1 - a));
  const ph = bIm * (a1 - a);
  const eRe = mag * Math.cos(ph);
  const eIm = mag * Math.sin(ph);
  const tRe = sRe * eRe - sIm * eIm;
  sIm = sRe * eIm + sIm * eRe;
  sRe = tRe;
  besselIKAt(bRe * a, bIm * a, f);
  const uRe = f[IK_I0R]! - (sRe * f[IK_K0R]! - sIm * f[IK_K0I]!);
  const uIm = f[IK_I0I]! - (sRe * f[IK_K0I]! + sIm * f[IK_K0R]!);
  const vRe = mur * (f[IK_I1R]! + (sRe * f[IK_K1R]! - sIm * f[IK_K1I]!));
  const vIm = mur * (f[IK_I1I]! + (sRe * f[IK_K1I]! + sIm * f[IK_K1R]!));
  const pRe = bRe * uRe - bIm * uIm;
  const pIm = bRe * uIm + bIm * uRe;
  const vv = vRe * vRe + vIm * vIm;
  out[0] = (pRe * vRe + pIm * vIm) / vv;
  out[1] = (pIm * vRe - pRe * vIm) / vv;
}

const tubeScratch = new Float64Array(8);

/**
 * Scaled I₀, I₁, K₀, K₁ at z = zr + i·zi into out (indices `IK_*`): exactly what
 * besselI0ComplexScaled … besselK1ComplexScaled return, from one evaluation where Re z ≥ 0 and
 * z ≠ 0, from those functions elsewhere.
 */
function besselIKAt(zr: number, zi: number, out: Float64Array): void {
  if (zr >= 0 && !(zr === 0 && zi === 0)) {
    besselIKScaledInto(zr, zi, true, out);
    return;
  }
  const z = { re: zr, im: zi };
  const i0 = besselI0ComplexScaled(z);
  const i1 = besselI1ComplexScaled(z);
  const k0 = besselK0ComplexScaled(z);
  const k1 = besselK1ComplexScaled(z);
  out[IK_I0R] = i0.re;
  out[IK_I0I] = i0.im;
  out[IK_I1R] = i1.re;
  out[IK_I1I] = i1.im;
  out[IK_K0R] = k0.re;
  out[IK_K0I] = k0.im;
  out[IK_K1R] = k1.re;
  out[IK_K1I] = k1.im;
}
