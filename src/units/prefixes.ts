/**
 * The SI decimal prefixes (SI Brochure, 9th edition 2019, Table 7, with ronna, quetta, ronto
 * and quecto added by the 27th CGPM, 2022).
 *
 * @packageDocumentation
 */

/**
 * One SI prefix: its symbol, name and power of ten.
 *
 * @category Parsing and formatting
 */
export interface SiPrefix {
  /** Symbol as printed (`"k"`, `"µ"`, `"da"`). */
  readonly symbol: string;
  /** English name (`"kilo"`). */
  readonly name: string;
  /** Power of ten the prefix stands for (`3` for kilo). */
  readonly exponent: number;
}

/**
 * All 24 SI prefixes, from quecto (10⁻³⁰) to quetta (10³⁰). Micro is printed with the micro
 * sign `µ` (U+00B5); parsing also accepts the Greek `μ` (U+03BC) and `u`.
 *
 * @see SI Brochure, 9th edition (2019), Table 7; Resolution 3 of the 27th CGPM (2022).
 * @example
 * ```ts
 * import { SI_PREFIXES } from "fluxwright";
 * console.log(SI_PREFIXES.length); // 24
 * ```
 * @category Parsing and formatting
 */
export const SI_PREFIXES: readonly SiPrefix[] = Object.freeze([
  Object.freeze({ symbol: "q", name: "quecto", exponent: -30 }),
  Object.freeze({ symbol: "r", name: "ronto", exponent: -27 }),
  Object.freeze({ symbol: "y", name: "yocto", exponent: -24 }),
  Object.freeze({ symbol: "z", name: "zepto", exponent: -21 }),
  Object.freeze({ symbol: "a", name: "atto", exponent: -18 }),
  Object.freeze({ symbol: "f", name: "femto", exponent: -15 }),
  Object.freeze({ symbol: "p", name: "pico", exponent: -12 }),
  Object.freeze({ symbol: "n", name: "nano", exponent: -9 }),
  Object.freeze({ symbol: "µ", name: "micro", exponent: -6 }),
  Object.freeze({ symbol: "m", name: "milli", exponent: -3 }),
  Object.freeze({ symbol: "c", name: "centi", exponent: -2 }),
  Object.freeze({ symbol: "d", name: "deci", exponent: -1 }),
  Object.freeze({ symbol: "da", name: "deca", exponent: 1 }),
  Object.freeze({ symbol: "h", name: "hecto", exponent: 2 }),
  Object.freeze({ symbol: "k", name: "kilo", exponent: 3 }),
  Object.freeze({ symbol: "M", name: "mega", exponent: 6 }),
  Object.freeze({ symbol: "G", name: "giga", exponent: 9 }),
  Object.freeze({ symbol: "T", name: "tera", exponent: 12 }),
  Object.freeze({ symbol: "P", name: "peta", exponent: 15 }),
  Object.freeze({ symbol: "E", name: "exa", exponent: 18 }),
  Object.freeze({ symbol: "Z", name: "zetta", exponent: 21 }),
  Object.freeze({ symbol: "Y", name: "yotta", exponent: 24 }),
  Object.freeze({ symbol: "R", name: "ronna", exponent: 27 }),
  Object.freeze({ symbol: "Q", name: "quetta", exponent: 30 }),
] as const);

/** Prefix symbol (including the micro aliases) → power of ten. */
export const PREFIX_EXPONENT: ReadonlyMap<string, number> = new Map([
  ...SI_PREFIXES.map((p) => [p.symbol, p.exponent] as const),
  ["μ", -6],
  ["u", -6],
]);

/** Power of ten (multiple of 3 only) → prefix symbol used when formatting. */
export const ENGINEERING_PREFIX: ReadonlyMap<number, string> = new Map(
  SI_PREFIXES.filter((p) => p.exponent % 3 === 0).map((p) => [p.exponent, p.symbol] as const),
);
