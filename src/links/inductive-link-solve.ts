/**
 * The phasor solve of {@link inductiveLink} on checked arguments: the secondary network reduced
 * to the impedance in series with the secondary coil, the primary network reduced around the
 * coil branch with the reflected impedance, then the capacitors' stresses (the cautions are in
 * `inductive-link-cautions.ts`).
 * Scalar complex arithmetic throughout (no intermediate objects); the reductions hand their
 * results on in the slots of one typed array. Internal.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { linkCautions } from "./inductive-link-cautions.js";
import type { InductiveLink, LinkCapacitor } from "./inductive-link-types.js";

/**
 * The checked arguments of {@link solveLink}, by slot, written by the caller just before the
 * call (a number passed to a call that V8 does not inline is boxed; a typed-array slot is
 * not): inductances [H], resistances [Ω], frequency [Hz], source voltage [V], the given
 * capacitances [F] (0: the default), the filter inductances [H] (0: none) and √(L₁L₂) [H].
 */
export const linkArguments = new Float64Array(13);
export const ARG_L1 = 0;
export const ARG_L2 = 1;
export const ARG_M = 2;
export const ARG_R1 = 3;
export const ARG_R2 = 4;
export const ARG_F = 5;
export const ARG_RL = 6;
export const ARG_V = 7;
export const ARG_C1 = 8;
export const ARG_C2 = 9;
export const ARG_LF1 = 10;
export const ARG_LF2 = 11;
export const ARG_ROOT = 12;

/** Writes the arguments of {@link solveLink} (small enough to be inlined into its callers: no boxing). */
export function setLinkArguments(
  l1: number, l2: number, m: number, r1: number, r2: number, f: number, rl: number, v: number, givenC1: number, givenC2: number, lf1: number, lf2: number, root: number,
): void {
  linkArguments[ARG_L1] = l1;
  linkArguments[ARG_L2] = l2;
  linkArguments[ARG_M] = m;
  linkArguments[ARG_R1] = r1;
  linkArguments[ARG_R2] = r2;
  linkArguments[ARG_F] = f;
  linkArguments[ARG_RL] = rl;
  linkArguments[ARG_V] = v;
  linkArguments[ARG_C1] = givenC1;
  linkArguments[ARG_C2] = givenC2;
  linkArguments[ARG_LF1] = lf1;
  linkArguments[ARG_LF2] = lf2;
  linkArguments[ARG_ROOT] = root;
}

/** Slots of {@link net}: ω, ω² … */
const W = 0;
const W2 = 1;
/**
 * … what the secondary reduction finds: C₂, C_f2, the secondary loop impedance Z₂ (coil,
 * compensation and load), and per ampere of secondary coil current the RMS voltage and current of
 * C₂ and of C_f2 and the load current …
 */
const C2 = 2;
const CF2 = 3;
const Z2_RE = 4;
const Z2_IM = 5;
const C2_VOLTS = 6;
const C2_AMPS = 7;
const CF2_VOLTS = 8;
const CF2_AMPS = 9;
const LOAD_AMPS = 10;
/** … and what the primary reduction finds: C₁, C_f1, the input impedance, the source and primary coil currents and the stresses of C₁ and C_f1. */
const C1 = 11;
const CF1 = 12;
const IN_RE = 13;
const IN_IM = 14;
const IN_CURRENT = 15;
const I1 = 16;
const C1_VOLTS = 17;
const C1_AMPS = 18;
const CF1_VOLTS = 19;
const CF1_AMPS = 20;
/** Results of the network reductions (written in place: no objects, no boxed numbers). */
const net = new Float64Array(21);

/*
 * Exact cancellations. A default capacitor is defined by a reactance that cancels another one
 * exactly, and the solve writes the result of that cancellation (a zero, a real impedance) rather
 * than subtracting two rounded reactances: a default series C₂ leaves Z₂ real; a default LCC
 * filter capacitor (always resonant with its inductor, X_f = −ωL_f) turns its node into a real
 * impedance (ωL_f)²/R; a default primary series or parallel C₁ leaves Z_in real. Each cancellation
 * removes divisions and square roots from the chain of dependent operations, which is what a call
 * spends most of its arithmetic time on.
 */

