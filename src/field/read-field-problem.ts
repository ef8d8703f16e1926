/**
 * Reading the options of {@link solveAxisymmetricField} (and of the coupled heat-up) into the
 * discrete problem of the solver: shapes, coils (solid turns or stranded shapes), regions
 * (linear or with a B–H curve), and the checks that the bodies stay clear of each other and of
 * the axis. Internal.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireFinite,
  requireInRange,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { effectiveCurve } from "./effective-curve.js";
import type { CurvePoint } from "./effective-curve.js";
import type { SolveAxisymmetricFieldOptions } from "./field-types.js";
import type { MeshShape } from "./mesh.js";
import type { SolverBody, SolverProblem } from "./solver-types.js";

const WHERE = "solveAxisymmetricField";
const OPTION_KEYS = ["frequency", "coils", "regions", "accuracy"] as const;
const COIL_KEYS = ["name", "current", "turns", "resistivity", "model"] as const;
const REGION_KEYS = ["name", "shape", "resistivity", "relativePermeability", "magnetisation"] as const;
const MAGNETISATION_KEYS = ["curve"] as const;
const CURVE_POINT_KEYS = ["fieldStrength", "fluxDensity"] as const;
const RECT_KEYS = ["kind", "rMin", "rMax", "zMin", "zMax"] as const;
const CIRCLE_KEYS = ["kind", "r", "z", "radius", "innerRadius"] as const;
const BLOCK_KEYS = ["shape", "count"] as const;

function checkShape(path: string, value: unknown): MeshShape {
  const o = requireObject(WHERE, path, value);
  const kind = requireOneOf(WHERE, `${path}.kind`, o.kind, ["rectangle", "circle"] as const);
  if (kind === "rectangle") {
    requireKnownKeys(WHERE, path, o, RECT_KEYS);
    const rMin = requireNonNegative(WHERE, `${path}.rMin`, o.rMin, "m");
    const rMax = requireFinite(WHERE, `${path}.rMax`, o.rMax, "m");
    if (!(rMax > rMin)) throw new InputError(WHERE, `${path}.rMax`, rMax, "m", `a finite number > rMin = ${rMin}`);
    const zMin = requireFinite(WHERE, `${path}.zMin`, o.zMin, "m");
    const zMax = requireFinite(WHERE, `${path}.zMax`, o.zMax, "m");
    if (!(zMax > zMin)) throw new InputError(WHERE, `${path}.zMax`, zMax, "m", `a finite number > zMin = ${zMin}`);
    return { kind, rMin, rMax, zMin, zMax };
  }
  requireKnownKeys(WHERE, path, o, CIRCLE_KEYS);
  const radius = requirePositive(WHERE, `${path}.radius`, o.radius, "m");
  const r = requirePositive(WHERE, `${path}.r`, o.r, "m");
  if (!(r > radius)) throw new InputError(WHERE, `${path}.r`, r, "m", `a number > radius = ${radius} (clear of the axis)`);
  const z = requireFinite(WHERE, `${path}.z`, o.z, "m");
  const innerRadius = o.innerRadius === undefined ? 0 : requireInRange(WHERE, `${path}.innerRadius`, o.innerRadius, "m", 0, radius, "[)");
  return { kind, r, z, radius, innerRadius };
}

/** A validated B–H curve: at least 2 points, H and B positive and strictly increasing, μr ≤ 1e6. */
function checkCurve(path: string, value: unknown): CurvePoint[] {
  const o = requireKnownKeys(WHERE, path, requireObject(WHERE, path, value), MAGNETISATION_KEYS);
  if (!Array.isArray(o.curve) || o.curve.length < 2) {
    throw new InputError(WHERE, `${path}.curve`, o.curve, "", "an array of at least 2 points { fieldStrength, fluxDensity }");
  }
  const out: CurvePoint[] = [];
  (o.curve as unknown[]).forEach((raw, k) => {
    const pp = `${path}.curve[${k}]`;
    const p = requireKnownKeys(WHERE, pp, requireObject(WHERE, pp, raw), CURVE_POINT_KEYS);
    const fieldStrength = requirePositive(WHERE, `${pp}.fieldStrength`, p.fieldStrength, "A/m");
    const fluxDensity = requirePositive(WHERE, `${pp}.fluxDensity`, p.fluxDensity, "T");
    const prev = out[k - 1];
    if (prev && !(fieldStrength > prev.fieldStrength)) {
      throw new InputError(WHERE, `${pp}.fieldStrength`, fieldStrength, "A/m", `a value > the previous point's ${prev.fieldStrength} (strictly increasing)`);
    }
    if (prev && !(fluxDensity > prev.fluxDensity)) {
      throw new InputError(WHERE, `${pp}.fluxDensity`, fluxDensity, "T", `a value > the previous point's ${prev.fluxDensity} (strictly increasing)`);
    }
    if (!(fluxDensity / (MU_0 * fieldStrength) <= 1e6)) {
      throw new InputError(WHERE, `${pp}.fluxDensity`, fluxDensity, "T", `a point with B/(μ0·H) ≤ 1e6`);
    }
    out.push({ fieldStrength, fluxDensity });
  });
  return out;
}

