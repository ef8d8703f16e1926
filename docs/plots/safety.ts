/**
 * Writes docs/img/safety-field-distance.svg: on-axis RMS flux density of the (invented) pancake
 * coil of docs/examples/safety-cautions.ts against distance, with the ICNIRP 2010 reference
 * levels at 40 kHz.
 *
 * Run: npx tsx docs/plots/safety.ts
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { lineChart } from "../../src/report/index.js";
import { fieldOnAxis, fieldNearCoil, icnirpReferenceLevel } from "../../src/index.js";

const out = join(dirname(fileURLToPath(import.meta.url)), "..", "img");
const coil = { kind: "spiral" as const, innerRadius: 0.015, outerRadius: 0.075, turns: 12 };
const current = 60;
const distances: number[] = [];
for (let e = -2; e <= 0.0001; e += 0.025) distances.push(10 ** e);
writeFileSync(
  join(out, "safety-field-distance.svg"),
  lineChart({
    title: "Pancake coil, 12 turns, 60 A RMS at 40 kHz (invented example)",
    xLabel: "distance from the coil",
    xUnit: "m",
    yLabel: "flux density (RMS)",
    yUnit: "T",
    xLog: true,
    yLog: true,
    series: [
      { name: "on the axis", x: distances, y: distances.map((d) => fieldOnAxis({ coil, current: current, axialPosition: d })) },
      {
        name: "in the coil plane, from the axis",
        x: distances.filter((d) => d > 0.09),
        y: distances.filter((d) => d > 0.09).map((d) => fieldNearCoil(coil, current, { radialDistance: d, axialPosition: 0 }).magnitude),
      },
    ],
    referenceLines: [
      { axis: "y", value: icnirpReferenceLevel(40e3, "general-public"), label: "ICNIRP 2010 general public" },
      { axis: "y", value: icnirpReferenceLevel(40e3, "occupational"), label: "ICNIRP 2010 occupational" },
    ],
  }),
);
console.log("wrote safety-field-distance.svg");
