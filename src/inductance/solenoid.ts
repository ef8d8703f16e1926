/**
 * Single-layer solenoid: Nagaoka's coefficient, the exact current-sheet inductance with Rosa's
 * round-wire corrections, and Wheeler's approximation.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { MU_0 } from "../units/index.js";
import { requireTurns } from "./coil-geometry.js";
import { MU_0_HALF_PI, nagaokaKernel, nagaokaLong, nagaokaShort } from "./kernels.js";
import { rosaB } from "./rosa.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SOLENOID_FIELDS: readonly string[] = Object.freeze(["radius", "length", "turns", "wireDiameter"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const WHEELER_FIELDS: readonly string[] = Object.freeze(["radius", "length", "turns"]);

/**
 * Nagaoka's coefficient: the inductance of a finite current-sheet solenoid relative to the
 * long-solenoid formula, $L = K_N\,\mu_0 \pi a^2 N^2 / l$.
 *
 * $$
 * K_N = \frac{4}{3\pi k'}\left[\frac{k'^2}{k^2}\bigl(K(k) - E(k)\bigr) + E(k) - k\right],\qquad
 * k = \frac{d}{\sqrt{d^2 + l^2}},\; k' = \frac{l}{\sqrt{d^2+l^2}}
 * $$
 *
 * (d = 2a the diameter, l the length). Evaluated with no difference of nearly equal terms (a
 * series of the bracket in $k^2$ for d/l < 1.4919, the logarithmic expansion about $k^2 = 1$
 * above, each economised to a short polynomial), so it keeps full precision for very long coils
 * ($K_N \to 1 - \tfrac{4}{3\pi}\tfrac{d}{l}$) and very short ones
 * ($K_N \to \tfrac{2}{\pi}\tfrac{l}{d}\,[\ln(4d/l) - \tfrac12]$).
 *
 * @param diameterOverLength - d/l of the coil, > 0 (any finite value)
 * @returns K_N (dimensionless), 0 < K_N < 1, decreasing in d/l
 * @throws {@link InputError} when d/l is not a finite number > 0
 * @remarks Accuracy ≤ 1e-13 relative vs mpmath (fixture solenoid.json, d/l from 1e-6 to 1e9;
 * measured worst 7e-16 over a dense mpmath sweep).
 * @see H. Nagaoka, "The inductance coefficients of solenoids", J. Coll. Sci. Imp. Univ. Tokyo 27,
 *   art. 6 (1909); F. W. Grover, Inductance Calculations (1946), ch. 16 (tables of Nagaoka's constant).
 * @example
 * ```ts
 * import { nagaokaCoefficient } from "fluxwright";
 * console.log(nagaokaCoefficient(1).toFixed(4)); // 0.6884
 * ```
 * @category Inductance
 */
export function nagaokaCoefficient(diameterOverLength: number): number {
  const x = requirePositive("nagaokaCoefficient", "diameterOverLength", diameterOverLength, "");
  return nagaokaKernel(x);
}

/**
 * Options of {@link solenoidInductance}.
 *
 * @category Inductance
 */
export interface SolenoidInductanceOptions {
  /** Radius to the wire centres [m], > 0. */
  readonly radius: number;
  /** Winding length [m], > 0: turns × pitch (Rosa's convention). */
  readonly length: number;
  /** Number of turns, ≥ 1 (an integer when `wireDiameter` is given). */
  readonly turns: number;
  /**
   * Diameter of the round wire [m], optional: 0 < wireDiameter ≤ pitch = length/turns and
   * < 2 × radius. When given, Rosa's corrections for round wire are applied.
   */
  readonly wireDiameter?: number;
}

