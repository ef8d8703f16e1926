/**
 * The task runners of the worker pool, by kind: the same functions run on a worker and on the
 * calling thread, so results do not depend on where they ran.
 *
 * @packageDocumentation
 */
import type { TaskRunner } from "./worker-pool.js";
import { sweepTask } from "./sweep-heater.js";
import { optimiseTask } from "./optimize-heater.js";

/** Task runners by job kind. */
export const HEATER_TASKS: Readonly<Record<string, TaskRunner>> = {
  sweep: sweepTask,
  optimise: optimiseTask,
};
