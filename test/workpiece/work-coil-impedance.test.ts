import { describe, expect, it } from "vitest";
import {
  coilOverPlate,
  encirclingCoilOverRod,
  InputError,
  loopInductance,
  loopMutualInductance,
  prepareWorkCoil,
  tubeAcResistance,
  workCoilImpedance,
} from "../../src/index.js";
import type { WorkCoilSolenoid } from "../../src/index.js";

const copper = 1.75e-8;

describe("workCoilImpedance: limits against outside formulas", () => {
  it("reproduces the exact DC resistance of the rings at low frequency (round, tube, strip: 1e-9)", () => {
    for (const conductor of [
      { kind: "round", diameter: 0.001 },
      { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 },
      { kind: "strip", width: 0.004, thickness: 0.001 },
    ] as const) {
      const r = workCoilImpedance({
        coil: { shape: "solenoid", radius: 0.02, length: 0.03, turns: 3, conductor, resistivity: copper },
        frequency: 1e-3,
      });
      expect(Math.abs(r.resistance / r.dcResistance - 1)).toBeLessThan(1e-9);
    }
    // the ring of round wire, radius R, wire radius a: R_dc = ρ / (R − √(R² − a²)) per turn
    // (∫dA/r over a disc, classical closed form, evaluated here)
    const r = workCoilImpedance({
      coil: { shape: "solenoid", radius: 0.02, length: 0.03, turns: 3, conductor: { kind: "round", diameter: 0.001 }, resistivity: copper },
      frequency: 1e-3,
    });
    expect(r.dcResistance / ((3 * copper) / (0.02 - Math.sqrt(0.02 ** 2 - 0.0005 ** 2))) - 1).toBeLessThan(1e-13);
  });

  it("tends at low frequency to the filament sum of uniform-current turns (Maxwell mutual + Wien self inductance) within 1e-3", () => {
    // Maxwell (1873) art. 701 for the mutual terms, Wien (1894) for each turn's self-inductance
    const radius = 0.02;
    const turns = 5;
    const length = 0.02;
    const d = 0.001;
    const r = workCoilImpedance({
      coil: { shape: "solenoid", radius, length, turns, conductor: { kind: "round", diameter: d }, resistivity: copper },
      frequency: 0.1,
    });
    const z = (i: number): number => -length / 2 + ((i + 0.5) * length) / turns;
    let sum = 0;
    for (let i = 0; i < turns; i++) {
      for (let j = 0; j < turns; j++) {
        sum +=
          i === j
            ? loopInductance({ loopRadius: radius, wireRadius: d / 2 })
            : loopMutualInductance({ radius1: radius, radius2: radius, axialDistance: Math.abs(z(i) - z(j)) });
      }
    }
    expect(Math.abs(r.inductance / sum - 1)).toBeLessThan(1e-3);
  });

  it("gives an isolated ring the exact AC resistance of a straight tube or wire (Schelkunoff 1934, via tubeAcResistance) within 1 %", () => {
    // a ring of radius 0.3 m: curvature corrections ~ (a/R)² < 1e-4
    for (const [frequency, conductor] of [
      [50e3, { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 }],
      [5e3, { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 }],
      [200e3, { kind: "round", diameter: 0.003 }],
    ] as const) {
      const ring = 0.3;
      const r = workCoilImpedance({ coil: { shape: "solenoid", radius: ring, length: 0.01, turns: 1, conductor, resistivity: copper }, frequency });
      const od = conductor.kind === "tube" ? conductor.outerDiameter : conductor.diameter;
      const wall = conductor.kind === "tube" ? conductor.wallThickness : od / 2;
      const exact = tubeAcResistance({ outerDiameter: od, wallThickness: wall, frequency, resistivity: copper }) * 2 * Math.PI * ring;
      expect(Math.abs(r.resistance / exact - 1)).toBeLessThan(0.01);
    }
  });

  it("converges as the mesh is refined: an isolated ring within 0.3 % of the exact resistance at refinement 2", () => {
    const ring = 0.3;
    const frequency = 50e3;
    const r = workCoilImpedance({
      coil: { shape: "solenoid", radius: ring, length: 0.01, turns: 1, conductor: { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 }, resistivity: copper },
      frequency,
      refinement: 2,
    });
    const exact = tubeAcResistance({ outerDiameter: 0.006, wallThickness: 0.001, frequency, resistivity: copper }) * 2 * Math.PI * ring;
    expect(Math.abs(r.resistance / exact - 1)).toBeLessThan(0.003);
  });

  it("agrees with encirclingCoilOverRod (Dodd, Deeds & Luquire 1969) for one thin turn around a bar or tube, within 1e-4", () => {
    const radius = 0.02;
    const d = 0.0003;
    const frequency = 10e3;
    for (const rod of [
      { radius: 0.012, innerRadius: 0, resistivity: 2e-7, relativePermeability: 50 },
      { radius: 0.012, innerRadius: 0, resistivity: 4e-8, relativePermeability: 1 },
      { radius: 0.012, innerRadius: 0.009, resistivity: 7e-7, relativePermeability: 1 },
    ]) {
      const part =
        rod.innerRadius > 0
          ? { shape: "tube" as const, radius: rod.radius, innerRadius: rod.innerRadius, length: 1, resistivity: rod.resistivity, relativePermeability: rod.relativePermeability }
          : { shape: "bar" as const, radius: rod.radius, length: 1, resistivity: rod.resistivity, relativePermeability: rod.relativePermeability };
      const r = workCoilImpedance({
        coil: { shape: "solenoid", radius, length: 0.01, turns: 1, conductor: { kind: "round", diameter: d }, resistivity: copper },
        frequency,
        part,
      });
      const e = encirclingCoilOverRod({ coil: { innerRadius: radius - d / 2, outerRadius: radius + d / 2, length: d, turns: 1 }, rod, frequency });
      expect(r.partModel).toBe("long-rod-kernel");
      expect(Math.abs(r.reflectedResistance / e.reflectedResistance - 1)).toBeLessThan(1e-4);
      expect(Math.abs(r.inductanceChange / e.inductanceChange - 1)).toBeLessThan(1e-4);
    }
  });

  it("agrees with coilOverPlate (Dodd & Deeds 1968) for one thin pancake turn over a plate, within 5e-4", () => {
    const radius = 0.03;
    const d = 0.0003;
    for (const plate of [
      { thickness: 0.003, resistivity: 4e-8, relativePermeability: 1 },
      { thickness: 0.003, resistivity: 2e-7, relativePermeability: 100 },
    ]) {
      const r = workCoilImpedance({
        coil: { shape: "pancake", innerRadius: radius, pitch: 0.01, turns: 1, conductor: { kind: "round", diameter: d }, resistivity: copper },
        frequency: 20e3,
        part: { shape: "plate", radius: 1, gap: 0.004, ...plate },
      });
      const e = coilOverPlate({
        coil: { innerRadius: radius - d / 2, outerRadius: radius + d / 2, liftOff: 0.004, length: d, turns: 1 },
        plate,
        frequency: 20e3,
      });
      expect(r.partModel).toBe("plate-kernel");
      expect(Math.abs(r.reflectedResistance / e.reflectedResistance - 1)).toBeLessThan(5e-4);
      expect(Math.abs(r.inductanceChange / e.inductanceChange - 1)).toBeLessThan(5e-4);
    }
  });
});

