import { describe, it, expect } from "vitest";
import { InputError } from "../../src/index.js";
import {
  brooksCoilInductance,
  multilayerCoilInductance,
  multilayerCoilInductanceWheeler,
  solenoidInductance,
} from "../../src/inductance/index.js";
import multilayer from "../fixtures/inductance/multilayer.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

const geometry = (c: { innerRadius: number; outerRadius: number; length: number; turns: number }) => ({
  innerRadius: c.innerRadius,
  outerRadius: c.outerRadius,
  length: c.length,
  turns: c.turns,
});

describe("multilayerCoilInductance", () => {
  it("matches the Bessel–Struve fixture to 1e-8", () => {
    // fixture from scipy/mpmath Bessel–Struve integral, test/fixtures/inductance/generate.py
    expect(multilayer.meta.rtol).toBe(1e-8);
    for (const c of multilayer.cases) expect(rel(multilayerCoilInductance(geometry(c)), c.inductance)).toBeLessThanOrEqual(1e-8);
  });

  it("tends to the current-sheet solenoid as the winding depth goes to zero", () => {
    // Lorenz/Nagaoka current sheet; difference O(depth/radius)
    const sheet = solenoidInductance({ radius: 0.02, length: 0.03, turns: 10 });
    expect(rel(multilayerCoilInductance({ innerRadius: 0.02, outerRadius: 0.02 * (1 + 1e-6), length: 0.03, turns: 10 }), sheet)).toBeLessThan(1e-5);
    expect(multilayerCoilInductance({ innerRadius: 0.02, outerRadius: 0.02, length: 0.03, turns: 10 })).toBe(sheet);
  });

  it("throws InputError for bad dimensions and turns", () => {
    const ok = { innerRadius: 0.01, outerRadius: 0.02, length: 0.01, turns: 10 };
    for (const bad of [{ ...ok, innerRadius: 0 }, { ...ok, outerRadius: 0.005 }, { ...ok, length: -1 }, { ...ok, turns: 0 }, { ...ok, length: NaN }]) {
      expect(() => multilayerCoilInductance(bad)).toThrow(InputError);
      expect(() => multilayerCoilInductanceWheeler(bad)).toThrow(InputError);
    }
  });
});

describe("multilayer approximations", () => {
  it("Wheeler's multilayer formula is within 1 % near his favoured proportions and uses 0.8a²N²/(6a + 9b + 10c)", () => {
    // Wheeler 1928, eq. (2): a = 1 in, b = 1 in, c = 0.5 in, N = 10 -> 80/20 µH
    expect(rel(multilayerCoilInductanceWheeler({ innerRadius: 0.75 * 0.0254, outerRadius: 1.25 * 0.0254, length: 0.0254, turns: 10 }), 4e-6)).toBeLessThan(1e-15);
    const g = { innerRadius: 0.02, outerRadius: 0.03, length: 0.025, turns: 200 };
    expect(rel(multilayerCoilInductanceWheeler(g), multilayerCoilInductance(g))).toBeLessThan(0.01);
  });

  it("Brooks' formula agrees with the exact Brooks coil within 2e-5", () => {
    // Brooks 1931 (coefficient from memory) vs exact uniform current density
    const exact = multilayerCoilInductance({ innerRadius: 0.01, outerRadius: 0.02, length: 0.01, turns: 100 });
    expect(rel(brooksCoilInductance({ sideLength: 0.01, turns: 100 }), exact)).toBeLessThan(2e-5);
    expect(brooksCoilInductance({ meanRadius: 0.015, turns: 100 })).toBe(brooksCoilInductance({ sideLength: 0.01, turns: 100 }));
  });

  it("Brooks throws InputError unless exactly one size is given", () => {
    expect(() => brooksCoilInductance({ turns: 10 })).toThrow(InputError);
    expect(() => brooksCoilInductance({ sideLength: 0.01, meanRadius: 0.015, turns: 10 })).toThrow(InputError);
    expect(() => brooksCoilInductance({ sideLength: -0.01, turns: 10 })).toThrow(InputError);
  });
});
