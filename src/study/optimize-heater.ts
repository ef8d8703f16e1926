/**
 * Searching turns, capacitance, conductor and frequency for a design that meets a power or
 * heat-up-time goal within limits.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys } from "../core/index.js";
import type { HeaterDescription } from "./description.js";
import { groupItems, searchPlan, WHERE } from "./optimise-plan.js";
import { evaluateGroup, optimiseTask } from "./optimise-screen.js";
import type { GroupResult } from "./optimise-screen.js";
import { finishSearch } from "./optimise-rank.js";
import type { HeaterGoal, HeaterOptimisation, HeaterSearchOptions } from "./optimise-types.js";
import { checkPoolOptions, runPool } from "./worker-pool.js";
import type { HeaterPoolOptions } from "./worker-pool.js";

export type { HeaterLimits, HeaterSearchSpace, HeaterGoal, HeaterCandidate, HeaterRejection, HeaterOptimisation, HeaterSearchOptions } from "./optimise-types.js";
// the search's parts, for the shards and the worker tasks
export { groupItems, searchPlan } from "./optimise-plan.js";
export type { GroupItem, SearchPlan } from "./optimise-plan.js";
export { optimiseTask } from "./optimise-screen.js";
export type { GroupResult } from "./optimise-screen.js";
export { combineParts, finalistCount, searchPart } from "./optimise-rank.js";
export type { PartFinalist, SearchPart } from "./optimise-rank.js";

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
