/**
 * SI prefixes, parsing and formatting of quantities, branded unit types, conversions,
 * physical constants and wire gauges.
 *
 * Import from `fluxwright/units` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/units.md
 * @module fluxwright/units
 */
export * from "./constants.js";
export * from "./quantities.js";
export * from "./temperature.js";
export * from "./length.js";
export * from "./wire-gauge.js";
export { SI_PREFIXES } from "./prefixes.js";
export type { SiPrefix } from "./prefixes.js";
export { parseQuantity } from "./parse.js";
export { formatQuantity } from "./format.js";
export type { FormatQuantityOptions } from "./format.js";
