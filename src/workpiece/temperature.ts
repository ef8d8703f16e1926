/**
 * Coupling of a part at a given temperature, with its resistivity and permeability read from
 * the materials module (resistivity rise, permeability collapse at the Curie point).
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { givenName, renamedOption } from "../core/renamed.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import { coilOverLayers } from "./coil-over-plate.js";
import type { CoilAbovePlate, CoilAbovePlateWithHeight } from "./coil-over-plate.js";
import { barCoupling, tubeCoupling } from "./long-coil.js";
import type { LongCoil } from "./long-coil.js";
import { checkPlateLayers } from "./coil-over-plate.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const COUPLING_FIELDS: readonly string[] = Object.freeze(["material", "temperature", "part", "frequency", "fieldStrengthPeak", "coilResistance", "fieldStrength"]);
const BAR_PART_FIELDS: readonly string[] = Object.freeze(["kind", "radius", "coil"]);
const TUBE_PART_FIELDS: readonly string[] = Object.freeze(["kind", "outerRadius", "innerRadius", "coil"]);
const PLATE_PART_FIELDS: readonly string[] = Object.freeze(["kind", "thickness", "coil"]);
const LONG_COIL_FIELDS: readonly string[] = Object.freeze(["innerRadius", "length", "turns"]);
const PLATE_COIL_FIELDS: readonly string[] = Object.freeze(["innerRadius", "outerRadius", "liftOff", "length", "turns", "height"]);

/**
 * A solid round bar in a long coil, for {@link workpieceCouplingAtTemperature}.
 *
 * @category Workpiece
 */
export interface HeatedBar {
  /** Discriminant. */
  readonly kind: "bar";
  /** Bar radius [m], > 0 and ≤ coil innerRadius. */
  readonly radius: number;
  /** The long coil around it, see {@link LongCoil}. */
  readonly coil: LongCoil;
}

/**
 * A hollow round tube in a long coil, for {@link workpieceCouplingAtTemperature}.
 *
 * @category Workpiece
 */
export interface HeatedTube {
  /** Discriminant. */
  readonly kind: "tube";
  /** Outer radius [m], > innerRadius and ≤ coil innerRadius. */
  readonly outerRadius: number;
  /** Bore radius [m], ≥ 0. */
  readonly innerRadius: number;
  /** The long coil around it, see {@link LongCoil}. */
  readonly coil: LongCoil;
}

/**
 * A plate (or half-space, thickness `Infinity`) under a pancake coil, for
 * {@link workpieceCouplingAtTemperature}.
 *
 * @category Workpiece
 */
export interface HeatedPlate {
  /** Discriminant. */
  readonly kind: "plate";
  /** Plate thickness [m], > 0 or `Infinity`. */
  readonly thickness: number;
  /** The coil above it, see {@link CoilAbovePlate}. */
  // eslint-disable-next-line @typescript-eslint/no-deprecated -- the former field name is accepted until 1.0
  readonly coil: CoilAbovePlate | CoilAbovePlateWithHeight;
}

/**
 * The heated part for {@link workpieceCouplingAtTemperature}: a solid bar or a tube in a long
 * coil, or a plate under a pancake coil.
 *
 * @category Workpiece
 */
export type HeatedPart = HeatedBar | HeatedTube | HeatedPlate;

/**
 * Options of {@link workpieceCouplingAtTemperature}.
 *
 * @category Workpiece
 */
export interface WorkpieceCouplingAtTemperatureOptions {
  /** The part's material, e.g. `lowCarbonSteel` from the materials module. */
  readonly material: ConductiveMaterial;
  /** The part's (surface) temperature [K], > 0. */
  readonly temperature: number;
  /** Shape, size and coil, see {@link HeatedPart}. */
  readonly part: HeatedPart;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /**
   * Amplitude (peak) of the surface magnetic field strength [A/m], ≥ 0, passed to the
   * permeability model (saturation in strong fields); omitted: the low-field permeability.
   */
  readonly fieldStrengthPeak?: number;
  /**
   * Former name of `fieldStrengthPeak` [A/m]; giving both is refused.
   *
   * @deprecated Use `fieldStrengthPeak`; this name goes at 1.0.
   */
  readonly fieldStrength?: number;
  /** Coil winding resistance [Ω], ≥ 0; when given, `efficiency` is returned. */
  readonly coilResistance?: number;
}

