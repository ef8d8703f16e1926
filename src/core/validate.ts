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

/** Edit distance (Levenshtein, insert/delete/substitute = 1) between two short strings. */
function editDistance(a: string, b: string): number {
  const row: number[] = [];
  for (let j = 0; j <= b.length; j++) row.push(j);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = row[0] ?? 0;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = row[j] ?? 0;
      const cost = a.charCodeAt(i - 1) === b.charCodeAt(j - 1) ? 0 : 1;
      row[j] = Math.min(above + 1, (row[j - 1] ?? 0) + 1, diagonal + cost);
      diagonal = above;
    }
  }
  return row[b.length] ?? 0;
}

/**
 * The known name closest to `name` (case-insensitive edit distance), or `null` when none is
 * close enough to be a likely typo (distance above a third of the longer name, at least 2).
 *
 * @param name - the unknown name as written
 * @param known - the names that are accepted
 * @returns the suggestion, or `null`
 * @example
 * ```ts
 * import { nearestName } from "fluxwright";
 * console.log(nearestName("relativePermeabilty", ["diameter", "relativePermeability"])); // relativePermeability
 * ```
 * @category Validation
 */
export function nearestName(name: string, known: readonly string[]): string | null {
  const lower = name.toLowerCase();
  let best: string | null = null;
  let bestDistance = Infinity;
  for (const candidate of known) {
    const distance = editDistance(lower, candidate.toLowerCase());
    if (distance < bestDistance) {
      bestDistance = distance;
      best = candidate;
    }
  }
  if (best === null) return null;
  const allowed = Math.max(2, Math.floor(Math.max(name.length, best.length) / 3));
  return bestDistance <= allowed ? best : null;
}

/**
 * Requires that an options object has no fields besides `known`: a misspelt optional field
 * would otherwise fall back to its default without a word. The error names the field and
 * suggests the nearest known one. The valid path allocates nothing (one `for…in` over the
 * object's own keys, each looked up in `known`).
 *
 * @param where - the public function doing the check
 * @param path - the options parameter's name or field path (`"options"`, `"coil"`); the error names `path.key`
 * @param value - the options object (already checked to be an object)
 * @param known - every accepted field name
 * @returns the value, unchanged
 * @throws {@link InputError} when `value` is not an object, or naming the first unknown field with the nearest known name
 * @example
 * ```ts
 * import { requireKnownKeys } from "fluxwright";
 * try {
 *   requireKnownKeys("demo", "options", { radius: 1, lenght: 2 }, ["radius", "length"]);
 * } catch (e) {
 *   console.log((e as Error).message); // demo: options.lenght must be absent (unknown field; did you mean "length"? known fields: radius, length), got 2
 * }
 * ```
 * @category Validation
 */
export function requireKnownKeys<T extends object>(where: string, path: string, value: T, known: readonly string[]): T {
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new InputError(where, path === "" ? "options" : path, value, "", "an object");
  }
  for (const key in value) {
    if (!Object.prototype.hasOwnProperty.call(value, key)) continue;
    if (known.includes(key)) continue;
    const suggestion = nearestName(key, known);
    const hint = suggestion === null ? "" : `did you mean ${JSON.stringify(suggestion)}? `;
    throw new InputError(
      where,
      path === "" ? key : `${path}.${key}`,
      (value as Record<string, unknown>)[key],
      "",
      `absent (unknown field; ${hint}known fields: ${known.join(", ")})`,
    );
  }
  return value;
}

/**
 * Most points a sweep, sampled waveform or other array result may have (10⁷: 80 MB per
 * `Float64Array`). Longer requests are refused with an {@link InputError} instead of failing
 * inside the engine with a plain `RangeError` or exhausting memory.
 *
 * @category Validation
 */
export const MAX_ARRAY_LENGTH = 10_000_000;

/**
 * Requires an array-like whose `length` is an integer between 0 (or `min`) and
 * {@link MAX_ARRAY_LENGTH}, e.g. the frequencies of a sweep.
 *
 * @param where - the public function doing the check
 * @param parameter - the parameter name or field path
 * @param value - the value to check
 * @param unit - the unit of its elements, `""` for dimensionless
 * @param min - the fewest elements allowed (default 0)
 * @returns the value, typed as an array-like of unknowns
 * @throws {@link InputError} when the value is not an object with such a length
 * @example
 * ```ts
 * import { requireArrayLike } from "fluxwright";
 * console.log(requireArrayLike("demo", "frequencies", [1e3, 2e3], "Hz").length); // 2
 * ```
 * @category Validation
 */
export function requireArrayLike(where: string, parameter: string, value: unknown, unit: string, min = 0): ArrayLike<unknown> {
  if (typeof value !== "object" || value === null) throw new InputError(where, parameter, value, unit, "an array");
  const length = (value as { length?: unknown }).length;
  if (typeof length !== "number" || !Number.isInteger(length) || length < min || length > MAX_ARRAY_LENGTH) {
    throw new InputError(where, `${parameter}.length`, length, "", `an integer between ${min} and ${MAX_ARRAY_LENGTH}`);
  }
  return value as ArrayLike<unknown>;
}

/**
 * A computed result when it is a finite number; otherwise an {@link InputError} naming the
 * inputs: dimensions near the ends of the double range can make an exact formula overflow or
 * give 0/0, and such inputs are refused rather than answered with Infinity or NaN. Nothing is
 * built unless it throws (it sits on hot paths). Internal.
 *
 * @param where - the public function
 * @param parameter - the inputs that together set the result (for the message)
 * @param result - the computed value
 */
export function requireFiniteResult(where: string, parameter: string, result: number): number {
  if (Math.abs(result) < Infinity) return result;
  throw new InputError(where, parameter, result, "", "values for which the result lies within the double-precision range");
}
