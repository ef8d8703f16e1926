/**
 * The hot functions with throughput targets and their varied inputs, shared by
 * `scripts/throughput.ts` (absolute rates against targets) and `scripts/throughput-check.ts`
 * (speed relative to a plain-JS baseline in the same run, for CI).
 */
import {
  barInLongCoil,
  eCore,
  gappedInductor,
  inductorDesign,
  inventedExampleFerrite,
  coilOverPlate,
  dowellFactor,
  ellipticE,
  ellipticK,
  igseLoss,
  inductiveLink,
  kelvinFunctions,
  llcGain,
  llcOperatingPoint,
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
export const solenoids = Array.from({ length: N }, (_, i) => ({ radius: r[i]!, length: len[i]!, turns: turns[i]! }));
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

const gains = Array.from({ length: N }, () => ({ inductanceRatio: logUniform(2, 20), qualityFactor: logUniform(0.05, 3), normalisedFrequency: logUniform(0.3, 3) }));
const llcPoints = Array.from({ length: 1024 }, () => {
  const lr = 60e-6;
  const cr = 24e-9;
  const fr = 1 / (2 * Math.PI * Math.sqrt(lr * cr));
  const zr = Math.sqrt(lr / cr);
  return {
    bridge: "half" as const, inputVoltage: 390, turnsRatio: 8, resonantInductance: lr, resonantCapacitance: cr,
    magnetisingInductance: logUniform(3, 10) * lr, switchingFrequency: logUniform(0.45, 1.6) * fr,
    loadResistance: (Math.PI * Math.PI * zr) / (8 * 64 * logUniform(0.15, 1)),
  };
});
const compensations = ["series-series", "series-parallel", "parallel-series", "parallel-parallel", "lcc-series", "double-lcc"] as const;
export const linkCases = Array.from({ length: N }, (_, i) => {
  const primaryInductance = logUniform(5e-6, 500e-6);
  const secondaryInductance = logUniform(5e-6, 500e-6);
  const compensation = compensations[i % 6] ?? "series-series";
  return {
    primaryInductance, secondaryInductance,
    mutualInductance: logUniform(0.01, 0.5) * Math.sqrt(primaryInductance * secondaryInductance),
    primaryResistance: logUniform(0.01, 1), secondaryResistance: logUniform(0.01, 1), frequency: logUniform(20e3, 7e6),
    compensation, loadResistance: logUniform(1, 100), sourceVoltage: 10,
    ...(compensation === "lcc-series" || compensation === "double-lcc" ? { primaryFilterInductance: 0.3 * primaryInductance } : {}),
    ...(compensation === "double-lcc" ? { secondaryFilterInductance: 0.3 * secondaryInductance } : {}),
  };
});
const gappedCores = Array.from({ length: N }, (_, i) => ({
  core: {
    effectiveArea: logUniform(2e-5, 4e-4), effectivePathLength: logUniform(0.03, 0.15), relativePermeability: 1000 + 2000 * random(),
    legShape: "rectangular" as const, legWidth: 0.012 + 0.008 * random(), legDepth: 0.012 + 0.008 * random(), windowHeight: 0.02 + 0.02 * random(),
  },
  turns: turns[i]!, gapLength: logUniform(5e-5, 1.5e-3), fringing: "muhlethaler" as const, current: 3,
}));
const designCore = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
const designs = Array.from({ length: 64 }, () => ({
  inductance: logUniform(50e-6, 150e-6), frequency: logUniform(50e3, 200e3), core: designCore, material: inventedExampleFerrite,
  current: { kind: "triangular" as const, average: 2 + 4 * random(), ripple: 0.5 + 1.5 * random(), dutyCycle: 0.2 + 0.6 * random() },
  conductor: { kind: "litz" as const, strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
  ambientTemperature: 313.15,
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
  { name: "gappedInductor (Mühlethaler fringing)", target: 10e6, unit: "per second", n: 4e6, run: (i) => gappedInductor(gappedCores[i & mask]!).inductance },
  { name: "inductorDesign (E core, litz, triangle)", target: 1, unit: "ms per call", n: 500, run: (i) => inductorDesign(designs[i & 63]!).totalLoss },
  { name: "coilOverPlate (1e-6 relative)", target: 1, unit: "ms per call", n: 200, run: (i) => coilOverPlate(plates[i & 63]!).reflectedResistance },
  { name: "llcGain", target: 30e6, unit: "per second", n: 4e6, run: (i) => llcGain(gains[i & mask]!) },
  { name: "llcOperatingPoint (3 ≤ L_n ≤ 10, 0.15 ≤ Q ≤ 1, 0.45 ≤ f_n ≤ 1.6)", target: 100e3, unit: "per second", n: 20e3, run: (i) => llcOperatingPoint(llcPoints[i & 1023]!).gain },
  { name: "inductiveLink (six compensations)", target: 5e6, unit: "per second", n: 1e6, run: (i) => inductiveLink(linkCases[i & mask]!).efficiency },
];

