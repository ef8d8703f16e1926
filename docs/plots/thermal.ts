/**
 * Writes the thermal guide's figures:
 * - docs/img/thermal-race-heat-up.svg: lumped temperature of the (invented) bearing race of
 *   docs/examples/thermal-shrink-fit.ts, and the surface and core of its wall by radialHeatUp;
 * - docs/img/thermal-curie.svg: a 1 kg steel part heated with constant power and with power
 *   that falls away at the Curie point (invented power curve), to 900 °C.
 *
 * Run: npx tsx docs/plots/thermal.ts
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { lineChart } from "../../src/report/index.js";
import { lumpedHeatUp, radialHeatUp, lowCarbonSteel, celsius } from "../../src/index.js";

const out = join(dirname(fileURLToPath(import.meta.url)), "..", "img");
const toC = (values: readonly number[]): number[] => values.map((t) => t - 273.15);

// Race: 120/80 mm, 30 mm wide, 2 kW absorbed (invented example).
const outer = 0.06;
const inner = 0.04;
const width = 0.03;
const mass = lowCarbonSteel.density * Math.PI * (outer ** 2 - inner ** 2) * width;
const area = 2 * Math.PI * (outer + inner) * width + 2 * Math.PI * (outer ** 2 - inner ** 2);
const lumped = lumpedHeatUp({ mass, material: lowCarbonSteel, power: 2000, surfaceArea: area, convectionCoefficient: 10, emissivity: 0.6, ambientTemperature: celsius(20), duration: 90 });
const wall = radialHeatUp({
  geometry: "slab",
  thickness: outer - inner,
  faceArea: Math.PI * (outer + inner) * width,
  power: 2000,
  skinDepth: 0.5e-3,
  material: lowCarbonSteel,
  convectionCoefficient: 10,
  emissivity: 0.6,
  ambientTemperature: celsius(20),
  duration: 90,
});
writeFileSync(
  join(out, "thermal-race-heat-up.svg"),
  lineChart({
    title: "Bearing race, 2 kW absorbed (invented example)",
    xLabel: "time",
    xUnit: "s",
    yLabel: "temperature",
    yUnit: "°C",
    series: [
      { name: "lumped (lumpedHeatUp)", x: lumped.times, y: toC(lumped.temperatures) },
      { name: "surface (radialHeatUp)", x: wall.times, y: toC(wall.surfaceTemperatures) },
      { name: "core (radialHeatUp)", x: wall.times, y: toC(wall.coreTemperatures) },
    ],
    referenceLines: [{ axis: "y", value: 150, label: "shrink-fit target 150 °C" }],
  }),
);

// 1 kg steel part, 0.03 m²: constant 4 kW vs 4 kW falling to 1 kW over the last 30 K below Curie.
const curie = lowCarbonSteel.curieTemperature ?? celsius(770);
const surroundings = { mass: 1, material: lowCarbonSteel, surfaceArea: 0.03, convectionCoefficient: 15, emissivity: 0.8, ambientTemperature: celsius(20) };
const constant = lumpedHeatUp({ ...surroundings, power: 4000, targetTemperature: celsius(900) });
const fading = lumpedHeatUp({
  ...surroundings,
  powerAt: (t) => (t < curie - 30 ? 4000 : t >= curie ? 1000 : 1000 + (3000 * (curie - t)) / 30),
  duration: 1.5 * (constant.timeToTarget ?? 600),
});
writeFileSync(
  join(out, "thermal-curie.svg"),
  lineChart({
    title: "1 kg steel part through the Curie point (invented power curve)",
    xLabel: "time",
    xUnit: "s",
    yLabel: "temperature",
    yUnit: "°C",
    series: [
      { name: "constant 4 kW", x: constant.times, y: toC(constant.temperatures) },
      { name: "4 kW falling to 1 kW at Curie", x: fading.times, y: toC(fading.temperatures) },
    ],
    referenceLines: [{ axis: "y", value: curie - 273.15, label: "Curie temperature" }],
  }),
);
console.log("wrote thermal-race-heat-up.svg, thermal-curie.svg");
