/**
 * Plots and self-contained HTML reports of magnetic components: an inductor from
 * `inductorDesign`'s specification (loss against turns, flux density and gap with the optimum
 * marked, temperature rise, the current and flux over a period, where the loss goes) and a
 * transformer from `transformerDesign`'s (loss against flux density with the optimum marked, the
 * MMF diagram across the window, losses by place).
 */
import { inductorTurnsSweep } from "../cores/index.js";
import type { InductorDesignOptions, InductorSweepPoint, InductorTurnsSweep } from "../cores/index.js";
import { InputError, requireObject } from "../core/index.js";
import { transformerDesign } from "../transformers/index.js";
import type { TransformerDesign, TransformerDesignOptions, TransformerLosses } from "../transformers/index.js";
import { barChart, escapeXml, lineChart } from "./chart.js";
import type { ChartReferenceLine, ChartSeries } from "./chart.js";
import { area, celsiusText, percent, q } from "./format.js";
import { CSS, figure, table } from "./html-report.js";

/** Most candidates of a transformer search re-run for the loss-split plot. */
const MAX_TRANSFORMER_POINTS = 60;

/**
 * One plot of a component report.
 *
 * @category Reports and charts
 */
export interface ComponentPlot {
  /** Short stable name of the plot (`"loss-turns"`, `"mmf"`, …). */
  readonly id: string;
  /** The plot, an `<svg>` element as text. */
  readonly svg: string;
  /** What it shows, one paragraph. */
  readonly caption: string;
}

const column = (points: readonly InductorSweepPoint[], pick: (p: InductorSweepPoint) => number, usable?: boolean): number[] =>
  points.map((p) => (usable === undefined || p.usable === usable ? pick(p) : NaN));

