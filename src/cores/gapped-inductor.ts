/**
 * Gapped-core inductors: reluctance of the core and of the gap with its fringing, inductance,
 * flux density and saturation current; and the gap that gives a wanted inductance.
 *
 * The gap model (core reading, fringing factor, notes) is in `gap-model.ts`, the allocation-free
 * fast path in `gapped-inductor-fast.ts`.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireInteger,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { brentRoot } from "../special/index.js";
import { MU_0 } from "../units/index.js";
import { FRINGING, fringingFactorOf, notesFor, readCore, requireGapFits } from "./gap-model.js";
import { gappedInductorFast } from "./gapped-inductor-fast.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const FIELDS: readonly string[] = Object.freeze(["core", "turns", "gapLength", "fringing", "current"]);
const INVERSE_FIELDS: readonly string[] = Object.freeze(["core", "turns", "inductance", "fringing"]);

/**
 * The magnetic description of a gapped core. From a {@link CoreShape} `s`: `{ effectiveArea:
 * s.effectiveArea, effectivePathLength: s.effectivePathLength, gapArea: s.legArea, legShape:
 * s.legShape, legWidth: s.legWidth, legDepth: s.legDepth, windowHeight: s.windowHeight }` plus the
 * material's `relativePermeability` (and `saturationFluxDensity`).
 *
 * @category Cores
 */
export interface GappedCore {
  /** Effective area $A_e$ [m²], > 0. */
  readonly effectiveArea: number;
  /** Effective path length $l_e$ [m], > gap length. */
  readonly effectivePathLength: number;
  /** Relative permeability of the core material (initial / small-signal) [-], ≥ 1. */
  readonly relativePermeability: number;
  /** Cross-section of the leg at the gap [m²], > 0 (default: the effective area). */
  readonly gapArea?: number;
  /** Section of the gapped leg (default `"rectangular"`); needed by `"muhlethaler"`. */
  readonly legShape?: "rectangular" | "round";
  /** Width of the gapped leg [m] (its diameter when round), > 0; needed by `"muhlethaler"`. */
  readonly legWidth?: number;
  /** Depth of the gapped leg [m], > 0 (ignored when round); needed by `"muhlethaler"`. */
  readonly legDepth?: number;
  /** Window height along the gapped leg [m], > gap length; needed by `"mclyman"` and `"muhlethaler"`. */
  readonly windowHeight?: number;
  /** Saturation flux density of the material at the working temperature [T], > 0 (for `saturationCurrent`). */
  readonly saturationFluxDensity?: number;
}

/**
 * Options of {@link gappedInductor}.
 *
 * @category Cores
 */
export interface GappedInductorOptions {
  /** The core, see {@link GappedCore}. */
  readonly core: GappedCore;
  /** Number of turns, integer ≥ 1. */
  readonly turns: number;
  /** Total gap length along the path (all gaps in series; a centre-leg gap of a pair) [m], ≥ 0. */
  readonly gapLength: number;
  /**
   * Gap model: `"none"` (plain reluctance $g/\mu_0 A_g$), `"mclyman"` (classical fringing factor)
   * or `"muhlethaler"` (Schwarz–Christoffel gap reluctance).
   */
  readonly fringing: "none" | "mclyman" | "muhlethaler";
  /** Peak current for `peakFluxDensity` [A], ≥ 0 (optional). */
  readonly current?: number;
}

/**
 * A gapped inductor's reluctances and what follows from them.
 *
 * @category Cores
 */
export interface GappedInductor {
  /** Inductance $L = N^2/(R_c + R_g)$ [H]. */
  readonly inductance: number;
  /** Reluctance of the gap, fringing included [1/H]. */
  readonly gapReluctance: number;
  /** Reluctance of the core material $(l_e - g)/(\mu_0\mu_r A_e)$ [1/H]. */
  readonly coreReluctance: number;
  /** Fringing factor $F = R_{g,0}/R_g$ ≥ 1: how much the fringing raises the gap's permeance [-]. */
  readonly fringingFactor: number;
  /** Flux density in the core at `current` [T] (`null` without a current). */
  readonly peakFluxDensity: number | null;
  /** Current at which the core reaches `saturationFluxDensity` [A] (`null` without it). */
  readonly saturationCurrent: number | null;
  /** Notes when the gap leaves the range the fringing model was checked over. */
  readonly validity: readonly ValidityNote[];
}

