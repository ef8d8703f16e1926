/**
 * The hot functions with throughput targets and their varied inputs, shared by
 * `scripts/throughput.ts` (absolute rates against targets) and `scripts/throughput-check.ts`
 * (speed relative to a plain-JS baseline in the same run, for CI).
 */
import {
  barInLongCoil,
  coilOverPlate,
  dowellFactor,
  ellipticE,
  ellipticK,
  igseLoss,
  kelvinFunctions,
  loopMutualInductance,
  roundWireAcRatio,
  solenoidInductance,
  spiralCoilInductance,
} from "../src/index.js";

export interface Case {
  readonly name: string;
  readonly target: number;
  readonly unit: "per second" | "ms per call";
  readonly n: number;
  /** Evaluations counted per call of `run` (default 1). */
  readonly evaluationsPerCall?: number;
  readonly run: (i: number) => number;
}

let seed = 12345;
const random = (): number => {
  seed = (seed * 1103515245 + 12345) >>> 0;
  return seed / 4294967296;
};
const logUniform = (lo: number, hi: number): number => lo * (hi / lo) ** random();
const table = (n: number, f: () => number): Float64Array => Float64Array.from({ length: n }, f);

const N = 1 << 16;
export const mask = N - 1;
const m = table(N, () => (random() < 0.1 ? 1 - logUniform(1e-12, 1e-2) : -2 + 3 * random()));
export const x = table(N, () => logUniform(1e-3, 1e3));
const r = table(N, () => logUniform(1e-3, 1));
const len = table(N, () => logUniform(1e-3, 1));
const turns = table(N, () => 1 + Math.floor(random() * 100));
const z = table(N, () => logUniform(1e-4, 10));
const delta = table(N, () => logUniform(1e-3, 1e2));
const layers = table(N, () => 1 + Math.floor(random() * 12));
const freq = table(N, () => logUniform(1e2, 1e7));
const solenoids = Array.from({ length: N }, (_, i) => ({ radius: r[i]!, length: len[i]!, turns: turns[i]! }));
const loops = Array.from({ length: N }, (_, i) => ({ radius1: r[i]!, radius2: len[i]!, axialDistance: z[i]! * r[i]! }));
const dowell = Array.from({ length: N }, (_, i) => ({ penetrationRatio: delta[i]!, layers: layers[i]! }));
const wires = Array.from({ length: N }, (_, i) => ({ diameter: 1e-3 * x[i]! ** 0.3, frequency: freq[i]!, resistivity: 1.7241e-8 }));
const waveforms = Array.from({ length: 1024 }, () => {
  const peak = logUniform(0.01, 0.3);
  const d = 0.1 + 0.8 * random();
  const period = 1 / logUniform(1e3, 1e6);
  return {
    k: 10 * random() + 1, alpha: 1.2 + 0.6 * random(), beta: 2.2 + 0.6 * random(), period,
    flux: { time: [0, d * period * 0.5, period * 0.5, period * (0.5 + d * 0.5), period], fluxDensity: [-peak, peak, peak, -peak, -peak] },
  };
});
const bars = Array.from({ length: N }, (_, i) => ({
  coil: { innerRadius: 0.05, length: 0.2, turns: 10 },
  bar: { radius: 0.04 * (0.1 + 0.9 * random()), resistivity: logUniform(1.7e-8, 1.2e-6), relativePermeability: 1 + 100 * random() },
  frequency: freq[i]!,
}));
const spirals = Array.from({ length: 256 }, () => ({ innerRadius: 0.01 + 0.01 * random(), outerRadius: 0.08 + 0.02 * random(), turns: 30, wireDiameter: 0.0015 }));
const plates = Array.from({ length: 64 }, () => ({
  coil: { innerRadius: 0.01, outerRadius: 0.06 + 0.02 * random(), liftOff: 0.002 + 0.005 * random(), height: 0.004, turns: 20 },
  plate: { thickness: 0.004, resistivity: 2e-7, relativePermeability: 1 + 50 * random() },
  frequency: logUniform(1e3, 1e5),
}));

export const cases: Case[] = [
  // The target counts evaluations of K and E together: one pair is two evaluations.
  { name: "ellipticK + ellipticE (evaluations, 2 per pair)", target: 30e6, unit: "per second", n: 4e6, evaluationsPerCall: 2, run: (i) => ellipticK(m[i & mask]!) + ellipticE(m[i & mask]!) },
  { name: "kelvinFunctions (all eight)", target: 3e6, unit: "per second", n: 1e6, run: (i) => kelvinFunctions(x[i & mask]!).kerPrime },
  { name: "solenoidInductance", target: 30e6, unit: "per second", n: 4e6, run: (i) => solenoidInductance(solenoids[i & mask]!) },
  { name: "loopMutualInductance", target: 30e6, unit: "per second", n: 4e6, run: (i) => loopMutualInductance(loops[i & mask]!) },
  { name: "spiralCoilInductance (30 turns, exact)", target: 20e3, unit: "per second", n: 20e3, run: (i) => spiralCoilInductance(spirals[i & 255]!) },
  { name: "dowellFactor", target: 16e6, unit: "per second", n: 4e6, run: (i) => dowellFactor(dowell[i & mask]!) },
  { name: "roundWireAcRatio", target: 3e6, unit: "per second", n: 2e6, run: (i) => roundWireAcRatio(wires[i & mask]!) },
  { name: "igseLoss (4 segments)", target: 2e6, unit: "per second", n: 2e6, run: (i) => igseLoss(waveforms[i & 1023]!) },
  { name: "barInLongCoil", target: 1e6, unit: "per second", n: 1e6, run: (i) => barInLongCoil(bars[i & mask]!).reflectedResistance },
  { name: "coilOverPlate (1e-6 relative)", target: 1, unit: "ms per call", n: 200, run: (i) => coilOverPlate(plates[i & 63]!).resistanceChange },
];

