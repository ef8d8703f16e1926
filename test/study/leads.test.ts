/**
 * The study's leads: their inductance in series with the coil lowers the tank's frequency and
 * takes a share of the tank voltage. The frequency is checked against a hand computation of the
 * parallel tank's zero-phase frequency, ω² = 1/(LC) − (R/L)², with the lead's inductance and
 * resistance from an independent mpmath computation (fixture test/fixtures/leads/generate_series.py,
 * `studyLead`: the cylindrical-harmonic solution at 30 digits on a frequency grid; `studyCoaxialLead`:
 * Schelkunoff's Bessel-function impedances of rod and return tube at 30 digits on the same grid).
 */
import { describe, expect, it } from "vitest";
import series from "../fixtures/leads/series.json" with { type: "json" };
import { readHeaterDescription } from "../../src/index.js";
import { coilProperties, heaterOperatingPoint } from "../../src/study/operating-point.js";
import { loadExample, mutate } from "./cases.js";

/** Lead per metre (resistance, inductance) at f from an mpmath table: quadratic in log–log (R and L are near power laws in f). */
function leadPerMetre(f: number, t: number[][] = series.studyLead.perMetre): [number, number] {
  const x = Math.log(f);
  let i = 1;
  while (i + 2 < t.length && Math.log(t[i]![0]!) < x) i++;
  if (x < Math.log(t[0]![0]!) || x > Math.log(t[t.length - 1]![0]!)) throw new Error(`frequency ${f} outside the fixture's table`);
  const xs = [t[i - 1]!, t[i]!, t[i + 1]!].map((row) => Math.log(row[0]!));
  const lagrange = (k: number): number[] => [0, 1, 2].map((j) => Math.log([t[i - 1]!, t[i]!, t[i + 1]!][j]![k]!));
  const interpolate = (ys: number[]): number => {
    let sum = 0;
    for (let j = 0; j < 3; j++) {
      let w = 1;
      for (let m = 0; m < 3; m++) if (m !== j) w *= (x - xs[m]!) / (xs[j]! - xs[m]!);
      sum += w * ys[j]!;
    }
    return Math.exp(sum);
  };
  return [interpolate(lagrange(1)), interpolate(lagrange(2))];
}

