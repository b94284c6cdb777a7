import { readFileSync } from "node:fs";
import type { Spec } from "../engine/types.ts";
import { parseSpec } from "../engine/parseSpec.ts";
import { CliError } from "./cliError.ts";

/** Reads and validates a spec file; every problem is reported with the file and the key. */
export function readSpec(file: string): Spec {
  let text: string;
  try {
    text = readFileSync(file, "utf8");
  } catch (error) {
    throw new CliError(`${file}: cannot read the spec file (${(error as NodeJS.ErrnoException).code ?? String(error)})`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    throw new CliError(`${file}: not valid JSON (${(error as Error).message})`);
  }
  const parsed = parseSpec(json);
  if (!parsed.ok) throw new CliError(`${file}: ${parsed.errors.map((e) => `${e.key}: ${e.message}`).join("; ")}`);
  return parsed.spec;
}
