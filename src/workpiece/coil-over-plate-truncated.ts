/**
 * The truncated-region eigenfunction expansion (TREE) of the coil over a layered plate: a series
 * over the zeros of J1 in a region of finite radius, extrapolated to an infinite one. An
 * independent check of the Dodd–Deeds integral of {@link coilOverPlate}.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { besselJ0, besselJ1 } from "../special/index.js";
import { exponentialIntegralE5 } from "../special/internal.js";
import { besselJ1MomentOverCube } from "./kernels.js";
import { assembleResult, checkCoil, checkPlateLayers, featureScale } from "./coil-over-plate.js";
import type { CoilAbovePlate, CoilOverPlateOptions, CoilOverPlateResult } from "./coil-over-plate.js";
import { layerArrays, reflectionInto } from "./layered-reflection.js";
import type { LayerArrays } from "./layered-reflection.js";
/** Accepted fields (misspelt ones are rejected, not ignored). */
const TRUNCATED_FIELDS: readonly string[] = Object.freeze(["domainRadius", "coil", "plate", "frequency"]);

/** Largest lift-off / outer radius of the truncated-region series (cost about 0.2 s there). */
const MAX_TRUNCATED_LIFT_OFF = 20;
/** Most terms of the truncated-region series (its cost and memory grow with the count). */
const MAX_TRUNCATED_TERMS = 200_000;

/**
 * Options of {@link coilOverPlateTruncatedRegion}.
 *
 * @category Workpiece
 */
export interface CoilOverPlateTruncatedRegionOptions extends CoilOverPlateOptions {
  /**
   * Radius $b$ of the truncated region [m] (the field is set to zero there), > coil
   * outerRadius; default 30 × the largest of outerRadius, liftOff + length and the material's
   * longest length scale (e.g. $2\rho/(\omega\mu_0 t)$ of a thin sheet, capped at 3 × the
   * coil's size). The sums at $b$ and $2b$ are
   * extrapolated to $b \to \infty$.
   */
  readonly domainRadius?: number;
}

/** Positive zeros of J1 up to count n: McMahon's expansion refined by two Newton steps. */
function besselJ1Zeros(n: number): Float64Array {
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const beta = (i + 1.25) * Math.PI;
    let x = beta - 0.375 / beta + 0.0234375 / (beta * beta * beta);
    for (let it = 0; it < 2; it++) {
      const j1 = besselJ1(x);
      x -= j1 / (besselJ0(x) - j1 / x);
    }
    z[i] = x;
  }
  return z;
}

/**
 * Impedance change of the coil of {@link coilOverPlate} by the truncated-region eigenfunction
 * expansion (TREE) of Theodoulidis & Kriezis: the field is confined to a cylinder of radius
 * $b$ (vector potential zero on it), the integral over the separation constant becomes a
 * series over the discrete eigenvalues $\alpha_i = j_{1,i}/b$ ($J_1(\alpha_i b) = 0$):
 *
 * $$
 * \Delta Z = j\omega\pi\mu_0 n^2 \sum_i \frac{2\,\Gamma(\alpha_i)\,\chi(\alpha_i)^2
 *   \left(e^{-\alpha_i l_1} - e^{-\alpha_i l_2}\right)^2}{\alpha_i^7\, b^2 J_0^2(\alpha_i b)},
 * $$
 *
 * with the same reflection coefficient and radial integral as {@link coilOverPlate}, summed
 * to $\alpha_i \le 40\pi/r_2$ (and $20/l_1$) with the same tail corrections. The truncation
 * error falls as $b^{-3}$, so the sums at $b$ and $2b$ are combined by Richardson
 * extrapolation, $(8S_{2b} - S_b)/7$. It is an independent discretisation of the same field
 * problem (a series over eigenvalues instead of a quadrature), used to cross-check
 * {@link coilOverPlate}. About 20× slower than {@link coilOverPlate}.
 *
 * Cost: grows with lift-off / outer radius; a lift-off above 20 outer radii is refused with an
 * InputError (use {@link coilOverPlate} there; about 0.2 s at that edge).
 * Hard domain (throws {@link InputError}): as {@link coilOverPlate}, and domainRadius >
 * coil outerRadius when given. Validity: as {@link coilOverPlate}, with the plate and field
 * ending at domainRadius.
 *
 * Accuracy: agrees with {@link coilOverPlate} to 3e-6 of |ΔZ| and 1e-6 of $L_0$ at the default
 * domainRadius over the fixture cases of `test/fixtures/workpiece/plate.json`, and to 1e-3
 * over random geometries and materials from 1 Hz to 1 MHz (thin sheets at very low frequency
 * need a larger domainRadius; measured worst 6e-4).
 *
 * @param options - coil, plate, frequency and optional domain radius, see {@link CoilOverPlateTruncatedRegionOptions}
 * @returns as {@link coilOverPlate}
 * @throws {@link InputError} for values outside the hard domain
 * @see T. P. Theodoulidis and E. E. Kriezis, *Eddy Current Canonical Problems (with
 *   Applications to Nondestructive Evaluation)*, Tech Science Press 2006 (truncated
 *   region eigenfunction expansion of the coil above a layered half-space).
 * @example
 * ```ts
 * import { coilOverPlate, coilOverPlateTruncatedRegion } from "fluxwright";
 * const options = {
 *   coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 },
 *   plate: { thickness: 0.003, resistivity: 3e-8, relativePermeability: 1 },
 *   frequency: 2e4,
 * };
 * const a = coilOverPlate(options).reflectedResistance;
 * const b = coilOverPlateTruncatedRegion(options).reflectedResistance;
 * console.log(Math.abs(b / a - 1) < 1e-6); // true
 * ```
 * @category Workpiece
 */
