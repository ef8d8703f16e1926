/**
 * `axisymmetricHeatConduction`: transient heat conduction in a part of rectangular r–z
 * cross-section (a bar, a tube, a disc, a ring) with temperature-dependent properties, the
 * enthalpy form of the heat equation, and convection and radiation at its faces.
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
import { checkConductiveMaterial } from "../materials/check-material.js";
import { surfaceTemperatureCaution } from "../safety/index.js";
import { ConductionLattice } from "./conduction-lattice.js";
import type { FieldRectangle } from "./field-types.js";

/**
 * The four faces of a part's r–z rectangle: `"outer"` (r = rMax, the mantle), `"inner"`
 * (r = rMin > 0, the bore of a tube or ring), `"lower"` (z = zMin) and `"upper"` (z = zMax).
 *
 * @category Field
 */
export type PartFace = "outer" | "inner" | "lower" | "upper";

/**
 * Heat exchange of the part's faces with the surroundings: convection and grey-body radiation,
 * the same on every face that is not insulated.
 *
 * @category Field
 */
export interface PartSurfaceExchange {
  /** Convection coefficient [W/(m²·K)], ≥ 0. */
  readonly convectionCoefficient: number;
  /** Total hemispherical emissivity [-], 0 … 1. */
  readonly emissivity: number;
  /** Temperature of the surrounding air and walls [K], > 0. */
  readonly ambientTemperature: number;
}

/**
 * Number of conduction cells across the part: `radial` across r (graded towards the heated
 * faces) and `axial` along z (graded towards both ends).
 *
 * @category Field
 */
export interface PartCells {
  /** Cells across the radius or wall, an integer 2 … 200. */
  readonly radial: number;
  /** Cells along the axis, an integer 1 … 200. */
  readonly axial: number;
}

/**
 * What a heat-generation callback receives; it writes the power generated in each cell.
 *
 * @category Field
 */
export interface PartGenerationRequest {
  /** Time [s] at the start of the step over which the generation is held. */
  readonly time: number;
  /** Temperature of each cell [K], cell (i, j) at `i·axial + j` (i radial from rMin, j axial from zMin); read only. */
  readonly temperatures: Float64Array;
  /** To fill: power generated in each cell [W] (finite, ≥ 0), same indexing. */
  readonly generation: Float64Array;
}

/**
 * Options of {@link axisymmetricHeatConduction}.
 *
 * @category Field
 */
export interface AxisymmetricHeatConductionOptions {
  /** The part's cross-section: a rectangle of the r–z half-plane [m]. */
  readonly shape: FieldRectangle;
  /**
   * The part's material: density, specific heat c(T) (its enthalpy integral, the peak at the
   * Curie point included) and thermal conductivity k(T); also the melting temperature for the
   * caution.
   */
  readonly material: ConductiveMaterial;
  /** Cells across the part; default `{ radial: 16, axial: 16 }`. */
  readonly cells?: PartCells;
  /** Heat exchange at the faces that are not insulated. */
  readonly surface: PartSurfaceExchange;
  /** Faces with no heat flow (symmetry planes, faces in contact with insulation); default none. */
  readonly insulatedFaces?: readonly PartFace[];
  /** Uniform starting temperature [K], > 0; default the ambient temperature. */
  readonly initialTemperature?: number;
  /** Uniform heat generation [W/m³], ≥ 0, held constant (instead of `generationAt`). */
  readonly powerDensity?: number;
  /** Heat generation per cell, recomputed at the start of each time step (instead of `powerDensity`). */
  readonly generationAt?: (request: PartGenerationRequest) => void;
  /** Time span simulated [s], > 0. */
  readonly duration: number;
  /** Temperature at which the heating stops and the run ends [K], > 0 (optional). */
  readonly targetTemperature?: number;
  /** Which temperature the target applies to: the hottest point (`"maximum"`, default), the volume `"mean"` or the `"centre"`. */
  readonly targetLocation?: "maximum" | "mean" | "centre";
  /** Largest temperature change of any cell in one time step [K], > 0; default 4 K (sets the step size). */
  readonly temperatureStep?: number;
  /** Largest time step [s], > 0; default `duration`/100. */
  readonly maxTimeStep?: number;
  /** Times [s] at which temperature maps are kept (the end state is always kept); default none. */
  readonly mapTimes?: readonly number[];
}

