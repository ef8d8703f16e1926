/**
 * Resistivity of a conducting material at a temperature.
 *
 * @packageDocumentation
 */
import { requireObject, requirePositive } from "../core/index.js";
import { checkResistivityModel } from "./check-material.js";
import { interpolateTemperatureTable } from "./interpolate.js";
import type { ConductiveMaterial } from "./types.js";

/** 20 °C in kelvin, the reference temperature of conductor standards. */
const T20 = 293.15;

/**
 * Electrical resistivity of a material at a temperature.
 *
 * For a material with a `"linear"` resistivity model (the conductor standards' form,
 * e.g. {@link copper}, {@link aluminium}):
 * $$
 * \rho(T) = \rho_{20}\,\bigl[1 + \alpha_{20}\,(T - 293.15\ \mathrm{K})\bigr]
 * $$
 * and for a `"table"` model, piecewise-linear interpolation in the material's table.
 * Outside the material's `temperatureRange` the value at the nearer end is held.
 *
 * Hard domain (throws {@link InputError}): `material` not an object; `temperature` not a
 * finite number > 0. Validity: the material's `temperatureRange`. Accuracy: the data's own,
 * as stated in each material's sources; the linear IEC form for copper stays within about
 * 5 % of tabulated pure-copper resistivity up to 1000 K (from memory, CRC Handbook
 * "Electrical resistivity of pure metals") and under-reads by about 9 % at 1200 K.
 *
 * @param material - the material (one of the exported sets, or one of your own)
 * @param temperature - temperature [K], > 0
 * @returns resistivity [Ω·m], positive and finite
 * @throws {@link InputError} on a bad material or temperature
 * @see IEC 60028:1925 (copper), IEC 60889:1987 (hard-drawn aluminium) for the linear form.
 * @example
 * ```ts
 * import { resistivityAt, copper, celsius } from "fluxwright";
 * console.log(resistivityAt(copper, celsius(100))); // ≈ 2.2662e-8
 * ```
 * @category Materials
 */
export function resistivityAt(material: ConductiveMaterial, temperature: number): number {
  requireObject("resistivityAt", "material", material);
  requirePositive("resistivityAt", "temperature", temperature, "K");
  checkResistivityModel("resistivityAt", material);
  const model = material.resistivity;
  if (model.kind === "table") return interpolateTemperatureTable(model.table, temperature);
  const range = material.temperatureRange;
  const t = temperature < range.min ? range.min : temperature > range.max ? range.max : temperature;
  return material.resistivity20 * (1 + material.temperatureCoefficient * (t - T20));
}
