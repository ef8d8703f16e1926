/**
 * Mutual inductance of any two coaxial coils (loops, single-layer solenoids, multilayer coils,
 * flat spirals).
 *
 * @packageDocumentation
 */
import { InputError, requireNonNegative } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { MU_0 } from "../units/index.js";
import { maxwellOverMu0 } from "./kernels.js";
import { readCoilGeometry, spiralTurnRadius } from "./coil-geometry.js";
import type { CoilGeometry, CoilRules, LoopGeometry, MultilayerGeometry, SolenoidGeometry, SpiralRadii } from "./coil-geometry.js";
import {
  gaussLegendreAdaptive as integrate,
  gaussLegendreAdaptiveAbsolute as integrateAbsolute,
  gaussLegendreAdaptiveSingularAtStart as integrateSingularAtStart,
} from "../special/internal.js";

/** How this module reads coil descriptions: the deprecated `kind: "spiral"` gives turn centres. */
/** Most turns of a flat spiral: each pair of turns is one term of the sum (3000 turns with another 3000-turn spiral: about 0.5 s). */
const MAX_SPIRAL_TURNS = 3000;
const RULES: CoilRules = Object.freeze({ legacySpiral: "turnCentres", multilayer: true, spiralLimit: MAX_SPIRAL_TURNS });

/**
 * A single circular filament (or `turns` filaments bunched at one place), centred on the axis.
 *
 * @deprecated Use {@link LoopGeometry} (the same shape, plus an optional `position`); this name
 *   stays until 1.0.
 * @category Inductance
 */
export type CoaxialLoop = LoopGeometry;

/**
 * A single-layer solenoid as a current sheet: `turns` spread evenly over `length`
 * (Rosa's convention: length = turns × pitch), at `radius` (the wire centres).
 *
 * @deprecated Use {@link SolenoidGeometry} (the same shape, plus an optional `position`); this
 *   name stays until 1.0.
 * @category Inductance
 */
export type CoaxialSolenoid = SolenoidGeometry;

/**
 * A coil of rectangular winding cross-section with uniform current density.
 *
 * @deprecated Use {@link MultilayerGeometry} (the same shape, plus an optional `position`); this
 *   name stays until 1.0.
 * @category Inductance
 */
export type CoaxialMultilayerCoil = MultilayerGeometry;

/**
 * The former flat-spiral description of the inductance functions: `turns` circular filaments in
 * one plane, evenly spaced from `innerRadius` to `outerRadius`, both measured to the **wire
 * centres** of the innermost and outermost turns. The field functions read the same shape as
 * winding edges ({@link FieldSpiral}), hence the new tag.
 *
 * @deprecated Use {@link FlatSpiralByTurnCentres}: `{ kind: "flatSpiral", innerTurnRadius,
 *   outerTurnRadius, turns }` with the same numbers gives bit-identical results. Accepted until 1.0.
 * @category Inductance
 */
export interface CoaxialSpiralCoil {
  /** Discriminant: `"spiral"`. */
  readonly kind: "spiral";
  /** Radius of the innermost turn's wire centre [m], > 0. */
  readonly innerRadius: number;
  /** Radius of the outermost turn's wire centre [m], ≥ innerRadius (equal only for one turn). */
  readonly outerRadius: number;
  /** Number of turns, an integer ≥ 1. */
  readonly turns: number;
  /** Axial position of the spiral's plane [m], any sign (default 0). */
  readonly position?: number;
}

/**
 * Any coil that {@link coaxialCoilMutualInductance} accepts: the {@link CoilGeometry} family or
 * the former spiral description.
 *
 * @deprecated Use {@link CoilGeometry}; this name (which also admits the former
 *   {@link CoaxialSpiralCoil}) stays until 1.0.
 * @category Inductance
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former spiral is accepted until 1.0
export type CoaxialCoil = CoilGeometry | CoaxialSpiralCoil;

/** Internal form of a winding: radial distribution × axial extent (not part of the public surface). */
export interface Shape {
  /** 0 point, 1 uniform interval, 2 discrete radii (see `spiralTurnRadius`). */
  readonly radial: 0 | 1 | 2;
  readonly r1: number;
  readonly r2: number;
  readonly count: number;
  readonly length: number;
  readonly turns: number;
  /** What r1 and r2 of discrete radii are measured to. */
  readonly radiiAt: SpiralRadii;
  /** Axial position of the winding's centre [m]. */
  readonly position: number;
}

