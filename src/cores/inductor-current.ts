/**
 * The current of an inductor over one period for {@link inductorDesign}: reading a triangular
 * or sampled piecewise-linear waveform, and its average, RMS, extremes and harmonics.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireInRange, requireKnownKeys, requireNonNegative, requireObject, requireOneOf } from "../core/index.js";
import type { SampledCurrent, TriangularCurrent } from "./inductor-design-types.js";

const TRIANGULAR_FIELDS: readonly string[] = Object.freeze(["kind", "average", "ripple", "dutyCycle"]);
const SAMPLED_FIELDS: readonly string[] = Object.freeze(["kind", "time", "current"]);

/** Harmonics of the current given their own AC resistance factor (the rest share the last one's). */
export const HARMONICS = 40;
/** Most samples of a sampled current waveform. */
const MAX_SAMPLES = 10_000;

/** A closed piecewise-linear current: times from 0 to the period, current at each. */
export interface Waveform {
  time: Float64Array;
  current: Float64Array;
}

/** Average, RMS and extremes of a piecewise-linear current [A]. */
export interface CurrentSummary {
  average: number;
  rms: number;
  max: number;
  min: number;
}

/** Reads `options.current` into a closed waveform over one `period` [s]; throws InputError on a bad one. */
export function readCurrent(where: string, current: unknown, period: number): Waveform {
  requireObject(where, "current", current);
  const kind = requireOneOf(where, "current.kind", (current as { kind?: unknown }).kind, ["triangular", "samples"] as const);
  if (kind === "triangular") {
    requireKnownKeys(where, "current", current as object, TRIANGULAR_FIELDS);
    const c = current as TriangularCurrent;
    const average = requireFinite(where, "current.average", c.average, "A");
    const ripple = requireNonNegative(where, "current.ripple", c.ripple, "A");
    const d = requireInRange(where, "current.dutyCycle", c.dutyCycle, "", 0, 1, "()");
    return {
      time: Float64Array.of(0, d * period, period),
      current: Float64Array.of(average - ripple / 2, average + ripple / 2, average - ripple / 2),
    };
  }
  requireKnownKeys(where, "current", current as object, SAMPLED_FIELDS);
  const c = current as SampledCurrent;
  const t = c.time as unknown;
  const i = c.current as unknown;
  if (!Array.isArray(t) || t.length < 2 || t.length > MAX_SAMPLES) {
    throw new InputError(where, "current.time", t, "s", `an array of 2 … ${MAX_SAMPLES} times`);
  }
  if (!Array.isArray(i) || i.length !== t.length) {
    throw new InputError(where, "current.current", i, "A", `an array as long as current.time (${t.length})`);
  }
  const n = t.length;
  const time = new Float64Array(n);
  const cur = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    time[k] = requireFinite(where, `current.time[${k}]`, t[k], "s");
    cur[k] = requireFinite(where, `current.current[${k}]`, i[k], "A");
    if (k > 0 && !(time[k]! > time[k - 1]!)) throw new InputError(where, `current.time[${k}]`, t[k], "s", "greater than the time before it");
  }
  if (time[0] !== 0) throw new InputError(where, "current.time[0]", time[0], "s", "0");
  if (Math.abs(time[n - 1]! - period) > 1e-9 * period) {
    throw new InputError(where, `current.time[${n - 1}]`, time[n - 1], "s", `the period 1/frequency = ${period}`);
  }
  time[n - 1] = period;
  let big = 0;
  for (let k = 0; k < n; k++) big = Math.max(big, Math.abs(cur[k]!));
  if (Math.abs(cur[n - 1]! - cur[0]!) > 1e-9 * big) {
    throw new InputError(where, `current.current[${n - 1}]`, cur[n - 1], "A", `equal to current.current[0] (${cur[0]}): an inductor current is continuous`);
  }
  cur[n - 1] = cur[0]!;
  return { time, current: cur };
}

/** Average, RMS, extremes and harmonic RMS values (1 … HARMONICS) of a piecewise-linear current. */
export function currentSpectrum(w: Waveform, harmonicRms: Float64Array): CurrentSummary {
  const { time, current } = w;
  const n = time.length;
  const period = time[n - 1]!;
  let mean = 0;
  let square = 0;
  let max = -Infinity;
  let min = Infinity;
  for (let k = 0; k < n - 1; k++) {
    const dt = time[k + 1]! - time[k]!;
    const a = current[k]!;
    const b = current[k + 1]!;
    mean += ((a + b) / 2) * dt;
    square += ((a * a + a * b + b * b) / 3) * dt;
    max = Math.max(max, a);
    min = Math.min(min, a);
  }
  // Fourier coefficients from the jumps of the slope: c_n = −(1/(T ω_n²)) Σ Δs_k e^{−jω_n t_k}.
  for (let h = 1; h <= HARMONICS; h++) {
    const omega = (2 * Math.PI * h) / period;
    let re = 0;
    let im = 0;
    for (let k = 0; k < n - 1; k++) {
      const slope = (current[k + 1]! - current[k]!) / (time[k + 1]! - time[k]!);
      const kPrev = k === 0 ? n - 2 : k - 1;
      const slopePrev = (current[kPrev + 1]! - current[kPrev]!) / (time[kPrev + 1]! - time[kPrev]!);
      const jump = slope - slopePrev;
      re += jump * Math.cos(omega * time[k]!);
      im -= jump * Math.sin(omega * time[k]!);
    }
    const magnitude = Math.hypot(re, im) / (period * omega * omega);
    harmonicRms[h - 1] = Math.SQRT2 * magnitude;
  }
  return { average: mean / period, rms: Math.sqrt(square / period), max, min };
}
