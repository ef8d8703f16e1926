/**
 * Series impedance of a go-and-return lead (the run between a work coil and its capacitor
 * bank): two parallel round conductors, two flat bus bars facing each other, or a coaxial lead.
 * The round conductors' field kernels are in lead-impedance-kernels.ts.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { cCoth } from "../special/index.js";
import { MU_0 } from "../units/index.js";
import {
  DC_LIMIT,
  MAX_ORDERS,
  TWO_PI,
  ordersFor,
  reciprocal,
  returnTubeLogDerivative,
  roundPairPerMetre,
  surfaceLogDerivatives,
  wallInductanceDc,
} from "./lead-impedance-kernels.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const OPTION_FIELDS: readonly string[] = Object.freeze(["lead", "length", "frequency", "resistivity"]);
const ROUND_FIELDS: readonly string[] = Object.freeze(["shape", "diameter", "wallThickness", "spacing"]);
const FLAT_FIELDS: readonly string[] = Object.freeze(["shape", "width", "thickness", "gap"]);
const COAXIAL_FIELDS: readonly string[] = Object.freeze(["shape", "innerDiameter", "innerWallThickness", "returnInnerDiameter", "returnWallThickness"]);

/**
 * Largest ratio of a round conductor's radius to the skin depth evaluated: the Bessel functions
 * of the round-pair and coaxial solutions cost time in proportion to it (about 25 ms at 1e6,
 * seconds at 1e8). At 1e6 a 3 mm copper radius is at about 5e14 Hz, far beyond any lead.
 */
const MAX_RADIUS_OVER_SKIN_DEPTH = 1e6;

/** Refuses a frequency at which the largest radius exceeds {@link MAX_RADIUS_OVER_SKIN_DEPTH} skin depths (bounded work). */
function requireBoundedSkinRatio(where: string, frequency: number, resistivity: number, radius: number, delta: number): void {
  if (radius / delta <= MAX_RADIUS_OVER_SKIN_DEPTH) return;
  const highest = resistivity / (Math.PI * MU_0 * (radius / MAX_RADIUS_OVER_SKIN_DEPTH) ** 2);
  throw new InputError(where, "frequency", frequency, "Hz", `at most ${highest.toPrecision(3)} (a skin depth of at least 1e-6 of the conductor radius ${radius} m)`);
}

/**
 * Two parallel round conductors (solid wire or tube) carrying the current out and back.
 *
 * @category Conductors
 */
export interface RoundPairLead {
  /** Geometry tag. */
  readonly shape: "round-pair";
  /** Outer diameter of each conductor [m], > 0. */
  readonly diameter: number;
  /** Wall thickness of a tube [m], > 0 and ≤ diameter/2 (omitted or diameter/2: solid). */
  readonly wallThickness?: number;
  /** Centre-to-centre spacing of the two conductors [m], > diameter (they must not touch). */
  readonly spacing: number;
}

/**
 * Two flat bus bars of equal rectangular section, broad faces towards each other (strip line).
 *
 * @category Conductors
 */
export interface FlatPairLead {
  /** Geometry tag. */
  readonly shape: "flat-pair";
  /** Width of each bar (the broad face) [m], > 0. */
  readonly width: number;
  /** Thickness of each bar [m], > 0. */
  readonly thickness: number;
  /** Gap between the facing broad faces [m], > 0. */
  readonly gap: number;
}

/**
 * A coaxial lead: a round inner conductor (wire or tube) inside a return tube.
 *
 * @category Conductors
 */
export interface CoaxialLead {
  /** Geometry tag. */
  readonly shape: "coaxial";
  /** Outer diameter of the inner conductor [m], > 0. */
  readonly innerDiameter: number;
  /** Wall thickness of the inner conductor if it is a tube [m], > 0 and ≤ innerDiameter/2 (omitted: solid). */
  readonly innerWallThickness?: number;
  /** Inner diameter of the return tube [m], > innerDiameter. */
  readonly returnInnerDiameter: number;
  /** Wall thickness of the return tube [m], > 0. */
  readonly returnWallThickness: number;
}

