/**
 * Steady-state temperature of a heated part losing heat by convection and radiation.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import { STEFAN_BOLTZMANN } from "../units/index.js";
import { brentRoot } from "../special/index.js";
import { checkSurface, powerFunction, surfaceLoss } from "./surface-loss.js";

/** Highest equilibrium temperature returned [K]: beyond it no material model means anything. */
const MAX_TEMPERATURE = 1e6;

/** Accepted fields (misspelt ones are rejected, not ignored). */
const STEADY_FIELDS: readonly string[] = Object.freeze(["power", "powerAt", "surfaceArea", "convectionCoefficient", "emissivity", "ambientTemperature", "initialTemperature"]);

/**
 * Options of {@link steadyStateTemperature}. Give exactly one of `power` and `powerAt`.
 *
 * @category Thermal
 */
export interface SteadyStateTemperatureOptions {
  /** Heating power absorbed by the part [W], ≥ 0, constant. */
  readonly power?: number;
  /**
   * Heating power absorbed by the part as a function of its temperature [K] → [W] (e.g. falling
   * at the Curie point as the coupling changes). Must return finite numbers ≥ 0 (anything else throws an InputError naming the temperature).
   */
  readonly powerAt?: (temperature: number) => number;
  /** Surface area exchanging heat with the surroundings [m²], > 0. */
  readonly surfaceArea: number;
  /** Convection coefficient h [W/(m²·K)], ≥ 0 (natural convection in air: roughly 5–25). */
  readonly convectionCoefficient: number;
  /** Total hemispherical emissivity ε of the surface [-], 0 … 1. */
  readonly emissivity: number;
  /** Temperature of the surrounding air and of the radiating surroundings [K], > 0. */
  readonly ambientTemperature: number;
  /**
   * Where the part starts [K], > 0 (default: `ambientTemperature`). With a temperature-dependent
   * `powerAt` there may be several equilibria; the one returned is the first met when moving from
   * here in the direction of the net heat flow, the one a heat-up settles at.
   */
  readonly initialTemperature?: number;
}

/**
 * The temperature at which the absorbed power equals the surface loss by convection and
 * radiation:
 * $$ P(T) = h A\,(T - T_a) + \varepsilon \sigma A\,(T^4 - T_a^4) . $$
 *
 * For a constant power the right side rises strictly with $T$, so the root is unique and lies in
 * the bracket $[T_a,\ \min(T_a + P/(hA),\ (T_a^4 + P/(\varepsilon\sigma A))^{1/4})]$; since the net heat
 * is decreasing and concave in $T$, Newton's method started at the upper end descends
 * monotonically onto it (to a few ulp), with a bracketed regula falsi as fallback. With `powerAt(T)` the
 * equilibrium reached from `initialTemperature` is bracketed by a scan in steps of at most 2 K
 * (below 5000 K), then refined the same way: an equilibrium narrower than the scan step (power
 * rising and falling back within 2 K) can be missed.
 *
 * Hard domain (throws {@link InputError}): non-finite or out-of-range inputs (see
 * {@link SteadyStateTemperatureOptions}); both or neither of `power`/`powerAt`; no equilibrium
 * exists (no convection, no radiation and net heating — the temperature would rise without
 * limit — or no balance below 10⁶ K).
 *
 * Validity: a part at one uniform temperature (lumped) in surroundings at one temperature; grey,
 * diffuse surface; $h$ independent of temperature. Accuracy: the root to ≤ 1e-12 relative
 * (tests: against the closed forms without radiation, $T_a + P/(hA)$, and without convection,
 * $(T_a^4 + P/(\varepsilon\sigma A))^{1/4}$).
 *
 * @param options - power, surface and surroundings; see {@link SteadyStateTemperatureOptions}
 * @returns the steady-state temperature [K]
 * @throws {@link InputError} on bad input or when no equilibrium exists
 * @see F. P. Incropera, D. P. DeWitt et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
 *   Wiley 2007, §1.3.1 (surface energy balance, eq. 1.12).
 * @example
 * ```ts
 * import { steadyStateTemperature } from "fluxwright";
 * // 100 W into a part with 0.01 m² of surface, h = 20 W/(m²·K), no radiation, in 20 °C air:
 * const t = steadyStateTemperature({ power: 100, surfaceArea: 0.01, convectionCoefficient: 20,
 *   emissivity: 0, ambientTemperature: 293.15 });
 * console.log(t); // ≈ 793.15
 * ```
 * @category Thermal
 */
