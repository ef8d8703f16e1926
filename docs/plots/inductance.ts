/**
 * Writes docs/img/inductance-*.svg: the error of each classic approximation against the exact
 * method over aspect ratio, and prints the same numbers as the Markdown tables of
 * docs/inductance.md.
 *
 * Run: npx tsx docs/plots/inductance.ts
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { lineChart } from "../../src/report/index.js";
import {
  multilayerCoilInductance,
  multilayerCoilInductanceWheeler,
  solenoidInductance,
  solenoidInductanceWheeler,
  spiralCoilInductance,
  spiralCoilInductanceMohan,
  spiralCoilInductanceWheeler,
} from "../../src/index.js";

const here = dirname(fileURLToPath(import.meta.url));
const pct = (approx: number, exact: number): number => 100 * (approx / exact - 1);
const fmt = (x: number): string => (x >= 0 ? "+" : "") + x.toFixed(2);

// 1. single-layer solenoid: Wheeler vs exact current sheet, over length/radius
const ratios: number[] = [];
for (let e = -1.3; e <= 2.0001; e += 0.05) ratios.push(10 ** e);
const solenoidError = ratios.map((x) => pct(solenoidInductanceWheeler({ radius: 1, length: x, turns: 1 }), solenoidInductance({ radius: 1, length: x, turns: 1 })));
writeFileSync(
  join(here, "../img/inductance-solenoid-wheeler.svg"),
  lineChart({
    title: "Single-layer solenoid: Wheeler (1928) vs exact current sheet",
    xLabel: "length / radius",
    yLabel: "error of the approximation [%]",
    xLog: true,
    series: [{ name: "Wheeler r²N²/(9r + 10l)", x: ratios, y: solenoidError }],
    referenceLines: [{ axis: "x", value: 0.8, label: "l = 0.8 r" }],
  }),
);
console.log("| length / radius | Wheeler error |\n| ---: | ---: |");
for (const x of [0.05, 0.1, 0.2, 0.4, 0.8, 1, 2, 5, 10, 100]) {
  console.log(`| ${x} | ${fmt(pct(solenoidInductanceWheeler({ radius: 1, length: x, turns: 1 }), solenoidInductance({ radius: 1, length: x, turns: 1 })))} % |`);
}

// 2. multilayer coil: Wheeler vs exact (uniform current density), over length/mean radius,
//    for three winding depths
const lengths = [0.1, 0.2, 0.35, 0.5, 0.75, 1, 1.5, 2, 3, 5];
const depths = [0.2, 0.5, 1];
const multilayerSeries = depths.map((c) => ({
  name: `depth = ${c} × mean radius`,
  x: lengths,
  y: lengths.map((b) => {
    const g = { innerRadius: 1 - c / 2, outerRadius: 1 + c / 2, length: b, turns: 1 };
    return pct(multilayerCoilInductanceWheeler(g), multilayerCoilInductance(g));
  }),
}));
writeFileSync(
  join(here, "../img/inductance-multilayer-wheeler.svg"),
  lineChart({
    title: "Multilayer coil: Wheeler (1928) vs exact uniform current density",
    xLabel: "length / mean radius",
    yLabel: "error of the approximation [%]",
    xLog: true,
    series: multilayerSeries,
  }),
);
console.log(`\n| length / mean radius | ${depths.map((c) => `depth ${c} a`).join(" | ")} |\n| ---: | ${depths.map(() => "---:").join(" | ")} |`);
lengths.forEach((b, i) => { console.log(`| ${b} | ${multilayerSeries.map((s) => `${fmt(s.y[i]!)} %`).join(" | ")} |`); });

// 3. flat spiral: Wheeler and Mohan vs the exact ring sum, over the fill ratio (20 turns,
//    wire 0.8 of the pitch, outermost turn at 100 mm)
const fills = [0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9];
const spiralAt = (rho: number): { inner: number; outer: number } => {
  // fill ratio of the sheet (N pitch wide) rho = N p / (r_in + r_out), p = (r_out - r_in)/(N - 1)
  const n = 20;
  const outer = 0.1;
  // solve for inner: rho (inner + outer) = n (outer - inner)/(n - 1)
  const q = n / (n - 1);
  const inner = (outer * (q - rho)) / (q + rho);
  return { inner, outer };
};
const wheelerSpiral: number[] = [];
const mohanSpiral: number[] = [];
for (const rho of fills) {
  const { inner, outer } = spiralAt(rho);
  const pitch = (outer - inner) / 19;
  const g = { innerRadius: inner, outerRadius: outer, turns: 20, wireDiameter: 0.8 * Math.min(pitch, inner) };
  const exact = spiralCoilInductance(g);
  wheelerSpiral.push(pct(spiralCoilInductanceWheeler(g), exact));
  mohanSpiral.push(pct(spiralCoilInductanceMohan(g), exact));
}
writeFileSync(
  join(here, "../img/inductance-spiral-approximations.svg"),
  lineChart({
    title: "Flat spiral (20 turns): approximations vs exact ring sum",
    xLabel: "fill ratio (d_out − d_in)/(d_out + d_in) of the current sheet",
    yLabel: "error of the approximation [%]",
    series: [
      { name: "Wheeler a²N²/(8a + 11c)", x: fills, y: wheelerSpiral },
      { name: "Mohan et al. current sheet", x: fills, y: mohanSpiral },
    ],
  }),
);
console.log("\n| fill ratio | Wheeler | Mohan |\n| ---: | ---: | ---: |");
fills.forEach((f, i) => { console.log(`| ${f} | ${fmt(wheelerSpiral[i]!)} % | ${fmt(mohanSpiral[i]!)} % |`); });
