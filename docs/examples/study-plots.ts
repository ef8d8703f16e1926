/**
 * The study guide's figures: the heat-up of the forging-bar demo through the Curie point and its
 * operating point against temperature, drawn with the report's own plots. Checks that the
 * frequency drifts down below the Curie point and jumps back up past it; with `--write` it
 * also writes docs/img/study-heat-up-through-curie.svg and docs/img/study-temperature-scan.svg.
 *
 * Run: npx tsx docs/examples/study-plots.ts [--write]
 */
import { readFileSync, writeFileSync } from "node:fs";
import { studyPlots } from "../../src/report/index.js";
import { studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";

const study = studyHeater(JSON.parse(readFileSync(new URL("./study-forging-bar.json", import.meta.url), "utf8")) as HeaterDescription);
const curie = study.part.curieTemperature;
const h = study.heatUp;
if (curie === null || h === null || h.curieCrossingTime === null) throw new Error("the forging bar should cross its Curie point");
// the frequency falls while the bar is magnetic, then jumps back up past the Curie point (common practice)
const fAt = (t: number): number => h.frequencies[h.times.findIndex((x) => x >= t)] ?? Number.NaN;
const start = h.frequencies[0] ?? Number.NaN;
const before = fAt(h.curieCrossingTime * 0.7);
const after = h.frequencies[h.frequencies.length - 1] ?? Number.NaN;
if (!(before < start && after > start)) throw new Error(`frequency drift ${start} → ${before} → ${after} not as expected`);
console.log(`frequency ${(start / 1e3).toFixed(1)} kHz → ${(before / 1e3).toFixed(1)} kHz before Curie → ${(after / 1e3).toFixed(1)} kHz after (Curie point crossed at ${h.curieCrossingTime.toFixed(0)} s)`);

const plots = studyPlots(study);
const heat = plots.find((p) => p.svg.includes("Heat-up"));
const scan = plots.find((p) => p.svg.includes("against part temperature"));
if (heat === undefined || scan === undefined) throw new Error("plots missing");
if (process.argv.includes("--write")) {
  writeFileSync(new URL("../img/study-heat-up-through-curie.svg", import.meta.url), heat.svg);
  writeFileSync(new URL("../img/study-temperature-scan.svg", import.meta.url), scan.svg);
  console.log("wrote docs/img/study-heat-up-through-curie.svg and docs/img/study-temperature-scan.svg");
}
