/**
 * Heat per unit mass to take a material from one temperature to another: the exact integral of
 * its specific heat model, the steel peak near the Curie point included.
 *
 * @packageDocumentation
 */
import { ZERO_CELSIUS } from "../units/index.js";
import { requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { checkSpecificHeatModel } from "./check-material.js";
import { specificHeatAt } from "./specific-heat.js";
import type { ConductiveMaterial } from "./types.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const INTERVAL_FIELDS: readonly string[] = Object.freeze(["fromTemperature", "toTemperature"]);

/**
 * The temperatures between which {@link specificEnthalpyChange} integrates.
 *
 * @category Materials
 */
export interface EnthalpyChangeInterval {
  /** Start temperature [K], > 0. */
  readonly fromTemperature: number;
  /** End temperature [K], > 0 (below `fromTemperature` gives a negative result). */
  readonly toTemperature: number;
}

/** Antiderivative of the EN 1993-1-2 carbon-steel specific heat, θ in °C, on the branch that holds at `branchTheta`. */
function en1993Antiderivative(theta: number, branchTheta: number): number {
  if (branchTheta < 600) return 425 * theta + (0.773 / 2) * theta ** 2 - (1.69e-3 / 3) * theta ** 3 + (2.22e-6 / 4) * theta ** 4;
  if (branchTheta < 735) return 666 * theta - 13002 * Math.log(738 - theta);
  if (branchTheta < 900) return 545 * theta + 17820 * Math.log(theta - 731);
  return 650 * theta;
}

/**
 * Specific enthalpy change of a material between two temperatures, the exact integral of
 * {@link specificHeatAt}:
 * $$
 * \Delta h = \int_{T_1}^{T_2} c(T)\, dT
 * $$
 * Tabulated specific heat is integrated piece by piece (trapezoids between table points, exact
 * for the linear interpolation); the EN 1993-1-2 carbon-steel form is integrated in closed
 * form branch by branch, so the latent-like peak at 735 °C is captured exactly (about
 * 101 kJ/kg above a flat 650 J/(kg·K) between 600 °C and 900 °C). Outside the material's
 * `temperatureRange` the held end value is integrated, as {@link specificHeatAt} returns it.
 *
 * Hard domain (throws {@link InputError}): `material` or `interval` not an object; either
 * temperature not a finite number > 0. Validity: the material's `temperatureRange`.
 * Accuracy: ≤ 1e-12 relative to the integral of the model (tests: closed form and mpmath
 * quadrature of EN 1993-1-2 eq. (3.2)); the data's own accuracy as stated in the material.
 *
 * @param material - the material
 * @param interval - start and end temperature [K]
 * @returns specific enthalpy change [J/kg] (negative when cooling)
 * @throws {@link InputError} on bad input
 * @see EN 1993-1-2:2005, §3.4.1.2, eq. (3.2) (carbon steel).
 * @example
 * ```ts
 * import { specificEnthalpyChange, lowCarbonSteel, celsius } from "fluxwright";
 * const dh = specificEnthalpyChange(lowCarbonSteel, { fromTemperature: celsius(20), toTemperature: celsius(200) });
 * console.log(dh); // ≈ 88191.15
 * ```
 * @category Materials
 */
export function specificEnthalpyChange(material: ConductiveMaterial, interval: EnthalpyChangeInterval): number {
  const where = "specificEnthalpyChange";
  requireObject(where, "material", material);
  requireObject(where, "interval", interval);
  requireKnownKeys(where, "interval", interval, INTERVAL_FIELDS);
  const t1 = requirePositive(where, "interval.fromTemperature", interval.fromTemperature, "K");
  const t2 = requirePositive(where, "interval.toTemperature", interval.toTemperature, "K");
  checkSpecificHeatModel(where, material);
  if (t1 === t2) return 0;
  const lo = t1 < t2 ? t1 : t2;
  const hi = t1 < t2 ? t2 : t1;
  const { min, max } = material.temperatureRange;
  const model = material.specificHeat;
  const breaks: number[] = [lo, hi, min, max];
  if (model.kind === "table") breaks.push(...model.table.temperatures);
  else for (const c of [20, 600, 735, 900]) breaks.push(c + ZERO_CELSIUS);
  const points = breaks.filter((t) => t >= lo && t <= hi).sort((a, b) => a - b);
  let sum = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1] as number;
    const b = points[i] as number;
    if (!(b > a)) continue;
    if (model.kind === "table" || b <= min || a >= max) {
      // linear (or constant) between breakpoints: the trapezoid is exact
      sum += 0.5 * (specificHeatAt(material, a) + specificHeatAt(material, b)) * (b - a);
    } else {
      const mid = 0.5 * (a + b) - ZERO_CELSIUS;
      const thetaA = a - ZERO_CELSIUS;
      const thetaB = b - ZERO_CELSIUS;
      if (mid < 20) sum += specificHeatAt(material, a) * (b - a);
      else sum += en1993Antiderivative(thetaB, mid) - en1993Antiderivative(thetaA, mid);
    }
  }
  return t2 > t1 ? sum : -sum;
}
