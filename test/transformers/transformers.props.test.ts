import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { leakageInductance, transformerFluxOptimum, transformerTurns, transformerWindingResistance } from "../../src/index.js";
import type { LayerConductor, LeakageLayer, WindingLayer } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const rel = (a: number, b: number) => Math.abs(a / b - 1);

/** A random stack with both windings present: winding indices, thicknesses, spacers. */
const stackArb = fc
  .array(fc.record({ winding: fc.constantFrom<0 | 1>(0, 1), thickness: logUniform(1e-5, 2e-3) }), { minLength: 2, maxLength: 10 })
  .filter((l) => l.some((x) => x.winding === 0) && l.some((x) => x.winding === 1))
  .chain((layers) => fc.tuple(fc.constant(layers as LeakageLayer[]), fc.array(logUniform(1e-6, 1e-3), { minLength: layers.length - 1, maxLength: layers.length - 1 })));

describe("leakageInductance properties", () => {
  it("is positive, scales with turns squared and with a uniform scale of every length", () => {
    fc.assert(
      fc.property(stackArb, logUniform(1, 200), logUniform(0.1, 10), ([layers, spacers], turns, k) => {
        const o = { turns, meanTurnLength: 0.05, windowBreadth: 0.01, layers, spacers };
        const L = leakageInductance(o);
        expect(L).toBeGreaterThan(0);
        expect(rel(leakageInductance({ ...o, turns: 2 * turns }), 4 * L)).toBeLessThan(1e-12);
        const scaled = { ...o, meanTurnLength: 0.05 * k, windowBreadth: 0.01 * k, layers: layers.map((l) => ({ ...l, thickness: l.thickness * k })), spacers: spacers.map((s) => s * k) };
        expect(rel(leakageInductance(scaled), k * L)).toBeLessThan(1e-12);
      }),
      { seed: 19, numRuns: 200 },
    );
  });

  it("does not change when the stack is read from the other side or the windings swap labels", () => {
    fc.assert(
      fc.property(stackArb, ([layers, spacers]) => {
        const o = { turns: 10, meanTurnLength: 0.05, windowBreadth: 0.01, layers, spacers };
        const L = leakageInductance(o);
        expect(rel(leakageInductance({ ...o, layers: [...layers].reverse(), spacers: [...spacers].reverse() }), L)).toBeLessThan(1e-12);
        const swapped = layers.map((l) => ({ ...l, winding: (1 - l.winding) as 0 | 1 }));
        expect(rel(leakageInductance({ ...o, layers: swapped }), L)).toBeLessThan(1e-12);
      }),
      { seed: 19, numRuns: 200 },
    );
  });

  it("falls when a P|S pair is split into P-S-P (interleaving)", () => {
    fc.assert(
      fc.property(logUniform(1e-5, 1e-3), logUniform(1e-5, 1e-3), logUniform(1e-6, 1e-3), (t, T, g) => {
        const o = { turns: 10, meanTurnLength: 0.05, windowBreadth: 0.01 };
        const plain = leakageInductance({ ...o, layers: [{ winding: 0, thickness: 2 * t }, { winding: 1, thickness: T }], spacers: [g] });
        const split = leakageInductance({ ...o, layers: [{ winding: 0, thickness: t }, { winding: 1, thickness: T }, { winding: 0, thickness: t }], spacers: [g, g] });
        expect(split).toBeLessThan(plain);
      }),
      { seed: 19, numRuns: 200 },
    );
  });
});

const conductorArb: fc.Arbitrary<LayerConductor> = fc.oneof(
  logUniform(2e-5, 1e-3).map((d) => ({ kind: "round" as const, diameter: d })),
  logUniform(1e-5, 1e-3).map((h) => ({ kind: "foil" as const, thickness: h })),
  fc.tuple(fc.integer({ min: 1, max: 200 }), logUniform(3e-5, 2e-4)).map(([n, d]) => ({ kind: "litz" as const, construction: { strands: n, strandDiameter: d } })),
);

