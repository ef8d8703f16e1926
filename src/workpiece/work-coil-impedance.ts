/**
 * The impedance of an induction work coil's own turns at frequency, with skin and proximity
 * effect in the coil's conductor, empty and with a part: a partial-element model of the turns
 * (each turn's cross-section split into coaxial ring cells) with the part's reflected coupling
 * from the Dodd–Deeds kernels, or the part's own cells when it is short and non-magnetic.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { litzAcRatio, litzGeometry } from "../conductors/index.js";
import { MU_0 } from "../units/index.js";
import { layerArrays } from "./coil-over-plate.js";
import { buildCells, cellInductanceMatrix, gradedLayers } from "./work-coil-cells.js";
import type { CellControls, CellSet, CrossSection, PartBlock } from "./work-coil-cells.js";
import { addPartCoupling, foldMatrix, foldResistance, reduction, solveSeries } from "./work-coil-model.js";
import type { PlatePart, Reduction, RodPart } from "./work-coil-model.js";
import { constantPermeabilityNote } from "./validity-notes.js";

/**
 * The conductor the coil is wound from.
 *
 * - `tube`: round tube, `outerDiameter` [m] > 0, `wallThickness` [m] in (0, outerDiameter/2]
 *   (half the diameter is a solid wire);
 * - `round`: solid round wire of `diameter` [m] > 0;
 * - `strip`: rectangular strip, `width` [m] > 0 and `thickness` [m] > 0. Orientation: the
 *   `width` faces the part — it lies along the coil axis for a solenoid (a strip wound flat
 *   against the bore, like a sheet-wound coil) and along the radius for a pancake (a flat
 *   spiral of strip); `thickness` is the other side;
 * - `litz`: `strands` (integer ≥ 1) of bare diameter `strandDiameter` [m] > 0, in a round
 *   bundle of packing factor 0.7 (as {@link litzGeometry}'s default).
 *
 * @category Workpiece
 */
export type WorkCoilConductor =
  | { readonly kind: "tube"; readonly outerDiameter: number; readonly wallThickness: number }
  | { readonly kind: "round"; readonly diameter: number }
  | { readonly kind: "strip"; readonly width: number; readonly thickness: number }
  | { readonly kind: "litz"; readonly strands: number; readonly strandDiameter: number };

/**
 * A solenoid work coil: `turns` closed coaxial rings (helical pitch ignored) with centres at
 * radius `radius` and axial positions $z_i = -\ell/2 + (i + \tfrac12)\ell/N$.
 *
 * @category Workpiece
 */
export interface WorkCoilSolenoid {
  readonly shape: "solenoid";
  /** Radius of the turn centres [m], > the conductor's radial half-size. */
  readonly radius: number;
  /** Length [m] = turns × pitch, > 0; the pitch must exceed the conductor's axial size. */
  readonly length: number;
  /** Number of turns, an integer ≥ 1. */
  readonly turns: number;
  /** The conductor, see {@link WorkCoilConductor}. */
  readonly conductor: WorkCoilConductor;
  /** Resistivity of the conductor at its working temperature [Ω·m], > 0. */
  readonly resistivity: number;
}

/**
 * A flat pancake (spiral) work coil: `turns` coplanar rings at z = 0 with centres at radii
 * $r_i = r_0 + i\,p$.
 *
 * @category Workpiece
 */
export interface WorkCoilPancake {
  readonly shape: "pancake";
  /** Radius of the first (innermost) turn's centre [m], > the conductor's radial half-size. */
  readonly innerRadius: number;
  /** Radial pitch [m], > the conductor's radial size. */
  readonly pitch: number;
  /** Number of turns, an integer ≥ 1. */
  readonly turns: number;
  /** The conductor, see {@link WorkCoilConductor}. */
  readonly conductor: WorkCoilConductor;
  /** Resistivity of the conductor [Ω·m], > 0. */
  readonly resistivity: number;
}

/**
 * The part being heated, coaxial with the coil.
 *
 * - `bar`: solid round bar of `radius` [m] and `length` [m], centred on the coil (z = 0);
 * - `tube`: hollow round tube, outer `radius` and bore `innerRadius` [m], `length` [m], centred;
 * - `plate`: round plate of `radius` [m] and `thickness` [m] below the coil, its top face `gap`
 *   [m] below the conductor surface of the lowest turn.
 *
 * All: `resistivity` [Ω·m] > 0, `relativePermeability` [-] ≥ 1 (constant: the value at the
 * working field). A bar or tube must fit inside the turns' inner faces.
 *
 * @category Workpiece
 */