/**
 * The cell grid of a conduction result: cell (i, j) spans `rEdges[i] … rEdges[i+1]` and
 * `zEdges[j] … zEdges[j+1]`; maps index it as `i·axial + j`.
 *
 * @category Field
 */
export interface PartGrid {
  /** Radial cell boundaries [m], from rMin to rMax. */
  readonly rEdges: readonly number[];
  /** Axial cell boundaries [m], from zMin to zMax. */
  readonly zEdges: readonly number[];
  /** Cells across r. */
  readonly radial: number;
  /** Cells along z. */
  readonly axial: number;
}

/**
 * A temperature map: every cell's temperature at one time.
 *
 * @category Field
 */
export interface PartTemperatureMap {
  /** Time [s]. */
  readonly time: number;
  /** Cell temperatures [K], cell (i, j) at `i·axial + j` ({@link PartGrid}). */
  readonly temperatures: Float64Array;
}

/**
 * Energy balance of a heat-up [J]: generated = stored + lost, to the rounding of the implicit solve.
 *
 * @category Field
 */
export interface PartEnergyBalance {
  /** Heat generated in the part [J]. */
  readonly input: number;
  /** Heat stored: the enthalpy rise of every cell [J]. */
  readonly stored: number;
  /** Heat lost through the faces by convection and radiation [J]. */
  readonly lost: number;
  /** `input − stored − lost` [J]. */
  readonly imbalance: number;
}

/**
 * Result of {@link axisymmetricHeatConduction}: histories at every time step, temperature maps
 * and the energy balance.
 *
 * @category Field
 */
export interface AxisymmetricHeatConductionResult {
  /** The cell grid. */
  readonly grid: PartGrid;
  /** Times [s] of the histories, from 0. */
  readonly times: number[];
  /** Coldest cell [K]. */
  readonly minimumTemperature: number[];
  /** Hottest point [K]: the hottest cell or face. */
  readonly maximumTemperature: number[];
  /** Volume-mean temperature [K]. */
  readonly meanTemperature: number[];
  /** Hottest point of the exposed faces [K] (insulated faces are symmetry planes or covered; with every face insulated, the hottest cell along the mantle). */
  readonly surfaceTemperature: number[];
  /** Temperature of the cell at the middle of the inner edge (the axis of a bar, at half length) [K]. */
  readonly centreTemperature: number[];
  /** Heat generated in the part over the step that ends at each time [W] (0 at time 0). */
  readonly power: number[];
  /** Temperature maps at the requested `mapTimes` (first step at or after each) and at the end. */
  readonly maps: PartTemperatureMap[];
  /** When the target temperature was reached [s] (interpolated in the last step), or `null`. */
  readonly targetReachedAt: number | null;
  /** Energy balance over the run. */
  readonly energy: PartEnergyBalance;
  /** Time steps taken. */
  readonly steps: number;
  /** Hot-surface and melting cautions. */
  readonly cautions: Caution[];
  /** Where the result may fall short. */
  readonly validity: ValidityNote[];
}

const WHERE = "axisymmetricHeatConduction";
const KNOWN = [
  "shape",
  "material",
  "cells",
  "surface",
  "insulatedFaces",
  "initialTemperature",
  "powerDensity",
  "generationAt",
  "duration",
  "targetTemperature",
  "targetLocation",
  "temperatureStep",
  "maxTimeStep",
  "mapTimes",
] as const;
const RECT_KEYS = ["kind", "rMin", "rMax", "zMin", "zMax"] as const;
const CELL_KEYS = ["radial", "axial"] as const;
const SURFACE_KEYS = ["convectionCoefficient", "emissivity", "ambientTemperature"] as const;
const FACES = ["outer", "inner", "lower", "upper"] as const;
/** Most time steps of one run (a bound on run time). */
const MAX_STEPS = 200_000;

