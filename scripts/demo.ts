/**
 * The demo behind `npm run demo`: studies the battery-powered shrink-fit heater for a steel
 * bearing race (docs/examples/study-bearing-race.json), prints the text report and writes the
 * HTML report with plots to docs/report/bearing-race.html (its path is printed last).
 *
 * Run: npx tsx scripts/demo.ts [study-file] [output.html]
 */
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { dirname, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { studyHtmlReport } from "../src/report/index.js";
import { studyTextReport } from "../src/report/index.js";
import { studyHeater } from "../src/index.js";
import type { HeaterDescription } from "../src/index.js";

const root = resolve(dirname(fileURLToPath(import.meta.url)), "..");
const studyFile = resolve(process.argv[2] ?? resolve(root, "docs/examples/study-bearing-race.json"));
const output = resolve(process.argv[3] ?? resolve(root, "docs/report/bearing-race.html"));
const shown = relative(process.cwd(), studyFile) || studyFile;

const study = studyHeater(JSON.parse(readFileSync(studyFile, "utf8")) as HeaterDescription);
process.stdout.write(studyTextReport(study, shown));
mkdirSync(dirname(output), { recursive: true });
writeFileSync(output, studyHtmlReport(study, relative(root, studyFile)), "utf8");
process.stdout.write(`\nHTML report with plots: ${output}\n`);
