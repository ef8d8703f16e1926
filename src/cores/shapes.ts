/**
 * Core shapes from their dimensions: the IEC 60205 core constants and effective parameters,
 * plus the winding window, mean turn length, outer surface and the winding leg a designer needs.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { EffectiveCoreParameters } from "./effective-parameters.js";

/**
 * A core of a named shape: effective parameters (IEC 60205) and what a winding designer needs.
 * All dimensions are of the assembled core (a pair of halves, or the halves and their mate).
 *
 * @category Cores
 */
export interface CoreShape extends EffectiveCoreParameters {
  /** Smallest cross-section along the path [m²] (where the flux density peaks). */
  readonly minimumArea: number;
  /** Winding window area available to one winding side [m²]. */
  readonly windowArea: number;
  /** Window height, the length along the winding leg available to the winding [m]. */
  readonly windowHeight: number;
  /** Window width, the build available across the window [m]. */
  readonly windowWidth: number;
  /** Mean length of a turn of a winding that fills the window [m]. */
  readonly meanTurnLength: number;
  /** Outer surface of the wound component (core and winding, as a box or cylinder) [m²]. */
  readonly surfaceArea: number;
  /** Cross-section of the leg that carries the winding (and the gap) [m²]. */
  readonly legArea: number;
  /** Shape of that leg's section. */
  readonly legShape: "rectangular" | "round";
  /** Width of that leg [m] (its diameter when round). */
  readonly legWidth: number;
  /** Depth of that leg [m] (its diameter when round). */
  readonly legDepth: number;
}

/** Running sums of the core constants. */
interface Sums {
  c1: number;
  c2: number;
}

function add(sums: Sums, length: number, area: number): void {
  sums.c1 += length / area;
  sums.c2 += length / (area * area);
}

/**
 * A 90° corner between a limb of width `w` and one of width `t` (IEC 60205's corner
 * allowance, recalled from memory): a quarter circle whose radius is the mean of the two
 * half-widths, area the mean of the two adjoining areas.
 */
function corner(sums: Sums, w: number, t: number, areaW: number, areaT: number): void {
  add(sums, (Math.PI * (w + t)) / 8, (areaW + areaT) / 2);
}

function finish(sums: Sums, rest: Omit<CoreShape, keyof EffectiveCoreParameters>): CoreShape {
  const effectiveArea = sums.c1 / sums.c2;
  const effectivePathLength = (sums.c1 * sums.c1) / sums.c2;
  return {
    c1: sums.c1,
    c2: sums.c2,
    effectiveArea,
    effectivePathLength,
    effectiveVolume: effectiveArea * effectivePathLength,
    ...rest,
  };
}

function boxSurface(a: number, b: number, c: number): number {
  return 2 * (a * b + b * c + c * a);
}

function requireLess(where: string, name: string, value: number, limitName: string, limit: number): void {
  if (!(value < limit)) throw new InputError(where, name, value, "m", `a finite number < ${limitName} (${limit})`);
}

// ---------------------------------------------------------------------------------------------
// Toroid

/** Accepted fields of {@link toroidCore}. */
const TOROID_FIELDS: readonly string[] = Object.freeze(["innerDiameter", "outerDiameter", "height"]);

/**
 * Options of {@link toroidCore}.
 *
 * @category Cores
 */
export interface ToroidCoreShapeOptions {
  /** Inner diameter [m], > 0. */
  readonly innerDiameter: number;
  /** Outer diameter [m], > inner diameter. */
  readonly outerDiameter: number;
  /** Height (axial length) [m], > 0. */
  readonly height: number;
}

