import { describe, expect, it } from "vitest";
import {
  aluminiumAlloy,
  barInLongCoil,
  celsius,
  coilOverPlate,
  InputError,
  lowCarbonSteel,
  relativePermeabilityAt,
  resistivityAt,
  workpieceCouplingAtTemperature,
} from "../../src/index.js";

const coil = { innerRadius: 0.03, length: 0.3, turns: 20 };
const plateCoil = { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 };

describe("workpieceCouplingAtTemperature", () => {
  it("reads resistivity and permeability from the materials module and delegates to barInLongCoil", () => {
    const t = celsius(300);
    const r = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: t, part: { kind: "bar", radius: 0.02, coil }, frequency: 1e4, coilResistance: 0.01 });
    const rho = resistivityAt(lowCarbonSteel, t);
    const mur = relativePermeabilityAt(lowCarbonSteel, { temperature: t });
    expect(r.resistivity).toBe(rho);
    expect(r.relativePermeability).toBe(mur);
    const direct = barInLongCoil({ coil, bar: { radius: 0.02, resistivity: rho, relativePermeability: mur }, frequency: 1e4, coilResistance: 0.01 });
    expect(r.reflectedResistance).toBe(direct.reflectedResistance);
    expect(r.efficiency).toBe(direct.efficiency);
  });

  it("prints the documented example: above Curie steel is non-magnetic and the inductance drops (common practice)", () => {
    const cold = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(20), part: { kind: "bar", radius: 0.02, coil }, frequency: 1e4 });
    const hot = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(900), part: { kind: "bar", radius: 0.02, coil }, frequency: 1e4 });
    expect(hot.relativePermeability).toBe(1);
    expect(cold.inductanceChange > hot.inductanceChange).toBe(true);
  });

  it("passes the field strength to the permeability model (saturation lowers mu_r)", () => {
    const lo = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(20), part: { kind: "bar", radius: 0.02, coil }, frequency: 1e4 });
    const hi = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(20), part: { kind: "bar", radius: 0.02, coil }, frequency: 1e4, fieldStrengthPeak: 1e5 });
    expect(hi.relativePermeability).toBeLessThan(lo.relativePermeability);
  });

  it("handles tubes and plates", () => {
    const tube = workpieceCouplingAtTemperature({ material: aluminiumAlloy, temperature: celsius(100), part: { kind: "tube", outerRadius: 0.02, innerRadius: 0.015, coil }, frequency: 1e4 });
    expect(tube.reflectedResistance).toBeGreaterThan(0);
    const t = celsius(200);
    const plate = workpieceCouplingAtTemperature({ material: aluminiumAlloy, temperature: t, part: { kind: "plate", thickness: 0.003, coil: plateCoil }, frequency: 2e4 });
    const direct = coilOverPlate({ coil: plateCoil, plate: { thickness: 0.003, resistivity: resistivityAt(aluminiumAlloy, t), relativePermeability: 1 }, frequency: 2e4 });
    expect(plate.reflectedResistance).toBe(direct.reflectedResistance);
  });

  it("throws InputError for bad input", () => {
    const ok = { material: lowCarbonSteel, temperature: 300, part: { kind: "bar" as const, radius: 0.02, coil }, frequency: 1e4 };
    expect(() => workpieceCouplingAtTemperature({ ...ok, temperature: -1 })).toThrow(InputError);
    expect(() => workpieceCouplingAtTemperature({ ...ok, part: { kind: "cone", coil } as never })).toThrow(InputError);
    expect(() => workpieceCouplingAtTemperature({ ...ok, part: { ...ok.part, radius: 0.05 } })).toThrow(InputError);
    expect(() => workpieceCouplingAtTemperature({ ...ok, frequency: 0 })).toThrow(InputError);
    expect(() => workpieceCouplingAtTemperature({ ...ok, fieldStrengthPeak: -5 })).toThrow(InputError);
    expect(() => workpieceCouplingAtTemperature({ ...ok, material: null as never })).toThrow(InputError);
  });
});
