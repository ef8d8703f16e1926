import { describe, it, expect } from "vitest";
import * as report from "../../src/report/index.js";
import { InputError } from "../../src/index.js";

describe("fluxwright/report: the public report builders", () => {
  it("exports the charts and the report builders, and nothing else", () => {
    expect(Object.keys(report).sort()).toEqual([
      "barChart", "inductorHtmlReport", "inductorPlots", "lineChart", "optimisationTextReport", "studyHtmlReport", "studyPlots", "studyTextReport",
      "sweepCsv", "sweepTextReport", "transformerHtmlReport", "transformerPlots",
    ]);
  });

  it("throws InputError (not TypeError) for input that is not what it renders", () => {
    const bad: unknown[] = [null, undefined, 42, "study", {}];
    const calls: [string, (x: unknown) => unknown][] = [
      ["lineChart", (x) => report.lineChart(x as never)],
      ["barChart", (x) => report.barChart(x as never)],
      ["studyPlots", (x) => report.studyPlots(x as never)],
      ["studyHtmlReport", (x) => report.studyHtmlReport(x as never)],
      ["studyTextReport", (x) => report.studyTextReport(x as never)],
      ["sweepTextReport", (x) => report.sweepTextReport(x as never)],
      ["sweepCsv", (x) => report.sweepCsv(x as never)],
      ["optimisationTextReport", (x) => report.optimisationTextReport(x as never)],
      ["inductorPlots", (x) => report.inductorPlots(x as never)],
      ["inductorHtmlReport", (x) => report.inductorHtmlReport(x as never)],
      ["transformerPlots", (x) => report.transformerPlots(x as never)],
      ["transformerHtmlReport", (x) => report.transformerHtmlReport(x as never)],
    ];
    for (const [name, call] of calls) {
      for (const value of bad) expect(() => call(value), `${name}(${String(value)})`).toThrow(InputError);
    }
  });

  it("prints the optimiser's warnings", () => {
    const text = report.optimisationTextReport({ evaluated: 4, feasible: 4, best: [], rejected: [], warnings: ["the goal cannot be met by these variables"] });
    expect(text).toContain("WARNINGS");
    expect(text).toContain("the goal cannot be met by these variables");
  });
});
