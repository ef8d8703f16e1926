/**
 * Reading and validating heater descriptions (study files): text quantities through the units
 * module, defaults filled in, every problem reported with its field path.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys } from "../core/index.js";
import { conductiveMaterials, inventedExampleFerrite, inventedExampleIronPowder } from "../materials/index.js";
import type { ConductiveMaterial, CoreMaterial } from "../materials/index.js";
import { checkConductiveMaterial } from "../materials/check-material.js";
import { celsius, formatQuantity, parseQuantity, ZERO_CELSIUS } from "../units/index.js";
import { canonicalUnit } from "../units/unit-symbols.js";

const WHERE = "readHeaterDescription";

/** The supply with every field resolved to SI numbers. @category Heater study */
export interface ResolvedSupply {
  /** Source kind. */
  readonly kind: "battery" | "dc-bus";
  /** Open-circuit voltage [V]. */
  readonly voltage: number;
  /** Internal resistance [Ω]. */
  readonly internalResistance: number;
  /** Current limit [A], `null` when none was given. */
  readonly currentLimit: number | null;
}

/** A resolved current-fed parallel inverter. @category Heater study */
export interface ResolvedCurrentFedInverter {
  /** Topology tag. */
  readonly kind: "current-fed-parallel";
  /** Choke inductance [H]. */
  readonly chokeInductance: number;
  /** Switch on-resistance [Ω]. */
  readonly switchOnResistance: number;
  /** Switch voltage rating [V], `null` when not given. */
  readonly switchVoltageRating: number | null;
}

/** A resolved voltage-fed series inverter. @category Heater study */
export interface ResolvedSeriesInverter {
  /** Topology tag. */
  readonly kind: "voltage-fed-series";
  /** Bridge type. */
  readonly bridge: "half" | "full";
  /** Frequency control. */
  readonly control: "fixed" | "power-tracking";
  /** Fixed switching frequency [Hz] (`null` with power tracking). */
  readonly frequency: number | null;
  /** Target power [W] (`null` at fixed frequency). */
  readonly targetPower: number | null;
  /** Switch on-resistance [Ω]. */
  readonly switchOnResistance: number;
  /** Switch voltage rating [V], `null` when not given. */
  readonly switchVoltageRating: number | null;
}

/** A resolved inverter. @category Heater study */
export type ResolvedInverter = ResolvedCurrentFedInverter | ResolvedSeriesInverter;

/** A resolved solid round wire. @category Heater study */
export interface ResolvedSolidConductor {
  /** Conductor type tag. */
  readonly kind: "solid";
  /** Wire diameter [m]. */
  readonly diameter: number;
  /** Conductor material. */
  readonly material: ConductiveMaterial;
}

/** A resolved litz wire. @category Heater study */
export interface ResolvedLitzConductor {
  /** Conductor type tag. */
  readonly kind: "litz";
  /** Number of strands. */
  readonly strands: number;
  /** Strand diameter [m]. */
  readonly strandDiameter: number;
  /** Bundle outer diameter [m]. */
  readonly outerDiameter: number;
  /** Conductor material. */
  readonly material: ConductiveMaterial;
}

/** A resolved hollow tube. @category Heater study */
export interface ResolvedTubeConductor {
  /** Conductor type tag. */
  readonly kind: "tube";
  /** Outer diameter [m]. */
  readonly outerDiameter: number;
  /** Wall thickness [m]. */
  readonly wallThickness: number;
  /** Conductor material. */
  readonly material: ConductiveMaterial;
}

/** A resolved conductor. @category Heater study */
export type ResolvedConductor = ResolvedSolidConductor | ResolvedLitzConductor | ResolvedTubeConductor;

/** Fields every resolved coil has. @category Heater study */
export interface ResolvedCoilCommon {
  /** Number of turns. */
  readonly turns: number;
  /** The conductor. */
  readonly conductor: ResolvedConductor;
  /** Lead length [m]. */
  readonly leadLength: number;
  /** Conductor working temperature [K]. */
  readonly temperature: number;
}

/** A resolved solenoid coil. @category Heater study */
export interface ResolvedSolenoidCoil extends ResolvedCoilCommon {
  /** Coil shape tag. */
  readonly shape: "solenoid";
  /** Radius to the conductor centres [m]. */
  readonly radius: number;
  /** Winding length [m]. */
  readonly length: number;
}

/** A resolved pancake coil. @category Heater study */
export interface ResolvedPancakeCoil extends ResolvedCoilCommon {
  /** Coil shape tag. */
  readonly shape: "pancake";
  /** Radius of the innermost turn's centre [m]. */
  readonly innerRadius: number;
  /** Radius of the outermost turn's centre [m]. */
  readonly outerRadius: number;
  /** Gap from the conductor face to the part [m]. */
  readonly liftOff: number;
}

/** A resolved coil. @category Heater study */
export type ResolvedCoil = ResolvedSolenoidCoil | ResolvedPancakeCoil;

/** A resolved capacitor bank. @category Heater study */
export interface ResolvedCapacitorBank {
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** Dissipation factor tan δ. */
  readonly dissipationFactor: number;
  /** RMS voltage rating [V] or `null`. */
  readonly voltageRatingRms: number | null;
  /** RMS current rating [A] or `null`. */
  readonly currentRatingRms: number | null;
}

/** A resolved concentrator. @category Heater study */
export interface ResolvedConcentrator {
  /** Core material (with its id). */
  readonly material: CoreMaterial;
  /** The material id as written. */
  readonly materialId: string;
  /** Flux cross-section [m²]. */
  readonly crossSectionArea: number;
  /** Volume [m³]. */
  readonly volume: number;
}

