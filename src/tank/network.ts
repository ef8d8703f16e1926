/**
 * Impedance of a composable two-terminal network at a frequency or over a sweep. The parts are
 * built in `network-elements.ts`, typed in `network-types.ts` and checked in
 * `network-validate.ts`.
 *
 * @packageDocumentation
 */
import { InputError, requireArrayLike, requirePositive } from "../core/index.js";
import type { Complex } from "../special/index.js";
import type { TankImpedanceSweep, TankLike, TankNetwork } from "./network-types.js";
import { resolveNetwork } from "./network-validate.js";

/** Scratch pair for the impedance kernel; evaluation is synchronous, so one buffer suffices. */
const SCRATCH = new Float64Array(2);

/**
 * Impedance of a validated network at angular frequency `omega`, written into out[0] (real) and
 * out[1] (imaginary). An open circuit is signalled as out[0] = Infinity. Allocates nothing.
 */
function impedanceInto(net: TankNetwork, omega: number, out: Float64Array): void {
  switch (net.kind) {
    case "resistor":
      out[0] = net.resistance;
      out[1] = 0;
      return;
    case "inductor":
      out[0] = net.resistance;
      out[1] = omega * net.inductance;
      return;
    case "capacitor":
      out[0] = net.resistance;
      out[1] = -1 / (omega * net.capacitance);
      return;
    case "series": {
      let re = 0;
      let im = 0;
      for (const part of net.elements) {
        impedanceInto(part, omega, out);
        if (out[0] === Infinity) return;
        re += out[0] as number;
        im += out[1] as number;
      }
      out[0] = re;
      out[1] = im;
      return;
    }
    case "parallel": {
      let gRe = 0;
      let bIm = 0;
      for (const part of net.elements) {
        impedanceInto(part, omega, out);
        const zr = out[0] as number;
        const zi = out[1] as number;
        if (zr === Infinity) continue; // an open branch adds no admittance
        const m2 = zr * zr + zi * zi;
        if (m2 === 0) {
          out[0] = 0; // a short-circuited branch shorts the whole connection
          out[1] = 0;
          return;
        }
        gRe += zr / m2;
        bIm -= zi / m2;
      }
      const y2 = gRe * gRe + bIm * bIm;
      if (y2 === 0) {
        out[0] = Infinity;
        out[1] = 0;
        return;
      }
      out[0] = gRe / y2;
      out[1] = -bIm / y2;
      return;
    }
  }
}

/**
 * Complex impedance of a two-terminal network at a frequency:
 * $Z_R = R$, $Z_L = R + j\omega L$, $Z_C = R_\mathrm{ESR} - j/(\omega C)$, series impedances add,
 * parallel admittances add, $\omega = 2\pi f$.
 *
 * @param network - a {@link TankNetwork}, or the result of {@link seriesTank} / {@link parallelTank}
 * @param frequency - frequency [Hz], > 0
 * @returns the impedance `{ re, im }` [Ω] (the {@link Complex} shape); `im > 0` is inductive
 * @throws {@link InputError} when frequency is not > 0, the network is malformed, or the network
 * is an open circuit at that frequency (a lossless parallel LC exactly at its resonance).
 * Validity: lumped linear parts with frequency-independent values.
 * Accuracy: exact complex arithmetic, ≤ 1e-12 relative vs closed forms in the tests.
 * @see C. K. Alexander and M. N. O. Sadiku, Fundamentals of Electric Circuits, 5th ed.,
 * McGraw-Hill 2013, §9.6–9.7 (impedance and admittance combinations).
 * @example
 * ```ts
 * import { seriesTank, tankImpedance } from "fluxwright";
 * const tank = seriesTank({ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 });
 * const z = tankImpedance(tank, tank.undampedFrequency);
 * console.log(z.re); // ≈ 0.5
 * console.log(Math.abs(z.im) < 1e-9); // true
 * ```
 * @category Networks
 */
export function tankImpedance(network: TankLike, frequency: number): Complex {
  const where = "tankImpedance";
  const net = resolveNetwork(where, network);
  const f = requirePositive(where, "frequency", frequency, "Hz");
  const out = SCRATCH;
  impedanceInto(net, 2 * Math.PI * f, out);
  const re = out[0] as number;
  const im = out[1] as number;
  if (!Number.isFinite(re) || !Number.isFinite(im)) {
    throw new InputError(where, "frequency", frequency, "Hz", "a frequency at which the network's impedance is finite (not at a lossless parallel resonance)");
  }
  return { re, im };
}

/**
 * The impedance of a network over many frequencies, as two `Float64Array`s.
 *
 * @param network - a {@link TankNetwork}, or the result of {@link seriesTank} / {@link parallelTank}
 * @param frequencies - frequencies [Hz], each > 0
 * @returns `{ re, im }`, arrays of the same length as `frequencies` [Ω]
 * @throws {@link InputError} as {@link tankImpedance}, naming the index of a bad frequency
 * Accuracy: identical to {@link tankImpedance} at each point.
 * @see {@link tankImpedance}
 * @example
 * ```ts
 * import { logSpacedFrequencies, parallelTank, tankImpedanceSweep } from "fluxwright";
 * const tank = parallelTank({ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
 * const z = tankImpedanceSweep(tank, logSpacedFrequencies(1e4, 1e6, 201));
 * console.log(z.re.length); // 201
 * ```
 * @category Networks
 */
export function tankImpedanceSweep(
  network: TankLike,
  frequencies: ArrayLike<number>,
): TankImpedanceSweep {
  const where = "tankImpedanceSweep";
  const net = resolveNetwork(where, network);
  const n = requireArrayLike(where, "frequencies", frequencies, "Hz").length;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const out = new Float64Array(2);
  for (let k = 0; k < n; k++) {
    const f = frequencies[k];
    if (typeof f !== "number" || !(f > 0) || f === Infinity) {
      throw new InputError(where, `frequencies[${k}]`, f, "Hz", "a finite number > 0");
    }
    impedanceInto(net, 2 * Math.PI * f, out);
    const zr = out[0] as number;
    const zi = out[1] as number;
    if (!Number.isFinite(zr) || !Number.isFinite(zi)) {
      throw new InputError(where, `frequencies[${k}]`, f, "Hz", "a frequency at which the network's impedance is finite");
    }
    re[k] = zr;
    im[k] = zi;
  }
  return { re, im };
}

/**
 * @deprecated `logSpacedFrequencies` moved to `fluxwright/special`; this re-export from
 * `fluxwright/tank` (the same function) goes at 1.0.
 */
export { logSpacedFrequencies } from "../special/index.js";
