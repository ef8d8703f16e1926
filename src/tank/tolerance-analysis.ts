/**
 * Monte Carlo analysis of a tank's resonant frequency and current under component tolerances
 * and temperature coefficients, with a seeded, reproducible generator.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireInRange, requireInteger, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { summariseSamples } from "./percentiles.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TOLERANCE_FIELDS: readonly string[] = Object.freeze(["topology", "inductance", "capacitance", "resistance", "inductanceTolerance", "capacitanceTolerance", "resistanceTolerance", "inductanceTemperatureCoefficient", "capacitanceTemperatureCoefficient", "resistanceTemperatureCoefficient", "temperatureChangeMin", "temperatureChangeMax", "driveVoltageRms", "driveFrequency", "distribution", "samples", "seed"]);

/**
 * Options of {@link tankToleranceAnalysis}. Tolerances are relative (0.05 = ±5 %); temperature
 * coefficients are relative per kelvin (e.g. −150e-6 for a capacitor losing 150 ppm/K).
 *
 * @category Tolerances
 */
export interface TankToleranceOptions {
  /** `"series"` (voltage-driven at a fixed frequency) or `"parallel"` (self-oscillating at its zero-phase frequency). Default `"series"`. */
  readonly topology?: "series" | "parallel";
  /** Nominal inductance [H], > 0. */
  readonly inductance: number;
  /** Nominal capacitance [F], > 0. */
  readonly capacitance: number;
  /** Nominal series resistance (coil branch for the parallel tank) [Ω], > 0. */
  readonly resistance: number;
  /** Relative inductance tolerance, in [0, 1). */
  readonly inductanceTolerance: number;
  /** Relative capacitance tolerance, in [0, 1). */
  readonly capacitanceTolerance: number;
  /** Relative resistance tolerance, in [0, 1) (default 0). */
  readonly resistanceTolerance?: number;
  /** Inductance temperature coefficient [1/K] (default 0). */
  readonly inductanceTemperatureCoefficient?: number;
  /** Capacitance temperature coefficient [1/K] (default 0). */
  readonly capacitanceTemperatureCoefficient?: number;
  /** Resistance temperature coefficient [1/K] (default 0; annealed copper ≈ 0.00393). */
  readonly resistanceTemperatureCoefficient?: number;
  /** Lowest temperature change from the reference at which values are nominal [K] (default 0). */
  readonly temperatureChangeMin?: number;
  /** Highest temperature change from the reference [K] (default 0), ≥ temperatureChangeMin. */
  readonly temperatureChangeMax?: number;
  /**
   * Drive: for `"series"` the RMS voltage across the tank, for `"parallel"` the RMS tank voltage
   * [V], > 0 (default 1, so currents read per volt).
   */
  readonly driveVoltageRms?: number;
  /** For `"series"`: the fixed drive frequency [Hz], > 0 (default: the nominal resonant frequency). */
  readonly driveFrequency?: number;
  /** `"uniform"` within ±tolerance (default) or `"normal"` with the tolerance taken as 3σ. */
  readonly distribution?: "uniform" | "normal";
  /** Number of samples, integer in [1, 1e7] (default 100 000). */
  readonly samples?: number;
  /** Seed of the generator, an integer (default 1); equal seeds give identical results. */
  readonly seed?: number;
}

/**
 * Summary statistics of one Monte Carlo output (percentiles by linear interpolation between
 * order statistics, the "type 7" rule).
 *
 * @category Tolerances
 */
export interface ToleranceStatistics {
  /** Mean. */
  readonly mean: number;
  /** Sample standard deviation. */
  readonly standardDeviation: number;
  /** Smallest sample. */
  readonly min: number;
  /** 1st percentile. */
  readonly p1: number;
  /** 5th percentile. */
  readonly p5: number;
  /** Median. */
  readonly p50: number;
  /** 95th percentile. */
  readonly p95: number;
  /** 99th percentile. */
  readonly p99: number;
  /** Largest sample. */
  readonly max: number;
}

