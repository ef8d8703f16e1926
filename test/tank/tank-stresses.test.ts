import { describe, expect, it } from "vitest";
import { InputError, parallelTank, seriesTank, tankImpedance, tankStresses } from "../../src/index.js";

describe("tankStresses", () => {
  it("gives Q·V across the capacitor of a series tank at resonance (Alexander & Sadiku 5th ed., §14.5)", () => {
    const tank = seriesTank({ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 });
    const s = tankStresses(tank, { frequency: tank.undampedFrequency, voltageRms: 10 });
    expect(s.capacitorVoltageRms).toBeCloseTo(tank.qualityFactor * 10, 9); // A&S §14.5: VC = Q·Vs at ω0
    expect(s.coilCurrentRms).toBeCloseTo(20, 12);
    expect(s.power).toBeCloseTo(200, 9);
    expect(s.capacitorReactivePower).toBeCloseTo(200 * 20, 6);
    // At resonance the stored energy is constant: ½ L Î² = ½ C V̂C².
    expect(s.storedEnergyPeak).toBeCloseTo(0.5 * 100e-6 * s.coilCurrentPeak ** 2, 12);
    expect(s.storedEnergyPeak).toBeCloseTo(0.5 * 1e-6 * s.capacitorVoltagePeak ** 2, 12);
  });

  it("agrees with tankImpedance for the line current and phase of a parallel tank", () => {
    const tank = parallelTank({ inductance: 10e-6, capacitance: 1e-6, coilResistance: 0.2, parallelResistance: 300 });
    for (const f of [20e3, 50e3, 80e3]) {
      const s = tankStresses(tank, { frequency: f, voltageRms: 100 });
      const z = tankImpedance(tank, f);
      expect(s.driveCurrentRms).toBeCloseTo(100 / Math.hypot(z.re, z.im), 9);
      expect(s.phase).toBeCloseTo(Math.atan2(z.im, z.re), 12);
      expect(s.power / ((100 * 100 * z.re) / (z.re * z.re + z.im * z.im))).toBeCloseTo(1, 12);
      const back = tankStresses(tank, { frequency: f, currentRms: s.driveCurrentRms });
      expect(back.driveVoltageRms).toBeCloseTo(100, 9);
    }
  });

  it("finds the stored-energy maximum over a cycle by direct sampling", () => {
    const tank = parallelTank({ inductance: 10e-6, capacitance: 1e-6, coilResistance: 0.5 });
    const f = 40e3;
    const s = tankStresses(tank, { frequency: f, voltageRms: 50 });
    // Sample ½ L iL² + ½ C v² over a cycle with the phasors written out here.
    const w = 2 * Math.PI * f;
    const vp = 50 * Math.SQRT2;
    const zl = Math.hypot(0.5, w * 10e-6);
    const lag = Math.atan2(w * 10e-6, 0.5);
    let max = 0;
    for (let k = 0; k < 20000; k++) {
      const th = (2 * Math.PI * k) / 20000;
      const v = vp * Math.cos(th);
      const il = (vp / zl) * Math.cos(th - lag);
      max = Math.max(max, 0.5 * 10e-6 * il * il + 0.5 * 1e-6 * v * v);
    }
    expect(s.storedEnergyPeak / max).toBeCloseTo(1, 6);
  });

  it("throws InputError for a bad tank or drive", () => {
    const tank = seriesTank({ inductance: 1e-3, capacitance: 1e-6, resistance: 1 });
    expect(() => tankStresses(tank, { frequency: 1e3 })).toThrow(/exactly one/);
    expect(() => tankStresses(tank, { frequency: 1e3, voltageRms: 1, currentRms: 1 })).toThrow(InputError);
    expect(() => tankStresses(tank, { frequency: 0, voltageRms: 1 })).toThrow(InputError);
    expect(() => tankStresses(tank, { frequency: 1e3, voltageRms: -1 })).toThrow(InputError);
    expect(() => tankStresses({ kind: "other" } as never, { frequency: 1e3, voltageRms: 1 })).toThrow(InputError);
    expect(() => tankStresses(null as never, { frequency: 1e3, voltageRms: 1 })).toThrow(InputError);
  });
});
