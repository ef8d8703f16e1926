/**
 * The `optimise` command: a search around a study file for a part power or a heat-up time
 * within limits, on the calling thread or on the worker pool (or one shard of it).
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { HeaterDescriptionError, optimiseHeater, optimiseHeaterShard } from "../study/index.js";
import type { HeaterDescription, HeaterGoal, HeaterLimits, HeaterOptimisation, HeaterProgress, HeaterShard } from "../study/index.js";
import { optimisationTextReport } from "../report/index.js";
import { parseArgs, shardOption, single, splitList, workersOption } from "./args.js";
import type { Parsed } from "./args.js";
import { UsageError } from "./errors.js";
import { HELP } from "./help.js";
import { displayFor, EXIT_INTERRUPTED, EXIT_OK, EXIT_USAGE, JSON_FORMAT_VERSION } from "./io.js";
import type { CliIo } from "./io.js";
import { OPTIMISATION_SHARD_FORMAT } from "./merge.js";
import { checkStudyFile, designFailure, jsonOutput, loadStudyFile, reportInputError } from "./study-file.js";
import type { StudyFile } from "./study-file.js";

/** The options of `optimise`: those with a value, then the switches. */
const VALUED = ["power", "time", "turns", "min-capacitance", "max-capacitance", "series", "max-tank-voltage", "max-coil-current", "max-supply-current", "min-frequency", "max-frequency", "keep", "workers", "shard"];

/** The limit options and the {@link HeaterLimits} field each sets. */
const LIMIT_FLAGS: readonly (readonly [string, keyof HeaterLimits])[] = [
  ["max-tank-voltage", "tankVoltagePeak"],
  ["max-coil-current", "coilCurrentRms"],
  ["max-supply-current", "supplyCurrent"],
  ["min-frequency", "minFrequency"],
  ["max-frequency", "maxFrequency"],
];

/** Runs `fluxwright optimise` (see its help). */
export function optimiseCommand(args: readonly string[], io: CliIo): number | Promise<number> {
  const parsed = parseArgs(args, VALUED, ["json", "quiet"]);
  if (parsed.flags.has("help")) {
    io.stdout(HELP.optimise as string);
    return EXIT_OK;
  }
  const path = single(parsed, "optimise");
  const goal = goalOf(parsed);
  const file = loadStudyFile(io, path);
  const bad = checkStudyFile(io, file);
  if (bad !== null) return bad;
  const quiet = parsed.flags.has("quiet");
  const shard = shardOption(parsed);
  if (shard !== undefined && !parsed.flags.has("json")) throw new UsageError("--shard needs --json (fluxwright merge reads the shards' JSON)");
  const workers = workersOption(parsed) ?? io.defaultWorkers ?? (shard === undefined ? undefined : 0);
  if (!quiet) io.stderr(`searching designs around ${file.name}${shard === undefined ? "" : ` (shard ${shard.index}/${shard.count})`}…\n`);
  const run: OptimiseRun = { io, file, goal, quiet, json: parsed.flags.has("json"), started: Date.now() };
  if (workers !== undefined) return optimisePooled(run, workers, shard);
  let result;
  try {
    result = optimiseHeater(file.input as HeaterDescription, goal, {
      onProgress: (done, total) => {
        if (total >= 1000 && !quiet) io.stderr(`  ${done} / ${total} candidates (${Math.round((100 * done) / total)} %)\n`);
      },
    });
  } catch (e) {
    return optimiseFailure(run, e);
  }
  return optimiseFinish(run, result);
}