/**
 * Result of {@link tankToleranceAnalysis}.
 *
 * @category Tolerances
 */
export interface TankToleranceAnalysis {
  /** Samples drawn. */
  readonly samples: number;
  /** Samples that had a resonance and enter the statistics (all, for the series tank). */
  readonly resonantSamples: number;
  /** Resonant frequency at nominal values [Hz]. */
  readonly nominalFrequency: number;
  /** Tank current at nominal values [A]. */
  readonly nominalTankCurrentRms: number;
  /** Statistics of the resonant frequency [Hz]: undamped for the series tank, zero-phase for the parallel tank. */
  readonly frequency: ToleranceStatistics;
  /**
   * Statistics of the tank current [A]: for the series tank the RMS current at the fixed drive
   * voltage and frequency; for the parallel tank the RMS capacitor (circulating) current at the
   * tank voltage and its own zero-phase frequency.
   */
  readonly tankCurrentRms: ToleranceStatistics;
}

/** splitmix32: scrambles a 32-bit state; used to seed the main generator. */
function splitmix32(state: number): number {
  let z = (state + 0x9e3779b9) | 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return (z ^ (z >>> 16)) >>> 0;
}

/**
 * xoshiro128** (Blackman & Vigna 2018) with 32-bit words, seeded through splitmix32; `next()`
 * gives doubles in [0, 1) with 32 random bits.
 */
class Xoshiro128 {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(seed: number) {
    this.s0 = splitmix32(seed);
    this.s1 = splitmix32(this.s0 ^ 0x6a09e667);
    this.s2 = splitmix32(this.s1 ^ 0xbb67ae85);
    this.s3 = splitmix32(this.s2 ^ 0x3c6ef372);
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1;
  }

  next(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5), 7), 9) >>> 0;
    const t = this.s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3, 11);
    return result / 4294967296;
  }
}

/** Standard normal deviates by the Box–Muller transform, two per pair of uniforms. */
class NormalDeviates {
  private spare = 0;
  private hasSpare = false;

  constructor(private readonly uniform: Xoshiro128) {}

  next(): number {
    if (this.hasSpare) {
      this.hasSpare = false;
      return this.spare;
    }
    // 1 − u avoids log(0).
    const r = Math.sqrt(-2 * Math.log(1 - this.uniform.next()));
    const theta = 2 * Math.PI * this.uniform.next();
    this.spare = r * Math.sin(theta);
    this.hasSpare = true;
    return r * Math.cos(theta);
  }
}

function rotl(x: number, k: number): number {
  return (x << k) | (x >>> (32 - k));
}

/**
 * Monte Carlo of a tank's resonant frequency and current with component tolerances and
 * temperature coefficients. Each sample draws independent relative deviations
 * $\delta_L, \delta_C, \delta_R$ (uniform in ±tolerance, or normal with σ = tolerance/3) and one common
 * temperature change $\Delta T$ (uniform in [min, max]):
 *
 * $$
 * L = L_0(1 + \delta_L)(1 + \alpha_L\Delta T),\quad C = C_0(1 + \delta_C)(1 + \alpha_C\Delta T),\quad
 * R = R_0(1 + \delta_R)(1 + \alpha_R\Delta T)
 * $$
 *
 * Series tank: $f = 1/(2\pi\sqrt{LC})$, $I = V/|R + j(\omega L - 1/(\omega C))|$ at the fixed drive
 * frequency. Parallel tank: $f = f_0\sqrt{1 - R^2C/L}$ (samples with $R^2C/L \ge 1$ have no
 * resonance and are left out, counted in `resonantSamples`), $I_C = \omega C V$.
 * The generator is xoshiro128** seeded through splitmix32: the same seed gives the same result
 * on every platform.
 *
 * @param options - see {@link TankToleranceOptions}
 * @returns the {@link TankToleranceAnalysis} (Hz, A)
 * @throws {@link InputError} when a value is out of its domain, or (parallel tank) when no sample
 * has a zero-phase resonance.
 * Validity: independent component deviations, one common temperature; linear temperature
 * coefficients.
 * Accuracy: sampling error of a percentile ≈ √(p(1−p)/n)/density; with the uniform
 * distribution and zero tolerance on R the frequency percentiles match the exact distribution
 * of $1/\sqrt{(1+\delta_L)(1+\delta_C)}$ within 0.2 % at 1e5 samples (tested).
 * 1e6 samples take about 0.2 s.
 * @see D. Blackman and S. Vigna, "Scrambled linear pseudorandom number generators", ACM Trans.
 * Math. Software 47(4), 2021 (xoshiro128**); R. J. Hyndman and Y. Fan, "Sample quantiles in
 * statistical packages", The American Statistician 50(4), 1996 (definition 7).
 * @example
 * ```ts
 * import { tankToleranceAnalysis } from "fluxwright";
 * const mc = tankToleranceAnalysis({ inductance: 10e-6, capacitance: 1e-6, resistance: 0.1, inductanceTolerance: 0.05, capacitanceTolerance: 0.1, samples: 20000, seed: 7 });
 * console.log(mc.frequency.p5 < mc.nominalFrequency && mc.nominalFrequency < mc.frequency.p95); // true
 * ```
 * @category Tolerances
 */
