/**
 * The study's field model (`studyHeater(…, { model: "field" })`): the coil's own impedance and
 * the part's coupling from the axisymmetric eddy-current solver (`solveAxisymmetricField`),
 * solved at anchor temperatures and carried between them as a correction of the operating
 * point's surrogate.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { solveAxisymmetricField } from "../field/index.js";
import type { AxisymmetricFieldCoil, AxisymmetricFieldResult, FieldRegion, FieldShape } from "../field/index.js";
import { coilProperties, useOutsideCoilModel } from "./operating-point.js";
import type { CoilProperties, CoilState, OutsideCoilModel } from "./operating-point.js";
import type { ResolvedHeaterDescription } from "./read-description.js";

/**
 * Target relative error of the field solutions the study asks for (`accuracy` of
 * `solveAxisymmetricField`): 1e-2. The solver's first two meshes usually meet it already (their
 * estimated error was 1.5–2.5e-3 on the example designs).
 */
export const STUDY_FIELD_ACCURACY = 1e-2;

/**
 * Largest relative move of the operating frequency or the part's permeability between the field
 * solution of an anchor and the operating point it serves before the anchor is solved again
 * (at most {@link FIELD_ANCHOR_RESOLVES} solutions per anchor): 1 %.
 */
export const FIELD_ANCHOR_MOVE = 0.01;

/** Solutions per anchor temperature at most (the first at the iteration's first estimate). */
export const FIELD_ANCHOR_RESOLVES = 3;

/**
 * Largest relative distance in frequency between an empty-coil operating point and the empty
 * field solution whose correction it uses: 5 %.
 */
export const FIELD_EMPTY_FREQUENCY_SPAN = 0.05;

/**
 * The r–z cross-sections the field model gives the solver: the coil's turns and the part, in
 * the study's frame (solenoid: coil centred at z = 0; pancake: the plate's top face at z = 0).
 */
export interface HeaterFieldGeometry {
  /** The coil at 1 A RMS. */
  readonly coil: AxisymmetricFieldCoil;
  /** The part as one or more regions (material filled in per solution). */
  readonly part: readonly FieldShape[];
  /** Passive regions with their own material (concentrators). */
  readonly passive: readonly FieldRegion[];
  /** Whether the coil's own loss comes from the closed form (litz: the solver's stranded turns carry a uniform current). */
  readonly closedFormCopper: boolean;
}

/** Gap the solver needs between a round conductor's bounding square and any other body: radius/1000, doubled as a margin. */
const ROUND_GAP = 2e-3;

/**
 * The field solver's geometry of a study's coil and part, checked for what the solver cannot
 * mesh (turns that touch, a part reaching into the turns).
 *
 * @throws {@link InputError} naming the coil or part when the arrangement cannot be meshed
 */
