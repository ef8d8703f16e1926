/**
 * Samples of a field solution for the report's field picture: |B| on a grid over the coil and
 * part, the power density in the part on cells graded into the skin depth.
 *
 * @packageDocumentation
 */
import type { AxisymmetricFieldResult, FieldShape } from "../field/index.js";
import type { HeaterFieldGeometry } from "./field-model.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import type { HeaterFieldPicture } from "./study-heater-types.js";

/** Columns of the |B| grid (rows follow from the aspect ratio, at most 2.5 × as many). */
const COLUMNS = 56;

type Rect = { rMin: number; rMax: number; zMin: number; zMax: number };

function boundsOf(s: FieldShape): Rect {
  return s.kind === "rectangle" ? { rMin: s.rMin, rMax: s.rMax, zMin: s.zMin, zMax: s.zMax } : { rMin: s.r - s.radius, rMax: s.r + s.radius, zMin: s.z - s.radius, zMax: s.z + s.radius };
}

/** Cell edges from lo to hi, fine (`first`) at a graded end and growing by 1.3 away from it. */
function graded(lo: number, hi: number, first: number, atLo: boolean, atHi: boolean): number[] {
  const span = hi - lo;
  const steps = (half: number): number[] => {
    const out = [0];
    let h = Math.min(first, half / 2);
    while (out[out.length - 1]! + h < half) {
      out.push(out[out.length - 1]! + h);
      h *= 1.3;
    }
    out.push(half);
    return out;
  };
  if (atLo && atHi) {
    const s = steps(span / 2);
    const left = s.map((x) => lo + x);
    const right = s.slice(0, -1).reverse().map((x) => hi - x);
    return [...left, ...right];
  }
  if (atHi) return steps(span).reverse().map((x) => hi - x);
  if (atLo) return steps(span).map((x) => lo + x);
  const n = 12;
  return Array.from({ length: n + 1 }, (_, i) => lo + (span * i) / n);
}

/** The field picture of a solution at 1 A, scaled to the operating point's coil current. */
export function fieldPicture(geometry: HeaterFieldGeometry, solution: AxisymmetricFieldResult, operating: HeaterOperatingPoint): HeaterFieldPicture {
  const current = operating.coilCurrentRms;
  const turnShapes = Array.isArray(geometry.coil.turns) ? (geometry.coil.turns as readonly FieldShape[]) : [(geometry.coil.turns as { shape: FieldShape }).shape];
  const bodies: Rect[] = [...turnShapes, ...geometry.part, ...geometry.passive.map((p) => p.shape)].map(boundsOf);
  let rMax = 0;
  let zMin = Infinity;
  let zMax = -Infinity;
  for (const b of bodies) {
    rMax = Math.max(rMax, b.rMax);
    zMin = Math.min(zMin, b.zMin);
    zMax = Math.max(zMax, b.zMax);
  }
  // the view: the arrangement with a margin, the plate (wide) cut to 1.5 × the coil
  const coilBounds = turnShapes.map(boundsOf);
  const coilR = Math.max(...coilBounds.map((b) => b.rMax));
  const rView = Math.min(rMax, 1.6 * coilR) * 1.25;
  const margin = 0.3 * Math.max(zMax - zMin, rView) ;
  const z0 = zMin - margin * 0.5;
  const z1 = zMax + margin * 0.5;
  const columns = COLUMNS;
  const rows = Math.max(8, Math.min(Math.round(2.5 * columns), Math.round((columns * (z1 - z0)) / rView)));
  const r = Array.from({ length: columns + 1 }, (_, i) => (rView * i) / columns);
  const z = Array.from({ length: rows + 1 }, (_, j) => z0 + ((z1 - z0) * j) / rows);
  const fluxDensity: number[] = [];
  for (const zj of z) {
    for (const ri of r) {
      const b = solution.fieldAt({ r: ri, z: zj });
      fluxDensity.push(current * Math.sqrt(b.br.re * b.br.re + b.br.im * b.br.im + b.bz.re * b.bz.re + b.bz.im * b.bz.im));
    }
  }
  const depth = operating.partSkinDepth ?? (rMax / 50);
  const powerDensity = geometry.part.map((shape) => {
    const p = boundsOf(shape);
    const re = graded(p.rMin, p.rMax, depth / 4, p.rMin > 0, true);
    const ze = graded(p.zMin, p.zMax, depth / 4, true, true);
    const values: number[] = [];
    for (let j = 0; j + 1 < ze.length; j++) {
      for (let i = 0; i + 1 < re.length; i++) {
        const rc = 0.5 * (re[i]! + re[i + 1]!);
        const zc = 0.5 * (ze[j]! + ze[j + 1]!);
        values.push(current * current * solution.powerDensityAt({ r: rc, z: zc }));
      }
    }
    return { r: re, z: ze, values };
  });
  return {
    temperature: operating.partTemperature,
    frequency: operating.frequency,
    coilCurrentRms: current,
    r,
    z,
    fluxDensity,
    powerDensity,
    turns: turnShapes.map((t) => (t.kind === "circle" ? { r: t.r, z: t.z, radius: t.radius, innerRadius: t.innerRadius ?? 0 } : { r: 0.5 * (t.rMin + t.rMax), z: 0.5 * (t.zMin + t.zMax), radius: 0.5 * (t.rMax - t.rMin), innerRadius: 0 })),
    part: geometry.part.map(boundsOf),
    passive: geometry.passive.map((p) => boundsOf(p.shape)),
  };
}
