/**
 * Ranking a heater search: the screened candidates scored against the goal, the finalists
 * re-solved by the full study, and the parts of a search (shards) combined into one result.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { specificHeatAt } from "../materials/index.js";
import { formatQuantity } from "../units/index.js";
import type { HeaterConductor, HeaterDescription } from "./description.js";
import { coilProperties, heaterOperatingPoint } from "./operating-point.js";
import type { SearchPlan } from "./optimise-plan.js";
import type { Feasible, GroupResult } from "./optimise-screen.js";
import type { HeaterCandidate, HeaterOptimisation } from "./optimise-types.js";
import { readHeaterDescription } from "./read-description.js";
import { studyHeater } from "./study-heater.js";
import { summarise } from "./summary.js";
import type { HeaterSummary } from "./summary.js";

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
export function finishSearch(description: HeaterDescription, plan: SearchPlan, groups: readonly GroupResult[]): HeaterOptimisation {
  return combineParts(plan, [searchPart(description, plan, groups, 0)]);
}
