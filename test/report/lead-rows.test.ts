/**
 * The leads in the text and HTML reports: a design with leads shows their length and shape,
 * their inductance, resistance and voltage, and their loss as a place of its own; a design
 * without leads keeps the reports as they were. The numbers are the study's own fields, so
 * what is checked is that the report shows them and that the places still add up (the
 * lead loss is leadResistance × coilCurrentRms², by the field's definition).
 */
import { describe, it, expect } from "vitest";
import { studyHeater } from "../../src/index.js";
import { studyHtmlReport, studyTextReport } from "../../src/report/index.js";
import { lossEntries } from "../../src/report/text-report.js";
import { loadExample } from "../study/cases.js";

const options = { heatUp: false, temperatureScan: false, impedanceSweep: false } as const;

describe("reports: the leads", () => {
  const withLeads = studyHeater(loadExample("study-bearing-race-leads.json"), options);
  // the same race with no lead length at all (the demo files all give one)
  const bare = loadExample("study-bearing-race.json");
  const without = studyHeater({ ...bare, coil: { ...bare.coil, leadLength: "0 m" } }, options);

  it("a design with leads shows them in the design, the operating points and the losses", () => {
    const text = studyTextReport(withLeads);
    for (const label of ["leads (both together)", "lead inductance", "lead resistance (AC, part of it)", "coil terminal voltage (RMS)", "voltage across the leads (RMS)", "coil conductor", "leads  "]) {
      expect(text, label).toContain(label);
    }
    const html = studyHtmlReport(withLeads);
    for (const label of ["lead inductance", "voltage across the leads (RMS)", "coil conductor"]) expect(html, label).toContain(label);
    // the design and the tables stay within the report's 100 columns (the long design lines wrap)
    for (const line of text.split("\n")) expect(Array.from(line).length, line).toBeLessThanOrEqual(100);
  });

  it("the coil's loss is split into conductor and leads, and the places still sum to the coil's loss", () => {
    const p = withLeads.operating;
    const entries = new Map(lossEntries(p));
    const lead = entries.get("leads") ?? NaN;
    const conductor = entries.get("coil conductor") ?? NaN;
    expect(lead).toBeGreaterThan(0);
    expect(Math.abs(lead / (p.leadResistance * p.coilCurrentRms ** 2) - 1)).toBeLessThan(1e-15);
    expect(Math.abs((lead + conductor) / p.losses.coil - 1)).toBeLessThan(1e-14);
    expect(entries.has("coil and leads")).toBe(false);
  });

  it("a design without leads keeps one coil row and no lead rows", () => {
    const text = studyTextReport(without);
    expect(text).toContain("coil and leads");
    for (const label of ["lead inductance", "voltage across the leads", "coil conductor", "leads (both together)"]) expect(text, label).not.toContain(label);
  });
});
