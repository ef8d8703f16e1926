/**
 * Type tests (checked by `tsc -p .`): descriptions written in code are typed, so a misspelt
 * field, an unknown material id or a fixed-frequency inverter without its frequency do not
 * compile. Each `@ts-expect-error` fails the type check if the line below it compiles.
 */
import { optimizeHeater, studyHeater, sweepHeater, lowCarbonSteel } from "../../src/index.js";
import type { HeaterDescription, PartMaterialId } from "../../src/index.js";

const good: HeaterDescription = {
  supply: { kind: "battery", voltage: "48 V" },
  inverter: { kind: "voltage-fed-series", bridge: "full", control: "fixed", frequency: "30 kHz", switchOnResistance: "8 mΩ" },
  coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6, conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
  capacitor: { capacitance: "4 µF" },
  part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm", height: "30 mm", targetTemperature: "120 °C" },
};
export const study = studyHeater(good, { heatUp: false });
export const sweep = sweepHeater(good, { field: "coil.turns", values: [5, 6] });
export const search = (): unknown => optimizeHeater(good, { targetPower: "1 kW" });
// a material set from the catalogue in place of an id
export const withSet: HeaterDescription = { ...good, part: { ...good.part, material: lowCarbonSteel } };
export const id: PartMaterialId = "austeniticStainless";

// a misspelt field in an inline description
// @ts-expect-error -- "capacitr" is not a field
studyHeater({ ...good, capacitr: { capacitance: "4 µF" } });

export const badMaterial: HeaterDescription = {
  ...good,
  // @ts-expect-error -- not a material id of the catalogue
  part: { ...good.part, material: "lowCarbonSteal" },
};

export const noFrequency: HeaterDescription = {
  ...good,
  // @ts-expect-error -- a fixed-frequency inverter needs its frequency
  inverter: { kind: "voltage-fed-series", bridge: "full", control: "fixed", switchOnResistance: "8 mΩ" },
};

export const trackingWithFrequency: HeaterDescription = {
  ...good,
  // @ts-expect-error -- power tracking takes a target power, not a frequency
  inverter: { kind: "voltage-fed-series", bridge: "half", control: "power-tracking", frequency: "30 kHz", switchOnResistance: "8 mΩ" },
};

// a parsed file is accepted (typed by the caller) and checked at run time
export const parsed = (text: string): unknown => studyHeater(JSON.parse(text) as HeaterDescription, { heatUp: false });