function inductorPlotsOf(options: InductorDesignOptions, sweep: InductorTurnsSweep): ComponentPlot[] {
  const plots: ComponentPlot[] = [];
  const points = sweep.points;
  const d = sweep.design;
  const best = sweep.leastLoss;
  const turns = points.map((p) => p.turns);
  const bsat = options.material.saturationFluxDensity;
  const ratio = options.maxFluxDensityRatio ?? 0.8;
  // The design is a vertical line; the least-loss point a marked point on the curve it lies on.
  const marks = (designValue: number): ChartReferenceLine[] => [
    { axis: "x", value: designValue, label: best !== null && best.turns === d.turns ? `design = least loss (${d.turns} turns)` : `design (${d.turns} turns)` },
  ];
  const optimum = (x: (p: InductorSweepPoint) => number, y: (p: InductorSweepPoint) => number): ChartSeries[] =>
    best === null ? [] : [{ name: `least loss (${best.turns} turns)`, x: [x(best)], y: [y(best)], markers: true }];
  const lossSeries = (x: number[], at: (p: InductorSweepPoint) => number): ChartSeries[] => [
    { name: "total loss", x, y: column(points, (p) => p.design.totalLoss, true) },
    { name: "total loss (flux limit or window exceeded)", x, y: column(points, (p) => p.design.totalLoss, false) },
    { name: "core loss", x, y: column(points, (p) => p.design.coreLoss) },
    { name: "winding loss", x, y: column(points, (p) => p.design.windingLoss) },
    ...optimum(at, (p) => p.design.totalLoss),
  ];
  const optimumText =
    best === null
      ? "No swept turn count meets the flux limit and fits the window."
      : `The least total loss among usable turn counts is ${q(best.design.totalLoss, "W")} at ${best.turns} turns${sweep.leastLossAtRangeEnd ? " (at the end of the swept range: the optimum may lie beyond it)" : ""}; the design takes the fewest turns within the flux limit, ${d.turns}, with ${q(d.totalLoss, "W")}.`;
  plots.push({
    id: "loss-turns",
    svg: lineChart({
      title: "Loss against turns", xLabel: "turns", yLabel: "loss", yUnit: "W", series: lossSeries(turns, (p) => p.turns),
      referenceLines: marks(d.turns), idPrefix: "inductor-loss-turns",
    }),
    caption: `Core loss (iGSE) falls and winding loss rises with the turns; the gap follows from the inductance at each count. ${optimumText}`,
  });
  const flux = points.map((p) => p.peakFluxDensityNarrowest);
  const minimumArea = options.core.minimumArea > 0 ? options.core.minimumArea : options.core.effectiveArea;
  const designFlux = d.peakFluxDensity * (options.core.effectiveArea / minimumArea);
  const fluxLines = marks(designFlux);
  fluxLines.push({ axis: "x", value: ratio * bsat, label: `flux limit ${q(ratio * bsat, "T", 3)}` });
  plots.push({
    id: "loss-flux-density",
    svg: lineChart({
      title: "Loss against peak flux density", xLabel: "peak flux density (narrowest section)", xUnit: "T", yLabel: "loss", yUnit: "W",
      series: lossSeries(flux, (p) => p.peakFluxDensityNarrowest), referenceLines: fluxLines, idPrefix: "inductor-loss-flux",
    }),
    caption: `The same sweep against the peak flux density in the narrowest section: the core-loss / winding-loss trade-off. Points right of the flux limit (${q(ratio * bsat, "T", 3)}, ${ratio} of saturation) are not usable.`,
  });
  const gaps = points.map((p) => p.design.gapLength);
  plots.push({
    id: "loss-gap",
    svg: lineChart({
      title: "Loss against gap length", xLabel: "gap length", xUnit: "m", yLabel: "loss", yUnit: "W",
      series: lossSeries(gaps, (p) => p.design.gapLength), referenceLines: marks(d.gapLength), idPrefix: "inductor-loss-gap",
    }),
    caption: "The same sweep against the gap that gives the inductance: a longer gap takes more turns and lowers the flux density. Gaps longer than a few times the distance from the winding add fringing loss the winding model does not include (see the cautions).",
  });
  const hotLimit = (options.maxSurfaceTemperature ?? 373.15) - options.ambientTemperature;
  plots.push({
    id: "temperature-turns",
    svg: lineChart({
      title: "Temperature rise against turns", xLabel: "turns", yLabel: "surface temperature rise", yUnit: "K",
      series: [{ name: "temperature rise", x: turns, y: points.map((p) => p.design.temperatureRise) }, ...optimum((p) => p.turns, (p) => p.design.temperatureRise)],
      referenceLines: [...marks(d.turns), ...(hotLimit > 0 ? [{ axis: "y" as const, value: hotLimit, label: `hot-spot caution above ${celsiusText(options.maxSurfaceTemperature ?? 373.15)}` }] : [])],
      idPrefix: "inductor-temperature",
    }),
    caption: `Surface temperature rise above the ${celsiusText(options.ambientTemperature)} ambient (natural convection and radiation from the core's outer surface); the inside of the winding runs hotter.`,
  });
  const wave = currentWave(options);
  const perAmp = d.currentPeak > 0 ? d.peakFluxDensity / d.currentPeak : 0;
  plots.push({
    id: "waveform",
    svg: lineChart({
      title: "Current and flux density over one period", xLabel: "time", xUnit: "s", yLabel: "current", yUnit: "A",
      series: [
        { name: "winding current", x: wave.time, y: wave.current },
        { name: "flux density (effective area)", x: wave.time, y: wave.current.map((i) => i * perAmp), axis: "secondary" },
      ],
      secondaryAxis: { label: "flux density", unit: "T" }, idPrefix: "inductor-waveform",
    }),
    caption: `The current over one period and the flux density that follows it (${q(perAmp, "T/A", 3)}); swing ${q(d.fluxDensitySwing, "T")} peak to peak, peak ${q(d.peakFluxDensity, "T")}.`,
  });
  const dcPart = d.dcResistance * d.currentAverage * d.currentAverage;
  plots.push({
    id: "loss-split",
    svg: barChart({
      title: "Where the loss goes", valueLabel: "loss", unit: "W", showShare: true,
      bars: [
        { label: "core", value: d.coreLoss },
        { label: "winding, DC current", value: dcPart },
        { label: "winding, ripple harmonics", value: Math.max(0, d.windingLoss - dcPart) },
      ],
    }),
    caption: `Total ${q(d.totalLoss, "W")} at ${d.turns} turns: core loss by the iGSE over the real flux waveform, winding loss of the DC current and of the ripple's harmonics (loss-weighted AC factor ${d.rippleAcFactor.toPrecision(3)}).`,
  });
  return plots;
}