/**
 * A lead's cross-section.
 *
 * @category Conductors
 */
export type LeadGeometry = RoundPairLead | FlatPairLead | CoaxialLead;

/** Options of {@link leadImpedance}. @category Conductors */
export interface LeadImpedanceOptions {
  /** The cross-section of the go-and-return pair. */
  readonly lead: LeadGeometry;
  /** Length of the run (each of the two conductors is this long) [m], > 0. */
  readonly length: number;
  /** Frequency of the sinusoidal current [Hz], > 0. */
  readonly frequency: number;
  /** Resistivity of the conductors (non-magnetic) [Ω·m], > 0. */
  readonly resistivity: number;
}

/**
 * Result of {@link leadImpedance}: the loop's series impedance $R + j\omega L$ at the frequency.
 *
 * @category Conductors
 */
export interface LeadImpedance {
  /** Series inductance of the loop (out and back) [H]. */
  readonly inductance: number;
  /** AC resistance of the loop (both conductors) [Ω]. */
  readonly resistance: number;
  /** DC resistance of the loop [Ω]. */
  readonly dcResistance: number;
  /** Inductance of the loop as δ → 0 (current on the surfaces only) [H]; the DC value lies above it. */
  readonly highFrequencyInductance: number;
  /** Where the model leaves its tested range (empty inside it). */
  readonly validity: readonly ValidityNote[];
}

/**
 * Largest error of the flat-pair (strip-line) model of {@link leadImpedance} against the 2-D
 * finite-element reference for width ≥ 5 × gap and thickness ≤ width/2
 * (test/fixtures/leads/fem-flat.json): inductance and resistance, relative.
 *
 * @category Conductors
 */
