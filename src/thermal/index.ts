/**
 * Heat-up of the part: lumped and 1-D conduction models, time to temperature.
 *
 * Import from `fluxwright/thermal` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/thermal.md
 * @module fluxwright/thermal
 */
export { lumpedHeatUp } from "./lumped-heat-up.js";
export type { LumpedHeatUpOptions, LumpedHeatUpResult, LumpedEnergyBalance } from "./lumped-heat-up.js";
export { steadyStateTemperature } from "./steady-state.js";
export type { SteadyStateTemperatureOptions } from "./steady-state.js";
export { radialHeatUp } from "./radial-heat-up.js";
export type { RadialHeatUpOptions, RadialHeatUpResult, RadialEnergyBalance, RadialGenerationRequest } from "./radial-heat-up.js";
