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
  voltageCaution,
  type Caution,
} from "../core/index.js";
import { cAbs, cAdd, cDiv, cMul, cScale, complex, type Complex } from "../special/index.js";

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

/** Impedance of a capacitor at ω. */
function zc(omega: number, c: number): Complex {
  return complex(0, -1 / (omega * c));
}
/** Parallel combination. */
function par(a: Complex, b: Complex): Complex {
  return cDiv(cMul(a, b), cAdd(a, b));
}
function inv(a: Complex): Complex {
  return cDiv(complex(1), a);
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
  const compensation = requireOneOf(where, "compensation", options.compensation, COMPENSATIONS);
  const rl = requirePositive(where, "loadResistance", options.loadResistance, "Ω");
  const v = requirePositive(where, "sourceVoltage", options.sourceVoltage, "V");
  const givenC1 = options.primaryCapacitance === undefined ? undefined : requirePositive(where, "primaryCapacitance", options.primaryCapacitance, "F");
  const givenC2 = options.secondaryCapacitance === undefined ? undefined : requirePositive(where, "secondaryCapacitance", options.secondaryCapacitance, "F");
  const primaryLcc = compensation === "lcc-series" || compensation === "double-lcc";
  const secondaryLcc = compensation === "double-lcc";
  const secondaryParallel = compensation === "series-parallel" || compensation === "parallel-parallel";
  const primaryParallel = compensation === "parallel-series" || compensation === "parallel-parallel";
  let lf1 = 0;
  let lf2 = 0;
  if (primaryLcc) {
    lf1 = requirePositive(where, "primaryFilterInductance", options.primaryFilterInductance, "H");
    if (givenC1 === undefined && !(lf1 < l1)) throw new InputError(where, "primaryFilterInductance", lf1, "H", `less than primaryInductance (${l1}) for the default series capacitor`);
  } else if (options.primaryFilterInductance !== undefined) {
    throw new InputError(where, "primaryFilterInductance", options.primaryFilterInductance, "H", "absent (only LCC compensation has a filter inductor)");
  }
  if (secondaryLcc) {
    lf2 = requirePositive(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H");
    if (givenC2 === undefined && !(lf2 < l2)) throw new InputError(where, "secondaryFilterInductance", lf2, "H", `less than secondaryInductance (${l2}) for the default series capacitor`);
  } else if (options.secondaryFilterInductance !== undefined) {
    throw new InputError(where, "secondaryFilterInductance", options.secondaryFilterInductance, "H", "absent (only double-LCC compensation has a secondary filter inductor)");
  }

  const w = 2 * Math.PI * f;
  const capacitors: LinkCapacitor[] = [];
  // ---- secondary network (everything in the secondary loop except the coil)
  const load = complex(rl);
  const c2 = givenC2 ?? (secondaryLcc ? 1 / (w * w * (l2 - lf2)) : 1 / (w * w * l2));
  let zExt: Complex;
  let zAfterSeries = load; // secondary LCC: the part after C2
  const cf2 = secondaryLcc ? 1 / (w * w * lf2) : 0;
  if (secondaryLcc) {
    zAfterSeries = par(zc(w, cf2), cAdd(complex(0, w * lf2), load));
    zExt = cAdd(zc(w, c2), zAfterSeries);
  } else if (secondaryParallel) {
    zExt = par(zc(w, c2), load);
  } else {
    zExt = cAdd(zc(w, c2), load);
  }
  const z2 = cAdd(complex(r2, w * l2), zExt);
  const wm = w * m;
  const zRef = cDiv(complex(wm * wm), z2);
  const zCoil = cAdd(complex(r1, w * l1), zRef); // primary coil branch without its capacitor
  // ---- primary network
  let c1: number;
  let zin: Complex;
  const cf1 = primaryLcc ? 1 / (w * w * lf1) : 0;
  if (primaryLcc) {
    c1 = givenC1 ?? 1 / (w * w * (l1 - lf1));
    zin = cAdd(complex(0, w * lf1), par(zc(w, cf1), cAdd(zc(w, c1), zCoil)));
  } else if (primaryParallel) {
    const yb = inv(zCoil);
    c1 = givenC1 ?? -yb.im / w;
    if (!(c1 > 0)) throw new InputError(where, "primaryCapacitance", c1, "F", "given: the branch is capacitive, so no parallel capacitor makes the input impedance real");
    zin = par(zc(w, c1), zCoil);
  } else {
    c1 = givenC1 ?? 1 / (w * zCoil.im);
    if (!(c1 > 0)) throw new InputError(where, "primaryCapacitance", c1, "F", "given: the branch is capacitive, so no series capacitor makes the input impedance real");
    zin = cAdd(zc(w, c1), zCoil);
  }
  const vs = complex(v);
  const iin = cDiv(vs, zin);
  // coil currents
  let i1: Complex;
  if (primaryLcc) {
    const vNode = cAdd(vs, cMul(complex(0, -w * lf1), iin));
    i1 = cDiv(vNode, cAdd(zc(w, c1), zCoil));
    capacitors.push({ name: "primary-filter", capacitance: cf1, voltageRms: cAbs(vNode), currentRms: cAbs(vNode) * w * cf1 });
    capacitors.push({ name: "primary", capacitance: c1, voltageRms: cAbs(i1) / (w * c1), currentRms: cAbs(i1) });
  } else if (primaryParallel) {
    i1 = cDiv(vs, zCoil);
    capacitors.push({ name: "primary", capacitance: c1, voltageRms: v, currentRms: v * w * c1 });
  } else {
    i1 = iin;
    capacitors.push({ name: "primary", capacitance: c1, voltageRms: cAbs(i1) / (w * c1), currentRms: cAbs(i1) });
  }
  const i2 = cDiv(cScale(cMul(complex(0, wm), i1), 1), z2);
  const i2Abs = cAbs(i2);
  let loadCurrent: number;
  if (secondaryLcc) {
    const vNode2 = cMul(i2, zAfterSeries);
    loadCurrent = cAbs(vNode2) / cAbs(cAdd(complex(0, w * lf2), load));
    capacitors.push({ name: "secondary", capacitance: c2, voltageRms: i2Abs / (w * c2), currentRms: i2Abs });
    capacitors.push({ name: "secondary-filter", capacitance: cf2, voltageRms: cAbs(vNode2), currentRms: cAbs(vNode2) * w * cf2 });
  } else if (secondaryParallel) {
    const vLoad = i2Abs * cAbs(zExt);
    loadCurrent = vLoad / rl;
    capacitors.push({ name: "secondary", capacitance: c2, voltageRms: vLoad, currentRms: vLoad * w * c2 });
  } else {
    loadCurrent = i2Abs;
    capacitors.push({ name: "secondary", capacitance: c2, voltageRms: i2Abs / (w * c2), currentRms: i2Abs });
  }
  const outputPower = loadCurrent * loadCurrent * rl;
  const inputPower = v * v * zin.re / (zin.re * zin.re + zin.im * zin.im);
  const cautions: Caution[] = [];
  let worst = 0;
  let worstName = "";
  for (const c of capacitors) {
    if (c.voltageRms > worst) {
      worst = c.voltageRms;
      worstName = c.name;
    }
  }
  const caution = voltageCaution({ voltage: worst, waveform: "ac", location: `${worstName} compensating capacitor` });
  if (caution !== null) cautions.push(caution);
  const coilVoltage = cAbs(i1) * w * l1;
  const coilCaution = voltageCaution({ voltage: coilVoltage, waveform: "ac", location: "primary coil" });
  if (coilCaution !== null) cautions.push(coilCaution);
  return {
    efficiency: outputPower / inputPower,
    outputPower,
    inputPower,
    inputImpedance: { re: zin.re, im: zin.im },
    inputCurrentRms: cAbs(iin),
    primaryCurrentRms: cAbs(i1),
    secondaryCurrentRms: i2Abs,
    loadVoltageRms: loadCurrent * rl,
    couplingCoefficient: m / Math.sqrt(l1 * l2),
    capacitors,
    cautions,
  };
}