function currentWave(options: InductorDesignOptions): { time: number[]; current: number[] } {
  const c = options.current;
  const period = 1 / options.frequency;
  if (c.kind === "triangular") {
    return { time: [0, c.dutyCycle * period, period], current: [c.average - c.ripple / 2, c.average + c.ripple / 2, c.average - c.ripple / 2] };
  }
  return { time: Array.from(c.time), current: Array.from(c.current) };
}

function checkOptions(where: string, options: unknown): void {
  requireObject(where, "options", options);
}

/**
 * The plots of an inductor report, as SVG strings with captions: total, core and winding loss
 * against turns, against the peak flux density and against the gap length (the design and the
 * turns of least loss marked, unusable counts drawn apart), the temperature rise against turns,
 * the current and flux density over one period, and where the loss goes. The curves come from
 * `inductorTurnsSweep` (of `fluxwright/cores`) over its default range.
 *
 * @param options - the inductor's specification, as for `inductorDesign`
 * @returns the plots, each with a stable `id`, an `<svg>` string and a caption
 * @throws {@link InputError} on a specification `inductorDesign` rejects
 * @example
 * ```ts
 * import { eCore, inventedExampleFerrite, celsius } from "fluxwright";
 * import { inductorPlots } from "fluxwright/report";
 * const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
 * const plots = inductorPlots({ inductance: 100e-6, frequency: 100e3, core, material: inventedExampleFerrite,
 *   current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
 *   conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
 *   ambientTemperature: celsius(40), maxFluxDensityRatio: 0.7 });
 * console.log(plots.map((p) => p.id).join(" ")); // loss-turns loss-flux-density loss-gap temperature-turns waveform loss-split
 * ```
 * @category Reports and charts
 */
export function inductorPlots(options: InductorDesignOptions): ComponentPlot[] {
  checkOptions("inductorPlots", options);
  return inductorPlotsOf(options, inductorTurnsSweep({ design: options }));
}

function head(title: string, subtitle: string): string[] {
  return [
    "<!DOCTYPE html>",
    `<html lang="en"><head><meta charset="utf-8"/><meta name="viewport" content="width=device-width, initial-scale=1"/>`,
    `<title>${escapeXml(title)} — fluxwright</title><style>${CSS}</style></head><body>`,
    `<h1>${escapeXml(title)}</h1>`,
    `<p class="meta">${escapeXml(subtitle)} Numbers in SI with engineering prefixes; temperatures in °C.</p>`,
  ];
}

function cautionsAndNotes(parts: string[], cautions: readonly { code: string; severity: string; message: string; source: string }[], validity: readonly { code: string; message: string }[]): void {
  parts.push(`<h2>Cautions</h2>`);
  if (cautions.length === 0) parts.push("<p>None raised.</p>");
  for (const c of cautions) {
    parts.push(`<div class="caution ${escapeXml(c.severity)}"><strong>${escapeXml(c.severity)}</strong> <code>${escapeXml(c.code)}</code>: ${escapeXml(c.message)} <span class="meta">(source: ${escapeXml(c.source)})</span></div>`);
  }
  parts.push(`<h2>Validity notes</h2>`);
  if (validity.length === 0) parts.push("<p>None.</p>");
  else parts.push(`<ul>${validity.map((v) => `<li><code>${escapeXml(v.code)}</code>: ${escapeXml(v.message)}</li>`).join("")}</ul>`);
}

function tail(parts: string[]): string {
  parts.push(`<p class="meta">Cautions are data from the models, not a safety assessment. Consult local codes and licensed practice.</p>`);
  parts.push(`</body></html>`);
  return parts.join("\n") + "\n";
}

