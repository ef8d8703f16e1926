/**
 * Magnetic components: core constants and effective parameters (IEC 60205), core shapes from
 * their dimensions, and the temperature rise of a component from its loss.
 *
 * @module cores
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
