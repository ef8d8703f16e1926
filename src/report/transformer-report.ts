/**
 * The plots and the HTML report of a transformer from `transformerDesign`'s specification:
 * loss against flux density with the optimum marked, the MMF diagram across the window, and
 * losses by place.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { transformerDesign } from "../transformers/index.js";
import type { TransformerDesign, TransformerDesignOptions, TransformerLosses } from "../transformers/index.js";
import { barChart, lineChart } from "./chart.js";
import { celsiusText, percent, q } from "./format.js";
import { figure, table } from "./html-report.js";
import { cautionsAndNotes, checkOptions, head, tail } from "./component-page.js";
import type { ComponentPlot } from "./component-page.js";

/** Most candidates of a transformer search re-run for the loss-split plot. */
const MAX_TRANSFORMER_POINTS = 60;

interface TransformerPoint {
  flux: number;
  losses: TransformerLosses;
  primary: number;
  secondary: number;
}

function transformerPoints(options: TransformerDesignOptions, d: TransformerDesign): TransformerPoint[] {
  const feasible = d.candidates.filter((c) => c.rejected === null);
  if (options.turns !== undefined || feasible.length <= 1) {
    return [{ flux: d.peakFluxDensity, losses: d.losses, primary: d.turns.primary, secondary: d.turns.secondary }];
  }
  const step = Math.max(1, Math.ceil(feasible.length / MAX_TRANSFORMER_POINTS));
  const points: TransformerPoint[] = [];
  for (let i = 0; i < feasible.length; i++) {
    const c = feasible[i];
    if (c === undefined) continue;
    const chosen = c.primaryTurns === d.turns.primary && c.secondaryTurns === d.turns.secondary;
    if (!chosen && i % step !== 0 && i !== feasible.length - 1) continue;
    const r = chosen ? d : transformerDesign({ ...options, turns: { primary: c.primaryTurns, secondary: c.secondaryTurns } });
    points.push({ flux: r.peakFluxDensity, losses: r.losses, primary: c.primaryTurns, secondary: c.secondaryTurns });
  }
  return points.sort((a, b) => a.flux - b.flux);
}

function transformerPlotsOf(options: TransformerDesignOptions, d: TransformerDesign): ComponentPlot[] {
  const plots: ComponentPlot[] = [];
  const pts = transformerPoints(options, d);
  const x = pts.map((p) => p.flux);
  plots.push({
    id: "loss-flux-density",
    svg: lineChart({
      title: "Loss against peak flux density", xLabel: "peak flux density", xUnit: "T", yLabel: "loss", yUnit: "W",
      series: [
        { name: "total loss", x, y: pts.map((p) => p.losses.total) },
        { name: "core loss", x, y: pts.map((p) => p.losses.core) },
        { name: "copper loss (both windings)", x, y: pts.map((p) => p.losses.primaryCopper + p.losses.secondaryCopper) },
      ],
      referenceLines: [
        { axis: "x", value: d.peakFluxDensity, label: options.turns === undefined ? `least loss (${d.turns.primary}:${d.turns.secondary})` : `design (${d.turns.primary}:${d.turns.secondary})` },
        { axis: "x", value: options.maxFluxDensity, label: `flux limit ${q(options.maxFluxDensity, "T", 3)}` },
      ],
      xRange: [0, 1.1 * Math.max(options.maxFluxDensity, ...x)],
      idPrefix: "transformer-loss-flux",
    }),
    caption: `Each whole-turn pair the search found feasible (peak flux density within ${q(options.maxFluxDensity, "T", 3)}, layers within the window), wound and evaluated: fewer turns raise the flux density and the core loss and shorten the windings. The design takes the least total loss, ${q(d.losses.total, "W")} at ${d.turns.primary}:${d.turns.secondary} turns.`,
  });
  const px: number[] = [];
  const py: number[] = [];
  const sx: number[] = [];
  const sy: number[] = [];
  for (const layer of d.layers) {
    const xs = layer.winding === 0 ? px : sx;
    const ys = layer.winding === 0 ? py : sy;
    const other = layer.winding === 0 ? [sx, sy] : [px, py];
    xs.push(layer.position, layer.position + layer.thickness);
    ys.push(layer.mmfStart, layer.mmfEnd);
    other[0]?.push(NaN);
    other[1]?.push(NaN);
  }
  // The spacers between layers carry the MMF of the face before them.
  const gx: number[] = [];
  const gy: number[] = [];
  for (let i = 0; i + 1 < d.layers.length; i++) {
    const a = d.layers[i];
    const b = d.layers[i + 1];
    if (a === undefined || b === undefined) continue;
    gx.push(a.position + a.thickness, b.position, NaN);
    gy.push(a.mmfEnd, b.mmfStart, NaN);
  }
  plots.push({
    id: "mmf",
    svg: lineChart({
      title: "MMF across the winding window", xLabel: "position across the build", xUnit: "m", yLabel: "MMF per ampere of primary current", yUnit: "A/A",
      series: [
        { name: "primary layers", x: px, y: py },
        { name: "secondary layers", x: sx, y: sy },
        { name: "insulation between layers", x: gx, y: gy },
      ],
      referenceLines: [{ axis: "y", value: 0, label: "zero MMF" }],
      idPrefix: "transformer-mmf",
    }),
    caption: `The magnetomotive force across the window from the first layer's face (per ampere of primary current): it rises across each primary layer and falls across each secondary one. Interleaving keeps its peak low, which lowers the proximity loss and the leakage inductance (${q(d.leakageInductance, "H")} referred to the primary).`,
  });
  plots.push({
    id: "loss-split",
    svg: barChart({
      title: "Where the loss goes", valueLabel: "loss", unit: "W", showShare: true,
      bars: [
        { label: "core", value: d.losses.core },
        { label: "primary winding", value: d.losses.primaryCopper },
        { label: "secondary winding", value: d.losses.secondaryCopper },
      ],
    }),
    caption: `Total ${q(d.losses.total, "W")}; winding AC factors ${d.windings[0].acFactor.toPrecision(3)} (primary) and ${d.windings[1].acFactor.toPrecision(3)} (secondary).`,
  });
  return plots;
}