/** Checks a rectangle (used by the conduction and the coupled heat-up). */
export function checkPartRectangle(where: string, path: string, value: unknown): FieldRectangle {
  const o = requireKnownKeys(where, path, requireObject(where, path, value), RECT_KEYS);
  requireOneOf(where, `${path}.kind`, o.kind, ["rectangle"] as const);
  const rMin = requireNonNegative(where, `${path}.rMin`, o.rMin, "m");
  const rMax = requirePositive(where, `${path}.rMax`, o.rMax, "m");
  if (!(rMax > rMin)) throw new InputError(where, `${path}.rMax`, rMax, "m", `a finite number > rMin = ${rMin}`);
  const zMin = requireInRange(where, `${path}.zMin`, o.zMin, "m", -1e6, 1e6);
  const zMax = requireInRange(where, `${path}.zMax`, o.zMax, "m", -1e6, 1e6);
  if (!(zMax > zMin)) throw new InputError(where, `${path}.zMax`, zMax, "m", `a finite number > zMin = ${zMin}`);
  return { kind: "rectangle", rMin, rMax, zMin, zMax };
}

/** Checks the cell counts. */
export function checkPartCells(where: string, value: unknown, path = "cells"): PartCells {
  if (value === undefined) return { radial: 16, axial: 16 };
  const o = requireKnownKeys(where, path, requireObject(where, path, value), CELL_KEYS);
  const radial = requireInteger(where, `${path}.radial`, o.radial, 2);
  const axial = requireInteger(where, `${path}.axial`, o.axial, 1);
  if (radial > 200) throw new InputError(where, `${path}.radial`, radial, "", "an integer 2 … 200");
  if (axial > 200) throw new InputError(where, `${path}.axial`, axial, "", "an integer 1 … 200");
  return { radial, axial };
}

/** Checks the surface exchange. */
export function checkPartSurface(where: string, value: unknown): PartSurfaceExchange {
  const o = requireKnownKeys(where, "surface", requireObject(where, "surface", value), SURFACE_KEYS);
  return {
    convectionCoefficient: requireNonNegative(where, "surface.convectionCoefficient", o.convectionCoefficient, "W/(m²·K)"),
    emissivity: requireInRange(where, "surface.emissivity", o.emissivity, "", 0, 1),
    ambientTemperature: requirePositive(where, "surface.ambientTemperature", o.ambientTemperature, "K"),
  };
}

/** Checks the list of insulated faces. */
export function checkInsulatedFaces(where: string, value: unknown): Set<PartFace> {
  const out = new Set<PartFace>();
  if (value === undefined) return out;
  if (!Array.isArray(value)) throw new InputError(where, "insulatedFaces", value, "", 'an array of "outer", "inner", "lower", "upper"');
  (value as unknown[]).forEach((f, k) => out.add(requireOneOf(where, `insulatedFaces[${k}]`, f, FACES)));
  return out;
}

/**
 * Cell boundaries from a to b: `n` cells, graded by the power `p` towards b (`towardsA`: towards a
 * as well, symmetric). p = 1 is uniform.
 */
export function gradedEdges(a: number, b: number, n: number, p: number, both: boolean): number[] {
  const out: number[] = [];
  for (let k = 0; k <= n; k++) {
    const x = k / n;
    let s: number;
    if (both) {
      // symmetric: fine at both ends
      const y = 2 * x - 1; // −1 … 1
      s = 0.5 * (1 + Math.sign(y) * (1 - Math.pow(1 - Math.abs(y), p)));
    } else {
      s = 1 - Math.pow(1 - x, p);
    }
    out.push(a + (b - a) * s);
  }
  out[0] = a;
  out[n] = b;
  return out;
}

/** Validated inputs of the conduction solver shared with the coupled heat-up. */
export interface ConductionSetup {
  readonly shape: FieldRectangle;
  readonly material: ConductiveMaterial;
  readonly cells: PartCells;
  readonly surface: PartSurfaceExchange;
  readonly insulated: Set<PartFace>;
  readonly initial: number;
  readonly duration: number;
  readonly target: number | null;
  readonly targetLocation: "maximum" | "mean" | "centre";
  readonly temperatureStep: number;
  readonly maxTimeStep: number;
  readonly mapTimes: number[];
  /** Cell boundaries. */
  readonly rEdges: number[];
  readonly zEdges: number[];
}

