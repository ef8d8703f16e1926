/**
 * The heater study: one description in, every number a designer needs out.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES, InputError, requireInteger, requireKnownKeys, requireObject, requireOneOf } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { bySeverity } from "../core/caution.js";
import { capacitorElement, inductorElement, parallelNetwork, seriesNetwork, tankImpedanceSweep } from "../tank/index.js";
import { specificHeatAt } from "../materials/index.js";
import { lumpedHeatUp } from "../thermal/index.js";
import { workpieceGeometry } from "../workpiece/index.js";
import type { LumpedEnergyBalance } from "../thermal/index.js";
import { heaterCautions } from "./cautions.js";
import { inductionRadialHeatUp } from "./induction-radial-heat-up.js";
import { barInLongCoil, tubeInLongCoil } from "../workpiece/index.js";
import { NoOscillationError, coilImpedanceAt, coilProperties, heaterOperatingPoint } from "./operating-point.js";
import type { CoilProperties, HeaterLosses, HeaterOperatingPoint } from "./operating-point.js";
import { readHeaterDescription } from "./read-description.js";
import type { ResolvedHeaterDescription, ResolvedPart, ResolvedRectangle } from "./read-description.js";
import type { HeaterDescription } from "./description.js";
import { prepareHeaterFieldModel } from "./field-model.js";
import type { HeaterFieldModel } from "./field-model.js";
import { fieldPicture } from "./field-picture.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const STUDY_OPTION_FIELDS: readonly string[] = Object.freeze(["heatUp", "temperatureScan", "impedanceSweep", "heatUpPoints", "radialHeatUp", "model"]);

/**
 * Options of {@link studyHeater}: which of the slower parts of the study to run.
 *
 * @category Heater study
 */
export interface StudyHeaterOptions {
  /** Run the electro-thermal heat-up to the target temperature (default `true`). */
  readonly heatUp?: boolean;
  /** Compute the operating point over part temperature from start to past the Curie point (default `true`). */
  readonly temperatureScan?: boolean;
  /** Compute the tank impedance against frequency with and without the part (default `true`). */
  readonly impedanceSweep?: boolean;
  /**
   * Run the surface/core (radial) model for bars and tubes in a solenoid with the heat-up
   * (default `true`; always run when the part's `targetLocation` is `"surface"` or `"core"`).
   */
  readonly radialHeatUp?: boolean;
  /** Operating points of the initial temperature grid of the power curve, an integer ≥ 4 (default: one per 50 K, 6 … 24, plus clusters at the Curie transition and the specific-heat peak); adaptive refinement adds up to 48 more. */
  readonly heatUpPoints?: number;
  /**
   * How the coil's impedance and the part's coupling are computed: `"closed-form"` (default, the
   * fast closed forms and the coil-impedance model) or `"field"` (the axisymmetric field solver
   * `solveAxisymmetricField`, solved at anchor temperatures: slower, seconds per anchor; see
   * {@link HeaterFieldSummary}).
   */
  readonly model?: "closed-form" | "field";
}

/**
 * Samples of the field solution at the start temperature (model `"field"`), at the operating
 * point's coil current: what the report draws.
 *
 * @category Heater study
 */
export interface HeaterFieldPicture {
  /** Part temperature of the solution [K]. */
  readonly temperature: number;
  /** Frequency of the solution [Hz]. */
  readonly frequency: number;
  /** RMS coil current the samples are scaled to [A]. */
  readonly coilCurrentRms: number;
  /** Radii of the |B| grid [m], ascending from the axis. */
  readonly r: readonly number[];
  /** Axial positions of the |B| grid [m], ascending. */
  readonly z: readonly number[];
  /** |B| (RMS, $\sqrt{|B_r|^2 + |B_z|^2}$) at each grid node, row by row (z major) [T]. */
  readonly fluxDensity: readonly number[];
  /** Power density in the part [W/m³], per part rectangle, on cells graded towards its surfaces: cell edges in r and z and the value at each cell centre (z major). */
  readonly powerDensity: readonly {
    /** Cell edges in r [m]. */
    readonly r: readonly number[];
    /** Cell edges in z [m]. */
    readonly z: readonly number[];
    /** Power density at each cell centre, z major [W/m³]. */
    readonly values: readonly number[];
  }[];
  /** The turns' cross-sections (circles: centre r, z and outer and inner radius) [m]. */
  readonly turns: readonly {
    /** Radius of the centre [m]. */
    readonly r: number;
    /** Axial position of the centre [m]. */
    readonly z: number;
    /** Outer radius of the cross-section [m]. */
    readonly radius: number;
    /** Bore radius (tube), 0 for a solid conductor [m]. */
    readonly innerRadius: number;
  }[];
  /** The part's cross-section as r–z rectangles [m]. */
  readonly part: readonly ResolvedRectangle[];
  /** Other regions (concentrators) as r–z rectangles [m]. */
  readonly passive: readonly ResolvedRectangle[];
}

/**
 * What the field model did (model `"field"`).
 *
 * @category Heater study
 */
export interface HeaterFieldSummary {
  /** The anchor temperatures where the field was solved, with the operating frequency and the part's permeability there and the solutions it took. */
  readonly anchors: readonly {
    /** Part temperature [K]. */
    readonly temperature: number;
    /** Frequency of the (last) field solution there [Hz]. */
    readonly frequency: number;
    /** The part's relative permeability in it. */
    readonly relativePermeability: number;
    /** Field solutions run at this anchor. */
    readonly solves: number;
  }[];
  /** Field solutions run in all (empty coil and loaded). */
  readonly solves: number;
  /** Wall time spent in field solutions [s]. */
  readonly seconds: number;
  /** Largest mesh solved [nodes]. */
  readonly largestMesh: number;
  /** Largest estimated relative error of a solution's impedance. */
  readonly largestEstimatedError: number;
  /** The field picture at the start temperature. */
  readonly picture: HeaterFieldPicture | null;
}

