/**
 * Core shapes from their dimensions: the IEC 60205 core constants and effective parameters,
 * plus the winding window, mean turn length, outer surface and the winding leg a designer needs.
 *
 * The shapes are in `toroid-core.ts`, `e-cores.ts`, `pot-core.ts` and `u-core.ts`; the sums of
 * the core constants they share in `shape-sums.ts`.
 *
 * @packageDocumentation
 */
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

export { toroidCore } from "./toroid-core.js";
export type { ToroidCoreShapeOptions } from "./toroid-core.js";
export { eCore, planarECore, roundLegECore } from "./e-cores.js";
export type { ECoreOptions, PlanarECoreOptions } from "./e-cores.js";
export { potCore } from "./pot-core.js";
export type { PotCoreOptions } from "./pot-core.js";
export { uCore } from "./u-core.js";
export type { UCoreOptions } from "./u-core.js";
