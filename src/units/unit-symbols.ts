/**
 * The unit symbols that {@link parseQuantity} and {@link formatQuantity} know, with their
 * accepted spellings. Values are always in coherent SI units; the gram is the one prefixed
 * unit whose coherent unit (kg) already carries a prefix.
 *
 * @packageDocumentation
 */

/**
 * Canonical unit symbols and their accepted aliases. The canonical symbol is what
 * {@link formatQuantity} prints and what `unit` arguments are compared against after
 * normalisation.
 */
export const UNIT_ALIASES: ReadonlyMap<string, string> = new Map([
  ["m", "m"], ["m²", "m²"], ["m2", "m²"], ["m^2", "m²"], ["m³", "m³"], ["m3", "m³"], ["m^3", "m³"],
  ["s", "s"], ["A", "A"], ["K", "K"], ["mol", "mol"], ["cd", "cd"],
  ["g", "g"], ["kg", "kg"],
  ["Hz", "Hz"], ["N", "N"], ["Pa", "Pa"], ["J", "J"], ["W", "W"], ["C", "C"], ["V", "V"],
  ["F", "F"], ["Ω", "Ω"], ["\u2126", "Ω"], ["ohm", "Ω"], ["Ohm", "Ω"], ["ohms", "Ω"], ["S", "S"],
  ["Wb", "Wb"], ["T", "T"], ["H", "H"], ["var", "var"], ["VA", "VA"],
  ["Ω·m", "Ω·m"], ["Ωm", "Ω·m"], ["Ω m", "Ω·m"], ["Ω*m", "Ω·m"], ["ohm·m", "Ω·m"], ["ohm m", "Ω·m"],
  ["ohm*m", "Ω·m"], ["ohm-m", "Ω·m"],
  ["A/m", "A/m"], ["W/m²", "W/m²"], ["W/m2", "W/m²"], ["W/m³", "W/m³"], ["W/m3", "W/m³"],
  ["rad/s", "rad/s"], ["S/m", "S/m"], ["H/m", "H/m"], ["F/m", "F/m"], ["V/m", "V/m"],
  ["°C", "°C"], ["degC", "°C"], ["℃", "°C"],
  ["W/(m²·K)", "W/(m²·K)"], ["W/(m2·K)", "W/(m²·K)"], ["W/(m^2·K)", "W/(m²·K)"], ["W/(m2*K)", "W/(m²·K)"],
  ["W/(m²K)", "W/(m²·K)"], ["W/m2K", "W/(m²·K)"], ["W/(m·K)", "W/(m·K)"], ["W/(m*K)", "W/(m·K)"], ["W/mK", "W/(m·K)"],
  ["J/(kg·K)", "J/(kg·K)"], ["J/(kg*K)", "J/(kg·K)"], ["J/kgK", "J/(kg·K)"], ["kg/m³", "kg/m³"], ["kg/m3", "kg/m³"],
  ["V·s", "V·s"], ["Vs", "V·s"], ["A²", "A²"],
]);

/** Normalises a unit spelling to its canonical symbol, or returns `undefined` if unknown. */
export function canonicalUnit(text: string): string | undefined {
  return UNIT_ALIASES.get(text.trim());
}
