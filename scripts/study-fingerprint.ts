/**
 * Exact fingerprint of the demo studies, to show that a speed change leaves every result bit for
 * bit unchanged. Runs `studyHeater` on each demo study file (every part of the study), a sweep
 * with the heat-up, a search, and the coupling functions whose kernels the studies share, on a
 * built package, and prints one SHA-256 per case of the exact JSON of the results (JSON writes
 * each double as the shortest text that reads back as the same double, so equal text means equal
 * bits).
 *
 * Usage (build first with `npm run build`):
 *   npx tsx scripts/study-fingerprint.ts [distDir]            print the fingerprints
 *   npx tsx scripts/study-fingerprint.ts distDir otherDistDir  compare two builds, case by case
 * A build of an earlier commit for the comparison: `git worktree add <dir> <commit>`, link
 * node_modules, `npm run build` there, and pass its dist folder.
 */
import { readFileSync } from "node:fs";
import { fingerprintBuilds } from "./fingerprint-compare.js";

type Lib = typeof import("../src/index.js");

const examples = new URL("../docs/examples/", import.meta.url);
const studies = ["study-bearing-race.json", "study-forging-bar.json", "study-plate-warmer.json"].map((name) => ({
  name,
  description: JSON.parse(readFileSync(new URL(name, examples), "utf8")) as Parameters<Lib["studyHeater"]>[0],
}));

/** Case name → exact JSON of its results. */
function cases(lib: Lib): Map<string, string> {
  const out = new Map<string, string>();
  for (const { name, description } of studies) out.set(`studyHeater ${name}`, JSON.stringify(lib.studyHeater(description)));
  const race = studies[0]?.description;
  if (race === undefined) throw new Error("no bearing-race study");
  const values = Array.from({ length: 6 }, (_, i) => 2e-6 + i * 4e-7);
  out.set("sweepHeater race capacitance, heat-up", JSON.stringify(lib.sweepHeater(race, { field: "capacitor.capacitance", values, heatUp: true })));
  out.set("optimiseHeater race 1.5 kW", JSON.stringify(lib.optimiseHeater(race, { targetPower: 1500 })));
  const rows: unknown[] = [];
  for (let i = 0; i < 40; i++) {
    const frequency = 50 * 1.35 ** i;
    for (const [innerRadius, relativePermeability] of [[0, 1], [0, 80], [0.008, 1], [0.012, 200]] as const) {
      rows.push(
        lib.encirclingCoilOverRod({
          coil: { innerRadius: 0.02, outerRadius: 0.025, length: 0.05, turns: 10 },
          rod: { radius: 0.015, innerRadius, resistivity: 2e-7, relativePermeability },
          frequency,
        }),
      );
    }
  }
  out.set("encirclingCoilOverRod rods and tubes, 50 Hz … 6 MHz", JSON.stringify(rows));
  return out;
}

await fingerprintBuilds(cases);
