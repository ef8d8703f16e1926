/**
 * The heater study: one description in, every number a designer needs out.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES, InputError, requireInteger, requireObject } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { capacitorElement, inductorElement, parallelNetwork, seriesNetwork, tankImpedanceSweep } from "../tank/index.js";
import { lumpedHeatUp } from "../thermal/index.js";
import type { LumpedEnergyBalance } from "../thermal/index.js";
import { heaterCautions } from "./cautions.js";
import { coilImpedanceAt, coilProperties, heaterOperatingPoint } from "./operating-point.js";
import type { CoilProperties, HeaterLosses, HeaterOperatingPoint } from "./operating-point.js";
import { readHeaterDescription } from "./read-description.js";
import type { ResolvedHeaterDescription, ResolvedPart } from "./read-description.js";
import type { HeaterDescription } from "./description.js";

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
  /** Operating points on the temperature grid of the heat-up, an integer ≥ 4 (default: one per 50 K, 6 … 16, plus a cluster at the Curie transition). */
  readonly heatUpPoints?: number;
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
 * The electro-thermal heat-up: the lumped heat-up of the thermal module, driven by the part
 * power of the operating point re-solved as the part heats (through the Curie point).
 *
 * @category Heater study
 */
export interface HeaterHeatUp {
  /** Time to reach the target [s], `null` when it is not reached. */
  readonly timeToTarget: number | null;
  /** Whether the target is reached. */
  readonly reachable: boolean;
  /** Temperature at the end of the simulated span [K]. */
  readonly finalTemperature: number;
  /** Temperature the part would settle at with this heater [K] (`null` when unbounded). */
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
}

/**
 * The operating point against part temperature, from the start temperature to past the Curie
 * point (or to the target for non-magnetic parts).
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
}

/** Geometry of the part: volume and heat-losing surface. */
function partGeometry(part: ResolvedPart): { volume: number; surfaceArea: number } {
  switch (part.shape) {
    case "bar":
      return { volume: Math.PI * part.radius ** 2 * part.length, surfaceArea: 2 * Math.PI * part.radius * (part.radius + part.length) };
    case "tube": {
      const ri = part.outerRadius - part.wallThickness;
      return {
        volume: Math.PI * (part.outerRadius ** 2 - ri ** 2) * part.length,
        surfaceArea: 2 * Math.PI * (part.outerRadius + ri) * part.length + 2 * Math.PI * (part.outerRadius ** 2 - ri ** 2),
      };
    }
    case "ring":
      return {
        volume: Math.PI * (part.outerRadius ** 2 - part.innerRadius ** 2) * part.height,
        surfaceArea: 2 * Math.PI * (part.outerRadius + part.innerRadius) * part.height + 2 * Math.PI * (part.outerRadius ** 2 - part.innerRadius ** 2),
      };
    case "plate":
      return {
        volume: part.length * part.width * part.thickness,
        surfaceArea: 2 * (part.length * part.width + part.length * part.thickness + part.width * part.thickness),
      };
  }
}

