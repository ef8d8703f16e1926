/**
 * Surface and core temperature of a bar or tube heated in a long solenoid: the electro-thermal
 * radial model.
 *
 * Placement: the exact field in concentric shells is `layeredCylinderInLongCoil` (workpiece),
 * radial conduction with a generation callback is `radialHeatUp` (thermal); workpiece and
 * thermal sit on the same level and may not import each other, so the coupled transient that
 * composes them lives here, in the study module, and derives no physics of its own.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireInRange,
  requireInteger,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import { surfaceTemperatureCaution } from "../safety/index.js";
import { radialHeatUp } from "../thermal/index.js";
import type { RadialGenerationRequest, RadialHeatUpResult } from "../thermal/index.js";
import { MU_0 } from "../units/index.js";
import { barInLongCoil, layeredCylinderInLongCoil, tubeInLongCoil } from "../workpiece/index.js";
import type { LongCoil } from "../workpiece/index.js";

/**
 * The part of {@link inductionRadialHeatUp}: a solid bar or a tube, coaxial with the coil and
 * at least as long.
 *
 * @category Study
 */
export type RadialHeatedPart =
  | {
      /** Discriminant. */
      readonly shape: "bar";
      /** Bar radius [m], > 0 and ≤ coil innerRadius. */
      readonly radius: number;
    }
  | {
      /** Discriminant. */
      readonly shape: "tube";
      /** Outer radius [m], > innerRadius and ≤ coil innerRadius. */
      readonly radius: number;
      /** Bore radius [m], ≥ 0 and < radius (the bore surface is insulated). */
      readonly innerRadius: number;
    };

/**
 * What {@link InductionRadialHeatUpOptions.driveAt} receives.
 *
 * @category Study
 */
export interface InductionRadialState {
  /** Time [s]. */
  readonly time: number;
  /** Surface temperature [K]. */
  readonly surfaceTemperature: number;
  /** Core (axis, or bore surface of a tube) temperature [K]. */
  readonly coreTemperature: number;
  /** Volume-mean temperature [K]. */
  readonly meanTemperature: number;
}

/**
 * The drive returned by {@link InductionRadialHeatUpOptions.driveAt}.
 *
 * @category Study
 */
export interface InductionRadialDrive {
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** RMS coil current [A], ≥ 0: sets the field amplitude (hence μr(H)) and, without `power`, the power. */
  readonly coilCurrentRms: number;
  /**
   * Factor on the power of every shell [-], ≥ 0 (default 1): the ratio of a better coupling
   * model's power (e.g. a finite coil's) to the long coil's at the same state; the distribution
   * by depth stays that of the layered solution.
   */
  readonly powerFactor?: number;
}

/**
 * Options of {@link inductionRadialHeatUp}. The drive is one of: `frequency` with
 * `coilCurrentRms` (a constant current), `frequency` with `power` (the current adjusted to hold
 * the absorbed power), or `driveAt` (frequency and current from the state, e.g. an inverter's
 * operating point).
 *
 * @category Study
 */