/** Fields every resolved part has. @category Heater study */
export interface ResolvedPartCommon {
  /** The material set. */
  readonly material: ConductiveMaterial;
  /** Start temperature [K]. */
  readonly startTemperature: number;
  /** Target temperature [K]. */
  readonly targetTemperature: number;
  /** Emissivity. */
  readonly emissivity: number;
  /** What the target applies to (absent: `"mean"`). */
  readonly targetLocation?: "mean" | "surface" | "core";
  /** Soak band [K] (absent: no soak). */
  readonly soakBand?: number;
  /** Hardening temperature [K] (absent: none). */
  readonly hardeningTemperature?: number;
  /**
   * A part given as r–z rectangles (`shape: "rectangles"` in the description): its
   * cross-section [m]. The part's shape fields then describe its bounding bar, tube or plate,
   * which the closed-form surrogate of the field model uses.
   */
  readonly rectangles?: readonly ResolvedRectangle[];
}

/** A resolved r–z rectangle [m]. @category Heater study */
export interface ResolvedRectangle {
  /** Inner radius [m]. */
  readonly rMin: number;
  /** Outer radius [m]. */
  readonly rMax: number;
  /** Lower axial position [m]. */
  readonly zMin: number;
  /** Upper axial position [m]. */
  readonly zMax: number;
}

/** A resolved flux concentrator of the field model. @category Heater study */
export interface ResolvedFieldConcentrator {
  /** Name. */
  readonly name: string;
  /** Cross-section [m]. */
  readonly rectangles: readonly ResolvedRectangle[];
  /** Relative permeability. */
  readonly relativePermeability: number;
  /** Resistivity [Ω·m], `null` for a non-conductor. */
  readonly resistivity: number | null;
}

/** A resolved bar. @category Heater study */
export interface ResolvedBarPart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "bar";
  /** Radius [m]. */
  readonly radius: number;
  /** Length [m]. */
  readonly length: number;
}

/** A resolved tube. @category Heater study */
export interface ResolvedTubePart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "tube";
  /** Outer radius [m]. */
  readonly outerRadius: number;
  /** Wall thickness [m]. */
  readonly wallThickness: number;
  /** Length [m]. */
  readonly length: number;
}

/** A resolved ring. @category Heater study */
export interface ResolvedRingPart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "ring";
  /** Outer radius [m]. */
  readonly outerRadius: number;
  /** Inner radius [m]. */
  readonly innerRadius: number;
  /** Axial height [m]. */
  readonly height: number;
}

/** A resolved plate. @category Heater study */
export interface ResolvedPlatePart extends ResolvedPartCommon {
  /** Part shape tag. */
  readonly shape: "plate";
  /** Length [m]. */
  readonly length: number;
  /** Width [m]. */
  readonly width: number;
  /** Thickness [m]. */
  readonly thickness: number;
}

/** A resolved part. @category Heater study */
export type ResolvedPart = ResolvedBarPart | ResolvedTubePart | ResolvedRingPart | ResolvedPlatePart;

/** Resolved surroundings. @category Heater study */
export interface ResolvedEnvironment {
  /** Ambient temperature [K]. */
  readonly ambientTemperature: number;
  /** Convection coefficient [W/(m²·K)]. */
  readonly convectionCoefficient: number;
}

/**
 * A heater description with every quantity an SI number, every default filled in and every
 * material id replaced by its property set: what {@link readHeaterDescription} returns.
 *
 * @category Heater study
 */
export interface ResolvedHeaterDescription {
  /** Title for reports. */
  readonly title: string;
  /** Supply. */
  readonly supply: ResolvedSupply;
  /** Inverter. */
  readonly inverter: ResolvedInverter;
  /** Coil. */
  readonly coil: ResolvedCoil;
  /** Capacitor bank. */
  readonly capacitor: ResolvedCapacitorBank;
  /** Concentrator or `null`. */
  readonly concentrator: ResolvedConcentrator | null;
  /** Flux concentrators as r–z rectangles (field model); absent when none are given. */
  readonly concentrators?: readonly ResolvedFieldConcentrator[];
  /** Part. */
  readonly part: ResolvedPart;
  /** Environment. */
  readonly environment: ResolvedEnvironment;
}

/**
 * Thrown by {@link readHeaterDescription} when a description has problems: an
 * {@link InputError} for the first problem (its `parameter` is the field path, e.g.
 * `"coil.turns"`), carrying all of them in `problems`.
 *
 * @category Heater study
 */
export class HeaterDescriptionError extends InputError {
  /** Every problem found, in document order (the first is this error's own). */
  readonly problems: readonly InputError[];

  /**
   * @param problems - the problems found (at least one)
   */
  constructor(problems: readonly InputError[]) {
    const first = problems[0] as InputError;
    super(first.where, first.parameter, first.value, first.unit, first.expected);
    this.name = "HeaterDescriptionError";
    this.problems = problems;
  }
}

/** Material ids accepted for parts and conductors (the materials catalogue). */
const MATERIAL_IDS = conductiveMaterials.map((m) => m.id);
const CONDUCTOR_IDS = ["copper", "aluminium", "silver"];
const CORE_MATERIALS: Readonly<Record<string, CoreMaterial>> = {
  inventedExampleFerrite,
  inventedExampleIronPowder,
};

/** Problems collected before the reader stops (a huge malformed file would list millions). */
const MAX_PROBLEMS = 200;
/** Text that is only a number: it says nothing of its unit. */
const BARE_NUMBER_TEXT = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/u;
/** Lengths in inches or mils (`"1.25 in"`, `"40 mil"`), which the units module converts exactly (1 in = 25.4 mm). */
const INCH_TEXT = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(in|inch|inches|mil|mils)\s*$/u;

/** The unit a person would most likely write for each SI unit, for examples in messages. */
const EXAMPLE_UNIT: Readonly<Record<string, string>> = {
  m: "mm", F: "µF", H: "µH", V: "V", Ω: "mΩ", A: "A", Hz: "kHz", W: "W", K: "°C", "m²": "cm²", "m³": "cm³", "W/(m²·K)": "W/(m²·K)",
};

