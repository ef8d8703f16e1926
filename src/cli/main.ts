/**
 * The `fluxwright` command line: `fluxwright study FILE [--json] [--html OUT]`, `sweep`,
 * `optimise`, `help`. See `fluxwright --help`.
 */
import { readFileSync, writeFileSync } from "node:fs";
import { runCli } from "./commands.js";

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
