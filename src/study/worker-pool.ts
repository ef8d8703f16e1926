/**
 * The worker pool behind the `workers` option of {@link sweepHeater} and
 * {@link optimiseHeater}: contiguous batches of items run on `node:worker_threads` workers in
 * Node or module Web Workers in browsers (and Deno, Bun), or on the calling thread
 * (`workers: 0`); results come back in item order, with a bounded number of items in flight.
 *
 * Every item is computed by the same function whatever the number of workers, from the same
 * inputs (numbers cross the thread boundary by structured clone, which keeps every bit), so the
 * results are identical for any pool size.
 *
 * Size: options, messages, worker start-up for Node and browsers, and the two run loops of one
 * pool; each a short function.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys } from "../core/index.js";

/**
 * Progress of a pooled sweep or search, passed to `onProgress`.
 *
 * @category Heater study
 */
export interface HeaterProgress {
  /** Designs finished so far. */
  readonly done: number;
  /** Designs in the run (in this shard, for a sharded sweep). */
  readonly total: number;
  /** Time since the run started [s]. */
  readonly elapsed: number;
  /** Estimated time to finish [s] at the rate so far; `null` before the first design finishes. */
  readonly eta: number | null;
}

/**
 * How a sweep or a search runs: on how many workers, with what progress callback, and whether
 * it can be cancelled. None of these change the result.
 *
 * @category Heater study
 */
export interface HeaterPoolOptions {
  /**
   * Worker threads to run on: an integer 0 … 256. `0` runs on the calling thread but still
   * asynchronously (progress and cancellation work, the thread yields between designs); in Node
   * the machine's core count is `os.availableParallelism()`, in a browser
   * `navigator.hardwareConcurrency`.
   */
  readonly workers: number;
  /** Called after each finished batch (at most about 20 times a second). */
  readonly onProgress?: (progress: HeaterProgress) => void;
  /**
   * Cancels the run: the workers are stopped at once, what finished in order has been delivered
   * (by the streaming form), and the promise or iterator rejects with the signal's reason.
   */
  readonly signal?: AbortSignal;
  /**
   * Where the worker script is (the package subpath `fluxwright/worker`, the file
   * `dist/study/heater-worker.js`). In Node the default finds it in the installed package; in a
   * browser give the URL at which that file is served: with Vite,
   * `import workerUrl from "fluxwright/worker?url"`; where `import.meta.resolve` knows the
   * package (Deno, an import map), `import.meta.resolve("fluxwright/worker")`; otherwise copy
   * the file (it is self-contained) to your static assets and give its URL.
   */
  readonly workerUrl?: string | URL;
}

/** The option keys of {@link HeaterPoolOptions}. */
export const POOL_KEYS = ["workers", "onProgress", "signal", "workerUrl"] as const;

/** The pool options checked, with defaults. */
export interface CheckedPoolOptions {
  readonly workers: number;
  readonly onProgress: ((progress: HeaterProgress) => void) | undefined;
  readonly signal: AbortSignal | undefined;
  readonly workerUrl: string | URL | undefined;
}

/**
 * Checks pool options (unknown keys are refused, naming `where` and `path`).
 *
 * @throws {@link InputError} for a bad or unknown option
 */
export function checkPoolOptions(where: string, options: HeaterPoolOptions, extraKeys: readonly string[] = []): CheckedPoolOptions {
  if (typeof options !== "object" || options === null || Array.isArray(options)) throw new InputError(where, "options", options, "", "an object");
  requireKnownKeys(where, "options", options, [...POOL_KEYS, ...extraKeys]);
  const { workers, onProgress, signal, workerUrl } = options;
  if (typeof workers !== "number" || !Number.isInteger(workers) || workers < 0 || workers > 256) {
    throw new InputError(where, "options.workers", workers, "", "an integer in [0, 256]");
  }
  if (onProgress !== undefined && typeof onProgress !== "function") throw new InputError(where, "options.onProgress", onProgress, "", "a function");
  if (signal !== undefined && (typeof signal !== "object" || signal === null || typeof (signal as { aborted?: unknown }).aborted !== "boolean")) {
    throw new InputError(where, "options.signal", signal, "", "an AbortSignal");
  }
  if (workerUrl !== undefined && typeof workerUrl !== "string" && !(workerUrl instanceof URL)) {
    throw new InputError(where, "options.workerUrl", workerUrl, "", "a URL or a path");
  }
  return { workers, onProgress, signal, workerUrl };
}

/** A job: which task runner and its context (sent once to each worker). */
export interface PoolJob {
  readonly kind: string;
  readonly context: unknown;
}

/** What a task runner does with a batch of items: one result per item, in order. */
export type TaskRunner = (context: unknown, items: readonly unknown[]) => unknown[];

