/**
 * Switching-frequency sweep of a fixed-component LCC converter: the exact steady state at each
 * frequency, continued from the previous point's solution.
 *
 * @packageDocumentation
 */
import {
  requireArrayLike,
  requireKnownKeys,
  requireObject,
  requireOneOf,
  requirePositive,
  type Caution,
  type ValidityNote,
} from "../core/index.js";
import { capacitiveOperatingPointOf } from "./lcc-capacitive-filter.js";
import { lccFirstHarmonic, lccSteadyState } from "./lcc-kernel.js";
import {
  checkParallelConverterCircuit,
  INDUCTIVE_TESTED,
  tankVoltageCautions,
  testedDomainValidity,
  type ParallelConverterCircuit,
} from "./parallel-converter.js";
import type { StateAndGainStart } from "./periodic-newton.js";
import { hardSwitchingCaution } from "./steady-state-notes.js";

/**
 * Options of {@link lccFrequencySweep}: the components of {@link LccOperatingPointOptions}
 * without the switching frequency, the frequencies and the output filter.
 *
 * @category Converters
 */
export interface LccFrequencySweepOptions {
  /** `"half"`: the tank sees ±V_in/2; `"full"`: ±V_in. */
  readonly bridge: "half" | "full";
  /** DC input voltage V_in [V], > 0. */
  readonly inputVoltage: number;
  /** Transformer turns ratio n = primary/secondary turns, > 0. */
  readonly turnsRatio: number;
  /** Series resonant inductance L_r [H], > 0. */
  readonly resonantInductance: number;
  /** Series resonant capacitance C_s [F], > 0. */
  readonly seriesCapacitance: number;
  /** Parallel capacitance C_p across the transformer primary [F], > 0. */
  readonly parallelCapacitance: number;
  /** Load resistance R_load [Ω], > 0. */
  readonly loadResistance: number;
  /** Switching frequencies [Hz], each > 0, 1 to 100 000 of them, in the order to solve them (a monotone order continues best). */
  readonly frequencies: ArrayLike<number>;
  /**
   * `"inductive"` (default): the rectifier feeds an L–C filter ({@link lccOperatingPoint});
   * `"capacitive"`: it feeds the output capacitor directly ({@link lccOperatingPointCapacitiveFilter}).
   */
  readonly outputFilter?: "inductive" | "capacitive";
}

/**
 * One solved point of {@link LccFrequencySweep.points}.
 *
 * @category Converters
 */
export interface LccSweepPointSolved {
  /** Switching frequency f_s [Hz]. */
  readonly switchingFrequency: number;
  /** Always true: the steady state was found. */
  readonly solved: true;
  /** f_n = f_s/f_r. */
  readonly normalisedFrequency: number;
  /** Gain M = n V_out / V_b. */
  readonly gain: number;
  /** Output voltage [V]. */
  readonly outputVoltage: number;
  /** Output power [W]. */
  readonly outputPower: number;
  /** RMS resonant current [A]. */
  readonly resonantCurrentRms: number;
  /** Peak resonant current [A]. */
  readonly resonantCurrentPeak: number;
  /** Resonant current at turn-off, positive when lagging (ZVS possible) [A]. */
  readonly turnOffCurrent: number;
  /** True when turnOffCurrent > 0. */
  readonly zeroVoltageSwitching: boolean;
  /** Peak AC voltage of the series capacitor [V]. */
  readonly seriesCapacitorVoltagePeak: number;
  /** Peak voltage of the parallel capacitor [V]. */
  readonly parallelCapacitorVoltagePeak: number;
  /** Mode sequence of the positive half period (as the single-point functions name it). */
  readonly conductionMode: string;
  /** The first-harmonic gain at the same point (the model of the single-point function). */
  readonly firstHarmonicGain: number;
}

/**
 * A point of {@link LccFrequencySweep.points} where no steady state of the assumed modes was
 * found: no numbers, only the reason.
 *
 * @category Converters
 */
