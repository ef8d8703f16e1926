/**
 * Types of flux-density waveforms over one period.
 *
 * @packageDocumentation
 */

/**
 * Flux density over one period as two columns of equal length: times from 0 to the period,
 * strictly increasing, and the flux density at each time; read as piecewise linear between
 * points. The last flux density equals the first (the waveform closes).
 *
 * @category Core loss
 */
export interface FluxSamples {
  /** Times [s]: `time[0]` = 0, last = the period, strictly increasing. */
  readonly time: ArrayLike<number>;
  /** Flux density at each time [T]. */
  readonly fluxDensity: ArrayLike<number>;
}

/**
 * One point of a piecewise-linear flux-density waveform.
 *
 * @category Core loss
 */
export interface FluxPoint {
  /** Time [s]. */
  readonly time: number;
  /** Flux density [T]. */
  readonly fluxDensity: number;
}

/**
 * A flux-density waveform built by the helpers ({@link sinusoidalFluxWaveform},
 * {@link triangularFluxWaveform}, {@link trapezoidalFluxWaveform},
 * {@link fluxWaveformFromVoltage}): its period and its points, ready for {@link igseLoss}
 * (`igseLoss({ ...coefficients, period: w.period, flux: w })`).
 *
 * @category Core loss
 */
export interface FluxWaveform extends FluxSamples {
  /** Period [s]. */
  readonly period: number;
  /** Times [s], from 0 to `period`. */
  readonly time: Float64Array;
  /** Flux density [T] at each time. */
  readonly fluxDensity: Float64Array;
}
