/**
 * Circular loops: self-inductance of one turn of round wire, and Maxwell's mutual inductance
 * of two coaxial circular filaments.
 *
 * @packageDocumentation
 */
import { InputError, requireInRange, requireKnownKeys, requireNonNegative, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { integrateGk } from "../special/integrate-adaptive.js";
import { maxwellOverMu0 } from "./kernels.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const MUTUAL_FIELDS: readonly string[] = Object.freeze(["radius1", "radius2", "axialDistance", "lateralOffset", "tilt"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LOOP_FIELDS: readonly string[] = Object.freeze(["loopRadius", "wireRadius", "currentDistribution"]);

/**
 * How the current is spread over the wire's cross-section: `"uniform"` (direct current and low
 * frequency, skin depth ≫ wire radius) or `"surface"` (high frequency, skin depth ≪ wire radius).
 *
 * @category Inductance
 */
export type LoopCurrentDistribution = "uniform" | "surface";

/**
 * Options of {@link loopInductance}.
 *
 * @category Inductance
 */
export interface LoopInductanceOptions {
  /** Radius of the loop to the wire centre [m], > 0. */
  readonly loopRadius: number;
  /** Radius of the round wire [m], 0 < wireRadius < loopRadius. */
  readonly wireRadius: number;
  /** Current distribution over the wire, default `"uniform"`. */
  readonly currentDistribution?: LoopCurrentDistribution;
}

/** Unchecked self-inductance of a loop [H]; `surface` selects the high-frequency form. */
export function loopSelf(a: number, rho: number, surface: boolean): number {
  const lg = Math.log((8 * a) / rho);
  if (surface) return MU_0 * a * (lg - 2);
  const e = (rho * rho) / (a * a);
  return MU_0 * a * ((1 + e / 8) * lg + e / 24 - 1.75);
}

/**
 * Self-inductance of a single circular turn of round wire.
 *
 * Uniform current (low frequency), Wien's formula to second order in ρ/a:
 * $$ L = \mu_0 a\left[\left(1 + \frac{\rho^2}{8a^2}\right)\ln\frac{8a}{\rho} + \frac{\rho^2}{24a^2} - \frac74\right] $$
 * Surface current (high frequency limit, Kirchhoff's thin-ring form):
 * $$ L = \mu_0 a\left[\ln\frac{8a}{\rho} - 2\right] $$
 * (a the loop radius, ρ the wire radius). The difference of the two at ρ ≪ a is the internal
 * inductance μ₀a/4 of the wire.
 *
 * @param options - {@link LoopInductanceOptions}: loopRadius [m], wireRadius [m], currentDistribution
 * @returns self-inductance [H]
 * @throws {@link InputError} for a non-positive or non-finite radius, wireRadius ≥ loopRadius, or
 *   an unknown currentDistribution
 * @remarks Accuracy: uniform, the neglected terms are O((ρ/a)⁴): relative error ≤ 5e-3 (ρ/a)⁴,
 * i.e. 3e-6 at ρ/a = 0.2, 2e-7 at 0.1, 3e-10 at 0.02, against a numerical double integral of
 * Maxwell's formula over the wire cross-section (fixture loop-self.json; the first-order form
 * ln(8a/ρ) − 7/4 alone is off by 2e-3 at ρ/a = 0.1). Surface: first order, neglected terms
 * O((ρ/a)² ln(a/ρ)) — about 3e-3 relative at ρ/a = 0.1 judging by the size of the uniform case's
 * second-order terms (not checked against an exact high-frequency solution). Validity: thin wire, ρ/a ≲ 0.2; the surface form assumes skin depth ≪ ρ.
 * @see M. Wien, Ann. Phys. 289, 928 (1894); E. B. Rosa & F. W. Grover, "Formulas and tables for the
 *   calculation of mutual and self-inductance", Bull. Bur. Stand. 8, 1 (1912) (circular ring of
 *   circular section; equation numbers from memory).
 * @example
 * ```ts
 * import { loopInductance } from "fluxwright";
 * const dc = loopInductance({ loopRadius: 0.05, wireRadius: 0.001 });
 * const hf = loopInductance({ loopRadius: 0.05, wireRadius: 0.001, currentDistribution: "surface" });
 * console.log(dc.toExponential(4)); // ≈ 2.6652e-7
 * console.log(hf.toExponential(4)); // ≈ 2.5079e-7
 * ```
 * @category Inductance
 */
export function loopInductance(options: LoopInductanceOptions): number {
  const where = "loopInductance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, LOOP_FIELDS);
  const a = requirePositive(where, "loopRadius", options.loopRadius, "m");
  const rho = requirePositive(where, "wireRadius", options.wireRadius, "m");
  if (!(rho < a)) throw new InputError(where, "wireRadius", rho, "m", `less than loopRadius (${a})`);
  const dist = options.currentDistribution === undefined ? "uniform" : requireOneOf(where, "currentDistribution", options.currentDistribution, ["uniform", "surface"] as const);
  return loopSelf(a, rho, dist === "surface");
}

/**
 * Options of {@link loopMutualInductance}.
 *
 * @category Inductance
 */
export interface LoopMutualInductanceOptions {
  /** Radius of the first filament [m], > 0. */
  readonly radius1: number;
  /** Radius of the second filament [m], > 0. */
  readonly radius2: number;
  /** Distance between the two filaments' planes along the common axis [m], ≥ 0 (with an offset or tilt: the height of filament 2's centre above filament 1's plane). */
  readonly axialDistance: number;
  /** Offset of filament 2's centre perpendicular to filament 1's axis [m], ≥ 0; default 0 (coaxial). */
  readonly lateralOffset?: number;
  /** Rotation of filament 2's axis about its diameter perpendicular to the offset [rad], −π ≤ tilt ≤ π; default 0. Positive tilts filament 2's far side (in the offset direction) down towards filament 1's plane. */
  readonly tilt?: number;
}

/**
 * Mutual inductance of two coaxial circular filaments, Maxwell's formula:
 *
 * $$
 * M = \mu_0\sqrt{ab}\left[\left(\frac2k - k\right)K(k) - \frac2k E(k)\right],\qquad
 * k^2 = \frac{4ab}{(a+b)^2 + z^2}
 * $$
 *
 * evaluated without cancellation, with the complementary parameter
 * $k'^2 = ((a-b)^2+z^2)/((a+b)^2+z^2)$ formed directly from the geometry. For $k^2 \le 0.7$ the
 * quadratic transformation of the hypergeometric function (DLMF 15.8.13) gives
 * $M = \mu_0\frac{\pi}{8}u^2\sqrt{D}\;{}_2F_1(\tfrac34,\tfrac54;2;u^2)$ with
 * $D = a^2+b^2+z^2$, $u = 2ab/D$: a series of positive terms. For $k^2 > 0.7$ the bracket is
 * $P(k'^2) - \ln(k'^2)\,Q(k'^2)$ with polynomials merged from the Cephes approximations of K and
 * E (one logarithm). So nearly touching filaments (k → 1, $M \to \mu_0 a[\ln(8a/d) - 2]$) and
 * far ones (k → 0, $M \to \mu_0\pi a^2b^2/(2z^3)$) keep full precision. Straight-line code, no
 * iteration: about 50 million evaluations per second on one core (Node 20).
 *
 * With a lateral offset $d$ or a tilt $\theta$, filament 2 runs through
 * $\mathbf r(t) = (d + b\cos t\cos\theta,\; b\sin t,\; z - b\cos t\sin\theta)$ and the mutual
 * inductance is the line integral of filament 1's vector potential along it (a single integral,
 * equivalent to Grover's general formula for filaments in any position). The azimuthal vector
 * potential of filament 1 at radius $\rho$ and height $z$ is $A_\varphi = M_0(a, \rho, z)/(2\pi\rho)$
 * per ampere, $M_0$ the coaxial mutual inductance above (the flux through a coaxial circle is
 * $2\pi\rho A_\varphi$), so
 * $$ M = \int_0^{2\pi} \frac{M_0\big(a, \rho(t), z(t)\big)}{2\pi\rho(t)^2}\,\big(b\,d\cos t + b^2\cos\theta\big)\,dt, $$
 * integrated by adaptive Gauss–Kronrod quadrature over half the circle (the integrand is even
 * in t). The coaxial call (no offset, no tilt) is unchanged.
 *
 * @param options - {@link LoopMutualInductanceOptions}: radius1 [m], radius2 [m], axialDistance [m], lateralOffset [m], tilt [rad]
 * @returns mutual inductance [H]: > 0 for coaxial filaments; with an offset or tilt it may be zero or negative (flux linked in reverse)
 * @throws {@link InputError} for a non-positive or non-finite radius, a negative or non-finite
 *   axialDistance or lateralOffset, a tilt outside [−π, π], coinciding filaments (radius1 =
 *   radius2 with axialDistance = 0 and no offset or tilt), or filaments so nearly touching that
 *   the misaligned integral does not converge
 * @remarks Accuracy, coaxial: ≤ 1e-14 relative vs mpmath and the Neumann integral (fixture loop-mutual.json,
 * gaps from 1e-12 to 1e6 radii; measured worst 1.5e-15 over a dense mpmath sweep); tests use 1e-13.
 * Offset or tilted: ≤ 1e-11 relative vs a direct Neumann double integral (fixture
 * test/fixtures/links/misaligned-loops.json: periodic trapezoidal rule converged to 1e-14,
 * cross-checked with mpmath; 11 geometries from a 1 cm gap to the far field, tilts to 2.5 rad,
 * M of either sign); measured ≤ 1.1e-15, except 4e-12 for a small filament far off the axis,
 * where M is 1e-4 of the integrand's size. About 0.1 ms per call.
 * Validity: thin filaments; for filaments that cross, M is finite but the integrand has a
 * logarithmic peak and the quadrature needs more panels.
 * @see J. C. Maxwell, A Treatise on Electricity and Magnetism (1873), vol. 2, art. 701;
 *   F. W. Grover, Inductance Calculations (1946), ch. 11 (and ch. 13, circular filaments with
 *   parallel or inclined axes); J. D. Jackson, Classical Electrodynamics, 3rd ed. (1999),
 *   eq. 5.37 (vector potential of a circular loop); NIST DLMF 15.8.13 (quadratic
 *   transformation); S. L. Moshier, Cephes Math Library 2.8 (2000), ellpk.c and ellpe.c.
 * @example
 * ```ts
 * import { loopMutualInductance } from "fluxwright";
 * console.log(loopMutualInductance({ radius1: 0.1, radius2: 0.1, axialDistance: 0.1 }).toExponential(4)); // ≈ 4.9408e-8
 * // the same pair with filament 2 moved 5 cm sideways
 * console.log(loopMutualInductance({ radius1: 0.1, radius2: 0.1, axialDistance: 0.1, lateralOffset: 0.05 }).toExponential(4)); // ≈ 4.1996e-8
 * ```
 * @category Inductance
 */
export function loopMutualInductance(options: LoopMutualInductanceOptions): number {
  // fast path: valid input is checked inline; anything else goes to the checks that throw
  if (typeof options === "object" && (options as unknown) !== null) {
    const a = options.radius1;
    const b = options.radius2;
    const z = options.axialDistance;
    if (
      typeof a === "number" && typeof b === "number" && typeof z === "number" &&
      a > 0 && a < Infinity && b > 0 && b < Infinity && z >= 0 && z < Infinity && (a !== b || z !== 0) &&
      loopFieldsKnown(options)
    ) {
      const m = MU_0 * maxwellOverMu0(a, b, z);
      if (m > 0 && m < Infinity) return m; // else: extreme scales, handled by the scaled path
    }
  }
  return loopMutualInductanceChecked(options);
}

/** True when every field is a known one (constant-name comparisons: a few ns on this hot path). */
function loopFieldsKnown(options: object): boolean {
  for (const key in options) {
    if (key !== "radius1" && key !== "radius2" && key !== "axialDistance") return false;
  }
  return true;
}

/** The validating path of {@link loopMutualInductance}. */
function loopMutualInductanceChecked(options: LoopMutualInductanceOptions): number {
  const where = "loopMutualInductance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, MUTUAL_FIELDS);
  const a = requirePositive(where, "radius1", options.radius1, "m");
  const b = requirePositive(where, "radius2", options.radius2, "m");
  const z = requireNonNegative(where, "axialDistance", options.axialDistance, "m");
  const d = options.lateralOffset === undefined ? 0 : requireNonNegative(where, "lateralOffset", options.lateralOffset, "m");
  const tilt = options.tilt === undefined ? 0 : requireInRange(where, "tilt", options.tilt, "rad", -Math.PI, Math.PI);
  if (d !== 0 || tilt !== 0) return misalignedLoopMutual(where, a, b, z, d, tilt);
  if (a === b && z === 0) {
    throw new InputError(where, "axialDistance", z, "", "> 0 m when radius1 equals radius2 (coinciding filaments have infinite mutual inductance)");
  }
  const direct = MU_0 * maxwellOverMu0(a, b, z);
  if (direct > 0 && direct < Infinity) return direct;
  // Extreme scales: M is homogeneous of degree 1 in the lengths, so evaluate it on the geometry
  // divided by the largest length S and put S back in logarithms. When the smaller radius
  // underflows after the division, k² < 1e-300 and the far-field term
  // M = µ0 π a² b² / (2 (a² + b² + z²)^{3/2}) is exact to rounding (DLMF 15.8.13's series).
  const scale = Math.max(a, b, z);
  const as = a / scale;
  const bs = b / scale;
  const zs = z / scale;
  const kernel = as > 0 && bs > 0 ? maxwellOverMu0(as, bs, zs) : 0;
  const logM =
    kernel > 0 && kernel < Infinity
      ? Math.log(MU_0 * kernel) + Math.log(scale)
      : Math.log((MU_0 * Math.PI) / 2) + 2 * Math.log(a) + 2 * Math.log(b) - 1.5 * (2 * Math.log(scale) + Math.log(as * as + bs * bs + zs * zs));
  const m = Math.exp(logM);
  if (!(m > 0 && m < Infinity)) {
    throw new InputError(where, "radius1", a, "m", `a radius for which (with radius2 ${b} m and axialDistance ${z} m) the mutual inductance, e^${logM.toPrecision(4)} H, lies within the double-precision range`);
  }
  return m;
}

/**
 * M of filaments with an offset and/or tilt: the line integral of filament 1's vector potential
 * A_φ = M₀(a, ρ, z)/(2πρ) along filament 2 (checked arguments).
 */
function misalignedLoopMutual(where: string, a: number, b: number, h: number, d: number, tilt: number): number {
  // work in units of the larger radius (M is homogeneous of degree 1 in the lengths)
  const scale = Math.max(a, b);
  const as = a / scale;
  const bs = b / scale;
  const hs = h / scale;
  const ds = d / scale;
  const ct = Math.cos(tilt);
  const st = Math.sin(tilt);
  const integrand = (t: number): number => {
    const c = Math.cos(t);
    const x = ds + bs * c * ct;
    const y = bs * Math.sin(t);
    const z = Math.abs(hs - bs * c * st);
    const rho2 = x * x + y * y;
    const flux = bs * ds * c + bs * bs * ct; // x y' − y x'
    if (rho2 < 1e-16 * as * as) {
      // on filament 1's axis: M₀/ρ² → π a²/(2 (a² + z²)^{3/2})
      return (flux * Math.PI * as * as) / (2 * Math.pow(as * as + z * z, 1.5)) / (2 * Math.PI);
    }
    return (maxwellOverMu0(as, Math.sqrt(rho2), z) * flux) / (2 * Math.PI * rho2);
  };
  // the integrand is even in t: twice the integral over [0, π]; the coaxial M at the same height
  // and the integrand's size set the absolute tolerance, so an M that cancels to near zero (a
  // small filament far off the axis) still terminates
  const reference = Math.max(
    maxwellOverMu0(as, bs, Math.max(Math.abs(hs), 1e-3 * Math.min(as, bs))),
    Math.PI * Math.abs(integrand(0)),
    Math.PI * Math.abs(integrand(Math.PI)),
  );
  // Break the interval where filament 2 passes over or under filament 1's wire (ρ(t) = a): the
  // integrand peaks there (logarithmically for crossing filaments), and a peak at a panel end is
  // what the adaptive bisection resolves reliably. ρ² = a² is a quadratic in c = cos t.
  const qa = (ct * ct - 1) * bs * bs;
  const qb = 2 * ds * bs * ct;
  const qc = ds * ds + bs * bs - as * as;
  let c1 = NaN;
  let c2 = NaN;
  if (Math.abs(qa) > 1e-14 * bs * bs) {
    const disc = qb * qb - 4 * qa * qc;
    if (disc >= 0) {
      const root = Math.sqrt(disc);
      const qq = -0.5 * (qb + (qb >= 0 ? root : -root));
      c1 = qq / qa;
      c2 = qq !== 0 ? qc / qq : NaN;
    }
  } else if (qb !== 0) {
    c1 = -qc / qb;
  }
  let t1 = Math.abs(c1) < 1 ? Math.acos(c1) : Math.PI;
  let t2 = Math.abs(c2) < 1 ? Math.acos(c2) : Math.PI;
  if (t2 < t1) {
    const swap = t1;
    t1 = t2;
    t2 = swap;
  }
  let value = 0;
  let converged = true;
  let start = 0;
  for (const end of [t1, t2, Math.PI]) {
    if (end <= start) continue;
    const part = integrateGk(integrand, start, end, 1e-13, 1e-14 * reference, 2000);
    value += part.value;
    converged = converged && part.converged;
    start = end;
  }
  const m = 2 * MU_0 * value * scale;
  if (!converged || !Number.isFinite(m)) {
    throw new InputError(where, "lateralOffset", d, "m", "a geometry where the filaments do not touch (the misaligned integral did not converge)");
  }
  return m;
}
