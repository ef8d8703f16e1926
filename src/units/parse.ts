/**
 * Parsing of quantities written as text: `"4.7 µF"`, `"12.5kHz"`, `"-3e-3 m"`, RKM codes
 * (`"4k7"`, `"0R22"`, `"2n2"`).
 *
 * @packageDocumentation
 */
import { InputError } from "../core/input-error.js";
import { ZERO_CELSIUS } from "./constants.js";
import { PREFIX_EXPONENT } from "./prefixes.js";
import { canonicalUnit } from "./unit-symbols.js";

const NUMBER = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+))(?:[eE]([+-]?\d+))?\s*(.*)$/su;
/** RKM code: the multiplier letter stands in the place of the decimal point (IEC 60062:2016, §4). */
const RKM = /^(\d*)([RKkMGTpnuµμm])(\d*)$/u;
/** RKM letter → power of ten. `R` is the unit multiplier 1; `K` is accepted for kilo. */
const RKM_EXPONENT: Readonly<Record<string, number>> = {
  R: 0, K: 3, k: 3, M: 6, G: 9, T: 12, p: -12, n: -9, u: -6, "µ": -6, "μ": -6, m: -3,
};

/**
 * Parses a quantity written as text into a plain number in coherent SI units.
 *
 * Accepted forms:
 * - a decimal or scientific number, an optional space, an optional SI prefix and an optional
 *   unit symbol: `"4.7 µF"`, `"4.7µF"`, `"4.7e-6 F"`, `"12.5 kHz"`, `"330nH"`, `"-2 mm"`,
 *   `"0.5 kg"`, `"500 g"` (→ 0.5, the coherent unit being kg), `"20 °C"` with `unit = "K"`
 *   (→ 293.15);
 * - micro as `µ` (U+00B5), `μ` (U+03BC) or `u`; ohm as `Ω`, `Ω` (U+2126) or `ohm`;
 * - an RKM code of IEC 60062, the multiplier letter standing for the decimal point:
 *   `"4k7"` = 4700, `"4R7"` = 4.7, `"0R22"` = 0.22, `"R47"` = 0.47, `"2n2"` = 2.2 × 10⁻⁹,
 *   `"4µ7"` = 4.7 × 10⁻⁶, `"47R"` = 47.
 *
 * The number is scaled by its prefix in decimal (the prefix's power of ten is added to the
 * written exponent before conversion), so the result is the correctly rounded double of the
 * written value: `parseQuantity("4.7 µF")` is exactly the double nearest 4.7 × 10⁻⁶.
 *
 * A lone letter that is both a unit and a prefix (`m`, `T`) is read as the unit: `"1 m"` is one
 * metre, not 0.001. A prefix on an area or volume applies to the metre before it is raised to
 * the power, as the SI Brochure (§5.4.3) prescribes: `"6 cm²"` is 6 × 10⁻⁴ m², `"2 mm³"` is
 * 2 × 10⁻⁹ m³.
 *
 * @param text - the quantity as text
 * @param unit - the expected unit symbol (e.g. `"F"`, `"Hz"`, `"Ω"`); when given, a unit
 *   written in the text must be this one, and a bare number or bare prefix is taken in it;
 *   `""` asks for a dimensionless number, where a trailing letter can only be a prefix
 *   (`parseQuantity("2.5 m", "")` is 0.0025)
 * @returns the value in coherent SI units (kg for masses, K for temperatures)
 * @throws {@link InputError} on empty text, garbage, an unknown prefix or unit, or a unit
 *   different from `unit`; never returns NaN
 * @see IEC 60062:2016, Marking codes for resistors and capacitors, §4 (RKM code);
 *   SI Brochure, 9th edition (2019), Table 7 (prefixes).
 * @example
 * ```ts
 * import { parseQuantity } from "fluxwright";
 * console.log(parseQuantity("4.7 µF", "F")); // 0.0000047
 * console.log(parseQuantity("4k7")); // 4700
 * console.log(parseQuantity("12.5 kHz", "Hz")); // 12500
 * console.log(parseQuantity("0R22", "Ω")); // 0.22
 * ```
 * @category Parsing and formatting
 */
