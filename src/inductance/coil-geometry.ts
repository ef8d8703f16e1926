/**
 * One family of coaxial coil descriptions, shared by the inductance functions
 * ({@link coaxialCoilMutualInductance}) and the field functions ({@link fieldOnAxis},
 * {@link fieldNearCoil}): a loop, a single-layer solenoid, a multilayer winding and a flat
 * spiral whose field names say which radius they mean.
 *
 * Why the flat spiral has its own tag: the two former descriptions of a spiral both used
 * `kind: "spiral"` with `innerRadius`/`outerRadius`, but the inductance functions read them as
 * the innermost and outermost turns' wire centres, the field functions as the winding's edges
 * (half a pitch further out and in). `kind: "flatSpiral"` takes either pair under a name that
 * says which it is, and refuses a mix.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireInteger, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";

/**
 * A single circular filament (or `turns` filaments bunched at one place) on the common axis.
 *
 * @category Inductance
 */
export interface LoopGeometry {
  /** Discriminant: `"loop"`. */
  readonly kind: "loop";
  /** Radius of the filament (wire centre) [m], > 0. */
  readonly radius: number;
  /** Number of turns bunched at that radius, ≥ 1 (default 1; fractional turns allowed). */
  readonly turns?: number;
  /** Axial position of the loop's plane [m], any sign (default 0). */
  readonly position?: number;
}

/**
 * A single-layer solenoid: `turns` evenly pitched over `length` (Rosa's convention:
 * length = turns × pitch, each turn owns one pitch) at `radius` (the wire centres), centred on
 * `position`. The inductance functions treat it as a current sheet; the field functions as one
 * filament loop per turn at $z_i = z_0 - \ell/2 + (i + \tfrac12)\,\ell/N$.
 *
 * @category Inductance
 */
export interface SolenoidGeometry {
  /** Discriminant: `"solenoid"`. */
  readonly kind: "solenoid";
  /** Radius to the wire centres (mean turn radius) [m], > 0. */
  readonly radius: number;
  /** Winding length [m], > 0 (turns × pitch). */
  readonly length: number;
  /**
   * Number of turns, ≥ 1; a whole number (at most 10⁵) for the field functions, which sum one
   * loop per turn; fractional turns are accepted by the current-sheet inductance.
   */
  readonly turns: number;
  /** Axial position of the coil's centre [m], any sign (default 0). */
  readonly position?: number;
}

/**
 * A coil of rectangular winding cross-section with uniform current density (a multilayer coil
 * whose wire is fine compared with the winding). The radii are the edges of the current-carrying
 * region. Inductance functions only (the field functions refuse it: give its loops as an array).
 *
 * @category Inductance
 */
export interface MultilayerGeometry {
  /** Discriminant: `"multilayer"`. */
  readonly kind: "multilayer";
  /** Inner edge of the winding [m], > 0. */
  readonly innerRadius: number;
  /** Outer edge of the winding [m], > innerRadius. */
  readonly outerRadius: number;
  /** Axial length of the winding [m], > 0. */
  readonly length: number;
  /** Number of turns, ≥ 1 (fractional turns allowed). */
  readonly turns: number;
  /** Axial position of the coil's centre [m], any sign (default 0). */
  readonly position?: number;
}

/**
 * A flat (pancake) spiral of round wire, given by the radii of its innermost and outermost
 * **turn centres**: `turns` concentric filaments in one plane at
 * $r_i = r_1 + (r_N - r_1)\,i/(N - 1)$, $i = 0 … N-1$.
 *
 * @category Inductance
 */
export interface FlatSpiralByTurnCentres {
  /** Discriminant: `"flatSpiral"`. */
  readonly kind: "flatSpiral";
  /** Radius of the innermost turn's wire centre [m], > 0. */
  readonly innerTurnRadius: number;
  /** Radius of the outermost turn's wire centre [m], ≥ innerTurnRadius (equal only for one turn). */
  readonly outerTurnRadius: number;
  /** Not with this form (give the turn-centre radii or the edge radii, never both). */
  readonly innerEdgeRadius?: never;
  /** Not with this form (give the turn-centre radii or the edge radii, never both). */
  readonly outerEdgeRadius?: never;
  /** Number of turns, an integer ≥ 1 (at most 10⁵ for the field functions). */
  readonly turns: number;
  /** Axial position of the spiral's plane [m], any sign (default 0). */
  readonly position?: number;
}

