/**
 * Finite coil of rectangular winding cross-section around an infinitely long rod or tube:
 * the Dodd, Deeds & Luquire (1969) integral solution.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
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
import { MU_0 } from "../units/index.js";
import { IK_I0I, IK_I0R, IK_I1I, IK_I1R, IK_K0I, IK_K0R, IK_K1I, IK_K1R, besselI1OverI0ComplexInto, besselIKScaledInto, gaussLegendreRule } from "../special/internal.js";
import { besselK1MomentTailScaled } from "./kernels.js";
import { constantPermeabilityNote } from "./validity-notes.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
/** Largest coil length / radial gap accepted (cost about 0.1 s at this ratio on one core). */
const MAX_LENGTH_PER_GAP = 2000;

const ROD_FIELDS: readonly string[] = Object.freeze(["radius", "innerRadius", "resistivity", "relativePermeability"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const ENCIRCLING_COIL_FIELDS: readonly string[] = Object.freeze(["innerRadius", "outerRadius", "length", "turns"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const ENCIRCLING_FIELDS: readonly string[] = Object.freeze(["coil", "rod", "frequency"]);

/**
 * A coaxial coil of rectangular winding cross-section around a rod, with uniform current
 * density over the winding cross-section.
 *
 * @category Workpiece
 */
export interface EncirclingCoil {
  /** Inner radius of the winding [m], > rod radius. */
  readonly innerRadius: number;
  /** Outer radius of the winding [m], > innerRadius. */
  readonly outerRadius: number;
  /** Axial length of the winding [m], > 0. */
  readonly length: number;
  /** Number of turns, an integer ≥ 1. */
  readonly turns: number;
}

/**
 * An infinitely long round rod, or a tube when `innerRadius` > 0.
 *
 * @category Workpiece
 */
export interface LongRod {
  /** Outer radius [m], > 0 and < coil innerRadius. */
  readonly radius: number;
  /** Bore radius of a tube [m], ≥ 0 and < radius; omitted or 0 for a solid rod. */
  readonly innerRadius?: number;
  /** Resistivity [Ω·m], > 0. */
  readonly resistivity: number;
  /** Relative permeability [-], ≥ 1 (constant). */
  readonly relativePermeability: number;
}

/**
 * Options of {@link encirclingCoilOverRod}.
 *
 * @category Workpiece
 */
export interface EncirclingCoilOverRodOptions {
  /** The coil, see {@link EncirclingCoil}. */
  readonly coil: EncirclingCoil;
  /** The rod or tube, see {@link LongRod}. */
  readonly rod: LongRod;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
}

/**
 * Result of {@link encirclingCoilOverRod}.
 *
 * @category Workpiece
 */
export interface EncirclingCoilOverRodResult {
  /** Resistance reflected into the coil by the rod, $\Delta R$ [Ω], ≥ 0. */
  readonly reflectedResistance: number;
  /**
   * The same value as {@link EncirclingCoilOverRodResult.reflectedResistance} [Ω].
   *
   * @deprecated Use `reflectedResistance`; this field goes at 1.0.
   */
  readonly resistanceChange: number;
  /** Reactance change $\Delta X$ [Ω]. */
  readonly reactanceChange: number;
  /** Inductance change $\Delta X/\omega$ [H]. */
  readonly inductanceChange: number;
  /** Skin depth in the rod [m]. */
  readonly skinDepth: number;
  /** Where the model's assumptions may not hold. */
  readonly validity: readonly ValidityNote[];
}

const PANEL_NODES = 12;
const RULE = gaussLegendreRule(PANEL_NODES);

/** The checked coil and rod geometry of the coils encircling a rod (shared by the prepared form). */
export interface EncirclingGeometryRead {
  readonly r1: number;
  readonly r2: number;
  readonly len: number;
  readonly turns: number;
  readonly rod: Record<string, unknown>;
  readonly a: number;
  readonly a1: number;
}

/**
 * Checks the coil (0 < innerRadius < outerRadius, length > 0, integer turns ≥ 1) and the rod's
 * radii (0 < radius < coil innerRadius, 0 ≤ innerRadius < radius) of an encircling coil; with
 * `maxLengthPerGap`, also refuses a radial gap below coil length / maxLengthPerGap (bounded work).
 */
export function readEncirclingGeometry(where: string, coilValue: unknown, rodValue: unknown, rodFields: readonly string[], maxLengthPerGap?: number): EncirclingGeometryRead {
  const c = requireObject(where, "coil", coilValue);
  requireKnownKeys(where, "coil", c, ENCIRCLING_COIL_FIELDS);
  const r1 = requirePositive(where, "coil.innerRadius", c["innerRadius"], "m");
  const r2 = requirePositive(where, "coil.outerRadius", c["outerRadius"], "m");
  if (!(r2 > r1)) throw new InputError(where, "coil.outerRadius", r2, "m", `a finite number > coil.innerRadius (${r1})`);
  const len = requirePositive(where, "coil.length", c["length"], "m");
  const turns = requireInteger(where, "coil.turns", c["turns"], 1);
  const rod = requireObject(where, "rod", rodValue);
  requireKnownKeys(where, "rod", rod, rodFields);
  const a = requirePositive(where, "rod.radius", rod["radius"], "m");
  if (!(a < r1)) throw new InputError(where, "rod.radius", a, "m", `a finite number > 0 and < coil.innerRadius (${r1})`);
  // bounded work: the quadrature's cost grows as coil length / gap
  if (maxLengthPerGap !== undefined && len > maxLengthPerGap * (r1 - a)) {
    throw new InputError(where, "rod.radius", a, "m", `at most coil.innerRadius − coil.length/${maxLengthPerGap} = ${r1 - len / maxLengthPerGap} (a gap below 1/${maxLengthPerGap} of the coil length makes the integral too costly)`);
  }
  const a1 = rod["innerRadius"] === undefined ? 0 : requireNonNegative(where, "rod.innerRadius", rod["innerRadius"], "m");
  if (!(a1 < a)) throw new InputError(where, "rod.innerRadius", a1, "m", `a finite number ≥ 0 and < rod.radius (${a})`);
  return { r1, r2, len, turns, rod, a, a1 };
}

/**
 * Impedance change of a finite coil of rectangular winding cross-section encircling an
 * infinitely long rod or tube (coaxial), by the Dodd, Deeds & Luquire (1969) integral.
 *
 * With $n = N/((r_2 - r_1)\ell)$, rod radius $a$, $\kappa(\alpha) = \int_{\alpha r_1}^{\alpha r_2} xK_1(x)\,dx$
 * and $\beta = \sqrt{\alpha^2 + j\omega\mu_0\mu_r/\rho}$:
 *
 * $$
 * \Delta Z = 8j\omega\mu_0 n^2 \int_0^\infty C(\alpha)\,\frac{\kappa(\alpha)^2\sin^2(\alpha\ell/2)}{\alpha^6}\,d\alpha,\qquad
 * C = \frac{\alpha I_0(\alpha a) - R\,I_1(\alpha a)}{\alpha K_0(\alpha a) + R\,K_1(\alpha a)},
 * $$
 *
 * where $R = \beta I_0(\beta a)/(\mu_r I_1(\beta a))$ for a solid rod; for a tube the wall
 * solution $D_1 I_1(\beta r) + D_2 K_1(\beta r)$ is matched to the air bore. Evaluated with
 * exponentially scaled Bessel functions and 12-point Gauss–Legendre panels up to
 * $\alpha = 20/(r_1 - a)$, where the integrand has fallen by $e^{-40}$.
 *
 * Cost: grows as coil length / radial gap; a gap below 1/2000 of the coil length is refused
 * with an InputError (about 0.1 s of work at that edge).
 * Hard domain (throws {@link InputError}): 0 < rod radius < coil innerRadius < outerRadius,
 * length > 0, turns an integer ≥ 1, 0 ≤ rod innerRadius < rod radius, resistivity > 0,
 * relativePermeability ≥ 1, frequency > 0.
 * Validity: rod much longer than the coil (both ends well outside it), linear material of
 * constant permeability, uniform winding current density.
 *
 * Accuracy: ≤ 1e-7 relative to |ΔZ| vs an independent scipy evaluation of the same integral
 * (fixture `test/fixtures/workpiece/rod.json`); it tends to {@link barInLongCoil} as the
 * coil becomes long.
 *
 * @param options - coil, rod and frequency, see {@link EncirclingCoilOverRodOptions}
 * @returns resistance and reactance change [Ω], inductance change [H]
 * @throws {@link InputError} for values outside the hard domain
 * @see C. V. Dodd, W. E. Deeds and J. W. Luquire, "Integral solutions to some eddy current
 *   problems", Int. J. Nondestructive Testing 1 (1969) 29–90 (coil encircling a rod and tube).
 * @example
 * ```ts
 * import { encirclingCoilOverRod } from "fluxwright";
 * const r = encirclingCoilOverRod({
 *   coil: { innerRadius: 0.02, outerRadius: 0.025, length: 0.05, turns: 10 },
 *   rod: { radius: 0.015, resistivity: 3e-8, relativePermeability: 1 },
 *   frequency: 1e3,
 * });
 * console.log(r.reflectedResistance > 0, r.inductanceChange < 0); // true true
 * ```
 * @category Workpiece
 */
export function encirclingCoilOverRod(options: EncirclingCoilOverRodOptions): EncirclingCoilOverRodResult {
  const where = "encirclingCoilOverRod";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, ENCIRCLING_FIELDS);
  const { r1, r2, len, turns, rod, a, a1 } = readEncirclingGeometry(where, options.coil, options.rod, ROD_FIELDS, MAX_LENGTH_PER_GAP);
  const rho = requirePositive(where, "rod.resistivity", rod["resistivity"], "Ω·m");
  const mur = rod["relativePermeability"];
  if (typeof mur !== "number" || !Number.isFinite(mur) || mur < 1) {
    throw new InputError(where, "rod.relativePermeability", mur, "", "a finite number ≥ 1");
  }
  const f = requirePositive(where, "frequency", options.frequency, "Hz");

  const omega = 2 * Math.PI * f;
  const kk = (omega * MU_0 * mur) / rho;
  const gap = r1 - a;
  // a bore below 1e-9 of the radius changes nothing measurable (its effect goes as (a1/a)²)
  const solid = a1 < 1e-9 * a;

  const cc = new Float64Array(2);
  let sumRe = 0;
  let sumIm = 0;
  const panel = (lo: number, hi: number): void => {
    const half = 0.5 * (hi - lo);
    const mid = 0.5 * (hi + lo);
    for (let i = 0; i < PANEL_NODES; i++) {
      const alpha = mid + half * RULE.nodes[i]!;
      const wt = half * RULE.weights[i]!;
      rodReflectionScaled(alpha, a, a1, kk, mur, cc);
      const cRe = cc[0]!;
      const cIm = cc[1]!;
      // κ e^{α r1} = Gs(α r1) − e^{−α (r2 − r1)} Gs(α r2)
      const kap = besselK1MomentTailScaled(alpha * r1) - Math.exp(-alpha * (r2 - r1)) * besselK1MomentTailScaled(alpha * r2);
      const s = Math.sin(0.5 * alpha * len);
      const q = kap / (alpha * alpha * alpha);
      const fac = wt * Math.exp(-2 * alpha * gap) * q * q * s * s;
      sumRe += fac * cRe;
      sumIm += fac * cIm;
    }
  };

  // material scales near α = 0 need graded panels; the oscillation of sin² needs width ≤ π/ℓ
  const w = Math.min(Math.PI / len, 2 / gap, Math.PI / r2);
  const aMax = 20 / gap;
  let scale = Math.min(Math.sqrt(kk) / mur, 1 / (mur * a), 1 / r2);
  if (!solid) scale = Math.min(scale, (kk * (a - a1)) / (2 * mur), 1 / (mur * (a - a1)));
  let lo = w;
  let levels = 0;
  while (lo / 2 > scale / 8 && levels < 40) {
    panel(lo / 2, lo);
    lo /= 2;
    levels++;
  }
  panel(0, lo);
  let x = w;
  while (x < aMax) {
    const hi = Math.min(x + w, aMax);
    panel(x, hi);
    x = hi;
  }
  const n = turns / ((r2 - r1) * len);
  const coef = 8 * omega * MU_0 * n * n;
  const dR = -coef * sumIm;
  const dX = coef * sumRe;
  const validity: ValidityNote[] = [];
  if (mur > 1) validity.push(constantPermeabilityNote(mur));
  return {
    reflectedResistance: dR,
    // eslint-disable-next-line @typescript-eslint/no-deprecated -- kept until 1.0
    resistanceChange: dR,
    reactanceChange: dX,
    inductanceChange: dX / omega,
    skinDepth: Math.sqrt((2 * rho) / (omega * MU_0 * mur)),
    validity,
  };
}

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