export type WorkCoilPart =
  | {
      readonly shape: "bar";
      readonly radius: number;
      readonly length: number;
      readonly resistivity: number;
      readonly relativePermeability: number;
    }
  | {
      readonly shape: "tube";
      readonly radius: number;
      readonly innerRadius: number;
      readonly length: number;
      readonly resistivity: number;
      readonly relativePermeability: number;
    }
  | {
      readonly shape: "plate";
      readonly radius: number;
      readonly thickness: number;
      readonly gap: number;
      readonly resistivity: number;
      readonly relativePermeability: number;
    };

/**
 * Options of {@link workCoilImpedance}.
 *
 * @category Workpiece
 */
export interface WorkCoilImpedanceOptions {
  /** The coil: {@link WorkCoilSolenoid} or {@link WorkCoilPancake}. */
  readonly coil: WorkCoilSolenoid | WorkCoilPancake;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** The part, see {@link WorkCoilPart}; omitted for the empty coil. */
  readonly part?: WorkCoilPart;
  /**
   * Mesh refinement [-], in [0.5, 4], default 1: the cells at the conductor surfaces are a third
   * of a skin depth thick divided by this factor (cost grows about as its cube).
   */
  readonly refinement?: number;
}

/**
 * Result of {@link workCoilImpedance}: the impedance at the coil terminals (leads excluded)
 * at 1 A RMS in every turn.
 *
 * @category Workpiece
 */
export interface WorkCoilImpedanceResult {
  /** Terminal resistance [Ω]: coil copper loss plus the part's loss, per A². */
  readonly resistance: number;
  /** Terminal inductance [H] (with the part when one is given). */
  readonly inductance: number;
  /** `resistance` minus the empty coil's resistance [Ω] (0 without a part). */
  readonly reflectedResistance: number;
  /** `inductance` minus the empty coil's inductance [H] (0 without a part). */
  readonly inductanceChange: number;
  /** Resistance of the empty coil at this frequency [Ω]. */
  readonly emptyResistance: number;
  /** Inductance of the empty coil at this frequency [H]. */
  readonly emptyInductance: number;
  /** DC resistance of the turns [Ω] (exact for the ring geometry). */
  readonly dcResistance: number;
  /** Copper loss in the coil per A² with the part present [Ω]. */
  readonly copperResistance: number;
  /** Power dissipated in the part per A² [Ω] (`resistance` − `copperResistance`), i.e. the part's loss at 1 A RMS [W]. */
  readonly partResistance: number;
  /** Copper loss of each turn per A² [Ω], first turn first. */
  readonly turnResistances: readonly number[];
  /** Skin depth in the coil conductor [m]. */
  readonly skinDepth: number;
  /** Number of ring cells of the model (coil and, for a short non-magnetic part, the part). */
  readonly cellCount: number;
  /** How the part was coupled: `"none"`, `"long-rod-kernel"`, `"plate-kernel"` or `"part-cells"`. */
  readonly partModel: "none" | "long-rod-kernel" | "plate-kernel" | "part-cells";
  /** Where the model's assumptions may not hold. */
  readonly validity: readonly ValidityNote[];
}

/** Checked coil geometry. */
interface CoilGeometry {
  readonly shape: "solenoid" | "pancake";
  readonly centresR: number[];
  readonly centresZ: number[];
  readonly section: CrossSection;
  readonly radialHalf: number;
  readonly axialHalf: number;
  readonly resistivity: number;
  readonly conductor: WorkCoilConductor;
  /** litz: DC resistance per metre of the bundle [Ω/m] (strand metal, no lay factor). */
  readonly litzCopperArea: number;
}

const COIL_KEYS = {
  solenoid: ["shape", "radius", "length", "turns", "conductor", "resistivity"],
  pancake: ["shape", "innerRadius", "pitch", "turns", "conductor", "resistivity"],
} as const;
const CONDUCTOR_KEYS = {
  tube: ["kind", "outerDiameter", "wallThickness"],
  round: ["kind", "diameter"],
  strip: ["kind", "width", "thickness"],
  litz: ["kind", "strands", "strandDiameter"],
} as const;
const PART_KEYS = {
  bar: ["shape", "radius", "length", "resistivity", "relativePermeability"],
  tube: ["shape", "radius", "innerRadius", "length", "resistivity", "relativePermeability"],
  plate: ["shape", "radius", "thickness", "gap", "resistivity", "relativePermeability"],
} as const;

