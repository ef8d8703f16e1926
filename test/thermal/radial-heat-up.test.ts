import { describe, it, expect } from "vitest";
import { radialHeatUp, lumpedHeatUp, InputError, lowCarbonSteel, celsius } from "../../src/index.js";
import series from "../fixtures/thermal/series-conduction.json" with { type: "json" };

describe("radialHeatUp: exact series with surface convection (fixture from mpmath, generate_series.py)", () => {
  const rtol = series.meta.rtol;
  it.each(series.cases.map((c) => [c.label, c] as const))("%s", (_label, c) => {
    const r = radialHeatUp({
      geometry: c.geometry as "slab" | "cylinder",
      ...(c.geometry === "slab" ? { thickness: 2 * c.size, faceArea: 1 } : { radius: c.size, length: 1 }),
      power: 0,
      density: c.density,
      specificHeat: c.specificHeat,
      thermalConductivity: c.thermalConductivity,
      convectionCoefficient: c.convectionCoefficient,
      emissivity: 0,
      ambientTemperature: c.ambientTemperature,
      initialTemperature: c.initialTemperature,
      duration: c.time,
    });
    const scale = Math.abs(c.ambientTemperature - c.initialTemperature);
    expect(Math.abs(r.finalCoreTemperature - c.coreTemperature)).toBeLessThan(rtol * scale);
    expect(Math.abs(r.finalSurfaceTemperature - c.surfaceTemperature)).toBeLessThan(rtol * scale);
    const middle = r.finalTemperatures[30]!; // 60 uniform cells: node 30 is x* = 0.5
    expect(r.positions[30]).toBeCloseTo(c.size / 2, 12);
    expect(Math.abs(middle - c.middleTemperature)).toBeLessThan(rtol * scale);
  });
});

describe("radialHeatUp: textbook transient-conduction example", () => {
  it("Incropera & DeWitt 6th ed., Example 5.4 (steel pipe wall, oil at 60 °C): Bi = 0.313, Fo = 5.64, insulated face ≈ 42.7 °C (book's one-term answer, from memory; exact series 43.0 °C)", () => {
    // Wall 40 mm (a half-slab: symmetric slab of 80 mm), k = 63.9, rho = 7832, c = 434,
    // h = 500 W/(m²K), from −20 °C, 8 min.
    const r = radialHeatUp({
      geometry: "slab",
      thickness: 0.08,
      surfacePowerDensity: 0,
      density: 7832,
      specificHeat: 434,
      thermalConductivity: 63.9,
      convectionCoefficient: 500,
      emissivity: 0,
      ambientTemperature: celsius(60),
      initialTemperature: celsius(-20),
      duration: 480,
    });
    expect(r.biotNumber).toBeCloseTo(0.313, 3); // book: Bi = 0.313
    const fourier = ((63.9 / (7832 * 434)) * 480) / 0.04 ** 2;
    expect(fourier).toBeCloseTo(5.64, 2); // book: Fo = 5.64
    // Within the book's one-term rounding (±0.5 K).
    expect(Math.abs(r.finalCoreTemperature - celsius(42.7))).toBeLessThan(0.5);
    // Energy per unit area: the book's Q/Q0 ≈ 0.8 of Q0 = ρcL(T∞ − Ti).
    const q0 = 7832 * 434 * 0.04 * 80;
    expect(r.energy.stored / q0).toBeGreaterThan(0.78);
    expect(r.energy.stored / q0).toBeLessThan(0.81);
  });
});

