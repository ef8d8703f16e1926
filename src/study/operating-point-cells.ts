/**
 * The coil-impedance tier of the operating point: the study's coil and part as a
 * `prepareWorkCoil` model, reduced once per geometry over the study's frequency band, and the
 * end-effect factor of a part shorter than the coil, with the validity notes that state their
 * measured errors.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { skinDepth } from "../conductors/index.js";
import { resistivityAt } from "../materials/index.js";
import { MU_0 } from "../units/index.js";
import { prepareWorkCoil } from "../workpiece/index.js";
import { nonMagneticWeight, prepareShortPartFactor, shortPartFactorData, shortPartSection, shortPartTier } from "../workpiece/work-coil-short-part.js";
import type { ShortPartFactorData } from "../workpiece/work-coil-short-part.js";
import { reducedWorkCoilData, reducedWorkCoilFromData } from "../workpiece/work-coil-impedance.js";
import type { ReducedWorkCoilData } from "../workpiece/work-coil-impedance.js";
import type { PreparedWorkCoil, ReducedWorkCoil, WorkCoilConductor, WorkCoilPart, WorkCoilPancake, WorkCoilSolenoid } from "../workpiece/index.js";
import { SHORT_PART_ERROR, STUDY_COIL_REFINEMENT } from "./operating-point-accuracy.js";
import type { CoilProperties, CoilState } from "./operating-point-types.js";
import type { ResolvedHeaterDescription } from "./read-description.js";

/** The validity note of a part shorter than the coil at an operating point (coil-impedance tier): the measured error bound that applies. */
export function shortPartNote(d: ResolvedHeaterDescription, frequency: number, resistivity: number, relativePermeability: number, note: ValidityNote): ValidityNote {
  const part = d.part;
  const radial = part.shape === "bar" ? part.radius : part.shape === "tube" ? part.wallThickness : part.shape === "ring" ? part.outerRadius - part.innerRadius : part.thickness;
  const length = part.shape === "ring" ? part.height : part.shape === "plate" ? Infinity : part.length;
  const section = shortPartSection(radial, 0, length);
  const delta = skinDepth({ resistivity, frequency, relativePermeability });
  const depths = section / delta;
  const flux = section / (relativePermeability * delta);
  const tierName = shortPartTier(section, delta, relativePermeability);
  const tier = SHORT_PART_ERROR[tierName];
  const range =
    tierName !== "outside"
      ? `here the part's thinnest section (radial section or half its length) is ${depths.toPrecision(3)} skin depths and ${flux.toPrecision(2)} × μr·δ, where the field solver puts it within ${+(100 * tier.resistance).toPrecision(3)} % (the part's loss at a given coil current) and ${+(100 * tier.inductance).toPrecision(3)} % of the empty coil's inductance (ΔL)`
      : `here the part's thinnest section (radial section or half its length) is only ${flux.toPrecision(2)} × μr·δ (flux crosses the whole section, which a surface impedance cannot hold; the model needs ≥ 0.15): outside the model's range, where the field solver found errors up to ${tier.resistance} × (the part's loss) and ${+(100 * tier.inductance).toPrecision(3)} % of the empty coil's inductance; use the field model for this part`;
  return {
    ...note,
    message: `The part is shorter than the coil: the long part's exact coupling is scaled by a complex end-effect factor from a surface-impedance model of the short and the long part (Leontovich condition, ψ = p ∂ψ/∂n with p = (1 − j)μrδ/2, solved by a boundary-element method), corrected towards the coil-impedance model's own cells for the non-magnetic part (weight 1 at μr = 1 falling to 0 at μr = 20); ${range}. Measured against the library's axisymmetric field solver over solenoids of length/diameter 0.3–4, bars and rings 0.3–0.9 × the coil length, μr 1–600, 3–150 skin depths.`,
    value: depths,
  };
}

/** The validity note of the coil-impedance tier (numbers measured by test/study/field-reference.test.ts). */
export const CELL_MODEL_NOTE: ValidityNote = {
  code: "coil-impedance-model",
  message:
    "The coil's own resistance and inductance, empty and with the part, come from the coil-impedance model (prepareWorkCoil at refinement 0.5, reduced fast path: each turn split into ring cells, skin and proximity effect in the conductor, the part through the Dodd–Deeds kernels). Against the field solutions of the reference scenarios with solid turns (A–F: 4–20-turn solenoids around bars and a tube, a pancake over aluminium and μr 100 steel; 1–200 kHz) the empty inductance is within 0.24 %, the part's loss within 0.17 % and ΔL within 0.42 % of the loaded inductance; the study's frequency within 0.09 % and part power within 0.26 % (test/study/field-reference-study.test.ts). Leads are added from their length as an isolated conductor.",
};

