import { describe, expect, it } from "vitest";
import { InputError, seriesTank, tankImpedance, tankStresses } from "../../src/index.js";

describe("seriesTank", () => {
  // Alexander & Sadiku, Fundamentals of Electric Circuits, 5th ed. (McGraw-Hill 2013), Example 14.7
  // (from memory, no page): R = 2 Ω, L = 1 mH, C = 0.4 µF, vs = 20 sin ωt.
  // Book answers: ω0 = 50 krad/s, ω1 = 49 krad/s, ω2 = 51 krad/s, Q = 25, B = 2 krad/s, Im = 10 A.
  const tank = seriesTank({ inductance: 1e-3, capacitance: 0.4e-6, resistance: 2 });
  const w = (f: number): number => 2 * Math.PI * f;

  it("reproduces the resonant frequency, Q and bandwidth of Alexander & Sadiku Example 14.7", () => {
    expect(w(tank.undampedFrequency)).toBeCloseTo(50e3, 6); // Alexander & Sadiku 5th ed., Ex. 14.7 (from memory)
    expect(tank.qualityFactor).toBeCloseTo(25, 12); // Alexander & Sadiku 5th ed., Ex. 14.7 (from memory)
    expect(w(tank.bandwidth)).toBeCloseTo(2e3, 6); // Alexander & Sadiku 5th ed., Ex. 14.7 (from memory)
  });

  it("reproduces the half-power frequencies of Example 14.7 within the book's rounding (49 and 51 krad/s)", () => {
    expect(Math.abs(w(tank.lowerHalfPowerFrequency) - 49e3)).toBeLessThan(0.5e3 * 0.05); // Alexander & Sadiku, Ex. 14.7 (from memory)
    expect(Math.abs(w(tank.upperHalfPowerFrequency) - 51e3)).toBeLessThan(0.5e3 * 0.05);
    // Exact values: ω = ∓R/2L + √((R/2L)² + 1/LC).
    expect(w(tank.lowerHalfPowerFrequency)).toBeCloseTo(-1000 + Math.sqrt(1e6 + 2.5e9), 6);
  });

  it("carries 10 A peak at resonance for 20 V peak, as in Example 14.7", () => {
    const s = tankStresses(tank, { frequency: tank.undampedFrequency, voltageRms: 20 / Math.SQRT2 });
    expect(s.coilCurrentPeak).toBeCloseTo(10, 9); // Alexander & Sadiku 5th ed., Ex. 14.7 (from memory)
    // Capacitor voltage at resonance is Q times the source voltage (same book, §14.5).
    expect(s.capacitorVoltagePeak).toBeCloseTo(25 * 20, 6);
  });

  it("has a real impedance equal to R at the undamped frequency", () => {
    const z = tankImpedance(tank, tank.undampedFrequency);
    expect(z.re).toBeCloseTo(2, 12);
    expect(Math.abs(z.im)).toBeLessThan(1e-9);
  });

  it("has |Z| = √2·R at both half-power frequencies", () => {
    for (const f of [tank.lowerHalfPowerFrequency, tank.upperHalfPowerFrequency]) {
      const z = tankImpedance(tank, f);
      expect(Math.hypot(z.re, z.im) / (Math.SQRT2 * 2)).toBeCloseTo(1, 12);
    }
  });

  it("rings at f0·√(1 − 1/4Q²) and reports no ringing (null) for Q ≤ 1/2", () => {
    expect(tank.dampedFrequency).toBeCloseTo(tank.undampedFrequency * Math.sqrt(1 - 1 / (4 * 625)), 6);
    const overdamped = seriesTank({ inductance: 1e-3, capacitance: 1e-6, resistance: 100 }); // Q = 0.316
    expect(overdamped.dampedFrequency).toBeNull();
    const critical = seriesTank({ inductance: 1, capacitance: 1, resistance: 2 }); // Q = 0.5
    expect(critical.dampedFrequency).toBeNull();
    expect(Number.isFinite(overdamped.bandwidth)).toBe(true);
  });

  it("gives the documented example's f0 = 1/(2π√(LC)), Q = √(L/C)/R and bandwidth R/(2πL), computed by hand", () => {
    const t = seriesTank({ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 });
    expect(Math.abs(t.undampedFrequency / (1 / (2 * Math.PI * Math.sqrt(100e-6 * 1e-6))) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(t.qualityFactor / (Math.sqrt(100e-6 / 1e-6) / 0.5) - 1)).toBeLessThan(1e-14);
    expect(Math.abs(t.bandwidth / (0.5 / (2 * Math.PI * 100e-6)) - 1)).toBeLessThan(1e-14);
  });

  it("throws InputError for non-positive or non-finite inputs", () => {
    const ok = { inductance: 1e-3, capacitance: 1e-6, resistance: 1 };
    for (const key of ["inductance", "capacitance", "resistance"] as const) {
      for (const bad of [0, -1, NaN, Infinity]) {
        expect(() => seriesTank({ ...ok, [key]: bad })).toThrow(InputError);
      }
    }
    expect(() => seriesTank(null as never)).toThrow(InputError);
    expect(() => seriesTank({ ...ok, inductance: "1" as never })).toThrow(/inductance/);
  });
});
