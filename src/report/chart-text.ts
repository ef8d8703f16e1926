/**
 * Text and numbers of the charts: XML escaping, SI-prefixed tick and value labels, a rough
 * text width for layout, a stable hash for element ids, and coordinate rounding.
 *
 * @packageDocumentation
 */

/** Escapes text for use in SVG/XML character data and attribute values. */
export function escapeXml(text: string): string {
  return text
    // control characters are not allowed in XML 1.0: shown as \x1B-style text instead
    // eslint-disable-next-line no-control-regex -- matching control characters is the point
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/gu, (c) => `\\x${c.charCodeAt(0).toString(16).toUpperCase().padStart(2, "0")}`)
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

const PREFIXES: readonly [number, string][] = [
  [1e12, "T"], [1e9, "G"], [1e6, "M"], [1e3, "k"], [1, ""],
  [1e-3, "m"], [1e-6, "µ"], [1e-9, "n"], [1e-12, "p"], [1e-15, "f"],
];

/** Units whose values read badly with SI prefixes (`k°C`), printed as plain numbers. */
const NO_PREFIX_UNITS = new Set(["°C", "%", "°", "K", "dB", "rad", ""]);
/** Trims a fixed-point rendering: `"2.50"` → `"2.5"`, `"3.0"` → `"3"`. */
export function trimZeros(text: string): string {
  return text.includes(".") ? text.replace(/0+$/, "").replace(/\.$/, "") : text;
}

/**
 * Formats a number for an axis tick or value label: SI prefix plus unit for prefixable units
 * (`12 kHz`, `350 mW`), plain digits otherwise. `step` (the tick spacing) sets the number of
 * decimals so that neighbouring ticks never print alike.
 */
export function formatChartNumber(value: number, unit = "", step?: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return unit === "" ? "0" : `0 ${unit}`;
  const magnitude = Math.abs(value);
  const usePrefix = !NO_PREFIX_UNITS.has(unit);
  let scale = 1;
  let prefix = "";
  if (usePrefix) {
    for (const [s, p] of PREFIXES) {
      if (magnitude >= s * 0.9995) {
        scale = s;
        prefix = p;
        break;
      }
    }
    if (magnitude < 1e-15) {
      scale = 1e-15;
      prefix = "f";
    }
  } else if (magnitude >= 1e6 || magnitude < 1e-3) {
    const text = value.toExponential(2).replace(/\.?0+e/, "e").replace("e+", "e");
    return unit === "" ? text : `${text} ${unit}`;
  }
  const scaled = value / scale;
  let decimals: number;
  if (step !== undefined && step > 0 && Number.isFinite(step)) {
    decimals = Math.max(0, Math.min(6, -Math.floor(Math.log10(step / scale) + 1e-9)));
  } else {
    decimals = Math.max(0, Math.min(6, 2 - Math.floor(Math.log10(Math.abs(scaled)) + 1e-9)));
  }
  const digits = trimZeros(scaled.toFixed(decimals));
  const suffix = `${prefix}${unit}`;
  return suffix === "" ? digits : `${digits} ${suffix}`;
}
/** A rough text width for layout [px] (no font metrics in Node): 0.6 em per character. */
export function textWidth(text: string, fontSize: number): number {
  return text.length * fontSize * 0.6;
}

/** A short, stable hash of a string (FNV-1a, 32 bit) in base 36, for element ids. */
export function hashText(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(36);
}

/** Rounds a coordinate for compact output. */
export function r(value: number): string {
  return String(Math.round(value * 100) / 100);
}