/** Validates a coil description and returns its internal shape. */
function readCoil(where: string, name: string, coil: unknown): Shape {
  const c = readCoilGeometry(where, name, coil, RULES);
  const base = { r1: 0, r2: 0, count: 1, length: 0, turns: c.turns, radiiAt: "turnCentres", position: c.position } as const;
  switch (c.kind) {
    case "loop":
      return { ...base, radial: 0, r1: c.radius, r2: c.radius };
    case "solenoid":
      return { ...base, radial: 0, r1: c.radius, r2: c.radius, length: c.length };
    case "multilayer":
      return { ...base, radial: 1, r1: c.innerRadius, r2: c.outerRadius, length: c.length };
    case "spiral":
      if (c.turns === 1) {
        const r = spiralTurnRadius(c.radiiAt, c.innerRadius, c.outerRadius, 1, 0);
        return { ...base, radial: 0, r1: r, r2: r };
      }
      return { ...base, radial: 2, r1: c.innerRadius, r2: c.outerRadius, count: c.turns, radiiAt: c.radiiAt };
  }
}

/** Radius of turn i (0-based) of an evenly spaced discrete distribution. */
function turnRadius(s: Shape, i: number): number {
  return spiralTurnRadius(s.radiiAt, s.r1, s.r2, s.count, i);
}

// Local tolerances of the nested integrals; with the halving test the accepted error is far
// below them (1e-11 relative observed against a 1e-13 run and the mpmath fixture).
const TOL_AXIAL = 1e-10;
const TOL_INNER_RADIAL = 1e-10;
const TOL_OUTER_RADIAL = 1e-10;

/** x·ln(y) with the limit 0 at x = 0. */
function xlog(x: number, y: number): number {
  return x === 0 ? 0 : x * Math.log(y);
}

/**
 * Antiderivatives in Δ of the near-field terms of Maxwell's formula, with ρ² = δ² + Δ²:
 * index 0: ∫ ln ρ, 1: ∫ Δ ln ρ, 2: ∫ ρ² ln ρ, 3: ∫ Δ ρ² ln ρ.
 */
function nearFieldPrimitive(which: number, x: number, delta: number): number {
  const d2 = delta * delta;
  const u = d2 + x * x;
  const at = delta === 0 ? 0 : delta * Math.atan(x / delta);
  switch (which) {
    case 0:
      return 0.5 * (xlog(x, u) - 2 * x + 2 * at);
    case 1:
      return 0.25 * (xlog(u, u) - x * x);
    case 2:
      return 0.5 * (d2 * (xlog(x, u) - 2 * x + 2 * at) + xlog((x * x * x) / 3, u) - (2 / 3) * ((x * x * x) / 3 - d2 * x + d2 * at));
    default:
      return 0.25 * (0.5 * xlog(u * u, u) - 0.25 * u * u);
  }
}

/**
 * ∫_p^q (α + βΔ) M(ra, rb, Δ)/μ0 dΔ. Near the filament singularity the terms
 * −c₀ ln ρ − c₂ ρ² ln ρ of Maxwell's formula (c₀ = √(ab), c₂ = ¾√(ab)/(a+b)², ρ² = (a−b)² + Δ²)
 * are integrated in closed form and only the smooth remainder numerically.
 */
