/**
 * Compensated inductive power links: two coupled coils with series, parallel or LCC
 * compensation on each side, solved exactly as a linear phasor network.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
  EXTRA_LOW_VOLTAGE_LIMITS,
  type Caution,
} from "../core/index.js";
import { extraLowVoltageCaution } from "../core/extra-low-voltage.js";

/**
 * The compensation of an inductive link, primary side first: series (S), parallel (P), or the
 * LCC network (series filter inductor, parallel capacitor, series capacitor).
 *
 * @category Inductive links
 */
export type LinkCompensation = "series-series" | "series-parallel" | "parallel-series" | "parallel-parallel" | "lcc-series" | "double-lcc";

/**
 * Options of {@link inductiveLink}.
 *
 * @category Inductive links
 */
export interface InductiveLinkOptions {
  /** Primary coil inductance L₁ [H], > 0. */
  readonly primaryInductance: number;
  /** Secondary coil inductance L₂ [H], > 0. */
  readonly secondaryInductance: number;
  /** Mutual inductance M [H], 0 < M < √(L₁L₂). */
  readonly mutualInductance: number;
  /** Primary coil AC resistance R₁ [Ω], ≥ 0. */
  readonly primaryResistance: number;
  /** Secondary coil AC resistance R₂ [Ω], ≥ 0. */
  readonly secondaryResistance: number;
  /** Operating frequency [Hz], > 0. */
  readonly frequency: number;
  /** Compensation, primary side first. */
  readonly compensation: LinkCompensation;
  /** Load resistance R_L [Ω], > 0 (the AC resistance the secondary network feeds). */
  readonly loadResistance: number;
  /** RMS voltage of the sinusoidal source [V], > 0. */
  readonly sourceVoltage: number;
  /** Primary compensating capacitor (series or parallel; in an LCC the series one) [F], > 0; default: sized for a real input impedance. */
  readonly primaryCapacitance?: number;
  /** Secondary compensating capacitor [F], > 0; default: resonant with L₂ (LCC: with L₂ − L_f2). */
  readonly secondaryCapacitance?: number;
  /** Filter inductor of a primary LCC network L_f1 [H], 0 < L_f1 < L₁; required for "lcc-series" and "double-lcc". */
  readonly primaryFilterInductance?: number;
  /** Filter inductor of a secondary LCC network L_f2 [H], 0 < L_f2 < L₂; required for "double-lcc". */
  readonly secondaryFilterInductance?: number;
}

/**
 * One capacitor of a link and its stresses.
 *
 * @category Inductive links
 */
export interface LinkCapacitor {
  /** Which capacitor: "primary", "secondary", "primary-filter" (LCC parallel capacitor), "secondary-filter". */
  readonly name: string;
  /** Capacitance [F]. */
  readonly capacitance: number;
  /** RMS voltage across it [V]. */
  readonly voltageRms: number;
  /** RMS current through it [A]. */
  readonly currentRms: number;
}

/**
 * The steady state of an inductive link ({@link inductiveLink}).
 *
 * @category Inductive links
 */
export interface InductiveLink {
  /** Power into the load over power from the source. */
  readonly efficiency: number;
  /** Power into the load [W]. */
  readonly outputPower: number;
  /** Power from the source [W]. */
  readonly inputPower: number;
  /** Impedance seen by the source [Ω]. */
  readonly inputImpedance: {
    /** Resistance [Ω]. */
    readonly re: number;
    /** Reactance [Ω], > 0 inductive. */
    readonly im: number;
  };
  /** RMS source current [A]. */
  readonly inputCurrentRms: number;
  /** RMS current of the primary coil [A]. */
  readonly primaryCurrentRms: number;
  /** RMS current of the secondary coil [A]. */
  readonly secondaryCurrentRms: number;
  /** RMS load voltage [V]. */
  readonly loadVoltageRms: number;
  /** Coupling coefficient k = M/√(L₁L₂). */
  readonly couplingCoefficient: number;
  /** The capacitors (sized or given) and their stresses. */
  readonly capacitors: readonly LinkCapacitor[];
  /** Hazards: capacitor or coil voltages above extra-low voltage. */
  readonly cautions: readonly Caution[];
}

