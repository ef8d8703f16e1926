/**
 * The line chart of the reports: linear or logarithmic axes, an optional right-hand y axis,
 * reference lines with labels that avoid each other, and a legend under the plot.
 *
 * @packageDocumentation
 */
import { InputError, requireObject } from "../core/index.js";
import type { ChartReferenceLine, ChartSeries, LineChartOptions } from "./chart.js";
import { CHART_PALETTE, DASHES, FONT, GRID, GRID_MINOR, INK, markerElement } from "./chart-style.js";
import { escapeXml, hashText, r, textWidth } from "./chart-text.js";
import { linearTicks, logTicks } from "./chart-ticks.js";
import type { ChartTick } from "./chart-ticks.js";

interface Axis {
  readonly min: number;
  readonly max: number;
  readonly log: boolean;
  readonly ticks: ChartTick[];
}

function makeAxis(values: number[], log: boolean, unit: string, fixed?: readonly [number, number]): Axis {
  let lo = Infinity;
  let hi = -Infinity;
  if (fixed !== undefined && Number.isFinite(fixed[0]) && Number.isFinite(fixed[1]) && fixed[1] > fixed[0] && (!log || fixed[0] > 0)) {
    lo = fixed[0];
    hi = fixed[1];
  } else {
    for (const v of values) {
      if (!Number.isFinite(v) || (log && !(v > 0))) continue;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  if (log) {
    if (!Number.isFinite(lo)) {
      lo = 1;
      hi = 10;
    }
    const t = logTicks(lo, hi, unit);
    return { min: t.min, max: t.max, log, ticks: t.ticks };
  }
  if (!Number.isFinite(lo)) {
    lo = 0;
    hi = 1;
  }
  const t = linearTicks(lo, hi, unit);
  return { min: t.min, max: t.max, log, ticks: t.ticks };
}

/** Maps a data value to [0, 1] along an axis (NaN when it cannot be drawn). */
function fraction(axis: Axis, v: number): number {
  if (!Number.isFinite(v)) return NaN;
  if (axis.log) {
    if (!(v > 0)) return NaN;
    return (Math.log10(v) - Math.log10(axis.min)) / (Math.log10(axis.max) - Math.log10(axis.min));
  }
  return (v - axis.min) / (axis.max - axis.min);
}

/** The plot area inside the SVG and the data-to-pixel maps. */
interface Frame {
  readonly width: number;
  readonly height: number;
  readonly left: number;
  readonly top: number;
  readonly plotW: number;
  readonly plotH: number;
  px(v: number): number;
  py(axis: Axis, v: number): number;
}

/** A legend entry: the series, its index (colour, dash, marker) and its width [px]. */
interface LegendItem {
  readonly s: ChartSeries;
  readonly i: number;
  readonly w: number;
}

const FONT_SIZE = 12;
const TITLE_SIZE = 15;

/** The name a series shows in the legend (marked when drawn against the right axis). */
function legendName(s: ChartSeries, hasSecondary: boolean): string {
  return s.name + (s.axis === "secondary" && hasSecondary ? " (right axis)" : "");
}

/** The drawable points of all series, split by y axis, and how many there are. */
function collectPoints(series: readonly ChartSeries[], hasSecondary: boolean, xLog: boolean): { xs: number[]; ys: number[]; y2s: number[]; drawable: number } {
  const xs: number[] = [];
  const ys: number[] = [];
  const y2s: number[] = [];
  let drawable = 0;
  for (const s of series) {
    const n = Math.min(s.x.length, s.y.length);
    const onSecondary = s.axis === "secondary" && hasSecondary;
    for (let i = 0; i < n; i++) {
      const xv = s.x[i] as number;
      const yv = s.y[i] as number;
      if (!Number.isFinite(xv) || !Number.isFinite(yv)) continue;
      if (xLog && !(xv > 0)) continue;
      xs.push(xv);
      (onSecondary ? y2s : ys).push(yv);
      drawable++;
    }
  }
  return { xs, ys, y2s, drawable };
}

/** Legend entries wrapped into rows no wider than `legendMax` [px]. */
function legendLayout(series: readonly ChartSeries[], hasSecondary: boolean, legendMax: number): LegendItem[][] {
  const legendItems = series.map((s, i) => ({ s, i, w: 34 + textWidth(legendName(s, hasSecondary), FONT_SIZE) + 18 }));
  const legendRows: LegendItem[][] = [];
  let row: LegendItem[] = [];
  let rowWidth = 0;
  for (const item of legendItems) {
    if (row.length > 0 && rowWidth + item.w > legendMax) {
      legendRows.push(row);
      row = [];
      rowWidth = 0;
    }
    row.push(item);
    rowWidth += item.w;
  }
  if (row.length > 0) legendRows.push(row);
  return legendRows;
}

/** Margins from the tick labels and the legend, and the plot area they leave. */
function chartFrame(width: number, height: number, axes: { x: Axis; y: Axis; y2: Axis | undefined }, legendRowCount: number): Frame {
  const yLabelWidth = Math.max(...axes.y.ticks.map((t) => textWidth(t.label, FONT_SIZE)), 20);
  const y2LabelWidth = axes.y2 === undefined ? 0 : Math.max(...axes.y2.ticks.map((t) => textWidth(t.label, FONT_SIZE)), 20);
  const left = 30 + yLabelWidth + 10;
  const right = axes.y2 === undefined ? 24 : 30 + y2LabelWidth + 10;
  const top = 40;
  const legendHeight = legendRowCount * 18;
  const bottom = 56 + legendHeight + (legendRowCount > 0 ? 6 : 0);
  const plotW = Math.max(40, width - left - right);
  const plotH = Math.max(40, height - top - bottom);
  const xAxis = axes.x;
  return {
    width, height, left, top, plotW, plotH,
    px: (v: number): number => left + fraction(xAxis, v) * plotW,
    py: (axis: Axis, v: number): number => top + plotH - fraction(axis, v) * plotH,
  };
}

/** Grid lines, tick marks and tick labels of the three axes, and the plot border. */
function gridAndTicks(f: Frame, xAxis: Axis, yAxis: Axis, y2Axis: Axis | undefined): string[] {
  const { left, top, plotW, plotH } = f;
  const grid: string[] = [];
  const labels: string[] = [];
  for (const t of xAxis.ticks) {
    const x = f.px(t.value);
    if (!Number.isFinite(x)) continue;
    grid.push(`<line x1="${r(x)}" y1="${top}" x2="${r(x)}" y2="${r(top + plotH)}" stroke="${t.major ? GRID : GRID_MINOR}" stroke-width="1"/>`);
    grid.push(`<line x1="${r(x)}" y1="${r(top + plotH)}" x2="${r(x)}" y2="${r(top + plotH + (t.major ? 5 : 3))}" stroke="${INK}" stroke-width="1"/>`);
    if (t.label !== "") labels.push(`<text x="${r(x)}" y="${r(top + plotH + 18)}" text-anchor="middle" fill="${INK}">${escapeXml(t.label)}</text>`);
  }
  for (const t of yAxis.ticks) {
    const y = f.py(yAxis, t.value);
    if (!Number.isFinite(y)) continue;
    grid.push(`<line x1="${left}" y1="${r(y)}" x2="${r(left + plotW)}" y2="${r(y)}" stroke="${t.major ? GRID : GRID_MINOR}" stroke-width="1"/>`);
    grid.push(`<line x1="${r(left - (t.major ? 5 : 3))}" y1="${r(y)}" x2="${left}" y2="${r(y)}" stroke="${INK}" stroke-width="1"/>`);
    if (t.label !== "") labels.push(`<text x="${r(left - 8)}" y="${r(y + 4)}" text-anchor="end" fill="${INK}">${escapeXml(t.label)}</text>`);
  }
  if (y2Axis !== undefined) {
    for (const t of y2Axis.ticks) {
      const y = f.py(y2Axis, t.value);
      if (!Number.isFinite(y)) continue;
      grid.push(`<line x1="${r(left + plotW)}" y1="${r(y)}" x2="${r(left + plotW + (t.major ? 5 : 3))}" y2="${r(y)}" stroke="${INK}" stroke-width="1"/>`);
      if (t.label !== "") labels.push(`<text x="${r(left + plotW + 8)}" y="${r(y + 4)}" text-anchor="start" fill="${INK}">${escapeXml(t.label)}</text>`);
    }
  }
  return [
    `<g class="grid">${grid.join("")}</g>`,
    `<rect x="${left}" y="${top}" width="${r(plotW)}" height="${r(plotH)}" fill="none" stroke="${INK}" stroke-width="1"/>`,
    `<g class="tick-labels">${labels.join("")}</g>`,
  ];
}

/** The axis titles, with their units in brackets. */
function axisTitles(options: LineChartOptions, f: Frame): string[] {
  const { left, top, plotW, plotH, width } = f;
  const xUnit = options.xUnit ?? "";
  const yUnit = options.yUnit ?? "";
  const y2 = options.secondaryAxis;
  const withUnit = (label: string, unit: string): string => (unit === "" ? label : `${label} [${unit}]`);
  const out = [
    `<text x="${r(left + plotW / 2)}" y="${r(top + plotH + 40)}" text-anchor="middle" fill="${INK}">${escapeXml(withUnit(options.xLabel, xUnit))}</text>`,
    `<text transform="translate(14 ${r(top + plotH / 2)}) rotate(-90)" text-anchor="middle" fill="${INK}">${escapeXml(withUnit(options.yLabel, yUnit))}</text>`,
  ];
  if (y2 !== undefined) {
    out.push(`<text transform="translate(${r(width - 12)} ${r(top + plotH / 2)}) rotate(90)" text-anchor="middle" fill="${INK}">${escapeXml(withUnit(y2.label, y2.unit ?? ""))}</text>`);
  }
  return out;
}

/**
 * Reference lines and their labels, placed so that none overprints another: a label that
 * would overlap one already placed moves down a row (vertical lines) or along (horizontal).
 */
function referenceLines(lines: readonly ChartReferenceLine[], f: Frame, yAxis: Axis): string[] {
  const { left, top, plotW, plotH } = f;
  const out: string[] = [];
  const placed: { x0: number; x1: number; y0: number; y1: number }[] = [];
  const labelWidth = (text: string): number => 6.6 * Array.from(text).length + 2;
  const free = (box: { x0: number; x1: number; y0: number; y1: number }): boolean =>
    placed.every((b) => box.x1 <= b.x0 || box.x0 >= b.x1 || box.y1 <= b.y0 || box.y0 >= b.y1);
  for (const ref of lines) {
    const w = labelWidth(ref.label);
    if (ref.axis === "x") {
      const x = f.px(ref.value);
      if (!(x >= left && x <= left + plotW)) continue;
      out.push(`<line class="reference" x1="${r(x)}" y1="${top}" x2="${r(x)}" y2="${r(top + plotH)}" stroke="${INK}" stroke-width="1" stroke-dasharray="3 3"/>`);
      // right of the line, or left of it near the right edge
      const lx = x + 4 + w > left + plotW ? x - 4 - w : x + 4;
      let row = 0;
      while (row < 8 && !free({ x0: lx, x1: lx + w, y0: top + 3 + 13 * row, y1: top + 16 + 13 * row })) row++;
      placed.push({ x0: lx, x1: lx + w, y0: top + 3 + 13 * row, y1: top + 16 + 13 * row });
      out.push(`<text class="reference-label" x="${r(lx)}" y="${r(top + 14 + 13 * row)}" fill="${INK}" font-size="11">${escapeXml(ref.label)}</text>`);
    } else {
      const y = f.py(yAxis, ref.value);
      if (!(y >= top && y <= top + plotH)) continue;
      out.push(`<line class="reference" x1="${left}" y1="${r(y)}" x2="${r(left + plotW)}" y2="${r(y)}" stroke="${INK}" stroke-width="1" stroke-dasharray="3 3"/>`);
      let lx = left + 6;
      while (lx < left + plotW - w && !free({ x0: lx, x1: lx + w, y0: y - 15, y1: y - 2 })) lx += 12;
      placed.push({ x0: lx, x1: lx + w, y0: y - 15, y1: y - 2 });
      out.push(`<text class="reference-label" x="${r(lx)}" y="${r(y - 4)}" fill="${INK}" font-size="11">${escapeXml(ref.label)}</text>`);
    }
  }
  return out;
}

/** The clip path and the series (line, then markers), clipped to the plot area. */
function seriesGroup(options: LineChartOptions, f: Frame, yAxis: Axis, y2Axis: Axis | undefined): string[] {
  const { left, top, plotW, plotH, width, height } = f;
  const series = options.series;
  const clipId = `${options.idPrefix ?? `chart-${hashText(`${options.title}|${width}|${height}|${series.map((s) => s.name).join("|")}`)}`}-plot`;
  const drawn: string[] = [];
  series.forEach((s, index) => {
    const axis = s.axis === "secondary" && y2Axis !== undefined ? y2Axis : yAxis;
    const colour = CHART_PALETTE[index % CHART_PALETTE.length] ?? INK;
    const dash = DASHES[index % DASHES.length] ?? "";
    const n = Math.min(s.x.length, s.y.length);
    let d = "";
    let penDown = false;
    const marks: string[] = [];
    const showMarkers = s.markers ?? n <= 40;
    for (let i = 0; i < n; i++) {
      const x = f.px(s.x[i] as number);
      const y = f.py(axis, s.y[i] as number);
      if (!Number.isFinite(x) || !Number.isFinite(y)) {
        penDown = false;
        continue;
      }
      d += `${penDown ? "L" : "M"}${r(x)},${r(y)}`;
      penDown = true;
      if (showMarkers) marks.push(markerElement(index, x, y, colour));
    }
    if (d !== "") {
      drawn.push(
        `<path class="series" d="${d}" fill="none" stroke="${colour}" stroke-width="2" stroke-linejoin="round" stroke-linecap="round"${dash === "" ? "" : ` stroke-dasharray="${dash}"`}><title>${escapeXml(s.name)}</title></path>`,
      );
      drawn.push(...marks);
    }
  });
  return [
    `<defs><clipPath id="${escapeXml(clipId)}"><rect x="${left}" y="${top}" width="${r(plotW)}" height="${r(plotH)}"/></clipPath></defs>`,
    `<g clip-path="url(#${escapeXml(clipId)})">${drawn.join("")}</g>`,
  ];
}

/** The legend under the plot, each row centred. */
function legendGroup(legendRows: readonly (readonly LegendItem[])[], f: Frame, hasSecondary: boolean): string {
  const { width, top, plotH } = f;
  const legend: string[] = [];
  legendRows.forEach((items, rowIndex) => {
    const total = items.reduce((a, b) => a + b.w, 0);
    let x = (width - total) / 2;
    const y = top + plotH + 58 + rowIndex * 18;
    for (const { s, i, w } of items) {
      const colour = CHART_PALETTE[i % CHART_PALETTE.length] ?? INK;
      const dash = DASHES[i % DASHES.length] ?? "";
      legend.push(`<line x1="${r(x)}" y1="${r(y - 4)}" x2="${r(x + 28)}" y2="${r(y - 4)}" stroke="${colour}" stroke-width="2"${dash === "" ? "" : ` stroke-dasharray="${dash}"`}/>`);
      legend.push(markerElement(i, x + 14, y - 4, colour));
      legend.push(`<text x="${r(x + 34)}" y="${r(y)}" fill="${INK}">${escapeXml(legendName(s, hasSecondary))}</text>`);
      x += w;
    }
  });
  return `<g class="legend">${legend.join("")}</g>`;
}

/**
 * Draws a line chart as a self-contained SVG string.
 *
 * Axes may be linear or logarithmic (ticks at 1-2-5 steps or decades), tick labels carry SI
 * prefixes and the axis unit, each series gets a colour from a fixed palette, a dash
 * pattern and a marker shape, and the legend sits under the plot. Degenerate input never
 * throws: empty series draw empty axes with a note, a constant series gets a padded range,
 * and points that cannot be drawn (non-finite, or ≤ 0 on a log axis) break the line.
 *
 * @param options - title, axis labels and units, scales, series
 * @returns an `<svg>` element as text (UTF-8, no external references)
 *
 * @throws {@link InputError} when `options` is not an object or `series` not an array
 * @example
 * ```ts
 * import { lineChart } from "fluxwright/report";
 * const svg = lineChart({ title: "Skin depth in copper", xLabel: "frequency", yLabel: "depth",
 *   xUnit: "Hz", yUnit: "m", xLog: true, yLog: true,
 *   series: [{ name: "copper, 20 °C", x: [1e3, 1e4, 1e5], y: [2.1e-3, 6.6e-4, 2.1e-4] }] });
 * console.log(svg.startsWith("<svg")); // true
 * ```
 * @category Reports and charts
 */
export function lineChart(options: LineChartOptions): string {
  requireObject("lineChart", "options", options);
  if (!Array.isArray((options as { series?: unknown }).series)) throw new InputError("lineChart", "options.series", options.series, "", "an array of series");
  const width = Math.max(240, options.width ?? 720);
  const height = Math.max(180, options.height ?? 420);
  const series = options.series;
  const y2 = options.secondaryAxis;
  const hasSecondary = y2 !== undefined;

  const points = collectPoints(series, hasSecondary, options.xLog === true);
  const xAxis = makeAxis(points.xs, options.xLog === true, options.xUnit ?? "", options.xRange);
  const yAxis = makeAxis(points.ys, options.yLog === true, options.yUnit ?? "", options.yRange);
  const y2Axis = y2 === undefined ? undefined : makeAxis(points.y2s, y2.log === true, y2.unit ?? "");
  const legendRows = legendLayout(series, hasSecondary, width - 40);
  const f = chartFrame(width, height, { x: xAxis, y: yAxis, y2: y2Axis }, legendRows.length);

  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${escapeXml(options.title)}" font-family="${escapeXml(FONT)}" font-size="${FONT_SIZE}">`,
  );
  out.push(`<title>${escapeXml(options.title)}</title>`);
  out.push(`<rect x="0" y="0" width="${width}" height="${height}" fill="#ffffff"/>`);
  out.push(`<text x="${r(width / 2)}" y="24" text-anchor="middle" font-size="${TITLE_SIZE}" font-weight="bold" fill="${INK}">${escapeXml(options.title)}</text>`);
  out.push(...gridAndTicks(f, xAxis, yAxis, y2Axis));
  out.push(...axisTitles(options, f));
  out.push(...referenceLines(options.referenceLines ?? [], f, yAxis));
  out.push(...seriesGroup(options, f, yAxis, y2Axis));
  if (points.drawable === 0) {
    out.push(`<text x="${r(f.left + f.plotW / 2)}" y="${r(f.top + f.plotH / 2)}" text-anchor="middle" fill="#777777" font-size="14">no data</text>`);
  }
  out.push(legendGroup(legendRows, f, hasSecondary));
  out.push("</svg>");
  return out.join("\n");
}
