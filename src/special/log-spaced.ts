/**
 * Log-spaced grids for sweeps and plots.
 *
 * @packageDocumentation
 */
import { InputError, MAX_ARRAY_LENGTH, requirePositive } from "../core/index.js";

/**
 * Log-spaced frequencies from `start` to `stop` inclusive, for sweeps and plots (also usable for
 * any positive quantity; the messages say Hz):
 * $f_k = f_\mathrm{start}(f_\mathrm{stop}/f_\mathrm{start})^{k/(n-1)}$.
 *
 * @param start - first frequency [Hz], > 0
 * @param stop - last frequency [Hz], > 0
 * @param count - number of points, integer from 2 to 10⁷ (cost and memory linear in it: 8 bytes a point)
 * @returns the frequencies [Hz]
 * @throws {@link InputError} when start or stop is not > 0 or count is not an integer ≥ 2
 * @example
 * ```ts
 * import { logSpacedFrequencies } from "fluxwright";
 * console.log(Array.from(logSpacedFrequencies(10, 1000, 3))); // [ 10, 100, 1000 ]
 * ```
 * @category Grids
 */
export function logSpacedFrequencies(start: number, stop: number, count: number): Float64Array {
  const where = "logSpacedFrequencies";
  const a = requirePositive(where, "start", start, "Hz");
  const b = requirePositive(where, "stop", stop, "Hz");
  if (typeof count !== "number" || !Number.isInteger(count) || count < 2 || count > MAX_ARRAY_LENGTH) {
    throw new InputError(where, "count", count, "", `an integer between 2 and ${MAX_ARRAY_LENGTH}`);
  }
  const out = new Float64Array(count);
  const ratio = b / a;
  for (let k = 0; k < count; k++) out[k] = a * Math.pow(ratio, k / (count - 1));
  out[0] = a;
  out[count - 1] = b;
  return out;
}
