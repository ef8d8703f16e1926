/**
 * Example core-material sets. Their numbers are invented for examples and describe no real
 * material; use coefficients fitted to your own data for design work.
 *
 * @packageDocumentation
 */
import type { CoreMaterial } from "./types.js";

/**
 * An invented manganese–zinc-ferrite-like core material for examples only (not a real
 * material, not a product): $k = 2.5$, $\alpha = 1.45$, $\beta = 2.55$ (SI), i.e. about
 * 125 kW/m³ at 100 kHz and 0.1 T peak at the reference temperature 100 °C; temperature term
 * with its minimum at 90 °C; fitted ranges 20–300 kHz, 0.02–0.3 T, 20–120 °C;
 * relative permeability 2000, saturation 0.4 T.
 *
 * @see (invented example numbers)
 * @example
 * ```ts
 * import { inventedExampleFerrite } from "fluxwright";
 * console.log(inventedExampleFerrite.invented); // true
 * ```
 * @category Core materials
 */
export const inventedExampleFerrite: CoreMaterial = Object.freeze({
  name: "invented example ferrite (not a real material)",
  invented: true,
  steinmetz: Object.freeze({ k: 2.5, alpha: 1.45, beta: 2.55 }),
  frequencyRange: Object.freeze({ min: 20e3, max: 300e3 }),
  fluxDensityRange: Object.freeze({ min: 0.02, max: 0.3 }),
  temperatureRange: Object.freeze({ min: 293.15, max: 393.15 }),
  temperatureTerm: Object.freeze({ referenceTemperature: 373.15, linear: 2e-3, quadratic: 1e-4 }),
  relativePermeability: 2000,
  saturationFluxDensity: 0.4,
  source: "invented for examples",
});

/**
 * An invented iron-powder-like core material for examples only (not a real material, not a
 * product): $k = 40$, $\alpha = 1.1$, $\beta = 2.1$ (SI), about 160 kW/m³ at 50 kHz and
 * 0.1 T; no temperature term; fitted ranges 1–200 kHz, 0.01–0.5 T, 20–120 °C; relative
 * permeability 75, saturation 1.2 T.
 *
 * @see (invented example numbers)
 * @example
 * ```ts
 * import { inventedExampleIronPowder } from "fluxwright";
 * console.log(inventedExampleIronPowder.steinmetz.beta); // 2.1
 * ```
 * @category Core materials
 */
export const inventedExampleIronPowder: CoreMaterial = Object.freeze({
  name: "invented example iron powder (not a real material)",
  invented: true,
  steinmetz: Object.freeze({ k: 40, alpha: 1.1, beta: 2.1 }),
  frequencyRange: Object.freeze({ min: 1e3, max: 200e3 }),
  fluxDensityRange: Object.freeze({ min: 0.01, max: 0.5 }),
  temperatureRange: Object.freeze({ min: 293.15, max: 393.15 }),
  relativePermeability: 75,
  saturationFluxDensity: 1.2,
  source: "invented for examples",
});
