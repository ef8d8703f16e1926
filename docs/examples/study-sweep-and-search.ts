/**
 * Sweep the capacitor bank of the bearing-race heater, then let the optimiser search turns and
 * E12 capacitances for 1.5 kW into the ring while staying above 20 kHz (above hearing) and
 * below 200 V peak on the tank. Scenario and numbers are our own (invented for the demo).
 *
 * Run: npx tsx docs/examples/study-sweep-and-search.ts
 */
import { readFileSync } from "node:fs";
import { formatQuantity, optimizeHeater, sweepHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";

const base = JSON.parse(readFileSync(new URL("./study-bearing-race.json", import.meta.url), "utf8")) as HeaterDescription;

const sweep = sweepHeater(base, { field: "capacitor.capacitance", values: ["2.2 µF", "3.3 µF", "4.7 µF", "6.8 µF"], heatUp: false });
for (const row of sweep.rows) {
  if (row.summary === null) throw new Error(`unexpected problem: ${row.problem ?? ""}`);
  console.log(`C = ${String(row.value).padEnd(7)} f = ${formatQuantity(row.summary.frequency, "Hz")}, part ${formatQuantity(row.summary.partPower, "W")}`);
}
// more capacitance, lower frequency (f ∝ 1/√C)
const f = sweep.rows.map((r) => r.summary?.frequency ?? 0);
for (let i = 1; i < f.length; i++) if (!((f[i] ?? 0) < (f[i - 1] ?? 0))) throw new Error("frequency should fall as C rises");

const search = optimizeHeater(base, {
  targetPower: "1.5 kW",
  limits: { minFrequency: "20 kHz", tankVoltagePeak: "200 V" },
  search: { turns: [4, 5, 6, 7], minCapacitance: "1 µF", maxCapacitance: "15 µF" },
  keep: 3,
});
console.log(`searched ${search.evaluated} designs, ${search.feasible} within limits`);
for (const b of search.best) {
  console.log(`  ${b.turns} turns, ${formatQuantity(b.capacitance, "F")}: ${formatQuantity(b.summary.partPower, "W")} at ${formatQuantity(b.summary.frequency, "Hz")}`);
  if (b.summary.frequency < 20e3 || b.summary.tankVoltagePeak > 200) throw new Error("a reported design breaks a limit");
}
const best = search.best[0];
if (best === undefined || Math.abs(best.summary.partPower / 1500 - 1) > 0.2) throw new Error("no design within 20 % of 1.5 kW");