/**
 * Surface and core temperature of a bar or tube during the heat-up, from
 * {@link inductionRadialHeatUp} driven by the study's operating points at the surface temperature.
 *
 * @category Heater study
 */
export interface HeaterRadialHeatUp {
  /** Times [s]. */
  readonly times: readonly number[];
  /** Surface temperature at each time [K]. */
  readonly surfaceTemperatures: readonly number[];
  /** Core (axis, or bore of a tube) temperature at each time [K]. */
  readonly coreTemperatures: readonly number[];
  /** Volume-mean temperature at each time [K]. */
  readonly meanTemperatures: readonly number[];
  /** Times the surface, core and mean reach the target [s] (`null` when not reached). */
  readonly timeToSurfaceTarget: number | null;
  /** See `timeToSurfaceTarget`. */
  readonly timeToCoreTarget: number | null;
  /** See `timeToSurfaceTarget`. */
  readonly timeToMeanTarget: number | null;
  /** Time the heating stops (the `targetLocation` temperature at target) [s], or `null`. */
  readonly heatingTime: number | null;
  /** Surface minus core temperature when the heating stops [K], or `null`. */
  readonly surfaceCoreDifferenceAtTarget: number | null;
  /** Soak band [K] (`null`: no soak asked). */
  readonly soakBand: number | null;
  /** Time from switching off until surface and core are within the band [s], or `null`. */
  readonly soakTime: number | null;
  /** Hardening temperature [K] (`null`: not asked). */
  readonly hardeningTemperature: number | null;
  /** Depth below the surface whose peak temperature reached the hardening temperature [m], or `null`. */
  readonly hardeningDepth: number | null;
  /** Largest relative difference between the power with the radial profile and with the part uniform at its surface temperature [-] (what a uniform-temperature model misses). */
  readonly uniformPowerDeviation: number;
}

/**
 * Geometry-derived facts about the part.
 *
 * @category Heater study
 */
export interface HeaterPartFacts {
  /** Mass [kg] (volume × the material's density). */
  readonly mass: number;
  /** Surface area losing heat [m²]. */
  readonly surfaceArea: number;
  /** Volume [m³]. */
  readonly volume: number;
  /** Curie temperature of the material [K], `null` for non-magnetic materials. */
  readonly curieTemperature: number | null;
}

/**
 * A span of part temperature where the heater has no operating point (the study counts no
 * power there and never interpolates across it).
 *
 * @category Heater study
 */
export interface HeaterUnsolvedBand {
  /** Lowest temperature of the band [K] (located to within 0.5 K). */
  readonly from: number;
  /** Highest temperature of the band [K] (located to within 0.5 K; the top of the studied range when it runs off it). */
  readonly to: number;
  /** `true` when the current-fed tank cannot oscillate there for any permeability the part can take (the switches latch on). */
  readonly noOscillation: boolean;
  /** Why the operating point fails (the limit the design hits). */
  readonly reason: string;
}

/**
 * The electro-thermal heat-up: the lumped heat-up of the thermal module, driven by the part
 * power of the operating point re-solved as the part heats (through the Curie point).
 *
 * @category Heater study
 */
export interface HeaterHeatUp {
  /** Time for the `targetLocation` temperature to reach the target [s], `null` when it is not reached. */
  readonly timeToTarget: number | null;
  /** What the target applies to: `"mean"` (lumped model), `"surface"` or `"core"` (radial model). */
  readonly targetLocation: "mean" | "surface" | "core";
  /** Surface and core temperature of a bar or tube (radial model); `null` for other parts or when not run. */
  readonly radial: HeaterRadialHeatUp | null;
  /** Whether the target is reached. */
  readonly reachable: boolean;
  /** Temperature at the end of the simulated span [K]. */
  readonly finalTemperature: number;
  /** Temperature the part would settle at with this heater [K], from the power curve over the material's whole range (independent of the target); `null` when it lies above that range. */
  readonly steadyStateTemperature: number | null;
  /** Time the part crosses its Curie temperature [s], `null` when it does not. */
  readonly curieCrossingTime: number | null;
  /** Sample times [s] (the integrator's steps). */
  readonly times: readonly number[];
  /** Part temperature at each time [K]. */
  readonly temperatures: readonly number[];
  /** Operating frequency at each time [Hz]. */
  readonly frequencies: readonly number[];
  /** Power into the part at each time [W]. */
  readonly partPowers: readonly number[];
  /** Power drawn from the supply at each time [W]. */
  readonly inputPowers: readonly number[];
  /** Energy drawn from the supply over the heat-up [J]. */
  readonly supplyEnergy: number;
  /** Charge drawn from the supply over the heat-up [C] (divide by 3600 for A·h). */
  readonly supplyCharge: number;
  /** The thermal module's energy balance of the part [J]. */
  readonly energy: LumpedEnergyBalance;
  /** Biot number at the hottest point (`null` when unknown). */
  readonly biotNumber: number | null;
  /** The temperatures at which operating points were solved (the heat-up grid) [K]. */
  readonly gridTemperatures: readonly number[];
  /** Bands of temperature without an operating point (no power counted there), lowest first. */
  readonly unsolvedBands: readonly HeaterUnsolvedBand[];
  /** The temperature span over which the part power was solved [K]: from the start to the top of the material's range, independent of the target. */
  readonly powerCurveRange: readonly [number, number];
}

/**
 * The operating point against part temperature, over the same adaptively sampled power curve
 * the heat-up uses (from the start temperature to the top of the material's range).
 *
 * @category Heater study
 */
