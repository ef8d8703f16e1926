/**
 * Heat-up of a steel bearing race for a shrink fit, with the thermal module: how long to
 * 150 °C, whether the lumped model is valid, how far surface and core differ, and where the
 * part would settle. The race dimensions and the heater power are invented for this example.
 *
 * Run: npx tsx docs/examples/thermal-shrink-fit.ts
 */
import { lumpedHeatUp, radialHeatUp, steadyStateTemperature, lowCarbonSteel, celsius, toCelsius } from "../../src/index.js";

// Race: 120 mm outside, 80 mm bore, 30 mm wide (invented example part).
const outer = 0.06;
const inner = 0.04;
const width = 0.03;
const volume = Math.PI * (outer ** 2 - inner ** 2) * width;
const mass = lowCarbonSteel.density * volume;
const area = 2 * Math.PI * (outer + inner) * width + 2 * Math.PI * (outer ** 2 - inner ** 2);
const surroundings = { surfaceArea: area, convectionCoefficient: 10, emissivity: 0.6, ambientTemperature: celsius(20) };

const heat = lumpedHeatUp({ mass, material: lowCarbonSteel, power: 2000, ...surroundings, targetTemperature: celsius(150) });
console.log(`mass ${mass.toFixed(3)} kg, surface ${(area * 1e4).toFixed(0)} cm²`);
console.log(`time to 150 °C: ${heat.timeToTarget?.toFixed(1)} s (reachable: ${heat.reachable})`);
console.log(`Biot number ${heat.biotNumber?.toExponential(2)}; validity notes: ${heat.validity.length}`);
console.log(`energy: in ${heat.energy.input.toFixed(0)} J, stored ${heat.energy.stored.toFixed(0)} J, lost ${(heat.energy.convection + heat.energy.radiation).toFixed(0)} J`);

// Hand check: adiabatic estimate m c ΔT / P with c ≈ 470 J/(kg K) gives about 45 s; losses add a little.
const adiabatic = (mass * 470 * 130) / 2000;
if (!(heat.timeToTarget !== null && heat.timeToTarget > 0.9 * adiabatic && heat.timeToTarget < 1.3 * adiabatic)) {
  throw new Error(`time to target ${heat.timeToTarget} far from the adiabatic estimate ${adiabatic}`);
}
if (Math.abs(heat.energy.imbalance) > 1e-6 * heat.energy.input) throw new Error("energy balance does not close");
if (heat.validity.length !== 0) throw new Error("a small race should be lumped-valid");

// Left on, where would it settle? (Convection and radiation balance 2 kW.)
const settle = steadyStateTemperature({ power: 2000, ...surroundings });
console.log(`steady state if left on: ${toCelsius(settle).toFixed(0)} °C`);
if (!(settle > celsius(600) && settle < celsius(1100))) throw new Error(`steady state ${settle}`);

// Surface against core: the race wall as a slab 20 mm thick heated from both cylindrical faces
// (bore and outside, together as large as the slab's two faces, so the slab has the race's
// volume) in a 0.5 mm skin (roughly the skin depth of steel at tens of kHz below Curie).
const wall = radialHeatUp({
  geometry: "slab",
  thickness: outer - inner,
  faceArea: Math.PI * (outer + inner) * width,
  power: 2000,
  skinDepth: 0.5e-3,
  material: lowCarbonSteel,
  convectionCoefficient: 10,
  emissivity: 0.6,
  ambientTemperature: celsius(20),
  duration: heat.timeToTarget ?? 60,
});
const spread = wall.finalSurfaceTemperature - wall.finalCoreTemperature;
console.log(`after ${wall.times[wall.times.length - 1]?.toFixed(1)} s: surface ${toCelsius(wall.finalSurfaceTemperature).toFixed(1)} °C, core ${toCelsius(wall.finalCoreTemperature).toFixed(1)} °C`);
if (!(spread > 0 && spread < 10 && Math.abs(wall.finalCoreTemperature - celsius(150)) < 10)) throw new Error(`surface–core spread ${spread} K out of the expected range`);
