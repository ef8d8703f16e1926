/**
 * Writes the figure of docs/converters.md:
 *   docs/img/converters-llc-gain.svg  LLC gain over f_n for several Q (L_n = 6): first harmonic
 *                                     (lines) and the exact steady state (the "exact" series)
 *
 * The tank (60 µH, 24 nF, L_m = 360 µH, n = 8, 390 V half bridge) is invented for the figure.
 *
 * Run: npx tsx docs/plots/converters.ts
 */
import { writeFileSync } from "node:fs";
import { lineChart } from "../../src/report/index.js";
import { llcGain, llcOperatingPoint } from "../../src/index.js";

const img = (name: string): URL => new URL(`../img/${name}`, import.meta.url);
const lr = 60e-6;
const cr = 24e-9;
const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
const zr = Math.sqrt(lr / cr);
const fn = Array.from({ length: 240 }, (_, k) => 0.45 + (1.6 - 0.45) * (k / 239));
const fnExact = Array.from({ length: 47 }, (_, k) => 0.45 + (1.6 - 0.45) * (k / 46));
const series = [];
for (const q of [0.2, 0.4, 0.8]) {
  series.push({ name: `first harmonic, Q = ${q}`, x: fn, y: fn.map((f) => llcGain({ inductanceRatio: 6, qualityFactor: q, normalisedFrequency: f })) });
  const rl = (Math.PI * Math.PI * zr) / (8 * 64 * q);
  series.push({
    name: `exact, Q = ${q}`,
    x: fnExact,
    y: fnExact.map((f) => llcOperatingPoint({ bridge: "half", inputVoltage: 390, turnsRatio: 8, resonantInductance: lr, resonantCapacitance: cr, magnetisingInductance: 6 * lr, switchingFrequency: f * fr, loadResistance: rl }).gain),
  });
}
const svg = lineChart({
  title: "LLC gain, L_n = 6: first harmonic against the exact steady state",
  xLabel: "normalised frequency f_n",
  xUnit: "",
  yLabel: "gain M",
  yUnit: "",
  series,
  referenceLines: [{ axis: "x", value: 1, label: "f_r" }],
});
writeFileSync(img("converters-llc-gain.svg"), svg);
console.log("wrote converters-llc-gain.svg");
