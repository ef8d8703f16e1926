/**
 * Flat (pancake) spiral coils of round wire: exact sum over turns, Wheeler's and Mohan's
 * approximations.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { MU_0 } from "../units/index.js";
import { checkSpiralRadii } from "./coil-geometry.js";
import { maxwellOverMu0 } from "./kernels.js";
import { loopSelf, type LoopCurrentDistribution } from "./loop.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SPIRAL_FIELDS: readonly string[] = Object.freeze(["innerRadius", "outerRadius", "turns", "wireDiameter", "currentDistribution"]);

/**
 * Options of {@link spiralCoilInductance}.
 *
 * @category Inductance
 */
export interface SpiralCoilOptions {
  /** Radius of the innermost turn's wire centre [m], > wireDiameter/2. */
  readonly innerRadius: number;
  /** Radius of the outermost turn's wire centre [m], > innerRadius (equal for a single turn). */
  readonly outerRadius: number;
  /** Number of turns, an integer ≥ 1; turns are evenly spaced from innerRadius to outerRadius. */
  readonly turns: number;
  /** Wire diameter [m], > 0 and ≤ the pitch (outerRadius − innerRadius)/(turns − 1). */
  readonly wireDiameter: number;
  /** Current distribution over each wire, default `"uniform"` (see {@link loopInductance}). */
  readonly currentDistribution?: LoopCurrentDistribution;
}

/** Most turns of the exact sum (N² cost: about 0.15 s at this count on one core). */
const MAX_SPIRAL_TURNS = 3000;
/** Relative tolerance of geometric limits: touching turns stay allowed through the rounding of computed lengths. */
const GEOMETRY_RTOL = 1e-12;

function readSpiral(where: string, options: SpiralCoilOptions, needWire: boolean): { r1: number; r2: number; n: number; wire: number; pitch: number } {
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SPIRAL_FIELDS);
  const r1 = requirePositive(where, "innerRadius", options.innerRadius, "m");
  const r2 = requirePositive(where, "outerRadius", options.outerRadius, "m");
  const n = requireInteger(where, "turns", options.turns, 1);
  checkSpiralRadii(where, "outerRadius", r1, r2, n);
  let wire = NaN;
  if (needWire || options.wireDiameter !== undefined || n === 1) {
    wire = requirePositive(where, "wireDiameter", options.wireDiameter, "m");
  }
  const pitch = n === 1 ? wire : (r2 - r1) / (n - 1);
  if (Number.isNaN(wire)) return { r1, r2, n, wire, pitch };
  // relative tolerance: a pitch computed from radii (0.0019999999999999996 for 2 mm) still lets 2 mm wire touch
  if (wire > pitch * (1 + GEOMETRY_RTOL)) throw new InputError(where, "wireDiameter", wire, "m", `at most the pitch ${pitch} (turns would overlap)`);
  if (!(wire < 2 * r1)) throw new InputError(where, "wireDiameter", wire, "m", `less than 2 × innerRadius (${2 * r1})`);
  return { r1, r2, n, wire, pitch };
}

/**
 * Self-inductance of a flat spiral of round wire, exactly: the sum of the self-inductances of
 * its turns (coaxial circular rings at evenly spaced radii) and of all mutual inductances
 * between them.
 *
 * $$ L = \sum_{i=1}^{N} L_\mathrm{loop}(r_i, d/2) + 2\sum_{i<j} M(r_i, r_j, 0),\qquad
 * r_i = r_\mathrm{in} + (i-1)\frac{r_\mathrm{out} - r_\mathrm{in}}{N-1} $$
 *
 * ({@link loopInductance}, {@link loopMutualInductance}).
 *
 * @param options - {@link SpiralCoilOptions}: innerRadius [m], outerRadius [m], turns, wireDiameter [m], currentDistribution
 * @returns self-inductance [H]
 * @throws {@link InputError} for a non-positive or non-finite dimension, fractional turns or
 *   turns < 1, outerRadius ≤ innerRadius with several turns (or ≠ with one), a wire thicker than
 *   the pitch (overlapping turns) or than the innermost turn's diameter
 * @remarks Accuracy: the mutual terms are exact to ≤ 1e-14 (Maxwell between filaments at the wire
 * centres, which for round wires with uniform current equals the wire-to-wire value up to
 * O((d/r)²) curvature terms); the self terms carry the accuracy of {@link loopInductance}. The
 * spiral's pitch is neglected (turns as concentric rings), as in the published methods.
 * Cost: N(N−1)/2 Maxwell evaluations (30 turns: about 10 µs; 3000 turns, the most accepted:
 * about 0.15 s).
 * @see F. W. Grover, Inductance Calculations (1946), ch. 11 (coaxial circular filaments, summed over the turns).
 * @example
 * ```ts
 * import { spiralCoilInductance } from "fluxwright";
 * // pancake warmer coil: 15 turns of 2 mm wire at 3 mm pitch from 20 mm radius
 * const l = spiralCoilInductance({ innerRadius: 0.02, outerRadius: 0.062, turns: 15, wireDiameter: 0.002 });
 * console.log(l.toExponential(4)); // ≈ 1.7716e-5
 * ```
 * @category Inductance
 */