function checkCoil(where: string, value: unknown): CoilGeometry {
  const c = requireObject(where, "coil", value);
  const shape = requireOneOf(where, "coil.shape", c["shape"], ["solenoid", "pancake"] as const);
  requireKnownKeys(where, "coil", c, COIL_KEYS[shape]);
  const turns = requireInteger(where, "coil.turns", c["turns"], 1);
  const resistivity = requirePositive(where, "coil.resistivity", c["resistivity"], "Ω·m");
  const k = requireObject(where, "coil.conductor", c["conductor"]);
  const kind = requireOneOf(where, "coil.conductor.kind", k["kind"], ["tube", "round", "strip", "litz"] as const);
  requireKnownKeys(where, "coil.conductor", k, CONDUCTOR_KEYS[kind]);
  let section: CrossSection;
  let radialHalf: number;
  let axialHalf: number;
  let conductor: WorkCoilConductor;
  let litzCopperArea = 0;
  if (kind === "tube") {
    const od = requirePositive(where, "coil.conductor.outerDiameter", k["outerDiameter"], "m");
    const wall = requirePositive(where, "coil.conductor.wallThickness", k["wallThickness"], "m");
    if (!(wall <= od / 2)) {
      throw new InputError(where, "coil.conductor.wallThickness", wall, "m", `a finite number > 0 and ≤ outerDiameter/2 (${od / 2})`);
    }
    section = { kind: "annulus", inner: od / 2 - wall, outer: od / 2 };
    radialHalf = axialHalf = od / 2;
    conductor = { kind, outerDiameter: od, wallThickness: wall };
  } else if (kind === "round") {
    const d = requirePositive(where, "coil.conductor.diameter", k["diameter"], "m");
    section = { kind: "annulus", inner: 0, outer: d / 2 };
    radialHalf = axialHalf = d / 2;
    conductor = { kind, diameter: d };
  } else if (kind === "strip") {
    const w = requirePositive(where, "coil.conductor.width", k["width"], "m");
    const t = requirePositive(where, "coil.conductor.thickness", k["thickness"], "m");
    // the width faces the part: along z for a solenoid, along r for a pancake
    section = shape === "solenoid" ? { kind: "rectangle", width: t, height: w } : { kind: "rectangle", width: w, height: t };
    radialHalf = shape === "solenoid" ? t / 2 : w / 2;
    axialHalf = shape === "solenoid" ? w / 2 : t / 2;
    conductor = { kind, width: w, thickness: t };
  } else {
    const strands = requireInteger(where, "coil.conductor.strands", k["strands"], 1);
    const strandDiameter = requirePositive(where, "coil.conductor.strandDiameter", k["strandDiameter"], "m");
    const g = litzGeometry({ strands, strandDiameter });
    section = { kind: "disc", radius: g.bundleDiameter / 2 };
    radialHalf = axialHalf = g.bundleDiameter / 2;
    litzCopperArea = g.copperArea;
    conductor = { kind, strands, strandDiameter };
  }
  const centresR: number[] = [];
  const centresZ: number[] = [];
  if (shape === "solenoid") {
    const radius = requirePositive(where, "coil.radius", c["radius"], "m");
    const length = requirePositive(where, "coil.length", c["length"], "m");
    if (!(radius > radialHalf)) {
      throw new InputError(where, "coil.radius", radius, "m", `a finite number > the conductor's radial half-size (${radialHalf})`);
    }
    if (turns > 1 && !(length / turns > 2 * axialHalf)) {
      throw new InputError(where, "coil.length", length, "m", `a finite number > turns × the conductor's axial size (${turns * 2 * axialHalf}; turns must not touch)`);
    }
    for (let i = 0; i < turns; i++) {
      centresR.push(radius);
      centresZ.push(-length / 2 + ((i + 0.5) * length) / turns);
    }
  } else {
    const inner = requirePositive(where, "coil.innerRadius", c["innerRadius"], "m");
    const pitch = requirePositive(where, "coil.pitch", c["pitch"], "m");
    if (!(inner > radialHalf)) {
      throw new InputError(where, "coil.innerRadius", inner, "m", `a finite number > the conductor's radial half-size (${radialHalf})`);
    }
    if (turns > 1 && !(pitch > 2 * radialHalf)) {
      throw new InputError(where, "coil.pitch", pitch, "m", `a finite number > the conductor's radial size (${2 * radialHalf}; turns must not touch)`);
    }
    for (let i = 0; i < turns; i++) {
      centresR.push(inner + i * pitch);
      centresZ.push(0);
    }
  }
  return { shape, centresR, centresZ, section, radialHalf, axialHalf, resistivity, conductor, litzCopperArea };
}

/** Checked part. */
interface CheckedPart {
  readonly shape: "bar" | "tube" | "plate";
  readonly radius: number;
  readonly innerRadius: number;
  readonly length: number;
  readonly thickness: number;
  readonly gap: number;
  readonly resistivity: number;
  readonly relativePermeability: number;
}

