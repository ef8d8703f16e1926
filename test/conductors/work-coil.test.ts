import { describe, it, expect } from "vitest";
import { workCoilImpedance, workCoilResistanceCurrentSheet, skinDepth, InputError } from "../../src/index.js";

describe("workCoilResistanceCurrentSheet", () => {
  const o = { innerDiameter: 0.06, coilLength: 0.08, turns: 8, spaceFactor: 0.75, frequency: 20e3, resistivity: 1.86e-8 };
  it("is the current-sheet formula ρ·πD·N²/(k_s·ℓ·δ)", () => {
    // Davies & Simpson 1979, ch. 3 (from memory)
    const delta = skinDepth({ resistivity: o.resistivity, frequency: o.frequency });
    const expected = (o.resistivity * Math.PI * o.innerDiameter * 64) / (0.75 * 0.08 * delta);
    expect(Math.abs(workCoilResistanceCurrentSheet(o) / expected - 1)).toBeLessThan(1e-14);
  });
  it("grows as N² and as √f", () => {
    const r = workCoilResistanceCurrentSheet(o);
    expect(workCoilResistanceCurrentSheet({ ...o, turns: 16 }) / r).toBeCloseTo(4, 12);
    expect(workCoilResistanceCurrentSheet({ ...o, frequency: 80e3 }) / r).toBeCloseTo(2, 12);
  });
  it("throws InputError on bad input", () => {
    expect(() => workCoilResistanceCurrentSheet({ ...o, spaceFactor: 0 })).toThrow(/spaceFactor/);
    expect(() => workCoilResistanceCurrentSheet({ ...o, spaceFactor: 1.2 })).toThrow(InputError);
    expect(() => workCoilResistanceCurrentSheet({ ...o, turns: 0 })).toThrow(/turns/);
    expect(() => workCoilResistanceCurrentSheet({ ...o, coilLength: -1 })).toThrow(/coilLength/);
  });
});

describe("workCoilResistanceCurrentSheet against the cell model of the turns (workCoilImpedance)", () => {
  // the measured statement of the TSDoc: 14–67 % high on the four solenoids of the issue-14
  // scenarios (A–D), empty and with the part; the better method is the library's cell model
  const copper = 1.75e-8;
  const tube = (od: number, wall: number) => ({ kind: "tube" as const, outerDiameter: od, wallThickness: wall });
  const cases = [
    { coil: { shape: "solenoid", radius: 0.02, length: 0.032, turns: 4, conductor: tube(0.006, 0.001), resistivity: copper }, part: { shape: "bar", radius: 0.008, length: 0.4, resistivity: 2e-7, relativePermeability: 50 }, frequencies: [10e3, 50e3], range: [0.27, 0.67] },
    { coil: { shape: "solenoid", radius: 0.012, length: 0.1, turns: 20, conductor: tube(0.004, 0.0008), resistivity: copper }, part: { shape: "bar", radius: 0.006, length: 0.6, resistivity: 1.5e-7, relativePermeability: 100 }, frequencies: [20e3], range: [0.13, 0.18] },
    { coil: { shape: "solenoid", radius: 0.03, length: 0.064, turns: 8, conductor: tube(0.006, 0.001), resistivity: copper }, part: { shape: "bar", radius: 0.018, length: 0.5, resistivity: 4e-8, relativePermeability: 1 }, frequencies: [5e3, 20e3], range: [0.25, 0.67] },
    { coil: { shape: "solenoid", radius: 0.02, length: 0.05, turns: 10, conductor: { kind: "round" as const, diameter: 0.003 }, resistivity: copper }, part: { shape: "tube", radius: 0.012, innerRadius: 0.01, length: 0.4, resistivity: 7.2e-7, relativePermeability: 1 }, frequencies: [50e3, 200e3], range: [0.27, 0.68] },
  ] as const;
  it("reads 14–67 % high, empty and loaded (range per coil asserted)", () => {
    for (const c of cases) {
      const od = c.coil.conductor.kind === "tube" ? c.coil.conductor.outerDiameter : c.coil.conductor.diameter;
      for (const frequency of c.frequencies) {
        const sheet = workCoilResistanceCurrentSheet({
          innerDiameter: 2 * (c.coil.radius - od / 2),
          coilLength: c.coil.length,
          turns: c.coil.turns,
          spaceFactor: (c.coil.turns * od) / c.coil.length,
          frequency,
          resistivity: copper,
        });
        // a coarser mesh than the default (refinement 0.67: surface cells δ/3) is ample for a 14–67 % effect
        const model = workCoilImpedance({ coil: c.coil, frequency, part: c.part, refinement: 0.67 });
        for (const reference of [model.emptyResistance, model.copperResistance]) {
          const excess = sheet / reference - 1;
          expect(excess).toBeGreaterThan(c.range[0]);
          expect(excess).toBeLessThan(c.range[1]);
        }
      }
    }
  });
});
