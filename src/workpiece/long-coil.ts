/**
 * Solid bar and hollow tube inside a long coil: the long-coil (uniform axial field) solution.
 * Its types are in long-coil-types.ts (re-exported here).
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import {
  besselI0ComplexScaled,
  besselI1ComplexScaled,
  besselK0ComplexScaled,
  besselK1ComplexScaled,
} from "../special/index.js";
import { MU_0 } from "../units/index.js";
import { bakerPQ } from "./kernels.js";
import { constantPermeabilityNote } from "./validity-notes.js";
import type { BarInLongCoilOptions, LongCoil, LongCoilCouplingResult, TubeInLongCoilOptions } from "./long-coil-types.js";

export type { BarInLongCoilOptions, LongCoil, LongCoilCouplingResult, RoundBar, RoundTube, TubeInLongCoilOptions } from "./long-coil-types.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TUBE_FIELDS: readonly string[] = Object.freeze(["outerRadius", "innerRadius", "resistivity", "relativePermeability"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const TUBE_OPTION_FIELDS: readonly string[] = Object.freeze(["coil", "tube", "frequency", "coilResistance"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const BAR_OPTION_FIELDS: readonly string[] = Object.freeze(["coil", "bar", "frequency", "coilResistance"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const BAR_FIELDS: readonly string[] = Object.freeze(["radius", "resistivity", "relativePermeability"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LONG_COIL_FIELDS: readonly string[] = Object.freeze(["innerRadius", "length", "turns"]);

/** Coil length over inner radius below which the long-coil note is returned (length < 2 diameters). */
const SHORT_COIL_LIMIT = 4;

function checkLongCoil(where: string, coil: unknown): LongCoil {
  const c = requireObject(where, "coil", coil);
  requireKnownKeys(where, "coil", c, LONG_COIL_FIELDS);
  return {
    innerRadius: requirePositive(where, "coil.innerRadius", c["innerRadius"], "m"),
    length: requirePositive(where, "coil.length", c["length"], "m"),
    turns: requireInteger(where, "coil.turns", c["turns"], 1),
  };
}

function checkMaterial(where: string, part: string, o: Record<string, unknown>): [number, number] {
  const rho = requirePositive(where, `${part}.resistivity`, o["resistivity"], "Ω·m");
  const mur = o["relativePermeability"];
  if (typeof mur !== "number" || !Number.isFinite(mur) || mur < 1) {
    throw new InputError(where, `${part}.relativePermeability`, mur, "", "a finite number ≥ 1");
  }
  return [rho, mur];
}

/**
 * Assembles the result from the normalised surface impedance p + jq at the outer radius and
 * reactiveExcess = q − (radius/δ)/μr.
 * Allocates only the result object (and the validity array when non-empty).
 */
function longCoilResult(
  coil: LongCoil,
  radius: number,
  rho: number,
  mur: number,
  omega: number,
  delta: number,
  p: number,
  q: number,
  reactiveExcess: number,
  coilResistance: number | undefined,
): LongCoilCouplingResult {
  const nn = (coil.turns * coil.turns) / coil.length;
  const rs = rho / delta;
  const perimeter = 2 * Math.PI * radius;
  const reflectedResistance = nn * perimeter * rs * p;
  // ωμ0πa² = 2πa (ρ/δ) (a/δ)/μr, so ΔX = n 2πa (ρ/δ) (q − (a/δ)/μr), the bracket computed without cancellation
  const reactanceChange = nn * perimeter * rs * reactiveExcess;
  const validity: ValidityNote[] = [];
  if (coil.length < SHORT_COIL_LIMIT * coil.innerRadius) {
    validity.push({
      code: "short-coil",
      message:
        "The coil is shorter than two diameters: the long-coil idealisation ignores the return flux and end effects and overestimates both the empty-coil inductance and the power; use encirclingCoilOverRod for a finite coil.",
      value: coil.length / coil.innerRadius,
      limit: SHORT_COIL_LIMIT,
    });
  }
  if (mur > 1) validity.push(constantPermeabilityNote(mur));
  const inductanceChange = reactanceChange / omega;
  const emptyCoilInductance = MU_0 * Math.PI * coil.innerRadius * coil.innerRadius * nn;
  const ratio = radius / delta;
  if (coilResistance === undefined) {
    return {
      reflectedResistance,
      reactanceChange,
      inductanceChange,
      emptyCoilInductance,
      powerPerAmpereSquared: reflectedResistance,
      skinDepth: delta,
      ratio,
      p,
      q,
      validity,
    };
  }
  const total = reflectedResistance + coilResistance;
  return {
    reflectedResistance,
    reactanceChange,
    inductanceChange,
    emptyCoilInductance,
    powerPerAmpereSquared: reflectedResistance,
    efficiency: total > 0 ? reflectedResistance / total : 0,
    skinDepth: delta,
    ratio,
    p,
    q,
    validity,
  };
}

