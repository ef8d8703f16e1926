import { describe, expect, it } from "vitest";
import { inductiveLink, InputError, maximumLinkEfficiency, optimalLoadResistance, type InductiveLinkOptions } from "../../src/index.js";
import fixture from "../fixtures/links/phasor.json" with { type: "json" };
import tuned from "../fixtures/links/tuned.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("inductiveLink", () => {
  for (const c of fixture.cases) {
    it(`matches an independent mesh solve (numpy) for ${c.input.compensation}, L₁ = ${c.input.primaryInductance}`, () => {
      const link = inductiveLink(c.input as InductiveLinkOptions);
      const e = c.expected;
      const tol = fixture.meta.rtol; // fixture from numpy, test/fixtures/links/generate.py
      expect(rel(link.efficiency, e.efficiency)).toBeLessThanOrEqual(tol);
      expect(rel(link.outputPower, e.outputPower)).toBeLessThanOrEqual(tol);
      expect(rel(link.inputPower, e.inputPower)).toBeLessThanOrEqual(tol);
      expect(rel(link.inputImpedance.re, e.inputImpedanceRe)).toBeLessThanOrEqual(tol);
      expect(Math.abs(link.inputImpedance.im - e.inputImpedanceIm)).toBeLessThanOrEqual(tol * Math.hypot(e.inputImpedanceRe, e.inputImpedanceIm));
      expect(rel(link.primaryCurrentRms, e.primaryCurrentRms)).toBeLessThanOrEqual(tol);
      expect(rel(link.secondaryCurrentRms, e.secondaryCurrentRms)).toBeLessThanOrEqual(tol);
      expect(rel(link.loadVoltageRms, e.loadVoltageRms)).toBeLessThanOrEqual(tol);
      // conservation: input power = load power + coil losses
      const losses = link.primaryCurrentRms ** 2 * c.input.primaryResistance + link.secondaryCurrentRms ** 2 * c.input.secondaryResistance;
      expect(rel(link.inputPower, link.outputPower + losses)).toBeLessThanOrEqual(1e-12);
    });
  }

  it("matches a 40-digit mesh solve (mpmath) on 360 seeded links, default and given capacitors, to 1e-12", () => {
    // fixture from mpmath at 40 digits, test/fixtures/links/generate_tuned.py (default capacitors by
    // the documented tuning rules); the ranges include ill-conditioned parallel secondaries
    const tol = tuned.meta.rtol;
    let worst = 0;
    let compared = 0;
    for (const c of tuned.cases) {
      const link = inductiveLink(c.input as InductiveLinkOptions);
      const e = c.expected;
      const zAbs = Math.hypot(e.inputImpedanceRe, e.inputImpedanceIm);
      const errors = [
        rel(link.efficiency, e.efficiency), rel(link.outputPower, e.outputPower), rel(link.inputPower, e.inputPower),
        Math.abs(link.inputImpedance.re - e.inputImpedanceRe) / zAbs, Math.abs(link.inputImpedance.im - e.inputImpedanceIm) / zAbs,
        rel(link.inputCurrentRms, e.inputCurrentRms), rel(link.primaryCurrentRms, e.primaryCurrentRms),
        rel(link.secondaryCurrentRms, e.secondaryCurrentRms), rel(link.loadVoltageRms, e.loadVoltageRms),
      ];
      expect(link.capacitors.map((k) => k.name)).toEqual(e.capacitors.map((k) => k.name));
      link.capacitors.forEach((k, i) => {
        const x = e.capacitors[i];
        if (x === undefined) throw new Error("capacitor missing from the fixture");
        errors.push(rel(k.capacitance, x.capacitance), rel(k.voltageRms, x.voltageRms), rel(k.currentRms, x.currentRms));
      });
      for (const error of errors) {
        expect(error).toBeLessThanOrEqual(tol);
        worst = Math.max(worst, error);
        compared++;
      }
    }
    expect(compared).toBeGreaterThan(360 * 15);
    expect(worst).toBeGreaterThan(0);
  });

  it("sizes the default capacitors for a real input impedance (SS: C₁ = 1/(ω²L₁), C₂ = 1/(ω²L₂))", () => {
    const base = { primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6, primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3, loadResistance: 5, sourceVoltage: 10 };
    const w = 2 * Math.PI * 140e3;
    const ss = inductiveLink({ ...base, compensation: "series-series" });
    expect(rel(ss.capacitors[0]?.capacitance ?? 0, 1 / (w * w * 24e-6))).toBeLessThanOrEqual(1e-12);
    expect(rel(ss.capacitors[1]?.capacitance ?? 0, 1 / (w * w * 12e-6))).toBeLessThanOrEqual(1e-12);
    for (const compensation of ["series-parallel", "parallel-series", "parallel-parallel"] as const) {
      const link = inductiveLink({ ...base, compensation });
      // the cancellation the default capacitor is defined by is written exactly, not as a rounding residue
      expect(link.inputImpedance.im).toBe(0);
    }
    // SP with R₂ = 0: the classic C₁ = 1/(ω²(L₁ − M²/L₂)) (Wang, Stielau & Covic 2005, from memory)
    const sp = inductiveLink({ ...base, secondaryResistance: 0, compensation: "series-parallel" });
    expect(rel(sp.capacitors[0]?.capacitance ?? 0, 1 / (w * w * (24e-6 - (4e-6) ** 2 / 12e-6)))).toBeLessThanOrEqual(1e-9);
    // LCC primary tuned: the coil current V/(ωL_f1) does not depend on the load (Li et al. 2015, from memory)
    const lcc = (rl: number) => inductiveLink({ ...base, compensation: "lcc-series", primaryFilterInductance: 6e-6, primaryResistance: 0, loadResistance: rl });
    expect(rel(lcc(2).primaryCurrentRms, 10 / (w * 6e-6))).toBeLessThanOrEqual(1e-9);
    expect(rel(lcc(20).primaryCurrentRms, 10 / (w * 6e-6))).toBeLessThanOrEqual(1e-9);
  });

  it("rejects bad input", () => {
    const base = { primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6, primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3, loadResistance: 5, sourceVoltage: 10, compensation: "series-series" as const };
    expect(() => inductiveLink({ ...base, mutualInductance: 20e-6 })).toThrow(InputError);
    expect(() => inductiveLink({ ...base, compensation: "lcc-series" })).toThrow(InputError);
    expect(() => inductiveLink({ ...base, loadresistance: 3 } as typeof base)).toThrow(/did you mean "loadResistance"/);
  });
});

