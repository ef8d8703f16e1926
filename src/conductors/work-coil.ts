/**
 * The classic current-sheet estimate of an induction work coil's resistance.
 *
 * @packageDocumentation
 */
import { requireInRange, requireInteger, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { MU_0 } from "../units/index.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const WORK_COIL_FIELDS: readonly string[] = Object.freeze(["innerDiameter", "coilLength", "turns", "spaceFactor", "frequency", "resistivity"]);

/** Options of {@link workCoilResistanceCurrentSheet}. @category Conductors */
export interface WorkCoilResistanceOptions {
  /** Diameter of the coil's copper face towards the part (the bore of an encircling coil) [m], finite and > 0. */
  readonly innerDiameter: number;
  /** Axial length of the coil [m], finite and > 0. */
  readonly coilLength: number;
  /** Number of turns N, an integer ≥ 1. */
  readonly turns: number;
  /**
   * Space factor $k_s$ [-] in (0, 1]: the fraction of the coil length occupied by copper on
   * the face towards the part (N × conductor width / coil length).
   */
  readonly spaceFactor: number;
  /** Frequency [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the coil conductor at its working temperature [Ω·m], finite and > 0. */
  readonly resistivity: number;
}

/**
 * Resistance of an induction work coil from the current-sheet picture: the coil's ampere-turns
 * NI flow as a sheet in one skin depth of the copper face towards the part, spread over the
 * copper part $k_s \ell$ of the coil length:
 *
 * $$
 * R_\mathrm{coil} \approx \frac{\rho\, \pi D\, N^2}{k_s\, \ell\, \delta},
 * \qquad \delta = \sqrt{\frac{\rho}{\pi f \mu_0}}
 * $$
 *
 * An approximation: it assumes the conductor is several δ thick (at least about 3 δ), the
 * current crowds to the face towards the part (a closely coupled load, or a long coil), and
 * the coil is long against its gap to the part; it ignores the current on the sides and back of
 * each turn, the end effects of short coils and the leads. Measured against the cell model of
 * the turns (`workCoilImpedance` of the workpiece module, skin and proximity effect solved)
 * on four solenoids of tube and round wire (4–20 turns, ℓ/D 0.6–4.2, 5–200 kHz, space factor
 * N·d/ℓ 0.6–0.8), it reads **high**, by 14–17 % on the long 20-turn coil and by 27–67 % on the
 * short ones — the current spreads over more of each turn's surface than the bore face — both
 * for the empty coil and for the coil's copper loss with a bar or tube inside
 * (test/conductors/work-coil.test.ts). Use it for trends (R ∝ N², ∝ √f);
 * for numbers use `workCoilImpedance`.
 *
 * Hard domain (throws {@link InputError}): diameters, length, frequency, resistivity finite and
 * > 0; turns an integer ≥ 1; spaceFactor in (0, 1]. Accuracy: an approximation, 14–67 % high
 * as measured above; the formula itself is evaluated to rounding (tests: 1e-14).
 *
 * @param options - {@link WorkCoilResistanceOptions}
 * @returns coil resistance [Ω]
 * @throws {@link InputError} on bad input
 * @see E. J. Davies, P. Simpson, Induction Heating Handbook, McGraw-Hill (1979), ch. 3 (coil resistance of a current sheet with a space factor; chapter from memory).
 * @see S. Zinn, S. L. Semiatin, Elements of Induction Heating, ASM International (1988), ch. 3 (same estimate, from memory).
 * @example
 * ```ts
 * import { workCoilResistanceCurrentSheet } from "fluxwright";
 * // 8 turns, 60 mm bore, 80 mm long, 75 % copper face, copper at 40 °C, 20 kHz
 * const options = { innerDiameter: 0.06, coilLength: 0.08, turns: 8, spaceFactor: 0.75,
 *   frequency: 20e3, resistivity: 1.86e-8 };
 * console.log(workCoilResistanceCurrentSheet(options)); // ≈ 0.0077
 * ```
 * @category Conductors
 */
export function workCoilResistanceCurrentSheet(options: WorkCoilResistanceOptions): number {
  const where = "workCoilResistanceCurrentSheet";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, WORK_COIL_FIELDS);
  const diameter = requirePositive(where, "innerDiameter", options.innerDiameter, "m");
  const length = requirePositive(where, "coilLength", options.coilLength, "m");
  const turns = requireInteger(where, "turns", options.turns, 1);
  const spaceFactor = requireInRange(where, "spaceFactor", options.spaceFactor, "", 0, 1, "(]");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const delta = Math.sqrt(resistivity / (Math.PI * frequency * MU_0));
  return (resistivity * Math.PI * diameter * turns * turns) / (spaceFactor * length * delta);
}
