/**
 * Magnetic flux density of a coil made of coaxial circular loops (Biot–Savart): exact on the
 * axis, and anywhere nearby through the exact loop field with complete elliptic integrals.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireInteger, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { ellipticEFromComplement, ellipticKFromComplement } from "../special/index.js";
import { MU_0 } from "../units/index.js";
import { readCoilGeometry, spiralTurnRadius } from "../inductance/coil-geometry.js";
import type { CoilGeometry, CoilRules, MultilayerGeometry, SolenoidGeometry } from "../inductance/coil-geometry.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const POINT_FIELDS: readonly string[] = Object.freeze(["radialDistance", "axialPosition"]);

/**
 * One circular filament loop of a coaxial coil (its axis is the common z axis).
 *
 * @category Field
 */
export interface FieldLoop {
  /** Loop radius [m], > 0. */
  readonly radius: number;
  /** Axial position of the loop's plane [m] (default 0). */
  readonly position?: number;
  /** Number of turns lumped in this loop (default 1; integer ≥ 1). */
  readonly turns?: number;
}

/**
 * A single-layer solenoid of `turns` loops of equal `radius`, evenly pitched over `length`
 * and centred on `position`: loop $i$ sits at $z_i = z_0 - \ell/2 + (i + \tfrac12)\,\ell/N$.
 *
 * @deprecated Use {@link SolenoidGeometry} (the same shape, shared with the inductance
 *   functions); this name stays until 1.0.
 * @category Field
 */
export type FieldSolenoid = SolenoidGeometry;

/**
 * The former flat-spiral description of the field functions: `turns` concentric loops evenly
 * spaced in radius between `innerRadius` and `outerRadius`, both measured to the **winding
 * edges**, in the plane `position`: loop $i$ has radius
 * $r_i = r_{in} + (i + \tfrac12)(r_{out} - r_{in})/N$. The inductance functions read the same shape
 * as turn centres ({@link CoaxialSpiralCoil}), hence the new tag.
 *
 * @deprecated Use {@link FlatSpiralByEdges}: `{ kind: "flatSpiral", innerEdgeRadius,
 *   outerEdgeRadius, turns, position }` with the same numbers gives bit-identical results.
 *   Accepted until 1.0.
 * @category Field
 */
export interface FieldSpiral {
  /** Discriminant. */
  readonly kind: "spiral";
  /** Inner edge of the winding [m], ≥ 0. */
  readonly innerRadius: number;
  /** Outer edge of the winding [m], > innerRadius. */
  readonly outerRadius: number;
  /** Number of turns, integer ≥ 1. */
  readonly turns: number;
  /** Axial position of the spiral's plane [m] (default 0). */
  readonly position?: number;
}

/**
 * A coil for the field functions: an array of coaxial loops, or a description of the
 * {@link CoilGeometry} family other than `"multilayer"` (expanded into its loops), or the
 * former {@link FieldSpiral} (deprecated).
 *
 * @category Field
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former spiral is accepted until 1.0
export type FieldCoil = readonly FieldLoop[] | Exclude<CoilGeometry, MultilayerGeometry> | FieldSpiral;

/**
 * Flux density at a point near a coil [T], cylindrical components.
 *
 * @category Field
 */
export interface FieldComponents {
  /** Radial component $B_\rho$ [T] (outward positive). */
  readonly radial: number;
  /** Axial component $B_z$ [T]. */
  readonly axial: number;
  /** Magnitude $\sqrt{B_\rho^2 + B_z^2}$ [T]. */
  readonly magnitude: number;
}

/**
 * A point in cylindrical coordinates about the coil axis.
 *
 * @category Field
 */
export interface FieldPoint {
  /** Distance from the axis [m], ≥ 0. */
  readonly radialDistance: number;
  /** Axial coordinate [m] (same origin as the loops' `position`). */
  readonly axialPosition: number;
}

interface Loop {
  radius: number;
  position: number;
  turns: number;
}

/**
 * Largest number of loops (turns of a description, or array entries) accepted: the field is a
 * sum over loops, so the cost grows linearly (about 0.1 µs per loop and point on the axis, 0.3 µs
 * off it, plus 50 bytes per loop); 10⁵ turns keep a call within about 30 ms.
 */
const MAX_LOOPS = 100_000;

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LOOP_FIELDS: readonly string[] = Object.freeze(["radius", "position", "turns"]);

/** How this module reads coil descriptions: the deprecated `kind: "spiral"` gives winding edges. */
const RULES: CoilRules = Object.freeze({ legacySpiral: "edges", loopLimit: MAX_LOOPS, multilayer: false });

