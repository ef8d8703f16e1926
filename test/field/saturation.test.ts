import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { InputError, solveAxisymmetricField } from "../../src/index.js";
import type { AxisymmetricFieldCoil, FieldCurvePoint, FieldRegion } from "../../src/index.js";

// Outside references:
// - test/fixtures/field-saturation/halfspace.json: a saturating half-space under a sinusoidal
//   surface field solved in the time domain with the static curve (scipy BDF, halfspace.py):
//   the error of the idealisation itself; and, for a step curve, the closed form of MacLean
//   (1954) / Agarwal (1959), Z = (8/3π)·sqrt(2ρωB_s/Ĥ0)·(1 + j/2), written out in the test.

interface HalfspacePoint {
  material: "steel" | "step";
  surfaceFieldPeak: number;
  timeDomain: [number, number];
  effective: [number, number];
  timeDomainGridChange: number;
}
interface HalfspaceFixture {
  resistivity: number;
  frequency: number;
  curve: FieldCurvePoint[];
  stepCurve: FieldCurvePoint[];
  points: HalfspacePoint[];
}

const dir = new URL("../fixtures/field-saturation/", import.meta.url);
const halfspace = JSON.parse(readFileSync(new URL("halfspace.json", dir), "utf8")) as HalfspaceFixture;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);
const MU0 = 4e-7 * Math.PI;

/**
 * Stated error of the effective-permeability method against the time-domain half-space
 * (halfspace.json): R low by up to 10 %, X high by up to 30 % (measured: the billet steel at
 * 100 kA/m −4.6 % and +15 %; the step-curve limit −7.9 % and +27 % in 1-D, −9.8 % and +28 %
 * for the solver's 20 mm bar, measured once at accuracy 2e-2: a 158 000-node solve, too slow
 * for the suite).
 */
const METHOD_ERROR_R = 0.1;
const METHOD_ERROR_X = 0.3;
/** Our 2-D solution of a bar's surface against the 1-D effective-permeability half-space (same method): curvature of a 20 mm bar plus accuracy 2e-2. */
const SAME_METHOD_TOLERANCE = 0.02;

/**
 * Surface impedance [Ω] of a 20 mm steel bar in a long stranded coil at 10 kHz, read at the
 * mid-plane from two open pick-up turns in the gap (flux difference: the gap field H0; flux of
 * the bar: E = jωΦ/2πa), scaled to the target peak surface field with the exponent −1/2 of the
 * step limit (the field reached is within 3 % of the target).
 */
function barSurfaceImpedance(curve: readonly FieldCurvePoint[], h0Peak: number): { re: number; im: number; h0: number } {
  const mm = 1e-3;
  const a = 20 * mm;
  const r1 = 20.5 * mm;
  const r2 = 21.5 * mm;
  const length = 0.1;
  const count = 50;
  // nI of the winding, raised by the 3.4 % the finite coil's mid-plane field falls short of it
  const current = (1.034 * h0Peak) / Math.SQRT2 / (count / length);
  const pick = (r: number, name: string): AxisymmetricFieldCoil => ({
    name,
    current: 0,
    resistivity: 1.75e-8,
    model: "stranded",
    turns: { shape: { kind: "rectangle", rMin: r - 0.05 * mm, rMax: r + 0.05 * mm, zMin: -0.05 * mm, zMax: 0.05 * mm }, count: 1 },
  });
  const res = solveAxisymmetricField({
    frequency: halfspace.frequency,
    accuracy: 2e-2,
    coils: [
      { name: "coil", current, resistivity: 1.75e-8, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 22 * mm, rMax: 23 * mm, zMin: -length / 2, zMax: length / 2 }, count } },
      pick(r1, "p1"),
      pick(r2, "p2"),
    ],
    regions: [{ name: "bar", shape: { kind: "rectangle", rMin: 0, rMax: a, zMin: -0.07, zMax: 0.07 }, resistivity: halfspace.resistivity, magnetisation: { curve } }],
  });
  expect(res.saturation?.converged).toBe(true);
  const w = 2 * Math.PI * halfspace.frequency;
  const v1 = res.coils.p1!.voltage;
  const v2 = res.coils.p2!.voltage;
  // flux Φ = V/(jω)
  const f1 = { re: v1.im / w, im: -v1.re / w };
  const f2 = { re: v2.im / w, im: -v2.re / w };
  const k = MU0 * Math.PI * (r2 * r2 - r1 * r1);
  const H = { re: (f2.re - f1.re) / k, im: (f2.im - f1.im) / k };
  const g = MU0 * Math.PI * (r1 * r1 - a * a);
  const fb = { re: f1.re - g * H.re, im: f1.im - g * H.im };
  const E = { re: (-w * fb.im) / (2 * Math.PI * a), im: (w * fb.re) / (2 * Math.PI * a) };
  const d = H.re * H.re + H.im * H.im;
  const h0 = Math.SQRT2 * Math.sqrt(d);
  expect(rel(h0, h0Peak)).toBeLessThan(0.03);
  const scale = Math.sqrt(h0 / h0Peak);
  return { re: ((E.re * H.re + E.im * H.im) / d) * scale, im: ((E.im * H.re - E.re * H.im) / d) * scale, h0 };
}

