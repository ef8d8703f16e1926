/**
 * Measures the throughput targets of the library's hot functions on one core: each function is
 * called on a pre-generated array of varied inputs over its valid domain (so V8 cannot fold the
 * work), best of five rounds, and reported as evaluations per second. A NaN result fails.
 *
 * Usage: npx tsx scripts/throughput.ts [--markdown]
 */
import { cases } from "./throughput-cases.js";

const markdown = process.argv.includes("--markdown");
const only = process.argv.find((a) => a.startsWith("--only="))?.slice("--only=".length);
const rows: string[] = [];
let failed = false;
for (const c of cases) {
  if (only !== undefined && !c.name.startsWith(only)) continue;
  let best = Infinity;
  for (let round = 0; round < 5; round++) {
    let sink = 0;
    const t0 = performance.now();
    for (let i = 0; i < c.n; i++) sink += c.run(i);
    const t = (performance.now() - t0) / 1000;
    if (Number.isNaN(sink)) throw new Error(`${c.name} returned NaN`);
    best = Math.min(best, t);
  }
  const perSecond = (c.n * (c.evaluationsPerCall ?? 1)) / best;
  const value = c.unit === "per second" ? perSecond : 1000 / perSecond;
  const ok = c.unit === "per second" ? value >= c.target : value <= c.target;
  if (!ok) failed = true;
  const shown = c.unit === "per second" ? `${(value / 1e6).toFixed(2)} M/s` : `${value.toFixed(3)} ms`;
  const target = c.unit === "per second" ? `≥ ${c.target >= 1e6 ? `${c.target / 1e6} M/s` : `${c.target / 1e3} k/s`}` : `≤ ${c.target} ms`;
  rows.push(markdown ? `| ${c.name} | ${shown} | ${target} | ${ok ? "met" : "not met"} |` : `${c.name.padEnd(42)} ${shown.padStart(12)}   target ${target.padEnd(10)} ${ok ? "met" : "NOT MET"}`);
}
if (markdown) console.log("| function | measured (best of 5) | target | |\n| --- | --- | --- | --- |");
console.log(rows.join("\n"));
process.exitCode = failed ? 1 : 0;
