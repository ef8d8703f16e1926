/**
 * The phasor solve of {@link inductiveLink} on checked arguments: the secondary network reduced
 * to the impedance in series with the secondary coil, the primary network reduced around the
 * coil branch with the reflected impedance, then the capacitors' stresses and the cautions.
 * Scalar complex arithmetic throughout (no intermediate objects); the reductions hand their
 * results on in the slots of one typed array. Internal.
 *
 * @packageDocumentation
 */
import { InputError, EXTRA_LOW_VOLTAGE_LIMITS, type Caution } from "../core/index.js";
import { acVoltageCautionAbove, voltageMessageStart } from "../core/extra-low-voltage.js";
import type { InductiveLink, LinkCapacitor } from "./inductive-link-types.js";

/** Extra-low-voltage limit (AC RMS) read once: the cautions are built only above it. */
const ELV_AC_RMS = EXTRA_LOW_VOLTAGE_LIMITS.acRms;

/** The cautions of a link below extra-low voltage: one shared, frozen empty list. */
const NO_CAUTIONS: readonly Caution[] = Object.freeze([]);

/**
 * The checked arguments of {@link solveLink}, by slot, written by the caller just before the
 * call (a number passed to a call that V8 does not inline is boxed; a typed-array slot is
 * not): inductances [H], resistances [Ω], frequency [Hz], source voltage [V], the given
 * capacitances [F] (0: the default) and the filter inductances [H] (0: none).
 */
export const linkArguments = new Float64Array(12);
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

/** Writes the arguments of {@link solveLink} (small enough to be inlined into its callers: no boxing). */
export function setLinkArguments(
  l1: number, l2: number, m: number, r1: number, r2: number, f: number, rl: number, v: number, givenC1: number, givenC2: number, lf1: number, lf2: number,
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
}

/** Slots of {@link net}: ω and ω² … */
const W = 13;
const W2 = 14;
/** … what the secondary reduction finds … */
const C2 = 0;
const CF2 = 1;
const EXT_RE = 2;
const EXT_IM = 3;
/** Secondary LCC: |impedance after C2| and |jωL_f2 + R_L|. */
const AFTER_ABS = 4;
const BRANCH_ABS = 5;
/** … and what the primary reduction finds. */
const C1 = 6;
const CF1 = 7;
const IN_RE = 8;
const IN_IM = 9;
const I1_ABS = 10;
const IN_CURRENT_ABS = 11;
/** Primary LCC: |voltage of the node after the filter inductor|. */
const NODE_ABS = 12;
/** Results of the network reductions (written in place: no objects, no boxed numbers). */
const net = new Float64Array(15);

/** The start of each capacitor's voltage caution message, made once (no concatenation per call). */
const PRIMARY_START = voltageMessageStart("primary compensating capacitor");
const SECONDARY_START = voltageMessageStart("secondary compensating capacitor");
const PRIMARY_FILTER_START = voltageMessageStart("primary-filter compensating capacitor");
const SECONDARY_FILTER_START = voltageMessageStart("secondary-filter compensating capacitor");
const COIL_START = voltageMessageStart("primary coil");

/** The start of the voltage caution message of a capacitor, by its name. */
function capacitorMessageStart(name: string): string {
  switch (name) {
    case "primary": return PRIMARY_START;
    case "secondary": return SECONDARY_START;
    case "primary-filter": return PRIMARY_FILTER_START;
    case "secondary-filter": return SECONDARY_FILTER_START;
    default: return voltageMessageStart(`${name} compensating capacitor`);
  }
}

/**
 * The secondary network (everything in the secondary loop except the coil): its capacitors and
 * its impedance zExt into {@link net}. Secondary series $1/(j\omega C_2) + R_L$, parallel
 * $R_L \parallel 1/(j\omega C_2)$, LCC $1/(j\omega C_2) + [1/(j\omega C_{f2}) \parallel (j\omega L_{f2} + R_L)]$.
 */
