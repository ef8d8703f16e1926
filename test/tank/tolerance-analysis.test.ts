import { describe, expect, it } from "vitest";
import { InputError, tankToleranceAnalysis } from "../../src/index.js";

describe("tankToleranceAnalysis", () => {
  const base = { inductance: 10e-6, capacitance: 1e-6, resistance: 0.1, inductanceTolerance: 0.05, capacitanceTolerance: 0.1, samples: 20000, seed: 7 };

  it("is reproducible for a seed and changes with the seed", () => {
    const a = tankToleranceAnalysis(base);
    const b = tankToleranceAnalysis(base);
    expect(a).toEqual(b);
    const c = tankToleranceAnalysis({ ...base, seed: 8 });
    expect(c.frequency.p50).not.toBe(a.frequency.p50);
  });

  it("matches the exact percentiles of f0/√(1+δ) for a uniform inductance deviation", () => {
    // Exact distribution (outside check by construction): δ ~ U(−t, t), f = f0/√(1+δ) is decreasing
    // in δ, so its p-quantile is f0/√(1 + t(1 − 2p)).
    const t = 0.1;
    const mc = tankToleranceAnalysis({ inductance: 10e-6, capacitance: 1e-6, resistance: 0.1, inductanceTolerance: t, capacitanceTolerance: 0, samples: 100000, seed: 3 });
    const f0 = mc.nominalFrequency;
    for (const [p, got] of [[0.01, mc.frequency.p1], [0.05, mc.frequency.p5], [0.5, mc.frequency.p50], [0.95, mc.frequency.p95], [0.99, mc.frequency.p99]] as const) {
      expect(Math.abs(got / (f0 / Math.sqrt(1 + t * (1 - 2 * p))) - 1)).toBeLessThan(0.002);
    }
    expect(mc.frequency.max).toBeLessThanOrEqual(f0 / Math.sqrt(0.9));
    expect(mc.frequency.min).toBeGreaterThanOrEqual(f0 / Math.sqrt(1.1));
  });

  it("collapses to the nominal values with zero tolerances and no temperature change", () => {
    const mc = tankToleranceAnalysis({ ...base, inductanceTolerance: 0, capacitanceTolerance: 0, samples: 50 });
    expect(mc.frequency.min).toBe(mc.frequency.max);
    expect(mc.frequency.p50).toBeCloseTo(mc.nominalFrequency, 9);
    expect(mc.tankCurrentRms.p50).toBeCloseTo(mc.nominalTankCurrentRms, 9);
    expect(mc.tankCurrentRms.p50).toBeCloseTo(1 / 0.1, 9); // 1 V at resonance into 0.1 Ω
  });

  it("shifts frequency by the temperature coefficient: −150 ppm/K over +40 K raises f by ≈ 0.3 %", () => {
    const mc = tankToleranceAnalysis({ ...base, inductanceTolerance: 0, capacitanceTolerance: 0, capacitanceTemperatureCoefficient: -150e-6, temperatureChangeMin: 40, temperatureChangeMax: 40, samples: 10 });
    expect(mc.frequency.p50 / mc.nominalFrequency).toBeCloseTo(1 / Math.sqrt(1 - 150e-6 * 40), 12);
  });

  it("uses the zero-phase frequency and capacitor current for the parallel tank, dropping non-resonant samples", () => {
    const mc = tankToleranceAnalysis({ ...base, topology: "parallel", resistance: 3.1, resistanceTolerance: 0.1, driveVoltageRms: 100 });
    // √(L/C) = 3.162 Ω: some samples lose their resonance.
    expect(mc.resonantSamples).toBeLessThan(mc.samples);
    expect(mc.resonantSamples).toBeGreaterThan(0);
    expect(mc.frequency.max).toBeLessThan(1 / (2 * Math.PI * Math.sqrt(10e-6 * 0.9 * 1e-6 * 0.9)));
  });

  it("draws normal deviates with σ = tolerance/3", () => {
    const t = 0.03;
    const mc = tankToleranceAnalysis({ ...base, inductanceTolerance: t, capacitanceTolerance: 0, distribution: "normal", samples: 100000, seed: 11 });
    // f ≈ f0 (1 − δ/2): σ_f/f0 ≈ (t/3)/2 to first order.
    expect(mc.frequency.standardDeviation / mc.nominalFrequency / (t / 6)).toBeCloseTo(1, 1);
  });

  it("throws InputError for bad inputs", () => {
    expect(() => tankToleranceAnalysis({ ...base, inductanceTolerance: 1 })).toThrow(InputError);
    expect(() => tankToleranceAnalysis({ ...base, samples: 0 })).toThrow(InputError);
    expect(() => tankToleranceAnalysis({ ...base, seed: 1.5 })).toThrow(InputError);
    expect(() => tankToleranceAnalysis({ ...base, temperatureChangeMin: 10, temperatureChangeMax: 0 })).toThrow(InputError);
    expect(() => tankToleranceAnalysis({ ...base, topology: "parallel", resistance: 10 })).toThrow(/resonate/);
    expect(() => tankToleranceAnalysis({ ...base, distribution: "triangular" as never })).toThrow(InputError);
    expect(() => tankToleranceAnalysis({ ...base, capacitanceTemperatureCoefficient: -0.1, temperatureChangeMax: 20 })).toThrow(InputError);
  });
});