export const FLAT_PAIR_ACCURACY: {
  /** Largest relative error of the inductance. */
  readonly inductance: number;
  /** Largest relative error of the resistance. */
  readonly resistance: number;
} = { inductance: 0.22, resistance: 0.16 };
/** Width/gap from which the flat-pair accuracy above holds. */
const FLAT_PAIR_MIN_ASPECT = 5;
/**
 * Series impedance $R + j\omega L$ of a go-and-return lead at a frequency, with skin and
 * proximity effect, for three cross-sections.
 *
 * **Round pair** (two solid wires or tubes, outer radius a, centre spacing D), exact: the 2-D
 * eddy-current field expanded in cylindrical harmonics of order m inside the metal
 * ($I_m(\gamma r)$, $K_m(\gamma r)$, γ = (1 + j)/δ) and outside each conductor (multipoles
 * $\cos m\theta/r^m$ re-expanded about the other centre by the binomial series), matched at the
 * surfaces. With $P_m = a u_m'(a)/u_m(a)$ the surface log-derivative of the metal's solution
 * of order m and q = a/D, the multipole strengths β solve
 *
 * $$
 * (P_m + m)\,\beta_m - (P_m - m)\sum_{k\ge1}\binom{k+m-1}{m} q^{k+m}\beta_k = q^m\Big(\frac{P_m}{m} - 1\Big),
 * \qquad Z = \frac{j\omega\mu_0\ell}{\pi}\Big[\ln\frac{D}{a} + \frac{1}{P_0} - \sum_k \beta_k q^k\Big]
 * $$
 *
 * truncated where the image-point ratio, squared, has decayed to 1e-15. Limits it reproduces: DC,
 * $L = \frac{\mu_0\ell}{\pi}\big(\ln\frac{D}{a} + \frac14\big)$ for solid wire (internal
 * μ0/(8π) per conductor); δ → 0, $L \to \frac{\mu_0\ell}{\pi}\,\mathrm{acosh}\frac{D}{2a}$ and
 * $R \to \frac{\rho\,\ell}{\pi a \delta}\,\frac{D/2a}{\sqrt{(D/2a)^2 - 1}}$ (conformal map).
 *
 * **Coaxial**, exact (axisymmetric): $Z = \frac{j\omega\mu_0\ell}{2\pi}\big[\frac{1}{P_a} + \ln\frac{b}{a} - \frac{1}{P_b}\big]$,
 * $P_a$ the inner conductor's order-0 log-derivative, $P_b$ the return tube's at its inner face.
 *
 * **Flat pair** (bus bars of width w, thickness t, facing gap g): the strip-line model (field
 * uniform between the broad faces, zero outside; each bar's current on its inner face with the
 * 1-D skin effect of a slab) on an effective width $w_e = wF$ that carries the edge fringing,
 * $F = 1 + \frac{g}{\pi w}\big(1 + \ln\frac{2\pi w}{g}\big)$ (Palmer's parallel-plate edge
 * correction, through the duality $L' = \mu_0\varepsilon_0/C'$):
 * $Z = j\omega\mu_0\ell\,g/w_e + \frac{2\rho\gamma\ell}{w_e}\coth\gamma t$ (R not below R_dc). Exact
 * as w/g → ∞; an approximation otherwise: against the 2-D finite-element reference
 * (fixture fem-flat.json: w/g = 5–10, t/g = 0.5–1, t/δ = 0.5 and 4) it reads high by up to
 * 21 % in L (most near DC, where the uniform current's internal inductance is below the
 * slab's) and up to 15 % in R ({@link FLAT_PAIR_ACCURACY}); for w < 5 g or t > w/2 a
 * `validity` note (at w = 2 g: 46 % in L).
 *
 * Hard domain (throws {@link InputError}): every length, the frequency and the resistivity
 * finite and > 0; round pair: spacing > diameter, wallThickness ≤ diameter/2; coaxial:
 * returnInnerDiameter > innerDiameter, innerWallThickness ≤ innerDiameter/2; round pair and
 * coaxial: a frequency at which the (outer) radius is more than 1e6 skin depths (bounded work). Validity: straight
 * parallel run much longer than its spacing (end effects ignored), non-magnetic metal, no
 * other conductors near.
 *
 * Accuracy: round pair and coaxial ≤ 1e-9 relative vs mpmath (the cylindrical-harmonic
 * solution at 30 digits, written independently, and the DC, δ → 0 and coaxial closed forms;
 * fixture test/fixtures/leads/series.json) for 1.05 ≤ D/d ≤ 10, 0.1 ≤ d/δ ≤ 30, and within
 * 0.3 % of the 2-D finite-element reference (scikit-fem P2, fixtures fem-round.json and
 * fem-tube.json, whose own discretisation error is ≤ 0.12 %) over 1.05 ≤ D/d ≤ 2 and
 * 0.5 ≤ d/δ ≤ 20; below r/δ = 1e-3 the uniform-current values (exact to 1e-12). Flat pair as
 * above.
 *
 * @param options - {@link LeadImpedanceOptions}
 * @returns loop inductance and resistance ({@link LeadImpedance})
 * @throws {@link InputError} on bad input
 * @see S. Ramo, J. R. Whinnery, T. Van Duzer, Fields and Waves in Communication Electronics, 3rd ed., Wiley 1994, Table 5.11a (two-wire line: L and R with the proximity factor).
 * @see W. R. Smythe, Static and Dynamic Electricity, 3rd ed., McGraw-Hill 1968, §10.09 (eddy currents in parallel cylinders by cylindrical harmonics).
 * @see S. A. Schelkunoff, "The electromagnetic theory of coaxial transmission lines and cylindrical shields", Bell Syst. Tech. J. 13, 532–579 (1934).
 * @see NIST Digital Library of Mathematical Functions, 10.23.7 (Graf's addition theorem) and 4.6.7 (binomial series).
 * @example
 * ```ts
 * import { leadImpedance } from "fluxwright";
 * // 0.4 m run of two 6 mm × 1 mm copper tubes at 12 mm centres, 50 kHz
 * const z = leadImpedance({ lead: { shape: "round-pair", diameter: 6e-3, wallThickness: 1e-3, spacing: 12e-3 }, length: 0.4, frequency: 50e3, resistivity: 1.7241e-8 });
 * console.log(z.inductance); // ≈ 2.2e-7
 * console.log(z.resistance); // ≈ 3.0e-3
 * ```
 * @category Conductors
 */
