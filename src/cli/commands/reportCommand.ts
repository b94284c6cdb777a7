import type { CliOptions } from "../main.ts";
import { CliError } from "../cliError.ts";

/** `report`: the selection report arrives with the report module; until then it says so. */
export function reportCommand(_args: string[], _options: CliOptions): string {
  throw new CliError("report: not yet available (the selection report is still being built)");
}
