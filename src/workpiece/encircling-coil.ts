/**
 * Finite coil of rectangular winding cross-section around an infinitely long rod or tube:
 * the Dodd, Deeds & Luquire (1969) integral solution. The rod's and tube's reflection kernels are
 * in rod-reflection.ts (re-exported here).
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { gaussLegendreRule } from "../special/internal.js";
import { besselK1MomentTailScaled } from "./kernels.js";
import { rodReflectionScaled } from "./rod-reflection.js";
import { constantPermeabilityNote } from "./validity-notes.js";

export { rodReflectionScaled, rodReflectionScaledFrom, tubeSurfaceRatio, tubeSurfaceRatioInto } from "./rod-reflection.js";

/** Largest coil length / radial gap accepted (cost about 0.1 s at this ratio on one core). */
const MAX_LENGTH_PER_GAP = 2000;

/** Accepted fields (misspelt ones are rejected, not ignored). */
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
