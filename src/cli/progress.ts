/**
 * Progress on standard error for long runs: a bar redrawn in place when standard error is a
 * terminal, a plain line every tenth of the run otherwise, nothing when quiet.
 */
import type { HeaterProgress } from "../study/index.js";

/** Seconds as `42 s`, `3 min 05 s` or `2 h 07 min`. */
export function duration(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  if (s < 60) return `${s} s`;
  if (s < 3600) return `${Math.floor(s / 60)} min ${String(s % 60).padStart(2, "0")} s`;
  return `${Math.floor(s / 3600)} h ${String(Math.floor((s % 3600) / 60)).padStart(2, "0")} min`;
}

/** Where progress goes. */
export interface ProgressSink {
  /** Writes raw text to standard error (the bar's carriage returns must reach the terminal). */
  readonly write: (text: string) => void;
  /** Whether standard error is a terminal. */
  readonly terminal: boolean;
  /** Print nothing. */
  readonly quiet: boolean;
}

/** A progress display: `update` for each report, `end` once (clears the bar's line). */
export interface ProgressDisplay {
  readonly update: (p: HeaterProgress) => void;
  readonly end: () => void;
}

/**
 * A progress display for `what` (e.g. "designs"). `plainLine` formats the non-terminal line
 * (the default: `  520 / 1000 designs (52 %), 12 s, about 11 s left`).
 */
export function progressDisplay(sink: ProgressSink, what: string, plainLine?: (p: HeaterProgress) => string | null): ProgressDisplay {
  if (sink.quiet) return { update: () => undefined, end: () => undefined };
  const left = (p: HeaterProgress): string => (p.eta === null ? "" : p.done >= p.total ? "" : `, about ${duration(p.eta)} left`);
  if (!sink.terminal) {
    let nextTenth = 1;
    return {
      update: (p) => {
        if (p.total <= 0 || (10 * p.done) / p.total < nextTenth) return;
        nextTenth = Math.floor((10 * p.done) / p.total) + 1;
        const line = plainLine === undefined ? `  ${p.done} / ${p.total} ${what} (${Math.round((100 * p.done) / p.total)} %), ${duration(p.elapsed)}${left(p)}\n` : plainLine(p);
        if (line !== null) sink.write(line);
      },
      end: () => undefined,
    };
  }
  let drawn = false;
  let last = 0;
  return {
    update: (p) => {
      const now = Date.now();
      if (p.done < p.total && now - last < 100) return;
      last = now;
      const width = 24;
      const fraction = p.total > 0 ? Math.min(1, p.done / p.total) : 1;
      const full = Math.round(fraction * width);
      const bar = `[${"#".repeat(full)}${"-".repeat(width - full)}]`;
      sink.write(`\r${bar} ${String(Math.round(fraction * 100)).padStart(3)} %  ${p.done}/${p.total} ${what}  ${duration(p.elapsed)}${left(p)}\u001b[K`);
      drawn = true;
    },
    end: () => {
      if (drawn) sink.write("\r\u001b[K");
      drawn = false;
    },
  };
}