export function steadyStateTemperature(options: SteadyStateTemperatureOptions): number {
  const where = "steadyStateTemperature";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, STEADY_FIELDS);
  const surface = checkSurface(where, options);
  const start =
    options.initialTemperature === undefined
      ? surface.ambient
      : requirePositive(where, "initialTemperature", options.initialTemperature, "K");
  if (options.powerAt === undefined && options.power !== undefined) {
    requireNonNegative(where, "power", options.power, "W");
  }
  const power = powerFunction(where, options.power, options.powerAt);
  const result = findEquilibrium(power, surface, start, options.powerAt === undefined);
  if (result === null) {
    throw new InputError(
      where,
      "convectionCoefficient",
      options.convectionCoefficient,
      "W/(m²·K)",
      "large enough (with emissivity) for an equilibrium below 1e6 K to exist",
    );
  }
  return result;
}

/**
 * The equilibrium met from `start` following the net heat flow, or `null` when none exists
 * (unbounded heating, or cooling to absolute zero). `constantPower` enables the closed bracket.
 * @internal
 */
export function findEquilibrium(
  power: (temperature: number) => number,
  surface: { area: number; convection: number; emissivity: number; ambient: number },
  start: number,
  constantPower: boolean,
): number | null {
  const { area, convection, emissivity, ambient } = surface;
  const net = (t: number): number => power(t) - surfaceLoss(t, ambient, area, convection, emissivity);
  const noLoss = convection === 0 && emissivity === 0;
  if (constantPower) {
    const p = power(start);
    if (noLoss) return p === 0 ? start : null;
    if (p === 0) return ambient;
    // no balance below the documented ceiling: refuse rather than return an overflowed bound
    if (net(MAX_TEMPERATURE) > 0) return null;
    // Root of P = hA(T − Ta) + εσA(T⁴ − Ta⁴), P > 0: between Ta and each single-mechanism bound.
    let upper: number = MAX_TEMPERATURE;
    if (convection > 0) upper = Math.min(upper, ambient + p / (convection * area));
    if (emissivity > 0) upper = Math.min(upper, Math.pow(ambient ** 4 + p / (emissivity * STEFAN_BOLTZMANN * area), 0.25));
    if (convection === 0 || emissivity === 0) return upper; // a single mechanism: closed form
    // net(T) is decreasing and concave, so Newton's method from the upper bound descends
    // monotonically onto the root (each tangent lies above the curve): quadratic and safe.
    const hA = convection * area;
    const sigmaA = emissivity * STEFAN_BOLTZMANN * area;
    let t = upper;
    for (let iteration = 0; iteration < 100; iteration++) {
      const value = net(t);
      if (value >= 0) return t;
      const slope = -hA - 4 * sigmaA * t * t * t;
      const next = t - value / slope;
      if (!(next < t) || next < ambient) break;
      if (t - next <= 4 * Number.EPSILON * t) return next;
      t = next;
    }
    return brentRoot(net, ambient, t, { tolerance: 1e-13 * t });
  }
  const n0 = net(start);
  if (n0 === 0) return start;
  const direction = n0 > 0 ? 1 : -1;
  let a = start;
  let fa = n0;
  for (let i = 0; i < 200000; i++) {
    const step = a < 5000 ? Math.min(2, Math.max(0.25, 0.01 * a)) : 0.05 * a;
    let b = a + direction * step;
    if (direction < 0 && b <= 0) {
      if (a < 1e-6) return null;
      b = 0.5 * a;
    }
    if (b > MAX_TEMPERATURE) return null;
    const fb = net(b);
    if (fb === 0) return b;
    if (fb > 0 !== fa > 0) return brentRoot(net, Math.min(a, b), Math.max(a, b), { tolerance: 1e-13 * Math.max(a, b) });
    a = b;
    fa = fb;
  }
  return null;
}
