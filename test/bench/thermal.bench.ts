import { bench, describe } from "vitest";
import { lumpedHeatUp, radialHeatUp, steadyStateTemperature, solveOde, lowCarbonSteel } from "../../src/index.js";

// Random inputs prepared beforehand (fixed seed), over the documented domain.
let seed = 12345;
const random = (): number => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
};
const logUniform = (lo: number, hi: number): number => Math.exp(Math.log(lo) + random() * Math.log(hi / lo));
const cases = Array.from({ length: 256 }, () => ({
  mass: logUniform(0.01, 10),
  specificHeat: logUniform(300, 1000),
  power: logUniform(10, 5000),
  surfaceArea: logUniform(1e-3, 0.3),
  convectionCoefficient: logUniform(2, 100),
  emissivity: random(),
  ambientTemperature: 293.15,
}));
let index = 0;
const next = (): (typeof cases)[number] => cases[index++ & 255]!;
const check = (x: number | null): void => {
  if (x !== null && !Number.isFinite(x)) throw new Error("non-finite result");
};

describe("thermal", () => {
  bench("steadyStateTemperature (convection + radiation)", () => {
    check(steadyStateTemperature(next()));
  }, { time: 300 });
  bench("lumpedHeatUp to 80 % of steady state (constant c)", () => {
    const o = next();
    const s = steadyStateTemperature(o);
    check(lumpedHeatUp({ ...o, targetTemperature: 293.15 + 0.8 * (s - 293.15) }).timeToTarget);
  }, { time: 300 });
  bench("lumpedHeatUp of 1 kg steel to 900 °C (EN 1993 c(T))", () => {
    const o = next();
    check(lumpedHeatUp({ mass: 1, material: lowCarbonSteel, power: 2000 + o.power, surfaceArea: 0.03, convectionCoefficient: 15, emissivity: 0.8, ambientTemperature: 293.15, targetTemperature: 1173.15 }).timeToTarget);
  }, { time: 300 });
  bench("radialHeatUp, 60 cells, steel cylinder 20 mm, 60 s", () => {
    const o = next();
    check(radialHeatUp({ geometry: "cylinder", radius: 0.02, length: 0.1, power: o.power, skinDepth: 0.001, material: lowCarbonSteel, convectionCoefficient: 10, emissivity: 0.7, ambientTemperature: 293.15, duration: 60 }).finalSurfaceTemperature);
  }, { time: 300 });
  bench("solveOde, harmonic oscillator over 10 periods at rtol 1e-8", () => {
    const w = 1 + next().emissivity;
    check(solveOde((_t, y, dy) => { dy[0] = y[1]!; dy[1] = -w * w * y[0]!; }, [1, 0], { end: 20 * Math.PI, recordSteps: false }).finalState[0]!);
  }, { time: 300 });
});
