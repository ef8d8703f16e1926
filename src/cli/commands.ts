/**
 * The `fluxwright` subcommands, written against a small I/O interface so that tests can run
 * them in-process. Exit codes: 0 success, 1 an unexpected failure, 2 bad usage or a bad study
 * file (the message names the field path; no report is written), 3 a valid file whose design
 * cannot run, 4 an output that could not be written.
 */
import { InputError, nearestName } from "../core/index.js";
import { studyHeater } from "../study/index.js";
import type { HeaterDescription } from "../study/index.js";
import { studyHtmlReport, studyTextReport } from "../report/index.js";
import { parseArgs, single } from "./args.js";
import { OutputError, UsageError } from "./errors.js";
import { EXAMPLES, HELP, MAIN_HELP } from "./help.js";
import { escapeControls, EXIT_FAILURE, EXIT_OK, EXIT_OUTPUT, EXIT_USAGE } from "./io.js";
import type { CliIo } from "./io.js";
import { mergeCommand } from "./merge.js";
import { optimiseCommand } from "./optimise-command.js";
import { checkStudyFile, designFailure, jsonOutput, loadStudyFile, writeOutput } from "./study-file.js";
import { sweepCommand } from "./sweep-command.js";

export type { CliIo } from "./io.js";
export { EXIT_OK, EXIT_FAILURE, EXIT_USAGE, EXIT_DESIGN, EXIT_OUTPUT, EXIT_INTERRUPTED, JSON_FORMAT_VERSION, escapeControls } from "./io.js";

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