export interface InductionRadialHeatUpOptions {
  /** The part, see {@link RadialHeatedPart}. */
  readonly part: RadialHeatedPart;
  /** Material: resistivity ρ(T), permeability μr(T, H), specific heat, conductivity, density. */
  readonly material: ConductiveMaterial;
  /** The long coil around the part, see {@link LongCoil}. */
  readonly coil: LongCoil;
  /**
   * Length of part that shares the absorbed power and loses heat from its mantle [m], > 0
   * (default `coil.length`); a part longer than the coil, with axial conduction evening out the
   * power, is modelled by its whole length (an axial average).
   */
  readonly heatedLength?: number;
  /** Frequency [Hz], > 0 (with `coilCurrentRms` or `power`). */
  readonly frequency?: number;
  /** Constant RMS coil current [A], ≥ 0. */
  readonly coilCurrentRms?: number;
  /** Constant power absorbed by the part [W], ≥ 0 (the current follows the load). */
  readonly power?: number;
  /** Frequency and RMS coil current from the part's state (called at each re-solve of the field). */
  readonly driveAt?: (state: InductionRadialState) => InductionRadialDrive;
  /** Convection coefficient at the outer surface [W/(m²·K)], ≥ 0. */
  readonly convectionCoefficient: number;
  /** Emissivity of the outer surface [-], 0 … 1. */
  readonly emissivity: number;
  /** Temperature of the surroundings [K], > 0. */
  readonly ambientTemperature: number;
  /** Uniform starting temperature [K], > 0 (default: `ambientTemperature`). */
  readonly initialTemperature?: number;
  /** Longest time simulated [s], > 0 (heating and soak together). */
  readonly duration: number;
  /** Target temperature [K], > 0: the heating stops when the `targetLocation` temperature reaches it. */
  readonly targetTemperature?: number;
  /** What the target applies to: `"mean"` (default, as the lumped model), `"surface"` or `"core"`. */
  readonly targetLocation?: "mean" | "surface" | "core";
  /** After the heating stops, soak until surface and core are within this band [K], > 0. */
  readonly soakBand?: number;
  /** Temperature whose reach into the part is wanted (hardening depth) [K], > 0. */
  readonly hardeningTemperature?: number;
  /** Cells across the radius or wall (integer, 8 … 400; default 60). */
  readonly cells?: number;
  /** Local error allowed per time step [K], > 0 (default 0.2 K). */
  readonly temperatureTolerance?: number;
  /** Largest time step [s], > 0 (default `duration`/200). */
  readonly maxTimeStep?: number;
  /**
   * The field is re-solved when a node's temperature has moved by more than this since the
   * last solve [K], > 0 (default 2 K).
   */
  readonly resolveStep?: number;
}

/**
 * Result of {@link inductionRadialHeatUp}: the thermal result of `radialHeatUp` (per unit heated
 * surface for its energy balance) plus the electrical history and the balance in joules.
 *
 * @category Study
 */
export interface InductionRadialHeatUpResult extends RadialHeatUpResult {
  /** Electrical history, one entry per field solution. */
  readonly electrical: {
    /** Times [s]. */
    readonly times: number[];
    /** Power absorbed by the part [W]. */
    readonly power: number[];
    /** Frequency [Hz]. */
    readonly frequency: number[];
    /** RMS coil current [A]. */
    readonly coilCurrentRms: number[];
    /** Resistance reflected into the coil [Ω]. */
    readonly reflectedResistance: number[];
    /** Inductance change of the coil [H]. */
    readonly inductanceChange: number[];
    /** Relative permeability of the outer shell [-]. */
    readonly surfacePermeability: number[];
    /**
     * Reflected resistance of the part at one uniform temperature, the surface's, with the outer
     * shell's permeability ({@link barInLongCoil} / {@link tubeInLongCoil}) [Ω]: against
     * `reflectedResistance` it measures what a uniform-temperature model misses.
     */
    readonly uniformReflectedResistance: number[];
  };
  /** Energy balance of the part over `heatedLength`, in joules: electrical input, stored, lost to the surroundings. */
  readonly partEnergy: {
    /** Electrical energy absorbed by the part [J]. */
    readonly input: number;
    /** Heat stored [J]. */
    readonly stored: number;
    /** Heat lost by convection and radiation [J]. */
    readonly lost: number;
    /** `input − stored − lost` [J] (rounding only). */
    readonly imbalance: number;
  };
  /** Number of times the field was re-solved for new temperatures. */
  readonly fieldSolutions: number;
  /** Number of field evaluations in the permeability fixed points (≥ `fieldSolutions`). */
  readonly fieldIterations: number;
  /** Hot-surface caution (ISO 13732-1 thresholds) when the surface exceeds 65 °C. */
  readonly cautions: Caution[];
}

const WHERE = "inductionRadialHeatUp";
const KNOWN = [
  "part",
  "material",
  "coil",
  "heatedLength",
  "frequency",
  "coilCurrentRms",
  "power",
  "driveAt",
  "convectionCoefficient",
  "emissivity",
  "ambientTemperature",
  "initialTemperature",
  "duration",
  "targetTemperature",
  "targetLocation",
  "soakBand",
  "hardeningTemperature",
  "cells",
  "temperatureTolerance",
  "maxTimeStep",
  "resolveStep",
] as const;

