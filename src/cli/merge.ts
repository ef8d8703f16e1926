/**
 * `fluxwright merge`: joins the NDJSON outputs of a sweep's shards into the output of the whole
 * sweep, reading each file line by line (constant memory), or the outputs of a search's shards
 * into the output of the whole search.
 */
import { InputError } from "../core/index.js";
import { mergeHeaterOptimisationShards } from "../study/index.js";
import type { HeaterOptimisation, HeaterOptimisationShard, HeaterShard, HeaterSweepRow } from "../study/index.js";
import { optimisationTextReport, sweepCsv } from "../report/index.js";
import type { CliIo } from "./commands.js";
import { UsageError } from "./errors.js";

/** The `format` of the first line of `fluxwright sweep --ndjson`. */
export const SWEEP_ROWS_FORMAT = "fluxwright-sweep-rows";

/** The `format` of the one-line output of `fluxwright optimise --json --shard I/N`. */
export const OPTIMISATION_SHARD_FORMAT = "fluxwright-optimisation-shard";

/** A short fingerprint of the swept values (FNV-1a, 32 bits, of their JSON), so that shards of different sweeps are told apart. */
export function valuesDigest(values: readonly (number | string)[]): string {
  const text = JSON.stringify(values);
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, "0");
}

export const MERGE_HELP = `usage: fluxwright merge SHARD... [--csv | --text]

Joins the NDJSON outputs of "fluxwright sweep --ndjson --shard I/N" (one file per shard, in any
order) into the output of the whole sweep, exactly as one run would have written it: NDJSON, or
CSV with --csv, on standard output. Checks that the files are the N shards of one sweep (same
study file, field, values and heat-up setting), each present once and complete.

Joins the outputs of "fluxwright optimise --json --shard I/N" likewise into what one run of
"fluxwright optimise --json" prints (or its text report with --text).

options:
  --csv         print a merged sweep as CSV instead of NDJSON
  --text        print a merged search as the text report instead of JSON
  -h, --help    show this help

Exits with status 2 when a shard is missing, repeated, incomplete or from another sweep, and 3
when no value gave a design that runs.
`;

/** The header line of a shard. */
interface ShardHeader {
  readonly format: string;
  readonly formatVersion: number;
  readonly fluxwright: string;
  readonly field: string;
  readonly heatUp: boolean;
  readonly total: number;
  readonly valuesDigest: string;
  readonly shard?: HeaterShard;
  readonly range?: readonly [number, number];
  readonly input: unknown;
}

/** The one-line output of a search's shard. */
interface OptimisationShardFile extends HeaterOptimisationShard {
  readonly format: string;
  readonly formatVersion: number;
  readonly fluxwright: string;
  readonly input: unknown;
}

interface ParsedArgs {
  positional: string[];
  flags: Map<string, string | true>;
}

/** Lines of a file: the I/O's line reader, or the whole file split. */
function linesOf(io: CliIo, path: string): AsyncIterator<string> {
  if (io.readLines !== undefined) return io.readLines(path)[Symbol.asyncIterator]();
  return (async function* whole(): AsyncGenerator<string> {
    await Promise.resolve();
    yield* io.readFile(path).split("\n");
  })();
}

const reason = (e: unknown): string => {
  const code = (e as { code?: unknown }).code;
  return typeof code === "string" ? code : e instanceof Error ? e.message : String(e);
};

/** Merges the outputs of a search's shards (first lines already read and parsed). */
function mergeSearch(io: CliIo, shards: readonly { path: string; header: OptimisationShardFile }[], text: boolean): number {
  const ref = (shards[0] as (typeof shards)[number]).header;
  const inputText = JSON.stringify(ref.input);
  for (const s of shards) {
    if (s.header.format !== OPTIMISATION_SHARD_FORMAT) throw new UsageError(`${s.path} is not the output of a sharded search ("fluxwright optimise FILE ... --json --shard I/N")`);
    if (s.header.formatVersion !== ref.formatVersion || JSON.stringify(s.header.input) !== inputText) {
      throw new UsageError(`${s.path} is from another search than ${(shards[0] as (typeof shards)[number]).path} (its ${s.header.formatVersion !== ref.formatVersion ? "format version" : "study file"} differs)`);
    }
  }
  let result: HeaterOptimisation;
  try {
    // the envelope's fields (format, version, input) are checked above; the merge reads the rest
    result = mergeHeaterOptimisationShards(shards.map((s) => s.header));
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    // name the files, not the array positions
    const named = e.message.replace(/shards\[(\d+)\]/gu, (_, k: string) => shards[Number(k)]?.path ?? `shards[${k}]`);
    throw new UsageError(named.replace(/^mergeHeaterOptimisationShards: /u, ""));
  }
  for (const w of result.warnings) io.stderr(`fluxwright merge: warning: ${w}\n`);
  if (text) io.stdout(optimisationTextReport(result));
  else {
    const envelope = { format: "fluxwright-optimisation", formatVersion: ref.formatVersion, fluxwright: ref.fluxwright, input: ref.input, ...result };
    io.stdout(`${JSON.stringify(envelope, null, 2)}\n`);
  }
  return 0;
}

