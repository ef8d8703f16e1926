/**
 * The voltage cautions of {@link inductiveLink}: the most stressed capacitor and the primary coil
 * above extra-low voltage, with each message's start made once per location. Internal.
 *
 * @packageDocumentation
 */
import { EXTRA_LOW_VOLTAGE_LIMITS, type Caution } from "../core/index.js";
import { acVoltageCautionAbove, voltageMessageStart } from "../core/extra-low-voltage.js";
import type { LinkCapacitor } from "./inductive-link-types.js";

/** Extra-low-voltage limit (AC RMS) read once: the cautions are built only above it. */
const ELV_AC_RMS = EXTRA_LOW_VOLTAGE_LIMITS.acRms;

/** The cautions of a link below extra-low voltage: one shared, frozen empty list. */
const NO_CAUTIONS: readonly Caution[] = Object.freeze([]);

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

/** The voltage cautions of a link: its most stressed capacitor and the primary coil, when above extra-low voltage. */
export function linkCautions(capacitors: readonly LinkCapacitor[], coilVoltage: number): readonly Caution[] {
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
