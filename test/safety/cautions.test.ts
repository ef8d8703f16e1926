import { describe, it, expect } from "vitest";
import {
  voltageCaution,
  storedEnergyCaution,
  surfaceTemperatureCaution,
  contactBurnThreshold,
  audibleFrequencyCaution,
  exposureCaution,
  safetyCautions,
  EXTRA_LOW_VOLTAGE_LIMITS,
  DEFER_TO_CODES,
  InputError,
  celsius,
} from "../../src/index.js";
import type { Caution } from "../../src/index.js";

function expectWellFormed(c: Caution | null): asserts c is Caution {
  expect(c).not.toBeNull();
  const caution = c!;
  expect(caution.message.endsWith(DEFER_TO_CODES)).toBe(true);
  expect(Number.isFinite(caution.value)).toBe(true);
  expect(Number.isFinite(caution.limit)).toBe(true);
  expect(caution.source.length).toBeGreaterThan(5);
  expect(["info", "warning", "danger"]).toContain(caution.severity);
}

describe("voltageCaution: IEC 61140 extra-low voltage (50 V AC RMS, 120 V ripple-free DC)", () => {
  it("limits are those of IEC 61140", () => {
    expect(EXTRA_LOW_VOLTAGE_LIMITS).toEqual({ acRms: 50, rippleFreeDc: 120 });
  });
  it("50 V AC is at the limit (no caution); 50.1 V AC is danger", () => {
    expect(voltageCaution({ voltage: 50, waveform: "ac" })).toBeNull();
    const c = voltageCaution({ voltage: 50.1, waveform: "ac", location: "tank" });
    expectWellFormed(c);
    expect(c.code).toBe("voltage-above-extra-low");
    expect(c.severity).toBe("danger");
    expect(c.limit).toBe(50);
    expect(c.source).toMatch(/IEC 61140/);
    expect(c.message).toMatch(/tank/);
  });
  it("120 V DC is at the limit; 121 V DC is above; magnitude is used for negative values", () => {
    expect(voltageCaution({ voltage: 120, waveform: "dc" })).toBeNull();
    expect(voltageCaution({ voltage: -121, waveform: "dc" })?.value).toBe(121);
  });
  it("throws InputError on bad input", () => {
    expect(() => voltageCaution({ voltage: Number.NaN, waveform: "ac" })).toThrow(InputError);
    expect(() => voltageCaution({ voltage: 10, waveform: "pulsed" as never })).toThrow(InputError);
  });
});

describe("storedEnergyCaution", () => {
  it("½CV² above 20 J at 2 V or more is danger (IEC 60950-1:2005 §2.1.1.5 c) 2): 'exceeds 20 J', 'U is 2 V or more')", () => {
    const c = storedEnergyCaution({ capacitance: 1e-3, voltagePeak: 201 }); // 20.2 J
    expectWellFormed(c);
    expect(c.code).toBe("stored-energy-hazard");
    expect(c.severity).toBe("danger");
    expect(c.value).toBeCloseTo(20.2005, 12);
    expect(c.source).toMatch(/60950-1.*2\.1\.1\.5/);
    // exactly 20 J does not exceed 20 J (IEC 60950-1 §2.1.1.5 c) 2)): the shock screen applies instead
    expect(storedEnergyCaution({ capacitance: 1e-3, voltagePeak: 200 })?.code).toBe("stored-energy-shock");
    // below 2 V the 20 J level does not apply (IEC 60950-1 §2.1.1.5 c) 2)): 50 F at 1.9 V is 90 J
    expect(storedEnergyCaution({ capacitance: 50, voltagePeak: 1.9 })).toBeNull();
    expect(storedEnergyCaution({ capacitance: 50, voltagePeak: 2 })?.code).toBe("stored-energy-hazard");
  });
  it("above 0.35 J at a shock-capable voltage is a warning (IEC 60335-1 §8.1.4)", () => {
    const c = storedEnergyCaution({ capacitance: 10e-6, voltagePeak: 400 }); // 0.8 J
    expectWellFormed(c);
    expect(c.code).toBe("stored-energy-shock");
    expect(c.limit).toBe(0.35);
  });
  it("below 0.35 J, or at ≤ 42.4 V peak and below 20 J, nothing", () => {
    expect(storedEnergyCaution({ capacitance: 1e-6, voltagePeak: 400 })).toBeNull(); // 0.08 J
    expect(storedEnergyCaution({ capacitance: 0.01, voltagePeak: 40 })).toBeNull(); // 8 J at 40 V
  });
  it("throws InputError on bad input", () => {
    expect(() => storedEnergyCaution({ capacitance: 0, voltagePeak: 10 })).toThrow(InputError);
    expect(() => storedEnergyCaution({ capacitance: 1e-6, voltagePeak: Infinity })).toThrow(InputError);
  });
});

