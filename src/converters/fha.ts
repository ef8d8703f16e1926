/**
 * First-harmonic (FHA) voltage gains of resonant DC–DC converters: LLC, series (SRC),
 * parallel (PRC) and LCC (series–parallel).
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";

/**
 * Options of {@link llcGain}.
 *
 * @category Converters
 */
export interface LlcGainOptions {
  /** $L_n = L_m/L_r$, > 0. */
  readonly inductanceRatio: number;
  /** $Q = \sqrt{L_r/C_r}/R_\mathrm{ac}$ with $R_\mathrm{ac} = 8n^2R_\mathrm{load}/\pi^2$, > 0. */
  readonly qualityFactor: number;
  /** $f_n = f_s/f_r$, $f_r = 1/(2\pi\sqrt{L_rC_r})$, > 0. */
  readonly normalisedFrequency: number;
}

const LLC_KEYS = ["inductanceRatio", "qualityFactor", "normalisedFrequency"] as const;

/**
 * First-harmonic voltage gain of the LLC converter, $M = n V_\mathrm{out}/V_b$ ($V_b = V_\mathrm{in}/2$
 * for a half bridge, $V_\mathrm{in}$ for a full bridge):
 *
 * $$
 * M = \frac{1}{\sqrt{\left(1 + \frac{1}{L_n} - \frac{1}{L_n f_n^2}\right)^2 + Q^2\left(f_n - \frac{1}{f_n}\right)^2}}
 * $$
 *
 * the magnitude of the divider formed by the series $L_r C_r$ branch and $L_m \parallel R_\mathrm{ac}$,
 * with the bridge's square wave and the rectifier's square wave replaced by their fundamentals
 * (both carry the factor $4/\pi$, which cancels).
 *
 * @param options - {@link LlcGainOptions}: inductanceRatio, qualityFactor, normalisedFrequency (all dimensionless)
 * @returns the FHA gain M (dimensionless, > 0)
 * @throws {@link InputError} when an input is not a finite number > 0, or on an unknown option key
 * @remarks Closed form, ≤ 4 ulp. Validity: as an approximation of the real converter it is
 * exact to within the FHA error; against the exact piecewise-linear steady state
 * ({@link llcOperatingPoint}) it is within 1.5 % for 0.95 ≤ f_n ≤ 1.05 and 4 % for
 * 0.9 ≤ f_n ≤ 1.1 (3 ≤ L_n ≤ 10, 0.4 ≤ Q ≤ 1; tested), exactly 1 at f_n = 1 where the exact
 * gain is also 1, and off by up to 16 % at f_n = 0.8 or 1.2 — more at light load below
 * resonance, where the real converter runs in discontinuous modes.
 * @see R. L. Steigerwald, "A comparison of half-bridge resonant converter topologies", IEEE
 *   Trans. Power Electron. 3(2), 174–182 (1988) (the FHA method, R_ac = 8R/π²); B. Yang, F. C. Lee,
 *   A. J. Zhang, G. Huang, "LLC resonant converter for front end DC/DC conversion", APEC 2002
 *   (the LLC gain in this form; from memory, no equation number).
 * @example
 * ```ts
 * import { llcGain } from "fluxwright";
 * console.log(llcGain({ inductanceRatio: 6, qualityFactor: 0.4, normalisedFrequency: 1 })); // 1
 * console.log(llcGain({ inductanceRatio: 6, qualityFactor: 0.4, normalisedFrequency: 0.7 }).toFixed(4)); // 1.1410
 * ```
 * @category Converters
 */
export function llcGain(options: LlcGainOptions): number {
  // fast path: valid numbers checked inline, the key check by comparison with constant names
  if ((options as unknown) != null) {
    const ln = options.inductanceRatio;
    const q = options.qualityFactor;
    const fn = options.normalisedFrequency;
    if (
      typeof ln === "number" && typeof q === "number" && typeof fn === "number" &&
      ln > 0 && ln < Infinity && q > 0 && q < Infinity && fn > 0 && fn < Infinity && llcGainFieldsKnown(options)
    ) {
      return llcGainKernel(ln, q, fn);
    }
  }
  const where = "llcGain";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, LLC_KEYS);
  const ln = requirePositive(where, "inductanceRatio", options.inductanceRatio, "");
  const q = requirePositive(where, "qualityFactor", options.qualityFactor, "");
  const fn = requirePositive(where, "normalisedFrequency", options.normalisedFrequency, "");
  return llcGainKernel(ln, q, fn);
}

