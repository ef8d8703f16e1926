/**
 * Sweeping one field of a heater description.
 *
 * Size: the sweep's checks, the rows' context for a pool (with the coil models handed to the
 * workers) and the public forms (table, promise, stream) with their documentation.
 *
 * @packageDocumentation
 */
import { InputError, nearestName, requireKnownKeys } from "../core/index.js";
import { HeaterDescriptionError, readHeaterDescription } from "./read-description.js";
import type { HeaterDescription, QuantityInput } from "./description.js";
import type { ReadHeaterDescriptionOptions } from "./read-description.js";
import { studyHeater } from "./study-heater.js";
import { checkPoolOptions, runPool } from "./worker-pool.js";
import type { HeaterPoolOptions } from "./worker-pool.js";
import { summarise } from "./summary.js";
import { cellModelKey, exportCellModels, importCellModels } from "./operating-point-cells.js";
import type { CellModelData } from "./operating-point-cells.js";
import { coilProperties } from "./operating-point-coil.js";
import type { HeaterSummary } from "./summary.js";

/**
 * What {@link sweepHeater} varies.
 *
 * @category Heater study
 */
export interface HeaterSweepSpec {
  /** Dotted path of a numeric field of the description, e.g. `"coil.turns"`, `"capacitor.capacitance"`, `"supply.voltage"`. */
  readonly field: string;
  /** The values to give it: SI numbers or text quantities (`"3.3 µF"`), at least one. */
  readonly values: readonly QuantityInput[];
  /** Also run the electro-thermal heat-up for each value (default `true`). */
  readonly heatUp?: boolean;
  /**
   * Read the description and the values as a study file is read (default `false`): a bare
   * number for a field with a dimension is refused (see {@link ReadHeaterDescriptionOptions}).
   */
  readonly requireUnits?: boolean;
}

/**
 * One row of a sweep table.
 *
 * @category Heater study
 */
export interface HeaterSweepRow {
  /** The value given to the field, as written. */
  readonly value: QuantityInput;
  /** The headline numbers, or `null` when the description was invalid with this value. */
  readonly summary: HeaterSummary | null;
  /** Number of cautions the study raised (0 when invalid). */
  readonly cautionCount: number;
  /** Why the row has no result (the description's problem, with field path), else `null`. */
  readonly problem: string | null;
}

/**
 * The result of {@link sweepHeater}.
 *
 * @category Heater study
 */
export interface HeaterSweep {
  /** The swept field's path. */
  readonly field: string;
  /** One row per value, in the order given. */
  readonly rows: readonly HeaterSweepRow[];
}

/** The problems of a description (empty when it reads). */
function problemsOf(description: unknown, options: ReadHeaterDescriptionOptions): readonly InputError[] {
  try {
    readHeaterDescription(description, options);
    return [];
  } catch (e) {
    if (e instanceof HeaterDescriptionError) return e.problems;
    throw e;
  }
}

/** A copy of the description with the field at `path` set to `value`. */
function setField(root: unknown, path: string, value: unknown): unknown {
  const copy = structuredClone(root) as Record<string, unknown>;
  const keys = path.split(".");
  let node: Record<string, unknown> = copy;
  for (const key of keys.slice(0, -1)) {
    const next = node[key];
    if (typeof next !== "object" || next === null || Array.isArray(next)) {
      throw new InputError("sweepHeater", "field", path, "", "the dotted path of a field of the description (its parent objects must exist)");
    }
    node = next as Record<string, unknown>;
  }
  const last = keys[keys.length - 1] as string;
  const current = node[last];
  if (current !== undefined && typeof current !== "number" && typeof current !== "string") {
    throw new InputError("sweepHeater", "field", path, "", "a numeric field (number or quantity text), not an object");
  }
  node[last] = value;
  return copy;
}

/** A sweep checked: what every row needs. */
interface CheckedSweep {
  readonly field: string;
  readonly values: readonly QuantityInput[];
  readonly heatUp: boolean;
  readonly requireUnits: boolean;
}

