/**
 * Benchmark of the electro-thermal radial model: a solenoid heat-up of a magnetic forging bar
 * through Curie to a 900 °C surface, the field re-solved shell by shell (one core). Currents vary
 * between calls; a NaN fails the run.
 */
import { bench, describe } from "vitest";
import { celsius, inductionRadialHeatUp, lowCarbonSteel } from "../../src/index.js";

let seed = 12345;
const random = (): number => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
const currents = Array.from({ length: 16 }, () => 220 + 60 * random());
let k = 0;

/** The benchmarked heat-up: 30 mm steel bar, 40 turns over 200 mm at 10 kHz, 220–280 A. */
export function forgingBarHeatUp(current: number): number {
  const r = inductionRadialHeatUp({
    part: { shape: "bar", radius: 0.015 },
    material: lowCarbonSteel,
    coil: { innerRadius: 0.025, length: 0.2, turns: 40 },
    frequency: 1e4,
    coilCurrentRms: current,
    convectionCoefficient: 10,
    emissivity: 0.8,
    ambientTemperature: celsius(20),
    duration: 300,
    targetTemperature: celsius(900),
    targetLocation: "surface",
    hardeningTemperature: celsius(850),
  });
  if (r.heatingTime === null || !Number.isFinite(r.surfaceCoreDifferenceAtStop!)) throw new Error("radial heat-up did not reach the target");
  return r.heatingTime;
}

describe("electro-thermal radial model", () => {
  bench("inductionRadialHeatUp, steel bar through Curie to 900 °C surface (60 cells)", () => {
    forgingBarHeatUp(currents[k++ % currents.length]!);
  }, { time: 2000 });
});
