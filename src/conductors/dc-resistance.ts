/**
 * DC resistance of a round wire, from a resistivity or from a material at a temperature.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { resistivityAt } from "../materials/index.js";
import type { ConductiveMaterial } from "../materials/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const DC_AT_FIELDS: readonly string[] = Object.freeze(["material", "temperature", "length", "diameter"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const DC_FIELDS: readonly string[] = Object.freeze(["resistivity", "length", "diameter"]);

/** Options of {@link wireDcResistance}. @category Conductors */
export interface WireDcResistanceOptions {
  /** Resistivity of the conductor [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Length of the wire [m], finite and > 0. */
  readonly length: number;
  /** Diameter of the bare conductor [m], finite and > 0. */
  readonly diameter: number;
}

/**
 * DC resistance of a solid round wire.
 *
 * $$
 * R_\mathrm{dc} = \frac{4 \rho\, \ell}{\pi d^2}
 * $$
 *
 * Hard domain (throws {@link InputError}): every input finite and > 0. Validity: uniform
 * current density (DC or d ≪ δ; see {@link roundWireAcRatio} otherwise).
 * Accuracy: exact formula (tests: 1e-15 relative, and IEC 60228 class-1 copper within the
 * standard's rounding).
 *
 * @param options - {@link WireDcResistanceOptions}: resistivity [Ω·m], length [m], diameter [m]
 * @returns resistance [Ω]
 * @throws {@link InputError} when an input is not finite or not > 0
 * @see IEC 60028:1925 (resistivity of annealed copper); R = ρℓ/A, any physics text.
 * @example
 * ```ts
 * import { wireDcResistance } from "fluxwright";
 * // 10 m of 1 mm annealed copper at 20 °C
 * console.log(wireDcResistance({ resistivity: 1.7241e-8, length: 10, diameter: 1e-3 })); // ≈ 0.21952
 * ```
 * @category Conductors
 */
export function wireDcResistance(options: WireDcResistanceOptions): number {
  requireObject("wireDcResistance", "options", options);
  requireKnownKeys("wireDcResistance", "", options, DC_FIELDS);
  const resistivity = requirePositive("wireDcResistance", "resistivity", options.resistivity, "Ω·m");
  const length = requirePositive("wireDcResistance", "length", options.length, "m");
  const diameter = requirePositive("wireDcResistance", "diameter", options.diameter, "m");
  return requireFiniteResult("wireDcResistance", "resistivity, length and diameter", (4 * resistivity * length) / (Math.PI * diameter * diameter));
}

/** Options of {@link wireDcResistanceAt}. @category Conductors */
export interface WireDcResistanceAtOptions {
  /** The conductor material (e.g. `copper` from the materials module). */
  readonly material: ConductiveMaterial;
  /** Conductor temperature [K], finite and > 0. */
  readonly temperature: number;
  /** Length of the wire [m], finite and > 0. */
  readonly length: number;
  /** Diameter of the bare conductor [m], finite and > 0. */
  readonly diameter: number;
}

/**
 * DC resistance of a solid round wire of a given material at a given temperature: the
 * resistivity comes from {@link resistivityAt}, then
 * $R_\mathrm{dc} = 4 \rho(T)\, \ell / (\pi d^2)$ as in {@link wireDcResistance}.
 *
 * Hard domain (throws {@link InputError}): `material` not an object; temperature, length and
 * diameter not finite or not > 0. Validity: the material's documented temperature range
 * (outside it {@link resistivityAt} holds the end value). Accuracy: that of the material data
 * (the formula itself is exact; tests: 1e-15 relative against {@link wireDcResistance}).
 *
 * @param options - {@link WireDcResistanceAtOptions}: material, temperature [K], length [m], diameter [m]
 * @returns resistance [Ω]
 * @throws {@link InputError} on a bad material, temperature, length or diameter
 * @see IEC 60028:1925 (linear temperature coefficient of annealed copper).
 * @example
 * ```ts
 * import { wireDcResistanceAt, copper, celsius } from "fluxwright";
 * // 10 m of 1 mm copper at 100 °C
 * console.log(wireDcResistanceAt({ material: copper, temperature: celsius(100), length: 10, diameter: 1e-3 })); // ≈ 0.28854
 * ```
 * @category Conductors
 */
export function wireDcResistanceAt(options: WireDcResistanceAtOptions): number {
  requireObject("wireDcResistanceAt", "options", options);
  requireKnownKeys("wireDcResistanceAt", "", options, DC_AT_FIELDS);
  const material = requireObject("wireDcResistanceAt", "material", options.material) as unknown as ConductiveMaterial;
  const temperature = requirePositive("wireDcResistanceAt", "temperature", options.temperature, "K");
  const length = requirePositive("wireDcResistanceAt", "length", options.length, "m");
  const diameter = requirePositive("wireDcResistanceAt", "diameter", options.diameter, "m");
  const resistivity = resistivityAt(material, temperature);
  return requireFiniteResult("wireDcResistanceAt", "length and diameter", (4 * resistivity * length) / (Math.PI * diameter * diameter));
}
