/**
 * Splitting a design search across machines: each machine runs one shard of the coils of
 * {@link optimiseHeater}'s search, and the shards' outputs merge into the result of one run.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys } from "../core/index.js";
import type { HeaterConductor, HeaterDescription } from "./description.js";
import { combineParts, finalistCount, groupItems, optimiseTask, searchPart, searchPlan } from "./optimize-heater.js";
import type { GroupResult, HeaterGoal, HeaterOptimisation, SearchPart } from "./optimize-heater.js";
import type { HeaterSummary } from "./summary.js";
import { checkShard, shardRange } from "./sweep-heater.js";
import type { HeaterShard } from "./sweep-heater.js";
import { checkPoolOptions, runPool } from "./worker-pool.js";
import type { HeaterPoolOptions } from "./worker-pool.js";

const WHERE = "optimiseHeaterShard";
const MERGE = "mergeHeaterOptimisationShards";

/**
 * Options of {@link optimiseHeaterShard}: which shard, and optionally the pool options.
 *
 * @category Heater study
 */
export interface HeaterSearchShardOptions extends Partial<HeaterPoolOptions> {
  /** The part of the search's coils to run (see {@link HeaterShard}). */
  readonly shard: HeaterShard;
}

/**
 * A finalist of one shard: a candidate re-solved with the full study, with the keys that place
 * it in the whole search.
 *
 * @category Heater study
 */
export interface HeaterShardFinalist {
  /**
   * Screening score (|ln(achieved / target)| on the screening tier), the coil's index in the
   * whole search, and the candidate's place among that coil's feasible candidates: the order in
   * which one run picks its finalists.
   */
  readonly rank: readonly [number, number, number];
  /** Score on the finalist's own study, |ln(achieved / target)|; `null` when the target temperature is not reached. */
  readonly score: number | null;
  /** Heat-up time [s] for a time goal; `null` for a power goal or when the target is not reached. */
  readonly timeToTarget: number | null;
  /** Turns. */
  readonly turns: number;
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** The conductor. */
  readonly conductor: HeaterConductor;
  /** Switching frequency [Hz] for fixed-frequency series inverters, else `null`. */
  readonly switchingFrequency: number | null;
  /** Headline numbers of the finalist's own study. */
  readonly summary: HeaterSummary;
  /** The complete description of this design. */
  readonly description: HeaterDescription;
}

/**
 * The output of one shard of a search: plain data (numbers, strings, arrays), written as JSON
 * between machines without loss (every number is finite and JSON keeps every bit of a finite
 * double). {@link mergeHeaterOptimisationShards} combines the shards.
 *
 * @category Heater study
 */
export interface HeaterOptimisationShard {
  /** Fingerprint of the search (description, goal and the search space laid out from them): shards of different searches are told apart. */
  readonly search: string;
  /** Which shard. */
  readonly shard: HeaterShard;
  /** Coils in the whole search (each coil is one conductor, turns and frequency over every capacitance). */
  readonly coils: number;
  /** The coils of this shard, `[start, end)` in the search's order. */
  readonly range: readonly [number, number];
  /** How many designs the search keeps. */
  readonly keep: number;
  /** Whether the goal is a part power or a heat-up time. */
  readonly goal: "power" | "time";
  /** Candidates evaluated in this shard. */
  readonly evaluated: number;
  /** Candidates within every limit in this shard. */
  readonly feasible: number;
  /** Rejections: reason, count, and where the reason first occurred (coil index, place in that coil's list). */
  readonly rejections: readonly (readonly [string, number, number, number])[];
  /** This shard's best candidates by screening score, each re-solved with the full study. */
  readonly finalists: readonly HeaterShardFinalist[];
  /** The search's warnings (the same in every shard). */
  readonly warnings: readonly string[];
}

/** 32-bit FNV-1a of a text, as 8 hex digits. */
function fnv1a(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, "0");
}