/**
 * Result of {@link workpieceCouplingAtTemperature}.
 *
 * @category Workpiece
 */
export interface WorkpieceCouplingAtTemperatureResult {
  /** Resistivity used, from `resistivityAt` [Ω·m]. */
  readonly resistivity: number;
  /** Relative permeability used, from `relativePermeabilityAt` [-] (exactly 1 at and above Curie). */
  readonly relativePermeability: number;
  /** Resistance reflected into the coil [Ω]. */
  readonly reflectedResistance: number;
  /** Reactance change caused by the part [Ω]. */
  readonly reactanceChange: number;
  /** Inductance change caused by the part [H]. */
  readonly inductanceChange: number;
  /** Skin depth in the part [m]. */
  readonly skinDepth: number;
  /** $R_r/(R_r + R_c)$ [-], present only when `coilResistance` was given. */
  readonly efficiency?: number;
  /** Validity notes of the underlying model. */
  readonly validity: readonly ValidityNote[];
}

/**
 * Re-evaluates the coupling of a coil and part at the part's temperature: the resistivity and
 * relative permeability are read from the materials module (`resistivityAt`,
 * `relativePermeabilityAt`: resistivity rises with temperature, permeability falls to exactly
 * 1 at the Curie point), then the coupling is computed by {@link barInLongCoil},
 * {@link tubeInLongCoil} or {@link coilOverPlate}. A heat-up study calls it at each step to
 * follow the reflected resistance and the inductance — and so the tank frequency — as the
 * part heats.
 *
 * $$
 * \rho = \rho(T),\quad \mu_r = \mu_r(T, \hat H),\quad Z_\text{part} = Z(\rho, \mu_r, f)
 * $$
 *
 * The part is taken at one uniform temperature (the surface temperature is the usual
 * choice, since the power enters within a few skin depths).
 *
 * Hard domain (throws {@link InputError}): temperature > 0, frequency > 0, fieldStrengthPeak ≥ 0,
 * coilResistance ≥ 0, and the hard domain of the underlying function; a temperature outside
 * the material's tabulated range throws from the materials module.
 * Validity: that of the underlying model, plus a uniform part temperature.
 * Accuracy: that of the underlying function and of the material data.
 *
 * @param options - material, temperature, part with its coil, frequency, see {@link WorkpieceCouplingAtTemperatureOptions}
 * @returns the material values used and the coupling [Ω, H]
 * @throws {@link InputError} for values outside the hard domain
 * @see E. J. Davies, *Conduction and Induction Heating* (1990) (magnetic load above and
 *   below Curie); the materials module for the property sources.
 * @example
 * ```ts
 * import { workpieceCouplingAtTemperature, lowCarbonSteel, celsius } from "fluxwright";
 * const coil = { innerRadius: 0.03, length: 0.3, turns: 20 };
 * const cold = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(20),
 *   part: { kind: "bar", radius: 0.02, coil }, frequency: 1e4 });
 * const hot = workpieceCouplingAtTemperature({ material: lowCarbonSteel, temperature: celsius(900),
 *   part: { kind: "bar", radius: 0.02, coil }, frequency: 1e4 });
 * console.log(hot.relativePermeability); // 1
 * console.log(cold.inductanceChange > hot.inductanceChange); // true
 * ```
 * @category Workpiece
 */