/**
 * A ring core (toroid) of rectangular section, with the logarithmic form of IEC 60205: the
 * ring is a set of thin concentric rings in parallel, each of path $2\pi r$.
 *
 * $$
 * C_1 = \frac{2\pi}{h \ln(r_2/r_1)}, \qquad C_2 = \frac{2\pi\,(1/r_1 - 1/r_2)}{h^2 \ln^3(r_2/r_1)}
 * $$
 *
 * Window area $\pi r_1^2$; mean turn length $2(r_2 - r_1) + 2h$ (one layer hugging the core);
 * surface area that of the bare ring (two annuli and two cylinders).
 *
 * Hard domain (throws {@link InputError}): a dimension not finite and > 0; outer diameter ≤ inner.
 * Validity: sharp-edged rectangular section (chamfers ignored). Accuracy: the constants are
 * exact for that section (≤ 1e-14 relative vs the numerical integral of the field, fixture
 * test/fixtures/cores/toroid.json); `log1p` keeps thin rings exact. The printed parameters of
 * the 25/15/10 ring ($l_e$ 60.2 mm, $A_e$ 48.9 mm², from memory) agree to their three digits.
 *
 * @param options - inner and outer diameter [m], height [m]
 * @returns {@link CoreShape}
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, clause 5 (ring cores: the logarithmic formulas for $C_1$ and $C_2$).
 * @example
 * ```ts
 * import { toroidCore } from "fluxwright";
 * const t = toroidCore({ innerDiameter: 0.02, outerDiameter: 0.04, height: 0.01 });
 * console.log(t.effectivePathLength); // ≈ 0.0871034
 * console.log(t.effectiveArea); // ≈ 9.60906e-5
 * ```
 * @category Cores
 */
export function toroidCore(options: ToroidCoreShapeOptions): CoreShape {
  const where = "toroidCore";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TOROID_FIELDS);
  const d1 = requirePositive(where, "innerDiameter", options.innerDiameter, "m");
  const d2 = requirePositive(where, "outerDiameter", options.outerDiameter, "m");
  const h = requirePositive(where, "height", options.height, "m");
  if (!(d2 > d1)) throw new InputError(where, "outerDiameter", d2, "m", `a finite number > innerDiameter (${d1})`);
  const r1 = d1 / 2;
  const r2 = d2 / 2;
  const ln = Math.log1p((r2 - r1) / r1);
  const inv = (r2 - r1) / (r1 * r2);
  const c1 = (2 * Math.PI) / (h * ln);
  const c2 = (2 * Math.PI * inv) / (h * h * ln * ln * ln);
  const section = h * (r2 - r1);
  return finish(
    { c1, c2 },
    {
      minimumArea: section,
      windowArea: Math.PI * r1 * r1,
      windowHeight: 2 * Math.PI * r1,
      windowWidth: r1,
      meanTurnLength: 2 * (r2 - r1) + 2 * h,
      surfaceArea: 2 * Math.PI * (r2 * r2 - r1 * r1) + 2 * Math.PI * (r1 + r2) * h,
      legArea: section,
      legShape: "rectangular",
      legWidth: r2 - r1,
      legDepth: h,
    },
  );
}

// ---------------------------------------------------------------------------------------------
// E cores (rectangular or round centre leg, mated with an E or a plate)

/** Accepted fields of the E-core shapes. */
const E_FIELDS: readonly string[] = Object.freeze(["width", "height", "depth", "windowWidth", "centreLegWidth", "windowHeight"]);
const PLANAR_FIELDS: readonly string[] = Object.freeze([...E_FIELDS, "mate", "plateThickness"]);

/**
 * Dimensions of one E half; the core is a pair of identical halves (or, for
 * {@link planarECore}, one half and a plate).
 *
 * @category Cores
 */
export interface ECoreOptions {
  /** Overall width across the three legs [m], > 0. */
  readonly width: number;
  /** Height of one half, from the back of the yoke to the leg faces [m], > window height. */
  readonly height: number;
  /** Depth of the core (stack direction) [m], > 0. */
  readonly depth: number;
  /** Distance between the inner faces of the outer legs [m], < width. */
  readonly windowWidth: number;
  /** Width of the centre leg [m] (its diameter for {@link roundLegECore}), < windowWidth. */
  readonly centreLegWidth: number;
  /** Depth of the window in one half (leg length) [m], > 0. */
  readonly windowHeight: number;
}

/**
 * Options of {@link planarECore}.
 *
 * @category Cores
 */
export interface PlanarECoreOptions extends ECoreOptions {
  /** What closes the core: a second E (default `"E"`) or a flat `"plate"`. */
  readonly mate?: "E" | "plate";
  /** Thickness of the plate [m], > 0 (default: the E's yoke thickness, height − windowHeight). */
  readonly plateThickness?: number;
}