function checkPart(where: string, value: unknown, geo: CoilGeometry): CheckedPart {
  const p = requireObject(where, "part", value);
  const shape = requireOneOf(where, "part.shape", p["shape"], ["bar", "tube", "plate"] as const);
  requireKnownKeys(where, "part", p, PART_KEYS[shape]);
  const radius = requirePositive(where, "part.radius", p["radius"], "m");
  const resistivity = requirePositive(where, "part.resistivity", p["resistivity"], "Ω·m");
  const mur = p["relativePermeability"];
  if (typeof mur !== "number" || !Number.isFinite(mur) || mur < 1) {
    throw new InputError(where, "part.relativePermeability", mur, "", "a finite number ≥ 1");
  }
  if (shape === "plate") {
    const thickness = requirePositive(where, "part.thickness", p["thickness"], "m");
    const gap = requirePositive(where, "part.gap", p["gap"], "m");
    return { shape, radius, innerRadius: 0, length: 0, thickness, gap, resistivity, relativePermeability: mur };
  }
  const length = requirePositive(where, "part.length", p["length"], "m");
  let innerFace = Infinity;
  for (const r of geo.centresR) innerFace = Math.min(innerFace, r - geo.radialHalf);
  if (!(radius < innerFace)) {
    throw new InputError(where, "part.radius", radius, "m", `a finite number > 0 and < the turns' inner face radius (${innerFace})`);
  }
  let innerRadius = 0;
  if (shape === "tube") {
    innerRadius = requirePositive(where, "part.innerRadius", p["innerRadius"], "m");
    if (!(innerRadius < radius)) {
      throw new InputError(where, "part.innerRadius", innerRadius, "m", `a finite number > 0 and < part.radius (${radius})`);
    }
  }
  return { shape, radius, innerRadius, length, thickness: 0, gap: 0, resistivity, relativePermeability: mur };
}

function skinDepthOf(resistivity: number, frequency: number, mur = 1): number {
  return Math.sqrt((2 * resistivity) / (2 * Math.PI * frequency * MU_0 * mur));
}

/** Controls of the coil cells for a skin depth and refinement. */
function controlsFor(geo: CoilGeometry, delta: number, refinement: number): CellControls {
  const size = Math.max(geo.radialHalf, geo.axialHalf);
  return {
    surfaceLayer: Math.min(delta / 3, size / 2) / refinement,
    growth: 1 + 0.3 / refinement,
    sectors: 2 * Math.round(8 * refinement),
    maxDepth: 6 * delta,
  };
}

/** A bar or tube is volume-modelled (its own cells) when non-magnetic and no longer than the coil's extent plus this many coil radii. */
const SHORT_PART_RADII = 4;

/** Coil extent along z and outer radius. */
function coilExtent(geo: CoilGeometry): { zMin: number; zMax: number; rOuter: number } {
  let zMin = Infinity;
  let zMax = -Infinity;
  let rOuter = 0;
  for (let i = 0; i < geo.centresR.length; i++) {
    zMin = Math.min(zMin, geo.centresZ[i]! - geo.axialHalf);
    zMax = Math.max(zMax, geo.centresZ[i]! + geo.axialHalf);
    rOuter = Math.max(rOuter, geo.centresR[i]! + geo.radialHalf);
  }
  return { zMin, zMax, rOuter };
}

function isShortPart(geo: CoilGeometry, part: CheckedPart): boolean {
  if (part.shape === "plate") return false;
  const { zMin, zMax, rOuter } = coilExtent(geo);
  return part.length < zMax - zMin + SHORT_PART_RADII * rOuter;
}

/** The cell blocks of a short non-magnetic bar or tube at a frequency. */
function partBlock(part: CheckedPart, frequency: number, refinement: number): PartBlock {
  const delta = skinDepthOf(part.resistivity, frequency);
  const first = Math.min(delta / 3, part.length / 8, (part.radius - part.innerRadius) / 4) / refinement;
  const growth = 1 + 0.3 / refinement;
  let rBounds: number[];
  if (part.innerRadius > 0) {
    rBounds = gradedLayers(part.radius - part.innerRadius, first, growth, true, Infinity).map((x) => part.innerRadius + x);
  } else {
    rBounds = gradedLayers(part.radius, first, growth, false, Infinity)
      .map((x) => part.radius - x)
      .reverse();
  }
  const zBounds = gradedLayers(part.length, first, growth, true, Infinity).map((x) => x - part.length / 2);
  return { rBounds, zBounds };
}

