/**
 * Shared foundations: the {@link InputError} type, the validation helpers every module uses,
 * and the caution and validity records that result objects carry.
 *
 * Import from `fluxwright/core` (or from `fluxwright`, which re-exports every module).
 *
 * @module fluxwright/core
 */
export { InputError } from "./input-error.js";
export {
  requireFinite,
  requirePositive,
  requireNonNegative,
  requireInRange,
  requireInteger,
  requireOneOf,
  requireObject,
  requireKnownKeys,
  nearestName,
  requireArrayLike,
  MAX_ARRAY_LENGTH,
} from "./validate.js";
export { DEFER_TO_CODES } from "./caution.js";
export { EXTRA_LOW_VOLTAGE_LIMITS, voltageCaution } from "./extra-low-voltage.js";
export type { VoltageCautionOptions } from "./extra-low-voltage.js";
export type { Caution, CautionSeverity, ValidityNote } from "./caution.js";
