/**
 * The `fluxwright` command line: `fluxwright study FILE [--json] [--html OUT]`, `sweep`,
 * `optimise`, `new`, `help`. See `fluxwright --help`.
 */
import { closeSync, existsSync, fsyncSync, openSync, readFileSync, realpathSync, renameSync, statSync, unlinkSync, writeSync } from "node:fs";
import { basename, dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { EXIT_OUTPUT, runCli } from "./commands.js";

/** The package root: this file is `src/cli/main.ts` or `dist/cli/main.js`, two levels down. */
const packageRoot = fileURLToPath(new URL("../../", import.meta.url));

function packageVersion(): string | undefined {
  try {
    const pkg = JSON.parse(readFileSync(join(packageRoot, "package.json"), "utf8")) as { name?: unknown; version?: unknown };
    return pkg.name === "fluxwright" && typeof pkg.version === "string" ? pkg.version : undefined;
  } catch {
    return undefined;
  }
}

/** Whether two paths name the same file: the same inode when both exist, else the same absolute path. */
function samePath(a: string, b: string): boolean {
  try {
    if (existsSync(a) && existsSync(b)) {
      const sa = statSync(a);
      const sb = statSync(b);
      return sa.dev === sb.dev && sa.ino === sb.ino;
    }
    const real = (p: string): string => join(realpathSync(dirname(resolve(p))), basename(p));
    return real(a) === real(b);
  } catch {
    return resolve(a) === resolve(b);
  }
}

/**
 * Writes `text` to a temporary file in the target's directory, flushes it, and renames it over
 * the target: a failure (missing directory, permissions, a full disk, a file-size limit) leaves
 * the old file untouched and no temporary file behind.
 */
function writeFileAtomic(path: string, text: string): void {
  const temporary = join(dirname(resolve(path)), `.${basename(path)}.${process.pid}.tmp`);
  let fd: number | undefined;
  try {
    fd = openSync(temporary, "wx", 0o644);
    const bytes = Buffer.from(text, "utf8");
    let written = 0;
    while (written < bytes.length) written += writeSync(fd, bytes, written, bytes.length - written);
    fsyncSync(fd);
    closeSync(fd);
    fd = undefined;
    renameSync(temporary, path);
  } catch (e) {
    if (fd !== undefined) {
      try {
        closeSync(fd);
      } catch {
        // already failing: report the first error
      }
    }
    try {
      unlinkSync(temporary);
    } catch {
      // never created
    }
    throw e;
  }
}

// Past a file-size limit (ulimit -f) the kernel sends SIGXFSZ, which would kill the process
// mid-write; ignored, the write fails with EFBIG and is reported like any other.
process.on("SIGXFSZ", () => undefined);

/** A failed write to standard output or error: one line, exit status 4 (a closed pipe exits quietly, as Unix tools do). */
function streamFailed(stream: "standard output" | "standard error", error: NodeJS.ErrnoException): never {
  if (error.code === "EPIPE") process.exit(process.exitCode ?? 0);
  if (stream === "standard output") {
    try {
      process.stderr.write(`fluxwright: cannot write to standard output: ${error.code ?? error.message}\n`);
    } catch {
      // nothing left to report to
    }
  }
  process.exit(EXIT_OUTPUT);
}

process.stdout.on("error", (error: NodeJS.ErrnoException) => streamFailed("standard output", error));
process.stderr.on("error", (error: NodeJS.ErrnoException) => streamFailed("standard error", error));

process.exitCode = runCli(process.argv.slice(2), {
  stdout: (text) => {
    try {
      process.stdout.write(text);
    } catch (e) {
      streamFailed("standard output", e as NodeJS.ErrnoException);
    }
  },
  stderr: (text) => {
    try {
      process.stderr.write(text);
    } catch (e) {
      streamFailed("standard error", e as NodeJS.ErrnoException);
    }
  },
  readFile: (path) => readFileSync(path, "utf8"),
  readStdin: () => readFileSync(0, "utf8"),
  writeFile: writeFileAtomic,
  samePath,
  version: packageVersion(),
  readPackageFile: (path) => readFileSync(join(packageRoot, path), "utf8"),
});
