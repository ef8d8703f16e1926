/**
 * Machinery of the robustness suite: walking result objects for non-finite numbers, finding the
 * numeric leaves and nested objects of an argument list, and building mutated argument lists.
 * The per-function table lives in `examples.ts`; the checks in `public-api.test.ts`.
 */

/** The kinds of bad value put in place of one numeric argument or field. */
export const BAD_NUMBERS = ["NaN", "Infinity", "-Infinity", "string", "undefined", "zero", "negative"] as const;
/** One kind of bad value. */
export type BadNumber = (typeof BAD_NUMBERS)[number];

/** The kinds of bad value put in place of one options object (or nested object, or array). */
export const BAD_OBJECTS = ["null", "number", "string", "undefined"] as const;
/** One kind of bad object. */
export type BadObject = (typeof BAD_OBJECTS)[number];

/** A path into an argument list: argument index first, then field names / array indices. */
export type Path = readonly (string | number)[];

/** Renders a path as `0.coil.turns` (the key used in the allow tables). */
export function pathKey(path: Path): string {
  return path.join(".");
}

/** The value that replaces a numeric leaf `valid` for a given kind of bad number. */
export function badNumber(kind: BadNumber, valid: number, badString: string): unknown {
  switch (kind) {
    case "NaN":
      return Number.NaN;
    case "Infinity":
      return Infinity;
    case "-Infinity":
      return -Infinity;
    case "string":
      return badString;
    case "undefined":
      return undefined;
    case "zero":
      return 0;
    case "negative":
      return valid === 0 ? -1 : -Math.abs(valid);
  }
}

/** The value that replaces an object for a given kind of bad object. */
export function badObject(kind: BadObject): unknown {
  switch (kind) {
    case "null":
      return null;
    case "number":
      return 42;
    case "string":
      return "options";
    case "undefined":
      return undefined;
  }
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (typeof v !== "object" || v === null || Array.isArray(v) || ArrayBuffer.isView(v)) return false;
  const proto = Object.getPrototypeOf(v) as unknown;
  return proto === Object.prototype || proto === null;
}

/** What the walk over an argument list found. */
export interface ArgumentLeaves {
  /** Paths of number leaves (and of `quantityStrings` leaves when asked for). */
  numbers: { path: Path; value: number }[];
  /** Paths of plain objects and arrays (not opaque ones' insides). */
  objects: { path: Path; isArray: boolean }[];
}

/**
 * Finds numeric leaves and object nodes of an argument list. Objects in `opaque` (library data
 * sets and results of other library functions passed back in) are object nodes, but their
 * fields are not walked. Strings are numeric leaves when `quantityStrings` is set (study
 * descriptions take quantities as text).
 */
export function findLeaves(args: readonly unknown[], opaque: ReadonlySet<object>, quantityStrings: boolean): ArgumentLeaves {
  const out: ArgumentLeaves = { numbers: [], objects: [] };
  const visit = (value: unknown, path: Path, top: boolean): void => {
    if (typeof value === "number") {
      out.numbers.push({ path, value });
      return;
    }
    if (typeof value === "string" && quantityStrings && /^-?(\d|\.\d)/.test(value)) {
      out.numbers.push({ path, value: Number.parseFloat(value) });
      return;
    }
    if (typeof value === "object" && value !== null && (isPlainObject(value) || Array.isArray(value))) {
      if (!top || path.length > 0) out.objects.push({ path, isArray: Array.isArray(value) });
      if (opaque.has(value)) return;
      if (Array.isArray(value)) {
        // long arrays: first and last element are enough to catch a missing element check
        const indices = value.length <= 4 ? value.map((_, i) => i) : [0, value.length - 1];
        for (const i of indices) visit(value[i], [...path, i], false);
      } else {
        for (const [k, v] of Object.entries(value)) visit(v, [...path, k], false);
      }
    }
  };
  args.forEach((a, i) => {
    visit(a, [i], false);
  });
  return out;
}

/** A copy of `args` with the value at `path` replaced (copying only along the path). */
export function replaceAt(args: readonly unknown[], path: Path, replacement: unknown): unknown[] {
  const set = (node: unknown, rest: Path): unknown => {
    if (rest.length === 0) return replacement;
    const [head, ...tail] = rest as [string | number, ...(string | number)[]];
    if (Array.isArray(node)) {
      const list = node as unknown[];
      const copy: unknown[] = [...list];
      copy[head as number] = set(list[head as number], tail);
      return copy;
    }
    const rec = node as Record<string, unknown>;
    return { ...rec, [head]: set(rec[head as string], tail) };
  };
  return set(args, path) as unknown[];
}

/** One non-finite number, null or NaN found in a result. */
export interface BadResultValue {
  path: string;
  value: unknown;
}

/**
 * Walks a result (number, plain object, array, typed array, Map) and lists every number that is
 * not finite and every `null`. Functions and strings are ignored.
 */
export function nonFiniteValues(result: unknown): BadResultValue[] {
  const found: BadResultValue[] = [];
  const seen = new Set<object>();
  const visit = (v: unknown, path: string): void => {
    if (typeof v === "number") {
      if (!Number.isFinite(v)) found.push({ path, value: v });
      return;
    }
    if (v === null) {
      found.push({ path, value: null });
      return;
    }
    if (typeof v !== "object") return;
    if (seen.has(v)) return;
    seen.add(v);
    if (ArrayBuffer.isView(v)) {
      const arr = v as unknown as ArrayLike<unknown>;
      for (let i = 0; i < arr.length; i++) visit(arr[i], `${path}[${i}]`);
      return;
    }
    if (Array.isArray(v)) {
      v.forEach((x, i) => {
        visit(x, `${path}[${i}]`);
      });
      return;
    }
    if (v instanceof Map) {
      for (const [k, x] of v) visit(x, `${path}.${String(k)}`);
      return;
    }
    for (const [k, x] of Object.entries(v)) visit(x, path === "" ? k : `${path}.${k}`);
  };
  visit(result, "");
  return found;
}

/** Normalises a result path for whitelisting: array indices become `[]`. */
export function resultPathPattern(path: string): string {
  return path.replace(/\[\d+\]/g, "[]");
}