export interface LccSweepPointUnsolved {
  /** Switching frequency f_s [Hz]. */
  readonly switchingFrequency: number;
  /** Always false: no consistent periodic solution was found. */
  readonly solved: false;
  /** f_n = f_s/f_r. */
  readonly normalisedFrequency: number;
  /** Why the point has no values. */
  readonly reason: string;
}

/**
 * A point of the sweep: test `solved` before reading the values.
 *
 * @category Converters
 */
export type LccSweepPoint = LccSweepPointSolved | LccSweepPointUnsolved;

/**
 * The result of {@link lccFrequencySweep}.
 *
 * @category Converters
 */
export interface LccFrequencySweep {
  /** The output filter the points were solved for. */
  readonly outputFilter: "inductive" | "capacitive";
  /** f_r = 1/(2π√(L_r C_s)) [Hz]. */
  readonly resonantFrequency: number;
  /** Q = √(L_r/C_s)/R_ac, R_ac = π²n²R/8 (inductive) or 8n²R/π² (capacitive). */
  readonly qualityFactor: number;
  /** A = C_p/C_s. */
  readonly capacitanceRatio: number;
  /** One entry per requested frequency, in the given order. */
  readonly points: readonly LccSweepPoint[];
  /** Number of points without a steady state. */
  readonly unsolvedCount: number;
  /** Hazards over the sweep: each voltage caution at its worst point, hard switching with its frequency span. */
  readonly cautions: readonly Caution[];
  /** Points outside the tested domain, and points without a steady state. */
  readonly validity: readonly ValidityNote[];
}

const KEYS = [
  "bridge", "inputVoltage", "turnsRatio", "resonantInductance", "seriesCapacitance", "parallelCapacitance", "loadResistance",
  "frequencies", "outputFilter",
] as const;

interface PointValues {
  readonly point: LccSweepPointSolved;
  readonly cautions: readonly Caution[];
  readonly validity: readonly ValidityNote[];
}

/**
 * The exact steady state of a fixed-component LCC converter over a list of switching
 * frequencies: gain, output voltage and power, resonant current, turn-off current and
 * zero-voltage switching, capacitor voltages and the conduction mode at each point. Each point
 * is the periodic solution of {@link lccOperatingPoint} (inductive output filter) or
 * {@link lccOperatingPointCapacitiveFilter} (capacitive), solved by the same kernels; each
 * point starts Newton's method from the previous solved point's state and gain
 * (continuation) and falls back to the single-point start when that fails. A point where no periodic solution of the
 * assumed circuit modes is found is returned as `{ solved: false, reason }` — no numbers, so
 * that a gap cannot be plotted as a value — and counted in `unsolvedCount`; the sweep goes on
 * from the last solved point.
 *
 * Definitions: $f_r = 1/(2\pi\sqrt{L_rC_s})$, $A = C_p/C_s$, $M = nV_\mathrm{out}/V_b$ (as
 * {@link lccOperatingPoint}).
 *
 * @param options - {@link LccFrequencySweepOptions} (V, H, F, Ω, Hz)
 * @returns the {@link LccFrequencySweep}: one point per frequency (V, A, W)
 * @throws {@link InputError} for a non-positive or non-finite component value or frequency,
 *   an empty or over-long frequency list, an unknown option key or option value
 * @remarks Accuracy: each solved point is the single-point function's steady state (within
 * 1e-6 of the time-domain simulation over their tested domains; the capacitive sweep is also
 * checked point by point against the simulated 105–240 kHz sweep of fixture
 * prc-lcc-capacitive-steady-state.json). Continuation changes only the start of the iteration,
 * not the converged values (equal to the single-point values to 1e-9, tested). Validity: as
 * the single-point functions; a `validity` note counts the points outside their tested domain.
 * @see {@link lccOperatingPoint} and {@link lccOperatingPointCapacitiveFilter} for the models
 *   and their published sources.
 * @example
 * ```ts
 * import { lccFrequencySweep } from "fluxwright";
 * const sweep = lccFrequencySweep({
 *   bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6,
 *   seriesCapacitance: 25e-9, parallelCapacitance: 25e-9, loadResistance: 12,
 *   frequencies: [120e3, 150e3, 200e3], outputFilter: "capacitive",
 * });
 * const p = sweep.points[1];
 * console.log(p?.solved === true ? p.outputVoltage.toFixed(3) : "none"); // 95.931
 * ```
 * @category Converters
 */
