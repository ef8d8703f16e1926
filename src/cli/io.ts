/**
 * What the commands of the command line need from the outside world, their exit codes, and the
 * escaping of text written to a terminal.
 *
 * @packageDocumentation
 */
import { progressDisplay } from "./progress.js";
import type { ProgressDisplay } from "./progress.js";

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

/** A progress display for a command's run. */
export function displayFor(io: CliIo, what: string, quiet: boolean, plainLine?: Parameters<typeof progressDisplay>[2]): ProgressDisplay {
  return progressDisplay({ write: io.rawStderr ?? io.stderr, terminal: io.stderrIsTerminal === true, quiet }, what, plainLine);
}

/**
 * Terminal control characters (C0 except tab, newline and the CR of a CRLF; DEL; C1) written as `\x1B`-style
 * escapes, so a title or a file name cannot move the cursor, recolour or clear the terminal.
 */
export function escapeControls(text: string): string {
  // eslint-disable-next-line no-control-regex -- matching control characters is the point
  return text.replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]|\r(?!\n)/gu, (c) => `\\x${c.charCodeAt(0).toString(16).toUpperCase().padStart(2, "0")}`);
}
