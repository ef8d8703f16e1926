/**
 * `fieldHeatUp`: the coupled electro-thermal heat-up of an axisymmetric part — the eddy-current
 * field of {@link solveAxisymmetricField} re-solved as the part's resistivity and permeability
 * change with temperature (through the Curie point), driving the transient conduction of
 * {@link axisymmetricHeatConduction}.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, requirePositive, InputError } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { runConduction } from "./conduction-run.js";
import { readConductionSetup } from "./conduction-setup.js";
import type { ConductionSetup } from "./conduction-setup.js";
import type { AxisymmetricHeatConductionResult, PartCells, PartFace, PartGenerationRequest, PartSurfaceExchange } from "./conduction-types.js";
import type { AxisymmetricFieldCoil, FieldRectangle, FieldRegion } from "./field-types.js";
import { HeatUpCoupling } from "./heat-up-coupling.js";
import type { FieldHeatUpSolution, HeatedCells } from "./heat-up-coupling.js";
import { readProblem } from "./read-field-problem.js";

export type { FieldHeatUpCoilState, FieldHeatUpSolution } from "./heat-up-coupling.js";

/**
 * The heated part of {@link fieldHeatUp}: a rectangle of the r–z half-plane of one material,
 * divided into conduction cells that are also the field's property zones.
 *
 * @category Field
 */
export interface FieldHeatedPart {
  /** Name (unique among the regions). */
  readonly name: string;
  /** Cross-section [m]. */
  readonly shape: FieldRectangle;
  /** Material: ρ(T), μr(T, H) through the Curie point, density, c(T), k(T), melting temperature. */
  readonly material: ConductiveMaterial;
  /** Cells across the part (conduction cells and field property zones): at most 40 each way and 400 in all; default `{ radial: 8, axial: 8 }`. */
  readonly cells?: PartCells;
}

/**
 * Options of {@link fieldHeatUp}.
 *
 * @category Field
 */
export interface FieldHeatUpOptions {
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** The coils, as for {@link solveAxisymmetricField}; each `current` is held (RMS, A). */
  readonly coils: readonly AxisymmetricFieldCoil[];
  /** Other bodies (concentrators, parts not heated), with fixed properties; default none. */
  readonly regions?: readonly FieldRegion[];
  /** The part that heats. */
  readonly part: FieldHeatedPart;
  /** Heat exchange of the part's exposed faces. */
  readonly surface: PartSurfaceExchange;
  /** Faces of the part with no heat flow (symmetry planes, covered faces); default none. */
  readonly insulatedFaces?: readonly PartFace[];
  /** Uniform starting temperature [K], > 0; default the ambient temperature. */
  readonly initialTemperature?: number;
  /** Time span simulated [s], > 0. */
  readonly duration: number;
  /** Temperature at which the heating stops and the run ends [K], > 0 (optional). */
  readonly targetTemperature?: number;
  /** What the target applies to: `"maximum"` (default), `"mean"` or `"centre"`. */
  readonly targetLocation?: "maximum" | "mean" | "centre";
  /**
   * The field is re-solved when any cell's temperature has moved by more than this since the
   * last solution [K], > 0; default 40 K.
   */
  readonly resolveStep?: number;
  /** Target relative error of the coils' impedance for the field solutions, in [1e-3, 0.1]; default 1e-2. */
  readonly accuracy?: number;
  /** Largest temperature change of any cell in one time step [K], > 0; default 4 K. */
  readonly temperatureStep?: number;
  /** Largest time step [s], > 0; default `duration`/100. */
  readonly maxTimeStep?: number;
  /** Times [s] at which temperature maps are kept (the end state is always kept). */
  readonly mapTimes?: readonly number[];
}

/**
 * Result of {@link fieldHeatUp}: the conduction result plus the field history.
 *
 * @category Field
 */
export interface FieldHeatUpResult extends AxisymmetricHeatConductionResult {
  /** Every field solution, in time order (the first at the starting temperature). */
  readonly solutions: FieldHeatUpSolution[];
  /** Field solutions for new temperatures. */
  readonly fieldSolutions: number;
  /** Finite-element solves in all (≥ `fieldSolutions`: permeability iterations and the starting error estimate). */
  readonly fieldIterations: number;
  /** Estimated relative error of the coils' impedance at the starting temperature (change between two meshes). */
  readonly estimatedError: number;
}

const WHERE = "fieldHeatUp";
const KNOWN = [
  "frequency",
  "coils",
  "regions",
  "part",
  "surface",
  "insulatedFaces",
  "initialTemperature",
  "duration",
  "targetTemperature",
  "targetLocation",
  "resolveStep",
  "accuracy",
  "temperatureStep",
  "maxTimeStep",
  "mapTimes",
] as const;
const PART_KEYS = ["name", "shape", "material", "cells"] as const;
/** Most cells of the part along r or z, and in all (each is a body of the field problem). */
const MAX_CELLS_ALONG = 40;
const MAX_CELLS = 400;

