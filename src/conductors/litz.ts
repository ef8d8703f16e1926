/**
 * Litz wire: construction, geometry, DC resistance and AC resistance ratio (strand skin
 * effect, bundle-internal proximity effect and the winding's external proximity effect).
 *
 * @packageDocumentation
 */
import { InputError, requireInRange, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { MU_0 } from "../units/index.js";
import { wireProximityFactorKernel, wireSkinFactorKernel } from "./round-wire-kernels.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LITZ_AC_FIELDS: readonly string[] = Object.freeze(["construction", "frequency", "resistivity", "turns", "windowBreadth", "fieldFactor"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LITZ_DC_FIELDS: readonly string[] = Object.freeze(["construction", "resistivity", "length"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LITZ_FIELDS: readonly string[] = Object.freeze(["strands", "strandDiameter", "strandOuterDiameter", "bundleLevels", "packingFactor", "twistPitch", "servingThickness"]);

/**
 * How a litz conductor is built. Lengths in metres.
 *
 * @category Conductors
 */
export interface LitzConstruction {
  /** Total number of strands n, an integer ≥ 1. */
  readonly strands: number;
  /** Diameter of the bare copper of one strand [m], finite and > 0. */
  readonly strandDiameter: number;
  /**
   * Diameter of one strand over its film insulation [m], finite and ≥ strandDiameter
   * (default: strandDiameter, i.e. insulation neglected in the bundle size).
   */
  readonly strandOuterDiameter?: number;
  /**
   * Bundle structure: the number of strands or sub-bundles twisted together at each
   * operation, innermost first, e.g. `[5, 5, 4]` for 100 strands; every entry an integer ≥ 1
   * and their product equal to `strands` (default `[strands]`, one bunching operation).
   */
  readonly bundleLevels?: readonly number[];
  /**
   * Fraction of the bundle's circular cross-section (inside the serving) filled by the
   * insulated strands [-], in (0, 0.9069] (hexagonal close packing is the upper bound).
   * Default 0.7 (common practice for bunched and twisted litz, from memory).
   */
  readonly packingFactor?: number;
  /** Lay length (twist pitch) of the final twisting operation [m], finite and > 0; default: untwisted length (no lay factor). */
  readonly twistPitch?: number;
  /** Radial thickness of the outer serving or wrap [m], finite and ≥ 0 (default 0). */
  readonly servingThickness?: number;
}

/**
 * Geometry of a litz conductor, from {@link litzGeometry}.
 *
 * @category Conductors
 */
export interface LitzGeometry {
  /** Total copper cross-section $n \pi d_s^2/4$ [m²]. */
  readonly copperArea: number;
  /** Diameter of the strand bundle inside the serving [m]. */
  readonly bundleDiameter: number;
  /** Outer diameter including the serving [m]. */
  readonly outerDiameter: number;
  /** Copper area over the area of the outer circle [-]. */
  readonly copperFillFactor: number;
  /** Mean strand length per unit length of cable from the final twist [-], ≥ 1 (1 when no pitch is given). */
  readonly layFactor: number;
}

interface CheckedLitz {
  strands: number;
  strandDiameter: number;
  strandOuterDiameter: number;
  packingFactor: number;
  twistPitch: number;
  servingThickness: number;
}

const HEX_PACKING = Math.PI / (2 * Math.sqrt(3));

function checkLitz(where: string, value: unknown): CheckedLitz {
  const c = requireObject(where, "construction", value);
  requireKnownKeys(where, "construction", c, LITZ_FIELDS);
  const strands = requireInteger(where, "construction.strands", c.strands, 1);
  const strandDiameter = requirePositive(where, "construction.strandDiameter", c.strandDiameter, "m");
  let strandOuterDiameter = strandDiameter;
  if (c.strandOuterDiameter !== undefined) {
    strandOuterDiameter = requireInRange(where, "construction.strandOuterDiameter", c.strandOuterDiameter, "m", strandDiameter, Infinity, "[)");
  }
  if (c.bundleLevels !== undefined) {
    const levels = c.bundleLevels;
    if (!Array.isArray(levels) || levels.length === 0) {
      throw new InputError(where, "construction.bundleLevels", levels, "", "a non-empty array of integers ≥ 1");
    }
    let product = 1;
    for (let i = 0; i < levels.length; i++) product *= requireInteger(where, `construction.bundleLevels[${i}]`, levels[i], 1);
    if (product !== strands) {
      throw new InputError(where, "construction.bundleLevels", levels, "", `entries whose product equals strands (${strands})`);
    }
  }
  const packingFactor =
    c.packingFactor === undefined ? 0.7 : requireInRange(where, "construction.packingFactor", c.packingFactor, "", 0, HEX_PACKING, "(]");
  const twistPitch = c.twistPitch === undefined ? Infinity : requirePositive(where, "construction.twistPitch", c.twistPitch, "m");
  const servingThickness = c.servingThickness === undefined ? 0 : requireNonNegative(where, "construction.servingThickness", c.servingThickness, "m");
  return { strands, strandDiameter, strandOuterDiameter, packingFactor, twistPitch, servingThickness };
}

function bundleDiameterOf(c: CheckedLitz): number {
  // one strand: the strand itself; otherwise insulated-strand area over the packing factor
  return c.strands === 1 ? c.strandOuterDiameter : c.strandOuterDiameter * Math.sqrt(c.strands / c.packingFactor);
}

function layFactorOf(c: CheckedLitz, bundleDiameter: number): number {
  if (c.twistPitch === Infinity || c.strands === 1) return 1;
  // mean of sqrt(1 + (2π r/p)²) over a disc of radius R (strands spread uniformly)
  const kr = (2 * Math.PI * (bundleDiameter / 2)) / c.twistPitch;
  const x = kr * kr;
  if (x < 1e-6) return 1 + x / 4;
  // for x ≥ 1e200 the mean is (2/3)·kr·(1 + 1.5/x) − 2/(3x) = (2/3)·kr to rounding, and (1 + x)^1.5 would overflow
  if (!(x < 1e200)) return (2 / 3) * kr;
  return (2 / (3 * x)) * (Math.pow(1 + x, 1.5) - 1);
}

/**
 * Geometry of a litz conductor: copper area $A_\mathrm{Cu} = n\pi d_s^2/4$; bundle diameter
 * $D_b = d_o \sqrt{n/p}$ from the insulated strand diameter $d_o$ and the packing factor p;
 * outer diameter $D_b + 2 t_\mathrm{serving}$; and the lay factor of the final twist, the mean
 * helix length per unit cable length of strands spread uniformly over the bundle,
 *
 * $$
 * \lambda = \frac{2}{3 x}\left[(1 + x)^{3/2} - 1\right], \qquad x = \left(\frac{\pi D_b}{p_\mathrm{twist}}\right)^2 .
 * $$
 *
 * Hard domain (throws {@link InputError}): see the fields of {@link LitzConstruction}.
 * Validity: round, compact bundles; the packing factor is the modelling input that sets the
 * size (real bundles of few strands pack worse than the default). The lay factor counts the
 * last twist only (inner twists add their own, usually smaller, factors).
 * Accuracy: exact for the stated model (tests: 1e-14 relative).
 *
 * @param construction - {@link LitzConstruction}
 * @returns {@link LitzGeometry}
 * @throws {@link InputError} on a bad construction
 * @see C. R. Sullivan, R. Y. Zhang, "Simplified design method for litz wire", IEEE APEC 2014, 2667–2674 (packing factor and twisting operations).
 * @example
 * ```ts
 * import { litzGeometry } from "fluxwright";
 * const g = litzGeometry({ strands: 100, strandDiameter: 0.1e-3, strandOuterDiameter: 0.115e-3, bundleLevels: [5, 5, 4],
 *   twistPitch: 25e-3, servingThickness: 0.05e-3 });
 * console.log(g.copperArea); // ≈ 7.854e-7
 * console.log(g.outerDiameter); // ≈ 1.4745e-3
 * ```
 * @category Conductors
 */
export function litzGeometry(construction: LitzConstruction): LitzGeometry {
  const c = checkLitz("litzGeometry", construction);
  const g = geometryOf(c);
  requireFiniteResult("litzGeometry", "construction", g.copperArea + g.outerDiameter + g.copperFillFactor + g.layFactor);
  return g;
}

function geometryOf(c: CheckedLitz): LitzGeometry {
  const copperArea = (c.strands * Math.PI * c.strandDiameter * c.strandDiameter) / 4;
  const bundleDiameter = bundleDiameterOf(c);
  const outerDiameter = bundleDiameter + 2 * c.servingThickness;
  return {
    copperArea,
    bundleDiameter,
    outerDiameter,
    copperFillFactor: copperArea / ((Math.PI * outerDiameter * outerDiameter) / 4),
    layFactor: layFactorOf(c, bundleDiameter),
  };
}

/** Options of {@link litzDcResistance}. @category Conductors */
export interface LitzDcResistanceOptions {
  /** The litz construction. */
  readonly construction: LitzConstruction;
  /** Resistivity of the strand metal [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Length of the cable [m], finite and > 0. */
  readonly length: number;
}

/**
 * DC resistance of a litz conductor: all strands in parallel, each longer than the cable by
 * the lay factor λ of {@link litzGeometry}:
 * $R_\mathrm{dc} = \rho\, \ell\, \lambda / A_\mathrm{Cu}$.
 *
 * Hard domain (throws {@link InputError}): bad construction, resistivity or length not
 * finite and > 0. Validity: all strands joined at both ends. Accuracy: exact for the model
 * (tests: 1e-14 relative).
 *
 * @param options - {@link LitzDcResistanceOptions}: construction, resistivity [Ω·m], length [m]
 * @returns resistance [Ω]
 * @throws {@link InputError} on bad input
 * @see IEC 60028:1925 (copper resistivity); lay factor as in {@link litzGeometry}.
 * @example
 * ```ts
 * import { litzDcResistance } from "fluxwright";
 * console.log(litzDcResistance({ construction: { strands: 100, strandDiameter: 0.1e-3 }, resistivity: 1.7241e-8, length: 1 })); // ≈ 0.021952
 * ```
 * @category Conductors
 */
export function litzDcResistance(options: LitzDcResistanceOptions): number {
  const where = "litzDcResistance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, LITZ_DC_FIELDS);
  const c = checkLitz(where, options.construction);
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const length = requirePositive(where, "length", options.length, "m");
  const g = geometryOf(c);
  return requireFiniteResult("litzDcResistance", "construction, resistivity and length", (resistivity * length * g.layFactor) / g.copperArea);
}

/** Options of {@link litzAcRatio}. @category Conductors */
export interface LitzAcRatioOptions {
  /** The litz construction. */
  readonly construction: LitzConstruction;
  /** Frequency of the sinusoidal current [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the strand metal [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /**
   * Turns N of the winding portion, an integer ≥ 1, for the external (winding) proximity
   * effect; give it together with `windowBreadth`. Omit both for an isolated conductor.
   */
  readonly turns?: number;
  /** Breadth b of the winding window [m], finite and > 0; with `turns`. */
  readonly windowBreadth?: number;
  /** Field-shape factor k of the winding field (default 1), as in {@link litzWindingAcRatio}. */
  readonly fieldFactor?: number;
}

/**
 * AC-to-DC resistance ratio of a litz conductor: strand-level skin effect, the proximity
 * effect of the bundle's own field on its strands, and the proximity effect of the winding
 * field, each strand treated as a round wire in a locally uniform transverse field (exact
 * Kelvin-function factors, so valid also for strands not small against δ):
 *
 * $$
 * F_R = F(q) + g(q)\left[\frac{n(n-1)\, d_s^2}{16\pi r_b^2}
 *  + \frac{\pi n^2 d_s^2\, k N^2}{6\, b^2}\right],
 * \qquad q = \frac{d_s}{\sqrt 2\,\delta}
 * $$
 *
 * with F the isolated-wire skin factor ({@link roundWireAcRatio}), g the transverse-field
 * loss factor $g = 2\pi q(\mathrm{ber}\,\mathrm{ber}' + \mathrm{bei}\,\mathrm{bei}')/(\mathrm{ber}^2 + \mathrm{bei}^2)$,
 * $r_b$ the bundle radius ({@link litzGeometry}). The bundle term is the mean square of the
 * internal field $H(r) = I r/(2\pi r_b^2)$ of a uniformly filled bundle, counting the field of
 * the other n − 1 strands; the winding term is the mean square of a 1-D winding field
 * $k (NI/b)^2/3$. With one strand and no winding this is exactly {@link roundWireAcRatio};
 * at d_s ≪ δ the winding term is Sullivan's (see {@link litzWindingAcRatio}).
 *
 * Hard domain (throws {@link InputError}): bad construction; frequency, resistivity not
 * finite and > 0; `turns` without `windowBreadth` or the reverse. Validity: ideal twisting
 * (equal strand currents, no bundle-level eddy currents: twist pitch short against the
 * conductor length and bundle structure following Sullivan & Zhang 2014), strands below
 * about 2 δ (beyond that neighbouring strands screen each other and the isolated-strand
 * field overstates the loss), sinusoidal current.
 *
 * Accuracy: the formula is evaluated to ≤ 1e-12 relative (its Kelvin-function factors are
 * checked against mpmath and a radial ODE solution, fixture round-wire.json).
 *
 * @param options - {@link LitzAcRatioOptions}
 * @returns $R_\mathrm{ac}/R_\mathrm{dc}$ [-], ≥ 1
 * @throws {@link InputError} on bad input
 * @see M. Bartoli, N. Noferi, A. Reatti, M. K. Kazimierczuk, "Modeling litz-wire winding losses in high-frequency power inductors", IEEE PESC 1996, 1690–1696 (strand skin + internal + external proximity).
 * @see C. R. Sullivan, IEEE Trans. Power Electron. 14(2), 283–291 (1999) (1-D winding field).
 * @see J. A. Ferreira, IEEE Trans. Power Electron. 9(1), 127–131 (1994) (orthogonal skin and proximity losses).
 * @example
 * ```ts
 * import { litzAcRatio } from "fluxwright";
 * const construction = { strands: 100, strandDiameter: 0.1e-3, strandOuterDiameter: 0.115e-3 };
 * console.log(litzAcRatio({ construction, frequency: 100e3, resistivity: 1.7241e-8 })); // ≈ 1.0215
 * console.log(litzAcRatio({ construction, frequency: 100e3, resistivity: 1.7241e-8, turns: 20, windowBreadth: 20e-3 })); // ≈ 1.291
 * ```
 * @category Conductors
 */
export function litzAcRatio(options: LitzAcRatioOptions): number {
  const where = "litzAcRatio";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, LITZ_AC_FIELDS);
  const c = checkLitz(where, options.construction);
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  let windingTerm = 0;
  if (options.turns !== undefined || options.windowBreadth !== undefined) {
    const turns = requireInteger(where, "turns", options.turns, 1);
    const breadth = requirePositive(where, "windowBreadth", options.windowBreadth, "m");
    const k = options.fieldFactor === undefined ? 1 : requirePositive(where, "fieldFactor", options.fieldFactor, "");
    const n = c.strands;
    windingTerm = (Math.PI * n * n * c.strandDiameter * c.strandDiameter * k * turns * turns) / (6 * breadth * breadth);
  }
  const n = c.strands;
  const rb = bundleDiameterOf(c) / 2;
  const bundleTerm = (n * (n - 1) * c.strandDiameter * c.strandDiameter) / (16 * Math.PI * rb * rb);
  const q = c.strandDiameter * Math.sqrt((Math.PI * frequency * MU_0) / (2 * resistivity));
  const skin = wireSkinFactorKernel(q);
  const proximityTerms = bundleTerm + windingTerm;
  return proximityTerms === 0 ? skin : skin + wireProximityFactorKernel(q) * proximityTerms;
}
