/**
 * The list of every conducting material set shipped with the library.
 *
 * @packageDocumentation
 */
import { aluminium, copper, silver } from "./conductors.js";
import type { ConductiveMaterial } from "./types.js";
import {
  aluminiumAlloy,
  austeniticStainless,
  brass,
  ferriticStainless,
  lowCarbonSteel,
  mediumCarbonSteel,
  titaniumAlloy,
} from "./workpieces.js";

/**
 * Every conducting material set shipped with the library, conductors first, in a fixed order.
 * Each entry's `id` equals its exported constant's name, so a study file can name a material
 * by string: `conductiveMaterials.find((m) => m.id === "brass")`.
 *
 * @example
 * ```ts
 * import { conductiveMaterials } from "fluxwright";
 * console.log(conductiveMaterials.length); // 10
 * ```
 * @category Materials
 */
export const conductiveMaterials: readonly ConductiveMaterial[] = Object.freeze([
  copper,
  aluminium,
  silver,
  lowCarbonSteel,
  mediumCarbonSteel,
  austeniticStainless,
  ferriticStainless,
  aluminiumAlloy,
  brass,
  titaniumAlloy,
]);
