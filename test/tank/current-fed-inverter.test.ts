import { describe, expect, it } from "vitest";
import { currentFedParallelInverter, InputError, parallelTank } from "../../src/index.js";
import { simulateCurrentFed } from "./simulate.js";

/** A choke giving 0.2 % ripple: settles within the simulated cycles and barely disturbs the drive. */
function chokeFor(op: ReturnType<typeof currentFedParallelInverter>): number {
  const rEff = (2 * op.dynamicResistance) / (Math.PI * Math.PI);
  return (0.6614 * rEff) / (2 * Math.PI * op.frequency * 0.002);
}

describe("currentFedParallelInverter", () => {
  // Time-domain reference: test/tank/simulate.ts (RK4, ideal switches commutating at the tank
  // voltage zero crossings, choke current state, tank ODE), independent of the closed forms.
  for (const coilResistance of [0.01, 0.035, 0.1]) {
    const options = { supplyVoltage: 12, inductance: 1e-6, capacitance: 2e-6, coilResistance };
    const op = currentFedParallelInverter(options);
    it(`matches a time-domain simulation within 1 % at Q = ${op.qualityFactor.toFixed(1)} (π·Vdc peak, frequency, currents, power)`, () => {
      const sim = simulateCurrentFed({ ...options, chokeInductance: chokeFor(op), cycles: 400, measureCycles: 20, stepsPerCycle: 800 });
      const rel = (a: number, b: number): number => Math.abs(a / b - 1);
      expect(rel(op.tankVoltagePeak, sim.tankVoltagePeak)).toBeLessThanOrEqual(0.01); // simulation; π·Vdc (Kazimierczuk & Czarkowski, from memory)
      expect(rel(op.frequency, sim.frequency)).toBeLessThanOrEqual(0.01); // simulation
      expect(rel(op.supplyCurrent, sim.supplyCurrent)).toBeLessThanOrEqual(0.01); // simulation
      expect(rel(op.power, sim.power)).toBeLessThanOrEqual(0.01); // simulation
      expect(rel(op.capacitorCurrentRms, sim.capacitorCurrentRms)).toBeLessThanOrEqual(0.01); // simulation
      expect(rel(op.capacitorCurrentRmsWithHarmonics, sim.capacitorCurrentRms)).toBeLessThanOrEqual(0.003); // simulation
      expect(rel(op.coilCurrentRms, sim.coilCurrentRms)).toBeLessThanOrEqual(0.01); // simulation
      // √2·Q/π circulating-to-supply ratio, from the simulated waveforms.
      expect(rel(sim.capacitorCurrentRms / sim.supplyCurrent, (Math.SQRT2 * op.qualityFactor) / Math.PI)).toBeLessThanOrEqual(0.01);
      // Energy balance inside the simulation: supply power = coil I²R loss.
      expect(rel(sim.coilLossPower, sim.power)).toBeLessThanOrEqual(1e-3);
    });
  }

  it("reports the choke ripple as the simulation measures it", () => {
    const options = { supplyVoltage: 12, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.02, chokeInductance: 20e-6 };
    const op = currentFedParallelInverter(options);
    const sim = simulateCurrentFed({ ...options, cycles: 300, measureCycles: 10, stepsPerCycle: 800 });
    expect(Math.abs((op.chokeRipplePeakToPeak as number) / sim.chokeRipplePeakToPeak - 1)).toBeLessThan(0.05); // simulation
  });

  it("circulates several (around five) times its supply current in a small heater (common practice)", () => {
    // A small low-voltage heater with a workpiece in the coil: loaded coil Q around 10.
    const op = currentFedParallelInverter({ supplyVoltage: 24, inductance: 1.5e-6, capacitance: 2e-6, coilResistance: 0.085 });
    expect(op.qualityFactor).toBeGreaterThan(8);
    expect(op.qualityFactor).toBeLessThan(12);
    expect(op.circulatingToSupplyRatio).toBeGreaterThan(3); // common practice: "several (around five) times"
    expect(op.circulatingToSupplyRatio).toBeLessThan(7); // common practice
  });

  it("derives the ratio √2·Q/π exactly and the tank peak π·Vdc", () => {
    const op = currentFedParallelInverter({ supplyVoltage: 30, inductance: 2e-6, capacitance: 3e-6, coilResistance: 0.03 });
    expect(op.circulatingToSupplyRatio).toBeCloseTo((Math.SQRT2 * op.qualityFactor) / Math.PI, 12);
    expect(op.tankVoltagePeak).toBeCloseTo(Math.PI * 30, 12);
    expect(op.switchVoltagePeak).toBe(op.tankVoltagePeak);
    const tank = parallelTank({ inductance: 2e-6, capacitance: 3e-6, coilResistance: 0.03 });
    expect(op.frequency).toBeCloseTo(tank.zeroPhaseFrequency as number, 6);
    expect(op.dynamicResistance).toBeCloseTo(tank.dynamicResistance, 9);
  });

  it("cautions above extra-low voltage (IEC 61140: 50 V a.c. RMS) and not below", () => {
    const low = currentFedParallelInverter({ supplyVoltage: 12, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
    expect(low.cautions).toHaveLength(0); // 12·π/√2 = 26.7 V RMS < 50 V (IEC 61140 ELV band)
    const high = currentFedParallelInverter({ supplyVoltage: 24, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
    const c = high.cautions[0];
    expect(c?.code).toBe("voltage-above-extra-low");
    expect(c?.limit).toBe(50); // IEC 61140:2016 / IEC 60449 band I
    expect(c?.value).toBeCloseTo((24 * Math.PI) / Math.SQRT2, 9);
    expect(c?.message.endsWith("Consult local codes and licensed practice.")).toBe(true);
  });

  it("adds validity notes for low Q and large choke ripple", () => {
    const op = currentFedParallelInverter({ supplyVoltage: 12, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.3, chokeInductance: 1e-7 });
    const codes = op.validity.map((v) => v.code);
    expect(codes).toContain("low-tank-q");
    expect(codes).toContain("large-choke-ripple");
  });

  it("throws InputError without a zero-phase resonance or with bad inputs", () => {
    const ok = { supplyVoltage: 12, inductance: 1e-6, capacitance: 1e-6, coilResistance: 0.1 };
    expect(() => currentFedParallelInverter({ ...ok, coilResistance: 1 })).toThrow(/zero-phase/); // R = √(L/C)
    expect(() => currentFedParallelInverter({ ...ok, coilResistance: 0 })).toThrow(InputError);
    expect(() => currentFedParallelInverter({ ...ok, supplyVoltage: -12 })).toThrow(InputError);
    expect(() => currentFedParallelInverter({ ...ok, chokeInductance: 0 })).toThrow(InputError);
    expect(() => currentFedParallelInverter({ ...ok, inductance: Infinity })).toThrow(InputError);
  });
});
