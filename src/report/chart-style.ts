/**
 * The look shared by the charts: series colours, dash patterns and marker shapes (so that
 * series stay apart in grey-scale print), the font, ink and grid colours, and the marker paths.
 *
 * @packageDocumentation
 */
import { r } from "./chart-text.js";

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

/** Dash pattern of each series, in palette order. */
export const DASHES = ["", "7 4", "2 3", "10 3 2 3", "4 2", "12 4", "1 2", "6 2 2 2 2 2"];
const MARKERS = ["circle", "square", "triangle", "diamond", "cross", "triangle-down", "plus", "circle-open"] as const;
export const FONT = "'DejaVu Sans', 'Helvetica Neue', Arial, sans-serif";
export const INK = "#222222";
export const GRID = "#d9d9d9";
export const GRID_MINOR = "#eeeeee";

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

/** The marker of series `index` at (x, y) [px] as an SVG path element. */
export function markerElement(index: number, x: number, y: number, colour: string): string {
  const shape = MARKERS[index % MARKERS.length] ?? "circle";
  const open = shape === "cross" || shape === "plus" || shape === "circle-open";
  const fill = open ? "none" : colour;
  return `<path d="${markerPath(shape, x, y, 3.2)}" fill="${fill}" stroke="${colour}" stroke-width="1.4"/>`;
}
