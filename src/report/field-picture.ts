/**
 * The field picture of a study solved with the field model: |B| contours over the r–z half-plane
 * of the coil and part, and the power density inside the part, drawn as SVG by our own renderer
 * (marching squares for the contours, graded cells for the power density).
 */
import type { HeaterFieldPicture } from "../study/index.js";
import { escapeXml, formatChartNumber, linearTicks } from "./chart.js";

const FONT = "'DejaVu Sans', 'Helvetica Neue', Arial, sans-serif";
const INK = "#222222";
/** Number of |B| contour levels, geometric from 1/64 of the largest |B| in the air (98th percentile) to 0.9 of it. */
export const FIELD_CONTOUR_LEVELS = 9;
/** Decades of power density shown (below that, the lightest colour). */
export const POWER_DENSITY_DECADES = 3;

/** A colour between stops (0…1), as #rrggbb. */
function ramp(stops: readonly (readonly [number, number, number])[], t: number): string {
  const u = Math.min(1, Math.max(0, t)) * (stops.length - 1);
  const k = Math.min(stops.length - 2, Math.floor(u));
  const a = stops[k]!;
  const b = stops[k + 1]!;
  const f = u - k;
  const hex = (x: number): string => Math.round(x).toString(16).padStart(2, "0");
  return `#${hex(a[0] + (b[0] - a[0]) * f)}${hex(a[1] + (b[1] - a[1]) * f)}${hex(a[2] + (b[2] - a[2]) * f)}`;
}

/** Contour colours: pale to deep blue as |B| rises. */
const CONTOUR_STOPS = [
  [150, 190, 230],
  [60, 110, 190],
  [20, 40, 110],
] as const;
/** Power-density colours: pale yellow to dark red as the density rises. */
const HEAT_STOPS = [
  [255, 245, 200],
  [250, 170, 60],
  [210, 60, 20],
  [110, 10, 10],
] as const;

function num(x: number): string {
  return String(Math.round(x * 100) / 100);
}

/**
 * Contour segments of a grid at one level (marching squares; saddles resolved by the cell
 * mean), as pairs of points in grid coordinates (i along r, j along z, fractional).
 */
export function contourSegments(values: readonly number[], columns: number, rows: number, level: number): [number, number, number, number][] {
  const out: [number, number, number, number][] = [];
  const v = (i: number, j: number): number => values[j * columns + i]!;
  for (let j = 0; j + 1 < rows; j++) {
    for (let i = 0; i + 1 < columns; i++) {
      const a = v(i, j);
      const b = v(i + 1, j);
      const c = v(i + 1, j + 1);
      const d = v(i, j + 1);
      if (Number.isNaN(a) || Number.isNaN(b) || Number.isNaN(c) || Number.isNaN(d)) continue;
      const index = (a >= level ? 1 : 0) | (b >= level ? 2 : 0) | (c >= level ? 4 : 0) | (d >= level ? 8 : 0);
      if (index === 0 || index === 15) continue;
      const t = (p: number, q: number): number => (p === q ? 0.5 : (level - p) / (q - p));
      // edge points: bottom (a–b), right (b–c), top (d–c), left (a–d)
      const bottom: [number, number] = [i + t(a, b), j];
      const right: [number, number] = [i + 1, j + t(b, c)];
      const top: [number, number] = [i + t(d, c), j + 1];
      const left: [number, number] = [i, j + t(a, d)];
      const seg = (p: [number, number], q: [number, number]): void => {
        out.push([p[0], p[1], q[0], q[1]]);
      };
      switch (index) {
        case 1:
        case 14:
          seg(left, bottom);
          break;
        case 2:
        case 13:
          seg(bottom, right);
          break;
        case 3:
        case 12:
          seg(left, right);
          break;
        case 4:
        case 11:
          seg(right, top);
          break;
        case 6:
        case 9:
          seg(bottom, top);
          break;
        case 7:
        case 8:
          seg(left, top);
          break;
        case 5:
        case 10: {
          const centreHigh = (a + b + c + d) / 4 >= level;
          if ((index === 5) === centreHigh) {
            seg(left, top);
            seg(bottom, right);
          } else {
            seg(left, bottom);
            seg(right, top);
          }
          break;
        }
      }
    }
  }
  return out;
}

/**
 * |B| at the grid nodes outside the part, the turns and the passive regions (NaN inside them:
 * the contours are drawn in the air, where the grid resolves the field; inside a conductor the
 * field lives in the skin depth, which the power density shows).
 */
