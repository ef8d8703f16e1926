/**
 * The Dodd–Deeds–Luquire finite coil around a rod or tube with its geometry prepared once:
 * repeated evaluations over frequency and material (a heat-up, an operating-point iteration)
 * cost one complex Bessel ratio per quadrature node.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject } from "../core/index.js";
import {
  besselI0Scaled,
  besselI1OverI0Complex,
  besselI1Scaled,
  besselK0Scaled,
  besselK1Scaled,
} from "../special/index.js";
import { MU_0 } from "../units/index.js";
import type { EncirclingCoil } from "./encircling-coil.js";
import { readEncirclingGeometry, tubeSurfaceRatioInto } from "./encircling-coil.js";
import { gaussLegendreRule } from "../special/internal.js";
import { besselK1MomentTailScaled } from "./kernels.js";

/**
 * Geometry of {@link prepareEncirclingCoilOverRod}: the coil as in
 * {@link encirclingCoilOverRod} and the rod's radii (its material comes with each evaluation).
 *
 * @category Workpiece
 */
export interface EncirclingCoilGeometry {
  /** The coil, see {@link EncirclingCoil}. */
  readonly coil: EncirclingCoil;
  /** The rod's radii, see {@link RodRadii}. */
  readonly rod: RodRadii;
}

/**
 * The radii of a rod or tube for {@link prepareEncirclingCoilOverRod}.
 *
 * @category Workpiece
 */
export interface RodRadii {
  /** Outer radius [m], > 0 and < the coil's innerRadius. */
  readonly radius: number;
  /** Bore radius of a tube [m], ≥ 0 and < radius; omitted or 0 for a solid rod. */
  readonly innerRadius?: number;
}

/**
 * Impedance change from a prepared encircling-coil geometry
 * ({@link prepareEncirclingCoilOverRod}).
 *
 * @category Workpiece
 */
export interface EncirclingCoilChange {
  /** Resistance reflected into the coil, $\Delta R$ [Ω], ≥ 0. */
  readonly reflectedResistance: number;
  /**
   * The same value as {@link EncirclingCoilChange.reflectedResistance} [Ω].
   *
   * @deprecated Use `reflectedResistance`; this field goes at 1.0.
   */
  readonly resistanceChange: number;
  /** Reactance change $\Delta X$ [Ω]. */
  readonly reactanceChange: number;
  /** Inductance change $\Delta X/\omega$ [H]. */
  readonly inductanceChange: number;
}

/**
 * The impedance change of a prepared geometry at one frequency and material.
 *
 * @param frequency - frequency [Hz], > 0
 * @param resistivity - rod resistivity [Ω·m], > 0
 * @param relativePermeability - rod relative permeability [-], ≥ 1
 * @category Workpiece
 */
export type EncirclingCoilEvaluator = (frequency: number, resistivity: number, relativePermeability: number) => EncirclingCoilChange;

const PANEL_NODES = 6;
const RULE = gaussLegendreRule(PANEL_NODES);
/** Geometric panels towards α = 0 (from the first oscillation width down by 2⁻⁴⁰). */
const GRADED_LEVELS = 24;
const KNOWN = ["coil", "rod"] as const;
/** |z|² above which I1/I0 comes from Hankel's asymptotic sums. */
const ASYMPTOTIC_LIMIT_SQUARED = 40 * 40;

