/**
 * Surface and core temperature of a bar or tube heated in a long solenoid: the electro-thermal
 * radial model.
 *
 * Placement: the exact field in concentric shells is `layeredCylinderInLongCoil` (workpiece),
 * radial conduction with a generation callback is `radialHeatUp` (thermal); workpiece and
 * thermal sit on the same level and may not import each other, so the coupled transient that
 * composes them lives here, in the study module, and derives no physics of its own.
 *
 * Beside this file: `induction-radial-heat-up-types.ts` (options and result),
 * `-input.ts` (reading the options), `-field.ts` (the shells' heat generation from the field).
 *
 * @packageDocumentation
 */
import { requirePositive } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import { surfaceTemperatureCaution } from "../safety/index.js";
import { radialHeatUp } from "../thermal/index.js";
import type { RadialHeatUpResult } from "../thermal/index.js";
import { MU_0 } from "../units/index.js";
import type { LongCoil } from "../workpiece/index.js";
import { RadialFieldGeneration } from "./induction-radial-heat-up-field.js";
import { WHERE, readRadialHeatUpOptions } from "./induction-radial-heat-up-input.js";
import type { InductionRadialHeatUpOptions, InductionRadialHeatUpResult } from "./induction-radial-heat-up-types.js";

export type {
  InductionRadialDrive,
  InductionRadialHeatUpOptions,
  InductionRadialHeatUpResult,
  InductionRadialState,
  RadialHeatedPart,
} from "./induction-radial-heat-up-types.js";

/**
 * Surface and core temperature of a bar or tube heated in a long solenoid: the power density by
 * depth from the exact field in the part, re-solved shell by shell as the resistivity ρ(T) and
 * the permeability μr(T, H) change (Curie transition, saturation at the local field amplitude),
 * with radial conduction and convection plus radiation from the outer surface.
 *
 * Each control volume of the conduction grid is a shell of {@link layeredCylinderInLongCoil}
 * with $\rho_i = \rho(T_i)$ and $\mu_{r,i} = \mu_r(T_i, \hat H_i)$, $\hat H_i$ the field
 * amplitude at the shell (geometric mean of its boundary values, peak =
 * $\sqrt2\,N I_\text{rms}/\ell$ times the field ratio), iterated to a fixed point starting
 * from the last solution's field (until the largest change of μr, weighted by the field ratio
 * reaching the shell, is below 1e-3). The shell powers per square metre of surface drive
 * {@link radialHeatUp}:
 * $$
 * \rho c(T)\,\frac{\partial T}{\partial t} = \frac{1}{r}\frac{\partial}{\partial r}\!\left(r\,k(T)\frac{\partial T}{\partial r}\right) + p(r, T),\qquad
 * \int_{a}^{R} p\,2\pi r\,dr\,\ell = R_r(T)\,I^2 .
 * $$
 * The field is re-solved whenever a node has moved by more than `resolveStep` since the last
 * solution; between solutions the generation is held (the energy balance stays exact).
 *
 * Hard domain (throws {@link InputError}): unknown option keys; part radius ≤ 0 or above the
 * coil bore; a tube bore not below the radius; not exactly one drive (`frequency` with
 * `coilCurrentRms` or `power`, or `driveAt`); a drive callback returning a non-positive
 * frequency or a negative current; the hard domain of {@link radialHeatUp}.
 * Validity: the long-coil idealisation (uniform applied field along the coil; end effects and
 * axial conduction ignored; the power spread over `heatedLength`, the part's ends insulated);
 * the bore of a tube insulated; the permeability model of the material (no hysteresis loss).
 *
 * Accuracy: the field solution is exact for the shell properties (≤ 1e-10 vs mpmath); the
 * conduction is that of {@link radialHeatUp} (≤ 1e-3 of the temperature change vs the series
 * solutions). Tests: the electrical energy in equals the stored enthalpy plus the surface losses
 * within 2e-3 (held generation and mid-step properties); at a uniform temperature the power
 * equals {@link barInLongCoil} / {@link tubeInLongCoil} within 1e-12; with the default
 * `resolveStep` (2 K) and `temperatureTolerance` (0.2 K) a steel bar heated through Curie to a
 * 900 °C surface reaches it within 0.3 % of the time, and with a surface-to-core difference within
 * 0.5 K, of a run with 0.25 K and 0.01 K. Speed: that heat-up (60 cells) takes 180 ms of CPU
 * (median; `docs/benchmarks.md`).
 *
 * @param options - part, material, coil, drive, surface, target, see {@link InductionRadialHeatUpOptions}
 * @returns surface, core and mean temperature curves, times to target, soak time, hardening depth, electrical history
 * @throws {@link InputError} on bad input
 * @see R. L. Stoll, *The Analysis of Eddy Currents*, Clarendon Press 1974, ch. 2 (field in
 *   cylindrical shells); E. J. Davies, *Conduction and Induction Heating*, Peregrinus 1990
 *   (through-heating of bars, surface-to-core difference and soak).
 * @example
 * ```ts
 * import { inductionRadialHeatUp, lowCarbonSteel, celsius } from "fluxwright";
 * // 30 mm steel forging bar, 600 A in a 40-turn, 200 mm coil at 10 kHz, to a 900 °C surface
 * const r = inductionRadialHeatUp({
 *   part: { shape: "bar", radius: 0.015 },
 *   material: lowCarbonSteel,
 *   coil: { innerRadius: 0.025, length: 0.2, turns: 40 },
 *   frequency: 1e4, coilCurrentRms: 600,
 *   convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: celsius(20),
 *   duration: 120, targetTemperature: celsius(900), targetLocation: "surface",
 * });
 * console.log(r.heatingTime !== null && r.surfaceCoreDifferenceAtStop! > 0); // true
 * ```
 * @category Study
 */
