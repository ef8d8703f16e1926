/**
 * Reading the options of the conduction solver (shared by {@link axisymmetricHeatConduction}
 * and {@link fieldHeatUp}): the part's rectangle, cells, surface exchange, insulated faces and
 * time settings, and the graded cell boundaries. Internal.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireInRange,
  requireInteger,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { checkConductiveMaterial } from "../materials/check-material.js";
import type { PartCells, PartFace, PartSurfaceExchange } from "./conduction-types.js";
import type { FieldRectangle } from "./field-types.js";

const RECT_KEYS = ["kind", "rMin", "rMax", "zMin", "zMax"] as const;
const CELL_KEYS = ["radial", "axial"] as const;
const SURFACE_KEYS = ["convectionCoefficient", "emissivity", "ambientTemperature"] as const;
const FACES = ["outer", "inner", "lower", "upper"] as const;

/** Checks a rectangle (used by the conduction and the coupled heat-up). */
export function checkPartRectangle(where: string, path: string, value: unknown): FieldRectangle {
  const o = requireKnownKeys(where, path, requireObject(where, path, value), RECT_KEYS);
  requireOneOf(where, `${path}.kind`, o.kind, ["rectangle"] as const);
  const rMin = requireNonNegative(where, `${path}.rMin`, o.rMin, "m");
  const rMax = requirePositive(where, `${path}.rMax`, o.rMax, "m");
  if (!(rMax > rMin)) throw new InputError(where, `${path}.rMax`, rMax, "m", `a finite number > rMin = ${rMin}`);
  const zMin = requireInRange(where, `${path}.zMin`, o.zMin, "m", -1e6, 1e6);
  const zMax = requireInRange(where, `${path}.zMax`, o.zMax, "m", -1e6, 1e6);
  if (!(zMax > zMin)) throw new InputError(where, `${path}.zMax`, zMax, "m", `a finite number > zMin = ${zMin}`);
  return { kind: "rectangle", rMin, rMax, zMin, zMax };
}

/** Checks the cell counts. */
export function checkPartCells(where: string, value: unknown, path = "cells"): PartCells {
  if (value === undefined) return { radial: 16, axial: 16 };
  const o = requireKnownKeys(where, path, requireObject(where, path, value), CELL_KEYS);
  const radial = requireInteger(where, `${path}.radial`, o.radial, 2);
  const axial = requireInteger(where, `${path}.axial`, o.axial, 1);
  if (radial > 200) throw new InputError(where, `${path}.radial`, radial, "", "an integer 2 … 200");
  if (axial > 200) throw new InputError(where, `${path}.axial`, axial, "", "an integer 1 … 200");
  return { radial, axial };
}

/** Checks the surface exchange. */
export function checkPartSurface(where: string, value: unknown): PartSurfaceExchange {
  const o = requireKnownKeys(where, "surface", requireObject(where, "surface", value), SURFACE_KEYS);
  return {
    convectionCoefficient: requireNonNegative(where, "surface.convectionCoefficient", o.convectionCoefficient, "W/(m²·K)"),
    emissivity: requireInRange(where, "surface.emissivity", o.emissivity, "", 0, 1),
    ambientTemperature: requirePositive(where, "surface.ambientTemperature", o.ambientTemperature, "K"),
  };
}

/** Checks the list of insulated faces. */
export function checkInsulatedFaces(where: string, value: unknown): Set<PartFace> {
  const out = new Set<PartFace>();
  if (value === undefined) return out;
  if (!Array.isArray(value)) throw new InputError(where, "insulatedFaces", value, "", 'an array of "outer", "inner", "lower", "upper"');
  (value as unknown[]).forEach((f, k) => out.add(requireOneOf(where, `insulatedFaces[${k}]`, f, FACES)));
  return out;
}

/**
 * Cell boundaries from a to b: `n` cells, graded by the power `p` towards b (`towardsA`: towards a
 * as well, symmetric). p = 1 is uniform.
 */