/** Messages to a worker. */
export type ToWorker = { readonly type: "job"; readonly kind: string; readonly context: unknown } | { readonly type: "run"; readonly id: number; readonly items: readonly unknown[] };

/** Messages from a worker. */
export type FromWorker =
  | { readonly type: "done"; readonly id: number; readonly results: unknown[] }
  | { readonly type: "error"; readonly id: number; readonly error: { readonly name: string; readonly message: string; readonly stack?: string | undefined; readonly fields?: readonly [string, string, unknown, string, string] } };

/** Turns an error into a message a worker can post. */
export function errorMessage(id: number, e: unknown): FromWorker {
  if (e instanceof InputError) {
    return { type: "error", id, error: { name: "InputError", message: e.message, stack: e.stack, fields: [e.where, e.parameter, e.value, e.unit, e.expected] } };
  }
  const error = e instanceof Error ? e : new Error(String(e));
  return { type: "error", id, error: { name: error.name, message: error.message, stack: error.stack } };
}

/** The error a worker reported, rebuilt on this side. */
function rebuildError(error: Extract<FromWorker, { type: "error" }>["error"]): Error {
  if (error.name === "InputError" && error.fields !== undefined) {
    const [where, parameter, value, unit, expected] = error.fields;
    return new InputError(where, parameter, value, unit, expected);
  }
  const e = new Error(`${error.name} in a worker: ${error.message}`);
  if (error.stack !== undefined) e.stack = error.stack;
  return e;
}

/** One worker, whatever the platform. */
interface WorkerHandle {
  post(message: ToWorker): void;
  terminate(): void;
}

interface NodeWorkerLike {
  postMessage(m: unknown): void;
  on(event: "message" | "error" | "exit", f: (x: never) => void): void;
  terminate(): Promise<number>;
}
interface NodeWorkerModule {
  Worker: new (url: URL | string, options?: { eval?: boolean; workerData?: unknown }) => NodeWorkerLike;
}
interface WebWorkerLike {
  postMessage(m: unknown): void;
  terminate(): void;
  onmessage: ((e: { data: unknown }) => void) | null;
  onerror: ((e: { message?: string; preventDefault?: () => void }) => void) | null;
}

const isNode = (): boolean => typeof (globalThis as { process?: { versions?: { node?: unknown } } }).process?.versions?.node === "string";

/** `import()` of a name that bundlers for browsers must leave alone. */
async function importByName<T>(name: string): Promise<T> {
  return (await import(/* @vite-ignore */ /* webpackIgnore: true */ name)) as T;
}

/** The worker script of the installed package (Node), or of the source tree when run from source. */
async function defaultWorkerUrl(where: string): Promise<URL> {
  const here = import.meta.url;
  if (!isNode()) {
    throw new InputError(where, "options.workerUrl", undefined, "", "the URL at which the worker script fluxwright/worker (dist/study/heater-worker.js) is served, e.g. from Vite's import workerUrl from \"fluxwright/worker?url\" (required outside Node)");
  }
  const { existsSync } = await importByName<{ existsSync: (p: URL) => boolean }>("node:fs");
  // the bundle may have put this code in the study entry (dist/study) or in a shared chunk (dist)
  for (const candidate of ["./heater-worker.js", "./study/heater-worker.js", "../study/heater-worker.js", "./heater-worker.ts"]) {
    const url = new URL(candidate, here);
    if (existsSync(url)) return url;
  }
  throw new InputError(where, "options.workerUrl", undefined, "", "the path of fluxwright's dist/study/heater-worker.js (not found beside the package)");
}

/** Starts one worker and wires its messages and failures. */
async function startWorker(url: URL | string, onMessage: (m: FromWorker) => void, onFailure: (e: Error) => void): Promise<WorkerHandle> {
  const WebWorker = (globalThis as { Worker?: new (url: URL | string, options: { type: "module" }) => WebWorkerLike }).Worker;
  if (!isNode() && WebWorker !== undefined) {
    const w = new WebWorker(url, { type: "module" });
    w.onmessage = (e) => {
      onMessage(e.data as FromWorker);
    };
    w.onerror = (e) => {
      e.preventDefault?.();
      onFailure(new Error(`a worker failed: ${e.message ?? "could not load the worker script"}`));
    };
    return { post: (m) => { w.postMessage(m); }, terminate: () => { w.terminate(); } };
  }
  const { Worker } = await importByName<NodeWorkerModule>("node:worker_threads");
  const href = url instanceof URL ? url.href : url.startsWith("file:") ? url : new URL(url, `file://${(globalThis as unknown as { process: { cwd(): string } }).process.cwd()}/`).href;
  // a TypeScript entry (running from the source tree, in the tests) goes through tsx's loader,
  // found from the entry's own folder (the process may run anywhere)
  let w: NodeWorkerLike;
  if (href.endsWith(".ts")) {
    const api = import.meta.resolve("tsx/esm/api");
    w = new Worker(`import(${JSON.stringify(api)}).then((m) => { m.register(); return import(${JSON.stringify(href)}); });`, { eval: true });
  } else {
    w = new Worker(new URL(href));
  }
  let stopping = false;
  w.on("message", (m: never) => {
    onMessage(m);
  });
  w.on("error", (e: never) => {
    const error: unknown = e;
    onFailure(error instanceof Error ? error : new Error(String(error)));
  });
  w.on("exit", (code: never) => {
    if (!stopping) onFailure(new Error(`a worker stopped unexpectedly (exit code ${String(code)})`));
  });
  return {
    post: (m) => { w.postMessage(m); },
    terminate: () => {
      stopping = true;
      void w.terminate();
    },
  };
}

