/**
 * Worked choice of conductor for one induction coil at 20 kHz and at 200 kHz: solid round
 * wire, litz, or water-cooled copper tube. Scenario (our own, numbers invented for the
 * example): an encircling coil for shrink-fitting a steel bearing race, 8 turns on a 160 mm
 * bore, 100 mm long, carrying 120 A rms.
 *
 * Run: npx tsx docs/examples/conductors-coil-choice.ts
 */
import {
  copper,
  celsius,
  resistivityAt,
  skinDepth,
  wireDcResistance,
  roundWireAcRatio,
  roundWireWindingAcRatioFerreira,
  litzGeometry,
  litzDcResistance,
  litzAcRatio,
  tubeAcResistance,
  workCoilResistanceCurrentSheet,
} from "../../src/index.js";

const turns = 8;
const bore = 0.16; // m
const coilLength = 0.1; // m
const current = 120; // A rms
const rho = resistivityAt(copper, celsius(60)); // conductor at 60 °C

const solidDiameter = 4e-3;
const litz = { strands: 1000, strandDiameter: 0.1e-3, strandOuterDiameter: 0.112e-3, bundleLevels: [10, 10, 10], twistPitch: 40e-3 };
// the same copper in finer strands (for 200 kHz)
const fineLitz = { strands: 4000, strandDiameter: 0.05e-3, strandOuterDiameter: 0.058e-3, bundleLevels: [10, 10, 5, 8], twistPitch: 40e-3 };
const tube = { outerDiameter: 6e-3, wallThickness: 1e-3 };

function check(condition: boolean, message: string): void {
  if (!condition) throw new Error(`conductors-coil-choice: ${message}`);
}

interface Row {
  frequency: number;
  skinDepthMm: number;
  solid: number;
  litz: number;
  fineLitz: number;
  tubeIsolated: number;
  tubeCurrentSheet: number;
}

const rows: Row[] = [];
for (const frequency of [20e3, 200e3]) {
  const turnLength = Math.PI * (bore + tube.outerDiameter); // mean turn on the conductor centre line
  const length = turns * turnLength;

  // solid wire: skin + proximity of one layer of 8 turns across the coil length (Ferreira)
  const solidRdc = wireDcResistance({ resistivity: rho, length, diameter: solidDiameter });
  const solidFr = roundWireWindingAcRatioFerreira({
    wireDiameter: solidDiameter, frequency, resistivity: rho, layers: 1, turnsPerLayer: turns, windowBreadth: coilLength,
  });

  // litz: strand skin + bundle + winding proximity (1-D field of the 8 turns across the coil length)
  const litzRdc = litzDcResistance({ construction: litz, resistivity: rho, length });
  const litzFr = litzAcRatio({ construction: litz, frequency, resistivity: rho, turns, windowBreadth: coilLength });
  const fineRdc = litzDcResistance({ construction: fineLitz, resistivity: rho, length });
  const fineFr = litzAcRatio({ construction: fineLitz, frequency, resistivity: rho, turns, windowBreadth: coilLength });

  // tube: isolated-tube resistance (a lower bound in the coil) and the current-sheet estimate
  const tubeIsolated = tubeAcResistance({ ...tube, frequency, resistivity: rho }) * length;
  const spaceFactor = (turns * tube.outerDiameter) / coilLength;
  const tubeSheet = workCoilResistanceCurrentSheet({ innerDiameter: bore, coilLength, turns, spaceFactor, frequency, resistivity: rho });

  rows.push({
    frequency,
    skinDepthMm: skinDepth({ resistivity: rho, frequency }) * 1e3,
    solid: solidRdc * solidFr,
    litz: litzRdc * litzFr,
    fineLitz: fineRdc * fineFr,
    tubeIsolated,
    tubeCurrentSheet: tubeSheet,
  });

  // sanity: every AC resistance is at least its DC value
  check(solidFr >= 1 && litzFr >= 1, "AC ratios must be ≥ 1");
  check(roundWireAcRatio({ diameter: solidDiameter, frequency, resistivity: rho }) <= solidFr, "proximity adds loss");
}

for (const c of [litz, fineLitz]) {
  const g = litzGeometry(c);
  console.log(`litz ${c.strands} × ${c.strandDiameter * 1e3} mm: copper ${(g.copperArea * 1e6).toFixed(2)} mm², outer Ø ${(g.outerDiameter * 1e3).toFixed(2)} mm`);
}
// a Markdown table: coil resistance [mΩ] and copper loss at 120 A rms [W]
const cell = (r: number): string => `${(r * 1e3).toFixed(1)} mΩ / ${(r * current * current).toFixed(0)} W`;
console.log("| f | δ | 4 mm solid wire | litz 1000 × 0.1 mm | litz 4000 × 0.05 mm | 6 × 1 mm tube, isolated | tube, current sheet |");
console.log("| --- | --- | --- | --- | --- | --- | --- |");
for (const r of rows) {
  console.log(
    `| ${(r.frequency / 1e3).toFixed(0)} kHz | ${r.skinDepthMm.toFixed(3)} mm | ${cell(r.solid)} | ${cell(r.litz)} | ${cell(r.fineLitz)} | ${cell(r.tubeIsolated)} | ${cell(r.tubeCurrentSheet)} |`,
  );
}

const [low, high] = rows as [Row, Row];
// The decision the guide draws from these numbers (checked so the prose cannot drift from the code):
check(low.litz < low.solid && low.litz < low.tubeCurrentSheet, "at 20 kHz the litz has the lowest resistance");
check(high.litz / low.litz > 2, "at 200 kHz the 0.1 mm strands are too coarse: litz resistance more than doubles");
check(high.fineLitz < 0.8 * high.litz, "at 200 kHz the finer strands cut the litz resistance by more than 20 %");
check(low.tubeIsolated < low.tubeCurrentSheet && high.tubeIsolated < high.tubeCurrentSheet, "the isolated tube is the lower bound");
check(high.tubeCurrentSheet / low.tubeCurrentSheet > 3 && high.tubeCurrentSheet / low.tubeCurrentSheet < 3.3, "current-sheet tube resistance grows as √f");
