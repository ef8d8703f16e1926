/**
 * Study files on the command line: reading and parsing them (with line and column for JSON
 * errors), reporting their problems, writing outputs beside them, the JSON output envelope, and
 * the message of a design that cannot run.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { HeaterDescriptionError, readHeaterDescription } from "../study/index.js";
import { designErrorText } from "../report/design-error.js";
import { OutputError, UsageError } from "./errors.js";
import { EXIT_DESIGN, EXIT_USAGE, JSON_FORMAT_VERSION } from "./io.js";
import type { CliIo } from "./io.js";
import { jsonSyntaxError } from "./json-error.js";

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
export function fsReason(e: unknown): string {
  const code = (e as { code?: unknown }).code;
  if (typeof code !== "string") return e instanceof Error ? e.message : String(e);
  return `${FS_ERRORS[code] ?? "failed"} (${code})`;
}

/** Line and column (1-based) of a character offset in a text. */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, Math.max(0, Math.min(offset, text.length)));
  const lines = before.split("\n");
  return { line: lines.length, column: Array.from(lines[lines.length - 1] ?? "").length + 1 };
}

/** The kinds of JSON output, each carrying the study file it was computed from as `input`. */
const OUTPUT_FORMATS = ["fluxwright-study", "fluxwright-sweep", "fluxwright-optimisation"];

/** A study file read and parsed: the parsed JSON, and where it came from for messages. */
export interface StudyFile {
  readonly name: string;
  readonly input: unknown;
}

/**
 * Reads and parses a study file (`-` is standard input; a UTF-8 byte-order mark is skipped; the
 * JSON output of `study`, `sweep` or `optimise` is read back through the study file it carries),
 * or throws a UsageError with a useful message: JSON syntax errors give line and column.
 */
export function loadStudyFile(io: CliIo, path: string): StudyFile {
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
export function reportInputError(io: CliIo, file: string, e: InputError): void {
  const problems = e instanceof HeaterDescriptionError ? e.problems : [e];
  io.stderr(`fluxwright: ${file}: invalid study file (${problems.length} problem${problems.length === 1 ? "" : "s"}):\n`);
  for (const p of problems) io.stderr(`  ${p.parameter}: ${p.message.replace(/^[^:]*: /u, "")}\n`);
}

/** Checks a study file as a file must be (units on every quantity with a dimension); returns an exit status or null. */
export function checkStudyFile(io: CliIo, file: StudyFile): number | null {
  try {
    readHeaterDescription(file.input, { requireUnits: true });
    return null;
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    reportInputError(io, file.name, e);
    return EXIT_USAGE;
  }
}


/** Writes an output file, never over the input, atomically (see CliIo.writeFile); OutputError on failure. */
export function writeOutput(io: CliIo, what: string, path: string, text: string, input: string): void {
  const same = io.samePath ?? ((a: string, b: string) => a === b);
  if (input !== "-" && same(path, input)) throw new UsageError(`refusing to write the ${what} over the study file ${path}: choose another output path`);
  try {
    io.writeFile(path, text);
  } catch (e) {
    throw new OutputError(`cannot write the ${what} to ${path}: ${fsReason(e)}; nothing was changed there`);
  }
}

/** JSON text for an output: the envelope (format, versions, the input study file) and the result. */
export function jsonOutput(io: CliIo, format: string, file: StudyFile, result: object): string {
  const envelope = { format, formatVersion: JSON_FORMAT_VERSION, fluxwright: io.version ?? "unknown", input: file.input, ...result };
  return `${JSON.stringify(envelope, null, 2)}\n`;
}

/** Handles an InputError of a study run on a valid file: an impossible design (exit 3). */
export function designFailure(io: CliIo, command: string, file: StudyFile, e: unknown): number {
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
