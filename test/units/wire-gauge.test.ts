import { describe, expect, it } from "vitest";
import { InputError } from "../../src/core/index.js";
import {
  awgToDiameter,
  crossSectionToDiameter,
  diameterToAwg,
  diameterToCrossSection,
  METRIC_CROSS_SECTIONS,
  nextMetricCrossSection,
} from "../../src/units/index.js";

const MIL = 2.54e-5;

describe("awgToDiameter", () => {
  it("matches the ASTM B258 table entries to their rounding (0.1 mil)", () => {
    // ASTM B258 nominal diameters in mils (table values rounded to 0.1 mil; the metric values
    // quoted in the foundation issue: AWG 24 ≈ 0.5106 mm, AWG 10 ≈ 2.588 mm).
    const table: Array<[number | string, number]> = [
      ["0000", 460.0], ["000", 409.6], ["00", 364.8], ["0", 324.9], [1, 289.3], [4, 204.3],
      [10, 101.9], [12, 80.8], [14, 64.1], [18, 40.3], [20, 32.0], [24, 20.1], [30, 10.0], [36, 5.0], [40, 3.1],
    ];
    for (const [gauge, mils] of table) {
      expect(Math.abs(awgToDiameter(gauge) / MIL - mils), String(gauge)).toBeLessThanOrEqual(0.05 + 1e-9);
    }
    expect(awgToDiameter(24) * 1000).toBeCloseTo(0.5106, 4);
    expect(awgToDiameter(10) * 1000).toBeCloseTo(2.588, 3);
  });

  it("is exact at the defining points 0000 = 0.46 in and 36 = 0.005 in", () => {
    expect(awgToDiameter(-3)).toBeCloseTo(0.46 * 0.0254, 15);
    expect(awgToDiameter(36)).toBeCloseTo(0.005 * 0.0254, 16);
  });

  it("accepts zero-gauge names and numeric strings", () => {
    expect(awgToDiameter("4/0")).toBe(awgToDiameter(-3));
    expect(awgToDiameter("3/0")).toBe(awgToDiameter(-2));
    expect(awgToDiameter("00")).toBe(awgToDiameter(-1));
    expect(awgToDiameter("1/0")).toBe(awgToDiameter(0));
    expect(awgToDiameter("24")).toBe(awgToDiameter(24));
    expect(awgToDiameter(24.5)).toBeLessThan(awgToDiameter(24));
  });

  it("rejects gauges outside 0000 … 56 and non-gauges", () => {
    for (const bad of [-4, 57, NaN, Infinity, "00000", "5/0", "AWG", ""]) expect(() => awgToDiameter(bad)).toThrow(InputError);
  });
});

describe("diameterToAwg", () => {
  it("inverts awgToDiameter", () => {
    expect(diameterToAwg(awgToDiameter(18))).toBeCloseTo(18, 12);
    expect(diameterToAwg(0.46 * 0.0254)).toBeCloseTo(-3, 12);
  });
  it("rejects diameters outside the gauge range", () => {
    for (const bad of [0, -1, 0.02, 1e-6, NaN]) expect(() => diameterToAwg(bad)).toThrow(InputError);
  });
});

describe("metric cross-sections", () => {
  it("lists the IEC 60228 nominal sizes in ascending order", () => {
    // IEC 60228:2004 Table 1 (class 1) nominal cross-sections, as reproduced in KabelMetal's
    // "Conductor specification according to IEC 60228": 0.5, 0.75, 1, 1.5, 2.5, 4, 6, 10, 16 mm², ...
    expect(METRIC_CROSS_SECTIONS.slice(0, 9).map((a) => Math.round(a * 1e8) / 100)).toEqual([0.5, 0.75, 1, 1.5, 2.5, 4, 6, 10, 16]);
    // the same tables continue 25 … 400 mm² (copper) and 500 … 1200 mm² (aluminium column)
    expect(METRIC_CROSS_SECTIONS.slice(9, 25).map((a) => Math.round(a * 1e6))).toEqual([25, 35, 50, 70, 95, 120, 150, 185, 240, 300, 400, 500, 630, 800, 1000, 1200]);
    for (let i = 1; i < METRIC_CROSS_SECTIONS.length; i++) {
      expect(METRIC_CROSS_SECTIONS[i]).toBeGreaterThan(METRIC_CROSS_SECTIONS[i - 1] ?? 0);
    }
  });
  it("picks the next size up", () => {
    expect(nextMetricCrossSection(2e-6)).toBe(2.5e-6);
    expect(nextMetricCrossSection(2.5e-6)).toBe(2.5e-6);
    expect(() => nextMetricCrossSection(3e-3)).toThrow(InputError);
  });
  it("converts between diameter and cross-section of a solid round conductor", () => {
    expect(diameterToCrossSection(crossSectionToDiameter(1.5e-6))).toBeCloseTo(1.5e-6, 18);
    expect(crossSectionToDiameter(Math.PI * 1e-6)).toBeCloseTo(2e-3, 15);
    expect(() => crossSectionToDiameter(0)).toThrow(InputError);
  });
});
