import { describe, expect, it } from "vitest";
import { frequencyForPower, InputError, seriesInverter } from "../../src/index.js";
import { simulateHalfBridge } from "./simulate.js";
import fourier from "../fixtures/tank/half-bridge-fourier.json" with { type: "json" };

describe("seriesInverter (first-harmonic approximation)", () => {
  const L = 20e-6;
  const C = 1e-6;
  const f0 = 1 / (2 * Math.PI * Math.sqrt(L * C));
  const z0 = Math.sqrt(L / C);

  // Time-domain reference: test/tank/simulate.ts (RK4 on the series RLC driven by the ideal
  // half-bridge square wave 0…Vdc, step grid aligned with the switching edges).
  for (const q of [3, 5, 10]) {
    it(`agrees with a time-domain half-bridge simulation at Q = ${q} within the stated FHA error (power 1 %, RMS current 0.5 %)`, () => {
      for (const ratio of [0.8, 0.95, 1, 1.1, 1.5]) {
        const options = { supplyVoltage: 100, bridge: "half" as const, inductance: L, capacitance: C, resistance: z0 / q, switchingFrequency: ratio * f0 };
        const op = seriesInverter(options);
        const sim = simulateHalfBridge({ ...options, cycles: Math.ceil(6 * q) + 15, measureCycles: 4, stepsPerHalfCycle: 200 });
        expect(Math.abs(op.power / sim.power - 1)).toBeLessThanOrEqual(0.01); // simulation; FHA, Erickson & Maksimović ch. 19
        expect(Math.abs(op.currentRms / sim.currentRms - 1)).toBeLessThanOrEqual(0.005); // simulation
        // The harmonics add ≈ (V1/Z0)·Σ_{odd n≥3} r/(n²r² − 1): 0.25·V1/Z0 at resonance, 0.30 at r = 0.8.
        expect(Math.abs(op.switchedCurrent - sim.switchedCurrent)).toBeLessThanOrEqual(0.35 * (op.fundamentalVoltagePeak / z0)); // simulation
        if (ratio >= 1.1) expect(sim.switchedCurrent).toBeGreaterThan(0); // ZVS above resonance, as flagged
        expect(op.zeroVoltageSwitching).toBe(ratio > 1);
      }
    });
  }

  it("stays within the stated FHA error of the exact Fourier-series steady state (fixture half-bridge-fourier.json)", () => {
    const { supplyVoltage, inductance, capacitance } = fourier.meta;
    for (const c of fourier.cases) {
      const op = seriesInverter({ supplyVoltage, bridge: "half", inductance, capacitance, resistance: c.resistance, switchingFrequency: c.switchingFrequency });
      expect(Math.abs(op.power / c.power - 1)).toBeLessThanOrEqual(0.01); // fixture, mpmath Fourier sum
      expect(op.power).toBeLessThanOrEqual(c.power); // FHA leaves out the harmonics' power
      expect(Math.abs(op.currentRms / c.currentRms - 1)).toBeLessThanOrEqual(0.005); // fixture, mpmath Fourier sum
    }
  });

  it("has a simulator that reproduces the exact Fourier-series steady state within 0.1 %", () => {
    const { supplyVoltage, inductance, capacitance } = fourier.meta;
    for (const c of fourier.cases.filter((_, k) => k % 3 === 0)) {
      const sim = simulateHalfBridge({ supplyVoltage, inductance, capacitance, resistance: c.resistance, switchingFrequency: c.switchingFrequency, cycles: Math.ceil(6 * c.qualityFactor) + 15, measureCycles: 4, stepsPerHalfCycle: 200 });
      expect(Math.abs(sim.power / c.power - 1)).toBeLessThanOrEqual(1e-3); // fixture, mpmath Fourier sum
      expect(Math.abs(sim.currentRms / c.currentRms - 1)).toBeLessThanOrEqual(1e-3);
    }
  });

  it("doubles the fundamental (×4 power) for a full bridge, checked by simulation", () => {
    const options = { supplyVoltage: 50, inductance: L, capacitance: C, resistance: z0 / 5, switchingFrequency: 1.1 * f0 };
    const half = seriesInverter({ ...options, bridge: "half" });
    const full = seriesInverter({ ...options, bridge: "full" });
    expect(full.power / half.power).toBeCloseTo(4, 12);
    const sim = simulateHalfBridge({ ...options, bridge: "full", cycles: 45, measureCycles: 4, stepsPerHalfCycle: 200 });
    expect(Math.abs(full.power / sim.power - 1)).toBeLessThanOrEqual(0.01); // simulation
  });

  it("uses the fundamental 2·Vdc/π of the half-bridge square wave (Erickson & Maksimović 2nd ed., §19.1)", () => {
    const op = seriesInverter({ supplyVoltage: 100, bridge: "half", inductance: L, capacitance: C, resistance: 1, switchingFrequency: f0 });
    expect(op.fundamentalVoltagePeak).toBeCloseTo(200 / Math.PI, 12);
    expect(op.power).toBeCloseTo((200 / Math.PI) ** 2 / 2, 6); // at resonance P = V1²/(2R)
    expect(Math.abs(op.phase)).toBeLessThan(1e-9);
  });

  it("cautions about capacitive switching below resonance", () => {
    const op = seriesInverter({ supplyVoltage: 100, bridge: "half", inductance: L, capacitance: C, resistance: 1, switchingFrequency: 0.9 * f0 });
    expect(op.zeroVoltageSwitching).toBe(false);
    expect(op.cautions.map((c) => c.code)).toContain("capacitive-switching");
    expect(op.switchedCurrent).toBeLessThan(0);
  });

  it("throws InputError for bad inputs", () => {
    const ok = { supplyVoltage: 100, bridge: "half" as const, inductance: L, capacitance: C, resistance: 1, switchingFrequency: f0 };
    expect(() => seriesInverter({ ...ok, bridge: "quarter" as never })).toThrow(InputError);
    expect(() => seriesInverter({ ...ok, switchingFrequency: 0 })).toThrow(InputError);
    expect(() => seriesInverter({ ...ok, resistance: -1 })).toThrow(InputError);
    expect(() => seriesInverter({ ...ok, supplyVoltage: NaN })).toThrow(InputError);
  });
});