/**
 * The secondary network: its capacitors, the secondary loop impedance Z₂ = R₂ + jωL₂ + Z_ext and
 * the stresses per ampere of secondary coil current into {@link net}. Series
 * $Z_\mathrm{ext} = 1/(j\omega C_2) + R_L$; parallel $Z_\mathrm{ext} = R_L \parallel 1/(j\omega C_2)$.
 */
function reduceSecondary(code: number): void {
  if ((code & 8) !== 0) {
    reduceSecondaryLcc();
    return;
  }
  const w = net[W] ?? 0;
  const l2 = linkArguments[ARG_L2] ?? 0;
  const r2 = linkArguments[ARG_R2] ?? 0;
  const rl = linkArguments[ARG_RL] ?? 0;
  const givenC2 = linkArguments[ARG_C2] ?? 0;
  const wl2 = w * l2;
  // |1/(ωC₂)|: the default C₂ = 1/(ω²L₂) has reactance −ωL₂
  const c2 = givenC2 > 0 ? givenC2 : 1 / ((net[W2] ?? 0) * l2);
  const xc2 = givenC2 > 0 ? 1 / (w * givenC2) : wl2;
  net[C2] = c2;
  net[CF2] = 0;
  net[CF2_VOLTS] = 0;
  net[CF2_AMPS] = 0;
  if ((code & 2) !== 0) {
    // R_L ∥ (−j x): (R_L x² − j R_L² x)/(R_L² + x²); |Z_ext| = R_L x/√(R_L² + x²)
    const inv = 1 / (rl * rl + xc2 * xc2);
    const perAmp = xc2 * Math.sqrt(inv);
    net[Z2_RE] = r2 + rl * xc2 * xc2 * inv;
    net[Z2_IM] = wl2 - rl * rl * xc2 * inv;
    net[C2_VOLTS] = rl * perAmp;
    net[C2_AMPS] = rl * perAmp * w * c2;
    net[LOAD_AMPS] = perAmp;
  } else {
    net[Z2_RE] = r2 + rl;
    net[Z2_IM] = givenC2 > 0 ? wl2 - xc2 : 0;
    net[C2_VOLTS] = xc2;
    net[C2_AMPS] = 1;
    net[LOAD_AMPS] = 1;
  }
}

/**
 * {@link reduceSecondary} for a secondary LCC network (a function of its own so that the series
 * and parallel cases stay small enough to be inlined):
 * $Z_\mathrm{ext} = 1/(j\omega C_2) + [1/(j\omega C_{f2}) \parallel (j\omega L_{f2} + R_L)]$. With C_f2
 * resonant with L_f2 the bracket is exactly $((\omega L_{f2})^2/R_L,\,-\omega L_{f2})$, the load
 * current is $I_2\,\omega L_{f2}/R_L$ and the node voltage $I_2\,\omega L_{f2}\,|R_L + j\omega L_{f2}|/R_L$.
 */
function reduceSecondaryLcc(): void {
  const w = net[W] ?? 0;
  const w2 = net[W2] ?? 0;
  const l2 = linkArguments[ARG_L2] ?? 0;
  const r2 = linkArguments[ARG_R2] ?? 0;
  const rl = linkArguments[ARG_RL] ?? 0;
  const givenC2 = linkArguments[ARG_C2] ?? 0;
  const lf2 = linkArguments[ARG_LF2] ?? 0;
  const wlf = w * lf2;
  const c2 = givenC2 > 0 ? givenC2 : 1 / (w2 * (l2 - lf2));
  // |1/(ωC₂)|: the default C₂ = 1/(ω²(L₂ − L_f2)) has reactance −ω(L₂ − L_f2), cancelling the rest
  const xc2 = givenC2 > 0 ? 1 / (w * givenC2) : w * (l2 - lf2);
  const invRl = 1 / rl;
  const loadAmps = wlf * invRl;
  const branchAbs = Math.sqrt(rl * rl + wlf * wlf);
  net[C2] = c2;
  net[CF2] = 1 / (w2 * lf2);
  net[Z2_RE] = r2 + wlf * loadAmps;
  net[Z2_IM] = givenC2 > 0 ? w * l2 - wlf - xc2 : 0;
  net[C2_VOLTS] = xc2;
  net[C2_AMPS] = 1;
  net[CF2_VOLTS] = loadAmps * branchAbs;
  net[CF2_AMPS] = branchAbs * invRl;
  net[LOAD_AMPS] = loadAmps;
}