/**
 * Resistance and inductance change that a solid round bar reflects into a long coil around
 * it, from Baker's functions — the classic billet- and bar-heater calculation.
 *
 * With $n = N^2/\ell$, bar radius $a$, skin depth $\delta = \sqrt{2\rho/(\omega\mu_0\mu_r)}$ and
 * Baker's $P, Q$ at $a/\delta$ ({@link bakerFunctions}):
 *
 * $$
 * R_r = \frac{N^2}{\ell}\,2\pi a\,\frac{\rho}{\delta}\,P,\qquad
 * \Delta X = \frac{N^2}{\ell}\left(2\pi a\,\frac{\rho}{\delta}\,Q - \omega\mu_0\pi a^2\right),\qquad
 * \Delta L = \Delta X/\omega.
 * $$
 *
 * The power into the bar is $R_r I^2$ (I the RMS coil current), and with a winding
 * resistance $R_c$ the electrical efficiency is $R_r/(R_r + R_c)$. At low frequency a
 * magnetic bar adds $\mu_0\pi a^2(\mu_r - 1)N^2/\ell$ of inductance; at high frequency every
 * bar removes up to $\mu_0\pi a^2N^2/\ell$.
 *
 * Hard domain (throws {@link InputError}): coil innerRadius, length > 0, turns an integer ≥ 1;
 * bar radius > 0 and ≤ coil innerRadius; resistivity > 0; relativePermeability ≥ 1;
 * frequency > 0; coilResistance ≥ 0 when given.
 * Validity: the coil and the bar are long against the coil radius (a `"short-coil"` note is
 * returned when length < 4 × innerRadius, i.e. shorter than two diameters — common practice);
 * the bar reaches beyond both coil ends; linear material of constant permeability.
 *
 * Accuracy: exact within the idealisation; ≤ 1e-12 relative vs a numerical 1-D field diffusion
 * solution (fixture `test/fixtures/workpiece/diffusion.json`). Over 1 million evaluations/s.
 *
 * @param options - coil, bar, frequency and optional coil resistance, see {@link BarInLongCoilOptions}
 * @returns reflected resistance [Ω], inductance change [H], power per A² [W/A²], efficiency [-] and notes
 * @throws {@link InputError} for values outside the hard domain
 * @see R. M. Baker (1957, citation from memory), "Classical heat-flow problems applied to induction billet heating";
 *   E. J. Davies, *Conduction and Induction Heating* (1990) (cylinder in a long coil).
 * @example
 * ```ts
 * import { barInLongCoil } from "fluxwright";
 * // 40 mm steel bar above Curie (non-magnetic, 1.2 µΩ·m) in a 60 mm-bore, 300 mm, 20-turn coil at 10 kHz
 * const r = barInLongCoil({
 *   coil: { innerRadius: 0.03, length: 0.3, turns: 20 },
 *   bar: { radius: 0.02, resistivity: 1.2e-6, relativePermeability: 1 },
 *   frequency: 1e4,
 *   coilResistance: 0.01,
 * });
 * console.log(r.reflectedResistance.toPrecision(4)); // 0.03128
 * console.log(r.efficiency!.toFixed(3)); // 0.758
 * ```
 * @category Workpiece
 */
export function barInLongCoil(options: BarInLongCoilOptions): LongCoilCouplingResult {
  const where = "barInLongCoil";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, BAR_OPTION_FIELDS);
  const coil = checkLongCoil(where, options.coil);
  const bar = requireObject(where, "bar", options.bar);
  requireKnownKeys(where, "bar", bar, BAR_FIELDS);
  const radius = requirePositive(where, "bar.radius", bar["radius"], "m");
  if (radius > coil.innerRadius) {
    throw new InputError(where, "bar.radius", radius, "m", `a finite number ≤ coil.innerRadius (${coil.innerRadius})`);
  }
  const [rho, mur] = checkMaterial(where, "bar", bar);
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const rc = options.coilResistance === undefined ? undefined : requireNonNegative(where, "coilResistance", options.coilResistance, "Ω");
  return barCoupling(coil, radius, rho, mur, f, rc);
}

