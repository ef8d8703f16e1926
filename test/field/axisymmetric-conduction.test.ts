import { describe, expect, it } from "vitest";
import { axisymmetricHeatConduction, InputError, mediumCarbonSteel } from "../../src/index.js";
import type { AxisymmetricHeatConductionResult } from "../../src/index.js";
import cj from "../fixtures/thermal/carslaw-jaeger.json" with { type: "json" };
import fc from "../fixtures/field-conduction/finite-cylinder.json" with { type: "json" };
import { constantMaterial } from "./constant-material.js";

const ambient = 293.15;

/** Radial profile of the last map along axial cell j: cell centres and temperatures. */
function profile(run: AxisymmetricHeatConductionResult, j: number): { r: number[]; t: number[] } {
  const { rEdges, radial, axial } = run.grid;
  const last = run.maps[run.maps.length - 1]!.temperatures;
  const r: number[] = [];
  const t: number[] = [];
  for (let i = 0; i < radial; i++) {
    r.push(0.5 * (rEdges[i]! + rEdges[i + 1]!));
    t.push(last[i * axial + j]!);
  }
  return { r, t };
}

/** Linear interpolation in a profile; on the axis, T = a + b r² through the first two centres. */
function at(p: { r: number[]; t: number[] }, r: number): number {
  if (r <= p.r[0]!) {
    const [r0, r1] = [p.r[0]!, p.r[1]!];
    const b = (p.t[1]! - p.t[0]!) / (r1 * r1 - r0 * r0);
    return p.t[0]! + b * (r * r - r0 * r0);
  }
  for (let i = 1; i < p.r.length; i++) {
    if (r <= p.r[i]!) {
      const f = (r - p.r[i - 1]!) / (p.r[i]! - p.r[i - 1]!);
      return p.t[i - 1]! * (1 - f) + p.t[i]! * f;
    }
  }
  return p.t[p.t.length - 1]!;
}

describe("axisymmetricHeatConduction: long cylinder with uniform generation and a convective surface (Carslaw & Jaeger §7.9 series, fixture test/fixtures/thermal/generate_carslaw_jaeger.py)", () => {
  const cases = cj.cases.filter((c) => c.kind === "generation");
  it.each(cases.map((c) => [c.label, c] as const))("%s: core, mid-radius and surface within 0.5 % of the surface rise", (_label, c) => {
    const run = axisymmetricHeatConduction({
      shape: { kind: "rectangle", rMin: 0, rMax: c.radius, zMin: 0, zMax: 0.05 },
      material: constantMaterial(c.thermalConductivity, c.density, c.specificHeat),
      cells: { radial: 16, axial: 1 },
      surface: { convectionCoefficient: c.convectionCoefficient, emissivity: 0, ambientTemperature: ambient },
      insulatedFaces: ["lower", "upper"],
      powerDensity: c.generation,
      duration: c.time,
    });
    const p = profile(run, 0);
    const scale = c.surface;
    const tol = 0.005 * scale; // the accuracy stated in the TSDoc (measured: 3e-3)
    expect(Math.abs(run.surfaceTemperature.at(-1)! - ambient - c.surface)).toBeLessThan(tol);
    expect(Math.abs(at(p, 0) - ambient - c.core)).toBeLessThan(tol);
    expect(Math.abs(at(p, c.radius / 2) - ambient - c.middle)).toBeLessThan(tol);
    // energy: generated = stored + lost
    expect(Math.abs(run.energy.imbalance)).toBeLessThan(1e-6 * run.energy.input);
  });
});

/** Bilinear interpolation in the fixture's regular (r, |z|) grid. */
function exactRatio(ratio: number[][], r: number, z: number): number {
  const nr = fc.radii.length - 1;
  const nz = fc.heights.length - 1;
  const x = (r / fc.radius) * nr;
  const y = (Math.abs(z) / fc.halfLength) * nz;
  const i = Math.min(nr - 1, Math.floor(x));
  const j = Math.min(nz - 1, Math.floor(y));
  const fx = x - i;
  const fy = y - j;
  return (
    ratio[i]![j]! * (1 - fx) * (1 - fy) + ratio[i + 1]![j]! * fx * (1 - fy) + ratio[i]![j + 1]! * (1 - fx) * fy + ratio[i + 1]![j + 1]! * fx * fy
  );
}

