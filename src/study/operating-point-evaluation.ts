/**
 * One evaluation of the heater at a trial frequency and surface field, for the operating-point
 * iteration: the coil state (exact model, or the surrogate corrected to it), the leads, the
 * capacitor's and the concentrator's losses as series resistances, and the inverter's figures
 * the iteration reads.
 *
 * The exact coil and coupling are costly: the iteration runs on the closed-form surrogate
 * (current-sheet resistance, Rosa's inductance, long-coil coupling) corrected to the exact value
 * at the last exact evaluation (resistances by factors, inductances by offsets). A continued
 * point starts from its neighbour's correction; otherwise the first evaluation is exact.
 *
 * @packageDocumentation
 */
import { sinusoidalPeakFluxDensity, steinmetzLoss } from "../coreloss/index.js";
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import { capacitorSeriesResistance } from "../tank/index.js";
import { currentFedWithSourceFigures } from "../tank/current-fed-figures.js";
import { cellState } from "./operating-point-cells.js";
import { closedFormWindingResistance, leadSeriesImpedance } from "./operating-point-coil.js";
import { couplingModel } from "./operating-point-coupling.js";
import type { CouplingModel } from "./operating-point-coupling.js";
import { corrected, correctionOf, corrections, outsideCoilModel } from "./operating-point-correction.js";
import type { Correction, OutsideCoilModel } from "./operating-point-correction.js";
import { solveInverter } from "./operating-point-inverter.js";
import type { InverterSolution } from "./operating-point-inverter.js";
import type { CoilProperties, CoilState, OperatingPointStart } from "./operating-point-types.js";
import type { ResolvedHeaterDescription } from "./read-description.js";

/** The coil branch and tank at one trial frequency `f` [Hz] and surface field `h` [A/m]. */
export interface Evaluation {
  /** Winding copper and leads [Ω]. */
  readonly coilResistance: number;
  /** The part's relative permeability at the field. */
  readonly mur: number;
  readonly reflectedResistance: number;
  readonly inductanceChange: number;
  /** What the tank resonates with: the coil with the part, and the leads [H]. */
  readonly L: number;
  /** The coil with the part, leads excluded [H]. */
  readonly coilL: number;
  readonly leadR: number;
  readonly leadL: number;
  readonly emptyL: number;
  readonly capacitorResistance: number;
  readonly coreResistance: number;
  readonly tankResistance: number;
  readonly f: number;
  readonly h: number;
}

/**
 * What the fixed-point iteration reads of an inverter solution. The current-fed inverter's come
 * from its allocation-free kernel (the same numbers as `solveInverter`, which builds the whole
 * result with its cautions on every call); the final point is solved in full.
 */
export type Solution = Pick<InverterSolution, "frequency" | "coilCurrentRms" | "tankVoltagePeak">;

/** Peak voltage at the coil's terminals: the tank's voltage less the leads' share (the same without lead inductance). */
export function coilVoltagePeakOf(e: Evaluation, s: { coilCurrentRms: number; tankVoltagePeak: number }): number {
  return e.leadL > 0 ? Math.SQRT2 * s.coilCurrentRms * Math.hypot(e.tankResistance - e.capacitorResistance - e.leadR, 2 * Math.PI * e.f * e.coilL) : s.tankVoltagePeak;
}

/**
 * The heater at one part temperature, empty or with the part, evaluated at trial frequencies and
 * fields; holds the surrogate's corrections (loaded and empty) as the iteration refreshes them.
 */
export class PointEvaluator {
  /** The part's coupling model (`null` for the empty coil). */
  readonly model: CouplingModel | null;
  /** Resistivity of the part at its temperature [Ω·m]. */
  readonly partResistivity: number;
  /** The series inverter's fixed switching frequency [Hz], else `null`. */
  readonly fixedFrequency: number | null;
  /** An exact coil model supplied from outside (field tier), if any. */
  readonly outside: OutsideCoilModel | undefined;
  /** The surrogate's correction with the part (`null`: the next coil state is exact). */
  correction: Correction | null;
  /** The surrogate's correction for the empty coil (`null`: the next coil state is exact). */
  emptyCorrection: Correction | null;
  /** Whether the coil-impedance model is in use (falls to the closed form outside its domain). */
  cellsUsed: boolean;
  // the leads in series with the coil (one-entry cache: the iteration revisits a frequency)
  private leadFrequency = Number.NaN;
  private lead = { resistance: 0, inductance: 0 };
  private readonly figures = new Float64Array(3);
  private readonly figureScratch = new Float64Array(7);

  constructor(
    readonly d: ResolvedHeaterDescription,
    readonly props: CoilProperties,
    readonly partTemperature: number,
    readonly withPart: boolean,
    start: OperatingPointStart | null,
  ) {
    const inv = d.inverter;
    this.model = withPart ? couplingModel(d, props) : null;
    this.partResistivity = resistivityAt(d.part.material, partTemperature);
    this.fixedFrequency = inv.kind === "voltage-fed-series" && inv.control === "fixed" && inv.frequency !== null ? inv.frequency : null;
    const stored = start !== null ? corrections.get(start) : undefined;
    this.correction = stored !== undefined && withPart && stored.withPart ? stored.correction : null;
    this.emptyCorrection = stored !== undefined && !withPart && !stored.withPart ? stored.correction : null;
    this.cellsUsed = props.impedanceTier === "cells";
    this.outside = outsideCoilModel(props);
  }

