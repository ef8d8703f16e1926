/**
 * Input validation shared by every module. Each helper returns its value unchanged when it is
 * valid and throws {@link InputError} otherwise, so checks read as assignments:
 * `const r = requirePositive("solenoidInductance", "radius", options.radius, "m");`.
 * They allocate nothing on the valid path.
 *
 * @packageDocumentation
 */
import { InputError } from "./input-error.js";

/**
 * Requires a finite number (not NaN, not ±Infinity, and of type `number`).
 *
 * @param where - the public function doing the check (used in the message)
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @param unit - its SI unit symbol, `""` for dimensionless
 * @returns the value, typed as `number`
 * @throws {@link InputError} when the value is not a finite number
 * @example
 * ```ts
 * import { requireFinite } from "fluxwright";
 * console.log(requireFinite("demo", "offset", -2, "m")); // -2
 * ```
 * @category Validation
 */
export function requireFinite(where: string, parameter: string, value: unknown, unit: string): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new InputError(where, parameter, value, unit, "a finite number");
  }
  return value;
}

/**
 * Requires a finite number strictly greater than zero.
 *
 * @param where - the public function doing the check
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @param unit - its SI unit symbol, `""` for dimensionless
 * @returns the value
 * @throws {@link InputError} when the value is not finite or not > 0
 * @example
 * ```ts
 * import { requirePositive } from "fluxwright";
 * console.log(requirePositive("demo", "radius", 0.01, "m")); // 0.01
 * ```
 * @category Validation
 */
export function requirePositive(where: string, parameter: string, value: unknown, unit: string): number {
  if (typeof value !== "number" || !(value > 0) || value === Infinity) {
    throw new InputError(where, parameter, value, unit, "a finite number > 0");
  }
  return value;
}

/**
 * Requires a finite number greater than or equal to zero.
 *
 * @param where - the public function doing the check
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @param unit - its SI unit symbol, `""` for dimensionless
 * @returns the value
 * @throws {@link InputError} when the value is not finite or is negative
 * @example
 * ```ts
 * import { requireNonNegative } from "fluxwright";
 * console.log(requireNonNegative("demo", "gap", 0, "m")); // 0
 * ```
 * @category Validation
 */
export function requireNonNegative(where: string, parameter: string, value: unknown, unit: string): number {
  if (typeof value !== "number" || !(value >= 0) || value === Infinity) {
    throw new InputError(where, parameter, value, unit, "a finite number ≥ 0");
  }
  return value;
}

/**
 * Requires a finite number in an interval; each end may be open or closed.
 *
 * @param where - the public function doing the check
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @param unit - its SI unit symbol, `""` for dimensionless
 * @param min - the lower end of the interval (may be `-Infinity`)
 * @param max - the upper end of the interval (may be `Infinity`)
 * @param ends - `"[]"` (default), `"[)"`, `"(]"` or `"()"`: which ends are included
 * @returns the value
 * @throws {@link InputError} when the value is not finite or lies outside the interval
 * @example
 * ```ts
 * import { requireInRange } from "fluxwright";
 * console.log(requireInRange("demo", "dutyCycle", 0.5, "", 0, 1, "()")); // 0.5
 * ```
 * @category Validation
 */
export function requireInRange(
  where: string,
  parameter: string,
  value: unknown,
  unit: string,
  min: number,
  max: number,
  ends: "[]" | "[)" | "(]" | "()" = "[]",
): number {
  if (typeof value === "number" && Number.isFinite(value)) {
    const aboveMin = ends[0] === "[" ? value >= min : value > min;
    const belowMax = ends[1] === "]" ? value <= max : value < max;
    if (aboveMin && belowMax) return value;
  }
  const lo = min === -Infinity ? "" : `${ends[0] === "[" ? "≥" : ">"} ${min}`;
  const hi = max === Infinity ? "" : `${ends[1] === "]" ? "≤" : "<"} ${max}`;
  const range = lo !== "" && hi !== "" ? `${lo} and ${hi}` : lo + hi;
  throw new InputError(where, parameter, value, unit, `a finite number${range === "" ? "" : ` ${range}`}`);
}

/**
 * Requires an integer not below `min` (default 1), e.g. a turn or layer count.
 *
 * @param where - the public function doing the check
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @param min - the smallest allowed integer (default 1)
 * @returns the value
 * @throws {@link InputError} when the value is not an integer ≥ `min`
 * @example
 * ```ts
 * import { requireInteger } from "fluxwright";
 * console.log(requireInteger("demo", "turns", 12)); // 12
 * ```
 * @category Validation
 */
export function requireInteger(where: string, parameter: string, value: unknown, min = 1): number {
  if (typeof value !== "number" || !Number.isInteger(value) || value < min) {
    throw new InputError(where, parameter, value, "", `an integer ≥ ${min}`);
  }
  return value;
}

/**
 * Requires one of a fixed set of strings (an option such as `"half" | "full"`).
 *
 * @param where - the public function doing the check
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @param allowed - the allowed strings
 * @returns the value, narrowed to the allowed union
 * @throws {@link InputError} when the value is not one of `allowed`
 * @example
 * ```ts
 * import { requireOneOf } from "fluxwright";
 * console.log(requireOneOf("demo", "bridge", "half", ["half", "full"] as const)); // half
 * ```
 * @category Validation
 */
export function requireOneOf<const T extends string>(
  where: string,
  parameter: string,
  value: unknown,
  allowed: readonly T[],
): T {
  if (typeof value !== "string" || !(allowed as readonly string[]).includes(value)) {
    throw new InputError(where, parameter, value, "", `one of ${allowed.map((a) => JSON.stringify(a)).join(", ")}`);
  }
  return value as T;
}

/**
 * Requires a non-null object (an options object or a nested description).
 *
 * @param where - the public function doing the check
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @returns the value, typed as a record
 * @throws {@link InputError} when the value is not a non-null, non-array object
 * @example
 * ```ts
 * import { requireObject } from "fluxwright";
 * console.log(Object.keys(requireObject("demo", "options", { radius: 1 }))); // [ 'radius' ]
 * ```
 * @category Validation
 */
export function requireObject(where: string, parameter: string, value: unknown): Record<string, unknown> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new InputError(where, parameter, value, "", "an object");
  }
  return value as Record<string, unknown>;
}
