/**
 * A wireless-power pad pair: two identical flat spirals facing each other across an air gap.
 * Exact spiral inductance next to Wheeler's and Mohan's approximations, mutual inductance and
 * coupling against the gap. Dimensions are invented for the example.
 *
 * Run: npx tsx docs/examples/inductance-wireless-pad.ts
 */
import {
  coaxialCoilMutualInductance,
  couplingCoefficient,
  spiralCoilInductance,
  spiralCoilInductanceMohan,
  spiralCoilInductanceWheeler,
} from "../../src/index.js";

function check(name: string, ok: boolean): void {
  console.log(`${ok ? "ok  " : "FAIL"} ${name}`);
  if (!ok) throw new Error(name);
}

// 18 turns of 2.5 mm litz (outer diameter) at 3 mm pitch, innermost turn at 30 mm radius
const pad = { innerRadius: 0.03, outerRadius: 0.03 + 17 * 0.003, turns: 18, wireDiameter: 0.0025 };
const l = spiralCoilInductance(pad);
const lw = spiralCoilInductanceWheeler(pad);
const lm = spiralCoilInductanceMohan(pad);
console.log(`L exact ${(l * 1e6).toFixed(2)} µH; Wheeler ${(lw * 1e6).toFixed(2)} µH (${((lw / l - 1) * 100).toFixed(1)} %); Mohan ${(lm * 1e6).toFixed(2)} µH (${((lm / l - 1) * 100).toFixed(1)} %)`);
check("Wheeler within 5 % of exact", Math.abs(lw / l - 1) < 0.05);
check("Mohan within 5 % of exact", Math.abs(lm / l - 1) < 0.05);

const coil = { kind: "flatSpiral" as const, innerTurnRadius: pad.innerRadius, outerTurnRadius: pad.outerRadius, turns: pad.turns };
let previous = 1;
for (const gap of [0.01, 0.02, 0.04, 0.08]) {
  const m = coaxialCoilMutualInductance(coil, coil, gap);
  const k = couplingCoefficient({ mutualInductance: m, selfInductance1: l, selfInductance2: l });
  console.log(`gap ${(gap * 1e3).toFixed(0)} mm: M ${(m * 1e6).toFixed(2)} µH, k ${k.toFixed(3)}`);
  check(`coupling falls with the gap (${gap * 1e3} mm)`, k < previous && k > 0);
  previous = k;
}