/**
 * A flat (pancake) spiral given by the **edges** of its winding: the band from
 * `innerEdgeRadius` to `outerEdgeRadius` is cut into `turns` equal rings and each turn's
 * filament sits in the middle of its ring, $r_i = r_\mathrm{in} + (i + \tfrac12)(r_\mathrm{out} - r_\mathrm{in})/N$
 * (half a pitch inside each edge).
 *
 * @category Inductance
 */
export interface FlatSpiralByEdges {
  /** Discriminant: `"flatSpiral"`. */
  readonly kind: "flatSpiral";
  /** Inner edge of the winding [m], ≥ 0. */
  readonly innerEdgeRadius: number;
  /** Outer edge of the winding [m], > innerEdgeRadius. */
  readonly outerEdgeRadius: number;
  /** Not with this form (give the turn-centre radii or the edge radii, never both). */
  readonly innerTurnRadius?: never;
  /** Not with this form (give the turn-centre radii or the edge radii, never both). */
  readonly outerTurnRadius?: never;
  /** Number of turns, an integer ≥ 1 (at most 10⁵ for the field functions). */
  readonly turns: number;
  /** Axial position of the spiral's plane [m], any sign (default 0). */
  readonly position?: number;
}

/**
 * A flat spiral, by its turn centres or by its winding edges (the field names say which).
 *
 * @category Inductance
 */
export type FlatSpiralGeometry = FlatSpiralByTurnCentres | FlatSpiralByEdges;

/**
 * Any coaxial coil of the family, told apart by `kind`; accepted by
 * {@link coaxialCoilMutualInductance}, {@link fieldOnAxis} and {@link fieldNearCoil} (the field
 * functions refuse `"multilayer"`).
 *
 * @category Inductance
 */
export type CoilGeometry = LoopGeometry | SolenoidGeometry | MultilayerGeometry | FlatSpiralGeometry;

/** A validated coil with every default filled in (internal). */
export type CheckedCoil =
  | { readonly kind: "loop"; readonly radius: number; readonly turns: number; readonly position: number }
  | { readonly kind: "solenoid"; readonly radius: number; readonly length: number; readonly turns: number; readonly position: number }
  | {
      readonly kind: "multilayer";
      readonly innerRadius: number;
      readonly outerRadius: number;
      readonly length: number;
      readonly turns: number;
      readonly position: number;
    }
  | CheckedSpiral;

/** A validated flat spiral (internal): its two radii and what they are measured to. */
export interface CheckedSpiral {
  readonly kind: "spiral";
  readonly radiiAt: SpiralRadii;
  readonly innerRadius: number;
  readonly outerRadius: number;
  readonly turns: number;
  readonly position: number;
}

/** What a spiral's two radii are measured to: the end turns' wire centres, or the winding's edges. */
export type SpiralRadii = "turnCentres" | "edges";

/** How a module reads coil descriptions (internal). */
export interface CoilRules {
  /** What the deprecated `kind: "spiral"` has always meant in the calling module. */
  readonly legacySpiral: SpiralRadii;
  /**
   * Set when the caller sums one filament loop per turn: solenoid and spiral turns must then be
   * whole and at most this many.
   */
  readonly loopLimit?: number;
  /**
   * Set when the caller sums one term per flat-spiral turn (and per pair of turns): spiral turns
   * must then be at most this many, so that the work stays bounded.
   */
  readonly spiralLimit?: number;
  /** Whether `"multilayer"` is accepted. */
  readonly multilayer: boolean;
}

