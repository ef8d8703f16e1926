/**
 * Dependency-free SVG charts for reports and docs: line charts on linear or logarithmic axes
 * (with an optional second y axis) and horizontal bar charts for loss breakdowns.
 *
 * The output is one self-contained `<svg>` string (no scripts, no external fonts or styles),
 * readable on screen and in black-and-white print: every series has its own colour, dash
 * pattern and marker shape, so it can be told apart without colour. Tick labels use SI
 * prefixes with the axis unit (`10 kHz`, `1.5 kW`).
 *
 * @packageDocumentation
 */
import { InputError, requireObject } from "../core/index.js";

/** One line of a {@link lineChart}.
 *
 * @category Reports and charts
 */
export interface ChartSeries {
  /** Name shown in the legend. */
  readonly name: string;
  /** Abscissae, same length as `y`; non-finite points (and non-positive ones on a log axis) break the line. */
  readonly x: ArrayLike<number>;
  /** Ordinates, same length as `x`. */
  readonly y: ArrayLike<number>;
  /** Which y axis the series is drawn against (default `"primary"`, the left one). */
  readonly axis?: "primary" | "secondary";
  /** Draw a marker at every point (default: only when the series has ≤ 40 points). */
  readonly markers?: boolean;
}

/** A vertical or horizontal reference line drawn across the plot, e.g. the Curie temperature.
 *
 * @category Reports and charts
 */
export interface ChartReferenceLine {
  /** `"x"`: a vertical line at `value` on the x axis; `"y"`: a horizontal line on the primary y axis. */
  readonly axis: "x" | "y";
  /** Where the line goes, in the axis's data unit. */
  readonly value: number;
  /** Short text placed beside the line. */
  readonly label: string;
}

/** The right-hand y axis of a {@link lineChart}, used by series with `axis: "secondary"`.
 *
 * @category Reports and charts
 */
export interface ChartSecondaryAxis {
  /** Axis title. */
  readonly label: string;
  /** Unit for tick labels (SI symbol; `""` for none). */
  readonly unit?: string;
  /** Logarithmic scale. */
  readonly log?: boolean;
}

/** Options of {@link lineChart}.
 *
 * @category Reports and charts
 */
export interface LineChartOptions {
  /** Chart title, drawn at the top. */
  readonly title: string;
  /** x axis title, e.g. `"frequency"`. */
  readonly xLabel: string;
  /** Primary (left) y axis title. */
  readonly yLabel: string;
  /** Unit symbol for x tick labels (`"Hz"` → `10 kHz`); `""` or absent for plain numbers. */
  readonly xUnit?: string;
  /** Unit symbol for primary y tick labels. */
  readonly yUnit?: string;
  /** Logarithmic x axis. */
  readonly xLog?: boolean;
  /** Logarithmic primary y axis. */
  readonly yLog?: boolean;
  /** The lines to draw (any number; an empty list draws empty axes with a "no data" note). */
  readonly series: readonly ChartSeries[];
  /** Width of the SVG [px], default 720. */
  readonly width?: number;
  /** Height of the SVG [px], default 420. */
  readonly height?: number;
  /** A right-hand y axis for series with `axis: "secondary"`. */
  readonly secondaryAxis?: ChartSecondaryAxis;
  /** Reference lines (e.g. the Curie temperature, a target temperature). */
  readonly referenceLines?: readonly ChartReferenceLine[];
  /** Fixed x range `[min, max]` instead of the data range. */
  readonly xRange?: readonly [number, number];
  /** Fixed primary y range `[min, max]` instead of the data range. */
  readonly yRange?: readonly [number, number];
  /** Prefix for element ids inside the SVG (default: derived from the title), so that several charts can share one HTML page. */
  readonly idPrefix?: string;
}

/** One bar of a {@link barChart}.
 *
 * @category Reports and charts
 */
export interface ChartBar {
  /** Category label, drawn left of the bar. */
  readonly label: string;
  /** Bar length in the chart's unit (negative values are drawn leftwards from zero). */
  readonly value: number;
}

/** Options of {@link barChart}.
 *
 * @category Reports and charts
 */
export interface BarChartOptions {
  /** Chart title. */
  readonly title: string;
  /** Title of the value axis, e.g. `"power"`. */
  readonly valueLabel: string;
  /** Unit symbol for value labels (`"W"`). */
  readonly unit?: string;
  /** The bars, drawn top to bottom in this order. */
  readonly bars: readonly ChartBar[];
  /** Append each bar's share of the total (sum of positive values) to its value label. */
  readonly showShare?: boolean;
  /** Width of the SVG [px], default 720. */
  readonly width?: number;
  /** Height of the SVG [px]; default grows with the number of bars. */
  readonly height?: number;
}

