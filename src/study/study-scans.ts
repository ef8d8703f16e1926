/**
 * The scans of a heater study: the operating point against part temperature (the solved points
 * of the power curve) and the tank impedance against frequency, empty and loaded.
 *
 * @packageDocumentation
 */
import { capacitorElement, inductorElement, parallelNetwork, seriesNetwork, tankImpedanceSweep } from "../tank/index.js";
import { coilImpedanceAt } from "./operating-point.js";
import type { CoilProperties, HeaterOperatingPoint } from "./operating-point.js";
import type { PowerCurve } from "./power-curve.js";
import type { ResolvedHeaterDescription } from "./read-description.js";
import type { HeaterImpedanceSweep, HeaterTemperatureScan } from "./study-heater-types.js";

/** The operating point against temperature: the solved points of the power curve. */
export function temperatureScan(curve: PowerCurve): HeaterTemperatureScan {
  const points = curve.points;
  return {
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

/**
 * Tank impedance against frequency, empty and loaded (the part's coupling re-evaluated at each
 * frequency with the operating point's permeability), over a decade around the empty coil's
 * resonance widened to show every point of `allPoints` with a 25 % margin.
 */
export function impedanceSweep(
  d: ResolvedHeaterDescription,
  props: CoilProperties,
  emptyCoil: HeaterOperatingPoint,
  operating: HeaterOperatingPoint,
  allPoints: readonly HeaterOperatingPoint[],
): HeaterImpedanceSweep {
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
  return { frequencies, magnitudeEmpty, phaseEmpty, magnitudeLoaded, phaseLoaded };
}
