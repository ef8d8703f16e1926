/**
 * Volume and heat-losing surface of the simple part shapes a heater study takes.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";

/**
 * A part shape for {@link workpieceGeometry}: a solid round bar, a tube or ring (bore radius
 * ≥ 0), or a rectangular plate. Lengths in metres.
 *
 * @category Workpiece
 */
export type WorkpieceShape = WorkpieceBar | WorkpieceTube | WorkpiecePlate;

/**
 * A solid round bar for {@link workpieceGeometry}.
 *
 * @category Workpiece
 */
export interface WorkpieceBar {
  /** Discriminant. */
  readonly shape: "bar";
  /** Radius [m], > 0. */
  readonly radius: number;
  /** Length [m], > 0. */
  readonly length: number;
}

/**
 * A tube or ring for {@link workpieceGeometry}.
 *
 * @category Workpiece
 */
export interface WorkpieceTube {
  /** Discriminant. */
  readonly shape: "tube";
  /** Outer radius [m], > 0. */
  readonly outerRadius: number;
  /** Bore radius [m], ≥ 0 and < outerRadius. */
  readonly innerRadius: number;
  /** Length (a ring's height) [m], > 0. */
  readonly length: number;
}

/**
 * A rectangular plate for {@link workpieceGeometry}.
 *
 * @category Workpiece
 */
export interface WorkpiecePlate {
  /** Discriminant. */
  readonly shape: "plate";
  /** Length [m], > 0. */
  readonly length: number;
  /** Width [m], > 0. */
  readonly width: number;
  /** Thickness [m], > 0. */
  readonly thickness: number;
}

/**
 * Result of {@link workpieceGeometry}.
 *
 * @category Workpiece
 */
export interface WorkpieceGeometry {
  /** Volume [m³]. */
  readonly volume: number;
  /** Whole outer surface (ends, bore and faces included) [m²]. */
  readonly surfaceArea: number;
}

/**
 * Volume and whole surface area of a bar, tube (or ring) or plate:
 *
 * $$
 * \text{bar: } V = \pi a^2\ell,\; A = 2\pi a(a + \ell);\quad
 * \text{tube: } V = \pi(a^2 - b^2)\ell,\; A = 2\pi(a + b)\ell + 2\pi(a^2 - b^2);\quad
 * \text{plate: } V = \ell w t,\; A = 2(\ell w + \ell t + w t).
 * $$
 *
 * Hard domain (throws {@link InputError}): every length > 0 (a tube's inner radius ≥ 0 and <
 * its outer radius); an unknown shape or key. Validity: ideal solids (no chamfers or holes).
 * Accuracy: exact (elementary geometry).
 *
 * @param part - the shape and its dimensions [m], see {@link WorkpieceShape}
 * @returns volume [m³] and surface area [m²]
 * @throws {@link InputError} for values outside the hard domain
 * @see Elementary geometry (cylinder, annular cylinder, cuboid).
 * @example
 * ```ts
 * import { workpieceGeometry } from "fluxwright";
 * const g = workpieceGeometry({ shape: "bar", radius: 0.01, length: 0.1 });
 * console.log(g.volume); // ≈ 3.1416e-5
 * ```
 * @category Workpiece
 */
export function workpieceGeometry(part: WorkpieceShape): WorkpieceGeometry {
  const where = "workpieceGeometry";
  requireObject(where, "part", part);
  const shape = requireOneOf(where, "part.shape", part.shape, ["bar", "tube", "plate"] as const);
  if (shape === "bar") {
    requireKnownKeys(where, "part", part, ["shape", "radius", "length"]);
    const p = part as WorkpieceBar;
    const a = requirePositive(where, "part.radius", p.radius, "m");
    const l = requirePositive(where, "part.length", p.length, "m");
    return { volume: Math.PI * a * a * l, surfaceArea: 2 * Math.PI * a * (a + l) };
  }
  if (shape === "tube") {
    requireKnownKeys(where, "part", part, ["shape", "outerRadius", "innerRadius", "length"]);
    const p = part as WorkpieceTube;
    const a = requirePositive(where, "part.outerRadius", p.outerRadius, "m");
    const b = requireNonNegative(where, "part.innerRadius", p.innerRadius, "m");
    if (!(b < a)) throw new InputError(where, "part.innerRadius", b, "m", `a finite number ≥ 0 and < part.outerRadius (${a})`);
    const l = requirePositive(where, "part.length", p.length, "m");
    return { volume: Math.PI * (a * a - b * b) * l, surfaceArea: 2 * Math.PI * (a + b) * l + 2 * Math.PI * (a * a - b * b) };
  }
  requireKnownKeys(where, "part", part, ["shape", "length", "width", "thickness"]);
  const p = part as WorkpiecePlate;
  const l = requirePositive(where, "part.length", p.length, "m");
  const w = requirePositive(where, "part.width", p.width, "m");
  const t = requirePositive(where, "part.thickness", p.thickness, "m");
  return { volume: l * w * t, surfaceArea: 2 * (l * w + l * t + w * t) };
}
