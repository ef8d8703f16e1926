/**
 * Searching turns, capacitance, conductor and frequency for a design that meets a power or
 * heat-up-time goal within limits.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys } from "../core/index.js";
import { renamedOption } from "../core/renamed.js";
import { specificHeatAt } from "../materials/index.js";
import { formatQuantity, parseQuantity } from "../units/index.js";
import { E12, E24 } from "../tank/index.js";
import type { HeaterConductor, HeaterDescription, QuantityInput } from "./description.js";
import { coilProperties, heaterOperatingPoint } from "./operating-point.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import { readHeaterDescription } from "./read-description.js";
import { studyHeater } from "./study-heater.js";
import { summarise } from "./summary.js";
import { checkPoolOptions, runPool } from "./worker-pool.js";
import type { HeaterPoolOptions } from "./worker-pool.js";
import type { HeaterSummary } from "./summary.js";

const WHERE = "optimiseHeater";

/**
 * Upper (and for frequency, lower) limits a design must respect. All optional.
 *
 * @category Heater study
 */
export interface HeaterLimits {
  /** Largest peak tank (coil) voltage [V]. */
  readonly tankVoltagePeak?: QuantityInput;
  /** Largest RMS coil current [A]. */
  readonly coilCurrentRms?: QuantityInput;
  /** Largest DC supply current [A]. */
  readonly supplyCurrent?: QuantityInput;
  /** Largest RMS capacitor-bank voltage [V]. */
  readonly capacitorVoltageRms?: QuantityInput;
  /** Largest RMS capacitor-bank current [A]. */
  readonly capacitorCurrentRms?: QuantityInput;
  /** Largest peak switch voltage [V]. */
  readonly switchVoltagePeak?: QuantityInput;
  /** Lowest operating frequency [Hz] (e.g. 20 kHz to stay above hearing). */
  readonly minFrequency?: QuantityInput;
  /** Highest operating frequency [Hz]. */
  readonly maxFrequency?: QuantityInput;
  /**
   * Former short form of `tankVoltagePeak` [V]; giving both is refused.
   *
   * @deprecated Use `tankVoltagePeak`; this name goes at 1.0.
   */
  readonly maxVoltage?: QuantityInput;
  /**
   * Former short form of `coilCurrentRms` [A]; giving both is refused.
   *
   * @deprecated Use `coilCurrentRms`; this name goes at 1.0.
   */
  readonly maxCurrent?: QuantityInput;
}

/**
 * Where {@link optimiseHeater} looks. Each list replaces the base description's value; absent
 * lists get a default range around it.
 *
 * @category Heater study
 */
export interface HeaterSearchSpace {
  /** Turn counts to try (integers ≥ 1); default from half to twice the base turns. */
  readonly turns?: readonly number[];
  /** IEC 60063 series for the capacitance: `"E12"` (default) or `"E24"`. */
  readonly capacitanceSeries?: "E12" | "E24";
  /** Smallest capacitance [F]; default a quarter of the base. */
  readonly minCapacitance?: QuantityInput;
  /** Largest capacitance [F]; default four times the base. */
  readonly maxCapacitance?: QuantityInput;
  /** Conductors to try; default the base conductor only. */
  readonly conductors?: readonly HeaterConductor[];
  /** Switching frequencies to try [Hz] (fixed-frequency series inverters only); default the base frequency. */
  readonly frequencies?: readonly QuantityInput[];
}

/**
 * What {@link optimiseHeater} aims for: exactly one of `targetPower` or `targetTime`.
 *
 * @category Heater study
 */
export interface HeaterGoal {
  /** Power into the cold part [W]. */
  readonly targetPower?: QuantityInput;
  /** Heat-up time from start to target temperature [s]. */
  readonly targetTime?: QuantityInput;
  /** Limits every reported design respects. */
  readonly limits?: HeaterLimits;
  /** The search space. */
  readonly search?: HeaterSearchSpace;
  /** How many of the best designs to return, 1 … 50 (default 5). */
  readonly keep?: number;
}