/**
 * Series colours, chosen for this project: they differ strongly in lightness as well as hue
 * (blue–orange contrast first), so that the common red–green colour-vision deficiencies and
 * grey-scale print still separate them; dash patterns and marker shapes add a second cue.
 */
export const CHART_PALETTE: readonly string[] = [
  "#1b5e9e", // deep blue
  "#e07b00", // orange
  "#6a3d9a", // violet
  "#3fa7d6", // sky blue
  "#8c5a1d", // brown
  "#c2338a", // magenta
  "#4d4d4d", // dark grey
  "#b89b00", // ochre
];

const DASHES = ["", "7 4", "2 3", "10 3 2 3", "4 2", "12 4", "1 2", "6 2 2 2 2 2"];
const MARKERS = ["circle", "square", "triangle", "diamond", "cross", "triangle-down", "plus", "circle-open"] as const;
const FONT = "'DejaVu Sans', 'Helvetica Neue', Arial, sans-serif";
const INK = "#222222";
const GRID = "#d9d9d9";
const GRID_MINOR = "#eeeeee";

// ---------------------------------------------------------------------------------------------
// Text and numbers

/** Escapes text for use in SVG/XML character data and attribute values. */
export function escapeXml(text: string): string {
  return text
    // control characters are not allowed in XML 1.0: shown as \x1B-style text instead
    // eslint-disable-next-line no-control-regex -- matching control characters is the point
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/gu, (c) => `\\x${c.charCodeAt(0).toString(16).toUpperCase().padStart(2, "0")}`)
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

const PREFIXES: readonly [number, string][] = [
  [1e12, "T"], [1e9, "G"], [1e6, "M"], [1e3, "k"], [1, ""],
  [1e-3, "m"], [1e-6, "µ"], [1e-9, "n"], [1e-12, "p"], [1e-15, "f"],
];

/** Units whose values read badly with SI prefixes (`k°C`), printed as plain numbers. */
const NO_PREFIX_UNITS = new Set(["°C", "%", "°", "K", "dB", "rad", ""]);

/** Trims a fixed-point rendering: `"2.50"` → `"2.5"`, `"3.0"` → `"3"`. */
function trimZeros(text: string): string {
  return text.includes(".") ? text.replace(/0+$/, "").replace(/\.$/, "") : text;
}

/**
 * Formats a number for an axis tick or value label: SI prefix plus unit for prefixable units
 * (`12 kHz`, `350 mW`), plain digits otherwise. `step` (the tick spacing) sets the number of
 * decimals so that neighbouring ticks never print alike.
 */
export function formatChartNumber(value: number, unit = "", step?: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return unit === "" ? "0" : `0 ${unit}`;
  const magnitude = Math.abs(value);
  const usePrefix = !NO_PREFIX_UNITS.has(unit);
  let scale = 1;
  let prefix = "";
  if (usePrefix) {
    for (const [s, p] of PREFIXES) {
      if (magnitude >= s * 0.9995) {
        scale = s;
        prefix = p;
        break;
      }
    }
    if (magnitude < 1e-15) {
      scale = 1e-15;
      prefix = "f";
    }
  } else if (magnitude >= 1e6 || magnitude < 1e-3) {
    const text = value.toExponential(2).replace(/\.?0+e/, "e").replace("e+", "e");
    return unit === "" ? text : `${text} ${unit}`;
  }
  const scaled = value / scale;
  let decimals: number;
  if (step !== undefined && step > 0 && Number.isFinite(step)) {
    decimals = Math.max(0, Math.min(6, -Math.floor(Math.log10(step / scale) + 1e-9)));
  } else {
    decimals = Math.max(0, Math.min(6, 2 - Math.floor(Math.log10(Math.abs(scaled)) + 1e-9)));
  }
  const digits = trimZeros(scaled.toFixed(decimals));
  const suffix = `${prefix}${unit}`;
  return suffix === "" ? digits : `${digits} ${suffix}`;
}

/** A rough text width for layout [px] (no font metrics in Node): 0.6 em per character. */
function textWidth(text: string, fontSize: number): number {
  return text.length * fontSize * 0.6;
}

