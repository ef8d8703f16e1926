import { describe, expect, it } from "vitest";
import { InputError } from "../../src/index.js";
import {
  fluxDensityFromVoltSeconds,
  fluxWaveformFromVoltage,
  sinusoidalFluxWaveform,
  sinusoidalPeakFluxDensity,
  trapezoidalFluxWaveform,
  triangularFluxWaveform,
} from "../../src/coreloss/index.js";

describe("waveform builders", () => {
  it("sinusoidalFluxWaveform samples the peaks exactly and closes", () => {
    const w = sinusoidalFluxWaveform({ fluxDensityPeak: 0.2, frequency: 1e3, samples: 16, offset: 0.05 });
    expect(w.time.length).toBe(17);
    expect(w.fluxDensity[4]).toBe(0.25);
    // sample 12 of 16 is at three quarters of the period, sin = −1: offset − peak = −0.15 (to a
    // few ulps of 0.2; which neighbouring double comes out is the arithmetic's, not a property)
    expect(Math.abs(w.fluxDensity[12]! + 0.15)).toBeLessThanOrEqual(2 * Number.EPSILON * 0.2);
    expect(w.fluxDensity[16]).toBe(w.fluxDensity[0]);
    expect(w.time[16]).toBe(w.period);
    expect(Math.abs((w.fluxDensity[1] as number) - (0.05 + 0.2 * Math.sin(Math.PI / 8)))).toBeLessThan(1e-16);
  });

  it("triangularFluxWaveform puts the peak at D·T", () => {
    const w = triangularFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e4, dutyCycle: 0.2 });
    expect(Array.from(w.time)).toEqual([0, 0.2e-4, 1e-4]);
    expect(Array.from(w.fluxDensity)).toEqual([-0.1, 0.1, -0.1]);
  });

  it("trapezoidalFluxWaveform holds the flux during the zero-voltage intervals", () => {
    const w = trapezoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e3, dutyCycle: 0.5 });
    expect(Array.from(w.fluxDensity)).toEqual([-0.1, 0.1, 0.1, -0.1, -0.1]);
    expect(Array.from(w.time)).toEqual([0, 0.00025, 0.0005, 0.00075, 0.001]);
  });

  it("rejects bad input with InputError", () => {
    expect(() => sinusoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e3, samples: 3 })).toThrow(InputError);
    expect(() => triangularFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e3, dutyCycle: 1 })).toThrow(/dutyCycle/);
    expect(() => trapezoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e3, dutyCycle: 0 })).toThrow(/dutyCycle/);
    expect(() => trapezoidalFluxWaveform({ fluxDensityPeak: -0.1, frequency: 1e3, dutyCycle: 0.5 })).toThrow(InputError);
  });
});

describe("flux density from volt-seconds", () => {
  it("fluxDensityFromVoltSeconds is λ/(N A) (Faraday's law)", () => {
    expect(fluxDensityFromVoltSeconds({ voltSeconds: 2.4e-4, turns: 6, coreArea: 1e-4 })).toBeCloseTo(0.4, 14);
    expect(() => fluxDensityFromVoltSeconds({ voltSeconds: -1, turns: 6, coreArea: 1e-4 })).toThrow(InputError);
    expect(() => fluxDensityFromVoltSeconds({ voltSeconds: 1, turns: 0, coreArea: 1e-4 })).toThrow(/turns/);
    expect(() => fluxDensityFromVoltSeconds({} as never)).toThrow(/voltSeconds/);
  });

  it("fluxDensityFromVoltSeconds accepts a voltage waveform and returns the swing of its integral (Faraday's law)", () => {
    const swing = fluxDensityFromVoltSeconds({ time: [0, 3e-6, 5e-6, 8e-6, 10e-6], voltage: [40, 0, -40, 0], turns: 5, coreArea: 2e-4 });
    expect(swing).toBeCloseTo((40 * 3e-6) / (5 * 2e-4), 14);
    expect(() => fluxDensityFromVoltSeconds({ time: [0, 1e-6, 2e-6], voltage: [10, -9], turns: 1, coreArea: 1e-4 })).toThrow(/balanced/);
  });

  it("sinusoidalPeakFluxDensity is V/(4.44 f N A) within the rounding of 4.44 (transformer equation, common practice)", () => {
    const b = sinusoidalPeakFluxDensity({ voltageRms: 230, frequency: 50, turns: 500, coreArea: 20e-4 });
    expect(Math.abs(b - 230 / (4.44 * 50 * 500 * 20e-4)) / b).toBeLessThan(1e-3);
    expect(Math.abs(b - (Math.SQRT2 * 230) / (2 * Math.PI * 50 * 500 * 20e-4)) / b).toBeLessThan(1e-15);
    expect(() => sinusoidalPeakFluxDensity({ voltageRms: -1, frequency: 50, turns: 5, coreArea: 1 })).toThrow(InputError);
  });

  it("fluxWaveformFromVoltage integrates a rectangular voltage and centres the flux", () => {
    const w = fluxWaveformFromVoltage({ time: [0, 4e-6, 5e-6, 9e-6, 10e-6], voltage: [50, 0, -50, 0], turns: 4, coreArea: 1e-4 });
    const swing = (50 * 4e-6) / (4 * 1e-4);
    expect(Math.max(...w.fluxDensity)).toBeCloseTo(swing / 2, 14);
    expect(Math.min(...w.fluxDensity)).toBeCloseTo(-swing / 2, 14);
    expect(w.period).toBe(10e-6);
    expect(w.fluxDensity[4]).toBe(w.fluxDensity[0]);
  });

  it("fluxWaveformFromVoltage rejects unbalanced volt-seconds and malformed input", () => {
    expect(() => fluxWaveformFromVoltage({ time: [0, 1e-6, 2e-6], voltage: [10, -9], turns: 1, coreArea: 1e-4 })).toThrow(/balanced/);
    expect(() => fluxWaveformFromVoltage({ time: [0, 1e-6], voltage: [10, -9], turns: 1, coreArea: 1e-4 })).toThrow(InputError);
    expect(() => fluxWaveformFromVoltage({ time: [0, 2e-6, 1e-6], voltage: [10, -10], turns: 1, coreArea: 1e-4 })).toThrow(/time\[2\]/);
    expect(() => fluxWaveformFromVoltage({ time: [1e-6, 2e-6, 3e-6], voltage: [10, -10], turns: 1, coreArea: 1e-4 })).toThrow(/time\[0\]/);
  });
});
