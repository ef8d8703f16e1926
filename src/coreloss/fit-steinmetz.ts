/**
 * Fitting Steinmetz coefficients (and an optional quadratic temperature term) to a user's
 * own loss data by least squares in log space.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import type { SteinmetzTemperatureTerm } from "../materials/index.js";
import { leastSquaresQr } from "../special/internal.js";
import { givenName, renamedOption } from "../core/renamed.js";
import type { WithPeakFluxDensity } from "./waveforms.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const POINT_FIELDS: readonly string[] = Object.freeze(["frequency", "fluxDensityPeak", "lossDensity", "temperature", "peakFluxDensity"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const FIT_FIELDS: readonly string[] = Object.freeze(["referenceTemperature"]);

/**
 * One measured (or datasheet) loss point for {@link fitSteinmetz}.
 *
 * @category Core loss
 */
export interface SteinmetzDataPoint {
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** Peak flux density [T], > 0. */
  readonly fluxDensityPeak: number;
  /** Measured loss density [W/m³], > 0. */
  readonly lossDensity: number;
  /** Core temperature [K], > 0; give it on every point or on none. */
  readonly temperature?: number;
}

/**
 * Options of {@link fitSteinmetz}.
 *
 * @category Core loss
 */
export interface FitSteinmetzOptions {
  /**
   * Reference temperature of the fitted temperature term [K] (default: the mean of the
   * points' temperatures). Ignored without temperatures.
   */
  readonly referenceTemperature?: number;
}

/**
 * Result of {@link fitSteinmetz}.
 *
 * @category Core loss
 */
export interface SteinmetzFit {
  /** Fitted k [W/m³ at 1 Hz, 1 T] (at the reference temperature when a temperature term is fitted). */
  readonly k: number;
  /** Fitted frequency exponent α [-]. */
  readonly alpha: number;
  /** Fitted flux-density exponent β [-]. */
  readonly beta: number;
  /** Fitted temperature term, when every point carried a temperature and ≥ 3 distinct temperatures were given. */
  readonly temperatureTerm?: SteinmetzTemperatureTerm;
  /** RMS of the residuals in natural-log space, $\sqrt{\frac{1}{n}\sum (\ln P_{\text{fit}} - \ln P)^2}$ [-]. */
  readonly residualRms: number;
  /** Largest relative error of the fitted loss over the points, $\max |P_{\text{fit}}/P - 1|$ [-]. */
  readonly maxRelativeError: number;
  /** Notes on how well the data determine the coefficients (narrow span, dropped temperature term). */
  readonly validity: readonly ValidityNote[];
}

const WHERE = "fitSteinmetz";

/** The points in log space (ln f, ln B̂, ln P_v) and their temperatures, checked. */
interface LogPoints {
  readonly n: number;
  readonly lf: Float64Array;
  readonly lb: Float64Array;
  readonly lp: Float64Array;
  readonly temps: Float64Array;
}

/** Reads and checks the points and options; throws InputError on bad ones. */
function readPoints(
  // eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name peakFluxDensity is accepted until 1.0
  points: readonly (SteinmetzDataPoint | WithPeakFluxDensity<SteinmetzDataPoint>)[],
  options: FitSteinmetzOptions,
): LogPoints & { readonly withT: number } {
  if (!Array.isArray(points)) throw new InputError(WHERE, "points", points, "", "an array of { frequency, fluxDensityPeak, lossDensity } points");
  requireObject(WHERE, "options", options);
  requireKnownKeys(WHERE, "options", options, FIT_FIELDS);
  const n = points.length;
  if (n < 3) throw new InputError(WHERE, "points.length", n, "", "at least 3");
  const lf = new Float64Array(n);
  const lb = new Float64Array(n);
  const lp = new Float64Array(n);
  const temps = new Float64Array(n);
  let withT = 0;
  for (let i = 0; i < n; i++) {
    const p = requireObject(WHERE, `points[${i}]`, points[i]);
    requireKnownKeys(WHERE, `points[${i}]`, p, POINT_FIELDS);
    lf[i] = Math.log(requirePositive(WHERE, `points[${i}].frequency`, p.frequency, "Hz"));
    lb[i] = Math.log(requirePositive(WHERE, `points[${i}].${givenName(p, "fluxDensityPeak", "peakFluxDensity")}`, renamedOption(WHERE, `points[${i}]`, p, "fluxDensityPeak", "peakFluxDensity"), "T"));
    lp[i] = Math.log(requirePositive(WHERE, `points[${i}].lossDensity`, p.lossDensity, "W/m³"));
    if (p.temperature !== undefined) {
      temps[i] = requirePositive(WHERE, `points[${i}].temperature`, p.temperature, "K");
      withT++;
    }
  }
  if (withT !== 0 && withT !== n) {
    throw new InputError(WHERE, "points[].temperature", withT, "", `given on every point or on none (given on ${withT} of ${n})`);
  }
  return { n, lf, lb, lp, temps, withT };
}

