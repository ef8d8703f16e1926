/**
 * Internal kernel of the ideal current-fed parallel inverter: the numbers of
 * `currentFedParallelInverter` (which takes them from here) and of
 * `currentFedParallelInverterWithSource`, without allocation, for callers that need a few
 * figures many times (an operating point's inner iteration). Not part of the public API.
 *
 * @packageDocumentation
 */
/** Positions in the array written by `currentFedFigures`. */
export const FIG_OMEGA = 0;
export const FIG_FREQUENCY = 1;
export const FIG_DYNAMIC_RESISTANCE = 2;
export const FIG_TANK_VOLTAGE_PEAK = 3;
export const FIG_SUPPLY_CURRENT = 4;
export const FIG_TANK_VOLTAGE_RMS = 5;
export const FIG_COIL_CURRENT_RMS = 6;

/**
 * The figures of `currentFedParallelInverter` at supply voltage `supplyVoltage` for
 * checked inputs (every argument a finite number > 0), without allocation: writes ω [rad/s],
 * f [Hz], R_d [Ω], V̂ [V], I_dc [A], V_rms [V] and the RMS coil current [A] into out[0 … 6]
 * (indices `FIG_*`). Returns false, writing nothing, when R ≥ √(L/C) (no zero-phase
 * frequency). The public function takes its numbers from here, so a caller that needs only
 * these (an operating point's inner iteration) gets the same numbers bit for bit.
 */
export function currentFedFigures(supplyVoltage: number, L: number, C: number, R: number, out: Float64Array): boolean {
  const z0 = Math.sqrt(L / C);
  const a = (R / z0) * (R / z0);
  if (!(a < 1)) return false;
  const omega = Math.sqrt(1 - a) / Math.sqrt(L * C);
  const dynamicResistance = L / (R * C);
  const tankVoltagePeak = Math.PI * supplyVoltage;
  const tankVoltageRms = tankVoltagePeak / Math.SQRT2;
  out[FIG_OMEGA] = omega;
  out[FIG_FREQUENCY] = omega / (2 * Math.PI);
  out[FIG_DYNAMIC_RESISTANCE] = dynamicResistance;
  out[FIG_TANK_VOLTAGE_PEAK] = tankVoltagePeak;
  out[FIG_SUPPLY_CURRENT] = (Math.PI * Math.PI * supplyVoltage) / (2 * dynamicResistance);
  out[FIG_TANK_VOLTAGE_RMS] = tankVoltageRms;
  out[FIG_COIL_CURRENT_RMS] = tankVoltageRms / Math.hypot(R, omega * L);
  return true;
}

/**
 * Frequency [Hz], RMS coil current [A] and peak tank voltage [V] of
 * `currentFedParallelInverterWithSource` with these inputs, without allocation: written into
 * out[0], out[1], out[2], the same numbers bit for bit (the same steps: the unit-voltage input
 * resistance, the source divider, the operating point at the input voltage). Returns false,
 * writing nothing, wherever the public function would throw (a value outside its hard domain,
 * R ≥ √(L/C)): call it then for its error. `scratch` holds 7 numbers.
 */
export function currentFedWithSourceFigures(
  sourceVoltage: number,
  sourceResistance: number,
  switchOnResistance: number | undefined,
  L: number,
  C: number,
  R: number,
  chokeInductance: number | undefined,
  out: Float64Array,
  scratch: Float64Array,
): boolean {
  const ron = switchOnResistance ?? 0;
  if (!(positive(sourceVoltage) && nonNegative(sourceResistance) && nonNegative(ron) && positive(L) && positive(C) && positive(R))) return false;
  if (chokeInductance !== undefined && !positive(chokeInductance)) return false;
  if (!currentFedFigures(1, L, C, R, scratch)) return false;
  const inputResistance = 1 / scratch[FIG_SUPPLY_CURRENT]!;
  const current = sourceVoltage / (inputResistance + sourceResistance + ron);
  const vin = current * inputResistance;
  if (!positive(vin) || !currentFedFigures(vin, L, C, R, scratch)) return false;
  // its voltage caution requires a finite tank voltage
  if (!Number.isFinite(scratch[FIG_TANK_VOLTAGE_RMS]!)) return false;
  out[0] = scratch[FIG_FREQUENCY]!;
  out[1] = scratch[FIG_COIL_CURRENT_RMS]!;
  out[2] = scratch[FIG_TANK_VOLTAGE_PEAK]!;
  return true;
}

/** What `requirePositive` accepts. */
const positive = (x: number): boolean => x > 0 && x !== Infinity;
/** What `requireNonNegative` accepts. */
const nonNegative = (x: number): boolean => x >= 0 && x !== Infinity;
