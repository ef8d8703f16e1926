/**
 * Reading the command line's arguments: options and positionals, lists, `--workers` and
 * `--shard`.
 *
 * @packageDocumentation
 */
import { parseArgs as nodeParseArgs } from "node:util";
import { nearestName } from "../core/index.js";
import type { HeaterShard } from "../study/index.js";
import { UsageError } from "./errors.js";

/** Positional arguments and options of a command line. */
export interface Parsed {
  positional: string[];
  flags: Map<string, string | true>;
}

/**
 * Parses `--name value`, `--name=value` and boolean `--name` options with `node:util`'s
 * `parseArgs` (its tokens, so that the messages stay ours); `-` is a positional (standard
 * input), and so is any other argument that starts with a single dash except `-h`.
 */
export function parseArgs(args: readonly string[], valued: readonly string[], booleans: readonly string[]): Parsed {
  const options: Record<string, { type: "string" | "boolean"; short?: string }> = { help: { type: "boolean", short: "h" } };
  for (const name of valued) options[name] = { type: "string" };
  for (const name of booleans) options[name] = { type: "boolean" };
  const { tokens } = nodeParseArgs({ args: [...args], options, strict: false, allowPositionals: true, tokens: true });
  const positional: string[] = [];
  const flags = new Map<string, string | true>();
  const seen = new Set<number>();
  const unknown = (raw: string, name: string): UsageError => {
    const near = nearestName(name, [...valued, ...booleans]);
    return new UsageError(`unknown option ${raw}${near === null ? "" : ` (did you mean --${near}?)`}`);
  };
  for (const token of tokens) {
    if (token.kind === "positional") {
      positional.push(token.value);
      continue;
    }
    const raw = args[token.index] as string;
    if (token.kind === "option-terminator") throw unknown(raw, "");
    if (!raw.startsWith("--")) {
      if (raw === "-h") flags.set("help", true);
      // a lone dash word (a negative number, "-x") was a positional: keep it once, as written
      else if (!seen.has(token.index)) positional.push(raw);
      seen.add(token.index);
      continue;
    }
    const name = token.name;
    if (name === "help" && token.value === undefined) {
      flags.set("help", true);
    } else if (valued.includes(name)) {
      const value = token.value;
      if (value === undefined || (!token.inlineValue && value.startsWith("--"))) throw new UsageError(`option --${name} needs a value`);
      flags.set(name, value);
    } else if (booleans.includes(name) && token.value === undefined) {
      flags.set(name, true);
    } else {
      throw unknown(raw, name);
    }
  }
  return { positional, flags };
}

export function splitList(text: string): (number | string)[] {
  return text
    .split(",")
    .map((s) => s.trim())
    .filter((s) => s !== "")
    .map((s) => (/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/u.test(s) ? Number(s) : s));
}

/** The value of `--workers`, or undefined. */
export function workersOption(parsed: Parsed): number | undefined {
  const text = parsed.flags.get("workers");
  if (typeof text !== "string") return undefined;
  const n = Number(text);
  if (!/^\d+$/u.test(text.trim()) || !Number.isInteger(n) || n > 256) throw new UsageError(`--workers must be an integer from 0 to 256, got ${text}`);
  return n;
}

/** The value of `--shard I/N`, or undefined. */
export function shardOption(parsed: Parsed): HeaterShard | undefined {
  const text = parsed.flags.get("shard");
  if (typeof text !== "string") return undefined;
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/u.exec(text);
  const index = Number(m?.[1]);
  const count = Number(m?.[2]);
  if (m === null || !(count >= 1 && count <= 1e6 && index >= 1 && index <= count)) throw new UsageError(`--shard must be I/N with 1 <= I <= N (e.g. 2/8), got ${text}`);
  return { index, count };
}

/** The one study file a command takes; UsageError otherwise. */
export function single(parsed: Parsed, command: string): string {
  if (parsed.positional.length !== 1) throw new UsageError(`${command} takes exactly one study file, got ${parsed.positional.length}`);
  return parsed.positional[0] as string;
}