describe("workCoilImpedance: contract and behaviour", () => {
  const coil: WorkCoilSolenoid = {
    shape: "solenoid",
    radius: 0.02,
    length: 0.032,
    turns: 4,
    conductor: { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 },
    resistivity: copper,
  };

  it("prints the documented examples", () => {
    const r = workCoilImpedance({
      coil,
      frequency: 10e3,
      part: { shape: "bar", radius: 0.008, length: 0.4, resistivity: 2e-7, relativePermeability: 50 },
    });
    expect(r.reflectedResistance > 0 && r.resistance > r.dcResistance).toBe(true);
    const empty = prepareWorkCoil({ coil, frequency: 50e3 }).impedance(50e3);
    expect(empty.resistance > empty.dcResistance).toBe(true);
  });

  it("returns the four contract fields as differences from the empty coil", () => {
    const r = workCoilImpedance({
      coil,
      frequency: 20e3,
      part: { shape: "bar", radius: 0.01, length: 0.4, resistivity: 4e-8, relativePermeability: 1 },
    });
    expect(r.resistance).toBeCloseTo(r.emptyResistance + r.reflectedResistance, 15);
    expect(r.inductance).toBeCloseTo(r.emptyInductance + r.inductanceChange, 15);
    expect(r.copperResistance + r.partResistance).toBeCloseTo(r.resistance, 15);
    expect(r.turnResistances.length).toBe(4);
    const empty = workCoilImpedance({ coil, frequency: 20e3 });
    expect(empty.resistance).toBe(r.emptyResistance);
    expect(empty.reflectedResistance).toBe(0);
    expect(empty.inductanceChange).toBe(0);
  });

  it("the prepared coil gives the same numbers as the one-shot call", () => {
    const part = { shape: "bar", radius: 0.008, length: 0.4, resistivity: 2e-7, relativePermeability: 50 } as const;
    const a = workCoilImpedance({ coil, frequency: 30e3, part });
    const b = prepareWorkCoil({ coil, frequency: 30e3 }).impedance(30e3, part);
    expect(b.resistance).toBe(a.resistance);
    expect(b.inductance).toBe(a.inductance);
  });

  it("the mirror-folded solve of a solenoid equals the unfolded one (plate below a solenoid uses the unfolded system)", () => {
    // the empty coil is solved folded; with a plate far below, the loaded system is unfolded
    const r = workCoilImpedance({
      coil,
      frequency: 20e3,
      part: { shape: "plate", radius: 0.5, thickness: 1e-3, gap: 50, resistivity: 1e-7, relativePermeability: 1 },
    });
    expect(Math.abs(r.reflectedResistance / r.emptyResistance)).toBeLessThan(1e-9);
    expect(Math.abs(r.inductanceChange / r.emptyInductance)).toBeLessThan(1e-9);
  });

  it("models a short non-magnetic bar by its own cells and notes a short magnetic one", () => {
    const short = workCoilImpedance({
      coil,
      frequency: 20e3,
      part: { shape: "bar", radius: 0.012, length: 0.02, resistivity: 4e-8, relativePermeability: 1 },
    });
    expect(short.partModel).toBe("part-cells");
    expect(short.reflectedResistance).toBeGreaterThan(0);
    expect(short.inductanceChange).toBeLessThan(0);
    const magnetic = workCoilImpedance({
      coil,
      frequency: 20e3,
      part: { shape: "bar", radius: 0.012, length: 0.02, resistivity: 2e-7, relativePermeability: 30 },
    });
    expect(magnetic.partModel).toBe("long-rod-kernel");
    expect(magnetic.validity.map((v) => v.code)).toContain("short-magnetic-part");
  });

  it("homogenised litz: DC resistance from the copper area, a note, and R ≥ R_dc", () => {
    const r = workCoilImpedance({
      coil: { shape: "solenoid", radius: 0.02, length: 0.02, turns: 4, conductor: { kind: "litz", strands: 100, strandDiameter: 0.0001 }, resistivity: copper },
      frequency: 50e3,
    });
    const area = 100 * Math.PI * 0.00005 ** 2;
    expect(r.dcResistance / ((4 * copper * 2 * Math.PI * 0.02) / area) - 1).toBeLessThan(1e-14);
    expect(r.resistance).toBeGreaterThanOrEqual(r.dcResistance);
    expect(r.validity.map((v) => v.code)).toContain("litz-homogenised");
  });

  it("throws InputError for bad input and unknown keys", () => {
    const bad: unknown[] = [
      { coil, frequency: 0 },
      { coil: { ...coil, lenght: 0.03 }, frequency: 1e3 },
      { coil, frequency: 1e3, extra: 1 },
      { coil: { ...coil, length: 0.02 }, frequency: 1e3 }, // turns touch: pitch 5 mm < 6 mm tube
      { coil: { ...coil, conductor: { kind: "tube", outerDiameter: 0.006, wallThickness: 0.004 } }, frequency: 1e3 },
      { coil: { ...coil, conductor: { kind: "hexagon", size: 1 } }, frequency: 1e3 },
      { coil, frequency: 1e3, part: { shape: "bar", radius: 0.018, length: 0.1, resistivity: 1e-7, relativePermeability: 1 } },
      { coil, frequency: 1e3, part: { shape: "tube", radius: 0.01, innerRadius: 0.01, length: 0.1, resistivity: 1e-7, relativePermeability: 1 } },
      { coil, frequency: 1e3, part: { shape: "bar", radius: 0.01, length: 0.1, resistivity: 1e-7, relativePermeability: 0.5 } },
      { coil, frequency: 1e3, part: { shape: "plate", radius: 0.1, thickness: 0.001, gap: 0, resistivity: 1e-7, relativePermeability: 1 } },
      { coil, frequency: 1e3, refinement: 10 },
    ];
    for (const b of bad) expect(() => workCoilImpedance(b as never)).toThrow(InputError);
    expect(() => prepareWorkCoil({ coil, frequency: 1e3, part: {} } as never)).toThrow(InputError);
  });
});