/** Yields to the event loop (so that abort signals and timers get their turn). */
const yieldToEventLoop = (): Promise<void> =>
  new Promise((resolve) => {
    setTimeout(resolve, 0);
  });

/** Whether the signal has fired (a function, so that the compiler does not assume it cannot change). */
function isAborted(signal: AbortSignal | undefined): boolean {
  return signal?.aborted === true;
}

/** The abort reason as an error to throw. */
function abortError(signal: AbortSignal): unknown {
  const reason: unknown = signal.reason;
  if (reason !== undefined) return reason;
  const e = new Error("the run was cancelled");
  e.name = "AbortError";
  return e;
}

/** Items per batch: a few dozen batches per worker, at most `maxBatch` items each. */
export function batchSize(total: number, workers: number, maxBatch = 32): number {
  return Math.max(1, Math.min(maxBatch, Math.ceil(total / (Math.max(1, workers) * 64))));
}

/**
 * The size of the next batch handed to a worker: `batch`, but near the end of the run no more
 * than the remaining items over twice the workers (down to one item), so that the workers
 * finish together instead of one of them running a last full batch alone.
 */
export function nextBatchSize(remaining: number, batch: number, workers: number): number {
  return Math.max(1, Math.min(batch, Math.ceil(remaining / (2 * Math.max(1, workers)))));
}

/**
 * Runs `items` through the task runner `kind` on a pool and yields the results in item order.
 * At most about `4 × workers` batches are in flight or waiting to be yielded, so memory stays
 * bounded however many items there are and however slowly the consumer reads.
 *
 * @param job - runner kind and its context
 * @param items - the items (any iterable: generated lazily if large)
 * @param total - how many items there are
 * @param local - the runner itself, used when `workers` is 0
 * @param options - pool options (checked)
 * @param where - function name for errors
 * @param weight - designs per item, for progress (default 1)
 */
export async function* runPool(
  job: PoolJob,
  items: Iterable<unknown>,
  total: number,
  local: TaskRunner,
  options: CheckedPoolOptions,
  where: string,
  weight = 1,
): AsyncGenerator<unknown, void, undefined> {
  const report = progressReporter(options.onProgress, total, weight);
  if (isAborted(options.signal)) throw abortError(options.signal as AbortSignal);
  const source = batchSource(items, total, options.workers);
  if (options.workers === 0) yield* runOnCallingThread(job, local, source, total, options.signal, report);
  else yield* runOnWorkers(job, source, total, options, where, report);
}

/** Reports progress after `done` items: at most every 50 ms, always when `force`. */
type ProgressReport = (done: number, force: boolean) => void;

/** The `onProgress` caller of a run of `total` items of `weight` designs each. */
function progressReporter(onProgress: ((progress: HeaterProgress) => void) | undefined, total: number, weight: number): ProgressReport {
  const started = Date.now();
  let lastReport = -Infinity;
  return (done, force) => {
    if (onProgress === undefined) return;
    const now = Date.now();
    if (!force && now - lastReport < 50) return;
    lastReport = now;
    const elapsed = (now - started) / 1000;
    const designs = done * weight;
    const all = total * weight;
    onProgress({ done: designs, total: all, elapsed, eta: designs === 0 ? null : (elapsed / designs) * (all - designs) });
  };
}

/** The items cut into batches: `next()` takes the next batch (empty at the end). */
interface BatchSource {
  /** The full batch size. */
  readonly batch: number;
  next(): unknown[];
}

function batchSource(items: Iterable<unknown>, total: number, workers: number): BatchSource {
  const iterator = items[Symbol.iterator]();
  const batch = batchSize(total, workers);
  let taken = 0;
  return {
    batch,
    next: () => {
      const size = workers === 0 ? batch : nextBatchSize(total - taken, batch, workers);
      const out: unknown[] = [];
      while (out.length < size) {
        const r = iterator.next();
        if (r.done === true) break;
        out.push(r.value);
      }
      taken += out.length;
      return out;
    },
  };
}