const FIELDS = Object.freeze({
  loop: Object.freeze(["kind", "radius", "turns", "position"]),
  solenoid: Object.freeze(["kind", "radius", "length", "turns", "position"]),
  multilayer: Object.freeze(["kind", "innerRadius", "outerRadius", "length", "turns", "position"]),
  flatSpiral: Object.freeze(["kind", "innerTurnRadius", "outerTurnRadius", "innerEdgeRadius", "outerEdgeRadius", "turns", "position"]),
  spiral: Object.freeze(["kind", "innerRadius", "outerRadius", "turns", "position"]),
});

/** Turns of a current sheet or smeared winding: a finite number ≥ 1 (fractional turns allowed). */
export function requireTurns(where: string, parameter: string, value: unknown): number {
  if (typeof value !== "number" || !Number.isFinite(value) || !(value >= 1)) {
    throw new InputError(where, parameter, value, "", "a finite number ≥ 1");
  }
  return value;
}

/** Spiral turn-centre radii: outer ≥ inner, equal exactly when there is one turn. */
export function checkSpiralRadii(where: string, parameter: string, inner: number, outer: number, turns: number, innerName = "innerRadius"): void {
  if (turns === 1) {
    if (outer !== inner) throw new InputError(where, parameter, outer, "m", `equal to ${innerName} (${inner}) for a single turn`);
  } else if (!(outer > inner)) {
    throw new InputError(where, parameter, outer, "m", `a finite number > ${innerName} (${inner})`);
  }
}

/**
 * Radius of turn `i` (0-based) of a validated spiral: evenly spaced from the inner to the outer
 * turn centre, or in the middle of each of `turns` equal rings between the edges.
 */
export function spiralTurnRadius(radiiAt: SpiralRadii, inner: number, outer: number, turns: number, i: number): number {
  if (radiiAt === "edges") return inner + ((i + 0.5) * (outer - inner)) / turns;
  return turns === 1 ? inner : inner + ((outer - inner) * i) / (turns - 1);
}

function wholeTurns(where: string, parameter: string, value: unknown, limit: number): number {
  const turns = requireInteger(where, parameter, value, 1);
  if (turns > limit) throw new InputError(where, parameter, turns, "", `an integer between 1 and ${limit} (the cost grows with the number of turns)`);
  return turns;
}

function readSpiral(where: string, name: string, c: Record<string, unknown>, radiiAt: SpiralRadii, innerName: string, outerName: string, rules: CoilRules, position: number): CheckedSpiral {
  const turns =
    rules.loopLimit === undefined ? requireInteger(where, `${name}.turns`, c.turns, 1) : wholeTurns(where, `${name}.turns`, c.turns, rules.loopLimit);
  if (rules.spiralLimit !== undefined && turns > rules.spiralLimit) {
    throw new InputError(where, `${name}.turns`, turns, "", `an integer between 1 and ${rules.spiralLimit} for a flat spiral (one term per turn is summed, so the cost grows as turns²)`);
  }
  let inner: number;
  let outer: number;
  if (radiiAt === "turnCentres") {
    inner = requirePositive(where, `${name}.${innerName}`, c[innerName], "m");
    outer = requirePositive(where, `${name}.${outerName}`, c[outerName], "m");
    checkSpiralRadii(where, `${name}.${outerName}`, inner, outer, turns, innerName);
  } else {
    inner = requireFinite(where, `${name}.${innerName}`, c[innerName], "m");
    if (inner < 0) throw new InputError(where, `${name}.${innerName}`, inner, "m", "a finite number ≥ 0");
    outer = requirePositive(where, `${name}.${outerName}`, c[outerName], "m");
    if (!(outer > inner)) throw new InputError(where, `${name}.${outerName}`, outer, "m", `a finite number > ${innerName} (${inner})`);
  }
  return { kind: "spiral", radiiAt, innerRadius: inner, outerRadius: outer, turns, position };
}

