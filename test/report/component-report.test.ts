import { describe, expect, it } from "vitest";
import { celsius, eCore, InputError, inductorDesign, inductorTurnsSweep, inventedExampleFerrite, transformerDesign } from "../../src/index.js";
import type { InductorDesignOptions, TransformerDesignOptions } from "../../src/index.js";
import { inductorHtmlReport, inductorPlots, transformerHtmlReport, transformerPlots } from "../../src/report/index.js";
import { allText, findAll, parseXml } from "../cli/xml.js";

const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
const choke: InductorDesignOptions = {
  inductance: 100e-6, frequency: 100e3, core, material: inventedExampleFerrite, ambientTemperature: celsius(40), maxFluxDensityRatio: 0.7,
  current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
  conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
};
const bridge: TransformerDesignOptions = {
  frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
  core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
  coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
  primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } },
  secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
  sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
  resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 },
};

const texts = (svg: string): string[] => findAll(parseXml(svg), "text").map(allText);

describe("inductorPlots", () => {
  const plots = inductorPlots(choke);

  it("draws six well-formed SVG plots with their titles", () => {
    expect(plots.map((p) => p.id)).toEqual(["loss-turns", "loss-flux-density", "loss-gap", "temperature-turns", "waveform", "loss-split"]);
    const titles = ["Loss against turns", "Loss against peak flux density", "Loss against gap length", "Temperature rise against turns", "Current and flux density over one period", "Where the loss goes"];
    plots.forEach((p, i) => {
      expect(p.svg.startsWith("<svg")).toBe(true);
      expect(texts(p.svg)).toContain(titles[i]);
      expect(p.caption.length).toBeGreaterThan(20);
    });
  });

  it("marks the design and the least-loss turns found by the sweep", () => {
    const sweep = inductorTurnsSweep({ design: choke });
    const design = inductorDesign(choke);
    const t = texts(plots[0]!.svg);
    expect(t.some((x) => x.includes(`design (${design.turns} turns)`))).toBe(true);
    expect(t.some((x) => x.includes(`least loss (${sweep.leastLoss!.turns} turns)`))).toBe(true);
    expect(plots[0]!.caption).toContain(`at ${sweep.leastLoss!.turns} turns`);
    // The flux limit of the material (0.7 × 0.4 T) is drawn on the flux-density plot.
    expect(texts(plots[1]!.svg).some((x) => x.includes("flux limit 280 mT"))).toBe(true);
  });

  it("splits the loss into core, DC winding and ripple winding loss that sum to the design's total", () => {
    const d = inductorDesign(choke);
    const dc = d.dcResistance * d.currentAverage ** 2;
    const t = texts(plots[5]!.svg).join(" ");
    expect(t).toContain("core");
    expect(t).toContain("winding, DC current");
    expect(t).toContain("winding, ripple harmonics");
    expect(d.coreLoss + dc + (d.windingLoss - dc)).toBeCloseTo(d.totalLoss, 12);
  });

  it("throws InputError for a specification inductorDesign rejects", () => {
    expect(() => inductorPlots(null as never)).toThrow(InputError);
    expect(() => inductorPlots({ ...choke, inductance: -1 })).toThrow(InputError);
  });
});

describe("inductorHtmlReport", () => {
  const page = inductorHtmlReport(choke, "Plate-warmer boost choke <1>");
  const doc = parseXml(page, true);

  it("is one well-formed, self-contained document with the design, losses, cautions and plots", () => {
    expect(page.startsWith("<!DOCTYPE html>")).toBe(true);
    const headings = findAll(doc, "h2").map(allText);
    expect(headings).toEqual(["Design", "Losses and temperature", "Cautions", "Validity notes", "Plots"]);
    expect(findAll(doc, "svg")).toHaveLength(6);
    expect(findAll(doc, "script")).toHaveLength(0);
    expect(page).not.toMatch(/https?:\/\/(?!www\.w3\.org)/);
    expect(allText(findAll(doc, "h1")[0]!)).toBe("Plate-warmer boost choke &lt;1&gt;"); // the title is escaped, not markup
  });

  it("prints the design's turns and its caution about the gap's fringing", () => {
    const d = inductorDesign(choke);
    const text = allText(doc);
    expect(text).toContain(`turns${d.turns}`);
    for (const c of d.cautions) expect(text).toContain(c.code);
    expect(text).toContain("Consult local codes and licensed practice");
  });

  it("rejects a title that is not a string", () => {
    expect(() => inductorHtmlReport(choke, 3 as never)).toThrow(InputError);
  });
});

describe("transformerPlots and transformerHtmlReport", () => {
  const d = transformerDesign(bridge);

  it("draws the loss against flux density over the feasible turn pairs, the MMF diagram and the loss split", () => {
    const plots = transformerPlots(bridge);
    expect(plots.map((p) => p.id)).toEqual(["loss-flux-density", "mmf", "loss-split"]);
    for (const p of plots) parseXml(p.svg);
    const t = texts(plots[0]!.svg);
    expect(t.some((x) => x.includes(`least loss (${d.turns.primary}:${d.turns.secondary})`))).toBe(true);
    expect(t.some((x) => x.includes("flux limit 150 mT"))).toBe(true);
    expect(texts(plots[1]!.svg)).toEqual(expect.arrayContaining(["MMF across the winding window", "primary layers", "secondary layers"]));
    // One point per feasible candidate (all fewer than 60 here).
    const feasible = d.candidates.filter((c) => c.rejected === null).length;
    expect(plots[0]!.caption).toContain(`${d.turns.primary}:${d.turns.secondary}`);
    expect(feasible).toBeGreaterThan(1);
  });

  it("the MMF diagram rises across primary layers and falls across secondary ones, returning to zero (ampere-turn balance)", () => {
    const layers = d.layers;
    for (const l of layers) {
      if (l.winding === 0) expect(l.mmfEnd).toBeGreaterThan(l.mmfStart);
      else expect(l.mmfEnd).toBeLessThan(l.mmfStart);
    }
    expect(Math.abs(layers[layers.length - 1]!.mmfEnd)).toBeLessThan(1e-9);
  });

  it("writes a well-formed report with the losses by place that sum to the total", () => {
    const page = transformerHtmlReport(bridge, "Bridge transformer");
    const doc = parseXml(page, true);
    expect(findAll(doc, "h2").map(allText)).toEqual(["Design", "Losses", "Cautions", "Validity notes", "Plots"]);
    expect(findAll(doc, "svg")).toHaveLength(3);
    expect(d.losses.core + d.losses.primaryCopper + d.losses.secondaryCopper).toBeCloseTo(d.losses.total, 12);
    expect(allText(doc)).toContain(`${d.turns.primary} : ${d.turns.secondary}`);
    expect(() => transformerHtmlReport({ ...bridge, frequency: Number.NaN })).toThrow(InputError);
    expect(() => transformerPlots(undefined as never)).toThrow(InputError);
  });

  it("with fixed turns, plots the one design", () => {
    const plots = transformerPlots({ ...bridge, turns: { primary: 16, secondary: 2 } });
    expect(texts(plots[0]!.svg).some((x) => x.includes("design (16:2)"))).toBe(true);
  });
});
