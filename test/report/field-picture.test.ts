import { describe, it, expect } from "vitest";
import { studyHeater } from "../../src/index.js";
import type { HeaterDescription, HeaterFieldPicture } from "../../src/index.js";
import { contourSegments, fieldContourLevels, fieldPictureSvg } from "../../src/report/field-picture.js";
import { studyHtmlReport, studyPlots } from "../../src/report/html-report.js";
import { findAll, parseXml } from "../cli/xml.js";

/**
 * A synthetic picture: |B| a Gaussian hill centred on (r, z) = (20 mm, 0) (its contours are
 * circles about that centre, smaller for higher levels), the power density in a part 0–8 mm ×
 * ±30 mm falling off exponentially from the part's surface.
 */
function syntheticPicture(): HeaterFieldPicture {
  const r = Array.from({ length: 81 }, (_, i) => (i * 0.04) / 80);
  const z = Array.from({ length: 161 }, (_, j) => -0.04 + (j * 0.08) / 160);
  const fluxDensity: number[] = [];
  for (const zj of z) for (const ri of r) fluxDensity.push(0.05 * Math.exp(-((ri - 0.022) ** 2 + zj ** 2) / 0.01 ** 2));
  const pr = [0, 0.004, 0.006, 0.007, 0.0075, 0.0078, 0.008];
  const pz = [-0.03, -0.01, 0.01, 0.03];
  const values: number[] = [];
  for (let j = 0; j + 1 < pz.length; j++) for (let i = 0; i + 1 < pr.length; i++) values.push(1e9 * Math.exp(-(0.008 - 0.5 * (pr[i]! + pr[i + 1]!)) / 5e-4));
  return {
    temperature: 293.15,
    frequency: 25e3,
    coilCurrentRms: 400,
    r,
    z,
    fluxDensity,
    powerDensity: [{ r: pr, z: pz, values }],
    turns: [0, 1, 2, 3].map((k) => ({ r: 0.038, z: -0.012 + k * 0.008, radius: 0.003, innerRadius: 0.002 })),
    part: [{ rMin: 0, rMax: 0.008, zMin: -0.03, zMax: 0.03 }],
    passive: [],
  };
}