function reduceSecondary(code: number): void {
  if ((code & 8) !== 0) {
    reduceSecondaryLcc();
    return;
  }
  const w = net[W] ?? 0;
  const w2 = net[W2] ?? 0;
  const l2 = linkArguments[ARG_L2] ?? 0;
  const rl = linkArguments[ARG_RL] ?? 0;
  const givenC2 = linkArguments[ARG_C2] ?? 0;
  const c2 = givenC2 > 0 ? givenC2 : 1 / (w2 * l2);
  const xc2 = -1 / (w * c2);
  let extRe: number;
  let extIm: number;
  if ((code & 2) !== 0) {
    // (j xc2) ∥ R_L
    const d = rl * rl + xc2 * xc2;
    extRe = (rl * xc2 * xc2) / d;
    extIm = (rl * rl * xc2) / d;
  } else {
    extRe = rl;
    extIm = xc2;
  }
  net[C2] = c2;
  net[CF2] = 0;
  net[EXT_RE] = extRe;
  net[EXT_IM] = extIm;
  net[AFTER_ABS] = 0;
  net[BRANCH_ABS] = 0;
}

/** {@link reduceSecondary} for a secondary LCC network (a function of its own so that the series and parallel cases stay small enough to be inlined). */
function reduceSecondaryLcc(): void {
  const w = net[W] ?? 0;
  const w2 = net[W2] ?? 0;
  const l2 = linkArguments[ARG_L2] ?? 0;
  const rl = linkArguments[ARG_RL] ?? 0;
  const givenC2 = linkArguments[ARG_C2] ?? 0;
  const lf2 = linkArguments[ARG_LF2] ?? 0;
  const c2 = givenC2 > 0 ? givenC2 : 1 / (w2 * (l2 - lf2));
  const xc2 = -1 / (w * c2);
  const cf2 = 1 / (w2 * lf2);
  // (−j/(ωC_f2)) ∥ (R_L + jωL_f2)
  const xf = -1 / (w * cf2);
  const bRe = rl;
  const bIm = w * lf2;
  // a·b/(a + b) with a = j xf
  const nRe = -xf * bIm;
  const nIm = xf * bRe;
  const dRe = bRe;
  const dIm = bIm + xf;
  const dd = dRe * dRe + dIm * dIm;
  const aRe = (nRe * dRe + nIm * dIm) / dd;
  const aIm = (nIm * dRe - nRe * dIm) / dd;
  net[C2] = c2;
  net[CF2] = cf2;
  net[EXT_RE] = aRe;
  net[EXT_IM] = aIm + xc2;
  net[AFTER_ABS] = Math.sqrt(aRe * aRe + aIm * aIm);
  net[BRANCH_ABS] = Math.sqrt(bRe * bRe + bIm * bIm);
}

/**
 * The primary network around the coil branch $R_1 + j\omega L_1 + Z_\mathrm{ref}$ (in the
 * input-impedance slots of {@link net} on entry): its capacitors, the input impedance and the currents into {@link net}. Series
 * $1/(j\omega C_1) + Z_b$, parallel $1/(j\omega C_1)\parallel Z_b$, LCC
 * $j\omega L_{f1} + 1/(j\omega C_{f1}) \parallel (1/(j\omega C_1) + Z_b)$.
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
  let c1: number;
  let inRe: number;
  let inIm: number;
  let i1Abs: number;
  let inCurrentAbs: number;
  if ((code & 1) !== 0) {
    const coilSq = coilRe * coilRe + coilIm * coilIm;
    c1 = givenC1 > 0 ? givenC1 : coilIm / (coilSq * w);
    if (!(c1 > 0)) throw noDefaultCapacitor(c1, "parallel");
    // admittance jωC₁ + 1/Z_coil
    const yRe = coilRe / coilSq;
    const yIm = w * c1 - coilIm / coilSq;
    const ySq = yRe * yRe + yIm * yIm;
    inRe = yRe / ySq;
    inIm = -yIm / ySq;
    inCurrentAbs = v * Math.sqrt(ySq);
    i1Abs = v / Math.sqrt(coilSq);
  } else {
    c1 = givenC1 > 0 ? givenC1 : 1 / (w * coilIm);
    if (!(c1 > 0)) throw noDefaultCapacitor(c1, "series");
    inRe = coilRe;
    inIm = coilIm - 1 / (w * c1);
    inCurrentAbs = v / Math.sqrt(inRe * inRe + inIm * inIm);
    i1Abs = inCurrentAbs;
  }
  net[C1] = c1;
  net[CF1] = 0;
  net[IN_RE] = inRe;
  net[IN_IM] = inIm;
  net[I1_ABS] = i1Abs;
  net[IN_CURRENT_ABS] = inCurrentAbs;
  net[NODE_ABS] = 0;
}

/** The error for a primary series or parallel capacitor that would have to be negative. */
function noDefaultCapacitor(c1: number, kind: "series" | "parallel"): InputError {
  return new InputError("inductiveLink", "primaryCapacitance", c1, "F", `given: the branch is capacitive, so no ${kind} capacitor makes the input impedance real`);
}