/**
 * Surface and core temperature of a bar or tube heated in a long solenoid: the power density by
 * depth from the exact field in the part, re-solved shell by shell as the resistivity ρ(T) and
 * the permeability μr(T, H) change (Curie transition, saturation at the local field amplitude),
 * with radial conduction and convection plus radiation from the outer surface.
 *
 * Each control volume of the conduction grid is a shell of {@link layeredCylinderInLongCoil}
 * with $\rho_i = \rho(T_i)$ and $\mu_{r,i} = \mu_r(T_i, \hat H_i)$, $\hat H_i$ the field
 * amplitude at the shell (geometric mean of its boundary values, peak =
 * $\sqrt2\,N I_\text{rms}/\ell$ times the field ratio), iterated to a fixed point starting
 * from the last solution's field (until the largest change of μr, weighted by the field ratio
 * reaching the shell, is below 1e-3). The shell powers per square metre of surface drive
 * {@link radialHeatUp}:
 * $$
 * \rho c(T)\,\frac{\partial T}{\partial t} = \frac{1}{r}\frac{\partial}{\partial r}\!\left(r\,k(T)\frac{\partial T}{\partial r}\right) + p(r, T),\qquad
 * \int_{a}^{R} p\,2\pi r\,dr\,\ell = R_r(T)\,I^2 .
 * $$
 * The field is re-solved whenever a node has moved by more than `resolveStep` since the last
 * solution; between solutions the generation is held (the energy balance stays exact).
 *
 * Hard domain (throws {@link InputError}): unknown option keys; part radius ≤ 0 or above the
 * coil bore; a tube bore not below the radius; not exactly one drive (`frequency` with
 * `coilCurrentRms` or `power`, or `driveAt`); a drive callback returning a non-positive
 * frequency or a negative current; the hard domain of {@link radialHeatUp}.
 * Validity: the long-coil idealisation (uniform applied field along the coil; end effects and
 * axial conduction ignored; the power spread over `heatedLength`, the part's ends insulated);
 * the bore of a tube insulated; the permeability model of the material (no hysteresis loss).
 *
 * Accuracy: the field solution is exact for the shell properties (≤ 1e-10 vs mpmath); the
 * conduction is that of {@link radialHeatUp} (≤ 1e-3 of the temperature change vs the series
 * solutions). Tests: the electrical energy in equals the stored enthalpy plus the surface losses
 * within 2e-3 (held generation and mid-step properties); at a uniform temperature the power
 * equals {@link barInLongCoil} / {@link tubeInLongCoil} within 1e-12; with the default
 * `resolveStep` (2 K) and `temperatureTolerance` (0.2 K) a steel bar heated through Curie to a
 * 900 °C surface reaches it within 0.3 % of the time, and with a surface-to-core difference within
 * 0.5 K, of a run with 0.25 K and 0.01 K. Speed: that heat-up (60 cells) takes 180 ms of CPU
 * (median; `docs/benchmarks.md`).
 *
 * @param options - part, material, coil, drive, surface, target, see {@link InductionRadialHeatUpOptions}
 * @returns surface, core and mean temperature curves, times to target, soak time, hardening depth, electrical history
 * @throws {@link InputError} on bad input
 * @see R. L. Stoll, *The Analysis of Eddy Currents*, Clarendon Press 1974, ch. 2 (field in
 *   cylindrical shells); E. J. Davies, *Conduction and Induction Heating*, Peregrinus 1990
 *   (through-heating of bars, surface-to-core difference and soak).
 * @example
 * ```ts
 * import { inductionRadialHeatUp, lowCarbonSteel, celsius } from "fluxwright";
 * // 30 mm steel forging bar, 600 A in a 40-turn, 200 mm coil at 10 kHz, to a 900 °C surface
 * const r = inductionRadialHeatUp({
 *   part: { shape: "bar", radius: 0.015 },
 *   material: lowCarbonSteel,
 *   coil: { innerRadius: 0.025, length: 0.2, turns: 40 },
 *   frequency: 1e4, coilCurrentRms: 600,
 *   convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: celsius(20),
 *   duration: 120, targetTemperature: celsius(900), targetLocation: "surface",
 * });
 * console.log(r.heatingTime !== null && r.surfaceCoreDifferenceAtStop! > 0); // true
 * ```
 * @category Study
 */
