/**
 * The U core from its dimensions.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { add, boxSurface, corner, finish, requireLess } from "./shape-sums.js";
import type { Sums } from "./shape-sums.js";
import type { CoreShape } from "./shapes.js";

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