/**
 * Runs one shard of {@link optimiseHeater}'s search: the coils (conductor × turns × frequency,
 * in the search's order) are split into `shard.count` contiguous parts as
 * {@link HeaterShard} describes, and this call evaluates part `shard.index` over every
 * capacitance, ranks its feasible candidates on the screening tier and re-solves its own best
 * ones with {@link studyHeater} (as many as the whole search re-solves: twice `keep`, or for a
 * time goal `max(4·keep, 20)` with the heat-up). Every finalist of the whole search is among
 * the finalists of its shard, so {@link mergeHeaterOptimisationShards} of all the shards gives
 * the result of one run, bit for bit. Each shard repeats the base design's study (for the
 * screening calibration), so `n` shards cost about `n` base studies more than one run.
 *
 * Without `workers` the shard runs on the calling thread and returns its output; with
 * `workers` (see {@link HeaterPoolOptions}) it runs on a pool and returns a promise of the same
 * output.
 *
 * @param description - the base design
 * @param goal - target, limits, search space and how many designs to keep (as for {@link optimiseHeater})
 * @param options - `shard` `{ index, count }` (1 ≤ index ≤ count ≤ 10⁶); optionally `workers`, `onProgress`, `signal`, `workerUrl`
 * @returns the shard's output (a promise of it with `workers`)
 * @throws {@link InputError} for everything {@link optimiseHeater} refuses, a bad or missing
 * `shard`, bad pool options and unknown option keys
 * @example
 * ```ts
 * import { mergeHeaterOptimisationShards, optimiseHeater, optimiseHeaterShard } from "fluxwright";
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
 * const goal = { targetPower: "1 kW", limits: { minFrequency: "20 kHz" }, keep: 3 };
 * const parts = [1, 2, 3].map((index) => optimiseHeaterShard(base, goal, { shard: { index, count: 3 } }));
 * const merged = mergeHeaterOptimisationShards(parts);
 * console.log(JSON.stringify(merged) === JSON.stringify(optimiseHeater(base, goal))); // true
 * ```
 * @category Heater study
 */
export function optimiseHeaterShard(description: HeaterDescription, goal: HeaterGoal, options: HeaterSearchShardOptions & HeaterPoolOptions): Promise<HeaterOptimisationShard>;
export function optimiseHeaterShard(description: HeaterDescription, goal: HeaterGoal, options: HeaterSearchShardOptions): HeaterOptimisationShard;
export function optimiseHeaterShard(description: HeaterDescription, goal: HeaterGoal, options: HeaterSearchShardOptions): HeaterOptimisationShard | Promise<HeaterOptimisationShard> {
  if (typeof options !== "object" || options === null || Array.isArray(options)) throw new InputError(WHERE, "options", options, "", "an object { shard, workers? }");
  const pooled = options.workers !== undefined;
  if (pooled) checkPoolOptions(WHERE, options as HeaterPoolOptions, ["shard"]);
  else requireKnownKeys(WHERE, "options", options, ["shard"]);
  if (options.shard === undefined) throw new InputError(WHERE, "options.shard", undefined, "", "an object { index, count }");
  const shard = checkShard(WHERE, options.shard) as HeaterShard;
  const plan = searchPlan(description, goal);
  const items = groupItems(plan);
  const [start, end] = shardRange(items.length, shard);
  const mine = items.slice(start, end);
  const finish = (groups: readonly GroupResult[]): HeaterOptimisationShard => {
    const part: SearchPart = searchPart(description, plan, groups, start);
    return {
      search: fnv1a(JSON.stringify(plan)),
      shard: { index: shard.index, count: shard.count },
      coils: items.length,
      range: [start, end],
      keep: plan.keep,
      goal: plan.targetTime !== null ? "time" : "power",
      evaluated: part.evaluated,
      feasible: part.feasible,
      rejections: part.rejections,
      finalists: part.finalists,
      warnings: part.warnings,
    };
  };
  if (!pooled) return finish(optimiseTask(plan, mine) as GroupResult[]);
  const pool = checkPoolOptions(WHERE, options as HeaterPoolOptions, ["shard"]);
  return (async () => {
    const groups: GroupResult[] = [];
    for await (const g of runPool({ kind: "optimise", context: plan }, mine, mine.length, optimiseTask, pool, WHERE, plan.capacitances.length)) groups.push(g as GroupResult);
    return finish(groups);
  })();
}

const isCount = (v: unknown): v is number => typeof v === "number" && Number.isInteger(v) && v >= 0;

