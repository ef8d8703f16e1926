/**
 * The heat generation of {@link inductionRadialHeatUp}: the exact field in the part's shells
 * (`layeredCylinderInLongCoil`) at their resistivity ρ(T) and permeability μr(T, H), iterated to
 * a fixed point in μr, re-solved when the temperatures have moved, held between solutions; and
 * the electrical history of the solutions.
 *
 * @packageDocumentation
 */
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import type { RadialGenerationRequest } from "../thermal/index.js";
import { barInLongCoil, layeredCylinderInLongCoil, tubeInLongCoil } from "../workpiece/index.js";
import type { InductionRadialHeatUpResult } from "./induction-radial-heat-up-types.js";
import type { RadialHeatUpSettings } from "./induction-radial-heat-up-input.js";

/** The shells' heat generation for `radialHeatUp`, from field solutions re-solved as the part heats. */
export class RadialFieldGeneration {
  /** Electrical history, one entry per field solution. */
  readonly electrical: InductionRadialHeatUpResult["electrical"] = {
    times: [],
    power: [],
    frequency: [],
    coilCurrentRms: [],
    reflectedResistance: [],
    inductanceChange: [],
    surfacePermeability: [],
    uniformReflectedResistance: [],
  };
  /** Number of field solutions. */
  solutions = 0;
  /** Number of field evaluations in the permeability fixed points. */
  iterations = 0;
  private readonly rho: Float64Array;
  private readonly mur: Float64Array;
  private readonly field: Float64Array;
  private readonly lastTemps: Float64Array;
  /** W/m² per A² (last solution). */
  private readonly perArea: Float64Array;
  private lastCurrent = 0;
  /** Generation per (W/m² per A²): I², times the override factor. */
  private lastScale = 0;
  private solved = false;

  /**
   * @param settings - the checked options
   * @param n - shells (control volumes) of the conduction grid
   * @param heatedArea - outer surface of the heated length [m²]: the shell powers per square metre
   */
  constructor(
    private readonly settings: RadialHeatUpSettings,
    private readonly n: number,
    private readonly heatedArea: number,
  ) {
    this.rho = new Float64Array(n);
    this.mur = new Float64Array(n);
    this.field = new Float64Array(n);
    this.lastTemps = new Float64Array(n);
    this.perArea = new Float64Array(n);
  }

  /** The generation callback of `radialHeatUp`: the last solution's shell powers, re-solved when a node has moved by more than `resolveStep`. */
  readonly generationAt = (request: RadialGenerationRequest): void => {
    const { n, lastTemps, perArea } = this;
    const resolveStep = this.settings.resolveStep;
    let moved = !this.solved;
    if (!moved) {
      for (let i = 0; i < n; i++) {
        if (Math.abs(request.temperatures[i]! - lastTemps[i]!) > resolveStep) {
          moved = true;
          break;
        }
      }
    }
    if (moved) this.solve(request);
    for (let i = 0; i < n; i++) request.generation[i] = perArea[i]! * this.lastScale;
  };

  /** Re-solves the field for the request's temperatures (the drive read at its state) and records the electrical history. */
  private solve(request: RadialGenerationRequest): void {
    const { coil, material, bore, radius, heldPower } = this.settings;
    const { n, heatedArea, rho, mur, field, lastTemps, perArea } = this;
    const temps = request.temperatures;
    const faces = request.faces;
    let volumeSum = 0;
    let weighted = 0;
    for (let i = 0; i < n; i++) {
      const a = faces[i]!;
      const b = faces[i + 1]!;
      const v = b * b - a * a;
      volumeSum += v;
      weighted += v * temps[i]!;
    }
    const drive = this.settings.readDrive({
      time: request.time,
      surfaceTemperature: temps[n - 1]!,
      coreTemperature: temps[0]!,
      meanTemperature: weighted / volumeSum,
    });
    let current = drive.coilCurrentRms;
    const surfacePeakPerAmpere = (Math.SQRT2 * coil.turns) / coil.length;
    for (let i = 0; i < n; i++) {
      rho[i] = resistivityAt(material, temps[i]!);
      // first iterate: the new temperatures at the last solution's field (the surface field everywhere at the start)
      const h = this.solved ? (this.lastCurrent > 0 ? (field[i]! * current) / this.lastCurrent : 0) : surfacePeakPerAmpere * current;
      mur[i] = relativePermeabilityAt(material, { temperature: temps[i]!, fieldStrengthPeak: h });
    }
    const radii = faces.subarray(1, n + 1);
    let result = layeredCylinderInLongCoil({ coil, frequency: drive.frequency, innerRadius: bore, radii, resistivities: rho, relativePermeabilities: mur });
    for (let iteration = 0; iteration < 60; iteration++) {
      this.iterations++;
      if (heldPower !== null) current = result.reflectedResistance > 0 ? Math.sqrt(heldPower / result.reflectedResistance) : 0;
      const peak = surfacePeakPerAmpere * current;
      let change = 0;
      for (let i = 0; i < n; i++) {
        field[i] = peak * Math.sqrt(result.fieldRatios[i]! * result.fieldRatios[i + 1]!);
        const wanted = relativePermeabilityAt(material, { temperature: temps[i]!, fieldStrengthPeak: field[i]! });
        // a shell's permeability matters in proportion to the field that reaches it
        change = Math.max(change, Math.abs(wanted / mur[i]! - 1) * result.fieldRatios[i + 1]!);
        mur[i] = wanted;
      }
      if (change < 1e-3) break;
      result = layeredCylinderInLongCoil({ coil, frequency: drive.frequency, innerRadius: bore, radii, resistivities: rho, relativePermeabilities: mur });
    }
    if (heldPower !== null) current = result.reflectedResistance > 0 ? Math.sqrt(heldPower / result.reflectedResistance) : 0;
    for (let i = 0; i < n; i++) {
      perArea[i] = result.shellPowers[i]! / heatedArea;
      lastTemps[i] = temps[i]!;
    }
    this.lastCurrent = current;
    const factor = drive.powerFactor ?? 1;
    const power = result.reflectedResistance * current * current * factor;
    this.lastScale = current * current * factor;
    this.solved = true;
    this.solutions++;
    this.electrical.times.push(request.time);
    this.electrical.power.push(power);
    this.electrical.frequency.push(drive.frequency);
    this.electrical.coilCurrentRms.push(current);
    this.electrical.reflectedResistance.push(result.reflectedResistance);
    this.electrical.inductanceChange.push(result.inductanceChange);
    this.electrical.surfacePermeability.push(mur[n - 1]!);
    const uniform =
      bore > 0
        ? tubeInLongCoil({ coil, tube: { outerRadius: radius, innerRadius: bore, resistivity: rho[n - 1]!, relativePermeability: mur[n - 1]! }, frequency: drive.frequency })
        : barInLongCoil({ coil, bar: { radius, resistivity: rho[n - 1]!, relativePermeability: mur[n - 1]! }, frequency: drive.frequency });
    this.electrical.uniformReflectedResistance.push(uniform.reflectedResistance);
  }
}
