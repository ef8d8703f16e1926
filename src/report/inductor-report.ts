/**
 * The plots and the HTML report of an inductor from `inductorDesign`'s specification: loss
 * against turns, flux density and gap with the optimum marked, temperature rise, the current
 * and flux over a period, and where the loss goes.
 *
 * @packageDocumentation
 */
import { inductorTurnsSweep } from "../cores/index.js";
import type { InductorDesignOptions, InductorSweepPoint, InductorTurnsSweep } from "../cores/index.js";
import { InputError } from "../core/index.js";
import { barChart, lineChart } from "./chart.js";
import type { ChartReferenceLine, ChartSeries } from "./chart.js";
import { area, celsiusText, percent, q } from "./format.js";
import { figure, table } from "./html-report.js";
import { cautionsAndNotes, checkOptions, head, tail } from "./component-page.js";
import type { ComponentPlot } from "./component-page.js";

const column = (points: readonly InductorSweepPoint[], pick: (p: InductorSweepPoint) => number, usable?: boolean): number[] =>
  points.map((p) => (usable === undefined || p.usable === usable ? pick(p) : NaN));

/** The six plots of an inductor report from its turns sweep. */
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

/** The current over one period as plain arrays. */
function currentWave(options: InductorDesignOptions): { time: number[]; current: number[] } {
  const c = options.current;
  const period = 1 / options.frequency;
  if (c.kind === "triangular") {
    return { time: [0, c.dutyCycle * period, period], current: [c.average - c.ripple / 2, c.average + c.ripple / 2, c.average - c.ripple / 2] };
  }
  return { time: Array.from(c.time), current: Array.from(c.current) };
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