describe("frequencyForPower", () => {
  const tank = { supplyVoltage: 325, bridge: "half" as const, inductance: 100e-6, capacitance: 0.2e-6, resistance: 4 };

  it("returns the inductive-side frequency that gives back the target power", () => {
    for (const power of [100, 1000, 3479, 5000]) {
      const f = frequencyForPower({ ...tank, power });
      const op = seriesInverter({ ...tank, switchingFrequency: f });
      expect(op.power / power).toBeCloseTo(1, 9);
      expect(op.zeroVoltageSwitching || Math.abs(op.phase) < 1e-9).toBe(true);
    }
  });

  it("matches the first-harmonic frequency solved by hand on the inductive side", () => {
    // Hand derivation (first harmonic, Erickson & Maksimović ch. 19): the half bridge's square
    // wave 0…Vdc has a fundamental of peak V1 = 2·Vdc/π; P = V1²·R / (2·|Z|²) with
    // |Z|² = R² + X², so X = √(V1²·R/(2P) − R²); on the inductive side ωL − 1/(ωC) = X, whose
    // positive root is ω = (X + √(X² + 4L/C)) / (2L).
    const { supplyVoltage: vdc, inductance: l, capacitance: c, resistance: r } = tank;
    for (const power of [500, 2000, 4000]) {
      const v1 = (2 * vdc) / Math.PI;
      const x = Math.sqrt((v1 * v1 * r) / (2 * power) - r * r);
      const omega = (x + Math.sqrt(x * x + (4 * l) / c)) / (2 * l);
      expect(Math.abs(frequencyForPower({ ...tank, power }) / (omega / (2 * Math.PI)) - 1)).toBeLessThan(1e-9);
    }
  });

  it("returns the resonant frequency at the maximum power and throws InputError above it", () => {
    const v1 = (2 * 325) / Math.PI;
    const pMax = (v1 * v1) / (2 * 4);
    const f0 = 1 / (2 * Math.PI * Math.sqrt(100e-6 * 0.2e-6));
    expect(frequencyForPower({ ...tank, power: pMax })).toBeCloseTo(f0, 6);
    expect(() => frequencyForPower({ ...tank, power: pMax * 1.01 })).toThrow(/power at resonance/);
    expect(() => frequencyForPower({ ...tank, power: 0 })).toThrow(InputError);
  });
});
