/**
 * AC resistance of a hollow round tube (the water-cooled copper tubing of induction coils).
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { kelvinFunctionsScaled } from "../special/index.js";
import { MU_0 } from "../units/index.js";
import { dowellFactorKernel } from "./dowell.js";
import { wireSkinFactorKernel } from "./round-wire-kernels.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TUBE_FIELDS: readonly string[] = Object.freeze(["outerDiameter", "wallThickness", "frequency", "resistivity", "relativePermeability"]);

/** Options of {@link tubeAcResistance}. @category Conductors */
export interface TubeAcResistanceOptions {
  /** Outer diameter of the tube [m], finite and > 0. */
  readonly outerDiameter: number;
  /** Wall thickness [m], finite, > 0 and ≤ outerDiameter/2 (equal: a solid wire). */
  readonly wallThickness: number;
  /** Frequency of the sinusoidal current [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the tube metal [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Relative permeability of the tube metal [-], finite and > 0 (default 1). */
  readonly relativePermeability?: number;
}

/**
 * AC resistance per metre of an isolated straight tube (return conductor far away, no field
 * in the bore), exact through Bessel functions of complex argument, written with the Kelvin
 * functions of the outer and inner surfaces ($q_b = \sqrt2\, b/\delta$, $q_a = \sqrt2\, a/\delta$,
 * b outer and a inner radius):
 *
 * $$
 * Z' = \frac{\rho\,\tau}{2\pi b}\,
 *   \frac{I_0(\tau b) K_1(\tau a) + I_1(\tau a) K_0(\tau b)}{I_1(\tau b) K_1(\tau a) - I_1(\tau a) K_1(\tau b)}
 *   = \frac{j \rho\, q_b}{2\pi b^2}\,
 *   \frac{B'_a K_b - B_b K'_a}{B'_a K'_b - B'_b K'_a},
 * \qquad \tau = \frac{1 + j}{\delta}
 * $$
 *
 * with $B = \mathrm{ber} + j\,\mathrm{bei}$, $K = \mathrm{ker} + j\,\mathrm{kei}$ and primes their
 * derivatives; $R' = \mathrm{Re}\, Z'$. Evaluated with the exponentially scaled Kelvin functions
 * and the factor $e^{-t/\delta}$ between the surfaces, so thick and thin walls are both free of
 * overflow. A wall of half the diameter is a solid wire ({@link roundWireAcRatio}). For an
 * outer diameter above 1e4·√2 δ, and for walls thinner than 5e-8 of the radius, the flat-wall
 * limit $R' = R'_\mathrm{dc}\, u\,\frac{\sinh 2u + \sin 2u}{\cosh 2u - \cos 2u}$, u = t/δ, is used
 * (curvature error below the smaller of δ/b and t/b).
 *
 * Hard domain (throws {@link InputError}): inputs finite and > 0, wallThickness ≤
 * outerDiameter/2. Validity: isolated straight tube with sinusoidal current; in a coil the
 * proximity of the other turns and of the workpiece moves the current to the facing side
 * (see {@link workCoilResistanceCurrentSheet}). A wall thicker than about 3 δ behaves as
 * solid wire of the same outer diameter (within 1 %).
 *
 * Accuracy: ≤ 1e-10 relative against mpmath (complex Bessel I, K at 40 digits) and an
 * independent radial-ODE solution (fixture tube.json) for walls ≥ 1e-3 of the outer radius;
 * for thinner walls the difference of nearly equal Kelvin-function products costs accuracy,
 * about 2e-22·(b/t)² relative (≤ 1e-10 down to t = 1.5e-6 b, ≤ 1e-7 at the switch to the flat
 * wall at 5e-8 b). Rac ≥ Rdc is guaranteed.
 *
 * @param options - {@link TubeAcResistanceOptions}
 * @returns AC resistance per unit length [Ω/m]
 * @throws {@link InputError} on bad input
 * @see S. A. Schelkunoff, "The electromagnetic theory of coaxial transmission lines and cylindrical shields", Bell Syst. Tech. J. 13, 532–579 (1934) (impedance of a tubular conductor).
 * @see NIST Digital Library of Mathematical Functions, §10.61 (Kelvin functions as I, K of argument x·exp(jπ/4)).
 * @example
 * ```ts
 * import { tubeAcResistance } from "fluxwright";
 * // 6 mm × 1 mm copper tube at 20 kHz
 * console.log(tubeAcResistance({ outerDiameter: 6e-3, wallThickness: 1e-3, frequency: 20e3, resistivity: 1.7241e-8 })); // ≈ 2.0e-3
 * ```
 * @category Conductors
 */
