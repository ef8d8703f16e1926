/**
 * Shared malformed-study cases: each mutates one field of a demo study file. Used by the reader
 * test, the schema test and the CLI test.
 */
import { readFileSync } from "node:fs";
import type { HeaterDescription } from "../../src/index.js";

/**
 * A study file as read at run time: typed as a description for the study functions (which check
 * every field at run time) and as a record for reaching into it.
 */
export type StudyFileObject = HeaterDescription & Record<string, unknown>;

/** Loads a demo study file from docs/examples. */
export function loadExample(name: "study-bearing-race.json" | "study-plate-warmer.json" | "study-forging-bar.json" | "study-bearing-race-leads.json"): StudyFileObject {
  return JSON.parse(readFileSync(new URL(`../../docs/examples/${name}`, import.meta.url), "utf8")) as StudyFileObject;
}

/** Returns a deep copy of `base` with the field at `path` set to `value` (deleted when `value` is `undefined`). */
export function mutate(base: unknown, path: string, value: unknown): StudyFileObject {
  const copy = structuredClone(base) as Record<string, unknown>;
  const keys = path.split(".");
  let node = copy;
  for (const k of keys.slice(0, -1)) node = node[k] as Record<string, unknown>;
  const last = keys[keys.length - 1] as string;
  if (value === undefined) Reflect.deleteProperty(node, last);
  else node[last] = value;
  return copy as StudyFileObject;
}

/** One malformed case. */
export interface MalformedCase {
  /** Which kind of fault it is. */
  readonly fault: "missing" | "wrong type" | "wrong unit" | "out of range" | "unknown field" | "wrong variant" | "inconsistent";
  /** Which example it mutates. */
  readonly file: "study-bearing-race.json" | "study-plate-warmer.json";
  /** The field path set (or deleted). */
  readonly path: string;
  /** The new value (`undefined` deletes the field). */
  readonly value: unknown;
  /** The message the reader must give (substring). */
  readonly message: string;
  /** Whether the JSON Schema can see this fault (consistency checks are the reader's alone). */
  readonly schema: boolean;
}

const R = "study-bearing-race.json" as const;
const P = "study-plate-warmer.json" as const;

