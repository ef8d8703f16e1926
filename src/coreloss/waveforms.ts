/**
 * Builders of common flux-density waveforms: sinusoid, triangle (symmetric or with duty
 * cycle D) and trapezoid with zero-voltage intervals.
 *
 * @packageDocumentation
 */
import { InputError, MAX_ARRAY_LENGTH, requireFinite, requireInRange, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { FluxWaveform } from "./waveform-types.js";
import { givenName, renamedOption } from "../core/renamed.js";

/**
 * A core-loss options object (or data point) with the peak flux density under its former name
 * `peakFluxDensity` instead of `fluxDensityPeak`.
 *
 * @deprecated Give `fluxDensityPeak`; `peakFluxDensity` is accepted until 1.0.
 * @category Core loss
 */
export type WithPeakFluxDensity<T extends object> = Omit<T, "fluxDensityPeak"> & {
  /**
   * Peak flux density [T].
   *
   * @deprecated Use `fluxDensityPeak`.
   */
  readonly peakFluxDensity: number;
};

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TRAPEZOIDAL_FIELDS: readonly string[] = Object.freeze(["fluxDensityPeak", "frequency", "dutyCycle", "offset", "peakFluxDensity"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TRIANGULAR_FIELDS: readonly string[] = Object.freeze(["fluxDensityPeak", "frequency", "dutyCycle", "offset", "peakFluxDensity"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SINUSOIDAL_FIELDS: readonly string[] = Object.freeze(["fluxDensityPeak", "frequency", "samples", "offset", "peakFluxDensity"]);

/**
 * Options of {@link sinusoidalFluxWaveform}.
 *
 * @category Core loss
 */
export interface SinusoidalFluxOptions {
  /** Amplitude $\hat B$ [T], ≥ 0. */
  readonly fluxDensityPeak: number;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** Number of linear pieces per period, an integer ≥ 4 (default 256). */
  readonly samples?: number;
  /** DC offset of the flux density [T] (default 0). */
  readonly offset?: number;
}

/**
 * Samples a sinusoidal flux density $B(t) = B_0 + \hat B \sin(2\pi f t)$ at
 * `samples` + 1 equally spaced times over one period (the last equal to the first), for
 * {@link igseLoss}. With a multiple of 4 samples the peaks are sampled exactly.
 *
 * $$
 * t_i = \frac{i}{N f}, \qquad B_i = B_0 + \hat B \sin\frac{2\pi i}{N}, \quad i = 0 \ldots N
 * $$
 *
 * Hard domain (throws {@link InputError}): $\hat B$ < 0 or non-finite; f ≤ 0; `samples` not
 * an integer ≥ 4; offset non-finite. Accuracy: the points are exact to rounding; the iGSE of
 * the linear interpolation approaches the Steinmetz loss as $N^{-2}$ (about 3.4e-5 relative at
 * N = 256 for α ≈ 1.5).
 *
 * @param options - amplitude [T], frequency [Hz], samples, offset [T]
 * @returns the waveform (period [s], time [s], fluxDensity [T])
 * @throws {@link InputError} on bad input
 * @see Common practice.
 * @example
 * ```ts
 * import { sinusoidalFluxWaveform } from "fluxwright";
 * const w = sinusoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 50e3, samples: 8 });
 * console.log(w.time.length, w.period); // 9 0.00002
 * ```
 * @category Core loss
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name peakFluxDensity is accepted until 1.0
export function sinusoidalFluxWaveform(options: SinusoidalFluxOptions | WithPeakFluxDensity<SinusoidalFluxOptions>): FluxWaveform {
  const where = "sinusoidalFluxWaveform";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SINUSOIDAL_FIELDS);
  const peak = requireNonNegative(where, givenName(options, "fluxDensityPeak", "peakFluxDensity"), renamedOption(where, "", options, "fluxDensityPeak", "peakFluxDensity"), "T");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const samples = options.samples === undefined ? 256 : requireInteger(where, "samples", options.samples, 4);
  if (samples > MAX_ARRAY_LENGTH) throw new InputError(where, "samples", samples, "", `an integer between 4 and ${MAX_ARRAY_LENGTH}`);
  const offset = options.offset === undefined ? 0 : requireFinite(where, "offset", options.offset, "T");
  const period = 1 / f;
  const time = new Float64Array(samples + 1);
  const fluxDensity = new Float64Array(samples + 1);
  for (let i = 0; i <= samples; i++) {
    time[i] = i === samples ? period : (i * period) / samples;
    const q = (4 * i) % (4 * samples);
    // exact zeros and peaks at quarter periods
    let s: number;
    if (q === 0) s = 0;
    else if (q === samples) s = 1;
    else if (q === 2 * samples) s = 0;
    else if (q === 3 * samples) s = -1;
    else s = Math.sin((2 * Math.PI * i) / samples);
    fluxDensity[i] = offset + peak * s;
  }
  return { period, time, fluxDensity };
}

/**
 * Options of {@link triangularFluxWaveform}.
 *
 * @category Core loss
 */
export interface TriangularFluxOptions {
  /** Half the peak-to-peak swing $\hat B$ [T], ≥ 0. */
  readonly fluxDensityPeak: number;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** Fraction D of the period during which the flux rises, 0 < D < 1 (default 0.5: symmetric). */
  readonly dutyCycle?: number;
  /** DC offset [T] (default 0). */
  readonly offset?: number;
}

/**
 * A triangular flux density: rising from $B_0 - \hat B$ to $B_0 + \hat B$ during $DT$, falling
 * back during $(1 - D)T$ (the flux of a winding driven by a rectangular voltage with duty cycle
 * D and volt-second balance). Points at t = 0, DT, T.
 *
 * $$
 * B(t) = B_0 - \hat B + 2\hat B\, \frac{t}{DT}\ (0 \le t \le DT), \qquad
 * B(t) = B_0 + \hat B - 2\hat B\, \frac{t - DT}{(1-D)T}\ (DT \le t \le T)
 * $$
 *
 * Hard domain (throws {@link InputError}): $\hat B$ < 0; f ≤ 0; D outside (0, 1); offset
 * non-finite. Accuracy: exact (points only).
 *
 * @param options - amplitude [T], frequency [Hz], duty cycle, offset [T]
 * @returns the waveform (3 points)
 * @throws {@link InputError} on bad input
 * @see Common practice.
 * @example
 * ```ts
 * import { triangularFluxWaveform } from "fluxwright";
 * const w = triangularFluxWaveform({ fluxDensityPeak: 0.2, frequency: 20e3, dutyCycle: 0.25 });
 * console.log(Array.from(w.fluxDensity)); // [ -0.2, 0.2, -0.2 ]
 * ```
 * @category Core loss
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name peakFluxDensity is accepted until 1.0
export function triangularFluxWaveform(options: TriangularFluxOptions | WithPeakFluxDensity<TriangularFluxOptions>): FluxWaveform {
  const where = "triangularFluxWaveform";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TRIANGULAR_FIELDS);
  const peak = requireNonNegative(where, givenName(options, "fluxDensityPeak", "peakFluxDensity"), renamedOption(where, "", options, "fluxDensityPeak", "peakFluxDensity"), "T");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const d = options.dutyCycle === undefined ? 0.5 : requireInRange(where, "dutyCycle", options.dutyCycle, "", 0, 1, "()");
  const offset = options.offset === undefined ? 0 : requireFinite(where, "offset", options.offset, "T");
  const period = 1 / f;
  return {
    period,
    time: Float64Array.of(0, d * period, period),
    fluxDensity: Float64Array.of(offset - peak, offset + peak, offset - peak),
  };
}

/**
 * Options of {@link trapezoidalFluxWaveform}.
 *
 * @category Core loss
 */
export interface TrapezoidalFluxOptions {
  /** Half the peak-to-peak swing $\hat B$ [T], ≥ 0. */
  readonly fluxDensityPeak: number;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /**
   * Fraction D of each half period during which voltage is applied and the flux ramps,
   * 0 < D ≤ 1; the rest of each half period is a zero-voltage interval with constant flux.
   * D = 1 gives the symmetric triangle.
   */
  readonly dutyCycle: number;
  /** DC offset [T] (default 0). */
  readonly offset?: number;
}

/**
 * A trapezoidal flux density with zero-voltage intervals (the flux of a transformer in a
 * phase-shifted full bridge, or of a three-level inverter): it ramps from $-\hat B$ to
 * $+\hat B$ in $DT/2$, holds for $(1 - D)T/2$, ramps back down in $DT/2$ and holds again.
 * Points at $t = 0,\ DT/2,\ T/2,\ T/2 + DT/2,\ T$ (four segments); for D = 1, the
 * three points of the symmetric triangle.
 *
 * $$
 * |dB/dt| = \frac{4\hat B}{DT} \text{ on the ramps}, \quad 0 \text{ on the holds}
 * $$
 *
 * Hard domain (throws {@link InputError}): $\hat B$ < 0; f ≤ 0; D outside (0, 1]; offset
 * non-finite. Accuracy: exact (points only).
 *
 * @param options - amplitude [T], frequency [Hz], duty cycle, offset [T]
 * @returns the waveform
 * @throws {@link InputError} on bad input
 * @see Common practice.
 * @example
 * ```ts
 * import { trapezoidalFluxWaveform } from "fluxwright";
 * const w = trapezoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e3, dutyCycle: 0.5 });
 * console.log(Array.from(w.time)); // [ 0, 0.00025, 0.0005, 0.00075, 0.001 ]
 * ```
 * @category Core loss
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name peakFluxDensity is accepted until 1.0
export function trapezoidalFluxWaveform(options: TrapezoidalFluxOptions | WithPeakFluxDensity<TrapezoidalFluxOptions>): FluxWaveform {
  const where = "trapezoidalFluxWaveform";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TRAPEZOIDAL_FIELDS);
  const peak = requireNonNegative(where, givenName(options, "fluxDensityPeak", "peakFluxDensity"), renamedOption(where, "", options, "fluxDensityPeak", "peakFluxDensity"), "T");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const d = requireInRange(where, "dutyCycle", options.dutyCycle, "", 0, 1, "(]");
  const offset = options.offset === undefined ? 0 : requireFinite(where, "offset", options.offset, "T");
  const period = 1 / f;
  if (d === 1) {
    return { period, time: Float64Array.of(0, period / 2, period), fluxDensity: Float64Array.of(offset - peak, offset + peak, offset - peak) };
  }
  const half = period / 2;
  return {
    period,
    time: Float64Array.of(0, d * half, half, half + d * half, period),
    fluxDensity: Float64Array.of(offset - peak, offset + peak, offset + peak, offset - peak, offset - peak),
  };
}
