/**
 * The self-contained HTML report of a heater study: inline CSS, inline SVG plots (no scripts,
 * no network), written in XML-compatible HTML so that it parses both as HTML and as XML.
 */
import type { HeaterStudy } from "../study/index.js";
import { requireStudy } from "./checks.js";
import { ZERO_CELSIUS } from "../units/index.js";
import { barChart, escapeXml, lineChart } from "./chart.js";
import type { ChartReferenceLine, ChartSeries } from "./chart.js";
import { celsiusText, duration, percent, q } from "./format.js";
import { designRows, lossEntries, operatingRows } from "./text-report.js";
import { POWER_DENSITY_DECADES, fieldPictureSvg } from "./field-picture.js";

export const CSS = `
body { font-family: 'DejaVu Sans', 'Helvetica Neue', Arial, sans-serif; color: #222; max-width: 60rem; margin: 2rem auto; padding: 0 1rem; line-height: 1.45; }
h1 { font-size: 1.5rem; margin-bottom: 0.2rem; }
h2 { font-size: 1.15rem; margin-top: 2rem; border-bottom: 1px solid #ccc; padding-bottom: 0.2rem; }
.meta { color: #555; font-size: 0.9rem; }
table { border-collapse: collapse; margin: 0.5rem 0; font-size: 0.92rem; }
th, td { padding: 0.2rem 0.7rem; text-align: right; border-bottom: 1px solid #e4e4e4; }
th:first-child, td:first-child { text-align: left; }
thead th { border-bottom: 2px solid #999; }
.caution { border-left: 5px solid #999; padding: 0.3rem 0.7rem; margin: 0.4rem 0; background: #f7f7f7; }
.caution.danger { border-color: #b00020; }
.caution.warning { border-color: #e07b00; }
.caution.info { border-color: #1b5e9e; }
.caution strong { text-transform: uppercase; font-size: 0.8rem; letter-spacing: 0.04em; }
figure { margin: 1rem 0; }
figure svg { max-width: 100%; height: auto; }
figcaption { font-size: 0.88rem; color: #444; }
code { font-size: 0.88rem; }
@media print { body { margin: 0; max-width: none; } h2 { break-after: avoid; } figure { break-inside: avoid; } }
`;

export function table(rows: readonly (readonly string[])[], header?: readonly string[]): string {
  const cell = (tag: "td" | "th", text: string): string => `<${tag}>${escapeXml(text)}</${tag}>`;
  const head = header === undefined ? "" : `<thead><tr>${header.map((h) => cell("th", h)).join("")}</tr></thead>`;
  return `<table>${head}<tbody>${rows.map((r) => `<tr>${r.map((c) => cell("td", c)).join("")}</tr>`).join("")}</tbody></table>`;
}

export function figure(svg: string, caption: string): string {
  return `<figure class="plot">${svg}<figcaption>${escapeXml(caption)}</figcaption></figure>`;
}

const toC = (k: number): number => k - ZERO_CELSIUS;
const degrees = (rad: number): number => (rad * 180) / Math.PI;

/**
 * One plot of a study report.
 *
 * @category Reports and charts
 */
export interface StudyPlot {
  /** The plot, an `<svg>` element as text. */
  readonly svg: string;
  /** What it shows, one paragraph. */
  readonly caption: string;
}

/**
 * The plots of a study report, as SVG strings with captions: tank impedance magnitude and
 * phase, the heat-up, power and frequency, coil current and tank voltage, efficiency and
 * permeability against part temperature, and where the power goes. Plots whose data the study
 * did not compute (`heatUp`, `temperatureScan`, `impedance` off) are left out.
 *
 * @param study - a result of `studyHeater`
 * @returns the plots, each an `<svg>` string and a one-paragraph caption
 * @throws {@link InputError} when `study` is not a study result
 * @example
 * ```ts
 * import { studyHeater } from "fluxwright";
 * import type { HeaterDescription } from "fluxwright";
 * import { studyPlots } from "fluxwright/report";
 * const design: HeaterDescription = {
 *   supply: { kind: "battery", voltage: "48 V" },
 *   inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
 *   coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6,
 *     conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
 *   capacitor: { capacitance: "4 µF" },
 *   part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm",
 *     height: "30 mm", targetTemperature: "120 °C" },
 * };
 * const plots = studyPlots(studyHeater(design, { heatUp: false }));
 * console.log(plots.length, plots[0]?.svg.startsWith("<svg")); // 6 true
 * ```
 * @category Reports and charts
 */