export function tankToleranceAnalysis(options: TankToleranceOptions): TankToleranceAnalysis {
  const where = "tankToleranceAnalysis";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TOLERANCE_FIELDS);
  const topology = options.topology === undefined ? "series" : requireOneOf(where, "topology", options.topology, ["series", "parallel"] as const);
  const L0 = requirePositive(where, "inductance", options.inductance, "H");
  const C0 = requirePositive(where, "capacitance", options.capacitance, "F");
  const R0 = requirePositive(where, "resistance", options.resistance, "Ω");
  const tolL = requireInRange(where, "inductanceTolerance", options.inductanceTolerance, "", 0, 1, "[)");
  const tolC = requireInRange(where, "capacitanceTolerance", options.capacitanceTolerance, "", 0, 1, "[)");
  const tolR = options.resistanceTolerance === undefined ? 0 : requireInRange(where, "resistanceTolerance", options.resistanceTolerance, "", 0, 1, "[)");
  const aL = options.inductanceTemperatureCoefficient === undefined ? 0 : requireFinite(where, "inductanceTemperatureCoefficient", options.inductanceTemperatureCoefficient, "1/K");
  const aC = options.capacitanceTemperatureCoefficient === undefined ? 0 : requireFinite(where, "capacitanceTemperatureCoefficient", options.capacitanceTemperatureCoefficient, "1/K");
  const aR = options.resistanceTemperatureCoefficient === undefined ? 0 : requireFinite(where, "resistanceTemperatureCoefficient", options.resistanceTemperatureCoefficient, "1/K");
  const tMin = options.temperatureChangeMin === undefined ? 0 : requireFinite(where, "temperatureChangeMin", options.temperatureChangeMin, "K");
  const tMax = options.temperatureChangeMax === undefined ? tMin : requireFinite(where, "temperatureChangeMax", options.temperatureChangeMax, "K");
  if (tMax < tMin) throw new InputError(where, "temperatureChangeMax", tMax, "K", `a finite number ≥ temperatureChangeMin (${tMin})`);
  for (const [name, alpha] of [["inductanceTemperatureCoefficient", aL], ["capacitanceTemperatureCoefficient", aC], ["resistanceTemperatureCoefficient", aR]] as const) {
    if (!(1 + alpha * tMin > 0 && 1 + alpha * tMax > 0)) {
      throw new InputError(where, name, alpha, "1/K", "small enough that 1 + α·ΔT > 0 over the temperature range");
    }
  }
  const voltage = options.driveVoltageRms === undefined ? 1 : requirePositive(where, "driveVoltageRms", options.driveVoltageRms, "V");
  const nominalOmega0 = 1 / Math.sqrt(L0 * C0);
  const driveOmega =
    options.driveFrequency === undefined ? nominalOmega0 : 2 * Math.PI * requirePositive(where, "driveFrequency", options.driveFrequency, "Hz");
  const distribution = options.distribution === undefined ? "uniform" : requireOneOf(where, "distribution", options.distribution, ["uniform", "normal"] as const);
  const n = options.samples === undefined ? 100_000 : requireInteger(where, "samples", options.samples, 1);
  if (n > 1e7) throw new InputError(where, "samples", n, "", "an integer ≤ 10000000");
  const seedValue = options.seed === undefined ? 1 : options.seed;
  if (typeof seedValue !== "number" || !Number.isInteger(seedValue)) throw new InputError(where, "seed", seedValue, "", "an integer");

  const twoPi = 2 * Math.PI;
  let nominalFrequency: number;
  let nominalCurrent: number;
  if (topology === "series") {
    nominalFrequency = nominalOmega0 / twoPi;
    nominalCurrent = voltage / Math.hypot(R0, driveOmega * L0 - 1 / (driveOmega * C0));
  } else {
    const x = 1 - (R0 * R0 * C0) / L0;
    if (!(x > 0)) throw new InputError(where, "resistance", R0, "Ω", `a finite number < √(L/C) = ${Math.sqrt(L0 / C0)} for a parallel tank to resonate`);
    const w = nominalOmega0 * Math.sqrt(x);
    nominalFrequency = w / twoPi;
    nominalCurrent = w * C0 * voltage;
  }

  const uniform = new Xoshiro128(seedValue | 0);
  const gauss = new NormalDeviates(uniform);
  const normal = distribution === "normal";
  // Uniform: δ = tol·(2u − 1); normal: δ = (tol/3)·z. A component with zero tolerance draws nothing.
  const scaleL = normal ? tolL / 3 : tolL;
  const scaleC = normal ? tolC / 3 : tolC;
  const scaleR = normal ? tolR / 3 : tolR;
  const frequencies = new Float64Array(n);
  const currents = new Float64Array(n);
  const span = tMax - tMin;
  const isSeries = topology === "series";
  let kept = 0;
  for (let k = 0; k < n; k++) {
    const dT = span === 0 ? tMin : tMin + span * uniform.next();
    const dL = scaleL === 0 ? 0 : scaleL * (normal ? gauss.next() : 2 * uniform.next() - 1);
    const dC = scaleC === 0 ? 0 : scaleC * (normal ? gauss.next() : 2 * uniform.next() - 1);
    const dR = scaleR === 0 ? 0 : scaleR * (normal ? gauss.next() : 2 * uniform.next() - 1);
    // A normal deviate beyond −100 % is clipped to a tiny positive value (physically meaningless tails).
    const L = L0 * Math.max(1e-9, 1 + dL) * (1 + aL * dT);
    const C = C0 * Math.max(1e-9, 1 + dC) * (1 + aC * dT);
    const R = R0 * Math.max(1e-9, 1 + dR) * (1 + aR * dT);
    if (isSeries) {
      frequencies[kept] = 1 / (twoPi * Math.sqrt(L * C));
      const x = driveOmega * L - 1 / (driveOmega * C);
      currents[kept] = voltage / Math.sqrt(R * R + x * x);
      kept++;
    } else {
      const x = 1 - (R * R * C) / L;
      if (x > 0) {
        const w = Math.sqrt(x / (L * C));
        frequencies[kept] = w / twoPi;
        currents[kept] = w * C * voltage;
        kept++;
      }
    }
  }
  if (kept === 0) throw new InputError(where, "resistance", R0, "Ω", "small enough that some samples resonate");
  return {
    samples: n,
    resonantSamples: kept,
    nominalFrequency,
    nominalTankCurrentRms: nominalCurrent,
    frequency: summariseSamples(frequencies, kept),
    tankCurrentRms: summariseSamples(currents, kept),
  };
}