/** A coil-impedance model prepared for one coil and part geometry over a frequency band. */
interface CellEntry {
  prepared: PreparedWorkCoil;
  reduced: ReducedWorkCoil;
  fMin: number;
  fMax: number;
}

/** The prepared coil-impedance models by coil and part geometry (`null`: outside the model's domain, the closed form is used). */
const cellCache = new Map<string, { coil: WorkCoilSolenoid | WorkCoilPancake; part: WorkCoilPart; entry: CellEntry | null; failed: boolean; ends: Map<string, EndFactors> }>();

/** The study's coil as a `workCoilImpedance` coil. */
function workCoilOf(d: ResolvedHeaterDescription, props: CoilProperties): WorkCoilSolenoid | WorkCoilPancake {
  const coil = d.coil;
  const c = coil.conductor;
  const conductor: WorkCoilConductor =
    c.kind === "tube"
      ? { kind: "tube", outerDiameter: c.outerDiameter, wallThickness: c.wallThickness }
      : c.kind === "solid"
        ? { kind: "round", diameter: c.diameter }
        : { kind: "litz", strands: c.strands, strandDiameter: c.strandDiameter };
  if (coil.shape === "solenoid") return { shape: "solenoid", radius: coil.radius, length: coil.length, turns: coil.turns, conductor, resistivity: props.resistivity };
  const pitch = coil.turns > 1 ? (coil.outerRadius - coil.innerRadius) / (coil.turns - 1) : 2 * props.conductorDiameter;
  return { shape: "pancake", innerRadius: coil.innerRadius, pitch, turns: coil.turns, conductor, resistivity: props.resistivity };
}

/** The study's part as a `workCoilImpedance` part (its material is given per evaluation). */
function workPartOf(d: ResolvedHeaterDescription): WorkCoilPart {
  const part = d.part;
  const material = { resistivity: 1e-7, relativePermeability: 2 };
  switch (part.shape) {
    case "bar":
      return { shape: "bar", radius: part.radius, length: part.length, ...material };
    case "tube":
      return { shape: "tube", radius: part.outerRadius, innerRadius: part.outerRadius - part.wallThickness, length: part.length, ...material };
    case "ring":
      return { shape: "tube", radius: part.outerRadius, innerRadius: part.innerRadius, length: part.height, ...material };
    case "plate":
      return { shape: "plate", radius: Math.min(part.length, part.width) / 2, thickness: part.thickness, gap: d.coil.shape === "pancake" ? d.coil.liftOff : 0, ...material };
  }
}

/**
 * The frequency band of the study's coil-impedance model, from the description alone (so that a
 * study's numbers do not depend on what ran before it): whole octaves around the empty coil's
 * closed-form resonance ÷/× 2√2 (a part moves the loaded resonance by less than √2 either way
 * for ΔL/L from −0.5 to +1), widened to a fixed switching frequency and, for a power-tracking
 * series inverter, to 4 × the resonance.
 */
export function studyBand(d: ResolvedHeaterDescription, props: CoilProperties): [number, number] {
  const resonance = 1 / (2 * Math.PI * Math.sqrt(props.inductance * d.capacitor.capacitance));
  let lo = resonance / (2 * Math.SQRT2);
  let hi = resonance * 2 * Math.SQRT2;
  const inv = d.inverter;
  if (inv.kind === "voltage-fed-series") {
    if (inv.control === "fixed" && inv.frequency !== null) {
      lo = Math.min(lo, inv.frequency / 1.5);
      hi = Math.max(hi, inv.frequency * 1.5);
    } else hi = Math.max(hi, 4 * resonance);
  }
  return [2 ** Math.floor(Math.log2(lo)), 2 ** Math.ceil(Math.log2(hi))];
}

/** The study's coil and part as model inputs, the band, and the cache key of their model. */
function cellKey(d: ResolvedHeaterDescription, props: CoilProperties): { coil: WorkCoilSolenoid | WorkCoilPancake; part: WorkCoilPart; fMin: number; fMax: number; key: string } {
  const coil = workCoilOf(d, props);
  const part = workPartOf(d);
  const [fMin, fMax] = studyBand(d, props);
  return { coil, part, fMin, fMax, key: JSON.stringify([coil, part, fMin, fMax]) };
}

/** The cache key of the coil-impedance model a description's studies use (coil, part geometry and band). */
export function cellModelKey(d: ResolvedHeaterDescription, props: CoilProperties): string {
  return cellKey(d, props).key;
}

/**
 * A coil-impedance model built on one thread, as plain data for another (a worker of the pool):
 * the reduced model and, for a part shorter than the coil, the end-effect factors with their
 * tables so far. Every number in it is a pure function of the cache key, so a thread that
 * starts from it computes what it would have built itself, bit for bit.
 */