function axialSegment(ra: number, rb: number, p: number, q: number, alpha: number, beta: number, singularNear: boolean, scale: number): number {
  if (!singularNear) {
    return integrate((x: number): number => (alpha + beta * x) * maxwellOverMu0(ra, rb, x), p, q, TOL_AXIAL);
  }
  const delta = Math.abs(ra - rb);
  const c0 = Math.sqrt(ra * rb);
  const sum = ra + rb;
  const c2 = (0.75 * c0) / (sum * sum);
  const closed = nearFieldIntegral(q, delta, c0, c2, alpha, beta) - nearFieldIntegral(p, delta, c0, c2, alpha, beta);
  const tol = TOL_AXIAL * scale;
  const d2 = delta * delta;
  const rest =
    p === 0
      ? integrateSingularAtStart((x: number): number => nearFieldRemainder(ra, rb, x, d2, c0, c2, alpha, beta), 0, q, 0, tol)
      : q === 0
        ? -integrateSingularAtStart((x: number): number => nearFieldRemainder(ra, rb, x, d2, c0, c2, alpha, beta), 0, p, 0, tol)
        : integrateAbsolute((x: number): number => nearFieldRemainder(ra, rb, x, d2, c0, c2, alpha, beta), p, q, tol);
  return closed + rest;
}

/** Antiderivative of (α + βΔ)(−c₀ ln ρ − c₂ ρ² ln ρ) at Δ = x. */
function nearFieldIntegral(x: number, delta: number, c0: number, c2: number, alpha: number, beta: number): number {
  return (
    -c0 * (alpha * nearFieldPrimitive(0, x, delta) + beta * nearFieldPrimitive(1, x, delta)) -
    c2 * (alpha * nearFieldPrimitive(2, x, delta) + beta * nearFieldPrimitive(3, x, delta))
  );
}

/** (α + βΔ)(M/μ0 + c₀ ln ρ + c₂ ρ² ln ρ): the smooth remainder. */
function nearFieldRemainder(ra: number, rb: number, x: number, d2: number, c0: number, c2: number, alpha: number, beta: number): number {
  const r2 = d2 + x * x;
  const lnr = 0.5 * Math.log(r2);
  return (alpha + beta * x) * (maxwellOverMu0(ra, rb, x) + c0 * lnr + c2 * r2 * lnr);
}

/** Density of the axial offset of two uniform windings (trapezoid), at offset x from the centre distance d. */
function trapezoidWeight(x: number, d: number, inner: number, outer: number, big: number, small: number): number {
  const as = Math.abs(x - d);
  if (small === 0 || as <= inner) return 1 / big;
  return Math.max(0, outer - as) / (big * small);
}

/**
 * Average of M/μ0 over the axial positions of the two windings: Δ = zA − zB is spread over
 * the convolution of two uniform distributions (a trapezoid) centred on D.
 */
function axialAverage(ra: number, rb: number, lengthA: number, lengthB: number, d: number): number {
  if (lengthA === 0 && lengthB === 0) return maxwellOverMu0(ra, rb, d);
  const big = Math.max(lengthA, lengthB);
  const small = Math.min(lengthA, lengthB);
  const outer = 0.5 * (big + small);
  const inner = 0.5 * (big - small);
  // scale of the answer, for absolute tolerances: the filament mutual inductance near Δ = 0
  const near = 0.25 * (ra + rb);
  const delta = Math.abs(ra - rb);
  const singular = delta < near;
  const scale = singular ? Math.sqrt(ra * rb) * (Math.log((8 * Math.sqrt(ra * rb)) / Math.max(delta, 1e-3 * near)) + 1) : 0;
  const lo = d - outer;
  const hi = d + outer;
  const points = d === 0 ? [0, inner, outer] : [lo, d - inner, d + inner, hi];
  if (singular) {
    for (const c of [-near, 0, near]) if (c > points[0]! && c < points[points.length - 1]!) points.push(c);
  }
  points.sort((x, y) => x - y);
  let total = 0;
  for (let i = 0; i + 1 < points.length; i++) {
    const p = points[i] as number;
    const q = points[i + 1] as number;
    if (!(q > p)) continue;
    const wp = trapezoidWeight(p, d, inner, outer, big, small);
    const wq = trapezoidWeight(q, d, inner, outer, big, small);
    const beta = (wq - wp) / (q - p);
    const alpha = wp - beta * p;
    const inside = singular && p >= -near && q <= near;
    total += axialSegment(ra, rb, p, q, alpha, beta, inside, scale * Math.max(wp, wq) * (q - p));
  }
  return d === 0 ? 2 * total : total;
}