/**
 * The reference temperature of the temperature term, or null when it is not fitted (no
 * temperatures, or fewer than 3 distinct ones: noted in `validity`); throws with fewer than 6
 * points.
 */
function temperatureReference(data: LogPoints, withT: number, options: FitSteinmetzOptions, validity: ValidityNote[]): number | null {
  const { n, temps } = data;
  if (withT !== n) return null;
  const distinct = new Set(Array.from(temps, (t) => t.toPrecision(9))).size;
  if (distinct < 3) {
    validity.push({
      code: "temperature-term-not-fitted",
      message: `Only ${distinct} distinct temperature(s): at least 3 are needed for the quadratic temperature term, which was not fitted.`,
      value: distinct,
      limit: 3,
    });
    return null;
  }
  if (n < 6) throw new InputError(WHERE, "points.length", n, "", "at least 6 when temperatures are given");
  let s = 0;
  for (let i = 0; i < n; i++) s += temps[i] as number;
  return options.referenceTemperature === undefined ? s / n : requirePositive(WHERE, "options.referenceTemperature", options.referenceTemperature, "K");
}

/** The plain fit: ln P = ln k + α ln f + β ln B̂ by QR. */
function fitWithoutTemperature(data: LogPoints, validity: ValidityNote[]): SteinmetzFit {
  const { n, lf, lb, lp } = data;
  const x = solve(n, 3, (i, row) => {
    row[0] = 1;
    row[1] = lf[i] as number;
    row[2] = lb[i] as number;
  }, lp);
  const lnk = x[0] as number;
  const alpha = x[1] as number;
  const beta = x[2] as number;
  return finish(n, lp, (i) => lnk + alpha * (lf[i] as number) + beta * (lb[i] as number), { k: Math.exp(lnk), alpha, beta }, validity);
}

/**
 * The fit with the quadratic temperature factor: a linear start with ln F ≈ γ₁d + γ₂d², then
 * Gauss–Newton with step halving on the log residuals (at most 100 steps).
 */
