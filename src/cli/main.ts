/**
 * The `fluxwright` command line. Subcommands arrive with the heater study.
 */
import { formatQuantity } from "../units/index.js";

const args = process.argv.slice(2);
if (args.length === 0 || args[0] === "--help" || args[0] === "-h") {
  process.stdout.write("usage: fluxwright <command> [options]\n");
  process.exit(0);
}
process.stderr.write(`fluxwright: unknown command ${JSON.stringify(args[0])} (${formatQuantity(0, "V")})\n`);
process.exit(2);