describe("axisymmetricHeatConduction: finite cylinder cooling on every face (Carslaw & Jaeger product solution, fixture test/fixtures/field-conduction/generate_finite_cylinder.py)", () => {
  const initial = 1000;
  const material = constantMaterial(fc.thermalConductivity, fc.density, fc.specificHeat);
  const run = (duration: number, cells = { radial: 16, axial: 16 }, temperatureStep?: number): AxisymmetricHeatConductionResult =>
    axisymmetricHeatConduction({
      shape: { kind: "rectangle", rMin: 0, rMax: fc.radius, zMin: -fc.halfLength, zMax: fc.halfLength },
      material,
      cells,
      surface: { convectionCoefficient: fc.convectionCoefficient, emissivity: 0, ambientTemperature: ambient },
      initialTemperature: initial,
      powerDensity: 0,
      duration,
      ...(temperatureStep === undefined ? {} : { temperatureStep }),
    });
  /** Largest error of any cell against the exact value at its centre, relative to θ0. */
  const cellError = (res: AxisymmetricHeatConductionResult, ratio: number[][]): number => {
    const { rEdges, zEdges, radial, axial } = res.grid;
    const last = res.maps.at(-1)!.temperatures;
    let e = 0;
    for (let i = 0; i < radial; i++) {
      for (let j = 0; j < axial; j++) {
        const r = 0.5 * (rEdges[i]! + rEdges[i + 1]!);
        const z = 0.5 * (zEdges[j]! + zEdges[j + 1]!);
        const exact = ambient + (initial - ambient) * exactRatio(ratio, r, z);
        e = Math.max(e, Math.abs(last[i * axial + j]! - exact) / (initial - ambient));
      }
    }
    return e;
  };
  it.each(fc.cases.map((c) => [c.fourier, c] as const))("Fo = %s: every cell and the mean within 0.5 % of θ0", (_fo, c) => {
    const res = run(c.time);
    expect(cellError(res, c.ratio)).toBeLessThan(0.005); // measured ≤ 3.4e-3
    const meanRatio = (res.meanTemperature.at(-1)! - ambient) / (initial - ambient);
    expect(Math.abs(meanRatio - c.meanRatio)).toBeLessThan(0.005);
    // cooling only: the heat lost equals the enthalpy given up
    expect(Math.abs(res.energy.imbalance)).toBeLessThan(1e-6 * Math.abs(res.energy.lost));
  });
  it("converges: halving the temperature step and refining the cells reduces the error", () => {
    const c = fc.cases[1]!;
    const coarse = cellError(run(c.time, { radial: 8, axial: 8 }, 16), c.ratio);
    const fine = cellError(run(c.time, { radial: 24, axial: 24 }, 2), c.ratio);
    expect(fine).toBeLessThan(coarse / 2);
  });
});

describe("axisymmetricHeatConduction: input checks", () => {
  const good = {
    shape: { kind: "rectangle" as const, rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.1 },
    material: mediumCarbonSteel,
    surface: { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15 },
    powerDensity: 1e6,
    duration: 10,
  };
  it("rejects bad input with InputError", () => {
    expect(() => axisymmetricHeatConduction({ ...good, duration: -1 })).toThrow(InputError);
    expect(() => axisymmetricHeatConduction({ ...good, shape: { ...good.shape, rMax: 0 } })).toThrow(InputError);
    expect(() => axisymmetricHeatConduction({ ...good, cells: { radial: 1, axial: 4 } })).toThrow(InputError);
    expect(() => axisymmetricHeatConduction({ ...good, surface: { ...good.surface, emissivity: 2 } })).toThrow(InputError);
    expect(() => axisymmetricHeatConduction({ ...good, insulatedFaces: ["side" as "outer"] })).toThrow(InputError);
    expect(() => axisymmetricHeatConduction({ ...good, powerDensity: undefined } as never)).toThrow(InputError);
    expect(() => axisymmetricHeatConduction({ ...good, generationAt: () => undefined })).toThrow(InputError);
    expect(() => axisymmetricHeatConduction({ ...good, powrDensity: 1 } as never)).toThrow(/powerDensity|known/);
    const rest = { shape: good.shape, material: good.material, surface: good.surface, duration: good.duration };
    expect(() =>
      axisymmetricHeatConduction({ ...rest, generationAt: (q) => { q.generation[0] = Number.NaN; } }),
    ).toThrow(InputError);
  });
  it("a bore of denormal radius gives finite results (pinned fast-check counterexample)", () => {
    const res = axisymmetricHeatConduction({
      ...good,
      shape: { kind: "rectangle", rMin: 5e-324, rMax: 0.03125, zMin: 0, zMax: 0.01 },
      surface: { convectionCoefficient: 0, emissivity: 0, ambientTemperature: 293.15 },
      powerDensity: 1e7,
      duration: 2,
    });
    expect(Number.isFinite(res.meanTemperature.at(-1)!)).toBe(true);
    expect(Math.abs(res.energy.imbalance)).toBeLessThan(1e-6 * res.energy.input);
  });
  it("reports a part above its melting temperature with a caution", () => {
    const res = axisymmetricHeatConduction({ ...good, powerDensity: 5e9, duration: 4 });
    expect(res.cautions.map((c) => c.code)).toContain("part-above-melting");
    expect(res.cautions.map((c) => c.code)).toContain("hot-surface-burn");
  });
});