/** Checks the sweep and the base description (see {@link sweepHeater}'s `@throws`). */
function checkSweep(where: string, description: HeaterDescription, sweep: HeaterSweepSpec): CheckedSweep {
  if (typeof sweep !== "object" || sweep === null) throw new InputError(where, "sweep", sweep, "", "an object { field, values }");
  requireKnownKeys(where, "sweep", sweep, ["field", "values", "heatUp", "requireUnits"]);
  if (typeof sweep.field !== "string" || !/^[A-Za-z]\w*(\.[A-Za-z]\w*)*$/.test(sweep.field)) {
    throw new InputError(where, "field", sweep.field, "", "a dotted field path such as \"coil.turns\"");
  }
  const values: readonly QuantityInput[] = sweep.values;
  if (!Array.isArray(values) || values.length === 0) throw new InputError(where, "values", values, "", "a non-empty array");
  let firstNumber = -1;
  let firstString = -1;
  values.forEach((v, i) => {
    if (typeof v !== "number" && typeof v !== "string") throw new InputError(where, `values[${i}]`, v, "", "a number or a quantity text");
    if (typeof v === "number" && firstNumber < 0) firstNumber = i;
    if (typeof v === "string" && firstString < 0) firstString = i;
  });
  if (sweep.requireUnits !== undefined && typeof sweep.requireUnits !== "boolean") throw new InputError(where, "requireUnits", sweep.requireUnits, "", "a boolean");
  const requireUnits = sweep.requireUnits === true;
  // the base must be valid (otherwise every row would carry the same problem)
  readHeaterDescription(description, { requireUnits });
  studyHeater(description, { heatUp: false, temperatureScan: false, impedanceSweep: false });
  // a field the description does not have (a typo such as coil.turn) would fail every row: refuse
  // it. Whether the field is known, and whether a bare number lacks a unit there, depend only on
  // the field and on the value being a number or a text: the first of each kind tells.
  for (const i of [firstNumber, firstString].filter((k) => k >= 0).sort((a, b) => a - b)) {
    const value = values[i] as QuantityInput;
    const problems = problemsOf(setField(description, sweep.field, value), { requireUnits });
    for (const p of problems) {
      if (p.parameter !== sweep.field) continue;
      const known = /known fields: (.*)\)$/u.exec(p.expected)?.[1]?.split(", ");
      if (known !== undefined || p.expected.startsWith("absent")) {
        const parent = sweep.field.split(".").slice(0, -1).join(".");
        const near = known === undefined ? null : nearestName(sweep.field.split(".").pop() ?? "", known);
        const hint = near !== null ? ` (did you mean ${JSON.stringify(parent === "" ? near : `${parent}.${near}`)}?)` : known === undefined ? ` (${p.expected})` : ` (fields there: ${known.join(", ")})`;
        throw new InputError(where, "field", sweep.field, "", `a field of the description${hint}`);
      }
      if (p.expected.includes("a bare number has no unit")) throw new InputError(where, `values[${i}]`, value, "", p.expected);
    }
  }
  return { field: sweep.field, values, heatUp: sweep.heatUp !== false, requireUnits };
}

/** What a worker needs for the rows of a sweep. */
interface SweepContext {
  readonly description: HeaterDescription;
  readonly field: string;
  readonly heatUp: boolean;
  readonly requireUnits: boolean;
  /** The coil-impedance models the calling thread built for the base design (for workers: none on the calling thread). */
  readonly models?: readonly CellModelData[];
}

/**
 * The context of a sweep's rows; for workers, with the coil-impedance model of the base
 * design, which the calling thread built when it checked the sweep: each worker starts from it
 * instead of building it again (a cold thread spends most of its first study there), and
 * computes the same numbers it would have built itself.
 */
function sweepContext(description: HeaterDescription, c: CheckedSweep, workers: number): SweepContext {
  const context: SweepContext = { description, field: c.field, heatUp: c.heatUp, requireUnits: c.requireUnits };
  if (workers === 0) return context;
  return { ...context, models: sweepModels(description, c) };
}

