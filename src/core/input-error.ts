/**
 * The one error type thrown by fluxwright for bad input.
 *
 * @packageDocumentation
 */

/**
 * Thrown by every public fluxwright function when an argument is non-finite, of the wrong
 * type, or outside the function's hard domain. A `RangeError`, so `catch (e) { if (e
 * instanceof RangeError) … }` keeps working in apps that do not import this class.
 *
 * The message always follows one pattern:
 * `<function>: <parameter> must be <expected> [<unit>], got <value>`, for example
 * `solenoidInductance: radius must be a finite number > 0 m, got -0.01`.
 *
 * @example
 * ```ts
 * import { InputError, parseQuantity } from "fluxwright";
 * try {
 *   parseQuantity("4.7 xF", "F");
 * } catch (e) {
 *   console.log(e instanceof InputError, (e as InputError).parameter); // true text
 * }
 * ```
 * @category Errors
 */
export class InputError extends RangeError {
  /** The function that rejected the input, e.g. `"solenoidInductance"`. */
  readonly where: string;
  /** The parameter (or field path, e.g. `"coil.turns"`) that was rejected. */
  readonly parameter: string;
  /** The rejected value, as given. */
  readonly value: unknown;
  /** The SI unit symbol of the parameter, or `""` for a dimensionless one. */
  readonly unit: string;
  /** What was expected, in words, e.g. `"a finite number > 0"`. */
  readonly expected: string;

  /**
   * @param where - the public function that rejects the input
   * @param parameter - the parameter name or field path
   * @param value - the value that was given
   * @param unit - the SI unit symbol of the parameter (`""` for none)
   * @param expected - what the value must be, in words, without the unit
   */
  constructor(where: string, parameter: string, value: unknown, unit: string, expected: string) {
    super(`${where}: ${parameter} must be ${expected}${unit === "" ? "" : ` ${unit}`}, got ${describeValue(value)}`);
    this.name = "InputError";
    this.where = where;
    this.parameter = parameter;
    this.value = value;
    this.unit = unit;
    this.expected = expected;
  }
}

/** Renders a rejected value for an error message: strings quoted, objects abbreviated. */
function describeValue(value: unknown): string {
  if (typeof value === "string") return JSON.stringify(value);
  if (typeof value === "number" || typeof value === "boolean" || typeof value === "bigint") return String(value);
  if (value === null) return "null";
  if (value === undefined) return "undefined";
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  if (typeof value === "function") return "a function";
  return "an object";
}