/**
 * The plots of a transformer report, as SVG strings with captions: total, core and copper loss
 * against the peak flux density over the feasible turn pairs of `transformerDesign`'s search
 * (each re-wound and evaluated; at most 60 of them, evenly picked, the chosen one always) with
 * the least-loss design and the flux limit marked; the MMF diagram across the winding window;
 * and where the loss goes. With fixed `turns` the loss plot holds the one design.
 *
 * @param options - the transformer's specification, as for `transformerDesign`
 * @returns the plots, each with a stable `id`, an `<svg>` string and a caption
 * @throws {@link InputError} on a specification `transformerDesign` rejects
 * @example
 * ```ts
 * import { transformerPlots } from "fluxwright/report";
 * const plots = transformerPlots({ frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
 *   core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
 *   coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
 *   primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } },
 *   secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
 *   sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
 *   resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 } });
 * console.log(plots.map((p) => p.id).join(" ")); // loss-flux-density mmf loss-split
 * ```
 * @category Reports and charts
 */
export function transformerPlots(options: TransformerDesignOptions): ComponentPlot[] {
  checkOptions("transformerPlots", options);
  return transformerPlotsOf(options, transformerDesign(options));
}

/**
 * A self-contained HTML report of a transformer (inline CSS and SVG, no scripts,
 * XML-compatible): turns, flux density, losses by place, winding resistances, leakage
 * inductance, build and temperature, the cautions and validity notes, and the plots of
 * {@link transformerPlots}.
 *
 * @param options - the transformer's specification, as for `transformerDesign`
 * @param title - heading of the report (default `"Transformer"`)
 * @returns the HTML document as text
 * @throws {@link InputError} on a specification `transformerDesign` rejects, or a title that is not a string
 * @example
 * ```ts
 * import { transformerHtmlReport } from "fluxwright/report";
 * const page = transformerHtmlReport({ frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
 *   core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
 *   coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
 *   primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } },
 *   secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
 *   sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
 *   resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 } }, "Bridge transformer");
 * console.log(page.includes("<h2>Losses</h2>")); // true
 * ```
 * @category Reports and charts
 */
export function transformerHtmlReport(options: TransformerDesignOptions, title = "Transformer"): string {
  checkOptions("transformerHtmlReport", options);
  if (typeof title !== "string") throw new InputError("transformerHtmlReport", "title", title, "", "a string");
  const d = transformerDesign(options);
  const parts = head(title, "fluxwright transformer design (transformerDesign).");
  parts.push(`<h2>Design</h2>`);
  parts.push(
    table([
      ["turns (primary : secondary)", `${d.turns.primary} : ${d.turns.secondary}`],
      ["peak flux density", q(d.peakFluxDensity, "T")],
      ["layers", String(d.layers.length)],
      ["build across the window", `${q(d.build, "m")} of ${q(options.core.windowWidth, "m")}`],
      ["leakage inductance (referred to the primary)", q(d.leakageInductance, "H")],
      ["primary: DC, AC resistance, AC factor", `${q(d.windings[0].dcResistance, "Ω")}, ${q(d.windings[0].acResistance, "Ω")}, ${d.windings[0].acFactor.toPrecision(4)}`],
      ["secondary: DC, AC resistance, AC factor", `${q(d.windings[1].dcResistance, "Ω")}, ${q(d.windings[1].acResistance, "Ω")}, ${d.windings[1].acFactor.toPrecision(4)}`],
      ["surface temperature", `${celsiusText(d.temperature.surfaceTemperature)} (rise ${q(d.temperature.surfaceTemperature - options.ambientTemperature, "K")})`],
      ["turn pairs tried by the search", String(d.candidates.length)],
    ]),
  );
  parts.push(`<h2>Losses</h2>`);
  const t = d.losses.total;
  parts.push(
    table(
      [
        ["core", q(d.losses.core, "W"), percent(t > 0 ? d.losses.core / t : null)],
        ["primary winding", q(d.losses.primaryCopper, "W"), percent(t > 0 ? d.losses.primaryCopper / t : null)],
        ["secondary winding", q(d.losses.secondaryCopper, "W"), percent(t > 0 ? d.losses.secondaryCopper / t : null)],
        ["total", q(t, "W"), "100.0 %"],
      ],
      ["place", "loss", "share"],
    ),
  );
  cautionsAndNotes(parts, d.cautions, d.validity);
  parts.push(`<h2>Plots</h2>`);
  for (const p of transformerPlotsOf(options, d)) parts.push(figure(p.svg, p.caption));
  return tail(parts);
}
