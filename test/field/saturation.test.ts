import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { InputError, solveAxisymmetricField } from "../../src/index.js";
import type { AxisymmetricFieldCoil, FieldCurvePoint, FieldRegion } from "../../src/index.js";

// Outside references:
// - test/fixtures/field-saturation/saturation.json: an independent gmsh + scikit-fem solution
//   (generate.py) of a steel billet in a four-turn tube solenoid with the same first-harmonic
//   effective-permeability idealisation, its own two-mesh uncertainty stored beside each case;
// - test/fixtures/field-saturation/halfspace.json: the error of that idealisation itself, a
//   saturating half-space solved in the time domain with the static curve (scipy BDF) against
//   the effective-permeability solution (halfspace.py).

interface SaturationFixture {
  curve: FieldCurvePoint[];
  cases: {
    id: string;
    frequency: number;
    coils: AxisymmetricFieldCoil[];
    regions: FieldRegion[];
    results: { resistance: number; inductance: number; coilLosses: number; barLosses: number };
    uncertainty: number;
  }[];
}
interface HalfspaceFixture {
  points: { surfaceFieldPeak: number; resistanceRatio: number; reactanceRatio: number }[];
}

const dir = new URL("../fixtures/field-saturation/", import.meta.url);
const fixture = JSON.parse(readFileSync(new URL("saturation.json", dir), "utf8")) as SaturationFixture;
const halfspace = JSON.parse(readFileSync(new URL("halfspace.json", dir), "utf8")) as HalfspaceFixture;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

/** Tolerance against the scikit-fem solution: the solver's accuracy plus the fixture's own uncertainty. */
const TOLERANCE = 0.02;
/** Stated error of the effective-permeability idealisation (resistance and reactance, vs time domain). */
const METHOD_ERROR_R = 0.1;
const METHOD_ERROR_X = 0.25;

describe("solveAxisymmetricField with saturating steel", () => {
  for (const c of fixture.cases) {
    it(`${c.id}: R, L, coil and billet losses within ${TOLERANCE * 100} % of the scikit-fem solution`, () => {
      const res = solveAxisymmetricField({ frequency: c.frequency, coils: c.coils, regions: c.regions, accuracy: 1e-2 });
      const coil = res.coils.coil!;
      expect(res.saturation?.method).toBe("first-harmonic effective permeability");
      expect(res.validity.map((v) => v.code)).not.toContain("saturation-not-converged");
      expect(rel(coil.resistance, c.results.resistance)).toBeLessThan(TOLERANCE);
      expect(rel(coil.inductance, c.results.inductance)).toBeLessThan(TOLERANCE);
      expect(rel(coil.losses, c.results.coilLosses)).toBeLessThan(TOLERANCE);
      expect(rel(res.regions.bar!.losses, c.results.barLosses)).toBeLessThan(TOLERANCE);
      expect(c.uncertainty).toBeLessThan(TOLERANCE / 2);
    }, 300_000);
  }

  it("the stated error of the effective-permeability method covers the time-domain half-space (halfspace.json)", () => {
    for (const p of halfspace.points) {
      expect(Math.abs(p.resistanceRatio - 1)).toBeLessThan(METHOD_ERROR_R);
      expect(Math.abs(p.reactanceRatio - 1)).toBeLessThan(METHOD_ERROR_X);
    }
  });

  it("converges: a weak current gives the linear solution at the initial permeability; a strong one saturates", () => {
    const curve: FieldCurvePoint[] = [
      { fieldStrength: 400, fluxDensity: 0.5 },
      { fieldStrength: 4000, fluxDensity: 1.5 },
      { fieldStrength: 40000, fluxDensity: 1.9 },
    ];
    const muInitial = 0.5 / (4e-7 * Math.PI * 400);
    const coils = (current: number): AxisymmetricFieldCoil[] => [
      { name: "coil", current, resistivity: 1.75e-8, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 0.012, rMax: 0.014, zMin: -0.006, zMax: 0.006 }, count: 6 } },
    ];
    const pin = (m: Partial<FieldRegion>): FieldRegion => ({ name: "pin", shape: { kind: "rectangle", rMin: 0, rMax: 0.006, zMin: -0.015, zMax: 0.015 }, resistivity: 2e-7, ...m });
    const weak = solveAxisymmetricField({ frequency: 5e3, accuracy: 1e-2, coils: coils(0.01), regions: [pin({ magnetisation: { curve } })] });
    const linear = solveAxisymmetricField({ frequency: 5e3, accuracy: 1e-2, coils: coils(0.01), regions: [pin({ relativePermeability: muInitial })] });
    // a field far below the first point: the same linear problem (both within their estimates)
    expect(rel(weak.coils.coil!.resistance, linear.coils.coil!.resistance)).toBeLessThan(2e-2);
    expect(rel(weak.coils.coil!.inductance, linear.coils.coil!.inductance)).toBeLessThan(2e-2);
    const strong = solveAxisymmetricField({ frequency: 5e3, accuracy: 1e-2, coils: coils(300), regions: [pin({ magnetisation: { curve } })] });
    expect(strong.validity.map((v) => v.code)).not.toContain("saturation-not-converged");
    expect(strong.saturation!.iterations).toBeGreaterThan(1);
    // saturation lowers the inductance toward the air-core value
    expect(strong.coils.coil!.inductance).toBeLessThan(weak.coils.coil!.inductance);
    // power balance holds for the converged (linearised) problem
    const all = strong.coils.coil!.losses + strong.regions.pin!.losses;
    expect(Math.abs(strong.coils.coil!.voltage.re * 300 - all)).toBeLessThan(1e-9 * all);
  }, 300_000);

  it("throws InputError for a bad curve and for a curve given with relativePermeability", () => {
    const base = {
      frequency: 1e4,
      coils: [{ name: "c", current: 1, resistivity: 1.75e-8, model: "stranded" as const, turns: { shape: { kind: "rectangle" as const, rMin: 0.01, rMax: 0.012, zMin: 0, zMax: 0.002 }, count: 1 } }],
    };
    const region = (magnetisation: unknown, extra: object = {}) => ({
      ...base,
      regions: [{ name: "p", shape: { kind: "rectangle" as const, rMin: 0, rMax: 0.005, zMin: -0.01, zMax: 0 }, resistivity: 2e-7, magnetisation, ...extra }],
    });
    const call = (o: unknown) => () => solveAxisymmetricField(o as never);
    expect(call(region({ curve: [{ fieldStrength: 100, fluxDensity: 1 }] }))).toThrow(InputError);
    expect(call(region({ curve: [{ fieldStrength: 100, fluxDensity: 1 }, { fieldStrength: 50, fluxDensity: 1.2 }] }))).toThrow(InputError);
    expect(call(region({ curve: [{ fieldStrength: 100, fluxDensity: 1 }, { fieldStrength: 200, fluxDensity: 0.9 }] }))).toThrow(InputError);
    expect(call(region({ curve: [{ fieldStrength: 100, fluxDensity: 1 }, { fieldStrength: 200, fluxDensity: 1.2, extra: 1 }] }))).toThrow(InputError);
    expect(call(region({ curve: [{ fieldStrength: 100, fluxDensity: 1 }, { fieldStrength: 200, fluxDensity: 1.2 }] }, { relativePermeability: 10 }))).toThrow(InputError);
    expect(call(region({ curve: [{ fieldStrength: 1e-6, fluxDensity: 2 }, { fieldStrength: 200, fluxDensity: 2.1 }] }))).toThrow(InputError);
  });
});