/**
 * One design found by {@link optimiseHeater}.
 *
 * @category Heater study
 */
export interface HeaterCandidate {
  /** Turns. */
  readonly turns: number;
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** The conductor. */
  readonly conductor: HeaterConductor;
  /** Switching frequency [Hz] for fixed-frequency series inverters, else `null`. */
  readonly switchingFrequency: number | null;
  /** Headline numbers (time to target for the finalists of a time goal). */
  readonly summary: HeaterSummary;
  /** Distance from the goal, |ln(achieved / target)| (0 is a perfect hit). */
  readonly score: number;
  /** The complete description of this design, ready for {@link studyHeater}. */
  readonly description: HeaterDescription;
}

/**
 * Why candidates were rejected: one entry per reason, with a count.
 *
 * @category Heater study
 */
export interface HeaterRejection {
  /** The reason, e.g. `"tank voltage above limit"` or the description problem. */
  readonly reason: string;
  /** How many candidates failed for it (a candidate may count under several limits). */
  readonly count: number;
}

/**
 * The result of {@link optimiseHeater}.
 *
 * @category Heater study
 */
export interface HeaterOptimisation {
  /** Candidates evaluated. */
  readonly evaluated: number;
  /** Candidates within every limit. */
  readonly feasible: number;
  /** The best designs, closest to the goal first. */
  readonly best: readonly HeaterCandidate[];
  /** Why the others failed, most common first. */
  readonly rejected: readonly HeaterRejection[];
  /**
   * What makes the ranking misleading, in words (empty when nothing does): e.g. a part-power
   * goal for a power-tracking inverter, whose tank power the searched variables do not change.
   */
  readonly warnings: readonly string[];
}

function quantity(path: string, value: QuantityInput | undefined, unit: string): number | null {
  if (value === undefined) return null;
  let v: unknown = value;
  if (typeof value === "string") {
    try {
      v = parseQuantity(value, unit);
    } catch (e) {
      // name the field the caller wrote, not the parser's own parameter
      if (e instanceof InputError) throw new InputError(WHERE, path, value, unit, `a finite number > 0 or a quantity text (${e.expected})`);
      throw e;
    }
  }
  if (typeof v !== "number" || !(v > 0) || !Number.isFinite(v)) throw new InputError(WHERE, path, value, unit, "a finite number > 0 or a quantity text");
  return v;
}