/**
 * The primary network around the coil branch $R_1 + j\omega L_1 + Z_\mathrm{ref}$ (in the
 * input-impedance slots of {@link net} on entry): its capacitors, the input impedance, the
 * currents and the stresses into {@link net}. Series $1/(j\omega C_1) + Z_b$, parallel
 * $1/(j\omega C_1)\parallel Z_b$.
 *
 * @throws {@link InputError} when a given capacitance leaves no default series or parallel capacitor
 */
function reducePrimary(code: number): void {
  if ((code & 4) !== 0) {
    reducePrimaryLcc();
    return;
  }
  const w = net[W] ?? 0;
  const v = linkArguments[ARG_V] ?? 0;
  const givenC1 = linkArguments[ARG_C1] ?? 0;
  const coilRe = net[IN_RE] ?? 0;
  const coilIm = net[IN_IM] ?? 0;
  net[CF1] = 0;
  net[CF1_VOLTS] = 0;
  net[CF1_AMPS] = 0;
  if ((code & 1) !== 0) {
    const coilSq = coilRe * coilRe + coilIm * coilIm;
    const inv = 1 / coilSq;
    // the default C₁ cancels the branch susceptance: admittance jωC₁ + 1/Z_coil real
    const c1 = givenC1 > 0 ? givenC1 : (coilIm * inv) / w;
    if (!(c1 > 0)) throw noDefaultCapacitor(c1, "parallel");
    const yRe = coilRe * inv;
    if (givenC1 > 0) {
      const yIm = w * givenC1 - coilIm * inv;
      const ySq = yRe * yRe + yIm * yIm;
      net[IN_RE] = yRe / ySq;
      net[IN_IM] = -yIm / ySq;
      net[IN_CURRENT] = v * Math.sqrt(ySq);
    } else {
      net[IN_RE] = coilSq / coilRe;
      net[IN_IM] = 0;
      net[IN_CURRENT] = v * yRe;
    }
    net[C1] = c1;
    net[I1] = v * Math.sqrt(inv);
    net[C1_VOLTS] = v;
    net[C1_AMPS] = v * w * c1;
    return;
  }
  const c1 = givenC1 > 0 ? givenC1 : 1 / (w * coilIm);
  if (!(c1 > 0)) throw noDefaultCapacitor(c1, "series");
  // |1/(ωC₁)|: the default C₁ = 1/(ω X_coil) cancels the branch reactance, leaving Z_in real
  const xc1 = givenC1 > 0 ? 1 / (w * givenC1) : coilIm;
  const inIm = givenC1 > 0 ? coilIm - xc1 : 0;
  const inCurrent = givenC1 > 0 ? v / Math.sqrt(coilRe * coilRe + inIm * inIm) : v / coilRe;
  net[C1] = c1;
  net[IN_RE] = coilRe;
  net[IN_IM] = inIm;
  net[IN_CURRENT] = inCurrent;
  net[I1] = inCurrent;
  net[C1_VOLTS] = inCurrent * xc1;
  net[C1_AMPS] = inCurrent;
}

/** The error for a primary series or parallel capacitor that would have to be negative. */
function noDefaultCapacitor(c1: number, kind: "series" | "parallel"): InputError {
  return new InputError("inductiveLink", "primaryCapacitance", c1, "F", `given: the branch is capacitive, so no ${kind} capacitor makes the input impedance real`);
}