/** Axis-aligned bounding square/rectangle of a shape (the region the mesher reserves). */
function box(s: MeshShape): [number, number, number, number] {
  return s.kind === "rectangle" ? [s.rMin, s.rMax, s.zMin, s.zMax] : [s.r - s.radius, s.r + s.radius, s.z - s.radius, s.z + s.radius];
}

/** Gap between two boxes in the ∞-norm (negative when they overlap with positive area). */
function boxGap(a: [number, number, number, number], b: [number, number, number, number]): number {
  const gr = Math.max(b[0] - a[1], a[0] - b[1]);
  const gz = Math.max(b[2] - a[3], a[2] - b[3]);
  if (gr < 0 && gz < 0) return Math.max(gr, gz);
  return Math.max(gr, gz);
}

/** Validated problem: bodies, names, block sizes. */
/** The problem read from the options, with the names and currents in coil and region order. */
export interface ReadProblem {
  readonly problem: SolverProblem;
  readonly coilNames: string[];
  readonly regionNames: string[];
  readonly currents: number[];
  readonly accuracy: number;
}

/** Validated problem: bodies, names, block sizes. */
export function readProblem(options: SolveAxisymmetricFieldOptions): ReadProblem {
  requireKnownKeys(WHERE, "", options, OPTION_KEYS);
  const frequency = requirePositive(WHERE, "frequency", options.frequency, "Hz");
  const accuracy = options.accuracy === undefined ? 1e-3 : requireInRange(WHERE, "accuracy", options.accuracy, "", 1e-4, 0.1);
  if (!Array.isArray(options.coils) || options.coils.length === 0) {
    throw new InputError(WHERE, "coils", options.coils, "", "a non-empty array of coils");
  }
  const regionsIn: unknown = options.regions === undefined ? [] : options.regions;
  if (!Array.isArray(regionsIn)) throw new InputError(WHERE, "regions", regionsIn, "", "an array of regions");
  const bodies: SolverBody[] = [];
  const { coilNames, currents } = readCoils(options.coils as readonly unknown[], bodies);
  const regionNames = readRegions(regionsIn as unknown[], bodies);
  const blockHalfSizes = clearBlocks(bodies);
  let rMax = 0;
  let zMin = Infinity;
  let zMax = -Infinity;
  for (const b of bodies.map((body) => box(body.shape))) {
    rMax = Math.max(rMax, b[1]);
    zMin = Math.min(zMin, b[2]);
    zMax = Math.max(zMax, b[3]);
  }
  const problem: SolverProblem = {
    frequency,
    bodies,
    coilCount: coilNames.length,
    regionCount: regionNames.length,
    blockHalfSizes,
    extent: { rMax, zMin, zMax },
  };
  return { problem, coilNames, regionNames, currents, accuracy };
}

/** Reads the coils, appending a body per turn (or per winding block) to `bodies`. */
function readCoils(coils: readonly unknown[], bodies: SolverBody[]): { coilNames: string[]; currents: number[] } {
  const coilNames: string[] = [];
  const currents: number[] = [];
  coils.forEach((raw, c) => {
    const path = `coils[${c}]`;
    const o = requireKnownKeys(WHERE, path, requireObject(WHERE, path, raw), COIL_KEYS);
    if (typeof o.name !== "string" || o.name === "" || coilNames.includes(o.name)) {
      throw new InputError(WHERE, `${path}.name`, o.name, "", "a non-empty name, unique among the coils");
    }
    coilNames.push(o.name);
    currents.push(requireNonNegative(WHERE, `${path}.current`, o.current, "A"));
    const resistivity = requirePositive(WHERE, `${path}.resistivity`, o.resistivity, "Ω·m");
    const model = requireOneOf(WHERE, `${path}.model`, o.model, ["solid", "stranded"] as const);
    if (Array.isArray(o.turns)) {
      const turns = o.turns as unknown[];
      if (turns.length === 0) throw new InputError(WHERE, `${path}.turns`, turns, "", "at least one turn");
      turns.forEach((t, k) => {
        const shape = checkShape(`${path}.turns[${k}]`, t);
        bodies.push({
          shape,
          sigma: model === "solid" ? 1 / resistivity : 0,
          mur: 1,
          role: model,
          owner: c,
          count: 1,
          resistivity,
        });
      });
    } else {
      const b = requireKnownKeys(WHERE, `${path}.turns`, requireObject(WHERE, `${path}.turns`, o.turns), BLOCK_KEYS);
      if (model !== "stranded") {
        throw new InputError(WHERE, `${path}.turns`, "{ shape, count }", "", 'a list of turn shapes (a winding block needs model "stranded")');
      }
      const count = b.count;
      if (typeof count !== "number" || !Number.isInteger(count) || count < 1) {
        throw new InputError(WHERE, `${path}.turns.count`, count, "", "an integer ≥ 1");
      }
      bodies.push({ shape: checkShape(`${path}.turns.shape`, b.shape), sigma: 0, mur: 1, role: "stranded", owner: c, count, resistivity });
    }
  });
  return { coilNames, currents };
}