/** True when every enumerable key is a known one (comparisons with constant names: a few ns). */
function llcGainFieldsKnown(options: object): boolean {
  for (const key in options) {
    if (key !== "inductanceRatio" && key !== "qualityFactor" && key !== "normalisedFrequency") return false;
  }
  return true;
}

/** Unchecked LLC FHA gain; L_n may be Infinity (series resonant). */
export function llcGainKernel(ln: number, q: number, fn: number): number {
  const a = 1 + (1 - 1 / (fn * fn)) / ln;
  const b = q * (fn - 1 / fn);
  return 1 / Math.sqrt(a * a + b * b);
}

/**
 * Options of {@link seriesResonantGain}.
 *
 * @category Converters
 */
export interface SeriesResonantGainOptions {
  /** $Q = \sqrt{L_r/C_r}/R_\mathrm{ac}$, $R_\mathrm{ac} = 8n^2R_\mathrm{load}/\pi^2$, > 0. */
  readonly qualityFactor: number;
  /** $f_n = f_s/f_r$, > 0. */
  readonly normalisedFrequency: number;
}

/**
 * First-harmonic voltage gain of the series-resonant converter (capacitive output filter),
 * $M = nV_\mathrm{out}/V_b$:
 *
 * $$ M = \frac{1}{\sqrt{1 + Q^2\left(f_n - 1/f_n\right)^2}} $$
 *
 * (the LLC gain with $L_n \to \infty$).
 *
 * @param options - {@link SeriesResonantGainOptions}: qualityFactor, normalisedFrequency
 * @returns the FHA gain M (dimensionless, 0 < M ≤ 1)
 * @throws {@link InputError} when an input is not a finite number > 0, or on an unknown option key
 * @remarks Closed form. FHA error vs the exact steady state ({@link seriesResonantOperatingPoint}):
 * not measured as a bound here (the fixture's series cases show 0.4 % at f_n = 1.05 and 6 % at
 * f_n = 1.5, Q = 0.5, fixture llc-steady-state.json); below resonance
 * the exact converter runs discontinuously and clamps at M = 1 at light load, which FHA misses.
 * @see R. L. Steigerwald, IEEE Trans. Power Electron. 3(2), 174–182 (1988), series resonant
 *   converter (Q defined there as ω₀L/R_ac, the same as here; from memory).
 * @example
 * ```ts
 * import { seriesResonantGain } from "fluxwright";
 * console.log(seriesResonantGain({ qualityFactor: 1, normalisedFrequency: 1.2 }).toFixed(4)); // 0.9389
 * ```
 * @category Converters
 */
export function seriesResonantGain(options: SeriesResonantGainOptions): number {
  const where = "seriesResonantGain";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, ["qualityFactor", "normalisedFrequency"]);
  const q = requirePositive(where, "qualityFactor", options.qualityFactor, "");
  const fn = requirePositive(where, "normalisedFrequency", options.normalisedFrequency, "");
  return requireFiniteResult(where, "normalisedFrequency", llcGainKernel(Infinity, q, fn));
}

/**
 * Options of {@link parallelResonantGain}.
 *
 * @category Converters
 */
export interface ParallelResonantGainOptions {
  /** $Q = \sqrt{L_r/C_p}/R_\mathrm{ac}$ with $R_\mathrm{ac} = \pi^2 n^2 R_\mathrm{load}/8$ (inductive output filter), > 0. */
  readonly qualityFactor: number;
  /** $f_n = f_s/f_r$, $f_r = 1/(2\pi\sqrt{L_rC_p})$, > 0. */
  readonly normalisedFrequency: number;
}

/**
 * First-harmonic DC gain of the parallel-resonant converter with an inductive (LC) output
 * filter, $M = nV_\mathrm{out}/V_b$. The rectifier input voltage is the capacitor voltage, whose
 * rectified mean is $2/\pi$ of its peak; the filter inductor makes the rectifier a current sink,
 * seen by the fundamental as $R_\mathrm{ac} = \pi^2n^2R_\mathrm{load}/8$:
 *
 * $$ M = \frac{8}{\pi^2}\,\frac{1}{\sqrt{\left(1 - f_n^2\right)^2 + Q^2 f_n^2}} $$
 *
 * (the AC transfer function times $\tfrac{4}{\pi}\cdot\tfrac{2}{\pi}$).
 *
 * @param options - {@link ParallelResonantGainOptions}: qualityFactor, normalisedFrequency
 * @returns the FHA DC gain M (dimensionless, > 0)
 * @throws {@link InputError} when an input is not a finite number > 0, or on an unknown option key
 * @remarks Closed form (the algebra is checked against an independent phasor solve in the
 * tests). FHA error against the exact steady state ({@link parallelResonantOperatingPoint}):
 * within 1.2 % for |f_n − 1| ≤ 0.02, 3.1 % for ≤ 0.05, 6.4 % for ≤ 0.1 (0.2 ≤ Q ≤ 1), exact at
 * f_n = 1 in the continuous mode; more in the clamped (discontinuous) mode.
 * @see R. L. Steigerwald, IEEE Trans. Power Electron. 3(2), 174–182 (1988), parallel resonant
 *   converter (from memory; Q there is R_ac/(ω₀L) = 1/Q here).
 * @example
 * ```ts
 * import { parallelResonantGain } from "fluxwright";
 * console.log(parallelResonantGain({ qualityFactor: 0.5, normalisedFrequency: 1 }).toFixed(4)); // 1.6211
 * ```
 * @category Converters
 */
