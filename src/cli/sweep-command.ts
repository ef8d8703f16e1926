/**
 * The `sweep` command: one field of a study file varied over a list of values, on the calling
 * thread or on the worker pool (rows streamed as they finish, shards for job arrays).
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { HeaterDescriptionError, sweepHeater, sweepHeaterStream } from "../study/index.js";
import type { HeaterDescription, HeaterShard, HeaterSweepRow } from "../study/index.js";
import { sweepCsv, sweepTextReport } from "../report/index.js";
import { parseArgs, shardOption, single, splitList, workersOption } from "./args.js";
import { UsageError } from "./errors.js";
import { HELP } from "./help.js";
import { displayFor, EXIT_DESIGN, EXIT_INTERRUPTED, EXIT_OK, EXIT_USAGE, JSON_FORMAT_VERSION } from "./io.js";
import type { CliIo } from "./io.js";
import { SWEEP_ROWS_FORMAT, valuesDigest } from "./merge.js";
import { checkStudyFile, designFailure, jsonOutput, loadStudyFile, reportInputError } from "./study-file.js";
import type { StudyFile } from "./study-file.js";

/** Maps a failure of a sweep to its message and exit status. */
function sweepFailure(io: CliIo, file: StudyFile, e: unknown): number {
  if (e instanceof HeaterDescriptionError) {
    reportInputError(io, file.name, e);
    return EXIT_USAGE;
  }
  if (e instanceof InputError && (e.where === "sweepHeater" || e.where === "sweepHeaterStream")) throw new UsageError(e.message.replace(/^sweepHeater(Stream)?: /u, "--"));
  return designFailure(io, "sweep", file, e);
}

/** Runs `fluxwright sweep` (see its help). */
export function sweepCommand(args: readonly string[], io: CliIo): number | Promise<number> {
  const parsed = parseArgs(args, ["field", "values", "workers", "shard"], ["json", "csv", "ndjson", "no-heat-up", "quiet"]);
  if (parsed.flags.has("help")) {
    io.stdout(HELP.sweep as string);
    return EXIT_OK;
  }
  const path = single(parsed, "sweep");
  const field = parsed.flags.get("field");
  const values = parsed.flags.get("values");
  if (typeof field !== "string") throw new UsageError("sweep needs --field PATH");
  if (typeof values !== "string") throw new UsageError("sweep needs --values LIST");
  if (parsed.flags.has("json") && parsed.flags.has("csv")) throw new UsageError("choose one of --json and --csv");
  const formats = (["json", "csv", "ndjson"] as const).filter((f) => parsed.flags.has(f));
  if (formats.length > 1) throw new UsageError(`choose one of ${formats.map((f) => `--${f}`).join(" and ")}`);
  const workers = workersOption(parsed);
  const shard = shardOption(parsed);
  if (shard !== undefined && !parsed.flags.has("ndjson")) throw new UsageError("--shard needs --ndjson (fluxwright merge reads NDJSON)");
  const file = loadStudyFile(io, path);
  const bad = checkStudyFile(io, file);
  if (bad !== null) return bad;
  const list = splitList(values);
  if (list.length === 0) throw new UsageError("--values needs at least one value");
  const heatUp = !parsed.flags.has("no-heat-up");
  const quiet = parsed.flags.has("quiet");
  if (!quiet) io.stderr(`sweeping ${field} over ${list.length} value${list.length === 1 ? "" : "s"}${shard === undefined ? "" : ` (shard ${shard.index}/${shard.count})`}…\n`);
  if (workers !== undefined || shard !== undefined || parsed.flags.has("ndjson") || io.defaultWorkers !== undefined) {
    return sweepPooled(io, file, { field, list, heatUp, format: formats[0] ?? "text", workers, shard, quiet });
  }
  let result;
  try {
    result = sweepHeater(file.input as HeaterDescription, { field, values: list, heatUp, requireUnits: true });
  } catch (e) {
    return sweepFailure(io, file, e);
  }
  if (parsed.flags.has("json")) io.stdout(jsonOutput(io, "fluxwright-sweep", file, result));
  else if (parsed.flags.has("csv")) io.stdout(sweepCsv(result, heatUp));
  else io.stdout(sweepTextReport(result, heatUp));
  if (result.rows.every((r) => r.summary === null)) {
    io.stderr(`fluxwright sweep: no value of ${field} gave a design that runs (reasons in the table)\n`);
    return EXIT_DESIGN;
  }
  return EXIT_OK;
}