describe("prepareWorkCoil(...).reduce: the fast path against the full solve", () => {
  it("solenoid with a bar: R, L, ΔL within 2e-4 and ΔR within 1e-3 of the full model between the trained frequencies", () => {
    const prepared = prepareWorkCoil({
      coil: { shape: "solenoid", radius: 0.02, length: 0.032, turns: 4, conductor: { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 }, resistivity: copper },
      frequency: 50e3,
    });
    const part = { shape: "bar", radius: 0.008, length: 0.4, resistivity: 2e-7, relativePermeability: 50 } as const;
    const fast = prepared.reduce({ part, minFrequency: 10e3, maxFrequency: 50e3 });
    expect(fast.basisSize).toBeGreaterThan(0);
    for (const [f, rho, mur] of [
      [10e3, 2e-7, 50],
      [23.9e3, 4e-7, 150],
      [46.5e3, 1e-7, 1],
      [12e3, 1e-6, 300],
      [31e3, 1e-8, 1],
    ] as const) {
      const a = fast.impedance(f, rho, mur);
      const b = prepared.impedance(f, { ...part, resistivity: rho, relativePermeability: mur });
      expect(Math.abs(a.resistance / b.resistance - 1)).toBeLessThan(2e-4);
      expect(Math.abs(a.inductance / b.inductance - 1)).toBeLessThan(2e-4);
      expect(Math.abs(a.inductanceChange / b.inductanceChange - 1)).toBeLessThan(2e-4);
      expect(Math.abs(a.reflectedResistance / b.reflectedResistance - 1)).toBeLessThan(1e-3);
      expect(Math.abs(a.emptyResistance / b.emptyResistance - 1)).toBeLessThan(2e-4);
      expect(a.outsideTrainedRange).toBe(false);
    }
    expect(fast.impedance(100e3, 2e-7, 50).outsideTrainedRange).toBe(true);
    expect(() => fast.impedance(20e3, -1, 50)).toThrow(InputError);
    expect(() => fast.impedance(20e3, 1e-7, 0.5)).toThrow(InputError);
  });

  it("pancake over a plate (small coil): same tolerances", () => {
    const prepared = prepareWorkCoil({
      coil: { shape: "pancake", innerRadius: 0.015, pitch: 0.007, turns: 3, conductor: { kind: "tube", outerDiameter: 0.005, wallThickness: 0.001 }, resistivity: copper },
      frequency: 40e3,
    });
    const part = { shape: "plate", radius: 0.2, thickness: 0.003, gap: 0.004, resistivity: 4e-8, relativePermeability: 1 } as const;
    const fast = prepared.reduce({ part, minFrequency: 20e3, maxFrequency: 40e3 });
    for (const [f, rho, mur] of [
      [27e3, 4e-8, 1],
      [35e3, 2e-7, 100],
    ] as const) {
      const a = fast.impedance(f, rho, mur);
      const b = prepared.impedance(f, { ...part, resistivity: rho, relativePermeability: mur });
      expect(Math.abs(a.resistance / b.resistance - 1)).toBeLessThan(2e-4);
      expect(Math.abs(a.inductance / b.inductance - 1)).toBeLessThan(2e-4);
      expect(Math.abs(a.inductanceChange / b.inductanceChange - 1)).toBeLessThan(2e-4);
      expect(Math.abs(a.reflectedResistance / b.reflectedResistance - 1)).toBeLessThan(1e-3);
    }
  });

  it("falls back to the full solve for a short non-magnetic bar (own cells)", () => {
    const prepared = prepareWorkCoil({
      coil: { shape: "solenoid", radius: 0.02, length: 0.012, turns: 2, conductor: { kind: "round", diameter: 0.002 }, resistivity: copper },
      frequency: 10e3,
    });
    const part = { shape: "bar", radius: 0.012, length: 0.01, resistivity: 4e-8, relativePermeability: 1 } as const;
    const fast = prepared.reduce({ part, minFrequency: 5e3, maxFrequency: 10e3 });
    expect(fast.basisSize).toBe(0);
    expect(fast.impedance(8e3, 4e-8, 1).resistance).toBe(prepared.impedance(8e3, { ...part, resistivity: 4e-8 }).resistance);
  });
});