/**
 * Prepares the finite-coil-over-rod integral of {@link encirclingCoilOverRod} for one geometry
 * and returns an evaluator of the impedance change at any frequency, resistivity and relative
 * permeability. Everything that depends on geometry alone (quadrature nodes, the winding
 * moments $\kappa(\alpha)$, $\sin^2(\alpha\ell/2)$, the rod's $I_{0,1}(\alpha a)$,
 * $K_{0,1}(\alpha a)$) is computed once; an evaluation costs one complex Bessel ratio per node
 * (a solid rod) or four complex Bessel pairs per node (a tube).
 *
 * $$
 * \Delta Z = 8j\omega\mu_0 n^2 \int_0^\infty C(\alpha)\,\frac{\kappa(\alpha)^2\sin^2(\alpha\ell/2)}{\alpha^6}\,d\alpha,\qquad
 * C = \frac{\alpha I_0(\alpha a) - R\,I_1(\alpha a)}{\alpha K_0(\alpha a) + R\,K_1(\alpha a)}
 * $$
 *
 * (symbols as in {@link encirclingCoilOverRod}). The quadrature uses a fixed set of panels: 40
 * geometric levels towards $\alpha = 0$ below the oscillation width
 * $w = \min(\pi/\ell, 2/(r_1 - a), \pi/r_2)$, then panels of width $w$ up to $20/(r_1 - a)$,
 * 12 Gauss–Legendre nodes each.
 *
 * Hard domain (throws {@link InputError}): as {@link encirclingCoilOverRod} (0 < rod radius <
 * coil innerRadius < outerRadius, length > 0, turns an integer ≥ 1, 0 ≤ rod innerRadius < rod
 * radius); unknown keys. The evaluator itself does not check its arguments (hot path): give it
 * frequency > 0, resistivity > 0, relative permeability ≥ 1.
 * Validity: that of {@link encirclingCoilOverRod} (rod much longer than the coil, linear
 * material, uniform winding current density).
 * Accuracy: agrees with {@link encirclingCoilOverRod} to ≤ 1e-7 relative in |ΔZ| (tested over
 * bars and tubes, μr 1 … 1000, a/δ 0.3 … 300), itself ≤ 1e-7 from an independent scipy
 * evaluation of the integral.
 * Cost: preparation about as much as one {@link encirclingCoilOverRod} call; an evaluation
 * about 0.1–0.3 ms for a solid rod (one core).
 *
 * @param geometry - coil and rod radii, see {@link EncirclingCoilGeometry}
 * @returns the evaluator `(frequency, resistivity, relativePermeability) → ΔR, ΔX, ΔL`
 * @throws {@link InputError} for a geometry outside the hard domain
 * @see C. V. Dodd, W. E. Deeds and J. W. Luquire, "Integral solutions to some eddy current
 *   problems", Int. J. Nondestructive Testing 1 (1969) 29–90 (coil encircling a rod and tube).
 * @example
 * ```ts
 * import { prepareEncirclingCoilOverRod } from "fluxwright";
 * const change = prepareEncirclingCoilOverRod({
 *   coil: { innerRadius: 0.02, outerRadius: 0.025, length: 0.05, turns: 10 },
 *   rod: { radius: 0.015 },
 * });
 * const r = change(1e3, 3e-8, 1);
 * console.log(r.reflectedResistance > 0, r.inductanceChange < 0); // true true
 * ```
 * @category Workpiece
 */
export function prepareEncirclingCoilOverRod(geometry: EncirclingCoilGeometry): EncirclingCoilEvaluator {
  const where = "prepareEncirclingCoilOverRod";
  requireObject(where, "geometry", geometry);
  requireKnownKeys(where, "geometry", geometry, KNOWN);
  const { r1, r2, len, turns, a, a1 } = readEncirclingGeometry(where, geometry.coil, geometry.rod, ["radius", "innerRadius"]);
  const solid = a1 < 1e-9 * a;

  const { count, alpha, weight, i0, i1, k0, k1, bore } = quadratureNodes(r1, r2, len, a, a1, solid);
  const windingDensity = turns / ((r2 - r1) * len);
  const ratio = new Float64Array(2);

  return (frequency: number, resistivity: number, relativePermeability: number): EncirclingCoilChange => {
    const mur = relativePermeability;
    const omega = 2 * Math.PI * frequency;
    const kk = (omega * MU_0 * mur) / resistivity;
    // a wall many skin depths thick shields the bore: the solid-rod ratio is then exact to e^{−40}
    const thick = solid || 2 * (a - a1) * Math.sqrt(0.5 * kk) > 40;
    let sumRe = 0;
    let sumIm = 0;
    for (let j = 0; j < count; j++) {
      const al = alpha[j]!;
      const b2 = al * al;
      const rr = Math.hypot(b2, kk);
      const bRe = Math.sqrt(0.5 * (rr + b2));
      const bIm = kk / (2 * bRe);
      let rRe: number;
      let rIm: number;
      if (thick) {
        const zRe = bRe * a;
        const zIm = bIm * a;
        let wRe: number;
        let wIm: number;
        if (zRe * zRe + zIm * zIm >= ASYMPTOTIC_LIMIT_SQUARED) {
          // Hankel's expansions of I0 and I1 (the e^{−2z} part is below 1e-24 here): the ratio
          // of the two sums, to ≤ 1e-16 with 12 terms for |z| ≥ 40
          const d = 8 * (zRe * zRe + zIm * zIm);
          const uRe = zRe / d; // u = 1/(8z)
          const uIm = -zIm / d;
          let t0Re = 1;
          let t0Im = 0;
          let t1Re = 1;
          let t1Im = 0;
          let s0Re = 1;
          let s0Im = 0;
          let s1Re = 1;
          let s1Im = 0;
          for (let k = 1; k <= 12; k++) {
            const odd = (2 * k - 1) * (2 * k - 1);
            const c0 = odd / k;
            const c1 = (odd - 4) / k;
            const a0 = c0 * (t0Re * uRe - t0Im * uIm);
            t0Im = c0 * (t0Re * uIm + t0Im * uRe);
            t0Re = a0;
            const a1 = c1 * (t1Re * uRe - t1Im * uIm);
            t1Im = c1 * (t1Re * uIm + t1Im * uRe);
            t1Re = a1;
            s0Re += t0Re;
            s0Im += t0Im;
            s1Re += t1Re;
            s1Im += t1Im;
          }
          const ss = s0Re * s0Re + s0Im * s0Im;
          wRe = (s1Re * s0Re + s1Im * s0Im) / ss;
          wIm = (s1Im * s0Re - s1Re * s0Im) / ss;
        } else {
          const wv = besselI1OverI0Complex({ re: zRe, im: zIm });
          wRe = wv.re;
          wIm = wv.im;
        }
        const ww = wRe * wRe + wIm * wIm;
        rRe = (bRe * wRe + bIm * wIm) / (ww * mur);
        rIm = (bIm * wRe - bRe * wIm) / (ww * mur);
      } else {
        tubeSurfaceRatioInto(bRe, bIm, a, a1, mur, bore[j]!, ratio);
        rRe = ratio[0]!;
        rIm = ratio[1]!;
      }
      const nRe = al * i0[j]! - rRe * i1[j]!;
      const nIm = -rIm * i1[j]!;
      const dRe = al * k0[j]! + rRe * k1[j]!;
      const dIm = rIm * k1[j]!;
      const dd = dRe * dRe + dIm * dIm;
      const fac = weight[j]!;
      sumRe += (fac * (nRe * dRe + nIm * dIm)) / dd;
      sumIm += (fac * (nIm * dRe - nRe * dIm)) / dd;
    }
    const coef = 8 * omega * MU_0 * windingDensity * windingDensity;
    const dX = coef * sumRe;
    const dR = -coef * sumIm;
    // eslint-disable-next-line @typescript-eslint/no-deprecated -- resistanceChange kept until 1.0
    return { reflectedResistance: dR, resistanceChange: dR, reactanceChange: dX, inductanceChange: dX / omega };
  };
}

