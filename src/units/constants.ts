/**
 * Physical constants, each with its source and edition. Derived values are computed.
 *
 * @packageDocumentation
 */

/**
 * Vacuum magnetic permeability μ₀ [H/m]: 1.25663706212 × 10⁻⁶ H/m.
 *
 * Since the 2019 SI redefinition μ₀ is measured, not exactly 4π × 10⁻⁷; this is the
 * CODATA 2018 recommended value (relative standard uncertainty 1.5 × 10⁻¹⁰).
 *
 * @see CODATA 2018 recommended values, E. Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021).
 * @example
 * ```ts
 * import { MU_0 } from "fluxwright";
 * console.log(MU_0); // 0.00000125663706212
 * ```
 * @category Constants
 */
export const MU_0 = 1.25663706212e-6;

/**
 * Speed of light in vacuum c [m/s]: 299 792 458 m/s, exact by the definition of the metre.
 *
 * @see CODATA 2018 (exact).
 * @example
 * ```ts
 * import { SPEED_OF_LIGHT } from "fluxwright";
 * console.log(SPEED_OF_LIGHT); // 299792458
 * ```
 * @category Constants
 */
export const SPEED_OF_LIGHT = 299792458;

/**
 * Vacuum electric permittivity ε₀ [F/m], computed as 1/(μ₀ c²) from CODATA 2018 μ₀ and the
 * exact c; it agrees with the CODATA 2018 value 8.8541878128 × 10⁻¹² F/m to its 11 digits.
 *
 * @see CODATA 2018 recommended values.
 * @example
 * ```ts
 * import { EPSILON_0 } from "fluxwright";
 * console.log(EPSILON_0.toPrecision(11)); // 8.8541878128e-12
 * ```
 * @category Constants
 */
export const EPSILON_0 = 1 / (MU_0 * SPEED_OF_LIGHT * SPEED_OF_LIGHT);

/**
 * Stefan–Boltzmann constant σ [W/(m²·K⁴)]: 5.670374419 × 10⁻⁸, exact in the 2019 SI
 * (computed there from h, c and k; CODATA 2018 lists it to these digits).
 *
 * @see CODATA 2018 recommended values.
 * @example
 * ```ts
 * import { STEFAN_BOLTZMANN } from "fluxwright";
 * console.log(STEFAN_BOLTZMANN); // 5.670374419e-8
 * ```
 * @category Constants
 */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/**
 * Resistivity of the International Annealed Copper Standard at 20 °C [Ω·m]:
 * 1/58 Ω·mm²/m = 1.7241…× 10⁻⁸ Ω·m (conductivity 58 MS/m, "100 % IACS"), with temperature
 * coefficient {@link ANNEALED_COPPER_TEMPERATURE_COEFFICIENT} at 20 °C.
 *
 * @see IEC 60028:1925, International standard of resistance for copper.
 * @example
 * ```ts
 * import { ANNEALED_COPPER_RESISTIVITY } from "fluxwright";
 * console.log(ANNEALED_COPPER_RESISTIVITY.toPrecision(5)); // 1.7241e-8
 * ```
 * @category Constants
 */
export const ANNEALED_COPPER_RESISTIVITY = 1 / 58e6;

/**
 * Temperature coefficient of resistance of the annealed copper standard at 20 °C [1/K]:
 * 0.00393 (ρ(T) = ρ₂₀ (1 + α (T − 20 °C))).
 *
 * @see IEC 60028:1925.
 * @example
 * ```ts
 * import { ANNEALED_COPPER_TEMPERATURE_COEFFICIENT } from "fluxwright";
 * console.log(ANNEALED_COPPER_TEMPERATURE_COEFFICIENT); // 0.00393
 * ```
 * @category Constants
 */
export const ANNEALED_COPPER_TEMPERATURE_COEFFICIENT = 0.00393;

/**
 * 0 °C in kelvin: 273.15 K, exact by definition of the Celsius scale.
 *
 * @see SI Brochure, 9th edition (2019), §2.3.1.
 * @example
 * ```ts
 * import { ZERO_CELSIUS } from "fluxwright";
 * console.log(ZERO_CELSIUS); // 273.15
 * ```
 * @category Constants
 */
export const ZERO_CELSIUS = 273.15;