  /** The exact model: the outside model, the coil-impedance model (cells tier), or the closed form with the finite-coil coupling. */
  exactState(f: number, mur: number, part: boolean): CoilState {
    if (this.outside !== undefined) return this.outside.state(f, this.partResistivity, mur, part, this.partTemperature, this.cheapState(f, mur, part));
    if (this.cellsUsed) {
      const z = cellState(this.d, this.props, f, this.partResistivity, mur, part && this.model !== null);
      if (z !== null) return z;
      this.cellsUsed = false;
    }
    const L0 = this.props.inductance;
    const copper = closedFormWindingResistance(this.d, this.props, f, null);
    if (!part || this.model === null) return { copper, part: 0, L: L0, emptyL: L0 };
    const c = this.model.coupling(f, this.partResistivity, mur);
    return { copper, part: c.reflectedResistance, L: L0 + c.inductanceChange, emptyL: L0 };
  }

  /** The cheap surrogate with the same trends. */
  cheapState(f: number, mur: number, part: boolean): CoilState {
    const L0 = this.props.inductance;
    const copper = closedFormWindingResistance(this.d, this.props, f, null);
    if (!part || this.model === null) return { copper, part: 0, L: L0, emptyL: L0 };
    const c = this.model.surrogate(f, this.partResistivity, mur);
    return { copper, part: c.reflectedResistance, L: L0 + c.inductanceChange, emptyL: L0 };
  }

  /** The coil state the iteration uses: exact when no correction is held (and the correction taken from it), else the corrected surrogate. */
  private coilState(f: number, mur: number, part: boolean): CoilState {
    const slot = part ? this.correction : this.emptyCorrection;
    if (slot === null) {
      const exact = this.exactState(f, mur, part);
      const next = correctionOf(exact, this.cheapState(f, mur, part));
      if (part) this.correction = next;
      else this.emptyCorrection = next;
      return exact;
    }
    return corrected(this.cheapState(f, mur, part), slot);
  }

  /** Concentrator: Steinmetz loss at the peak flux the coil voltage drives through its section, as a series resistance [Ω]. */
  coreResistance(f: number, current: number, voltagePeak: number): number {
    const d = this.d;
    if (d.concentrator === null || !(voltagePeak > 0) || !(current > 0)) return 0;
    const bPeak = sinusoidalPeakFluxDensity({ voltageRms: voltagePeak / Math.SQRT2, frequency: f, turns: d.coil.turns, coreArea: d.concentrator.crossSectionArea });
    const k = d.concentrator.material.steinmetz;
    const loss = steinmetzLoss({ k: k.k, alpha: k.alpha, beta: k.beta, frequency: f, fluxDensityPeak: bPeak }) * d.concentrator.volume;
    return loss / (current * current);
  }

  /** The leads' series resistance [Ω] and inductance [H] at `f`. */
  leadAt(f: number): { resistance: number; inductance: number } {
    if (f !== this.leadFrequency) {
      this.lead = leadSeriesImpedance(this.d, this.props, f);
      this.leadFrequency = f;
    }
    return this.lead;
  }

  /** The coil branch and tank at frequency `f` and surface field `h`, the core loss at the previous iterate's current and coil voltage. */
  evaluate(f: number, h: number, previousCurrent: number, previousVoltagePeak: number, part: boolean): Evaluation {
    const d = this.d;
    // the coil's own impedance at f, empty or with the part
    const mur = part ? relativePermeabilityAt(d.part.material, { temperature: this.partTemperature, fieldStrengthPeak: h }) : 1;
    const st = this.coilState(f, mur, part && this.model !== null);
    const { resistance: leadR, inductance: leadL } = this.leadAt(f);
    const coilResistance = st.copper + leadR;
    const reflectedResistance = st.part;
    const inductanceChange = st.L - st.emptyL;
    // the tank sees the coil and the leads in series
    const L = st.L + leadL;
    // the capacitor's dielectric loss as its equivalent series resistance tanδ/(ωC), in the coil branch
    const capacitorResistance = capacitorSeriesResistance({ capacitance: d.capacitor.capacitance, dissipationFactor: d.capacitor.dissipationFactor, frequency: f });
    const coreResistance = this.coreResistance(f, previousCurrent, previousVoltagePeak);
    const tankResistance = coilResistance + reflectedResistance + capacitorResistance + coreResistance;
    return { coilResistance, mur, reflectedResistance, inductanceChange, L, coilL: st.L, leadR, leadL, emptyL: st.emptyL, capacitorResistance, coreResistance, tankResistance, f, h };
  }

  /** The inverter's figures the iteration reads at an evaluation (its arguments must stay those of the current-fed call in `solveInverter`). */
  solveStep(e: Evaluation): Solution {
    const d = this.d;
    const inv = d.inverter;
    const figures = this.figures;
    if (
      inv.kind === "current-fed-parallel" &&
      currentFedWithSourceFigures(d.supply.voltage, d.supply.internalResistance, inv.switchOnResistance, e.L, d.capacitor.capacitance, e.tankResistance, inv.chokeInductance, figures, this.figureScratch)
    ) {
      return { frequency: figures[0]!, coilCurrentRms: figures[1]!, tankVoltagePeak: figures[2]! };
    }
    // the other inverters, and the public function's error where the kernel declines
    return solveInverter(d, this.fixedFrequency, e.L, e.tankResistance, false);
  }

  /** Peak surface field of a solution [A/m] (0 for the empty coil). */
  fieldOf(s: Solution): number {
    return this.model === null ? 0 : this.model.fieldPerAmpere * s.coilCurrentRms;
  }
}
