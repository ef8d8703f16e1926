/**
 * The power curve of a heater study: the part's operating point against its temperature, from
 * the start temperature to the top of the material's range, sampled adaptively and solved by
 * continuation, with the bands of temperature where the inverter has no operating point.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { specificHeatAt } from "../materials/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { NoOscillationError, heaterOperatingPoint } from "./operating-point.js";
import type { CoilProperties, HeaterOperatingPoint } from "./operating-point.js";
import type { ResolvedHeaterDescription, ResolvedPart } from "./read-description.js";
import type { HeaterFieldModel } from "./field-model.js";
import type { HeaterUnsolvedBand } from "./study-heater-types.js";

/** The part's operating points against temperature, with the bands where none exists. */
export interface PowerCurve {
  /** Every sampled temperature, ascending [K]. */
  readonly temperatures: readonly number[];
  /** The solved operating points, ascending in temperature. */
  readonly points: readonly HeaterOperatingPoint[];
  /** The unsolved bands. */
  readonly bands: readonly HeaterUnsolvedBand[];
  /** The sampled span [K]. */
  readonly range: readonly [number, number];
  /** A quantity at a temperature: linear between neighbouring solved points, 0 in an unsolved band, held beyond the ends. */
  valueAt(temperature: number, of: (p: HeaterOperatingPoint) => number): number;
  /** The operating point at a temperature (continued from the nearest solved sample), `null` when none exists. */
  solveAt(temperature: number): HeaterOperatingPoint | null;
}

/** One sampled temperature: its operating point, or why there is none. */
interface CurveSample {
  readonly t: number;
  readonly p: HeaterOperatingPoint | null;
  readonly reason: string;
  readonly noOscillation: boolean;
}

/** Solves the operating point at a temperature, continued from a neighbouring point. */
type SampleSolver = (t: number, from: HeaterOperatingPoint | null) => CurveSample;

/** Extra refinement points of the power curve beyond the initial grid. */
const REFINEMENT_BUDGET = 32;

/**
 * Samples the part's operating point from the start temperature to the top of the material's
 * range (independent of the target): an initial grid with clusters at the Curie transition and
 * the specific-heat peak, solved in ascending order by continuation, then refined where the part
 * power or frequency changes by more than 2 % between neighbours and at the edges of any band
 * without an operating point (located to 0.5 K).
 */
export function powerCurve(
  d: ResolvedHeaterDescription,
  props: CoilProperties,
  operating: HeaterOperatingPoint,
  initialCount: number | undefined,
  enabled: boolean,
  fieldModel: HeaterFieldModel | null,
): PowerCurve {
  const part = d.part;
  const material = part.material;
  const start = part.startTemperature;
  const top = Math.max(part.targetTemperature, Math.min(material.temperatureRange.max, material.meltingTemperature - 50));
  const solve: SampleSolver = (t, from) => {
    if (t === start) return { t, p: operating, reason: "", noOscillation: false };
    try {
      return { t, p: seededOperatingPoint(d, t, true, props, from, fieldModel), reason: "", noOscillation: false };
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      return { t, p: null, reason: e.message, noOscillation: e instanceof NoOscillationError };
    }
  };
  const samples: CurveSample[] = [];
  if (enabled) {
    const curie = curieTemperatureOf(part);
    const width = material.permeability?.transitionWidth ?? 0;
    const count = initialCount ?? Math.min(16, Math.max(6, Math.ceil((top - start) / 100) + 2));
    const grid = new Set(temperatureGrid(start, top, count, curie, width));
    addSpecificHeatCluster(grid, material, start, top);
    // the field model: solve the anchors first (field solutions), then the rest between them
    const anchors = fieldModel === null ? [] : fieldAnchorTemperatures(start, top, part.targetTemperature, curie, width);
    for (const t of anchors) grid.add(t);
    samples.push(...solveGrid([...grid].sort((x, y) => x - y), anchors, operating, fieldModel, solve));
    refineCurve(samples, solve);
  }
  const points = samples.flatMap((x) => (x.p === null ? [] : [x.p]));
  return {
    temperatures: samples.map((x) => x.t),
    points,
    bands: unsolvedBands(samples, top),
    range: [start, top],
    valueAt: (t, of) => interpolatedValue(samples, operating, t, of),
    solveAt(t) {
      const exact = samples.find((x) => x.t === t);
      if (exact !== undefined) return exact.p;
      let from: HeaterOperatingPoint = operating;
      for (const p of points) if (Math.abs(p.partTemperature - t) < Math.abs(from.partTemperature - t)) from = p;
      return solve(t, from).p;
    },
  };
}