export function spiralCoilInductance(options: SpiralCoilOptions): number {
  const where = "spiralCoilInductance";
  const { r1, r2, n, wire } = readSpiral(where, options, true);
  if (n > MAX_SPIRAL_TURNS) {
    throw new InputError(where, "turns", n, "", `an integer between 1 and ${MAX_SPIRAL_TURNS} (the cost grows as turns²; for more, use spiralCoilInductanceMohan)`);
  }
  const surface =
    options.currentDistribution !== undefined &&
    requireOneOf(where, "currentDistribution", options.currentDistribution, ["uniform", "surface"] as const) === "surface";
  const rho = 0.5 * wire;
  const step = n === 1 ? 0 : (r2 - r1) / (n - 1);
  let self = 0;
  let mutual = 0;
  for (let i = 0; i < n; i++) {
    const ri = r1 + step * i;
    self += loopSelf(ri, rho, surface);
    for (let j = i + 1; j < n; j++) mutual += maxwellOverMu0(ri, r1 + step * j, 0);
  }
  return requireFiniteResult(where, "innerRadius, outerRadius and wireDiameter", self + 2 * MU_0 * mutual);
}

/**
 * Options of {@link spiralCoilInductanceWheeler} and {@link spiralCoilInductanceMohan}.
 *
 * @category Inductance
 */
export interface SpiralCoilApproximationOptions {
  /** Radius of the innermost turn's wire centre [m], > 0. */
  readonly innerRadius: number;
  /** Radius of the outermost turn's wire centre [m], > innerRadius (equal for a single turn). */
  readonly outerRadius: number;
  /** Number of turns, an integer ≥ 1. */
  readonly turns: number;
  /** Wire diameter [m]: optional, ≤ pitch; required for a single turn (it is then the width of the winding). */
  readonly wireDiameter?: number;
}

/** Mean radius a and winding depth c = N × pitch of the equivalent current sheet. */
function sheetOf(where: string, options: SpiralCoilApproximationOptions): [number, number, number] {
  const { r1, r2, n, pitch } = readSpiral(where, options as SpiralCoilOptions, false);
  return [0.5 * (r1 + r2), n * pitch, n];
}

/**
 * Wheeler's approximation for a flat spiral, with his original coefficients:
 * $L\,[\mu\mathrm{H}] = a^2N^2/(8a + 11c)$, a the mean radius and c the radial depth of the
 * winding in inches; converted exactly to SI. Here a = (innerRadius + outerRadius)/2 and
 * c = N × pitch (each turn occupies one pitch, as in Rosa's convention for solenoids).
 *
 * $$ L = 10^{-6}\,\frac{a^2N^2}{0.0254\,(8a + 11c)}\ \mathrm{H}\quad(\text{lengths in m}) $$
 *
 * @param options - {@link SpiralCoilApproximationOptions}: innerRadius [m], outerRadius [m], turns, wireDiameter [m]
 * @returns self-inductance [H]
 * @throws {@link InputError} as {@link spiralCoilInductance} (wireDiameter needed only for one turn)
 * @remarks Approximation. Wheeler stated about 5 % for c > 0.2a; against {@link spiralCoilInductance}
 * (tabulated in the guide) it is typically within a few per cent for close-wound spirals of many turns.
 * @see H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1398–1400 (1928), eq. (3).
 * @example
 * ```ts
 * import { spiralCoilInductanceWheeler } from "fluxwright";
 * const l = spiralCoilInductanceWheeler({ innerRadius: 0.02, outerRadius: 0.062, turns: 15 });
 * console.log(l.toExponential(3)); // ≈ 1.809e-5
 * ```
 * @category Inductance
 */
export function spiralCoilInductanceWheeler(options: SpiralCoilApproximationOptions): number {
  const [a, c, n] = sheetOf("spiralCoilInductanceWheeler", options);
  return requireFiniteResult("spiralCoilInductanceWheeler", "radii and turns", (1e-6 * a * a * n * n) / (INCH * (8 * a + 11 * c)));
}

/** One inch in metres (exact). */
const INCH = 0.0254;

/**
 * Mohan et al.'s current-sheet approximation for a circular planar spiral:
 *
 * $$ L = \frac{\mu_0 N^2 d_\mathrm{avg} c_1}{2}\left[\ln\frac{c_2}{\rho} + c_3\rho + c_4\rho^2\right],
 * \quad c_1 = 1.00,\ c_2 = 2.46,\ c_3 = 0,\ c_4 = 0.20 $$
 *
 * with $d_\mathrm{avg}$ the mean diameter and $\rho = (d_\mathrm{out} - d_\mathrm{in})/(d_\mathrm{out} + d_\mathrm{in})$
 * the fill ratio of the sheet; here $d_\mathrm{avg} = r_\mathrm{in} + r_\mathrm{out}$ and the sheet spans
 * N × pitch (half a pitch beyond the outer and inner wire centres).
 *
 * @param options - {@link SpiralCoilApproximationOptions}: innerRadius [m], outerRadius [m], turns, wireDiameter [m]
 * @returns self-inductance [H]
 * @throws {@link InputError} as {@link spiralCoilInductanceWheeler}
 * @remarks Approximation. Mohan et al. report about 2–3 % against field solvers and
 * measurements for their on-chip spirals; against {@link spiralCoilInductance} see the guide's table.
 * @see S. S. Mohan, M. del Mar Hershenson, S. P. Boyd, T. H. Lee, "Simple accurate expressions for
 *   planar spiral inductances", IEEE J. Solid-State Circuits 34(10), 1419–1424 (1999), eq. (3) and Table II.
 * @example
 * ```ts
 * import { spiralCoilInductanceMohan } from "fluxwright";
 * const l = spiralCoilInductanceMohan({ innerRadius: 0.02, outerRadius: 0.062, turns: 15 });
 * console.log(l.toExponential(3)); // ≈ 1.809e-5
 * ```
 * @category Inductance
 */
export function spiralCoilInductanceMohan(options: SpiralCoilApproximationOptions): number {
  const [a, c, n] = sheetOf("spiralCoilInductanceMohan", options);
  const rho = c / (2 * a);
  return requireFiniteResult("spiralCoilInductanceMohan", "radii and turns", MU_0 * n * n * a * (Math.log(2.46 / rho) + 0.2 * rho * rho));
}