function fitWithTemperature(data: LogPoints, tRef: number, validity: ValidityNote[]): SteinmetzFit {
  const { n, lf, lb, lp, temps } = data;
  // temperature term: scale d by 100 K for conditioning
  const scale = 100;
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) d[i] = ((temps[i] as number) - tRef) / scale;
  // linear start: ln F ≈ g1 d + g2 d²
  const x0 = solve(n, 5, (i, row) => {
    const di = d[i] as number;
    row[0] = 1;
    row[1] = lf[i] as number;
    row[2] = lb[i] as number;
    row[3] = di;
    row[4] = di * di;
  }, lp);
  let lnk = x0[0] as number;
  let alpha = x0[1] as number;
  let beta = x0[2] as number;
  let c1 = x0[3] as number;
  let c2 = (x0[4] as number) + 0.5 * (x0[3] as number) ** 2;
  const sse = (lk: number, a: number, b: number, q1: number, q2: number): number => {
    let s = 0;
    for (let i = 0; i < n; i++) {
      const di = d[i] as number;
      const f = 1 + q1 * di + q2 * di * di;
      if (!(f > 0)) return Infinity;
      const r = lk + a * (lf[i] as number) + b * (lb[i] as number) + Math.log(f) - (lp[i] as number);
      s += r * r;
    }
    return s;
  };
  let current = sse(lnk, alpha, beta, c1, c2);
  if (!Number.isFinite(current)) {
    c1 = 0;
    c2 = 0;
    current = sse(lnk, alpha, beta, c1, c2);
  }
  const rhs = new Float64Array(n);
  for (let iter = 0; iter < 100; iter++) {
    for (let i = 0; i < n; i++) {
      const di = d[i] as number;
      const f = 1 + c1 * di + c2 * di * di;
      rhs[i] = (lp[i] as number) - (lnk + alpha * (lf[i] as number) + beta * (lb[i] as number) + Math.log(f));
    }
    const step = solve(n, 5, (i, row) => {
      const di = d[i] as number;
      const f = 1 + c1 * di + c2 * di * di;
      row[0] = 1;
      row[1] = lf[i] as number;
      row[2] = lb[i] as number;
      row[3] = di / f;
      row[4] = (di * di) / f;
    }, rhs);
    let lambda = 1;
    let accepted = false;
    for (let h = 0; h < 30; h++) {
      const cand = sse(lnk + lambda * (step[0] as number), alpha + lambda * (step[1] as number), beta + lambda * (step[2] as number), c1 + lambda * (step[3] as number), c2 + lambda * (step[4] as number));
      if (cand <= current) {
        lnk += lambda * (step[0] as number);
        alpha += lambda * (step[1] as number);
        beta += lambda * (step[2] as number);
        c1 += lambda * (step[3] as number);
        c2 += lambda * (step[4] as number);
        const improvement = current - cand;
        current = cand;
        accepted = true;
        if (improvement <= 1e-30 + 1e-15 * current && lambda === 1) iter = 100;
        break;
      }
      lambda /= 2;
    }
    if (!accepted) break;
    let stepNorm = 0;
    for (let j = 0; j < 5; j++) stepNorm = Math.max(stepNorm, Math.abs(lambda * (step[j] as number)));
    if (stepNorm < 1e-14) break;
  }
  const term: SteinmetzTemperatureTerm = { referenceTemperature: tRef, linear: c1 / scale, quadratic: c2 / (scale * scale) };
  return finish(
    n,
    lp,
    (i) => {
      const di = d[i] as number;
      return lnk + alpha * (lf[i] as number) + beta * (lb[i] as number) + Math.log(1 + c1 * di + c2 * di * di);
    },
    { k: Math.exp(lnk), alpha, beta, temperatureTerm: term },
    validity,
  );
}

/**
 * Fits Steinmetz coefficients to loss points by linear least squares in log space:
 * $$
 * \ln P_v = \ln k + \alpha \ln f + \beta \ln \hat B \;\bigl[ + \ln F(T) \bigr],
 * \qquad F(T) = 1 + c_1 (T - T_{\mathrm{ref}}) + c_2 (T - T_{\mathrm{ref}})^2
 * $$
 * Without temperatures the problem is linear (Householder QR). With temperatures on every
 * point (at least 3 distinct), the quadratic factor is fitted as well: a linear start with
 * $\ln F ≈ \gamma_1 d + \gamma_2 d^2$, then Gauss–Newton on the log residuals.
 *
 * Hard domain (throws {@link InputError}): fewer than 3 points (6 with temperatures); a point
 * with a non-positive or non-finite field; temperatures on some points but not all; all
 * points at one frequency or one flux density, or frequency and flux collinear in log space
 * (α and β cannot be separated). Validity (reported in `validity`, not thrown): a frequency or
 * flux span narrower than a factor of 2, strongly correlated frequency and flux, fewer than
 * 3 distinct temperatures. Accuracy: recovers the coefficients of exact synthetic data to
 * ≤ 1e-9 relative (tests); with noisy data, the statistical error of least squares.
 *
 * @param points - the data points
 * @param options - optional reference temperature [K]
 * @returns the coefficients, residuals and validity notes
 * @throws {@link InputError} on bad input or data that cannot determine α and β
 * @see Least squares in log space: common practice for Steinmetz fits; quadratic temperature
 * factor $c_{t0} - c_{t1}T + c_{t2}T^2$ of ferrite datasheets (common practice).
 * @example
 * ```ts
 * import { fitSteinmetz, steinmetzLoss } from "fluxwright";
 * // synthetic points from invented coefficients k = 2.5, α = 1.45, β = 2.55
 * const points = [];
 * for (const frequency of [25e3, 50e3, 100e3, 200e3])
 *   for (const fluxDensityPeak of [0.05, 0.1, 0.2])
 *     points.push({ frequency, fluxDensityPeak, lossDensity: steinmetzLoss({ k: 2.5, alpha: 1.45, beta: 2.55, frequency, fluxDensityPeak }) });
 * const fit = fitSteinmetz(points);
 * console.log(fit.alpha.toFixed(6), fit.beta.toFixed(6)); // 1.450000 2.550000
 * ```
 * @category Core loss
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name peakFluxDensity is accepted until 1.0
export function fitSteinmetz(points: readonly (SteinmetzDataPoint | WithPeakFluxDensity<SteinmetzDataPoint>)[], options: FitSteinmetzOptions = {}): SteinmetzFit {
  const data = readPoints(points, options);
  const validity: ValidityNote[] = [];
  checkSpan(data.lf, data.lb, validity);
  const tRef = temperatureReference(data, data.withT, options, validity);
  return tRef === null ? fitWithoutTemperature(data, validity) : fitWithTemperature(data, tRef, validity);
}

/** Builds the design matrix with `fill` and solves by QR; throws when rank-deficient. */
function solve(n: number, p: number, fill: (i: number, row: Float64Array) => void, rhs: Float64Array): Float64Array {
  const a = new Float64Array(n * p);
  const row = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    fill(i, row);
    a.set(row, i * p);
  }
  const b = Float64Array.from(rhs);
  const x = leastSquaresQr(a, b, n, p, 1e-10);
  if (x === undefined) {
    throw new InputError(WHERE, "points", n, "", "points spanning at least two frequencies, two flux densities (not collinear in log space) and, with temperatures, three temperatures; points given");
  }
  return x;
}