/**
 * {@link reducePrimary} for a primary LCC network (a function of its own so that the series and
 * parallel cases stay small enough to be inlined):
 * $Z_\mathrm{in} = j\omega L_{f1} + 1/(j\omega C_{f1}) \parallel (1/(j\omega C_1) + Z_b)$ with C_f1
 * resonant with L_f1. When the branch reactance is exactly cancelled (default C₁, real Z₂) this is
 * $Z_\mathrm{in} = (\omega L_{f1})^2/R_b$ with coil current $V/(\omega L_{f1})$.
 */
function reducePrimaryLcc(): void {
  const w = net[W] ?? 0;
  const w2 = net[W2] ?? 0;
  const l1 = linkArguments[ARG_L1] ?? 0;
  const v = linkArguments[ARG_V] ?? 0;
  const givenC1 = linkArguments[ARG_C1] ?? 0;
  const lf1 = linkArguments[ARG_LF1] ?? 0;
  const coilRe = net[IN_RE] ?? 0;
  const coilIm = net[IN_IM] ?? 0;
  const wlf = w * lf1;
  const c1 = givenC1 > 0 ? givenC1 : 1 / (w2 * (l1 - lf1));
  const xc1 = givenC1 > 0 ? 1 / (w * givenC1) : w * (l1 - lf1);
  net[C1] = c1;
  net[CF1] = 1 / (w2 * lf1);
  if (givenC1 === 0 && net[Z2_IM] === 0) {
    // branch b = R_b + jωL_f1 against −jωL_f1: node voltage V(1 − jR_b/(ωL_f1))
    const ratio = coilRe / wlf;
    const inCurrent = (v * ratio) / wlf;
    const nodeVolts = v * Math.sqrt(1 + ratio * ratio);
    net[IN_RE] = wlf / ratio;
    net[IN_IM] = 0;
    net[IN_CURRENT] = inCurrent;
    net[I1] = v / wlf;
    net[C1_VOLTS] = (v / wlf) * xc1;
    net[C1_AMPS] = v / wlf;
    net[CF1_VOLTS] = nodeVolts;
    net[CF1_AMPS] = nodeVolts / wlf;
    return;
  }
  const bRe = coilRe;
  const bIm = coilIm - xc1;
  // (−jωL_f1) ∥ b = −jωL_f1·b/(b − jωL_f1)
  const nRe = wlf * bIm;
  const nIm = -wlf * bRe;
  const dIm = bIm - wlf;
  const inv = 1 / (bRe * bRe + dIm * dIm);
  const inRe = (nRe * bRe + nIm * dIm) * inv;
  const inIm = (nIm * bRe - nRe * dIm) * inv + wlf;
  const inSq = inRe * inRe + inIm * inIm;
  // I_in = V/Z_in; node voltage V − jωL_f1 I_in; coil current node/b
  const scale = v / inSq;
  const vnRe = v + wlf * (-inIm * scale);
  const vnIm = -wlf * (inRe * scale);
  const nodeVolts = Math.sqrt(vnRe * vnRe + vnIm * vnIm);
  const i1 = nodeVolts / Math.sqrt(bRe * bRe + bIm * bIm);
  net[IN_RE] = inRe;
  net[IN_IM] = inIm;
  net[IN_CURRENT] = v / Math.sqrt(inSq);
  net[I1] = i1;
  net[C1_VOLTS] = i1 * xc1;
  net[C1_AMPS] = i1;
  net[CF1_VOLTS] = nodeVolts;
  net[CF1_AMPS] = nodeVolts / wlf;
}

/**
 * The phasor solve on the checked arguments in {@link linkArguments} (a given capacitance 0:
 * the default capacitor). With $Z_2$ the
 * secondary loop impedance the primary sees $Z_\mathrm{ref} = (\omega M)^2/Z_2$ and
 * $I_2 = j\omega M I_1/Z_2$.
 */
