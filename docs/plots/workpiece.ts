/**
 * Writes the figures of docs/workpiece.md:
 *   docs/img/workpiece-efficiency.svg   coil efficiency against bar radius / skin depth
 *   docs/img/workpiece-plate-shift.svg  inductance change of a pancake coil over plates against frequency
 *
 * Run: npx tsx docs/plots/workpiece.ts
 */
import { writeFileSync } from "node:fs";
import { lineChart } from "../../src/report/index.js";
import {
  aluminiumAlloy,
  ANNEALED_COPPER_RESISTIVITY,
  barInLongCoil,
  brentRoot,
  celsius,
  coilEfficiency,
  coilOverPlate,
  lowCarbonSteel,
  MU_0,
  relativePermeabilityAt,
  resistivityAt,
} from "../../src/index.js";

const here = new URL("../img/", import.meta.url);

// ---- efficiency of a bar in a long coil against a/δ -------------------------------------
// Coil: a copper current sheet of inner radius 1.25 × the bar radius, thicker than its own
// skin depth, so R_coil = (N²/ℓ) 2π r_c ρ_cu/δ_cu (common practice for a tube-wound coil,
// space factor 1). Copper at 40 °C (a water-cooled coil).
const rhoCu = ANNEALED_COPPER_RESISTIVITY * (1 + 0.00393 * 20);
const barRadius = 0.02;
const coil = { innerRadius: 1.25 * barRadius, length: 0.4, turns: 20 };

export interface EfficiencyCurve {
  name: string;
  ratio: number[];
  efficiency: number[];
}

function efficiencyCurve(name: string, resistivity: number, relativePermeability: number): EfficiencyCurve {
  const ratio: number[] = [];
  const efficiency: number[] = [];
  for (let lr = -1; lr <= 1.7; lr += 0.02) {
    const u = 10 ** lr;
    const delta = barRadius / u;
    const frequency = resistivity / (Math.PI * MU_0 * relativePermeability * delta * delta);
    const deltaCu = Math.sqrt(rhoCu / (Math.PI * frequency * MU_0));
    const coilResistance = ((coil.turns * coil.turns) / coil.length) * 2 * Math.PI * coil.innerRadius * (rhoCu / deltaCu);
    const r = barInLongCoil({ coil, bar: { radius: barRadius, resistivity, relativePermeability }, frequency });
    ratio.push(r.ratio);
    efficiency.push(coilEfficiency({ coilResistance, reflectedResistance: r.reflectedResistance }));
  }
  return { name, ratio, efficiency };
}

const cold = celsius(20);
const hot = celsius(900);
const workingField = 5e4; // A/m amplitude at the bar surface, a typical through-heating field (invented for the figure)
const steelColdMu = relativePermeabilityAt(lowCarbonSteel, { temperature: cold, fieldStrength: workingField });
export const curves: EfficiencyCurve[] = [
  efficiencyCurve(`low-carbon steel 20 °C (μr ≈ ${steelColdMu.toFixed(0)})`, resistivityAt(lowCarbonSteel, cold), steelColdMu),
  efficiencyCurve("low-carbon steel 900 °C (above Curie)", resistivityAt(lowCarbonSteel, hot), 1),
  efficiencyCurve("aluminium alloy 20 °C", resistivityAt(aluminiumAlloy, cold), 1),
];

/** The ratio a/δ at which a curve first reaches `share` of its value at the top of the sweep. */
export function kneeRatio(c: EfficiencyCurve, share: number): number {
  const top = c.efficiency[c.efficiency.length - 1]!;
  const i = c.efficiency.findIndex((e) => e >= share * top);
  return c.ratio[i]!;
}

// ---- inductance change of a pancake coil over plates against frequency -------------------
const pancake = { innerRadius: 0.01, outerRadius: 0.06, liftOff: 0.005, height: 0.006, turns: 16 };
const steelPlate = (t: number, field: number) => ({
  thickness: 0.004,
  resistivity: resistivityAt(lowCarbonSteel, t),
  relativePermeability: relativePermeabilityAt(lowCarbonSteel, { temperature: t, fieldStrength: field }),
});
export const plates = {
  "low-carbon steel 4 mm, 20 °C": steelPlate(cold, workingField),
  "low-carbon steel 4 mm, 900 °C": steelPlate(hot, workingField),
  "aluminium alloy 4 mm, 20 °C": { thickness: 0.004, resistivity: resistivityAt(aluminiumAlloy, cold), relativePermeability: 1 },
};
export const frequencies: number[] = [];
for (let lf = 0; lf <= 6; lf += 0.05) frequencies.push(10 ** lf);

/** Frequency at which the steel plate's inductance change crosses zero. */
export function steelCrossover(): number {
  const plate = plates["low-carbon steel 4 mm, 20 °C"];
  const lf = brentRoot((x) => coilOverPlate({ coil: pancake, plate, frequency: 10 ** x }).inductanceChange, 0, 6);
  return 10 ** lf;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const svg = lineChart({
    title: "Coil efficiency, round bar in a long copper coil (coil bore = 1.25 × bar radius)",
    xLabel: "bar radius / skin depth a/δ",
    yLabel: "efficiency",
    xLog: true,
    yRange: [0, 1],
    series: curves.map((c) => ({ name: c.name, x: c.ratio, y: c.efficiency })),
    referenceLines: [{ axis: "x", value: 2.5, label: "a/δ = 2.5" }],
  });
  writeFileSync(new URL("workpiece-efficiency.svg", here), svg);

  const crossover = steelCrossover();
  const shift = lineChart({
    title: "Inductance change of a pancake coil over a 4 mm plate",
    xLabel: "frequency",
    yLabel: "ΔL",
    xUnit: "Hz",
    yUnit: "H",
    xLog: true,
    series: Object.entries(plates).map(([name, plate]) => ({
      name,
      x: frequencies,
      y: frequencies.map((f) => coilOverPlate({ coil: pancake, plate, frequency: f }).inductanceChange),
    })),
    referenceLines: [
      { axis: "y", value: 0, label: "" },
      { axis: "x", value: crossover, label: `crossover ${Math.round(crossover)} Hz` },
    ],
  });
  writeFileSync(new URL("workpiece-plate-shift.svg", here), shift);
  for (const c of curves) {
    console.log(`${c.name}: 90 % / 95 % of top efficiency at a/δ = ${kneeRatio(c, 0.9).toFixed(2)} / ${kneeRatio(c, 0.95).toFixed(2)}, efficiency at 2.5: ${c.efficiency[c.ratio.findIndex((u) => u >= 2.5)]!.toFixed(3)}, top ${c.efficiency[c.efficiency.length - 1]!.toFixed(3)}`);
  }
  console.log(`steel plate crossover: ${crossover.toPrecision(3)} Hz`);
}
