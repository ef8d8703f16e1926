/**
 * The `fluxwright` subcommands, written against a small I/O interface so that tests can run
 * them in-process. Exit codes: 0 success, 1 an unexpected failure, 2 bad usage or a bad study
 * file (the message names the field path; no report is written), 3 a valid file whose design
 * cannot run, 4 an output that could not be written.
 */
import { parseArgs as nodeParseArgs } from "node:util";
import { InputError, nearestName } from "../core/index.js";
import { HeaterDescriptionError, optimiseHeater, optimiseHeaterShard, readHeaterDescription, studyHeater, sweepHeater, sweepHeaterStream } from "../study/index.js";
import type { HeaterDescription, HeaterGoal, HeaterLimits, HeaterOptimisation, HeaterProgress, HeaterShard, HeaterSweepRow } from "../study/index.js";
import { progressDisplay } from "./progress.js";
import type { ProgressDisplay } from "./progress.js";
import { mergeCommand, MERGE_HELP, OPTIMISATION_SHARD_FORMAT, SWEEP_ROWS_FORMAT, valuesDigest } from "./merge.js";
import { designErrorText } from "../report/design-error.js";
import { jsonSyntaxError } from "./json-error.js";
import { OutputError, UsageError } from "./errors.js";
import { studyHtmlReport } from "../report/index.js";
import { optimisationTextReport, studyTextReport, sweepCsv, sweepTextReport } from "../report/index.js";

/** What the commands need from the outside world. */
export interface CliIo {
  /** Writes to standard output. */
  readonly stdout: (text: string) => void;
  /** Writes to standard error (progress, errors). */
  readonly stderr: (text: string) => void;
  /** Reads a UTF-8 file; throws with `code: "ENOENT"` etc. on failure. */
  readonly readFile: (path: string) => string;
  /**
   * Writes a UTF-8 file. The real one writes a temporary file beside the target and renames it,
   * so a failure leaves the old file as it was; it throws with `code` (`ENOENT`, `ENOSPC`, …).
   */
  readonly writeFile: (path: string, text: string) => void;
  /** Reads all of standard input (for the file name `-`). */
  readonly readStdin?: () => string;
  /** Whether two paths name the same file (default: equal strings). */
  readonly samePath?: (a: string, b: string) => boolean;
  /** The package version (`--version`, and in every JSON output). */
  readonly version?: string | undefined;
  /** Reads a file shipped in the package, by its path inside the package (`docs/examples/…`). */
  readonly readPackageFile?: (path: string) => string;
  /** Whether standard error is a terminal: progress is a bar redrawn in place, else plain lines. */
  readonly stderrIsTerminal?: boolean;
  /**
   * Worker threads for `sweep` and `optimise` when `--workers` is not given (the real command
   * line: the core count). When absent, and without `--workers`, `--ndjson` or `--shard`, they
   * run on the calling thread and `runCli` returns the exit status synchronously.
   */
  readonly defaultWorkers?: number;
  /** Starts listening for an interrupt (Ctrl-C): its signal aborts the run; `stop` stops listening. */
  readonly interrupt?: () => { readonly signal: AbortSignal; readonly stop: () => void };
  /** Reads a text file line by line (`merge` of large shard outputs); default: `readFile`, split. */
  readonly readLines?: (path: string) => AsyncIterable<string>;
  /** Standard error without control characters escaped (set by `runCli`, for the progress bar). */
  readonly rawStderr?: (text: string) => void;
}

/** Exit codes. */
export const EXIT_OK = 0;
/** The computation failed (a bug or an unexpected condition). */
export const EXIT_FAILURE = 1;
/** Bad usage or a bad study file. */
export const EXIT_USAGE = 2;
/** A valid study file whose design cannot run (the message says which limit and what to change). */
export const EXIT_DESIGN = 3;
/** An output (report file, standard output) could not be written; an existing file is kept. */
export const EXIT_OUTPUT = 4;
/** Interrupted (Ctrl-C): what finished was written and the message says how far the run got. */
export const EXIT_INTERRUPTED = 130;

/** The format version of the JSON outputs (`--json`); raised when a field changes meaning or goes. */
export const JSON_FORMAT_VERSION = 1;