/** {@link barInLongCoil} on checked input. */
export function barCoupling(
  coil: LongCoil,
  radius: number,
  rho: number,
  mur: number,
  f: number,
  coilResistance: number | undefined,
): LongCoilCouplingResult {
  const omega = 2 * Math.PI * f;
  const delta = Math.sqrt((2 * rho) / (omega * MU_0 * mur));
  const u = radius / delta;
  const { p, q, qExcess } = bakerPQ(u);
  return longCoilResult(coil, radius, rho, mur, omega, delta, p, q, qExcess + u * (1 - 1 / mur), coilResistance);
}

/**
 * Resistance and inductance change that a hollow round tube reflects into a long coil around
 * it (long-coil idealisation, air in the bore).
 *
 * In the wall $H = A I_0(kr) + B K_0(kr)$, $k = (1+j)/\delta$; the air bore of radius $a_1$
 * carries the uniform field $H(a_1)$, whose flux sets $\rho H'(a_1) = j\omega\mu_0\tfrac{a_1}{2}H(a_1)$.
 * In skin depths ($s = r/\delta$, $\kappa = 1+j$):
 *
 * $$
 * \frac{B}{A} = \frac{\kappa I_1(\kappa s_1) - j\frac{s_1}{\mu_r} I_0(\kappa s_1)}{\kappa K_1(\kappa s_1) + j\frac{s_1}{\mu_r} K_0(\kappa s_1)},\qquad
 * p + jq = \kappa\,\frac{I_1(\kappa s_2) - \frac{B}{A}K_1(\kappa s_2)}{I_0(\kappa s_2) + \frac{B}{A}K_0(\kappa s_2)},
 * $$
 *
 * evaluated with exponentially scaled Bessel functions (no overflow for thick walls), then as
 * in {@link barInLongCoil} with the outer radius $a_2$. innerRadius = 0 gives the solid bar.
 *
 * Hard domain (throws {@link InputError}): as {@link barInLongCoil}, with
 * 0 ≤ tube.innerRadius < tube.outerRadius ≤ coil.innerRadius.
 * Validity: as {@link barInLongCoil}.
 *
 * Accuracy: ≤ 1e-10 relative vs a numerical 1-D field diffusion solution (fixture
 * `test/fixtures/workpiece/diffusion.json`, walls from 5 % to 80 % of the radius, μr 1 and 50).
 *
 * @param options - coil, tube, frequency and optional coil resistance, see {@link TubeInLongCoilOptions}
 * @returns reflected resistance [Ω], inductance change [H], power per A² [W/A²], efficiency [-] and notes
 * @throws {@link InputError} for values outside the hard domain
 * @see R. L. Stoll, *The Analysis of Eddy Currents* (1974) (cylindrical shells in an
 *   axial field); E. J. Davies, *Conduction and Induction Heating* (1990).
 * @example
 * ```ts
 * import { tubeInLongCoil } from "fluxwright";
 * // stainless tube 50/44 mm in a 70 mm-bore coil at 20 kHz
 * const r = tubeInLongCoil({
 *   coil: { innerRadius: 0.035, length: 0.4, turns: 25 },
 *   tube: { outerRadius: 0.025, innerRadius: 0.022, resistivity: 7.2e-7, relativePermeability: 1 },
 *   frequency: 2e4,
 * });
 * console.log(r.reflectedResistance.toPrecision(4)); // 0.06367
 * ```
 * @category Workpiece
 */
