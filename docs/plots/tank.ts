/**
 * Writes the figures of docs/tanks.md:
 *   docs/img/tank-impedance.svg       |Z| of a parallel tank (plate-warmer coil) for three coil resistances
 *   docs/img/tank-inverter-power.svg  FHA power and ZVS current of a half-bridge series inverter vs frequency
 *
 * Component values are invented for the demonstration (a low-voltage plate warmer and a
 * shrink-fit heater for a bearing race), not measured.
 *
 * Run: npx tsx docs/plots/tank.ts
 */
import { writeFileSync } from "node:fs";
import { lineChart } from "../../src/report/index.js";
import { logSpacedFrequencies, parallelTank, seriesInverter, tankImpedanceSweep } from "../../src/index.js";

const img = (name: string): URL => new URL(`../img/${name}`, import.meta.url);

// Plate-warmer tank (invented): 1.5 µH pancake coil, 2 µF, coil resistance empty / with plate / heavy load.
const frequencies = logSpacedFrequencies(40e3, 200e3, 400);
const cases = [
  { name: "coil alone, R = 10 mΩ (Q ≈ 87)", coilResistance: 0.01 },
  { name: "over the steel plate, R = 85 mΩ (Q ≈ 10)", coilResistance: 0.085 },
  { name: "heavy load, R = 0.4 Ω (Q ≈ 2.2)", coilResistance: 0.4 },
];
const f0 = parallelTank({ inductance: 1.5e-6, capacitance: 2e-6, coilResistance: 0.01 }).undampedFrequency;
const impedanceSvg = lineChart({
  title: "Parallel tank impedance: 1.5 µH coil ∥ 2 µF",
  xLabel: "frequency",
  xUnit: "Hz",
  yLabel: "|Z|",
  yUnit: "Ω",
  xLog: true,
  yLog: true,
  series: cases.map(({ name, coilResistance }) => {
    const tank = parallelTank({ inductance: 1.5e-6, capacitance: 2e-6, coilResistance });
    const z = tankImpedanceSweep(tank, frequencies);
    return { name, x: Array.from(frequencies), y: Array.from(z.re, (re, k) => Math.hypot(re, z.im[k] as number)) };
  }),
  referenceLines: [{ axis: "x", value: f0, label: "f0 = 91.9 kHz" }],
});
writeFileSync(img("tank-impedance.svg"), impedanceSvg);

// Bearing-race shrink-fit heater (invented): 325 V half bridge, 40 µH + 0.5 µF, 0.9 Ω loaded.
const inverter = { supplyVoltage: 325, bridge: "half" as const, inductance: 40e-6, capacitance: 0.5e-6, resistance: 0.9 };
const fs = Array.from(logSpacedFrequencies(30e3, 60e3, 300));
const ops = fs.map((f) => seriesInverter({ ...inverter, switchingFrequency: f }));
const powerSvg = lineChart({
  title: "Half-bridge series inverter (FHA): 325 V, 40 µH, 0.5 µF, 0.9 Ω",
  xLabel: "switching frequency",
  xUnit: "Hz",
  yLabel: "output power",
  yUnit: "W",
  series: [
    { name: "power", x: fs, y: ops.map((o) => o.power) },
    { name: "switched current (> 0: ZVS)", x: fs, y: ops.map((o) => o.switchedCurrent), axis: "secondary" },
  ],
  secondaryAxis: { label: "current at commutation", unit: "A" },
  referenceLines: [{ axis: "x", value: ops[0]!.resonantFrequency, label: "resonance" }],
});
writeFileSync(img("tank-inverter-power.svg"), powerSvg);
console.log("wrote tank-impedance.svg, tank-inverter-power.svg");