/** {@link reducePrimary} for a primary LCC network (a function of its own so that the series and parallel cases stay small enough to be inlined). */
function reducePrimaryLcc(): void {
  const w = net[W] ?? 0;
  const w2 = net[W2] ?? 0;
  const l1 = linkArguments[ARG_L1] ?? 0;
  const v = linkArguments[ARG_V] ?? 0;
  const givenC1 = linkArguments[ARG_C1] ?? 0;
  const lf1 = linkArguments[ARG_LF1] ?? 0;
  const coilRe = net[IN_RE] ?? 0;
  const coilIm = net[IN_IM] ?? 0;
  const c1 = givenC1 > 0 ? givenC1 : 1 / (w2 * (l1 - lf1));
  const cf1 = 1 / (w2 * lf1);
  const xf = -1 / (w * cf1);
  const bRe = coilRe;
  const bIm = coilIm - 1 / (w * c1);
  // (j xf) ∥ b
  const nRe = -xf * bIm;
  const nIm = xf * bRe;
  const dIm = bIm + xf;
  const dd = bRe * bRe + dIm * dIm;
  const inRe = (nRe * bRe + nIm * dIm) / dd;
  const inIm = (nIm * bRe - nRe * dIm) / dd + w * lf1;
  const inSq = inRe * inRe + inIm * inIm;
  // I_in = V/Z_in; node voltage V − jωL_f1 I_in; coil current node/(branch)
  const iRe = (v * inRe) / inSq;
  const iIm = (-v * inIm) / inSq;
  const vnRe = v + w * lf1 * iIm;
  const vnIm = -w * lf1 * iRe;
  const nodeAbs = Math.sqrt(vnRe * vnRe + vnIm * vnIm);
  net[C1] = c1;
  net[CF1] = cf1;
  net[IN_RE] = inRe;
  net[IN_IM] = inIm;
  net[I1_ABS] = nodeAbs / Math.sqrt(bRe * bRe + bIm * bIm);
  net[IN_CURRENT_ABS] = v / Math.sqrt(inSq);
  net[NODE_ABS] = nodeAbs;
}

/** The voltage cautions of a link: its most stressed capacitor and the primary coil, when above extra-low voltage. */
function linkCautions(capacitors: readonly LinkCapacitor[], coilVoltage: number): readonly Caution[] {
  let worst = 0;
  let worstName = "";
  for (let k = 0; k < capacitors.length; k++) {
    const c = capacitors[k];
    if (c !== undefined && c.voltageRms > worst) {
      worst = c.voltageRms;
      worstName = c.name;
    }
  }
  // the limit is checked here first so a safe link builds no message text and shares one empty list
  if (!(worst > ELV_AC_RMS || coilVoltage > ELV_AC_RMS)) return NO_CAUTIONS;
  // the list built at its final length (a push onto an empty array allocates room for 17)
  const caution = worst > ELV_AC_RMS ? acVoltageCautionAbove(worst, capacitorMessageStart(worstName)) : null;
  const coilCaution = coilVoltage > ELV_AC_RMS ? acVoltageCautionAbove(coilVoltage, COIL_START) : null;
  if (caution === null) return coilCaution === null ? [] : [coilCaution];
  return coilCaution === null ? [caution] : [caution, coilCaution];
}

/**
 * The phasor solve on the checked arguments in {@link linkArguments} (a given capacitance 0:
 * the default capacitor). With $Z_2$ the
 * secondary loop impedance the primary sees $Z_\mathrm{ref} = (\omega M)^2/Z_2$ and
 * $I_2 = j\omega M I_1/Z_2$.
 */
