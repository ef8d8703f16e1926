import { bench, describe } from "vitest";
import { conductiveMaterials, relativePermeabilityAt, resistivityAt, specificHeatAt } from "../../src/materials/index.js";
import type { ConductiveMaterial } from "../../src/materials/index.js";

const N = 1024;
const temps = Array.from({ length: N }, () => 300 + 1100 * Math.random());
const fields = Array.from({ length: N }, () => 10 ** (2 + 4 * Math.random()));
const mats = Array.from({ length: N }, () => conductiveMaterials[Math.floor(Math.random() * conductiveMaterials.length)] as ConductiveMaterial);
let i = 0;
const check = (x: number): void => {
  if (Number.isNaN(x)) throw new Error("NaN");
};

describe("materials", () => {
  bench("resistivityAt", () => {
    const j = i++ & (N - 1);
    check(resistivityAt(mats[j] as ConductiveMaterial, temps[j] as number));
  }, { time: 300 });
  bench("specificHeatAt", () => {
    const j = i++ & (N - 1);
    check(specificHeatAt(mats[j] as ConductiveMaterial, temps[j] as number));
  }, { time: 300 });
  bench("relativePermeabilityAt", () => {
    const j = i++ & (N - 1);
    check(relativePermeabilityAt(mats[j] as ConductiveMaterial, { temperature: temps[j] as number, fieldStrengthPeak: fields[j] as number }));
  }, { time: 300 });
});