/** A short, stable hash of a string (FNV-1a, 32 bit) in base 36, for element ids. */
function hashText(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(36);
}

/** Rounds a coordinate for compact output. */
function r(value: number): string {
  return String(Math.round(value * 100) / 100);
}

// ---------------------------------------------------------------------------------------------
// Ticks

/** A tick position and its label. */
export interface ChartTick {
  /** Position in data units. */
  readonly value: number;
  /** Text drawn beside it. */
  readonly label: string;
  /** `false` for a minor (unlabelled) log tick. */
  readonly major: boolean;
}

/**
 * "Nice" linear ticks (steps of 1, 2 or 5 × 10ⁿ) covering `[min, max]`; the range is widened
 * to the outer ticks when `extend` is set.
 */
export function linearTicks(min: number, max: number, unit = "", target = 6): { ticks: ChartTick[]; min: number; max: number } {
  let lo = min;
  let hi = max;
  // a span too small to tick (against the values' size, or below normal doubles) is padded
  const size = Math.max(Math.abs(lo), Math.abs(hi));
  if (!(hi - lo > size * 1e-9) || !(hi - lo > 1e-290)) {
    const pad = size < 1e-290 ? 1 : size * 0.1;
    lo -= pad;
    hi += pad;
  }
  const rough = (hi - lo) / Math.max(1, target - 1);
  const power = 10 ** Math.floor(Math.log10(rough));
  const fraction = rough / power;
  const step = (fraction <= 1.5 ? 1 : fraction <= 3 ? 2 : fraction <= 7 ? 5 : 10) * power;
  const first = Math.floor(lo / step + 1e-9) * step;
  const last = Math.ceil(hi / step - 1e-9) * step;
  const ticks: ChartTick[] = [];
  for (let i = 0; ; i++) {
    const v = first + i * step;
    if (v > last + step * 1e-6 || i > 100) break;
    const clean = Math.abs(v) < step * 1e-9 ? 0 : v;
    ticks.push({ value: clean, label: formatChartNumber(clean, unit, step), major: true });
  }
  return { ticks, min: first, max: last };
}

/**
 * Logarithmic ticks covering `[min, max]` (both > 0): every decade labelled, with 2 and 5
 * labelled too when the range spans fewer than three decades, and unlabelled minor ticks at
 * 2…9 × 10ⁿ. Across three decades or more the range widens to whole decades; below that it
 * keeps the data range when two labelled ticks fall inside it, else widens to 1-2-5 steps.
 */
export function logTicks(min: number, max: number, unit = ""): { ticks: ChartTick[]; min: number; max: number } {
  // clamp to where powers of ten are still normal doubles
  let lo = min > 0 && Number.isFinite(min) ? Math.max(min, 1e-300) : 1;
  let hi = max > 0 && Number.isFinite(max) ? Math.min(Math.max(max, 1e-300), 1e300) : lo * 10;
  lo = Math.min(lo, 1e299);
  if (!(hi > lo)) {
    lo /= 2;
    hi *= 2;
  }
  const decades = Math.log10(hi) - Math.log10(lo);
  const mantissas = decades < 3 ? [1, 2, 5] : [1];
  const steps = [1, 2, 5, 10];
  // widen to the nearest 1-2-5 mantissa (for short ranges) or whole decade
  const floorNice = (v: number): number => {
    const p = 10 ** Math.floor(Math.log10(v) + 1e-12);
    if (decades >= 3) return p;
    let best = p;
    for (const s of steps) if (s * p <= v * (1 + 1e-12)) best = s * p;
    return best;
  };
  const ceilNice = (v: number): number => {
    const p = 10 ** Math.floor(Math.log10(v) - 1e-12);
    if (decades >= 3) return p * 10;
    for (const s of steps) if (s * p >= v * (1 - 1e-12)) return s * p;
    return p * 10;
  };
  // below three decades keep the data range when at least two labelled ticks fall inside it
  const dataLo = lo;
  const dataHi = hi;
  lo = floorNice(lo);
  hi = ceilNice(hi);
  if (decades < 3) {
    let inside = 0;
    for (let d = Math.floor(Math.log10(dataLo)); d <= Math.ceil(Math.log10(dataHi)); d++) {
      for (const m of mantissas) {
        const v = m * 10 ** d;
        if (v >= dataLo * (1 - 1e-9) && v <= dataHi * (1 + 1e-9)) inside++;
      }
    }
    if (inside >= 2) {
      lo = dataLo;
      hi = dataHi;
    }
  }
  const firstDecade = Math.floor(Math.log10(lo) + 1e-12);
  const lastDecade = Math.ceil(Math.log10(hi) - 1e-12);
  const decadeStride = Math.max(1, Math.ceil((lastDecade - firstDecade) / 8));
  const ticks: ChartTick[] = [];
  for (let d = firstDecade; d <= lastDecade; d++) {
    const p = 10 ** d;
    for (let m = 1; m <= 9; m++) {
      const v = m * p;
      if (v < lo * (1 - 1e-9) || v > hi * (1 + 1e-9)) continue;
      if (m !== 1 && decadeStride > 1) continue; // minor ticks only while decades are few
      const labelled = mantissas.includes(m) && (m !== 1 || (d - firstDecade) % decadeStride === 0);
      // rounding keeps 3e-6 from printing as 2.9999999999999997e-6
      const clean = Number(v.toPrecision(12));
      ticks.push({ value: clean, label: labelled ? formatChartNumber(clean, unit) : "", major: labelled });
    }
  }
  return { ticks, min: lo, max: hi };
}

