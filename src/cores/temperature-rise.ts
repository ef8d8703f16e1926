/**
 * Temperature rise of a component (an inductor, a transformer) from its total loss: natural
 * convection by the Churchill–Chu correlation plus radiation, or a given thermal resistance.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireInRange,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requirePositive,
} from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { surfaceTemperatureCaution } from "../safety/index.js";
import { brentRoot } from "../special/index.js";
import { STEFAN_BOLTZMANN } from "../units/index.js";

/** Standard gravity [m/s²] (CGPM 1901, exact). */
const GRAVITY = 9.80665;

/**
 * Dry air at 1 atm: film temperature [K], kinematic viscosity [m²/s], thermal conductivity
 * [W/(m·K)], thermal diffusivity [m²/s]. Incropera & DeWitt, Fundamentals of Heat and Mass
 * Transfer, Table A.4 (values from memory).
 */
const AIR_TABLE: readonly (readonly [number, number, number, number])[] = [
  [250, 11.44e-6, 22.3e-3, 15.9e-6],
  [300, 15.89e-6, 26.3e-3, 22.5e-6],
  [350, 20.92e-6, 30.0e-3, 29.9e-6],
  [400, 26.41e-6, 33.8e-3, 38.3e-6],
  [450, 32.39e-6, 37.3e-3, 47.2e-6],
  [500, 38.79e-6, 40.7e-3, 56.7e-6],
  [550, 45.57e-6, 43.9e-3, 66.7e-6],
  [600, 52.69e-6, 46.9e-3, 76.9e-6],
];
const AIR_MIN = 250;
const AIR_MAX = 600;

/** Accepted fields of an air-property override. */
const AIR_FIELDS: readonly string[] = Object.freeze(["kinematicViscosity", "thermalConductivity", "thermalDiffusivity"]);
const CONVECTION_FIELDS: readonly string[] = Object.freeze(["height", "surfaceTemperature", "ambientTemperature", "air"]);
const RISE_FIELDS: readonly string[] = Object.freeze([
  "power",
  "ambientTemperature",
  "surfaceArea",
  "height",
  "emissivity",
  "air",
  "thermalResistance",
]);

/**
 * Properties of the air at the film temperature, overriding the built-in table.
 *
 * @category Cores
 */
export interface AirProperties {
  /** Kinematic viscosity ν [m²/s], > 0. */
  readonly kinematicViscosity: number;
  /** Thermal conductivity k [W/(m·K)], > 0. */
  readonly thermalConductivity: number;
  /** Thermal diffusivity α [m²/s], > 0. */
  readonly thermalDiffusivity: number;
}

/**
 * Options of {@link naturalConvectionCoefficient}.
 *
 * @category Cores
 */
export interface NaturalConvectionOptions {
  /** Height of the vertical surface (the characteristic length) [m], > 0. */
  readonly height: number;
  /** Surface temperature [K], > 0. */
  readonly surfaceTemperature: number;
  /** Temperature of the still air far from the surface [K], > 0. */
  readonly ambientTemperature: number;
  /** Air properties at the film temperature (default: dry air at 1 atm, interpolated in a table). */
  readonly air?: AirProperties;
}

/**
 * Natural convection from a vertical surface: the coefficient and the numbers behind it.
 *
 * @category Cores
 */
export interface NaturalConvection {
  /** Mean convection coefficient $\bar h$ [W/(m²·K)]. */
  readonly coefficient: number;
  /** Rayleigh number $Ra_L$ [-]. */
  readonly rayleighNumber: number;
  /** Mean Nusselt number $\overline{Nu}_L$ [-]. */
  readonly nusseltNumber: number;
  /** Notes when the film temperature leaves the air table (250 … 600 K) or Ra leaves 0.1 … 1e12. */
  readonly validity: readonly ValidityNote[];
}