/** Values sampled (evenly, first and last included) for the models a sweep shares. */
const MODEL_SAMPLES = 16;
/** Models the calling thread builds beyond the base design's, at most. */
const MODEL_BUILDS = 3;

/**
 * The coil-impedance models for the workers: the base design's (built when the sweep was
 * checked) and those that at least two of {@link MODEL_SAMPLES} sampled values share but the
 * base does not (a capacitance sweep crossing an octave of the model's band), built here by a
 * short study of one such value — once, instead of once per worker. A model used by a single
 * value (a coil geometry per value) is left to the worker that needs it.
 */
function sweepModels(description: HeaterDescription, c: CheckedSweep): CellModelData[] {
  const models = new Map<string, CellModelData>();
  const take = (variant: HeaterDescription): void => {
    const d = readHeaterDescription(variant, { requireUnits: c.requireUnits });
    for (const m of exportCellModels(d, coilProperties(d))) models.set(m.key, m);
  };
  take(description);
  const n = c.values.length;
  const samples = Math.min(n, MODEL_SAMPLES);
  const shared = new Map<string, { count: number; variant: HeaterDescription }>();
  for (let s = 0; s < samples; s++) {
    const i = samples === 1 ? 0 : Math.round((s * (n - 1)) / (samples - 1));
    const variant = setField(description, c.field, c.values[i]) as HeaterDescription;
    try {
      const d = readHeaterDescription(variant, { requireUnits: c.requireUnits });
      const key = cellModelKey(d, coilProperties(d));
      const seen = shared.get(key);
      shared.set(key, { count: (seen?.count ?? 0) + 1, variant: seen?.variant ?? variant });
    } catch (e) {
      // a value the description refuses: its row reports the problem
      if (!(e instanceof InputError)) throw e;
    }
  }
  const wanted = [...shared].filter(([key, v]) => v.count >= 2 && !models.has(key)).sort((a, b) => b[1].count - a[1].count);
  for (const [, { variant }] of wanted.slice(0, MODEL_BUILDS)) {
    try {
      studyHeater(variant, { heatUp: false, temperatureScan: false, impedanceSweep: false });
      take(variant);
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
    }
  }
  return [...models.values()];
}

/** Contexts whose models this thread has taken into its cache. */
const imported = new WeakSet<SweepContext>();

/** One row: the variant studied, or its problem. */
function sweepRow(c: SweepContext, value: QuantityInput): HeaterSweepRow {
  const variant = setField(c.description, c.field, value) as HeaterDescription;
  try {
    if (c.requireUnits) readHeaterDescription(variant, { requireUnits: true });
    const s = studyHeater(variant, { heatUp: c.heatUp, radialHeatUp: false, temperatureScan: false, impedanceSweep: false });
    return { value, summary: summarise(s.operating, s.emptyCoil, s.heatUp?.timeToTarget ?? null), cautionCount: s.cautions.length, problem: null };
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    return { value, summary: null, cautionCount: 0, problem: e.message };
  }
}

/** The pool's task runner for sweeps: one row per value. */
export function sweepTask(context: unknown, items: readonly unknown[]): unknown[] {
  const c = context as SweepContext;
  if (c.models !== undefined && !imported.has(c)) {
    importCellModels(c.models);
    imported.add(c);
  }
  return items.map((v) => sweepRow(c, v as QuantityInput));
}

/**
 * One part of a design space split for several machines: part `index` of `count` (both
 * counted from 1). Part `i` holds designs `⌊(i−1)·N/count⌋ … ⌊i·N/count⌋ − 1` of the `N` in
 * the run, so the parts are contiguous, cover every design once, and concatenated in order give
 * the whole run.
 *
 * @category Heater study
 */
export interface HeaterShard {
  /** Which part, 1 … `count`. */
  readonly index: number;
  /** How many parts, 1 … 10⁶. */
  readonly count: number;
}

/**
 * Options of {@link sweepHeaterStream}: the pool options and an optional shard.
 *
 * @category Heater study
 */