/** The coil's cells and folded matrices, for one mesh. */
interface Mesh {
  readonly cells: CellSet;
  readonly red: Reduction;
  /** Folded inductance matrix (m×m) [H]. */
  readonly L: Float64Array;
  /** Folded resistances (diagonal) [Ω]. */
  readonly R: Float64Array;
}

function buildMesh(geo: CoilGeometry, ctl: CellControls, mirror: boolean, part?: PartBlock, partResistivity = 1): Mesh {
  const cells = buildCells(geo.centresR, geo.centresZ, geo.section, ctl, mirror, part);
  const full = cellInductanceMatrix(cells);
  const red = reduction(cells, mirror);
  const L = new Float64Array(red.m * red.m);
  foldMatrix(red, cells.n, full, L);
  const R = foldResistance(red, cells, geo.conductor.kind === "litz" ? 0 : geo.resistivity, partResistivity);
  return { cells, red, L, R };
}

/** Per-turn resistance of a homogenised litz turn [Ω] at a frequency. */
function litzTurnResistance(geo: CoilGeometry, frequency: number, turnIndex: number): number {
  const c = geo.conductor as { kind: "litz"; strands: number; strandDiameter: number };
  const turns = geo.centresR.length;
  const span = geo.shape === "solenoid" ? coilExtent(geo).zMax - coilExtent(geo).zMin : turns * 2 * geo.radialHalf;
  const ratio = litzAcRatio({
    construction: { strands: c.strands, strandDiameter: c.strandDiameter },
    frequency,
    resistivity: geo.resistivity,
    turns,
    windowBreadth: Math.max(span, turns * 2 * geo.radialHalf),
  });
  return (ratio * geo.resistivity * 2 * Math.PI * geo.centresR[turnIndex]!) / geo.litzCopperArea;
}

interface Solved {
  readonly re: number;
  readonly im: number;
  readonly copper: number;
  readonly partCells: number;
  readonly turnCopper: Float64Array;
}

/** Solves one mesh at a frequency with an optional kernel part. */
function solveMesh(geo: CoilGeometry, mesh: Mesh, frequency: number, kernelPart?: RodPart | PlatePart): Solved {
  const { red, cells } = mesh;
  const m = red.m;
  const omega = 2 * Math.PI * frequency;
  const zRe = new Float64Array(m * m);
  const zIm = new Float64Array(m * m);
  for (let k = 0; k < m * m; k++) zIm[k] = omega * mesh.L[k]!;
  const rDiag = Float64Array.from(mesh.R);
  if (geo.conductor.kind === "litz") {
    // one cell per turn: its resistance is the homogenised litz turn resistance
    for (let a = 0; a < m; a++) {
      if (red.group[a]! < 0) continue;
      const cell = red.members[red.memberStart[a]!]!;
      const count = red.memberStart[a + 1]! - red.memberStart[a]!;
      rDiag[a] = rDiag[a]! + count * litzTurnResistance(geo, frequency, cells.turn[cell]!);
    }
  }
  for (let a = 0; a < m; a++) zRe[a * m + a] = rDiag[a]!;
  if (kernelPart !== undefined) addPartCoupling(red, cells, kernelPart, omega, zRe, zIm);
  return solveSeries(red, cells, zRe, zIm, rDiag);
}

/**
 * A coil prepared for repeated impedance evaluations: its cells and partial inductance matrix
 * are computed once (for the skin depth at `frequency`), then each call of `impedance`
 * assembles and solves the cell system for one frequency and part.
 *
 * @category Workpiece
 */
export interface PreparedWorkCoil {
  /** Number of ring cells of the coil. */
  readonly cellCount: number;
  /** The frequency the mesh was built for [Hz]. */
  readonly designFrequency: number;
  /**
   * Impedance at `frequency` [Hz] with an optional part; the same result as
   * {@link workCoilImpedance} with this coil (and the design frequency's mesh).
   */
  impedance(frequency: number, part?: WorkCoilPart): WorkCoilImpedanceResult;
}

/**
 * Options of {@link prepareWorkCoil}.
 *
 * @category Workpiece
 */
export interface PrepareWorkCoilOptions {
  /** The coil, as in {@link WorkCoilImpedanceOptions}. */
  readonly coil: WorkCoilSolenoid | WorkCoilPancake;
  /** Design frequency [Hz], > 0: the mesh resolves the skin depth at this frequency (use the highest of the intended range). */
  readonly frequency: number;
  /** Mesh refinement [-], in [0.5, 4], default 1 (see {@link WorkCoilImpedanceOptions}). */
  readonly refinement?: number;
}

function checkRefinement(where: string, value: unknown): number {
  if (value === undefined) return 1;
  const v = requirePositive(where, "refinement", value, "");
  if (!(v >= 0.5 && v <= 4)) throw new InputError(where, "refinement", v, "", "a number in [0.5, 4]");
  return v;
}

