import { describe, it, expect } from "vitest";
import { lumpedHeatUp, InputError, lowCarbonSteel, STEFAN_BOLTZMANN, celsius } from "../../src/index.js";

const base = {
  mass: 0.05,
  specificHeat: 490,
  power: 200,
  surfaceArea: 0.003,
  convectionCoefficient: 10,
  emissivity: 0,
  ambientTemperature: 293.15,
};

/** Closed form without radiation, from T0 = Ta: t = −(mc/(hA)) ln(1 − (T − Ta) hA / P). */
function closedFormTime(m: number, c: number, h: number, a: number, p: number, ta: number, t: number): number {
  return -((m * c) / (h * a)) * Math.log(1 - ((t - ta) * h * a) / p);
}

describe("lumpedHeatUp: closed form without radiation (calculus: linear first-order ODE)", () => {
  it.each([
    [0.05, 490, 200, 10, 0.003, 333.15],
    [1, 460, 2000, 15, 0.05, 473.15],
    [0.2, 900, 50, 25, 0.02, 350],
    [5, 385, 5000, 8, 0.2, 900],
  ])("time to target matches −(mc/hA) ln(1 − ΔT hA/P) within 1e-9 (m=%s c=%s P=%s)", (m, c, p, h, a, target) => {
    const r = lumpedHeatUp({ ...base, mass: m, specificHeat: c, power: p, convectionCoefficient: h, surfaceArea: a, targetTemperature: target });
    const exact = closedFormTime(m, c, h, a, p, 293.15, target);
    expect(r.reachable).toBe(true);
    expect(Math.abs(r.timeToTarget! / exact - 1)).toBeLessThan(1e-9);
  });

  it("the curve follows Ta + (P/hA)(1 − e^{−t hA/(mc)}) at every step within 1e-8 K", () => {
    const r = lumpedHeatUp({ ...base, duration: 600 });
    const tau = (0.05 * 490) / (10 * 0.003);
    r.times.forEach((t, i) => {
      const exact = 293.15 + (200 / (10 * 0.003)) * -Math.expm1(-t / tau);
      expect(Math.abs(r.temperatures[i]! - exact)).toBeLessThan(1e-8);
    });
    expect(Math.abs(r.temperatureAt(123.4) - (293.15 + (200 / 0.03) * -Math.expm1(-123.4 / tau)))).toBeLessThan(1e-7);
    expect(r.timeConstant).toBeCloseTo(tau, 9);
  });

  it("steady state is Ta + P/(hA) without radiation", () => {
    const r = lumpedHeatUp({ ...base, duration: 10 });
    expect(r.steadyStateTemperature).toBeCloseTo(293.15 + 200 / 0.03, 9);
  });

  it("adiabatic heating (no losses) rises at P/(mc) exactly", () => {
    const r = lumpedHeatUp({ ...base, convectionCoefficient: 0, emissivity: 0, duration: 10, targetTemperature: 393.15 });
    expect(r.steadyStateTemperature).toBeNull();
    expect(r.timeConstant).toBeNull();
    expect(r.finalTemperature).toBeCloseTo(293.15 + (200 * 10) / (0.05 * 490), 8);
    expect(r.timeToTarget!).toBeCloseTo((100 * 0.05 * 490) / 200, 8);
  });
});

describe("lumpedHeatUp: textbook worked example", () => {
  it("Incropera & DeWitt 6th ed., Example 5.1 (thermocouple junction; from memory): Bi ≈ 2.35e-3, 5.2 s to reach 199 °C", () => {
    // Junction sphere: h = 400 W/(m²K), k = 20 W/(mK), c = 400 J/(kgK), rho = 8500 kg/m³,
    // time constant 1 s ⇒ D = 6hτ/(ρc) = 0.706 mm; gas at 200 °C, junction from 25 °C.
    const diameter = (6 * 400 * 1) / (8500 * 400);
    const volume = (Math.PI * diameter ** 3) / 6;
    const r = lumpedHeatUp({
      mass: 8500 * volume,
      specificHeat: 400,
      power: 0,
      surfaceArea: Math.PI * diameter * diameter,
      convectionCoefficient: 400,
      emissivity: 0,
      ambientTemperature: celsius(200),
      initialTemperature: celsius(25),
      targetTemperature: celsius(199),
      thermalConductivity: 20,
      density: 8500,
    });
    expect(diameter).toBeCloseTo(7.06e-4, 6); // book: D = 0.706 mm
    expect(r.biotNumber!).toBeCloseTo(2.35e-3, 5); // book: Bi = 2.35e-3
    expect(r.timeConstant!).toBeCloseTo(1, 9); // book: τ = 1 s by construction
    expect(r.timeToTarget!).toBeGreaterThan(5.15); // book: t = 5.2 s (rounded)
    expect(r.timeToTarget!).toBeLessThan(5.25);
    expect(r.validity).toEqual([]);
  });
});

