import { describe, expect, it } from "vitest";
import { inductiveLink, InputError, linkFrequencySweep, seriesSeriesSplitting, type InductiveLinkOptions } from "../../src/index.js";
import fixture from "../fixtures/links/splitting.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("seriesSeriesSplitting", () => {
  for (const c of fixture.cases) {
    const { primaryResistance, ...input } = c.input;
    it(`matches a numerical search of the input reactance (Q₂ from L₂ = ${input.secondaryInductance}, k = ${(input.mutualInductance / Math.sqrt(input.primaryInductance * input.secondaryInductance)).toFixed(2)})`, () => {
      const s = seriesSeriesSplitting(input);
      // fixture: direct complex evaluation of Z_in with scipy root and extremum searches, test/fixtures/links/generate_splitting.py
      expect(rel(s.criticalCoupling, c.expected.criticalCoupling)).toBeLessThanOrEqual(fixture.meta.rtol);
      expect(s.zeroPhaseFrequencies.length).toBe(c.expected.zeroPhaseFrequencies.length);
      s.zeroPhaseFrequencies.forEach((f, i) => { expect(rel(f, c.expected.zeroPhaseFrequencies[i]!)).toBeLessThanOrEqual(fixture.meta.rtol); });
      // the full phasor solve is real at each zero-phase frequency (capacitors held at their f₀ values)
      const w0 = 2 * Math.PI * input.resonantFrequency;
      for (const f of s.zeroPhaseFrequencies) {
        const link = inductiveLink({
          primaryInductance: input.primaryInductance, secondaryInductance: input.secondaryInductance, mutualInductance: input.mutualInductance,
          primaryResistance, secondaryResistance: input.secondaryResistance, frequency: f, compensation: "series-series",
          loadResistance: input.loadResistance, sourceVoltage: 1,
          primaryCapacitance: 1 / (w0 * w0 * input.primaryInductance), secondaryCapacitance: 1 / (w0 * w0 * input.secondaryInductance),
        });
        expect(Math.abs(link.inputImpedance.im)).toBeLessThanOrEqual(1e-7 * Math.hypot(link.inputImpedance.re, 2 * Math.PI * f * input.primaryInductance));
      }
    });
  }

  it("throws InputError for M ≥ √(L₁L₂) and unknown keys", () => {
    const base = { primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 10e-6, secondaryResistance: 0.08, loadResistance: 5, resonantFrequency: 100e3 };
    expect(() => seriesSeriesSplitting({ ...base, mutualInductance: 50e-6 })).toThrow(InputError);
    expect(() => seriesSeriesSplitting({ ...base, primaryResistance: 0.1 } as typeof base)).toThrow(/primaryResistance/);
  });
});

describe("linkFrequencySweep", () => {
  const options: InductiveLinkOptions = {
    primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 14.7e-6, primaryResistance: 0.1,
    secondaryResistance: 0.08, frequency: 100e3, compensation: "series-series", loadResistance: 5, sourceVoltage: 10,
  };
  it("shows the split as a power dip at f₀ between two peaks, with three zero-phase crossings", () => {
    const f = Array.from({ length: 2001 }, (_, i) => 70e3 + 7 + i * 30); // off f₀ itself, where the phase is 0 to rounding
    const sweep = linkFrequencySweep(options, f);
    let crossings = 0;
    for (let i = 1; i < f.length; i++) if (Math.sign(sweep.inputPhase[i]!) !== Math.sign(sweep.inputPhase[i - 1]!)) crossings++;
    expect(crossings).toBe(3);
    const at = (hz: number): number => sweep.outputPower[Math.round((hz - 70e3 - 7) / 30)]!;
    expect(at(100e3)).toBeLessThan(at(92e3));
    expect(at(100e3)).toBeLessThan(at(114e3));
    // each point is the exact solve with the capacitors fixed at their f₀ values
    const one = inductiveLink({ ...options, frequency: f[Math.round((92e3 - 70e3 - 7) / 30)]!, primaryCapacitance: sweep.primaryCapacitance, secondaryCapacitance: sweep.secondaryCapacitance });
    expect(at(92e3)).toBe(one.outputPower);
  });

  it("throws InputError for an LCC compensation and a bad frequency", () => {
    expect(() => linkFrequencySweep({ ...options, compensation: "lcc-series", primaryFilterInductance: 10e-6 }, [1e5])).toThrow(InputError);
    expect(() => linkFrequencySweep(options, [1e5, -1])).toThrow(InputError);
  });

});
