/**
 * Formatting of quantities in engineering notation with SI prefixes.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/input-error.js";
import { requireInteger, requireKnownKeys, requireObject } from "../core/validate.js";
import { ENGINEERING_PREFIX } from "./prefixes.js";
import { canonicalUnit } from "./unit-symbols.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const FORMAT_FIELDS: readonly string[] = Object.freeze(["digits"]);

/**
 * Options of {@link formatQuantity}.
 *
 * @category Parsing and formatting
 */
export interface FormatQuantityOptions {
  /** Significant digits, 1 … 17 (default 4). Trailing zeros are dropped. */
  readonly digits?: number;
}

/** Units that take no prefix when printed (the prefix would read as a different unit). */
const UNPREFIXED = new Set(["°C", "K"]);

/**
 * Formats a value in engineering notation: a mantissa in [1, 1000) with the SI prefix of a
 * power of ten that is a multiple of three, a space, and the unit (`4.7 µF`, `12.5 kHz`,
 * `330 nH`, `-2.2 mΩ`).
 *
 * - Rounding to `digits` significant figures is done on the decimal digits of the value
 *   (`toExponential`), so no binary scaling error enters; trailing zeros are dropped.
 * - Zero prints as `0 F`. Beyond the prefixes (|value| ≥ 10³³ or < 10⁻³⁰) the value prints
 *   in scientific notation (`1.5e33 F`).
 * - Areas and volumes take the prefix of the metre, raised with it: `0.0147` m² prints as
 *   `14700 mm²` and `6e-4` m² as `600 mm²`; `2e-9` m³ as `2 mm³`.
 * - A mass in kg prints in grams with a prefix (`0.25` kg → `250 g`); kelvin and °C print
 *   without prefix. An empty unit prints the number and prefix alone (`4.7 k`).
 * - {@link parseQuantity} reads every output back: with `digits: 15` the round trip is within
 *   1 × 10⁻¹⁴ relative (tested).
 *
 * @param value - the value in coherent SI units
 * @param unit - the unit symbol to print (e.g. `"F"`, `"Hz"`, `"Ω"`, `"kg"`, or `""`)
 * @param options - `digits`: significant digits, 1 … 17, default 4
 * @returns the formatted text
 * @throws {@link InputError} when `value` is not finite, `options` is given but not an object, or
 * `digits` is not an integer 1 … 17
 * @see SI Brochure, 9th edition (2019), §5.4.3 (a space between number and unit) and Table 7.
 * @example
 * ```ts
 * import { formatQuantity } from "fluxwright";
 * console.log(formatQuantity(4.7e-6, "F")); // 4.7 µF
 * console.log(formatQuantity(12500, "Hz")); // 12.5 kHz
 * console.log(formatQuantity(3.3e-7, "H")); // 330 nH
 * console.log(formatQuantity(-0.0022, "Ω")); // -2.2 mΩ
 * console.log(formatQuantity(Math.PI, "V", { digits: 3 })); // 3.14 V
 * ```
 * @category Parsing and formatting
 */
export function formatQuantity(value: number, unit: string, options?: FormatQuantityOptions): string {
  const where = "formatQuantity";
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new InputError(where, "value", value, "", "a finite number");
  }
  if (typeof unit !== "string") throw new InputError(where, "unit", unit, "", "a unit symbol string");
  if (options !== undefined) requireObject(where, "options", options);
  if (options !== undefined) requireKnownKeys(where, "options", options, FORMAT_FIELDS);
  const digits = options?.digits === undefined ? 4 : requireInteger(where, "options.digits", options.digits, 1);
  if (digits > 17) throw new InputError(where, "options.digits", digits, "", "an integer between 1 and 17");

  let printedUnit = canonicalUnit(unit) ?? unit;
  let v = value;
  let shift = 0;
  if (printedUnit === "kg") {
    printedUnit = "g";
    shift = 3; // kg → g: multiply by 10³ in decimal, exactly.
  }
  const space = " ";
  if (v === 0) return printedUnit === "" ? "0" : `0 ${printedUnit}`;

  const sign = v < 0 ? "-" : "";
  v = Math.abs(v);
  const [digitsPart = "", expPart = "0"] = v.toExponential(digits - 1).split("e");
  const exponent = Number(expPart) + shift;
  const allDigits = digitsPart.replace(".", "");

  const prefixable = !UNPREFIXED.has(printedUnit);
  // Areas and volumes: the prefix is raised with the metre (1 mm² = 10⁻⁶ m²), so the printed
  // power of ten steps by 6 or 9 and the mantissa lies in [1, 10⁶) or [1, 10⁹).
  const power = printedUnit === "m²" ? 2 : printedUnit === "m³" ? 3 : 1;
  const engineering = prefixable ? Math.floor(exponent / (3 * power)) * 3 * power : 0;
  if (engineering > 30 || engineering < -30) {
    // Beyond quetta/quecto: plain scientific notation.
    const m = digitsPart.includes(".") ? digitsPart.replace(/0+$/u, "").replace(/\.$/u, "") : digitsPart;
    return printedUnit === "" ? `${sign}${m}e${exponent}` : `${sign}${m}e${exponent} ${printedUnit}`;
  }
  // Place the decimal point (exponent − engineering) places after the first digit.
  const pointAfter = exponent - engineering + 1;
  let mantissa: string;
  if (pointAfter <= 0) {
    mantissa = `0.${"0".repeat(-pointAfter)}${allDigits}`;
  } else if (pointAfter >= allDigits.length) {
    mantissa = allDigits + "0".repeat(pointAfter - allDigits.length);
  } else {
    mantissa = `${allDigits.slice(0, pointAfter)}.${allDigits.slice(pointAfter)}`;
  }
  if (mantissa.includes(".")) mantissa = mantissa.replace(/0+$/u, "").replace(/\.$/u, "");
  const prefix = engineering === 0 ? "" : (ENGINEERING_PREFIX.get(engineering / power) ?? "");
  const tail = `${prefix}${printedUnit}`;
  return tail === "" ? `${sign}${mantissa}` : `${sign}${mantissa}${space}${tail}`;
}
