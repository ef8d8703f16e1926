/**
 * Two worked heater designs with the tank module. All component values are invented for the
 * demonstration.
 *
 *  1. A low-voltage plate warmer: a 24 V self-oscillating (current-fed push-pull) inverter
 *     driving a 1.5 µH pancake coil over a steel plate, with a 2 µF bank of E12 capacitors.
 *  2. A shrink-fit heater for a steel bearing race: a 325 V half-bridge series-resonant inverter
 *     set to 3 kW on the zero-voltage-switching side of resonance.
 *
 * Run: npx tsx docs/examples/tank-heater-design.ts
 */
import {
  capacitorBank,
  currentFedParallelInverter,
  frequencyForPower,
  seriesInverter,
  tankToleranceAnalysis,
} from "../../src/index.js";

function check(condition: boolean, message: string): void {
  if (!condition) throw new Error(message);
}

// 1. Plate warmer (invented values): coil 1.5 µH whose resistance with the plate is 85 mΩ.
const warmer = currentFedParallelInverter({
  supplyVoltage: 24,
  inductance: 1.5e-6,
  capacitance: 2e-6,
  coilResistance: 0.085,
  chokeInductance: 47e-6,
});
console.log(
  `plate warmer: ${(warmer.frequency / 1e3).toFixed(1)} kHz, tank ${warmer.tankVoltagePeak.toFixed(1)} V peak, ` +
    `supply ${warmer.supplyCurrent.toFixed(2)} A, ${warmer.power.toFixed(0)} W, ` +
    `capacitor ${warmer.capacitorCurrentRms.toFixed(1)} A RMS (${warmer.circulatingToSupplyRatio.toFixed(2)} × supply)`,
);
check(Math.abs(warmer.tankVoltagePeak - 24 * Math.PI) < 1e-9, "tank peak must be π·Vdc");
check(Math.abs(warmer.circulatingToSupplyRatio - (Math.SQRT2 * warmer.qualityFactor) / Math.PI) < 1e-9, "ratio must be √2·Q/π");
check(warmer.cautions.some((c) => c.code === "voltage-above-extra-low"), "53 V RMS tank must carry the ELV caution");
for (const c of warmer.cautions) console.log(`  caution [${c.severity}] ${c.message}`);

// Capacitor bank for it: 2 µF from E12 units rated 250 V RMS and 20 A RMS at the frequency.
const bank = capacitorBank({
  capacitance: 2e-6,
  voltageRms: warmer.tankVoltageRms,
  currentRms: warmer.capacitorCurrentRmsWithHarmonics,
  frequency: warmer.frequency,
  series: "E12",
  unitVoltageRmsRating: 250,
  unitCurrentRmsRating: 20,
});
console.log(
  `bank: ${bank.parallelCount} × ${(bank.unitCapacitance * 1e9).toFixed(0)} nF in parallel (${bank.seriesCount} in series), ` +
    `${(bank.capacitance * 1e6).toFixed(3)} µF (${(bank.capacitanceError * 100).toFixed(1)} %), ${bank.unitCurrentRms.toFixed(1)} A per unit`,
);
check(bank.withinTolerance && bank.unitCurrentRms <= 20, "bank must meet tolerance and ratings");

// Frequency spread with ±10 % capacitors, ±5 % coil and ±20 % load resistance, warm bank.
const spread = tankToleranceAnalysis({
  topology: "parallel",
  inductance: 1.5e-6,
  capacitance: 2e-6,
  resistance: 0.085,
  inductanceTolerance: 0.05,
  capacitanceTolerance: 0.1,
  resistanceTolerance: 0.2,
  capacitanceTemperatureCoefficient: -200e-6,
  temperatureChangeMin: 0,
  temperatureChangeMax: 40,
  driveVoltageRms: warmer.tankVoltageRms,
  samples: 200_000,
  seed: 42,
});
console.log(
  `frequency 5…95 %: ${(spread.frequency.p5 / 1e3).toFixed(1)}…${(spread.frequency.p95 / 1e3).toFixed(1)} kHz; ` +
    `capacitor current 95 %: ${spread.tankCurrentRms.p95.toFixed(1)} A`,
);
check(spread.frequency.p5 < warmer.frequency && warmer.frequency < spread.frequency.p95, "nominal inside the spread");

// 2. Bearing-race shrink-fit heater (invented values): 40 µH coil with the race, 0.9 Ω, 0.5 µF.
const race = { supplyVoltage: 325, bridge: "half" as const, inductance: 40e-6, capacitance: 0.5e-6, resistance: 0.9 };
const f = frequencyForPower({ ...race, power: 3000 });
const op = seriesInverter({ ...race, switchingFrequency: f });
console.log(
  `bearing race: ${(f / 1e3).toFixed(2)} kHz for 3 kW (resonance ${(op.resonantFrequency / 1e3).toFixed(2)} kHz), ` +
    `${op.currentRms.toFixed(1)} A RMS, capacitor ${op.capacitorVoltagePeak.toFixed(0)} V peak, ` +
    `ZVS ${op.zeroVoltageSwitching} with ${op.switchedCurrent.toFixed(1)} A at commutation`,
);
check(Math.abs(op.power / 3000 - 1) < 1e-9 && op.zeroVoltageSwitching, "3 kW above resonance");