describe("kQ limit", () => {
  it("maximumLinkEfficiency is reached by the series–series link at optimalLoadResistance, and nowhere beaten", () => {
    const l1 = 24e-6, l2 = 12e-6, m = 3e-6, r1 = 0.06, r2 = 0.05, f = 140e3;
    const w = 2 * Math.PI * f;
    const k = m / Math.sqrt(l1 * l2);
    const q1 = (w * l1) / r1;
    const q2 = (w * l2) / r2;
    const eta = maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2 });
    const ropt = optimalLoadResistance({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2, secondaryResistance: r2 });
    const at = (rl: number) => inductiveLink({ primaryInductance: l1, secondaryInductance: l2, mutualInductance: m, primaryResistance: r1, secondaryResistance: r2, frequency: f, compensation: "series-series", loadResistance: rl, sourceVoltage: 10 }).efficiency;
    expect(rel(at(ropt), eta)).toBeLessThanOrEqual(1e-12);
    expect(at(ropt * 1.01)).toBeLessThan(eta);
    expect(at(ropt / 1.01)).toBeLessThan(eta);
  });

  it("maximumLinkEfficiency follows Zargham & Gulak 2012: x/(1+√(1+x))² with x = k²Q₁Q₂ (from memory)", () => {
    // x = 3: 3/(1+2)² = 1/3 exactly
    expect(maximumLinkEfficiency({ couplingCoefficient: 0.1, primaryQuality: 30, secondaryQuality: 10 })).toBeCloseTo(1 / 3, 14);
    expect(() => maximumLinkEfficiency({ couplingCoefficient: 1, primaryQuality: 30, secondaryQuality: 10 })).toThrow(InputError);
  });
});