export interface HeaterSweepStreamOptions extends HeaterPoolOptions {
  /** Run only this part of the values (for one task of a job array). */
  readonly shard?: HeaterShard;
}

/**
 * A row of {@link sweepHeaterStream}: a {@link HeaterSweepRow} and its place in the sweep.
 *
 * @category Heater study
 */
export interface HeaterSweepStreamRow extends HeaterSweepRow {
  /** Position of the value in `sweep.values` (0-based, in the whole sweep, also for a shard). */
  readonly index: number;
}

/** The values `[start, end)` of a shard of `total`. */
export function shardRange(total: number, shard: HeaterShard | undefined): readonly [number, number] {
  if (shard === undefined) return [0, total];
  return [Math.floor(((shard.index - 1) * total) / shard.count), Math.floor((shard.index * total) / shard.count)];
}

/** Checks a shard `{ index, count }` (undefined passes through), naming `path` in errors. */
export function checkShard(where: string, shard: unknown, path = "options.shard"): HeaterShard | undefined {
  if (shard === undefined) return undefined;
  if (typeof shard !== "object" || shard === null) throw new InputError(where, path, shard, "", "an object { index, count }");
  requireKnownKeys(where, path, shard, ["index", "count"]);
  const { index, count } = shard as HeaterShard;
  if (typeof count !== "number" || !Number.isInteger(count) || count < 1 || count > 1e6) throw new InputError(where, `${path}.count`, count, "", "an integer in [1, 1e6]");
  if (typeof index !== "number" || !Number.isInteger(index) || index < 1 || index > count) throw new InputError(where, `${path}.index`, index, "", `an integer in [1, ${count}]`);
  return { index, count };
}

/**
 * Sweeps one field like {@link sweepHeater}, on a pool of workers, and hands the rows out one by
 * one, in the order of `sweep.values`, as they finish: an async iterator whose memory stays
 * bounded (a few batches per worker) however long the sweep, so a sweep of 10⁶ designs can be
 * written to a file as it runs. With `shard`, only that part of the values runs (see
 * {@link HeaterShard}); the rows carry their index in the whole sweep.
 *
 * The rows are identical, bit for bit and in order, for any number of workers and for the
 * shards concatenated: each row is computed from the base description and its value alone.
 * Stopping the loop early (`break`) or aborting `signal` stops the workers at once; after an
 * abort the iterator throws the signal's reason, having delivered every row before the first
 * one that had not finished.
 *
 * @param description - the base design (see {@link HeaterDescription})
 * @param sweep - `field` (dotted path) and `values`, as for {@link sweepHeater}
 * @param options - `workers` (0 … 256), `onProgress`, `signal`, `workerUrl`, `shard`
 * @returns an async iterator of rows, each with its `index`
 * @throws {@link InputError} (at the call, before any design runs) for everything {@link sweepHeater} refuses,
 * for bad pool options (`workers` not an integer in [0, 256], `onProgress` not a function,
 * `signal` not an AbortSignal, unknown keys) and for a bad shard (`count` not an integer in
 * [1, 10⁶], `index` not in [1, count])
 * @example
 * ```ts
 * import { sweepHeaterStream } from "fluxwright";
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
 * const indices: number[] = [];
 * for await (const row of sweepHeaterStream(base, { field: "coil.turns", values: [4, 5, 6, 7], heatUp: false },
 *   { workers: 0, shard: { index: 2, count: 2 } })) indices.push(row.index);
 * console.log(indices.join(",")); // 2,3
 * ```
 * @category Heater study
 */