export function airFluxDensity(picture: HeaterFieldPicture): number[] {
  const columns = picture.r.length;
  const inside = (r: number, z: number): boolean =>
    [...picture.part, ...picture.passive].some((p) => r > p.rMin && r < p.rMax && z > p.zMin && z < p.zMax) || picture.turns.some((t) => Math.hypot(r - t.r, z - t.z) < t.radius);
  return picture.fluxDensity.map((b, k) => (inside(picture.r[k % columns]!, picture.z[Math.floor(k / columns)]!) ? NaN : b));
}

/**
 * The |B| contour levels of a picture: geometric, ascending [T], up to the 98th percentile of
 * |B| in the air (a magnetic part's corners would otherwise set the scale for one grid node).
 */
export function fieldContourLevels(picture: HeaterFieldPicture): number[] {
  const air = airFluxDensity(picture)
    .filter((b) => !Number.isNaN(b))
    .sort((a, b) => a - b);
  const peak = air.length === 0 ? 0 : air[Math.min(air.length - 1, Math.floor(0.98 * air.length))]!;
  if (!(peak > 0)) return [];
  const lo = peak / 64;
  const hi = 0.9 * peak;
  return Array.from({ length: FIELD_CONTOUR_LEVELS }, (_, k) => lo * (hi / lo) ** (k / (FIELD_CONTOUR_LEVELS - 1)));
}

/**
 * Power density against depth below the part's outer surface at mid-height (the first part
 * rectangle's row of cells nearest its middle), on a logarithmic scale: the skin layer, which is
 * too thin to see at the picture's scale.
 */
function depthProfile(picture: HeaterFieldPicture, x0: number, y0: number, pMax: number): string {
  const block = picture.powerDensity[0];
  if (block === undefined || !(pMax > 0)) return "";
  const nr = block.r.length - 1;
  const zMid = 0.5 * (block.z[0]! + block.z[block.z.length - 1]!);
  let row = 0;
  for (let j = 0; j + 1 < block.z.length; j++) {
    const zc = 0.5 * (block.z[j]! + block.z[j + 1]!);
    const best = 0.5 * (block.z[row]! + block.z[row + 1]!);
    if (Math.abs(zc - zMid) < Math.abs(best - zMid)) row = j;
  }
  const surface = block.r[nr]!;
  const points: [number, number][] = [];
  for (let i = nr - 1; i >= 0; i--) {
    const depth = surface - 0.5 * (block.r[i]! + block.r[i + 1]!);
    const p = block.values[row * nr + i]!;
    points.push([depth, p]);
  }
  // depth axis to where the density falls 3 decades (or the whole part)
  let depthMax = points[points.length - 1]![0];
  for (const [depth, p] of points) {
    if (p < pMax * 10 ** -POWER_DENSITY_DECADES) {
      depthMax = depth;
      break;
    }
  }
  const w = 200;
  const h = 110;
  const ticks = linearTicks(0, depthMax * 1e3, "", 4);
  const dMax = ticks.max / 1e3;
  const X = (d: number): number => x0 + (Math.min(d, dMax) / dMax) * w;
  const Y = (p: number): number => y0 + h * Math.min(1, Math.max(0, -Math.log10(Math.max(p, 1e-300) / pMax) / POWER_DENSITY_DECADES));
  const out: string[] = [];
  out.push(`<g class="depth-profile">`);
  out.push(`<text x="${num(x0)}" y="${num(y0 - 8)}">power density against depth (mid-height)</text>`);
  out.push(`<rect x="${num(x0)}" y="${num(y0)}" width="${w}" height="${h}" fill="none" stroke="#999999"/>`);
  const line = points.filter(([d]) => d <= dMax).map(([d, p], k) => `${k === 0 ? "M" : "L"}${num(X(d))} ${num(Y(p))}`).join("");
  if (line !== "") out.push(`<path d="${line}" fill="none" stroke="#b03010" stroke-width="1.5"/>`);
  for (const t of ticks.ticks) {
    const xv = X(t.value / 1e3);
    out.push(`<line x1="${num(xv)}" y1="${num(y0 + h)}" x2="${num(xv)}" y2="${num(y0 + h + 4)}" stroke="${INK}"/><text x="${num(xv)}" y="${num(y0 + h + 16)}" text-anchor="middle" font-size="10">${escapeXml(t.label)}</text>`);
  }
  out.push(`<text x="${num(x0 + w / 2)}" y="${num(y0 + h + 30)}" text-anchor="middle" font-size="10">depth below the outer surface (mm)</text>`);
  out.push(`<text x="${num(x0 + w - 4)}" y="${num(y0 + 12)}" text-anchor="end" font-size="10">${escapeXml(formatChartNumber(pMax, "W/m³"))}</text>`);
  out.push(`<text x="${num(x0 + w - 4)}" y="${num(y0 + h - 4)}" text-anchor="end" font-size="10">${escapeXml(formatChartNumber(pMax * 10 ** -POWER_DENSITY_DECADES, "W/m³"))}</text>`);
  out.push(`</g>`);
  return out.join("");
}