function eShape(where: string, options: PlanarECoreOptions, round: boolean, known: readonly string[]): CoreShape {
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, known);
  const a = requirePositive(where, "width", options.width, "m");
  const b = requirePositive(where, "height", options.height, "m");
  const c = requirePositive(where, "depth", options.depth, "m");
  const e = requirePositive(where, "windowWidth", options.windowWidth, "m");
  const f = requirePositive(where, "centreLegWidth", options.centreLegWidth, "m");
  const d = requirePositive(where, "windowHeight", options.windowHeight, "m");
  requireLess(where, "windowWidth", e, "width", a);
  requireLess(where, "centreLegWidth", f, "windowWidth", e);
  requireLess(where, "windowHeight", d, "height", b);
  const mate = options.mate === undefined ? "E" : requireOneOf(where, "mate", options.mate, ["E", "plate"] as const);
  const y = b - d;
  let p = y;
  if (options.plateThickness !== undefined) {
    if (mate !== "plate") throw new InputError(where, "plateThickness", options.plateThickness, "m", 'absent unless mate is "plate"');
    p = requirePositive(where, "plateThickness", options.plateThickness, "m");
  }
  const s = (a - e) / 2;
  const hw = mate === "E" ? 2 * d : d;
  const outerArea = 2 * s * c;
  const centreArea = round ? (Math.PI * f * f) / 4 : f * c;
  const sums: Sums = { c1: 0, c2: 0 };
  add(sums, hw, outerArea);
  add(sums, hw, centreArea);
  const yokes = mate === "E" ? [y, y] : [y, p];
  let minYoke = Infinity;
  for (const t of yokes) {
    const yokeArea = 2 * t * c;
    minYoke = Math.min(minYoke, yokeArea);
    add(sums, (e - f) / 2, yokeArea);
    corner(sums, s, t, outerArea, yokeArea);
    corner(sums, f / 2, t, centreArea, yokeArea);
  }
  const build = (e - f) / 2;
  const totalHeight = mate === "E" ? 2 * b : b + p;
  const meanTurnLength = round ? (Math.PI * (e + f)) / 2 : 2 * (f + c) + Math.PI * build;
  const outerDepth = round ? Math.max(c, e) : c + 2 * build;
  return finish(sums, {
    minimumArea: Math.min(outerArea, centreArea, minYoke),
    windowArea: build * hw,
    windowHeight: hw,
    windowWidth: build,
    meanTurnLength,
    surfaceArea: boxSurface(a, totalHeight, outerDepth),
    legArea: centreArea,
    legShape: round ? "round" : "rectangular",
    legWidth: f,
    legDepth: round ? f : c,
  });
}

/**
 * An E core pair with a rectangular centre leg, divided as IEC 60205 divides it: outer legs (in
 * parallel), centre leg, yokes and the eight corners (quarter-circle allowances, recalled from
 * memory), summed into $C_1 = \sum l/A$ and $C_2 = \sum l/A^2$.
 *
 * $$
 * s = \tfrac{A - E}{2},\; y = B - D:\quad
 * \lbrace l, A\rbrace = \lbrace 2D, 2sC\rbrace,\ \lbrace 2D, FC\rbrace,\ 2\times\lbrace \tfrac{E-F}{2}, 2yC\rbrace,\
 * 2\times\lbrace \tfrac{\pi(s+y)}{8}, (s+y)C\rbrace,\ 2\times\lbrace \tfrac{\pi(F/2+y)}{8}, \tfrac{FC + 2yC}{2}\rbrace
 * $$
 *
 * Window area $\tfrac{E-F}{2}\,2D$; mean turn length $2(F + C) + \pi\tfrac{E-F}{2}$ (a winding filling
 * the window); surface area the box of the core with the winding standing out front and back.
 *
 * Hard domain (throws {@link InputError}): a dimension not finite and > 0; windowWidth ≥ width,
 * centreLegWidth ≥ windowWidth, windowHeight ≥ height. Validity: straight limbs, no chamfers
 * or radii. Accuracy: the arithmetic is exact; against the effective parameters a maker prints
 * for a standard size (computed by the IEC 60205 method), E 42/21/15 from the tolerance
 * mid-points: $C_1$, $l_e$, $A_e$, $V_e$ and $A_\mathrm{min}$ within 0.6 % (measured 0.5 %; fixture
 * test/fixtures/cores/datasheet-cores.json). Against a field solution the same kind of section
 * model (uniform flux per limb, quarter-circle corners) overestimates $C_1$ by 12 % for a pot
 * core (see {@link potCore}); no E-core field check yet.
 *
 * @param options - {@link ECoreOptions} [m]
 * @returns {@link CoreShape}
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, clause 6 (E cores: division into limbs and corners).
 * @example
 * ```ts
 * import { eCore } from "fluxwright";
 * const e = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
 * console.log(e.legArea); // ≈ 0.00018
 * console.log(e.windowArea); // ≈ 0.00027
 * ```
 * @category Cores
 */