export function solveLink(code: number): InductiveLink {
  const l1 = linkArguments[ARG_L1] ?? 0;
  const m = linkArguments[ARG_M] ?? 0;
  const r1 = linkArguments[ARG_R1] ?? 0;
  const f = linkArguments[ARG_F] ?? 0;
  const rl = linkArguments[ARG_RL] ?? 0;
  const w = 2 * Math.PI * f;
  net[W] = w;
  net[W2] = w * w;
  reduceSecondary(code);
  const z2Re = net[Z2_RE] ?? 0;
  const z2Im = net[Z2_IM] ?? 0;
  const wm = w * m;
  const wm2 = wm * wm;
  // primary coil branch without its capacitor: R₁ + jωL₁ + (ωM)²/Z₂; |I₂| = ωM|I₁|/|Z₂|
  let secondaryPerPrimary: number;
  if (z2Im === 0) {
    const q = wm / z2Re;
    net[IN_RE] = r1 + wm * q;
    net[IN_IM] = w * l1;
    secondaryPerPrimary = q;
  } else {
    const z2Sq = z2Re * z2Re + z2Im * z2Im;
    const s = wm2 / z2Sq;
    net[IN_RE] = r1 + s * z2Re;
    net[IN_IM] = w * l1 - s * z2Im;
    secondaryPerPrimary = wm / Math.sqrt(z2Sq);
  }
  reducePrimary(code);
  const inRe = net[IN_RE] ?? 0;
  const inCurrent = net[IN_CURRENT] ?? 0;
  const i1 = net[I1] ?? 0;
  const i2 = secondaryPerPrimary * i1;
  const loadCurrent = i2 * (net[LOAD_AMPS] ?? 0);
  const secondaryCapacitor: LinkCapacitor = { name: "secondary", capacitance: net[C2] ?? 0, voltageRms: i2 * (net[C2_VOLTS] ?? 0), currentRms: i2 * (net[C2_AMPS] ?? 0) };
  const secondaryFilter: LinkCapacitor | null =
    (code & 8) === 0 ? null : { name: "secondary-filter", capacitance: net[CF2] ?? 0, voltageRms: i2 * (net[CF2_VOLTS] ?? 0), currentRms: i2 * (net[CF2_AMPS] ?? 0) };
  const primaryCapacitor: LinkCapacitor = { name: "primary", capacitance: net[C1] ?? 0, voltageRms: net[C1_VOLTS] ?? 0, currentRms: net[C1_AMPS] ?? 0 };
  // the capacitor list built at its final length (no growth)
  let capacitors: LinkCapacitor[];
  if ((code & 4) !== 0) {
    const primaryFilter: LinkCapacitor = { name: "primary-filter", capacitance: net[CF1] ?? 0, voltageRms: net[CF1_VOLTS] ?? 0, currentRms: net[CF1_AMPS] ?? 0 };
    capacitors = secondaryFilter === null ? [primaryFilter, primaryCapacitor, secondaryCapacitor] : [primaryFilter, primaryCapacitor, secondaryCapacitor, secondaryFilter];
  } else {
    capacitors = secondaryFilter === null ? [primaryCapacitor, secondaryCapacitor] : [primaryCapacitor, secondaryCapacitor, secondaryFilter];
  }
  const outputPower = loadCurrent * loadCurrent * rl;
  // |I_in|² Re Z_in = V² Re Z_in/|Z_in|²
  const inputPower = inCurrent * inCurrent * inRe;
  return {
    efficiency: outputPower / inputPower,
    outputPower,
    inputPower,
    inputImpedance: { re: inRe, im: net[IN_IM] ?? 0 },
    inputCurrentRms: inCurrent,
    primaryCurrentRms: i1,
    secondaryCurrentRms: i2,
    loadVoltageRms: loadCurrent * rl,
    couplingCoefficient: m / (linkArguments[ARG_ROOT] ?? 0),
    capacitors,
    cautions: linkCautions(capacitors, i1 * w * l1),
  };
}