export function inductionRadialHeatUp(options: InductionRadialHeatUpOptions): InductionRadialHeatUpResult {
  const settings = readRadialHeatUpOptions(options);
  const { radius, bore, material, coil, initial } = settings;

  // Finest skin depth expected (cold, weak-field permeability) sets the grid refinement.
  const firstDrive = settings.readDrive({ time: 0, surfaceTemperature: initial, coreTemperature: initial, meanTemperature: initial });
  const coldMur = relativePermeabilityAt(material, { temperature: initial });
  const coldRho = resistivityAt(material, initial);
  const finestSkin = Math.sqrt((2 * coldRho) / (2 * Math.PI * firstDrive.frequency * MU_0 * coldMur));

  const heatedLength = options.heatedLength === undefined ? coil.length : requirePositive(WHERE, "heatedLength", options.heatedLength, "m");
  const heatedArea = 2 * Math.PI * radius * heatedLength;
  const generation = new RadialFieldGeneration(settings, settings.cells + 1, heatedArea); // shells = control volumes

  const { target, soakBand, hardening } = settings;
  const thermal = radialHeatUp({
    geometry: "cylinder",
    radius,
    ...(bore > 0 ? { innerRadius: bore } : {}),
    generationAt: generation.generationAt,
    skinDepth: finestSkin,
    material,
    convectionCoefficient: settings.convection,
    emissivity: settings.emissivity,
    ambientTemperature: settings.ambient,
    initialTemperature: initial,
    duration: settings.duration,
    ...(target === undefined ? {} : { targetTemperature: target, stopAt: settings.targetLocation }),
    ...(soakBand === undefined ? {} : { soakBand }),
    ...(hardening === undefined ? {} : { hardeningTemperature: hardening }),
    cells: settings.cells,
    temperatureTolerance: settings.tolerance,
    maxTimeStep: settings.maxStep,
  });
  return radialHeatUpResult(thermal, coil, heatedArea, generation);
}

/** The result: the thermal run with the long-coil note and the hot-surface caution, the electrical history, and the energy balance in joules over the heated length. */
function radialHeatUpResult(thermal: RadialHeatUpResult, coil: LongCoil, heatedArea: number, generation: RadialFieldGeneration): InductionRadialHeatUpResult {
  const validity: ValidityNote[] = [...thermal.validity];
  if (coil.length < 4 * coil.innerRadius) {
    validity.push({
      code: "short-coil",
      message:
        "The coil is shorter than two diameters: the long-coil idealisation ignores the return flux and end effects and overestimates the power; the temperatures are those of the middle of a long coil.",
      value: coil.length / coil.innerRadius,
      limit: 4,
    });
  }
  const cautions: Caution[] = [...thermal.cautions];
  let hottest = 0;
  for (const v of thermal.surfaceTemperatures) hottest = Math.max(hottest, v);
  const hot = surfaceTemperatureCaution({ temperature: hottest, location: "part surface" });
  if (hot !== null) cautions.push(hot);
  const e = thermal.energy;
  return {
    ...thermal,
    validity,
    electrical: generation.electrical,
    partEnergy: {
      input: e.input * heatedArea,
      stored: e.stored * heatedArea,
      lost: e.lost * heatedArea,
      imbalance: e.imbalance * heatedArea,
    },
    fieldSolutions: generation.solutions,
    fieldIterations: generation.iterations,
    cautions,
  };
}
