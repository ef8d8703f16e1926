/**
 * The `fluxwright` subcommands, written against a small I/O interface so that tests can run
 * them in-process. Exit codes: 0 success, 1 the computation failed, 2 bad usage or a bad study
 * file (the message names the field path; no report is written).
 */
import { InputError } from "../core/index.js";
import { HeaterDescriptionError, optimizeHeater, studyHeater, sweepHeater } from "../study/index.js";
import type { HeaterGoal, HeaterLimits } from "../study/index.js";
import { studyHtmlReport } from "./html-report.js";
import { optimisationTextReport, studyTextReport, sweepTextReport } from "./text-report.js";

/** What the commands need from the outside world. */
export interface CliIo {
  /** Writes to standard output. */
  readonly stdout: (text: string) => void;
  /** Writes to standard error (progress, errors). */
  readonly stderr: (text: string) => void;
  /** Reads a UTF-8 file; throws with `code: "ENOENT"` etc. on failure. */
  readonly readFile: (path: string) => string;
  /** Writes a UTF-8 file. */
  readonly writeFile: (path: string, text: string) => void;
}

/** Exit codes. */
export const EXIT_OK = 0;
/** The computation failed (a bug or an unexpected condition). */
export const EXIT_FAILURE = 1;
/** Bad usage or a bad study file. */
export const EXIT_USAGE = 2;

const MAIN_HELP = `usage: fluxwright <command> [options]

Induction-heater design studies from a JSON study file.

commands:
  study FILE [--json] [--html OUT]      run a study: text report, JSON, or an HTML report with plots
  sweep FILE --field PATH --values LIST  vary one field of the study file over values
  optimise FILE --power W | --time S     search turns, capacitance and frequency for a goal
  help [COMMAND]                         show help for a command

Study files: see docs/heater-study.schema.json and docs/examples/study-*.json.
Exit status: 0 success, 1 computation failed, 2 bad usage or bad study file.
`;

const HELP: Record<string, string> = {
  study: `usage: fluxwright study FILE [--json] [--html OUT] [--quiet]

Runs the heater study in FILE (JSON; quantities as SI numbers or text such as "30 mm") and
prints a text report: cautions first, the design, operating points empty / cold / at target,
where the power goes, the heat-up and the validity notes.

options:
  --json        print the full study result as JSON instead of the text report
  --html OUT    also write a self-contained HTML report with plots to OUT
  --quiet       with --html: print only the report's path
  -h, --help    show this help

A bad study file exits with status 2 and a message naming the field path; nothing is written.
`,
  sweep: `usage: fluxwright sweep FILE --field PATH --values LIST [--json] [--no-heat-up]

Varies one numeric field of the study in FILE and prints a table of headline numbers per value.

options:
  --field PATH    dotted field path, e.g. coil.turns, capacitor.capacitance, supply.voltage
  --values LIST   comma-separated values, SI numbers or quantities: "4,5,6" or "2.2 µF,3.3 µF"
  --no-heat-up    skip the heat-up (faster; no time to target)
  --json          print the sweep as JSON
  -h, --help      show this help

Progress goes to standard error.
`,
  optimise: `usage: fluxwright optimise FILE (--power W | --time S) [limits] [--keep N] [--json]

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
  -h, --help             show this help

Progress goes to standard error.
`,
};

/** A usage error (exit 2). */
class UsageError extends Error {}

interface Parsed {
  positional: string[];
  flags: Map<string, string | true>;
}

/** Parses `--name value`, `--name=value` and boolean `--name` options. */
function parseArgs(args: readonly string[], valued: readonly string[], booleans: readonly string[]): Parsed {
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    if (a === "-h" || a === "--help") {
      flags.set("help", true);
      continue;
    }
    if (a.startsWith("--")) {
      const eq = a.indexOf("=");
      const name = eq < 0 ? a.slice(2) : a.slice(2, eq);
      if (valued.includes(name)) {
        const value = eq < 0 ? args[++i] : a.slice(eq + 1);
        if (value === undefined || (eq < 0 && value.startsWith("--"))) throw new UsageError(`option --${name} needs a value`);
        flags.set(name, value);
      } else if (booleans.includes(name) && eq < 0) {
        flags.set(name, true);
      } else {
        throw new UsageError(`unknown option ${a}`);
      }
      continue;
    }
    positional.push(a);
  }
  return { positional, flags };
}

/** Reads and parses a study file, or throws a UsageError with a useful message. */
function loadStudyFile(io: CliIo, path: string): unknown {
  let text: string;
  try {
    text = io.readFile(path);
  } catch (e) {
    const code = (e as { code?: string }).code;
    throw new UsageError(`cannot read ${path}${code === undefined ? "" : ` (${code})`}`);
  }
  try {
    return JSON.parse(text) as unknown;
  } catch (e) {
    throw new UsageError(`${path} is not valid JSON: ${(e as Error).message}`);
  }
}

/** Prints a description error with every problem, one per line. */
function reportInputError(io: CliIo, path: string, e: InputError): void {
  const problems = e instanceof HeaterDescriptionError ? e.problems : [e];
  io.stderr(`fluxwright: ${path}: invalid study file (${problems.length} problem${problems.length === 1 ? "" : "s"}):\n`);
  for (const p of problems) io.stderr(`  ${p.parameter}: ${p.message.replace(/^[^:]*: /, "")}\n`);
}

