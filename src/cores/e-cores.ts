/**
 * E cores from their dimensions: rectangular or round centre leg, mated with an E or a plate.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { add, boxSurface, corner, finish, requireLess } from "./shape-sums.js";
import type { Sums } from "./shape-sums.js";
import type { CoreShape } from "./shapes.js";

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