export function gradedEdges(a: number, b: number, n: number, p: number, both: boolean): number[] {
  const out: number[] = [];
  for (let k = 0; k <= n; k++) {
    const x = k / n;
    let s: number;
    if (both) {
      // symmetric: fine at both ends
      const y = 2 * x - 1; // −1 … 1
      s = 0.5 * (1 + Math.sign(y) * (1 - Math.pow(1 - Math.abs(y), p)));
    } else {
      s = 1 - Math.pow(1 - x, p);
    }
    out.push(a + (b - a) * s);
  }
  out[0] = a;
  out[n] = b;
  return out;
}

/** Validated inputs of the conduction solver shared with the coupled heat-up. */
export interface ConductionSetup {
  readonly shape: FieldRectangle;
  readonly material: ConductiveMaterial;
  readonly cells: PartCells;
  readonly surface: PartSurfaceExchange;
  readonly insulated: Set<PartFace>;
  readonly initial: number;
  readonly duration: number;
  readonly target: number | null;
  readonly targetLocation: "maximum" | "mean" | "centre";
  readonly temperatureStep: number;
  readonly maxTimeStep: number;
  readonly mapTimes: number[];
  /** Cell boundaries. */
  readonly rEdges: number[];
  readonly zEdges: number[];
}

/** Builds the graded cell boundaries of a part. */
export function partEdges(shape: FieldRectangle, cells: PartCells, insulated: Set<PartFace>): { rEdges: number[]; zEdges: number[] } {
  const innerExposed = shape.rMin > 0 && !insulated.has("inner");
  // radial: graded towards the mantle (and the bore when it exchanges heat)
  const rEdges = gradedEdges(shape.rMin, shape.rMax, cells.radial, 1.6, innerExposed);
  const zEdges = gradedEdges(shape.zMin, shape.zMax, cells.axial, cells.axial > 2 ? 1.6 : 1, true);
  return { rEdges, zEdges };
}

/** Reads the thermal options common to both public functions. */
export function readConductionSetup(where: string, o: Record<string, unknown>, part: Record<string, unknown> = o, prefix = ""): ConductionSetup {
  const shape = checkPartRectangle(where, `${prefix}shape`, part.shape);
  const material = checkConductiveMaterial(where, `${prefix}material`, part.material);
  const cells = checkPartCells(where, part.cells, `${prefix}cells`);
  const surface = checkPartSurface(where, o.surface);
  const insulated = checkInsulatedFaces(where, o.insulatedFaces);
  const initial = o.initialTemperature === undefined ? surface.ambientTemperature : requirePositive(where, "initialTemperature", o.initialTemperature, "K");
  const duration = requirePositive(where, "duration", o.duration, "s");
  const target = o.targetTemperature === undefined ? null : requirePositive(where, "targetTemperature", o.targetTemperature, "K");
  const targetLocation = o.targetLocation === undefined ? "maximum" : requireOneOf(where, "targetLocation", o.targetLocation, ["maximum", "mean", "centre"] as const);
  const temperatureStep = o.temperatureStep === undefined ? 4 : requirePositive(where, "temperatureStep", o.temperatureStep, "K");
  const maxTimeStep = o.maxTimeStep === undefined ? duration / 100 : requirePositive(where, "maxTimeStep", o.maxTimeStep, "s");
  let mapTimes: number[] = [];
  if (o.mapTimes !== undefined) {
    if (!Array.isArray(o.mapTimes)) throw new InputError(where, "mapTimes", o.mapTimes, "s", "an array of times ≥ 0");
    mapTimes = (o.mapTimes as unknown[]).map((t, k) => requireNonNegative(where, `mapTimes[${k}]`, t, "s")).sort((a, b) => a - b);
  }
  const { rEdges, zEdges } = partEdges(shape, cells, insulated);
  return { shape, material, cells, surface, insulated, initial, duration, target, targetLocation, temperatureStep, maxTimeStep, mapTimes, rEdges, zEdges };
}
