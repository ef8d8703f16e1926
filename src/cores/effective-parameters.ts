/**
 * Effective magnetic parameters of a core from its sections, by the core constants of
 * IEC 60205.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const FIELDS: readonly string[] = Object.freeze(["sections"]);
/** Accepted fields of one section. */
const SECTION_FIELDS: readonly string[] = Object.freeze(["length", "area"]);

/** Most sections accepted (a core description, not a mesh). */
const MAX_SECTIONS = 10_000;

/**
 * One uniform section of a magnetic path, in series with the others.
 *
 * @category Cores
 */
export interface CoreSection {
  /** Length of the section along the flux [m], > 0. */
  readonly length: number;
  /** Cross-section of the section [m²], > 0. */
  readonly area: number;
}

/**
 * Options of {@link effectiveCoreParameters}.
 *
 * @category Cores
 */
export interface EffectiveCoreParametersOptions {
  /** The sections of the closed magnetic path, in series (1 … 10 000 of them). */
  readonly sections: readonly CoreSection[];
}

/**
 * Core constants and effective parameters of a core (IEC 60205).
 *
 * @category Cores
 */
export interface EffectiveCoreParameters {
  /** Core constant $C_1 = \sum l/A$ [1/m]. */
  readonly c1: number;
  /** Core constant $C_2 = \sum l/A^2$ [1/m³]. */
  readonly c2: number;
  /** Effective area $A_e = C_1/C_2$ [m²]. */
  readonly effectiveArea: number;
  /** Effective magnetic path length $l_e = C_1^2/C_2$ [m]. */
  readonly effectivePathLength: number;
  /** Effective volume $V_e = C_1^3/C_2^2 = A_e l_e$ [m³]. */
  readonly effectiveVolume: number;
}

/** Effective parameters from the two core constants (no checks). */
export function parametersFromConstants(c1: number, c2: number): EffectiveCoreParameters {
  const effectiveArea = c1 / c2;
  const effectivePathLength = (c1 * c1) / c2;
  return { c1, c2, effectiveArea, effectivePathLength, effectiveVolume: effectiveArea * effectivePathLength };
}

/**
 * The core constants and effective parameters of a magnetic path made of uniform sections in
 * series, by the method of IEC 60205: the uniform core with the same reluctance ($C_1$) and the
 * same field energy for a given flux ($C_2$).
 *
 * $$
 * C_1 = \sum_i \frac{l_i}{A_i}, \qquad C_2 = \sum_i \frac{l_i}{A_i^2}, \qquad
 * A_e = \frac{C_1}{C_2}, \qquad l_e = \frac{C_1^2}{C_2}, \qquad V_e = \frac{C_1^3}{C_2^2}
 * $$
 *
 * Hard domain (throws {@link InputError}): `sections` not an array of 1 … 10 000 objects; a
 * length or area not finite and > 0; unknown fields. Validity: the flux is taken uniform over
 * each section (the premise of the standard's method). Accuracy: exact arithmetic of the
 * definitions (≤ 1e-15 relative per section added).
 *
 * @param options - the sections, each `{ length [m], area [m²] }`
 * @returns $C_1$ [1/m], $C_2$ [1/m³], $A_e$ [m²], $l_e$ [m], $V_e$ [m³]
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, Calculation of the effective parameters of magnetic piece parts, clause 3 (definitions of $C_1$, $C_2$) and clause 4 (effective parameters).
 * @example
 * ```ts
 * import { effectiveCoreParameters } from "fluxwright";
 * const p = effectiveCoreParameters({ sections: [{ length: 0.04, area: 1e-4 }, { length: 0.02, area: 2e-4 }] });
 * console.log(p.c1); // 500
 * console.log(p.effectiveArea); // ≈ 0.000111111
 * ```
 * @category Cores
 */
export function effectiveCoreParameters(options: EffectiveCoreParametersOptions): EffectiveCoreParameters {
  const where = "effectiveCoreParameters";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FIELDS);
  const sections: unknown = options.sections;
  if (!Array.isArray(sections) || sections.length < 1 || sections.length > MAX_SECTIONS) {
    throw new InputError(where, "sections", sections, "", `an array of 1 … ${MAX_SECTIONS} sections { length, area }`);
  }
  let c1 = 0;
  let c2 = 0;
  for (let i = 0; i < sections.length; i++) {
    const s: unknown = sections[i];
    const path = `sections[${i}]`;
    requireObject(where, path, s);
    requireKnownKeys(where, path, s as object, SECTION_FIELDS);
    const section = s as CoreSection;
    const length = requirePositive(where, `${path}.length`, section.length, "m");
    const area = requirePositive(where, `${path}.area`, section.area, "m²");
    c1 += length / area;
    c2 += length / area / area;
  }
  return parametersFromConstants(c1, c2);
}
