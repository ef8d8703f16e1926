/**
 * The heater study: one description in, every number a designer needs out. The pieces live
 * beside this file: the result types (study-heater-types.ts), the part's geometry
 * (part-geometry.ts), the power curve (power-curve.ts), the heat-up (study-heat-up.ts), the
 * scans (study-scans.ts) and the cautions (cautions.ts).
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireObject, requireOneOf } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { studyCautions } from "./cautions.js";
import { coilProperties } from "./operating-point.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import { readHeaterDescription } from "./read-description.js";
import type { ResolvedHeaterDescription } from "./read-description.js";
import type { HeaterDescription } from "./description.js";
import { prepareHeaterFieldModel } from "./field-model.js";
import type { HeaterFieldModel } from "./field-model.js";
import { fieldPicture } from "./field-picture.js";
import { partGeometry } from "./part-geometry.js";
import { curieTemperatureOf, powerCurve, seededOperatingPoint } from "./power-curve.js";
import { heaterHeatUp } from "./study-heat-up.js";
import { impedanceSweep, temperatureScan } from "./study-scans.js";
import type { HeaterFieldSummary, HeaterPartFacts, HeaterStudy, StudyHeaterOptions } from "./study-heater-types.js";

export type {
  StudyHeaterOptions,
  HeaterFieldPicture,
  HeaterFieldSummary,
  HeaterRadialHeatUp,
  HeaterPartFacts,
  HeaterUnsolvedBand,
  HeaterHeatUp,
  HeaterTemperatureScan,
  HeaterImpedanceSweep,
  HeaterStudy,
} from "./study-heater-types.js";
export { rectanglesGeometry } from "./part-geometry.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const STUDY_OPTION_FIELDS: readonly string[] = Object.freeze(["heatUp", "temperatureScan", "impedanceSweep", "heatUpPoints", "radialHeatUp", "model"]);

/**
 * Studies one induction-heater design from end to end, as a composition of the library's
 * modules so that every number can be reproduced by calling them directly:
 *
 * 1. the coil: inductance (`solenoidInductance` / `spiralCoilInductance`), conductor resistance
 *    at the working temperature (`resistivityAt`, `wireDcResistance`, `litzDcResistance`) and at
 *    frequency (`workCoilResistanceCurrentSheet`, `tubeAcResistance`, `roundWireAcRatio`,
 *    `litzAcRatio`);
 * 2. the part's coupling at its temperature (`resistivityAt`, `relativePermeabilityAt` at the
 *    finite coil's surface field from `fieldNearCoil`): bars, tubes and rings through the finite
 *    coil, `prepareEncirclingCoilOverRod`, weighted by the share of the coil's squared field over
 *    the part's length; plates through `coilOverPlate`;
 * 3. tank and inverter fed from the source (`currentFedParallelInverterWithSource`, or
 *    `seriesInverterWithSource` at a fixed frequency or a target power; `tankStresses`), with
 *    frequency and the field-dependent permeability iterated to a fixed point by continuation
 *    from the neighbouring temperature, damping, and a bracketing search over the field;
 * 4. losses by place (supply, switches, coil, capacitors via `capacitorSeriesResistance`,
 *    concentrator core via `sinusoidalPeakFluxDensity` and `steinmetzLoss`, part) adding up to the
 *    input power, efficiencies (`coilEfficiency`);
 * 5. the power curve over the material's whole temperature range (adaptive, by continuation),
 *    the electro-thermal heat-up on it (`lumpedHeatUp`), the operating point against temperature
 *    and the tank impedance against frequency (`tankImpedanceSweep`);
 * 6. cautions (tank and safety modules, plus the description's ratings, plus
 *    `tank-cannot-oscillate` for a band where the current-fed tank cannot run) and a validity
 *    list of every approximation used.
 *
 * Accuracy: the composition adds no error of its own beyond the fixed-point tolerance (1e-10
 * in frequency, 1e-9 in surface field, exact coupling agreeing to 1e-10 of the tank resistance)
 * and the linear interpolation of part power between neighbouring points of the power curve
 * (refined until neighbours differ by ≤ 2 % in power and frequency, within 48 extra points); the
 * energy balance of each operating point closes to 1e-9 relative and its terminal voltages are
 * positive (tested); a design the source or tank cannot serve throws. Each module's accuracy and
 * validity apply, and are listed in `validity` where they are stretched.
 *
 * With `options.model: "field"` steps 1–2 come from the axisymmetric field solver
 * (`solveAxisymmetricField`, accuracy 1e-2) at anchor temperatures, interpolated in temperature
 * between them: against the solver called directly at the operating point within 0.1 % at an
 * anchor and 1 % between anchors (plus the solver's estimated error); on a bar longer than the
 * coil it agrees with the default model within that model's stated error (0.1 % frequency,
 * 0.3 % power). Seconds to a minute per study instead of milliseconds; parts and concentrators
 * given as r–z rectangles need it.
 *
 * @param description - the design (see {@link HeaterDescription}); text quantities allowed
 * @param options - which slower parts to run (all by default)
 * @returns the {@link HeaterStudy}
 * @throws {@link HeaterDescriptionError} (an {@link InputError}) when the description is
 * invalid, naming the field path; {@link InputError} when `options` is not an object,
 * `options.heatUpPoints` is not an integer from 4 to 1000 (each point costs a coupling solution),
 * `options.model` is not `"closed-form"` or `"field"`, the description has a part or
 * concentrators as r–z rectangles without `model: "field"`, or (field model) the turns touch or
 * a body reaches into them
 * @example
 * ```ts
 * import { studyHeater } from "fluxwright";
 * const study = studyHeater({
 *   supply: { kind: "battery", voltage: "48 V", internalResistance: "40 mΩ" },
 *   inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
 *   coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6,
 *     conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
 *   capacitor: { capacitance: "4 µF" },
 *   part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm",
 *     height: "30 mm", targetTemperature: "120 °C" },
 * }, { heatUp: false, temperatureScan: false, impedanceSweep: false });
 * console.log(study.operating.efficiency > 0.7, study.cautions[0]?.code); // true voltage-above-extra-low
 * ```
 * @category Heater study
 */