export function leadImpedance(options: LeadImpedanceOptions): LeadImpedance {
  const where = "leadImpedance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, OPTION_FIELDS);
  const length = requirePositive(where, "length", options.length, "m");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const lead = requireObject(where, "lead", options.lead);
  const shape = requireOneOf(where, "lead.shape", lead.shape, ["round-pair", "flat-pair", "coaxial"] as const);
  const omega = TWO_PI * frequency;
  const delta = Math.sqrt(resistivity / (Math.PI * frequency * MU_0));
  const validity: ValidityNote[] = [];
  let perMetre: [number, number];
  let dcPerMetre: number;
  let highFrequencyPerMetre: number;
  if (shape === "round-pair") {
    requireKnownKeys(where, "lead", lead, ROUND_FIELDS);
    const diameter = requirePositive(where, "lead.diameter", lead.diameter, "m");
    const a = diameter / 2;
    const wall = lead.wallThickness === undefined ? a : requirePositive(where, "lead.wallThickness", lead.wallThickness, "m");
    if (wall > a * (1 + 1e-12)) throw new InputError(where, "lead.wallThickness", wall, "m", `≤ diameter/2 = ${a}`);
    const spacing = requirePositive(where, "lead.spacing", lead.spacing, "m");
    if (!(spacing > diameter)) throw new InputError(where, "lead.spacing", spacing, "m", `> diameter = ${diameter} (the conductors must not touch)`);
    const ri = Math.max(0, a - wall);
    requireBoundedSkinRatio(where, frequency, resistivity, a, delta);
    const orders = ordersFor(spacing, a);
    if (orders >= MAX_ORDERS) {
      validity.push({
        code: "lead-nearly-touching",
        message: `The conductors nearly touch (spacing/diameter = ${spacing / diameter}): the multipole series is cut at ${MAX_ORDERS} orders, so the proximity effect is resolved less accurately than 1e-15.`,
        value: spacing / diameter,
        limit: 1.0009,
      });
    }
    dcPerMetre = (2 * resistivity) / (Math.PI * (a * a - ri * ri));
    perMetre = a / delta < DC_LIMIT
      ? [dcPerMetre, omega * ((MU_0 / Math.PI) * Math.log(spacing / a) + 2 * wallInductanceDc(ri, a, "inner"))]
      : roundPairPerMetre(a, ri, spacing, delta, omega, orders);
    highFrequencyPerMetre = (MU_0 / Math.PI) * Math.acosh(spacing / diameter);
  } else if (shape === "coaxial") {
    requireKnownKeys(where, "lead", lead, COAXIAL_FIELDS);
    const innerDiameter = requirePositive(where, "lead.innerDiameter", lead.innerDiameter, "m");
    const a = innerDiameter / 2;
    const wall = lead.innerWallThickness === undefined ? a : requirePositive(where, "lead.innerWallThickness", lead.innerWallThickness, "m");
    if (wall > a * (1 + 1e-12)) throw new InputError(where, "lead.innerWallThickness", wall, "m", `≤ innerDiameter/2 = ${a}`);
    const returnInnerDiameter = requirePositive(where, "lead.returnInnerDiameter", lead.returnInnerDiameter, "m");
    if (!(returnInnerDiameter > innerDiameter)) throw new InputError(where, "lead.returnInnerDiameter", returnInnerDiameter, "m", `> innerDiameter = ${innerDiameter}`);
    const returnWall = requirePositive(where, "lead.returnWallThickness", lead.returnWallThickness, "m");
    const ri = Math.max(0, a - wall);
    const b = returnInnerDiameter / 2;
    const c = b + returnWall;
    requireBoundedSkinRatio(where, frequency, resistivity, c, delta);
    dcPerMetre = resistivity / (Math.PI * (a * a - ri * ri)) + resistivity / (Math.PI * (c * c - b * b));
    const pa = new Float64Array(1);
    const paIm = new Float64Array(1);
    surfaceLogDerivatives(a, ri, delta, 0, pa, paIm);
    const [iaRe, iaIm] = reciprocal(pa[0]!, paIm[0]!);
    const [pbRe, pbIm] = returnTubeLogDerivative(b, c, delta);
    const [ibRe, ibIm] = reciprocal(pbRe, pbIm);
    const bracketRe = iaRe + Math.log(b / a) - ibRe;
    const bracketIm = iaIm - ibIm;
    const k = (omega * MU_0) / TWO_PI;
    perMetre = c / delta < DC_LIMIT
      ? [dcPerMetre, omega * (wallInductanceDc(ri, a, "inner") + (MU_0 / TWO_PI) * Math.log(b / a) + wallInductanceDc(b, c, "outer"))]
      : [-k * bracketIm, k * bracketRe];
    highFrequencyPerMetre = (MU_0 / TWO_PI) * Math.log(b / a);
  } else {
    requireKnownKeys(where, "lead", lead, FLAT_FIELDS);
    const width = requirePositive(where, "lead.width", lead.width, "m");
    const thickness = requirePositive(where, "lead.thickness", lead.thickness, "m");
    const gap = requirePositive(where, "lead.gap", lead.gap, "m");
    // the field between the bars with the fringing at the two edges, through the duality
    // L' = μ0ε0/C' and Palmer's edge correction of the parallel-plate capacitance: the strip
    // line of effective width w·F for the field and for each bar's face current
    const fringe = 1 + (gap / (Math.PI * width)) * (1 + Math.log((2 * Math.PI * width) / gap));
    const effectiveWidth = width * fringe;
    // internal impedance of one bar, field on one broad face: (ργ/w) coth(γ t), γ = (1 + j)/δ
    const u = thickness / delta;
    const ct = cCoth({ re: u, im: u });
    const s = resistivity / (effectiveWidth * delta);
    // (1 + j) · coth
    const zr = s * (ct.re - ct.im);
    const zi = s * (ct.re + ct.im);
    perMetre = [2 * zr, omega * MU_0 * (gap / effectiveWidth) + 2 * zi];
    dcPerMetre = (2 * resistivity) / (width * thickness);
    highFrequencyPerMetre = (MU_0 * gap) / effectiveWidth;
    if (width < FLAT_PAIR_MIN_ASPECT * gap || thickness > width / 2) {
      validity.push({
        code: "flat-pair-narrow",
        message: `The bars are not wide against their gap and thickness (width/gap = ${width / gap}, thickness/width = ${thickness / width}): the strip-line model assumes the field nearly confined between the broad faces (46 % high in L at width = 2 × gap); its tested accuracy (${FLAT_PAIR_ACCURACY.inductance * 100} % in L, ${FLAT_PAIR_ACCURACY.resistance * 100} % in R) holds for width ≥ ${FLAT_PAIR_MIN_ASPECT} × gap and thickness ≤ width/2.`,
        value: width / gap,
        limit: FLAT_PAIR_MIN_ASPECT,
      });
    }
  }
  const resistance = Math.max(perMetre[0], dcPerMetre) * length;
  const inductance = (perMetre[1] / omega) * length;
  return { inductance, resistance, dcResistance: dcPerMetre * length, highFrequencyInductance: highFrequencyPerMetre * length, validity };
}
