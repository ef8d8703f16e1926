/**
 * `axisymmetricHeatConduction`: transient heat conduction in a part of rectangular r–z
 * cross-section (a bar, a tube, a disc, a ring) with temperature-dependent properties, the
 * enthalpy form of the heat equation, and convection and radiation at its faces. The types are
 * in `conduction-types.ts`, the reading of the options in `conduction-setup.ts`, the time
 * stepping in `conduction-run.ts` and the finite-volume lattice in `conduction-lattice.ts`.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireNonNegative, requireObject } from "../core/index.js";
import { readConductionSetup } from "./conduction-setup.js";
import { runConduction } from "./conduction-run.js";
import type { AxisymmetricHeatConductionOptions, AxisymmetricHeatConductionResult, PartGenerationRequest } from "./conduction-types.js";

export type {
  AxisymmetricHeatConductionOptions,
  AxisymmetricHeatConductionResult,
  PartCells,
  PartEnergyBalance,
  PartFace,
  PartGenerationRequest,
  PartGrid,
  PartSurfaceExchange,
  PartTemperatureMap,
} from "./conduction-types.js";

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
