/**
 * Screening the candidates of a heater search: each coil of the plan over every capacitance,
 * solved by continuation with the closed-form coil tier and checked against the limits.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { HeaterConductor, HeaterDescription } from "./description.js";
import { coilProperties, heaterOperatingPoint } from "./operating-point.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import { LIMIT_CHECKS } from "./optimise-plan.js";
import type { GroupItem, SearchPlan } from "./optimise-plan.js";
import { readHeaterDescription } from "./read-description.js";

/** A feasible candidate. */
export interface Feasible {
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

/** Evaluates one coil over every capacitance of the plan. */
export function evaluateGroup(plan: SearchPlan, [c, turns, frequency]: GroupItem): GroupResult {
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