const KEYS = [
  "primaryInductance", "secondaryInductance", "mutualInductance", "primaryResistance", "secondaryResistance",
  "frequency", "compensation", "loadResistance", "sourceVoltage", "primaryCapacitance", "secondaryCapacitance",
  "primaryFilterInductance", "secondaryFilterInductance",
] as const;
const COMPENSATIONS = ["series-series", "series-parallel", "parallel-series", "parallel-parallel", "lcc-series", "double-lcc"] as const;

/** True when every enumerable key is a known one (comparisons with constant names: cheaper than a list lookup). */
function linkFieldsKnown(options: object): boolean {
  for (const key in options) {
    if (
      key !== "primaryInductance" && key !== "secondaryInductance" && key !== "mutualInductance" &&
      key !== "primaryResistance" && key !== "secondaryResistance" && key !== "frequency" &&
      key !== "compensation" && key !== "loadResistance" && key !== "sourceVoltage" &&
      key !== "primaryCapacitance" && key !== "secondaryCapacitance" &&
      key !== "primaryFilterInductance" && key !== "secondaryFilterInductance"
    ) return false;
  }
  return true;
}

/** Compensation code: bit 0 primary parallel, bit 1 secondary parallel, bit 2 primary LCC, bit 3 secondary LCC; -1 unknown. */
function compensationCode(c: unknown): number {
  switch (c) {
    case "series-series": return 0;
    case "parallel-series": return 1;
    case "series-parallel": return 2;
    case "parallel-parallel": return 3;
    case "lcc-series": return 4;
    case "double-lcc": return 12;
    default: return -1;
  }
}

/**
 * The sinusoidal steady state of a compensated two-coil inductive link driven by a sinusoidal
 * voltage source, solved exactly as a linear phasor network. With $Z_2$ the secondary loop
 * impedance (coil, compensation, load) the primary sees the reflected impedance
 * $$ Z_\mathrm{ref} = \frac{(\omega M)^2}{Z_2},\qquad I_2 = \frac{j\omega M I_1}{Z_2} $$
 * and the primary network is reduced around $R_1 + j\omega L_1 + Z_\mathrm{ref}$. Secondary
 * side: series $Z = 1/(j\omega C_2) + R_L$; parallel $Z = R_L \parallel 1/(j\omega C_2)$; LCC
 * $Z = 1/(j\omega C_2) + [1/(j\omega C_{f2}) \parallel (j\omega L_{f2} + R_L)]$. Primary side:
 * series $Z_\mathrm{in} = 1/(j\omega C_1) + Z_b$; parallel $Z_\mathrm{in} = 1/(j\omega C_1)\parallel Z_b$;
 * LCC $Z_\mathrm{in} = j\omega L_{f1} + 1/(j\omega C_{f1}) \parallel (1/(j\omega C_1) + Z_b)$.
 *
 * Default capacitors: secondary series or parallel $C_2 = 1/(\omega^2L_2)$; LCC filter
 * capacitors $C_f = 1/(\omega^2L_f)$ and series $C = 1/(\omega^2(L - L_f))$ (the coil current is
 * then independent of the load); a primary series or parallel $C_1$ makes the input impedance
 * real at the given load (for series–series this is $1/(\omega^2L_1)$, for series–parallel with
 * $R_2 = 0$ the classic $1/(\omega^2(L_1 - M^2/L_2))$).
 *
 * @param options - {@link InductiveLinkOptions} (H, Ω, Hz, V, F)
 * @returns the {@link InductiveLink} (W, A, V, Ω)
 * @throws {@link InputError} for a non-finite or out-of-range value, M ≥ √(L₁L₂), an unknown
 *   option key or compensation, a missing or too large filter inductance, or a default
 *   capacitor that would have to be negative
 * @remarks Exact for the linear circuit (no approximation): ≤ 1e-12 relative vs an independent
 * numpy nodal solve of each of the six networks (fixture test/fixtures/links/phasor.json);
 * input power = output power + coil losses to 1e-12. Validity: lumped, linear components at a
 * single frequency; a square-wave inverter is represented by its fundamental.
 * @see C.-S. Wang, O. H. Stielau, G. A. Covic, "Design considerations for a contactless electric
 *   vehicle battery charger", IEEE Trans. Ind. Electron. 52(5), 1308–1314 (2005) (SS, SP, PS, PP
 *   compensation; from memory); S. Li, W. Li, J. Deng, T. D. Nguyen, C. C. Mi, "A double-sided LCC
 *   compensation network…", IEEE Trans. Veh. Technol. 64(6), 2261–2273 (2015) (LCC tuning; from memory).
 * @example
 * ```ts
 * import { inductiveLink } from "fluxwright";
 * const link = inductiveLink({
 *   primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6,
 *   primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3,
 *   compensation: "series-series", loadResistance: 5, sourceVoltage: 10,
 * });
 * console.log(link.efficiency.toFixed(4)); // 0.9455
 * console.log(link.outputPower.toFixed(3)); // 37.265
 * ```
 * @category Inductive links
 */
