/**
 * Magnetic components: core constants and effective parameters (IEC 60205), core shapes from
 * their dimensions, and the temperature rise of a component from its loss.
 *
 * Import from `fluxwright/cores` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/cores.md
 * @module fluxwright/cores
 */
export { effectiveCoreParameters } from "./effective-parameters.js";
export type { CoreSection, EffectiveCoreParametersOptions, EffectiveCoreParameters } from "./effective-parameters.js";
export { toroidCore, eCore, planarECore, roundLegECore, potCore, uCore } from "./shapes.js";
export type { CoreShape, ToroidCoreShapeOptions, ECoreOptions, PlanarECoreOptions, PotCoreOptions, UCoreOptions } from "./shapes.js";
export { naturalConvectionCoefficient, componentTemperatureRise } from "./temperature-rise.js";
export type {
  AirProperties,
  NaturalConvectionOptions,
  NaturalConvection,
  ComponentTemperatureRiseOptions,
  ComponentTemperatureRise,
} from "./temperature-rise.js";
export { gappedInductor, gapLengthForInductance } from "./gapped-inductor.js";
export type { GappedCore, GappedInductorOptions, GappedInductor, GapLengthForInductanceOptions } from "./gapped-inductor.js";
export { inductorDesign } from "./inductor-design.js";
export type { InductorDesignOptions, InductorDesign, TriangularCurrent, SampledCurrent, InductorConductor } from "./inductor-design.js";
export { inductorCoreSearch } from "./core-search.js";
export type { CoreCandidate, InductorCoreSearchOptions, FeasibleCore, RejectedCore, InductorCoreSearch } from "./core-search.js";
export { inductorTurnsSweep } from "./inductor-sweep.js";
export type { InductorTurnsSweepOptions, InductorSweepPoint, InductorTurnsSweep } from "./inductor-sweep.js";
