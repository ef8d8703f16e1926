/**
 * The time stepping of the conduction solver (internal): backward Euler in the enthalpy form
 * with Newton's method on each step ({@link ConductionLattice}), the step size from the
 * temperature change, the histories and maps of a run, the target temperature, and the
 * validity notes and cautions of a finished run.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { surfaceTemperatureCaution } from "../safety/index.js";
import { ConductionLattice } from "./conduction-lattice.js";
import type { ConductionSetup } from "./conduction-setup.js";
import type { AxisymmetricHeatConductionResult, PartGenerationRequest, PartTemperatureMap } from "./conduction-types.js";

/** Most time steps of one run (a bound on run time). */
const MAX_STEPS = 200_000;

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
