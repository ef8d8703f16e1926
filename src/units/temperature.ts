/**
 * Temperature conversions. fluxwright takes and returns kelvin everywhere; these helpers convert
 * at the edges.
 *
 * @packageDocumentation
 */
import { requireFinite, requireInRange } from "../core/validate.js";
import { ZERO_CELSIUS } from "./constants.js";
import type { Kelvins } from "./quantities.js";

/**
 * Converts a Celsius temperature to kelvin: $T = t + 273.15$.
 *
 * @param degreesCelsius - temperature [°C], ≥ −273.15
 * @returns thermodynamic temperature [K]
 * @throws {@link InputError} when the value is not finite or is below absolute zero
 * @remarks Exact up to the rounding of one addition (≤ 0.5 ulp).
 * @see SI Brochure, 9th edition (2019), §2.3.1.
 * @example
 * ```ts
 * import { celsius } from "fluxwright";
 * console.log(celsius(20)); // 293.15
 * ```
 * @category Conversions
 */
export function celsius(degreesCelsius: number): Kelvins {
  requireInRange("celsius", "degreesCelsius", degreesCelsius, "°C", -ZERO_CELSIUS, Infinity);
  return (degreesCelsius + ZERO_CELSIUS) as Kelvins;
}

/**
 * Converts a temperature in kelvin to degrees Celsius: $t = T - 273.15$.
 *
 * @param kelvin - thermodynamic temperature [K], ≥ 0
 * @returns temperature [°C]
 * @throws {@link InputError} when the value is not finite or is negative
 * @see SI Brochure, 9th edition (2019), §2.3.1.
 * @example
 * ```ts
 * import { toCelsius } from "fluxwright";
 * console.log(toCelsius(373.15)); // 100
 * ```
 * @category Conversions
 */
export function toCelsius(kelvin: number): number {
  requireFinite("toCelsius", "kelvin", kelvin, "K");
  requireInRange("toCelsius", "kelvin", kelvin, "K", 0, Infinity);
  return kelvin - ZERO_CELSIUS;
}
