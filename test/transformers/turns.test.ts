import { describe, it, expect } from "vitest";
import { InputError, transformerFluxOptimum, transformerTurns, windowFill } from "../../src/index.js";
import type { TransformerFluxOptimumOptions } from "../../src/index.js";

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe("transformerTurns", () => {
  it("agrees with the transformer EMF equation V = 4.44 f N B A for a sinusoid (common practice)", () => {
    // 230 V RMS, 50 Hz, 1.2 T on 10 cm²: N = 230 / (4.443·50·1.2·1e-3) = 862.8 (4.443 = √2·π)
    const lambda = (Math.SQRT2 * 230) / (Math.PI * 50);
    const t = transformerTurns({ voltSeconds: lambda, maxFluxDensity: 1.2, effectiveArea: 1e-3 });
    expect(rel(t.minimumTurns, 230 / (Math.SQRT2 * Math.PI * 50 * 1.2 * 1e-3))).toBeLessThan(1e-15);
    expect(t.turns).toBe(863);
    expect(t.peakFluxDensity).toBeLessThanOrEqual(1.2);
  });

  it("gives N = V/(4 f B A) for a square wave and keeps exact quotients whole", () => {
    const t = transformerTurns({ voltSeconds: 200 * 2.5e-6, maxFluxDensity: 0.1, effectiveArea: 1e-4 });
    expect(t.turns).toBe(25);
    expect(rel(t.peakFluxDensity, 0.1)).toBeLessThan(1e-15);
    expect(() => transformerTurns({ voltSeconds: 0, maxFluxDensity: 0.1, effectiveArea: 1e-4 })).toThrow(InputError);
  });
});

const base: TransformerFluxOptimumOptions = {
  voltSeconds: 200 * 2.5e-6, frequency: 200e3, effectiveArea: 1e-4, effectiveVolume: 5e-6, windowArea: 1e-4,
  meanTurnLength: 0.06, fillFactor: 0.3, resistivity: 2.2e-8, totalCurrentRms: 6, coreLoss: { k: 3, alpha: 1.4, beta: 2.6 },
};

/** Golden-section minimum of the loss sum written from its definitions (independent of the closed form). */
function numericMinimum(o: TransformerFluxOptimumOptions): number {
  const loss = (b: number): number => {
    const n = o.voltSeconds / (2 * b * o.effectiveArea);
    const copper = (o.resistivity * o.meanTurnLength * n * n * o.totalCurrentRms ** 2) / (o.fillFactor * o.windowArea);
    const core = o.effectiveVolume * o.coreLoss.k * o.frequency ** o.coreLoss.alpha * b ** o.coreLoss.beta;
    return copper + core;
  };
  let lo = 1e-3;
  let hi = 2;
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < 200; i++) {
    const a = hi - g * (hi - lo);
    const b = lo + g * (hi - lo);
    if (loss(a) < loss(b)) hi = b;
    else lo = a;
  }
  return (lo + hi) / 2;
}

describe("transformerFluxOptimum", () => {
  it("finds the same minimum as a direct numerical minimisation of the loss sum (to 2e-8, the resolution of a golden-section search on a flat minimum)", () => {
    for (const beta of [2.2, 2.6, 3]) {
      for (const current of [1, 6, 30]) {
        const o = { ...base, totalCurrentRms: current, coreLoss: { k: 3, alpha: 1.4, beta } };
        expect(rel(transformerFluxOptimum(o).peakFluxDensity, numericMinimum(o))).toBeLessThan(2e-8);
      }
    }
  });

  it("balances the losses at Pcu = (β/2) Pfe (Erickson & Maksimović 2001 §15.1, from memory)", () => {
    const o = transformerFluxOptimum(base);
    expect(rel(o.copperLoss / o.coreLoss, 2.6 / 2)).toBeLessThan(1e-12);
    expect(o.limited).toBe(false);
    expect(rel(o.turns, base.voltSeconds / (2 * o.peakFluxDensity * base.effectiveArea))).toBeLessThan(1e-15);
  });

  it("returns the limit when saturation comes first", () => {
    const o = transformerFluxOptimum({ ...base, maxFluxDensity: 0.05 });
    expect(o.peakFluxDensity).toBe(0.05);
    expect(o.limited).toBe(true);
    expect(() => transformerFluxOptimum({ ...base, fillFactor: 1.2 })).toThrow(InputError);
    expect(() => transformerFluxOptimum({ ...base, acFactor: 0.5 })).toThrow(InputError);
    expect(() => transformerFluxOptimum({ ...base, coreLoss: { k: 3, alpha: 1.4, beta: 2.6, gamma: 1 } as never })).toThrow(/gamma/);
  });
});

describe("windowFill", () => {
  it("sums turns times areas over the window (hand arithmetic)", () => {
    const f = windowFill({ windowArea: 1e-4, windings: [{ turns: 20, copperArea: 0.5e-6, conductorArea: 0.8e-6 }, { turns: 5, copperArea: 2e-6 }] });
    expect(rel(f.copperFill, (20 * 0.5e-6 + 5 * 2e-6) / 1e-4)).toBeLessThan(1e-15);
    expect(rel(f.conductorFill, (20 * 0.8e-6 + 5 * 2e-6) / 1e-4)).toBeLessThan(1e-15);
    expect(() => windowFill({ windowArea: 1e-4, windings: [] })).toThrow(InputError);
    expect(() => windowFill({ windowArea: 1e-4, windings: [{ turns: 1, copperArea: 2e-6, conductorArea: 1e-6 }] })).toThrow(InputError);
  });
});