export interface HeaterTemperatureScan {
  /** Part temperatures [K]. */
  readonly temperatures: readonly number[];
  /** Operating frequency [Hz]. */
  readonly frequencies: readonly number[];
  /** Power into the part [W]. */
  readonly partPowers: readonly number[];
  /** Power from the supply [W]. */
  readonly inputPowers: readonly number[];
  /** Overall efficiency (part / input). */
  readonly efficiencies: readonly number[];
  /** Relative permeability used for the part. */
  readonly relativePermeabilities: readonly number[];
  /** Inductance at the coil terminals [H]. */
  readonly inductances: readonly number[];
  /** Bands of temperature without an operating point, lowest first (their points are left out above). */
  readonly unsolvedBands: readonly HeaterUnsolvedBand[];
  /** RMS coil current [A]. */
  readonly coilCurrentsRms: readonly number[];
  /** Peak tank (coil) voltage [V]. */
  readonly tankVoltagesPeak: readonly number[];
}

/**
 * Tank impedance seen by the inverter against frequency, empty and loaded (at the start
 * temperature).
 *
 * @category Heater study
 */
export interface HeaterImpedanceSweep {
  /** Frequencies [Hz] (log-spaced). */
  readonly frequencies: readonly number[];
  /** |Z| of the tank with the empty coil [Ω]. */
  readonly magnitudeEmpty: readonly number[];
  /** Phase of Z with the empty coil [rad]. */
  readonly phaseEmpty: readonly number[];
  /** |Z| with the part in place [Ω]. */
  readonly magnitudeLoaded: readonly number[];
  /** Phase with the part in place [rad]. */
  readonly phaseLoaded: readonly number[];
}

/**
 * The result of {@link studyHeater}.
 *
 * @category Heater study
 */
export interface HeaterStudy {
  /** Title from the description. */
  readonly title: string;
  /** The resolved description the study ran on (SI numbers, defaults filled). */
  readonly description: ResolvedHeaterDescription;
  /** The coil's own properties (inductance, conductor length, DC resistance). */
  readonly coil: CoilProperties;
  /** Mass, area and Curie temperature of the part. */
  readonly part: HeaterPartFacts;
  /** Operating point with the empty coil (no part). */
  readonly emptyCoil: HeaterOperatingPoint;
  /** Operating point with the part at its start temperature. */
  readonly operating: HeaterOperatingPoint;
  /** Operating point with the part at its target temperature (`null` when the inverter cannot run there). */
  readonly atTarget: HeaterOperatingPoint | null;
  /** Operating frequency with the part at its start temperature [Hz] (= `operating.frequency`). */
  readonly frequency: number;
  /** Operating frequency with the empty coil [Hz] (= `emptyCoil.frequency`). */
  readonly emptyCoilFrequency: number;
  /**
   * The same value as `emptyCoilFrequency` [Hz].
   *
   * @deprecated Use `emptyCoilFrequency`; this field goes at 1.0.
   */
  readonly frequencyWithoutPart: number;
  /** Power into the part at its start temperature [W] (= `operating.losses.part`). */
  readonly partPower: number;
  /** Power drawn from the supply at the start temperature [W] (= `operating.inputPower`). */
  readonly inputPower: number;
  /** Losses by place at the start temperature [W] (= `operating.losses`); they add up to `inputPower`. */
  readonly losses: HeaterLosses;
  /** Part power over input power at the start temperature (= `operating.efficiency`). */
  readonly efficiency: number;
  /** Time to the target temperature [s] (= `heatUp.timeToTarget`; `null` when not computed or not reached). */
  readonly timeToTarget: number | null;
  /** Frequency with the cold part minus frequency with the empty coil [Hz]. */
  readonly frequencyShift: number;
  /** Frequency at the target minus frequency at the start [Hz]: the drift during heat-up (`null` without a target point). */
  readonly frequencyDrift: number | null;
  /** The electro-thermal heat-up (`null` when not requested). */
  readonly heatUp: HeaterHeatUp | null;
  /** Operating point against part temperature (`null` when not requested). */
  readonly temperatureScan: HeaterTemperatureScan | null;
  /** Tank impedance against frequency (`null` when not requested). */
  readonly impedance: HeaterImpedanceSweep | null;
  /** Hazards and rating checks, most serious first; each message defers to local codes. */
  readonly cautions: readonly Caution[];
  /** Every approximation used and why, one note per code. */
  readonly validity: readonly ValidityNote[];
  /** The model of the coil's impedance and the part's coupling: `"closed-form"` (default) or `"field"`. */
  readonly model: "closed-form" | "field";
  /** What the field model did, with the field picture (`null` with the closed-form model). */
  readonly field: HeaterFieldSummary | null;
}

/**
 * Volume and outer surface of a body of revolution given as r–z rectangles that do not overlap:
 * the volume is the sum of the rings'; the surface the rectangles' edges less the stretches two
 * rectangles share (a horizontal edge from r₁ to r₂ sweeps $\pi(r_2^2 - r_1^2)$, a vertical one
 * at r over a height h sweeps $2\pi r h$).
 */
