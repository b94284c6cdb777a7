import { parseArgs } from "node:util";
import { CliError } from "./cliError.ts";
import { parseCommand } from "./commands/parseCommand.ts";
import { rankCommand } from "./commands/rankCommand.ts";
import { waveformCommand } from "./commands/waveformCommand.ts";
import { reportCommand } from "./commands/reportCommand.ts";

const USAGE = `usage: npm run --silent cli -- <command> [options]
  parse <parts.csv|tsv> [--map "Header=quantity:unit"]… [--json]
  rank (--spec <spec.json> --parts <file> [--parts <file>]… | --project <project.json>) [--json | --csv]
  waveform --spec <spec.json> --parts <file> --part <part number> [--vin V] [--iout A] [--inductance min|nom|max] [--json]
  report (--spec <spec.json> --parts <file>… --shortlist <pn,pn,…> | --project <project.json> [--shortlist <pn,…>])
         --out <report.html> [--name <design name>] [--generated-at <ISO time>]`;

const OPTIONS = {
  json: { type: "boolean" },
  spec: { type: "string" },
  parts: { type: "string", multiple: true },
  part: { type: "string" },
  vin: { type: "string" },
  iout: { type: "string" },
  inductance: { type: "string" },
  map: { type: "string", multiple: true },
  shortlist: { type: "string" },
  out: { type: "string" },
  csv: { type: "boolean" },
  project: { type: "string" },
  name: { type: "string" },
  "generated-at": { type: "string" },
  help: { type: "boolean", short: "h" },
} as const;

export type CliOptions = ReturnType<typeof parseArgs<{ options: typeof OPTIONS; allowPositionals: true }>>["values"];

/** Runs one CLI invocation; returns the exit code. Output goes to the given writers. */
export function runCli(argv: string[], out: (text: string) => void, err: (text: string) => void): number {
  try {
    let parsed;
    try {
      parsed = parseArgs({ args: argv, options: OPTIONS, allowPositionals: true, strict: true });
    } catch (error) {
      throw new CliError((error as Error).message);
    }
    const [command, ...rest] = parsed.positionals;
    if (parsed.values.help || command === undefined) {
      (command === undefined && !parsed.values.help ? err : out)(USAGE);
      return command === undefined && !parsed.values.help ? 2 : 0;
    }
    switch (command) {
      case "parse":
        out(parseCommand(rest, parsed.values));
        return 0;
      case "rank":
        out(rankCommand(rest, parsed.values));
        return 0;
      case "waveform":
        out(waveformCommand(rest, parsed.values));
        return 0;
      case "report":
        out(reportCommand(rest, parsed.values));
        return 0;
      default:
        throw new CliError(`unknown command "${command}" (parse, rank, waveform or report)`);
    }
  } catch (error) {
    if (error instanceof CliError) {
      err(`coilsift: ${error.message}`);
      return 2;
    }
    throw error;
  }
}

const invokedDirectly = process.argv[1] !== undefined && import.meta.url === new URL(`file://${process.argv[1]}`).href;
if (invokedDirectly) {
  // A reader that stops early (`rank --csv | head`) closes the pipe: that is the reader's choice, not an error.
  process.stdout.on("error", (error: NodeJS.ErrnoException) => {
    if (error.code === "EPIPE") process.exit(0);
    throw error;
  });
  process.exitCode = runCli(
    process.argv.slice(2),
    (text) => process.stdout.write(text.endsWith("\n") ? text : `${text}\n`),
    (text) => process.stderr.write(text.endsWith("\n") ? text : `${text}\n`),
  );
}
