/**
 * Thermal conductivity of a conducting material at a temperature.
 *
 * @packageDocumentation
 */
import { requireObject, requirePositive } from "../core/index.js";
import { checkTemperatureTable } from "./check-material.js";
import { interpolateTemperatureTable } from "./interpolate.js";
import type { ConductiveMaterial } from "./types.js";

/**
 * Thermal conductivity of a material at a temperature, by piecewise-linear interpolation in
 * its `thermalConductivityTable`; the value at the nearer end is held outside the table.
 *
 * $$
 * \lambda(T) = \lambda_i + (\lambda_{i+1} - \lambda_i)\,\frac{T - T_i}{T_{i+1} - T_i}
 * $$
 *
 * Hard domain (throws {@link InputError}): `material` not an object; `temperature` not a
 * finite number > 0. Validity: the material's `temperatureRange`. Accuracy: that of the
 * source table named in the material (typically ±10 % between grades of one family).
 *
 * @param material - the material
 * @param temperature - temperature [K], > 0
 * @returns thermal conductivity [W/(m·K)], positive and finite
 * @throws {@link InputError} on a bad material or temperature
 * @see F. P. Incropera, D. P. DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1.
 * @example
 * ```ts
 * import { thermalConductivityAt, austeniticStainless } from "fluxwright";
 * console.log(thermalConductivityAt(austeniticStainless, 600)); // 19.8
 * ```
 * @category Materials
 */
export function thermalConductivityAt(material: ConductiveMaterial, temperature: number): number {
  requireObject("thermalConductivityAt", "material", material);
  requirePositive("thermalConductivityAt", "temperature", temperature, "K");
  const table = checkTemperatureTable("thermalConductivityAt", "material.thermalConductivityTable", material.thermalConductivityTable, "W/(m·K)");
  return interpolateTemperatureTable(table, temperature);
}