describe("radialHeatUp: skin-layer heating", () => {
  it("the slab's steady profile matches the closed form with exponential generation (calculus)", () => {
    // q(x) = q0 e^{β(x−L)}, ∫0^L q = qs; steady: surface T = Ta + qs/h and, since the generated
    // heat flows outward, the core is hotter: T(0) − T(L) = (q0/(kβ)) [ (1 − e^{−βL})/β − L e^{−βL} ].
    const L = 0.01;
    const k = 50;
    const h = 200;
    const qs = 5000;
    const delta = 0.004;
    const beta = 2 / delta;
    const q0 = (qs * beta) / -Math.expm1(-beta * L);
    const r = radialHeatUp({
      geometry: "slab",
      thickness: 2 * L,
      surfacePowerDensity: qs,
      skinDepth: delta,
      density: 7850,
      specificHeat: 480,
      thermalConductivity: k,
      convectionCoefficient: h,
      emissivity: 0,
      ambientTemperature: 293.15,
      duration: 20000,
      cells: 100,
    });
    const surface = 293.15 + qs / h;
    const drop = (q0 / (k * beta)) * (-Math.expm1(-beta * L) / beta - L * Math.exp(-beta * L));
    expect(Math.abs(r.finalSurfaceTemperature - surface)).toBeLessThan(1e-3);
    expect(Math.abs(r.finalCoreTemperature - r.finalSurfaceTemperature - drop) / drop).toBeLessThan(2e-3);
  });

  it("the surface runs ahead of the core while heating, and the core reaches a target later", () => {
    const r = radialHeatUp({
      geometry: "cylinder",
      radius: 0.02,
      length: 0.1,
      power: 3000,
      skinDepth: 0.0005,
      material: lowCarbonSteel,
      convectionCoefficient: 10,
      emissivity: 0.7,
      ambientTemperature: celsius(20),
      duration: 60,
      targetTemperature: celsius(200),
    });
    expect(r.finalSurfaceTemperature).toBeGreaterThan(r.finalCoreTemperature);
    expect(r.timeToSurfaceTarget!).toBeLessThan(r.timeToCoreTarget!);
    expect(Math.abs(r.energy.imbalance)).toBeLessThan(1e-9 * r.energy.input);
  });

  it("energy is conserved by the scheme to 1e-9 (input = stored + lost)", () => {
    const r = radialHeatUp({
      geometry: "slab",
      thickness: 0.02,
      faceArea: 0.01,
      power: 500,
      skinDepth: 0.002,
      density: 2700,
      specificHeat: 900,
      thermalConductivity: 200,
      convectionCoefficient: 30,
      emissivity: 0.9,
      ambientTemperature: 293.15,
      duration: 300,
    });
    const stored = Array.from(r.finalTemperatures).length; // profile present
    expect(stored).toBe(61);
    expect(Math.abs(r.energy.imbalance)).toBeLessThan(1e-9 * r.energy.input);
    expect(r.energy.input).toBeCloseTo((500 / 0.02) * 300, 6);
  });

  it("agrees with the lumped model for a well-conducting thin part (Bi ≪ 0.1)", () => {
    const radius = 0.005;
    const length = 0.05;
    const common = { convectionCoefficient: 10, emissivity: 0, ambientTemperature: 293.15 };
    const r = radialHeatUp({ geometry: "cylinder", radius, length, power: 50, skinDepth: 0.001, density: 8900, specificHeat: 385, thermalConductivity: 400, duration: 120, ...common });
    const mass = 8900 * Math.PI * radius * radius * length;
    const l = lumpedHeatUp({ mass, specificHeat: 385, power: 50, surfaceArea: 2 * Math.PI * radius * length, duration: 120, ...common });
    expect(r.biotNumber).toBeLessThan(1e-3);
    const rise = l.finalTemperature - 293.15;
    expect(Math.abs(r.finalCoreTemperature - l.finalTemperature)).toBeLessThan(5e-4 * rise);
    expect(Math.abs(r.finalSurfaceTemperature - l.finalTemperature)).toBeLessThan(5e-4 * rise);
  });

  it("times to target bracket the lumped closed form for a well-conducting rod (surface first, core last, within 0.3 %)", () => {
    const [radius, length, rho, c, k, h, power, ta, target] = [0.005, 0.05, 8900, 385, 400, 10, 50, 293.15, 393.15];
    const mass = rho * Math.PI * radius * radius * length;
    const area = 2 * Math.PI * radius * length;
    const exact = -((mass * c) / (h * area)) * Math.log(1 - ((target - ta) * h * area) / power); // Incropera eq. 5.25 form
    const r = radialHeatUp({ geometry: "cylinder", radius, length, power, density: rho, specificHeat: c, thermalConductivity: k, convectionCoefficient: h, emissivity: 0, ambientTemperature: ta, duration: 2 * exact, targetTemperature: target });
    expect(r.timeToSurfaceTarget!).toBeLessThan(exact);
    expect(r.timeToCoreTarget!).toBeGreaterThan(exact);
    expect(Math.abs(r.timeToCoreTarget! / exact - 1)).toBeLessThan(3e-3);
    expect(Math.abs(r.timeToSurfaceTarget! / exact - 1)).toBeLessThan(3e-3);
  });

  it("notes a grid coarser than the skin layer", () => {
    const r = radialHeatUp({ geometry: "slab", thickness: 0.2, faceArea: 1, power: 1000, skinDepth: 1e-5, density: 7850, specificHeat: 480, thermalConductivity: 45, convectionCoefficient: 10, emissivity: 0, ambientTemperature: 293.15, duration: 1, cells: 8 });
    expect(r.validity.map((v) => v.code)).toContain("grid-coarser-than-skin");
  });
});

