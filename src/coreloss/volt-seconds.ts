/**
 * Flux density from volt-seconds: Faraday's law for a winding on a core.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { FluxWaveform } from "./waveform-types.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const WAVEFORM_FIELDS: readonly string[] = Object.freeze(["time", "voltage", "turns", "coreArea"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const VOLT_SECONDS_FIELDS: readonly string[] = Object.freeze(["voltSeconds", "turns", "coreArea"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SINUSOIDAL_VOLTAGE_FIELDS: readonly string[] = Object.freeze(["voltageRms", "frequency", "turns", "coreArea"]);

/**
 * Options of {@link fluxDensityFromVoltSeconds} with a volt-second product.
 *
 * @category Core loss
 */
export interface VoltSecondsOptions {
  /** Volt-seconds applied while the flux moves one way, $\lambda = \int v\,dt$ [V·s], ≥ 0. */
  readonly voltSeconds: number;
  /** Number of turns N, > 0. */
  readonly turns: number;
  /** Effective core cross-section $A_e$ [m²], > 0. */
  readonly coreArea: number;
}

/**
 * Flux-density swing from volt-seconds (Faraday's law), given either the volt-second product
 * λ or a piecewise-constant winding voltage over one period (see
 * {@link VoltageWaveformOptions}):
 * $$
 * \Delta B = \frac{\lambda}{N A_e}, \qquad
 * \Delta B = \max_t B(t) - \min_t B(t),\ B(t) = \frac{1}{N A_e}\int_0^t v\, d\tau
 * $$
 * For a symmetric waveform this is the peak-to-peak swing; the peak is half of it. For the
 * whole waveform (to feed {@link igseLoss}) use {@link fluxWaveformFromVoltage}.
 *
 * Hard domain (throws {@link InputError}): λ < 0 or non-finite; N or $A_e$ not finite and
 * > 0; a voltage waveform rejected by {@link fluxWaveformFromVoltage}. Accuracy: exact
 * (≤ 1e-15 relative). Validity: uniform flux over $A_e$ (fringing and leakage ignored).
 *
 * @param options - volt-seconds [V·s] or a voltage waveform (times [s], voltages [V]), turns, core area [m²]
 * @returns flux-density swing [T]
 * @throws {@link InputError} on bad input
 * @see Faraday's law of induction, $v = N A_e\, dB/dt$.
 * @example
 * ```ts
 * import { fluxDensityFromVoltSeconds } from "fluxwright";
 * // 48 V for 5 µs on 6 turns, 1 cm² core
 * console.log(fluxDensityFromVoltSeconds({ voltSeconds: 48 * 5e-6, turns: 6, coreArea: 1e-4 })); // ≈ 0.4
 * // the same from the voltage of a 100 kHz square wave, ±48 V
 * const swing = fluxDensityFromVoltSeconds({ time: [0, 5e-6, 10e-6], voltage: [48, -48], turns: 6, coreArea: 1e-4 });
 * console.log(swing); // ≈ 0.4
 * ```
 * @category Core loss
 */
export function fluxDensityFromVoltSeconds(options: VoltSecondsOptions | VoltageWaveformOptions): number {
  const where = "fluxDensityFromVoltSeconds";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, "voltSeconds" in options || !("voltage" in options) ? VOLT_SECONDS_FIELDS : WAVEFORM_FIELDS);
  if (!("voltSeconds" in options) && "voltage" in options) {
    const w = fluxWaveformFromVoltage(options);
    let max = -Infinity;
    let min = Infinity;
    for (const b of w.fluxDensity) {
      if (b > max) max = b;
      if (b < min) min = b;
    }
    return max - min;
  }
  const lambda = (options).voltSeconds;
  if (typeof lambda !== "number" || !(lambda >= 0) || lambda === Infinity) {
    throw new InputError(where, "voltSeconds", lambda, "V·s", "a finite number ≥ 0");
  }
  const n = requirePositive(where, "turns", options.turns, "");
  const a = requirePositive(where, "coreArea", options.coreArea, "m²");
  return lambda / (n * a);
}

/**
 * Options of {@link sinusoidalPeakFluxDensity}.
 *
 * @category Core loss
 */
export interface SinusoidalVoltageOptions {
  /** RMS winding voltage [V], ≥ 0. */
  readonly voltageRms: number;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** Number of turns, > 0. */
  readonly turns: number;
  /** Effective core cross-section [m²], > 0. */
  readonly coreArea: number;
}

/**
 * Peak flux density under a sinusoidal winding voltage (the transformer equation):
 * $$
 * \hat B = \frac{\sqrt 2\, V_{\mathrm{rms}}}{2\pi f N A_e} \approx \frac{V_{\mathrm{rms}}}{4.44\, f N A_e}
 * $$
 * (the exact factor 2π/√2 = 4.4429 is used).
 *
 * Hard domain (throws {@link InputError}): V < 0; f, N, $A_e$ not finite and > 0. Accuracy:
 * exact (≤ 1e-15 relative).
 *
 * @param options - RMS voltage [V], frequency [Hz], turns, core area [m²]
 * @returns peak flux density [T]
 * @throws {@link InputError} on bad input
 * @see Faraday's law; the "4.44 f N A" transformer equation (common practice).
 * @example
 * ```ts
 * import { sinusoidalPeakFluxDensity } from "fluxwright";
 * console.log(sinusoidalPeakFluxDensity({ voltageRms: 230, frequency: 50, turns: 500, coreArea: 20e-4 })); // ≈ 1.0354
 * ```
 * @category Core loss
 */
