/**
 * The public types of {@link axisymmetricHeatConduction} (and of the part in
 * {@link fieldHeatUp}): faces, surface exchange, cells, the generation callback, the options,
 * the grid, temperature maps, the energy balance and the result.
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
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
