/**
 * The plan of a heater search: the goal checked against the base description and the search
 * laid out (turns, E-series capacitances, conductors, frequencies, limits) as plain data for the
 * workers.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys } from "../core/index.js";
import { renamedOption } from "../core/renamed.js";
import { parseQuantity } from "../units/index.js";
import { E12, E24 } from "../tank/index.js";
import type { HeaterConductor, HeaterDescription, QuantityInput } from "./description.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import { readHeaterDescription } from "./read-description.js";
import type { HeaterGoal, HeaterLimits } from "./optimise-types.js";

/** The function named in the messages. */
export const WHERE = "optimiseHeater";

/** A goal's quantity (number or text) as a positive SI number, `null` when absent. */
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
export const LIMIT_CHECKS: readonly [Exclude<keyof HeaterLimits, "maxVoltage" | "maxCurrent">, string, string, (p: HeaterOperatingPoint) => number, "max" | "min"][] = [
  ["tankVoltagePeak", "V", "tank voltage above limit", (p) => p.tankVoltagePeak, "max"],
  ["coilCurrentRms", "A", "coil current above limit", (p) => p.coilCurrentRms, "max"],
  ["supplyCurrent", "A", "supply current above limit", (p) => p.supplyCurrent, "max"],
  ["capacitorVoltageRms", "V", "capacitor voltage above limit", (p) => p.capacitorVoltageRms, "max"],
  ["capacitorCurrentRms", "A", "capacitor current above limit", (p) => p.capacitorCurrentRms, "max"],
  ["switchVoltagePeak", "V", "switch voltage above limit", (p) => p.switchVoltagePeak, "max"],
  ["minFrequency", "Hz", "frequency below limit", (p) => p.frequency, "min"],
  ["maxFrequency", "Hz", "frequency above limit", (p) => p.frequency, "max"],
];


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