/**
 * Self-inductance of a single-layer solenoid: the exact current-sheet value (Lorenz's formula,
 * written with Nagaoka's coefficient), with Rosa's corrections when the wire diameter is given.
 *
 * $$
 * L_s = \mu_0 \pi a^2 N^2 K_N(2a/l)/l,\qquad
 * L = L_s - \mu_0 a N (A + B),\quad A = \tfrac54 - \ln\frac{2p}{d},\; p = l/N
 * $$
 *
 * (A and B: {@link rosaCorrectionA}, {@link rosaCorrectionB}).
 *
 * @param options - {@link SolenoidInductanceOptions}: radius [m], length [m], turns, wireDiameter [m]
 * @returns self-inductance [H]
 * @throws {@link InputError} for a non-positive or non-finite dimension, turns < 1 (or
 *   fractional with a wire diameter), a wire thicker than the pitch (overlapping turns) or than
 *   the coil diameter
 * @remarks Accuracy: the current sheet is exact (≤ 1e-13 relative vs mpmath, fixture
 * solenoid.json). Rosa's corrections are asymptotic in pitch/radius: they assume wire and pitch
 * small against the radius (in practice p < 0.1 a; common practice), uniform current over the
 * wire (low frequency: skin depth > wire radius), and turns treated as coaxial rings (helix pitch
 * neglected); the correction is then good to well under 0.1 % of L for coils of several turns.
 * @see L. Lorenz, Ann. Phys. 243, 161 (1879); H. Nagaoka (1909); E. B. Rosa, Bull. Bur. Stand. 2,
 *   161 (1906); F. W. Grover, Inductance Calculations (1946), ch. 16, eq. (152) and Tables 7, 8.
 * @example
 * ```ts
 * import { solenoidInductance } from "fluxwright";
 * // 20 turns of 1 mm wire at 1.5 mm pitch on a 25 mm radius (billet-heater coil)
 * const sheet = solenoidInductance({ radius: 0.025, length: 0.03, turns: 20 });
 * const wire = solenoidInductance({ radius: 0.025, length: 0.03, turns: 20, wireDiameter: 0.001 });
 * console.log(sheet.toExponential(4)); // ≈ 1.8742e-5
 * console.log(wire.toExponential(4)); // ≈ 1.8461e-5
 * ```
 * @category Inductance
 */
export function solenoidInductance(options: SolenoidInductanceOptions): number {
  // fast path for the current sheet, valid input checked inline; kept small so that the engine
  // inlines it together with both Nagaoka pieces (a product of finite positives is finite
  // unless it overflows, which only sends the call to the checked path)
  if ((options as unknown) != null && options.wireDiameter === undefined) {
    const a = options.radius;
    const l = options.length;
    const n = options.turns;
    if (typeof a === "number" && typeof l === "number" && typeof n === "number" && a > 0 && l > 0 && n >= 1 && a * l * n < Infinity && solenoidFieldsKnown(options)) {
      const x = (2 * a) / l;
      // mu0 N^2 a (pi x / 2) K_N, Nagaoka's two pieces called directly (one inlining level less)
      const value = MU_0_HALF_PI * n * n * a * x * (x < 1.4919 ? nagaokaLong(x) : nagaokaShort(x));
      if (value > 0 && value < Infinity) return value; // else: extreme scales, the checked path

    }
  }
  return solenoidInductanceChecked(options);
}

/**
 * True when every field is a known one: a for…in over the options with comparisons against
 * constant names (a few ns; a generic list lookup costs several times more on this hot path).
 */
function solenoidFieldsKnown(options: object): boolean {
  for (const key in options) {
    if (key !== "radius" && key !== "length" && key !== "turns" && key !== "wireDiameter") return false;
  }
  return true;
}

