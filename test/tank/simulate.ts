/**
 * Small fixed-step RK4 time-domain simulators used as independent checks of the
 * first-harmonic inverter formulas. Test helpers only (not part of the library).
 */

const k1 = new Float64Array(4);
const k2 = new Float64Array(4);
const k3 = new Float64Array(4);
const k4 = new Float64Array(4);
const t = new Float64Array(4);

/** One classical RK4 step of y' = f(y) (autonomous, inputs frozen over the step); n ≤ 4 states. */
function rk4(f: (y: Float64Array, dy: Float64Array) => void, y: Float64Array, h: number, out: Float64Array): void {
  const n = y.length;
  f(y, k1);
  for (let i = 0; i < n; i++) t[i] = y[i]! + 0.5 * h * k1[i]!;
  f(t, k2);
  for (let i = 0; i < n; i++) t[i] = y[i]! + 0.5 * h * k2[i]!;
  f(t, k3);
  for (let i = 0; i < n; i++) t[i] = y[i]! + h * k3[i]!;
  f(t, k4);
  for (let i = 0; i < n; i++) out[i] = y[i]! + (h / 6) * (k1[i]! + 2 * k2[i]! + 2 * k3[i]! + k4[i]!);
}

export interface CurrentFedSimulation {
  frequency: number;
  tankVoltagePeak: number;
  supplyCurrent: number;
  capacitorCurrentRms: number;
  coilCurrentRms: number;
  power: number;
  coilLossPower: number;
  chokeRipplePeakToPeak: number;
}

/**
 * Ideal current-fed push-pull parallel-resonant inverter, referred to the whole coil:
 * state (v, iL, ich); the switch state s = ±1 follows the sign of the tank voltage v
 * (commutation exactly at the zero crossings, located by secant iteration inside the step).
 *   C dv/dt = s·ich/2 − iL,  L diL/dt = v − R·iL,  Lch dich/dt = Vdc − s·v/2.
 * Starts with the capacitor charged to Vdc (a kick) and no current; measures over the last `measureCycles` periods.
 */
export function simulateCurrentFed(p: {
  supplyVoltage: number;
  inductance: number;
  capacitance: number;
  coilResistance: number;
  chokeInductance: number;
  cycles: number;
  measureCycles: number;
  stepsPerCycle: number;
}): CurrentFedSimulation {
  const { supplyVoltage: vdc, inductance: L, capacitance: C, coilResistance: R, chokeInductance: Lch } = p;
  const period0 = 2 * Math.PI * Math.sqrt(L * C);
  const h = period0 / p.stepsPerCycle;
  let s = 1;
  const f = (y: Float64Array, dy: Float64Array): void => {
    dy[0] = ((s * y[2]!) / 2 - y[1]!) / C;
    dy[1] = (y[0]! - R * y[1]!) / L;
    dy[2] = (vdc - (s * y[0]!) / 2) / Lch;
  };
  let y = new Float64Array([vdc, 0, 0]); // a kick: the capacitor starts charged to Vdc
  let next = new Float64Array(3);
  const trial = new Float64Array(3);
  let t = 0;
  const upCrossings: number[] = [];
  // Integrals over the measuring window [tStart, tEnd] between upward crossings.
  const totalSteps = Math.ceil(p.cycles * p.stepsPerCycle);
  const measureFrom = (p.cycles - p.measureCycles - 1) * period0;
  let measuring = false;
  let tStart = 0;
  let intI = 0;
  let intIc2 = 0;
  let intIl2 = 0;
  let peak = 0;
  let ichMin = Infinity;
  let ichMax = -Infinity;
  let cyclesMeasured = 0;
  const accumulate = (a: Float64Array, b: Float64Array, dt: number, sNow: number): void => {
    if (!measuring) return;
    const ica = (sNow * a[2]!) / 2 - a[1]!;
    const icb = (sNow * b[2]!) / 2 - b[1]!;
    intI += 0.5 * (a[2]! + b[2]!) * dt;
    // Simpson-like accuracy is not needed at 2000+ steps per cycle; trapezoid on squares.
    intIc2 += 0.5 * (ica * ica + icb * icb) * dt;
    intIl2 += 0.5 * (a[1]! * a[1]! + b[1]! * b[1]!) * dt;
    peak = Math.max(peak, Math.abs(b[0]!));
    ichMin = Math.min(ichMin, b[2]!);
    ichMax = Math.max(ichMax, b[2]!);
  };
  let result: CurrentFedSimulation | null = null;
  for (let step = 0; step < totalSteps * 2 && result === null; step++) {
    rk4(f, y, h, next);
    if (s * next[0]! < 0) {
      // Locate the zero crossing of v inside the step by secant iteration on the sub-step length.
      let h0 = 0;
      let v0 = y[0]!;
      let h1 = h;
      let v1 = next[0]!;
      let hc = h * (v0 / (v0 - v1));
      for (let it = 0; it < 6; it++) {
        rk4(f, y, hc, trial);
        const vc = trial[0]!;
        if (Math.abs(vc) < 1e-14 * vdc) break;
        if (vc * v0 > 0) {
          h0 = hc;
          v0 = vc;
        } else {
          h1 = hc;
          v1 = vc;
        }
        hc = h0 + (h1 - h0) * (v0 / (v0 - v1));
      }
      rk4(f, y, hc, trial);
      trial[0] = 0;
      accumulate(y, trial, hc, s);
      t += hc;
      const wasNegative = s < 0;
      s = -s;
      if (wasNegative) {
        upCrossings.push(t);
        if (!measuring && t >= measureFrom) {
          measuring = true;
          tStart = t;
        } else if (measuring) {
          cyclesMeasured++;
          if (cyclesMeasured === p.measureCycles) {
            const span = t - tStart;
            const nCross = upCrossings.length;
            const frequency = p.measureCycles / (upCrossings[nCross - 1]! - upCrossings[nCross - 1 - p.measureCycles]!);
            const supplyCurrent = intI / span;
            result = {
              frequency,
              tankVoltagePeak: peak,
              supplyCurrent,
              capacitorCurrentRms: Math.sqrt(intIc2 / span),
              coilCurrentRms: Math.sqrt(intIl2 / span),
              power: vdc * supplyCurrent,
              coilLossPower: (R * intIl2) / span,
              chokeRipplePeakToPeak: ichMax - ichMin,
            };
            break;
          }
        }
      }
      const rest = h - hc;
      if (rest > 0) {
        rk4(f, trial, rest, next);
        accumulate(trial, next, rest, s);
        t += rest;
        [y, next] = [next, y];
      } else {
        y.set(trial);
      }
    } else {
      accumulate(y, next, h, s);
      t += h;
      [y, next] = [next, y];
    }
  }
  if (result === null) throw new Error("simulateCurrentFed: did not reach the measuring window");
  return result;
}