/**
 * Prepares a work coil for repeated evaluations of {@link workCoilImpedance} (a frequency
 * sweep, or a study's operating-point iteration over frequency and part permeability): the
 * cells and their partial inductance matrix are built once for the design frequency.
 *
 * Cost: building is dominated by the partial-inductance matrix (n² Maxwell kernels, n the
 * cell count); each evaluation by the dense complex solve, about n³/48 complex
 * multiply-adds with the mirror symmetry of solenoids (n³/6 without).
 *
 * Hard domain and validity: as {@link workCoilImpedance}; evaluating far above the design
 * frequency leaves the skin depth under-resolved (reported in `validity`).
 *
 * @param options - coil, design frequency and refinement, see {@link PrepareWorkCoilOptions}
 * @returns an evaluator, see {@link PreparedWorkCoil}
 * @throws {@link InputError} for a bad coil, frequency or refinement
 * @see {@link workCoilImpedance} for the model and its sources.
 * @example
 * ```ts
 * import { prepareWorkCoil } from "fluxwright";
 * const coil = prepareWorkCoil({
 *   coil: { shape: "solenoid", radius: 0.02, length: 0.032, turns: 4,
 *     conductor: { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 }, resistivity: 1.75e-8 },
 *   frequency: 50e3,
 * });
 * const empty = coil.impedance(50e3);
 * console.log(empty.resistance > empty.dcResistance); // true
 * ```
 * @category Workpiece
 */
export function prepareWorkCoil(options: PrepareWorkCoilOptions): PreparedWorkCoil {
  const where = "prepareWorkCoil";
  requireKnownKeys(where, "", options, ["coil", "frequency", "refinement"]);
  const geo = checkCoil(where, options.coil);
  const design = requirePositive(where, "frequency", options.frequency, "Hz");
  const refinement = checkRefinement(where, options.refinement);
  return prepared(geo, design, refinement);
}

function prepared(geo: CoilGeometry, design: number, refinement: number): PreparedWorkCoil {
  const delta = skinDepthOf(geo.resistivity, design);
  const ctl = controlsFor(geo, delta, refinement);
  let coilMesh: Mesh | undefined;
  let coilMeshNoMirror: Mesh | undefined;
  const emptyCache = new Map<number, Solved>();
  const getMesh = (mirror: boolean): Mesh => {
    if (mirror) return (coilMesh ??= buildMesh(geo, ctl, geo.shape === "solenoid"));
    if (geo.shape === "pancake") return (coilMesh ??= buildMesh(geo, ctl, false));
    return (coilMeshNoMirror ??= buildMesh(geo, ctl, false));
  };
  const dc = dcResistanceOf(geo);
  const impedance = (frequency: number, partInput?: WorkCoilPart): WorkCoilImpedanceResult => {
    const where = "workCoilImpedance";
    const f = requirePositive(where, "frequency", frequency, "Hz");
    const part = partInput === undefined ? undefined : checkPart(where, partInput, geo);
    let empty = emptyCache.get(f);
    if (empty === undefined) {
      empty = solveMesh(geo, getMesh(true), f);
      if (emptyCache.size > 64) emptyCache.clear();
      emptyCache.set(f, empty);
    }
    const validity: ValidityNote[] = [];
    let loaded = empty;
    let partModel: WorkCoilImpedanceResult["partModel"] = "none";
    let cellCount = getMesh(true).cells.n;
    if (part !== undefined) {
      if (part.relativePermeability > 1) validity.push(constantPermeabilityNote(part.relativePermeability));
      if (part.shape === "plate") {
        const { zMin, rOuter } = coilExtent(geo);
        const top = zMin - part.gap;
        const omega = 2 * Math.PI * f;
        const layers = layerArrays([{ thickness: part.thickness, resistivity: part.resistivity, relativePermeability: part.relativePermeability }], omega);
        loaded = solveMesh(geo, getMesh(false), f, { kind: "plate", top, layers });
        partModel = "plate-kernel";
        cellCount = getMesh(false).cells.n;
        if (part.radius < rOuter + 4 * (part.gap + part.thickness)) {
          validity.push({
            code: "finite-plate",
            message: "The plate is modelled as laterally infinite; it ends within a few gaps of the coil's outer radius, so its edge (not modelled) changes the coupling.",
            value: part.radius,
            limit: rOuter + 4 * (part.gap + part.thickness),
          });
        }
      } else if (part.relativePermeability === 1 && isShortPart(geo, part)) {
        const block = partBlock(part, f, refinement);
        const mirror = geo.shape === "solenoid";
        const mesh = buildMesh(geo, ctl, mirror, block, part.resistivity);
        loaded = solveMesh(geo, mesh, f);
        partModel = "part-cells";
        cellCount = mesh.cells.n;
      } else {
        const mirror = geo.shape === "solenoid";
        const kk = (2 * Math.PI * f * MU_0 * part.relativePermeability) / part.resistivity;
        loaded = solveMesh(geo, getMesh(mirror), f, {
          kind: "rod",
          radius: part.radius,
          innerRadius: part.innerRadius,
          kk,
          mur: part.relativePermeability,
        });
        partModel = "long-rod-kernel";
        if (isShortPart(geo, part)) {
          validity.push({
            code: "short-magnetic-part",
            message: "A magnetic bar or tube shorter than the coil plus a few coil radii is modelled as infinitely long; its ends (not modelled) lower the coupling, by an amount not measured here.",
            value: part.length,
          });
        }
      }
    }
    const omega = 2 * Math.PI * f;
    if (f > 1.5 * design) {
      validity.push({
        code: "mesh-below-skin-depth",
        message: "Evaluated above 1.5 × the design frequency of the mesh: the skin depth is resolved more coarsely than the stated accuracy assumes.",
        value: f,
        limit: 1.5 * design,
      });
    }
    if (geo.conductor.kind === "litz") {
      validity.push({
        code: "litz-homogenised",
        message: "Litz turns carry a uniform current over the bundle; strand skin and proximity losses come from litzAcRatio with the winding's own field (the part's field on the strands is not counted).",
      });
    }
    const partLoss = loaded.re - loaded.copper;
    return {
      resistance: loaded.re,
      inductance: loaded.im / omega,
      reflectedResistance: loaded.re - empty.re,
      inductanceChange: (loaded.im - empty.im) / omega,
      emptyResistance: empty.re,
      emptyInductance: empty.im / omega,
      dcResistance: dc,
      copperResistance: loaded.copper,
      partResistance: partLoss,
      turnResistances: Array.from(loaded.turnCopper),
      skinDepth: skinDepthOf(geo.resistivity, f),
      cellCount,
      partModel,
      validity,
    };
  };
  return {
    get cellCount() {
      return getMesh(true).cells.n;
    },
    designFrequency: design,
    impedance,
  };
}

