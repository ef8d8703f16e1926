/**
 * Coil efficiency and the power delivered into the part from the reflected resistance.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const POWER_FIELDS: readonly string[] = Object.freeze(["coilCurrentRms", "reflectedResistance"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const EFFICIENCY_FIELDS: readonly string[] = Object.freeze(["coilResistance", "reflectedResistance"]);

/**
 * Options of {@link coilEfficiency}.
 *
 * @category Workpiece
 */
export interface CoilEfficiencyOptions {
  /** Resistance of the coil winding (and leads) at the working frequency [Ω], ≥ 0. */
  readonly coilResistance: number;
  /** Resistance reflected into the coil by the part [Ω], ≥ 0. */
  readonly reflectedResistance: number;
}

/**
 * Electrical efficiency of an induction coil: the share of the power entering the coil
 * terminals that ends up as heat in the part,
 *
 * $$
 * \eta = \frac{R_r}{R_r + R_c},
 * $$
 *
 * since the same coil current flows through the winding resistance $R_c$ and the reflected
 * resistance $R_r$. Losses in capacitors, leads and concentrators are not included.
 *
 * Hard domain (throws {@link InputError}): both resistances finite and ≥ 0, not both 0.
 * Accuracy: exact (one division).
 *
 * @param options - the two resistances, see {@link CoilEfficiencyOptions}
 * @returns efficiency [-], in [0, 1]
 * @throws {@link InputError} for negative or non-finite resistances, or both zero
 * @see E. J. Davies, *Conduction and Induction Heating* (1990) (coil efficiency);
 *   common practice.
 * @example
 * ```ts
 * import { coilEfficiency } from "fluxwright";
 * console.log(coilEfficiency({ coilResistance: 0.01, reflectedResistance: 0.03 })); // 0.75
 * ```
 * @category Workpiece
 */
export function coilEfficiency(options: CoilEfficiencyOptions): number {
  const where = "coilEfficiency";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, EFFICIENCY_FIELDS);
  const rc = requireNonNegative(where, "coilResistance", options.coilResistance, "Ω");
  const rr = requireNonNegative(where, "reflectedResistance", options.reflectedResistance, "Ω");
  if (rc + rr === 0) throw new InputError(where, "coilResistance", rc, "Ω", "> 0 when reflectedResistance is 0");
  return rr / (rr + rc);
}

/**
 * Options of {@link powerInPart}.
 *
 * @category Workpiece
 */
export interface PowerInPartOptions {
  /** RMS coil current [A], ≥ 0. */
  readonly coilCurrentRms: number;
  /** Resistance reflected into the coil by the part [Ω], ≥ 0. */
  readonly reflectedResistance: number;
}

/**
 * Power dissipated in the part by its eddy currents, $P = I_\mathrm{rms}^2 R_r$: the reflected
 * resistance seen at the coil terminals times the square of the RMS coil current.
 *
 * Hard domain (throws {@link InputError}): both inputs finite and ≥ 0.
 * Accuracy: exact.
 *
 * @param options - coil current and reflected resistance, see {@link PowerInPartOptions}
 * @returns power in the part [W]
 * @throws {@link InputError} for negative or non-finite inputs
 * @see E. J. Davies, *Conduction and Induction Heating* (1990); common practice.
 * @example
 * ```ts
 * import { powerInPart } from "fluxwright";
 * console.log(powerInPart({ coilCurrentRms: 200, reflectedResistance: 0.05 })); // 2000
 * ```
 * @category Workpiece
 */
export function powerInPart(options: PowerInPartOptions): number {
  const where = "powerInPart";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, POWER_FIELDS);
  const i = requireNonNegative(where, "coilCurrentRms", options.coilCurrentRms, "A");
  const r = requireNonNegative(where, "reflectedResistance", options.reflectedResistance, "Ω");
  return i * i * r;
}
