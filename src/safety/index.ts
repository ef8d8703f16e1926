/**
 * Safety: magnetic field exposure against reference levels, and cautions for voltage, stored energy and hot surfaces.
 *
 * Import from `fluxwright/safety` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/safety.md
 * @module fluxwright/safety
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- one overload (the positional form) is deprecated, not the function
export { fieldOnAxis, fieldNearCoil } from "./coil-field.js";
export type { FieldCoil, FieldOnAxisOptions, FieldLoop, FieldComponents, FieldPoint } from "./coil-field.js";
// eslint-disable-next-line @typescript-eslint/no-deprecated -- former coil type names, kept until 1.0
export type { FieldSolenoid, FieldSpiral } from "./coil-field.js";
export { exposureCheck, icnirpReferenceLevel } from "./exposure.js";
export type { ExposureCheckOptions, ExposureCheckResult, ExposurePopulation } from "./exposure.js";
export {
  EXTRA_LOW_VOLTAGE_LIMITS,
  voltageCaution,
  storedEnergyCaution,
  contactBurnThreshold,
  surfaceTemperatureCaution,
  audibleFrequencyCaution,
  exposureCaution,
  safetyCautions,
} from "./cautions.js";
export type {
  VoltageCautionOptions,
  StoredEnergyCautionOptions,
  SurfaceTemperatureCautionOptions,
  ExposureCautionOptions,
  SafetyCautionsOptions,
} from "./cautions.js";
