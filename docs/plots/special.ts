/**
 * Writes the figure of docs/special.md:
 *   docs/img/special-kelvin-error.svg  error of kelvinFunctions vs mpmath over 0.001 ≤ x ≤ 1000
 *
 * The reference values are the committed mpmath fixture test/fixtures/special/kelvin.json; the
 * error of each function is taken relative to the modulus of its pair (as the tests do), and
 * the worst of the eight is plotted per x, with floor 1e-17 so that exact hits show on a log axis.
 *
 * Run: npx tsx docs/plots/special.ts
 */
import { writeFileSync } from "node:fs";
import { lineChart } from "../../src/report/index.js";
import { kelvinFunctions } from "../../src/index.js";
import data from "../../test/fixtures/special/kelvin.json" with { type: "json" };

const img = (name: string): URL => new URL(`../img/${name}`, import.meta.url);
const pairs = [
  ["ber", "bei"],
  ["ker", "kei"],
  ["berPrime", "beiPrime"],
  ["kerPrime", "keiPrime"],
] as const;

const rows = data.cases.filter((c) => c.x > 0).sort((p, q) => p.x - q.x);
const x: number[] = [];
const worstI: number[] = [];
const worstK: number[] = [];
for (const row of rows) {
  const k = kelvinFunctions(row.x);
  let wi = 1e-17;
  let wk = 1e-17;
  for (const [a, b] of pairs) {
    const modulus = Math.hypot(row[a], row[b]);
    const e = Math.max(Math.abs(k[a] - row[a]), Math.abs(k[b] - row[b])) / modulus;
    if (a.startsWith("ber")) wi = Math.max(wi, e);
    else wk = Math.max(wk, e);
  }
  x.push(row.x);
  worstI.push(wi);
  worstK.push(wk);
}

const svg = lineChart({
  title: "Kelvin functions: error vs mpmath (relative to the modulus of each pair)",
  xLabel: "x",
  yLabel: "error",
  xLog: true,
  yLog: true,
  yRange: [1e-17, 1e-13],
  series: [
    { name: "worst of ber, bei, ber′, bei′", x, y: worstI },
    { name: "worst of ker, kei, ker′, kei′", x, y: worstK },
  ],
  referenceLines: [
    { axis: "x", value: 1.5, label: "series | node table" },
    { axis: "x", value: 19, label: "node table | asymptotic" },
    { axis: "y", value: 5e-15, label: "bound 5e-15" },
  ],
});
writeFileSync(img("special-kelvin-error.svg"), svg);
console.log("wrote docs/img/special-kelvin-error.svg");
