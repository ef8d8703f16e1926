/**
 * Piecewise-linear reading of a temperature table (internal helper, not exported publicly).
 *
 * @packageDocumentation
 */
import { ZERO_CELSIUS } from "../units/index.js";
import type { TemperatureTable } from "./types.js";

/**
 * Reads a table at temperature `t` by linear interpolation between the two neighbouring
 * entries; holds the end values outside the table. Allocates nothing.
 *
 * @param table - strictly increasing temperatures with their values
 * @param t - temperature [K]
 * @returns the interpolated value
 */
export function interpolateTemperatureTable(table: TemperatureTable, t: number): number {
  const xs = table.temperatures;
  const ys = table.values;
  const n = xs.length;
  const x0 = xs[0] as number;
  if (t <= x0) return ys[0] as number;
  const xn = xs[n - 1] as number;
  if (t >= xn) return ys[n - 1] as number;
  let i = 1;
  while ((xs[i] as number) < t) i++;
  const xa = xs[i - 1] as number;
  const xb = xs[i] as number;
  const ya = ys[i - 1] as number;
  const yb = ys[i] as number;
  return ya + ((yb - ya) * (t - xa)) / (xb - xa);
}

/**
 * Builds a frozen table from temperatures in °C and values (a convenience for the data files).
 *
 * @param celsiusTemperatures - temperatures [°C], strictly increasing
 * @param values - the property at each temperature
 * @param divisor - every value is divided by it (e.g. 1e6 for µΩ·m → Ω·m)
 * @param source - where the numbers come from
 * @returns a frozen {@link TemperatureTable} in kelvin
 */
export function tableFromCelsius(
  celsiusTemperatures: readonly number[],
  values: readonly number[],
  divisor: number,
  source: string,
): TemperatureTable {
  return Object.freeze({
    temperatures: Object.freeze(celsiusTemperatures.map((c) => c + ZERO_CELSIUS)),
    values: Object.freeze(values.map((v) => v / divisor)),
    source,
  });
}