/** An example text for a quantity in `unit`. */
function unitExample(unit: string): string {
  return { m: "30 mm", F: "4.7 µF", H: "200 µH", V: "24 V", Ω: "10 mΩ", A: "50 A", Hz: "25 kHz", W: "1.5 kW", K: "20 °C", "m²": "6 cm²", "m³": "30 cm³", "W/(m²·K)": "10 W/(m²·K)", "": "0.5" }[unit] ?? "1";
}

/** The message for a bare number where a unit is needed: shows the fix with the number as written. */
function bareNumberFix(value: number, unit: string): string {
  const likely = EXAMPLE_UNIT[unit] ?? unit;
  const written = Number.isFinite(value) ? String(value) : "1";
  const alternative = likely === unit ? "" : ` or "${written} ${unit}"`;
  return `a quantity with its unit, e.g. "${written} ${likely}"${alternative} (a bare number has no unit in a study file)`;
}

/**
 * A limit for a message, in the unit the user wrote for the field (`"30 mm"` → mm, `"850 °C"`
 * → °C, `"1.25 in"` → in), else with an SI prefix; 4 significant digits, the unit after the number.
 */
function limitText(value: number, unit: string, written: unknown): string {
  const digits = (x: number): string => String(Number(x.toPrecision(4)));
  if (!Number.isFinite(value)) return String(value);
  if (typeof written === "string") {
    const inch = INCH_TEXT.exec(written);
    if (inch !== null && unit === "m") {
      const mil = inch[2]?.startsWith("mil") === true;
      return `${digits(value / (mil ? 2.54e-5 : 0.0254))} ${mil ? "mil" : "in"}`;
    }
    const suffix = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*(\S.*?)\s*$/u.exec(written)?.[1];
    if (suffix !== undefined) {
      if (unit === "K" && canonicalUnit(suffix) === "°C") return `${digits(value - ZERO_CELSIUS)} °C`;
      try {
        const scale = parseQuantity(`1 ${suffix}`, unit);
        if (unit !== "K" && scale > 0) return `${digits(value / scale)} ${suffix}`;
      } catch {
        // not a unit we can scale to: fall through to the prefixed SI form
      }
    }
  }
  if (unit === "K") return `${digits(value - ZERO_CELSIUS)} °C`;
  return formatQuantity(value, unit, { digits: 4 });
}

/** The reader: converts and checks fields, recording problems instead of stopping at the first. */
class Reader {
  readonly problems: InputError[] = [];

  /** Refuse bare numbers for quantities with a dimension (study files). */
  constructor(readonly requireUnits = false) {}

  fail(path: string, value: unknown, unit: string, expected: string): number {
    this.problems.push(new InputError(WHERE, path, value, unit, expected));
    // bounded work on huge malformed input: stop collecting after MAX_PROBLEMS
    if (this.problems.length >= MAX_PROBLEMS) {
      this.problems.push(new InputError(WHERE, "(description)", `more than ${MAX_PROBLEMS} problems`, "", `fixed first: reading stopped after ${MAX_PROBLEMS} problems`));
      throw new HeaterDescriptionError(this.problems);
    }
    return Number.NaN;
  }

  object(path: string, value: unknown, known: readonly string[]): Record<string, unknown> | undefined {
    if (typeof value !== "object" || value === null || Array.isArray(value)) {
      this.fail(path, value, "", "an object");
      return undefined;
    }
    const record = value as Record<string, unknown>;
    for (const key of Object.keys(record)) {
      if (!known.includes(key)) {
        this.fail(`${path === "" ? "" : `${path}.`}${key}`, record[key], "", `absent (not a field here; known fields: ${known.join(", ")})`);
      }
    }
    return record;
  }

  oneOf<const T extends string>(path: string, value: unknown, allowed: readonly T[]): T | undefined {
    if (typeof value !== "string" || !(allowed as readonly string[]).includes(value)) {
      this.fail(path, value, "", `one of ${allowed.map((a) => JSON.stringify(a)).join(", ")}`);
      return undefined;
    }
    return value as T;
  }

  /**
   * A quantity: text with a unit (`"30 mm"`, `"1.25 in"`, `"850 °C"`), or a number in SI. With
   * `requireUnits` (study files) a bare number is refused where the field has a dimension; text
   * that is only a number (`"2.2"`) is refused everywhere a unit is expected. NaN after a problem.
   */
  quantity(path: string, value: unknown, unit: string, check: "positive" | "non-negative" | "finite", required = true): number {
    if (value === undefined) {
      return required ? this.fail(path, value, unit, check === "positive" ? "a finite number > 0" : "a finite number ≥ 0") : Number.NaN;
    }
    let v: number;
    if (typeof value === "number") {
      if (this.requireUnits && unit !== "") return this.fail(path, value, "", bareNumberFix(value, unit));
      v = value;
    } else if (typeof value === "string") {
      if (unit !== "" && BARE_NUMBER_TEXT.test(value)) return this.fail(path, value, "", bareNumberFix(Number(value.trim()), unit));
      const inch = unit === "m" ? INCH_TEXT.exec(value) : null;
      try {
        v = inch === null ? parseQuantity(value, unit) : (Number(inch[1]) * 254) / (inch[2]?.startsWith("mil") === true ? 1e7 : 1e4);
      } catch (e) {
        if (!(e instanceof InputError)) throw e;
        // a well-formed temperature below absolute zero: out of range, not unreadable
        if (e.expected.includes("absolute zero")) return this.fail(path, value, unit, check === "positive" ? "a finite number > 0" : "a finite number ≥ 0");
        const example = unitExample(unit);
        return this.fail(path, value, "", unit === "" ? `a number, e.g. "${example}"` : `a quantity in ${unit}, e.g. "${example}"`);
      }
    } else {
      return this.fail(path, value, "", unit === "" ? "a number" : `a quantity text with its unit, e.g. "${unitExample(unit)}"`);
    }
    if (!Number.isFinite(v)) return this.fail(path, value, unit, "a finite number");
    if (check === "positive" && !(v > 0)) return this.fail(path, value, unit, "a finite number > 0");
    if (check === "non-negative" && !(v >= 0)) return this.fail(path, value, unit, "a finite number ≥ 0");
    return v;
  }

