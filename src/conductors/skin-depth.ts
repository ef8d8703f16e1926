/**
 * Skin depth of a conductor carrying a sinusoidal current.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { MU_0 } from "../units/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SKIN_DEPTH_FIELDS: readonly string[] = Object.freeze(["resistivity", "frequency", "relativePermeability"]);

/** Options of {@link skinDepth}. @category Conductors */
export interface SkinDepthOptions {
  /** Resistivity of the conductor [Ω·m], finite and > 0 (annealed copper at 20 °C: 1.7241e-8). */
  readonly resistivity: number;
  /** Frequency of the sinusoidal current [Hz], finite and > 0. */
  readonly frequency: number;
  /** Relative permeability of the conductor [-], finite and > 0 (default 1, non-magnetic). */
  readonly relativePermeability?: number;
}

/**
 * Skin depth δ: the depth at which the current density of a plane conductor has fallen to
 * 1/e of its surface value.
 *
 * $$
 * \delta = \sqrt{\frac{\rho}{\pi f \mu_0 \mu_r}}
 * $$
 *
 * For annealed copper at 20 °C (IEC 60028, ρ = 1/58 Ω·mm²/m) this is
 * δ ≈ 66.1 mm / √(f/Hz).
 *
 * Hard domain (throws {@link InputError}): resistivity, frequency and relative permeability
 * must be finite and > 0. Validity: any frequency at which the conductor is a good conductor
 * (displacement current negligible, f ≪ 1/(2π ρ ε₀) ≈ 1e17 Hz for copper).
 *
 * Accuracy: exact formula; the tests agree with published copper tables within their
 * rounding and to 1e-15 relative with the closed form.
 *
 * @param options - {@link SkinDepthOptions}: resistivity [Ω·m], frequency [Hz], relative permeability [-]
 * @returns the skin depth [m]
 * @throws {@link InputError} when an input is not finite or not > 0
 * @see S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication Electronics, 3rd ed. (1994), ch. 5, skin effect in a plane conductor.
 * @example
 * ```ts
 * import { skinDepth } from "fluxwright";
 * // annealed copper at 20 °C, 20 kHz
 * console.log(skinDepth({ resistivity: 1.7241e-8, frequency: 20e3 })); // ≈ 4.673e-4
 * ```
 * @category Conductors
 */
export function skinDepth(options: SkinDepthOptions): number {
  requireObject("skinDepth", "options", options);
  requireKnownKeys("skinDepth", "", options, SKIN_DEPTH_FIELDS);
  const resistivity = requirePositive("skinDepth", "resistivity", options.resistivity, "Ω·m");
  const frequency = requirePositive("skinDepth", "frequency", options.frequency, "Hz");
  const mur =
    options.relativePermeability === undefined
      ? 1
      : requirePositive("skinDepth", "relativePermeability", options.relativePermeability, "");
  return Math.sqrt(resistivity / (Math.PI * frequency * MU_0 * mur));
}
