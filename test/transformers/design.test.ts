import { describe, it, expect } from "vitest";
import { InputError, transformerDesign, potCore } from "../../src/index.js";
import type { TransformerDesignOptions } from "../../src/index.js";
import fixture from "../fixtures/transformers/design-llc.json" with { type: "json" };

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const options = fixture.case.options as TransformerDesignOptions;
function withoutTurns(): TransformerDesignOptions {
  const copy: Record<string, unknown> = { ...options };
  delete copy.turns;
  return copy as unknown as TransformerDesignOptions;
}

describe("transformerDesign", () => {
  it("matches the independently rebuilt stack end to end (fixture design-llc.json: 1-D finite differences, sampled MMF energy, iGSE by quadrature)", () => {
    const d = transformerDesign(options);
    const c = fixture.case;
    expect(d.turns).toEqual({ primary: 56, secondary: 7 });
    expect(d.layers).toHaveLength(c.layerCount);
    expect(rel(d.peakFluxDensity, c.peakFluxDensity)).toBeLessThan(1e-14);
    for (const w of [0, 1] as const) {
      expect(rel(d.windings[w].dcResistance, c.windings[w]?.dcResistance ?? NaN)).toBeLessThan(1e-12);
      expect(rel(d.windings[w].acResistance, c.windings[w]?.acResistance ?? NaN)).toBeLessThan(1e-10);
    }
    expect(rel(d.losses.core, c.losses.core)).toBeLessThan(fixture.meta.rtol);
    expect(rel(d.losses.primaryCopper, c.losses.primaryCopper)).toBeLessThan(1e-10);
    expect(rel(d.losses.secondaryCopper, c.losses.secondaryCopper)).toBeLessThan(1e-10);
    expect(rel(d.leakageInductance, c.leakageInductance)).toBeLessThan(fixture.meta.rtol);
    expect(rel(d.temperature.temperatureRise, c.temperatureRise)).toBeLessThan(fixture.meta.rtol);
    expect(d.cautions.map((x) => x.code)).toContain("voltage-above-extra-low");
  });

  it("searches the turns: rejects high flux and an overfull window, keeps the least total loss", () => {
    const search = withoutTurns();
    const d = transformerDesign({ ...search, maxFluxDensity: 0.12 });
    const feasible = d.candidates.filter((c) => c.rejected === null);
    expect(feasible.length).toBeGreaterThan(1);
    expect(d.candidates.some((c) => c.rejected === "flux-density")).toBe(true);
    expect(d.candidates[d.candidates.length - 1]?.rejected).toBe("window");
    const least = Math.min(...feasible.map((c) => c.totalLoss ?? Infinity));
    expect(d.losses.total).toBe(least);
    expect(d.peakFluxDensity).toBeLessThanOrEqual(0.12);
    for (const c of feasible) expect(c.primaryTurns).toBe(Math.round(8 * c.secondaryTurns));
  });

  it("takes a pot core from fluxwright/cores as it is", () => {
    const core = potCore({ outerDiameter: 30e-3, windowOuterDiameter: 25e-3, postDiameter: 12.5e-3, postHoleDiameter: 5e-3, height: 19e-3, windowHeight: 13e-3 });
    const search = withoutTurns();
    const d = transformerDesign({ ...search, core });
    expect(d.turns.secondary).toBeGreaterThan(0);
  });

  it("raises a saturation caution when fixed turns exceed the flux limit", () => {
    const d = transformerDesign({ ...options, maxFluxDensity: 0.05 });
    expect(d.cautions.map((x) => x.code)).toContain("flux-density-above-limit");
  });

  it("rejects bad input and impossible specifications with InputError", () => {
    expect(() => transformerDesign({ ...options, sections: [0, 0] })).toThrow(InputError);
    expect(() => transformerDesign({ ...options, turns: { primary: 1, secondary: 7 }, sections: [0, 1, 0] })).toThrow(InputError);
    expect(() => transformerDesign({ ...options, thermal: {} })).toThrow(/thermal/);
    expect(() => transformerDesign({ ...options, core: { ...options.core, windowHieght: 1 } as never })).toThrow(/windowHieght/);
    const search = withoutTurns();
    expect(() => transformerDesign({ ...search, maxFluxDensity: 0.01 })).toThrow(/maxFluxDensity/);
  });
});
