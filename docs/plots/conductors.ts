/**
 * Writes docs/img/conductors-ac-ratio.svg: Rac/Rdc against frequency for the conductors of the
 * worked coil choice in docs/conductors.md (copper at 60 °C).
 *
 * Run: npx tsx docs/plots/conductors.ts
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { lineChart } from "../../src/report/index.js";
import {
  copper,
  celsius,
  resistivityAt,
  roundWireAcRatio,
  roundWireWindingAcRatioFerreira,
  litzAcRatio,
  tubeAcResistance,
} from "../../src/index.js";

const rho = resistivityAt(copper, celsius(60));
const frequencies: number[] = [];
for (let e = 2; e <= 6.0001; e += 0.05) frequencies.push(10 ** e);

const litz = { strands: 1000, strandDiameter: 0.1e-3, strandOuterDiameter: 0.112e-3, bundleLevels: [10, 10, 10], twistPitch: 40e-3 };
const fineLitz = { strands: 4000, strandDiameter: 0.05e-3, strandOuterDiameter: 0.058e-3, bundleLevels: [10, 10, 5, 8], twistPitch: 40e-3 };
const tubeDc = rho / (Math.PI * (3e-3 ** 2 - 2e-3 ** 2));

const series = [
  { name: "4 mm solid wire, isolated", y: frequencies.map((f) => roundWireAcRatio({ diameter: 4e-3, frequency: f, resistivity: rho })) },
  {
    name: "4 mm solid wire, 8 turns in 100 mm (Ferreira)",
    y: frequencies.map((f) => roundWireWindingAcRatioFerreira({ wireDiameter: 4e-3, frequency: f, resistivity: rho, layers: 1, turnsPerLayer: 8, windingWidth: 0.1 })),
  },
  { name: "6 × 1 mm tube, isolated", y: frequencies.map((f) => tubeAcResistance({ outerDiameter: 6e-3, wallThickness: 1e-3, frequency: f, resistivity: rho }) / tubeDc) },
  { name: "litz 1000 × 0.1 mm, isolated", y: frequencies.map((f) => litzAcRatio({ construction: litz, frequency: f, resistivity: rho })) },
  {
    name: "litz 1000 × 0.1 mm, 8 turns in 100 mm",
    y: frequencies.map((f) => litzAcRatio({ construction: litz, frequency: f, resistivity: rho, turns: 8, windowBreadth: 0.1 })),
  },
  {
    name: "litz 4000 × 0.05 mm, 8 turns in 100 mm",
    y: frequencies.map((f) => litzAcRatio({ construction: fineLitz, frequency: f, resistivity: rho, turns: 8, windowBreadth: 0.1 })),
  },
];

const svg = lineChart({
  title: "AC-to-DC resistance ratio of copper conductors (60 °C)",
  xLabel: "frequency",
  xUnit: "Hz",
  yLabel: "Rac / Rdc",
  xLog: true,
  yLog: true,
  series: series.map((s) => ({ name: s.name, x: frequencies, y: s.y })),
  referenceLines: [
    { axis: "x", value: 20e3, label: "20 kHz" },
    { axis: "x", value: 200e3, label: "200 kHz" },
  ],
});

const here = dirname(fileURLToPath(import.meta.url));
writeFileSync(join(here, "..", "img", "conductors-ac-ratio.svg"), svg);
console.log("wrote docs/img/conductors-ac-ratio.svg");