export function inductiveLink(options: InductiveLinkOptions): InductiveLink {
  // fast path: every check inline (no calls), the known-key test by constant comparisons
  if ((options as unknown) != null && typeof options === "object") {
    const l1 = options.primaryInductance;
    const l2 = options.secondaryInductance;
    const m = options.mutualInductance;
    const r1 = options.primaryResistance;
    const r2 = options.secondaryResistance;
    const f = options.frequency;
    const rl = options.loadResistance;
    const v = options.sourceVoltage;
    const c1 = options.primaryCapacitance;
    const c2 = options.secondaryCapacitance;
    const lf1 = options.primaryFilterInductance;
    const lf2 = options.secondaryFilterInductance;
    const code = compensationCode(options.compensation);
    if (
      typeof l1 === "number" && typeof l2 === "number" && typeof m === "number" && typeof r1 === "number" &&
      typeof r2 === "number" && typeof f === "number" && typeof rl === "number" && typeof v === "number" &&
      l1 > 0 && l1 < Infinity && l2 > 0 && l2 < Infinity && m > 0 && m < Math.sqrt(l1 * l2) &&
      r1 >= 0 && r1 < Infinity && r2 >= 0 && r2 < Infinity && f > 0 && f < Infinity &&
      rl > 0 && rl < Infinity && v > 0 && v < Infinity && code >= 0 &&
      c1 === undefined && c2 === undefined &&
      ((code & 4) === 0 ? lf1 === undefined : typeof lf1 === "number" && lf1 > 0 && lf1 < l1) &&
      ((code & 8) === 0 ? lf2 === undefined : typeof lf2 === "number" && lf2 > 0 && lf2 < l2) &&
      linkFieldsKnown(options)
    ) {
      return solveLink(l1, l2, m, r1, r2, f, code, rl, v, 0, 0, lf1 ?? 0, lf2 ?? 0);
    }
  }
  return inductiveLinkChecked(options);
}

