/**
 * IEC 60063 preferred-number series E12, E24 and E96 (mantissas in [1, 10)).
 *
 * Source: IEC 60063:2015 "Preferred number series for resistors and capacitors", Table 1
 * (E6–E24, two significant figures) and Table 2 (E48–E192, three significant figures).
 * Checked in the tests against the published tables (as reproduced in the appendix "Normreihen
 * der Bauelemente" of the RWTH Aachen MSP430 textbook) and against the rule they follow: every
 * E96 value equals $\mathrm{round}(100\cdot10^{i/96})/100$, and E12/E24 equal
 * $\mathrm{round}(10\cdot10^{i/n})/10$ except the historic values 2.7, 3.0, 3.3, 3.6, 3.9, 4.3,
 * 4.7 and 8.2 that the standard keeps.
 *
 * @packageDocumentation
 */

/**
 * The E12 series (IEC 60063:2015, Table 1): 12 values per decade, as mantissas in [1, 10).
 *
 * @example
 * ```ts
 * import { E12 } from "fluxwright";
 * console.log(E12.length, E12[5]); // 12 2.7
 * ```
 * @category Capacitor banks
 */
export const E12: readonly number[] = Object.freeze([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);

/**
 * The E24 series (IEC 60063:2015, Table 1): 24 values per decade, as mantissas in [1, 10).
 *
 * @example
 * ```ts
 * import { E24 } from "fluxwright";
 * console.log(E24.length, E24[11]); // 24 3
 * ```
 * @category Capacitor banks
 */
export const E24: readonly number[] = Object.freeze([
  1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1,
]);

/**
 * The E96 series (IEC 60063:2015, Table 2): 96 values per decade, as mantissas in [1, 10).
 *
 * @example
 * ```ts
 * import { E96 } from "fluxwright";
 * console.log(E96.length, E96[1]); // 96 1.02
 * ```
 * @category Capacitor banks
 */
export const E96: readonly number[] = Object.freeze(
  [
    100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140, 143, 147, 150, 154, 158, 162, 165, 169,
    174, 178, 182, 187, 191, 196, 200, 205, 210, 215, 221, 226, 232, 237, 243, 249, 255, 261, 267, 274, 280, 287, 294,
    301, 309, 316, 324, 332, 340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442, 453, 464, 475, 487, 499, 511,
    523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732, 750, 768, 787, 806, 825, 845, 866, 887,
    909, 931, 953, 976,
  ].map((v) => v / 100),
);