/** Builds the graded cell boundaries of a part. */
export function partEdges(shape: FieldRectangle, cells: PartCells, insulated: Set<PartFace>): { rEdges: number[]; zEdges: number[] } {
  const innerExposed = shape.rMin > 0 && !insulated.has("inner");
  // radial: graded towards the mantle (and the bore when it exchanges heat)
  const rEdges = gradedEdges(shape.rMin, shape.rMax, cells.radial, 1.6, innerExposed);
  const zEdges = gradedEdges(shape.zMin, shape.zMax, cells.axial, cells.axial > 2 ? 1.6 : 1, true);
  return { rEdges, zEdges };
}

/** Reads the thermal options common to both public functions. */
export function readConductionSetup(where: string, o: Record<string, unknown>, part: Record<string, unknown> = o, prefix = ""): ConductionSetup {
  const shape = checkPartRectangle(where, `${prefix}shape`, part.shape);
  const material = checkConductiveMaterial(where, `${prefix}material`, part.material);
  const cells = checkPartCells(where, part.cells, `${prefix}cells`);
  const surface = checkPartSurface(where, o.surface);
  const insulated = checkInsulatedFaces(where, o.insulatedFaces);
  const initial = o.initialTemperature === undefined ? surface.ambientTemperature : requirePositive(where, "initialTemperature", o.initialTemperature, "K");
  const duration = requirePositive(where, "duration", o.duration, "s");
  const target = o.targetTemperature === undefined ? null : requirePositive(where, "targetTemperature", o.targetTemperature, "K");
  const targetLocation = o.targetLocation === undefined ? "maximum" : requireOneOf(where, "targetLocation", o.targetLocation, ["maximum", "mean", "centre"] as const);
  const temperatureStep = o.temperatureStep === undefined ? 4 : requirePositive(where, "temperatureStep", o.temperatureStep, "K");
  const maxTimeStep = o.maxTimeStep === undefined ? duration / 100 : requirePositive(where, "maxTimeStep", o.maxTimeStep, "s");
  let mapTimes: number[] = [];
  if (o.mapTimes !== undefined) {
    if (!Array.isArray(o.mapTimes)) throw new InputError(where, "mapTimes", o.mapTimes, "s", "an array of times ≥ 0");
    mapTimes = (o.mapTimes as unknown[]).map((t, k) => requireNonNegative(where, `mapTimes[${k}]`, t, "s")).sort((a, b) => a - b);
  }
  const { rEdges, zEdges } = partEdges(shape, cells, insulated);
  return { shape, material, cells, surface, insulated, initial, duration, target, targetLocation, temperatureStep, maxTimeStep, mapTimes, rEdges, zEdges };
}

/**
 * The implicit conduction solver (internal): backward Euler in the enthalpy form, Newton's
 * method on each step, the sparse symmetric system factorised by the library's LDLᵀ.
 */
