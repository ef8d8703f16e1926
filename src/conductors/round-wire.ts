/**
 * Skin effect in an isolated round wire.
 *
 * @packageDocumentation
 */
import { InputError, requireArrayLike, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { wireSkinFactorKernel } from "./round-wire-kernels.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const AC_RATIO_FIELDS: readonly string[] = Object.freeze(["diameter", "frequency", "resistivity", "relativePermeability"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SWEEP_FIELDS: readonly string[] = Object.freeze(["diameter", "frequencies", "resistivity", "relativePermeability"]);

/** Options of {@link roundWireAcRatio}. @category Conductors */
export interface RoundWireAcRatioOptions {
  /** Diameter of the bare conductor [m], finite and > 0. */
  readonly diameter: number;
  /** Frequency of the sinusoidal current [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the conductor [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Relative permeability of the conductor [-], finite and > 0 (default 1). */
  readonly relativePermeability?: number;
}

/**
 * AC-to-DC resistance ratio of an isolated, straight round wire (return conductor far away),
 * exact through the Kelvin functions of order 0:
 *
 * $$
 * \frac{R_\mathrm{ac}}{R_\mathrm{dc}} = \frac{q}{2}\,
 * \frac{\mathrm{ber}\,q\;\mathrm{bei}'q - \mathrm{bei}\,q\;\mathrm{ber}'q}{(\mathrm{ber}'q)^2 + (\mathrm{bei}'q)^2},
 * \qquad q = \frac{d}{\sqrt{2}\,\delta} = \frac{r}{\delta}\sqrt{2},\quad
 * \delta = \sqrt{\frac{\rho}{\pi f \mu_0 \mu_r}}
 * $$
 *
 * Evaluated with the exponentially scaled Kelvin functions (the ratio is scale-free), so it
 * neither overflows nor loses accuracy for d ≫ δ; below q = 1e-3 the series
 * $1 + q^4/192$ and above q = 1e4 the asymptote $r/(2\delta) + 1/4 + 3\delta/(32 r)$ are used.
 *
 * Hard domain (throws {@link InputError}): every input finite and > 0. Validity: a straight
 * wire far from other conductors (no proximity effect), sinusoidal current, linear material.
 *
 * Accuracy: ≤ 1e-12 relative against mpmath (Kelvin functions at 40 digits) over
 * d/δ = 1e-3 … 1e4, and against an independent numerical solution of the radial diffusion
 * equation (fixture round-wire.json).
 *
 * @param options - {@link RoundWireAcRatioOptions}: diameter [m], frequency [Hz], resistivity [Ω·m], relative permeability [-]
 * @returns $R_\mathrm{ac}/R_\mathrm{dc}$ [-], ≥ 1
 * @throws {@link InputError} when an input is not finite or not > 0
 * @see S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication Electronics, 3rd ed. (1994), §5.5 (internal impedance of a round wire, ber/bei form).
 * @see NIST Digital Library of Mathematical Functions, §10.61 (Kelvin functions).
 * @example
 * ```ts
 * import { roundWireAcRatio } from "fluxwright";
 * // 2 mm copper wire at 20 kHz (d ≈ 4.3 δ)
 * console.log(roundWireAcRatio({ diameter: 2e-3, frequency: 20e3, resistivity: 1.7241e-8 })); // ≈ 1.327
 * ```
 * @category Conductors
 */
export function roundWireAcRatio(options: RoundWireAcRatioOptions): number {
  requireObject("roundWireAcRatio", "options", options);
  for (const key in options) {
    // constant-name comparisons: a few ns on this hot path
    if (key !== "diameter" && key !== "frequency" && key !== "resistivity" && key !== "relativePermeability") {
      requireKnownKeys("roundWireAcRatio", "", options, AC_RATIO_FIELDS);
    }
  }
  const diameter = requirePositive("roundWireAcRatio", "diameter", options.diameter, "m");
  const frequency = requirePositive("roundWireAcRatio", "frequency", options.frequency, "Hz");
  const resistivity = requirePositive("roundWireAcRatio", "resistivity", options.resistivity, "Ω·m");
  const mur =
    options.relativePermeability === undefined
      ? 1
      : requirePositive("roundWireAcRatio", "relativePermeability", options.relativePermeability, "");
  // q = d/(√2 δ) = d · sqrt(π f μ0 μr / (2 ρ))
  const q = diameter * Math.sqrt((Math.PI * frequency * MU_0 * mur) / (2 * resistivity));
  return wireSkinFactorKernel(q);
}

/** Options of {@link roundWireAcRatioSweep}. @category Conductors */
export interface RoundWireAcRatioSweepOptions {
  /** Diameter of the bare conductor [m], finite and > 0. */
  readonly diameter: number;
  /** Frequencies [Hz], each finite and > 0 (any array-like, e.g. a `Float64Array`). */
  readonly frequencies: ArrayLike<number>;
  /** Resistivity of the conductor [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Relative permeability of the conductor [-], finite and > 0 (default 1). */
  readonly relativePermeability?: number;
}

/**
 * {@link roundWireAcRatio} over many frequencies at once, written into a `Float64Array`
 * (allocated, or the `out` array you pass, which must be at least as long as `frequencies`).
 * Same formula, domain and accuracy as {@link roundWireAcRatio}.
 *
 * @param options - {@link RoundWireAcRatioSweepOptions}
 * @param out - optional output array (length ≥ frequencies.length)
 * @returns $R_\mathrm{ac}/R_\mathrm{dc}$ at each frequency [-]
 * @throws {@link InputError} on a bad diameter, resistivity, permeability or any bad frequency, or an `out` array that is too short
 * @see {@link roundWireAcRatio} for the sources.
 * @example
 * ```ts
 * import { roundWireAcRatioSweep } from "fluxwright";
 * const r = roundWireAcRatioSweep({ diameter: 2e-3, frequencies: [1e3, 20e3, 1e6], resistivity: 1.7241e-8 });
 * console.log(r[1]); // ≈ 1.327
 * ```
 * @category Conductors
 */
export function roundWireAcRatioSweep(options: RoundWireAcRatioSweepOptions, out?: Float64Array): Float64Array {
  const where = "roundWireAcRatioSweep";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SWEEP_FIELDS);
  const diameter = requirePositive(where, "diameter", options.diameter, "m");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const mur = options.relativePermeability === undefined ? 1 : requirePositive(where, "relativePermeability", options.relativePermeability, "");
  const frequencies = options.frequencies;
  const n = requireArrayLike(where, "frequencies", frequencies, "Hz").length;
  const result = out ?? new Float64Array(n);
  if (result.length < n) throw new InputError(where, "out", result, "", `a Float64Array of length ≥ ${n}`);
  const scale = diameter * Math.sqrt((Math.PI * MU_0 * mur) / (2 * resistivity));
  for (let i = 0; i < n; i++) {
    const f = requirePositive(where, `frequencies[${i}]`, frequencies[i], "Hz");
    result[i] = wireSkinFactorKernel(scale * Math.sqrt(f));
  }
  return result;
}