  optional(path: string, value: unknown, unit: string, check: "positive" | "non-negative", fallback: number): number {
    return value === undefined ? fallback : this.quantity(path, value, unit, check);
  }

  optionalOrNull(path: string, value: unknown, unit: string): number | null {
    return value === undefined ? null : this.quantity(path, value, unit, "positive");
  }

  integer(path: string, value: unknown, min: number): number {
    if (typeof value !== "number" || !Number.isInteger(value) || value < min) return this.fail(path, value, "", `an integer ≥ ${min}`);
    return value;
  }

  ratio(path: string, value: unknown, min: number, max: number, openLow: boolean, fallback: number): number {
    if (value === undefined) return fallback;
    const v = value;
    if (typeof v !== "number" || !Number.isFinite(v) || (openLow ? !(v > min) : !(v >= min)) || !(v <= max)) {
      return this.fail(path, value, "", `a number in ${openLow ? "(" : "["}${min}, ${max}]`);
    }
    return v;
  }

  material(path: string, value: unknown, allowed: readonly string[]): ConductiveMaterial | undefined {
    // a material set passed in code (e.g. the exported `lowCarbonSteel`, or one of the caller's own)
    if (typeof value === "object" && value !== null && !Array.isArray(value)) {
      // checked field by field, so that a caller's own set fails here with its path, not later
      try {
        return checkConductiveMaterial(WHERE, path, value);
      } catch (e) {
        if (!(e instanceof InputError)) throw e;
        this.fail(e.parameter, e.value, e.unit, e.expected);
        return undefined;
      }
    }
    const id = this.oneOf(path, value, allowed);
    return id === undefined ? undefined : conductiveMaterials.find((m) => m.id === id);
  }
}

function readConductor(rd: Reader, path: string, value: unknown): ResolvedConductor | undefined {
  const o = rd.object(path, value, ["kind", "diameter", "strands", "strandDiameter", "outerDiameter", "wallThickness", "material"]);
  if (o === undefined) return undefined;
  const kind = rd.oneOf(`${path}.kind`, o.kind, ["solid", "litz", "tube"] as const);
  const material = o.material === undefined ? conductiveMaterials.find((m) => m.id === "copper") : rd.material(`${path}.material`, o.material, CONDUCTOR_IDS);
  const extra = (allowed: readonly string[]): void => {
    for (const key of ["diameter", "strands", "strandDiameter", "outerDiameter", "wallThickness"]) {
      if (!allowed.includes(key) && o[key] !== undefined) rd.fail(`${path}.${key}`, o[key], "", `absent for a ${String(kind)} conductor`);
    }
  };
  if (kind === "solid") {
    extra(["diameter"]);
    const diameter = rd.quantity(`${path}.diameter`, o.diameter, "m", "positive");
    return material === undefined ? undefined : { kind, diameter, material };
  }
  if (kind === "litz") {
    extra(["strands", "strandDiameter", "outerDiameter"]);
    const strands = rd.integer(`${path}.strands`, o.strands, 1);
    const strandDiameter = rd.quantity(`${path}.strandDiameter`, o.strandDiameter, "m", "positive");
    // default bundle diameter: copper area over a packing factor of 0.5 (common practice for served litz)
    const packed = strandDiameter * Math.sqrt(strands / 0.5);
    const outerDiameter = rd.optional(`${path}.outerDiameter`, o.outerDiameter, "m", "positive", packed);
    if (outerDiameter < strandDiameter * Math.sqrt(strands) * (1 - 1e-12)) {
      rd.fail(`${path}.outerDiameter`, o.outerDiameter, "", `≥ strandDiameter × √strands = ${limitText(strandDiameter * Math.sqrt(strands), "m", o.outerDiameter)}`);
    }
    return material === undefined ? undefined : { kind, strands, strandDiameter, outerDiameter, material };
  }
  if (kind === "tube") {
    extra(["outerDiameter", "wallThickness"]);
    const outerDiameter = rd.quantity(`${path}.outerDiameter`, o.outerDiameter, "m", "positive");
    const wallThickness = rd.quantity(`${path}.wallThickness`, o.wallThickness, "m", "positive");
    if (wallThickness * 2 >= outerDiameter) rd.fail(`${path}.wallThickness`, o.wallThickness, "", `< outerDiameter / 2 = ${limitText(outerDiameter / 2, "m", o.wallThickness)}`);
    return material === undefined ? undefined : { kind, outerDiameter, wallThickness, material };
  }
  return undefined;
}

/** Outer diameter of a resolved conductor [m]. */
export function conductorOuterDiameter(conductor: ResolvedConductor): number {
  return conductor.kind === "solid" ? conductor.diameter : conductor.outerDiameter;
}