export function runConduction(
  setup: ConductionSetup,
  generationAt: (request: PartGenerationRequest) => void,
  where: string,
): AxisymmetricHeatConductionResult {
  const { initial, duration, target, targetLocation, temperatureStep, maxTimeStep, mapTimes } = setup;
  const lattice = new ConductionLattice(setup);
  const { n, T } = lattice;
  const history = new ConductionHistory(lattice);
  const Told = new Float64Array(n);
  const Hold = new Float64Array(n);
  const gen = new Float64Array(n);
  // face temperatures for the first record
  lattice.faceLoss();
  history.record();

  let input = 0;
  let lost = 0;
  let time = 0;
  let dt = Math.min(maxTimeStep, duration / 1000);
  let steps = 0;
  let mapNext = 0;
  let targetReachedAt: number | null = null;
  let newtonTrouble = 0;

  while (time < duration * (1 - 1e-12) && steps < MAX_STEPS) {
    // generation, held over the step
    gen.fill(0);
    generationAt({ time, temperatures: T, generation: gen });
    let genTotal = 0;
    for (let c = 0; c < n; c++) {
      const g = gen[c]!;
      if (!(g >= 0) || g === Infinity) throw new InputError(where, `generation[${c}]`, g, "W", "a finite number ≥ 0 from the generation callback");
      genTotal += g;
    }
    if (time + dt > duration) dt = duration - time;
    Told.set(T);
    lattice.enthalpies(Hold);
    if (!lattice.newtonStep(dt, Hold, gen)) newtonTrouble++;
    // final residual-consistent bookkeeping: loss from the converged face flows
    const stepLoss = lattice.faceLoss();
    input += genTotal * dt;
    lost += stepLoss * dt;
    time += dt;
    steps++;
    history.times.push(time);
    history.power.push(genTotal);
    history.record();
    let change = 0;
    for (let c = 0; c < n; c++) change = Math.max(change, Math.abs(T[c]! - Told[c]!));
    while (mapNext < mapTimes.length && mapTimes[mapNext]! <= time * (1 + 1e-12)) {
      history.maps.push({ time, temperatures: Float64Array.from(T) });
      mapNext++;
    }
    if (target !== null) {
      const series = targetLocation === "maximum" ? history.maximumTemperature : targetLocation === "mean" ? history.meanTemperature : history.centreTemperature;
      const k = history.times.length - 1;
      const v = series[k]!;
      if (v >= target) {
        const before = series[k - 1]!;
        targetReachedAt = v > before ? history.times[k - 1]! + ((target - before) / (v - before)) * dt : time;
        break;
      }
    }
    // next step from the change of this one
    const grow = change > 0 ? temperatureStep / change : 2;
    dt = Math.min(maxTimeStep, dt * Math.min(2, Math.max(0.3, grow)));
  }
  const maps = history.maps;
  if (maps.length === 0 || maps[maps.length - 1]!.time !== time) maps.push({ time, temperatures: Float64Array.from(T) });
  const stored = lattice.storedEnergy(initial);
  const { cautions, validity } = conductionNotes(setup, history, { newtonTrouble, steps, time });
  return {
    grid: { rEdges: [...setup.rEdges], zEdges: [...setup.zEdges], radial: lattice.nr, axial: lattice.nz },
    times: history.times,
    minimumTemperature: history.minimumTemperature,
    maximumTemperature: history.maximumTemperature,
    meanTemperature: history.meanTemperature,
    surfaceTemperature: history.surfaceTemperature,
    centreTemperature: history.centreTemperature,
    power: history.power,
    maps,
    targetReachedAt,
    energy: { input, stored, lost, imbalance: input - stored - lost },
    steps,
    cautions,
    validity,
  };
}

/** The curves of a run: one entry per recorded state. */
class ConductionHistory {
  readonly times: number[] = [0];
  readonly minimumTemperature: number[] = [];
  readonly maximumTemperature: number[] = [];
  readonly meanTemperature: number[] = [];
  readonly surfaceTemperature: number[] = [];
  readonly centreTemperature: number[] = [];
  readonly power: number[] = [0];
  readonly maps: PartTemperatureMap[] = [];
  private readonly centreCell: number;

  constructor(private readonly lattice: ConductionLattice) {
    this.centreCell = Math.floor(lattice.nz / 2);
  }

  /** Appends the present minimum, maximum, mean, surface and centre temperatures. */
  record(): void {
    const { n, nr, nz, T, volume, totalVolume, faces, faceTemp } = this.lattice;
    let lo = Infinity;
    let hi = -Infinity;
    let sum = 0;
    for (let c = 0; c < n; c++) {
      const t = T[c]!;
      if (t < lo) lo = t;
      if (t > hi) hi = t;
      sum += t * volume[c]!;
    }
    let surf = -Infinity;
    for (let s = 0; s < faces.length; s++) surf = Math.max(surf, faceTemp[s]!);
    // every face insulated: the cells along the mantle stand for the surface
    if (faces.length === 0) for (let j = 0; j < nz; j++) surf = Math.max(surf, T[(nr - 1) * nz + j]!);
    this.minimumTemperature.push(lo);
    this.maximumTemperature.push(Math.max(hi, surf));
    this.meanTemperature.push(sum / totalVolume);
    this.surfaceTemperature.push(surf);
    const centreCell = this.centreCell;
    this.centreTemperature.push(nz % 2 === 0 ? 0.5 * (T[centreCell - 1]! + T[centreCell]!) : T[centreCell]!);
  }
}