/**
 * Inductance and flux of a gapped core by the magnetic circuit: the core's reluctance in series
 * with the gap's, the gap's fringing by one of three models.
 *
 * $$
 * R_c = \frac{l_e - g}{\mu_0 \mu_r A_e},\quad R_{g,0} = \frac{g}{\mu_0 A_g},\quad R_g = \frac{R_{g,0}}{F},\quad
 * L = \frac{N^2}{R_c + R_g},\quad \hat B = \frac{N \hat I}{(R_c + R_g) A_e},\quad
 * I_\mathrm{sat} = \frac{B_\mathrm{sat} A_e (R_c + R_g)}{N}
 * $$
 *
 * Fringing factors $F$:
 * - `"none"`: $F = 1$.
 * - `"mclyman"`: $F = 1 + \frac{g}{\sqrt{A_g}} \ln\frac{2G}{g}$ with $G$ the window height.
 * - `"muhlethaler"`: the 2-D Schwarz–Christoffel reluctance of a gap $g$ in a leg of width $w$ with
 *   a flank of height $h = (G - g)/2$ on each side, $\sigma_w = \frac{w/g}{w/g + \frac{2}{\pi}\left(1 + \ln\frac{\pi h}{2g}\right)}$,
 *   applied in both directions: $F = 1/(\sigma_w \sigma_d)$; a round leg of diameter $D$ is the
 *   square of side $D$ (same perimeter-to-area ratio).
 *
 * Hard domain (throws {@link InputError}): a non-finite, negative or zero input where positive is
 * required; turns not an integer ≥ 1; μr < 1; gap ≥ $l_e$; with a fringing model, no window
 * height or gap ≥ half of it; `"muhlethaler"` without the leg's width (and depth). Validity: a
 * linear core (below saturation; μr the small-signal value), one gap in the winding leg. The
 * models were checked for 0.011 ≤ g/w ≤ 0.17 and g/G ≤ 0.22; beyond, `validity` says so.
 * Accuracy: the circuit arithmetic is exact (the `"none"` inductance equals the hand sum). Against
 * the axisymmetric finite-element fixture of a gapped pot core (test/fixtures/cores/pot-gap.json,
 * gap 0.1 … 1.6 mm in a 9.2 mm post) the fringing factor is within **1.7 %** with `"muhlethaler"`
 * (max +1.69 %) and **2.9 %** with `"mclyman"` (max −2.87 %); `"none"` is up to 32 % low there.
 * With {@link potCore}'s parameters and `"muhlethaler"`, the inductance itself is within 1.5 %
 * of the field solution over the same gaps.
 * Mühlethaler et al. report agreement with 3-D field solutions and measurements within about 5 %
 * (from memory).
 *
 * @param options - {@link GappedInductorOptions}
 * @returns {@link GappedInductor}: inductance [H], reluctances [1/H], F [-], B [T], I_sat [A]
 * @throws {@link InputError} on bad input
 * @see J. Mühlethaler, J. W. Kolar, A. Ecklebe, "A novel approach for 3D air gap reluctance calculations", Proc. IEEE ECCE Asia (ICPE) 2011, eqs. (9)–(13), and J. Mühlethaler, "Modeling and multi-objective optimization of inductive power components", ETH Zurich dissertation 2012, ch. 2 (Schwarz–Christoffel basic reluctance); C. Wm. T. McLyman, Transformer and Inductor Design Handbook, 3rd ed., ch. 8 (fringing flux factor; equation number from memory).
 * @example
 * ```ts
 * import { gappedInductor } from "fluxwright";
 * const core = { effectiveArea: 9.7e-5, effectivePathLength: 0.0686, relativePermeability: 2000, legShape: "round" as const, legWidth: 0.0111, windowHeight: 0.0222, saturationFluxDensity: 0.35 };
 * const l = gappedInductor({ core, turns: 30, gapLength: 0.8e-3, fringing: "muhlethaler", current: 4 });
 * console.log(l.inductance.toExponential(3)); // 1.819e-4
 * console.log(l.fringingFactor.toFixed(3)); // 1.406
 * ```
 * @category Cores
 */
export function gappedInductor(options: GappedInductorOptions): GappedInductor {
  if (typeof options === "object" && (options as unknown) !== null) {
    const fast = gappedInductorFast(options);
    if (fast !== null) return fast;
  }
  return gappedInductorChecked(options);
}

/** The validating path of {@link gappedInductor}. */
function gappedInductorChecked(options: GappedInductorOptions): GappedInductor {
  const where = "gappedInductor";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FIELDS);
  const fringing = requireOneOf(where, "fringing", options.fringing, FRINGING);
  const d = readCore(where, options.core, fringing);
  const turns = requireInteger(where, "turns", options.turns, 1);
  const g = requireNonNegative(where, "gapLength", options.gapLength, "m");
  requireGapFits(where, "gapLength", g, d, fringing);
  const current = options.current === undefined ? NaN : requireNonNegative(where, "current", options.current, "A");
  const coreReluctance = (d.length - g) / (MU_0 * d.mur * d.area);
  const f = fringingFactorOf(fringing, d, g);
  const gapReluctance = g / (MU_0 * d.gapArea * f);
  const total = coreReluctance + gapReluctance;
  return {
    inductance: (turns * turns) / total,
    gapReluctance,
    coreReluctance,
    fringingFactor: f,
    peakFluxDensity: Number.isNaN(current) ? null : (turns * current) / (total * d.area),
    saturationCurrent: Number.isNaN(d.bsat) ? null : (d.bsat * d.area * total) / turns,
    validity: notesFor(fringing, d, g),
  };
}