describe("lumpedHeatUp: common practice", () => {
  it("a ~50 g steel part on a few-hundred-watt low-voltage heater is too hot to touch (60 °C) in under a minute (common practice)", () => {
    const r = lumpedHeatUp({
      mass: 0.05,
      material: lowCarbonSteel,
      power: 300,
      surfaceArea: 0.003,
      convectionCoefficient: 10,
      emissivity: 0.6,
      ambientTemperature: celsius(20),
      targetTemperature: celsius(60),
    });
    expect(r.reachable).toBe(true);
    expect(r.timeToTarget!).toBeLessThan(60);
    expect(r.timeToTarget!).toBeGreaterThan(1); // not instantaneous either
  });
});

describe("lumpedHeatUp: energy balance ∫P dt = stored + convection + radiation", () => {
  it("closes to 1e-6 with radiation and a constant specific heat", () => {
    const r = lumpedHeatUp({ ...base, emissivity: 0.8, power: 400, duration: 300 });
    const e = r.energy;
    expect(Math.abs(e.imbalance)).toBeLessThan(1e-6 * e.input);
    expect(e.stored).toBeCloseTo(0.05 * 490 * (r.finalTemperature - 293.15), 9);
    expect(e.radiation).toBeGreaterThan(0);
  });

  it("closes to 1e-6 through the Curie-point peak of steel's specific heat (EN 1993-1-2 curve from the materials module)", () => {
    const r = lumpedHeatUp({
      mass: 1,
      material: lowCarbonSteel,
      power: 4000,
      surfaceArea: 0.03,
      convectionCoefficient: 15,
      emissivity: 0.8,
      ambientTemperature: celsius(20),
      targetTemperature: celsius(900),
    });
    expect(r.reachable).toBe(true);
    const e = r.energy;
    expect(Math.abs(e.imbalance)).toBeLessThan(1e-6 * e.input);
    // Stored energy by hand: m ∫ c(θ) dθ from 20 °C to 900 °C over the three pieces of
    // EN 1993-1-2:2005 eq. (3.2), integrated in closed form:
    //   20…600 °C:  [425θ + 0.773θ²/2 − 1.69e-3·θ³/3 + 2.22e-6·θ⁴/4]
    //   600…735 °C: 666·135 + 13002·ln(138/3)
    //   735…900 °C: 545·165 + 17820·ln(169/4)
    const cubic = (t: number): number => 425 * t + (0.773 * t ** 2) / 2 - (1.69e-3 * t ** 3) / 3 + (2.22e-6 * t ** 4) / 4;
    const byHand = cubic(600) - cubic(20) + 666 * 135 + 13002 * Math.log(138 / 3) + 545 * 165 + 17820 * Math.log(169 / 4);
    expect(r.finalTemperature).toBeCloseTo(celsius(900), 9);
    expect(Math.abs(e.stored / byHand - 1)).toBeLessThan(1e-9);
  });

  it("power falling to zero above the Curie point stops the rise there (temperature-dependent power)", () => {
    const curie = celsius(770);
    const powerAt = (t: number): number => (t < curie - 20 ? 3000 : t >= curie ? 0 : (3000 * (curie - t)) / 20);
    const r = lumpedHeatUp({
      mass: 1,
      material: lowCarbonSteel,
      powerAt,
      surfaceArea: 0.03,
      convectionCoefficient: 15,
      emissivity: 0.8,
      ambientTemperature: celsius(20),
      targetTemperature: celsius(900),
    });
    expect(r.reachable).toBe(false);
    expect(r.timeToTarget).toBeNull();
    expect(r.steadyStateTemperature!).toBeLessThan(curie);
    expect(r.steadyStateTemperature!).toBeGreaterThan(curie - 20);
    expect(Math.abs(r.energy.imbalance)).toBeLessThan(1e-6 * r.energy.input);
  });
});