export function studyPlots(study: HeaterStudy): StudyPlot[] {
  requireStudy("studyPlots", study);
  const plots: StudyPlot[] = [];
  const refs: ChartReferenceLine[] = [
    { axis: "x", value: study.emptyCoil.frequency, label: "empty" },
    { axis: "x", value: study.operating.frequency, label: "loaded" },
  ];
  if (study.impedance !== null) {
    const z = study.impedance;
    plots.push({
      svg: lineChart({
        title: "Tank impedance seen by the inverter",
        xLabel: "frequency",
        yLabel: "|Z|",
        xUnit: "Hz",
        yUnit: "Ω",
        xLog: true,
        yLog: true,
        series: [
          { name: "empty coil", x: z.frequencies, y: z.magnitudeEmpty },
          { name: `with part at ${celsiusText(study.operating.partTemperature)}`, x: z.frequencies, y: z.magnitudeLoaded },
        ],
        referenceLines: refs,
        idPrefix: "impedance-magnitude",
      }),
      caption: "Magnitude of the tank impedance against frequency, with the empty coil and with the part in place (its coupling re-evaluated at each frequency). Dashed lines: operating frequencies.",
    });
    plots.push({
      svg: lineChart({
        title: "Tank impedance phase",
        xLabel: "frequency",
        yLabel: "phase",
        xUnit: "Hz",
        yUnit: "°",
        xLog: true,
        series: [
          { name: "empty coil", x: z.frequencies, y: z.phaseEmpty.map(degrees) },
          { name: `with part at ${celsiusText(study.operating.partTemperature)}`, x: z.frequencies, y: z.phaseLoaded.map(degrees) },
        ],
        referenceLines: refs,
        yRange: [-90, 90],
        idPrefix: "impedance-phase",
      }),
      caption: "Phase of the tank impedance (positive: inductive). The self-oscillating inverter runs where the phase crosses zero; a series inverter switches at zero voltage on the inductive side.",
    });
  }
  const curie = study.part.curieTemperature;
  if (study.heatUp !== null) {
    const h = study.heatUp;
    const refLines: ChartReferenceLine[] = [{ axis: "y", value: toC(study.description.part.targetTemperature), label: "target" }];
    if (curie !== null) refLines.push({ axis: "y", value: toC(curie), label: "Curie point" });
    plots.push({
      svg: lineChart({
        title: "Heat-up: part temperature and operating frequency",
        xLabel: "time",
        yLabel: "part temperature",
        xUnit: "s",
        yUnit: "°C",
        series: [
          { name: "part temperature", x: h.times, y: h.temperatures.map(toC), markers: false },
          { name: "operating frequency", x: h.times, y: h.frequencies, axis: "secondary", markers: false },
        ],
        secondaryAxis: { label: "frequency", unit: "Hz" },
        referenceLines: refLines,
        idPrefix: "heat-up",
      }),
      caption: `Part temperature (left axis) and operating frequency (right axis) against time, from the electro-thermal heat-up${h.curieCrossingTime === null ? "" : `; the part crosses its Curie point at ${duration(h.curieCrossingTime)}`}.`,
    });
    const r = h.radial;
    if (r !== null) {
      plots.push({
        svg: lineChart({
          title: "Heat-up: surface and core temperature",
          xLabel: "time",
          yLabel: "temperature",
          xUnit: "s",
          yUnit: "°C",
          series: [
            { name: "surface", x: r.times, y: r.surfaceTemperatures.map(toC), markers: false },
            { name: "core", x: r.times, y: r.coreTemperatures.map(toC), markers: false },
            { name: "mean", x: r.times, y: r.meanTemperatures.map(toC), markers: false },
          ],
          referenceLines: refLines,
          idPrefix: "surface-core",
        }),
        caption: `Surface, core and mean temperature against time from the radial model (power by depth from the exact field in the part, re-solved as each shell heats)${r.surfaceCoreDifferenceAtTarget === null ? "" : `; surface − core ${r.surfaceCoreDifferenceAtTarget.toFixed(1)} K when the heating stops`}${r.soakTime === null ? "" : `, within ${(r.soakBand ?? 0).toFixed(0)} K after a ${duration(r.soakTime)} soak`}${r.hardeningDepth === null ? "" : `; heated above the hardening temperature to ${(r.hardeningDepth * 1000).toFixed(2)} mm`}.`,
      });
    }
  }
  if (study.temperatureScan !== null) {
    const s = study.temperatureScan;
    // one segment per solved stretch: no line is drawn across a band without an operating point
    const series: ChartSeries[] = [];
    const bands = s.unsolvedBands;
    const cuts = [-Infinity, ...bands.map((b) => b.from), Infinity];
    for (let k = 0; k + 1 < cuts.length; k++) {
      const lo = k === 0 ? -Infinity : (bands[k - 1]?.to ?? -Infinity);
      const hi = cuts[k + 1] ?? Infinity;
      const idx = s.temperatures.flatMap((t, i) => (t >= lo && t <= hi ? [i] : []));
      if (idx.length === 0) continue;
      const suffix = k === 0 ? "" : ` (above ${celsiusText(lo)})`;
      series.push({ name: `power into part${suffix}`, x: idx.map((i) => toC(s.temperatures[i] ?? 0)), y: idx.map((i) => s.partPowers[i] ?? 0), markers: false });
      series.push({ name: `operating frequency${suffix}`, x: idx.map((i) => toC(s.temperatures[i] ?? 0)), y: idx.map((i) => s.frequencies[i] ?? 0), axis: "secondary", markers: false });
    }
    const scanRefs: ChartReferenceLine[] = curie === null ? [] : [{ axis: "x", value: toC(curie), label: "Curie point" }];
    for (const b of bands) {
      scanRefs.push({ axis: "x", value: toC(b.from), label: "no operating point from" });
      scanRefs.push({ axis: "x", value: toC(b.to), label: "to" });
    }
    plots.push({
      svg: lineChart({
        title: "Operating point against part temperature",
        xLabel: "part temperature",
        yLabel: "power",
        xUnit: "°C",
        yUnit: "W",
        series,
        secondaryAxis: { label: "frequency", unit: "Hz" },
        referenceLines: scanRefs,
        idPrefix: "temperature-scan",
      }),
      caption: `Power into the part (left axis) and operating frequency (right axis) against part temperature, each point a solved operating point; past the Curie point a steel part is no longer magnetic, which shows as a step in both.${bands.length === 0 ? "" : ` The heater has no operating point at ${bands.map((b) => `${celsiusText(b.from)}–${celsiusText(b.to)}`).join(", ")}: no line is drawn there and the heat-up counts no power.`}`,
    });
  }
  if (study.temperatureScan !== null && study.temperatureScan.temperatures.length > 1) {
    const s = study.temperatureScan;
    const t = s.temperatures.map(toC);
    const curieLine: ChartReferenceLine[] = curie === null ? [] : [{ axis: "x", value: toC(curie), label: "Curie point" }];
    plots.push({
      svg: lineChart({
        title: "Coil current and tank voltage against part temperature",
        xLabel: "part temperature",
        yLabel: "coil current (RMS)",
        xUnit: "°C",
        yUnit: "A",
        series: [
          { name: "coil current (RMS)", x: t, y: s.coilCurrentsRms, markers: false },
          { name: "tank voltage (peak)", x: t, y: s.tankVoltagesPeak, axis: "secondary", markers: false },
        ],
        secondaryAxis: { label: "tank voltage (peak)", unit: "V" },
        referenceLines: curieLine,
        idPrefix: "current-voltage-scan",
      }),
      caption: "RMS coil current (left axis) and peak tank voltage (right axis) against part temperature: the stresses on the coil, capacitors and switches as the part heats.",
    });
    plots.push({
      svg: lineChart({
        title: "Efficiency and permeability against part temperature",
        xLabel: "part temperature",
        yLabel: "efficiency",
        xUnit: "°C",
        yUnit: "%",
        series: [
          { name: "efficiency (part / input)", x: t, y: s.efficiencies.map((e) => 100 * e), markers: false },
          { name: "relative permeability μr", x: t, y: s.relativePermeabilities, axis: "secondary", markers: false },
        ],
        secondaryAxis: { label: "μr", unit: "" },
        yRange: [0, 100],
        referenceLines: curieLine,
        idPrefix: "efficiency-scan",
      }),
      caption: "Overall efficiency (left axis) and the part's relative permeability used for the coupling (right axis) against part temperature; μr falls to 1 at the Curie point.",
    });
  }
  const losses = lossEntries(study.operating, study.description.concentrator !== null);
  plots.push({
    svg: barChart({
      title: `Where the power goes (part at ${celsiusText(study.operating.partTemperature)})`,
      valueLabel: "power",
      unit: "W",
      bars: losses.map(([label, value]) => ({ label, value })),
      showShare: true,
    }),
    caption: `Loss breakdown at the cold operating point; the places add up to the input power ${q(study.operating.inputPower, "W")}.`,
  });
  const picture = study.field?.picture ?? null;
  if (picture !== null) {
    plots.push({
      svg: fieldPictureSvg(picture),
      caption: `The field of the coil with the part at ${celsiusText(picture.temperature)} from the field model (solveAxisymmetricField): contours of |B| (RMS) in the r–z half-plane (the axis on the left, geometric levels), and the time-average power density of the eddy currents in the part on a logarithmic colour scale (${POWER_DENSITY_DECADES} decades below its peak), on cells graded into the skin depth. The coil's turns are drawn in copper.`,
    });
  }
  return plots;
}