/**
 * Options of {@link gapLengthForInductance}.
 *
 * @category Cores
 */
export interface GapLengthForInductanceOptions {
  /** The core, see {@link GappedCore}. */
  readonly core: GappedCore;
  /** Number of turns, integer ≥ 1. */
  readonly turns: number;
  /** Wanted inductance [H], > 0 and below the ungapped core's $N^2\mu_0\mu_r A_e/l_e$. */
  readonly inductance: number;
  /** Gap model, as in {@link gappedInductor}. */
  readonly fringing: "none" | "mclyman" | "muhlethaler";
}

/**
 * The gap length that gives a wanted inductance: {@link gappedInductor} inverted. Without
 * fringing the reluctance is linear in $g$ and the gap is closed-form; with fringing the
 * gap is the smallest root of $L(g) = L_\text{wanted}$ above the unfringed gap $g_0$, bracketed
 * by stepping up by 25 % and refined by Brent's method.
 *
 * $$
 * g_0 = \frac{N^2/L - l_e/(\mu_0\mu_r A_e)}{1/(\mu_0 A_g) - 1/(\mu_0\mu_r A_e)},\qquad
 * L(g) = \frac{N^2}{R_c(g) + g/(\mu_0 A_g F(g))} \overset{!}{=} L_\text{wanted}
 * $$
 *
 * Hard domain (throws {@link InputError}): as {@link gappedInductor}; the inductance not below the
 * ungapped value; no gap below half the window height (or $l_e$) reaching it. Validity: as
 * {@link gappedInductor}. Accuracy: $L(g)$ reproduces the wanted inductance to ≤ 1e-12 relative
 * (the models' own accuracy is that of {@link gappedInductor}).
 *
 * @param options - {@link GapLengthForInductanceOptions}
 * @returns the gap length [m]
 * @throws {@link InputError} on bad input or an unreachable inductance
 * @see as {@link gappedInductor}; R. P. Brent (1973), ch. 4, for the root.
 * @example
 * ```ts
 * import { gapLengthForInductance } from "fluxwright";
 * const core = { effectiveArea: 9.7e-5, effectivePathLength: 0.0686, relativePermeability: 2000, legShape: "round" as const, legWidth: 0.0111, windowHeight: 0.0222 };
 * console.log(gapLengthForInductance({ core, turns: 30, inductance: 150e-6, fringing: "muhlethaler" }).toExponential(3)); // 1.049e-3
 * ```
 * @category Cores
 */
export function gapLengthForInductance(options: GapLengthForInductanceOptions): number {
  const where = "gapLengthForInductance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, INVERSE_FIELDS);
  const fringing = requireOneOf(where, "fringing", options.fringing, FRINGING);
  const d = readCore(where, options.core, fringing);
  const turns = requireInteger(where, "turns", options.turns, 1);
  const wanted = requirePositive(where, "inductance", options.inductance, "H");
  const need = (turns * turns) / wanted;
  const rCoreFull = d.length / (MU_0 * d.mur * d.area);
  if (!(need > rCoreFull)) {
    throw new InputError(where, "inductance", wanted, "H", `a finite number < the ungapped inductance ${(turns * turns) / rCoreFull} H`);
  }
  const slope = 1 / (MU_0 * d.gapArea) - 1 / (MU_0 * d.mur * d.area);
  const g0 = (need - rCoreFull) / slope;
  const limit = fringing === "none" ? d.length : Math.min(d.length, d.window / 2);
  const reluctance = (g: number): number =>
    (d.length - g) / (MU_0 * d.mur * d.area) + g / (MU_0 * d.gapArea * fringingFactorOf(fringing, d, g));
  if (fringing === "none") {
    if (!(g0 < limit)) throw new InputError(where, "inductance", wanted, "H", `reachable with a gap < ${limit} m`);
    return g0;
  }
  const upperGap = limit * (1 - 1e-9);
  // March up from the unfringed gap (fringing only lowers the reluctance, so g0 is below the
  // root) to the first crossing: far outside the checked range the fringed reluctance can turn
  // down again, and the smallest root is the physical one.
  let lower = Math.min(g0, upperGap);
  if (reluctance(lower) >= need) return lower;
  let upper = Math.min(upperGap, lower * 1.25);
  while (reluctance(upper) < need) {
    if (upper >= upperGap) {
      throw new InputError(where, "inductance", wanted, "H", `reachable with a gap < ${limit} m (window height / 2 or l_e)`);
    }
    lower = upper;
    upper = Math.min(upperGap, upper * 1.25);
  }
  return brentRoot((g) => reluctance(g) - need, lower, upper, { tolerance: 0 });
}
