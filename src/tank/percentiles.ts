/**
 * Order statistics of Monte Carlo samples by selection (internal helper of the tolerance analysis).
 *
 * @packageDocumentation
 */
import type { ToleranceStatistics } from "./tolerance-analysis.js";

/**
 * Rearranges a[lo..hi] so that a[k] holds the value it would have in sorted order, with no larger
 * value before it and no smaller value after it (Hoare's selection with median-of-three pivots).
 */
function select(a: Float64Array, lo: number, hi: number, k: number): void {
  while (hi > lo) {
    const mid = (lo + hi) >>> 1;
    // Median of three to a[mid].
    if ((a[mid] as number) < (a[lo] as number)) swap(a, mid, lo);
    if ((a[hi] as number) < (a[lo] as number)) swap(a, hi, lo);
    if ((a[hi] as number) < (a[mid] as number)) swap(a, hi, mid);
    const pivot = a[mid] as number;
    let i = lo;
    let j = hi;
    while (i <= j) {
      while ((a[i] as number) < pivot) i++;
      while ((a[j] as number) > pivot) j--;
      if (i <= j) {
        swap(a, i, j);
        i++;
        j--;
      }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return;
  }
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i] as number;
  a[i] = a[j] as number;
  a[j] = t;
}

function minOf(a: Float64Array, from: number, to: number): number {
  let m = Infinity;
  for (let i = from; i <= to; i++) if ((a[i] as number) < m) m = a[i] as number;
  return m;
}

/**
 * Mean, standard deviation, extremes and percentiles 1, 5, 50, 95, 99 of values[0..n) by the
 * type-7 rule (linear interpolation between the order statistics at p·(n − 1)), found by
 * selection rather than a full sort. Reorders `values` in place. Internal (not exported from the
 * module index).
 */
export function summariseSamples(values: Float64Array, n: number): ToleranceStatistics {
  const a = values.subarray(0, n);
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let k = 0; k < n; k++) {
    const v = a[k] as number;
    sum += v;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  const mean = sum / n;
  let ss = 0;
  for (let k = 0; k < n; k++) {
    const d = (a[k] as number) - mean;
    ss += d * d;
  }
  const levels = [0.01, 0.05, 0.5, 0.95, 0.99];
  const index = levels.map((p) => Math.floor(p * (n - 1)));
  // Select the median first, then the lower and upper levels inside their halves.
  const order = [2, 1, 0, 3, 4];
  const bounds: [number, number][] = [
    [0, n - 1],
    [0, (index[2] as number) - 1],
    [0, (index[1] as number) - 1],
    [(index[2] as number) + 1, n - 1],
    [(index[3] as number) + 1, n - 1],
  ];
  for (let q = 0; q < order.length; q++) {
    const [lo, hi] = bounds[q] as [number, number];
    const k = index[order[q] as number] as number;
    if (k >= lo && k <= hi) select(a, lo, hi, k);
  }
  // The next order statistic after index[i] is the smallest value between it and the next selected index.
  const nextLimit = [index[1] as number, index[2] as number, index[3] as number, index[4] as number, n - 1];
  const out = levels.map((p, i) => {
    const k = index[i] as number;
    const frac = p * (n - 1) - k;
    const v = a[k] as number;
    if (frac === 0 || k + 1 >= n) return v;
    const limit = Math.max(k + 1, nextLimit[i] as number);
    return v + frac * (minOf(a, k + 1, limit) - v);
  });
  return {
    mean,
    standardDeviation: n > 1 ? Math.sqrt(ss / (n - 1)) : 0,
    min,
    p1: out[0] as number,
    p5: out[1] as number,
    p50: out[2] as number,
    p95: out[3] as number,
    p99: out[4] as number,
    max,
  };
}

