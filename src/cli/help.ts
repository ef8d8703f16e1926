/**
 * The help texts of the command line: the overview and one page per command.
 *
 * @packageDocumentation
 */
import { MERGE_HELP } from "./merge.js";

/** The shipped example study files (`fluxwright new FILE --example NAME`). */
export const EXAMPLES = ["bearing-race", "forging-bar", "plate-warmer"] as const;

export const MAIN_HELP = `usage: fluxwright <command> [options]

Induction-heater design studies from a JSON study file.

commands:
  study FILE [--json] [--html OUT]      run a study: text report, JSON, or an HTML report with plots
  sweep FILE --field PATH --values LIST  vary one field of the study file over values
  merge SHARD...                         combine the NDJSON outputs of a sweep's shards
  optimise FILE --power W | --time S     search turns, capacitance and frequency for a goal
  new FILE [--example NAME]              write a starter study file to edit
  help [COMMAND]                         show help for a command

options:
  -h, --help      show help
  -V, --version   print the version

FILE may be - for standard input. Study files are JSON; every quantity with a dimension is text
with its unit ("32 mm", "1.25 in", "4.7 µF", "850 °C"). The package ships their JSON Schema
(docs/heater-study.schema.json) and examples (docs/examples/study-*.json); "fluxwright new"
writes one to start from.
Exit status: 0 success, 1 unexpected failure, 2 bad usage or bad study file, 3 valid file but
the design cannot run, 4 an output could not be written, 130 interrupted (Ctrl-C).
`;

export const HELP: Record<string, string> = {
  study: `usage: fluxwright study FILE [--json] [--html OUT] [--model field] [--quiet]

Runs the heater study in FILE (JSON, or - for standard input; quantities as text with units
such as "30 mm") and prints a text report: cautions first, the design, operating points
empty / cold / at target, where the power goes, the heat-up and the validity notes.

options:
  --json        print the full study result as JSON instead of the text report (it carries
                the study file as "input", so it can be read back as FILE)
  --html OUT    also write a self-contained HTML report with plots to OUT (never over FILE;
                written to a temporary file and renamed, so a failure keeps the old OUT)
  --model M     "closed-form" (default, fast) or "field": the coil's impedance and the part's
                coupling from the axisymmetric field solver (seconds per anchor temperature;
                the HTML report then shows the field picture)
  --quiet       with --html: print only the report's path
  -h, --help    show this help

A bad study file exits with status 2 and a message naming the field path; nothing is written.
A valid file whose design cannot run exits with status 3 and says what to change.
`,
  sweep: `usage: fluxwright sweep FILE --field PATH --values LIST [--csv | --json | --ndjson]
                       [--no-heat-up] [--workers N] [--shard I/N] [--quiet]

Varies one field of the study in FILE and prints a table of headline numbers per value.
Rows whose design is invalid or cannot run are kept, with the reason in the last column.

options:
  --field PATH    dotted field path, e.g. coil.turns, capacitor.capacitance, supply.voltage
  --values LIST   comma-separated values, with units where the field has one:
                  "4,5,6" or "2.2 µF,3.3 µF"
  --no-heat-up    skip the heat-up (faster; no time-to-target column)
  --csv           print the table as CSV (SI numbers, one header line), row by row as the
                  designs finish
  --json          print the sweep as JSON
  --ndjson        print one JSON line per design as it finishes (after a header line): the
                  output of a long sweep, and what "fluxwright merge" reads
  --workers N     worker threads (default: one per core from 32 values on; 0 runs on the
                  main thread)
  --shard I/N     run only part I of N of the values (1 <= I <= N; needs --ndjson), for one
                  task of a job array; "fluxwright merge" joins the parts
  --quiet         no progress on standard error
  -h, --help      show this help

Progress goes to standard error: a bar on a terminal, a line every tenth otherwise. Ctrl-C stops
the workers, keeps the rows that finished and says how far the sweep got (exit status 130).
Exits with status 3 when no value gave a design that runs.
`,
  optimise: `usage: fluxwright optimise FILE (--power W | --time S) [limits] [--keep N] [--json]
                       [--workers N] [--shard I/N] [--quiet]

Searches turns, capacitance (E12 values) and, for fixed-frequency series inverters, the
switching frequency around the design in FILE for the closest match to a part power or a
heat-up time, within limits. Prints the best designs and why the others failed.

options:
  --power W              target power into the cold part, e.g. "1.5 kW"
  --time S               target heat-up time, e.g. "90 s"
  --turns LIST           turn counts to try, e.g. "4,5,6,7,8" (default: half to twice the file's)
  --min-capacitance C    smallest capacitance (default a quarter of the file's)
  --max-capacitance C    largest capacitance (default four times the file's)
  --series E12|E24       capacitance series (default E12)
  --max-tank-voltage V   peak tank voltage limit
  --max-coil-current A   RMS coil current limit
  --max-supply-current A supply current limit
  --min-frequency F      lowest operating frequency (e.g. 20 kHz, above hearing)
  --max-frequency F      highest operating frequency
  --keep N               designs to report (default 5)
  --json                 print the result as JSON
  --workers N            worker threads (default one per core; 0 runs on the main thread)
  --shard I/N            run only part I of N of the searched coils (needs --json) and print
                         that part's output on one line; "fluxwright merge" of all N parts
                         prints what one run prints with --json
  --quiet                no progress on standard error
  -h, --help             show this help

Progress goes to standard error. Ctrl-C stops the search and says how far it got (exit status
130; a search ranks its candidates at the end, so nothing is printed).
`,
  new: `usage: fluxwright new FILE [--example NAME]

Writes a starter study file to FILE (never over an existing file) to edit and run with
"fluxwright study FILE". NAME is one of: ${EXAMPLES.join(", ")} (default bearing-race).
Its "$schema" names the published JSON Schema, so editors can check it wherever it is copied.
`,
  merge: MERGE_HELP,
};
