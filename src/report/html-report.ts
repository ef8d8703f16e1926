/**
 * The self-contained HTML report of a heater study: inline CSS, inline SVG plots (no scripts,
 * no network), written in XML-compatible HTML so that it parses both as HTML and as XML.
 */
import type { HeaterStudy } from "../study/index.js";
import { requireStudy } from "./checks.js";
import { escapeXml } from "./chart.js";
import { celsiusText, duration, percent, q } from "./format.js";
import { designRows, lossEntries, operatingRows } from "./text-report.js";
import { studyPlots } from "./study-plots.js";

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

export { studyPlots } from "./study-plots.js";
export type { StudyPlot } from "./study-plots.js";

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