export interface CellModelData {
  readonly key: string;
  readonly coil: WorkCoilSolenoid | WorkCoilPancake;
  readonly part: WorkCoilPart;
  readonly fMin: number;
  readonly fMax: number;
  readonly reduced: ReducedWorkCoilData;
  readonly ends: readonly { readonly key: string; readonly copper: number; readonly factor: ShortPartFactorData; readonly cells: readonly (readonly [number, number, number])[] }[];
}

/**
 * The model this thread has built for a description (its coil, part and band), as data for
 * {@link importCellModels} on another thread; empty when there is none (not built yet, outside
 * the model's domain, or a model that calls the full solve).
 */
export function exportCellModels(d: ResolvedHeaterDescription, props: CoilProperties): CellModelData[] {
  const { coil, part, fMin, fMax, key } = cellKey(d, props);
  const slot = cellCache.get(key);
  const entry = slot?.entry ?? null;
  if (slot === undefined || slot.failed || entry === null) return [];
  const reduced = reducedWorkCoilData(entry.reduced);
  if (reduced === null) return [];
  const ends: CellModelData["ends"][number][] = [];
  for (const [k, e] of slot.ends) {
    const factor = shortPartFactorData(e.factor);
    if (factor === null) return [];
    ends.push({ key: k, copper: e.copper, factor, cells: Array.from(e.cells, ([n, [a, p]]) => [n, a, p] as const) });
  }
  return [{ key, coil, part, fMin, fMax, reduced, ends }];
}

/** Takes models built on another thread ({@link exportCellModels}) into this thread's cache (keys already there are kept). */
export function importCellModels(models: readonly CellModelData[]): void {
  for (const m of models) {
    if (cellCache.has(m.key)) continue;
    // the prepared coil builds its mesh only when first used (here: a short part's exact factor
    // at a table node not handed over)
    const prepared = prepareWorkCoil({ coil: m.coil, frequency: m.fMax, refinement: STUDY_COIL_REFINEMENT });
    const ends = new Map<string, EndFactors>();
    for (const e of m.ends) {
      const factor = prepareShortPartFactor(e.factor.geometry, e.factor.nodes);
      ends.set(e.key, { copper: e.copper, factor, cells: new Map(e.cells.map(([n, a, p]) => [n, [a, p]])) });
    }
    if (cellCache.size >= 64) cellCache.delete(cellCache.keys().next().value as string);
    cellCache.set(m.key, { coil: m.coil, part: m.part, entry: { prepared, reduced: reducedWorkCoilFromData(m.reduced), fMin: m.fMin, fMax: m.fMax }, failed: false, ends });
  }
}

/**
 * End effects of a part shorter than the coil: the copper change's factor (exact short
 * non-magnetic part over the long one at the start resistivity), the surface-impedance model's
 * complex short-over-long ratio F(μrδ/2) (`prepareShortPartFactor`), and a table of its
 * correction to the exact non-magnetic part (the model's own cells), as [log |c|, arg c] by
 * node k of t = 2^(k/2) m, filled when first needed.
 */
interface EndFactors {
  readonly copper: number;
  readonly factor: (t: number) => [number, number];
  readonly cells: Map<number, [number, number]>;
}

/** (a + jb)/(c + jd) as [re, im]. */
function complexRatio(a: number, b: number, c: number, d: number): [number, number] {
  const den = c * c + d * d;
  return [(a * c + b * d) / den, (b * c - a * d) / den];
}

/**
 * The coil-impedance model's state at a frequency and part material (the reduced fast path of
 * `prepareWorkCoil`, built once per coil, part geometry and band and kept for later studies;
 * outside its band the reduced model extrapolates, which the operating point reports), or
 * `null` when the geometry is outside the model's domain.
 *
 * A part shorter than the coil: the reduced model holds the infinitely long part; its
 * impedance change is multiplied by a complex end-effect factor (see {@link EndFactors}): the
 * exact short non-magnetic part over the long one (the model's own part cells, computed once
 * per geometry at the start resistivity and the band's centre), blended with the
 * surface-impedance model's factor at μrδ/2 by weights 1/μr and 1 − 1/μr; the copper's change
 * is scaled by the non-magnetic factor. Errors: {@link SHORT_PART_ERROR}.
 */
