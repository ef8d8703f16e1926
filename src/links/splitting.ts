/**
 * Frequency splitting of a series–series link, and the frequency sweep that shows it.
 *
 * @packageDocumentation
 */
import { InputError, requireArrayLike, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import { inductiveLink, type InductiveLinkOptions } from "./inductive-link.js";

/**
 * Options of {@link seriesSeriesSplitting}.
 *
 * @category Inductive links
 */
export interface SeriesSeriesSplittingOptions {
  /** Primary coil inductance L₁ [H], > 0. */
  readonly primaryInductance: number;
  /** Secondary coil inductance L₂ [H], > 0. */
  readonly secondaryInductance: number;
  /** Mutual inductance M [H], 0 < M < √(L₁L₂). */
  readonly mutualInductance: number;
  /** Secondary coil resistance R₂ [Ω], ≥ 0. */
  readonly secondaryResistance: number;
  /** Load resistance R_L [Ω], > 0. */
  readonly loadResistance: number;
  /** Frequency both sides are tuned to by their series capacitors, f₀ [Hz], > 0. */
  readonly resonantFrequency: number;
}

/**
 * The result of {@link seriesSeriesSplitting}.
 *
 * @category Inductive links
 */
export interface SeriesSeriesSplitting {
  /** Secondary loaded quality factor Q₂ = 2πf₀L₂/(R₂ + R_L). */
  readonly secondaryQuality: number;
  /** Coupling coefficient k = M/√(L₁L₂). */
  readonly couplingCoefficient: number;
  /** The coupling above which the input phase crosses zero three times (1 when Q₂ ≤ 1/√2: never below k = 1). */
  readonly criticalCoupling: number;
  /** True when k > criticalCoupling. */
  readonly split: boolean;
  /** Frequencies where the input impedance is real [Hz], ascending: f₀ alone, or three when split. */
  readonly zeroPhaseFrequencies: readonly number[];
}

const SPLIT_KEYS = ["primaryInductance", "secondaryInductance", "mutualInductance", "secondaryResistance", "loadResistance", "resonantFrequency"] as const;

/**
 * Frequency splitting of a series–series compensated link with both sides tuned to $f_0$. The
 * input reactance is $X_1 - \omega^2M^2X_2/(R^2 + X_2^2)$ with $X_i = L_i(\omega - \omega_0^2/\omega)$ and
 * $R = R_2 + R_L$; besides $f_0$ it vanishes where, with $x = f/f_0$ and $Q_2 = \omega_0L_2/R$,
 * $$ (1-k^2)\,x^4 - \left(2 - \frac{1}{Q_2^2}\right)x^2 + 1 = 0, $$
 * which has two positive roots (two more zero-phase frequencies) once
 * $$ k > k_c = \frac{1}{Q_2}\sqrt{1 - \frac{1}{4Q_2^2}}\qquad (Q_2 > 1/\sqrt2). $$
 * Between $k_c$ and $1/Q_2$ both extra frequencies lie above $f_0$; above $1/Q_2$ they straddle it
 * and the output power at fixed source voltage dips at $f_0$ (see {@link linkFrequencySweep}).
 * The primary resistance does not enter.
 *
 * @param options - {@link SeriesSeriesSplittingOptions} (H, Ω, Hz)
 * @returns the {@link SeriesSeriesSplitting}
 * @throws {@link InputError} for non-finite or out-of-range values, M ≥ √(L₁L₂), an unknown key
 * @remarks Closed form. Checked against an independent numerical search (fixture
 * test/fixtures/links/splitting.json: the critical coupling as the coupling at which an
 * extremum of the directly evaluated input reactance first touches zero, and the zero-phase
 * frequencies by sampling and root refinement): ≤ 1e-8 relative (measured 3e-15 for the
 * critical coupling and 3e-12 for the frequencies, which the fixture stores to 1e-6 Hz). Validity: ideal lumped components, both sides tuned to the same f₀,
 * sinusoidal source.
 * @see C.-S. Wang, G. A. Covic, O. H. Stielau, "Power transfer capability and bifurcation
 *   phenomena of loosely coupled inductive power transfer systems", IEEE Trans. Ind. Electron.
 *   51(1), 148–157 (2004) (bifurcation of the zero-phase frequencies; from memory, no equation number).
 * @example
 * ```ts
 * import { seriesSeriesSplitting } from "fluxwright";
 * const s = seriesSeriesSplitting({
 *   primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 0.3 * Math.sqrt(60e-6 * 40e-6),
 *   secondaryResistance: 0.08, loadResistance: 5, resonantFrequency: 100e3,
 * });
 * console.log(s.criticalCoupling.toFixed(4)); // 0.2011
 * console.log(s.zeroPhaseFrequencies.map((f) => Math.round(f))); // [ 91204, 100000, 114939 ]
 * ```
 * @category Inductive links
 */
export function seriesSeriesSplitting(options: SeriesSeriesSplittingOptions): SeriesSeriesSplitting {
  const where = "seriesSeriesSplitting";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, SPLIT_KEYS);
  const l1 = requirePositive(where, "primaryInductance", options.primaryInductance, "H");
  const l2 = requirePositive(where, "secondaryInductance", options.secondaryInductance, "H");
  const m = requirePositive(where, "mutualInductance", options.mutualInductance, "H");
  if (!(m < Math.sqrt(l1 * l2))) throw new InputError(where, "mutualInductance", m, "H", `less than √(L₁L₂) = ${Math.sqrt(l1 * l2)}`);
  const r2 = requireNonNegative(where, "secondaryResistance", options.secondaryResistance, "Ω");
  const rl = requirePositive(where, "loadResistance", options.loadResistance, "Ω");
  const f0 = requirePositive(where, "resonantFrequency", options.resonantFrequency, "Hz");
  const q = (2 * Math.PI * f0 * l2) / (r2 + rl);
  const k = m / Math.sqrt(l1 * l2);
  const criticalCoupling = q > Math.SQRT1_2 ? Math.sqrt(1 / (q * q) - 1 / (4 * q * q * q * q)) : 1;
  const frequencies: number[] = [f0];
  const b = 2 - 1 / (q * q);
  const a = 1 - k * k;
  const disc = b * b - 4 * a;
  const split = k > criticalCoupling && disc > 0 && b > 0;
  if (split) {
    const root = Math.sqrt(disc);
    const big = (b + root) / (2 * a);
    const small = 1 / (a * big); // product of the roots is 1/a (no cancellation)
    frequencies.unshift(f0 * Math.sqrt(small));
    frequencies.push(f0 * Math.sqrt(big));
    frequencies.sort((x, y) => x - y);
  }
  return { secondaryQuality: q, couplingCoefficient: k, criticalCoupling, split, zeroPhaseFrequencies: frequencies };
}