function readCoil(rd: Reader, value: unknown): ResolvedCoil | undefined {
  const o = rd.object("coil", value, ["shape", "radius", "length", "turns", "innerRadius", "outerRadius", "liftOff", "conductor", "leadLength", "temperature"]);
  if (o === undefined) return undefined;
  const shape = rd.oneOf("coil.shape", o.shape, ["solenoid", "pancake"] as const);
  const turns = rd.integer("coil.turns", o.turns, 1);
  const conductor = readConductor(rd, "coil.conductor", o.conductor);
  const leadLength = rd.optional("coil.leadLength", o.leadLength, "m", "non-negative", 0);
  const temperature = rd.optional("coil.temperature", o.temperature, "K", "positive", celsius(40));
  const d = conductor === undefined ? Number.NaN : conductorOuterDiameter(conductor);
  const forbid = (keys: readonly string[]): void => {
    for (const key of keys) if (o[key] !== undefined) rd.fail(`coil.${key}`, o[key], "", `absent for a ${String(shape)} coil`);
  };
  if (shape === "solenoid") {
    forbid(["innerRadius", "outerRadius", "liftOff"]);
    const radius = rd.quantity("coil.radius", o.radius, "m", "positive");
    const length = rd.quantity("coil.length", o.length, "m", "positive");
    if (length / turns < d * (1 - 1e-12)) rd.fail("coil.length", o.length, "", `≥ turns × conductor diameter = ${limitText(turns * d, "m", o.length)} (turns would overlap)`);
    if (radius < (d / 2) * (1 - 1e-12)) rd.fail("coil.radius", o.radius, "", `≥ half the conductor diameter = ${limitText(d / 2, "m", o.radius)}`);
    return conductor === undefined ? undefined : { shape, radius, length, turns, conductor, leadLength, temperature };
  }
  if (shape === "pancake") {
    forbid(["radius", "length"]);
    const innerRadius = rd.quantity("coil.innerRadius", o.innerRadius, "m", "positive");
    const outerRadius = rd.quantity("coil.outerRadius", o.outerRadius, "m", "positive");
    const liftOff = rd.quantity("coil.liftOff", o.liftOff, "m", "non-negative");
    if (turns > 1 && !(outerRadius > innerRadius)) rd.fail("coil.outerRadius", o.outerRadius, "", `> coil.innerRadius = ${limitText(innerRadius, "m", o.outerRadius)}`);
    if (turns > 1 && (outerRadius - innerRadius) / (turns - 1) < d * (1 - 1e-12)) {
      rd.fail("coil.outerRadius", o.outerRadius, "", `≥ innerRadius + (turns − 1) × conductor diameter = ${limitText(innerRadius + (turns - 1) * d, "m", o.outerRadius)} (turns would overlap)`);
    }
    if (innerRadius < (d / 2) * (1 - 1e-12)) rd.fail("coil.innerRadius", o.innerRadius, "", `≥ half the conductor diameter = ${limitText(d / 2, "m", o.innerRadius)}`);
    return conductor === undefined ? undefined : { shape, innerRadius, outerRadius, turns, liftOff, conductor, leadLength, temperature };
  }
  return undefined;
}

function readInverter(rd: Reader, value: unknown): ResolvedInverter | undefined {
  const o = rd.object("inverter", value, ["kind", "chokeInductance", "switchOnResistance", "switchVoltageRating", "bridge", "control", "frequency", "targetPower"]);
  if (o === undefined) return undefined;
  const kind = rd.oneOf("inverter.kind", o.kind, ["current-fed-parallel", "voltage-fed-series"] as const);
  const switchOnResistance = rd.quantity("inverter.switchOnResistance", o.switchOnResistance, "Ω", "non-negative");
  const switchVoltageRating = rd.optionalOrNull("inverter.switchVoltageRating", o.switchVoltageRating, "V");
  if (kind === "current-fed-parallel") {
    for (const key of ["bridge", "control", "frequency", "targetPower"]) {
      if (o[key] !== undefined) rd.fail(`inverter.${key}`, o[key], "", "absent for a current-fed-parallel inverter (it runs at the tank's own frequency)");
    }
    const chokeInductance = rd.quantity("inverter.chokeInductance", o.chokeInductance, "H", "positive");
    return { kind, chokeInductance, switchOnResistance, switchVoltageRating };
  }
  if (kind === "voltage-fed-series") {
    if (o.chokeInductance !== undefined) rd.fail("inverter.chokeInductance", o.chokeInductance, "", "absent for a voltage-fed-series inverter");
    const bridge = rd.oneOf("inverter.bridge", o.bridge, ["half", "full"] as const);
    const control = rd.oneOf("inverter.control", o.control, ["fixed", "power-tracking"] as const);
    let frequency: number | null = null;
    let targetPower: number | null = null;
    if (control === "fixed") {
      frequency = rd.quantity("inverter.frequency", o.frequency, "Hz", "positive");
      if (o.targetPower !== undefined) rd.fail("inverter.targetPower", o.targetPower, "", "absent with fixed-frequency control");
    } else if (control === "power-tracking") {
      targetPower = rd.quantity("inverter.targetPower", o.targetPower, "W", "positive");
      if (o.frequency !== undefined) rd.fail("inverter.frequency", o.frequency, "", "absent with power-tracking control (the study finds it)");
    }
    if (bridge === undefined || control === undefined) return undefined;
    return { kind, bridge, control, frequency, targetPower, switchOnResistance, switchVoltageRating };
  }
  return undefined;
}

