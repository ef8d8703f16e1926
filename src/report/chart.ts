/**
 * Dependency-free SVG charts for reports and docs: line charts on linear or logarithmic axes
 * (with an optional second y axis) and horizontal bar charts for loss breakdowns.
 *
 * The output is one self-contained `<svg>` string (no scripts, no external fonts or styles),
 * readable on screen and in black-and-white print: every series has its own colour, dash
 * pattern and marker shape, so it can be told apart without colour. Tick labels use SI
 * prefixes with the axis unit (`10 kHz`, `1.5 kW`).
 *
 * The pieces: `chart-text.ts` (labels and escaping), `chart-ticks.ts` (axis ticks),
 * `chart-style.ts` (palette, dashes, markers), `line-chart.ts` and `bar-chart.ts`; this file
 * holds the public option types and re-exports the rest.
 *
 * @packageDocumentation
 */

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

export { CHART_PALETTE } from "./chart-style.js";
export { escapeXml, formatChartNumber } from "./chart-text.js";
export { linearTicks, logTicks } from "./chart-ticks.js";
export type { ChartTick } from "./chart-ticks.js";
export { lineChart } from "./line-chart.js";
export { barChart } from "./bar-chart.js";