function airAt(film: number): [number, number, number] {
  const t = Math.min(AIR_MAX, Math.max(AIR_MIN, film));
  let i = 0;
  while (i < AIR_TABLE.length - 2 && t > (AIR_TABLE[i + 1] as readonly number[])[0]!) i++;
  const a = AIR_TABLE[i]!;
  const b = AIR_TABLE[i + 1]!;
  const w = (t - a[0]) / (b[0] - a[0]);
  return [a[1] + w * (b[1] - a[1]), a[2] + w * (b[2] - a[2]), a[3] + w * (b[3] - a[3])];
}

function checkAir(where: string, air: unknown): AirProperties | undefined {
  if (air === undefined) return undefined;
  requireObject(where, "air", air);
  requireKnownKeys(where, "air", air as object, AIR_FIELDS);
  const a = air as AirProperties;
  return {
    kinematicViscosity: requirePositive(where, "air.kinematicViscosity", a.kinematicViscosity, "m²/s"),
    thermalConductivity: requirePositive(where, "air.thermalConductivity", a.thermalConductivity, "W/(m·K)"),
    thermalDiffusivity: requirePositive(where, "air.thermalDiffusivity", a.thermalDiffusivity, "m²/s"),
  };
}

/** Churchill–Chu convection without checks; `notes` collects validity notes when given. */
function convection(
  height: number,
  surface: number,
  ambient: number,
  air: AirProperties | undefined,
  notes: ValidityNote[] | null,
): { h: number; ra: number; nu: number } {
  const film = (surface + ambient) / 2;
  let nuKin: number;
  let k: number;
  let alpha: number;
  if (air === undefined) {
    [nuKin, k, alpha] = airAt(film);
    if (notes !== null && (film < AIR_MIN || film > AIR_MAX)) {
      notes.push({
        code: "air-table-range",
        message: `film temperature ${film.toFixed(1)} K is outside the air table (250 … 600 K); the nearest end was used`,
        value: film,
        limit: film < AIR_MIN ? AIR_MIN : AIR_MAX,
      });
    }
  } else {
    nuKin = air.kinematicViscosity;
    k = air.thermalConductivity;
    alpha = air.thermalDiffusivity;
  }
  const pr = nuKin / alpha;
  const ra = (GRAVITY * (1 / film) * Math.abs(surface - ambient) * height * height * height) / (nuKin * alpha);
  const root = 0.825 + (0.387 * Math.pow(ra, 1 / 6)) / Math.pow(1 + Math.pow(0.492 / pr, 9 / 16), 8 / 27);
  const nu = root * root;
  if (notes !== null && ra > 1e12) {
    notes.push({ code: "rayleigh-range", message: "Rayleigh number above 1e12, beyond the correlation's data", value: ra, limit: 1e12 });
  }
  return { h: (nu * k) / height, ra, nu };
}

/**
 * Mean natural-convection coefficient of a vertical surface in still air, by the Churchill–Chu
 * correlation (all Rayleigh numbers), with the air's properties at the film temperature
 * $T_f = (T_s + T_\infty)/2$ and $\beta = 1/T_f$ (ideal gas).
 *
 * $$
 * Ra_L = \frac{g \beta (T_s - T_\infty) L^3}{\nu \alpha},\qquad
 * \overline{Nu}_L = \left\lbrace 0.825 + \frac{0.387\, Ra_L^{1/6}}{\left[1 + (0.492/Pr)^{9/16}\right]^{8/27}} \right\rbrace^2,\qquad
 * \bar h = \frac{\overline{Nu}_L\, k}{L}
 * $$
 *
 * Hard domain (throws {@link InputError}): a temperature or the height not finite and > 0; bad
 * `air` fields. Validity: laminar and turbulent, $Ra_L \lesssim 10^{12}$; the default air table
 * covers film temperatures 250 … 600 K (outside, the nearest end is used and `validity` says so).
 * For a component, using its height for the whole surface is common practice (tops and bottoms
 * exchange somewhat differently). Accuracy: the correlation itself is an empirical fit (its
 * authors' data scatter is of the order of ±10 %); against Incropera's Example 9.2 (values from
 * memory) this implementation agrees within 0.2 % for $\overline{Nu}$ and $\bar h$.
 *
 * @param options - {@link NaturalConvectionOptions}
 * @returns {@link NaturalConvection}: coefficient [W/(m²·K)], Ra, Nu, validity notes
 * @throws {@link InputError} on bad input
 * @see S. W. Churchill and H. H. S. Chu, "Correlating equations for laminar and turbulent free convection from a vertical plate", Int. J. Heat Mass Transfer 18 (1975) 1323–1329, eq. (4); Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, eq. 9.26 and Table A.4.
 * @example
 * ```ts
 * import { naturalConvectionCoefficient } from "fluxwright";
 * const c = naturalConvectionCoefficient({ height: 0.71, surfaceTemperature: 505, ambientTemperature: 296 });
 * console.log(c.coefficient.toFixed(2)); // 7.00
 * ```
 * @category Cores
 */