export function rectanglesGeometry(rectangles: readonly ResolvedRectangle[]): { volume: number; surfaceArea: number } {
  let volume = 0;
  let area = 0;
  const overlap = (a0: number, a1: number, b0: number, b1: number): [number, number] | null => {
    const lo = Math.max(a0, b0);
    const hi = Math.min(a1, b1);
    return hi > lo ? [lo, hi] : null;
  };
  for (const a of rectangles) {
    volume += Math.PI * (a.rMax * a.rMax - a.rMin * a.rMin) * (a.zMax - a.zMin);
    // horizontal edges (bottom, top): their area less the stretches covered by a neighbour's opposite edge
    for (const [z, opposite] of [[a.zMin, "zMax"], [a.zMax, "zMin"]] as const) {
      let covered = 0;
      for (const b of rectangles) {
        if (b === a || b[opposite] !== z) continue;
        const o = overlap(a.rMin, a.rMax, b.rMin, b.rMax);
        if (o !== null) covered += Math.PI * (o[1] * o[1] - o[0] * o[0]);
      }
      area += Math.PI * (a.rMax * a.rMax - a.rMin * a.rMin) - covered;
    }
    // vertical edges (inner, outer)
    for (const [r, opposite] of [[a.rMin, "rMax"], [a.rMax, "rMin"]] as const) {
      if (r === 0) continue;
      let covered = 0;
      for (const b of rectangles) {
        if (b === a || b[opposite] !== r) continue;
        const o = overlap(a.zMin, a.zMax, b.zMin, b.zMax);
        if (o !== null) covered += o[1] - o[0];
      }
      area += 2 * Math.PI * r * (a.zMax - a.zMin - covered);
    }
  }
  return { volume, surfaceArea: area };
}

/** Geometry of the part: volume and heat-losing surface (`workpieceGeometry`). */
function partGeometry(part: ResolvedPart): { volume: number; surfaceArea: number } {
  if (part.rectangles !== undefined) return rectanglesGeometry(part.rectangles);
  switch (part.shape) {
    case "bar":
      return workpieceGeometry({ shape: "bar", radius: part.radius, length: part.length });
    case "tube":
      return workpieceGeometry({ shape: "tube", outerRadius: part.outerRadius, innerRadius: part.outerRadius - part.wallThickness, length: part.length });
    case "ring":
      return workpieceGeometry({ shape: "tube", outerRadius: part.outerRadius, innerRadius: part.innerRadius, length: part.height });
    case "plate":
      return workpieceGeometry({ shape: "plate", length: part.length, width: part.width, thickness: part.thickness });
  }
}

/** The part's operating points against temperature, with the bands where none exists. */
interface PowerCurve {
  /** Every sampled temperature, ascending [K]. */
  readonly temperatures: readonly number[];
  /** The solved operating points, ascending in temperature. */
  readonly points: readonly HeaterOperatingPoint[];
  /** The unsolved bands. */
  readonly bands: readonly HeaterUnsolvedBand[];
  /** The sampled span [K]. */
  readonly range: readonly [number, number];
  /** A quantity at a temperature: linear between neighbouring solved points, 0 in an unsolved band, held beyond the ends. */
  valueAt(temperature: number, of: (p: HeaterOperatingPoint) => number): number;
  /** The operating point at a temperature (continued from the nearest solved sample), `null` when none exists. */
  solveAt(temperature: number): HeaterOperatingPoint | null;
}

interface CurveSample {
  readonly t: number;
  readonly p: HeaterOperatingPoint | null;
  readonly reason: string;
  readonly noOscillation: boolean;
}

/** Extra refinement points of the power curve beyond the initial grid. */
const REFINEMENT_BUDGET = 32;

/**
 * Samples the part's operating point from the start temperature to the top of the material's
 * range (independent of the target): an initial grid with clusters at the Curie transition and
 * the specific-heat peak, solved in ascending order by continuation, then refined where the part
 * power or frequency changes by more than 2 % between neighbours and at the edges of any band
 * without an operating point (located to 0.5 K).
 */