export function tubeAcResistance(options: TubeAcResistanceOptions): number {
  const r = tubeAcResistanceOf(options);
  return requireFiniteResult("tubeAcResistance", "outerDiameter, wallThickness, frequency and resistivity", r);
}

/** The computation of {@link tubeAcResistance} on its every path (the caller checks that the result is finite). */
function tubeAcResistanceOf(options: TubeAcResistanceOptions): number {
  const where = "tubeAcResistance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TUBE_FIELDS);
  const outerDiameter = requirePositive(where, "outerDiameter", options.outerDiameter, "m");
  const wall = requirePositive(where, "wallThickness", options.wallThickness, "m");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const mur =
    options.relativePermeability === undefined ? 1 : requirePositive(where, "relativePermeability", options.relativePermeability, "");
  const b = outerDiameter / 2;
  if (wall > b * (1 + 1e-12)) {
    throw new InputError(where, "wallThickness", wall, "m", `≤ outerDiameter/2 = ${b}`);
  }
  const a = Math.max(0, b - wall);
  const delta = Math.sqrt(resistivity / (Math.PI * frequency * MU_0 * mur));
  const qb = (Math.SQRT2 * b) / delta;
  const qa = (Math.SQRT2 * a) / delta;
  if (a === 0 || qa < 1e-300) {
    return (resistivity / (Math.PI * b * b)) * wireSkinFactorKernel(qb);
  }
  const u = (b - a) / delta;
  const rdc = resistivity / (Math.PI * (b * b - a * a));
  if (qb > 1e4 || wall < 5e-8 * b) {
    // flat wall with the field on one face: R' = Rdc · u ς₁(u) (Dowell's one-layer factor, series for small u)
    return rdc * dowellFactorKernel(u, 1);
  }
  const kb = kelvinFunctionsScaled(qb);
  const ka = kelvinFunctionsScaled(qa);
  // scaled: B = e^{q/√2} B̂, K = e^{-q/√2} K̂; multiply numerator and denominator by e^{-(qb-qa)/√2}
  const s = Math.exp(-u); // e^{-(qb - qa)/√2}
  const s2 = s * s;
  // complex parts
  const bpaRe = ka.berPrime, bpaIm = ka.beiPrime; // B'_a
  const kpaRe = ka.kerPrime, kpaIm = ka.keiPrime; // K'_a
  const bbRe = kb.ber, bbIm = kb.bei; // B_b
  const bpbRe = kb.berPrime, bpbIm = kb.beiPrime; // B'_b
  const kbRe = kb.ker, kbIm = kb.kei; // K_b
  const kpbRe = kb.kerPrime, kpbIm = kb.keiPrime; // K'_b
  // num = s² B'_a K_b − B_b K'_a
  const numRe = s2 * (bpaRe * kbRe - bpaIm * kbIm) - (bbRe * kpaRe - bbIm * kpaIm);
  const numIm = s2 * (bpaRe * kbIm + bpaIm * kbRe) - (bbRe * kpaIm + bbIm * kpaRe);
  // den = s² B'_a K'_b − B'_b K'_a
  const denRe = s2 * (bpaRe * kpbRe - bpaIm * kpbIm) - (bpbRe * kpaRe - bpbIm * kpaIm);
  const denIm = s2 * (bpaRe * kpbIm + bpaIm * kpbRe) - (bpbRe * kpaIm + bpbIm * kpaRe);
  // Re(j · num/den) = −Im(num/den)
  const den2 = denRe * denRe + denIm * denIm;
  const ratioIm = (numIm * denRe - numRe * denIm) / den2;
  const r = ((-resistivity * qb) / (2 * Math.PI * b * b)) * ratioIm;
  // Rac ≥ Rdc holds exactly; for walls below 1e-5 b rounding in the Kelvin-function
  // differences can put the computed value a few ulps × (b/t)² below it
  return r < rdc ? rdc : r;
}
