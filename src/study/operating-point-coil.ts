/**
 * The coil's own properties for the operating point: inductance, conductor length and DC
 * resistance, the leads' series impedance, and the closed-form AC resistance of the winding.
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import {
  leadImpedance,
  litzAcRatio,
  litzDcResistance,
  roundWireAcRatio,
  skinDepth,
  tubeAcResistance,
  wireDcResistance,
  workCoilResistanceCurrentSheet,
} from "../conductors/index.js";
import { solenoidInductance, spiralCoilInductance } from "../inductance/index.js";
import { resistivityAt } from "../materials/index.js";
import { MU_0 } from "../units/index.js";
import { CLOSED_FORM_COIL_INDUCTANCE_ERROR } from "./operating-point-accuracy.js";
import type { CoilImpedanceTier, CoilProperties } from "./operating-point-types.js";
import { conductorOuterDiameter } from "./read-description.js";
import type { ResolvedCoaxialLeads, ResolvedConductor, ResolvedFlatPairLeads, ResolvedHeaterDescription } from "./read-description.js";

/** Copper area of a resolved conductor as a round-wire equivalent diameter, for DC resistance. */
function conductorDcResistance(conductor: ResolvedConductor, resistivity: number, length: number): number {
  switch (conductor.kind) {
    case "solid":
      return wireDcResistance({ resistivity, length, diameter: conductor.diameter });
    case "litz":
      return litzDcResistance({ construction: { strands: conductor.strands, strandDiameter: conductor.strandDiameter }, resistivity, length });
    case "tube": {
      // tube copper area as the difference of two round wires: 1/R = 1/R_outer − 1/R_bore
      const outer = wireDcResistance({ resistivity, length, diameter: conductor.outerDiameter });
      const bore = wireDcResistance({ resistivity, length, diameter: conductor.outerDiameter - 2 * conductor.wallThickness });
      return 1 / (1 / outer - 1 / bore);
    }
  }
}

/** The coil's own properties: inductance (inductance module), conductor length and DC resistance, and the impedance tier. */
export function coilProperties(d: ResolvedHeaterDescription, impedanceTier: CoilImpedanceTier = "cells"): CoilProperties {
  const coil = d.coil;
  const conductorDiameter = conductorOuterDiameter(coil.conductor);
  const resistivity = resistivityAt(coil.conductor.material, coil.temperature);
  let inductance: number;
  let windingLength: number;
  if (coil.shape === "solenoid") {
    inductance = solenoidInductance({ radius: coil.radius, length: coil.length, turns: coil.turns, wireDiameter: conductorDiameter });
    windingLength = coil.turns * 2 * Math.PI * coil.radius;
  } else {
    inductance = spiralCoilInductance({ innerRadius: coil.innerRadius, outerRadius: coil.outerRadius, turns: coil.turns, wireDiameter: conductorDiameter });
    windingLength = coil.turns * Math.PI * (coil.innerRadius + coil.outerRadius);
  }
  const leads = coil.leads;
  if (leads !== null && leads.shape !== "round-pair") {
    // bus-bar and coaxial leads are conductors of their own: the coil's conductor ends at the winding
    const dcResistance = conductorDcResistance(coil.conductor, resistivity, windingLength) + separateLeadsDcResistance(leads, coil.leadLength, coil.temperature);
    return { inductance, impedanceTier, windingLength, conductorLength: windingLength, resistivity, dcResistance, conductorDiameter };
  }
  const conductorLength = windingLength + coil.leadLength;
  return { inductance, impedanceTier, windingLength, conductorLength, resistivity, dcResistance: conductorDcResistance(coil.conductor, resistivity, conductorLength), conductorDiameter };
}

/**
 * DC resistance of leads that are conductors of their own [Ω]: two bars of the lead length
 * together, or a coaxial cable of half of it (inner conductor and return tube in series).
 */
function separateLeadsDcResistance(leads: ResolvedFlatPairLeads | ResolvedCoaxialLeads, leadLength: number, temperature: number): number {
  const rho = resistivityAt(leads.material, temperature);
  if (leads.shape === "flat-pair") return (rho * leadLength) / (leads.width * leads.thickness);
  const a = leads.innerDiameter / 2;
  const ri = a - leads.innerWallThickness;
  const b = leads.returnInnerDiameter / 2;
  const c = b + leads.returnWallThickness;
  return ((rho * leadLength) / 2) * (1 / (Math.PI * (a * a - ri * ri)) + 1 / (Math.PI * (c * c - b * b)));
}

/** Conductor resistance per metre, isolated (skin effect only) [Ω/m]. */
function isolatedResistancePerMetre(d: ResolvedHeaterDescription, rho: number, frequency: number): number {
  const c = d.coil.conductor;
  switch (c.kind) {
    case "solid":
      return wireDcResistance({ resistivity: rho, length: 1, diameter: c.diameter }) * roundWireAcRatio({ diameter: c.diameter, frequency, resistivity: rho });
    case "tube":
      return tubeAcResistance({ outerDiameter: c.outerDiameter, wallThickness: c.wallThickness, frequency, resistivity: rho });
    case "litz": {
      const construction = { strands: c.strands, strandDiameter: c.strandDiameter };
      return litzDcResistance({ construction, resistivity: rho, length: 1 }) * litzAcRatio({ construction, frequency, resistivity: rho });
    }
  }
}