export function naturalConvectionCoefficient(options: NaturalConvectionOptions): NaturalConvection {
  const where = "naturalConvectionCoefficient";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, CONVECTION_FIELDS);
  const height = requirePositive(where, "height", options.height, "m");
  const surface = requirePositive(where, "surfaceTemperature", options.surfaceTemperature, "K");
  const ambient = requirePositive(where, "ambientTemperature", options.ambientTemperature, "K");
  const air = checkAir(where, options.air);
  const validity: ValidityNote[] = [];
  const { h, ra, nu } = convection(height, surface, ambient, air, validity);
  return { coefficient: h, rayleighNumber: ra, nusseltNumber: nu, validity };
}

/**
 * Options of {@link componentTemperatureRise}: `power` and `ambientTemperature`, then either
 * `thermalResistance` alone or `surfaceArea` and `height` (with `emissivity`, `air`).
 *
 * @category Cores
 */
export interface ComponentTemperatureRiseOptions {
  /** Total loss dissipated [W], ≥ 0. */
  readonly power: number;
  /** Ambient (air and surroundings) temperature [K], > 0. */
  readonly ambientTemperature: number;
  /** Outer surface exchanging heat [m²], > 0 (e.g. {@link CoreShape.surfaceArea}). */
  readonly surfaceArea?: number;
  /** Height of the component as it stands (convection length) [m], > 0. */
  readonly height?: number;
  /** Total hemispherical emissivity [-], 0 … 1 (default 0.9: ferrite, varnish and tape, common practice). */
  readonly emissivity?: number;
  /** Air property override, see {@link naturalConvectionCoefficient}. */
  readonly air?: AirProperties;
  /** Thermal resistance surface-to-ambient [K/W], > 0 (instead of the surface model). */
  readonly thermalResistance?: number;
}

/**
 * Temperature rise of a component and how its heat leaves.
 *
 * @category Cores
 */
export interface ComponentTemperatureRise {
  /** Surface temperature rise above ambient [K]. */
  readonly temperatureRise: number;
  /** Surface temperature [K]. */
  readonly surfaceTemperature: number;
  /** Mean convection coefficient at that temperature [W/(m²·K)] (`null` with a thermal resistance). */
  readonly convectionCoefficient: number | null;
  /** Heat leaving by convection [W] (`null` with a thermal resistance). */
  readonly convectedPower: number | null;
  /** Heat leaving by radiation [W] (`null` with a thermal resistance). */
  readonly radiatedPower: number | null;
  /** Hot-surface cautions (ISO 13732-1 contact thresholds). */
  readonly cautions: readonly Caution[];
  /** Notes on the convection model's range. */
  readonly validity: readonly ValidityNote[];
}