/** `workers: 0`: every item on this thread, checking the signal between items and yielding to the event loop at least every 20 ms. */
async function* runOnCallingThread(
  job: PoolJob,
  local: TaskRunner,
  source: BatchSource,
  total: number,
  signal: AbortSignal | undefined,
  report: ProgressReport,
): AsyncGenerator<unknown, void, undefined> {
  let done = 0;
  let lastYield = Date.now();
  for (;;) {
    const chunk = source.next();
    if (chunk.length === 0) break;
    for (const item of chunk) {
      if (isAborted(signal)) throw abortError(signal as AbortSignal);
      const [result] = local(job.context, [item]);
      done++;
      yield result;
      report(done, done === total);
      if (Date.now() - lastYield > 20) {
        await yieldToEventLoop();
        lastYield = Date.now();
      }
    }
  }
  if (isAborted(signal)) throw abortError(signal as AbortSignal);
}

/** The workers of a run and what they have sent back. */
class WorkerCrew {
  /** Results by batch id (the index of the batch's first item), not yet yielded. */
  readonly ready = new Map<number, unknown[]>();
  /** The worker running each batch id. */
  readonly busy = new Map<number, WorkerHandle>();
  readonly idle: WorkerHandle[] = [];
  readonly handles: WorkerHandle[] = [];
  failure: { error: unknown } | null = null;
  private wake: (() => void) | null = null;

  /** Wakes the run's loop if it waits. */
  notify(): void {
    const w = this.wake;
    this.wake = null;
    w?.();
  }

  /** Resolves at the next message, failure or abort. */
  next(): Promise<void> {
    return new Promise<void>((resolve) => {
      this.wake = resolve;
    });
  }

  /** Starts one worker on `job`, idle. */
  async start(url: URL | string, job: PoolJob): Promise<void> {
    let handle: WorkerHandle | null = null;
    const mine = (m: FromWorker): void => {
      if (m.type === "error") {
        this.failure ??= { error: rebuildError(m.error) };
      } else {
        this.ready.set(m.id, m.results);
        this.busy.delete(m.id);
        if (handle !== null) this.idle.push(handle);
      }
      this.notify();
    };
    handle = await startWorker(url, mine, (e) => {
      this.failure ??= { error: e };
      this.notify();
    });
    this.handles.push(handle);
    handle.post({ type: "job", kind: job.kind, context: job.context });
    this.idle.push(handle);
  }

  terminate(): void {
    for (const h of this.handles) h.terminate();
  }
}

/** `workers ≥ 1`: batches handed to idle workers within a window of `4 × workers` batches, results yielded in item order. */
async function* runOnWorkers(
  job: PoolJob,
  source: BatchSource,
  total: number,
  options: CheckedPoolOptions,
  where: string,
  report: ProgressReport,
): AsyncGenerator<unknown, void, undefined> {
  const { signal } = options;
  const url = options.workerUrl ?? (await defaultWorkerUrl(where));
  const workerCount = Math.min(options.workers, Math.max(1, Math.ceil(total / source.batch)));
  const crew = new WorkerCrew();
  const onAbort = (): void => {
    crew.terminate();
    crew.notify();
  };
  signal?.addEventListener("abort", onAbort, { once: true });
  try {
    for (let k = 0; k < workerCount; k++) await crew.start(url, job);
    let done = 0;
    let nextId = 0; // id of a batch = index of its first item
    let nextYield = 0;
    let exhausted = false;
    const window = workerCount * source.batch * 4;
    for (;;) {
      if (isAborted(signal)) throw abortError(signal as AbortSignal);
      if (crew.failure !== null) throw crew.failure.error;
      // hand out batches while workers are idle and the window has room
      while (!exhausted && crew.idle.length > 0 && nextId - nextYield < window) {
        const chunk = source.next();
        if (chunk.length === 0) {
          exhausted = true;
          break;
        }
        const h = crew.idle.pop() as WorkerHandle;
        crew.busy.set(nextId, h);
        h.post({ type: "run", id: nextId, items: chunk });
        nextId += chunk.length;
      }
      // deliver what is ready, in order
      let results = crew.ready.get(nextYield);
      if (results !== undefined) {
        while (results !== undefined) {
          crew.ready.delete(nextYield);
          for (const r of results) {
            if (isAborted(signal)) throw abortError(signal as AbortSignal);
            done++;
            nextYield++;
            yield r;
          }
          report(done, done === total);
          results = crew.ready.get(nextYield);
        }
        continue;
      }
      if (exhausted && crew.busy.size === 0 && crew.ready.size === 0) break;
      await crew.next();
    }
  } finally {
    signal?.removeEventListener("abort", onAbort);
    crew.terminate();
  }
}
