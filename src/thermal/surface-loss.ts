/**
 * Internal helpers shared by the thermal models: the surface heat loss by convection and
 * radiation, and input checks. Not part of the public surface.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/index.js";
import { STEFAN_BOLTZMANN } from "../units/index.js";

/** Surface heat loss [W] of area `area` at `temperature` to surroundings at `ambient`. */
export function surfaceLoss(
  temperature: number,
  ambient: number,
  area: number,
  convectionCoefficient: number,
  emissivity: number,
): number {
  const t2 = temperature * temperature;
  const a2 = ambient * ambient;
  return area * (convectionCoefficient * (temperature - ambient) + emissivity * STEFAN_BOLTZMANN * (t2 * t2 - a2 * a2));
}

/**
 * Effective (linearised) surface heat-transfer coefficient [W/(m²·K)] between `temperature`
 * and `ambient`: $h + \varepsilon\sigma (T^2 + T_a^2)(T + T_a)$.
 */
export function effectiveCoefficient(
  temperature: number,
  ambient: number,
  convectionCoefficient: number,
  emissivity: number,
): number {
  return (
    convectionCoefficient +
    emissivity * STEFAN_BOLTZMANN * (temperature * temperature + ambient * ambient) * (temperature + ambient)
  );
}



/** A heat input: constant power [W] or a function of temperature [K] → power [W]. */
export function powerFunction(
  where: string,
  power: unknown,
  powerAt: unknown,
): (temperature: number) => number {
  if (power !== undefined && powerAt !== undefined) {
    throw new InputError(where, "power", power, "W", "given alone (not together with powerAt)");
  }
  if (powerAt !== undefined) {
    if (typeof powerAt !== "function") throw new InputError(where, "powerAt", powerAt, "", "a function of temperature [K] returning watts");
    const fn = powerAt as (temperature: number) => number;
    return (temperature: number): number => {
      const p = fn(temperature);
      if (typeof p !== "number" || !(p >= 0) || p === Infinity) {
        throw new InputError(where, `powerAt(${temperature})`, p, "W", "a finite number ≥ 0 (the heating power the part absorbs)");
      }
      return p;
    };
  }
  if (power === undefined) throw new InputError(where, "power", power, "W", "a finite number (or give powerAt)");
  const p = requireFinite(where, "power", power, "W");
  return (): number => p;
}

/** Checks the surface-exchange inputs shared by every thermal model. */
export function checkSurface(
  where: string,
  options: {
    readonly surfaceArea?: unknown;
    readonly convectionCoefficient?: unknown;
    readonly emissivity?: unknown;
    readonly ambientTemperature?: unknown;
  },
  needArea = true,
): { area: number; convection: number; emissivity: number; ambient: number } {
  const area = needArea ? requirePositive(where, "surfaceArea", options.surfaceArea, "m²") : 1;
  const convection = requireNonNegative(where, "convectionCoefficient", options.convectionCoefficient, "W/(m²·K)");
  const emissivity = requireInRange(where, "emissivity", options.emissivity, "", 0, 1);
  const ambient = requirePositive(where, "ambientTemperature", options.ambientTemperature, "K");
  return { area, convection, emissivity, ambient };
}