/**
 * The steady surface temperature rise of a component dissipating `power`, from its outer
 * surface (natural convection by {@link naturalConvectionCoefficient} plus grey-body radiation to
 * surroundings at ambient) or from a given thermal resistance:
 *
 * $$
 * P = A\left[\bar h(T_s)\,(T_s - T_a) + \varepsilon\sigma\,(T_s^4 - T_a^4)\right]
 * \qquad\text{or}\qquad \Delta T = P\,R_\theta
 * $$
 *
 * solved for $T_s$ by bracketed root finding (the right side rises strictly with $T_s$).
 *
 * Hard domain (throws {@link InputError}): power < 0; ambient ≤ 0; neither or both of
 * `thermalResistance` and `surfaceArea`; `height` missing with `surfaceArea`; emissivity outside
 * 0 … 1. Validity: a single surface temperature (hot spots inside the winding are hotter than the
 * surface), still air, surroundings at ambient. Accuracy: the
 * balance is solved to 1e-9 K; the result inherits the correlation's scatter (about ±10 %
 * in $\bar h$) and the emissivity's uncertainty.
 *
 * @param options - {@link ComponentTemperatureRiseOptions}
 * @returns {@link ComponentTemperatureRise}: rise [K], surface temperature [K], split of the heat [W]
 * @throws {@link InputError} on bad input
 * @see Churchill & Chu (1975) eq. (4) for the convection; the Stefan–Boltzmann law (σ, CODATA 2018) for radiation.
 * @example
 * ```ts
 * import { componentTemperatureRise } from "fluxwright";
 * const t = componentTemperatureRise({ power: 2, ambientTemperature: 313.15, surfaceArea: 0.006, height: 0.03 });
 * console.log(t.temperatureRise.toFixed(1)); // 23.8
 * ```
 * @category Cores
 */
export function componentTemperatureRise(options: ComponentTemperatureRiseOptions): ComponentTemperatureRise {
  const where = "componentTemperatureRise";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, RISE_FIELDS);
  const power = requireNonNegative(where, "power", options.power, "W");
  const ambient = requirePositive(where, "ambientTemperature", options.ambientTemperature, "K");
  const cautions: Caution[] = [];
  if (options.thermalResistance !== undefined) {
    if (options.surfaceArea !== undefined) {
      throw new InputError(where, "surfaceArea", options.surfaceArea, "m²", "absent when thermalResistance is given");
    }
    const resistance = requirePositive(where, "thermalResistance", options.thermalResistance, "K/W");
    const rise = power * resistance;
    const c = surfaceTemperatureCaution({ temperature: ambient + rise, location: "component" });
    if (c !== null) cautions.push(c);
    return {
      temperatureRise: rise,
      surfaceTemperature: ambient + rise,
      convectionCoefficient: null,
      convectedPower: null,
      radiatedPower: null,
      cautions,
      validity: [],
    };
  }
  if (options.surfaceArea === undefined) {
    throw new InputError(where, "surfaceArea", undefined, "m²", "a finite number > 0 (or give thermalResistance)");
  }
  const area = requirePositive(where, "surfaceArea", options.surfaceArea, "m²");
  const height = requirePositive(where, "height", options.height, "m");
  const emissivity = options.emissivity === undefined ? 0.9 : requireInRange(where, "emissivity", options.emissivity, "", 0, 1);
  const air = checkAir(where, options.air);
  const heatOut = (rise: number): number => {
    const ts = ambient + rise;
    const h = rise > 0 ? convection(height, ts, ambient, air, null).h : 0;
    const ts2 = ts * ts;
    const ta2 = ambient * ambient;
    return area * (h * rise + emissivity * STEFAN_BOLTZMANN * (ts2 * ts2 - ta2 * ta2));
  };
  let rise = 0;
  if (power > 0) {
    let upper = 1;
    while (heatOut(upper) < power && upper < 1e7) upper *= 2;
    if (heatOut(upper) < power) {
      throw new InputError(where, "power", power, "W", "small enough for a surface temperature below 1e7 K");
    }
    rise = brentRoot((x) => heatOut(x) - power, 0, upper, { tolerance: 1e-9 });
  }
  const ts = ambient + rise;
  const validity: ValidityNote[] = [];
  const h = rise > 0 ? convection(height, ts, ambient, air, validity).h : 0;
  const convected = area * h * rise;
  const c = surfaceTemperatureCaution({ temperature: ts, location: "component" });
  if (c !== null) cautions.push(c);
  return {
    temperatureRise: rise,
    surfaceTemperature: ts,
    convectionCoefficient: h,
    convectedPower: convected,
    radiatedPower: power - convected,
    cautions,
    validity,
  };
}