/** Quadrature nodes of {@link prepareEncirclingCoilOverRod} with everything that depends on geometry alone. */
interface QuadratureNodes {
  readonly count: number;
  /** Node abscissae α [1/m]. */
  readonly alpha: Float64Array;
  /** Weight × e^{−2α gap} (κ/α³)² sin²(αℓ/2). */
  readonly weight: Float64Array;
  /** Scaled I₀, I₁, K₀, K₁ at α a. */
  readonly i0: Float64Array;
  readonly i1: Float64Array;
  readonly k0: Float64Array;
  readonly k1: Float64Array;
  /** Tube: α I₀(α a₁)/I₁(α a₁) (unused for a solid rod). */
  readonly bore: Float64Array;
}

/**
 * The fixed quadrature of {@link prepareEncirclingCoilOverRod} for a coil r1 … r2 of length `len`
 * around a rod of radius a (bore a1): graded panels towards α = 0, then uniform panels of the
 * oscillation width, with the geometry-only factors at each node.
 */
function quadratureNodes(r1: number, r2: number, len: number, a: number, a1: number, solid: boolean): QuadratureNodes {
  const gap = r1 - a;
  // nodes: graded panels towards 0, then uniform panels of the oscillation width
  const w = Math.min(Math.PI / len, 2 / gap, Math.PI / r2);
  const aMax = 20 / gap;
  const panels: [number, number][] = [];
  let lo = w;
  for (let level = 0; level < GRADED_LEVELS; level++) {
    panels.push([lo / 2, lo]);
    lo /= 2;
  }
  panels.push([0, lo]);
  for (let x = w; x < aMax; ) {
    const hi = Math.min(x + w, aMax);
    panels.push([x, hi]);
    x = hi;
  }
  const count = panels.length * PANEL_NODES;
  const alpha = new Float64Array(count);
  const weight = new Float64Array(count); // wt e^{−2α gap} q² s²
  const i0 = new Float64Array(count);
  const i1 = new Float64Array(count);
  const k0 = new Float64Array(count);
  const k1 = new Float64Array(count);
  const bore = new Float64Array(count); // tube: α I0(α a1)/I1(α a1)
  let n = 0;
  for (const [p0, p1] of panels) {
    const half = 0.5 * (p1 - p0);
    const mid = 0.5 * (p1 + p0);
    for (let i = 0; i < PANEL_NODES; i++) {
      const al = mid + half * RULE.nodes[i]!;
      const x = al * a;
      const kap = besselK1MomentTailScaled(al * r1) - Math.exp(-al * (r2 - r1)) * besselK1MomentTailScaled(al * r2);
      const s = Math.sin(0.5 * al * len);
      const q = kap / (al * al * al);
      alpha[n] = al;
      weight[n] = half * RULE.weights[i]! * Math.exp(-2 * al * gap) * q * q * s * s;
      i0[n] = besselI0Scaled(x);
      i1[n] = besselI1Scaled(x);
      k0[n] = besselK0Scaled(x);
      k1[n] = besselK1Scaled(x);
      if (!solid) bore[n] = (al * besselI0Scaled(al * a1)) / besselI1Scaled(al * a1);
      n++;
    }
  }
  return { count, alpha, weight, i0, i1, k0, k1, bore };
}