/** Every class of malformed field, across the sections of a study file. */
export const MALFORMED: readonly MalformedCase[] = [
  // missing
  { fault: "missing", file: R, path: "supply", value: undefined, message: "supply must be an object, got undefined", schema: true },
  { fault: "missing", file: R, path: "supply.voltage", value: undefined, message: "supply.voltage must be a finite number > 0 V, got undefined", schema: true },
  { fault: "missing", file: R, path: "coil.turns", value: undefined, message: "coil.turns must be an integer ≥ 1, got undefined", schema: true },
  { fault: "missing", file: R, path: "part.targetTemperature", value: undefined, message: "part.targetTemperature must be a finite number > 0 K, got undefined", schema: true },
  { fault: "missing", file: R, path: "inverter.chokeInductance", value: undefined, message: "inverter.chokeInductance must be a finite number > 0 H, got undefined", schema: true },
  { fault: "missing", file: P, path: "inverter.targetPower", value: undefined, message: "inverter.targetPower must be a finite number > 0 W, got undefined", schema: true },
  { fault: "missing", file: P, path: "coil.liftOff", value: undefined, message: "coil.liftOff must be a finite number ≥ 0 m, got undefined", schema: true },
  { fault: "missing", file: R, path: "capacitor.capacitance", value: undefined, message: "capacitor.capacitance must be a finite number > 0 F, got undefined", schema: true },
  { fault: "missing", file: R, path: "coil.conductor.wallThickness", value: undefined, message: "coil.conductor.wallThickness must be a finite number > 0 m, got undefined", schema: true },
  // wrong type
  { fault: "wrong type", file: R, path: "coil.turns", value: "six", message: "coil.turns must be an integer ≥ 1, got \"six\"", schema: true },
  { fault: "wrong type", file: R, path: "coil", value: [1, 2], message: "coil must be an object, got an array of length 2", schema: true },
  { fault: "wrong type", file: R, path: "supply.voltage", value: true, message: "supply.voltage must be a quantity text with its unit, e.g. \"24 V\", got true", schema: true },
  { fault: "wrong type", file: R, path: "title", value: 7, message: "title must be a string, got 7", schema: true },
  { fault: "wrong type", file: P, path: "coil.conductor.strands", value: 10.5, message: "coil.conductor.strands must be an integer ≥ 1, got 10.5", schema: true },
  { fault: "wrong type", file: R, path: "environment.convectionCoefficient", value: "10 W", message: "environment.convectionCoefficient must be a quantity in W/(m²·K), e.g. \"10 W/(m²·K)\", got \"10 W\"", schema: true },
  { fault: "wrong type", file: R, path: "supply.kind", value: "mains", message: "supply.kind must be one of \"battery\", \"dc-bus\", got \"mains\"", schema: true },
  { fault: "wrong type", file: R, path: "part.material", value: "unobtainium", message: "part.material must be one of", schema: true },
  // wrong unit
  { fault: "wrong unit", file: R, path: "coil.radius", value: "75 mF", message: "coil.radius must be a quantity in m, e.g. \"30 mm\", got \"75 mF\"", schema: true },
  { fault: "wrong unit", file: R, path: "capacitor.capacitance", value: "4 µH", message: "capacitor.capacitance must be a quantity in F", schema: true },
  { fault: "wrong unit", file: R, path: "part.targetTemperature", value: "120 V", message: "part.targetTemperature must be a quantity in K", schema: true },
  { fault: "wrong unit", file: R, path: "supply.voltage", value: "48 volts please", message: "supply.voltage must be a quantity in V", schema: true },
  // out of range
  { fault: "out of range", file: R, path: "coil.turns", value: 0, message: "readHeaterDescription: coil.turns must be an integer ≥ 1, got 0", schema: true },
  { fault: "out of range", file: R, path: "supply.voltage", value: -48, message: "supply.voltage must be a finite number > 0 V, got -48", schema: true },
  { fault: "out of range", file: R, path: "supply.internalResistance", value: "-1 Ω", message: "supply.internalResistance must be a finite number ≥ 0 Ω, got \"-1 Ω\"", schema: true },
  { fault: "out of range", file: R, path: "capacitor.dissipationFactor", value: 0.5, message: "capacitor.dissipationFactor must be a number in [0, 0.1], got 0.5", schema: true },
  { fault: "out of range", file: R, path: "part.emissivity", value: 0, message: "part.emissivity must be a number in (0, 1], got 0", schema: true },
  { fault: "out of range", file: R, path: "coil.radius", value: 0, message: "coil.radius must be a finite number > 0 m, got 0", schema: true },
  { fault: "out of range", file: R, path: "part.startTemperature", value: "-300 °C", message: "part.startTemperature must be a finite number > 0 K, got \"-300 °C\"", schema: false },
  // unknown field
  { fault: "unknown field", file: R, path: "coil.turn", value: 6, message: "coil.turn must be absent (not a field here", schema: true },
  { fault: "unknown field", file: R, path: "colour", value: "red", message: "colour must be absent", schema: true },
  // wrong variant
  { fault: "wrong variant", file: R, path: "inverter.frequency", value: "30 kHz", message: "inverter.frequency must be absent for a current-fed-parallel inverter", schema: true },
  { fault: "wrong variant", file: R, path: "coil.liftOff", value: "3 mm", message: "coil.liftOff must be absent for a solenoid coil", schema: true },
  { fault: "wrong variant", file: R, path: "part.thickness", value: "3 mm", message: "part.thickness must be absent for a ring part", schema: true },
  { fault: "wrong variant", file: P, path: "inverter.control", value: "fixed", message: "inverter.frequency must be a finite number > 0 Hz, got undefined", schema: true },
  { fault: "wrong variant", file: R, path: "coil.conductor.kind", value: "litz", message: "coil.conductor.wallThickness must be absent for a litz conductor", schema: true },
  // inconsistent (the reader alone)
  { fault: "inconsistent", file: R, path: "coil.length", value: "30 mm", message: "coil.length must be ≥ turns × conductor diameter", schema: false },
  { fault: "inconsistent", file: R, path: "part.targetTemperature", value: "10 °C", message: "part.targetTemperature must be > part.startTemperature", schema: false },
  { fault: "inconsistent", file: R, path: "part.targetTemperature", value: "2000 °C", message: "part.targetTemperature must be < the melting temperature", schema: false },
  { fault: "inconsistent", file: R, path: "part.outerRadius", value: "80 mm", message: "part.outerRadius must be < the coil's bore radius", schema: false },
  { fault: "inconsistent", file: R, path: "part.innerRadius", value: "70 mm", message: "part.innerRadius must be < part.outerRadius", schema: false },
  { fault: "inconsistent", file: P, path: "coil.outerRadius", value: "40 mm", message: "coil.outerRadius must be ≥ innerRadius + (turns − 1) × conductor diameter", schema: false },
  { fault: "inconsistent", file: R, path: "coil.conductor.wallThickness", value: "3 mm", message: "coil.conductor.wallThickness must be < outerDiameter / 2", schema: false },
];