/** The shipped example study files (`fluxwright new FILE --example NAME`). */
const EXAMPLES = ["bearing-race", "forging-bar", "plate-warmer"] as const;

const MAIN_HELP = `usage: fluxwright <command> [options]

Induction-heater design studies from a JSON study file.

commands:
  study FILE [--json] [--html OUT]      run a study: text report, JSON, or an HTML report with plots
  sweep FILE --field PATH --values LIST  vary one field of the study file over values
  merge SHARD...                         combine the NDJSON outputs of a sweep's shards
  optimise FILE --power W | --time S     search turns, capacitance and frequency for a goal
  new FILE [--example NAME]              write a starter study file to edit
  help [COMMAND]                         show help for a command

options:
  -h, --help      show help
  -V, --version   print the version

FILE may be - for standard input. Study files are JSON; every quantity with a dimension is text
with its unit ("32 mm", "1.25 in", "4.7 µF", "850 °C"). The package ships their JSON Schema
(docs/heater-study.schema.json) and examples (docs/examples/study-*.json); "fluxwright new"
writes one to start from.
Exit status: 0 success, 1 unexpected failure, 2 bad usage or bad study file, 3 valid file but
the design cannot run, 4 an output could not be written, 130 interrupted (Ctrl-C).
`;

const HELP: Record<string, string> = {
  study: `usage: fluxwright study FILE [--json] [--html OUT] [--model field] [--quiet]

Runs the heater study in FILE (JSON, or - for standard input; quantities as text with units
such as "30 mm") and prints a text report: cautions first, the design, operating points
empty / cold / at target, where the power goes, the heat-up and the validity notes.

options:
  --json        print the full study result as JSON instead of the text report (it carries
                the study file as "input", so it can be read back as FILE)
  --html OUT    also write a self-contained HTML report with plots to OUT (never over FILE;
                written to a temporary file and renamed, so a failure keeps the old OUT)
  --model M     "closed-form" (default, fast) or "field": the coil's impedance and the part's
                coupling from the axisymmetric field solver (seconds per anchor temperature;
                the HTML report then shows the field picture)
  --quiet       with --html: print only the report's path
  -h, --help    show this help

A bad study file exits with status 2 and a message naming the field path; nothing is written.
A valid file whose design cannot run exits with status 3 and says what to change.
`,
  sweep: `usage: fluxwright sweep FILE --field PATH --values LIST [--csv | --json | --ndjson]
                       [--no-heat-up] [--workers N] [--shard I/N] [--quiet]

Varies one field of the study in FILE and prints a table of headline numbers per value.
Rows whose design is invalid or cannot run are kept, with the reason in the last column.

options:
  --field PATH    dotted field path, e.g. coil.turns, capacitor.capacitance, supply.voltage
  --values LIST   comma-separated values, with units where the field has one:
                  "4,5,6" or "2.2 µF,3.3 µF"
  --no-heat-up    skip the heat-up (faster; no time-to-target column)
  --csv           print the table as CSV (SI numbers, one header line), row by row as the
                  designs finish
  --json          print the sweep as JSON
  --ndjson        print one JSON line per design as it finishes (after a header line): the
                  output of a long sweep, and what "fluxwright merge" reads
  --workers N     worker threads (default: one per core from 32 values on; 0 runs on the
                  main thread)
  --shard I/N     run only part I of N of the values (1 <= I <= N; needs --ndjson), for one
                  task of a job array; "fluxwright merge" joins the parts
  --quiet         no progress on standard error
  -h, --help      show this help

Progress goes to standard error: a bar on a terminal, a line every tenth otherwise. Ctrl-C stops
the workers, keeps the rows that finished and says how far the sweep got (exit status 130).
Exits with status 3 when no value gave a design that runs.
`,
  optimise: `usage: fluxwright optimise FILE (--power W | --time S) [limits] [--keep N] [--json]
                       [--workers N] [--shard I/N] [--quiet]

Searches turns, capacitance (E12 values) and, for fixed-frequency series inverters, the
switching frequency around the design in FILE for the closest match to a part power or a
heat-up time, within limits. Prints the best designs and why the others failed.

options:
  --power W              target power into the cold part, e.g. "1.5 kW"
  --time S               target heat-up time, e.g. "90 s"
  --turns LIST           turn counts to try, e.g. "4,5,6,7,8" (default: half to twice the file's)
  --min-capacitance C    smallest capacitance (default a quarter of the file's)
  --max-capacitance C    largest capacitance (default four times the file's)
  --series E12|E24       capacitance series (default E12)
  --max-tank-voltage V   peak tank voltage limit
  --max-coil-current A   RMS coil current limit
  --max-supply-current A supply current limit
  --min-frequency F      lowest operating frequency (e.g. 20 kHz, above hearing)
  --max-frequency F      highest operating frequency
  --keep N               designs to report (default 5)
  --json                 print the result as JSON
  --workers N            worker threads (default one per core; 0 runs on the main thread)
  --shard I/N            run only part I of N of the searched coils (needs --json) and print
                         that part's output on one line; "fluxwright merge" of all N parts
                         prints what one run prints with --json
  --quiet                no progress on standard error
  -h, --help             show this help

Progress goes to standard error. Ctrl-C stops the search and says how far it got (exit status
130; a search ranks its candidates at the end, so nothing is printed).
`,
  new: `usage: fluxwright new FILE [--example NAME]

Writes a starter study file to FILE (never over an existing file) to edit and run with
"fluxwright study FILE". NAME is one of: ${EXAMPLES.join(", ")} (default bearing-race).
Its "$schema" names the published JSON Schema, so editors can check it wherever it is copied.
`,
  merge: MERGE_HELP,
};