interface PooledSweep {
  readonly field: string;
  readonly list: readonly (number | string)[];
  readonly heatUp: boolean;
  readonly format: "text" | "json" | "csv" | "ndjson";
  readonly workers: number | undefined;
  readonly shard: HeaterShard | undefined;
  readonly quiet: boolean;
}

/**
 * A sweep on the worker pool: CSV and NDJSON rows are written as they finish (constant memory),
 * text and JSON at the end; Ctrl-C keeps what finished.
 */
async function sweepPooled(io: CliIo, file: StudyFile, run: PooledSweep): Promise<number> {
  const { field, list, heatUp, format, shard } = run;
  const start = shard === undefined ? 0 : Math.floor(((shard.index - 1) * list.length) / shard.count);
  const end = shard === undefined ? list.length : Math.floor((shard.index * list.length) / shard.count);
  const count = end - start;
  const workers = run.workers ?? (count >= 32 ? (io.defaultWorkers ?? 0) : 0);
  const display = displayFor(io, "designs", run.quiet);
  const interrupt = io.interrupt?.();
  const rows: HeaterSweepRow[] = [];
  let done = 0;
  let runs = 0;
  let headerWritten = false;
  const csvHeader = sweepCsv({ field, rows: [] }, heatUp);
  const header = (): void => {
    if (headerWritten) return;
    headerWritten = true;
    if (format === "csv") io.stdout(csvHeader);
    if (format === "ndjson") {
      const head = {
        format: SWEEP_ROWS_FORMAT,
        formatVersion: JSON_FORMAT_VERSION,
        fluxwright: io.version ?? "unknown",
        field,
        heatUp,
        total: list.length,
        valuesDigest: valuesDigest(list),
        ...(shard === undefined ? {} : { shard, range: [start, end] }),
        input: file.input,
      };
      io.stdout(`${JSON.stringify(head)}\n`);
    }
  };
  try {
    const options = { workers, onProgress: display.update, ...(interrupt === undefined ? {} : { signal: interrupt.signal }), ...(shard === undefined ? {} : { shard }) };
    for await (const row of sweepHeaterStream(file.input as HeaterDescription, { field, values: list, heatUp, requireUnits: true }, options)) {
      header();
      done++;
      if (row.summary !== null) runs++;
      if (format === "ndjson") io.stdout(`${JSON.stringify(row)}\n`);
      else if (format === "csv") io.stdout(sweepCsv({ field, rows: [row] }, heatUp).slice(csvHeader.length));
      else rows.push({ value: row.value, summary: row.summary, cautionCount: row.cautionCount, problem: row.problem });
    }
    header();
  } catch (e) {
    display.end();
    if (interrupt?.signal.aborted !== true) return sweepFailure(io, file, e);
    header();
    if (format === "json") io.stdout(jsonOutput(io, "fluxwright-sweep", file, { field, rows, interrupted: { done, total: count } }));
    if (format === "text") io.stdout(sweepTextReport({ field, rows }, heatUp));
    const first = start + 1;
    io.stderr(
      `fluxwright sweep: interrupted after ${done} of ${count} designs; ${done === 0 ? "no rows were written" : `the rows written (values ${first}–${start + done} of ${list.length}) are complete`}\n`,
    );
    return EXIT_INTERRUPTED;
  } finally {
    interrupt?.stop();
  }
  display.end();
  if (format === "json") io.stdout(jsonOutput(io, "fluxwright-sweep", file, { field, rows }));
  if (format === "text") io.stdout(sweepTextReport({ field, rows }, heatUp));
  if (runs === 0 && shard === undefined) {
    io.stderr(`fluxwright sweep: no value of ${field} gave a design that runs (reasons in the table)\n`);
    return EXIT_DESIGN;
  }
  return EXIT_OK;
}
