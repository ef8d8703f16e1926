/**
 * The layer stack of a two-winding transformer and its magnetomotive-force (MMF) diagram in
 * the one-dimensional model: shared, unchecked kernels of this module.
 *
 * @packageDocumentation
 * @internal
 */
import { InputError, requireArrayLike, requireInteger, requireNonNegative, requireObject } from "../core/index.js";

/**
 * Fills `start` and `end` with the MMF at the two faces of every layer, per ampere-turn of the
 * primary (N₀I₀ = 1). Layer i belongs to winding `winding[i]` (0 or 1) and carries the share
 * `share[i]` of its winding's ampere-turns; the primary's layers add, the secondary's subtract,
 * so the diagram starts and ends at zero when each winding's shares sum to one.
 *
 * @internal
 */
export function mmfFaces(winding: ArrayLike<number>, share: ArrayLike<number>, start: Float64Array, end: Float64Array): void {
  let f = 0;
  for (let i = 0; i < winding.length; i++) {
    start[i] = f;
    f += winding[i] === 0 ? (share[i] ?? 0) : -(share[i] ?? 0);
    end[i] = f;
  }
}

/**
 * ∫ f(x)² dx across the stack for the per-unit MMF f of {@link mmfFaces}: linear inside each
 * layer, constant in each spacer. The leakage inductance is μ₀ N₀² ℓ_T / b times this.
 *
 * @internal
 */
export function mmfSquareIntegral(
  thickness: ArrayLike<number>,
  spacers: ArrayLike<number>,
  start: Float64Array,
  end: Float64Array,
): number {
  let sum = 0;
  const n = thickness.length;
  for (let i = 0; i < n; i++) {
    const a = start[i] ?? 0;
    const c = end[i] ?? 0;
    sum += ((thickness[i] ?? 0) * (a * a + a * c + c * c)) / 3;
    if (i < n - 1) sum += (spacers[i] ?? 0) * c * c;
  }
  return sum;
}

/** A checked layer list: winding index per layer, and the layer count of each winding. @internal */
export interface CheckedLayerWindings {
  winding: Uint8Array;
  layerCount: [number, number];
}

/**
 * Checks `layers[i].winding` (0 or 1) for every layer and that both windings are present.
 *
 * @internal
 */
export function checkLayerWindings(where: string, layers: unknown): { list: readonly Record<string, unknown>[] } & CheckedLayerWindings {
  const list = requireArrayLike(where, "layers", layers, "", 2);
  const winding = new Uint8Array(list.length);
  const layerCount: [number, number] = [0, 0];
  const out: Record<string, unknown>[] = [];
  for (let i = 0; i < list.length; i++) {
    const layer = requireObject(where, `layers[${i}]`, list[i]);
    const w = requireInteger(where, `layers[${i}].winding`, layer.winding, 0);
    if (w > 1) throw new InputError(where, `layers[${i}].winding`, w, "", "0 (primary) or 1 (secondary)");
    winding[i] = w;
    layerCount[w as 0 | 1]++;
    out.push(layer);
  }
  if (layerCount[0] === 0 || layerCount[1] === 0) {
    throw new InputError(where, "layers", list.length, "", "layers of both windings (winding 0 and winding 1)");
  }
  return { list: out, winding, layerCount };
}

/**
 * Checks `spacers`: one finite gap ≥ 0 [m] between each pair of consecutive layers.
 *
 * @internal
 */
export function checkSpacers(where: string, spacers: unknown, layerCount: number): Float64Array {
  const list = requireArrayLike(where, "spacers", spacers, "m");
  if (list.length !== layerCount - 1) {
    throw new InputError(where, "spacers", list.length, "", `one gap between each pair of consecutive layers: ${layerCount - 1} entries`);
  }
  const out = new Float64Array(list.length);
  for (let i = 0; i < list.length; i++) out[i] = requireNonNegative(where, `spacers[${i}]`, list[i], "m");
  return out;
}