interface Parsed {
  positional: string[];
  flags: Map<string, string | true>;
}

/**
 * Parses `--name value`, `--name=value` and boolean `--name` options with `node:util`'s
 * `parseArgs` (its tokens, so that the messages stay ours); `-` is a positional (standard
 * input), and so is any other argument that starts with a single dash except `-h`.
 */
function parseArgs(args: readonly string[], valued: readonly string[], booleans: readonly string[]): Parsed {
  const options: Record<string, { type: "string" | "boolean"; short?: string }> = { help: { type: "boolean", short: "h" } };
  for (const name of valued) options[name] = { type: "string" };
  for (const name of booleans) options[name] = { type: "boolean" };
  const { tokens } = nodeParseArgs({ args: [...args], options, strict: false, allowPositionals: true, tokens: true });
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  const seen = new Set<number>();
  const unknown = (raw: string, name: string): UsageError => {
    const near = nearestName(name, [...valued, ...booleans]);
    return new UsageError(`unknown option ${raw}${near === null ? "" : ` (did you mean --${near}?)`}`);
  };
  for (const token of tokens) {
    if (token.kind === "positional") {
      positional.push(token.value);
      continue;
    }
    const raw = args[token.index] as string;
    if (token.kind === "option-terminator") throw unknown(raw, "");
    if (!raw.startsWith("--")) {
      if (raw === "-h") flags.set("help", true);
      // a lone dash word (a negative number, "-x") was a positional: keep it once, as written
      else if (!seen.has(token.index)) positional.push(raw);
      seen.add(token.index);
      continue;
    }
    const name = token.name;
    if (name === "help" && token.value === undefined) {
      flags.set("help", true);
    } else if (valued.includes(name)) {
      const value = token.value;
      if (value === undefined || (!token.inlineValue && value.startsWith("--"))) throw new UsageError(`option --${name} needs a value`);
      flags.set(name, value);
    } else if (booleans.includes(name) && token.value === undefined) {
      flags.set(name, true);
    } else {
      throw unknown(raw, name);
    }
  }
  return { positional, flags };
}

/** Words for the usual file-system error codes. */
const FS_ERRORS: Readonly<Record<string, string>> = {
  ENOENT: "no such file or directory",
  EACCES: "permission denied",
  EPERM: "operation not permitted",
  EISDIR: "is a directory",
  ENOTDIR: "a parent is not a directory",
  ENOSPC: "no space left on the device",
  EDQUOT: "disk quota exceeded",
  EFBIG: "file too large (file-size limit)",
  EROFS: "read-only file system",
  EEXIST: "the file already exists",
};

/** `no such file or directory (ENOENT)` from an error thrown by the file system. */
function fsReason(e: unknown): string {
  const code = (e as { code?: unknown }).code;
  if (typeof code !== "string") return e instanceof Error ? e.message : String(e);
  return `${FS_ERRORS[code] ?? "failed"} (${code})`;
}