describe("surface temperature: burn thresholds for bare metal", () => {
  // EN 563:1994 burn-threshold table, uncoated metals (as reproduced in DGUV Vorschrift 79, §12):
  // 1 s 65–70 °C (lower edge used), 1 min 51 °C, 10 min 48 °C, 8 h and longer 43 °C
  it.each([
    [1, 65],
    [60, 51],
    [600, 48],
    [28800, 43],
  ])("contact %s s → %s °C (EN 563:1994 table, predecessor of ISO 13732-1)", (t, c) => {
    expect(contactBurnThreshold(t)).toBeCloseTo(celsius(c), 10);
  });
  it("holds the 10 s point at 55 °C (consistency, not an outside check: read off the standard's figure, listed in docs/unverified-values.md)", () => {
    expect(contactBurnThreshold(10)).toBeCloseTo(celsius(55), 10);
  });
  it("stays inside EN 563's 1 s band and at or below the 1 min value beyond a minute (EN 563:1994 table)", () => {
    const oneSecond = contactBurnThreshold(1) - celsius(0);
    expect(oneSecond).toBeGreaterThanOrEqual(65);
    expect(oneSecond).toBeLessThanOrEqual(70);
    for (const t of [61, 120, 599, 601, 3600, 28799]) expect(contactBurnThreshold(t)).toBeLessThanOrEqual(celsius(51));
  });
  it("falls with contact time and is held outside 1 s … 8 h", () => {
    expect(contactBurnThreshold(0.1)).toBe(contactBurnThreshold(1));
    expect(contactBurnThreshold(1e6)).toBe(contactBurnThreshold(28800));
    expect(contactBurnThreshold(30)).toBeLessThan(contactBurnThreshold(10));
    expect(contactBurnThreshold(30)).toBeGreaterThan(contactBurnThreshold(60));
  });
  it("a part at 200 °C is danger; 60 °C with 1 min contact is a warning; 40 °C nothing", () => {
    const hot = surfaceTemperatureCaution({ temperature: celsius(200) });
    expectWellFormed(hot);
    expect(hot.code).toBe("hot-surface-burn");
    expect(hot.severity).toBe("danger");
    expect(hot.unit).toBe("K");
    const warm = surfaceTemperatureCaution({ temperature: celsius(60), contactTime: 60 });
    expectWellFormed(warm);
    expect(warm.code).toBe("hot-surface-contact");
    expect(surfaceTemperatureCaution({ temperature: celsius(60) })).toBeNull();
    expect(surfaceTemperatureCaution({ temperature: celsius(40), contactTime: 28800 })).toBeNull();
  });
  it("throws InputError on bad input", () => {
    expect(() => surfaceTemperatureCaution({ temperature: -1 })).toThrow(InputError);
    expect(() => surfaceTemperatureCaution({ temperature: 300, contactTime: 0 })).toThrow(InputError);
    expect(() => contactBurnThreshold(Number.NaN)).toThrow(InputError);
  });
});

describe("audibleFrequencyCaution (common practice: hearing to about 20 kHz)", () => {
  it("below 20 kHz is a warning; 20 kHz and above nothing", () => {
    const c = audibleFrequencyCaution(15000);
    expectWellFormed(c);
    expect(c.code).toBe("audible-frequency");
    expect(audibleFrequencyCaution(20000)).toBeNull();
  });
  it("throws InputError on bad input", () => {
    expect(() => audibleFrequencyCaution(0)).toThrow(InputError);
  });
});

describe("exposureCaution (ICNIRP 2010)", () => {
  it("above the public level at 30 kHz is a warning naming ICNIRP", () => {
    const c = exposureCaution({ fluxDensityRms: 1e-4, frequency: 30000 });
    expectWellFormed(c);
    expect(c.code).toBe("field-above-reference-level");
    expect(c.limit).toBe(2.7e-5);
    expect(c.source).toMatch(/ICNIRP/);
    expect(exposureCaution({ fluxDensityRms: 1e-4, frequency: 30000, population: "occupational" })).toBeNull();
  });
});

describe("safetyCautions: all generators at once", () => {
  it("returns the cautions found, danger first, each ending with the deferral to codes", () => {
    const list = safetyCautions({
      tankVoltageRms: 300,
      supplyVoltageDc: 48,
      capacitance: 4e-6,
      capacitorVoltagePeak: 425,
      surfaceTemperature: celsius(400),
      frequency: 15000,
      fluxDensityRms: 50e-6,
    });
    expect(list.map((c) => c.code)).toEqual([
      "voltage-above-extra-low",
      "hot-surface-burn",
      "stored-energy-shock",
      "audible-frequency",
      "field-above-reference-level",
    ]);
    list.forEach(expectWellFormed);
  });
  it("a safe low-voltage design gives no cautions", () => {
    expect(safetyCautions({ tankVoltageRms: 30, supplyVoltageDc: 24, surfaceTemperature: celsius(35), frequency: 40000, fluxDensityRms: 1e-6 })).toEqual([]);
  });
  it("throws InputError for capacitance without voltage, or field without frequency", () => {
    expect(() => safetyCautions({ capacitance: 1e-6 })).toThrow(InputError);
    expect(() => safetyCautions({ fluxDensityRms: 1e-5 })).toThrow(InputError);
  });
});
