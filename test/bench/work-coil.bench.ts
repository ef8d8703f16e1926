import { bench, describe } from "vitest";
import { prepareWorkCoil, workCoilImpedance } from "../../src/index.js";
import type { WorkCoilSolenoid } from "../../src/index.js";

// the scenario-A coil (4 turns of 6 × 1 mm copper tube, 40 mm turn diameter) around a steel bar
const coil: WorkCoilSolenoid = {
  shape: "solenoid",
  radius: 0.02,
  length: 0.032,
  turns: 4,
  conductor: { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 },
  resistivity: 1.75e-8,
};
const part = { shape: "bar", radius: 0.008, length: 0.4, resistivity: 2e-7, relativePermeability: 50 } as const;

// random operating points (fixed generator): frequency 10–50 kHz, resistivity 1e-7–1e-6 Ω·m, μr 1–300
let seed = 4242;
const random = () => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed / 2147483648;
};
const logUniform = (lo: number, hi: number) => Math.exp(Math.log(lo) + random() * (Math.log(hi) - Math.log(lo)));
const points = Array.from({ length: 256 }, () => [logUniform(10e3, 50e3), logUniform(1e-7, 1e-6), logUniform(1, 300)] as const);

const prepared = prepareWorkCoil({ coil, frequency: 50e3 });
const fast = prepared.reduce({ part, minFrequency: 10e3, maxFrequency: 50e3 });
let i = 0;
const check = (x: number) => {
  if (Number.isNaN(x)) throw new Error("NaN in work-coil benchmark");
};

describe("work coil impedance (scenario A coil with a steel bar)", () => {
  bench(
    "reduced evaluator: impedance(f, ρ, μr)",
    () => {
      const [f, rho, mur] = points[i++ & 255]!;
      check(fast.impedance(f, rho, mur).resistance);
    },
    { time: 500 },
  );
  bench(
    "prepared full solve: impedance(f, part)",
    () => {
      const [f, rho, mur] = points[i++ & 255]!;
      check(prepared.impedance(f, { ...part, resistivity: rho, relativePermeability: mur }).resistance);
    },
    { time: 500, iterations: 3 },
  );
  bench(
    "one-shot workCoilImpedance",
    () => {
      const [f, rho, mur] = points[i++ & 255]!;
      check(workCoilImpedance({ coil, frequency: f, part: { ...part, resistivity: rho, relativePermeability: mur } }).resistance);
    },
    { time: 500, iterations: 2 },
  );
});
