import { describe, it, expect } from "vitest";
import { InputError, leakageInductance, litzAcRatio, roundWireWindingAcRatio, transformerWindingResistance } from "../../src/index.js";
import type { TransformerWindingResistanceOptions, WindingLayer } from "../../src/index.js";
import stack from "../fixtures/transformers/stack-1d.json" with { type: "json" };

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const RHO = 1.72e-8;

describe("transformerWindingResistance", () => {
  it("matches a 1-D finite-difference field solution of every layer within 1e-10 (fixture stack-1d.json, scipy)", () => {
    expect(stack.meta.rtol).toBe(1e-10);
    for (const c of stack.cases) {
      const r = transformerWindingResistance(c.options as TransformerWindingResistanceOptions);
      for (const w of [0, 1] as const) {
        const ref = c.windings[w];
        expect(rel(r.windings[w].dcResistance, ref?.dcResistance ?? NaN), `${c.name} dc ${w}`).toBeLessThan(1e-12);
        expect(rel(r.windings[w].acResistance, ref?.acResistance ?? NaN), `${c.name} ac ${w}`).toBeLessThan(stack.meta.rtol);
      }
    }
  });

  it("reduces to Dowell's whole-portion factor for a P|S stack of full round-wire layers (roundWireWindingAcRatio)", () => {
    const conductor = { kind: "round", diameter: 0.3e-3 } as const;
    const layers: WindingLayer[] = [];
    for (let i = 0; i < 4; i++) layers.push({ winding: 0, turns: 20, conductor });
    for (let i = 0; i < 4; i++) layers.push({ winding: 1, turns: 20, conductor });
    const r = transformerWindingResistance({ frequency: 200e3, resistivity: RHO, windowBreadth: 8e-3, meanTurnLength: 0.05, layers, spacers: Array(7).fill(0.05e-3) as number[] });
    const portion = roundWireWindingAcRatio({ wireDiameter: 0.3e-3, frequency: 200e3, resistivity: RHO, layers: 4, turnsPerLayer: 20, windingWidth: 8e-3 });
    expect(rel(r.windings[0].acFactor, portion)).toBeLessThan(1e-13);
    expect(rel(r.windings[1].acFactor, portion)).toBeLessThan(1e-13);
  });

  it("reduces to the litz winding factor for a P|S stack of litz layers (litzAcRatio with the winding field)", () => {
    // the mean over the layers of (fa² + fa fc + fc²)/3 is 1/3 of the peak: litzAcRatio's k = 1 winding term
    const construction = { strands: 60, strandDiameter: 0.08e-3, strandOuterDiameter: 0.092e-3 };
    const layers: WindingLayer[] = [];
    for (let i = 0; i < 3; i++) layers.push({ winding: 0, turns: 7, conductor: { kind: "litz", construction } });
    for (let i = 0; i < 2; i++) layers.push({ winding: 1, turns: 5, conductor: { kind: "litz", construction } });
    const r = transformerWindingResistance({ frequency: 200e3, resistivity: RHO, windowBreadth: 10e-3, meanTurnLength: 0.05, layers, spacers: [0, 0, 0.2e-3, 0] });
    const f0 = litzAcRatio({ construction, frequency: 200e3, resistivity: RHO, turns: 21, windowBreadth: 10e-3 });
    const f1 = litzAcRatio({ construction, frequency: 200e3, resistivity: RHO, turns: 10, windowBreadth: 10e-3 });
    expect(rel(r.windings[0].acFactor, f0)).toBeLessThan(1e-13);
    expect(rel(r.windings[1].acFactor, f1)).toBeLessThan(1e-13);
  });

  it("gives the same leakage as leakageInductance with the layers' builds and turns", () => {
    const conductor = { kind: "round", diameter: 0.3e-3, outerDiameter: 0.34e-3 } as const;
    const foil = { kind: "foil", thickness: 0.2e-3 } as const;
    const r = transformerWindingResistance({ frequency: 200e3, resistivity: RHO, windowBreadth: 8e-3, meanTurnLength: 0.05,
      layers: [{ winding: 0, turns: 20, conductor }, { winding: 1, turns: 1, conductor: foil }, { winding: 0, turns: 11, conductor }], spacers: [0.1e-3, 0.1e-3] });
    const L = leakageInductance({ turns: 31, meanTurnLength: 0.05, windowBreadth: 8e-3,
      layers: [{ winding: 0, thickness: 0.34e-3, turns: 20 }, { winding: 1, thickness: 0.2e-3, turns: 1 }, { winding: 0, thickness: 0.34e-3, turns: 11 }], spacers: [0.1e-3, 0.1e-3] });
    expect(rel(r.leakageInductance, L)).toBeLessThan(1e-14);
    expect(r.layers[1]?.mmfStart).toBeCloseTo(20, 12);
    expect(r.layers[1]?.mmfEnd).toBeCloseTo(-11, 12);
  });

  it("prints the documented example and flags thick round wire", () => {
    const wire = { kind: "round", diameter: 0.4e-3, outerDiameter: 0.45e-3 } as const;
    const foil = { kind: "foil", thickness: 0.1e-3 } as const;
    const layers: WindingLayer[] = [{ winding: 0, turns: 8, conductor: wire }, { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil },
      { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil }, { winding: 0, turns: 8, conductor: wire }];
    const options = { frequency: 100e3, resistivity: RHO, windowBreadth: 8e-3, meanTurnLength: 0.05, layers, spacers: [0.1e-3, 0.03e-3, 0.03e-3, 0.03e-3, 0.1e-3] };
    const r = transformerWindingResistance(options);
    expect(r.windings[0].acFactor).toBeCloseTo(1.0894, 4);
    expect(r.windings[1].acFactor).toBeCloseTo(1.0222, 4);
    expect(r.validity).toHaveLength(0);
    const thick = transformerWindingResistance({ ...options, frequency: 300e3 });
    expect(thick.validity.map((v) => v.code)).toContain("round-wire-thick");
  });

  it("rejects bad layers with InputError", () => {
    const foil = { kind: "foil", thickness: 0.1e-3 } as const;
    const ok: TransformerWindingResistanceOptions = { frequency: 1e5, resistivity: RHO, windowBreadth: 5e-3, meanTurnLength: 0.04,
      layers: [{ winding: 0, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil }], spacers: [0] };
    expect(() => transformerWindingResistance(ok)).not.toThrow();
    expect(() => transformerWindingResistance({ ...ok, layers: [{ winding: 0, turns: 2, conductor: foil }, { winding: 1, turns: 1, conductor: foil }] })).toThrow(InputError);
    expect(() => transformerWindingResistance({ ...ok, layers: [{ winding: 0, turns: 20, conductor: { kind: "round", diameter: 0.3e-3 } }, { winding: 1, turns: 1, conductor: foil }] })).toThrow(/windowBreadth/);
    expect(() => transformerWindingResistance({ ...ok, layers: [{ winding: 0, turns: 1, conductor: { kind: "foil", thickness: 1e-4, width: 6e-3 } }, { winding: 1, turns: 1, conductor: foil }] })).toThrow(InputError);
    expect(() => transformerWindingResistance({ ...ok, layers: [{ winding: 0, turns: 1, conductor: { kind: "litz", construction: { strands: 0, strandDiameter: 1e-4 } } }, { winding: 1, turns: 1, conductor: foil }] })).toThrow(/layers\[0\]\.conductor\.construction\.strands/);
    expect(() => transformerWindingResistance({ ...ok, layers: [{ winding: 0, turns: 1, conductor: { kind: "wire" } as never }, { winding: 1, turns: 1, conductor: foil }] })).toThrow(InputError);
    expect(() => transformerWindingResistance({ ...ok, frequency: -1 })).toThrow(InputError);
  });
});