/** Exact DC resistance of the turns (rings of the conductor's cross-section), litz from its copper area. */
function dcResistanceOf(geo: CoilGeometry): number {
  let sum = 0;
  const rho = geo.resistivity;
  for (const rc of geo.centresR) {
    const s = geo.section;
    let inv: number; // ∫ dA / r over the cross-section
    if (s.kind === "annulus") {
      // disc of radius a centred at R: 2π (R − √(R² − a²))
      const disc = (a: number): number => (a === 0 ? 0 : (2 * Math.PI * a * a) / (rc + Math.sqrt(rc * rc - a * a)));
      inv = disc(s.outer) - disc(s.inner);
    } else if (s.kind === "rectangle") {
      inv = s.height * Math.log((rc + s.width / 2) / (rc - s.width / 2));
    } else {
      sum += (rho * 2 * Math.PI * rc) / geo.litzCopperArea;
      continue;
    }
    sum += (2 * Math.PI * rho) / inv;
  }
  return sum;
}

/**
 * Impedance of an induction work coil's own turns at frequency — resistance and inductance
 * with skin and proximity effect in the coil conductor — empty and with a coaxial part (bar,
 * tube or plate), at the coil terminals without leads.
 *
 * Model: every turn is a closed coaxial ring of its real cross-section (helical pitch
 * ignored), split into ring cells of uniform current density, graded to a third of a skin
 * depth at the conductor surfaces. With cell resistances $R_i = 2\pi\rho/\int_i dA/r$, the
 * partial inductances $L_{ij}$ (Maxwell's formula for coaxial filaments with the
 * geometric-mean-distance correction for neighbouring cells) and the part's reflected
 * coupling $\Delta M_{ij}(\omega)$, the cells of one turn share the turn's voltage and the
 * turns are in series:
 *
 * $$
 * \big(R + j\omega(L + \Delta M)\big)\,I = B\,V,\qquad B^\mathsf{T} I = \mathbf 1,\qquad
 * Z = \mathbf 1^\mathsf{T} V = \mathbf 1^\mathsf{T}\big(B^\mathsf{T}(R + j\omega(L+\Delta M))^{-1}B\big)^{-1}\mathbf 1
 * $$
 *
 * (B: cell-to-turn incidence), solved by a complex symmetric $LDL^\mathsf{T}$ factorisation;
 * skin and proximity effect emerge from the solve. Part coupling between two cells
 * $(r_i, z_i)$, $(r_j, z_j)$:
 * - long bar or tube (Dodd, Deeds & Luquire 1969):
 *   $\Delta M_{ij} = 2\mu_0 r_ir_j\int_0^\infty C(\alpha)K_1(\alpha r_i)K_1(\alpha r_j)\cos\alpha(z_i - z_j)\,d\alpha$,
 *   the rod coefficient C as in {@link encirclingCoilOverRod} (a tube's bore adds the
 *   $K$-function terms of the inner boundary);
 * - plate (Dodd & Deeds 1968):
 *   $\Delta M_{ij} = \pi\mu_0 r_ir_j\int_0^\infty \Gamma(\alpha)J_1(\alpha r_i)J_1(\alpha r_j)e^{-\alpha(h_i + h_j)}\,d\alpha$,
 *   Γ the plate's reflection coefficient as in {@link coilOverPlate}, h the height above it;
 * - a non-magnetic bar or tube shorter than the coil plus four coil radii: the part's own ring
 *   cells (closed loops without source) join the system — exact for any length.
 *
 * Litz is homogenised: one cell of uniform current per turn, its resistance the strand-level
 * skin and proximity result of {@link litzAcRatio} for the winding's own field.
 *
 * Hard domain (throws {@link InputError}): positive finite sizes, resistivities and frequency;
 * integer turns ≥ 1; tube wall ≤ half the diameter; turns that do not touch (pitch larger than
 * the conductor); a bar or tube inside the turns' inner faces, tube bore < its radius; plate
 * gap > 0; relativePermeability ≥ 1; refinement in [0.5, 4]; unknown keys rejected.
 * Validity (reported in `validity`): axisymmetric turns, linear materials of constant
 * permeability, a plate modelled laterally infinite, a magnetic bar or tube modelled infinitely
 * long, litz homogenised, frequencies far below the coil's self-resonance (no capacitance).
 *
 * Accuracy: the discretisation converges as the square of the surface cell thickness: a single
 * isolated ring reproduces the exact tube and round-wire AC resistance
 * ({@link tubeAcResistance}) within 0.6 % at the default mesh and its DC resistance exactly; the
 * low-frequency inductance matches the filament sums of uniform-current turns.
 *
 * @param options - coil, frequency, optional part and mesh refinement, see {@link WorkCoilImpedanceOptions}
 * @returns resistance [Ω], inductance [H], their changes caused by the part, and details, see {@link WorkCoilImpedanceResult}
 * @throws {@link InputError} for values outside the hard domain or unknown keys
 * @see C. V. Dodd, W. E. Deeds and J. W. Luquire, "Integral solutions to some eddy current problems", Int. J. Nondestructive Testing 1 (1969) 29–90 (coil encircling a rod or tube).
 * @see C. V. Dodd and W. E. Deeds, "Analytical solutions to eddy-current probe-coil problems", J. Appl. Phys. 39 (1968) 2829–2838 (coil above a plate).
 * @see A. E. Ruehli, "Equivalent circuit models for three-dimensional multiconductor systems", IEEE Trans. Microwave Theory Tech. 22 (1974) 216–221 (partial-element circuit of conductor cells).
 * @see J. C. Maxwell, A Treatise on Electricity and Magnetism (1873), vol. 2, arts. 691–693 (geometric mean distance) and 701 (coaxial circles).
 * @example
 * ```ts
 * import { workCoilImpedance } from "fluxwright";
 * // 4-turn copper-tube coil around a steel forging bar at 10 kHz
 * const r = workCoilImpedance({
 *   coil: { shape: "solenoid", radius: 0.02, length: 0.032, turns: 4,
 *     conductor: { kind: "tube", outerDiameter: 0.006, wallThickness: 0.001 }, resistivity: 1.75e-8 },
 *   frequency: 10e3,
 *   part: { shape: "bar", radius: 0.008, length: 0.4, resistivity: 2e-7, relativePermeability: 50 },
 * });
 * console.log(r.reflectedResistance > 0, r.resistance > r.dcResistance); // true true
 * ```
 * @category Workpiece
 */
export function workCoilImpedance(options: WorkCoilImpedanceOptions): WorkCoilImpedanceResult {
  const where = "workCoilImpedance";
  requireKnownKeys(where, "", options, ["coil", "frequency", "part", "refinement"]);
  const geo = checkCoil(where, options.coil);
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const refinement = checkRefinement(where, options.refinement);
  if (options.part !== undefined) checkPart(where, options.part, geo);
  return prepared(geo, f, refinement).impedance(f, options.part);
}