describe("radialHeatUp: bad input throws InputError", () => {
  const ok = {
    geometry: "slab" as const,
    thickness: 0.02,
    surfacePowerDensity: 1000,
    density: 7850,
    specificHeat: 480,
    thermalConductivity: 45,
    convectionCoefficient: 10,
    emissivity: 0,
    ambientTemperature: 293.15,
    duration: 10,
  };
  it("accepts the valid base case", () => {
    expect(() => radialHeatUp(ok)).not.toThrow();
  });
  it.each([
    ["unknown geometry", { ...ok, geometry: "sphere" }],
    ["missing radius of a cylinder", { ...ok, geometry: "cylinder" }],
    ["negative thickness", { ...ok, thickness: -1 }],
    ["power without faceArea", { ...ok, surfacePowerDensity: undefined, power: 100 }],
    ["both power and surfacePowerDensity", { ...ok, power: 100, faceArea: 1 }],
    ["missing conductivity without material", { ...ok, thermalConductivity: undefined }],
    ["zero skin depth", { ...ok, skinDepth: 0 }],
    ["too few cells", { ...ok, cells: 2 }],
    ["non-integer cells", { ...ok, cells: 10.5 }],
    ["missing duration", { ...ok, duration: undefined }],
    ["emissivity above 1", { ...ok, emissivity: 2 }],
  ])("%s", (_name, options) => {
    expect(() => radialHeatUp(options as never)).toThrow(InputError);
  });
});

describe("radialHeatUp: a part driven past its melting temperature is flagged", () => {
  // 10 kW into 0.1 m of a 20 mm steel bar for 60 s: about 600 kJ into 0.25 kg, far above the
  // ≈ 0.3 MJ a steel part of that mass needs to reach its melting temperature (hand estimate:
  // c ≈ 600 J/(kg·K) × 1200 K × 0.25 kg ≈ 180 kJ, before the latent heat the model leaves out).
  const base = {
    geometry: "cylinder" as const, radius: 0.01, length: 0.1, skinDepth: 0.001, material: lowCarbonSteel,
    convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: 293.15,
  };
  it("a danger caution naming the melting temperature when the peak reaches it", () => {
    const r = radialHeatUp({ ...base, power: 10_000, duration: 60 });
    const melt = r.cautions.find((c) => c.code === "part-above-melting");
    expect(melt?.severity).toBe("danger");
    expect(melt?.limit).toBe(lowCarbonSteel.meltingTemperature);
    expect(melt?.value ?? 0).toBeGreaterThanOrEqual(lowCarbonSteel.meltingTemperature);
  });
  it("no caution for a gentle heat-up", () => {
    const r = radialHeatUp({ ...base, power: 200, duration: 10 });
    expect(r.finalSurfaceTemperature).toBeLessThan(lowCarbonSteel.meltingTemperature);
    expect(r.cautions).toEqual([]);
  });
});