export function sinusoidalPeakFluxDensity(options: SinusoidalVoltageOptions): number {
  const where = "sinusoidalPeakFluxDensity";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SINUSOIDAL_VOLTAGE_FIELDS);
  const v = options.voltageRms;
  if (typeof v !== "number" || !(v >= 0) || v === Infinity) throw new InputError(where, "voltageRms", v, "V", "a finite number ≥ 0");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const n = requirePositive(where, "turns", options.turns, "");
  const a = requirePositive(where, "coreArea", options.coreArea, "m²");
  return (Math.SQRT2 * v) / (2 * Math.PI * f * n * a);
}

/**
 * Options of {@link fluxWaveformFromVoltage}.
 *
 * @category Core loss
 */
export interface VoltageWaveformOptions {
  /** Breakpoint times [s]: n + 1 values from 0 to the period, strictly increasing. */
  readonly time: ArrayLike<number>;
  /** Winding voltage on each interval [V]: n values, constant from `time[i]` to `time[i+1]`. */
  readonly voltage: ArrayLike<number>;
  /** Number of turns, > 0. */
  readonly turns: number;
  /** Effective core cross-section [m²], > 0. */
  readonly coreArea: number;
}

/**
 * Flux-density waveform of a winding driven by a piecewise-constant (rectangular) voltage:
 * integrates Faraday's law interval by interval and centres the result (a DC flux bias is not
 * set by the voltage; the waveform is placed so that its maximum and minimum are opposite).
 * The result is piecewise linear and ready for {@link igseLoss}.
 *
 * $$
 * B(t_{i+1}) = B(t_i) + \frac{v_i\,(t_{i+1} - t_i)}{N A_e}
 * $$
 *
 * Hard domain (throws {@link InputError}): fewer than one interval; lengths inconsistent;
 * times not starting at 0 or not strictly increasing; non-finite voltages; N, $A_e$ not > 0;
 * volt-seconds not balanced over the period (|∫v dt| above 1e-9 of ∫|v| dt: the flux would
 * not close). Accuracy: exact to rounding.
 *
 * @param options - breakpoints [s], interval voltages [V], turns, core area [m²]
 * @returns the flux waveform [T] with its period
 * @throws {@link InputError} on bad input
 * @see Faraday's law of induction.
 * @example
 * ```ts
 * import { fluxWaveformFromVoltage } from "fluxwright";
 * // ±100 V square wave at 50 kHz on 10 turns, 1 cm²
 * const w = fluxWaveformFromVoltage({ time: [0, 10e-6, 20e-6], voltage: [100, -100], turns: 10, coreArea: 1e-4 });
 * console.log(Array.from(w.fluxDensity)); // [ -0.5, 0.5, -0.5 ]
 * ```
 * @category Core loss
 */
export function fluxWaveformFromVoltage(options: VoltageWaveformOptions): FluxWaveform {
  const where = "fluxWaveformFromVoltage";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, WAVEFORM_FIELDS);
  const time = options.time;
  const voltage = options.voltage;
  if (time === null || typeof time !== "object" || typeof time.length !== "number" || time.length < 2) {
    throw new InputError(where, "time", time, "s", "an array of at least 2 breakpoints");
  }
  const n = time.length - 1;
  if (voltage === null || typeof voltage !== "object" || voltage.length !== n) {
    throw new InputError(where, "voltage", voltage, "V", `an array of ${n} interval voltages (one fewer than time)`);
  }
  const turns = requirePositive(where, "turns", options.turns, "");
  const area = requirePositive(where, "coreArea", options.coreArea, "m²");
  if (time[0] !== 0) throw new InputError(where, "time[0]", time[0], "s", "0");
  const t = new Float64Array(n + 1);
  const b = new Float64Array(n + 1);
  let abs = 0;
  for (let i = 0; i < n; i++) {
    const t1 = requireFinite(where, `time[${i + 1}]`, time[i + 1], "s");
    if (!(t1 > (t[i] as number))) throw new InputError(where, `time[${i + 1}]`, t1, "s", `a finite number > time[${i}] (${t[i]})`);
    const v = requireFinite(where, `voltage[${i}]`, voltage[i], "V");
    const dt = t1 - (t[i] as number);
    t[i + 1] = t1;
    b[i + 1] = (b[i] as number) + (v * dt) / (turns * area);
    abs += Math.abs(v) * dt;
  }
  const net = (b[n] as number) * turns * area;
  if (!(Math.abs(net) <= 1e-9 * abs)) {
    throw new InputError(where, "voltage", net, "V·s", "balanced over the period (net volt-seconds 0)");
  }
  b[n] = 0;
  let max = -Infinity;
  let min = Infinity;
  for (let i = 0; i <= n; i++) {
    const v = b[i] as number;
    if (v > max) max = v;
    if (v < min) min = v;
  }
  const shift = (max + min) / 2;
  for (let i = 0; i <= n; i++) b[i] = (b[i] as number) - shift;
  return { period: t[n] as number, time: t, fluxDensity: b };
}
