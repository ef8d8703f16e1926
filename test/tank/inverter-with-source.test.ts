import { describe, expect, it } from "vitest";
import {
  capacitorSeriesResistance,
  currentFedParallelInverter,
  currentFedParallelInverterWithSource,
  InputError,
  seriesInverter,
  seriesInverterWithSource,
} from "../../src/index.js";

const tank = { bridge: "full" as const, inductance: 20e-6, capacitance: 1.5e-6, resistance: 0.3 };

describe("capacitorSeriesResistance", () => {
  it("is tanδ/(ωC) (definition of the dissipation factor, IEC 60384-1 §4.8, from memory)", () => {
    // 1 µF at 50 kHz: X = 1/(2π·5e4·1e-6) = 3.18310 Ω; tanδ = 1e-3 ⇒ 3.18310 mΩ (hand calculation)
    expect(capacitorSeriesResistance({ capacitance: 1e-6, dissipationFactor: 0.001, frequency: 50e3 })).toBeCloseTo(3.1830988618e-3, 12);
    expect(capacitorSeriesResistance({ capacitance: 1e-6, dissipationFactor: 0, frequency: 50e3 })).toBe(0);
  });
  it("rejects bad input and unknown keys", () => {
    expect(() => capacitorSeriesResistance({ capacitance: 0, dissipationFactor: 0.001, frequency: 50e3 })).toThrow(InputError);
    expect(() => capacitorSeriesResistance({ capacitance: 1e-6, dissipationFactor: -1, frequency: 50e3 })).toThrow(InputError);
    expect(() => capacitorSeriesResistance({ capacitance: 1e-6, dissipationFactor: 0.001, frequency: 50e3, tanDelta: 1 } as never)).toThrow(/unknown field/);
  });
});

describe("seriesInverterWithSource", () => {
  it("at a fixed frequency, V_in = V_s/(1 + R_s·g) and the source side balances exactly (Ohm's law)", () => {
    const op = seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.5, ...tank, switchOnResistance: 0.01, switchingFrequency: 35e3 });
    const ref = seriesInverter({ supplyVoltage: op.inputVoltage, ...tank, resistance: 0.32, switchingFrequency: 35e3 });
    expect(op.power).toBeCloseTo(ref.power, 12);
    expect(op.inputVoltage).toBeCloseTo(24 - 0.5 * op.sourceCurrent, 12);
    expect(Math.abs(op.sourcePower - op.sourceLoss - op.power)).toBeLessThanOrEqual(1e-12 * op.sourcePower);
    // the switches' share of the tank loss: I²·2R_on (two switches of a full bridge conduct)
    expect(op.switchConductionLoss).toBeCloseTo(op.currentRms ** 2 * 0.02, 12);
    expect(op.switchCurrentRms).toBeCloseTo(op.currentRms / Math.SQRT2, 14);
  });

  it("for a target power, takes the higher root of V_in(V_s − V_in) = R_s·P", () => {
    const op = seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.5, ...tank, power: 100 });
    // hand calculation: V_in = (24 + √(576 − 200))/2 = 21.6953597…
    expect(op.inputVoltage).toBeCloseTo(21.695359714832659, 10);
    expect(op.power).toBeCloseTo(100, 9);
    expect(op.terminalVoltage).toBeGreaterThan(0);
  });

  it("refuses a power the source cannot deliver, naming the limit V²/(4R) (maximum power transfer, from memory)", () => {
    // 24 V behind 5 Ω: at most 24²/20 = 28.8 W into any load
    expect(() => seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 5, ...tank, power: 250 })).toThrow(/≤ 28\.8 \(the most a 24 V source behind 5 Ω delivers/);
    expect(() => seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 20, ...tank, power: 250 })).toThrow(InputError);
    // and a power above the tank's resonance power at the input voltage: V1²/(2R) = (4·24/π)²/0.6 = 1556 W
    expect(() => seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 0, ...tank, power: 2000 })).toThrow(/the tank's power at resonance/);
  });

  it("needs exactly one of switchingFrequency and power, and rejects unknown keys", () => {
    expect(() => seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.5, ...tank })).toThrow(/exactly one/);
    expect(() => seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.5, ...tank, power: 10, switchingFrequency: 4e4 })).toThrow(/exactly one/);
    expect(() => seriesInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.5, ...tank, power: 10, powr: 1 } as never)).toThrow(/did you mean "power"/);
  });
});

describe("currentFedParallelInverterWithSource", () => {
  it("is the ideal inverter at V_in = I·R_in with I = V_s/(R_in + R_s + R_on); the balance closes exactly", () => {
    const o = { inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 };
    const op = currentFedParallelInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.05, switchOnResistance: 0.01, ...o });
    const ref = currentFedParallelInverter({ supplyVoltage: op.inputVoltage, ...o });
    expect(op.supplyCurrent).toBeCloseTo(ref.supplyCurrent, 12);
    // R_in = 2R_d/π² with R_d = L/(RC) = 50 Ω ⇒ 10.1321 Ω; I = 24/10.1921 = 2.35476 A (hand calculation)
    expect(op.sourceCurrent).toBeCloseTo(24 / ((2 * 50) / Math.PI ** 2 + 0.06), 10);
    expect(Math.abs(op.sourcePower - op.sourceLoss - op.switchConductionLoss - op.power)).toBeLessThanOrEqual(1e-12 * op.sourcePower);
    expect(op.terminalVoltage).toBeCloseTo(24 - 0.05 * op.sourceCurrent, 12);
  });
  it("throws when the tank cannot oscillate (R ≥ √(L/C))", () => {
    expect(() => currentFedParallelInverterWithSource({ sourceVoltage: 24, sourceResistance: 0.05, inductance: 1e-6, capacitance: 2e-6, coilResistance: 1 })).toThrow(/√\(L\/C\)/);
  });
});
