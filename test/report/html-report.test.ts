import { describe, it, expect } from "vitest";
import { studyHeater } from "../../src/index.js";
import { studyHtmlReport } from "../../src/report/html-report.js";
import { studyTextReport } from "../../src/report/text-report.js";
import { area, volume } from "../../src/report/format.js";
import { lineChart } from "../../src/report/chart.js";
import { loadExample, mutate } from "../study/cases.js";
import { allText, findAll, parseXml } from "../cli/xml.js";

const race = studyHeater(loadExample("study-bearing-race.json"));
const html = studyHtmlReport(race, "race.json");
const doc = parseXml(html, true);

describe("the HTML report is a standalone document", () => {
  it("has a DESIGN section with the supply, inverter, coil, conductor, capacitors, part and surroundings", () => {
    const headings = findAll(doc, "h2").map(allText);
    expect(headings).toContain("Design");
    expect(headings.indexOf("Design")).toBeLessThan(headings.indexOf("Operating points"));
    const text = allText(doc);
    for (const row of ["supply", "inverter", "coil inductance (empty)", "capacitor bank", "part mass, surface", "surroundings"]) expect(text).toContain(row);
  });

  it("plots power, coil current, tank voltage, efficiency and μr against temperature", () => {
    const titles = findAll(doc, "svg").flatMap((svg) => findAll(svg, "text").map(allText));
    for (const t of ["power into part", "coil current (RMS)", "tank voltage (peak)", "efficiency (part / input)", "relative permeability μr"]) {
      expect(titles.some((x) => x.includes(t)), t).toBe(true);
    }
  });

  it("lists no concentrator line for a design without one, and lists it for one with it", () => {
    expect(html).not.toContain("concentrator core");
    expect(studyTextReport(race)).not.toContain("concentrator core");
    const plate = studyHeater(loadExample("study-plate-warmer.json"), { heatUp: false });
    expect(studyHtmlReport(plate)).toContain("concentrator core");
  });

  it("formats areas and volumes in mm², cm² or m² with 4 digits (never 785400 µm²)", () => {
    expect(area(Math.PI * 0.005 ** 2)).toBe("78.54 mm²"); // a 10 mm diameter
    expect(area(Math.PI * 0.0005 ** 2 * 1000)).toBe("7.854 cm²");
    expect(area(0.0147)).toBe("147 cm²");
    expect(area(1.5)).toBe("1.5 m²");
    expect(volume(3e-5)).toBe("30 cm³");
    expect(allText(doc)).not.toMatch(/µm²|\d{5,} [mµ]/u);
  });

  it("prints caution quantities with prefixes (no 1.48e+3 V, no 30100 Hz)", () => {
    const hot = studyHeater(mutate(loadExample("study-forging-bar.json"), "supply.voltage", "150 V"), { temperatureScan: false, impedanceSweep: false });
    const text = studyHtmlReport(hot);
    expect(text).not.toMatch(/\de\+\d/u);
    expect(text).not.toMatch(/\d{5,} Hz/u);
  });

  it("escapes control characters of the title so the page stays well-formed", () => {
    const evil = studyHeater(mutate(loadExample("study-bearing-race.json"), "title", "race \u001b[2J"), { heatUp: false });
    const page = studyHtmlReport(evil);
    expect(() => parseXml(page, true)).not.toThrow();
    expect(page).toContain("race \\x1B[2J");
  });
});

describe("chart reference-line labels never overprint", () => {
  it("labels of close vertical lines are stacked in rows, and of close horizontal lines moved along", () => {
    const svg = lineChart({
      title: "t", xLabel: "x", yLabel: "y", xUnit: "", yUnit: "",
      series: [{ name: "s", x: [0, 100], y: [0, 100] }],
      referenceLines: [
        { axis: "x", value: 50, label: "empty coil" },
        { axis: "x", value: 51, label: "loaded" },
        { axis: "x", value: 52, label: "at target" },
        { axis: "y", value: 40, label: "target" },
        { axis: "y", value: 41, label: "Curie point" },
      ],
    });
    const labels = findAll(parseXml(svg), "text").filter((t) => t.attributes.class === "reference-label");
    expect(labels).toHaveLength(5);
    const boxes = labels.map((t) => {
      const x = Number(t.attributes.x);
      const y = Number(t.attributes.y);
      return { x0: x, x1: x + 6.6 * Array.from(allText(t)).length, y0: y - 11, y1: y };
    });
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i];
        const b = boxes[j];
        if (a === undefined || b === undefined) continue;
        const overlap = a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
        expect(overlap, `${allText(labels[i] as never)} / ${allText(labels[j] as never)}`).toBe(false);
      }
    }
  });
});
