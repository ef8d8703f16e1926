/**
 * Prints the solenoid and pancake heat-ups' results to full precision (JSON), so that two
 * versions of the coil-impedance model's evaluation can be compared number by number:
 *
 *     npx tsx scripts/measurements/heat-up-results.ts > after.json
 */
import { readFileSync } from "node:fs";
import { studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";

const out: Record<string, unknown> = {};
for (const name of ["study-bearing-race.json", "study-forging-bar.json", "study-plate-warmer.json"]) {
  const d = JSON.parse(readFileSync(new URL(`../../docs/examples/${name}`, import.meta.url), "utf8")) as HeaterDescription;
  const s = studyHeater(d, { temperatureScan: false, impedanceSweep: false });
  const h = s.heatUp;
  out[name] = {
    frequency: s.operating.frequency,
    reflectedResistance: s.operating.reflectedResistance,
    coilInductance: s.operating.coilInductance,
    timeToTarget: h?.timeToTarget,
    finalTemperature: h?.finalTemperature,
    steadyStateTemperature: h?.steadyStateTemperature,
    temperatures: h?.temperatures,
    frequencies: h?.frequencies,
    partPowers: h?.partPowers,
  };
}
console.log(JSON.stringify(out, null, 1));