/** Validity notes (Newton trouble, step limit, data range) and cautions (hot surface, melting) of a finished run. */
function conductionNotes(setup: ConductionSetup, history: ConductionHistory, run: { newtonTrouble: number; steps: number; time: number }): { cautions: Caution[]; validity: ValidityNote[] } {
  const { material, duration } = setup;
  const { newtonTrouble, steps, time } = run;
  const melting = material.meltingTemperature;
  const validity: ValidityNote[] = [];
  if (newtonTrouble > 0) {
    validity.push({
      code: "newton-not-converged",
      message: `Newton's method did not converge on ${newtonTrouble} time steps; reduce temperatureStep or maxTimeStep`,
      value: newtonTrouble,
      limit: 0,
    });
  }
  if (steps >= MAX_STEPS && time < duration) {
    validity.push({ code: "step-limit", message: `stopped after ${MAX_STEPS} time steps at ${time} s`, value: time, limit: duration });
  }
  const cautions: Caution[] = [];
  let hottest = 0;
  for (const v of history.maximumTemperature) hottest = Math.max(hottest, v);
  let hottestSurface = 0;
  for (const v of history.surfaceTemperature) hottestSurface = Math.max(hottestSurface, v);
  const hot = surfaceTemperatureCaution({ temperature: hottestSurface, location: "part surface" });
  if (hot !== null) cautions.push(hot);
  if (hottest > melting) {
    cautions.push({
      code: "part-above-melting",
      severity: "danger",
      message: `The part reaches ${Math.round(hottest)} K, above the ${Math.round(melting)} K at which ${material.name} melts: molten metal can spill and splash, and the solid-state model no longer holds. Reduce the power or the time. Follow local codes and licensed practice.`,
      value: hottest,
      limit: melting,
      unit: "K",
      source: `melting temperature of the material set (${material.id})`,
    });
  }
  if (hottest > material.temperatureRange.max) {
    validity.push({
      code: "above-material-data",
      message: `the part reaches ${Math.round(hottest)} K, above the ${Math.round(material.temperatureRange.max)} K to which the material data are documented (end values held)`,
      value: hottest,
      limit: material.temperatureRange.max,
    });
  }
  return { cautions, validity };
}

