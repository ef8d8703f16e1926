/**
 * Number formatting for reports: engineering units through `formatQuantity`, temperatures in
 * °C, durations in minutes and seconds, and aligned text tables.
 */
import { formatQuantity, ZERO_CELSIUS } from "../units/index.js";

/** A quantity with SI prefix and unit (`12.5 kHz`); `—` for null or non-finite values. */
export function q(value: number | null | undefined, unit: string, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return formatQuantity(value, unit, { digits });
}

/** A temperature given in kelvin, printed in °C (`120 °C`). */
export function celsiusText(kelvin: number | null | undefined, digits = 4): string {
  if (kelvin === null || kelvin === undefined || !Number.isFinite(kelvin)) return "—";
  const c = kelvin - ZERO_CELSIUS;
  const rounded = Number(c.toPrecision(digits));
  return `${Math.abs(rounded) < 1e-9 ? 0 : Number(rounded.toFixed(1))} °C`;
}

/**
 * An area in the unit that keeps the number between 1 and 10 000 (mm², cm² or m²), 4
 * significant digits: `785.4 mm²`, `147 cm²`, `1.2 m²` (never `785400 µm²`).
 */
export function area(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const a = Math.abs(value);
  const [scale, unit] = a === 0 || a >= 1 ? [1, "m²"] : a >= 1e-4 ? [1e-4, "cm²"] : [1e-6, "mm²"];
  return `${Number((value / scale).toPrecision(4))} ${unit}`;
}

/** A volume in mm³, cm³ or m³ (as {@link area}), 4 significant digits. */
export function volume(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const a = Math.abs(value);
  const [scale, unit] = a === 0 || a >= 1 ? [1, "m³"] : a >= 1e-6 ? [1e-6, "cm³"] : [1e-9, "mm³"];
  return `${Number((value / scale).toPrecision(4))} ${unit}`;
}

/** A percentage with one decimal (`87.3 %`). */
export function percent(fraction: number | null | undefined): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return "—";
  return `${(100 * fraction).toFixed(1)} %`;
}

/** A duration: seconds below two minutes, else minutes and seconds, else hours and minutes. */
export function duration(seconds: number | null | undefined): string {
  if (seconds === null || seconds === undefined || !Number.isFinite(seconds)) return "—";
  if (seconds < 120) return `${Number(seconds.toPrecision(3))} s`;
  if (seconds < 7200) {
    const m = Math.floor(seconds / 60);
    return `${m} min ${Math.round(seconds - 60 * m)} s`;
  }
  const h = Math.floor(seconds / 3600);
  return `${h} h ${Math.round((seconds - 3600 * h) / 60)} min`;
}

/** Display width of a string (code points; the report uses no wide characters). */
function width(text: string): number {
  return Array.from(text).length;
}

/**
 * Lays out rows as an aligned text table: first column left-aligned, the others right-aligned,
 * two spaces between columns, an optional header underlined with dashes.
 */
export function textTable(rows: readonly (readonly string[])[], header?: readonly string[], indent = "  ", leftColumns = 1): string {
  const all = header === undefined ? rows : [header, ...rows];
  const columns = Math.max(...all.map((r) => r.length));
  const widths: number[] = [];
  for (let c = 0; c < columns; c++) widths.push(Math.max(...all.map((r) => width(r[c] ?? ""))));
  const line = (r: readonly string[]): string =>
    indent +
    r
      .map((cell, c) => {
        const pad = " ".repeat((widths[c] ?? 0) - width(cell));
        return c < leftColumns ? cell + pad : pad + cell;
      })
      .join("  ")
      .trimEnd();
  const out: string[] = [];
  if (header !== undefined) {
    out.push(line(header));
    out.push(indent + widths.map((w) => "-".repeat(w)).join("  "));
  }
  for (const r of rows) out.push(line(r));
  return out.join("\n");
}

/**
 * Lays out [label, text] rows as a two-column list: labels left-aligned, each text wrapped at
 * word boundaries so that no line passes `columns`, its continuation lines aligned under it (a
 * number is not parted from the word after it, e.g. its unit).
 */
export function definitionList(rows: readonly (readonly [string, string])[], columns = 100, indent = "  "): string {
  const labelWidth = Math.max(0, ...rows.map(([label]) => width(label)));
  const textColumn = width(indent) + labelWidth + 2;
  const hanging = " ".repeat(textColumn);
  return rows
    .map(([label, text]) => {
      // a number and its unit stay on one line: their space is held as a placeholder while wrapping
      const glued = text.replace(/(\d) (?=[^\s\d])/gu, "$1\u0001");
      const lines = wrap(glued, Math.max(20, columns - textColumn), "").replaceAll("\u0001", " ").split("\n");
      const first = indent + label + " ".repeat(labelWidth - width(label) + 2) + (lines[0] ?? "");
      return [first.trimEnd(), ...lines.slice(1).map((l) => hanging + l)].join("\n");
    })
    .join("\n");
}

/** Wraps text at `columns`, indenting continuation lines. */
export function wrap(text: string, columns = 96, indent = "    "): string {
  const lead = /^\s*/.exec(text)?.[0] ?? "";
  const words = text.trim().split(/\s+/);
  words[0] = lead + (words[0] ?? "");
  const lines: string[] = [];
  let line = "";
  for (const w of words) {
    if (line !== "" && width(line) + 1 + width(w) > columns) {
      lines.push(line);
      line = indent + w;
    } else {
      line = line === "" ? w : `${line} ${w}`;
    }
  }
  if (line !== "") lines.push(line);
  return lines.join("\n");
}
