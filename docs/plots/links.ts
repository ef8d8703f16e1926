/**
 * Writes the figure of docs/links.md:
 *   docs/img/links-misalignment.svg  coupling and efficiency of a 3 kW vehicle-class pad pair
 *                                    (double LCC, 85 kHz, 150 mm gap) against lateral offset
 *
 * Pad geometry, resistances and load are invented for the figure (as in
 * docs/examples/links-vehicle-pads.ts), not measured.
 *
 * Run: npx tsx docs/plots/links.ts
 */
import { writeFileSync } from "node:fs";
import { lineChart } from "../../src/report/index.js";
import { inductiveLink, padMutualInductance, spiralCoilInductance } from "../../src/index.js";

const img = (name: string): URL => new URL(`../img/${name}`, import.meta.url);
const pad = { innerRadius: 0.1, outerRadius: 0.25, turns: 12 };
const l = spiralCoilInductance({ ...pad, wireDiameter: 4e-3 });
const offsets = Array.from({ length: 26 }, (_, k) => 0.012 * k);
const k = offsets.map((d) => padMutualInductance({ pad1: pad, pad2: pad, axialDistance: 0.15, lateralOffset: d }).mutualInductance / l);
const efficiency = k.map((kk) => inductiveLink({
  primaryInductance: l, secondaryInductance: l, mutualInductance: Math.max(kk, 1e-6) * l, primaryResistance: 0.05, secondaryResistance: 0.05,
  frequency: 85e3, compensation: "double-lcc", loadResistance: 40, sourceVoltage: 300, primaryFilterInductance: 0.25 * l, secondaryFilterInductance: 0.25 * l,
}).efficiency);
const svg = lineChart({
  title: "Vehicle-class pads, 150 mm gap: efficiency and k against offset",
  xLabel: "lateral offset",
  xUnit: "m",
  yLabel: "efficiency",
  yUnit: "",
  series: [
    { name: "efficiency (double LCC, 85 kHz)", x: offsets, y: efficiency },
    { name: "coupling coefficient k", x: offsets, y: k, axis: "secondary" },
  ],
  secondaryAxis: { label: "k", unit: "" },
});
writeFileSync(img("links-misalignment.svg"), svg);
console.log("wrote links-misalignment.svg");