function powerCurve(
  d: ResolvedHeaterDescription,
  props: CoilProperties,
  operating: HeaterOperatingPoint,
  initialCount: number | undefined,
  enabled: boolean,
  fieldModel: HeaterFieldModel | null,
): PowerCurve {
  const part = d.part;
  const material = part.material;
  const start = part.startTemperature;
  const top = Math.max(part.targetTemperature, Math.min(material.temperatureRange.max, material.meltingTemperature - 50));
  const solve = (t: number, from: HeaterOperatingPoint | null): CurveSample => {
    if (t === start) return { t, p: operating, reason: "", noOscillation: false };
    try {
      return { t, p: seededOperatingPoint(d, t, true, props, from, fieldModel), reason: "", noOscillation: false };
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      return { t, p: null, reason: e.message, noOscillation: e instanceof NoOscillationError };
    }
  };
  const samples: CurveSample[] = [];
  if (enabled) {
    const curie = material.magnetic && material.curieTemperature !== undefined ? material.curieTemperature : null;
    const count = initialCount ?? Math.min(16, Math.max(6, Math.ceil((top - start) / 100) + 2));
    const grid = new Set(temperatureGrid(start, top, count, curie, material.permeability?.transitionWidth ?? 0));
    // a cluster at the specific-heat peak (e.g. the magnetic transition of steel)
    let peakT = start;
    let peakC = -Infinity;
    for (let i = 0; i <= 200; i++) {
      const t = start + ((top - start) * i) / 200;
      const c = specificHeatAt(material, t);
      if (c > peakC) {
        peakC = c;
        peakT = t;
      }
    }
    if (peakT > start && peakT < top) for (let k = -3; k <= 3; k++) grid.add(Math.min(top, Math.max(start, peakT + 10 * k)));
    // the field model: solve the anchors first (field solutions), then the rest between them
    const anchors = fieldModel === null ? [] : fieldAnchorTemperatures(start, top, part.targetTemperature, curie, material.permeability?.transitionWidth ?? 0);
    for (const t of anchors) grid.add(t);
    const byTemperature = new Map<number, CurveSample>();
    let previous: HeaterOperatingPoint | null = operating;
    if (fieldModel !== null) {
      fieldModel.mode = "anchor";
      for (const t of anchors) {
        const sample = solve(t, previous);
        if (sample.p !== null) previous = sample.p;
        byTemperature.set(t, sample);
      }
      fieldModel.mode = "interpolate";
      previous = operating;
    }
    for (const t of [...grid].sort((x, y) => x - y)) {
      const sample: CurveSample = byTemperature.get(t) ?? solve(t, previous);
      if (sample.p !== null) previous = sample.p;
      samples.push(sample);
    }
    // adaptive refinement: band edges first, then the largest changes of power or frequency
    const pMax = Math.max(...samples.map((x) => x.p?.losses.part ?? 0), 1e-300);
    for (let budget = REFINEMENT_BUDGET; budget > 0; budget--) {
      let best = -1;
      let bestPriority = 0;
      for (let i = 0; i + 1 < samples.length; i++) {
        const a = samples[i] as CurveSample;
        const b = samples[i + 1] as CurveSample;
        const span = b.t - a.t;
        let priority = 0;
        if ((a.p === null) !== (b.p === null)) priority = span > 0.5 ? 10 + span : 0;
        else if (a.p !== null && b.p !== null && span > 1) {
          const change = Math.max(Math.abs(b.p.losses.part - a.p.losses.part) / pMax, Math.abs(b.p.frequency - a.p.frequency) / a.p.frequency);
          priority = change > 0.03 ? change : 0;
        }
        if (priority > bestPriority) {
          bestPriority = priority;
          best = i;
        }
      }
      if (best < 0) break;
      const a = samples[best] as CurveSample;
      const b = samples[best + 1] as CurveSample;
      samples.splice(best + 1, 0, solve(0.5 * (a.t + b.t), a.p ?? b.p));
    }
  }
  const points = samples.flatMap((x) => (x.p === null ? [] : [x.p]));
  const bands: HeaterUnsolvedBand[] = [];
  for (let i = 0; i < samples.length; i++) {
    const x = samples[i] as CurveSample;
    if (x.p !== null) continue;
    let j = i;
    while (j + 1 < samples.length && (samples[j + 1] as CurveSample).p === null) j++;
    const last = samples[j] as CurveSample;
    bands.push({ from: x.t, to: j + 1 < samples.length ? last.t : top, noOscillation: samples.slice(i, j + 1).some((y) => y.noOscillation), reason: x.reason });
    i = j;
  }
  const temperatures = samples.map((x) => x.t);
  return {
    temperatures,
    points,
    bands,
    range: [start, top],
    valueAt(t, of) {
      const n = samples.length;
      if (n === 0) return of(operating);
      const first = samples[0] as CurveSample;
      const last = samples[n - 1] as CurveSample;
      if (t <= first.t) return first.p === null ? 0 : of(first.p);
      if (t >= last.t) return last.p === null ? 0 : of(last.p);
      let lo = 0;
      let hi = n - 1;
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if ((samples[mid] as CurveSample).t <= t) lo = mid;
        else hi = mid;
      }
      const a = samples[lo] as CurveSample;
      const b = samples[hi] as CurveSample;
      if (a.p !== null && b.p !== null) {
        const u = (t - a.t) / (b.t - a.t);
        return of(a.p) * (1 - u) + of(b.p) * u;
      }
      // beside a band: hold the solved neighbour over the half of the (≤ 0.5 K) gap nearer to it
      const nearer = t - a.t <= b.t - t ? a : b;
      return nearer.p === null ? 0 : of(nearer.p);
    },
    solveAt(t) {
      const exact = samples.find((x) => x.t === t);
      if (exact !== undefined) return exact.p;
      let from: HeaterOperatingPoint = operating;
      for (const p of points) if (Math.abs(p.partTemperature - t) < Math.abs(from.partTemperature - t)) from = p;
      return solve(t, from).p;
    },
  };
}

/**
 * The operating point; with the field model at an anchor, started from the closed-form model's
 * point at the same temperature (its correction of the common surrogate is close to the field
 * model's, so the field is solved once at the converged point instead of at a first estimate).
 */
function seededOperatingPoint(
  d: ResolvedHeaterDescription,
  t: number,
  withPart: boolean,
  props: CoilProperties,
  from: HeaterOperatingPoint | null,
  fieldModel: HeaterFieldModel | null,
): HeaterOperatingPoint {
  let start = from;
  if (fieldModel !== null && fieldModel.mode === "anchor") {
    try {
      start = heaterOperatingPoint(d, t, withPart, fieldModel.seedProperties, from);
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
    }
  }
  return heaterOperatingPoint(d, t, withPart, props, start);
}

/**
 * Anchor temperatures of the field model: five across the power curve's span, the target, and
 * four across the Curie transition of a magnetic part.
 */
function fieldAnchorTemperatures(start: number, top: number, target: number, curie: number | null, width: number): number[] {
  const set = new Set<number>();
  for (let i = 1; i <= 4; i++) set.add(start + ((top - start) * i) / 4);
  if (target > start && target < top) set.add(target);
  if (curie !== null && curie > start && curie < top) {
    for (const t of [curie - width - 40, curie - width / 2, curie, curie + 20]) if (t > start && t < top) set.add(t);
  }
  return [...set].sort((a, b) => a - b);
}