export function cellState(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number, resistivity: number, relativePermeability: number, withPart: boolean): CoilState | null {
  const { coil, part, fMin, fMax, key } = cellKey(d, props);
  let slot = cellCache.get(key);
  if (slot === undefined) {
    slot = { coil, part, entry: null, failed: false, ends: new Map() };
    if (cellCache.size >= 64) cellCache.delete(cellCache.keys().next().value as string);
    cellCache.set(key, slot);
  }
  if (slot.failed) return null;
  let entry = slot.entry;
  try {
    if (entry === null) {
      const prepared = prepareWorkCoil({ coil, frequency: fMax, refinement: STUDY_COIL_REFINEMENT });
      entry = { prepared, reduced: prepared.reduce({ part, minFrequency: fMin, maxFrequency: fMax }), fMin, fMax };
      slot.entry = entry;
    }
    const z = entry.reduced.impedance(frequency, resistivity, relativePermeability);
    if (!withPart) return { copper: z.emptyResistance, part: 0, L: z.emptyInductance, emptyL: z.emptyInductance };
    const partLength = part.shape === "plate" ? Infinity : part.length;
    if (coil.shape !== "solenoid" || part.shape === "plate" || !(partLength < coil.length)) {
      return { copper: z.copperResistance, part: z.partResistance, L: z.emptyInductance + z.inductanceChange, emptyL: z.emptyInductance };
    }
    const rhoStart = resistivityAt(d.part.material, d.part.startTemperature);
    const centre = Math.sqrt(entry.fMin * entry.fMax);
    const endsKey = `${rhoStart}|${centre}`;
    let ends = slot.ends.get(endsKey);
    if (ends === undefined) {
      const exact = entry.prepared.impedance(centre, { ...part, resistivity: rhoStart, relativePermeability: 1 });
      const long = entry.reduced.impedance(centre, rhoStart, 1);
      const copperLong = long.copperResistance - long.emptyResistance;
      const copperExact = exact.copperResistance - exact.emptyResistance;
      const turns = coil.turns;
      const factor = prepareShortPartFactor({
        coilRadius: coil.radius,
        turnPositions: Array.from({ length: turns }, (_, i) => coil.length * ((i + 0.5) / turns - 0.5)),
        outerRadius: part.radius,
        innerRadius: part.shape === "tube" ? part.innerRadius : 0,
        length: part.length,
      });
      ends = {
        copper: Math.abs(copperLong) > 1e-3 * long.emptyResistance ? Math.min(2, Math.max(0, copperExact / copperLong)) : 1,
        factor,
        cells: new Map(),
      };
      slot.ends.set(endsKey, ends);
    }
    const w = 2 * Math.PI * frequency;
    const t = (relativePermeability * skinDepth({ resistivity, frequency, relativePermeability })) / 2;
    let [gr, gi] = ends.factor(t);
    const weight = nonMagneticWeight(relativePermeability);
    if (weight > 0) {
      // the surface-impedance factor corrected towards the exact non-magnetic part (own cells)
      // at the non-magnetic skin depth, table in log t half an octave apart, linear between
      const wc = 2 * Math.PI * centre;
      const table = ends.cells;
      const e = ends;
      const node = (k: number): [number, number] => {
        let v = table.get(k);
        if (v === undefined) {
          const tk = 2 ** (k / 2);
          const rho = (wc * MU_0 * (2 * tk) ** 2) / 2;
          const exact = entry!.prepared.impedance(centre, { ...part, resistivity: rho, relativePermeability: 1 });
          const long = entry!.reduced.impedance(centre, rho, 1);
          const [kr, ki] = complexRatio(exact.partResistance, wc * exact.inductanceChange, long.partResistance, wc * long.inductanceChange);
          const [fr, fi] = e.factor(tk);
          const [cr, ci] = complexRatio(kr, ki, fr, fi);
          v = [Math.log(Math.hypot(cr, ci)), Math.atan2(ci, cr)];
          table.set(k, v);
        }
        return v;
      };
      const x = 2 * Math.log2(skinDepth({ resistivity, frequency }) / 2);
      const k0 = Math.floor(x);
      const u = x - k0;
      const [a0, p0] = node(k0);
      const [a1, p1] = node(k0 + 1);
      const magnitude = Math.exp(weight * ((1 - u) * a0 + u * a1));
      const phase = weight * ((1 - u) * p0 + u * p1);
      const cr = magnitude * Math.cos(phase);
      const ci = magnitude * Math.sin(phase);
      [gr, gi] = [gr * cr - gi * ci, gr * ci + gi * cr];
    }
    const zr = z.partResistance;
    const zi = w * z.inductanceChange;
    return {
      copper: z.emptyResistance + ends.copper * (z.copperResistance - z.emptyResistance),
      part: gr * zr - gi * zi,
      L: z.emptyInductance + (gr * zi + gi * zr) / w,
      emptyL: z.emptyInductance,
    };
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    slot.failed = true;
    return null;
  }
}