/** Line and column (1-based) of a character offset in a text. */
function lineColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, Math.max(0, Math.min(offset, text.length)));
  const lines = before.split("\n");
  return { line: lines.length, column: Array.from(lines[lines.length - 1] ?? "").length + 1 };
}

/** The kinds of JSON output, each carrying the study file it was computed from as `input`. */
const OUTPUT_FORMATS = ["fluxwright-study", "fluxwright-sweep", "fluxwright-optimisation"];

/** A study file read and parsed: the parsed JSON, and where it came from for messages. */
interface StudyFile {
  readonly name: string;
  readonly input: unknown;
}

/**
 * Reads and parses a study file (`-` is standard input; a UTF-8 byte-order mark is skipped; the
 * JSON output of `study`, `sweep` or `optimise` is read back through the study file it carries),
 * or throws a UsageError with a useful message: JSON syntax errors give line and column.
 */
function loadStudyFile(io: CliIo, path: string): StudyFile {
  const name = path === "-" ? "(standard input)" : path;
  let text: string;
  try {
    if (path === "-") {
      if (io.readStdin === undefined) throw new UsageError("standard input is not available here");
      text = io.readStdin();
    } else {
      text = io.readFile(path);
    }
  } catch (e) {
    if (e instanceof UsageError) throw e;
    throw new UsageError(`cannot read ${name}: ${fsReason(e)}`);
  }
  if (text.startsWith("\uFEFF")) text = text.slice(1);
  let parsed: unknown;
  try {
    parsed = JSON.parse(text) as unknown;
  } catch (e) {
    const found = jsonSyntaxError(text);
    const where = lineColumn(text, found?.offset ?? text.length);
    const reason = found?.reason ?? (e as Error).message;
    const source = text.split("\n")[where.line - 1] ?? "";
    const caret = `${" ".repeat(Math.max(0, where.column - 1))}^`;
    throw new UsageError(`${name}:${where.line}:${where.column}: not valid JSON: ${reason}\n    ${source}\n    ${caret}`);
  }
  if (typeof parsed === "object" && parsed !== null && OUTPUT_FORMATS.includes((parsed as { format?: string }).format ?? "")) {
    const inner = (parsed as { input?: unknown }).input;
    if (inner === undefined) throw new UsageError(`${name}: a ${(parsed as { format: string }).format} output without its "input" study file`);
    return { name, input: inner };
  }
  return { name, input: parsed };
}

/** Prints a description error with every problem, one per line. */
function reportInputError(io: CliIo, file: string, e: InputError): void {
  const problems = e instanceof HeaterDescriptionError ? e.problems : [e];
  io.stderr(`fluxwright: ${file}: invalid study file (${problems.length} problem${problems.length === 1 ? "" : "s"}):\n`);
  for (const p of problems) io.stderr(`  ${p.parameter}: ${p.message.replace(/^[^:]*: /u, "")}\n`);
}

/** Checks a study file as a file must be (units on every quantity with a dimension); returns an exit status or null. */
function checkStudyFile(io: CliIo, file: StudyFile): number | null {
  try {
    readHeaterDescription(file.input, { requireUnits: true });
    return null;
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    reportInputError(io, file.name, e);
    return EXIT_USAGE;
  }
}

function single(parsed: Parsed, command: string): string {
  if (parsed.positional.length !== 1) throw new UsageError(`${command} takes exactly one study file, got ${parsed.positional.length}`);
  return parsed.positional[0] as string;
}

/** Writes an output file, never over the input, atomically (see CliIo.writeFile); OutputError on failure. */
function writeOutput(io: CliIo, what: string, path: string, text: string, input: string): void {
  const same = io.samePath ?? ((a: string, b: string) => a === b);
  if (input !== "-" && same(path, input)) throw new UsageError(`refusing to write the ${what} over the study file ${path}: choose another output path`);
  try {
    io.writeFile(path, text);
  } catch (e) {
    throw new OutputError(`cannot write the ${what} to ${path}: ${fsReason(e)}; nothing was changed there`);
  }
}

/** JSON text for an output: the envelope (format, versions, the input study file) and the result. */
function jsonOutput(io: CliIo, format: string, file: StudyFile, result: object): string {
  const envelope = { format, formatVersion: JSON_FORMAT_VERSION, fluxwright: io.version ?? "unknown", input: file.input, ...result };
  return `${JSON.stringify(envelope, null, 2)}\n`;
}

