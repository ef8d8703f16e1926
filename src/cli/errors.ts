/** The command line's own error kinds, each with its exit status (see commands.ts). */

/** A usage error (exit 2). */
export class UsageError extends Error {}

/** An output that could not be written (exit 4). */
export class OutputError extends Error {}