/** Expands and validates a coil description into loops. */
function coilLoops(where: string, coil: unknown): Loop[] {
  if (Array.isArray(coil)) {
    if (coil.length === 0) throw new InputError(where, "coil", coil, "", "a non-empty array of loops");
    if (coil.length > MAX_LOOPS) throw new InputError(where, "coil", `${coil.length} loops`, "", `at most ${MAX_LOOPS} loops (the cost grows with the number of loops)`);
    return coil.map((item: unknown, i) => {
      const loop = requireObject(where, `coil[${i}]`, item);
      if (loop.kind !== undefined) {
        throw new InputError(where, `coil[${i}].kind`, loop.kind, "", "absent: an array lists single loops (radius, position, turns); pass a solenoid or spiral description itself, not inside an array");
      }
      requireKnownKeys(where, `coil[${i}]`, loop, LOOP_FIELDS);
      return {
        radius: requirePositive(where, `coil[${i}].radius`, loop.radius, "m"),
        position: loop.position === undefined ? 0 : requireFinite(where, `coil[${i}].position`, loop.position, "m"),
        turns: loop.turns === undefined ? 1 : requireInteger(where, `coil[${i}].turns`, loop.turns, 1),
      };
    });
  }
  const c = readCoilGeometry(where, "coil", coil, RULES);
  const position = c.position;
  const loops: Loop[] = [];
  if (c.kind === "loop") {
    loops.push({ radius: c.radius, position, turns: c.turns });
  } else if (c.kind === "solenoid") {
    const { radius, length, turns } = c;
    for (let i = 0; i < turns; i++) loops.push({ radius, position: position - length / 2 + ((i + 0.5) * length) / turns, turns: 1 });
  } else if (c.kind === "spiral") {
    for (let i = 0; i < c.turns; i++) loops.push({ radius: spiralTurnRadius(c.radiiAt, c.innerRadius, c.outerRadius, c.turns, i), position, turns: 1 });
  }
  return loops;
}

/** Below this parameter m the elliptic combinations are summed as power series. */
const SERIES_LIMIT = 0.1;
const SERIES_TERMS = 24;

/**
 * Power-series coefficients (times π/2) in m of E(m), of D(m) = (K − E)/m and of
 * F(m)/m = (E − 2(1 − m) D)/m, from $K = \tfrac{\pi}{2}\sum c_n m^n$, $E = \tfrac{\pi}{2}\sum c_n m^n/(1 - 2n)$,
 * $c_n = ((2n-1)!!/(2n)!!)^2$ (Abramowitz & Stegun 17.3.11–12).
 */
const { E_COEFFICIENTS, D_COEFFICIENTS, F_COEFFICIENTS } = ((): {
  E_COEFFICIENTS: Float64Array;
  D_COEFFICIENTS: Float64Array;
  F_COEFFICIENTS: Float64Array;
} => {
  const c = new Float64Array(SERIES_TERMS + 2);
  c[0] = 1;
  for (let n = 1; n < c.length; n++) c[n] = c[n - 1]! * ((2 * n - 1) / (2 * n)) ** 2;
  const eCoefficients = new Float64Array(SERIES_TERMS + 1);
  const dCoefficients = new Float64Array(SERIES_TERMS + 1);
  for (let n = 0; n <= SERIES_TERMS; n++) {
    eCoefficients[n] = (Math.PI / 2) * (c[n]! / (1 - 2 * n));
    dCoefficients[n] = (Math.PI / 2) * c[n + 1]! * ((2 * n + 2) / (2 * n + 1));
  }
  // F = E − 2D + 2mD: coefficient of m^n is e_n − 2 d_n + 2 d_{n−1}; the m⁰ term vanishes.
  const fCoefficients = new Float64Array(SERIES_TERMS);
  for (let n = 1; n <= SERIES_TERMS; n++) {
    fCoefficients[n - 1] = eCoefficients[n]! - 2 * dCoefficients[n]! + 2 * dCoefficients[n - 1]!;
  }
  return { E_COEFFICIENTS: eCoefficients, D_COEFFICIENTS: dCoefficients, F_COEFFICIENTS: fCoefficients };
})();

/** Horner evaluation of Σ coefficients[n] mⁿ. */
function series(coefficients: Float64Array, m: number): number {
  let sum = 0;
  for (let n = coefficients.length - 1; n >= 0; n--) sum = sum * m + coefficients[n]!;
  return sum;
}

/**
 * Options of {@link fieldOnAxis}.
 *
 * @category Field
 */
export interface FieldOnAxisOptions {
  /** The coil: loops, or a solenoid or spiral description. */
  readonly coil: FieldCoil;
  /** Coil current [A] (RMS or peak; the result is the same kind), any sign. */
  readonly current: number;
  /**
   * Axial coordinate of the point [m], any sign, measured from the coil's origin (the loops'
   * `position`s are relative to the same origin).
   */
  readonly axialPosition: number;
}

