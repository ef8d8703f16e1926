import { describe, expect, it } from "vitest";
import { InputError } from "../../src/index.js";
import { fitSteinmetz, steinmetzLoss, steinmetzTemperatureFactor } from "../../src/coreloss/index.js";
import type { SteinmetzDataPoint } from "../../src/coreloss/index.js";
import { uniform } from "../support/seeded.js";

const truth = { k: 2.5, alpha: 1.45, beta: 2.55 };
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

function grid(): SteinmetzDataPoint[] {
  const points: SteinmetzDataPoint[] = [];
  for (const frequency of [25e3, 50e3, 100e3, 200e3, 400e3]) {
    for (const fluxDensityPeak of [0.025, 0.05, 0.1, 0.2]) {
      points.push({ frequency, fluxDensityPeak, lossDensity: steinmetzLoss({ ...truth, frequency, fluxDensityPeak }) });
    }
  }
  return points;
}

describe("fitSteinmetz", () => {
  it("recovers known coefficients from exact synthetic points (to 1e-9)", () => {
    const fit = fitSteinmetz(grid());
    expect(rel(fit.k, truth.k)).toBeLessThan(1e-9);
    expect(rel(fit.alpha, truth.alpha)).toBeLessThan(1e-9);
    expect(rel(fit.beta, truth.beta)).toBeLessThan(1e-9);
    expect(fit.residualRms).toBeLessThan(1e-12);
    expect(fit.maxRelativeError).toBeLessThan(1e-11);
    expect(fit.validity).toEqual([]);
    expect(fit.temperatureTerm).toBeUndefined();
  });

  it("recovers coefficients from points with 5 % log-normal noise within stated error (α, β to ±0.05, k within a factor 1.5)", () => {
    const rnd = uniform(12345);
    const noisy = grid().map((p) => {
      // Box–Muller normal, σ = 0.05 in ln P
      const z = Math.sqrt(-2 * Math.log(rnd())) * Math.cos(2 * Math.PI * rnd());
      return { ...p, lossDensity: p.lossDensity * Math.exp(0.05 * z) };
    });
    const fit = fitSteinmetz(noisy);
    expect(Math.abs(fit.alpha - truth.alpha)).toBeLessThan(0.05);
    expect(Math.abs(fit.beta - truth.beta)).toBeLessThan(0.05);
    expect(fit.k / truth.k).toBeGreaterThan(1 / 1.5);
    expect(fit.k / truth.k).toBeLessThan(1.5);
    expect(fit.residualRms).toBeGreaterThan(0.02);
    expect(fit.residualRms).toBeLessThan(0.08);
  });

  it("fits the quadratic temperature term when every point has a temperature", () => {
    const term = { referenceTemperature: 353.15, linear: -3e-3, quadratic: 6e-5 };
    const points: SteinmetzDataPoint[] = [];
    for (const temperature of [298.15, 333.15, 353.15, 373.15, 393.15]) {
      for (const p of grid()) points.push({ ...p, temperature, lossDensity: p.lossDensity * steinmetzTemperatureFactor(term, temperature) });
    }
    const fit = fitSteinmetz(points, { referenceTemperature: 353.15 });
    expect(rel(fit.k, truth.k)).toBeLessThan(1e-9);
    expect(rel(fit.alpha, truth.alpha)).toBeLessThan(1e-9);
    expect(rel(fit.beta, truth.beta)).toBeLessThan(1e-9);
    expect(fit.temperatureTerm?.referenceTemperature).toBe(353.15);
    expect(rel(fit.temperatureTerm?.linear ?? 0, term.linear)).toBeLessThan(1e-8);
    expect(rel(fit.temperatureTerm?.quadratic ?? 0, term.quadratic)).toBeLessThan(1e-8);
  });

  it("defaults the reference temperature to the mean temperature and reproduces the data", () => {
    const term = { referenceTemperature: 353.15, linear: -3e-3, quadratic: 6e-5 };
    const points: SteinmetzDataPoint[] = [];
    for (const temperature of [298.15, 353.15, 393.15]) {
      for (const p of grid()) points.push({ ...p, temperature, lossDensity: p.lossDensity * steinmetzTemperatureFactor(term, temperature) });
    }
    const fit = fitSteinmetz(points);
    expect(fit.temperatureTerm?.referenceTemperature).toBeCloseTo((298.15 + 353.15 + 393.15) / 3, 10);
    expect(fit.maxRelativeError).toBeLessThan(1e-9);
  });

  it("warns when the points span too narrow a range to determine α and β", () => {
    const points: SteinmetzDataPoint[] = [];
    for (const frequency of [90e3, 100e3, 110e3]) {
      for (const fluxDensityPeak of [0.09, 0.1, 0.12]) points.push({ frequency, fluxDensityPeak, lossDensity: steinmetzLoss({ ...truth, frequency, fluxDensityPeak }) });
    }
    const codes = fitSteinmetz(points).validity.map((v) => v.code);
    expect(codes).toContain("narrow-frequency-span");
    expect(codes).toContain("narrow-flux-span");
  });

  it("notes a dropped temperature term when fewer than 3 temperatures are given", () => {
    const points = grid().map((p, i) => ({ ...p, temperature: i % 2 === 0 ? 300 : 350 }));
    const fit = fitSteinmetz(points);
    expect(fit.temperatureTerm).toBeUndefined();
    expect(fit.validity.map((v) => v.code)).toContain("temperature-term-not-fitted");
  });

  it("throws InputError when α and β cannot be determined or input is bad", () => {
    const one = (f: number, b: number): SteinmetzDataPoint => ({ frequency: f, fluxDensityPeak: b, lossDensity: steinmetzLoss({ ...truth, frequency: f, fluxDensityPeak: b }) });
    expect(() => fitSteinmetz([one(1e5, 0.1), one(1e5, 0.2), one(1e5, 0.3)])).toThrow(/frequency/);
    expect(() => fitSteinmetz([one(1e5, 0.1), one(2e5, 0.1), one(3e5, 0.1)])).toThrow(/fluxDensityPeak/);
    expect(() => fitSteinmetz([one(1e5, 0.1), one(2e5, 0.2), one(4e5, 0.4)])).toThrow(/collinear/);
    expect(() => fitSteinmetz([one(1e5, 0.1), one(2e5, 0.2)])).toThrow(InputError);
    expect(() => fitSteinmetz([one(1e5, 0.1), one(2e5, 0.2), { ...one(4e5, 0.1), lossDensity: 0 }])).toThrow(/lossDensity/);
    expect(() => fitSteinmetz([{ ...one(1e5, 0.1), temperature: 300 }, one(2e5, 0.2), one(4e5, 0.1)])).toThrow(/temperature/);
    expect(() => fitSteinmetz("x" as never)).toThrow(InputError);
  });
});
