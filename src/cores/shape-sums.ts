/**
 * The running sums of the core constants of a shape (IEC 60205 $C_1 = \sum l/A$,
 * $C_2 = \sum l/A^2$), the corner allowance, the effective parameters from the sums, and the
 * small checks the shapes share.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { EffectiveCoreParameters } from "./effective-parameters.js";
import type { CoreShape } from "./shapes.js";

/** Running sums of the core constants. */
export interface Sums {
  c1: number;
  c2: number;
}

/** Adds a limb of `length` [m] and section `area` [m²] to the sums. */
export function add(sums: Sums, length: number, area: number): void {
  sums.c1 += length / area;
  sums.c2 += length / (area * area);
}

/**
 * A 90° corner between a limb of width `w` and one of width `t` (IEC 60205's corner
 * allowance, recalled from memory): a quarter circle whose radius is the mean of the two
 * half-widths, area the mean of the two adjoining areas.
 */
export function corner(sums: Sums, w: number, t: number, areaW: number, areaT: number): void {
  add(sums, (Math.PI * (w + t)) / 8, (areaW + areaT) / 2);
}

/** The effective parameters from the sums, joined with the rest of the shape. */
export function finish(sums: Sums, rest: Omit<CoreShape, keyof EffectiveCoreParameters>): CoreShape {
  const effectiveArea = sums.c1 / sums.c2;
  const effectivePathLength = (sums.c1 * sums.c1) / sums.c2;
  return {
    c1: sums.c1,
    c2: sums.c2,
    effectiveArea,
    effectivePathLength,
    effectiveVolume: effectiveArea * effectivePathLength,
    ...rest,
  };
}

/** Outer surface of an a × b × c box [m²]. */
export function boxSurface(a: number, b: number, c: number): number {
  return 2 * (a * b + b * c + c * a);
}

/** Throws InputError unless `value` < `limit` (a dimension that must fit inside another). */
export function requireLess(where: string, name: string, value: number, limitName: string, limit: number): void {
  if (!(value < limit)) throw new InputError(where, name, value, "m", `a finite number < ${limitName} (${limit})`);
}