export function lccFrequencySweep(options: LccFrequencySweepOptions): LccFrequencySweep {
  const where = "lccFrequencySweep";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, KEYS);
  const filter = options.outputFilter === undefined ? "inductive" : requireOneOf(where, "outputFilter", options.outputFilter, ["inductive", "capacitive"] as const);
  const { circuit } = checkParallelConverterCircuit(where, options, true, "none");
  const list = requireArrayLike(where, "frequencies", options.frequencies, "Hz", 1);
  const frequencies = new Float64Array(list.length);
  for (let i = 0; i < list.length; i++) frequencies[i] = requirePositive(where, `frequencies[${i}]`, list[i], "Hz");

  const { resonantInductance: lr, seriesCapacitance: cs, parallelCapacitance: cp, turnsRatio: n, loadResistance: rl } = circuit;
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cs));
  const rac = filter === "inductive" ? (Math.PI * Math.PI * n * n * rl) / 8 : (8 * n * n * rl) / (Math.PI * Math.PI);
  const q = Math.sqrt(lr / cs) / rac;

  const points: LccSweepPoint[] = [];
  const voltageWorst = new Map<string, Caution>();
  let hardFirst = -1;
  let hardLast = -1;
  let hardCount = 0;
  let hardCaution: Caution | null = null;
  let outside = 0;
  let outsideNote: ValidityNote | null = null;
  let unsolved = 0;
  const continued: { start?: StateAndGainStart } = {};
  for (let i = 0; i < frequencies.length; i++) {
    const fs = frequencies[i] ?? 0;
    const values = filter === "capacitive" ? capacitivePoint(circuit, fs, continued) : inductivePoint(circuit, fs, continued);
    if (values === null) {
      unsolved++;
      points.push({
        switchingFrequency: fs,
        solved: false,
        normalisedFrequency: fs / fr,
        reason: `no periodic steady state of the ${filter}-filter circuit modes was found at f_n = ${(fs / fr).toPrecision(4)}`,
      });
      continue;
    }
    points.push(values.point);
    for (const c of values.cautions) {
      if (c.code === "hard-switching") {
        hardCount++;
        if (hardFirst < 0) hardFirst = fs;
        hardLast = fs;
        hardCaution ??= c;
        continue;
      }
      const key = `${c.code}|${c.message.replace(/[0-9.]+ V/g, "")}`;
      const old = voltageWorst.get(key);
      if (old === undefined || Math.abs(c.value ?? 0) > Math.abs(old.value ?? 0)) voltageWorst.set(key, c);
    }
    if (values.validity.length > 0) {
      outside++;
      outsideNote ??= values.validity[0] ?? null;
    }
  }
  const cautions: Caution[] = [...voltageWorst.values()];
  if (hardCaution !== null) {
    cautions.push({
      ...hardCaution,
      message: `${hardCount} of ${frequencies.length} points switch hard (turn-off current ≤ 0), between ${hardFirst.toPrecision(4)} Hz and ${hardLast.toPrecision(4)} Hz in the order given. ${hardCaution.message}`,
    });
  }
  const validity: ValidityNote[] = [];
  if (outsideNote !== null) validity.push({ code: outsideNote.code, message: `${outside} of ${frequencies.length} points: ${outsideNote.message}` });
  if (unsolved > 0) {
    validity.push({
      code: "no-steady-state",
      message: `${unsolved} of ${frequencies.length} points have no periodic steady state of the assumed circuit modes (points with solved: false); their values are not given.`,
    });
  }
  return { outputFilter: filter, resonantFrequency: fr, qualityFactor: q, capacitanceRatio: cp / cs, points, unsolvedCount: unsolved, cautions, validity };
}

