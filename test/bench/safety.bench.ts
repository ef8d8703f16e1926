import { bench, describe } from "vitest";
import { fieldOnAxis, fieldNearCoil, exposureCheck, safetyCautions } from "../../src/index.js";

let seed = 4242;
const random = (): number => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
};
const points = Array.from({ length: 1024 }, () => ({ radialDistance: 0.2 * random(), axialPosition: 0.01 + 0.3 * random() }));
const frequencies = Array.from({ length: 1024 }, () => 10 ** (7 * random()));
const loop = [{ radius: 0.05 }];
const pancake = { kind: "spiral" as const, innerRadius: 0.015, outerRadius: 0.075, turns: 12 };
let i = 0;
const check = (x: number): void => {
  if (!Number.isFinite(x)) throw new Error("non-finite result");
};

describe("safety", () => {
  bench("fieldOnAxis, single loop", () => {
    check(fieldOnAxis({ coil: loop, current: 10, axialPosition: points[i++ & 1023]!.axialPosition }));
  }, { time: 300 });
  bench("fieldNearCoil, single loop (elliptic integrals)", () => {
    check(fieldNearCoil(loop, 10, points[i++ & 1023]!).magnitude);
  }, { time: 300 });
  bench("fieldNearCoil, 12-turn pancake", () => {
    check(fieldNearCoil(pancake, 10, points[i++ & 1023]!).magnitude);
  }, { time: 300 });
  bench("exposureCheck", () => {
    check(exposureCheck({ fluxDensityRms: 3e-5, frequency: frequencies[i++ & 1023]!, population: "general-public" }).ratio);
  }, { time: 300 });
  bench("safetyCautions, all fields given", () => {
    const f = 1e3 + frequencies[i++ & 1023]! / 10;
    if (safetyCautions({ tankVoltageRms: 200, supplyVoltageDc: 48, capacitance: 2e-6, capacitorVoltagePeak: 300, surfaceTemperature: 500, frequency: f, fluxDensityRms: 1e-4 }).length === 0) throw new Error("expected cautions");
  }, { time: 300 });
});
