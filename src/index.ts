/**
 * fluxwright: verified magnetics and resonant-converter formulas for induction heating,
 * wireless power and resonant converters. Every function is also importable from its module's
 * subpath, e.g. `fluxwright/inductance`.
 *
 * @module fluxwright
 */
export * from "./core/index.js";
export * from "./units/index.js";
export * from "./special/index.js";
export * from "./materials/index.js";
export * from "./inductance/index.js";
export * from "./conductors/index.js";
export * from "./coreloss/index.js";
export * from "./tank/index.js";
export * from "./workpiece/index.js";
export * from "./thermal/index.js";
export * from "./field/index.js";
export * from "./cores/index.js";
export * from "./safety/index.js";
export * from "./converters/index.js";
export * from "./links/index.js";
export * from "./study/index.js";