const ON_AXIS_FIELDS: readonly string[] = Object.freeze(["coil", "current", "axialPosition"]);

/**
 * Axial flux density on the axis of a coil of coaxial circular loops, by superposition of the
 * exact on-axis field of each loop (Biot–Savart):
 * $$ B_z(z) = \sum_i \frac{\mu_0 N_i I\, a_i^2}{2\,\left(a_i^2 + (z - z_i)^2\right)^{3/2}} . $$
 *
 * The field is linear in the current: give the RMS current for the RMS flux density (as
 * {@link exposureCheck} wants), the peak current for the peak.
 *
 * Hard domain (throws {@link InputError}): a malformed coil (see {@link FieldCoil}),
 * non-finite `current` or `axialPosition`, an unknown option. Validity: thin filaments, free space (no magnetic core,
 * no eddy currents in nearby metal), quasi-static (coil much smaller than the wavelength).
 * Accuracy: exact for the filament model (rounding only, ≤ 1e-14 relative; tests against the
 * closed forms for a loop, a solenoid and a flat spiral in the limit of many turns).
 * Cost: linear in the number of loops, about 0.1 µs per loop; at most 10⁵ loops or turns are
 * accepted (more throws {@link InputError} saying so), i.e. at most about 10 ms per call.
 *
 * @param options - the coil, its current and the point on the axis (see {@link FieldOnAxisOptions})
 * @returns axial flux density [T]
 * @throws {@link InputError} on bad input
 * @see J. D. Jackson, Classical Electrodynamics, 3rd ed., Wiley 1999, §5.5 (field of a circular loop).
 * @example
 * ```ts
 * import { fieldOnAxis } from "fluxwright";
 * // A single 50 mm loop carrying 10 A, at its centre: μ0 I / (2a).
 * console.log(fieldOnAxis({ coil: [{ radius: 0.05 }], current: 10, axialPosition: 0 })); // ≈ 1.2566e-4
 * ```
 * @category Field
 */
export function fieldOnAxis(options: FieldOnAxisOptions): number;
/**
 * The positional form of {@link fieldOnAxis}: `fieldOnAxis(coil, current, distance)` is
 * `fieldOnAxis({ coil, current, axialPosition: distance })`.
 *
 * @deprecated Use the options object `fieldOnAxis({ coil, current, axialPosition })`; this form
 *   stays until 1.0.
 * @param coil - the coil: loops, or a solenoid or spiral description
 * @param current - coil current [A], any sign
 * @param distance - axial coordinate of the point [m]
 * @returns axial flux density [T]
 */
export function fieldOnAxis(coil: FieldCoil, current: number, distance: number): number;
export function fieldOnAxis(...args: [FieldOnAxisOptions] | [FieldCoil, number, number]): number {
  const where = "fieldOnAxis";
  let coil: unknown;
  let current: unknown;
  let distance: unknown;
  let distanceName = "distance";
  if (args.length === 1) {
    const options = args[0] as unknown;
    if (Array.isArray(options) || (typeof options === "object" && options !== null && "kind" in options)) {
      throw new InputError(where, "options", options, "", "an object { coil, current, axialPosition } (a coil alone has no current)");
    }
    const o = requireObject(where, "options", options);
    requireKnownKeys(where, "options", o, ON_AXIS_FIELDS);
    coil = o.coil;
    current = o.current;
    distance = o.axialPosition;
    distanceName = "axialPosition";
  } else {
    [coil, current, distance] = args;
  }
  const loops = coilLoops(where, coil);
  const i = requireFinite(where, "current", current, "A");
  const z = requireFinite(where, distanceName, distance, "m");
  let sum = 0;
  for (const loop of loops) {
    const a2 = loop.radius * loop.radius;
    const dz = z - loop.position;
    const r2 = a2 + dz * dz;
    sum += (loop.turns * a2) / (r2 * Math.sqrt(r2));
  }
  return 0.5 * MU_0 * i * sum;
}

