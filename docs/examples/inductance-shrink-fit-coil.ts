/**
 * Work coil for a shrink-fit heater of a steel bearing race: a single-layer coil of copper
 * tube wound round the race. Exact current-sheet inductance, Rosa's round-conductor corrections,
 * Wheeler's quick estimate beside it, and the tank capacitance for a target frequency.
 * Dimensions are invented for the example.
 *
 * Run: npx tsx docs/examples/inductance-shrink-fit-coil.ts
 */
import {
  coaxialCoilMutualInductance,
  loopInductance,
  nagaokaCoefficient,
  solenoidInductance,
  solenoidInductanceWheeler,
  MU_0,
} from "../../src/index.js";

function check(name: string, ok: boolean): void {
  console.log(`${ok ? "ok  " : "FAIL"} ${name}`);
  if (!ok) throw new Error(name);
}

// 8 turns of 6 mm tube at 9 mm pitch on a 70 mm radius (to the tube centres)
const radius = 0.07;
const turns = 8;
const pitch = 0.009;
const tube = 0.006;
const length = turns * pitch; // Rosa's convention

const sheet = solenoidInductance({ radius, length, turns });
const rosa = solenoidInductance({ radius, length, turns, wireDiameter: tube });
const wheeler = solenoidInductanceWheeler({ radius, length, turns });
console.log(`Nagaoka K = ${nagaokaCoefficient((2 * radius) / length).toFixed(5)}`);
console.log(`current sheet ${(sheet * 1e6).toFixed(3)} µH, with Rosa's corrections ${(rosa * 1e6).toFixed(3)} µH, Wheeler ${(wheeler * 1e6).toFixed(3)} µH`);

// the same coil as 8 separate rings of round conductor (uniform current), summed exactly
let rings = 0;
for (let i = 0; i < turns; i++) {
  rings += loopInductance({ loopRadius: radius, wireRadius: tube / 2 });
  for (let j = 0; j < turns; j++) {
    if (j !== i) rings += coaxialCoilMutualInductance({ kind: "loop", radius }, { kind: "loop", radius }, Math.abs(i - j) * pitch);
  }
}
console.log(`ring sum ${(rings * 1e6).toFixed(3)} µH`);

check("Rosa's corrected value agrees with the exact ring sum within 0.3 %", Math.abs(rosa / rings - 1) < 3e-3);
check("the bare current sheet overestimates a spaced tube winding by more than 3 %", sheet / rings - 1 > 0.03);
check("Wheeler is within 2 % of the current sheet for this short coil (length ≈ radius)", Math.abs(wheeler / sheet - 1) < 0.02);

// tank capacitor for 25 kHz with the empty coil: C = 1/((2πf)² L)
const f = 25e3;
const c = 1 / ((2 * Math.PI * f) ** 2 * rosa);
console.log(`capacitance for ${f / 1e3} kHz: ${(c * 1e6).toFixed(2)} µF`);
check("capacitance is a few µF", c > 1e-6 && c < 20e-6);
check("long-solenoid formula overestimates by 1/K", Math.abs((MU_0 * Math.PI * radius ** 2 * turns ** 2) / length / sheet - 1 / nagaokaCoefficient((2 * radius) / length)) < 1e-9);