export function inductionRadialHeatUp(options: InductionRadialHeatUpOptions): InductionRadialHeatUpResult {
  requireObject(WHERE, "options", options);
  requireKnownKeys(WHERE, "options", options, KNOWN);
  const part = requireObject(WHERE, "part", options.part);
  const shape = requireOneOf(WHERE, "part.shape", part["shape"], ["bar", "tube"] as const);
  requireKnownKeys(WHERE, "part", part, shape === "bar" ? ["shape", "radius"] : ["shape", "radius", "innerRadius"]);
  const radius = requirePositive(WHERE, "part.radius", part["radius"], "m");
  const bore = shape === "tube" ? requireNonNegative(WHERE, "part.innerRadius", part["innerRadius"], "m") : 0;
  if (!(bore < radius)) throw new InputError(WHERE, "part.innerRadius", bore, "m", `a finite number < part.radius (${radius})`);
  const material = requireObject(WHERE, "material", options.material) as unknown as ConductiveMaterial;
  const c = requireObject(WHERE, "coil", options.coil);
  requireKnownKeys(WHERE, "coil", c, ["innerRadius", "length", "turns"]);
  const coil: LongCoil = {
    innerRadius: requirePositive(WHERE, "coil.innerRadius", c["innerRadius"], "m"),
    length: requirePositive(WHERE, "coil.length", c["length"], "m"),
    turns: requireInteger(WHERE, "coil.turns", c["turns"], 1),
  };
  if (radius > coil.innerRadius) throw new InputError(WHERE, "part.radius", radius, "m", `a finite number ≤ coil.innerRadius (${coil.innerRadius})`);
  const ambient = requirePositive(WHERE, "ambientTemperature", options.ambientTemperature, "K");
  const initial = options.initialTemperature === undefined ? ambient : requirePositive(WHERE, "initialTemperature", options.initialTemperature, "K");

  // The drive.
  const driveAt = options.driveAt;
  let fixedFrequency = 0;
  let fixedCurrent: number | null = null;
  let heldPower: number | null = null;
  if (driveAt !== undefined) {
    if (typeof driveAt !== "function") throw new InputError(WHERE, "driveAt", driveAt, "", "a function returning { frequency, coilCurrentRms }");
    for (const key of ["frequency", "coilCurrentRms", "power"] as const) {
      if (options[key] !== undefined) throw new InputError(WHERE, key, options[key], "", "absent when driveAt is given");
    }
  } else {
    fixedFrequency = requirePositive(WHERE, "frequency", options.frequency, "Hz");
    if (options.coilCurrentRms !== undefined && options.power !== undefined) {
      throw new InputError(WHERE, "power", options.power, "W", "absent when coilCurrentRms is given");
    }
    if (options.power !== undefined) heldPower = requireNonNegative(WHERE, "power", options.power, "W");
    else fixedCurrent = requireNonNegative(WHERE, "coilCurrentRms", options.coilCurrentRms, "A");
  }
  const cells = options.cells === undefined ? 60 : requireInteger(WHERE, "cells", options.cells, 8);
  if (cells > 400) throw new InputError(WHERE, "cells", cells, "", "an integer in [8, 400]");
  const resolveStep = options.resolveStep === undefined ? 2 : requirePositive(WHERE, "resolveStep", options.resolveStep, "K");
  const duration = requirePositive(WHERE, "duration", options.duration, "s");
  const convection = requireNonNegative(WHERE, "convectionCoefficient", options.convectionCoefficient, "W/(m²·K)");
  const emissivity = requireInRange(WHERE, "emissivity", options.emissivity, "", 0, 1);
  const target = options.targetTemperature === undefined ? undefined : requirePositive(WHERE, "targetTemperature", options.targetTemperature, "K");
  const soakBand = options.soakBand === undefined ? undefined : requirePositive(WHERE, "soakBand", options.soakBand, "K");
  if (soakBand !== undefined && target === undefined) throw new InputError(WHERE, "targetTemperature", target, "K", "a finite number > 0 when soakBand is given");
  const hardening =
    options.hardeningTemperature === undefined ? undefined : requirePositive(WHERE, "hardeningTemperature", options.hardeningTemperature, "K");
  const tolerance = options.temperatureTolerance === undefined ? 0.2 : requirePositive(WHERE, "temperatureTolerance", options.temperatureTolerance, "K");
  const maxStep = options.maxTimeStep === undefined ? duration / 200 : requirePositive(WHERE, "maxTimeStep", options.maxTimeStep, "s");
  const targetLocation =
    options.targetLocation === undefined ? "mean" : requireOneOf(WHERE, "targetLocation", options.targetLocation, ["mean", "surface", "core"] as const);

  const readDrive = (state: InductionRadialState): InductionRadialDrive => {
    if (driveAt === undefined) return { frequency: fixedFrequency, coilCurrentRms: fixedCurrent ?? 0 };
    const d = driveAt(state) as unknown;
    if (typeof d !== "object" || d === null) throw new InputError(WHERE, "driveAt(…)", d, "", "an object { frequency, coilCurrentRms }");
    const o = d as Record<string, unknown>;
    const frequency = requirePositive(WHERE, "driveAt(…).frequency", o["frequency"], "Hz");
    const coilCurrentRms = requireNonNegative(WHERE, "driveAt(…).coilCurrentRms", o["coilCurrentRms"], "A");
    if (o["powerFactor"] === undefined) return { frequency, coilCurrentRms };
    return { frequency, coilCurrentRms, powerFactor: requireNonNegative(WHERE, "driveAt(…).powerFactor", o["powerFactor"], "") };
  };

  // Finest skin depth expected (cold, weak-field permeability) sets the grid refinement.
  const firstDrive = readDrive({ time: 0, surfaceTemperature: initial, coreTemperature: initial, meanTemperature: initial });
  const coldMur = relativePermeabilityAt(material, { temperature: initial });
  const coldRho = resistivityAt(material, initial);
  const finestSkin = Math.sqrt((2 * coldRho) / (2 * Math.PI * firstDrive.frequency * MU_0 * coldMur));

  const heatedLength = options.heatedLength === undefined ? coil.length : requirePositive(WHERE, "heatedLength", options.heatedLength, "m");
  const heatedArea = 2 * Math.PI * radius * heatedLength;
  const n = cells + 1; // shells = control volumes
  const rho = new Float64Array(n);
  const mur = new Float64Array(n);
  const field = new Float64Array(n);
  const lastTemps = new Float64Array(n);
  const perArea = new Float64Array(n); // W/m² per A² (last solution)
  let lastCurrent = 0;
  let lastScale = 0; // generation per (W/m² per A²): I², times the override factor
  let solved = false;
  let solutions = 0;
  let iterations = 0;
  const electrical = {
    times: [] as number[],
    power: [] as number[],
    frequency: [] as number[],
    coilCurrentRms: [] as number[],
    reflectedResistance: [] as number[],
    inductanceChange: [] as number[],
    surfacePermeability: [] as number[],
    uniformReflectedResistance: [] as number[],
  };

  const solve = (request: RadialGenerationRequest): void => {
    const temps = request.temperatures;
    const faces = request.faces;
    let volumeSum = 0;
    let weighted = 0;
    for (let i = 0; i < n; i++) {
      const a = faces[i]!;
      const b = faces[i + 1]!;
      const v = b * b - a * a;
      volumeSum += v;
      weighted += v * temps[i]!;
    }
    const drive = readDrive({
      time: request.time,
      surfaceTemperature: temps[n - 1]!,
      coreTemperature: temps[0]!,
      meanTemperature: weighted / volumeSum,
    });
    let current = drive.coilCurrentRms;
    const surfacePeakPerAmpere = (Math.SQRT2 * coil.turns) / coil.length;
    for (let i = 0; i < n; i++) {
      rho[i] = resistivityAt(material, temps[i]!);
      // first iterate: the new temperatures at the last solution's field (the surface field everywhere at the start)
      const h = solved ? (lastCurrent > 0 ? (field[i]! * current) / lastCurrent : 0) : surfacePeakPerAmpere * current;
      mur[i] = relativePermeabilityAt(material, { temperature: temps[i]!, fieldStrength: h });
    }
    const radii = faces.subarray(1, n + 1);
    let result = layeredCylinderInLongCoil({ coil, frequency: drive.frequency, innerRadius: bore, radii, resistivities: rho, relativePermeabilities: mur });
    for (let iteration = 0; iteration < 60; iteration++) {
      iterations++;
      if (heldPower !== null) current = result.reflectedResistance > 0 ? Math.sqrt(heldPower / result.reflectedResistance) : 0;
      const peak = surfacePeakPerAmpere * current;
      let change = 0;
      for (let i = 0; i < n; i++) {
        field[i] = peak * Math.sqrt(result.fieldRatios[i]! * result.fieldRatios[i + 1]!);
        const wanted = relativePermeabilityAt(material, { temperature: temps[i]!, fieldStrength: field[i]! });
        // a shell's permeability matters in proportion to the field that reaches it
        change = Math.max(change, Math.abs(wanted / mur[i]! - 1) * result.fieldRatios[i + 1]!);
        mur[i] = wanted;
      }
      if (change < 1e-3) break;
      result = layeredCylinderInLongCoil({ coil, frequency: drive.frequency, innerRadius: bore, radii, resistivities: rho, relativePermeabilities: mur });
    }
    if (heldPower !== null) current = result.reflectedResistance > 0 ? Math.sqrt(heldPower / result.reflectedResistance) : 0;
    for (let i = 0; i < n; i++) {
      perArea[i] = result.shellPowers[i]! / heatedArea;
      lastTemps[i] = temps[i]!;
    }
    lastCurrent = current;
    const factor = drive.powerFactor ?? 1;
    const power = result.reflectedResistance * current * current * factor;
    lastScale = current * current * factor;
    solved = true;
    solutions++;
    electrical.times.push(request.time);
    electrical.power.push(power);
    electrical.frequency.push(drive.frequency);
    electrical.coilCurrentRms.push(current);
    electrical.reflectedResistance.push(result.reflectedResistance);
    electrical.inductanceChange.push(result.inductanceChange);
    electrical.surfacePermeability.push(mur[n - 1]!);
    const uniform =
      bore > 0
        ? tubeInLongCoil({ coil, tube: { outerRadius: radius, innerRadius: bore, resistivity: rho[n - 1]!, relativePermeability: mur[n - 1]! }, frequency: drive.frequency })
        : barInLongCoil({ coil, bar: { radius, resistivity: rho[n - 1]!, relativePermeability: mur[n - 1]! }, frequency: drive.frequency });
    electrical.uniformReflectedResistance.push(uniform.reflectedResistance);
  };

  const generationAt = (request: RadialGenerationRequest): void => {
    let moved = !solved;
    if (!moved) {
      for (let i = 0; i < n; i++) {
        if (Math.abs(request.temperatures[i]! - lastTemps[i]!) > resolveStep) {
          moved = true;
          break;
        }
      }
    }
    if (moved) solve(request);
    for (let i = 0; i < n; i++) request.generation[i] = perArea[i]! * lastScale;
  };

  const thermal = radialHeatUp({
    geometry: "cylinder",
    radius,
    ...(bore > 0 ? { innerRadius: bore } : {}),
    generationAt,
    skinDepth: finestSkin,
    material,
    convectionCoefficient: convection,
    emissivity,
    ambientTemperature: ambient,
    initialTemperature: initial,
    duration,
    ...(target === undefined ? {} : { targetTemperature: target, stopAt: targetLocation }),
    ...(soakBand === undefined ? {} : { soakBand }),
    ...(hardening === undefined ? {} : { hardeningTemperature: hardening }),
    cells,
    temperatureTolerance: tolerance,
    maxTimeStep: maxStep,
  });

  const validity: ValidityNote[] = [...thermal.validity];
  if (coil.length < 4 * coil.innerRadius) {
    validity.push({
      code: "short-coil",
      message:
        "The coil is shorter than two diameters: the long-coil idealisation ignores the return flux and end effects and overestimates the power; the temperatures are those of the middle of a long coil.",
      value: coil.length / coil.innerRadius,
      limit: 4,
    });
  }
  const cautions: Caution[] = [...thermal.cautions];
  let hottest = 0;
  for (const v of thermal.surfaceTemperatures) hottest = Math.max(hottest, v);
  const hot = surfaceTemperatureCaution({ temperature: hottest, location: "part surface" });
  if (hot !== null) cautions.push(hot);
  const e = thermal.energy;
  return {
    ...thermal,
    validity,
    electrical,
    partEnergy: {
      input: e.input * heatedArea,
      stored: e.stored * heatedArea,
      lost: e.lost * heatedArea,
      imbalance: e.imbalance * heatedArea,
    },
    fieldSolutions: solutions,
    fieldIterations: iterations,
    cautions,
  };
}
