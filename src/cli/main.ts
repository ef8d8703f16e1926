/**
 * The `fluxwright` command line: `fluxwright study FILE [--json] [--html OUT]`, `sweep`,
 * `optimise`, `help`. See `fluxwright --help`.
 */
import { readFileSync, writeFileSync } from "node:fs";
import { runCli } from "./commands.js";

// A reader that closes the pipe early (`fluxwright study f.json | head`) is normal Unix use:
// stop quietly instead of throwing EPIPE.
for (const stream of [process.stdout, process.stderr]) {
  stream.on("error", (error: NodeJS.ErrnoException) => {
    if (error.code === "EPIPE") process.exit(process.exitCode ?? 0);
    throw error;
  });
}

process.exitCode = runCli(process.argv.slice(2), {
  stdout: (text) => {
    process.stdout.write(text);
  },
  stderr: (text) => {
    process.stderr.write(text);
  },
  readFile: (path) => readFileSync(path, "utf8"),
  writeFile: (path, text) => {
    writeFileSync(path, text, "utf8");
  },
});