/** Handles an InputError of a study run on a valid file: an impossible design (exit 3). */
function designFailure(io: CliIo, command: string, file: StudyFile, e: unknown): number {
  if (e instanceof HeaterDescriptionError) {
    reportInputError(io, file.name, e);
    return EXIT_USAGE;
  }
  if (e instanceof InputError) {
    io.stderr(designErrorText(command, file.name, e, file.input));
    return EXIT_DESIGN;
  }
  throw e;
}

function studyCommand(args: readonly string[], io: CliIo): number {
  const parsed = parseArgs(args, ["html", "model"], ["json", "quiet"]);
  if (parsed.flags.has("help")) {
    io.stdout(HELP.study as string);
    return EXIT_OK;
  }
  const path = single(parsed, "study");
  const html = parsed.flags.get("html");
  const same = io.samePath ?? ((a: string, b: string) => a === b);
  if (typeof html === "string" && path !== "-" && same(html, path)) throw new UsageError(`refusing to write the HTML report over the study file ${html}: choose another output path`);
  const model = parsed.flags.get("model");
  if (model !== undefined && model !== "field" && model !== "closed-form") throw new UsageError(`--model must be "closed-form" or "field", got ${String(model)}`);
  const file = loadStudyFile(io, path);
  const bad = checkStudyFile(io, file);
  if (bad !== null) return bad;
  let study;
  try {
    study = studyHeater(file.input as HeaterDescription, model === "field" ? { model } : {});
  } catch (e) {
    return designFailure(io, "study", file, e);
  }
  const json = parsed.flags.has("json");
  if (json) io.stdout(jsonOutput(io, "fluxwright-study", file, study));
  else if (!(parsed.flags.has("quiet") && typeof html === "string")) io.stdout(studyTextReport(study, file.name));
  if (typeof html === "string") {
    writeOutput(io, "HTML report", html, studyHtmlReport(study, file.name), path);
    (json ? io.stderr : io.stdout)(`HTML report written to ${html}\n`);
  }
  return EXIT_OK;
}

function splitList(text: string): (number | string)[] {
  return text
    .split(",")
    .map((s) => s.trim())
    .filter((s) => s !== "")
    .map((s) => (/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/u.test(s) ? Number(s) : s));
}

/** The value of `--workers`, or undefined. */
function workersOption(parsed: Parsed): number | undefined {
  const text = parsed.flags.get("workers");
  if (typeof text !== "string") return undefined;
  const n = Number(text);
  if (!/^\d+$/u.test(text.trim()) || !Number.isInteger(n) || n > 256) throw new UsageError(`--workers must be an integer from 0 to 256, got ${text}`);
  return n;
}

/** The value of `--shard I/N`, or undefined. */
function shardOption(parsed: Parsed): HeaterShard | undefined {
  const text = parsed.flags.get("shard");
  if (typeof text !== "string") return undefined;
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/u.exec(text);
  const index = Number(m?.[1]);
  const count = Number(m?.[2]);
  if (m === null || !(count >= 1 && count <= 1e6 && index >= 1 && index <= count)) throw new UsageError(`--shard must be I/N with 1 <= I <= N (e.g. 2/8), got ${text}`);
  return { index, count };
}

/** A progress display for a command's run. */
function displayFor(io: CliIo, what: string, quiet: boolean, plainLine?: Parameters<typeof progressDisplay>[2]): ProgressDisplay {
  return progressDisplay({ write: io.rawStderr ?? io.stderr, terminal: io.stderrIsTerminal === true, quiet }, what, plainLine);
}

/** Maps a failure of a sweep to its message and exit status. */
function sweepFailure(io: CliIo, file: StudyFile, e: unknown): number {
  if (e instanceof HeaterDescriptionError) {
    reportInputError(io, file.name, e);
    return EXIT_USAGE;
  }
  if (e instanceof InputError && (e.where === "sweepHeater" || e.where === "sweepHeaterStream")) throw new UsageError(e.message.replace(/^sweepHeater(Stream)?: /u, "--"));
  return designFailure(io, "sweep", file, e);
}

