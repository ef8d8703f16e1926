/**
 * CPU time of the solenoid heat-ups with the coil-impedance model (bearing race, forging bar),
 * the model already built: the first study of each builds and is reported apart; then `runs`
 * studies with supply voltages varied by a few per mille (so no result is reused) are timed
 * with `process.cpuUsage` (user + system of this process: the machine is shared, so CPU time
 * rather than wall time), and the load average is printed beside them.
 *
 *     npx tsx scripts/measurements/heat-up-speed.ts [runs]
 */
import { readFileSync } from "node:fs";
import { loadavg } from "node:os";
import { studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";

const runs = Number(process.argv[2] ?? 5);
for (const name of ["study-bearing-race.json", "study-forging-bar.json"]) {
  const base = JSON.parse(readFileSync(new URL(`../../docs/examples/${name}`, import.meta.url), "utf8")) as HeaterDescription & { supply: { voltage: string } };
  const volts = Number.parseFloat(base.supply.voltage);
  const study = (i: number): number => {
    const d = { ...base, supply: { ...base.supply, voltage: `${volts * (1 + 0.002 * i)} V` } } as HeaterDescription;
    const start = process.cpuUsage();
    const s = studyHeater(d, { temperatureScan: false, impedanceSweep: false });
    const used = process.cpuUsage(start);
    if (!Number.isFinite(s.heatUp?.timeToTarget ?? s.heatUp?.finalTemperature ?? Number.NaN)) throw new Error(`${name}: no heat-up result`);
    return (used.user + used.system) / 1e3;
  };
  const first = study(0);
  const times = Array.from({ length: runs }, (_, i) => study(i + 1));
  times.sort((a, b) => a - b);
  console.log(`${name}: first (builds the model) ${first.toFixed(0)} ms; heat-up CPU ms min ${times[0]!.toFixed(0)} median ${times[Math.floor(runs / 2)]!.toFixed(0)} max ${times[runs - 1]!.toFixed(0)}; load average ${loadavg().map((x) => x.toFixed(1)).join(" ")}`);
}