/** Adds a cluster of seven points 10 K apart at the specific-heat peak (e.g. the magnetic transition of steel). */
function addSpecificHeatCluster(grid: Set<number>, material: ConductiveMaterial, start: number, top: number): void {
  let peakT = start;
  let peakC = -Infinity;
  for (let i = 0; i <= 200; i++) {
    const t = start + ((top - start) * i) / 200;
    const c = specificHeatAt(material, t);
    if (c > peakC) {
      peakC = c;
      peakT = t;
    }
  }
  if (peakT > start && peakT < top) for (let k = -3; k <= 3; k++) grid.add(Math.min(top, Math.max(start, peakT + 10 * k)));
}

/**
 * Solves the grid (ascending) by continuation from the start point; with the field model the
 * anchors first (field solutions), then every point between them by interpolation.
 */
function solveGrid(
  grid: readonly number[],
  anchors: readonly number[],
  operating: HeaterOperatingPoint,
  fieldModel: HeaterFieldModel | null,
  solve: SampleSolver,
): CurveSample[] {
  const byTemperature = new Map<number, CurveSample>();
  let previous: HeaterOperatingPoint | null = operating;
  if (fieldModel !== null) {
    fieldModel.mode = "anchor";
    for (const t of anchors) {
      const sample = solve(t, previous);
      if (sample.p !== null) previous = sample.p;
      byTemperature.set(t, sample);
    }
    fieldModel.mode = "interpolate";
    previous = operating;
  }
  const samples: CurveSample[] = [];
  for (const t of grid) {
    const sample: CurveSample = byTemperature.get(t) ?? solve(t, previous);
    if (sample.p !== null) previous = sample.p;
    samples.push(sample);
  }
  return samples;
}

/**
 * Adaptive refinement, in place: halves the interval of highest priority, band edges first
 * (until located to 0.5 K), then the largest changes of power or frequency (above 3 %), within
 * {@link REFINEMENT_BUDGET} extra points.
 */
function refineCurve(samples: CurveSample[], solve: SampleSolver): void {
  const pMax = Math.max(...samples.map((x) => x.p?.losses.part ?? 0), 1e-300);
  for (let budget = REFINEMENT_BUDGET; budget > 0; budget--) {
    let best = -1;
    let bestPriority = 0;
    for (let i = 0; i + 1 < samples.length; i++) {
      const a = samples[i] as CurveSample;
      const b = samples[i + 1] as CurveSample;
      const span = b.t - a.t;
      let priority = 0;
      if ((a.p === null) !== (b.p === null)) priority = span > 0.5 ? 10 + span : 0;
      else if (a.p !== null && b.p !== null && span > 1) {
        const change = Math.max(Math.abs(b.p.losses.part - a.p.losses.part) / pMax, Math.abs(b.p.frequency - a.p.frequency) / a.p.frequency);
        priority = change > 0.03 ? change : 0;
      }
      if (priority > bestPriority) {
        bestPriority = priority;
        best = i;
      }
    }
    if (best < 0) break;
    const a = samples[best] as CurveSample;
    const b = samples[best + 1] as CurveSample;
    samples.splice(best + 1, 0, solve(0.5 * (a.t + b.t), a.p ?? b.p));
  }
}