export function coilOverPlateTruncatedRegion(options: CoilOverPlateTruncatedRegionOptions): CoilOverPlateResult {
  const where = "coilOverPlateTruncatedRegion";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TRUNCATED_FIELDS);
  const coil = checkCoil(where, options.coil);
  if (coil.liftOff > MAX_TRUNCATED_LIFT_OFF * coil.outerRadius) {
    throw new InputError(where, "coil.liftOff", coil.liftOff, "m", `at most ${MAX_TRUNCATED_LIFT_OFF} × coil.outerRadius = ${MAX_TRUNCATED_LIFT_OFF * coil.outerRadius} (the series' cost grows with lift-off/radius; use coilOverPlate)`);
  }
  const layers = checkPlateLayers(where, options.plate);
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const size = Math.max(coil.outerRadius, coil.liftOff + coil.length);
  const materialLength = Math.min(1 / featureScale(coil, layerArrays(layers, 2 * Math.PI * f)), 3 * size);
  const b =
    options.domainRadius === undefined
      ? 30 * Math.max(size, materialLength)
      : requirePositive(where, "domainRadius", options.domainRadius, "m");
  if (!(b > coil.outerRadius)) {
    throw new InputError(where, "domainRadius", b, "m", `a finite number > coil.outerRadius (${coil.outerRadius})`);
  }
  const omega = 2 * Math.PI * f;
  const lay = layerArrays(layers, omega);
  // Richardson extrapolation in b: the truncation error falls as b^-3 (measured)
  const [aRe, aIm, aJ] = truncatedRegionSums(coil, lay, b);
  const [bRe, bIm, bJ] = truncatedRegionSums(coil, lay, 2 * b);
  return assembleResult(coil, layers, omega, (8 * bRe - aRe) / 7, (8 * bIm - aIm) / 7, (8 * bJ - aJ) / 7);
}

/** TREE sums [Re, Im, J] for a truncation radius b (same meaning as the Dodd–Deeds integrals). */
function truncatedRegionSums(coil: CoilAbovePlate, lay: LayerArrays, b: number): [number, number, number] {
  const r1 = coil.innerRadius;
  const r2 = coil.outerRadius;
  const l1 = coil.liftOff;
  const h = coil.length;
  const l2 = l1 + h;
  const gamma = new Float64Array(2);
  const aMax = (40 * Math.PI) / r2;
  const aExp = l1 > 0 ? 20 / l1 : Infinity;
  const count = Math.ceil((aMax * b) / Math.PI);
  // default domains need at most about 50 000 terms (b ≤ 630 outer radii); a coil far taller
  // than wide, or a domainRadius far beyond it, would need more: refused (bounded work)
  if (!(count <= MAX_TRUNCATED_TERMS)) {
    throw new InputError("coilOverPlateTruncatedRegion", "coil", `outer radius ${r2} m, height ${h} m, domain radius ${b} m`, "", `a coil and domain radius whose series needs at most ${MAX_TRUNCATED_TERMS} terms (domain radius ≤ ${(MAX_TRUNCATED_TERMS * Math.PI) / aMax} m for this outer radius)`);
  }
  const zeros = besselJ1Zeros(count);
  let sumRe = 0;
  let sumIm = 0;
  let sumJ = 0;
  for (let i = 0; i < count; i++) {
    const x = zeros[i]!;
    const alpha = x / b;
    const j0 = besselJ0(x);
    const wt = 2 / (alpha * b * b * j0 * j0);
    const q = r2 ** 3 * besselJ1MomentOverCube(alpha * r2) - (r1 > 0 ? r1 ** 3 * besselJ1MomentOverCube(alpha * r1) : 0);
    const q2 = q * q;
    sumJ += wt * q2 * (alpha * h + Math.expm1(-alpha * h));
    if (alpha >= aExp) continue;
    const de = Math.exp(-alpha * l1) * -Math.expm1(-alpha * h);
    const fw = wt * q2 * de * de;
    if (fw === 0) continue;
    reflectionInto(alpha, lay, gamma);
    sumRe += fw * gamma[0]!;
    sumIm += fw * gamma[1]!;
  }
  // tails beyond the last eigenvalue, as in coilOverPlate (the spacing π/b is fine there)
  const last = zeros[count - 1]! / b + Math.PI / (2 * b);
  const c = (r1 + r2) / (Math.PI * last ** 4);
  sumJ += c * (exponentialIntegralE5(last * h) - 0.25 + (last * h) / 3);
  if (last < aExp) {
    reflectionInto(last, lay, gamma);
    const tail = c * (exponentialIntegralE5(2 * last * l1) - 2 * exponentialIntegralE5(last * (l1 + l2)) + exponentialIntegralE5(2 * last * l2));
    sumRe += tail * gamma[0]!;
    sumIm += tail * gamma[1]!;
  }
  // the whole air-core sum is taken here (the truncated domain changes both parts of it);
  // return it in the form assembleResult expects, J = sum − h K
  const kClosed = ((r2 ** 4 - r1 ** 4) / 4 - r1 ** 3 * (r2 - r1)) / 3;
  return [sumRe, sumIm, sumJ - h * kClosed];
}