export function parseQuantity(text: string, unit?: string): number {
  const where = "parseQuantity";
  if (typeof text !== "string") throw new InputError(where, "text", text, "", "a string");
  let expected: string | undefined;
  if (unit !== undefined) {
    if (typeof unit !== "string") throw new InputError(where, "unit", unit, "", "a unit symbol string");
    expected = unit === "" ? "" : canonicalUnit(unit);
    if (expected === undefined) throw new InputError(where, "unit", unit, "", "a known SI unit symbol");
  }
  const source = text.trim().replace(/\u2212/gu, "-");
  const fail = (why: string): never => {
    throw new InputError(where, "text", text, "", why);
  };
  if (source === "") fail(`a quantity such as "4.7 µF"`);

  const rkm = RKM.exec(source);
  if (rkm !== null) {
    const [, whole = "", letter = "", fraction = ""] = rkm;
    // Only a letter in the place of the decimal point, or a leading/trailing R or K, is an RKM code;
    // "47k" is ordinary notation (same value).
    if (whole.length + fraction.length > 0 && (fraction.length > 0 || letter === "R" || letter === "K")) {
      const exponent = RKM_EXPONENT[letter] ?? 0;
      if (expected !== undefined && expected !== "" && letter === "R" && expected !== "Ω") {
        fail(`a quantity in ${expected} (the RKM letter R marks ohms)`);
      }
      return Number(`${whole === "" ? "0" : whole}.${fraction === "" ? "0" : fraction}e${exponent}`);
    }
  }

  const match = NUMBER.exec(source);
  if (match === null) return fail(`a number with an optional SI prefix and unit, e.g. "4.7 µF"`);
  const [, mantissa = "", written = "0", rest = ""] = match;
  const suffix = rest.trim();
  let exponent = Number(written);
  let factorUnit = "";
  let prefixExponent = 0;
  let found = false;

  if (suffix === "") {
    found = true;
  } else {
    // A dimensionless quantity (unit "") takes a bare prefix only.
    const asUnit = expected === "" ? undefined : canonicalUnit(suffix);
    if (asUnit !== undefined) {
      factorUnit = asUnit;
      found = true;
    } else {
      // Prefix (1 or 2 characters) followed by a unit, or a bare prefix.
      for (const length of [2, 1]) {
        const head = suffix.slice(0, length);
        const p = PREFIX_EXPONENT.get(head);
        if (p === undefined) continue;
        const tail = suffix.slice(length);
        if (tail === "") {
          prefixExponent = p;
          found = true;
          break;
        }
        const u = canonicalUnit(tail);
        if (u !== undefined && u !== "°C" && u !== "kg" && u.length > 0) {
          prefixExponent = p;
          factorUnit = u;
          found = true;
          break;
        }
      }
    }
  }
  if (!found) return fail(`a number with a known SI prefix and unit, e.g. "4.7 µF"`);

  // Units whose coherent SI form differs from the written one.
  let offset = 0;
  let resultUnit = factorUnit;
  if (factorUnit === "g") {
    prefixExponent -= 3;
    resultUnit = "kg";
  } else if (factorUnit === "°C") {
    offset = ZERO_CELSIUS;
    resultUnit = "K";
  }
  if (expected !== undefined && resultUnit !== "" && resultUnit !== expected) {
    return fail(`a quantity in ${expected} (the text is in ${factorUnit})`);
  }
  // A prefix on a power of the metre is raised to that power: 1 cm² = (10⁻² m)² = 10⁻⁴ m².
  exponent += prefixExponent * (factorUnit === "m²" ? 2 : factorUnit === "m³" ? 3 : 1);
  const value = Number(`${mantissa}e${exponent}`) + offset;
  if (!Number.isFinite(value)) return fail("a quantity within the double-precision range");
  // a Celsius text below absolute zero is no temperature (celsius() refuses it too)
  if (offset !== 0 && value < 0) return fail("a temperature at or above absolute zero (−273.15 °C)");
  return value;
}