export function heaterFieldGeometry(d: ResolvedHeaterDescription, props: CoilProperties): HeaterFieldGeometry {
  const coil = d.coil;
  const c = coil.conductor;
  const radius = props.conductorDiameter / 2;
  const innerRadius = c.kind === "tube" ? radius - c.wallThickness : 0;
  const circle = (r: number, z: number): FieldShape => (innerRadius > 0 ? { kind: "circle", r, z, radius, innerRadius } : { kind: "circle", r, z, radius });
  const turns: FieldShape[] = [];
  let partShapes: FieldShape[];
  if (coil.shape === "solenoid") {
    const pitch = coil.length / coil.turns;
    if (coil.turns > 1 && !(pitch > 2 * radius * (1 + ROUND_GAP))) {
      throw new InputError("studyHeater", "coil.length", coil.length, "m", `a winding length above turns × conductor diameter × ${1 + ROUND_GAP} = ${coil.turns * 2 * radius * (1 + ROUND_GAP)} m with model "field" (the solver needs a gap between round turns)`);
    }
    for (let i = 0; i < coil.turns; i++) turns.push(circle(coil.radius, -coil.length / 2 + (i + 0.5) * pitch));
    const part = d.part;
    if (part.shape === "plate") throw new InputError("studyHeater", "part.shape", part.shape, "", "a bar, tube or ring inside a solenoid");
    const outer = part.rectangles !== undefined ? Math.max(...part.rectangles.map((x) => x.rMax)) : part.shape === "bar" ? part.radius : part.outerRadius;
    const bore = part.shape === "bar" ? 0 : part.shape === "tube" ? part.outerRadius - part.wallThickness : part.innerRadius;
    const length = part.shape === "ring" ? part.height : part.length;
    const clear = coil.radius - radius * (1 + ROUND_GAP);
    if (!(outer < clear)) {
      throw new InputError("studyHeater", "part", outer, "m", `a part whose outer radius is below the turns' inner edge, ${clear} m, with model "field"`);
    }
    partShapes = part.rectangles !== undefined ? part.rectangles.map((x) => ({ kind: "rectangle", ...x })) : [{ kind: "rectangle", rMin: bore, rMax: outer, zMin: -length / 2, zMax: length / 2 }];
  } else {
    const part = d.part;
    if (part.shape !== "plate") throw new InputError("studyHeater", "part.shape", part.shape, "", "a plate under a pancake coil");
    const pitch = coil.turns > 1 ? (coil.outerRadius - coil.innerRadius) / (coil.turns - 1) : Infinity;
    if (coil.turns > 1 && !(pitch > 2 * radius * (1 + ROUND_GAP))) {
      throw new InputError("studyHeater", "coil.outerRadius", coil.outerRadius, "m", `a turn pitch above the conductor diameter × ${1 + ROUND_GAP} with model "field" (the solver needs a gap between round turns)`);
    }
    if (!(coil.innerRadius > radius * (1 + ROUND_GAP))) {
      throw new InputError("studyHeater", "coil.innerRadius", coil.innerRadius, "m", `an inner turn clear of the axis (> ${radius * (1 + ROUND_GAP)} m) with model "field"`);
    }
    if (!(coil.liftOff > radius * ROUND_GAP)) {
      throw new InputError("studyHeater", "coil.liftOff", coil.liftOff, "m", `a lift-off above ${radius * ROUND_GAP} m with model "field" (the solver needs a gap between the turns and the plate)`);
    }
    for (let i = 0; i < coil.turns; i++) turns.push(circle(coil.innerRadius + i * (coil.turns > 1 ? pitch : 0), coil.liftOff + radius));
    // the plate as a disc of its half-span (the coil-impedance model's choice, too)
    partShapes = part.rectangles !== undefined ? part.rectangles.map((x) => ({ kind: "rectangle", ...x })) : [{ kind: "rectangle", rMin: 0, rMax: Math.min(part.length, part.width) / 2, zMin: -part.thickness, zMax: 0 }];
  }
  const passive: FieldRegion[] = [];
  for (const c of d.concentrators ?? []) {
    c.rectangles.forEach((x, k) => {
      passive.push({ name: `${c.name}#${k}`, shape: { kind: "rectangle", ...x }, relativePermeability: c.relativePermeability, ...(c.resistivity === null ? {} : { resistivity: c.resistivity }) });
    });
  }
  // rectangles must keep clear of each turn's bounding square (the solver's rule for round conductors)
  const named: [string, FieldShape][] = [
    ...(d.part.rectangles !== undefined ? partShapes.map((x, k): [string, FieldShape] => [`part.rectangles[${k}]`, x]) : []),
    ...(d.concentrators ?? []).flatMap((c, i) => c.rectangles.map((x, k): [string, FieldShape] => [`concentrators[${i}].rectangles[${k}]`, { kind: "rectangle", ...x }])),
  ];
  for (const [path, x] of named) {
    if (x.kind !== "rectangle") continue;
    for (const t of turns) {
      if (t.kind !== "circle") continue;
      const gap = Math.max(x.rMin - (t.r + t.radius), t.r - t.radius - x.rMax, x.zMin - (t.z + t.radius), t.z - t.radius - x.zMax);
      if (!(gap > t.radius * ROUND_GAP)) {
        throw new InputError("studyHeater", path, gap, "m", `a rectangle clear of the square around each turn (r = ${t.r} m, z = ${t.z} m, half-side ${t.radius} m) by more than ${t.radius * ROUND_GAP} m`);
      }
    }
  }
  const closedFormCopper = c.kind === "litz";
  // litz: stranded turns with the resistivity that gives the bundle the copper's DC resistance
  const resistivity = c.kind === "litz" ? (props.resistivity * radius * radius) / (c.strands * (c.strandDiameter / 2) ** 2) : props.resistivity;
  return {
    coil: { name: "coil", current: 1, turns, resistivity, model: c.kind === "litz" ? "stranded" : "solid" },
    part: partShapes,
    passive,
    closedFormCopper,
  };
}

/** One field solution's coil state (leads excluded), at 1 A: own conductor, part and concentrator (eddy) losses [Ω], inductance [H]. */
interface FieldState {
  readonly copper: number;
  readonly part: number;
  readonly passive: number;
  readonly L: number;
}

/** Correction of the surrogate to the field solution: resistances by factors, inductances by offsets. */
interface FieldCorrection {
  readonly copper: number;
  readonly part: number;
  readonly L: number;
  readonly emptyL: number;
}

/** A loaded anchor: the field solution at one part temperature. */
interface LoadedAnchor {
  readonly temperature: number;
  frequency: number;
  relativePermeability: number;
  correction: FieldCorrection;
  solves: number;
  result: AxisymmetricFieldResult;
}

