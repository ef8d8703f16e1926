/**
 * Effective magnetic dimensions of simple cores (toroid, rod) and total core loss.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LOSS_POWER_FIELDS: readonly string[] = Object.freeze(["lossDensity", "effectiveVolume"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const ROD_FIELDS: readonly string[] = Object.freeze(["diameter", "length"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TOROID_FIELDS: readonly string[] = Object.freeze(["innerDiameter", "outerDiameter", "height"]);

/**
 * Effective dimensions of a core: the cross-section, path length and volume of the
 * equivalent uniform core (IEC 60205).
 *
 * @category Core loss
 */
export interface CoreGeometry {
  /** Effective cross-section $A_e$ [m²]. */
  readonly effectiveArea: number;
  /** Effective magnetic path length $l_e$ [m]. */
  readonly effectivePathLength: number;
  /** Effective volume $V_e = A_e l_e$ [m³]. */
  readonly effectiveVolume: number;
}

/**
 * Options of {@link toroidCoreGeometry}.
 *
 * @category Core loss
 */
export interface ToroidCoreOptions {
  /** Inner diameter [m], > 0. */
  readonly innerDiameter: number;
  /** Outer diameter [m], > inner diameter. */
  readonly outerDiameter: number;
  /** Height (axial length) [m], > 0. */
  readonly height: number;
}

/**
 * Effective dimensions of a toroid (ring core) with rectangular cross-section, by the core
 * constants of IEC 60205, $C_1 = \sum l/A$, $C_2 = \sum l/A^2$, integrated over the radius:
 * $$
 * l_e = \frac{2\pi \ln(r_2/r_1)}{1/r_1 - 1/r_2}, \qquad
 * A_e = \frac{h\, \ln^2(r_2/r_1)}{1/r_1 - 1/r_2}, \qquad V_e = A_e l_e
 * $$
 * As the ring thins, $l_e \to \pi (d_1 + d_2)/2$ and $A_e \to h (r_2 - r_1)$.
 *
 * Hard domain (throws {@link InputError}): diameters or height not finite and > 0; outer
 * diameter ≤ inner. Accuracy: exact for the ideal rectangular section (≤ 1e-14 relative;
 * uses `log1p` for thin rings); chamfers are ignored.
 *
 * @param options - inner and outer diameter [m], height [m]
 * @returns effective area [m²], path length [m], volume [m³]
 * @throws {@link InputError} on bad input
 * @see IEC 60205:2016, Calculation of the effective parameters of magnetic piece parts, ring cores.
 * @example
 * ```ts
 * import { toroidCoreGeometry } from "fluxwright";
 * const g = toroidCoreGeometry({ innerDiameter: 0.02, outerDiameter: 0.04, height: 0.01 });
 * console.log(g.effectivePathLength.toFixed(5), g.effectiveArea.toExponential(4)); // 0.08710 9.6091e-5
 * ```
 * @category Core loss
 */
export function toroidCoreGeometry(options: ToroidCoreOptions): CoreGeometry {
  const where = "toroidCoreGeometry";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TOROID_FIELDS);
  const d1 = requirePositive(where, "innerDiameter", options.innerDiameter, "m");
  const d2 = requirePositive(where, "outerDiameter", options.outerDiameter, "m");
  const h = requirePositive(where, "height", options.height, "m");
  if (!(d2 > d1)) throw new InputError(where, "outerDiameter", d2, "m", `a finite number > innerDiameter (${d1})`);
  const r1 = d1 / 2;
  const r2 = d2 / 2;
  const ln = Math.log1p((r2 - r1) / r1);
  const inv = (r2 - r1) / (r1 * r2);
  const effectivePathLength = (2 * Math.PI * ln) / inv;
  const effectiveArea = (h * ln * ln) / inv;
  return { effectiveArea, effectivePathLength, effectiveVolume: effectiveArea * effectivePathLength };
}

/**
 * Options of {@link rodCoreGeometry}.
 *
 * @category Core loss
 */
export interface RodCoreOptions {
  /** Rod diameter [m], > 0. */
  readonly diameter: number;
  /** Rod length [m], > 0. */
  readonly length: number;
}

/**
 * Dimensions of a cylindrical rod core (an open magnetic path, e.g. a ferrite rod or a
 * concentrator bar): $A_e = \pi d^2/4$, $l_e$ = the rod length, $V_e = A_e l_e$. The flux in a
 * rod is not uniform along it; use these for the loss volume with the mean flux density, and
 * account for the demagnetising field elsewhere.
 *
 * $$
 * A_e = \frac{\pi d^2}{4}, \qquad V_e = \frac{\pi d^2 l}{4}
 * $$
 *
 * Hard domain (throws {@link InputError}): diameter or length not finite and > 0.
 * Accuracy: exact (geometric).
 *
 * @param options - diameter [m], length [m]
 * @returns area [m²], path length [m], volume [m³]
 * @throws {@link InputError} on bad input
 * @see Common practice (geometry).
 * @example
 * ```ts
 * import { rodCoreGeometry } from "fluxwright";
 * console.log(rodCoreGeometry({ diameter: 0.01, length: 0.1 }).effectiveVolume); // ≈ 7.853982e-6
 * ```
 * @category Core loss
 */
export function rodCoreGeometry(options: RodCoreOptions): CoreGeometry {
  const where = "rodCoreGeometry";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, ROD_FIELDS);
  const d = requirePositive(where, "diameter", options.diameter, "m");
  const l = requirePositive(where, "length", options.length, "m");
  const area = (Math.PI * d * d) / 4;
  return { effectiveArea: area, effectivePathLength: l, effectiveVolume: area * l };
}

/**
 * Options of {@link coreLossPower}.
 *
 * @category Core loss
 */
export interface CoreLossPowerOptions {
  /** Loss density [W/m³], ≥ 0 (from {@link steinmetzLoss} or {@link igseLoss}). */
  readonly lossDensity: number;
  /** Effective core volume [m³], > 0. */
  readonly effectiveVolume: number;
}

/**
 * Total core loss from a loss density and the effective volume: $P = P_v V_e$.
 *
 * $$
 * P = P_v\, V_e
 * $$
 *
 * Hard domain (throws {@link InputError}): loss density < 0 or non-finite; volume not > 0.
 * Accuracy: exact.
 *
 * @param options - loss density [W/m³], effective volume [m³]
 * @returns loss [W]
 * @throws {@link InputError} on bad input
 * @see IEC 60205 (effective volume).
 * @example
 * ```ts
 * import { coreLossPower } from "fluxwright";
 * console.log(coreLossPower({ lossDensity: 200e3, effectiveVolume: 8e-6 })); // ≈ 1.6
 * ```
 * @category Core loss
 */
export function coreLossPower(options: CoreLossPowerOptions): number {
  const where = "coreLossPower";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, LOSS_POWER_FIELDS);
  const p = requireNonNegative(where, "lossDensity", options.lossDensity, "W/m³");
  const v = requirePositive(where, "effectiveVolume", options.effectiveVolume, "m³");
  return p * v;
}
