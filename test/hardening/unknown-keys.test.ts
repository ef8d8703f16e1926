/**
 * Misspelt option names are rejected with an InputError naming the field and the nearest known
 * name, instead of silently falling back to a default. The cases are the ones reported in the
 * adversarial review of the public surface; the robustness suite checks every options object of
 * every export with a made-up field in addition.
 */
import { describe, expect, it } from "vitest";
import {
  InputError,
  fieldOnAxis,
  lumpedHeatUp,
  optimiseHeater,
  roundWireAcRatio,
  safetyCautions,
  solenoidInductance,
  studyHeater,
} from "../../src/index.js";
import { loadExample } from "../study/cases.js";

function messageOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as InputError).message;
  }
  throw new Error("no InputError thrown");
}

describe("misspelt options", () => {
  it("safetyCautions({ tankVoltageRMS }) names the field and suggests tankVoltageRms", () => {
    const m = messageOf(() => safetyCautions({ tankVoltageRMS: 400 } as never));
    expect(m).toContain("tankVoltageRMS");
    expect(m).toContain('did you mean "tankVoltageRms"');
  });

  it("roundWireAcRatio with relativePermeabilty suggests relativePermeability", () => {
    const m = messageOf(() => roundWireAcRatio({ diameter: 2e-3, frequency: 20e3, resistivity: 1.7241e-8, relativePermeabilty: 1000 } as never));
    expect(m).toContain('did you mean "relativePermeability"');
  });

  it("lumpedHeatUp with targetTemperture suggests targetTemperature", () => {
    const m = messageOf(() =>
      lumpedHeatUp({ mass: 1, specificHeat: 460, power: 1000, surfaceArea: 0.01, targetTemperture: 500 } as never),
    );
    expect(m).toContain('did you mean "targetTemperature"');
  });

  it("studyHeater(d, { heatup: false }) names heatup and suggests heatUp", () => {
    const m = messageOf(() => studyHeater(loadExample("study-bearing-race.json"), { heatup: false } as never));
    expect(m).toContain("options.heatup");
    expect(m).toContain('did you mean "heatUp"');
  });

  it("the hot-path fast branches reject an unknown field too (solenoidInductance)", () => {
    const m = messageOf(() => solenoidInductance({ radius: 0.05, length: 0.1, turns: 10, wireDiamter: 1e-3 } as never));
    expect(m).toContain('did you mean "wireDiameter"');
  });

  it("fieldOnAxis refuses solenoid descriptions inside an array instead of reading them as loops", () => {
    const m = messageOf(() => fieldOnAxis({ coil: [{ kind: "solenoid", radius: 0.05, length: 0.1, turns: 1000 }], current: 1, axialPosition: 0 } as never));
    expect(m).toContain("coil[0].kind");
  });

  it("optimiseHeater names goal.targetPower (not the parser's own parameter) for a bad quantity text", () => {
    const m = messageOf(() => optimiseHeater(loadExample("study-bearing-race.json"), { targetPower: "abc" }));
    expect(m).toMatch(/^optimiseHeater: goal\.targetPower must be/);
  });
});