/**
 * A frequency sweep of an inductive link with its capacitors held at the values sized at
 * `options.frequency` (as {@link inductiveLink} sizes them, unless given).
 *
 * @category Inductive links
 */
export interface LinkFrequencySweep {
  /** The frequencies [Hz]. */
  readonly frequency: Float64Array;
  /** Power into the load at each frequency [W]. */
  readonly outputPower: Float64Array;
  /** Efficiency at each frequency. */
  readonly efficiency: Float64Array;
  /** Phase of the input impedance at each frequency [rad] (> 0 inductive). */
  readonly inputPhase: Float64Array;
  /** The primary and secondary capacitances held fixed [F]. */
  readonly primaryCapacitance: number;
  /** Secondary capacitance [F]. */
  readonly secondaryCapacitance: number;
}

/**
 * Output power, efficiency and input phase of an inductive link over a list of frequencies,
 * the compensating capacitors fixed at their values for `options.frequency` — the curve on which
 * frequency splitting shows as two power peaks and three zero-phase crossings. Each point is
 * the exact phasor solve of {@link inductiveLink}.
 *
 * @param options - {@link InductiveLinkOptions} with a series or parallel compensation on each side
 * @param frequencies - the frequencies [Hz], each > 0 (at most 10⁷)
 * @returns the {@link LinkFrequencySweep}
 * @throws {@link InputError} as {@link inductiveLink}, for an LCC compensation (its filter
 *   capacitors cannot be held fixed yet), or for a bad frequency list
 * @remarks Exact for the linear circuit at each frequency (as {@link inductiveLink}, ≤ 1e-12).
 * @see {@link seriesSeriesSplitting} for the closed-form critical coupling.
 * @example
 * ```ts
 * import { linkFrequencySweep } from "fluxwright";
 * const sweep = linkFrequencySweep({
 *   primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 14.7e-6, primaryResistance: 0.1,
 *   secondaryResistance: 0.08, frequency: 100e3, compensation: "series-series", loadResistance: 5, sourceVoltage: 10,
 * }, [90e3, 100e3, 115e3]);
 * console.log(Array.from(sweep.outputPower, (p) => p.toFixed(2))); // [ '14.23', '5.79', '12.63' ]
 * ```
 * @category Inductive links
 */
export function linkFrequencySweep(options: InductiveLinkOptions, frequencies: ArrayLike<number>): LinkFrequencySweep {
  const where = "linkFrequencySweep";
  requireObject(where, "options", options);
  if (options.compensation === "lcc-series" || options.compensation === "double-lcc") {
    throw new InputError(where, "compensation", options.compensation, "", "a series or parallel compensation (an LCC network's filter capacitors cannot be held fixed yet)");
  }
  const list = requireArrayLike(where, "frequencies", frequencies, "Hz");
  const n = list.length;
  const tuned = inductiveLink(options);
  const c1 = tuned.capacitors[0]?.capacitance ?? 0;
  const c2 = tuned.capacitors[1]?.capacitance ?? 0;
  const frequency = new Float64Array(n);
  const outputPower = new Float64Array(n);
  const efficiency = new Float64Array(n);
  const inputPhase = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const f = requirePositive(where, `frequencies[${i}]`, list[i], "Hz");
    const link = inductiveLink({ ...options, frequency: f, primaryCapacitance: c1, secondaryCapacitance: c2 });
    frequency[i] = f;
    outputPower[i] = link.outputPower;
    efficiency[i] = link.efficiency;
    inputPhase[i] = Math.atan2(link.inputImpedance.im, link.inputImpedance.re);
  }
  return { frequency, outputPower, efficiency, inputPhase, primaryCapacitance: c1, secondaryCapacitance: c2 };
}