function sweepCommand(args: readonly string[], io: CliIo): number | Promise<number> {
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

function optimiseCommand(args: readonly string[], io: CliIo): number | Promise<number> {
  const parsed = parseArgs(
    args,
    ["power", "time", "turns", "min-capacitance", "max-capacitance", "series", "max-tank-voltage", "max-coil-current", "max-supply-current", "min-frequency", "max-frequency", "keep", "workers", "shard"],
    ["json", "quiet"],
  );
  if (parsed.flags.has("help")) {
    io.stdout(HELP.optimise as string);
    return EXIT_OK;
  }
  const path = single(parsed, "optimise");
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
  const limitFlags: [string, keyof HeaterLimits][] = [
    ["max-tank-voltage", "tankVoltagePeak"],
    ["max-coil-current", "coilCurrentRms"],
    ["max-supply-current", "supplyCurrent"],
    ["min-frequency", "minFrequency"],
    ["max-frequency", "maxFrequency"],
  ];
  for (const [flag, key] of limitFlags) {
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
  const goal = {
    ...(power === undefined ? {} : { targetPower: power }),
    ...(time === undefined ? {} : { targetTime: time }),
    limits,
    search,
    ...(keep === undefined ? {} : { keep }),
  } as HeaterGoal;
  const file = loadStudyFile(io, path);
  const bad = checkStudyFile(io, file);
  if (bad !== null) return bad;
  const quiet = parsed.flags.has("quiet");
  const shard = shardOption(parsed);
  if (shard !== undefined && !parsed.flags.has("json")) throw new UsageError("--shard needs --json (fluxwright merge reads the shards' JSON)");
  const workers = workersOption(parsed) ?? io.defaultWorkers ?? (shard === undefined ? undefined : 0);
  if (!quiet) io.stderr(`searching designs around ${file.name}${shard === undefined ? "" : ` (shard ${shard.index}/${shard.count})`}…\n`);
  const started = Date.now();
  const failed = (e: unknown): number => {
    if (e instanceof HeaterDescriptionError) {
      reportInputError(io, file.name, e);
      return EXIT_USAGE;
    }
    if (e instanceof InputError && e.parameter.startsWith("goal")) throw new UsageError(`${e.message.replace(/^optimiseHeater: /u, "")} (from the command-line options)`);
    return designFailure(io, "optimise", file, e);
  };
  const finish = (result: HeaterOptimisation): number => {
    if (!quiet) io.stderr(`evaluated ${result.evaluated} candidates in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
    for (const w of result.warnings) io.stderr(`fluxwright optimise: warning: ${w}\n`);
    io.stdout(parsed.flags.has("json") ? jsonOutput(io, "fluxwright-optimisation", file, result) : optimisationTextReport(result));
    return EXIT_OK;
  };
  if (workers !== undefined) {
    return (async () => {
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
        if (interrupt?.signal.aborted !== true) return failed(e);
        io.stderr(`fluxwright optimise: interrupted after ${last.done} of ${last.total} candidates; no designs are reported (the ranking needs every candidate)\n`);
        return EXIT_INTERRUPTED;
      } finally {
        interrupt?.stop();
      }
      display.end();
      return finish(result);
    })();
  }
  let result;
  try {
    result = optimiseHeater(file.input as HeaterDescription, goal, {
      onProgress: (done, total) => {
        if (total >= 1000 && !quiet) io.stderr(`  ${done} / ${total} candidates (${Math.round((100 * done) / total)} %)\n`);
      },
    });
  } catch (e) {
    return failed(e);
  }
  return finish(result);
}

function newCommand(args: readonly string[], io: CliIo): number {
  const parsed = parseArgs(args, ["example"], []);
  if (parsed.flags.has("help")) {
    io.stdout(HELP.new as string);
    return EXIT_OK;
  }
  if (parsed.positional.length !== 1) throw new UsageError(`new takes exactly one output file, got ${parsed.positional.length}`);
  const path = parsed.positional[0] as string;
  const example = parsed.flags.get("example") ?? "bearing-race";
  if (typeof example !== "string" || !(EXAMPLES as readonly string[]).includes(example)) {
    throw new UsageError(`--example must be one of ${EXAMPLES.join(", ")}, got ${String(example)}`);
  }
  if (io.readPackageFile === undefined) throw new UsageError("the shipped examples are not available here");
  let exists = true;
  try {
    io.readFile(path);
  } catch {
    exists = false;
  }
  if (exists) throw new UsageError(`${path} already exists; choose a new file name`);
  const text = io.readPackageFile(`docs/examples/study-${example}.json`);
  writeOutput(io, "study file", path, text, "-");
  io.stdout(`study file written to ${path}; run it with: fluxwright study ${path}\n`);
  return EXIT_OK;
}

const COMMANDS: Record<string, (args: readonly string[], io: CliIo) => number | Promise<number>> = {
  study: studyCommand,
  sweep: sweepCommand,
  merge: (args, io) => mergeCommand(args, io, parseArgs),
  optimise: optimiseCommand,
  optimize: optimiseCommand,
  new: newCommand,
};

/**
 * Terminal control characters (C0 except tab, newline and the CR of a CRLF; DEL; C1) written as `\x1B`-style
 * escapes, so a title or a file name cannot move the cursor, recolour or clear the terminal.
 */
export function escapeControls(text: string): string {
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  return text.replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]|\r(?!\n)/gu, (c) => `\\x${c.charCodeAt(0).toString(16).toUpperCase().padStart(2, "0")}`);
}

/**
 * Runs the command line with the given arguments (without the program name).
 *
 * @returns the exit status; a promise of it for the commands that run on the worker pool or
 * stream (`sweep` and `optimise` with `--workers`, `--ndjson`, `--shard` or `io.defaultWorkers`,
 * and `merge`)
 */
export function runCli(args: readonly string[], rawIo: CliIo): number | Promise<number> {
  // JSON outputs escape control characters themselves (\u001b); text outputs get them escaped here
  const jsonMode = args.includes("--json") || args.includes("--ndjson") || (args[0] === "merge" && !args.includes("--csv"));
  const io: CliIo = {
    ...rawIo,
    stdout: (t) => {
      rawIo.stdout(jsonMode ? t.replace(/[\u007F-\u009F]/gu, (c) => `\\u00${c.charCodeAt(0).toString(16).toUpperCase()}`) : escapeControls(t));
    },
    stderr: (t) => {
      rawIo.stderr(escapeControls(t));
    },
    rawStderr: rawIo.stderr,
  };
  const [command, ...rest] = args;
  if (command === undefined) {
    io.stderr(MAIN_HELP);
    return EXIT_USAGE;
  }
  if (command === "-h" || command === "--help") {
    io.stdout(MAIN_HELP);
    return EXIT_OK;
  }
  if (command === "help") {
    const topic = rest[0];
    const text = topic === undefined ? MAIN_HELP : HELP[topic === "optimize" ? "optimise" : topic];
    if (text === undefined) {
      io.stderr(`fluxwright: no help for ${JSON.stringify(topic)}\n`);
      return EXIT_USAGE;
    }
    io.stdout(text);
    return EXIT_OK;
  }
  if (command === "--version" || command === "-V") {
    io.stdout(`fluxwright ${io.version ?? "(version unknown)"}\n`);
    return EXIT_OK;
  }
  const run = COMMANDS[command];
  if (run === undefined) {
    const near = nearestName(command, Object.keys(COMMANDS));
    io.stderr(`fluxwright: unknown command ${JSON.stringify(command)}${near === null ? "" : ` (did you mean "${near}"?)`}; try "fluxwright --help"\n`);
    return EXIT_USAGE;
  }
  const failure = (e: unknown): number => {
    if (e instanceof UsageError) {
      io.stderr(`fluxwright ${command}: ${e.message}\n(see "fluxwright ${command} --help")\n`);
      return EXIT_USAGE;
    }
    if (e instanceof OutputError) {
      io.stderr(`fluxwright ${command}: ${e.message}\n`);
      return EXIT_OUTPUT;
    }
    if (e instanceof InputError) {
      io.stderr(`fluxwright ${command}: ${e.message}\n`);
      return EXIT_USAGE;
    }
    io.stderr(`fluxwright ${command}: failed: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
    return EXIT_FAILURE;
  };
  try {
    const status = run(rest, io);
    return typeof status === "number" ? status : status.catch(failure);
  } catch (e) {
    return failure(e);
  }
}
