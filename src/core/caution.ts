/**
 * Cautions and validity notes: the data records that result objects carry when a number
 * crosses a hazard threshold or a model leaves its range of validity.
 *
 * @packageDocumentation
 */

/**
 * How serious a caution is: `"info"` (worth knowing), `"warning"` (check the design),
 * `"danger"` (can injure or kill; do not build without qualified review).
 *
 * @category Cautions
 */
export type CautionSeverity = "info" | "warning" | "danger";

/**
 * A hazard found in a result, as data so that apps can render it their own way.
 * Every caution's `message` ends by deferring to local codes and licensed practice.
 *
 * @category Cautions
 */
export interface Caution {
  /** A stable machine-readable code of fluxwright's own, e.g. `"voltage-above-extra-low"`. */
  readonly code: string;
  /** How serious it is. */
  readonly severity: CautionSeverity;
  /** One or two plain sentences for a person. */
  readonly message: string;
  /** The value that crossed the limit, in SI units (`unit`). */
  readonly value: number;
  /** The limit it crossed, in the same unit. */
  readonly limit: number;
  /** The SI unit symbol of `value` and `limit`. */
  readonly unit: string;
  /** Where the limit comes from (standard, guideline, or "common practice"). */
  readonly source: string;
}

/**
 * A note that a model was used outside (or near the edge of) its range of validity.
 * Leaving a model's range is not an error: the result is still computed and carries this.
 *
 * @category Cautions
 */
export interface ValidityNote {
  /** A stable machine-readable code of fluxwright's own, e.g. `"short-coil"`. */
  readonly code: string;
  /** What was assumed and why the result may be off. */
  readonly message: string;
  /** The quantity that left the range, when there is one. */
  readonly value?: number;
  /** The edge of the range it crossed. */
  readonly limit?: number;
}

/**
 * The sentence that ends every caution message.
 *
 * @category Cautions
 */
export const DEFER_TO_CODES = "Consult local codes and licensed practice.";

/** Rank of each severity, most serious first (internal: sorting cautions). */
const SEVERITY_RANK: Readonly<Record<CautionSeverity, number>> = Object.freeze({ danger: 0, warning: 1, info: 2 });

/**
 * Comparator that orders cautions danger before warning before info (stable within a
 * severity). The one severity ranking of the library; not part of the public API.
 */
export function bySeverity(a: Caution, b: Caution): number {
  return SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity];
}