function readPart(rd: Reader, value: unknown, ambient: number): ResolvedPart | undefined {
  const o = rd.object("part", value, [
    "shape", "material", "startTemperature", "targetTemperature", "emissivity", "targetLocation", "soakBand", "hardeningTemperature",
    "radius", "length", "outerRadius", "wallThickness", "innerRadius", "height", "width", "thickness", "rectangles",
  ]);
  if (o === undefined) return undefined;
  const shape = rd.oneOf("part.shape", o.shape, ["bar", "tube", "ring", "plate", "rectangles"] as const);
  const material = rd.material("part.material", o.material, MATERIAL_IDS);
  const startTemperature = rd.optional("part.startTemperature", o.startTemperature, "K", "positive", ambient);
  const targetTemperature = rd.quantity("part.targetTemperature", o.targetTemperature, "K", "positive");
  if (targetTemperature <= startTemperature) rd.fail("part.targetTemperature", o.targetTemperature, "", `> part.startTemperature = ${limitText(startTemperature, "K", o.targetTemperature)}`);
  if (material !== undefined && targetTemperature >= material.meltingTemperature) {
    rd.fail("part.targetTemperature", o.targetTemperature, "", `< the melting temperature of ${material.name} = ${limitText(material.meltingTemperature, "K", o.targetTemperature)}`);
  }
  const emissivity = rd.ratio("part.emissivity", o.emissivity, 0, 1, true, material?.emissivity.typical ?? 0.5);
  const fields: Record<string, readonly string[]> = {
    bar: ["radius", "length"],
    tube: ["outerRadius", "wallThickness", "length"],
    ring: ["outerRadius", "innerRadius", "height"],
    plate: ["length", "width", "thickness"],
    rectangles: ["rectangles"],
  };
  if (shape !== undefined) {
    const mine = fields[shape] ?? [];
    for (const key of ["radius", "length", "outerRadius", "wallThickness", "innerRadius", "height", "width", "thickness", "rectangles"]) {
      if (!mine.includes(key) && o[key] !== undefined) rd.fail(`part.${key}`, o[key], "", `absent for a ${shape} part`);
    }
  }
  const dim = (key: string): number => rd.quantity(`part.${key}`, o[key], "m", "positive");
  if (material === undefined || shape === undefined) {
    if (shape === "rectangles") readRectangles(rd, "part.rectangles", o.rectangles);
    else if (shape !== undefined) for (const key of fields[shape] ?? []) dim(key);
    return undefined;
  }
  const radialShape = shape === "bar" || shape === "tube";
  const targetLocation = o.targetLocation === undefined ? undefined : rd.oneOf("part.targetLocation", o.targetLocation, ["mean", "surface", "core"] as const);
  if (!radialShape && targetLocation !== undefined && targetLocation !== "mean") rd.fail("part.targetLocation", o.targetLocation, "", `"mean" for a ${shape} part (surface and core: bars and tubes)`);
  const soakBand = o.soakBand === undefined ? undefined : rd.quantity("part.soakBand", o.soakBand, "K", "positive");
  const hardeningTemperature = o.hardeningTemperature === undefined ? undefined : rd.quantity("part.hardeningTemperature", o.hardeningTemperature, "K", "positive");
  for (const [key, v] of [["soakBand", soakBand], ["hardeningTemperature", hardeningTemperature]] as const) {
    if (!radialShape && v !== undefined) rd.fail(`part.${key}`, o[key], "K", `absent for a ${shape} part (bars and tubes only)`);
  }
  const common = {
    material,
    startTemperature,
    targetTemperature,
    emissivity,
    ...(targetLocation === undefined ? {} : { targetLocation }),
    ...(soakBand === undefined ? {} : { soakBand }),
    ...(hardeningTemperature === undefined ? {} : { hardeningTemperature }),
  };
  switch (shape) {
    case "bar":
      return { ...common, shape, radius: dim("radius"), length: dim("length") };
    case "tube": {
      const outerRadius = dim("outerRadius");
      const wallThickness = dim("wallThickness");
      if (wallThickness >= outerRadius) rd.fail("part.wallThickness", o.wallThickness, "", `< part.outerRadius = ${limitText(outerRadius, "m", o.wallThickness)}`);
      return { ...common, shape, outerRadius, wallThickness, length: dim("length") };
    }
    case "ring": {
      const outerRadius = dim("outerRadius");
      const innerRadius = dim("innerRadius");
      if (innerRadius >= outerRadius) rd.fail("part.innerRadius", o.innerRadius, "", `< part.outerRadius = ${limitText(outerRadius, "m", o.innerRadius)}`);
      return { ...common, shape, outerRadius, innerRadius, height: dim("height") };
    }
    case "plate":
      return { ...common, shape, length: dim("length"), width: dim("width"), thickness: dim("thickness") };
    case "rectangles": {
      // the bounding bar or tube stands in for the closed-form surrogate; under a pancake coil
      // the caller turns it into the bounding plate
      const rectangles = readRectangles(rd, "part.rectangles", o.rectangles);
      if (rectangles === undefined) return undefined;
      const b = rectangleBounds(rectangles);
      return b.rMin > 0
        ? { ...common, shape: "tube", outerRadius: b.rMax, wallThickness: b.rMax - b.rMin, length: b.zMax - b.zMin, rectangles }
        : { ...common, shape: "bar", radius: b.rMax, length: b.zMax - b.zMin, rectangles };
    }
  }
}

/** Bounding box of rectangles. */
function rectangleBounds(rectangles: readonly ResolvedRectangle[]): ResolvedRectangle {
  return {
    rMin: Math.min(...rectangles.map((x) => x.rMin)),
    rMax: Math.max(...rectangles.map((x) => x.rMax)),
    zMin: Math.min(...rectangles.map((x) => x.zMin)),
    zMax: Math.max(...rectangles.map((x) => x.zMax)),
  };
}