/** An empty-coil field solution at one frequency. */
interface EmptyAnchor {
  readonly frequency: number;
  readonly state: FieldState;
}

/** Counters of the field model's work. */
export interface FieldModelWork {
  /** Field solutions run (empty and loaded). */
  solves: number;
  /** Wall time spent in them [s]. */
  seconds: number;
  /** Largest mesh solved (nodes). */
  largestMesh: number;
  /** Largest estimated error of a solution. */
  largestEstimatedError: number;
}

/** The prepared field model of one study. */
export interface HeaterFieldModel {
  readonly geometry: HeaterFieldGeometry;
  /** The closed-form model's coil properties (tier `"cells"`), whose operating point starts each anchor's. */
  readonly seedProperties: CoilProperties;
  /** `"anchor"`: solve the field at each temperature asked for; `"interpolate"`: carry the anchors' corrections linearly in temperature. */
  mode: "anchor" | "interpolate";
  readonly work: FieldModelWork;
  /** The loaded anchors by temperature, ascending after {@link HeaterFieldModel.anchorList}. */
  anchorList(): readonly { temperature: number; frequency: number; relativePermeability: number; solves: number }[];
  /** The last loaded field solution at a temperature (1 A RMS in the coil), or `null`. */
  solutionAt(temperature: number): AxisymmetricFieldResult | null;
}

/** Validity note of the field model. */
export function fieldModelNote(): ValidityNote {
  return {
    code: "field-model",
    message: `The coil's own resistance and inductance, empty and with the part, and the part's coupling come from the axisymmetric field solver (solveAxisymmetricField, accuracy ${STUDY_FIELD_ACCURACY}: each turn a closed coaxial ring, helical pitch and leads ignored, the part with uniform ρ and μr at its temperature and the coil's surface field). The field is solved at anchor temperatures (at each anchor's own operating point, again when the frequency or permeability moves by more than ${FIELD_ANCHOR_MOVE * 100} %); between anchors the field solution's correction of the closed-form surrogate is interpolated linearly in temperature. Litz: the solver's turns carry a uniform current, the winding's own loss is the closed form's (litzAcRatio). Concentrators given as r–z rectangles have linear μr; the eddy-current loss of a conducting one is counted with the coil's loss. Against solveAxisymmetricField called directly at the operating point: within ${FIELD_ANCHOR_ERROR * 100} % at an anchor and ${FIELD_INTERPOLATION_ERROR * 100} % between anchors (on top of the solver's estimated error).`,
  };
}

function cheapFactor(a: number, b: number): number {
  return b > 0 ? a / b : 1;
}

/**
 * Prepares the field model of a study and attaches it to `props` (tier `"field"`), so that
 * every operating point solved with `props` uses it.
 */