/**
 * Flux density at any point near a coil of coaxial circular loops (off the axis too), by
 * superposition of the exact field of each filament loop (Biot–Savart in closed form with
 * complete elliptic integrals). For a loop of radius $a$ at $z_i$ and a point at distance $\rho$
 * from the axis and $\Delta z = z - z_i$:
 * $$ \alpha^2 = (a - \rho)^2 + \Delta z^2, \quad \beta^2 = (a + \rho)^2 + \Delta z^2, \quad m_1 = \alpha^2/\beta^2 $$
 * $$ B_z = \frac{\mu_0 I}{2\pi\alpha^2\beta}\left[(a^2 - \rho^2 - \Delta z^2)\,E + \alpha^2 K\right], \qquad
 *    B_\rho = \frac{\mu_0 I\,\Delta z}{2\pi\alpha^2\beta\rho}\left[(a^2 + \rho^2 + \Delta z^2)\,E - \alpha^2 K\right] $$
 * with $K, E$ of parameter $m = 4a\rho/\beta^2 = 1 - m_1$. Evaluated without cancellation as
 * $B_z = \frac{\mu_0 I}{2\pi\alpha^2\beta}\left[2a(a - \rho)E + \alpha^2 m D\right]$ and
 * $B_\rho = \frac{\mu_0 I\,a\,\Delta z}{\pi\alpha^2\beta}\,(E - 2 m_1 D)$ with $D = (K - E)/m$: power
 * series in $m$ for $m < 0.1$ (near the axis and far away), else $K$ and $E$ from the complement
 * $m_1$ (accurate right up to the wire).
 *
 * Use it for a near-field estimate of the exposure of a person near a heater coil (then
 * {@link exposureCheck}); the field falls off as the inverse cube of distance far from the coil.
 *
 * Hard domain (throws {@link InputError}): malformed coil; non-finite current or position;
 * negative `radialDistance`; a point on a filament (the filament field is singular there).
 * Validity: as {@link fieldOnAxis}; within about one conductor radius of a turn the filament
 * model overstates the field. Accuracy: each component within 1e-13 of |B| for a single loop from
 * the axis to ten radii away and 1 % of a radius from the wire (mpmath fixture, cross-checked by
 * numerical Biot–Savart integration); ≤ 1e-12 relative vs @stdlib's elliptic integrals.
 * Cost: linear in the number of loops, about 0.3 µs per loop; at most 10⁵ loops or turns are
 * accepted (more throws {@link InputError} saying so), i.e. at most about 30 ms per call.
 *
 * @param coil - the coil: loops, or a solenoid or spiral description
 * @param current - coil current [A] (RMS or peak; the result is the same kind)
 * @param point - where: distance from the axis and axial coordinate [m]
 * @returns radial and axial components and magnitude [T]
 * @throws {@link InputError} on bad input
 * @see E. Durand, Magnétostatique, Masson 1968; J. C. Simpson, J. E. Lane, C. D. Immer,
 *   R. C. Youngquist, "Simple analytic expressions for the magnetic field of a circular current
 *   loop", NASA Technical Memorandum 2013-217919 (2001), eqs. 12–13.
 * @example
 * ```ts
 * import { fieldNearCoil } from "fluxwright";
 * const b = fieldNearCoil({ kind: "solenoid", radius: 0.04, length: 0.08, turns: 10 }, 20,
 *   { radialDistance: 0.1, axialPosition: 0 });
 * console.log(b.magnitude < 1e-3); // true
 * ```
 * @category Field
 */
export function fieldNearCoil(coil: FieldCoil, current: number, point: FieldPoint): FieldComponents {
  const where = "fieldNearCoil";
  const loops = coilLoops(where, coil);
  const i = requireFinite(where, "current", current, "A");
  requireObject(where, "point", point);
  requireKnownKeys(where, "point", point, POINT_FIELDS);
  const rho = requireFinite(where, "point.radialDistance", point.radialDistance, "m");
  if (rho < 0) throw new InputError(where, "point.radialDistance", rho, "m", "a finite number ≥ 0");
  const z = requireFinite(where, "point.axialPosition", point.axialPosition, "m");
  let bz = 0;
  let br = 0;
  for (const loop of loops) {
    const a = loop.radius;
    const dz = z - loop.position;
    const alpha2 = (a - rho) * (a - rho) + dz * dz;
    if (alpha2 <= 1e-24 * a * a) {
      throw new InputError(where, "point", point, "m", "off every filament loop (the filament field is singular on the wire)");
    }
    const beta2 = (a + rho) * (a + rho) + dz * dz;
    const beta = Math.sqrt(beta2);
    const m = (4 * a * rho) / beta2;
    const m1 = alpha2 / beta2;
    // D = (K − E)/m and F = E − 2 m₁ D, by series for small m (no cancellation near the axis or
    // far away), else from K and E.
    let e: number;
    let d: number;
    let f: number;
    if (m < SERIES_LIMIT) {
      e = series(E_COEFFICIENTS, m);
      d = series(D_COEFFICIENTS, m);
      f = m * series(F_COEFFICIENTS, m);
    } else {
      const k = ellipticKFromComplement(m1);
      e = ellipticEFromComplement(m1);
      d = (k - e) / m;
      f = e - 2 * m1 * d;
    }
    const scale = loop.turns / (Math.PI * alpha2 * beta);
    bz += 0.5 * scale * (2 * a * (a - rho) * e + alpha2 * m * d);
    br += scale * a * dz * f;
  }
  const axial = MU_0 * i * bz;
  const radial = MU_0 * i * br;
  return { radial, axial, magnitude: Math.hypot(radial, axial) };
}
