/**
 * Slab heated from both faces by a uniform tangential magnetic field.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { constantPermeabilityNote } from "./validity-notes.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SLAB_FIELDS: readonly string[] = Object.freeze(["thickness", "resistivity", "relativePermeability", "frequency", "fieldStrengthRms"]);

/**
 * Options of {@link slabInTangentialField}.
 *
 * @category Workpiece
 */
export interface SlabInTangentialFieldOptions {
  /** Slab thickness between the two heated faces [m], > 0; `Infinity` for a half-space heated from one face. */
  readonly thickness: number;
  /** Resistivity of the slab [Ω·m], > 0. */
  readonly resistivity: number;
  /** Relative permeability of the slab [-], ≥ 1 (constant, linear material). */
  readonly relativePermeability: number;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** RMS tangential magnetic field strength at each face [A/m], ≥ 0 (both faces in phase). */
  readonly fieldStrengthRms: number;
}

/**
 * Result of {@link slabInTangentialField}. Powers are per face and per square metre of face.
 *
 * @category Workpiece
 */
export interface SlabInTangentialFieldResult {
  /** Active power entering through one face [W/m²]. */
  readonly powerPerArea: number;
  /** Reactive power entering through one face [var/m²]. */
  readonly reactivePowerPerArea: number;
  /** Skin depth $\delta = \sqrt{2\rho/(\omega\mu_0\mu_r)}$ [m]. */
  readonly skinDepth: number;
  /** Active-power factor $p$: power per face divided by that of a half-space in the same field [-], in [0, 1.0904]. */
  readonly p: number;
  /** Reactive-power factor $q$, normalised like `p` [-]. */
  readonly q: number;
  /** Surface impedance real part (the surface resistance) $\mathrm{Re}\,Z_s$ [Ω]. */
  readonly surfaceResistance: number;
  /** Surface impedance imaginary part (the surface reactance) $\mathrm{Im}\,Z_s$ [Ω]. */
  readonly surfaceReactance: number;
  /** Where the 1-D model's assumptions may not hold. */
  readonly validity: readonly ValidityNote[];
}

/** sinh(x) − sin(x) without cancellation for small x: 2 Σ x^(4k+3)/(4k+3)!. */
function sinhMinusSin(x: number): number {
  if (x > 0.8) return Math.sinh(x) - Math.sin(x);
  const x2 = x * x;
  const x4 = x2 * x2;
  let term = (x2 * x) / 6;
  let sum = term;
  for (let k = 1; k < 8; k++) {
    const n = 4 * k + 3;
    term *= x4 / ((n - 3) * (n - 2) * (n - 1) * n);
    sum += term;
    if (term < 1e-17 * sum) break;
  }
  return 2 * sum;
}

/**
 * Slab factors p and q for a slab of `u = thickness/(2δ)` half-thicknesses in skin depths:
 * $p + jq = (1+j)\tanh((1+j)u)$. Writes nothing, allocates nothing.
 *
 * @internal
 */
export function slabFactors(u: number): { p: number; q: number } {
  if (u === Infinity) return { p: 1, q: 1 };
  const x = 2 * u;
  if (x > 40) {
    // divide numerator and denominator by cosh(x); e^(-x) terms are below 1e-17
    const e = 2 * Math.exp(-x);
    const den = 1 + Math.cos(x) * e;
    return { p: (1 - Math.sin(x) * e) / den, q: (1 + Math.sin(x) * e) / den };
  }
  const den = Math.cosh(x) + Math.cos(x);
  return { p: sinhMinusSin(x) / den, q: (Math.sinh(x) + Math.sin(x)) / den };
}