/**
 * Renders a study as one self-contained HTML page (inline CSS and SVG; no scripts, no
 * external resources), in XML-compatible HTML: summary, cautions, design, operating points,
 * plots, where the power goes, heat-up and validity notes.
 *
 * @param study - a result of `studyHeater`
 * @param source - the study file's name, shown under the title (optional)
 * @returns the page as text (UTF-8)
 * @throws {@link InputError} when `study` is not a study result
 * @example
 * ```ts
 * import { studyHeater } from "fluxwright";
 * import type { HeaterDescription } from "fluxwright";
 * import { studyHtmlReport } from "fluxwright/report";
 * const design: HeaterDescription = {
 *   supply: { kind: "battery", voltage: "48 V" },
 *   inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
 *   coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6,
 *     conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
 *   capacitor: { capacitance: "4 µF" },
 *   part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm",
 *     height: "30 mm", targetTemperature: "120 °C" },
 * };
 * const page = studyHtmlReport(studyHeater(design, { heatUp: false }), "race.json");
 * console.log(page.startsWith("<!DOCTYPE html>"), page.includes("<h2>Design</h2>")); // true true
 * ```
 * @category Reports and charts
 */
export function studyHtmlReport(study: HeaterStudy, source?: string): string {
  requireStudy("studyHtmlReport", study);
  const d = study.description;
  const parts: string[] = [];
  parts.push("<!DOCTYPE html>");
  parts.push(`<html lang="en"><head><meta charset="utf-8"/><meta name="viewport" content="width=device-width, initial-scale=1"/>`);
  parts.push(`<title>${escapeXml(study.title)} — fluxwright heater study</title><style>${CSS}</style></head><body>`);
  parts.push(`<h1>${escapeXml(study.title)}</h1>`);
  parts.push(`<p class="meta">fluxwright heater study${source === undefined ? "" : ` of <code>${escapeXml(source)}</code>`}. Numbers in SI with engineering prefixes; temperatures in °C.</p>`);
  parts.push(`<h2>Summary</h2>`);
  const h = study.heatUp;
  parts.push(
    table([
      ["operating frequency (empty → loaded → at target)", `${q(study.emptyCoil.frequency, "Hz")} → ${q(study.operating.frequency, "Hz")} → ${q(study.atTarget?.frequency, "Hz")}`],
      ["power into part (cold → at target)", `${q(study.operating.losses.part, "W")} → ${q(study.atTarget?.losses.part, "W")}`],
      ["efficiency (cold)", percent(study.operating.efficiency)],
      [`time to ${celsiusText(d.part.targetTemperature)}`, h === null ? "not computed" : h.reachable ? duration(h.timeToTarget) : "not reached"],
      ["tank voltage (peak)", q(study.operating.tankVoltagePeak, "V")],
      ["supply current", q(study.operating.supplyCurrent, "A")],
    ]),
  );
  parts.push(`<h2>Cautions</h2>`);
  if (study.cautions.length === 0) parts.push("<p>None raised.</p>");
  for (const c of study.cautions) {
    parts.push(`<div class="caution ${c.severity}"><strong>${escapeXml(c.severity)}</strong> <code>${escapeXml(c.code)}</code>: ${escapeXml(c.message)} <span class="meta">(source: ${escapeXml(c.source)})</span></div>`);
  }
  parts.push(`<h2>Design</h2>`);
  parts.push(table(designRows(study)));
  parts.push(`<h2>Operating points</h2>`);
  parts.push(
    table(operatingRows(study.atTarget === null ? [study.emptyCoil, study.operating] : [study.emptyCoil, study.operating, study.atTarget]), [
      "",
      "empty coil",
      `part at ${celsiusText(study.operating.partTemperature)}`,
      ...(study.atTarget === null ? [] : [`part at ${celsiusText(study.atTarget.partTemperature)}`]),
    ]),
  );
  parts.push(`<h2>Plots</h2>`);
  for (const p of studyPlots(study)) parts.push(figure(p.svg, p.caption));
  parts.push(`<h2>Where the power goes</h2>`);
  const total = study.operating.inputPower;
  parts.push(
    table(
      [...lossEntries(study.operating, d.concentrator !== null).map(([label, w]) => [label, q(w, "W"), percent(total > 0 ? w / total : null)]), ["total = input power", q(total, "W"), "100.0 %"]],
      ["place", "power", "share"],
    ),
  );
  if (h !== null) {
    parts.push(`<h2>Heat-up</h2>`);
    parts.push(
      table([
        [`time to ${celsiusText(d.part.targetTemperature)}`, h.reachable ? duration(h.timeToTarget) : "not reached"],
        ["temperature the part would settle at", celsiusText(h.steadyStateTemperature)],
        ["Curie point crossed at", h.curieCrossingTime === null ? (study.part.curieTemperature === null ? "no Curie point (non-magnetic)" : "not crossed") : duration(h.curieCrossingTime)],
        ["energy from the supply", q(h.supplyEnergy, "J")],
        ["charge from the supply", `${(h.supplyCharge / 3600).toPrecision(3)} A·h`],
        ["heat into the part", q(h.energy.input, "J")],
      ]),
    );
  }
  parts.push(`<h2>Validity notes</h2><ul>`);
  for (const v of study.validity) parts.push(`<li><code>${escapeXml(v.code)}</code>: ${escapeXml(v.message)}</li>`);
  parts.push(`</ul>`);
  parts.push(`<p class="meta">Cautions are data from the models, not a safety assessment. Consult local codes and licensed practice.</p>`);
  parts.push(`</body></html>`);
  return parts.join("\n") + "\n";
}