/**
 * The field picture as an SVG document: |B| contours (RMS, geometric levels) over the r–z
 * half-plane, the power density in the part on a logarithmic colour scale, the turns and the
 * part outlined, r and z axes in mm, a legend of the levels and a colour bar.
 */
export function fieldPictureSvg(picture: HeaterFieldPicture): string {
  const r = picture.r;
  const z = picture.z;
  const columns = r.length;
  const rows = z.length;
  const rSpan = r[columns - 1]! - r[0]!;
  const zSpan = z[rows - 1]! - z[0]!;
  // equal scales in r and z, the plot at most 460 wide and 560 high
  const scale = Math.min(460 / rSpan, 560 / zSpan);
  const plotW = rSpan * scale;
  const plotH = zSpan * scale;
  const left = 64;
  const top = 40;
  const legendW = 250;
  const width = Math.ceil(left + plotW + 24 + legendW);
  const height = Math.ceil(Math.max(top + plotH + 56, top + 36 + FIELD_CONTOUR_LEVELS * 16 + 160 + 190));
  const X = (rv: number): number => left + (rv - r[0]!) * scale;
  const Y = (zv: number): number => top + (z[rows - 1]! - zv) * scale;
  const gx = (i: number): number => {
    const k = Math.min(columns - 2, Math.floor(i));
    return r[k]! + (r[k + 1]! - r[k]!) * (i - k);
  };
  const gy = (j: number): number => {
    const k = Math.min(rows - 2, Math.floor(j));
    return z[k]! + (z[k + 1]! - z[k]!) * (j - k);
  };
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" role="img" font-family="${escapeXml(FONT)}" font-size="12" class="field-picture">`);
  out.push(`<title>${escapeXml(`Field at ${formatChartNumber(picture.frequency, "Hz")}, ${formatChartNumber(picture.coilCurrentRms, "A")} RMS in the coil`)}</title>`);
  out.push(`<rect x="0" y="0" width="${width}" height="${height}" fill="#ffffff"/>`);
  out.push(`<text x="${left}" y="22" font-size="14" fill="${INK}">${escapeXml(`|B| contours and power density in the part, ${formatChartNumber(picture.frequency, "Hz")}, ${formatChartNumber(picture.coilCurrentRms, "A")} RMS`)}</text>`);
  out.push(`<defs><clipPath id="field-plot"><rect x="${num(left)}" y="${num(top)}" width="${num(plotW)}" height="${num(plotH)}"/></clipPath></defs>`);
  out.push(`<rect x="${num(left)}" y="${num(top)}" width="${num(plotW)}" height="${num(plotH)}" fill="#fbfbfb" stroke="#999999"/>`);
  // power density in the part
  let pMax = 0;
  for (const block of picture.powerDensity) for (const p of block.values) if (p > pMax) pMax = p;
  out.push(`<g class="power-density" clip-path="url(#field-plot)">`);
  for (const block of picture.powerDensity) {
    const nr = block.r.length - 1;
    for (let j = 0; j + 1 < block.z.length; j++) {
      for (let i = 0; i < nr; i++) {
        const p = block.values[j * nr + i]!;
        const t = pMax > 0 && p > 0 ? 1 + Math.log10(p / pMax) / POWER_DENSITY_DECADES : 0;
        const x0 = X(block.r[i]!);
        const x1 = X(block.r[i + 1]!);
        const y0 = Y(block.z[j + 1]!);
        const y1 = Y(block.z[j]!);
        out.push(`<rect x="${num(x0)}" y="${num(y0)}" width="${num(Math.max(0.01, x1 - x0))}" height="${num(Math.max(0.01, y1 - y0))}" fill="${ramp(HEAT_STOPS, t)}" data-power-density="${p.toPrecision(3)}"/>`);
      }
    }
  }
  out.push(`</g>`);
  // |B| contours
  const levels = fieldContourLevels(picture);
  const air = airFluxDensity(picture);
  out.push(`<g class="contours" fill="none" clip-path="url(#field-plot)">`);
  levels.forEach((level, k) => {
    const segments = contourSegments(air, columns, rows, level);
    const d = segments.map(([i0, j0, i1, j1]) => `M${num(X(gx(i0)))} ${num(Y(gy(j0)))}L${num(X(gx(i1)))} ${num(Y(gy(j1)))}`).join("");
    const colour = ramp(CONTOUR_STOPS, levels.length > 1 ? k / (levels.length - 1) : 1);
    out.push(`<path class="contour" data-level="${level.toPrecision(4)}" stroke="${colour}" stroke-width="1.1" d="${d === "" ? "M0 0" : d}"/>`);
  });
  out.push(`</g>`);
  // outlines: part, passive regions, turns
  out.push(`<g class="outlines">`);
  for (const p of picture.part) out.push(`<rect class="part" x="${num(X(p.rMin))}" y="${num(Y(p.zMax))}" width="${num((p.rMax - p.rMin) * scale)}" height="${num((p.zMax - p.zMin) * scale)}" fill="none" stroke="#555555" stroke-width="0.5"/>`);
  for (const p of picture.passive) out.push(`<rect class="passive" x="${num(X(p.rMin))}" y="${num(Y(p.zMax))}" width="${num((p.rMax - p.rMin) * scale)}" height="${num((p.zMax - p.zMin) * scale)}" fill="#9e9e9e" fill-opacity="0.35" stroke="#555555" stroke-dasharray="4 2"/>`);
  for (const t of picture.turns) {
    out.push(`<circle class="turn" cx="${num(X(t.r))}" cy="${num(Y(t.z))}" r="${num(Math.max(0.8, t.radius * scale))}" fill="#b87333" stroke="#5a3311" stroke-width="0.6"/>`);
    if (t.innerRadius > 0) out.push(`<circle cx="${num(X(t.r))}" cy="${num(Y(t.z))}" r="${num(Math.max(0.4, t.innerRadius * scale))}" fill="#ffffff"/>`);
  }
  out.push(`</g>`);
  // axes in mm
  const rt = linearTicks(r[0]! * 1e3, r[columns - 1]! * 1e3, "", 6);
  const zt = linearTicks(z[0]! * 1e3, z[rows - 1]! * 1e3, "", 8);
  out.push(`<g class="axes" fill="${INK}">`);
  for (const t of rt.ticks) {
    const xv = X(t.value / 1e3);
    if (xv < left - 0.5 || xv > left + plotW + 0.5) continue;
    out.push(`<line x1="${num(xv)}" y1="${num(top + plotH)}" x2="${num(xv)}" y2="${num(top + plotH + 5)}" stroke="${INK}"/><text x="${num(xv)}" y="${num(top + plotH + 18)}" text-anchor="middle">${escapeXml(t.label)}</text>`);
  }
  for (const t of zt.ticks) {
    const yv = Y(t.value / 1e3);
    if (yv < top - 0.5 || yv > top + plotH + 0.5) continue;
    out.push(`<line x1="${num(left - 5)}" y1="${num(yv)}" x2="${num(left)}" y2="${num(yv)}" stroke="${INK}"/><text x="${num(left - 8)}" y="${num(yv + 4)}" text-anchor="end">${escapeXml(t.label)}</text>`);
  }
  out.push(`<text x="${num(left + plotW / 2)}" y="${num(top + plotH + 38)}" text-anchor="middle">r (mm, from the axis)</text>`);
  out.push(`<text transform="translate(16 ${num(top + plotH / 2)}) rotate(-90)" text-anchor="middle">z (mm)</text>`);
  out.push(`</g>`);
  // legend: contour levels, then the power-density colour bar
  const lx = left + plotW + 24;
  out.push(`<g class="legend" fill="${INK}">`);
  out.push(`<text x="${num(lx)}" y="${num(top + 4)}">|B| (RMS)</text>`);
  levels
    .slice()
    .reverse()
    .forEach((level, k) => {
      const y = top + 20 + k * 16;
      const colour = ramp(CONTOUR_STOPS, levels.length > 1 ? (levels.length - 1 - k) / (levels.length - 1) : 1);
      out.push(`<line x1="${num(lx)}" y1="${num(y - 4)}" x2="${num(lx + 22)}" y2="${num(y - 4)}" stroke="${colour}" stroke-width="2"/><text x="${num(lx + 28)}" y="${num(y)}">${escapeXml(formatChartNumber(level, "T"))}</text>`);
    });
  const by = top + 36 + levels.length * 16;
  out.push(`<text x="${num(lx)}" y="${num(by)}">power density in the part</text>`);
  const steps = 30;
  const barH = 140;
  for (let k = 0; k < steps; k++) {
    const t = 1 - k / steps;
    out.push(`<rect x="${num(lx)}" y="${num(by + 10 + (k * barH) / steps)}" width="16" height="${num(barH / steps + 0.3)}" fill="${ramp(HEAT_STOPS, t)}"/>`);
  }
  for (let dec = 0; dec <= POWER_DENSITY_DECADES; dec++) {
    const y = by + 10 + (dec * barH) / POWER_DENSITY_DECADES;
    out.push(`<text x="${num(lx + 22)}" y="${num(y + 4)}">${escapeXml(formatChartNumber(pMax * 10 ** -dec, "W/m³"))}</text>`);
  }
  out.push(depthProfile(picture, lx, by + barH + 40, pMax));
  out.push(`</g>`);
  out.push(`</svg>`);
  return out.join("");
}
