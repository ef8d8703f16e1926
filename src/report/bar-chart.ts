/**
 * The horizontal bar chart of the reports (losses by place and the like).
 *
 * @packageDocumentation
 */
import { InputError, requireObject } from "../core/index.js";
import type { BarChartOptions } from "./chart.js";
import { CHART_PALETTE, FONT, GRID, INK } from "./chart-style.js";
import { escapeXml, formatChartNumber, r, textWidth, trimZeros } from "./chart-text.js";
import { linearTicks } from "./chart-ticks.js";

/**
 * Draws a horizontal bar chart (one bar per category, e.g. losses by place) as an SVG string.
 * Each bar is labelled with its value (SI prefix and unit) and, with `showShare`, its share of
 * the total. Bars take colours from a fixed palette in order; the value text makes the
 * chart readable without colour. An empty list draws a "no data" note.
 *
 * @param options - title, unit and bars
 * @returns an `<svg>` element as text
 *
 * @throws {@link InputError} when `options` is not an object or `bars` not an array
 * @example
 * ```ts
 * import { barChart } from "fluxwright/report";
 * const svg = barChart({ title: "Where the power goes", valueLabel: "power", unit: "W",
 *   bars: [{ label: "part", value: 1200 }, { label: "coil", value: 180 }], showShare: true });
 * console.log(svg.includes("1.2 kW")); // true
 * ```
 * @category Reports and charts
 */
export function barChart(options: BarChartOptions): string {
  requireObject("barChart", "options", options);
  if (!Array.isArray((options as { bars?: unknown }).bars)) throw new InputError("barChart", "options.bars", options.bars, "", "an array of bars");
  const bars = options.bars;
  const unit = options.unit ?? "";
  const fontSize = 12;
  const width = Math.max(240, options.width ?? 720);
  const barH = 22;
  const gap = 10;
  const top = 40;
  const bottom = 50;
  const height = Math.max(140, options.height ?? top + bottom + Math.max(1, bars.length) * (barH + gap));
  const labelW = Math.min(width * 0.35, Math.max(40, ...bars.map((b) => textWidth(b.label, fontSize))) + 16);
  const values = bars.map((b) => (Number.isFinite(b.value) ? b.value : 0));
  const lo = Math.min(0, ...values);
  const hi = Math.max(0, ...values);
  const axis = linearTicks(lo, hi === lo ? lo + 1 : hi, unit, 5);
  const total = values.reduce((a, v) => a + (v > 0 ? v : 0), 0);
  const valueTexts = bars.map((b, i) => {
    const v = values[i] ?? 0;
    let text = Number.isFinite(b.value) ? formatChartNumber(v, unit) : "n/a";
    if (options.showShare === true && total > 0 && v >= 0) text += ` (${trimZeros(((100 * v) / total).toFixed(1))} %)`;
    return text;
  });
  const valueW = Math.max(60, ...valueTexts.map((t) => textWidth(t, fontSize))) + 12;
  const left = labelW + 10;
  const plotW = Math.max(40, width - left - valueW - 16);
  const plotH = height - top - bottom;
  const step = bars.length === 0 ? plotH : plotH / bars.length;
  const px = (v: number): number => left + ((v - axis.min) / (axis.max - axis.min)) * plotW;

  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${escapeXml(options.title)}" font-family="${escapeXml(FONT)}" font-size="${fontSize}">`,
  );
  out.push(`<title>${escapeXml(options.title)}</title>`);
  out.push(`<rect x="0" y="0" width="${width}" height="${height}" fill="#ffffff"/>`);
  out.push(`<text x="${r(width / 2)}" y="24" text-anchor="middle" font-size="15" font-weight="bold" fill="${INK}">${escapeXml(options.title)}</text>`);
  const grid: string[] = [];
  for (const t of axis.ticks) {
    const x = px(t.value);
    grid.push(`<line x1="${r(x)}" y1="${top}" x2="${r(x)}" y2="${r(top + plotH)}" stroke="${GRID}" stroke-width="1"/>`);
    grid.push(`<text x="${r(x)}" y="${r(top + plotH + 16)}" text-anchor="middle" fill="${INK}">${escapeXml(t.label)}</text>`);
  }
  out.push(`<g class="grid">${grid.join("")}</g>`);
  out.push(`<text x="${r(left + plotW / 2)}" y="${r(top + plotH + 36)}" text-anchor="middle" fill="${INK}">${escapeXml(unit === "" ? options.valueLabel : `${options.valueLabel} [${unit}]`)}</text>`);
  const zero = px(0);
  const drawn: string[] = [];
  bars.forEach((b, i) => {
    const v = values[i] ?? 0;
    const y = top + i * step + (step - Math.min(barH, step * 0.8)) / 2;
    const h = Math.min(barH, step * 0.8);
    const x0 = Math.min(zero, px(v));
    const w = Math.abs(px(v) - zero);
    const colour = CHART_PALETTE[i % CHART_PALETTE.length] ?? INK;
    drawn.push(`<text x="${r(left - 8)}" y="${r(y + h / 2 + 4)}" text-anchor="end" fill="${INK}">${escapeXml(b.label)}</text>`);
    drawn.push(`<rect class="bar" x="${r(x0)}" y="${r(y)}" width="${r(Math.max(w, 0.5))}" height="${r(h)}" fill="${colour}" stroke="${INK}" stroke-width="0.5"><title>${escapeXml(`${b.label}: ${valueTexts[i] ?? ""}`)}</title></rect>`);
    drawn.push(`<text x="${r(Math.max(zero, px(v)) + 6)}" y="${r(y + h / 2 + 4)}" fill="${INK}">${escapeXml(valueTexts[i] ?? "")}</text>`);
  });
  out.push(`<g class="bars">${drawn.join("")}</g>`);
  out.push(`<line x1="${r(zero)}" y1="${top}" x2="${r(zero)}" y2="${r(top + plotH)}" stroke="${INK}" stroke-width="1"/>`);
  if (bars.length === 0) {
    out.push(`<text x="${r(left + plotW / 2)}" y="${r(top + plotH / 2)}" text-anchor="middle" fill="#777777" font-size="14">no data</text>`);
  }
  out.push("</svg>");
  return out.join("\n");
}
