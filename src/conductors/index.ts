/**
 * Conductor resistance: DC resistance, skin depth, round-wire skin effect, Dowell layered windings, litz wire and copper tube.
 *
 * Import from `fluxwright/conductors` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/conductors.md
 * @module fluxwright/conductors
 */
export * from "./skin-depth.js";
export * from "./dc-resistance.js";
export { dowellFactor } from "./dowell.js";
export type { DowellFactorOptions } from "./dowell.js";
export * from "./round-wire.js";
export { roundWireWindingAcRatio } from "./round-wire-winding.js";
// eslint-disable-next-line @typescript-eslint/no-deprecated -- exported until 1.0
export type { RoundWireWindingOptions, RoundWireWindingOptionsWithWidth } from "./round-wire-winding.js";
export * from "./round-wire-winding-ferreira.js";
export * from "./litz.js";
export * from "./litz-sullivan.js";
export * from "./tube.js";
export * from "./work-coil.js";
export * from "./validity.js";
export * from "./lead-impedance.js";