/**
 * Heats an axisymmetric part in the field of coaxial coils: the eddy-current field
 * ({@link solveAxisymmetricField}'s finite elements) with each cell's resistivity and
 * permeability at its temperature, re-solved whenever a cell has moved by `resolveStep`, and
 * the transient conduction ({@link axisymmetricHeatConduction}) driven by the induced power of
 * each cell; temperature maps, surface, centre and mean temperatures and the power against time.
 *
 * Coupling: the part is divided into `cells.radial × cells.axial` ring cells (graded towards
 * the exposed faces); each is a region of the field problem with
 * $\rho = \rho(T_c)$ and $\mu_r = \mu_r(T_c, \hat H_c)$ ({@link resistivityAt},
 * {@link relativePermeabilityAt}: $\mu_r = 1$ at and above the Curie temperature), where
 * $\hat H_c = \sqrt2\,|B|/\mu_0\mu_r$ is the peak field strength at the cell's centre,
 * found by fixed-point iteration (up to 3 solves per solution, 6 at the start, until the
 * field-weighted change of μr is below 3 %). The power of cell c is the finite-element loss
 * integral $P_c = \int_c \sigma|E|^2\,dV$, held over the time steps until the next
 * solution, so the energy balance is exact: $\int\sum_c P_c\,dt$ = stored + lost. The field
 * mesh density is chosen at the starting temperature by refining until the coils' impedance
 * changes by less than `accuracy` and then held (the mesh follows the skin depth of every
 * cell as it changes).
 *
 * @param options - frequency, coils, other regions, the part, surface exchange, time span and
 *   coupling settings ({@link FieldHeatUpOptions})
 * @returns histories, temperature maps, energy balance, cautions (as
 *   {@link axisymmetricHeatConduction}) and the field solutions ({@link FieldHeatUpResult})
 * @throws {@link InputError} for everything {@link solveAxisymmetricField} and
 *   {@link axisymmetricHeatConduction} reject, a part that is not a rectangle, a non-positive
 *   `resolveStep`, `accuracy` outside [1e-3, 0.1], and unknown option keys
 * @remarks Validity: the coil currents are held (no supply model); the time-harmonic field at
 *   one frequency (μr at the peak field, no hysteresis loss or harmonics); dimensions fixed;
 *   the part's material data range. The power between re-solutions lags the temperature by at
 *   most `resolveStep`.
 *
 *   Accuracy (measured, test/field/field-heat-up.test.ts): the conduction as
 *   {@link axisymmetricHeatConduction} (0.5 % of the temperature change against Carslaw &
 *   Jaeger); the induced power of a non-magnetic bar (30 radii long) in a long coil within 1 %
 *   of the exact Bessel solution ({@link barInLongCoil}) at accuracy 1e-2; a long steel bar
 *   heated in a long coil (1 kHz, to about 300 °C) within 4 % of the temperature rise of the
 *   one-dimensional `inductionRadialHeatUp` (layered Bessel field with 60 shells, radial
 *   conduction) with 12 radial cells (measured 2.4 %). The μr(H) of a steel skin layer is
 *   resolved by the cells: with 6 radial cells the same bar heated through Curie rose 9 %
 *   less than the one-dimensional model, 2.4 % with 12 (docs/field.md); use more radial cells
 *   near the surface when the skin depth is small. Energy balance: |imbalance| ≤ 1e-6 of the
 *   energy induced.
 * @see H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed. (1959) (the checks);
 *   P. P. Silvester, R. L. Ferrari, Finite Elements for Electrical Engineers, 3rd ed. (1996),
 *   ch. 9 (eddy currents); V. Rudnev, D. Loveless, R. Cook, M. Black, Handbook of Induction
 *   Heating (2003), ch. 3 (coupled electromagnetic–thermal heat-up through the Curie point).
 * @example
 * ```ts
 * import { fieldHeatUp, mediumCarbonSteel } from "fluxwright";
 * // a 30 mm steel billet, 80 mm long, in a 6-turn coil at 10 kHz, 1.2 kA, for 5 s
 * const run = fieldHeatUp({
 *   frequency: 10e3,
 *   coils: [{ name: "coil", current: 1200, resistivity: 1.75e-8, model: "stranded",
 *             turns: { shape: { kind: "rectangle", rMin: 0.025, rMax: 0.03, zMin: -0.05, zMax: 0.05 }, count: 6 } }],
 *   part: { name: "billet", shape: { kind: "rectangle", rMin: 0, rMax: 0.015, zMin: -0.04, zMax: 0.04 },
 *           material: mediumCarbonSteel, cells: { radial: 8, axial: 6 } },
 *   surface: { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15 },
 *   duration: 5,
 * });
 * console.log(run.solutions.length > 1); // true
 * console.log(run.surfaceTemperature[run.surfaceTemperature.length - 1]! > 600); // true
 * ```
 * @category Field
 */