/** Which radii a `"flatSpiral"` gives; refuses none, a mix, or the ambiguous bare names. */
function flatSpiralForm(where: string, name: string, c: Record<string, unknown>): SpiralRadii {
  const centres = c.innerTurnRadius !== undefined || c.outerTurnRadius !== undefined;
  const edges = c.innerEdgeRadius !== undefined || c.outerEdgeRadius !== undefined;
  if (centres && edges) {
    const key = c.innerEdgeRadius !== undefined ? "innerEdgeRadius" : "outerEdgeRadius";
    throw new InputError(where, `${name}.${key}`, c[key], "m",
      "absent when turn-centre radii are given: a flatSpiral takes innerTurnRadius and outerTurnRadius (turn centres) or innerEdgeRadius and outerEdgeRadius (winding edges), not a mix (they differ by half a pitch)");
  }
  return edges ? "edges" : "turnCentres";
}

/**
 * Validates one coil description of the family (or a module's deprecated `kind: "spiral"`) and
 * fills in its defaults (internal). `name` is the path used in error messages (`coil`, `coilA`).
 */
export function readCoilGeometry(where: string, name: string, coil: unknown, rules: CoilRules): CheckedCoil {
  const c = requireObject(where, name, coil);
  const kinds = rules.multilayer ? ["loop", "solenoid", "multilayer", "flatSpiral"] : ["loop", "solenoid", "flatSpiral"];
  const kind = c.kind;
  if (kind === "multilayer" && !rules.multilayer) {
    throw new InputError(where, `${name}.kind`, kind, "",
      `one of ${kinds.map((k) => JSON.stringify(k)).join(", ")} (a multilayer winding of uniform current density has no filament loops here: give its loops as an array)`);
  }
  if (kind !== "loop" && kind !== "solenoid" && kind !== "multilayer" && kind !== "flatSpiral" && kind !== "spiral") {
    throw new InputError(where, `${name}.kind`, kind, "", `one of ${kinds.map((k) => JSON.stringify(k)).join(", ")}`);
  }
  if (kind === "flatSpiral" && (c.innerRadius !== undefined || c.outerRadius !== undefined)) {
    const key = c.innerRadius !== undefined ? "innerRadius" : "outerRadius";
    throw new InputError(where, `${name}.${key}`, c[key], "m",
      "absent: a flatSpiral says which radius it means, innerTurnRadius and outerTurnRadius (turn centres) or innerEdgeRadius and outerEdgeRadius (winding edges)");
  }
  requireKnownKeys(where, name, c, FIELDS[kind]);
  const position = c.position === undefined ? 0 : requireFinite(where, `${name}.position`, c.position, "m");
  switch (kind) {
    case "loop":
      return { kind, radius: requirePositive(where, `${name}.radius`, c.radius, "m"), turns: c.turns === undefined ? 1 : requireTurns(where, `${name}.turns`, c.turns), position };
    case "solenoid": {
      const radius = requirePositive(where, `${name}.radius`, c.radius, "m");
      const length = requirePositive(where, `${name}.length`, c.length, "m");
      const turns = rules.loopLimit === undefined ? requireTurns(where, `${name}.turns`, c.turns) : wholeTurns(where, `${name}.turns`, c.turns, rules.loopLimit);
      return { kind, radius, length, turns, position };
    }
    case "multilayer": {
      const innerRadius = requirePositive(where, `${name}.innerRadius`, c.innerRadius, "m");
      const outerRadius = requirePositive(where, `${name}.outerRadius`, c.outerRadius, "m");
      if (!(outerRadius > innerRadius)) throw new InputError(where, `${name}.outerRadius`, outerRadius, "m", `a finite number > innerRadius (${innerRadius})`);
      const length = requirePositive(where, `${name}.length`, c.length, "m");
      return { kind, innerRadius, outerRadius, length, turns: requireTurns(where, `${name}.turns`, c.turns), position };
    }
    case "flatSpiral": {
      const form = flatSpiralForm(where, name, c);
      return form === "edges"
        ? readSpiral(where, name, c, "edges", "innerEdgeRadius", "outerEdgeRadius", rules, position)
        : readSpiral(where, name, c, "turnCentres", "innerTurnRadius", "outerTurnRadius", rules, position);
    }
    default:
      return readSpiral(where, name, c, rules.legacySpiral, "innerRadius", "outerRadius", rules, position);
  }
}
