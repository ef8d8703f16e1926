/**
 * Text helpers of the caution messages: optional text options, quantities with SI prefixes,
 * rounded numbers and flux densities with a tesla prefix.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { formatQuantity } from "../units/index.js";

/** An optional text option: its value, or the fallback when absent; InputError when not a string. */
export function optionalText(where: string, parameter: string, value: unknown, fallback: string): string {
  if (value === undefined) return fallback;
  if (typeof value !== "string") throw new InputError(where, parameter, value, "", "a string");
  return value;
}

/** A quantity with SI prefix and 3 significant digits, as every report prints them (`30.1 kHz`, `1.48 kV`). */
export function qty(value: number, unit: string): string {
  return formatQuantity(value, unit, { digits: 3 });
}

/** Three significant digits, plain notation where sensible. */
export function round(value: number): string {
  if (value === 0) return "0";
  const a = Math.abs(value);
  if (a >= 1e-3 && a < 1e6) return String(Number(value.toPrecision(3)));
  return value.toPrecision(3);
}

/** Flux density with a µT/mT/T suffix, for messages. */
export function formatTesla(value: number): string {
  const a = Math.abs(value);
  if (a < 1e-3) return `${round(value * 1e6)} µT`;
  if (a < 1) return `${round(value * 1e3)} mT`;
  return `${round(value)} T`;
}