export function studyHeater(description: HeaterDescription, options: StudyHeaterOptions = {}): HeaterStudy {
  const { heatUpPoints, model } = readStudyOptions(options);
  const d = readHeaterDescription(description);
  requireClosedFormShapes(d, model);
  const props = coilProperties(d, model === "field" ? "field" : "cells");
  const fieldModel = model === "field" ? prepareHeaterFieldModel(d, props) : null;
  const part = d.part;
  const geometry = partGeometry(part);
  const facts: HeaterPartFacts = { mass: geometry.volume * part.material.density, surfaceArea: geometry.surfaceArea, volume: geometry.volume, curieTemperature: curieTemperatureOf(part) };

  const must = (f: () => HeaterOperatingPoint, what: string): HeaterOperatingPoint => {
    try {
      return f();
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      throw new InputError("studyHeater", "description", description, "", `a design the inverter can run ${what} (${e.message})`);
    }
  };
  const emptyCoil = must(() => seededOperatingPoint(d, part.startTemperature, false, props, null, fieldModel), "with the empty coil");
  const operating = must(() => seededOperatingPoint(d, part.startTemperature, true, props, emptyCoil, fieldModel), "with the part at its start temperature");

  // the part power against temperature, over the material's whole range (independent of the
  // target), sampled adaptively and solved by continuation from the neighbouring point
  const curve = powerCurve(d, props, operating, heatUpPoints, options.heatUp !== false || options.temperatureScan !== false, fieldModel);
  const atTarget = curve.solveAt(part.targetTemperature);
  const validity: ValidityNote[] = [...operating.validity, ...(atTarget?.validity ?? []), ...emptyCoil.validity];
  const allPoints: HeaterOperatingPoint[] = [emptyCoil, operating];
  if (atTarget !== null) allPoints.push(atTarget);
  // the curve's solved points join the checked points when the heat-up or the scan ran
  if (options.heatUp !== false || options.temperatureScan !== false) for (const p of curve.points) allPoints.push(p);

  const heatUp = options.heatUp !== false ? heaterHeatUp(d, facts, curve, options.radialHeatUp, validity) : null;
  const scan = options.temperatureScan !== false ? temperatureScan(curve) : null;
  const impedance = options.impedanceSweep !== false ? impedanceSweep(d, props, emptyCoil, operating, allPoints) : null;
  const cautions = studyCautions(d, facts, allPoints, heatUp, curve.bands, validity);
  return {
    title: d.title,
    description: d,
    coil: props,
    part: facts,
    emptyCoil,
    operating,
    atTarget,
    frequency: operating.frequency,
    emptyCoilFrequency: emptyCoil.frequency,
    // eslint-disable-next-line @typescript-eslint/no-deprecated -- kept until 1.0
    frequencyWithoutPart: emptyCoil.frequency,
    partPower: operating.losses.part,
    inputPower: operating.inputPower,
    losses: operating.losses,
    efficiency: operating.efficiency,
    timeToTarget: heatUp?.timeToTarget ?? null,
    frequencyShift: operating.frequency - emptyCoil.frequency,
    frequencyDrift: atTarget === null ? null : atTarget.frequency - operating.frequency,
    heatUp,
    temperatureScan: scan,
    impedance,
    cautions,
    validity: uniqueNotes(validity),
    model,
    field: fieldModel === null ? null : fieldSummary(fieldModel, operating),
  };
}