export interface HalfBridgeSimulation {
  power: number;
  currentRms: number;
  /** Tank current at the rising edge of the bridge voltage, taken positive when it flows into the bridge node (charging it: ZVS). */
  switchedCurrent: number;
  capacitorVoltagePeak: number;
}

/**
 * Voltage-fed half bridge (bridge node square wave between 0 and Vdc, 50 % duty, ideal
 * switches) driving a series RLC tank: L di/dt = vin − R i − vC, C dvC/dt = i.
 * The step grid is aligned with the switching edges. Measures over the last cycles.
 */
export function simulateHalfBridge(p: {
  supplyVoltage: number;
  inductance: number;
  capacitance: number;
  resistance: number;
  switchingFrequency: number;
  cycles: number;
  measureCycles: number;
  stepsPerHalfCycle: number;
  bridge?: "half" | "full";
}): HalfBridgeSimulation {
  const { supplyVoltage: vdc, inductance: L, capacitance: C, resistance: R } = p;
  const full = p.bridge === "full";
  const h = 1 / (2 * p.switchingFrequency * p.stepsPerHalfCycle);
  let vin = 0;
  const f = (y: Float64Array, dy: Float64Array): void => {
    dy[0] = (vin - R * y[0]! - y[1]!) / L;
    dy[1] = y[0]! / C;
  };
  let y = new Float64Array([0, full ? 0 : vdc / 2]);
  let next = new Float64Array(2);
  let intP = 0;
  let intI2 = 0;
  let switched = 0;
  let vcPeak = 0;
  let nMeasured = 0;
  for (let cycle = 0; cycle < p.cycles; cycle++) {
    const measuring = cycle >= p.cycles - p.measureCycles;
    if (measuring && cycle === p.cycles - 1) switched = -y[0]!;
    for (let half = 0; half < 2; half++) {
      vin = half === 0 ? vdc : full ? -vdc : 0;
      for (let k = 0; k < p.stepsPerHalfCycle; k++) {
        rk4(f, y, h, next);
        if (measuring) {
          intP += vin * 0.5 * (y[0]! + next[0]!) * h;
          intI2 += 0.5 * (y[0]! * y[0]! + next[0]! * next[0]!) * h;
          vcPeak = Math.max(vcPeak, Math.abs(next[1]! - (full ? 0 : vdc / 2)));
        }
        [y, next] = [next, y];
      }
    }
    if (measuring) nMeasured++;
  }
  const span = nMeasured / p.switchingFrequency;
  return { power: intP / span, currentRms: Math.sqrt(intI2 / span), switchedCurrent: switched, capacitorVoltagePeak: vcPeak };
}
