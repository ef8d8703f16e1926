/**
 * The result of {@link coilOverPlate} and {@link coilOverPlateTruncatedRegion} from their integrals:
 * resistance and inductance change, empty-coil inductance, skin depth and validity notes.
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import { requireFiniteResult } from "../core/validate.js";
import { MU_0 } from "../units/index.js";
import type { CoilAbovePlate, CoilOverPlateResult, PlateLayer } from "./coil-over-plate-types.js";

/** The public function a result is for: coilOverPlate passes its air-core inductance, the truncated region does not. */
function where(airCore: number | null): string {
  return airCore === null ? "coilOverPlateTruncatedRegion" : "coilOverPlate";
}

/** Result object from the three integrals: ΔZ = jωπμ0 n² (iRe + j iIm), L0 = 2πμ0 n² (h K + j). */
export function assembleResult(
  coil: CoilAbovePlate,
  layers: readonly PlateLayer[],
  omega: number,
  iRe: number,
  iIm: number,
  j: number,
  airCore: number | null = null,
): CoilOverPlateResult {
  const r1 = coil.innerRadius;
  const r2 = coil.outerRadius;
  const n = coil.turns / ((r2 - r1) * coil.length);
  const c = Math.PI * MU_0 * n * n;
  const dR = -omega * c * iIm;
  const dX = omega * c * iRe;
  const kClosed = ((r2 ** 4 - r1 ** 4) / 4 - r1 ** 3 * (r2 - r1)) / 3;
  const l0 = airCore ?? 2 * c * (coil.length * kClosed + j);
  const dL = dX / omega;
  // dimensions or frequencies near the ends of the double range can overflow the integrals or
  // give 0/0: refused rather than answered with Infinity or NaN
  requireFiniteResult(where(airCore), "coil and frequency", dR + Math.abs(dX) + Math.abs(l0));
  const top = layers[0]!;
  const skinDepth = Math.sqrt((2 * top.resistivity) / (omega * MU_0 * top.relativePermeability));
  const validity: ValidityNote[] = [];
  if (layers.some((layer) => layer.relativePermeability > 1)) {
    validity.push({
      code: "constant-permeability",
      message:
        "Magnetic layers are taken as linear with a constant relative permeability; steel saturates in strong fields, so use the permeability at the working field strength.",
    });
  }
  if (coil.liftOff === 0) {
    validity.push({
      code: "zero-lift-off",
      message: "The winding touches the plate; real coils need insulation and cooling gaps, which lower the coupling.",
      value: 0,
    });
  }
  return {
    reflectedResistance: dR,
    // eslint-disable-next-line @typescript-eslint/no-deprecated -- kept until 1.0
    resistanceChange: dR,
    reactanceChange: dX,
    inductanceChange: dL,
    emptyCoilInductance: l0,
    // eslint-disable-next-line @typescript-eslint/no-deprecated -- kept until 1.0
    airCoreInductance: l0,
    inductance: l0 + dL,
    impedance: { re: dR, im: omega * (l0 + dL) },
    skinDepth,
    validity,
  };
}
