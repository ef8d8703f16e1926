/**
 * Resonant DC–DC converters: LLC, series (SRC), parallel (PRC) and LCC. The exact periodic
 * steady state of the ideal piecewise-linear circuit, with the first-harmonic values beside it.
 *
 * Import from `fluxwright/converters` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/converters.md
 * @module fluxwright/converters
 */
export { llcGain, seriesResonantGain, parallelResonantGain, lccGain } from "./fha.js";
export type { LlcGainOptions, SeriesResonantGainOptions, ParallelResonantGainOptions, LccGainOptions } from "./fha.js";
export * from "./llc-operating-point.js";
export * from "./llc-design.js";
export * from "./lcc-operating-point.js";
export { parallelResonantOperatingPointCapacitiveFilter, lccOperatingPointCapacitiveFilter } from "./lcc-capacitive-filter.js";
export type { CapacitiveFilterOperatingPoint, CapacitiveFilterFirstHarmonic } from "./lcc-capacitive-filter.js";
export { lccFrequencySweep } from "./lcc-frequency-sweep.js";
export type { LccFrequencySweepOptions, LccFrequencySweep, LccSweepPoint, LccSweepPointSolved, LccSweepPointUnsolved } from "./lcc-frequency-sweep.js";
