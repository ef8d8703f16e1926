/**
 * Multilayer coils of rectangular winding cross-section: exact (uniform current density),
 * Wheeler's approximation and Brooks' coil.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { multilayerShape, shapeMutual } from "./coaxial.js";
import { requireTurns } from "./coil-geometry.js";
import { MU_0_HALF_PI, nagaokaKernel } from "./kernels.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const BROOKS_FIELDS: readonly string[] = Object.freeze(["sideLength", "meanRadius", "turns"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const MULTILAYER_FIELDS: readonly string[] = Object.freeze(["innerRadius", "outerRadius", "length", "turns"]);

/**
 * Options of {@link multilayerCoilInductance} and {@link multilayerCoilInductanceWheeler}.
 *
 * @category Inductance
 */
export interface MultilayerCoilOptions {
  /** Inner radius of the winding [m], > 0. */
  readonly innerRadius: number;
  /** Outer radius of the winding [m], ≥ innerRadius (equal: a current-sheet solenoid). */
  readonly outerRadius: number;
  /** Axial length of the winding [m], > 0. */
  readonly length: number;
  /** Number of turns, ≥ 1. */
  readonly turns: number;
}

/** Smallest length/outerRadius of the exact integral (its cost grows as the inverse). */
const MIN_LENGTH_RATIO = 1e-4;

function readMultilayer(where: string, options: MultilayerCoilOptions): [number, number, number, number] {
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, MULTILAYER_FIELDS);
  const r1 = requirePositive(where, "innerRadius", options.innerRadius, "m");
  const r2 = requirePositive(where, "outerRadius", options.outerRadius, "m");
  if (!(r2 >= r1)) throw new InputError(where, "outerRadius", r2, "m", `a finite number ≥ innerRadius (${r1})`);
  const l = requirePositive(where, "length", options.length, "m");
  const n = requireTurns(where, "turns", options.turns);
  return [r1, r2, l, n];
}

/**
 * Self-inductance of a coil of rectangular winding cross-section carrying a uniform current
 * density (N turns smeared over the section: the limit of fine wire, low frequency).
 *
 * $$
 * L = \frac{N^2}{A^2}\int_{R_1}^{R_2}\!\!\int_{R_1}^{R_2}\!\!\int_0^l\!\!\int_0^l
 *     M(r_1, r_2, z_1 - z_2)\,dz_1\,dz_2\,dr_1\,dr_2,\qquad A = (R_2 - R_1)\,l
 * $$
 *
 * with Maxwell's exact filament mutual inductance M. The two axial integrals collapse to one
 * with the triangular weight $2(l - z)$; the remaining three are done by nested adaptive
 * Gauss–Legendre quadrature with the nodes clustered (substitution $x = t^3$) at the integrable
 * logarithmic singularity $r_1 = r_2, z = 0$, so the method converges like a smooth integral.
 *
 * @param options - {@link MultilayerCoilOptions}: innerRadius [m], outerRadius [m], length [m], turns
 * @returns self-inductance [H]
 * @throws {@link InputError} for a non-positive or non-finite dimension, outerRadius < innerRadius,
 *   or turns < 1
 * @remarks Accuracy ≤ 1e-8 relative vs the Bessel–Struve integral evaluated in mpmath (fixture
 * multilayer.json). Validity: the winding is fine compared with its section (otherwise add
 * round-wire corrections as for a solenoid). Cost: about 1–10 ms, growing as outerRadius/length;
 * length < 1e-4 × outerRadius is refused (InputError) to keep a call under about 0.5 s. Note: at fixed turns, L is not
 * monotonic in the outer radius — thickening a short, thick winding first lowers L as the current
 * spreads (e.g. inner 0.1 m, length 0.02 m: a minimum near outer radius 0.1647 m).
 * @see F. W. Grover, Inductance Calculations (1946), ch. 13; T. R. Lyle, Phil. Trans. R. Soc. A 213,
 *   421 (1914) (the Bessel-function form used for the check).
 * @example
 * ```ts
 * import { multilayerCoilInductance } from "fluxwright";
 * // a 200-turn choke, winding 20 mm to 30 mm radius, 25 mm long
 * const l = multilayerCoilInductance({ innerRadius: 0.02, outerRadius: 0.03, length: 0.025, turns: 200 });
 * console.log(l.toExponential(4)); // ≈ 1.6596e-3
 * ```
 * @category Inductance
 */
export function multilayerCoilInductance(options: MultilayerCoilOptions): number {
  const [r1, r2, l, n] = readMultilayer("multilayerCoilInductance", options);
  if (l < MIN_LENGTH_RATIO * r2) {
    throw new InputError("multilayerCoilInductance", "length", l, "m", `at least ${MIN_LENGTH_RATIO} × outerRadius = ${MIN_LENGTH_RATIO * r2} (the integral's cost grows as outerRadius/length; a flatter winding is a flat spiral: use spiralCoilInductance)`);
  }
  if (r2 === r1) {
    const x = (2 * r1) / l;
    return requireFiniteResult("multilayerCoilInductance", "innerRadius, outerRadius, length and turns", MU_0_HALF_PI * n * n * r1 * x * nagaokaKernel(x));
  }
  const s = multilayerShape(r1, r2, l, n);
  return requireFiniteResult("multilayerCoilInductance", "innerRadius, outerRadius, length and turns", shapeMutual(s, s, 0));
}