// ---------------------------------------------------------------------------------------------
// Line chart

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

function markerPath(shape: (typeof MARKERS)[number], x: number, y: number, size: number): string {
  const s = size;
  switch (shape) {
    case "circle":
    case "circle-open":
      return `M${r(x - s)},${r(y)}a${r(s)},${r(s)} 0 1,0 ${r(2 * s)},0a${r(s)},${r(s)} 0 1,0 ${r(-2 * s)},0Z`;
    case "square":
      return `M${r(x - s)},${r(y - s)}h${r(2 * s)}v${r(2 * s)}h${r(-2 * s)}Z`;
    case "triangle":
      return `M${r(x)},${r(y - s * 1.2)}L${r(x + s * 1.1)},${r(y + s * 0.8)}L${r(x - s * 1.1)},${r(y + s * 0.8)}Z`;
    case "triangle-down":
      return `M${r(x)},${r(y + s * 1.2)}L${r(x + s * 1.1)},${r(y - s * 0.8)}L${r(x - s * 1.1)},${r(y - s * 0.8)}Z`;
    case "diamond":
      return `M${r(x)},${r(y - s * 1.3)}L${r(x + s)},${r(y)}L${r(x)},${r(y + s * 1.3)}L${r(x - s)},${r(y)}Z`;
    case "cross":
      return `M${r(x - s)},${r(y - s)}L${r(x + s)},${r(y + s)}M${r(x - s)},${r(y + s)}L${r(x + s)},${r(y - s)}`;
    case "plus":
      return `M${r(x - s)},${r(y)}H${r(x + s)}M${r(x)},${r(y - s)}V${r(y + s)}`;
  }
}