/** Adds validity notes for narrow spans and collinearity; throws when α, β are undetermined. */
function checkSpan(lf: Float64Array, lb: Float64Array, validity: ValidityNote[]): void {
  const n = lf.length;
  let fMin = Infinity;
  let fMax = -Infinity;
  let bMin = Infinity;
  let bMax = -Infinity;
  let mf = 0;
  let mb = 0;
  for (let i = 0; i < n; i++) {
    const f = lf[i] as number;
    const b = lb[i] as number;
    fMin = Math.min(fMin, f);
    fMax = Math.max(fMax, f);
    bMin = Math.min(bMin, b);
    bMax = Math.max(bMax, b);
    mf += f / n;
    mb += b / n;
  }
  if (!(fMax > fMin)) throw new InputError(WHERE, "points[].frequency", Math.exp(fMin), "Hz", "not all equal (α cannot be determined from one frequency); all equal to");
  if (!(bMax > bMin)) throw new InputError(WHERE, "points[].fluxDensityPeak", Math.exp(bMin), "T", "not all equal (β cannot be determined from one flux density); all equal to");
  let sff = 0;
  let sbb = 0;
  let sfb = 0;
  for (let i = 0; i < n; i++) {
    const f = (lf[i] as number) - mf;
    const b = (lb[i] as number) - mb;
    sff += f * f;
    sbb += b * b;
    sfb += f * b;
  }
  const r = sfb / Math.sqrt(sff * sbb);
  if (Math.abs(r) > 1 - 1e-12) {
    throw new InputError(WHERE, "points", r, "", "with frequency and flux density not collinear in log space (α and β cannot be separated); correlation");
  }
  const fSpan = Math.exp(fMax - fMin);
  const bSpan = Math.exp(bMax - bMin);
  if (fSpan < 2) {
    validity.push({ code: "narrow-frequency-span", message: `Frequencies span only a factor of ${fSpan.toPrecision(3)} (< 2): α is poorly determined.`, value: fSpan, limit: 2 });
  }
  if (bSpan < 2) {
    validity.push({ code: "narrow-flux-span", message: `Flux densities span only a factor of ${bSpan.toPrecision(3)} (< 2): β is poorly determined.`, value: bSpan, limit: 2 });
  }
  if (Math.abs(r) > 0.95) {
    validity.push({ code: "frequency-flux-correlated", message: `Frequency and flux density are strongly correlated in the data (r = ${r.toFixed(3)}): α and β trade off against each other.`, value: Math.abs(r), limit: 0.95 });
  }
}

/** Residual statistics and the result object. */
function finish(
  n: number,
  lp: Float64Array,
  model: (i: number) => number,
  coefficients: { k: number; alpha: number; beta: number; temperatureTerm?: SteinmetzTemperatureTerm },
  validity: ValidityNote[],
): SteinmetzFit {
  let s = 0;
  let maxRel = 0;
  for (let i = 0; i < n; i++) {
    const r = model(i) - (lp[i] as number);
    s += r * r;
    maxRel = Math.max(maxRel, Math.abs(Math.expm1(r)));
  }
  return { ...coefficients, residualRms: Math.sqrt(s / n), maxRelativeError: maxRel, validity };
}
