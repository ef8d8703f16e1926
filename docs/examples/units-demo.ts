/**
 * Units demonstration: read the values a designer types for a small shrink-fit heater
 * (invented numbers), convert them to SI, and print them back in engineering notation.
 * Run with `npx tsx docs/examples/units-demo.ts`.
 */
import { awgToDiameter, celsius, formatQuantity, InputError, parseQuantity } from "../../src/index.js";

const typed = {
  capacitance: ["4.7 µF", "F"],
  inductance: ["2u2", "H"],
  frequency: ["28 kHz", "Hz"],
  coilRadius: ["32 mm", "m"],
  snubberResistor: ["4R7", "Ω"],
  partMass: ["450 g", "kg"],
} as const;

console.log("Shrink-fit heater inputs (invented demo values)");
for (const [name, [text, unit]] of Object.entries(typed)) {
  const si = parseQuantity(text, unit);
  console.log(`  ${name.padEnd(16)} ${text.padEnd(8)} → ${String(si).padEnd(22)} → ${formatQuantity(si, unit)}`);
}

const tankFrequency = 1 / (2 * Math.PI * Math.sqrt(parseQuantity("2u2", "H") * parseQuantity("4.7 µF", "F")));
console.log(`  undamped tank frequency 1/(2π√(LC)) = ${formatQuantity(tankFrequency, "Hz")}`);
console.log(`  AWG 14 conductor diameter          = ${formatQuantity(awgToDiameter(14), "m")}`);
console.log(`  target temperature 220 °C          = ${formatQuantity(celsius(220), "K", { digits: 5 })}`);

try {
  parseQuantity("10 mH", "F");
  throw new Error("a unit mismatch must throw");
} catch (error) {
  if (!(error instanceof InputError)) throw error;
  console.log(`  a unit mismatch is refused: ${error.message}`);
}
if (Math.abs(tankFrequency - 49_490) > 10) throw new Error(`unexpected tank frequency ${tankFrequency}`);