export function sweepHeaterStream(description: HeaterDescription, sweep: HeaterSweepSpec, options: HeaterSweepStreamOptions): AsyncGenerator<HeaterSweepStreamRow, void, undefined> {
  const where = "sweepHeaterStream";
  const pool = checkPoolOptions(where, options, ["shard"]);
  const shard = checkShard(where, options.shard);
  const c = checkSweep(where, description, sweep);
  const [start, end] = shardRange(c.values.length, shard);
  const context = sweepContext(description, c, pool.workers);
  function* values(): Generator<QuantityInput> {
    for (let i = start; i < end; i++) yield c.values[i] as QuantityInput;
  }
  return (async function* rows(): AsyncGenerator<HeaterSweepStreamRow, void, undefined> {
    let index = start;
    for await (const row of runPool({ kind: "sweep", context }, values(), end - start, sweepTask, pool, where)) {
      yield { index: index++, ...(row as HeaterSweepRow) };
    }
  })();
}

/**
 * Sweeps one numeric field of a heater description over a list of values and studies each
 * variant with {@link studyHeater}: a table of headline numbers per value. A value that makes
 * the description invalid gives a row with its `problem` (field path and reason) instead of
 * stopping the sweep.
 *
 * With a third argument, the pool options (see {@link HeaterPoolOptions}), the sweep runs on
 * `workers` threads and returns a promise of the same table: identical, bit for bit and in
 * order, for any number of workers. It reports progress to `onProgress` and stops when
 * `signal` aborts (the promise then rejects with the signal's reason; use
 * {@link sweepHeaterStream} to keep the rows that finished). Without it, the sweep runs on the
 * calling thread and returns the table.
 *
 * @param description - the base design (see {@link HeaterDescription})
 * @param sweep - `field` (dotted path) and `values`
 * @returns the table
 * @throws {@link InputError} when the base description is invalid, `field` is not a field of
 * the description (a typo such as `coil.turn`, with the nearest field suggested), a value is a
 * bare number for a field with a dimension under `requireUnits`, `field` is not a dotted path
 * to a numeric field, or `values` is empty or holds something other than numbers and strings
 * @example
 * ```ts
 * import { sweepHeater } from "fluxwright";
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
 * const table = sweepHeater(base, { field: "coil.turns", values: [5, 6, 0], heatUp: false });
 * console.log(table.rows.length, table.rows[2]?.problem !== null); // 3 true
 * ```
 * @category Heater study
 */
export function sweepHeater(description: HeaterDescription, sweep: HeaterSweepSpec): HeaterSweep;
/**
 * {@link sweepHeater} on a pool of `workers` threads (see {@link HeaterPoolOptions}): the same
 * table, bit for bit and in order, for any number of workers, with progress (`onProgress`) and
 * cancellation (`signal`: the promise rejects with its reason; {@link sweepHeaterStream} keeps
 * the rows that finished).
 *
 * @param description - the base design (see {@link HeaterDescription})
 * @param sweep - `field` (dotted path) and `values`
 * @param options - pool options: `workers` (0 … 256), `onProgress`, `signal`, `workerUrl`
 * @returns a promise of the table
 * @throws {@link InputError} at the call for what the single-thread form refuses and for bad
 * pool options (`workers` not an integer in [0, 256], `onProgress` not a function, `signal` not
 * an AbortSignal, an unknown key)
 * @category Heater study
 */
export function sweepHeater(description: HeaterDescription, sweep: HeaterSweepSpec, options: HeaterPoolOptions): Promise<HeaterSweep>;
export function sweepHeater(description: HeaterDescription, sweep: HeaterSweepSpec, options?: HeaterPoolOptions): HeaterSweep | Promise<HeaterSweep> {
  const where = "sweepHeater";
  if (options !== undefined) {
    const pool = checkPoolOptions(where, options);
    const c = checkSweep(where, description, sweep);
    const context = sweepContext(description, c, pool.workers);
    return (async () => {
      const rows: HeaterSweepRow[] = [];
      for await (const row of runPool({ kind: "sweep", context }, c.values, c.values.length, sweepTask, pool, where)) rows.push(row as HeaterSweepRow);
      return { field: c.field, rows };
    })();
  }
  const c = checkSweep(where, description, sweep);
  const context: SweepContext = { description, field: c.field, heatUp: c.heatUp, requireUnits: c.requireUnits };
  return { field: c.field, rows: c.values.map((value) => sweepRow(context, value)) };
}