/** A list of r–z rectangles (at least one, each with rMax > rMin ≥ 0 and zMax > zMin, none overlapping another), or undefined after a problem. */
function readRectangles(rd: Reader, path: string, value: unknown): ResolvedRectangle[] | undefined {
  if (!Array.isArray(value) || value.length === 0) {
    rd.fail(path, value, "", "a non-empty array of rectangles { rMin, rMax, zMin, zMax }");
    return undefined;
  }
  const out: ResolvedRectangle[] = [];
  let ok = true;
  (value as unknown[]).forEach((item, k) => {
    const p = `${path}[${k}]`;
    const o = rd.object(p, item, ["rMin", "rMax", "zMin", "zMax"]);
    if (o === undefined) {
      ok = false;
      return;
    }
    const rMin = rd.quantity(`${p}.rMin`, o.rMin, "m", "non-negative");
    const rMax = rd.quantity(`${p}.rMax`, o.rMax, "m", "positive");
    const zMin = rd.quantity(`${p}.zMin`, o.zMin, "m", "finite");
    const zMax = rd.quantity(`${p}.zMax`, o.zMax, "m", "finite");
    if (![rMin, rMax, zMin, zMax].every(Number.isFinite)) {
      ok = false;
      return;
    }
    if (!(rMax > rMin)) {
      rd.fail(`${p}.rMax`, o.rMax, "", `> ${p}.rMin = ${limitText(rMin, "m", o.rMin)}`);
      ok = false;
    }
    if (!(zMax > zMin)) {
      rd.fail(`${p}.zMax`, o.zMax, "", `> ${p}.zMin = ${limitText(zMin, "m", o.zMin)}`);
      ok = false;
    }
    out.push({ rMin, rMax, zMin, zMax });
  });
  if (!ok) return undefined;
  for (let i = 0; i < out.length; i++) {
    for (let j = i + 1; j < out.length; j++) {
      const a = out[i]!;
      const b = out[j]!;
      if (Math.min(a.rMax, b.rMax) > Math.max(a.rMin, b.rMin) && Math.min(a.zMax, b.zMax) > Math.max(a.zMin, b.zMin)) {
        rd.fail(`${path}[${j}]`, value[j], "", `a rectangle that does not overlap ${path}[${i}]`);
        return undefined;
      }
    }
  }
  return out;
}

/** Flux concentrators of the field model, or undefined after a problem. */
function readFieldConcentrators(rd: Reader, value: unknown): ResolvedFieldConcentrator[] | undefined {
  if (!Array.isArray(value)) {
    rd.fail("concentrators", value, "", "an array of concentrators { rectangles, relativePermeability, resistivity? }");
    return undefined;
  }
  const out: ResolvedFieldConcentrator[] = [];
  (value as unknown[]).forEach((item, k) => {
    const p = `concentrators[${k}]`;
    const o = rd.object(p, item, ["name", "rectangles", "relativePermeability", "resistivity"]);
    if (o === undefined) return;
    const name = o.name === undefined ? `concentrator${k + 1}` : typeof o.name === "string" && o.name !== "" ? o.name : (rd.fail(`${p}.name`, o.name, "", "a non-empty string"), "");
    if (out.some((c) => c.name === name)) rd.fail(`${p}.name`, o.name, "", "a name unique among the concentrators");
    const rectangles = readRectangles(rd, `${p}.rectangles`, o.rectangles);
    const mur = o.relativePermeability;
    if (typeof mur !== "number" || !Number.isFinite(mur) || mur < 1 || mur > 1e6) rd.fail(`${p}.relativePermeability`, mur, "", "a number from 1 to 1e6");
    const resistivity = o.resistivity === undefined ? null : rd.quantity(`${p}.resistivity`, o.resistivity, "Ω·m", "positive");
    if (rectangles !== undefined && typeof mur === "number") out.push({ name, rectangles, relativePermeability: mur, resistivity });
  });
  return out;
}

/**
 * Options of {@link readHeaterDescription}.
 *
 * @category Heater study
 */
export interface ReadHeaterDescriptionOptions {
  /**
   * Refuse a bare number for a quantity with a dimension (`"radius": 32` must be written
   * `"32 mm"`), as study files must: the command line reads files this way. Default `false`:
   * descriptions built in code may give SI numbers.
   */
  readonly requireUnits?: boolean;
}

/**
 * Reads a heater description (a parsed study file, or an object built in code) and returns it
 * resolved: quantities as SI numbers (text such as `"30 mm"`, `"4.7 µF"` or `"20 °C"` is read
 * with `parseQuantity` in the field's unit), defaults filled in, material ids replaced by their
 * property sets. Every field is checked, and nothing is returned from a half-valid description:
 * all problems are collected and thrown together.
 *
 * Checks, each reported with the field's path (`coil.turns`, `part.targetTemperature`): missing
 * required fields, wrong types, text in the wrong unit (`"30 mF"` for a length), values out of
 * range (negative, zero where > 0 is needed, non-integer turns), unknown fields (a typo such as
 * `coil.turn`), fields that do not belong to the chosen variant (a `frequency` for a
 * self-oscillating inverter), and consistency (overlapping turns, a part that does not fit in
 * the coil, a target at or below the start temperature or at or above the melting point, a
 * coil shape that cannot heat the part shape: a solenoid takes bars, tubes and rings; a
 * pancake coil takes plates).
 *
 * @param input - the description (e.g. `JSON.parse` of a study file)
 * @param options - `requireUnits: true` refuses bare numbers for quantities with a dimension
 * @returns the resolved description
 * @throws {@link HeaterDescriptionError} (an {@link InputError} whose `parameter` is the field
 * path of the first problem and whose `problems` lists them all), e.g.
 * `readHeaterDescription: coil.turns must be an integer ≥ 1, got 0`
 * @example
 * ```ts
 * import { readHeaterDescription } from "fluxwright";
 * try {
 *   readHeaterDescription({ supply: { kind: "battery", voltage: "24 V" } });
 * } catch (e) {
 *   console.log((e as Error).message); // readHeaterDescription: inverter must be an object, got undefined
 * }
 * ```
 * @category Heater study
 */
