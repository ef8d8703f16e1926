/**
 * The section readers of {@link readHeaterDescription}: conductor, coil, inverter and part,
 * each with the checks that tie its own fields together.
 *
 * @packageDocumentation
 */
import { conductiveMaterials } from "../materials/index.js";
import { celsius } from "../units/index.js";
import { CONDUCTOR_IDS, limitText, MATERIAL_IDS, Reader } from "./description-reader.js";
import { conductorOuterDiameter } from "./resolved-description.js";
import type { ResolvedCoil, ResolvedConductor, ResolvedFieldConcentrator, ResolvedInverter, ResolvedLeads, ResolvedPart, ResolvedRectangle } from "./resolved-description.js";

export function readConductor(rd: Reader, path: string, value: unknown): ResolvedConductor | undefined {
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

/**
 * The leads' cross-section (`coil.leads`), or `null` when absent; `conductor` is the coil's
 * (a round pair continues it), `leadLength` must be > 0 when a cross-section is given.
 */
export function readLeads(rd: Reader, value: unknown, conductor: ResolvedConductor | undefined, leadLength: number, leadLengthInput: unknown): ResolvedLeads | null | undefined {
  if (value === undefined) return null;
  const o = rd.object("coil.leads", value, ["shape", "spacing", "width", "thickness", "gap", "innerDiameter", "innerWallThickness", "returnInnerDiameter", "returnWallThickness", "material"]);
  if (o === undefined) return undefined;
  if (!(leadLength > 0)) rd.fail("coil.leadLength", leadLengthInput, "", "> 0 when coil.leads is given (the leads' total length, both together)");
  const shape = rd.oneOf("coil.leads.shape", o.shape, ["round-pair", "flat-pair", "coaxial"] as const);
  const coaxialKeys = ["innerDiameter", "innerWallThickness", "returnInnerDiameter", "returnWallThickness"];
  const forbid = (keys: readonly string[]): void => {
    for (const key of keys) if (o[key] !== undefined) rd.fail(`coil.leads.${key}`, o[key], "", `absent for ${String(shape)} leads`);
  };
  if (shape === "round-pair") {
    forbid(["width", "thickness", "gap", "material", ...coaxialKeys]);
    const spacing = rd.quantity("coil.leads.spacing", o.spacing, "m", "positive");
    if (conductor !== undefined) {
      const d = conductorOuterDiameter(conductor);
      if (!(spacing > d)) rd.fail("coil.leads.spacing", o.spacing, "", `> the conductor's outer diameter = ${limitText(d, "m", o.spacing)} (the leads would touch)`);
    }
    return { shape, spacing };
  }
  if (shape === "flat-pair") {
    forbid(["spacing", ...coaxialKeys]);
    const width = rd.quantity("coil.leads.width", o.width, "m", "positive");
    const thickness = rd.quantity("coil.leads.thickness", o.thickness, "m", "positive");
    const gap = rd.quantity("coil.leads.gap", o.gap, "m", "positive");
    const material = o.material === undefined ? conductor?.material : rd.material("coil.leads.material", o.material, CONDUCTOR_IDS);
    return material === undefined ? undefined : { shape, width, thickness, gap, material };
  }
  if (shape === "coaxial") {
    forbid(["spacing", "width", "thickness", "gap"]);
    return readCoaxialLeads(rd, o, conductor);
  }
  return undefined;
}

/** Coaxial leads (`coil.leads` with `shape: "coaxial"`): the inner conductor inside the return tube, without touching. */
function readCoaxialLeads(rd: Reader, o: Record<string, unknown>, conductor: ResolvedConductor | undefined): ResolvedLeads | undefined {
  const innerDiameter = rd.quantity("coil.leads.innerDiameter", o.innerDiameter, "m", "positive");
  const innerWallThickness = o.innerWallThickness === undefined ? innerDiameter / 2 : rd.quantity("coil.leads.innerWallThickness", o.innerWallThickness, "m", "positive");
  if (innerWallThickness > innerDiameter / 2) rd.fail("coil.leads.innerWallThickness", o.innerWallThickness, "", `≤ innerDiameter / 2 = ${limitText(innerDiameter / 2, "m", o.innerWallThickness)}`);
  const returnInnerDiameter = rd.quantity("coil.leads.returnInnerDiameter", o.returnInnerDiameter, "m", "positive");
  if (!(returnInnerDiameter > innerDiameter)) rd.fail("coil.leads.returnInnerDiameter", o.returnInnerDiameter, "", `> innerDiameter = ${limitText(innerDiameter, "m", o.returnInnerDiameter)} (the conductors would touch)`);
  const returnWallThickness = rd.quantity("coil.leads.returnWallThickness", o.returnWallThickness, "m", "positive");
  const material = o.material === undefined ? conductor?.material : rd.material("coil.leads.material", o.material, CONDUCTOR_IDS);
  return material === undefined ? undefined : { shape: "coaxial", innerDiameter, innerWallThickness, returnInnerDiameter, returnWallThickness, material };
}

export function readCoil(rd: Reader, value: unknown): ResolvedCoil | undefined {
  const o = rd.object("coil", value, ["shape", "radius", "length", "turns", "innerRadius", "outerRadius", "liftOff", "conductor", "leadLength", "leads", "temperature"]);
  if (o === undefined) return undefined;
  const shape = rd.oneOf("coil.shape", o.shape, ["solenoid", "pancake"] as const);
  const turns = rd.integer("coil.turns", o.turns, 1);
  const conductor = readConductor(rd, "coil.conductor", o.conductor);
  const leadLength = rd.optional("coil.leadLength", o.leadLength, "m", "non-negative", 0);
  const leads = readLeads(rd, o.leads, conductor, leadLength, o.leadLength);
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
    return conductor === undefined || leads === undefined ? undefined : { shape, radius, length, turns, conductor, leadLength, leads, temperature };
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
    return conductor === undefined || leads === undefined ? undefined : { shape, innerRadius, outerRadius, turns, liftOff, conductor, leadLength, leads, temperature };
  }
  return undefined;
}

export function readInverter(rd: Reader, value: unknown): ResolvedInverter | undefined {
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

export function readPart(rd: Reader, value: unknown, ambient: number): ResolvedPart | undefined {
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
export function rectangleBounds(rectangles: readonly ResolvedRectangle[]): ResolvedRectangle {
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
export function readFieldConcentrators(rd: Reader, value: unknown): ResolvedFieldConcentrator[] | undefined {
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