export function solveLink(code: number): InductiveLink {
  const l1 = linkArguments[ARG_L1] ?? 0;
  const l2 = linkArguments[ARG_L2] ?? 0;
  const m = linkArguments[ARG_M] ?? 0;
  const r1 = linkArguments[ARG_R1] ?? 0;
  const r2 = linkArguments[ARG_R2] ?? 0;
  const f = linkArguments[ARG_F] ?? 0;
  const rl = linkArguments[ARG_RL] ?? 0;
  const v = linkArguments[ARG_V] ?? 0;
  const primaryParallel = (code & 1) !== 0;
  const secondaryParallel = (code & 2) !== 0;
  const primaryLcc = (code & 4) !== 0;
  const secondaryLcc = (code & 8) !== 0;
  const w = 2 * Math.PI * f;
  const w2 = w * w;
  net[W] = w;
  net[W2] = w2;
  reduceSecondary(code);
  const c2 = net[C2] ?? 0;
  const extRe = net[EXT_RE] ?? 0;
  const extIm = net[EXT_IM] ?? 0;
  const z2Re = r2 + extRe;
  const z2Im = w * l2 + extIm;
  const z2Sq = z2Re * z2Re + z2Im * z2Im;
  const wm = w * m;
  const wm2 = wm * wm;
  // primary coil branch without its capacitor: R₁ + jωL₁ + (ωM)²/Z₂
  net[IN_RE] = r1 + (wm2 * z2Re) / z2Sq;
  net[IN_IM] = w * l1 - (wm2 * z2Im) / z2Sq;
  reducePrimary(code);
  const c1 = net[C1] ?? 0;
  const inRe = net[IN_RE] ?? 0;
  const inIm = net[IN_IM] ?? 0;
  const i1Abs = net[I1_ABS] ?? 0;
  const i2Abs = (wm * i1Abs) / Math.sqrt(z2Sq);
  let loadCurrent: number;
  let secondaryCapacitor: LinkCapacitor;
  let secondaryFilter: LinkCapacitor | null = null;
  if (secondaryLcc) {
    const cf2 = net[CF2] ?? 0;
    const node2 = i2Abs * (net[AFTER_ABS] ?? 0);
    loadCurrent = node2 / (net[BRANCH_ABS] ?? 0);
    secondaryCapacitor = { name: "secondary", capacitance: c2, voltageRms: i2Abs / (w * c2), currentRms: i2Abs };
    secondaryFilter = { name: "secondary-filter", capacitance: cf2, voltageRms: node2, currentRms: node2 * w * cf2 };
  } else if (secondaryParallel) {
    const vLoad = i2Abs * Math.sqrt(extRe * extRe + extIm * extIm);
    loadCurrent = vLoad / rl;
    secondaryCapacitor = { name: "secondary", capacitance: c2, voltageRms: vLoad, currentRms: vLoad * w * c2 };
  } else {
    loadCurrent = i2Abs;
    secondaryCapacitor = { name: "secondary", capacitance: c2, voltageRms: i2Abs / (w * c2), currentRms: i2Abs };
  }
  const primaryCapacitor: LinkCapacitor = primaryParallel
    ? { name: "primary", capacitance: c1, voltageRms: v, currentRms: v * w * c1 }
    : { name: "primary", capacitance: c1, voltageRms: i1Abs / (w * c1), currentRms: i1Abs };
  // the capacitor list built at its final length (no growth)
  let capacitors: LinkCapacitor[];
  if (primaryLcc) {
    const cf1 = net[CF1] ?? 0;
    const nodeAbs = net[NODE_ABS] ?? 0;
    const primaryFilter: LinkCapacitor = { name: "primary-filter", capacitance: cf1, voltageRms: nodeAbs, currentRms: nodeAbs * w * cf1 };
    capacitors = secondaryFilter === null ? [primaryFilter, primaryCapacitor, secondaryCapacitor] : [primaryFilter, primaryCapacitor, secondaryCapacitor, secondaryFilter];
  } else {
    capacitors = secondaryFilter === null ? [primaryCapacitor, secondaryCapacitor] : [primaryCapacitor, secondaryCapacitor, secondaryFilter];
  }
  const outputPower = loadCurrent * loadCurrent * rl;
  const inputPower = (v * v * inRe) / (inRe * inRe + inIm * inIm);
  return {
    efficiency: outputPower / inputPower,
    outputPower,
    inputPower,
    inputImpedance: { re: inRe, im: inIm },
    inputCurrentRms: net[IN_CURRENT_ABS] ?? 0,
    primaryCurrentRms: i1Abs,
    secondaryCurrentRms: i2Abs,
    loadVoltageRms: loadCurrent * rl,
    couplingCoefficient: m / Math.sqrt(l1 * l2),
    capacitors,
    cautions: linkCautions(capacitors, i1Abs * w * l1),
  };
}