/** One inch in metres (exact). */
const INCH = 0.0254;

/**
 * Wheeler's approximation for a multilayer coil, with his original coefficients:
 * $L\,[\mu\mathrm{H}] = 0.8\,a^2N^2/(6a + 9b + 10c)$, a the mean radius, b the length and c the
 * radial depth of the winding, all in inches; converted exactly to SI:
 *
 * $$ L = 0.8\times10^{-6}\,\frac{a^2N^2}{0.0254\,(6a + 9b + 10c)}\ \mathrm{H}\quad(\text{lengths in m}) $$
 *
 * @param options - {@link MultilayerCoilOptions}: innerRadius [m], outerRadius [m], length [m], turns
 * @returns self-inductance [H]
 * @throws {@link InputError} as {@link multilayerCoilInductance}
 * @remarks Approximation. Against {@link multilayerCoilInductance}: within about 1 % when the three
 * terms 6a, 9b, 10c are roughly equal (Wheeler's stated range); the error over aspect ratio is
 * tabulated in the guide (measured in the tests).
 * @see H. A. Wheeler, "Simple inductance formulas for radio coils", Proc. IRE 16(10), 1398–1400 (1928), eq. (2).
 * @example
 * ```ts
 * import { multilayerCoilInductanceWheeler } from "fluxwright";
 * const l = multilayerCoilInductanceWheeler({ innerRadius: 0.02, outerRadius: 0.03, length: 0.025, turns: 200 });
 * console.log(l.toExponential(3)); // ≈ 1.658e-3
 * ```
 * @category Inductance
 */
export function multilayerCoilInductanceWheeler(options: MultilayerCoilOptions): number {
  const [r1, r2, l, n] = readMultilayer("multilayerCoilInductanceWheeler", options);
  const a = 0.5 * (r1 + r2);
  const c = r2 - r1;
  return requireFiniteResult("multilayerCoilInductanceWheeler", "radii, length and turns", (0.8e-6 * a * a * n * n) / (INCH * (6 * a + 9 * l + 10 * c)));
}

/**
 * Options of {@link brooksCoilInductance}: give exactly one of `sideLength` and `meanRadius`.
 *
 * @category Inductance
 */
export interface BrooksCoilOptions {
  /** Side c of the square winding cross-section [m], > 0 (inner radius c, outer radius 2c, length c). */
  readonly sideLength?: number;
  /** Mean radius a = 1.5 c of the winding [m], > 0. */
  readonly meanRadius?: number;
  /** Number of turns, ≥ 1. */
  readonly turns: number;
}

/**
 * Inductance of a Brooks coil — the multilayer coil of square cross-section c × c and mean
 * radius 1.5c (inner radius c, outer 2c, length c), the shape of greatest inductance for a
 * given length of wire — by Brooks' formula:
 *
 * $$ L = 1.6994\times10^{-6}\,a\,N^2\ \mathrm{H} = 2.5491\times10^{-6}\,c\,N^2\ \mathrm{H}\quad(a = 1.5c \text{ in m}) $$
 *
 * @param options - {@link BrooksCoilOptions}: sideLength or meanRadius [m], turns
 * @returns self-inductance [H]
 * @throws {@link InputError} when neither or both of sideLength and meanRadius are given, a
 *   dimension is not a finite number > 0, or turns < 1
 * @remarks Approximation: within 2e-5 relative of the exact uniform-current-density value
 * ({@link multilayerCoilInductance} of the same geometry: 1.3e-5 above it, asserted in the tests).
 * The coefficient is quoted from memory (Brooks 1931; Grover 1946, ch. 13).
 * @see H. B. Brooks, "Design of standards of inductance, and the proposed use of model reactors in the
 *   design of air-core and iron-core reactors", Bur. Stand. J. Res. 7, 289 (1931).
 * @example
 * ```ts
 * import { brooksCoilInductance } from "fluxwright";
 * console.log(brooksCoilInductance({ sideLength: 0.01, turns: 100 }).toExponential(4)); // ≈ 2.5491e-4
 * ```
 * @category Inductance
 */
export function brooksCoilInductance(options: BrooksCoilOptions): number {
  const where = "brooksCoilInductance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, BROOKS_FIELDS);
  const hasSide = options.sideLength !== undefined;
  const hasMean = options.meanRadius !== undefined;
  if (hasSide === hasMean) {
    throw new InputError(where, "sideLength", options.sideLength, "m", "given, or meanRadius given, but not both");
  }
  const a = hasSide ? 1.5 * requirePositive(where, "sideLength", options.sideLength, "m") : requirePositive(where, "meanRadius", options.meanRadius, "m");
  const n = requireTurns(where, "turns", options.turns);
  return requireFiniteResult("brooksCoilInductance", "meanRadius and turns", 1.6994e-6 * a * n * n);
}