export function parallelResonantGain(options: ParallelResonantGainOptions): number {
  const where = "parallelResonantGain";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, ["qualityFactor", "normalisedFrequency"]);
  const q = requirePositive(where, "qualityFactor", options.qualityFactor, "");
  const fn = requirePositive(where, "normalisedFrequency", options.normalisedFrequency, "");
  const a = 1 - fn * fn;
  const b = q * fn;
  return 8 / (Math.PI * Math.PI) / Math.sqrt(a * a + b * b);
}

/**
 * Options of {@link lccGain}.
 *
 * @category Converters
 */
export interface LccGainOptions {
  /** $Q = \sqrt{L_r/C_s}/R_\mathrm{ac}$ with $R_\mathrm{ac} = \pi^2n^2R_\mathrm{load}/8$, > 0. */
  readonly qualityFactor: number;
  /** $f_n = f_s/f_r$ with $f_r = 1/(2\pi\sqrt{L_rC_s})$ (series capacitor), > 0. */
  readonly normalisedFrequency: number;
  /** $A = C_p/C_s$, parallel over series capacitance, > 0. */
  readonly capacitanceRatio: number;
}

/**
 * First-harmonic DC gain of the LCC (series–parallel) resonant converter with an inductive
 * output filter, $M = nV_\mathrm{out}/V_b$: series $L_r C_s$, then $C_p$ across the rectifier
 * input, $R_\mathrm{ac} = \pi^2n^2R_\mathrm{load}/8$:
 *
 * $$ M = \frac{8}{\pi^2}\,\frac{1}{\sqrt{\left(1 + A - A f_n^2\right)^2 + Q^2\left(f_n - 1/f_n\right)^2}} $$
 *
 * It tends to the series-resonant form as $A \to 0$ (times $8/\pi^2$, the inductive filter's
 * factor) and to the parallel-resonant form as $C_s \to \infty$.
 *
 * @param options - {@link LccGainOptions}: qualityFactor, normalisedFrequency, capacitanceRatio
 * @returns the FHA DC gain M (dimensionless, > 0)
 * @throws {@link InputError} when an input is not a finite number > 0, or on an unknown option key
 * @remarks Closed form, checked against an independent phasor solve of the network in the tests.
 * FHA error against the exact steady state ({@link lccOperatingPoint}): within 4.5 % for A = 2
 * and up to 22 % over 0.25 ≤ A ≤ 2, 1 ≤ f_n ≤ 1.6, 0.2 ≤ Q ≤ 1 (worst at small A); a design
 * estimate only.
 * @see R. L. Steigerwald, IEEE Trans. Power Electron. 3(2), 174–182 (1988), series–parallel
 *   resonant converter (from memory).
 * @example
 * ```ts
 * import { lccGain } from "fluxwright";
 * console.log(lccGain({ qualityFactor: 1, normalisedFrequency: 1.2, capacitanceRatio: 1 }).toFixed(4)); // 1.2110
 * ```
 * @category Converters
 */
export function lccGain(options: LccGainOptions): number {
  const where = "lccGain";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, ["qualityFactor", "normalisedFrequency", "capacitanceRatio"]);
  const q = requirePositive(where, "qualityFactor", options.qualityFactor, "");
  const fn = requirePositive(where, "normalisedFrequency", options.normalisedFrequency, "");
  const ratio = requirePositive(where, "capacitanceRatio", options.capacitanceRatio, "");
  const a = 1 + ratio - ratio * fn * fn;
  const b = q * (fn - 1 / fn);
  return 8 / (Math.PI * Math.PI) / Math.sqrt(a * a + b * b);
}