describe("the field picture (SVG)", () => {
  it("is a well-formed SVG document with contours, power-density cells, turns and the part", () => {
    const svg = fieldPictureSvg(syntheticPicture());
    const root = parseXml(svg);
    expect(root.name).toBe("svg");
    expect(root.attributes.xmlns).toBe("http://www.w3.org/2000/svg");
    expect(findAll(root, "path").filter((p) => p.attributes.class === "contour").length).toBe(9);
    expect(findAll(root, "circle").filter((c) => c.attributes.class === "turn").length).toBe(4);
    expect(findAll(root, "rect").filter((c) => c.attributes.class === "part").length).toBe(1);
  });

  it("draws contour levels in ascending order, each enclosing the next (nested circles about the peak)", () => {
    const picture = syntheticPicture();
    const root = parseXml(fieldPictureSvg(picture));
    const contours = findAll(root, "path").filter((p) => p.attributes.class === "contour");
    const levels = contours.map((p) => Number(p.attributes["data-level"]));
    for (let k = 1; k < levels.length; k++) expect(levels[k]!).toBeGreaterThan(levels[k - 1]!);
    // the mean distance of each contour's points from the centroid shrinks as the level rises
    const radii = contours.map((p) => {
      const numbers = (p.attributes.d ?? "").match(/-?\d+(\.\d+)?/g)!.map(Number);
      const xs = numbers.filter((_, i) => i % 2 === 0);
      const ys = numbers.filter((_, i) => i % 2 === 1);
      const cx = xs.reduce((a, b) => a + b, 0) / xs.length;
      const cy = ys.reduce((a, b) => a + b, 0) / ys.length;
      const d = xs.map((x, i) => Math.hypot(x - cx, ys[i]! - cy));
      const mean = d.reduce((a, b) => a + b, 0) / d.length;
      // a circle: every point near the mean distance (the lowest levels are cut by the part and the turns)
      return { mean, spread: Math.max(...d.map((x) => Math.abs(x / mean - 1))) };
    });
    for (let k = 1; k < radii.length; k++) expect(radii[k]!.mean).toBeLessThan(radii[k - 1]!.mean);
    for (const c of radii.slice(5)) expect(c.spread).toBeLessThan(0.05);
  });

  it("puts the marching-squares points on the level (linear interpolation along cell edges)", () => {
    // a plane rising along r: the level-0.5 contour is the vertical line i = 2.5
    const columns = 6;
    const rows = 4;
    const values = Array.from({ length: columns * rows }, (_, k) => (k % columns) / 5);
    const segments = contourSegments(values, columns, rows, 0.5);
    expect(segments.length).toBe(rows - 1);
    for (const [i0, , i1] of segments) {
      expect(i0).toBeCloseTo(2.5, 12);
      expect(i1).toBeCloseTo(2.5, 12);
    }
    expect(fieldContourLevels({ ...syntheticPicture(), fluxDensity: [0, 0] })).toEqual([]);
  });

  it("shows power density only inside the part's outline, darker towards the surface", () => {
    const root = parseXml(fieldPictureSvg(syntheticPicture()));
    const part = findAll(root, "rect").find((c) => c.attributes.class === "part")!;
    const px = Number(part.attributes.x);
    const py = Number(part.attributes.y);
    const pw = Number(part.attributes.width);
    const ph = Number(part.attributes.height);
    const cells = findAll(root, "rect").filter((c) => c.attributes["data-power-density"] !== undefined);
    expect(cells.length).toBe(18);
    for (const c of cells) {
      const x = Number(c.attributes.x);
      const y = Number(c.attributes.y);
      expect(x).toBeGreaterThanOrEqual(px - 0.01);
      expect(y).toBeGreaterThanOrEqual(py - 0.01);
      expect(x + Number(c.attributes.width)).toBeLessThanOrEqual(px + pw + 0.02);
      expect(y + Number(c.attributes.height)).toBeLessThanOrEqual(py + ph + 0.02);
    }
    // colours darken (sum of RGB falls) as the density rises
    const brightness = (c: (typeof cells)[number]): number => {
      const hex = c.attributes.fill!.slice(1);
      return parseInt(hex.slice(0, 2), 16) + parseInt(hex.slice(2, 4), 16) + parseInt(hex.slice(4, 6), 16);
    };
    const sorted = [...cells].sort((a, b) => Number(a.attributes["data-power-density"]) - Number(b.attributes["data-power-density"]));
    for (let k = 1; k < sorted.length; k++) expect(brightness(sorted[k]!)).toBeLessThanOrEqual(brightness(sorted[k - 1]!));
  });

  it("joins the HTML report's plots only when the study used the field model", () => {
    const design: HeaterDescription = {
      supply: { kind: "dc-bus", voltage: "24 V", internalResistance: "10 mΩ" },
      inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "5 mΩ" },
      coil: { shape: "solenoid", radius: "20 mm", length: "32 mm", turns: 4, conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
      capacitor: { capacitance: "100 µF" },
      part: { shape: "bar", material: "mediumCarbonSteel", radius: "8 mm", length: "60 mm", targetTemperature: "300 °C" },
    };
    const options = { heatUp: false, temperatureScan: false, impedanceSweep: false } as const;
    const closed = studyHeater(design, options);
    expect(studyPlots(closed).some((p) => p.svg.includes('class="field-picture"'))).toBe(false);
    const field = studyHeater(design, { ...options, model: "field" });
    const page = studyHtmlReport(field, "small.json");
    parseXml(page, true);
    const root = parseXml(page, true);
    const pictures = findAll(root, "svg").filter((s) => s.attributes.class === "field-picture");
    expect(pictures.length).toBe(1);
    // the power density cells of the real solution are positive and inside the part
    const cells = findAll(pictures[0]!, "rect").filter((c) => c.attributes["data-power-density"] !== undefined);
    expect(cells.length).toBeGreaterThan(50);
    expect(cells.every((c) => Number(c.attributes["data-power-density"]) >= 0)).toBe(true);
  }, 300_000);
});