export function tubeInLongCoil(options: TubeInLongCoilOptions): LongCoilCouplingResult {
  const where = "tubeInLongCoil";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TUBE_OPTION_FIELDS);
  const coil = checkLongCoil(where, options.coil);
  const tube = requireObject(where, "tube", options.tube);
  requireKnownKeys(where, "tube", tube, TUBE_FIELDS);
  const a2 = requirePositive(where, "tube.outerRadius", tube["outerRadius"], "m");
  if (a2 > coil.innerRadius) {
    throw new InputError(where, "tube.outerRadius", a2, "m", `a finite number ≤ coil.innerRadius (${coil.innerRadius})`);
  }
  const a1 = requireNonNegative(where, "tube.innerRadius", tube["innerRadius"], "m");
  if (!(a1 < a2)) throw new InputError(where, "tube.innerRadius", a1, "m", `a finite number ≥ 0 and < tube.outerRadius (${a2})`);
  const [rho, mur] = checkMaterial(where, "tube", tube);
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const rc = options.coilResistance === undefined ? undefined : requireNonNegative(where, "coilResistance", options.coilResistance, "Ω");
  return tubeCoupling(coil, a2, a1, rho, mur, f, rc);
}

/** Normalised surface impedance p + jq of a tube wall between s1 and s2 skin depths. */
export function tubeSurfaceFactors(s1: number, s2: number, mur: number): [number, number] {
  // κ = 1 + j; z = κ s
  const z1 = { re: s1, im: s1 };
  const z2 = { re: s2, im: s2 };
  const i0a = besselI0ComplexScaled(z1);
  const i1a = besselI1ComplexScaled(z1);
  const k0a = besselK0ComplexScaled(z1);
  const k1a = besselK1ComplexScaled(z1);
  const c = s1 / mur; // j c multiplies I0, K0 at the bore
  // numerator κ I1 − j c I0 ; denominator κ K1 + j c K0
  const nRe = i1a.re - i1a.im + c * i0a.im;
  const nIm = i1a.re + i1a.im - c * i0a.re;
  const dRe = k1a.re - k1a.im - c * k0a.im;
  const dIm = k1a.re + k1a.im + c * k0a.re;
  const dd = dRe * dRe + dIm * dIm;
  let bRe = (nRe * dRe + nIm * dIm) / dd;
  let bIm = (nIm * dRe - nRe * dIm) / dd;
  // B/A in scaled form carries e^{Re z1 + z1}; at z2 the ratio K/I carries e^{-z2 - Re z2}:
  // factor E = e^{2(s1 − s2)} e^{j(s1 − s2)}
  const mag = Math.exp(2 * (s1 - s2));
  const ph = s1 - s2;
  const eRe = mag * Math.cos(ph);
  const eIm = mag * Math.sin(ph);
  const tRe = bRe * eRe - bIm * eIm;
  const tIm = bRe * eIm + bIm * eRe;
  bRe = tRe;
  bIm = tIm;
  const i0b = besselI0ComplexScaled(z2);
  const i1b = besselI1ComplexScaled(z2);
  const k0b = besselK0ComplexScaled(z2);
  const k1b = besselK1ComplexScaled(z2);
  // num = I1 − b K1 ; den = I0 + b K0
  const uRe = i1b.re - (bRe * k1b.re - bIm * k1b.im);
  const uIm = i1b.im - (bRe * k1b.im + bIm * k1b.re);
  const vRe = i0b.re + (bRe * k0b.re - bIm * k0b.im);
  const vIm = i0b.im + (bRe * k0b.im + bIm * k0b.re);
  const vv = vRe * vRe + vIm * vIm;
  const rRe = (uRe * vRe + uIm * vIm) / vv;
  const rIm = (uIm * vRe - uRe * vIm) / vv;
  // × κ
  return [rRe - rIm, rRe + rIm];
}

/** {@link tubeInLongCoil} on checked input. */
export function tubeCoupling(
  coil: LongCoil,
  outerRadius: number,
  innerRadius: number,
  rho: number,
  mur: number,
  f: number,
  coilResistance: number | undefined,
): LongCoilCouplingResult {
  // a bore below 1e-9 of the radius changes nothing measurable (its effect goes as (a1/a2)²)
  if (innerRadius < 1e-9 * outerRadius) return barCoupling(coil, outerRadius, rho, mur, f, coilResistance);
  const omega = 2 * Math.PI * f;
  const delta = Math.sqrt((2 * rho) / (omega * MU_0 * mur));
  const [p, q] = tubeSurfaceFactors(innerRadius / delta, outerRadius / delta, mur);
  return longCoilResult(coil, outerRadius, rho, mur, omega, delta, p, q, q - outerRadius / delta / mur, coilResistance);
}
