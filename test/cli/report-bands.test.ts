import { describe, expect, it } from "vitest";
import { studyHeater } from "../../src/index.js";
import type { HeaterStudy } from "../../src/index.js";
import { studyHtmlReport } from "../../src/report/html-report.js";
import { studyTextReport } from "../../src/report/text-report.js";
import { loadExample } from "../study/cases.js";

// a band put into a real study (the demos have none): the reports must mark it
const base = studyHeater(loadExample("study-forging-bar.json"), { impedanceSweep: false });
const band = { from: 923.15, to: 973.15, noOscillation: true, reason: "test band" };
const withBand: HeaterStudy = {
  ...base,
  heatUp: base.heatUp === null ? null : { ...base.heatUp, unsolvedBands: [band] },
  temperatureScan: base.temperatureScan === null ? null : { ...base.temperatureScan, unsolvedBands: [band] },
};

describe("reports mark a band without an operating point", () => {
  it("the text report lists it with its temperatures and the no-oscillation reason", () => {
    const text = studyTextReport(withBand);
    expect(text).toMatch(/NO OPERATING POINT \(no power counted\)\s+650 °C … 700 °C — the tank cannot oscillate/);
    expect(text).toMatch(/power solved from … to/);
  });
  it("the HTML report draws no line across it and names it in the caption", () => {
    const html = studyHtmlReport(withBand);
    expect(html).toContain("no operating point from");
    expect(html).toMatch(/has no operating point at 650 °C–700 °C/);
    expect(html).toContain("power into part (above 700 °C)");
  });
  it("without a band neither report mentions one", () => {
    expect(studyTextReport(base)).not.toContain("NO OPERATING POINT");
    expect(studyHtmlReport(base)).not.toContain("no operating point from");
  });
});
