/**
 * Internal helpers shared by the thermal models: the surface heat loss by convection and
 * radiation, a safeguarded bracketed root finder, an adaptive Simpson quadrature, and input
 * checks. Not part of the public surface.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireInRange, requireNonNegative, requirePositive } from "../core/index.js";
import { STEFAN_BOLTZMANN } from "../units/index.js";

/** Surface heat loss [W] of area `area` at `temperature` to surroundings at `ambient`. */
export function surfaceLoss(
  temperature: number,
  ambient: number,
  area: number,
  convectionCoefficient: number,
  emissivity: number,
): number {
  const t2 = temperature * temperature;
  const a2 = ambient * ambient;
  return area * (convectionCoefficient * (temperature - ambient) + emissivity * STEFAN_BOLTZMANN * (t2 * t2 - a2 * a2));
}

/**
 * Effective (linearised) surface heat-transfer coefficient [W/(m²·K)] between `temperature`
 * and `ambient`: $h + \varepsilon\sigma (T^2 + T_a^2)(T + T_a)$.
 */
export function effectiveCoefficient(
  temperature: number,
  ambient: number,
  convectionCoefficient: number,
  emissivity: number,
): number {
  return (
    convectionCoefficient +
    emissivity * STEFAN_BOLTZMANN * (temperature * temperature + ambient * ambient) * (temperature + ambient)
  );
}

/**
 * Root of f on [a, b] given f(a), f(b) of opposite signs: Illinois regula falsi with a
 * bisection every few steps (never worse than bisection). Tolerance on x, absolute.
 */
export function bracketedRoot(
  f: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fb: number,
  tolerance: number,
): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa > 0 === fb > 0) return Math.abs(fa) < Math.abs(fb) ? a : b; // no sign change: best end
  let side = 0;
  for (let iteration = 0; iteration < 400; iteration++) {
    const width = Math.abs(b - a);
    if (width <= tolerance || width <= 4 * Number.EPSILON * Math.max(Math.abs(a), Math.abs(b))) break;
    let x = (a * fb - b * fa) / (fb - fa);
    if (!(x > Math.min(a, b) && x < Math.max(a, b)) || iteration % 6 === 5) x = 0.5 * (a + b);
    const fx = f(x);
    if (fx === 0) return x;
    if (fx > 0 === fb > 0) {
      b = x;
      fb = fx;
      if (side === 1) fa *= 0.5;
      side = 1;
    } else {
      a = x;
      fa = fx;
      if (side === -1) fb *= 0.5;
      side = -1;
    }
  }
  return Math.abs(fa) < Math.abs(fb) ? a : b;
}

/** Adaptive Simpson quadrature of f over [a, b] to an absolute tolerance. */
export function adaptiveSimpson(f: (x: number) => number, a: number, b: number, tolerance: number): number {
  if (a === b) return 0;
  const fa = f(a);
  const fb = f(b);
  const m = 0.5 * (a + b);
  const fm = f(m);
  const whole = ((b - a) / 6) * (fa + 4 * fm + fb);
  return simpsonStep(f, a, b, fa, fm, fb, whole, tolerance, 50);
}

function simpsonStep(
  f: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fm: number,
  fb: number,
  whole: number,
  tolerance: number,
  depth: number,
): number {
  const m = 0.5 * (a + b);
  const lm = 0.5 * (a + m);
  const rm = 0.5 * (m + b);
  const flm = f(lm);
  const frm = f(rm);
  const left = ((m - a) / 6) * (fa + 4 * flm + fm);
  const right = ((b - m) / 6) * (fm + 4 * frm + fb);
  const delta = left + right - whole;
  if (depth <= 0 || Math.abs(delta) <= 15 * tolerance || m === a || m === b) return left + right + delta / 15;
  return (
    simpsonStep(f, a, m, fa, flm, fm, left, tolerance / 2, depth - 1) +
    simpsonStep(f, m, b, fm, frm, fb, right, tolerance / 2, depth - 1)
  );
}

/** A heat input: constant power [W] or a function of temperature [K] → power [W]. */
export function powerFunction(
  where: string,
  power: unknown,
  powerAt: unknown,
): (temperature: number) => number {
  if (power !== undefined && powerAt !== undefined) {
    throw new InputError(where, "power", power, "W", "given alone (not together with powerAt)");
  }
  if (powerAt !== undefined) {
    if (typeof powerAt !== "function") throw new InputError(where, "powerAt", powerAt, "", "a function of temperature [K] returning watts");
    const fn = powerAt as (temperature: number) => number;
    return (temperature: number): number => {
      const p = fn(temperature);
      if (typeof p !== "number" || !Number.isFinite(p)) {
        throw new InputError(where, `powerAt(${temperature})`, p, "W", "a finite number");
      }
      return p;
    };
  }
  if (power === undefined) throw new InputError(where, "power", power, "W", "a finite number (or give powerAt)");
  const p = requireFinite(where, "power", power, "W");
  return (): number => p;
}

/** Checks the surface-exchange inputs shared by every thermal model. */
export function checkSurface(
  where: string,
  options: {
    readonly surfaceArea?: unknown;
    readonly convectionCoefficient?: unknown;
    readonly emissivity?: unknown;
    readonly ambientTemperature?: unknown;
  },
  needArea = true,
): { area: number; convection: number; emissivity: number; ambient: number } {
  const area = needArea ? requirePositive(where, "surfaceArea", options.surfaceArea, "m²") : 1;
  const convection = requireNonNegative(where, "convectionCoefficient", options.convectionCoefficient, "W/(m²·K)");
  const emissivity = requireInRange(where, "emissivity", options.emissivity, "", 0, 1);
  const ambient = requirePositive(where, "ambientTemperature", options.ambientTemperature, "K");
  return { area, convection, emissivity, ambient };
}