/** Linear interpolation in a sorted grid, clamped at its ends. */
function interpolate(xs: readonly number[], ys: readonly number[], x: number): number {
  const n = xs.length;
  if (x <= (xs[0] as number)) return ys[0] as number;
  if (x >= (xs[n - 1] as number)) return ys[n - 1] as number;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((xs[mid] as number) <= x) lo = mid;
    else hi = mid;
  }
  const x0 = xs[lo] as number;
  const x1 = xs[hi] as number;
  const t = (x - x0) / (x1 - x0);
  return (ys[lo] as number) * (1 - t) + (ys[hi] as number) * t;
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
  const rank = { danger: 0, warning: 1, info: 2 } as const;
  return [...byCode.values()].sort((a, b) => rank[a.severity] - rank[b.severity]);
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
 *    surface field, `barInLongCoil` / `tubeInLongCoil` / `coilOverPlate`);
 * 3. tank and inverter (`currentFedParallelInverter`, or `seriesInverter` with
 *    `frequencyForPower`; `tankStresses`), with frequency and the field-dependent permeability
 *    iterated to a fixed point, and the supply's internal resistance and the switches'
 *    on-resistance in the loop;
 * 4. losses by place (supply, switches, coil, capacitors, concentrator core via `steinmetzLoss`,
 *    part) adding up to the input power, efficiencies (`coilEfficiency`);
 * 5. the electro-thermal heat-up (`lumpedHeatUp` driven by the part power re-solved on a
 *    temperature grid through the Curie point), the operating point against temperature and
 *    the tank impedance against frequency (`tankImpedanceSweep`);
 * 6. cautions (tank and safety modules, plus the description's own ratings) and a validity
 *    list of every approximation used.
 *
 * Accuracy: the composition adds no error of its own beyond the fixed-point tolerance (1e-9
 * in frequency, 1e-8 in surface field) and the linear interpolation of part power on the
 * heat-up grid (one point per 50 K, 6 to 16, plus a dense cluster at the Curie transition); the
 * energy balance of each operating point closes to 1e-9 relative (tested). Each module's
 * accuracy and validity apply, and are listed in `validity` where they are stretched.
 *
 * @param description - the design (see {@link HeaterDescription}); text quantities allowed
 * @param options - which slower parts to run (all by default)
 * @returns the {@link HeaterStudy}
 * @throws {@link HeaterDescriptionError} (an {@link InputError}) when the description is
 * invalid, naming the field path; {@link InputError} when `options` is not an object or
 * `options.heatUpPoints` is not an integer ≥ 4
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
  const heatUpPoints = options.heatUpPoints === undefined ? undefined : requireInteger("studyHeater", "options.heatUpPoints", options.heatUpPoints, 4);
  const d = readHeaterDescription(description);
  const props = coilProperties(d);
  const part = d.part;
  const material = part.material;
  const geometry = partGeometry(part);
  const curie = material.magnetic && material.curieTemperature !== undefined ? material.curieTemperature : null;
  const facts: HeaterPartFacts = { mass: geometry.volume * material.density, surfaceArea: geometry.surfaceArea, volume: geometry.volume, curieTemperature: curie };

  // a point the inverter cannot run at (e.g. a parallel tank damped past oscillation) is `null`
  const failures: { temperature: number; message: string }[] = [];
  const tryPoint = (t: number): HeaterOperatingPoint | null => {
    try {
      return heaterOperatingPoint(d, t, true, props);
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      failures.push({ temperature: t, message: e.message });
      return null;
    }
  };
  const must = (f: () => HeaterOperatingPoint, what: string): HeaterOperatingPoint => {
    try {
      return f();
    } catch (e) {
      if (!(e instanceof InputError)) throw e;
      throw new InputError("studyHeater", "description", description, "", `a design the inverter can run ${what} (${e.message})`);
    }
  };
  const emptyCoil = must(() => heaterOperatingPoint(d, part.startTemperature, false, props), "with the empty coil");
  const operating = must(() => heaterOperatingPoint(d, part.startTemperature, true, props), "with the part at its start temperature");
  const atTarget = tryPoint(part.targetTemperature);
  const validity: ValidityNote[] = [...operating.validity, ...(atTarget?.validity ?? []), ...emptyCoil.validity];
  const allPoints: HeaterOperatingPoint[] = [emptyCoil, operating];
  if (atTarget !== null) allPoints.push(atTarget);

  // electro-thermal heat-up
  let heatUp: HeaterHeatUp | null = null;
  if (options.heatUp !== false) {
    const width = material.permeability?.transitionWidth ?? 0;
    // about one operating point per 50 K (6 … 16), plus a dense cluster at the Curie transition
    const span = part.targetTemperature - part.startTemperature;
    const count = heatUpPoints ?? Math.min(16, Math.max(6, Math.ceil(span / 50) + 2));
    const grid = temperatureGrid(part.startTemperature, part.targetTemperature, Math.max(4, count), curie, width);
    const points = grid.map((t) => (t === part.startTemperature ? operating : t === part.targetTemperature ? atTarget : tryPoint(t)));
    for (const p of points) if (p !== null) allPoints.push(p);
    // where the inverter cannot run, no power flows (frequency shown as 0)
    const partPower = points.map((p) => p?.losses.part ?? 0);
    const inputPower = points.map((p) => p?.inputPower ?? 0);
    const frequency = points.map((p) => p?.frequency ?? 0);
    const current = points.map((p) => p?.supplyCurrent ?? 0);
    const thermal = lumpedHeatUp({
      mass: facts.mass,
      material,
      powerAt: (t: number) => interpolate(grid, partPower, t),
      surfaceArea: facts.surfaceArea,
      convectionCoefficient: d.environment.convectionCoefficient,
      emissivity: part.emissivity,
      ambientTemperature: d.environment.ambientTemperature,
      initialTemperature: part.startTemperature,
      targetTemperature: part.targetTemperature,
      relativeTolerance: 1e-8,
    });
    validity.push(...thermal.validity);
    validity.push({
      code: "lumped-heat-up",
      message: `Heat-up with one part temperature (lumped model); the part power is re-solved at ${grid.length} temperatures and interpolated linearly between them.`,
    });
    const times = thermal.times;
    const temperatures = thermal.temperatures;
    let supplyEnergy = 0;
    let supplyCharge = 0;
    const inputs = temperatures.map((t) => interpolate(grid, inputPower, t));
    const currents = temperatures.map((t) => interpolate(grid, current, t));
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
    heatUp = {
      timeToTarget: thermal.timeToTarget,
      reachable: thermal.reachable,
      finalTemperature: thermal.finalTemperature,
      steadyStateTemperature: thermal.steadyStateTemperature,
      curieCrossingTime,
      times,
      temperatures,
      frequencies: temperatures.map((t) => interpolate(grid, frequency, t)),
      partPowers: temperatures.map((t) => interpolate(grid, partPower, t)),
      inputPowers: inputs,
      supplyEnergy,
      supplyCharge,
      energy: thermal.energy,
      biotNumber: thermal.biotNumber,
      gridTemperatures: grid,
    };
  }

  // operating point against temperature, through the Curie point
  let temperatureScan: HeaterTemperatureScan | null = null;
  if (options.temperatureScan !== false) {
    const top = Math.min(
      material.temperatureRange.max,
      material.meltingTemperature - 50,
      Math.max(part.targetTemperature, curie === null ? part.targetTemperature : curie + 150),
    );
    const grid = temperatureGrid(part.startTemperature, Math.max(top, part.targetTemperature), 16, curie, material.permeability?.transitionWidth ?? 0);
    const solved = grid.map((t) => ({ t, p: tryPoint(t) }));
    const ok = solved.filter((x): x is { t: number; p: HeaterOperatingPoint } => x.p !== null);
    const points = ok.map((x) => x.p);
    temperatureScan = {
      temperatures: ok.map((x) => x.t),
      frequencies: points.map((p) => p.frequency),
      partPowers: points.map((p) => p.losses.part),
      inputPowers: points.map((p) => p.inputPower),
      efficiencies: points.map((p) => p.efficiency),
      relativePermeabilities: points.map((p) => p.partRelativePermeability),
      inductances: points.map((p) => p.inductance),
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
    const empty = tankImpedanceSweep(tank(emptyCoil.coilInductance, emptyCoil.coilResistance), frequencies);
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

  if (failures.length > 0) {
    const first = failures.reduce((a, b) => (b.temperature < a.temperature ? b : a));
    validity.push({
      code: "no-operating-point",
      message: `The inverter has no operating point with the part at ${(first.temperature - 273.15).toFixed(0)} °C and above in places (${first.message}); the study counts no power there.`,
      value: first.temperature,
    });
  }
  const cautions = heaterCautions(d, facts, allPoints, heatUp?.finalTemperature ?? part.targetTemperature, validity, heatUp?.steadyStateTemperature ?? null);
  // the operating points' own cautions (tank voltage, hard switching) join the list once per code:
  // the safety module's caution of the same code, or the first point's, stands for the rest
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
  };
}