/** The search goal from the command-line options (UsageError for a missing or double target or a bad series). */
function goalOf(parsed: Parsed): HeaterGoal {
  const text = (name: string): string | undefined => {
    const v = parsed.flags.get(name);
    return typeof v === "string" ? v : undefined;
  };
  const power = text("power");
  const time = text("time");
  if ((power === undefined) === (time === undefined)) throw new UsageError("optimise needs exactly one of --power or --time");
  const series = text("series");
  if (series !== undefined && series !== "E12" && series !== "E24") throw new UsageError(`--series must be E12 or E24, got ${series}`);
  const keepText = text("keep");
  const keep = keepText === undefined ? undefined : Number(keepText);
  const turnsText = text("turns");
  const limits: Record<string, string> = {};
  for (const [flag, key] of LIMIT_FLAGS) {
    const v = text(flag);
    if (v !== undefined) limits[key] = v;
  }
  const search: Record<string, unknown> = {};
  if (turnsText !== undefined) search.turns = splitList(turnsText);
  if (series !== undefined) search.capacitanceSeries = series;
  const minC = text("min-capacitance");
  const maxC = text("max-capacitance");
  if (minC !== undefined) search.minCapacitance = minC;
  if (maxC !== undefined) search.maxCapacitance = maxC;
  return {
    ...(power === undefined ? {} : { targetPower: power }),
    ...(time === undefined ? {} : { targetTime: time }),
    limits,
    search,
    ...(keep === undefined ? {} : { keep }),
  };
}

/** One run of `optimise`: where it writes, what it searches, and when it started. */
interface OptimiseRun {
  readonly io: CliIo;
  readonly file: StudyFile;
  readonly goal: HeaterGoal;
  readonly quiet: boolean;
  readonly json: boolean;
  readonly started: number;
}

/** The message and exit status of a failed search (a bad goal is a usage error of the options). */
function optimiseFailure({ io, file }: OptimiseRun, e: unknown): number {
  if (e instanceof HeaterDescriptionError) {
    reportInputError(io, file.name, e);
    return EXIT_USAGE;
  }
  if (e instanceof InputError && e.parameter.startsWith("goal")) throw new UsageError(`${e.message.replace(/^optimiseHeater: /u, "")} (from the command-line options)`);
  return designFailure(io, "optimise", file, e);
}

/** Prints the result of a search. */
function optimiseFinish({ io, file, quiet, json, started }: OptimiseRun, result: HeaterOptimisation): number {
  if (!quiet) io.stderr(`evaluated ${result.evaluated} candidates in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
  for (const w of result.warnings) io.stderr(`fluxwright optimise: warning: ${w}\n`);
  io.stdout(json ? jsonOutput(io, "fluxwright-optimisation", file, result) : optimisationTextReport(result));
  return EXIT_OK;
}

/** A search on the worker pool, or one shard of it (printed on one line for `fluxwright merge`); Ctrl-C reports nothing. */
async function optimisePooled(run: OptimiseRun, workers: number, shard: HeaterShard | undefined): Promise<number> {
  const { io, file, goal, quiet, started } = run;
  const display = displayFor(io, "candidates", quiet, (p) => (p.total >= 1000 ? `  ${p.done} / ${p.total} candidates (${Math.round((100 * p.done) / p.total)} %)\n` : null));
  const interrupt = io.interrupt?.();
  let last = { done: 0, total: 0 };
  let result;
  try {
    const options = {
      workers,
      onProgress: (p: HeaterProgress) => {
        last = p;
        display.update(p);
      },
      ...(interrupt === undefined ? {} : { signal: interrupt.signal }),
    };
    if (shard !== undefined) {
      const part = await optimiseHeaterShard(file.input as HeaterDescription, goal, { ...options, shard });
      display.end();
      if (!quiet) io.stderr(`evaluated ${part.evaluated} candidates of shard ${shard.index}/${shard.count} in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
      const envelope = { format: OPTIMISATION_SHARD_FORMAT, formatVersion: JSON_FORMAT_VERSION, fluxwright: io.version ?? "unknown", input: file.input, ...part };
      io.stdout(`${JSON.stringify(envelope)}\n`);
      return EXIT_OK;
    }
    result = await optimiseHeater(file.input as HeaterDescription, goal, options);
  } catch (e) {
    display.end();
    if (interrupt?.signal.aborted !== true) return optimiseFailure(run, e);
    io.stderr(`fluxwright optimise: interrupted after ${last.done} of ${last.total} candidates; no designs are reported (the ranking needs every candidate)\n`);
    return EXIT_INTERRUPTED;
  } finally {
    interrupt?.stop();
  }
  display.end();
  return optimiseFinish(run, result);
}