/** Temperatures from `start` to `end`, uniform, with extra points around the Curie transition. */
function temperatureGrid(start: number, end: number, count: number, curie: number | null, width: number): number[] {
  const set = new Set<number>();
  for (let i = 0; i < count; i++) set.add(start + ((end - start) * i) / (count - 1));
  if (curie !== null && curie > start && curie - width - 40 < end) {
    const lo = Math.max(start, curie - width - 40);
    const hi = Math.min(end, curie + 20);
    const extra = Math.max(6, Math.round(count / 2));
    for (let i = 0; i <= extra; i++) set.add(lo + ((hi - lo) * i) / extra);
    if (curie < end) {
      set.add(curie);
      set.add(Math.min(end, curie + 1e-6 * curie));
    }
  }
  return [...set].sort((a, b) => a - b);
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

/** Keeps one caution per code (the largest value), most serious first. */
function sortCautions(cautions: readonly Caution[]): Caution[] {
  const byCode = new Map<string, Caution>();
  for (const c of cautions) {
    const prev = byCode.get(c.code);
    if (prev === undefined || c.value > prev.value) byCode.set(c.code, c);
  }
  return [...byCode.values()].sort(bySeverity);
}

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
  requireObject("studyHeater", "options", options);
  requireKnownKeys("studyHeater", "options", options, STUDY_OPTION_FIELDS);
  const heatUpPoints = options.heatUpPoints === undefined ? undefined : requireInteger("studyHeater", "options.heatUpPoints", options.heatUpPoints, 4);
  // bounded work: each point is a coupling solution (about 0.1 ms)
  if (heatUpPoints !== undefined && heatUpPoints > 1000) throw new InputError("studyHeater", "options.heatUpPoints", heatUpPoints, "", "an integer between 4 and 1000");
  const model = options.model === undefined ? "closed-form" : requireOneOf("studyHeater", "options.model", options.model, ["closed-form", "field"] as const);
  const d = readHeaterDescription(description);
  if (model !== "field" && (d.part.rectangles !== undefined || (d.concentrators?.length ?? 0) > 0)) {
    throw new InputError(
      "studyHeater",
      "options.model",
      model,
      "",
      `"field" for a ${d.part.rectangles !== undefined ? "part given as r–z rectangles" : "design with concentrators given as r–z rectangles"} (the closed forms cover bars, tubes, rings and plates only): studyHeater(description, { model: "field" }), or --model field on the command line`,
    );
  }
  const props = coilProperties(d, model === "field" ? "field" : "cells");
  const fieldModel = model === "field" ? prepareHeaterFieldModel(d, props) : null;
  const part = d.part;
  const material = part.material;
  const geometry = partGeometry(part);
  const curie = material.magnetic && material.curieTemperature !== undefined ? material.curieTemperature : null;
  const facts: HeaterPartFacts = { mass: geometry.volume * material.density, surfaceArea: geometry.surfaceArea, volume: geometry.volume, curieTemperature: curie };

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

  // ---- heat-up: the hook for the radial (surface/core) model is here: it takes `curve`
  // (operating points by temperature, unsolved bands) and replaces `lumpedHeatUp` ----
  let heatUp: HeaterHeatUp | null = null;
  if (options.heatUp !== false) {
    const grid = curve.temperatures;
    for (const p of curve.points) allPoints.push(p);
    const thermal = lumpedHeatUp({
      mass: facts.mass,
      material,
      powerAt: (t: number) => curve.valueAt(t, (p) => p.losses.part),
      surfaceArea: facts.surfaceArea,
      convectionCoefficient: d.environment.convectionCoefficient,
      emissivity: part.emissivity,
      ambientTemperature: d.environment.ambientTemperature,
      initialTemperature: part.startTemperature,
      targetTemperature: part.targetTemperature,
      relativeTolerance: 1e-8,
    });
    validity.push(...thermal.validity);
    // the settle temperature is found on the power curve, which ends at the top of the material's range
    let steadyStateTemperature = thermal.steadyStateTemperature;
    if (steadyStateTemperature !== null && steadyStateTemperature > curve.range[1]) {
      validity.push({
        code: "settles-above-range",
        message: `The part would still be heating at ${(curve.range[1] - 273.15).toFixed(0)} °C, the top of the material's documented range (or 50 K below melting): it settles above it, where the study has no data; the settle temperature is reported as unknown.`,
        value: curve.range[1],
      });
      steadyStateTemperature = null;
    }
    validity.push({
      code: "lumped-heat-up",
      message: `Heat-up with one part temperature (lumped model); the part power is solved at ${grid.length} temperatures from ${(curve.range[0] - 273.15).toFixed(0)} to ${(curve.range[1] - 273.15).toFixed(0)} °C (denser where it changes fast) and interpolated linearly between neighbouring solved points, never across an unsolved band.`,
    });
    const times = thermal.times;
    const temperatures = thermal.temperatures;
    let supplyEnergy = 0;
    let supplyCharge = 0;
    const inputs = temperatures.map((t) => curve.valueAt(t, (p) => p.inputPower));
    const currents = temperatures.map((t) => curve.valueAt(t, (p) => p.supplyCurrent));
    for (let i = 1; i < times.length; i++) {
      const dt = (times[i] as number) - (times[i - 1] as number);
      supplyEnergy += 0.5 * dt * ((inputs[i] as number) + (inputs[i - 1] as number));
      supplyCharge += 0.5 * dt * ((currents[i] as number) + (currents[i - 1] as number));
    }
    let curieCrossingTime: number | null = null;
    if (curie !== null) {
      for (let i = 1; i < times.length; i++) {
        const t0 = temperatures[i - 1] as number;
        const t1 = temperatures[i] as number;
        if (t0 < curie && t1 >= curie) {
          curieCrossingTime = (times[i - 1] as number) + (((times[i] as number) - (times[i - 1] as number)) * (curie - t0)) / (t1 - t0);
          break;
        }
      }
    }
    // ---- surface and core (radial model) for bars and tubes in a solenoid ----
    const targetLocation = part.targetLocation ?? "mean";
    const radial =
      (options.radialHeatUp !== false || targetLocation !== "mean") && (part.shape === "bar" || part.shape === "tube") && part.rectangles === undefined && d.coil.shape === "solenoid"
        ? radialPart(d, part, curve, thermal.timeToTarget !== null ? 4 * thermal.timeToTarget : thermal.duration, validity)
        : null;
    heatUp = {
      timeToTarget: targetLocation === "mean" ? thermal.timeToTarget : (radial?.heatingTime ?? null),
      targetLocation,
      radial,
      reachable: thermal.reachable,
      finalTemperature: thermal.finalTemperature,
      steadyStateTemperature,
      curieCrossingTime,
      times,
      temperatures,
      // where no operating point exists, no power flows and the frequency is shown as 0
      frequencies: temperatures.map((t) => curve.valueAt(t, (p) => p.frequency)),
      partPowers: temperatures.map((t) => curve.valueAt(t, (p) => p.losses.part)),
      inputPowers: inputs,
      supplyEnergy,
      supplyCharge,
      energy: thermal.energy,
      biotNumber: thermal.biotNumber,
      gridTemperatures: grid,
      unsolvedBands: curve.bands,
      powerCurveRange: curve.range,
    };
  }

  // operating point against temperature: the solved points of the same curve
  let temperatureScan: HeaterTemperatureScan | null = null;
  if (options.temperatureScan !== false) {
    const points = curve.points;
    if (options.heatUp === false) for (const p of points) allPoints.push(p);
    temperatureScan = {
      temperatures: points.map((p) => p.partTemperature),
      frequencies: points.map((p) => p.frequency),
      partPowers: points.map((p) => p.losses.part),
      inputPowers: points.map((p) => p.inputPower),
      efficiencies: points.map((p) => p.efficiency),
      relativePermeabilities: points.map((p) => p.partRelativePermeability),
      inductances: points.map((p) => p.inductance),
      unsolvedBands: curve.bands,
      coilCurrentsRms: points.map((p) => p.coilCurrentRms),
      tankVoltagesPeak: points.map((p) => p.tankVoltagePeak),
    };
  }

  // tank impedance against frequency, empty and loaded (coupling re-evaluated at each frequency)
  let impedance: HeaterImpedanceSweep | null = null;
  if (options.impedanceSweep !== false) {
    const f0 = emptyCoil.frequency;
    // a decade around the empty coil's resonance, widened to show every operating point (a
    // power-tracking bridge may run several times above resonance) with a 25 % margin
    const running = allPoints.map((p) => p.frequency).filter((f) => f > 0);
    const low = Math.log10(Math.min(f0 / Math.sqrt(10), ...running.map((f) => f / 1.25)));
    const high = Math.log10(Math.max(f0 * Math.sqrt(10), ...running.map((f) => f * 1.25)));
    const count = Math.max(41, Math.ceil(40 * (high - low)) + 1);
    const frequencies: number[] = [];
    for (let i = 0; i < count; i++) frequencies.push(10 ** (low + ((high - low) * i) / (count - 1)));
    const tank = (L: number, R: number) =>
      d.inverter.kind === "current-fed-parallel"
        ? parallelNetwork(capacitorElement(d.capacitor.capacitance), inductorElement(L, R))
        : seriesNetwork(inductorElement(L, R), capacitorElement(d.capacitor.capacitance));
    const magnitudeEmpty: number[] = [];
    const phaseEmpty: number[] = [];
    const magnitudeLoaded: number[] = [];
    const phaseLoaded: number[] = [];
    const empty = tankImpedanceSweep(tank(emptyCoil.coilInductance + emptyCoil.leadInductance, emptyCoil.coilResistance), frequencies);
    for (let i = 0; i < count; i++) {
      magnitudeEmpty.push(Math.hypot(empty.re[i] as number, empty.im[i] as number));
      phaseEmpty.push(Math.atan2(empty.im[i] as number, empty.re[i] as number));
    }
    // loaded: the part's coupling depends on frequency; use the operating point's permeability
    for (const f of frequencies) {
      const p = coilImpedanceAt(d, props, operating, f);
      const z = tankImpedanceSweep(tank(p.inductance, p.resistance), [f]);
      magnitudeLoaded.push(Math.hypot(z.re[0] as number, z.im[0] as number));
      phaseLoaded.push(Math.atan2(z.im[0] as number, z.re[0] as number));
    }
    impedance = { frequencies, magnitudeEmpty, phaseEmpty, magnitudeLoaded, phaseLoaded };
  }

  const bands = curve.bands;
  if (bands.length > 0) {
    const list = bands.map((band) => `${(band.from - 273.15).toFixed(0)}–${(band.to - 273.15).toFixed(0)} °C`).join(", ");
    validity.push({
      code: "no-operating-point",
      message: `The inverter has no operating point with the part at ${list} (${bands[0]?.reason ?? ""}); the study counts no power there and does not interpolate across it.`,
      value: bands[0]?.from ?? 0,
    });
  }
  const cautions = heaterCautions(d, facts, allPoints, heatUp?.finalTemperature ?? part.targetTemperature, validity, heatUp?.steadyStateTemperature ?? null);
  // the operating points' own cautions (tank voltage, hard switching) join the list once per code:
  // the safety module's caution of the same code, or the first point's, stands for the rest
  const latched = bands.filter((band) => band.noOscillation);
  if (latched.length > 0) {
    const list = latched.map((band) => `${(band.from - 273.15).toFixed(0)}–${(band.to - 273.15).toFixed(0)} °C`).join(", ");
    cautions.push({
      code: "tank-cannot-oscillate",
      severity: "danger",
      message: `With the part at ${list} the loaded tank's resistance exceeds √(L/C) for every permeability the part can take: the current-fed inverter cannot oscillate, its switches latch on and only the supply's internal resistance, the choke and the switches limit the current (a short circuit of the supply through the choke). Add current limiting or a shutdown, or change the tank so that √(L/C) exceeds the loaded resistance (less capacitance, more turns).`,
      value: latched[0]?.from ?? 0,
      limit: part.startTemperature,
      unit: "K",
      source: "current-fed inverter: the tank oscillates only while its coil-branch resistance is below √(L/C) (currentFedParallelInverter)",
    });
  }
  const seen = new Set(cautions.map((c) => c.code));
  for (const p of allPoints) {
    for (const c of p.cautions) {
      if (seen.has(c.code)) continue;
      seen.add(c.code);
      cautions.push(c);
    }
  }
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
    temperatureScan,
    impedance,
    cautions: sortCautions(cautions).map((c) => (c.message.endsWith(DEFER_TO_CODES) ? c : { ...c, message: `${c.message} ${DEFER_TO_CODES}` })),
    validity: uniqueNotes(validity),
    model,
    field: fieldModel === null ? null : fieldSummary(fieldModel, operating),
  };
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