export function eCore(options: ECoreOptions): CoreShape {
  return eShape("eCore", options, false, E_FIELDS);
}

/**
 * A planar E core: an E half closed by a second E or by a plate (E–I). The same section model
 * as {@link eCore}; with a plate the window height is one half's and the plate is the second yoke.
 *
 * $$
 * h_w = \begin{cases} 2D & \text{E–E} \\ D & \text{E–plate}\end{cases},\qquad
 * C_1 = \sum l/A,\quad C_2 = \sum l/A^2 \text{ over legs, yokes (thickness } y \text{ and } p\text{) and corners}
 * $$
 *
 * Hard domain (throws {@link InputError}): as {@link eCore}; `mate` not `"E"`/`"plate"`;
 * `plateThickness` given without a plate or not > 0. Validity: as {@link eCore}; edge radii
 * are not modelled. Accuracy: against the printed parameters of the planar E 14/3.5/5 pair and
 * of E 14/3.5/5 with its plate, within 5 % (path length within 0.1 %; the printed areas are
 * 3–5 % smaller because of the 0.8 mm edge radii; fixture test/fixtures/cores/datasheet-cores.json).
 *
 * @param options - {@link PlanarECoreOptions} [m]
 * @returns {@link CoreShape}
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, clause 6 (E and planar E cores).
 * @example
 * ```ts
 * import { planarECore } from "fluxwright";
 * const p = planarECore({ width: 0.043, height: 0.0095, depth: 0.028, windowWidth: 0.035, centreLegWidth: 0.0081, windowHeight: 0.0054, mate: "plate", plateThickness: 0.0041 });
 * console.log(p.windowHeight); // 0.0054
 * ```
 * @category Cores
 */
export function planarECore(options: PlanarECoreOptions): CoreShape {
  return eShape("planarECore", options, false, PLANAR_FIELDS);
}

/**
 * An E core pair with a round centre leg of diameter `centreLegWidth` (outer legs straight).
 * The section model of {@link eCore} with the centre-leg area $\pi F^2/4$.
 *
 * $$
 * A_{\text{centre}} = \frac{\pi F^2}{4},\qquad \text{mean turn} = \frac{\pi (E + F)}{2}
 * $$
 *
 * Hard domain and validity: as {@link eCore}; curved inner faces of the outer legs (ETD, EC
 * cores) are not modelled. Accuracy: against the printed parameters of ETD 29/16/10 within 6 %
 * (measured: $V_e$ 5.1 % and $A_\mathrm{min}$ 5.0 % low, $A_e$ 3.1 % low, $l_e$ 2.2 % low, $C_1$
 * 1.0 % high; the flat faces make the outer legs too thin; fixture
 * test/fixtures/cores/datasheet-cores.json).
 *
 * @param options - {@link ECoreOptions} [m] (centreLegWidth is the diameter)
 * @returns {@link CoreShape}
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, clause 6 (E cores with a round centre limb).
 * @example
 * ```ts
 * import { roundLegECore } from "fluxwright";
 * const r = roundLegECore({ width: 0.039, height: 0.02, depth: 0.0128, windowWidth: 0.03, centreLegWidth: 0.0128, windowHeight: 0.0142 });
 * console.log(r.legShape); // round
 * ```
 * @category Cores
 */
export function roundLegECore(options: ECoreOptions): CoreShape {
  return eShape("roundLegECore", options, true, E_FIELDS);
}

// ---------------------------------------------------------------------------------------------
// Pot core

/** Accepted fields of {@link potCore}. */
const POT_FIELDS: readonly string[] = Object.freeze([
  "outerDiameter",
  "windowOuterDiameter",
  "postDiameter",
  "postHoleDiameter",
  "height",
  "windowHeight",
]);

/**
 * Dimensions of one pot-core half; the core is a pair of identical halves.
 *
 * @category Cores
 */
