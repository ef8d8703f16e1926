/**
 * Reading the options of {@link inductionRadialHeatUp}: every field checked in a fixed order
 * (the first fault is the one reported), and the drive, constant or from the callback, read and
 * checked at each field solution.
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
import type { ConductiveMaterial } from "../materials/index.js";
import type { LongCoil } from "../workpiece/index.js";
import type { InductionRadialDrive, InductionRadialHeatUpOptions, InductionRadialState } from "./induction-radial-heat-up-types.js";

export const WHERE = "inductionRadialHeatUp";
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

/** The checked options, defaults filled in (all but `heatedLength`, read after the first drive). */
export interface RadialHeatUpSettings {
  /** Outer radius of the part [m]. */
  readonly radius: number;
  /** Bore radius [m] (0 for a bar). */
  readonly bore: number;
  readonly material: ConductiveMaterial;
  readonly coil: LongCoil;
  readonly ambient: number;
  readonly initial: number;
  /** The drive at a state: the callback's, checked, or the constant one. */
  readonly readDrive: (state: InductionRadialState) => InductionRadialDrive;
  /** Constant absorbed power [W], or `null` (a current or the callback drives). */
  readonly heldPower: number | null;
  readonly cells: number;
  readonly resolveStep: number;
  readonly duration: number;
  readonly convection: number;
  readonly emissivity: number;
  readonly target: number | undefined;
  readonly soakBand: number | undefined;
  readonly hardening: number | undefined;
  readonly tolerance: number;
  readonly maxStep: number;
  readonly targetLocation: "mean" | "surface" | "core";
}

/** The part and coil of the options: the bar or tube within the coil's bore. */
function readGeometry(options: InductionRadialHeatUpOptions): { radius: number; bore: number; material: ConductiveMaterial; coil: LongCoil } {
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
  return { radius, bore, material, coil };
}

/** The drive of the options: exactly one of the callback, a constant current, or a held power. */
function readDriveOptions(options: InductionRadialHeatUpOptions): { readDrive: (state: InductionRadialState) => InductionRadialDrive; heldPower: number | null } {
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
  return { readDrive, heldPower };
}

/** Checks the options of {@link inductionRadialHeatUp} and fills in the defaults (throws {@link InputError}). */
export function readRadialHeatUpOptions(options: InductionRadialHeatUpOptions): RadialHeatUpSettings {
  requireObject(WHERE, "options", options);
  requireKnownKeys(WHERE, "options", options, KNOWN);
  const { radius, bore, material, coil } = readGeometry(options);
  const ambient = requirePositive(WHERE, "ambientTemperature", options.ambientTemperature, "K");
  const initial = options.initialTemperature === undefined ? ambient : requirePositive(WHERE, "initialTemperature", options.initialTemperature, "K");
  const { readDrive, heldPower } = readDriveOptions(options);
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
  return {
    radius,
    bore,
    material,
    coil,
    ambient,
    initial,
    readDrive,
    heldPower,
    cells,
    resolveStep,
    duration,
    convection,
    emissivity,
    target,
    soakBand,
    hardening,
    tolerance,
    maxStep,
    targetLocation,
  };
}
