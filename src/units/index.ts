/**
 * SI prefixes, parsing and formatting of quantities, branded unit types, conversions,
 * physical constants and wire gauges.
 *
 * @module units
 */
export * from "./constants.js";
export * from "./quantities.js";
export * from "./temperature.js";
