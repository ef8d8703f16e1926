/**
 * Volume and heat-losing surface of the study's part: the workpiece module's shapes, or a body
 * of revolution given as r–z rectangles.
 *
 * @packageDocumentation
 */
import { workpieceGeometry } from "../workpiece/index.js";
import type { ResolvedPart, ResolvedRectangle } from "./read-description.js";

/**
 * Volume and outer surface of a body of revolution given as r–z rectangles that do not overlap:
 * the volume is the sum of the rings'; the surface the rectangles' edges less the stretches two
 * rectangles share (a horizontal edge from r₁ to r₂ sweeps $\pi(r_2^2 - r_1^2)$, a vertical one
 * at r over a height h sweeps $2\pi r h$).
 */
export function rectanglesGeometry(rectangles: readonly ResolvedRectangle[]): { volume: number; surfaceArea: number } {
  let volume = 0;
  let area = 0;
  const overlap = (a0: number, a1: number, b0: number, b1: number): [number, number] | null => {
    const lo = Math.max(a0, b0);
    const hi = Math.min(a1, b1);
    return hi > lo ? [lo, hi] : null;
  };
  for (const a of rectangles) {
    volume += Math.PI * (a.rMax * a.rMax - a.rMin * a.rMin) * (a.zMax - a.zMin);
    // horizontal edges (bottom, top): their area less the stretches covered by a neighbour's opposite edge
    for (const [z, opposite] of [[a.zMin, "zMax"], [a.zMax, "zMin"]] as const) {
      let covered = 0;
      for (const b of rectangles) {
        if (b === a || b[opposite] !== z) continue;
        const o = overlap(a.rMin, a.rMax, b.rMin, b.rMax);
        if (o !== null) covered += Math.PI * (o[1] * o[1] - o[0] * o[0]);
      }
      area += Math.PI * (a.rMax * a.rMax - a.rMin * a.rMin) - covered;
    }
    // vertical edges (inner, outer)
    for (const [r, opposite] of [[a.rMin, "rMax"], [a.rMax, "rMin"]] as const) {
      if (r === 0) continue;
      let covered = 0;
      for (const b of rectangles) {
        if (b === a || b[opposite] !== r) continue;
        const o = overlap(a.zMin, a.zMax, b.zMin, b.zMax);
        if (o !== null) covered += o[1] - o[0];
      }
      area += 2 * Math.PI * r * (a.zMax - a.zMin - covered);
    }
  }
  return { volume, surfaceArea: area };
}

/** Geometry of the part: volume and heat-losing surface (`workpieceGeometry`). */
export function partGeometry(part: ResolvedPart): { volume: number; surfaceArea: number } {
  if (part.rectangles !== undefined) return rectanglesGeometry(part.rectangles);
  switch (part.shape) {
    case "bar":
      return workpieceGeometry({ shape: "bar", radius: part.radius, length: part.length });
    case "tube":
      return workpieceGeometry({ shape: "tube", outerRadius: part.outerRadius, innerRadius: part.outerRadius - part.wallThickness, length: part.length });
    case "ring":
      return workpieceGeometry({ shape: "tube", outerRadius: part.outerRadius, innerRadius: part.innerRadius, length: part.height });
    case "plate":
      return workpieceGeometry({ shape: "plate", length: part.length, width: part.width, thickness: part.thickness });
  }
}
