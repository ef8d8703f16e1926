/**
 * Specific heat capacity of a conducting material at a temperature, including the peak of
 * carbon steel near its transformation and Curie temperatures.
 *
 * @packageDocumentation
 */
import { ZERO_CELSIUS } from "../units/index.js";
import { requireObject, requirePositive } from "../core/index.js";
import { checkSpecificHeatModel } from "./check-material.js";
import { interpolateTemperatureTable } from "./interpolate.js";
import type { ConductiveMaterial } from "./types.js";

/**
 * Specific heat of carbon steel by EN 1993-1-2:2005 §3.4.1.2 eq. (3.2), θ in °C, valid from
 * 20 °C to 1200 °C; held at 650 J/(kg·K) above 1200 °C and at its 20 °C value below.
 *
 * @param theta - temperature [°C]
 * @returns specific heat [J/(kg·K)]
 */
export function carbonSteelSpecificHeatEn1993(theta: number): number {
  const t = theta < 20 ? 20 : theta;
  if (t < 600) return 425 + 0.773 * t - 1.69e-3 * t * t + 2.22e-6 * t * t * t;
  if (t < 735) return 666 + 13002 / (738 - t);
  if (t < 900) return 545 + 17820 / (t - 731);
  return 650;
}

/**
 * Specific heat capacity (at constant pressure) of a material at a temperature.
 *
 * Tabulated materials are read by piecewise-linear interpolation. The carbon steels
 * ({@link lowCarbonSteel}, {@link mediumCarbonSteel}) use the closed form of
 * EN 1993-1-2 (θ in °C):
 * $$
 * c(\theta) = \begin{cases}
 * 425 + 0.773\,\theta - 1.69\times10^{-3}\,\theta^2 + 2.22\times10^{-6}\,\theta^3 & 20 \le \theta < 600 \\
 * 666 + 13002/(738 - \theta) & 600 \le \theta < 735 \\
 * 545 + 17820/(\theta - 731) & 735 \le \theta < 900 \\
 * 650 & 900 \le \theta \le 1200
 * \end{cases}
 * $$
 * whose sharp peak of 5000 J/(kg·K) at 735 °C lumps the heat absorbed by the
 * ferrite-to-austenite transformation and the magnetic (Curie) order–disorder anomaly that
 * follows it: heating a steel part through 700–800 °C costs noticeably more energy than a
 * smooth curve would say. Integrate this function over temperature to get the enthalpy rise.
 * Outside the material's `temperatureRange` the value at the nearer end is held.
 *
 * Hard domain (throws {@link InputError}): `material` not an object; `temperature` not a
 * finite number > 0. Validity: the material's `temperatureRange`. Accuracy: that of the
 * source data (EN 1993-1-2 is a design curve for structural carbon steels, typically within
 * 10 % away from the peak; the peak's height and position vary with composition and heating
 * rate).
 *
 * @param material - the material
 * @param temperature - temperature [K], > 0
 * @returns specific heat capacity [J/(kg·K)], positive and finite
 * @throws {@link InputError} on a bad material or temperature
 * @see EN 1993-1-2:2005, Eurocode 3: Design of steel structures, Part 1-2, §3.4.1.2, eq. (3.2).
 * @see F. P. Incropera, D. P. DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1 (tabulated metals).
 * @example
 * ```ts
 * import { specificHeatAt, lowCarbonSteel, celsius } from "fluxwright";
 * console.log(specificHeatAt(lowCarbonSteel, celsius(735))); // ≈ 5000
 * ```
 * @category Materials
 */
export function specificHeatAt(material: ConductiveMaterial, temperature: number): number {
  requireObject("specificHeatAt", "material", material);
  requirePositive("specificHeatAt", "temperature", temperature, "K");
  checkSpecificHeatModel("specificHeatAt", material);
  const range = material.temperatureRange;
  const t = temperature < range.min ? range.min : temperature > range.max ? range.max : temperature;
  const model = material.specificHeat;
  if (model.kind === "table") return interpolateTemperatureTable(model.table, t);
  return carbonSteelSpecificHeatEn1993(t - ZERO_CELSIUS);
}