/** Checks the options of {@link studyHeater} (see its `@throws`). */
function readStudyOptions(options: StudyHeaterOptions): { heatUpPoints: number | undefined; model: "closed-form" | "field" } {
  requireObject("studyHeater", "options", options);
  requireKnownKeys("studyHeater", "options", options, STUDY_OPTION_FIELDS);
  const heatUpPoints = options.heatUpPoints === undefined ? undefined : requireInteger("studyHeater", "options.heatUpPoints", options.heatUpPoints, 4);
  // bounded work: each point is a coupling solution (about 0.1 ms)
  if (heatUpPoints !== undefined && heatUpPoints > 1000) throw new InputError("studyHeater", "options.heatUpPoints", heatUpPoints, "", "an integer between 4 and 1000");
  const model = options.model === undefined ? "closed-form" : requireOneOf("studyHeater", "options.model", options.model, ["closed-form", "field"] as const);
  return { heatUpPoints, model };
}

/** Parts and concentrators given as r–z rectangles need the field model: throws otherwise. */
function requireClosedFormShapes(d: ResolvedHeaterDescription, model: "closed-form" | "field"): void {
  if (model !== "field" && (d.part.rectangles !== undefined || (d.concentrators?.length ?? 0) > 0)) {
    throw new InputError(
      "studyHeater",
      "options.model",
      model,
      "",
      `"field" for a ${d.part.rectangles !== undefined ? "part given as r–z rectangles" : "design with concentrators given as r–z rectangles"} (the closed forms cover bars, tubes, rings and plates only): studyHeater(description, { model: "field" }), or --model field on the command line`,
    );
  }
}

/** Keeps the first note of each code. */
function uniqueNotes(notes: readonly ValidityNote[]): ValidityNote[] {
  const seen = new Set<string>();
  const out: ValidityNote[] = [];
  for (const n of notes) {
    if (seen.has(n.code)) continue;
    seen.add(n.code);
    out.push(n);
  }
  return out;
}

/** The field model's record, with the picture at the start temperature. */
function fieldSummary(fieldModel: HeaterFieldModel, operating: HeaterOperatingPoint): HeaterFieldSummary {
  const solution = fieldModel.solutionAt(operating.partTemperature);
  return {
    anchors: fieldModel.anchorList(),
    solves: fieldModel.work.solves,
    seconds: fieldModel.work.seconds,
    largestMesh: fieldModel.work.largestMesh,
    largestEstimatedError: fieldModel.work.largestEstimatedError,
    picture: solution === null ? null : fieldPicture(fieldModel.geometry, solution, operating),
  };
}