/** Checks the identity fields of one shard output (not its numbers, which are passed through). */
function checkShardOutput(k: number, s: unknown): HeaterOptimisationShard {
  const path = `shards[${k}]`;
  if (typeof s !== "object" || s === null || Array.isArray(s)) throw new InputError(MERGE, path, s, "", "the output of optimiseHeaterShard");
  const o = s as Partial<HeaterOptimisationShard>;
  if (typeof o.search !== "string") throw new InputError(MERGE, `${path}.search`, o.search, "", "the search fingerprint of optimiseHeaterShard");
  const shard = checkShard(MERGE, o.shard, `${path}.shard`);
  if (shard === undefined) throw new InputError(MERGE, `${path}.shard`, o.shard, "", "an object { index, count }");
  if (!isCount(o.coils)) throw new InputError(MERGE, `${path}.coils`, o.coils, "", "an integer ≥ 0");
  const [start, end] = shardRange(o.coils, shard);
  if (!Array.isArray(o.range) || o.range[0] !== start || o.range[1] !== end) throw new InputError(MERGE, `${path}.range`, o.range, "", `[${start}, ${end}] (shard ${shard.index}/${shard.count} of ${o.coils} coils)`);
  if (!isCount(o.keep) || o.keep < 1) throw new InputError(MERGE, `${path}.keep`, o.keep, "", "an integer ≥ 1");
  if (o.goal !== "power" && o.goal !== "time") throw new InputError(MERGE, `${path}.goal`, o.goal, "", '"power" or "time"');
  if (!isCount(o.evaluated)) throw new InputError(MERGE, `${path}.evaluated`, o.evaluated, "", "an integer ≥ 0");
  if (!isCount(o.feasible)) throw new InputError(MERGE, `${path}.feasible`, o.feasible, "", "an integer ≥ 0");
  if (!Array.isArray(o.rejections)) throw new InputError(MERGE, `${path}.rejections`, o.rejections, "", "an array");
  if (!Array.isArray(o.finalists)) throw new InputError(MERGE, `${path}.finalists`, o.finalists, "", "an array");
  o.finalists.forEach((f: unknown, i) => {
    const rank = (f as { rank?: unknown } | null)?.rank;
    if (!Array.isArray(rank) || rank.length !== 3 || !rank.every((x) => typeof x === "number" && Number.isFinite(x))) {
      throw new InputError(MERGE, `${path}.finalists[${i}].rank`, rank, "", "three finite numbers");
    }
  });
  if (!Array.isArray(o.warnings)) throw new InputError(MERGE, `${path}.warnings`, o.warnings, "", "an array");
  return o as HeaterOptimisationShard;
}

/**
 * Merges the outputs of every shard of one search (see {@link optimiseHeaterShard}), in any
 * order, into the result {@link optimiseHeater} gives in one run, bit for bit: the counts add
 * up, the rejection reasons keep the order in which one run meets them, and the finalists are
 * the best by screening score among the shards' finalists, ranked by their own studies. No
 * study runs here: merging takes microseconds.
 *
 * @param shards - the outputs of shards 1 … n of one search, each exactly once, in any order
 * @returns the search's result
 * @throws {@link InputError} when `shards` is empty or not an array, a shard is missing or
 * repeated, the shards are from different searches (description, goal or shard count differ),
 * or a shard's identity fields (`search`, `shard`, `coils`, `range`, `keep`, `goal`, counts,
 * finalists' `rank`) are malformed
 * @example
 * ```ts
 * import { mergeHeaterOptimisationShards, optimiseHeaterShard } from "fluxwright";
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
 * const goal = { targetPower: "1 kW", keep: 2 };
 * // written as JSON by each task of a job array, read back here
 * const texts = [2, 1].map((index) => JSON.stringify(optimiseHeaterShard(base, goal, { shard: { index, count: 2 } })));
 * const r = mergeHeaterOptimisationShards(texts.map((t) => JSON.parse(t)));
 * console.log(r.best.length, r.evaluated > 0); // 2 true
 * ```
 * @category Heater study
 */
export function mergeHeaterOptimisationShards(shards: readonly HeaterOptimisationShard[]): HeaterOptimisation {
  if (!Array.isArray(shards) || shards.length === 0) throw new InputError(MERGE, "shards", shards, "", "a non-empty array of optimiseHeaterShard outputs");
  const checked = (shards as readonly unknown[]).map((s, k) => checkShardOutput(k, s));
  const ref = checked[0] as HeaterOptimisationShard;
  const count = ref.shard.count;
  const seen = new Map<number, number>();
  checked.forEach((s, k) => {
    const differs =
      s.search !== ref.search ? "search (description or goal)"
      : s.shard.count !== count ? "shard count"
      : s.coils !== ref.coils ? "number of coils"
      : s.keep !== ref.keep || s.goal !== ref.goal ? "goal"
      : null;
    if (differs !== null) throw new InputError(MERGE, `shards[${k}]`, s.shard, "", `a shard of the same search as shards[0] (its ${differs} differs)`);
    const other = seen.get(s.shard.index);
    if (other !== undefined) throw new InputError(MERGE, `shards[${k}].shard.index`, s.shard.index, "", `a shard not given twice (shards[${other}] is shard ${s.shard.index}/${count} too)`);
    seen.set(s.shard.index, k);
  });
  const missing = Array.from({ length: count }, (_, i) => i + 1).filter((i) => !seen.has(i));
  if (missing.length > 0) throw new InputError(MERGE, "shards", `${checked.length} shards`, "", `all ${count} shards of the search (missing: ${missing.join(", ")})`);
  const ordered = [...checked].sort((a, b) => a.shard.index - b.shard.index);
  const plan = { targetTime: ref.goal === "time" ? 1 : null, keep: ref.keep };
  const parts: SearchPart[] = ordered.map((s) => ({
    evaluated: s.evaluated,
    feasible: s.feasible,
    rejections: s.rejections,
    finalists: s.finalists.slice(0, finalistCount(plan)),
    warnings: s.warnings,
  }));
  return combineParts(plan, parts);
}