/** E-series values between min and max. */
function seriesValues(series: readonly number[], min: number, max: number): number[] {
  const out: number[] = [];
  for (let decade = Math.floor(Math.log10(min)) - 1; decade <= Math.ceil(Math.log10(max)); decade++) {
    for (const m of series) {
      const v = Number((m * 10 ** decade).toPrecision(3));
      if (v >= min * (1 - 1e-9) && v <= max * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

/** The limit checks: [reason, value of the operating point, limit]. */
const LIMIT_CHECKS: readonly [Exclude<keyof HeaterLimits, "maxVoltage" | "maxCurrent">, string, string, (p: HeaterOperatingPoint) => number, "max" | "min"][] = [
  ["tankVoltagePeak", "V", "tank voltage above limit", (p) => p.tankVoltagePeak, "max"],
  ["coilCurrentRms", "A", "coil current above limit", (p) => p.coilCurrentRms, "max"],
  ["supplyCurrent", "A", "supply current above limit", (p) => p.supplyCurrent, "max"],
  ["capacitorVoltageRms", "V", "capacitor voltage above limit", (p) => p.capacitorVoltageRms, "max"],
  ["capacitorCurrentRms", "A", "capacitor current above limit", (p) => p.capacitorCurrentRms, "max"],
  ["switchVoltagePeak", "V", "switch voltage above limit", (p) => p.switchVoltagePeak, "max"],
  ["minFrequency", "Hz", "frequency below limit", (p) => p.frequency, "min"],
  ["maxFrequency", "Hz", "frequency above limit", (p) => p.frequency, "max"],
];

/**
 * Options of {@link optimiseHeater} that do not change its result.
 *
 * @category Heater study
 */
export interface HeaterSearchOptions {
  /** Called now and then with candidates evaluated so far and the total (for progress displays). */
  readonly onProgress?: (evaluated: number, total: number) => void;
}

/**
 * Searches turns, capacitance (IEC 60063 E12/E24 values), conductor and (for a fixed-frequency
 * series inverter) switching frequency for designs that come closest to a target part power or
 * heat-up time while respecting voltage, current and frequency limits. Every candidate is a full
 * operating point of {@link studyHeater}'s composition screened with the closed-form coil tier
 * (Rosa's inductance, the current-sheet resistance, the finite-coil coupling: frequency up to
 * 9 % low, see `CLOSED_FORM_FIELD_REFERENCE_TOLERANCE`), its part power scaled by the base
 * design's ratio of the two tiers; the finalists (twice `keep`, or for a time goal at least 20
 * ranked by an energy estimate) are then re-solved by
 * {@link studyHeater} with the coil-impedance model, re-ranked on those numbers, and reported
 * with them (for a time goal through the full electro-thermal heat-up). Returns the best few
 * designs and, for the others, why they failed (counts per reason). A design near the edge of a
 * limit may pass screening and exceed the limit by the screening error; the reported numbers
 * are the finalist's own.
 *
 * Performance: about 10⁴ candidates in a few seconds for solenoid coils (one core); pancake
 * coils cost more per candidate (the Dodd–Deeds integral at each fixed-point step).
 *
 * @param description - the base design
 * @param goal - target, limits, search space and how many designs to keep
 * With `options.workers` (see {@link HeaterPoolOptions}) the candidates run on that many worker
 * threads and the call returns a promise of the same result, identical bit for bit for any
 * number of workers (the unit of work is one coil, whose capacitances are solved in order, each
 * from the previous solution, exactly as on one thread); `onProgress` then receives
 * `{ done, total, elapsed, eta }` and `signal` cancels the search (the promise rejects with the
 * signal's reason). The finalists of a time goal run their heat-up on the calling thread.
 *
 * @param description - the base design
 * @param goal - target, limits, search space and how many designs to keep
 * @param options - `onProgress(evaluated, total)` (optional); or pool options with `workers`
 * @returns the best designs and the rejection counts (a promise of them with `workers`)
 * @throws {@link InputError} when the base description is invalid, the goal has neither or both
 * targets, a limit or search value is malformed, or `options` is not an object
 * @example
 * ```ts
 * import { optimiseHeater } from "fluxwright";
 * import type { HeaterDescription } from "fluxwright";
 * const base: HeaterDescription = {
 *   supply: { kind: "battery", voltage: "48 V" },
 *   inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
 *   coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6,
 *     conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
 *   capacitor: { capacitance: "4 µF" },
 *   part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm",
 *     height: "30 mm", targetTemperature: "120 °C" },
 * };
 * const r = optimiseHeater(base, { targetPower: "1 kW", limits: { minFrequency: "20 kHz" }, keep: 3 });
 * console.log(r.best.length <= 3, r.evaluated > 0); // true true
 * ```
 * @category Heater study
 */
export function optimiseHeater(description: HeaterDescription, goal: HeaterGoal, options: HeaterPoolOptions): Promise<HeaterOptimisation>;
export function optimiseHeater(description: HeaterDescription, goal: HeaterGoal, options?: HeaterSearchOptions): HeaterOptimisation;
export function optimiseHeater(description: HeaterDescription, goal: HeaterGoal, options: HeaterSearchOptions | HeaterPoolOptions = {}): HeaterOptimisation | Promise<HeaterOptimisation> {
  if (typeof options !== "object" || options === null || Array.isArray(options)) throw new InputError(WHERE, "options", options, "", "an object");
  if ((options as { workers?: unknown }).workers !== undefined) {
    const pool = checkPoolOptions(WHERE, options as HeaterPoolOptions);
    const plan = searchPlan(description, goal);
    const items = groupItems(plan);
    return (async () => {
      const groups: GroupResult[] = [];
      for await (const g of runPool({ kind: "optimise", context: plan }, items, items.length, optimiseTask, pool, WHERE, plan.capacitances.length)) groups.push(g as GroupResult);
      return finishSearch(description, plan, groups);
    })();
  }
  requireKnownKeys(WHERE, "options", options, ["onProgress"]);
  const onProgress = (options as HeaterSearchOptions).onProgress;
  if (onProgress !== undefined && typeof onProgress !== "function") {
    throw new InputError(WHERE, "options.onProgress", onProgress, "", "a function");
  }
  const plan = searchPlan(description, goal);
  const items = groupItems(plan);
  const total = items.length * plan.capacitances.length;
  const progressStep = Math.max(1, Math.floor(total / 20));
  let nextProgress = progressStep;
  let evaluated = 0;
  const groups = items.map((item) => {
    const g = evaluateGroup(plan, item);
    evaluated += plan.capacitances.length;
    if (onProgress !== undefined && evaluated >= nextProgress) {
      nextProgress = (Math.floor(evaluated / progressStep) + 1) * progressStep;
      onProgress(evaluated, total);
    }
    return g;
  });
  return finishSearch(description, plan, groups);
}

/** Everything the candidates of a search need, checked; plain data (it goes to the workers). */
export interface SearchPlan {
  readonly raw: Record<string, unknown> & { coil: Record<string, unknown>; capacitor: Record<string, unknown>; inverter: Record<string, unknown> };
  readonly limits: readonly (readonly [string, number])[];
  readonly turnsList: readonly number[];
  readonly capacitances: readonly number[];
  readonly conductors: readonly HeaterConductor[];
  readonly frequencies: readonly (number | null)[];
  readonly targetPower: number | null;
  readonly targetTime: number | null;
  readonly keep: number;
}

/** One coil of the search: conductor (index into the plan's list), turns, frequency. */
export type GroupItem = readonly [number, number, number | null];

/** A feasible candidate. */
interface Feasible {
  readonly turns: number;
  readonly capacitance: number;
  readonly conductor: number;
  readonly frequency: number | null;
  readonly point: HeaterOperatingPoint;
  readonly variant: HeaterDescription;
}

/** What one coil's capacitances gave: rejections (reason, count, in order of first use) and the feasible candidates. */
export interface GroupResult {
  readonly rejections: readonly (readonly [string, number])[];
  readonly feasible: readonly Feasible[];
}

/** Checks the goal against the base description and lays out the search (see optimiseHeater's `@throws`). */
export function searchPlan(description: HeaterDescription, goal: HeaterGoal): SearchPlan {
  const base = readHeaterDescription(description);
  if (typeof goal !== "object" || goal === null) throw new InputError(WHERE, "goal", goal, "", "an object");
  const targetPower = quantity("goal.targetPower", goal.targetPower, "W");
  const targetTime = quantity("goal.targetTime", goal.targetTime, "s");
  if ((targetPower === null) === (targetTime === null)) {
    throw new InputError(WHERE, "goal", goal, "", "an object with exactly one of targetPower or targetTime");
  }
  const keep = goal.keep ?? 5;
  if (!Number.isInteger(keep) || keep < 1 || keep > 50) throw new InputError(WHERE, "goal.keep", keep, "", "an integer in [1, 50]");
  // unknown keys are typos: reject them rather than ignore a limit the caller meant
  const known = (path: string, value: object | undefined, keys: readonly string[]): void => {
    if (value === undefined) return;
    requireKnownKeys(WHERE, path, value, keys);
  };
  known("goal", goal, ["targetPower", "targetTime", "limits", "search", "keep"]);
  known("goal.limits", goal.limits, [...LIMIT_CHECKS.map((c) => c[0]), "maxVoltage", "maxCurrent"]);
  known("goal.search", goal.search, ["turns", "capacitanceSeries", "minCapacitance", "maxCapacitance", "conductors", "frequencies"]);
  const limits = new Map<string, number>();
  for (const [key, unit] of LIMIT_CHECKS.map((c) => [c[0], c[1]] as const)) {
    const v = quantity(`goal.limits.${key}`, goal.limits?.[key], unit);
    if (v !== null) limits.set(key, v);
  }
  // deprecated short forms: maxVoltage = tankVoltagePeak, maxCurrent = coilCurrentRms (one name each)
  for (const [former, name, unit] of [["maxVoltage", "tankVoltagePeak", "V"], ["maxCurrent", "coilCurrentRms", "A"]] as const) {
    const v = quantity(`goal.limits.${former}`, goal.limits === undefined ? undefined : (renamedOption(WHERE, "goal.limits", goal.limits, name, former) as QuantityInput | undefined), unit);
    if (v !== null) limits.set(name, v);
  }
  const search = goal.search ?? {};
  const raw = structuredClone(description) as unknown as SearchPlan["raw"];
  const turnsList = search.turns ?? Array.from({ length: 2 * base.coil.turns - Math.max(1, Math.round(base.coil.turns / 2)) + 1 }, (_, i) => Math.max(1, Math.round(base.coil.turns / 2)) + i);
  turnsList.forEach((t, i) => {
    if (!Number.isInteger(t) || t < 1) throw new InputError(WHERE, `goal.search.turns[${i}]`, t, "", "an integer ≥ 1");
  });
  const cMin = quantity("goal.search.minCapacitance", search.minCapacitance, "F") ?? base.capacitor.capacitance / 4;
  const cMax = quantity("goal.search.maxCapacitance", search.maxCapacitance, "F") ?? base.capacitor.capacitance * 4;
  if (!(cMax >= cMin)) throw new InputError(WHERE, "goal.search.maxCapacitance", search.maxCapacitance, "F", `≥ minCapacitance = ${cMin}`);
  const capacitances = seriesValues(search.capacitanceSeries === "E24" ? E24 : E12, cMin, cMax);
  const conductors: readonly HeaterConductor[] = search.conductors ?? [raw.coil.conductor as HeaterConductor];
  const fixedSeries = base.inverter.kind === "voltage-fed-series" && base.inverter.control === "fixed";
  const frequencies: (number | null)[] = fixedSeries
    ? (search.frequencies ?? [base.inverter.kind === "voltage-fed-series" ? (base.inverter.frequency ?? 0) : 0]).map((f, i) => quantity(`goal.search.frequencies[${i}]`, f, "Hz") as number)
    : [null];
  return { raw, limits: [...limits.entries()], turnsList, capacitances, conductors, frequencies, targetPower, targetTime, keep };
}

/** The coils of the search, in the order of the loops conductor → turns → frequency. */
export function groupItems(plan: SearchPlan): GroupItem[] {
  const items: GroupItem[] = [];
  for (let c = 0; c < plan.conductors.length; c++) {
    for (const turns of plan.turnsList) {
      for (const frequency of plan.frequencies) items.push([c, turns, frequency]);
    }
  }
  return items;
}

/** Evaluates one coil over every capacitance of the plan. */
function evaluateGroup(plan: SearchPlan, [c, turns, frequency]: GroupItem): GroupResult {
  const { raw } = plan;
  const limits = new Map(plan.limits);
  const conductor = plan.conductors[c] as HeaterConductor;
  const rejections = new Map<string, number>();
  const reject = (reason: string, count = 1): void => {
    rejections.set(reason, (rejections.get(reason) ?? 0) + count);
  };
  const feasible: Feasible[] = [];
  // the capacitance does not change the coil: read the coil once per (conductor, turns, frequency)
  const coilVariant = { ...raw, coil: { ...raw.coil, turns, conductor } } as Record<string, unknown>;
  if (frequency !== null) coilVariant.inverter = { ...raw.inverter, frequency };
  let props;
  try {
    // screening with the closed-form tier; the finalists are re-solved with the coil-impedance model
    props = coilProperties(readHeaterDescription(coilVariant), "closed-form");
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    // group by field and rule, without the candidate's own numbers
    const rule = e.expected.replace(/\s*=\s*[-+0-9.e]+/g, "").replace(/\s+/g, " ");
    reject(`invalid design: ${e.parameter} must be ${rule}`, plan.capacitances.length);
    return { rejections: [...rejections.entries()], feasible };
  }
  // continuation across capacitances of one coil: each candidate starts from the previous solution
  let previous: HeaterOperatingPoint | null = null;
  for (const capacitance of plan.capacitances) {
    const variant = { ...coilVariant, capacitor: { ...raw.capacitor, capacitance } } as unknown as HeaterDescription;
    let point: HeaterOperatingPoint;
    try {
      const d = readHeaterDescription(variant);
      point = heaterOperatingPoint(d, d.part.startTemperature, true, props, previous);
      previous = point;
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      reject(`no operating point: ${e.where}: ${e.parameter} must be ${e.expected.replace(/\s*=\s*[-+0-9.e]+/g, "")}`);
      continue;
    }
    let ok = true;
    for (const [key, , reason, value, kind] of LIMIT_CHECKS) {
      const limit = limits.get(key);
      if (limit === undefined) continue;
      const v = value(point);
      if (kind === "max" ? v > limit : v < limit) {
        reject(reason);
        ok = false;
      }
    }
    if (ok) feasible.push({ turns, capacitance, conductor: c, frequency, point, variant });
  }
  return { rejections: [...rejections.entries()], feasible };
}

/** The pool's task runner for searches: one {@link GroupResult} per coil. */
export function optimiseTask(context: unknown, items: readonly unknown[]): unknown[] {
  return items.map((item) => evaluateGroup(context as SearchPlan, item as GroupItem));
}

/**
 * A finalist of one part of a search: its screening rank key, its own study's numbers and the
 * candidate as it would be reported. Plain data (it goes through JSON between machines).
 */
export interface PartFinalist {
  /** Screening score, then the coil's index in the whole search, then the candidate's place among that coil's feasible ones. */
  readonly rank: readonly [number, number, number];
  /** The finalist's score on its own study's numbers; `null` when not finite (a time goal whose target is not reached). */
  readonly score: number | null;
  /** Heat-up time of a time goal's finalist, `null` when the target is not reached or for a power goal. */
  readonly timeToTarget: number | null;
  readonly turns: number;
  readonly capacitance: number;
  readonly conductor: HeaterConductor;
  readonly switchingFrequency: number | null;
  readonly summary: HeaterSummary;
  readonly description: HeaterDescription;
}

/** What one contiguous part of the coils of a search gives (the whole search is one part). */
export interface SearchPart {
  readonly evaluated: number;
  readonly feasible: number;
  /** Rejection reason, count, and where it first occurred: coil index in the whole search, place in that coil's list. */
  readonly rejections: readonly (readonly [string, number, number, number])[];
  /** This part's best candidates by screening score (as many as the whole search re-solves), each re-solved. */
  readonly finalists: readonly PartFinalist[];
  readonly warnings: readonly string[];
}

/** How many screened candidates a search re-solves with the full study. */
export function finalistCount(plan: Pick<SearchPlan, "targetTime" | "keep">): number {
  return plan.targetTime !== null ? Math.max(4 * plan.keep, 20) : 2 * plan.keep;
}

/**
 * Screens and re-solves the finalists of the coils `groups` (coil `firstGroup` of the search
 * first): a part's finalists include every finalist of the whole search that lies in the part,
 * since a candidate's rank within the part is at most its rank in the whole search.
 */
export function searchPart(description: HeaterDescription, plan: SearchPlan, groups: readonly GroupResult[], firstGroup: number): SearchPart {
  const base = readHeaterDescription(description);
  const { targetPower, targetTime } = plan;
  const rejections = new Map<string, [string, number, number, number]>();
  const feasible: Feasible[] = [];
  const where: (readonly [number, number])[] = [];
  groups.forEach((g, k) => {
    g.rejections.forEach(([reason, count], position) => {
      const seen = rejections.get(reason);
      if (seen === undefined) rejections.set(reason, [reason, count, firstGroup + k, position]);
      else seen[1] += count;
    });
    g.feasible.forEach((f, position) => {
      feasible.push(f);
      where.push([firstGroup + k, position]);
    });
  });
  const evaluated = groups.length * plan.capacitances.length;
  // the heat-up-time estimate: energy to heat the part over the cold part power (losses ignored)
  const cMid = specificHeatAt(base.part.material, (base.part.startTemperature + base.part.targetTemperature) / 2);
  const energyEstimate = (mass: number): number => mass * cMid * (base.part.targetTemperature - base.part.startTemperature);

  // rank: Float64Array of scores
  const scores = new Float64Array(feasible.length);
  const baseStudy = studyHeater(description, { heatUp: false, temperatureScan: false, impedanceSweep: false });
  const mass = baseStudy.part.mass;
  // calibration of the screening tier: the base design's part power with the coil-impedance
  // model over the closed form's (the closed form's bias, e.g. for parts shorter than the coil,
  // is shared by the candidates); 1 when the base design has no closed-form operating point
  let calibration = 1;
  try {
    const dBase = baseStudy.description;
    const screened = heaterOperatingPoint(dBase, dBase.part.startTemperature, true, coilProperties(dBase, "closed-form"));
    if (screened.losses.part > 0 && baseStudy.operating.losses.part > 0) calibration = baseStudy.operating.losses.part / screened.losses.part;
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
  }
  for (let i = 0; i < feasible.length; i++) {
    const p = (feasible[i] as Feasible).point.losses.part * calibration;
    scores[i] = targetPower !== null ? Math.abs(Math.log(Math.max(p, 1e-300) / targetPower)) : Math.abs(Math.log(energyEstimate(mass) / Math.max(p, 1e-300) / (targetTime as number)));
  }
  // a stable sort: equal scores keep the search's order
  const order = Array.from(scores.keys()).sort((a, b) => (scores[a] as number) - (scores[b] as number));
  const finalists: PartFinalist[] = [];
  for (const i of order.slice(0, finalistCount(plan))) {
    const f = feasible[i] as Feasible;
    const s = studyHeater(f.variant, { heatUp: targetTime !== null, radialHeatUp: false, temperatureScan: false, impedanceSweep: false });
    const t = s.heatUp?.timeToTarget ?? null;
    // the finalist's own study (coil-impedance model) gives its numbers and its score
    const p = s.operating.losses.part;
    const score = targetTime !== null ? (t === null ? null : Math.abs(Math.log(t / targetTime))) : Math.abs(Math.log(Math.max(p, 1e-300) / (targetPower as number)));
    const [group, position] = where[i] as readonly [number, number];
    finalists.push({
      rank: [scores[i] as number, group, position],
      score,
      timeToTarget: t,
      turns: f.turns,
      capacitance: f.capacitance,
      conductor: plan.conductors[f.conductor] as HeaterConductor,
      switchingFrequency: f.frequency,
      summary: summarise(s.operating, s.emptyCoil, t),
      description: f.variant,
    });
  }
  const warnings: string[] = [];
  if (targetPower !== null && base.inverter.kind === "voltage-fed-series" && base.inverter.control === "power-tracking" && base.inverter.targetPower !== null) {
    warnings.push(
      `the goal is a part power of ${formatQuantity(targetPower, "W", { digits: 4 })}, but the inverter holds the tank power at inverter.targetPower = ${formatQuantity(base.inverter.targetPower, "W", { digits: 4 })}; ` +
        "the searched turns and capacitance change only the efficiency, so the designs closest to the goal are the least efficient ones. " +
        "Set inverter.targetPower to the goal divided by the efficiency you expect, and search for a heat-up time (or compare efficiencies) instead.",
    );
  }
  return { evaluated, feasible: feasible.length, rejections: [...rejections.values()], finalists, warnings };
}

/** Lexicographic order of rank keys. */
function byRank(a: PartFinalist, b: PartFinalist): number {
  for (let k = 0; k < 3; k++) {
    const d = (a.rank[k] as number) - (b.rank[k] as number);
    if (d !== 0) return d;
  }
  return 0;
}

/**
 * Combines the parts of a search (in any order) into its result: the whole search's finalists
 * are the best by screening score among the parts' finalists, ranked as one run ranks them.
 */
export function combineParts(plan: Pick<SearchPlan, "targetTime" | "keep">, parts: readonly SearchPart[]): HeaterOptimisation {
  const firstSeen = new Map<string, [number, number, number]>();
  for (const part of parts) {
    for (const [reason, count, group, position] of part.rejections) {
      const seen = firstSeen.get(reason);
      if (seen === undefined) firstSeen.set(reason, [count, group, position]);
      else {
        seen[0] += count;
        if (group < seen[1] || (group === seen[1] && position < seen[2])) {
          seen[1] = group;
          seen[2] = position;
        }
      }
    }
  }
  // reasons in the order the whole search met them first
  const rejections = new Map<string, number>(
    [...firstSeen.entries()].sort((a, b) => a[1][1] - b[1][1] || a[1][2] - b[1][2]).map(([reason, [count]]) => [reason, count]),
  );
  const finalists = parts.flatMap((p) => p.finalists).sort(byRank).slice(0, finalistCount(plan));
  let chosen = finalists;
  if (plan.targetTime !== null) {
    const missed = finalists.filter((f) => f.timeToTarget === null).length;
    if (missed > 0) rejections.set("target temperature not reached", (rejections.get("target temperature not reached") ?? 0) + missed);
    chosen = finalists.filter((f) => f.timeToTarget !== null);
  }
  chosen = [...chosen].sort((a, b) => (a.score ?? Infinity) - (b.score ?? Infinity));
  const best: HeaterCandidate[] = chosen.slice(0, plan.keep).map((f) => ({
    turns: f.turns,
    capacitance: f.capacitance,
    conductor: f.conductor,
    switchingFrequency: f.switchingFrequency,
    summary: f.summary,
    score: f.score ?? Infinity,
    description: f.description,
  }));
  const rejected = [...rejections.entries()].map(([reason, count]) => ({ reason, count })).sort((a, b) => b.count - a.count);
  let evaluated = 0;
  let feasible = 0;
  for (const p of parts) {
    evaluated += p.evaluated;
    feasible += p.feasible;
  }
  return { evaluated, feasible, best, rejected, warnings: [...(parts[0]?.warnings ?? [])] };
}

/** Ranks the feasible candidates of every coil (in the search's order) and picks the best. */
function finishSearch(description: HeaterDescription, plan: SearchPlan, groups: readonly GroupResult[]): HeaterOptimisation {
  return combineParts(plan, [searchPart(description, plan, groups, 0)]);
}

/**
 * Former spelling of {@link optimiseHeater} (the public names use British spelling).
 *
 * @deprecated Use `optimiseHeater`; this name goes at 1.0.
 * @category Heater study
 */
export const optimizeHeater: typeof optimiseHeater = optimiseHeater;

/**
 * Former spelling of {@link HeaterOptimisation}.
 *
 * @deprecated Use `HeaterOptimisation`; this name goes at 1.0.
 * @category Heater study
 */
export type HeaterOptimization = HeaterOptimisation;