/**
 * A self-contained HTML report of an inductor (inline CSS and SVG, no scripts, XML-compatible):
 * the design (turns, gap, flux, currents, winding layout, losses, temperature), its cautions and
 * validity notes, the plots of {@link inductorPlots}, and the turns of least loss.
 *
 * @param options - the inductor's specification, as for `inductorDesign`
 * @param title - heading of the report (default `"Inductor"`)
 * @returns the HTML document as text
 * @throws {@link InputError} on a specification `inductorDesign` rejects, or a title that is not a string
 * @example
 * ```ts
 * import { eCore, inventedExampleFerrite, celsius } from "fluxwright";
 * import { inductorHtmlReport } from "fluxwright/report";
 * const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
 * const page = inductorHtmlReport({ inductance: 100e-6, frequency: 100e3, core, material: inventedExampleFerrite,
 *   current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
 *   conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
 *   ambientTemperature: celsius(40), maxFluxDensityRatio: 0.7 }, "Plate-warmer boost choke");
 * console.log(page.startsWith("<!DOCTYPE html>"), page.includes("<h2>Design</h2>")); // true true
 * ```
 * @category Reports and charts
 */
export function inductorHtmlReport(options: InductorDesignOptions, title = "Inductor"): string {
  checkOptions("inductorHtmlReport", options);
  if (typeof title !== "string") throw new InputError("inductorHtmlReport", "title", title, "", "a string");
  const sweep = inductorTurnsSweep({ design: options });
  const d = sweep.design;
  const parts = head(title, "fluxwright inductor design (inductorDesign).");
  parts.push(`<h2>Design</h2>`);
  parts.push(
    table([
      ["inductance", q(d.inductance, "H")],
      ["turns", String(d.turns)],
      ["gap length (total, winding leg)", q(d.gapLength, "m")],
      ["fringing factor", d.fringingFactor.toPrecision(4)],
      ["peak flux density (effective area)", q(d.peakFluxDensity, "T")],
      ["flux density swing (peak to peak)", q(d.fluxDensitySwing, "T")],
      ["saturation current", q(d.saturationCurrent, "A")],
      ["current: average, RMS, peak, ripple", `${q(d.currentAverage, "A")}, ${q(d.currentRms, "A")}, ${q(d.currentPeak, "A")}, ${q(d.currentRipple, "A")}`],
      ["winding: layers × turns per layer", `${d.layers} × ${d.turnsPerLayer}`],
      ["window fill", percent(d.windowFill)],
      ["core: effective area, window area", `${area(options.core.effectiveArea)}, ${area(options.core.windowArea)}`],
      ["DC resistance (at temperature)", q(d.dcResistance, "Ω")],
      ["ripple AC factor", d.rippleAcFactor.toPrecision(4)],
    ]),
  );
  parts.push(`<h2>Losses and temperature</h2>`);
  parts.push(
    table(
      [
        ["core (iGSE)", q(d.coreLoss, "W"), percent(d.totalLoss > 0 ? d.coreLoss / d.totalLoss : null)],
        ["winding", q(d.windingLoss, "W"), percent(d.totalLoss > 0 ? d.windingLoss / d.totalLoss : null)],
        ["total", q(d.totalLoss, "W"), "100.0 %"],
      ],
      ["place", "loss", "share"],
    ),
  );
  const best = sweep.leastLoss;
  parts.push(
    table([
      ["surface temperature", `${celsiusText(d.surfaceTemperature)} (rise ${q(d.temperatureRise, "K")} over ${celsiusText(options.ambientTemperature)})`],
      ["turns of least loss (swept)", best === null ? "none usable" : `${best.turns} turns, ${q(best.design.totalLoss, "W")}${sweep.leastLossAtRangeEnd ? " (range end)" : ""}`],
      ["turns swept", sweep.points.length === 0 ? "—" : `${sweep.points[0]?.turns ?? ""} … ${sweep.points[sweep.points.length - 1]?.turns ?? ""}`],
    ]),
  );
  cautionsAndNotes(parts, d.cautions, d.validity);
  parts.push(`<h2>Plots</h2>`);
  for (const p of inductorPlotsOf(options, sweep)) parts.push(figure(p.svg, p.caption));
  return tail(parts);
}

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