describe("study leads", () => {
  const withLeads = readHeaterDescription(loadExample("study-bearing-race-leads.json"), { requireUnits: true });
  const without = readHeaterDescription(loadExample("study-bearing-race.json"), { requireUnits: true });
  const run = withLeads.coil.leadLength / 2;

  it("the example's leads are the fixture's: 6 × 1 mm copper tubes at 10 mm centres, copper at 35 °C (IEC 60028)", () => {
    expect(withLeads.coil.leads).toEqual({ shape: "round-pair", spacing: series.studyLead.spacing });
    expect(withLeads.coil.conductor).toMatchObject({ kind: "tube", outerDiameter: series.studyLead.diameter, wallThickness: series.studyLead.wallThickness });
    expect(Math.abs(coilProperties(withLeads).resistivity / series.studyLead.resistivity - 1)).toBeLessThan(1e-12);
  });

  for (const withPart of [false, true]) {
    it(`${withPart ? "with the part" : "empty"}: the lead inductance lowers the frequency to the zero-phase frequency of coil + leads (hand computation, leads from mpmath)`, () => {
      const p = heaterOperatingPoint(withLeads, 293.15, withPart);
      const q = heaterOperatingPoint(without, 293.15, withPart);
      const f = p.frequency;
      const [rLead, lLead] = leadPerMetre(f);
      // the lead as the study reports it, against mpmath (table interpolation ≤ 1e-5)
      expect(Math.abs(p.leadInductance / (lLead * run) - 1)).toBeLessThan(1e-5);
      expect(Math.abs(p.leadResistance / (rLead * run) - 1)).toBeLessThan(1e-5);
      // zero-phase frequency of the coil branch (coil + leads + capacitor ESR) with the capacitor
      const L = p.inductance + lLead * run;
      const R = p.tankResistance - p.leadResistance + rLead * run;
      const C = withLeads.capacitor.capacitance;
      const hand = Math.sqrt(1 / (L * C) - (R / L) ** 2) / (2 * Math.PI);
      expect(Math.abs(f / hand - 1)).toBeLessThan(1e-5);
      // the shift: the leads add about 0.1 µH to a few µH; the frequency drops by a few percent
      expect(f).toBeLessThan(q.frequency);
      const shift = 1 - f / q.frequency;
      const estimate = 1 - Math.sqrt(p.inductance / L); // first-order: coil inductance unchanged
      expect(Math.abs(shift - estimate)).toBeLessThan(0.2 * estimate);
      // voltage division: the coil sees less than the tank, the leads the rest (phasors)
      expect(p.coilVoltageRms).toBeLessThan(p.tankVoltagePeak / Math.SQRT2);
      const omega = 2 * Math.PI * f;
      expect(Math.abs(p.leadVoltageRms / (p.coilCurrentRms * Math.hypot(p.leadResistance, omega * p.leadInductance)) - 1)).toBeLessThan(1e-6); // the fixed point's last step in frequency
      // the losses still add up to the input power
      const l = p.losses;
      expect(Math.abs(l.supply + l.switches + l.coil + l.capacitors + l.core + l.part - p.inputPower)).toBeLessThan(1e-9 * p.inputPower);
    });
  }

  it("without a cross-section the leads are resistance only, as before (no inductance)", () => {
    const q = heaterOperatingPoint(without, 293.15, false);
    expect(q.leadInductance).toBe(0);
    expect(q.leadResistance).toBeGreaterThan(0);
  });

  describe("coaxial leads", () => {
    const lead = series.studyCoaxialLead;
    const coaxial = readHeaterDescription(
      mutate(loadExample("study-bearing-race-leads.json"), "coil.leads", { shape: "coaxial", innerDiameter: "6 mm", returnInnerDiameter: "12 mm", returnWallThickness: "1 mm" }),
      { requireUnits: true },
    );
    const coaxRun = coaxial.coil.leadLength / 2;

    it("read as a copper rod in a return tube, the coil conductor's material by default", () => {
      expect(coaxial.coil.leads).toMatchObject({ shape: "coaxial", innerDiameter: lead.innerDiameter, innerWallThickness: lead.innerDiameter / 2, returnInnerDiameter: lead.returnInnerDiameter, returnWallThickness: lead.returnWallThickness });
      expect(coaxial.coil.leads !== null && "material" in coaxial.coil.leads ? coaxial.coil.leads.material.id : "").toBe("copper");
      // DC: winding tube plus rod and return tube in series, each over the cable's length (hand computation)
      const rho = coilProperties(coaxial).resistivity;
      expect(Math.abs(rho / lead.resistivity - 1)).toBeLessThan(1e-12);
      const a = lead.innerDiameter / 2;
      const b = lead.returnInnerDiameter / 2;
      const c = b + lead.returnWallThickness;
      const winding = coilProperties(without).dcResistance - (rho * without.coil.leadLength) / (Math.PI * (3e-3 ** 2 - 2e-3 ** 2));
      const hand = winding + rho * coaxRun * (1 / (Math.PI * a * a) + 1 / (Math.PI * (c * c - b * b)));
      expect(Math.abs(coilProperties(coaxial).dcResistance / hand - 1)).toBeLessThan(1e-12);
    });

    for (const withPart of [false, true]) {
      it(`${withPart ? "with the part" : "empty"}: the coaxial lead's inductance and resistance are mpmath's, and the frequency the zero-phase frequency of coil + lead`, () => {
        const p = heaterOperatingPoint(coaxial, 293.15, withPart);
        const q = heaterOperatingPoint(without, 293.15, withPart);
        const f = p.frequency;
        const [rLead, lLead] = leadPerMetre(f, lead.perMetre);
        expect(Math.abs(p.leadInductance / (lLead * coaxRun) - 1)).toBeLessThan(1e-5);
        expect(Math.abs(p.leadResistance / (rLead * coaxRun) - 1)).toBeLessThan(1e-5);
        const L = p.inductance + lLead * coaxRun;
        const R = p.tankResistance - p.leadResistance + rLead * coaxRun;
        const hand = Math.sqrt(1 / (L * coaxial.capacitor.capacitance) - (R / L) ** 2) / (2 * Math.PI);
        expect(Math.abs(f / hand - 1)).toBeLessThan(1e-5);
        // a coaxial lead has far less inductance than the pair at 10 mm centres: a smaller shift
        const pair = heaterOperatingPoint(withLeads, 293.15, withPart);
        expect(p.leadInductance).toBeLessThan(0.5 * pair.leadInductance);
        expect(f).toBeLessThan(q.frequency);
        expect(f).toBeGreaterThan(pair.frequency);
      });
    }

    it("the reader rejects a bore no wider than the inner conductor, an inner wall over half its diameter and pair fields", () => {
      const base = mutate(loadExample("study-bearing-race-leads.json"), "coil.leads", { shape: "coaxial", innerDiameter: "6 mm", returnInnerDiameter: "12 mm", returnWallThickness: "1 mm" });
      expect(() => readHeaterDescription(mutate(base, "coil.leads.returnInnerDiameter", "6 mm"))).toThrow(/coil\.leads\.returnInnerDiameter.*touch/);
      expect(() => readHeaterDescription(mutate(base, "coil.leads.innerWallThickness", "4 mm"))).toThrow(/coil\.leads\.innerWallThickness/);
      expect(() => readHeaterDescription(mutate(base, "coil.leads.spacing", "10 mm"))).toThrow(/coil\.leads\.spacing/);
      expect(() => readHeaterDescription(mutate(base, "coil.leads.returnWallThickness", undefined))).toThrow(/coil\.leads\.returnWallThickness/);
      const tube = readHeaterDescription(mutate(base, "coil.leads.innerWallThickness", "1 mm"));
      expect(tube.coil.leads).toMatchObject({ shape: "coaxial", innerWallThickness: 0.001 });
      // a tube carries less DC than the rod of the same diameter: more resistance
      expect(coilProperties(tube).dcResistance).toBeGreaterThan(coilProperties(coaxial).dcResistance);
    });
  });

  it("the reader asks for a lead length and a spacing wider than the conductor, and rejects misplaced fields", () => {
    const base = loadExample("study-bearing-race-leads.json");
    expect(() => readHeaterDescription(mutate(base, "coil.leadLength", undefined))).toThrow(/coil\.leadLength/);
    expect(() => readHeaterDescription(mutate(base, "coil.leads.spacing", "5 mm"))).toThrow(/coil\.leads\.spacing.*outer diameter/);
    expect(() => readHeaterDescription(mutate(base, "coil.leads.width", "5 mm"))).toThrow(/coil\.leads\.width/);
    expect(() => readHeaterDescription(mutate(base, "coil.leads.innerDiameter", "5 mm"))).toThrow(/coil\.leads\.innerDiameter/);
    expect(() => readHeaterDescription(mutate(base, "coil.leads.shape", "twisted"))).toThrow(/coil\.leads\.shape/);
    const bus = readHeaterDescription(mutate(base, "coil.leads", { shape: "flat-pair", width: "30 mm", thickness: "2 mm", gap: "3 mm" }));
    expect(bus.coil.leads).toMatchObject({ shape: "flat-pair", width: 0.03, thickness: 0.002, gap: 0.003 });
    const p = heaterOperatingPoint(bus, 293.15, false);
    expect(p.leadInductance).toBeGreaterThan(0);
  });
});
