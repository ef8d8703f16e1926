/**
 * The dense output kept by {@link solveOde} with `dense: true`: the order-4 continuous extension
 * of every accepted step, evaluated at any time of the run.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";

/** One accepted step: its start, signed size and the 5·n coefficients r1…r5. */
export interface DenseStep {
  readonly t: number;
  readonly h: number;
  readonly c: Float64Array;
}

/** The function {@link OdeResult.sample} of a run from `t0` to `end` over `steps`. */
export function denseSampler(steps: readonly DenseStep[], n: number, t0: number, end: number, direction: number, finalState: Float64Array): (time: number) => Float64Array {
  const final = Float64Array.from(finalState);
  return (time: number): Float64Array => {
    if (typeof time !== "number" || !Number.isFinite(time) || (time - t0) * direction < 0 || (time - end) * direction > 0) {
      throw new InputError("OdeResult.sample", "time", time, "", `a finite number between ${t0} and ${end}`);
    }
    const out = new Float64Array(n);
    if (steps.length === 0) {
      out.set(final);
      return out;
    }
    // Binary search for the step containing `time`.
    let lo = 0;
    let hi = steps.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if ((time - steps[mid]!.t) * direction >= 0) lo = mid;
      else hi = mid - 1;
    }
    const s = steps[lo]!;
    const theta = (time - s.t) / s.h;
    const omt = 1 - theta;
    const c = s.c;
    for (let i = 0; i < n; i++) {
      out[i] =
        c[i]! + theta * (c[n + i]! + omt * (c[2 * n + i]! + theta * (c[3 * n + i]! + omt * c[4 * n + i]!)));
    }
    return out;
  };
}