/**
 * Power entering each face of a conducting slab that sits in a uniform tangential AC magnetic
 * field of the same amplitude and phase on both faces (a plate or strip in a long rectangular
 * coil, or in a transverse gap), from the 1-D field diffusion equation.
 *
 * With skin depth $\delta = \sqrt{2\rho/(\omega\mu_0\mu_r)}$, half-thickness $b = d/2$ and
 * $u = b/\delta$, the field inside is $H(x) = H_0\cosh(kx)/\cosh(kb)$ with $k = (1+j)/\delta$,
 * and the surface impedance is $Z_s = \rho k \tanh(kb)$, so per face
 *
 * $$
 * P + jQ = \frac{\rho}{\delta} H_0^2 (p + jq),\qquad
 * p = \frac{\sinh 2u - \sin 2u}{\cosh 2u + \cos 2u},\quad
 * q = \frac{\sinh 2u + \sin 2u}{\cosh 2u + \cos 2u}.
 * $$
 *
 * Both $p$ and $q$ tend to 1 for a thick slab ($d \gg \delta$, the half-space value); for a
 * thin slab $p \approx (d/\delta)^3/6$ and $q \approx d/\delta$ — the
 * power absorbed falls as the slab becomes transparent to the field. $p$ peaks at 1.090 at
 * $d = \pi\delta$ (the thickness that absorbs most for a given surface field).
 *
 * Hard domain (throws {@link InputError}): thickness > 0 (or `Infinity`), resistivity > 0,
 * relativePermeability ≥ 1, frequency > 0, fieldStrengthRms ≥ 0, all finite except thickness.
 * Validity: linear material of constant permeability, slab width and length ≫ thickness
 * (no edge effect), uniform field over each face. A note is added for magnetic slabs (steel
 * saturates in strong fields, which the constant-permeability model does not follow).
 *
 * Accuracy: closed form; ≤ 1e-12 relative vs a numerical 1-D field-diffusion solution
 * (fixture `test/fixtures/workpiece/diffusion.json`).
 *
 * @param options - slab and field, see {@link SlabInTangentialFieldOptions}
 * @returns power and reactive power per face [W/m², var/m²], skin depth [m], the factors p, q
 *   and the surface impedance [Ω]
 * @throws {@link InputError} for values outside the hard domain
 * @see R. L. Stoll, *The Analysis of Eddy Currents*, Clarendon Press 1974 (slab in a
 *   uniform tangential field); E. J. Davies, *Conduction and Induction Heating*, Peter
 *   Peregrinus 1990 (plane-slab power functions).
 * @example
 * ```ts
 * import { slabInTangentialField } from "fluxwright";
 * // a 10 mm aluminium-alloy plate in a 10 kA/m field at 10 kHz
 * const r = slabInTangentialField({ thickness: 0.01, resistivity: 3e-8, relativePermeability: 1,
 *   frequency: 1e4, fieldStrengthRms: 1e4 });
 * console.log(r.skinDepth.toExponential(3)); // 8.717e-4
 * console.log(r.powerPerArea.toPrecision(4)); // 3441
 * ```
 * @category Workpiece
 */
export function slabInTangentialField(options: SlabInTangentialFieldOptions): SlabInTangentialFieldResult {
  const where = "slabInTangentialField";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SLAB_FIELDS);
  const thickness = options.thickness;
  if (typeof thickness !== "number" || !(thickness > 0)) {
    throw new InputError(where, "thickness", thickness, "m", "a number > 0 (Infinity for a half-space)");
  }
  const rho = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const mur = requireFinite(where, "relativePermeability", options.relativePermeability, "");
  if (mur < 1) throw new InputError(where, "relativePermeability", mur, "", "a finite number ≥ 1");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const h = requireFinite(where, "fieldStrengthRms", options.fieldStrengthRms, "A/m");
  if (h < 0) throw new InputError(where, "fieldStrengthRms", h, "A/m", "a finite number ≥ 0");

  const delta = Math.sqrt((2 * rho) / (2 * Math.PI * f * MU_0 * mur));
  const { p, q } = slabFactors(thickness / (2 * delta));
  const rs = rho / delta;
  const validity: ValidityNote[] = [];
  if (mur > 1) validity.push(constantPermeabilityNote(mur));
  return {
    powerPerArea: rs * p * h * h,
    reactivePowerPerArea: rs * q * h * h,
    skinDepth: delta,
    p,
    q,
    surfaceResistance: rs * p,
    surfaceReactance: rs * q,
    validity,
  };
}