/** Average over coil B's radii of the axial average, at radius ra of coil A. */
function radialAverageB(ra: number, a: Shape, b: Shape, d: number): number {
  if (b.radial === 0) return axialAverage(ra, b.r1, a.length, b.length, d);
  if (b.radial === 2) {
    let s = 0;
    for (let i = 0; i < b.count; i++) s += axialAverage(ra, turnRadius(b, i), a.length, b.length, d);
    return s / b.count;
  }
  const la = a.length;
  const lb = b.length;
  const width = b.r2 - b.r1;
  let v: number;
  if (ra > b.r1 && ra < b.r2) {
    v =
      integrateSingularAtStart((rb: number): number => axialAverage(ra, rb, la, lb, d), ra, b.r2, TOL_INNER_RADIAL) -
      integrateSingularAtStart((rb: number): number => axialAverage(ra, rb, la, lb, d), ra, b.r1, TOL_INNER_RADIAL);
  } else if (ra <= b.r1) {
    v = integrateSingularAtStart((rb: number): number => axialAverage(ra, rb, la, lb, d), b.r1, b.r2, TOL_INNER_RADIAL);
  } else {
    v = -integrateSingularAtStart((rb: number): number => axialAverage(ra, rb, la, lb, d), b.r2, b.r1, TOL_INNER_RADIAL);
  }
  return v / width;
}

/** M/(μ0 N_A N_B): the mean filament mutual inductance over both windings [m]. */
function meanMutualOverMu0(a0: Shape, b0: Shape, d: number): number {
  // keep a smeared (interval) distribution innermost, where its singular point is handled
  let a = a0;
  let b = b0;
  if (a.radial === 1 && b.radial !== 1) {
    a = b0;
    b = a0;
  }
  if (a.radial === 0) return radialAverageB(a.r1, a, b, d);
  if (a.radial === 2) {
    let s = 0;
    for (let i = 0; i < a.count; i++) s += radialAverageB(turnRadius(a, i), a, b, d);
    return s / a.count;
  }
  // both smeared: outer integral over A, split where the integrand has kinks (B's edges)
  const cuts = [a.r1, a.r2];
  if (b.r1 > a.r1 && b.r1 < a.r2) cuts.push(b.r1);
  if (b.r2 > a.r1 && b.r2 < a.r2) cuts.push(b.r2);
  cuts.sort((x, y) => x - y);
  let total = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    const p = cuts[i] as number;
    const q = cuts[i + 1] as number;
    if (q > p) total += integrate((ra: number): number => radialAverageB(ra, a, b, d), p, q, TOL_OUTER_RADIAL);
  }
  return total / (a.r2 - a.r1);
}

/** True when two filaments of the shapes coincide somewhere (infinite mutual inductance). */
function filamentsCoincide(a: Shape, b: Shape, d: number): boolean {
  if (a.length !== 0 || b.length !== 0 || d !== 0) return false;
  if (a.radial === 1 || b.radial === 1) return false;
  for (let i = 0; i < a.count; i++) {
    const ra = turnRadius(a, i);
    for (let j = 0; j < b.count; j++) if (turnRadius(b, j) === ra) return true;
  }
  return false;
}

/**
 * Internal: mutual inductance of two validated shapes [H] (used by the self-inductance
 * functions of this module too).
 */
export function shapeMutual(a: Shape, b: Shape, d: number): number {
  return MU_0 * a.turns * b.turns * meanMutualOverMu0(a, b, d);
}

/** Internal: the shape of a uniform-current-density rectangular winding. */
export function multilayerShape(innerRadius: number, outerRadius: number, length: number, turns: number): Shape {
  return { radial: 1, r1: innerRadius, r2: outerRadius, count: 1, length, turns, radiiAt: "turnCentres", position: 0 };
}

