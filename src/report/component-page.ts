/**
 * What the component reports share: the plot record, the option check, and the head, the
 * cautions and notes, and the tail of the HTML page.
 *
 * @packageDocumentation
 */
import { requireObject } from "../core/index.js";
import { escapeXml } from "./chart.js";
import { CSS } from "./html-report.js";

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

/** Throws InputError when `options` is not an object. */
export function checkOptions(where: string, options: unknown): void {
  requireObject(where, "options", options);
}

/** The page up to the title and its subtitle. */
export function head(title: string, subtitle: string): string[] {
  return [
    "<!DOCTYPE html>",
    `<html lang="en"><head><meta charset="utf-8"/><meta name="viewport" content="width=device-width, initial-scale=1"/>`,
    `<title>${escapeXml(title)} — fluxwright</title><style>${CSS}</style></head><body>`,
    `<h1>${escapeXml(title)}</h1>`,
    `<p class="meta">${escapeXml(subtitle)} Numbers in SI with engineering prefixes; temperatures in °C.</p>`,
  ];
}

/** The cautions and the validity notes, appended to `parts`. */
export function cautionsAndNotes(parts: string[], cautions: readonly { code: string; severity: string; message: string; source: string }[], validity: readonly { code: string; message: string }[]): void {
  parts.push(`<h2>Cautions</h2>`);
  if (cautions.length === 0) parts.push("<p>None raised.</p>");
  for (const c of cautions) {
    parts.push(`<div class="caution ${escapeXml(c.severity)}"><strong>${escapeXml(c.severity)}</strong> <code>${escapeXml(c.code)}</code>: ${escapeXml(c.message)} <span class="meta">(source: ${escapeXml(c.source)})</span></div>`);
  }
  parts.push(`<h2>Validity notes</h2>`);
  if (validity.length === 0) parts.push("<p>None.</p>");
  else parts.push(`<ul>${validity.map((v) => `<li><code>${escapeXml(v.code)}</code>: ${escapeXml(v.message)}</li>`).join("")}</ul>`);
}

/** The closing note and tags; returns the whole page. */
export function tail(parts: string[]): string {
  parts.push(`<p class="meta">Cautions are data from the models, not a safety assessment. Consult local codes and licensed practice.</p>`);
  parts.push(`</body></html>`);
  return parts.join("\n") + "\n";
}
