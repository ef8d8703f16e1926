import { describe, expect, it } from "vitest";
import { componentTemperatureRise, InputError, naturalConvectionCoefficient, STEFAN_BOLTZMANN } from "../../src/index.js";

// Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Example 9.2 (values from memory):
// a vertical glass screen 0.71 m high, 1.02 m wide, at 232 °C in a room at 23 °C; air at the film
// temperature 400 K: ν = 26.41e-6 m²/s, k = 0.0338 W/(m·K), α = 38.3e-6 m²/s, Pr = 0.690.
// Results: Ra_L = 1.813e9, Nu_L = 147, h = 7.0 W/(m²·K), q = 1060 W.
const AIR_400K = { kinematicViscosity: 26.41e-6, thermalConductivity: 0.0338, thermalDiffusivity: 38.3e-6 };

describe("naturalConvectionCoefficient", () => {
  it("reproduces Incropera Example 9.2 (from memory) within 0.2 %", () => {
    const c = naturalConvectionCoefficient({ height: 0.71, surfaceTemperature: 505.15, ambientTemperature: 296.15, air: AIR_400K });
    expect(Math.abs(c.rayleighNumber / 1.813e9 - 1)).toBeLessThan(2e-3);
    expect(Math.abs(c.nusseltNumber / 147 - 1)).toBeLessThan(2e-3);
    expect(Math.abs(c.coefficient / 7.0 - 1)).toBeLessThan(2e-3);
    const q = c.coefficient * 1.02 * 0.71 * (232 - 23);
    expect(Math.abs(q / 1060 - 1)).toBeLessThan(5e-3);
  });

  it("with its own air table agrees with the same example within 0.2 % (Table A.4 values from memory)", () => {
    const c = naturalConvectionCoefficient({ height: 0.71, surfaceTemperature: 505.15, ambientTemperature: 296.15 });
    expect(Math.abs(c.coefficient / 7.0 - 1)).toBeLessThan(2e-3);
    expect(c.validity).toHaveLength(0);
  });

  it("notes a film temperature outside the air table", () => {
    const c = naturalConvectionCoefficient({ height: 0.05, surfaceTemperature: 900, ambientTemperature: 400 });
    expect(c.validity.map((v) => v.code)).toContain("air-table-range");
  });
});

describe("componentTemperatureRise", () => {
  it("balances the loss: convection plus radiation equals the power (energy conservation)", () => {
    const t = componentTemperatureRise({ power: 3, ambientTemperature: 313.15, surfaceArea: 0.008, height: 0.04, emissivity: 0.85 });
    const ts = t.surfaceTemperature;
    const radiated = 0.85 * STEFAN_BOLTZMANN * 0.008 * (ts ** 4 - 313.15 ** 4);
    expect(Math.abs((t.radiatedPower ?? NaN) / radiated - 1)).toBeLessThan(1e-8);
    const h = naturalConvectionCoefficient({ height: 0.04, surfaceTemperature: ts, ambientTemperature: 313.15 }).coefficient;
    expect(Math.abs(h * 0.008 * t.temperatureRise + radiated - 3)).toBeLessThan(1e-8);
  });

  it("with a thermal resistance is P·Rθ exactly", () => {
    const t = componentTemperatureRise({ power: 4, ambientTemperature: 300, thermalResistance: 12.5 });
    expect(t.temperatureRise).toBe(50);
    expect(t.cautions.map((c) => c.code)).toContain("hot-surface-burn");
  });

  it("is zero with no loss", () => {
    expect(componentTemperatureRise({ power: 0, ambientTemperature: 300, surfaceArea: 0.01, height: 0.05 }).temperatureRise).toBe(0);
  });

  it("rejects incomplete or contradictory options", () => {
    expect(() => componentTemperatureRise({ power: 1, ambientTemperature: 300 })).toThrow(InputError);
    expect(() => componentTemperatureRise({ power: 1, ambientTemperature: 300, surfaceArea: 0.01 })).toThrow(/height/);
    expect(() => componentTemperatureRise({ power: 1, ambientTemperature: 300, surfaceArea: 0.01, height: 0.02, thermalResistance: 3 })).toThrow(InputError);
    expect(() => componentTemperatureRise({ power: -1, ambientTemperature: 300, thermalResistance: 3 })).toThrow(InputError);
  });
});