/** The validating path of {@link inductiveLink}: each check throws {@link InputError} with its own message. */
function inductiveLinkChecked(options: InductiveLinkOptions): InductiveLink {
  const where = "inductiveLink";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, KEYS);
  const l1 = requirePositive(where, "primaryInductance", options.primaryInductance, "H");
  const l2 = requirePositive(where, "secondaryInductance", options.secondaryInductance, "H");
  const m = requirePositive(where, "mutualInductance", options.mutualInductance, "H");
  if (!(m < Math.sqrt(l1 * l2))) throw new InputError(where, "mutualInductance", m, "H", `less than √(L₁L₂) = ${Math.sqrt(l1 * l2)}`);
  const r1 = requireNonNegative(where, "primaryResistance", options.primaryResistance, "Ω");
  const r2 = requireNonNegative(where, "secondaryResistance", options.secondaryResistance, "Ω");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const code = compensationCode(requireOneOf(where, "compensation", options.compensation, COMPENSATIONS));
  const rl = requirePositive(where, "loadResistance", options.loadResistance, "Ω");
  const v = requirePositive(where, "sourceVoltage", options.sourceVoltage, "V");
  const c1Option = options.primaryCapacitance;
  const c2Option = options.secondaryCapacitance;
  const givenC1 = c1Option === undefined ? 0 : requirePositive(where, "primaryCapacitance", c1Option, "F");
  const givenC2 = c2Option === undefined ? 0 : requirePositive(where, "secondaryCapacitance", c2Option, "F");
  const primaryLcc = (code & 4) !== 0;
  const secondaryLcc = (code & 8) !== 0;
  let lf1 = 0;
  let lf2 = 0;
  if (primaryLcc) {
    lf1 = requirePositive(where, "primaryFilterInductance", options.primaryFilterInductance, "H");
    if (givenC1 === 0 && !(lf1 < l1)) throw new InputError(where, "primaryFilterInductance", lf1, "H", `less than primaryInductance (${l1}) for the default series capacitor`);
  } else if (options.primaryFilterInductance !== undefined) {
    throw new InputError(where, "primaryFilterInductance", options.primaryFilterInductance, "H", "absent (only LCC compensation has a filter inductor)");
  }
  if (secondaryLcc) {
    lf2 = requirePositive(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H");
    if (givenC2 === 0 && !(lf2 < l2)) throw new InputError(where, "secondaryFilterInductance", lf2, "H", `less than secondaryInductance (${l2}) for the default series capacitor`);
  } else if (options.secondaryFilterInductance !== undefined) {
    throw new InputError(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H", "absent (only double-LCC compensation has a secondary filter inductor)");
  }
  return solveLink(l1, l2, m, r1, r2, f, code, rl, v, givenC1, givenC2, lf1, lf2);
}

/** Extra-low-voltage limit (AC RMS) read once: the cautions are built only above it. */
const ELV_AC_RMS = EXTRA_LOW_VOLTAGE_LIMITS.acRms;

/** The cautions of a link below extra-low voltage: one shared, frozen empty list. */
const NO_CAUTIONS: readonly Caution[] = Object.freeze([]);

/** Where a capacitor's voltage caution points (constant text: no concatenation per call). */
function capacitorLocation(name: string): string {
  switch (name) {
    case "primary": return "primary compensating capacitor";
    case "secondary": return "secondary compensating capacitor";
    case "primary-filter": return "primary-filter compensating capacitor";
    case "secondary-filter": return "secondary-filter compensating capacitor";
    default: return `${name} compensating capacitor`;
  }
}

/** The phasor solve on checked arguments (givenC = 0: the default capacitor). */
function solveLink(
  l1: number, l2: number, m: number, r1: number, r2: number, f: number, code: number, rl: number, v: number,
  givenC1: number, givenC2: number, lf1: number, lf2: number,
): InductiveLink {
  const where = "inductiveLink";
  const primaryParallel = (code & 1) !== 0;
  const secondaryParallel = (code & 2) !== 0;
  const primaryLcc = (code & 4) !== 0;
  const secondaryLcc = (code & 8) !== 0;

  // Scalar complex arithmetic throughout (no intermediate objects).
  const w = 2 * Math.PI * f;
  const w2 = w * w;
  // ---- secondary network (everything in the secondary loop except the coil): zExt
  const c2 = givenC2 > 0 ? givenC2 : secondaryLcc ? 1 / (w2 * (l2 - lf2)) : 1 / (w2 * l2);
  const xc2 = -1 / (w * c2);
  let extRe: number;
  let extIm: number;
  let afterAbs = 0; // secondary LCC: |impedance after C2|
  let branchAbs = 0; // secondary LCC: |jωL_f2 + R_L|
  const cf2 = secondaryLcc ? 1 / (w2 * lf2) : 0;
  if (secondaryLcc) {
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
    afterAbs = Math.sqrt(aRe * aRe + aIm * aIm);
    branchAbs = Math.sqrt(bRe * bRe + bIm * bIm);
    extRe = aRe;
    extIm = aIm + xc2;
  } else if (secondaryParallel) {
    // (j xc2) ∥ R_L
    const d = rl * rl + xc2 * xc2;
    extRe = (rl * xc2 * xc2) / d;
    extIm = (rl * rl * xc2) / d;
  } else {
    extRe = rl;
    extIm = xc2;
  }
  const z2Re = r2 + extRe;
  const z2Im = w * l2 + extIm;
  const z2Sq = z2Re * z2Re + z2Im * z2Im;
  const wm = w * m;
  const wm2 = wm * wm;
  // primary coil branch without its capacitor: R₁ + jωL₁ + (ωM)²/Z₂
  const coilRe = r1 + (wm2 * z2Re) / z2Sq;
  const coilIm = w * l1 - (wm2 * z2Im) / z2Sq;
  // ---- primary network
  let c1: number;
  let inRe: number;
  let inIm: number;
  let i1Abs: number;
  let inCurrentAbs: number;
  let cf1 = 0;
  let nodeAbs = 0;
  if (primaryLcc) {
    c1 = givenC1 > 0 ? givenC1 : 1 / (w2 * (l1 - lf1));
    cf1 = 1 / (w2 * lf1);
    const xf = -1 / (w * cf1);
    const bRe = coilRe;
    const bIm = coilIm - 1 / (w * c1);
    // (j xf) ∥ b
    const nRe = -xf * bIm;
    const nIm = xf * bRe;
    const dIm = bIm + xf;
    const dd = bRe * bRe + dIm * dIm;
    inRe = (nRe * bRe + nIm * dIm) / dd;
    inIm = (nIm * bRe - nRe * dIm) / dd + w * lf1;
    const inSq = inRe * inRe + inIm * inIm;
    // I_in = V/Z_in; node voltage V − jωL_f1 I_in; coil current node/(branch)
    const iRe = (v * inRe) / inSq;
    const iIm = (-v * inIm) / inSq;
    const vnRe = v + w * lf1 * iIm;
    const vnIm = -w * lf1 * iRe;
    nodeAbs = Math.sqrt(vnRe * vnRe + vnIm * vnIm);
    inCurrentAbs = v / Math.sqrt(inSq);
    i1Abs = nodeAbs / Math.sqrt(bRe * bRe + bIm * bIm);
  } else if (primaryParallel) {
    const coilSq = coilRe * coilRe + coilIm * coilIm;
    c1 = givenC1 > 0 ? givenC1 : coilIm / (coilSq * w);
    if (!(c1 > 0)) throw new InputError(where, "primaryCapacitance", c1, "F", "given: the branch is capacitive, so no parallel capacitor makes the input impedance real");
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
    if (!(c1 > 0)) throw new InputError(where, "primaryCapacitance", c1, "F", "given: the branch is capacitive, so no series capacitor makes the input impedance real");
    inRe = coilRe;
    inIm = coilIm - 1 / (w * c1);
    inCurrentAbs = v / Math.sqrt(inRe * inRe + inIm * inIm);
    i1Abs = inCurrentAbs;
  }
  const i2Abs = (wm * i1Abs) / Math.sqrt(z2Sq);
  let loadCurrent: number;
  let secondaryCapacitor: LinkCapacitor;
  let secondaryFilter: LinkCapacitor | null = null;
  if (secondaryLcc) {
    const node2 = i2Abs * afterAbs;
    loadCurrent = node2 / branchAbs;
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
    const primaryFilter: LinkCapacitor = { name: "primary-filter", capacitance: cf1, voltageRms: nodeAbs, currentRms: nodeAbs * w * cf1 };
    capacitors = secondaryFilter === null ? [primaryFilter, primaryCapacitor, secondaryCapacitor] : [primaryFilter, primaryCapacitor, secondaryCapacitor, secondaryFilter];
  } else {
    capacitors = secondaryFilter === null ? [primaryCapacitor, secondaryCapacitor] : [primaryCapacitor, secondaryCapacitor, secondaryFilter];
  }
  let worst = 0;
  let worstName = "";
  for (let k = 0; k < capacitors.length; k++) {
    const c = capacitors[k];
    if (c !== undefined && c.voltageRms > worst) {
      worst = c.voltageRms;
      worstName = c.name;
    }
  }
  const outputPower = loadCurrent * loadCurrent * rl;
  const inputPower = (v * v * inRe) / (inRe * inRe + inIm * inIm);
  const coilVoltage = i1Abs * w * l1;
  // the cautions' limit is checked here first so a safe link builds no message text and
  // shares one empty list
  let cautions: readonly Caution[] = NO_CAUTIONS;
  if (worst > ELV_AC_RMS || coilVoltage > ELV_AC_RMS) {
    const list: Caution[] = [];
    const caution = worst > ELV_AC_RMS ? extraLowVoltageCaution(worst, "ac", capacitorLocation(worstName)) : null;
    if (caution !== null) list.push(caution);
    const coilCaution = coilVoltage > ELV_AC_RMS ? extraLowVoltageCaution(coilVoltage, "ac", "primary coil") : null;
    if (coilCaution !== null) list.push(coilCaution);
    cautions = list;
  }
  return {
    efficiency: outputPower / inputPower,
    outputPower,
    inputPower,
    inputImpedance: { re: inRe, im: inIm },
    inputCurrentRms: inCurrentAbs,
    primaryCurrentRms: i1Abs,
    secondaryCurrentRms: i2Abs,
    loadVoltageRms: loadCurrent * rl,
    couplingCoefficient: m / Math.sqrt(l1 * l2),
    capacitors,
    cautions,
  };
}
