/**
 * The kQ limit of an inductive link: the highest efficiency two coupled resonant coils can
 * reach, and the load resistance that reaches it.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requirePositive } from "../core/index.js";

/**
 * Options of {@link maximumLinkEfficiency}.
 *
 * @category Inductive links
 */
export interface MaximumLinkEfficiencyOptions {
  /** Coupling coefficient k, 0 < k < 1. */
  readonly couplingCoefficient: number;
  /** Primary coil quality factor Q₁ = ωL₁/R₁, > 0. */
  readonly primaryQuality: number;
  /** Secondary coil quality factor Q₂ = ωL₂/R₂, > 0. */
  readonly secondaryQuality: number;
}

function checkKq(where: string, options: MaximumLinkEfficiencyOptions, extra: readonly string[]): number {
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, ["couplingCoefficient", "primaryQuality", "secondaryQuality", ...extra]);
  const k = requirePositive(where, "couplingCoefficient", options.couplingCoefficient, "");
  if (!(k < 1)) requirePositive(where, "couplingCoefficient", NaN, "");
  const q1 = requirePositive(where, "primaryQuality", options.primaryQuality, "");
  const q2 = requirePositive(where, "secondaryQuality", options.secondaryQuality, "");
  return k * k * q1 * q2;
}

/**
 * The largest efficiency of an inductive link of two resonant coils with coupling k and
 * quality factors Q₁, Q₂ (the kQ limit), reached with the secondary resonant and the load at
 * {@link optimalLoadResistance}:
 *
 * $$ \eta_\mathrm{max} = \frac{k^2Q_1Q_2}{\left(1 + \sqrt{1 + k^2Q_1Q_2}\right)^2} $$
 *
 * It holds for every compensation of the primary (the primary network only sets the input
 * impedance, not the coil losses for a given secondary current).
 *
 * @param options - {@link MaximumLinkEfficiencyOptions}: couplingCoefficient, primaryQuality, secondaryQuality
 * @returns the efficiency limit, in (0, 1)
 * @throws {@link InputError} when k is not in (0, 1), a quality factor is not > 0, or on an unknown option key
 * @remarks Exact for the lumped circuit (coil losses only); ≤ 1e-12 relative vs the efficiency
 * of a full phasor solve ({@link inductiveLink}, series–series) at the optimal load (tested).
 * @see M. Zargham and P. G. Gulak, "Maximum achievable efficiency in near-field coupled
 *   power-transfer systems", IEEE Trans. Biomed. Circuits Syst. 6(3), 228–245 (2012), eq. for
 *   η_max in terms of k²Q₁Q₂ (from memory, no equation number).
 * @example
 * ```ts
 * import { maximumLinkEfficiency } from "fluxwright";
 * console.log(maximumLinkEfficiency({ couplingCoefficient: 0.2, primaryQuality: 200, secondaryQuality: 150 }).toFixed(4)); // 0.9439
 * ```
 * @category Inductive links
 */
export function maximumLinkEfficiency(options: MaximumLinkEfficiencyOptions): number {
  const x = checkKq("maximumLinkEfficiency", options, []);
  const s = 1 + Math.sqrt(1 + x);
  return x / (s * s);
}

/**
 * Options of {@link optimalLoadResistance}.
 *
 * @category Inductive links
 */
export interface OptimalLoadResistanceOptions extends MaximumLinkEfficiencyOptions {
  /** Secondary coil AC resistance R₂ [Ω], > 0. */
  readonly secondaryResistance: number;
}

/**
 * The load resistance, in series with the resonant secondary, at which an inductive link
 * reaches the kQ limit {@link maximumLinkEfficiency}:
 *
 * $$ R_{L,\mathrm{opt}} = R_2\sqrt{1 + k^2Q_1Q_2} $$
 *
 * (series-compensated secondary; a parallel-compensated secondary needs the parallel
 * equivalent $R_{L,p} = (\omega L_2)^2/R_{L,\mathrm{opt}}$ for high Q₂).
 *
 * @param options - {@link OptimalLoadResistanceOptions}: k, Q₁, Q₂ and R₂ [Ω]
 * @returns the optimal series load resistance [Ω]
 * @throws {@link InputError} as {@link maximumLinkEfficiency}, or when R₂ is not > 0
 * @remarks Exact for the lumped circuit; checked by maximising the efficiency of an independent
 * phasor solve over the load (tested, 1e-6 relative).
 * @see M. Zargham and P. G. Gulak, IEEE Trans. Biomed. Circuits Syst. 6(3), 228–245 (2012) (from memory).
 * @example
 * ```ts
 * import { optimalLoadResistance } from "fluxwright";
 * console.log(optimalLoadResistance({ couplingCoefficient: 0.2, primaryQuality: 200, secondaryQuality: 150, secondaryResistance: 0.05 }).toFixed(4)); // 1.7328
 * ```
 * @category Inductive links
 */
export function optimalLoadResistance(options: OptimalLoadResistanceOptions): number {
  const x = checkKq("optimalLoadResistance", options, ["secondaryResistance"]);
  const r2 = requirePositive("optimalLoadResistance", "secondaryResistance", options.secondaryResistance, "Ω");
  return r2 * Math.sqrt(1 + x);
}