export function workpieceCouplingAtTemperature(options: WorkpieceCouplingAtTemperatureOptions): WorkpieceCouplingAtTemperatureResult {
  const where = "workpieceCouplingAtTemperature";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, COUPLING_FIELDS);
  const material = requireObject(where, "material", options.material) as unknown as ConductiveMaterial;
  const temperature = requirePositive(where, "temperature", options.temperature, "K");
  const part = requireObject(where, "part", options.part);
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const given = renamedOption(where, "", options, "fieldStrengthPeak", "fieldStrength");
  const h = given === undefined ? undefined : requireNonNegative(where, givenName(options, "fieldStrengthPeak", "fieldStrength"), given, "A/m");
  const rc = options.coilResistance === undefined ? undefined : requireNonNegative(where, "coilResistance", options.coilResistance, "Ω");
  const rho = resistivityAt(material, temperature);
  const mur = relativePermeabilityAt(material, h === undefined ? { temperature } : { temperature, fieldStrengthPeak: h });
  const kind = part["kind"];
  const coil = requireObject(where, "part.coil", part["coil"]);
  let r: {
    reflectedResistance: number;
    reactanceChange: number;
    inductanceChange: number;
    skinDepth: number;
    efficiency?: number;
    validity: readonly ValidityNote[];
  };
  if (kind === "bar") {
    requireKnownKeys(where, "part", part, BAR_PART_FIELDS);
    const radius = requirePositive(where, "part.radius", part["radius"], "m");
    const lc = checkCoil(where, coil);
    if (radius > lc.innerRadius) throw new InputError(where, "part.radius", radius, "m", `a finite number ≤ part.coil.innerRadius (${lc.innerRadius})`);
    r = barCoupling(lc, radius, rho, mur, f, rc);
  } else if (kind === "tube") {
    requireKnownKeys(where, "part", part, TUBE_PART_FIELDS);
    const a2 = requirePositive(where, "part.outerRadius", part["outerRadius"], "m");
    const a1 = requireNonNegative(where, "part.innerRadius", part["innerRadius"], "m");
    if (!(a1 < a2)) throw new InputError(where, "part.innerRadius", a1, "m", `a finite number < part.outerRadius (${a2})`);
    const lc = checkCoil(where, coil);
    if (a2 > lc.innerRadius) throw new InputError(where, "part.outerRadius", a2, "m", `a finite number ≤ part.coil.innerRadius (${lc.innerRadius})`);
    r = tubeCoupling(lc, a2, a1, rho, mur, f, rc);
  } else if (kind === "plate") {
    requireKnownKeys(where, "part", part, PLATE_PART_FIELDS);
    const layers = checkPlateLayers(where, { thickness: part["thickness"], resistivity: rho, relativePermeability: mur });
    const pc = checkPlateCoil(where, coil);
    const z = coilOverLayers(pc, layers, f);
    const base = {
      reflectedResistance: z.reflectedResistance,
      reactanceChange: z.reactanceChange,
      inductanceChange: z.inductanceChange,
      skinDepth: z.skinDepth,
      validity: z.validity,
    };
    r = rc === undefined ? base : { ...base, efficiency: rc + z.reflectedResistance > 0 ? z.reflectedResistance / (rc + z.reflectedResistance) : 0 };
  } else {
    throw new InputError(where, "part.kind", kind, "", 'one of "bar", "tube", "plate"');
  }
  const out = {
    resistivity: rho,
    relativePermeability: mur,
    reflectedResistance: r.reflectedResistance,
    reactanceChange: r.reactanceChange,
    inductanceChange: r.inductanceChange,
    skinDepth: r.skinDepth,
    validity: r.validity,
  };
  return r.efficiency === undefined ? out : { ...out, efficiency: r.efficiency };
}

function checkCoil(where: string, c: Record<string, unknown>): LongCoil {
  requireKnownKeys(where, "part.coil", c, LONG_COIL_FIELDS);
  const innerRadius = requirePositive(where, "part.coil.innerRadius", c["innerRadius"], "m");
  const length = requirePositive(where, "part.coil.length", c["length"], "m");
  const turns = requireInteger(where, "part.coil.turns", c["turns"], 1);
  return { innerRadius, length, turns };
}

function checkPlateCoil(where: string, c: Record<string, unknown>): CoilAbovePlate {
  requireKnownKeys(where, "part.coil", c, PLATE_COIL_FIELDS);
  const innerRadius = requireNonNegative(where, "part.coil.innerRadius", c["innerRadius"], "m");
  const outerRadius = requirePositive(where, "part.coil.outerRadius", c["outerRadius"], "m");
  if (!(outerRadius > innerRadius)) throw new InputError(where, "part.coil.outerRadius", outerRadius, "m", `a finite number > part.coil.innerRadius (${innerRadius})`);
  const liftOff = requireNonNegative(where, "part.coil.liftOff", c["liftOff"], "m");
  const length = requirePositive(where, c["length"] === undefined && c["height"] !== undefined ? "part.coil.height" : "part.coil.length", renamedOption(where, "part.coil", c, "length", "height"), "m");
  const turns = requireInteger(where, "part.coil.turns", c["turns"], 1);
  return { innerRadius, outerRadius, liftOff, length, turns };
}
