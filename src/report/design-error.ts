/**
 * Messages for a valid study file whose design cannot run (exit status 3): the limit the design
 * hits, its numbers with SI prefixes and 4 significant digits, the unit after each number, and
 * what to change.
 */
import type { InputError } from "../core/index.js";
import { formatQuantity } from "../units/index.js";

/** The units an inner message may end its `expected` part with. */
const UNITS = ["Ω", "W", "V", "A", "Hz", "F", "H", "m", "K", "s", "J"];

/** The innermost `fn: parameter must be … [unit], got …` of a message, with its context. */
interface Limit {
  /** Words around the limit (`with the part at its start temperature`), or "". */
  readonly context: string;
  /** The rejected parameter (`coilResistance`). */
  readonly parameter: string;
  /** What it must be, numbers reformatted, unit after each number. */
  readonly expected: string;
  /** The rejected value, formatted. */
  readonly value: string;
}

/** A number in `unit` with prefix and 4 significant digits; a bare number keeps 4 digits. */
function formatNumber(text: string, unit: string): string {
  const v = Number(text);
  if (!Number.isFinite(v)) return text;
  if (unit === "K") return `${Number((v - 273.15).toPrecision(4))} °C`;
  return unit === "" ? String(Number(v.toPrecision(4))) : formatQuantity(v, unit, { digits: 4 });
}

const NUMBER = /[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/gu;

/** Splits an InputError raised inside the study into the limit it names. */
export function limitOf(error: Pick<InputError, "expected" | "message" | "parameter">): Limit {
  const text = error.expected;
  const open = text.search(/\(\w+: /u);
  const outer = open < 0 ? "" : text.slice(0, open).trim();
  const inner = open < 0 ? error.message : text.slice(open + 1, text.endsWith(")") ? -1 : undefined);
  const match = /^\w+: (\S+) must be (.*), got (.*)$/su.exec(inner);
  if (match === null) return { context: outer, parameter: error.parameter, expected: text.replace(NUMBER, (n) => formatNumber(n, "")), value: "" };
  const [, parameter = "", rest = "", got = ""] = match;
  let expected = rest;
  let unit = "";
  for (const u of UNITS) {
    if (rest.endsWith(` ${u}`)) {
      unit = u;
      expected = rest.slice(0, -u.length - 1);
      break;
    }
  }
  // the number the limit names ("= 0.0575511…" or "≤ 516.91…"), with the unit right after it
  const reformatted = expected.replace(NUMBER, (n, offset: number) => {
    const before = expected.slice(0, offset);
    const isLimit = /(=|≤|≥|<|>)\s*$/u.test(before);
    return isLimit ? formatNumber(n, unit) : n;
  });
  const context = outer.replace(/^a design the inverter can run\s*/u, "");
  return { context, parameter, expected: reformatted, value: formatNumber(got, unit) };
}

/** What to change for each limit the study knows, by the rejected parameter. */
function remedy(parameter: string, file: Readonly<Record<string, unknown>>): string {
  const written = (path: string): string => {
    let node: unknown = file;
    for (const key of path.split(".")) node = typeof node === "object" && node !== null ? (node as Record<string, unknown>)[key] : undefined;
    return node === undefined ? "" : `, now ${JSON.stringify(node)}`;
  };
  switch (parameter) {
    case "coilResistance":
      return `the loaded coil damps the tank too much for a self-oscillating inverter to find a zero-phase frequency. Raise √(L/C): less capacitance (capacitor.capacitance${written("capacitor.capacitance")}: fewer µF) or more turns (coil.turns${written("coil.turns")}); or couple the part less tightly.`;
    case "power":
      return `the bridge cannot deliver the target power even at resonance. Lower inverter.targetPower${written("inverter.targetPower")}, raise supply.voltage${written("supply.voltage")}, use a full bridge, or lower the tank impedance (fewer turns, more capacitance).`;
    default:
      return "change the design (turns, capacitance, supply voltage or inverter settings) so that the operating point stays inside this limit.";
  }
}

/** The one-paragraph message for an impossible design, ending in a remedy. */
export function designErrorText(command: string, file: string, error: InputError, input: unknown): string {
  const limit = limitOf(error);
  const where = limit.context === "" ? "" : ` ${limit.context}:`;
  const value = limit.value === "" ? "" : `, but it is ${limit.value}`;
  const fileRecord = typeof input === "object" && input !== null ? (input as Record<string, unknown>) : {};
  return (
    `fluxwright ${command}: ${file}: the file is valid but the design cannot run${where} ${limit.parameter} must be ${limit.expected}${value}.\n` +
    `  what to change: ${remedy(limit.parameter, fileRecord)}\n`
  );
}

/** A sweep row's problem in one short line: the field path or the limit, numbers formatted. */
export function reasonText(problem: string): string {
  const described = /^readHeaterDescription: (.*)$/su.exec(problem);
  if (described !== null) return described[1] ?? problem;
  const study = /^\w+: (\S+) must be (.*), got [^,]*$/su.exec(problem);
  if (study === null) return problem;
  const limit = limitOf({ expected: study[2] ?? "", message: problem, parameter: study[1] ?? "" });
  const where = limit.context === "" ? "" : `${limit.context}: `;
  return `${where}${limit.parameter} must be ${limit.expected}${limit.value === "" ? "" : `, but it is ${limit.value}`}`;
}
