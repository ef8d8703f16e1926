/**
 * Reading and checking the coil and plate of {@link coilOverPlate} (shared with the truncated-region
 * method and the temperature helper).
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import { renamedOption } from "../core/renamed.js";
import type { CoilAbovePlate, PlateLayer } from "./coil-over-plate-types.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LAYER_FIELDS: readonly string[] = Object.freeze(["thickness", "resistivity", "relativePermeability"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const PLATE_COIL_FIELDS: readonly string[] = Object.freeze(["innerRadius", "outerRadius", "liftOff", "length", "turns", "height"]);

/** Checked layer list of a plate option (shared with the temperature helper). */
export function checkPlateLayers(where: string, plate: unknown): PlateLayer[] {
  const list: unknown[] = Array.isArray(plate) ? (plate as unknown[]) : [requireObject(where, "plate", plate)];
  if (list.length === 0) throw new InputError(where, "plate", plate, "", "a layer or a non-empty array of layers");
  return list.map((item, i) => {
    const name = Array.isArray(plate) ? `plate[${i}]` : "plate";
    const layer = requireKnownKeys(where, name, requireObject(where, name, item), LAYER_FIELDS);
    const t = layer["thickness"];
    const last = i === list.length - 1;
    if (typeof t !== "number" || !(t > 0) || (t === Infinity && !last)) {
      throw new InputError(
        where,
        `${name}.thickness`,
        t,
        "m",
        last ? "a number > 0 (Infinity for a half-space)" : "a finite number > 0 (only the last layer may be Infinity)",
      );
    }
    const resistivity = requirePositive(where, `${name}.resistivity`, layer["resistivity"], "Ω·m");
    const mur = layer["relativePermeability"];
    if (typeof mur !== "number" || !Number.isFinite(mur) || mur < 1) {
      throw new InputError(where, `${name}.relativePermeability`, mur, "", "a finite number ≥ 1");
    }
    return { thickness: t, resistivity, relativePermeability: mur };
  });
}

/** Checked coil of {@link coilOverPlate}. */
export function checkCoil(where: string, coil: unknown): CoilAbovePlate {
  const c = requireObject(where, "coil", coil);
  requireKnownKeys(where, "coil", c, PLATE_COIL_FIELDS);
  const innerRadius = requireNonNegative(where, "coil.innerRadius", c["innerRadius"], "m");
  const outerRadius = requirePositive(where, "coil.outerRadius", c["outerRadius"], "m");
  if (!(outerRadius > innerRadius)) {
    throw new InputError(where, "coil.outerRadius", outerRadius, "m", `a finite number > coil.innerRadius (${innerRadius})`);
  }
  const liftOff = requireNonNegative(where, "coil.liftOff", c["liftOff"], "m");
  const length = requirePositive(where, c["length"] === undefined && c["height"] !== undefined ? "coil.height" : "coil.length", renamedOption(where, "coil", c, "length", "height"), "m");
  const turns = requireInteger(where, "coil.turns", c["turns"], 1);
  return { innerRadius, outerRadius, liftOff, length, turns };
}