const windingStackArb = fc
  .array(fc.record({ winding: fc.constantFrom<0 | 1>(0, 1), conductor: conductorArb, fill: fc.double({ min: 0.05, max: 1, noNaN: true }) }), { minLength: 2, maxLength: 8 })
  .filter((l) => l.some((x) => x.winding === 0) && l.some((x) => x.winding === 1));

function toLayers(list: readonly { winding: 0 | 1; conductor: LayerConductor; fill: number }[], breadth: number): WindingLayer[] {
  return list.map((l) => {
    const c = l.conductor;
    const size = c.kind === "round" ? c.diameter : c.kind === "litz" ? c.construction.strandDiameter * Math.sqrt(c.construction.strands / 0.7) : breadth;
    const turns = c.kind === "foil" ? 1 : Math.max(1, Math.floor((l.fill * breadth) / (size * 1.0001)));
    return { winding: l.winding, turns, conductor: c };
  });
}

describe("transformerWindingResistance properties", () => {
  it("gives AC factors ≥ 1 that tend to 1 at low frequency, and the same result read from the other side", () => {
    fc.assert(
      fc.property(windingStackArb, logUniform(1e2, 3e6), (list, f) => {
        const breadth = 0.02;
        const layers = toLayers(list, breadth);
        const spacers = layers.slice(1).map(() => 0.1e-3);
        const o = { frequency: f, resistivity: 1.72e-8, windowBreadth: breadth, meanTurnLength: 0.05, layers, spacers };
        const r = transformerWindingResistance(o);
        for (const w of r.windings) {
          expect(Number.isFinite(w.acResistance)).toBe(true);
          expect(w.acFactor).toBeGreaterThanOrEqual(1 - 1e-12);
        }
        for (const l of r.layers) expect(l.acFactor).toBeGreaterThanOrEqual(1 - 1e-12);
        const low = transformerWindingResistance({ ...o, frequency: 1e-3 });
        for (const w of low.windings) expect(w.acFactor - 1).toBeLessThan(1e-9);
        const back = transformerWindingResistance({ ...o, layers: [...layers].reverse() });
        for (const w of [0, 1] as const) expect(rel(back.windings[w].acResistance, r.windings[w].acResistance)).toBeLessThan(1e-11);
      }),
      { seed: 19, numRuns: 150 },
    );
  });
});

describe("turns and flux optimum properties", () => {
  it("whole turns keep the flux at or under the limit and one turn fewer would not", () => {
    fc.assert(
      fc.property(logUniform(1e-6, 1e-1), logUniform(0.01, 2), logUniform(1e-6, 1e-2), (lambda, b, a) => {
        const t = transformerTurns({ voltSeconds: lambda, maxFluxDensity: b, effectiveArea: a });
        expect(t.peakFluxDensity).toBeLessThanOrEqual(b * (1 + 1e-12));
        if (t.turns > 1) expect(lambda / (2 * (t.turns - 1) * a)).toBeGreaterThan(b * (1 - 1e-12));
      }),
      { seed: 19, numRuns: 200 },
    );
  });

  it("no flux density below the optimum gives less total loss", () => {
    fc.assert(
      fc.property(logUniform(0.1, 50), fc.double({ min: 2, max: 3, noNaN: true }), fc.double({ min: 0.2, max: 0.999, noNaN: true }), (current, beta, k) => {
        const o = { voltSeconds: 5e-4, frequency: 200e3, effectiveArea: 1e-4, effectiveVolume: 5e-6, windowArea: 1e-4, meanTurnLength: 0.06, fillFactor: 0.3, resistivity: 2.2e-8, totalCurrentRms: current, coreLoss: { k: 3, alpha: 1.4, beta } };
        const best = transformerFluxOptimum(o);
        const other = transformerFluxOptimum({ ...o, maxFluxDensity: k * best.peakFluxDensity });
        expect(other.limited).toBe(true);
        expect(other.totalLoss).toBeGreaterThanOrEqual(best.totalLoss * (1 - 1e-12));
      }),
      { seed: 19, numRuns: 200 },
    );
  });
});