/** The validating path of {@link solenoidInductance}. */
function solenoidInductanceChecked(options: SolenoidInductanceOptions): number {
  const where = "solenoidInductance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SOLENOID_FIELDS);
  const a = requirePositive(where, "radius", options.radius, "m");
  const l = requirePositive(where, "length", options.length, "m");
  const n = requireTurns(where, "turns", options.turns);
  const x = (2 * a) / l;
  // mu0 pi a^2 N^2 K_N / l = mu0 N^2 a (pi x / 2) K_N (no overflow of a^2/l for very short coils)
  let sheet = MU_0_HALF_PI * n * n * a * x * nagaokaKernel(x);
  if (!(sheet > 0 && sheet < Infinity)) {
    // a factor left the double range: the same product in logarithms; for x = 2a/l beyond the
    // double range, x·K(x) = (2/π)(ln 4x − 1/2) (thin band, Rosa & Grover 1916) to rounding
    const logX = Math.log(2) + Math.log(a) - Math.log(l);
    const logXK = x < Infinity ? logX + Math.log(nagaokaKernel(x)) : Math.log((2 / Math.PI) * (Math.log(4) + logX - 0.5));
    const logSheet = Math.log(MU_0_HALF_PI) + 2 * Math.log(n) + Math.log(a) + logXK;
    sheet = Math.exp(logSheet);
    if (!(sheet > 0 && sheet < Infinity)) {
      throw new InputError(where, "turns", n, "", `a count for which (with radius ${a} m and length ${l} m) the inductance, e^${logSheet.toPrecision(4)} H, lies within the double-precision range`);
    }
  }
  const d = options.wireDiameter;
  if (d === undefined) return sheet;
  const wire = requirePositive(where, "wireDiameter", d, "m");
  if (!Number.isInteger(n)) throw new InputError(where, "turns", n, "", "an integer ≥ 1 when wireDiameter is given");
  const pitch = l / n;
  // relative tolerance (1e-12): touching turns stay allowed through the rounding of length / turns
  if (wire > pitch * (1 + 1e-12)) {
    throw new InputError(where, "wireDiameter", wire, "m", `at most the pitch length/turns = ${pitch} (turns would overlap)`);
  }
  if (!(wire < 2 * a)) throw new InputError(where, "wireDiameter", wire, "m", `less than the coil diameter ${2 * a}`);
  const rosaA = 1.25 - Math.log((2 * pitch) / wire);
  return sheet - MU_0 * a * n * (rosaA + rosaB(n));
}

/**
 * Options of {@link solenoidInductanceWheeler}.
 *
 * @category Inductance
 */
export interface SolenoidInductanceWheelerOptions {
  /** Radius of the coil (to the wire centres) [m], > 0. */
  readonly radius: number;
  /** Winding length [m], > 0. */
  readonly length: number;
  /** Number of turns, ≥ 1. */
  readonly turns: number;
}

/** One inch in metres (exact by the 1959 international yard and pound agreement). */
const INCH = 0.0254;

/**
 * Wheeler's approximation for a single-layer solenoid, with his original coefficients:
 * $L\,[\mu\mathrm{H}] = r^2N^2/(9r + 10l)$ with r and l in inches, converted exactly to SI:
 *
 * $$ L = 10^{-6}\,\frac{N^2 r^2}{0.0254\,(9r + 10l)}\ \mathrm{H} \quad (r, l \text{ in m}) $$
 *
 * @param options - {@link SolenoidInductanceWheelerOptions}: radius [m], length [m], turns
 * @returns self-inductance [H]
 * @throws {@link InputError} for a non-positive or non-finite dimension or turns < 1
 * @remarks Approximation. Against the exact current sheet ({@link solenoidInductance}) its error
 * is within 0 … −0.6 % for length > 0.8 radius (Wheeler stated "about 1 %"; the tests assert
 * |error| ≤ 1 % there), −4 % at length = 0.4 radius and −19 % at 0.1 radius, growing without
 * bound for flat coils (tabulated in the guide).
 * @see H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1398–1400 (1928), eq. (1).
 * @example
 * ```ts
 * import { solenoidInductanceWheeler } from "fluxwright";
 * console.log(solenoidInductanceWheeler({ radius: 0.025, length: 0.03, turns: 20 }).toExponential(3)); // ≈ 1.875e-5
 * ```
 * @category Inductance
 */
export function solenoidInductanceWheeler(options: SolenoidInductanceWheelerOptions): number {
  const where = "solenoidInductanceWheeler";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, WHEELER_FIELDS);
  const r = requirePositive(where, "radius", options.radius, "m");
  const l = requirePositive(where, "length", options.length, "m");
  const n = requireTurns(where, "turns", options.turns);
  return requireFiniteResult("solenoidInductanceWheeler", "radius, length and turns", (1e-6 * n * n * r * r) / (INCH * (9 * r + 10 * l)));
}