function single(parsed: Parsed, command: string): string {
  if (parsed.positional.length !== 1) throw new UsageError(`${command} takes exactly one study file, got ${parsed.positional.length}`);
  return parsed.positional[0] as string;
}

function studyCommand(args: readonly string[], io: CliIo): number {
  const parsed = parseArgs(args, ["html"], ["json", "quiet"]);
  if (parsed.flags.has("help")) {
    io.stdout(HELP.study as string);
    return EXIT_OK;
  }
  const file = single(parsed, "study");
  const input = loadStudyFile(io, file);
  let study;
  try {
    study = studyHeater(input);
  } catch (e) {
    if (e instanceof HeaterDescriptionError) {
      reportInputError(io, file, e);
      return EXIT_USAGE;
    }
    if (e instanceof InputError) {
      io.stderr(`fluxwright study: ${file}: the design cannot be studied: ${e.expected}\n`);
      return EXIT_FAILURE;
    }
    throw e;
  }
  const html = parsed.flags.get("html");
  if (typeof html === "string") {
    io.writeFile(html, studyHtmlReport(study, file));
  }
  const json = parsed.flags.has("json");
  if (json) io.stdout(`${JSON.stringify(study, null, 2)}\n`);
  else if (!(parsed.flags.has("quiet") && typeof html === "string")) io.stdout(studyTextReport(study, file));
  if (typeof html === "string") (json ? io.stderr : io.stdout)(`HTML report written to ${html}\n`);
  return EXIT_OK;
}

function splitList(text: string): (number | string)[] {
  return text
    .split(",")
    .map((s) => s.trim())
    .filter((s) => s !== "")
    .map((s) => (/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(s) ? Number(s) : s));
}

function sweepCommand(args: readonly string[], io: CliIo): number {
  const parsed = parseArgs(args, ["field", "values"], ["json", "no-heat-up"]);
  if (parsed.flags.has("help")) {
    io.stdout(HELP.sweep as string);
    return EXIT_OK;
  }
  const file = single(parsed, "sweep");
  const field = parsed.flags.get("field");
  const values = parsed.flags.get("values");
  if (typeof field !== "string") throw new UsageError("sweep needs --field PATH");
  if (typeof values !== "string") throw new UsageError("sweep needs --values LIST");
  const input = loadStudyFile(io, file);
  const list = splitList(values);
  io.stderr(`sweeping ${field} over ${list.length} values…\n`);
  let result;
  try {
    result = sweepHeater(input, { field, values: list, heatUp: !parsed.flags.has("no-heat-up") });
  } catch (e) {
    if (e instanceof InputError) {
      reportInputError(io, file, e);
      return EXIT_USAGE;
    }
    throw e;
  }
  io.stdout(parsed.flags.has("json") ? `${JSON.stringify(result, null, 2)}\n` : sweepTextReport(result));
  return EXIT_OK;
}

function optimiseCommand(args: readonly string[], io: CliIo): number {
  const parsed = parseArgs(
    args,
    ["power", "time", "turns", "min-capacitance", "max-capacitance", "series", "max-tank-voltage", "max-coil-current", "max-supply-current", "min-frequency", "max-frequency", "keep"],
    ["json"],
  );
  if (parsed.flags.has("help")) {
    io.stdout(HELP.optimise as string);
    return EXIT_OK;
  }
  const file = single(parsed, "optimise");
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
  const input = loadStudyFile(io, file);
  io.stderr(`searching designs around ${file}…\n`);
  const started = Date.now();
  let result;
  try {
    result = optimizeHeater(input, goal, {
      onProgress: (done, total) => {
        if (total >= 1000) io.stderr(`  ${done} / ${total} candidates (${Math.round((100 * done) / total)} %)\n`);
      },
    });
  } catch (e) {
    if (e instanceof InputError) {
      reportInputError(io, file, e);
      return EXIT_USAGE;
    }
    throw e;
  }
  io.stderr(`evaluated ${result.evaluated} candidates in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);
  io.stdout(parsed.flags.has("json") ? `${JSON.stringify(result, null, 2)}\n` : optimisationTextReport(result));
  return EXIT_OK;
}

const COMMANDS: Record<string, (args: readonly string[], io: CliIo) => number> = {
  study: studyCommand,
  sweep: sweepCommand,
  optimise: optimiseCommand,
  optimize: optimiseCommand,
};

/**
 * Runs the command line with the given arguments (without the program name).
 *
 * @returns the exit status
 */
export function runCli(args: readonly string[], io: CliIo): number {
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
    io.stdout("fluxwright\n");
    return EXIT_OK;
  }
  const run = COMMANDS[command];
  if (run === undefined) {
    io.stderr(`fluxwright: unknown command ${JSON.stringify(command)}; try "fluxwright --help"\n`);
    return EXIT_USAGE;
  }
  try {
    return run(rest, io);
  } catch (e) {
    if (e instanceof UsageError) {
      io.stderr(`fluxwright ${command}: ${e.message}\n(see "fluxwright ${command} --help")\n`);
      return EXIT_USAGE;
    }
    if (e instanceof InputError) {
      io.stderr(`fluxwright ${command}: ${e.message}\n`);
      return EXIT_USAGE;
    }
    io.stderr(`fluxwright ${command}: failed: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
    return EXIT_FAILURE;
  }
}