describe("solveAxisymmetricField with saturating steel", () => {
  const steel = halfspace.points.find((p) => p.material === "steel" && p.surfaceFieldPeak === 1e5)!;
  it("a saturated bar surface (Ĥ0 = 100 kA/m): the stated method error covers the time-domain half-space, and the 1-D effective solution agrees closely", () => {
    const z = barSurfaceImpedance(halfspace.curve, steel.surfaceFieldPeak);
    // time-domain nonlinear diffusion with the static curve (scipy, halfspace.py): the method's error
    expect(rel(z.re, steel.timeDomain[0])).toBeLessThan(METHOD_ERROR_R);
    expect(rel(z.im, steel.timeDomain[1])).toBeLessThan(METHOD_ERROR_X);
    // the same effective-permeability idealisation in 1-D (scipy, halfspace.py)
    expect(rel(z.re, steel.effective[0])).toBeLessThan(SAME_METHOD_TOLERANCE);
    expect(rel(z.im, steel.effective[1])).toBeLessThan(SAME_METHOD_TOLERANCE);
  }, 600_000);

  it("the stated method error covers every time-domain half-space point of the fixture (halfspace.json)", () => {
    for (const p of halfspace.points) {
      expect(rel(p.effective[0], p.timeDomain[0])).toBeLessThan(METHOD_ERROR_R);
      expect(rel(p.effective[1], p.timeDomain[1])).toBeLessThan(METHOD_ERROR_X);
      expect(p.timeDomainGridChange).toBeLessThan(5e-3);
    }
  });

  it("step B–H curve: the time-domain half-space reproduces MacLean (1954) / Agarwal (1959); the method's error there is within the stated bound", () => {
    const p = halfspace.points.find((q) => q.material === "step")!;
    const bs = halfspace.stepCurve[0]!.fluxDensity;
    const w = 2 * Math.PI * halfspace.frequency;
    // MacLean 1954 / Agarwal 1959: Z = (8/3π) sqrt(2ρωB_s/Ĥ0) (1 + j/2)
    const r = (8 / (3 * Math.PI)) * Math.sqrt((2 * halfspace.resistivity * w * bs) / p.surfaceFieldPeak);
    // the fixture's curve has slope μ0 beyond B_s, which the closed form leaves out (μ0Ĥ0/B_s = 8 %)
    expect(rel(p.timeDomain[0], r)).toBeLessThan(0.05);
    expect(rel(p.timeDomain[1], r / 2)).toBeLessThan(0.05);
    // the effective-permeability method in this limit (1-D, same fixture) within its stated error
    expect(rel(p.effective[0], p.timeDomain[0])).toBeLessThan(METHOD_ERROR_R);
    expect(rel(p.effective[1], p.timeDomain[1])).toBeLessThan(METHOD_ERROR_X);
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
    expect(strong.saturation.converged).toBe(true);
    expect(strong.saturation.iterations).toBeGreaterThan(1);
    expect(strong.saturation.residual).toBeLessThan(1e-3);
    expect(strong.estimatedError).toBeGreaterThanOrEqual(strong.saturation.residual);
    // saturation lowers the inductance toward the air-core value
    expect(strong.coils.coil!.inductance).toBeLessThan(weak.coils.coil!.inductance);
    // power balance holds for the converged (linearised) problem
    const all = strong.coils.coil!.losses + strong.regions.pin!.losses;
    expect(Math.abs(strong.coils.coil!.voltage.re * 300 - all)).toBeLessThan(1e-9 * all);
  }, 600_000);

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
    expect(call(region({ curve: "steel" }))).toThrow(InputError);
    expect(call(region({ curve: [{ fieldStrength: 100, fluxDensity: 1 }, { fieldStrength: 200, fluxDensity: 1.2 }], other: 1 }))).toThrow(InputError);
  });
});
