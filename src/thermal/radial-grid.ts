/**
 * The finite-volume grid of {@link radialHeatUp}: nodes refined toward the heated surface,
 * control-volume faces, volumes and face areas per unit heated surface, and the share of an
 * exponential skin-layer source in each volume.
 *
 * @packageDocumentation
 */
import { gaussLegendreRule, gaussLegendrePanel } from "../special/internal.js";

const RULE_8 = gaussLegendreRule(8);

/** Nodes, faces and geometry factors of the grid from `inner` (core or bore) to `size` (surface). */
export interface RadialGrid {
  readonly span: number;
  readonly x: Float64Array;
  readonly faces: Float64Array;
  readonly volume: Float64Array;
  readonly faceArea: Float64Array;
  readonly totalVolume: number;
}

/** The grid of `n` cells between `inner` and `size` for a skin depth (0: uniform). */
export function radialGrid(inner: number, size: number, n: number, skinDepth: number, cylinder: boolean): RadialGrid {
  // Grid: nodes x_0 = inner (core or bore) … x_N = size (surface), geometric refinement toward the surface.
  const span = size - inner;
  const x = buildGrid(span, n, skinDepth);
  for (let i = 0; i <= n; i++) x[i] = inner + x[i]!;
  x[n] = size;
  const faces = new Float64Array(n + 2); // CV boundaries: faces[i] = left boundary of CV i
  faces[0] = inner;
  for (let i = 1; i <= n; i++) faces[i] = 0.5 * (x[i - 1]! + x[i]!);
  faces[n + 1] = size;
  // Geometry factors per unit heated surface: volume of CV i and area of face i+1/2, both
  // divided by the heated area (cylinder: per radian and metre, divided by R).
  const volume = new Float64Array(n + 1);
  const faceArea = new Float64Array(n); // between node i and i+1
  let totalVolume = 0;
  for (let i = 0; i <= n; i++) {
    const a = faces[i]!;
    const b = faces[i + 1]!;
    volume[i] = cylinder ? (0.5 * (b * b - a * a)) / size : b - a;
    totalVolume += volume[i]!;
  }
  for (let i = 0; i < n; i++) faceArea[i] = cylinder ? faces[i + 1]! / size : 1;
  return { span, x, faces, volume, faceArea, totalVolume };
}

/**
 * Node positions 0 … size: uniform, or geometric toward the surface so that the outer spacing
 * is at most a quarter of the skin depth (growth ratio ≤ 1.25 inward).
 */
export function buildGrid(size: number, n: number, skinDepth: number): Float64Array {
  const x = new Float64Array(n + 1);
  const uniform = size / n;
  const wanted = skinDepth > 0 ? Math.min(uniform, 0.25 * skinDepth) : uniform;
  let ratio = 1;
  if (wanted < uniform) {
    // Solve wanted·(ratio^n − 1)/(ratio − 1) = size for ratio in (1, 1.25].
    const total = (r: number): number => (wanted * (Math.pow(r, n) - 1)) / (r - 1);
    if (total(1.25) <= size) ratio = 1.25;
    else {
      let lo = 1 + 1e-12;
      let hi = 1.25;
      for (let i = 0; i < 200; i++) {
        const m = 0.5 * (lo + hi);
        if (total(m) < size) lo = m;
        else hi = m;
      }
      ratio = 0.5 * (lo + hi);
    }
  }
  if (ratio === 1) {
    for (let i = 0; i <= n; i++) x[i] = i * uniform;
  } else {
    // Spacings from the surface inward: s, s·r, s·r², …, scaled to sum to size.
    const spacings = new Float64Array(n);
    let sum = 0;
    for (let j = 0; j < n; j++) {
      spacings[j] = Math.pow(ratio, j);
      sum += spacings[j]!;
    }
    let position = size;
    x[n] = size;
    for (let j = 0; j < n; j++) {
      position -= (spacings[j]! * size) / sum;
      x[n - 1 - j] = position;
    }
    x[0] = 0;
  }
  return x;
}

/**
 * Share of the generated power in each control volume, for a density ∝ e^{−2(R−r)/δ} (weighted by
 * r in a cylinder); δ = 0 puts it all in the surface volume.
 */
export function generationShares(
  faces: Float64Array,
  n: number,
  size: number,
  skinDepth: number,
  cylinder: boolean,
): Float64Array {
  const share = new Float64Array(n + 1);
  if (skinDepth === 0) {
    share[n] = 1;
    return share;
  }
  const beta = 2 / skinDepth;
  let total = 0;
  for (let i = 0; i <= n; i++) {
    const a = faces[i]!;
    const b = faces[i + 1]!;
    let w: number;
    if (!cylinder) {
      // ∫_a^b e^{β(x−R)} dx = e^{β(b−R)} (1 − e^{−β(b−a)}) / β
      w = (Math.exp(beta * (b - size)) * -Math.expm1(-beta * (b - a))) / beta;
    } else if (beta * (b - a) > 1) {
      // ∫_a^b r e^{β(r−R)} dr = [e^{β(r−R)} (r − 1/β)/β]_a^b
      w = (Math.exp(beta * (b - size)) * (b - 1 / beta) - Math.exp(beta * (a - size)) * (a - 1 / beta)) / beta;
    } else {
      w = gaussLegendrePanel((r) => r * Math.exp(beta * (r - size)), a, b, RULE_8);
    }
    share[i] = w;
    total += w;
  }
  for (let i = 0; i <= n; i++) share[i] = share[i]! / total;
  return share;
}