describe("lumpedHeatUp: reachability", () => {
  it("a target above the steady state is unreachable: timeToTarget null, reachable false", () => {
    const r = lumpedHeatUp({ ...base, power: 10, targetTemperature: 293.15 + 10 / 0.03 + 1 });
    expect(r.reachable).toBe(false);
    expect(r.timeToTarget).toBeNull();
    expect(r.duration).toBeCloseTo(5 * r.timeConstant!, 6);
  });

  it("a target exactly at the steady state is unreachable (infinite time)", () => {
    const r = lumpedHeatUp({ ...base, power: 10, targetTemperature: 293.15 + 10 / 0.03 });
    expect(r.reachable).toBe(false);
  });

  it("reports the time to target even when it lies beyond the simulated duration", () => {
    const r = lumpedHeatUp({ ...base, targetTemperature: 333.15, duration: 2 });
    expect(r.duration).toBe(2);
    expect(r.times[r.times.length - 1]).toBe(2);
    expect(Math.abs(r.timeToTarget! / closedFormTime(0.05, 490, 10, 0.003, 200, 293.15, 333.15) - 1)).toBeLessThan(1e-9);
  });

  it("continues past the target to a longer duration", () => {
    const r = lumpedHeatUp({ ...base, targetTemperature: 333.15, duration: 20 });
    expect(r.finalTemperature).toBeGreaterThan(333.15);
    expect(Math.abs(r.temperatureAt(r.timeToTarget!) - 333.15)).toBeLessThan(1e-6);
  });

  it("a target equal to the start takes zero time", () => {
    const r = lumpedHeatUp({ ...base, targetTemperature: 293.15, duration: 5 });
    expect(r.timeToTarget).toBe(0);
    expect(r.reachable).toBe(true);
  });

  it("cooling toward ambient reaches a target below the start", () => {
    const r = lumpedHeatUp({ ...base, power: 0, initialTemperature: 500, targetTemperature: 400 });
    const exact = ((0.05 * 490) / 0.03) * Math.log((500 - 293.15) / (400 - 293.15)); // Incropera eq. 5.5
    expect(Math.abs(r.timeToTarget! / exact - 1)).toBeLessThan(1e-9);
  });

  it("radiation only: steady state (Ta⁴ + P/(εσA))^{1/4}", () => {
    const r = lumpedHeatUp({ ...base, convectionCoefficient: 0, emissivity: 0.9, duration: 10 });
    expect(r.steadyStateTemperature!).toBeCloseTo(Math.pow(293.15 ** 4 + 200 / (0.9 * STEFAN_BOLTZMANN * 0.003), 0.25), 8);
  });
});

describe("lumpedHeatUp: validity notes", () => {
  it("flags a Biot number above 0.1 for a thick, poorly conducting part", () => {
    const r = lumpedHeatUp({ ...base, convectionCoefficient: 2000, duration: 10, thermalConductivity: 15, characteristicLength: 0.01 });
    expect(r.biotNumber!).toBeGreaterThan(0.1);
    expect(r.validity.map((v) => v.code)).toContain("lumped-biot-above-limit");
  });

  it("says when the Biot number cannot be checked", () => {
    const r = lumpedHeatUp({ ...base, duration: 10 });
    expect(r.biotNumber).toBeNull();
    expect(r.validity.map((v) => v.code)).toContain("lumped-biot-unknown");
  });

  it("computes the Biot number from the material (density and conductivity)", () => {
    const r = lumpedHeatUp({ ...base, specificHeat: undefined as never, material: lowCarbonSteel, duration: 10 });
    expect(r.biotNumber!).toBeGreaterThan(0);
    expect(r.biotNumber!).toBeLessThan(0.01);
  });
});

describe("lumpedHeatUp: bad input throws InputError", () => {
  it.each([
    ["negative mass", { ...base, mass: -1, duration: 1 }],
    ["missing specific heat and material", { ...base, specificHeat: undefined, duration: 1 }],
    ["both power and powerAt", { ...base, powerAt: () => 1, duration: 1 }],
    ["neither power nor powerAt", { ...base, power: undefined, duration: 1 }],
    ["negative power", { ...base, power: -5, duration: 1 }],
    ["zero area", { ...base, surfaceArea: 0, duration: 1 }],
    ["emissivity above 1", { ...base, emissivity: 1.5, duration: 1 }],
    ["non-finite ambient", { ...base, ambientTemperature: Number.NaN, duration: 1 }],
    ["negative duration", { ...base, duration: -1 }],
    ["no losses and no target (duration needed)", { ...base, convectionCoefficient: 0 }],
    ["powerAt returning NaN", { ...base, power: undefined, powerAt: () => Number.NaN, duration: 1 }],
  ])("%s", (_name, options) => {
    expect(() => lumpedHeatUp(options as never)).toThrow(InputError);
  });

  it("temperatureAt outside the span throws InputError", () => {
    const r = lumpedHeatUp({ ...base, duration: 10 });
    expect(() => r.temperatureAt(11)).toThrow(InputError);
  });
});