/**
 * Transient heat conduction in an axisymmetric part of rectangular r–z cross-section (a bar,
 * a tube, a disc, a ring) with temperature-dependent properties, heat generated inside it, and
 * convection and radiation at its faces: temperature maps and histories against time.
 *
 * The heat equation in the enthalpy form, with $h(T) = \int c\,dT$ the specific enthalpy
 * (the latent-like peak of steel's specific heat at the Curie point included exactly),
 * $$\rho_m\,\frac{\partial h(T)}{\partial t} = \frac1r\frac{\partial}{\partial r}\Big(r\,k(T)\,\frac{\partial T}{\partial r}\Big) + \frac{\partial}{\partial z}\Big(k(T)\,\frac{\partial T}{\partial z}\Big) + q ,$$
 * and at an exposed face $-k\,\partial T/\partial n = h_c\,(T_s - T_a) + \varepsilon\sigma\,(T_s^4 - T_a^4)$.
 * Finite volumes on a grid of rings (cells graded towards the exposed faces; the radial
 * conductance of a cell half is the exact $\ln(r_2/r_1)/2\pi L k$), backward Euler in time
 * with Newton's method on each step (the face temperature solved in each face's balance), the
 * sparse symmetric system factorised by the library's $LDL^{\mathsf T}$
 * ({@link factorComplexSymmetric}) in nested-dissection order. The time step follows the
 * largest temperature change of a cell per step (`temperatureStep`). Energy is conserved by
 * construction: generated = stored + lost to the Newton tolerance (1e-7 K per cell).
 *
 * @param options - the part, its material and cells, the faces' heat exchange, the heat
 *   generation and the time span ({@link AxisymmetricHeatConductionOptions})
 * @returns histories (minimum, maximum, mean, surface, centre temperature [K], power [W]),
 *   temperature maps, the energy balance [J], cautions ({@link AxisymmetricHeatConductionResult})
 * @throws {@link InputError} for a malformed rectangle, cell counts outside 2…200 (radial) or
 *   1…200 (axial), a negative convection coefficient, an emissivity outside [0, 1], non-positive
 *   temperatures, duration or steps, both or neither of `powerDensity` and `generationAt`, a
 *   generation callback that writes a negative or non-finite power, an unknown face name,
 *   and unknown option keys
 * @remarks Validity: solid-state conduction with isotropic k(T); the part's dimensions do not
 *   change with temperature; the material data's own range (noted in `validity` when left);
 *   above the melting temperature the result carries the `"part-above-melting"` caution.
 *   Every cell's temperature is its volume mean; `surfaceTemperature` is that of the faces.
 *
 *   Accuracy (measured, test/field/axisymmetric-conduction.test.ts): with the default 16 × 16
 *   cells and `temperatureStep` 4 K, within 0.5 % of the temperature change (measured ≤ 3.4e-3)
 *   against the exact series of Carslaw & Jaeger for a long cylinder with uniform generation
 *   and a convective surface (Bi = 0.5, Fo = 0.05…1: core, mid-radius, surface) and for a
 *   finite cylinder cooling by convection on every face (Bi 1 and 1.5, Fo = 0.05…1: every
 *   cell and the mean); the error falls with the cell size and the time step (32 × 32 cells,
 *   1 K steps: ≤ 9e-4). Energy balance: |imbalance| ≤ 1e-6 of the heat generated (measured
 *   ≈ 1e-15 relative).
 * @see H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed. (1959), §7.8
 *   (cylinder with a convective surface, eq. (7.8.9)), §7.9 (with heat production), §8.2
 *   (products of solutions for a finite cylinder); S. V. Patankar, Numerical Heat Transfer and
 *   Fluid Flow (1980), ch. 4 (finite volumes, harmonic-mean face conductances).
 * @example
 * ```ts
 * import { axisymmetricHeatConduction, mediumCarbonSteel } from "fluxwright";
 * // a 40 mm × 100 mm steel billet with 2 MW/m³ generated inside, cooling in still air
 * const run = axisymmetricHeatConduction({
 *   shape: { kind: "rectangle", rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.1 },
 *   material: mediumCarbonSteel,
 *   surface: { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15 },
 *   powerDensity: 2e6,
 *   duration: 60,
 * });
 * console.log(run.meanTemperature[run.meanTemperature.length - 1]!.toFixed(0)); // 327
 * ```
 * @category Field
 */
export function axisymmetricHeatConduction(options: AxisymmetricHeatConductionOptions): AxisymmetricHeatConductionResult {
  const o = requireKnownKeys(WHERE, "", requireObject(WHERE, "options", options), KNOWN);
  const setup = readConductionSetup(WHERE, o);
  const hasDensity = o.powerDensity !== undefined;
  const hasCallback = o.generationAt !== undefined;
  if (hasDensity === hasCallback) {
    throw new InputError(WHERE, "powerDensity", o.powerDensity, "W/m³", "given alone, or a generationAt callback instead (exactly one of the two)");
  }
  let generationAt: (request: PartGenerationRequest) => void;
  if (hasDensity) {
    const q = requireNonNegative(WHERE, "powerDensity", o.powerDensity, "W/m³");
    const { rEdges, zEdges, cells } = setup;
    const perCell = new Float64Array(cells.radial * cells.axial);
    for (let i = 0; i < cells.radial; i++) {
      const ring = Math.PI * (rEdges[i + 1]! * rEdges[i + 1]! - rEdges[i]! * rEdges[i]!);
      for (let j = 0; j < cells.axial; j++) perCell[i * cells.axial + j] = q * ring * (zEdges[j + 1]! - zEdges[j]!);
    }
    generationAt = (request) => {
      request.generation.set(perCell);
    };
  } else {
    if (typeof o.generationAt !== "function") throw new InputError(WHERE, "generationAt", o.generationAt, "", "a function (request) => void");
    generationAt = o.generationAt as (request: PartGenerationRequest) => void;
  }
  return runConduction(setup, generationAt, WHERE);
}