export function fieldHeatUp(options: FieldHeatUpOptions): FieldHeatUpResult {
  const { setup, cells, accuracy } = readHeatUp(options);
  const coupling = new HeatUpCoupling(cells);
  coupling.start();
  const generationAt = (request: PartGenerationRequest): void => {
    coupling.generationAt(request);
  };
  const thermal = runConduction(setup, generationAt, WHERE);
  const { solutions, fieldIterations, estimatedError } = coupling;
  const validity: ValidityNote[] = [...thermal.validity];
  if (estimatedError > accuracy) {
    validity.push({
      code: "accuracy-not-reached",
      message: `the finest field mesh tried changes the impedance by ${estimatedError.toExponential(1)} relative, above the accuracy asked for`,
      value: estimatedError,
      limit: accuracy,
    });
  }
  return { ...thermal, validity, solutions, fieldSolutions: solutions.length, fieldIterations, estimatedError };
}

/** Reads and checks the options: the conduction setup and the field problem with the part's cells as regions. */
function readHeatUp(options: FieldHeatUpOptions): { setup: ConductionSetup; cells: HeatedCells; accuracy: number } {
  const o = requireKnownKeys(WHERE, "", requireObject(WHERE, "options", options), KNOWN);
  const part = requireKnownKeys(WHERE, "part", requireObject(WHERE, "part", o.part), PART_KEYS);
  if (typeof part.name !== "string" || part.name === "") throw new InputError(WHERE, "part.name", part.name, "", "a non-empty name");
  const setup = readConductionSetup(WHERE, o, { ...part, cells: part.cells === undefined ? { radial: 8, axial: 8 } : part.cells }, "part.");
  if (setup.cells.radial > MAX_CELLS_ALONG || setup.cells.axial > MAX_CELLS_ALONG || setup.cells.radial * setup.cells.axial > MAX_CELLS) {
    throw new InputError(WHERE, "part.cells", `${setup.cells.radial} × ${setup.cells.axial}`, "", `at most ${MAX_CELLS_ALONG} each way and ${MAX_CELLS} in all (each cell is a region of the field problem)`);
  }
  const resolveStep = o.resolveStep === undefined ? 40 : requirePositive(WHERE, "resolveStep", o.resolveStep, "K");
  const accuracy = o.accuracy === undefined ? 1e-2 : (o.accuracy as number);
  if (typeof accuracy !== "number" || !(accuracy >= 1e-3 && accuracy <= 0.1)) {
    throw new InputError(WHERE, "accuracy", o.accuracy, "", "a number in [1e-3, 0.1]");
  }
  const { material, rEdges, zEdges, cells, initial } = setup;
  const nr = cells.radial;
  const nz = cells.axial;
  if (o.regions !== undefined && !Array.isArray(o.regions)) throw new InputError(WHERE, "regions", o.regions, "", "an array of regions");
  const userRegions: unknown[] = o.regions === undefined ? [] : (o.regions as unknown[]);
  // the part's cells as regions of the field problem (validated with everything else)
  const cellRegions: FieldRegion[] = [];
  const rho0 = resistivityAt(material, initial);
  const mu0 = relativePermeabilityAt(material, { temperature: initial });
  for (let i = 0; i < nr; i++) {
    for (let j = 0; j < nz; j++) {
      cellRegions.push({
        name: `${part.name}[${i},${j}]`,
        shape: { kind: "rectangle", rMin: rEdges[i]!, rMax: rEdges[i + 1]!, zMin: zEdges[j]!, zMax: zEdges[j + 1]! },
        resistivity: rho0,
        relativePermeability: mu0,
      });
    }
  }
  const { problem: base, coilNames, currents } = readProblem({
    frequency: o.frequency as number,
    coils: o.coils as readonly AxisymmetricFieldCoil[],
    regions: [...(userRegions as FieldRegion[]), ...cellRegions],
    accuracy,
  });
  const firstCellBody = base.bodies.findIndex((b) => b.role === "region" && b.owner === userRegions.length);
  const cellsOut: HeatedCells = {
    base,
    firstCellBody,
    coilNames,
    currents: currents.map((re) => ({ re, im: 0 })),
    material,
    rEdges,
    zEdges,
    nr,
    nz,
    initial,
    rho0,
    mu0,
    resolveStep,
    accuracy,
  };
  return { setup, cells: cellsOut, accuracy };
}
