/**
 * Writes docs/img/materials-resistivity.svg, materials-permeability.svg and
 * materials-specific-heat.svg for docs/materials.md.
 *
 * Run: npx tsx docs/plots/materials.ts
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { lineChart } from "../../src/report/index.js";
import {
  austeniticStainless,
  conductiveMaterials,
  lowCarbonSteel,
  relativePermeabilityAt,
  resistivityAt,
  specificHeatAt,
  toCelsius,
} from "../../src/index.js";

const here = dirname(fileURLToPath(import.meta.url));
const write = (name: string, svg: string): void => {
  writeFileSync(join(here, "..", "img", name), svg);
  console.log(`wrote docs/img/${name}`);
};

const range = (a: number, b: number, step: number): number[] => {
  const out: number[] = [];
  for (let x = a; x <= b + 1e-9; x += step) out.push(x);
  return out;
};

// resistivity of every set over its documented range
write(
  "materials-resistivity.svg",
  lineChart({
    title: "Resistivity against temperature",
    xLabel: "temperature",
    xUnit: "°C",
    yLabel: "resistivity",
    yUnit: "Ω·m",
    yLog: true,
    series: conductiveMaterials.map((m) => {
      const t = range(m.temperatureRange.min, m.temperatureRange.max, 10);
      return { name: m.name, x: t.map(toCelsius), y: t.map((k) => resistivityAt(m, k)) };
    }),
  }),
);

// permeability of low-carbon steel against temperature at several surface fields
const temps = range(293.15, 1073.15, 2);
write(
  "materials-permeability.svg",
  lineChart({
    title: "Relative permeability of low-carbon steel (Curie 768 °C)",
    xLabel: "temperature",
    xUnit: "°C",
    yLabel: "relative permeability",
    yLog: true,
    series: [1e3, 1e4, 1e5, 1e6].map((h) => ({
      name: `H = ${h >= 1e6 ? "1 MA/m" : `${h / 1e3} kA/m`}`,
      x: temps.map(toCelsius),
      y: temps.map((t) => relativePermeabilityAt(lowCarbonSteel, { temperature: t, fieldStrength: h })),
    })),
    referenceLines: [{ axis: "x", value: toCelsius(lowCarbonSteel.curieTemperature ?? 0), label: "Curie" }],
  }),
);

// specific heat: carbon steel peak vs austenitic stainless
const temps2 = range(293.15, 1473.15, 1);
write(
  "materials-specific-heat.svg",
  lineChart({
    title: "Specific heat capacity",
    xLabel: "temperature",
    xUnit: "°C",
    yLabel: "specific heat",
    yUnit: "J/(kg·K)",
    series: [lowCarbonSteel, austeniticStainless].map((m) => ({
      name: m.name,
      x: temps2.map(toCelsius),
      y: temps2.map((t) => specificHeatAt(m, t)),
    })),
  }),
);