/**
 * Mutual inductance of two coaxial coils of any of the shapes {@link CoilGeometry} describes —
 * loops, single-layer solenoids (current sheets), multilayer coils (uniform current density)
 * and flat spirals (discrete filaments) — by Neumann's formula averaged over both windings.
 *
 * $$
 * M = \mu_0 N_A N_B \left\langle \frac{M_\mathrm{Maxwell}(r_A, r_B, z_A - z_B)}{\mu_0} \right\rangle_{A,B}
 * $$
 *
 * with Maxwell's exact filament formula (see {@link loopMutualInductance}); the average over a
 * winding's length is done in closed form for the weights (the axial offsets of two uniform
 * windings are trapezoid-distributed) and numerically (adaptive Gauss–Legendre, nodes clustered
 * at the integrable logarithmic singularity of touching filaments) over the offset and the
 * radii; discrete spiral turns are summed.
 *
 * Two windings may overlap in space (e.g. a coil with itself gives its self-inductance as a
 * current distribution) except that two filaments may not coincide (loops or spiral turns at
 * the same radius in the same plane): that mutual inductance is infinite and throws.
 *
 * Each coil's `position` (default 0) places its centre on the axis; `axialDistance` moves coilB
 * further along it, so the centres are $z_A$ = coilA.position and
 * $z_B$ = coilB.position + axialDistance, and only $|z_B - z_A|$ matters (the windings are
 * symmetric about their mid-planes). Without positions, `axialDistance` is the centre distance.
 *
 * The former flat-spiral description `{ kind: "spiral", innerRadius, outerRadius, turns }`
 * ({@link CoaxialSpiralCoil}, radii to the end turns' wire centres) is still accepted until 1.0
 * and gives bit-identical results to `{ kind: "flatSpiral", innerTurnRadius, outerTurnRadius, turns }`.
 *
 * @param coilA - first coil, a {@link CoilGeometry}; its reference point is its centre (mid-length)
 * @param coilB - second coil, coaxial with the first
 * @param axialDistance - distance by which coilB's centre lies further along the axis than its
 *   `position` says [m], ≥ 0 (the centre distance when neither coil gives a `position`)
 * @returns mutual inductance [H], > 0 (coaxial windings with currents in the same sense)
 * @throws {@link InputError} for a malformed coil (non-positive or non-finite dimension,
 *   turns < 1, fractional spiral turns or more than 3000 of them, outer radius not above inner
 *   radius, a flat spiral that mixes turn-centre and edge radii or uses the bare `innerRadius`/`outerRadius`), a negative or
 *   non-finite `axialDistance`, or coinciding filaments
 * @remarks Accuracy: ≤ 1e-8 relative for smeared windings (verified for multilayer self-inductance
 * against a Bessel–Struve integral in mpmath) and ≤ 1e-12 relative for loops and spirals (sums of
 * Maxwell's formula). Cost: a loop or spiral pair is a finite sum (µs); a solenoid adds a 1-D
 * integral; a multilayer coil adds one radial integral each (up to tens of ms for two multilayer coils).
 * @see J. C. Maxwell, A Treatise on Electricity and Magnetism (1873), vol. 2, art. 701;
 *   F. W. Grover, Inductance Calculations (1946), ch. 11, 12 and 15 (coaxial filaments and coils).
 * @example
 * ```ts
 * import { coaxialCoilMutualInductance } from "fluxwright";
 * // a pancake transmitter with a short solenoid receiver whose centre is 15 mm above it
 * const m = coaxialCoilMutualInductance(
 *   { kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 0.04, turns: 12 },
 *   { kind: "solenoid", radius: 0.02, length: 0.01, turns: 8 },
 *   0.015,
 * );
 * console.log(m.toExponential(4)); // ≈ 1.4050e-6
 * ```
 * @category Inductance
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former spiral description is accepted until 1.0
export function coaxialCoilMutualInductance(coilA: CoilGeometry | CoaxialSpiralCoil, coilB: CoilGeometry | CoaxialSpiralCoil, axialDistance: number): number {
  const where = "coaxialCoilMutualInductance";
  const a = readCoil(where, "coilA", coilA);
  const b = readCoil(where, "coilB", coilB);
  const shift = requireNonNegative(where, "axialDistance", axialDistance, "m");
  // exactly `shift` when neither coil gives a position
  const d = Math.abs(shift + b.position - a.position);
  if (filamentsCoincide(a, b, d)) {
    throw new InputError(where, "axialDistance", d, "", "> 0 m when a filament of coilA and one of coilB share a radius (coinciding filaments have infinite mutual inductance)");
  }
  return requireFiniteResult(where, "coilA, coilB and axialDistance", shapeMutual(a, b, d));
}
