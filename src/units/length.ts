/**
 * Length conversions between SI metres and the inch-based units of wire and sheet tables.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/input-error.js";
import { requireFinite } from "../core/validate.js";
import type { Metres } from "./quantities.js";

/** The converted value, or an InputError when it leaves the double range (about ±1.8e308). */
function representable(where: string, value: number, unit: string, result: number): number {
  if (!Number.isFinite(result)) throw new InputError(where, "value", value, unit, "a value whose conversion lies within the double-precision range");
  return result;
}

/** Metres per inch, exact by the 1959 international yard and pound agreement. */
const METRES_PER_INCH = 0.0254;

/**
 * Converts inches to metres: $x_\mathrm{m} = 0.0254\,x_\mathrm{in}$ (exact definition).
 *
 * @param value - length [in]
 * @returns length [m]
 * @throws {@link InputError} when the value is not finite
 * @see International yard and pound agreement (1959): 1 in = 25.4 mm exactly.
 * @example
 * ```ts
 * import { inches } from "fluxwright";
 * console.log(inches(2)); // 0.0508
 * ```
 * @category Conversions
 */
export function inches(value: number): Metres {
  return representable("inches", value, "in", requireFinite("inches", "value", value, "in") * METRES_PER_INCH) as Metres;
}

/**
 * Converts metres to inches.
 *
 * @param value - length [m]
 * @returns length [in]
 * @throws {@link InputError} when the value is not finite
 * @example
 * ```ts
 * import { toInches } from "fluxwright";
 * console.log(toInches(0.0508)); // 2
 * ```
 * @category Conversions
 */
export function toInches(value: number): number {
  return representable("toInches", value, "m", requireFinite("toInches", "value", value, "m") / METRES_PER_INCH);
}

/**
 * Converts mils (thousandths of an inch) to metres: 1 mil = 25.4 µm exactly.
 *
 * @param value - length [mil]
 * @returns length [m]
 * @throws {@link InputError} when the value is not finite
 * @example
 * ```ts
 * import { mils } from "fluxwright";
 * console.log(mils(10)); // 0.000254
 * ```
 * @category Conversions
 */
export function mils(value: number): Metres {
  return representable("mils", value, "mil", (requireFinite("mils", "value", value, "mil") * METRES_PER_INCH) / 1000) as Metres;
}

/**
 * Converts metres to mils.
 *
 * @param value - length [m]
 * @returns length [mil]
 * @throws {@link InputError} when the value is not finite
 * @example
 * ```ts
 * import { toMils } from "fluxwright";
 * console.log(toMils(0.000254)); // 10
 * ```
 * @category Conversions
 */
export function toMils(value: number): number {
  const v = requireFinite("toMils", "value", value, "m");
  // × 1000 first keeps the long-standing rounding; ÷ first when × 1000 alone would overflow
  return representable("toMils", value, "m", Math.abs(v) < 1e305 ? (v * 1000) / METRES_PER_INCH : v / (METRES_PER_INCH / 1000));
}

/**
 * Converts millimetres to metres.
 *
 * @param value - length [mm]
 * @returns length [m]
 * @throws {@link InputError} when the value is not finite
 * @example
 * ```ts
 * import { millimetres } from "fluxwright";
 * console.log(millimetres(2.5)); // 0.0025
 * ```
 * @category Conversions
 */
export function millimetres(value: number): Metres {
  return (requireFinite("millimetres", "value", value, "mm") / 1000) as Metres;
}

/**
 * Converts metres to millimetres.
 *
 * @param value - length [m]
 * @returns length [mm]
 * @throws {@link InputError} when the value is not finite
 * @example
 * ```ts
 * import { toMillimetres } from "fluxwright";
 * console.log(toMillimetres(0.0025)); // 2.5
 * ```
 * @category Conversions
 */
export function toMillimetres(value: number): number {
  return representable("toMillimetres", value, "m", requireFinite("toMillimetres", "value", value, "m") * 1000);
}