/** Reads the regions, appending a body per region to `bodies`; returns their names. */
function readRegions(regions: readonly unknown[], bodies: SolverBody[]): string[] {
  const regionNames: string[] = [];
  regions.forEach((raw, k) => {
    const path = `regions[${k}]`;
    const o = requireKnownKeys(WHERE, path, requireObject(WHERE, path, raw), REGION_KEYS);
    if (typeof o.name !== "string" || o.name === "" || regionNames.includes(o.name)) {
      throw new InputError(WHERE, `${path}.name`, o.name, "", "a non-empty name, unique among the regions");
    }
    regionNames.push(o.name);
    const shape = checkShape(`${path}.shape`, o.shape);
    const sigma = o.resistivity === undefined ? 0 : 1 / requirePositive(WHERE, `${path}.resistivity`, o.resistivity, "Ω·m");
    if (o.magnetisation !== undefined) {
      if (o.relativePermeability !== undefined) {
        throw new InputError(WHERE, `${path}.magnetisation`, "with relativePermeability", "", "either relativePermeability or magnetisation, not both");
      }
      const curve = effectiveCurve(checkCurve(`${path}.magnetisation`, o.magnetisation));
      bodies.push({ shape, sigma, mur: curve.maxRelativePermeability, role: "region", owner: k, count: 1, resistivity: sigma > 0 ? 1 / sigma : 0, curve });
      return;
    }
    const mur = o.relativePermeability === undefined ? 1 : requireInRange(WHERE, `${path}.relativePermeability`, o.relativePermeability, "", 1, 1e6);
    bodies.push({ shape, sigma, mur, role: "region", owner: k, count: 1, resistivity: sigma > 0 ? 1 / sigma : 0 });
  });
  return regionNames;
}

/**
 * Checks that no two bodies overlap and that every round conductor keeps a gap from the other
 * bodies and the axis; returns the half-size of the free square the mesher bends around each
 * round conductor (0 for rectangles).
 */
function clearBlocks(bodies: readonly SolverBody[]): number[] {
  // Overlaps, and the free square around each circle where the mesher bends the grid.
  const boxes = bodies.map((b) => box(b.shape));
  const label = (i: number): string => {
    const b = bodies[i]!;
    return b.role === "region" ? `regions[${b.owner}]` : `coils[${b.owner}]`;
  };
  const blockHalfSizes = bodies.map(() => 0);
  for (let i = 0; i < bodies.length; i++) {
    const si = bodies[i]!.shape;
    let clearance = si.kind === "circle" ? si.r - si.radius : Infinity;
    for (let j = 0; j < bodies.length; j++) {
      if (j === i) continue;
      const g = boxGap(boxes[i]!, boxes[j]!);
      const sj = bodies[j]!.shape;
      if (g < 0) {
        throw new InputError(WHERE, label(j), "overlap", "", `a body clear of ${label(i)} (bodies must not overlap${si.kind === "circle" || sj.kind === "circle" ? "; a round conductor reserves its bounding square" : ""})`);
      }
      if (si.kind === "circle") clearance = Math.min(clearance, sj.kind === "circle" ? g / 2 : g / 2);
    }
    if (si.kind === "circle") {
      if (!(clearance > 1e-3 * si.radius)) {
        throw new InputError(WHERE, label(i), clearance, "m", `a round conductor whose bounding square keeps a gap > ${1e-3 * si.radius} m (radius/1000) from other bodies and the axis`);
      }
      blockHalfSizes[i] = si.radius + Math.min(clearance, 2 * si.radius);
    }
  }
  return blockHalfSizes;
}