export function readHeaterDescription(input: unknown, options: ReadHeaterDescriptionOptions = {}): ResolvedHeaterDescription {
  requireKnownKeys(WHERE, "options", options, ["requireUnits"]);
  if (options.requireUnits !== undefined && typeof options.requireUnits !== "boolean") throw new InputError(WHERE, "options.requireUnits", options.requireUnits, "", "a boolean");
  const rd = new Reader(options.requireUnits === true);
  const top = rd.object("", input, ["$schema", "title", "notes", "supply", "inverter", "coil", "capacitor", "concentrator", "part", "environment", "concentrators"]);
  if (top === undefined) throw new HeaterDescriptionError([new InputError(WHERE, "description", input, "", "an object")]);
  if (top.title !== undefined && typeof top.title !== "string") rd.fail("title", top.title, "", "a string");
  if (top.notes !== undefined && typeof top.notes !== "string") rd.fail("notes", top.notes, "", "a string");

  // supply
  const so = rd.object("supply", top.supply, ["kind", "voltage", "internalResistance", "currentLimit"]);
  let supply: ResolvedSupply | undefined;
  if (so !== undefined) {
    const kind = rd.oneOf("supply.kind", so.kind, ["battery", "dc-bus"] as const);
    const voltage = rd.quantity("supply.voltage", so.voltage, "V", "positive");
    const internalResistance = rd.optional("supply.internalResistance", so.internalResistance, "Ω", "non-negative", 0);
    const currentLimit = rd.optionalOrNull("supply.currentLimit", so.currentLimit, "A");
    if (kind !== undefined) supply = { kind, voltage, internalResistance, currentLimit };
  }
  const inverter = readInverter(rd, top.inverter);
  const coil = readCoil(rd, top.coil);

  // capacitor bank
  const co = rd.object("capacitor", top.capacitor, ["capacitance", "dissipationFactor", "voltageRatingRms", "currentRatingRms"]);
  let capacitor: ResolvedCapacitorBank | undefined;
  if (co !== undefined) {
    capacitor = {
      capacitance: rd.quantity("capacitor.capacitance", co.capacitance, "F", "positive"),
      // 5e-4: polypropylene film capacitors at tens of kHz (common practice)
      dissipationFactor: rd.ratio("capacitor.dissipationFactor", co.dissipationFactor, 0, 0.1, false, 5e-4),
      voltageRatingRms: rd.optionalOrNull("capacitor.voltageRatingRms", co.voltageRatingRms, "V"),
      currentRatingRms: rd.optionalOrNull("capacitor.currentRatingRms", co.currentRatingRms, "A"),
    };
  }

  // concentrator
  let concentrator: ResolvedConcentrator | null = null;
  if (top.concentrator !== undefined) {
    const cc = rd.object("concentrator", top.concentrator, ["material", "crossSectionArea", "volume"]);
    if (cc !== undefined) {
      const given = cc.material;
      const isCore = typeof given === "object" && given !== null && typeof (given as Partial<CoreMaterial>).steinmetz === "object";
      const id = isCore ? ((given as CoreMaterial).name) : rd.oneOf("concentrator.material", given, Object.keys(CORE_MATERIALS));
      const crossSectionArea = rd.quantity("concentrator.crossSectionArea", cc.crossSectionArea, "m²", "positive");
      const volume = rd.quantity("concentrator.volume", cc.volume, "m³", "positive");
      const material = isCore ? (given as CoreMaterial) : id === undefined ? undefined : CORE_MATERIALS[id];
      if (material !== undefined && id !== undefined) concentrator = { material, materialId: id, crossSectionArea, volume };
    }
    if (coil !== undefined && coil.shape !== "pancake") rd.fail("concentrator", top.concentrator, "", "absent for a solenoid coil (concentrators are modelled behind pancake coils only)");
  }

  // environment (read before the part: the start temperature defaults to the ambient)
  let environment: ResolvedEnvironment = { ambientTemperature: celsius(20), convectionCoefficient: 10 };
  if (top.environment !== undefined) {
    const eo = rd.object("environment", top.environment, ["ambientTemperature", "convectionCoefficient"]);
    if (eo !== undefined) {
      environment = {
        ambientTemperature: rd.optional("environment.ambientTemperature", eo.ambientTemperature, "K", "positive", celsius(20)),
        convectionCoefficient: rd.optional("environment.convectionCoefficient", eo.convectionCoefficient, "W/(m²·K)", "non-negative", 10),
      };
    }
  }
  let part = readPart(rd, top.part, environment.ambientTemperature);
  const concentrators = top.concentrators === undefined ? undefined : readFieldConcentrators(rd, top.concentrators);

  // coil and part together
  if (coil !== undefined && part?.rectangles !== undefined && coil.shape === "pancake") {
    // a part of rectangles under a pancake coil: its bounding plate stands in for the surrogate
    const b = rectangleBounds(part.rectangles);
    const { rectangles, material, startTemperature, targetTemperature, emissivity } = part;
    part = { material, startTemperature, targetTemperature, emissivity, shape: "plate", length: 2 * b.rMax, width: 2 * b.rMax, thickness: b.zMax - b.zMin, rectangles };
  }
  if (coil !== undefined && part !== undefined) {
    if (coil.shape === "solenoid" && part.shape === "plate") rd.fail("part.shape", part.shape, "", `"bar", "tube" or "ring" inside a solenoid coil`);
    if (coil.shape === "pancake" && part.shape !== "plate") rd.fail("part.shape", part.shape, "", `"plate" under a pancake coil`);
    if (coil.shape === "solenoid" && part.shape !== "plate") {
      const outer = part.shape === "bar" ? part.radius : part.outerRadius;
      const bore = coil.radius - conductorOuterDiameter(coil.conductor) / 2;
      const key = part.shape === "bar" ? "radius" : "outerRadius";
      const written = (top.part as Record<string, unknown>)[key];
      if (outer >= bore) rd.fail(`part.${key}`, written, "", `< the coil's bore radius (coil.radius − conductor diameter / 2) = ${limitText(bore, "m", written)}`);
    }
  }

  if (rd.problems.length > 0) throw new HeaterDescriptionError(rd.problems);
  if (supply === undefined || inverter === undefined || coil === undefined || capacitor === undefined || part === undefined) {
    // unreachable: a missing piece always records a problem
    throw new HeaterDescriptionError([new InputError(WHERE, "description", input, "", "a complete heater description")]);
  }
  return {
    title: typeof top.title === "string" ? top.title : "heater study",
    supply,
    inverter,
    coil,
    capacitor,
    concentrator,
    part,
    environment,
    ...(concentrators === undefined ? {} : { concentrators }),
  };
}