export interface PotCoreOptions {
  /** Outer diameter [m], > windowOuterDiameter. */
  readonly outerDiameter: number;
  /** Inner diameter of the outer wall (window's outer edge) [m], > postDiameter. */
  readonly windowOuterDiameter: number;
  /** Diameter of the centre post [m], > postHoleDiameter. */
  readonly postDiameter: number;
  /** Diameter of the hole through the post [m], ≥ 0 (default 0). */
  readonly postHoleDiameter?: number;
  /** Height of one half [m], > windowHeight. */
  readonly height: number;
  /** Depth of the window in one half [m], > 0. */
  readonly windowHeight: number;
}

/**
 * A pot core pair: centre post and outer wall (axial flux), the two bases (radial flux,
 * integrated exactly as IEC 60205 does for radial sections) and four corner allowances.
 *
 * $$
 * C_1^{\text{base}} = \frac{\ln(r_2/r_p)}{2\pi t},\qquad C_2^{\text{base}} = \frac{1/r_p - 1/r_2}{4\pi^2 t^2}
 * \quad(\text{each of two bases, } t = \text{height} - \text{windowHeight})
 * $$
 *
 * plus posts $\lbrace 2h_w, \pi(r_p^2 - r_h^2)\rbrace$, wall $\lbrace 2h_w, \pi(r_3^2 - r_2^2)\rbrace$ and corners
 * (quarter circles through the limb mid-lines, area the mean of the adjoining areas, recalled from
 * memory). Wire slots are not modelled. Window area $(r_2 - r_p) 2h_w$, mean turn $\pi(r_p + r_2)$,
 * surface the closed cylinder.
 *
 * Hard domain (throws {@link InputError}): a dimension not finite and > 0 (hole ≥ 0); the
 * diameters not strictly decreasing outer > window > post > hole; windowHeight ≥ height.
 * Accuracy: against the axisymmetric finite-element fixture test/fixtures/cores/pot-gap.json
 * (ungapped, μr = 2000) $\mu_0\mu_r/C_1$ is 11.6 % below the field solution's inductance
 * factor (tolerance 12 %): the corner allowances lengthen the path more than the flux does.
 * Against the parameters printed for P 22/13 (IEC 60205 with its wire slots) within 5 %
 * (measured: $C_1$ 4.5 % low, $l_e$ 2.5 % low, $A_e$ 2.2 % high; fixture
 * test/fixtures/cores/datasheet-cores.json).
 *
 * @param options - {@link PotCoreOptions} [m]
 * @returns {@link CoreShape}
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, clause 7 (pot cores: radial sections and corners).
 * @example
 * ```ts
 * import { potCore } from "fluxwright";
 * const p = potCore({ outerDiameter: 0.022, windowOuterDiameter: 0.018, postDiameter: 0.0092, height: 0.0058, windowHeight: 0.0036 });
 * console.log(p.windowHeight, p.legShape); // 0.0072 round
 * ```
 * @category Cores
 */
export function potCore(options: PotCoreOptions): CoreShape {
  const where = "potCore";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, POT_FIELDS);
  const d1 = requirePositive(where, "outerDiameter", options.outerDiameter, "m");
  const d2 = requirePositive(where, "windowOuterDiameter", options.windowOuterDiameter, "m");
  const d3 = requirePositive(where, "postDiameter", options.postDiameter, "m");
  const d4 = options.postHoleDiameter === undefined ? 0 : requireNonNegative(where, "postHoleDiameter", options.postHoleDiameter, "m");
  const height = requirePositive(where, "height", options.height, "m");
  const hw = requirePositive(where, "windowHeight", options.windowHeight, "m");
  requireLess(where, "windowOuterDiameter", d2, "outerDiameter", d1);
  requireLess(where, "postDiameter", d3, "windowOuterDiameter", d2);
  requireLess(where, "postHoleDiameter", d4, "postDiameter", d3);
  requireLess(where, "windowHeight", hw, "height", height);
  const r3 = d1 / 2;
  const r2 = d2 / 2;
  const rp = d3 / 2;
  const rh = d4 / 2;
  const t = height - hw;
  const postArea = Math.PI * (rp * rp - rh * rh);
  const wallArea = Math.PI * (r3 * r3 - r2 * r2);
  const sums: Sums = { c1: 0, c2: 0 };
  add(sums, 2 * hw, postArea);
  add(sums, 2 * hw, wallArea);
  // Two bases, radial flux between the post and the wall.
  sums.c1 += (2 * Math.log(r2 / rp)) / (2 * Math.PI * t);
  sums.c2 += (2 * (1 / rp - 1 / r2)) / (4 * Math.PI * Math.PI * t * t);
  const basePost = 2 * Math.PI * rp * t;
  const baseWall = 2 * Math.PI * r2 * t;
  for (let k = 0; k < 2; k++) {
    corner(sums, rp - rh, t, postArea, basePost);
    corner(sums, r3 - r2, t, wallArea, baseWall);
  }
  return finish(sums, {
    minimumArea: Math.min(postArea, wallArea, basePost),
    windowArea: (r2 - rp) * 2 * hw,
    windowHeight: 2 * hw,
    windowWidth: r2 - rp,
    meanTurnLength: Math.PI * (rp + r2),
    surfaceArea: 2 * Math.PI * r3 * 2 * height + 2 * Math.PI * r3 * r3,
    legArea: postArea,
    legShape: "round",
    legWidth: d3,
    legDepth: d3,
  });
}

