/**
 * The worker script of the pool (`dist/study/heater-worker.js`): runs batches of sweep or
 * search items for `sweepHeater`/`optimiseHeater` with `workers ≥ 1`. It works as a
 * `node:worker_threads` worker and as a module Web Worker. Not imported by the library: the
 * pool loads it by URL.
 *
 * @packageDocumentation
 */
import { HEATER_TASKS } from "./heater-tasks.js";
import { errorMessage } from "./worker-pool.js";
import type { FromWorker, TaskRunner, ToWorker } from "./worker-pool.js";

interface Port {
  post(message: FromWorker): void;
  listen(handler: (message: ToWorker) => void): void;
}

async function port(): Promise<Port> {
  const g = globalThis as unknown as {
    WorkerGlobalScope?: unknown;
    postMessage(m: unknown): void;
    addEventListener(type: "message", f: (e: { data: unknown }) => void): void;
  };
  if (g.WorkerGlobalScope !== undefined) {
    return { post: (m) => { g.postMessage(m); }, listen: (h) => { g.addEventListener("message", (e) => { h(e.data as ToWorker); }); } };
  }
  const name = "node:worker_threads";
  const { parentPort } = (await import(/* @vite-ignore */ /* webpackIgnore: true */ name)) as {
    parentPort: { postMessage(m: unknown): void; on(type: "message", f: (m: unknown) => void): void } | null;
  };
  if (parentPort === null) throw new Error("heater-worker: not started as a worker");
  return { post: (m) => { parentPort.postMessage(m); }, listen: (h) => { parentPort.on("message", (m) => { h(m as ToWorker); }); } };
}

const p = await port();
let runner: TaskRunner | undefined;
let context: unknown;
p.listen((message) => {
  if (message.type === "job") {
    runner = HEATER_TASKS[message.kind];
    context = message.context;
    return;
  }
  try {
    if (runner === undefined) throw new Error("heater-worker: a batch arrived before its job");
    p.post({ type: "done", id: message.id, results: runner(context, message.items) });
  } catch (e) {
    p.post(errorMessage(message.id, e));
  }
});