export async function mergeCommand(args: readonly string[], io: CliIo, parse: (args: readonly string[], valued: readonly string[], booleans: readonly string[]) => ParsedArgs): Promise<number> {
  const parsed = parse(args, [], ["csv", "text"]);
  if (parsed.flags.has("help")) {
    io.stdout(MERGE_HELP);
    return 0;
  }
  if (parsed.positional.length === 0) throw new UsageError("merge needs the shard files to join");
  const shards: { path: string; header: ShardHeader; lines: AsyncIterator<string> }[] = [];
  for (const path of parsed.positional) {
    const lines = linesOf(io, path);
    let first: IteratorResult<string>;
    try {
      first = await lines.next();
    } catch (e) {
      throw new UsageError(`cannot read ${path}: ${reason(e)}`);
    }
    let header: ShardHeader | null;
    try {
      header = first.done === true ? null : (JSON.parse(first.value) as ShardHeader);
    } catch {
      header = null;
    }
    if (header?.format === OPTIMISATION_SHARD_FORMAT || (shards.length > 0 && (shards[0] as (typeof shards)[number]).header.format === OPTIMISATION_SHARD_FORMAT)) {
      shards.push({ path, header: header ?? ({} as ShardHeader), lines });
      continue;
    }
    if (header?.format !== SWEEP_ROWS_FORMAT || header.shard === undefined || header.range === undefined) {
      throw new UsageError(`${path} is not the NDJSON output of a sharded sweep ("fluxwright sweep FILE ... --ndjson --shard I/N")`);
    }
    shards.push({ path, header, lines });
  }
  if ((shards[0] as (typeof shards)[number]).header.format === OPTIMISATION_SHARD_FORMAT) {
    if (parsed.flags.has("csv")) throw new UsageError("--csv is for sweeps; a merged search prints JSON, or its text report with --text");
    return mergeSearch(io, shards as unknown as { path: string; header: OptimisationShardFile }[], parsed.flags.has("text"));
  }
  if (parsed.flags.has("text")) throw new UsageError("--text is for searches; a merged sweep prints NDJSON, or CSV with --csv");
  const ref = (shards[0] as (typeof shards)[number]).header;
  const refPath = (shards[0] as (typeof shards)[number]).path;
  const count = (ref.shard as HeaterShard).count;
  const inputText = JSON.stringify(ref.input);
  for (const s of shards) {
    const h = s.header;
    const differs =
      h.formatVersion !== ref.formatVersion ? "format version"
      : h.field !== ref.field ? "swept field"
      : h.total !== ref.total || h.valuesDigest !== ref.valuesDigest ? "values"
      : h.heatUp !== ref.heatUp ? "heat-up setting"
      : (h.shard as HeaterShard).count !== count ? "shard count"
      : JSON.stringify(h.input) !== inputText ? "study file"
      : null;
    if (differs !== null) throw new UsageError(`${s.path} is from another sweep than ${refPath} (its ${differs} differs)`);
  }
  const byIndex = new Map<number, (typeof shards)[number]>();
  for (const s of shards) {
    const i = (s.header.shard as HeaterShard).index;
    const other = byIndex.get(i);
    if (other !== undefined) throw new UsageError(`${other.path} and ${s.path} are both shard ${i}/${count}`);
    byIndex.set(i, s);
  }
  const missing = Array.from({ length: count }, (_, k) => k + 1).filter((i) => !byIndex.has(i));
  if (missing.length > 0) throw new UsageError(`shard${missing.length === 1 ? "" : "s"} ${missing.join(", ")} of ${count} missing (got ${shards.length} file${shards.length === 1 ? "" : "s"})`);
  const csv = parsed.flags.has("csv");
  const csvHeader = sweepCsv({ field: ref.field, rows: [] }, ref.heatUp);
  if (csv) io.stdout(csvHeader);
  else {
    const head = { format: ref.format, formatVersion: ref.formatVersion, fluxwright: ref.fluxwright, field: ref.field, heatUp: ref.heatUp, total: ref.total, valuesDigest: ref.valuesDigest, input: ref.input };
    io.stdout(`${JSON.stringify(head)}\n`);
  }
  let next = 0;
  let runs = 0;
  for (let i = 1; i <= count; i++) {
    const s = byIndex.get(i) as (typeof shards)[number];
    const [start, end] = s.header.range as readonly [number, number];
    let lineNumber = 1;
    for (;;) {
      let r: IteratorResult<string>;
      try {
        r = await s.lines.next();
      } catch (e) {
        throw new UsageError(`cannot read ${s.path}: ${reason(e)}`);
      }
      if (r.done === true) break;
      lineNumber++;
      if (r.value.trim() === "") continue;
      let row: HeaterSweepRow & { index: number };
      try {
        row = JSON.parse(r.value) as HeaterSweepRow & { index: number };
      } catch {
        throw new UsageError(`${s.path}:${lineNumber}: not a JSON line (a truncated file?)`);
      }
      if (row.index !== next || next >= end) throw new UsageError(`${s.path}:${lineNumber}: row ${String(row.index)} where row ${next} was expected`);
      next++;
      if (row.summary !== null) runs++;
      if (csv) io.stdout(sweepCsv({ field: ref.field, rows: [row] }, ref.heatUp).slice(csvHeader.length));
      else io.stdout(`${r.value.trim()}\n`);
    }
    if (next !== end) throw new UsageError(`${s.path}: shard ${i}/${count} stops after ${next - start} of its ${end - start} rows (an interrupted run? run that shard again)`);
  }
  if (runs === 0) {
    io.stderr(`fluxwright merge: no value of ${ref.field} gave a design that runs\n`);
    return 3;
  }
  return 0;
}