export function prepareHeaterFieldModel(d: ResolvedHeaterDescription, props: CoilProperties, accuracy: number = STUDY_FIELD_ACCURACY): HeaterFieldModel {
  const geometry = heaterFieldGeometry(d, props);
  const work: FieldModelWork = { solves: 0, seconds: 0, largestMesh: 0, largestEstimatedError: 0 };
  const loaded = new Map<number, LoadedAnchor>();
  const empties: EmptyAnchor[] = [];
  const solve = (frequency: number, resistivity: number, relativePermeability: number, withPart: boolean): { state: FieldState; result: AxisymmetricFieldResult } => {
    const started = performance.now();
    const regions: FieldRegion[] = [...geometry.passive];
    if (withPart) {
      geometry.part.forEach((shape, k) => {
        regions.push({ name: `part${k}`, shape, resistivity, relativePermeability });
      });
    }
    const result = solveAxisymmetricField({ frequency, coils: [geometry.coil], regions, accuracy });
    work.solves++;
    work.seconds += (performance.now() - started) / 1000;
    work.largestMesh = Math.max(work.largestMesh, result.mesh.nodes);
    work.largestEstimatedError = Math.max(work.largestEstimatedError, result.estimatedError);
    const coil = result.coils.coil;
    if (coil === undefined) throw new RangeError("unreachable: the coil's result is missing");
    let part = 0;
    if (withPart) for (let k = 0; k < geometry.part.length; k++) part += result.regions[`part${k}`]?.losses ?? 0;
    let passive = 0;
    for (const p of geometry.passive) passive += result.regions[p.name]?.losses ?? 0;
    return { state: { copper: coil.losses, part, passive, L: coil.inductance }, result };
  };
  const emptyAt = (frequency: number): FieldState => {
    let best: EmptyAnchor | null = null;
    for (const e of empties) if (best === null || Math.abs(Math.log(e.frequency / frequency)) < Math.abs(Math.log(best.frequency / frequency))) best = e;
    if (best !== null && Math.abs(Math.log(best.frequency / frequency)) <= FIELD_EMPTY_FREQUENCY_SPAN) return best.state;
    const s = solve(frequency, 1, 1, false).state;
    empties.push({ frequency, state: s });
    return s;
  };
  // the coil's loss: its own conductor's (litz: the closed form's) and the concentrators' eddy currents
  const copperOf = (field: FieldState, cheap: CoilState): number => (geometry.closedFormCopper ? cheap.copper : field.copper) + field.passive;
  const correctionAt = (temperature: number): FieldCorrection | null => {
    const list = [...loaded.values()].sort((a, b) => a.temperature - b.temperature);
    if (list.length === 0) return null;
    const first = list[0]!;
    const last = list[list.length - 1]!;
    if (temperature <= first.temperature) return first.correction;
    if (temperature >= last.temperature) return last.correction;
    for (let i = 0; i + 1 < list.length; i++) {
      const a = list[i]!;
      const b = list[i + 1]!;
      if (temperature >= a.temperature && temperature <= b.temperature) {
        const u = (temperature - a.temperature) / (b.temperature - a.temperature);
        const mix = (x: number, y: number): number => x + (y - x) * u;
        return { copper: mix(a.correction.copper, b.correction.copper), part: mix(a.correction.part, b.correction.part), L: mix(a.correction.L, b.correction.L), emptyL: mix(a.correction.emptyL, b.correction.emptyL) };
      }
    }
    return last.correction;
  };
  const apply = (cheap: CoilState, c: FieldCorrection): CoilState => ({ copper: cheap.copper * c.copper, part: cheap.part * c.part, L: cheap.L + c.L, emptyL: cheap.emptyL + c.emptyL });
  const model: HeaterFieldModel = {
    geometry,
    seedProperties: coilProperties(d, "cells"),
    mode: "anchor",
    work,
    anchorList() {
      return [...loaded.values()].sort((a, b) => a.temperature - b.temperature).map((a) => ({ temperature: a.temperature, frequency: a.frequency, relativePermeability: a.relativePermeability, solves: a.solves }));
    },
    solutionAt(temperature) {
      return loaded.get(temperature)?.result ?? null;
    },
  };
  const outside: OutsideCoilModel = {
    notes: [fieldModelNote()],
    state(frequency, resistivity, relativePermeability, withPart, partTemperature, cheap) {
      if (!withPart) {
        const e = emptyAt(frequency);
        const copper = copperOf(e, cheap);
        return { copper, part: 0, L: e.L, emptyL: e.L };
      }
      const anchor = loaded.get(partTemperature);
      const moved = (a: LoadedAnchor): boolean =>
        Math.abs(Math.log(frequency / a.frequency)) > FIELD_ANCHOR_MOVE || Math.abs(Math.log(relativePermeability / a.relativePermeability)) > FIELD_ANCHOR_MOVE;
      if (anchor !== undefined && (!moved(anchor) || anchor.solves >= FIELD_ANCHOR_RESOLVES)) return apply(cheap, anchor.correction);
      if (anchor === undefined && model.mode === "interpolate") {
        const c = correctionAt(partTemperature);
        if (c !== null) return apply(cheap, c);
      }
      const { state, result } = solve(frequency, resistivity, relativePermeability, true);
      const empty = emptyAt(frequency);
      const exact: CoilState = { copper: copperOf(state, cheap), part: state.part, L: state.L, emptyL: empty.L };
      const correction: FieldCorrection = {
        copper: cheapFactor(exact.copper, cheap.copper),
        part: cheapFactor(exact.part, cheap.part),
        L: exact.L - cheap.L,
        emptyL: exact.emptyL - cheap.emptyL,
      };
      loaded.set(partTemperature, { temperature: partTemperature, frequency, relativePermeability, correction, solves: (anchor?.solves ?? 0) + 1, result });
      return exact;
    },
  };
  useOutsideCoilModel(props, outside);
  return model;
}

/**
 * The field model's part loss and inductance at an anchor's operating point against
 * `solveAxisymmetricField` called directly there (the anchor was solved within
 * {@link FIELD_ANCHOR_MOVE} of that point), on top of both solutions' estimated errors:
 * 0.1 % (measured 0.011 % and 0.007 % on the bearing-race ring, test/study/study-heater-field.test.ts).
 */
export const FIELD_ANCHOR_ERROR = 0.001;

/**
 * The field model's part loss between anchors (the correction interpolated linearly in
 * temperature) against `solveAxisymmetricField` called directly at that operating point, on
 * top of the direct solution's estimated error: 1 % (measured on a steel bar heated through
 * Curie at the points farthest from an anchor: 0.27 % below the transition, 0.77 % inside it,
 * 0.02 % above it; test/study/study-heater-field.test.ts).
 */
export const FIELD_INTERPOLATION_ERROR = 0.01;
