/**
 * Axis ticks of the charts: "nice" 1-2-5 linear ticks and decade (or 1-2-5) logarithmic ticks,
 * each with its SI-prefixed label.
 *
 * @packageDocumentation
 */
import { formatChartNumber } from "./chart-text.js";

/** A tick position and its label. */
export interface ChartTick {
  /** Position in data units. */
  readonly value: number;
  /** Text drawn beside it. */
  readonly label: string;
  /** `false` for a minor (unlabelled) log tick. */
  readonly major: boolean;
}

/**
 * "Nice" linear ticks (steps of 1, 2 or 5 × 10ⁿ) covering `[min, max]`; the range is widened
 * to the outer ticks when `extend` is set.
 */
export function linearTicks(min: number, max: number, unit = "", target = 6): { ticks: ChartTick[]; min: number; max: number } {
  let lo = min;
  let hi = max;
  // a span too small to tick (against the values' size, or below normal doubles) is padded
  const size = Math.max(Math.abs(lo), Math.abs(hi));
  if (!(hi - lo > size * 1e-9) || !(hi - lo > 1e-290)) {
    const pad = size < 1e-290 ? 1 : size * 0.1;
    lo -= pad;
    hi += pad;
  }
  const rough = (hi - lo) / Math.max(1, target - 1);
  const power = 10 ** Math.floor(Math.log10(rough));
  const fraction = rough / power;
  const step = (fraction <= 1.5 ? 1 : fraction <= 3 ? 2 : fraction <= 7 ? 5 : 10) * power;
  const first = Math.floor(lo / step + 1e-9) * step;
  const last = Math.ceil(hi / step - 1e-9) * step;
  const ticks: ChartTick[] = [];
  for (let i = 0; ; i++) {
    const v = first + i * step;
    if (v > last + step * 1e-6 || i > 100) break;
    const clean = Math.abs(v) < step * 1e-9 ? 0 : v;
    ticks.push({ value: clean, label: formatChartNumber(clean, unit, step), major: true });
  }
  return { ticks, min: first, max: last };
}

/**
 * Logarithmic ticks covering `[min, max]` (both > 0): every decade labelled, with 2 and 5
 * labelled too when the range spans fewer than three decades, and unlabelled minor ticks at
 * 2…9 × 10ⁿ. Across three decades or more the range widens to whole decades; below that it
 * keeps the data range when two labelled ticks fall inside it, else widens to 1-2-5 steps.
 */
export function logTicks(min: number, max: number, unit = ""): { ticks: ChartTick[]; min: number; max: number } {
  // clamp to where powers of ten are still normal doubles
  let lo = min > 0 && Number.isFinite(min) ? Math.max(min, 1e-300) : 1;
  let hi = max > 0 && Number.isFinite(max) ? Math.min(Math.max(max, 1e-300), 1e300) : lo * 10;
  lo = Math.min(lo, 1e299);
  if (!(hi > lo)) {
    lo /= 2;
    hi *= 2;
  }
  const decades = Math.log10(hi) - Math.log10(lo);
  const mantissas = decades < 3 ? [1, 2, 5] : [1];
  const steps = [1, 2, 5, 10];
  // widen to the nearest 1-2-5 mantissa (for short ranges) or whole decade
  const floorNice = (v: number): number => {
    const p = 10 ** Math.floor(Math.log10(v) + 1e-12);
    if (decades >= 3) return p;
    let best = p;
    for (const s of steps) if (s * p <= v * (1 + 1e-12)) best = s * p;
    return best;
  };
  const ceilNice = (v: number): number => {
    const p = 10 ** Math.floor(Math.log10(v) - 1e-12);
    if (decades >= 3) return p * 10;
    for (const s of steps) if (s * p >= v * (1 - 1e-12)) return s * p;
    return p * 10;
  };
  // below three decades keep the data range when at least two labelled ticks fall inside it
  const dataLo = lo;
  const dataHi = hi;
  lo = floorNice(lo);
  hi = ceilNice(hi);
  if (decades < 3) {
    let inside = 0;
    for (let d = Math.floor(Math.log10(dataLo)); d <= Math.ceil(Math.log10(dataHi)); d++) {
      for (const m of mantissas) {
        const v = m * 10 ** d;
        if (v >= dataLo * (1 - 1e-9) && v <= dataHi * (1 + 1e-9)) inside++;
      }
    }
    if (inside >= 2) {
      lo = dataLo;
      hi = dataHi;
    }
  }
  const firstDecade = Math.floor(Math.log10(lo) + 1e-12);
  const lastDecade = Math.ceil(Math.log10(hi) - 1e-12);
  const decadeStride = Math.max(1, Math.ceil((lastDecade - firstDecade) / 8));
  const ticks: ChartTick[] = [];
  for (let d = firstDecade; d <= lastDecade; d++) {
    const p = 10 ** d;
    for (let m = 1; m <= 9; m++) {
      const v = m * p;
      if (v < lo * (1 - 1e-9) || v > hi * (1 + 1e-9)) continue;
      if (m !== 1 && decadeStride > 1) continue; // minor ticks only while decades are few
      const labelled = mantissas.includes(m) && (m !== 1 || (d - firstDecade) % decadeStride === 0);
      // rounding keeps 3e-6 from printing as 2.9999999999999997e-6
      const clean = Number(v.toPrecision(12));
      ticks.push({ value: clean, label: labelled ? formatChartNumber(clean, unit) : "", major: labelled });
    }
  }
  return { ticks, min: lo, max: hi };
}