function markerElement(index: number, x: number, y: number, colour: string): string {
  const shape = MARKERS[index % MARKERS.length] ?? "circle";
  const open = shape === "cross" || shape === "plus" || shape === "circle-open";
  const fill = open ? "none" : colour;
  return `<path d="${markerPath(shape, x, y, 3.2)}" fill="${fill}" stroke="${colour}" stroke-width="1.4"/>`;
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
  const xUnit = options.xUnit ?? "";
  const yUnit = options.yUnit ?? "";
  const y2 = options.secondaryAxis;
  const y2Unit = y2?.unit ?? "";

  const xs: number[] = [];
  const ys: number[] = [];
  const y2s: number[] = [];
  let drawable = 0;
  for (const s of series) {
    const n = Math.min(s.x.length, s.y.length);
    const onSecondary = s.axis === "secondary" && y2 !== undefined;
    for (let i = 0; i < n; i++) {
      const xv = s.x[i] as number;
      const yv = s.y[i] as number;
      if (!Number.isFinite(xv) || !Number.isFinite(yv)) continue;
      if (options.xLog === true && !(xv > 0)) continue;
      xs.push(xv);
      (onSecondary ? y2s : ys).push(yv);
      drawable++;
    }
  }
  const xAxis = makeAxis(xs, options.xLog === true, xUnit, options.xRange);
  const yAxis = makeAxis(ys, options.yLog === true, yUnit, options.yRange);
  const y2Axis = y2 === undefined ? undefined : makeAxis(y2s, y2.log === true, y2Unit);

  // layout
  const fontSize = 12;
  const titleSize = 15;
  const yLabelWidth = Math.max(...yAxis.ticks.map((t) => textWidth(t.label, fontSize)), 20);
  const y2LabelWidth = y2Axis === undefined ? 0 : Math.max(...y2Axis.ticks.map((t) => textWidth(t.label, fontSize)), 20);
  const left = 30 + yLabelWidth + 10;
  const right = y2Axis === undefined ? 24 : 30 + y2LabelWidth + 10;
  const top = 40;
  // legend rows
  const legendItems = series.map((s, i) => ({ s, i, w: 34 + textWidth(s.name + (s.axis === "secondary" && y2 !== undefined ? " (right axis)" : ""), fontSize) + 18 }));
  const legendRows: { s: ChartSeries; i: number; w: number }[][] = [];
  let row: { s: ChartSeries; i: number; w: number }[] = [];
  let rowWidth = 0;
  const legendMax = width - 40;
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
  const legendHeight = legendRows.length * 18;
  const bottom = 56 + legendHeight + (legendRows.length > 0 ? 6 : 0);
  const plotW = Math.max(40, width - left - right);
  const plotH = Math.max(40, height - top - bottom);
  const px = (v: number): number => left + fraction(xAxis, v) * plotW;
  const py = (axis: Axis, v: number): number => top + plotH - fraction(axis, v) * plotH;

  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" aria-label="${escapeXml(options.title)}" font-family="${escapeXml(FONT)}" font-size="${fontSize}">`,
  );
  out.push(`<title>${escapeXml(options.title)}</title>`);
  out.push(`<rect x="0" y="0" width="${width}" height="${height}" fill="#ffffff"/>`);
  out.push(`<text x="${r(width / 2)}" y="24" text-anchor="middle" font-size="${titleSize}" font-weight="bold" fill="${INK}">${escapeXml(options.title)}</text>`);

  // grid and ticks
  const grid: string[] = [];
  const labels: string[] = [];
  for (const t of xAxis.ticks) {
    const x = px(t.value);
    if (!Number.isFinite(x)) continue;
    grid.push(`<line x1="${r(x)}" y1="${top}" x2="${r(x)}" y2="${r(top + plotH)}" stroke="${t.major ? GRID : GRID_MINOR}" stroke-width="1"/>`);
    grid.push(`<line x1="${r(x)}" y1="${r(top + plotH)}" x2="${r(x)}" y2="${r(top + plotH + (t.major ? 5 : 3))}" stroke="${INK}" stroke-width="1"/>`);
    if (t.label !== "") labels.push(`<text x="${r(x)}" y="${r(top + plotH + 18)}" text-anchor="middle" fill="${INK}">${escapeXml(t.label)}</text>`);
  }
  for (const t of yAxis.ticks) {
    const y = py(yAxis, t.value);
    if (!Number.isFinite(y)) continue;
    grid.push(`<line x1="${left}" y1="${r(y)}" x2="${r(left + plotW)}" y2="${r(y)}" stroke="${t.major ? GRID : GRID_MINOR}" stroke-width="1"/>`);
    grid.push(`<line x1="${r(left - (t.major ? 5 : 3))}" y1="${r(y)}" x2="${left}" y2="${r(y)}" stroke="${INK}" stroke-width="1"/>`);
    if (t.label !== "") labels.push(`<text x="${r(left - 8)}" y="${r(y + 4)}" text-anchor="end" fill="${INK}">${escapeXml(t.label)}</text>`);
  }
  if (y2Axis !== undefined) {
    for (const t of y2Axis.ticks) {
      const y = py(y2Axis, t.value);
      if (!Number.isFinite(y)) continue;
      grid.push(`<line x1="${r(left + plotW)}" y1="${r(y)}" x2="${r(left + plotW + (t.major ? 5 : 3))}" y2="${r(y)}" stroke="${INK}" stroke-width="1"/>`);
      if (t.label !== "") labels.push(`<text x="${r(left + plotW + 8)}" y="${r(y + 4)}" text-anchor="start" fill="${INK}">${escapeXml(t.label)}</text>`);
    }
  }
  out.push(`<g class="grid">${grid.join("")}</g>`);
  out.push(`<rect x="${left}" y="${top}" width="${r(plotW)}" height="${r(plotH)}" fill="none" stroke="${INK}" stroke-width="1"/>`);
  out.push(`<g class="tick-labels">${labels.join("")}</g>`);

  // axis titles
  const withUnit = (label: string, unit: string): string => (unit === "" ? label : `${label} [${unit}]`);
  out.push(`<text x="${r(left + plotW / 2)}" y="${r(top + plotH + 40)}" text-anchor="middle" fill="${INK}">${escapeXml(withUnit(options.xLabel, xUnit))}</text>`);
  out.push(`<text transform="translate(14 ${r(top + plotH / 2)}) rotate(-90)" text-anchor="middle" fill="${INK}">${escapeXml(withUnit(options.yLabel, yUnit))}</text>`);
  if (y2 !== undefined) {
    out.push(`<text transform="translate(${r(width - 12)} ${r(top + plotH / 2)}) rotate(90)" text-anchor="middle" fill="${INK}">${escapeXml(withUnit(y2.label, y2Unit))}</text>`);
  }

  // reference lines; their labels are placed so that none overprints another: a label that
  // would overlap one already placed moves down a row (vertical lines) or along (horizontal)
  const placed: { x0: number; x1: number; y0: number; y1: number }[] = [];
  const labelWidth = (text: string): number => 6.6 * Array.from(text).length + 2;
  const free = (box: { x0: number; x1: number; y0: number; y1: number }): boolean =>
    placed.every((b) => box.x1 <= b.x0 || box.x0 >= b.x1 || box.y1 <= b.y0 || box.y0 >= b.y1);
  for (const ref of options.referenceLines ?? []) {
    const w = labelWidth(ref.label);
    if (ref.axis === "x") {
      const x = px(ref.value);
      if (!(x >= left && x <= left + plotW)) continue;
      out.push(`<line class="reference" x1="${r(x)}" y1="${top}" x2="${r(x)}" y2="${r(top + plotH)}" stroke="${INK}" stroke-width="1" stroke-dasharray="3 3"/>`);
      // right of the line, or left of it near the right edge
      const lx = x + 4 + w > left + plotW ? x - 4 - w : x + 4;
      let row = 0;
      while (row < 8 && !free({ x0: lx, x1: lx + w, y0: top + 3 + 13 * row, y1: top + 16 + 13 * row })) row++;
      placed.push({ x0: lx, x1: lx + w, y0: top + 3 + 13 * row, y1: top + 16 + 13 * row });
      out.push(`<text class="reference-label" x="${r(lx)}" y="${r(top + 14 + 13 * row)}" fill="${INK}" font-size="11">${escapeXml(ref.label)}</text>`);
    } else {
      const y = py(yAxis, ref.value);
      if (!(y >= top && y <= top + plotH)) continue;
      out.push(`<line class="reference" x1="${left}" y1="${r(y)}" x2="${r(left + plotW)}" y2="${r(y)}" stroke="${INK}" stroke-width="1" stroke-dasharray="3 3"/>`);
      let lx = left + 6;
      while (lx < left + plotW - w && !free({ x0: lx, x1: lx + w, y0: y - 15, y1: y - 2 })) lx += 12;
      placed.push({ x0: lx, x1: lx + w, y0: y - 15, y1: y - 2 });
      out.push(`<text class="reference-label" x="${r(lx)}" y="${r(y - 4)}" fill="${INK}" font-size="11">${escapeXml(ref.label)}</text>`);
    }
  }

  // series
  const clipId = `${options.idPrefix ?? `chart-${hashText(`${options.title}|${width}|${height}|${series.map((s) => s.name).join("|")}`)}`}-plot`;
  out.push(`<defs><clipPath id="${escapeXml(clipId)}"><rect x="${left}" y="${top}" width="${r(plotW)}" height="${r(plotH)}"/></clipPath></defs>`);
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
      const x = px(s.x[i] as number);
      const y = py(axis, s.y[i] as number);
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
  out.push(`<g clip-path="url(#${escapeXml(clipId)})">${drawn.join("")}</g>`);
  if (drawable === 0) {
    out.push(`<text x="${r(left + plotW / 2)}" y="${r(top + plotH / 2)}" text-anchor="middle" fill="#777777" font-size="14">no data</text>`);
  }

  // legend
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
      const name = s.name + (s.axis === "secondary" && y2 !== undefined ? " (right axis)" : "");
      legend.push(`<text x="${r(x + 34)}" y="${r(y)}" fill="${INK}">${escapeXml(name)}</text>`);
      x += w;
    }
  });
  out.push(`<g class="legend">${legend.join("")}</g>`);
  out.push("</svg>");
  return out.join("\n");
}

// ---------------------------------------------------------------------------------------------
// Bar chart

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
