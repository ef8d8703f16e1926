import { bench, describe } from "vitest";
import { leakageInductance, transformerDesign, transformerFluxOptimum, transformerWindingResistance } from "../../src/index.js";
import type { LeakageLayer, TransformerDesignOptions, WindingLayer } from "../../src/index.js";

// Inputs prepared beforehand: log-uniform over the documented domains, fixed pseudo-random sequence.
const N = 1024;
let seed = 20261204;
const random = (): number => ((seed = (seed * 1103515245 + 12345) >>> 0) / 4294967296);
const logUniform = (lo: number, hi: number): number => lo * (hi / lo) ** random();
const freqs = Float64Array.from({ length: N }, () => logUniform(1e3, 1e6));
const thick = Float64Array.from({ length: N }, () => logUniform(1e-5, 1e-3));
let i = 0;
let sink = 0;
const check = (v: number): void => {
  if (Number.isNaN(v)) throw new Error("NaN in benchmark");
  sink += v;
};

const foil = { kind: "foil", thickness: 0.1e-3 } as const;
const wire = { kind: "round", diameter: 0.3e-3, outerDiameter: 0.34e-3 } as const;
const litz = { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } as const;
const windingLayers: WindingLayer[] = [
  { winding: 0, turns: 20, conductor: wire }, { winding: 0, turns: 12, conductor: wire },
  { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil },
  { winding: 0, turns: 10, conductor: litz }, { winding: 0, turns: 6, conductor: litz },
];
const windingSpacers = [0.05e-3, 0.2e-3, 0.03e-3, 0.03e-3, 0.2e-3, 0.05e-3];

const design: TransformerDesignOptions = {
  frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
  core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
  coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
  primary: { conductor: litz }, secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
  sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
  resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 },
};

describe("transformers", () => {
  bench("leakageInductance (5 layers, interleaved)", () => {
    i = (i + 1) & (N - 1);
    const t = thick[i] ?? 1e-4;
    const layers: LeakageLayer[] = [{ winding: 0, thickness: t }, { winding: 0, thickness: t }, { winding: 1, thickness: 2 * t }, { winding: 0, thickness: t }, { winding: 0, thickness: t }];
    check(leakageInductance({ turns: 20, meanTurnLength: 0.06, windowBreadth: 0.01, layers, spacers: [1e-5, 1e-4, 1e-4, 1e-5] }));
  }, { time: 300 });
  bench("transformerWindingResistance (7 layers: round, foil, litz)", () => {
    i = (i + 1) & (N - 1);
    check(transformerWindingResistance({ frequency: freqs[i] ?? 1e5, resistivity: 1.72e-8, windowBreadth: 0.012, meanTurnLength: 0.05, layers: windingLayers, spacers: windingSpacers }).acResistanceReferred);
  }, { time: 300 });
  bench("transformerFluxOptimum", () => {
    i = (i + 1) & (N - 1);
    check(transformerFluxOptimum({ voltSeconds: 5e-4, frequency: freqs[i] ?? 1e5, effectiveArea: 1e-4, effectiveVolume: 5e-6, windowArea: 1e-4, meanTurnLength: 0.06, fillFactor: 0.3, resistivity: 2.2e-8, totalCurrentRms: 6, coreLoss: { k: 3, alpha: 1.4, beta: 2.6 } }).peakFluxDensity);
  }, { time: 300 });
  bench("transformerDesign (turn search, P-S-P, iGSE, thermal resistance)", () => {
    i = (i + 1) & (N - 1);
    check(transformerDesign({ ...design, primaryCurrentRms: 1 + (thick[i] ?? 1e-4) * 1e3 }).losses.total);
  }, { time: 300 });
});

export { sink };