/** The runs of unsolved samples as bands (a run reaching the last sample ends at `top`). */
function unsolvedBands(samples: readonly CurveSample[], top: number): HeaterUnsolvedBand[] {
  const bands: HeaterUnsolvedBand[] = [];
  for (let i = 0; i < samples.length; i++) {
    const x = samples[i] as CurveSample;
    if (x.p !== null) continue;
    let j = i;
    while (j + 1 < samples.length && (samples[j + 1] as CurveSample).p === null) j++;
    const last = samples[j] as CurveSample;
    bands.push({ from: x.t, to: j + 1 < samples.length ? last.t : top, noOscillation: samples.slice(i, j + 1).some((y) => y.noOscillation), reason: x.reason });
    i = j;
  }
  return bands;
}

/** A quantity at a temperature: linear between neighbouring solved samples, 0 in an unsolved band, held beyond the ends. */
function interpolatedValue(samples: readonly CurveSample[], operating: HeaterOperatingPoint, t: number, of: (p: HeaterOperatingPoint) => number): number {
  const n = samples.length;
  if (n === 0) return of(operating);
  const first = samples[0] as CurveSample;
  const last = samples[n - 1] as CurveSample;
  if (t <= first.t) return first.p === null ? 0 : of(first.p);
  if (t >= last.t) return last.p === null ? 0 : of(last.p);
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((samples[mid] as CurveSample).t <= t) lo = mid;
    else hi = mid;
  }
  const a = samples[lo] as CurveSample;
  const b = samples[hi] as CurveSample;
  if (a.p !== null && b.p !== null) {
    const u = (t - a.t) / (b.t - a.t);
    return of(a.p) * (1 - u) + of(b.p) * u;
  }
  // beside a band: hold the solved neighbour over the half of the (≤ 0.5 K) gap nearer to it
  const nearer = t - a.t <= b.t - t ? a : b;
  return nearer.p === null ? 0 : of(nearer.p);
}

/**
 * The operating point; with the field model at an anchor, started from the closed-form model's
 * point at the same temperature (its correction of the common surrogate is close to the field
 * model's, so the field is solved once at the converged point instead of at a first estimate).
 */
export function seededOperatingPoint(
  d: ResolvedHeaterDescription,
  t: number,
  withPart: boolean,
  props: CoilProperties,
  from: HeaterOperatingPoint | null,
  fieldModel: HeaterFieldModel | null,
): HeaterOperatingPoint {
  let start = from;
  if (fieldModel !== null && fieldModel.mode === "anchor") {
    try {
      start = heaterOperatingPoint(d, t, withPart, fieldModel.seedProperties, from);
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
    }
  }
  return heaterOperatingPoint(d, t, withPart, props, start);
}

/**
 * Anchor temperatures of the field model: five across the power curve's span, the target, and
 * four across the Curie transition of a magnetic part.
 */
function fieldAnchorTemperatures(start: number, top: number, target: number, curie: number | null, width: number): number[] {
  const set = new Set<number>();
  for (let i = 1; i <= 4; i++) set.add(start + ((top - start) * i) / 4);
  if (target > start && target < top) set.add(target);
  if (curie !== null && curie > start && curie < top) {
    for (const t of [curie - width - 40, curie - width / 2, curie, curie + 20]) if (t > start && t < top) set.add(t);
  }
  return [...set].sort((a, b) => a - b);
}

/** Temperatures from `start` to `end`, uniform, with extra points around the Curie transition. */
function temperatureGrid(start: number, end: number, count: number, curie: number | null, width: number): number[] {
  const set = new Set<number>();
  for (let i = 0; i < count; i++) set.add(start + ((end - start) * i) / (count - 1));
  if (curie !== null && curie > start && curie - width - 40 < end) {
    const lo = Math.max(start, curie - width - 40);
    const hi = Math.min(end, curie + 20);
    const extra = Math.max(6, Math.round(count / 2));
    for (let i = 0; i <= extra; i++) set.add(lo + ((hi - lo) * i) / extra);
    if (curie < end) {
      set.add(curie);
      set.add(Math.min(end, curie + 1e-6 * curie));
    }
  }
  return [...set].sort((a, b) => a - b);
}

/** The part's Curie temperature, `null` for a non-magnetic material. */
export function curieTemperatureOf(part: ResolvedPart): number | null {
  const material = part.material;
  return material.magnetic && material.curieTemperature !== undefined ? material.curieTemperature : null;
}
