import { bench, describe } from "vitest";
import { barInLongCoil, bakerFunctions, coilOverPlate, slabInTangentialField } from "../../src/index.js";

// random inputs prepared beforehand (fixed generator, log-uniform over the valid domain)
let seed = 12345;
const random = () => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
};
const logUniform = (lo: number, hi: number) => Math.exp(Math.log(lo) + random() * (Math.log(hi) - Math.log(lo)));
const N = 1024;
const bars = Array.from({ length: N }, () => {
  const innerRadius = logUniform(5e-3, 0.2);
  return {
    coil: { innerRadius, length: innerRadius * logUniform(1, 20), turns: 1 + Math.floor(random() * 50) },
    bar: { radius: innerRadius * (0.1 + 0.9 * random()), resistivity: logUniform(1.7e-8, 1.2e-6), relativePermeability: logUniform(1, 200) },
    frequency: logUniform(50, 1e6),
    coilResistance: logUniform(1e-4, 0.1),
  };
});
const ratios = Array.from({ length: N }, () => logUniform(1e-3, 1e3));
const slabs = Array.from({ length: N }, () => ({
  thickness: logUniform(1e-4, 0.1),
  resistivity: logUniform(1.7e-8, 1.2e-6),
  relativePermeability: logUniform(1, 200),
  frequency: logUniform(50, 1e6),
  fieldStrengthRms: logUniform(1e2, 1e5),
}));
const plates = Array.from({ length: 64 }, () => {
  const outerRadius = logUniform(0.01, 0.1);
  return {
    coil: { innerRadius: outerRadius * 0.8 * random(), outerRadius, liftOff: outerRadius * logUniform(0.01, 0.5), length: outerRadius * logUniform(0.05, 0.5), turns: 1 + Math.floor(random() * 40) },
    plate: { thickness: logUniform(5e-4, 0.05), resistivity: logUniform(1.7e-8, 1.2e-6), relativePermeability: random() < 0.5 ? 1 : logUniform(10, 200) },
    frequency: logUniform(1e3, 1e6),
  };
});

const check = (x: number) => {
  if (Number.isNaN(x)) throw new Error("NaN in workpiece benchmark");
};

describe("workpiece", () => {
  let i = 0;
  bench("bakerFunctions", () => {
    check(bakerFunctions(ratios[i++ & (N - 1)]!).p);
  }, { time: 300 });
  bench("barInLongCoil", () => {
    check(barInLongCoil(bars[i++ & (N - 1)]!).reflectedResistance);
  }, { time: 300 });
  bench("slabInTangentialField", () => {
    check(slabInTangentialField(slabs[i++ & (N - 1)]!).powerPerArea);
  }, { time: 300 });
  bench("coilOverPlate (one frequency point)", () => {
    check(coilOverPlate(plates[i++ & 63]!).reflectedResistance);
  }, { time: 300 });
});
