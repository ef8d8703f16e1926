import { describe, expect, it } from "vitest";
import { InputError, parallelTank, tankImpedance, tankStresses } from "../../src/index.js";
import data from "../fixtures/tank/parallel-resonance.json" with { type: "json" };

describe("parallelTank", () => {
  it("reproduces Alexander & Sadiku Example 14.8 (parallel RLC: R = 8 kΩ, L = 0.2 mH, C = 8 µF)", () => {
    // Alexander & Sadiku, Fundamentals of Electric Circuits, 5th ed., Example 14.8 (from memory):
    // ω0 = 25 krad/s, Q = 1600, B = 15.625 rad/s; with v = 10 sin ωt, P = 6.25 mW at ω0.
    const t = parallelTank({ inductance: 0.2e-3, capacitance: 8e-6, coilResistance: 0, parallelResistance: 8e3 });
    expect(2 * Math.PI * t.undampedFrequency).toBeCloseTo(25e3, 6); // A&S 5th ed., Ex. 14.8 (from memory)
    expect(t.qualityFactor).toBeCloseTo(1600, 9); // A&S 5th ed., Ex. 14.8 (from memory)
    expect((2 * Math.PI * t.undampedFrequency) / t.qualityFactor).toBeCloseTo(15.625, 9); // B, A&S Ex. 14.8
    expect(t.zeroPhaseFrequency).toBeCloseTo(t.undampedFrequency, 6);
    expect(t.dynamicResistance).toBe(8e3);
    const s = tankStresses(t, { frequency: t.undampedFrequency, voltageRms: 10 / Math.SQRT2 });
    expect(s.power).toBeCloseTo(6.25e-3, 12); // A&S 5th ed., Ex. 14.8 (from memory)
    // At the book's half-power frequencies (24.992 and 25.008 krad/s, rounded to 1 rad/s, i.e. to
    // 13 % of the half-bandwidth 7.8 rad/s) |Z| is R/√2 within that rounding (≤ 2 %).
    for (const w of [24.992e3, 25.008e3]) {
      const z = tankImpedance(t, w / (2 * Math.PI));
      expect(Math.abs(Math.hypot(z.re, z.im) / (8e3 / Math.SQRT2) - 1)).toBeLessThan(0.02); // A&S Ex. 14.8 (from memory)
    }
  });

  it("reproduces Alexander & Sadiku Example 14.9: coil (1 H, 2 Ω) ∥ 0.1 F ∥ 10 Ω resonates at √6 rad/s", () => {
    const t = parallelTank({ inductance: 1, capacitance: 0.1, coilResistance: 2, parallelResistance: 10 });
    expect(2 * Math.PI * (t.zeroPhaseFrequency as number)).toBeCloseTo(2.45, 2); // A&S 5th ed., Ex. 14.9 (from memory)
    expect(2 * Math.PI * (t.zeroPhaseFrequency as number)).toBeCloseTo(Math.sqrt(6), 12);
  });

  it("matches mpmath roots of Im Z and d|Z|/dω (fixture parallel-resonance.json)", () => {
    const rtol = data.meta.rtol;
    for (const c of data.cases) {
      const t = parallelTank({
        inductance: c.inductance,
        capacitance: c.capacitance,
        coilResistance: c.coilResistance,
        ...(c.parallelResistance === null ? {} : { parallelResistance: c.parallelResistance }),
      });
      expect(t.undampedFrequency / c.undampedFrequency - 1).toBeLessThan(1e-14);
      if (c.zeroPhaseFrequency === null) expect(t.zeroPhaseFrequency).toBeNull();
      else {
        expect(Math.abs((t.zeroPhaseFrequency as number) / c.zeroPhaseFrequency - 1)).toBeLessThan(rtol); // fixture, mpmath
        expect(Math.abs(t.dynamicResistance / (c.impedanceAtZeroPhase) - 1)).toBeLessThan(rtol); // fixture, mpmath
      }
      if (c.maxImpedanceFrequency === null) expect(t.maxImpedanceFrequency).toBeNull();
      else {
        expect(Math.abs((t.maxImpedanceFrequency as number) / c.maxImpedanceFrequency - 1)).toBeLessThan(rtol); // fixture, mpmath
        expect(Math.abs((t.maxImpedance as number) / (c.maxImpedance) - 1)).toBeLessThan(rtol);
      }
    }
  });

  it("returns dynamic resistance L/(RC) without a parallel resistance", () => {
    const t = parallelTank({ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
    expect(t.dynamicResistance).toBeCloseTo(50, 12);
    expect(t.undampedFrequency).toBeCloseTo(112539.5, 0);
    expect(t.zeroPhaseFrequency).toBeCloseTo(112528.3, 0);
  });

  it("documents 'no resonance' as null (never NaN) when the coil Q is ≤ 1", () => {
    const t = parallelTank({ inductance: 1e-6, capacitance: 1e-6, coilResistance: 1.2 }); // R > √(L/C) = 1
    expect(t.zeroPhaseFrequency).toBeNull();
    expect(t.resonant).toBe(false);
    expect(t.maxImpedanceFrequency).not.toBeNull(); // a = 1.44 < 1 + √2: the |Z| peak survives
    const heavy = parallelTank({ inductance: 1e-6, capacitance: 1e-6, coilResistance: 2 }); // a = 4 > 1 + √2
    expect(heavy.maxImpedanceFrequency).toBeNull();
    expect(heavy.maxImpedance).toBeNull();
    for (const v of Object.values(heavy)) if (typeof v === "number") expect(Number.isNaN(v)).toBe(false);
  });

  it("throws InputError for bad inputs", () => {
    const ok = { inductance: 1e-6, capacitance: 1e-6, coilResistance: 0.1 };
    expect(() => parallelTank({ ...ok, inductance: 0 })).toThrow(InputError);
    expect(() => parallelTank({ ...ok, capacitance: -1 })).toThrow(InputError);
    expect(() => parallelTank({ ...ok, coilResistance: -0.1 })).toThrow(InputError);
    expect(() => parallelTank({ ...ok, coilResistance: NaN })).toThrow(InputError);
    expect(() => parallelTank({ ...ok, parallelResistance: 0 })).toThrow(InputError);
    expect(() => parallelTank({ ...ok, coilResistance: 0 })).toThrow(/parallelResistance/);
    expect(() => parallelTank(undefined as never)).toThrow(InputError);
  });
});
