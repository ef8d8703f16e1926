/**
 * The heat-up of a heater study: the lumped heat-up of the thermal module driven by the power
 * curve, the supply's energy and charge over it, and the surface and core of a bar or tube from
 * the radial model.
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import { lumpedHeatUp } from "../thermal/index.js";
import { toCelsius } from "../units/index.js";
import { barInLongCoil, tubeInLongCoil } from "../workpiece/index.js";
import { inductionRadialHeatUp } from "./induction-radial-heat-up.js";
import type { PowerCurve } from "./power-curve.js";
import type { ResolvedHeaterDescription, ResolvedPart } from "./read-description.js";
import type { HeaterHeatUp, HeaterPartFacts, HeaterRadialHeatUp } from "./study-heater-types.js";

/**
 * The electro-thermal heat-up on the power curve (lumped), with the radial model for bars and
 * tubes in a solenoid when `radialHeatUp` is not `false` or the target is at the surface or
 * core. Appends its validity notes to `validity`.
 */
export function heaterHeatUp(
  d: ResolvedHeaterDescription,
  facts: HeaterPartFacts,
  curve: PowerCurve,
  radialHeatUp: boolean | undefined,
  validity: ValidityNote[],
): HeaterHeatUp {
  const part = d.part;
  const grid = curve.temperatures;
  const thermal = lumpedHeatUp({
    mass: facts.mass,
    material: part.material,
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
      message: `The part would still be heating at ${toCelsius(curve.range[1]).toFixed(0)} °C, the top of the material's documented range (or 50 K below melting): it settles above it, where the study has no data; the settle temperature is reported as unknown.`,
      value: curve.range[1],
    });
    steadyStateTemperature = null;
  }
  validity.push({
    code: "lumped-heat-up",
    message: `Heat-up with one part temperature (lumped model); the part power is solved at ${grid.length} temperatures from ${toCelsius(curve.range[0]).toFixed(0)} to ${toCelsius(curve.range[1]).toFixed(0)} °C (denser where it changes fast) and interpolated linearly between neighbouring solved points, never across an unsolved band.`,
  });
  const times = thermal.times;
  const temperatures = thermal.temperatures;
  const inputs = temperatures.map((t) => curve.valueAt(t, (p) => p.inputPower));
  const currents = temperatures.map((t) => curve.valueAt(t, (p) => p.supplyCurrent));
  // ---- surface and core (radial model) for bars and tubes in a solenoid ----
  const targetLocation = part.targetLocation ?? "mean";
  const radial =
    (radialHeatUp !== false || targetLocation !== "mean") && (part.shape === "bar" || part.shape === "tube") && part.rectangles === undefined && d.coil.shape === "solenoid"
      ? radialPart(d, part, curve, thermal.timeToTarget !== null ? 4 * thermal.timeToTarget : thermal.duration, validity)
      : null;
  return {
    timeToTarget: targetLocation === "mean" ? thermal.timeToTarget : (radial?.heatingTime ?? null),
    targetLocation,
    radial,
    reachable: thermal.reachable,
    finalTemperature: thermal.finalTemperature,
    steadyStateTemperature,
    curieCrossingTime: facts.curieTemperature === null ? null : crossingTime(times, temperatures, facts.curieTemperature),
    times,
    temperatures,
    // where no operating point exists, no power flows and the frequency is shown as 0
    frequencies: temperatures.map((t) => curve.valueAt(t, (p) => p.frequency)),
    partPowers: temperatures.map((t) => curve.valueAt(t, (p) => p.losses.part)),
    inputPowers: inputs,
    supplyEnergy: trapezoid(times, inputs),
    supplyCharge: trapezoid(times, currents),
    energy: thermal.energy,
    biotNumber: thermal.biotNumber,
    gridTemperatures: grid,
    unsolvedBands: curve.bands,
    powerCurveRange: curve.range,
  };
}

/** The trapezoidal integral of `values` over `times` (the supply's energy from its power, its charge from its current). */
function trapezoid(times: readonly number[], values: readonly number[]): number {
  let sum = 0;
  for (let i = 1; i < times.length; i++) {
    const dt = (times[i] as number) - (times[i - 1] as number);
    sum += 0.5 * dt * ((values[i] as number) + (values[i - 1] as number));
  }
  return sum;
}

/** The time the temperature first rises through `level` (linear between samples), `null` when it does not. */
function crossingTime(times: readonly number[], temperatures: readonly number[], level: number): number | null {
  for (let i = 1; i < times.length; i++) {
    const t0 = temperatures[i - 1] as number;
    const t1 = temperatures[i] as number;
    if (t0 < level && t1 >= level) return (times[i - 1] as number) + (((times[i] as number) - (times[i - 1] as number)) * (level - t0)) / (t1 - t0);
  }
  return null;
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
