/**
 * The grammar of a quantity written in a study file: a plain decimal or scientific number, an
 * optional space, an optional SI prefix and a spelling of the field's unit (`"30 mm"`,
 * `"4.7 µF"`, `"1.25 in"`, `"850 °C"`). One source for the reader (which refuses other text in
 * study files: RKM codes such as `"4k7"` and a bare prefix such as `"30 m"` for a capacitance
 * say nothing of the unit) and for the generated study-file schema (`scripts/study-schema.ts`).
 *
 * @packageDocumentation
 */
import { PREFIX_EXPONENT } from "../units/prefixes.js";
import { UNIT_ALIASES } from "../units/unit-symbols.js";

/** Lengths in inches or mils, which the reader converts exactly (1 in = 25.4 mm). */
export const INCH_SPELLINGS = ["in", "inch", "inches", "mil", "mils"] as const;

/** Units written without a prefix (a prefixed kelvin or degree would read as a typo). */
const UNPREFIXED = new Set(["K", "W/(m²·K)"]);

const escape = (text: string): string => text.replace(/[.*+?^${}()|[\]\\/]/gu, "\\$&");

/** Longest first, so that `da` is tried before `d` (the order does not change what matches). */
const byLength = (a: string, b: string): number => b.length - a.length || (a < b ? -1 : 1);

/** The number: digits with an optional point, or a leading point; an optional exponent. */
const NUMBER = "([0-9]+\\.?[0-9]*|\\.[0-9]+)([eE][+-]?[0-9]+)?";

/**
 * The regular-expression source of a quantity text in `unit` (a canonical symbol of the units
 * module: `"m"`, `"F"`, `"K"`, …).
 *
 * @param unit - the field's SI unit
 * @param sign - `"positive"`: no sign and a non-zero digit (the value is > 0 unless it underflows);
 *   `"non-negative"`: no minus sign; `"any"`: an optional sign (temperatures, and the reader's
 *   grammar check, which leaves the range to its numeric check)
 */
export function quantityTextPattern(unit: string, sign: "positive" | "non-negative" | "any"): string {
  const spellings = [...UNIT_ALIASES].filter(([, canonical]) => canonical === unit).map(([spelling]) => spelling);
  // the temperature fields are in kelvin; degrees Celsius are read too
  if (unit === "K") spellings.push(...[...UNIT_ALIASES].filter(([, c]) => c === "°C").map(([s]) => s));
  if (spellings.length === 0) throw new Error(`quantityTextPattern: no spelling of the unit ${unit}`);
  const units = `(${spellings.sort(byLength).map(escape).join("|")})`;
  const prefixes = `(${[...PREFIX_EXPONENT.keys()].sort(byLength).map(escape).join("|")})`;
  const symbol = UNPREFIXED.has(unit) ? units : `${prefixes}?${units}`;
  const tail = unit === "m" ? `(${symbol}|${INCH_SPELLINGS.slice().sort(byLength).join("|")})` : symbol;
  const lead = sign === "any" ? "[+-]?" : sign === "positive" ? "\\+?(?=[0-9.]*[1-9])" : "\\+?";
  return `^\\s*${lead}${NUMBER}\\s*${tail}\\s*$`;
}

const GRAMMAR = new Map<string, RegExp>();

/** Whether `text` is a quantity written in `unit` by the study-file grammar (any sign). */
export function isQuantityText(text: string, unit: string): boolean {
  let re = GRAMMAR.get(unit);
  if (re === undefined) {
    re = new RegExp(quantityTextPattern(unit, "any"), "u");
    GRAMMAR.set(unit, re);
  }
  return re.test(text);
}