// ---------------------------------------------------------------------------------------------
// U core

/** Accepted fields of {@link uCore}. */
const U_FIELDS: readonly string[] = Object.freeze(["width", "height", "depth", "legWidth", "windowHeight"]);

/**
 * Dimensions of one U half; the core is a pair of identical halves.
 *
 * @category Cores
 */
export interface UCoreOptions {
  /** Overall width across both legs [m], > 2 legWidth. */
  readonly width: number;
  /** Height of one half [m], > windowHeight. */
  readonly height: number;
  /** Depth of the core [m], > 0. */
  readonly depth: number;
  /** Width of each leg [m], > 0. */
  readonly legWidth: number;
  /** Depth of the window in one half [m], > 0. */
  readonly windowHeight: number;
}

/**
 * A U core pair (two legs, two yokes, four corners), winding on one leg.
 *
 * $$
 * W = A - 2s,\; y = B - D:\quad \lbrace 4D, sC\rbrace,\ \lbrace 2W, yC\rbrace,\ \lbrace \tfrac{\pi (s + y)}{2}, \tfrac{(s + y) C}{2}\rbrace
 * $$
 *
 * Window area $W\,2D$; mean turn length $2(s + C) + \pi W/2$ (a winding filling half the window on
 * one leg); surface area the box with the winding standing out front and back.
 *
 * Hard domain (throws {@link InputError}): a dimension not finite and > 0; width ≤ 2 legWidth;
 * windowHeight ≥ height. Validity and accuracy: as {@link eCore}.
 *
 * @param options - {@link UCoreOptions} [m]
 * @returns {@link CoreShape}
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, clause 6 (U cores).
 * @example
 * ```ts
 * import { uCore } from "fluxwright";
 * const u = uCore({ width: 0.06, height: 0.03, depth: 0.016, legWidth: 0.016, windowHeight: 0.02 });
 * console.log(u.windowArea); // ≈ 0.00112
 * ```
 * @category Cores
 */
export function uCore(options: UCoreOptions): CoreShape {
  const where = "uCore";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, U_FIELDS);
  const a = requirePositive(where, "width", options.width, "m");
  const b = requirePositive(where, "height", options.height, "m");
  const c = requirePositive(where, "depth", options.depth, "m");
  const s = requirePositive(where, "legWidth", options.legWidth, "m");
  const d = requirePositive(where, "windowHeight", options.windowHeight, "m");
  if (!(a > 2 * s)) throw new InputError(where, "width", a, "m", `a finite number > 2 legWidth (${2 * s})`);
  requireLess(where, "windowHeight", d, "height", b);
  const w = a - 2 * s;
  const y = b - d;
  const legArea = s * c;
  const yokeArea = y * c;
  const sums: Sums = { c1: 0, c2: 0 };
  add(sums, 4 * d, legArea);
  add(sums, 2 * w, yokeArea);
  for (let k = 0; k < 4; k++) corner(sums, s, y, legArea, yokeArea);
  return finish(sums, {
    minimumArea: Math.min(legArea, yokeArea),
    windowArea: w * 2 * d,
    windowHeight: 2 * d,
    windowWidth: w / 2,
    meanTurnLength: 2 * (s + c) + (Math.PI * w) / 2,
    surfaceArea: boxSurface(a, 2 * b, c + w),
    legArea,
    legShape: "rectangular",
    legWidth: s,
    legDepth: c,
  });
}