/**
 * Surface and core of a bar or tube: {@link inductionRadialHeatUp} driven at each state by the
 * study's operating point at the surface temperature (frequency, the finite coil's surface field
 * as an equivalent long-coil current, and the part power as the total).
 */
function radialPart(
  d: ResolvedHeaterDescription,
  part: ResolvedPart & { readonly shape: "bar" | "tube" },
  curve: PowerCurve,
  duration: number,
  validity: ValidityNote[],
): HeaterRadialHeatUp | null {
  if (d.coil.shape !== "solenoid") return null;
  const coil = d.coil;
  const radius = part.shape === "bar" ? part.radius : part.outerRadius;
  const bore = part.shape === "tube" ? part.outerRadius - part.wallThickness : 0;
  const longCoil = { innerRadius: Math.max(coil.radius, radius), length: coil.length, turns: coil.turns };
  const perAmpere = (Math.SQRT2 * coil.turns) / coil.length;
  const r = inductionRadialHeatUp({
    part: part.shape === "bar" ? { shape: "bar", radius } : { shape: "tube", radius, innerRadius: bore },
    material: part.material,
    coil: longCoil,
    heatedLength: part.length,
    driveAt: (s) => {
      const t = s.surfaceTemperature;
      const solved = curve.valueAt(t, (p) => p.frequency);
      const frequency = solved > 0 ? solved : (curve.points[0]?.frequency ?? 1);
      const power = curve.valueAt(t, (p) => p.losses.part);
      // the finite coil's field at the part surface, as the current of the equivalent long coil
      const current = curve.valueAt(t, (p) => p.surfaceFieldStrengthPeak) / perAmpere;
      // the study's (finite-coil) power over the long coil's, both for the part uniform at t
      const resistivity = curve.valueAt(t, (p) => p.partResistivity);
      const relativePermeability = Math.max(1, curve.valueAt(t, (p) => p.partRelativePermeability));
      if (!(current > 0) || !(resistivity > 0)) return { frequency, coilCurrentRms: 0 };
      const long =
        bore > 0
          ? tubeInLongCoil({ coil: longCoil, tube: { outerRadius: radius, innerRadius: bore, resistivity, relativePermeability }, frequency })
          : barInLongCoil({ coil: longCoil, bar: { radius, resistivity, relativePermeability }, frequency });
      const longPower = long.reflectedResistance * current * current;
      return { frequency, coilCurrentRms: current, powerFactor: longPower > 0 ? power / longPower : 0 };
    },
    convectionCoefficient: d.environment.convectionCoefficient,
    emissivity: part.emissivity,
    ambientTemperature: d.environment.ambientTemperature,
    initialTemperature: part.startTemperature,
    duration,
    targetTemperature: part.targetTemperature,
    targetLocation: part.targetLocation ?? "mean",
    ...(part.soakBand === undefined ? {} : { soakBand: part.soakBand }),
    ...(part.hardeningTemperature === undefined ? {} : { hardeningTemperature: part.hardeningTemperature }),
  });
  let deviation = 0;
  const e = r.electrical;
  for (let i = 0; i < e.reflectedResistance.length; i++) {
    const u = e.uniformReflectedResistance[i]!;
    if (u > 0) deviation = Math.max(deviation, Math.abs(e.reflectedResistance[i]! / u - 1));
  }
  validity.push({
    code: "radial-heat-up",
    message: `Surface and core from the radial model: the power by depth is the exact long-coil field in ${r.positions.length} shells with their own ρ(T) and μr(T, H), at the coil current and frequency of the operating point at the surface temperature, scaled by the study's finite-coil over long-coil power for the part uniform at that temperature (the tank's response to the profile is not followed); the profile changed the power by up to ${Number((100 * deviation).toPrecision(2)).toString()} % against the part uniform at its surface temperature in this run; the power is spread over the part's length (an axial average) and its ends${bore > 0 ? " and bore are" : " are"} taken as insulated.`,
    value: deviation,
  });
  for (const note of r.validity) if (note.code !== "short-coil") validity.push(note);
  return {
    times: r.times,
    surfaceTemperatures: r.surfaceTemperatures,
    coreTemperatures: r.coreTemperatures,
    meanTemperatures: r.meanTemperatures,
    timeToSurfaceTarget: r.timeToSurfaceTarget,
    timeToCoreTarget: r.timeToCoreTarget,
    timeToMeanTarget: r.timeToMeanTarget,
    heatingTime: r.heatingTime,
    surfaceCoreDifferenceAtTarget: r.surfaceCoreDifferenceAtStop,
    soakBand: part.soakBand ?? null,
    soakTime: r.soakTime,
    hardeningTemperature: part.hardeningTemperature ?? null,
    hardeningDepth: r.hardeningDepth,
    uniformPowerDeviation: deviation,
  };
}