function capacitivePoint(circuit: ParallelConverterCircuit, fs: number, continued: { start?: StateAndGainStart }): PointValues | null {
  const solved = capacitiveOperatingPointOf(circuit, fs, continued.start);
  if (solved === null) return null;
  continued.start = solved.solution;
  const op = solved.point;
  return {
    point: {
      switchingFrequency: fs,
      solved: true,
      normalisedFrequency: op.normalisedFrequency,
      gain: op.gain,
      outputVoltage: op.outputVoltage,
      outputPower: op.outputPower,
      resonantCurrentRms: op.resonantCurrentRms,
      resonantCurrentPeak: op.resonantCurrentPeak,
      turnOffCurrent: op.turnOffCurrent,
      zeroVoltageSwitching: op.zeroVoltageSwitching,
      seriesCapacitorVoltagePeak: op.seriesCapacitorVoltagePeak,
      parallelCapacitorVoltagePeak: op.parallelCapacitorVoltagePeak,
      conductionMode: op.conductionMode,
      firstHarmonicGain: op.firstHarmonic.gain,
    },
    cautions: op.cautions,
    validity: op.validity,
  };
}

const fha = new Float64Array(8);

/** The inductive-filter point from the kernel, scaled as {@link lccOperatingPoint} scales it. */
function inductivePoint(circuit: ParallelConverterCircuit, fs: number, continued: { start?: StateAndGainStart }): PointValues | null {
  const { bridgeVoltage: vb, turnsRatio: n, resonantInductance: lr, parallelCapacitance: cp, seriesCapacitance: cs, loadResistance: rl } = circuit;
  const a = cp / cs;
  const zp = Math.sqrt(lr / cp);
  const theta = (Math.PI / (2 * Math.PI * Math.sqrt(lr * cp))) / fs;
  const zeta = zp / (n * n * rl);
  const solution = lccSteadyState(a, zeta, theta, continued.start);
  if (solution === null) return null;
  continued.start = solution;
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cs));
  const fn = fs / fr;
  const q = Math.sqrt(lr / cs) / ((Math.PI * Math.PI * n * n * rl) / 8);
  const ib = vb / zp;
  const vout = (solution.gain * vb) / n;
  const turnOffCurrent = -solution.j0 * ib;
  const seriesPeak = solution.seriesPeak * vb;
  lccFirstHarmonic(a, zeta, theta, fha);
  const cautions = tankVoltageCautions(circuit.inputVoltage, solution.parallelRms * vb, seriesPeak);
  if (!(turnOffCurrent > 0)) cautions.push(hardSwitchingCaution(turnOffCurrent, " (capacitive operation, below the tank's zero-phase frequency)", "Raise the switching frequency."));
  const validity = testedDomainValidity(INDUCTIVE_TESTED, true, 0, fn, q, a);
  return {
    point: {
      switchingFrequency: fs,
      solved: true,
      normalisedFrequency: fn,
      gain: solution.gain,
      outputVoltage: vout,
      outputPower: (vout * vout) / rl,
      resonantCurrentRms: solution.resonantRms * ib,
      resonantCurrentPeak: solution.resonantPeak * ib,
      turnOffCurrent,
      zeroVoltageSwitching: turnOffCurrent > 0,
      seriesCapacitorVoltagePeak: seriesPeak,
      parallelCapacitorVoltagePeak: solution.parallelPeak * vb,
      conductionMode: solution.sequence,
      firstHarmonicGain: fha[3] ?? 0,
    },
    cautions,
    validity,
  };
}