/** AC resistance of the leads at a frequency [Ω] (isolated conductor of the lead length). */
function leadResistance(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number): number {
  return d.coil.leadLength > 0 ? isolatedResistancePerMetre(d, props.resistivity, frequency) * d.coil.leadLength : 0;
}

/**
 * The leads' series resistance [Ω] and inductance [H] at a frequency. Without a cross-section:
 * the isolated conductor's resistance and no inductance (as before leads had a geometry). With
 * one: `leadImpedance` for a run of half the lead length (a round pair of the coil's conductor,
 * the bus bars, or the coaxial cable); a litz pair carries a uniform current over its bundle, so its inductance is
 * the exact uniform-current value (μ0ℓ/π)(ln(D/a) + 1/4) and its resistance the litz model's.
 */
export function leadSeriesImpedance(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number): { resistance: number; inductance: number } {
  const leads = d.coil.leads;
  if (leads === null || !(d.coil.leadLength > 0)) return { resistance: leadResistance(d, props, frequency), inductance: 0 };
  const run = d.coil.leadLength / 2;
  const c = d.coil.conductor;
  if (leads.shape === "round-pair") {
    if (c.kind === "litz") {
      const inductance = (MU_0 * run / Math.PI) * (Math.log(leads.spacing / (c.outerDiameter / 2)) + 0.25);
      return { resistance: leadResistance(d, props, frequency), inductance };
    }
    const lead = c.kind === "tube"
      ? { shape: "round-pair" as const, diameter: c.outerDiameter, wallThickness: c.wallThickness, spacing: leads.spacing }
      : { shape: "round-pair" as const, diameter: c.diameter, spacing: leads.spacing };
    const z = leadImpedance({ lead, length: run, frequency, resistivity: props.resistivity });
    return { resistance: z.resistance, inductance: z.inductance };
  }
  const lead =
    leads.shape === "flat-pair"
      ? { shape: "flat-pair" as const, width: leads.width, thickness: leads.thickness, gap: leads.gap }
      : {
          shape: "coaxial" as const,
          innerDiameter: leads.innerDiameter,
          innerWallThickness: leads.innerWallThickness,
          returnInnerDiameter: leads.returnInnerDiameter,
          returnWallThickness: leads.returnWallThickness,
        };
  const z = leadImpedance({ lead, length: run, frequency, resistivity: resistivityAt(leads.material, d.coil.temperature) });
  return { resistance: z.resistance, inductance: z.inductance };
}

/** Closed-form AC resistance of the winding (leads excluded) at a frequency, with the method's validity notes when `notes` is given. */
export function closedFormWindingResistance(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number, notes: ValidityNote[] | null): number {
  const coil = d.coil;
  const c = coil.conductor;
  const rho = props.resistivity;
  const delta = skinDepth({ resistivity: rho, frequency });
  if (c.kind === "litz") {
    const construction = { strands: c.strands, strandDiameter: c.strandDiameter };
    const windowBreadth = coil.shape === "solenoid" ? coil.length : coil.outerRadius - coil.innerRadius + props.conductorDiameter;
    const ratio = litzAcRatio({ construction, frequency, resistivity: rho, turns: coil.turns, windowBreadth });
    return litzDcResistance({ construction, resistivity: rho, length: props.windingLength }) * ratio;
  }
  const thickness = c.kind === "tube" ? c.wallThickness : c.diameter / 2;
  if (coil.shape === "solenoid") {
    notes?.push({
      code: "coil-inductance-uniform-current",
      message: `The empty coil's inductance is the current-sheet value with Rosa's corrections for round wire (uniform current in each turn). At working frequencies a turn's current crowds towards its neighbours and the part: against the field solutions of the reference scenarios (4–20 turns, 5–200 kHz) it reads 5.9–19.0 % high (bound ${CLOSED_FORM_COIL_INDUCTANCE_ERROR * 100} %), so the operating frequency reads 4–9 % low (the closed-form tier: the study proper uses the coil-impedance model).`,
      value: CLOSED_FORM_COIL_INDUCTANCE_ERROR,
    });
    const spaceFactor = Math.min(1, (coil.turns * props.conductorDiameter) / coil.length);
    notes?.push({
      code: "coil-resistance-current-sheet",
      message: "Coil resistance from the current-sheet estimate (current in one skin depth of the face towards the part); it ignores current on the sides and back of each turn and the proximity effect between turns, and reads low by an amount not measured here (the coil-impedance model with skin and proximity effect replaces it).",
    });
    if (thickness < 3 * delta) {
      notes?.push({
        code: "coil-conductor-thin",
        message: "The coil conductor (tube wall or wire radius) is thinner than 3 skin depths, so the current-sheet estimate of its resistance reads low.",
        value: thickness / delta,
        limit: 3,
      });
    }
    return (
      workCoilResistanceCurrentSheet({
        innerDiameter: 2 * coil.radius - props.conductorDiameter,
        coilLength: coil.length,
        turns: coil.turns,
        spaceFactor,
        frequency,
        resistivity: rho,
      })
    );
  }
  notes?.push({
    code: "coil-resistance-isolated-conductor",
    message: "Coil resistance from the isolated-conductor skin effect; the proximity effect between turns is not included, so it reads low.",
  });
  return isolatedResistancePerMetre(d, rho, frequency) * props.windingLength;
}
