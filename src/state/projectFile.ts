import type { z } from "zod";
import { parseSpec } from "../engine/parseSpec.ts";
import type { Workspace } from "./workspace.ts";
import { PROJECT_FORMAT, PROJECT_VERSION, projectV1 } from "./projectFileSchema.ts";
import { migrateV0, projectV0 } from "./projectFileMigrations.ts";

export { PROJECT_FORMAT, PROJECT_VERSION } from "./projectFileSchema.ts";

export type OpenedProject = { ok: true; workspace: Workspace; migratedFrom?: number } | { ok: false; error: string };

/** Problems named in a message; the rest are counted. */
const ISSUES_SHOWN = 3;

/** The value at a path of the parsed file, undefined when the path leads nowhere. */
function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let at = root;
  for (const key of path) {
    if (typeof at !== "object" || at === null || !Object.hasOwn(at, key)) return undefined;
    at = (at as Record<PropertyKey, unknown>)[key];
  }
  return at;
}

/** "path: problem" for the first few issues; a key that is absent reads "missing" rather than a type complaint. */
function describeIssues(issues: readonly z.core.$ZodIssue[], root: unknown): string {
  const lines = issues.slice(0, ISSUES_SHOWN).map((issue) => {
    const path = issue.path.map(String).join(".") || "(file)";
    if (issue.code === "unrecognized_keys") return `${path}: unknown ${issue.keys.length === 1 ? "key" : "keys"} ${issue.keys.map((k) => `"${k}"`).join(", ")}`;
    if (valueAt(root, issue.path) === undefined && issue.path.length > 0) return `${path}: missing`;
    return `${path}: ${issue.message}`;
  });
  const more = issues.length > ISSUES_SHOWN ? `; and ${issues.length - ISSUES_SHOWN} more` : "";
  return lines.join("; ") + more;
}

const damaged = (detail: string): OpenedProject => ({ ok: false, error: `damaged project file: ${detail}` });

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === "object" && value !== null && !Array.isArray(value);
}

/** Validates a current-version file; the workspace keeps every value exactly as written. */
function readV1(file: unknown): OpenedProject {
  const parsed = projectV1.safeParse(file);
  if (!parsed.success) return damaged(describeIssues(parsed.error.issues, file));
  const workspace = parsed.data.workspace;
  const spec = parseSpec(workspace.spec);
  if (!spec.ok) return damaged(spec.errors.slice(0, ISSUES_SHOWN).map((e) => `workspace.spec.${e.key}: ${e.message}`).join("; "));
  return { ok: true, workspace };
}

/**
 * Opens a project file. Never throws: a file that is not JSON, not ours, from a newer Coilsift or
 * damaged gives { ok: false, error } with a message saying which, and the caller's workspace is
 * left as it was; an older version is migrated and says from which version.
 */
export function openProject(text: string): OpenedProject {
  try {
    if (typeof text !== "string") return { ok: false, error: "not a Coilsift project file: expected the file's text" };
    let file: unknown;
    try {
      file = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
    } catch (error) {
      return { ok: false, error: `not a Coilsift project file: the file is not JSON (${(error as Error).message})` };
    }
    if (!isRecord(file)) return { ok: false, error: `not a Coilsift project file: expected a JSON object with "format": "${PROJECT_FORMAT}"` };
    if (!("format" in file)) return { ok: false, error: `not a Coilsift project file: it has no "format": "${PROJECT_FORMAT}" field` };
    if (file.format !== PROJECT_FORMAT) {
      const shown = typeof file.format === "string" ? `"${file.format.slice(0, 60)}"` : JSON.stringify(file.format)?.slice(0, 60);
      return { ok: false, error: `not a Coilsift project file: its format is ${shown}, not "${PROJECT_FORMAT}"` };
    }
    const version = file.version;
    if (typeof version !== "number" || !Number.isInteger(version) || version < 0) {
      return damaged(`"version" must be a whole number from 0 to ${PROJECT_VERSION}, got ${JSON.stringify(version)?.slice(0, 40) ?? "nothing"}`);
    }
    if (version > PROJECT_VERSION) {
      return {
        ok: false,
        error: `this project was saved by a newer Coilsift (project format version ${version}); this version opens versions 0 to ${PROJECT_VERSION}. Open it with a newer Coilsift.`,
      };
    }
    if (version === 0) {
      const old = projectV0.safeParse(file);
      if (!old.success) return damaged(`(version 0) ${describeIssues(old.error.issues, file)}`);
      const migrated = migrateV0(old.data);
      if (!migrated.ok) return damaged(`(version 0) ${migrated.error}`);
      const opened = readV1(migrated.file);
      return opened.ok ? { ...opened, migratedFrom: 0 } : opened;
    }
    return readV1(file);
  } catch (error) {
    // Nothing above should throw; if a JavaScript engine limit does (say, nesting too deep), the file is still refused cleanly.
    return damaged(`could not be read (${error instanceof Error ? error.message : String(error)})`);
  }
}

/**
 * The whole workspace in Coilsift's own versioned JSON format. Checked on the way out as it will
 * be on the way in: a workspace that could not be reopened throws a RangeError naming the field
 * rather than writing a file that would be refused later.
 */
export function saveProject(workspace: Workspace): string {
  const file = { format: PROJECT_FORMAT, version: PROJECT_VERSION, workspace };
  const text = `${JSON.stringify(file, null, 2)}\n`;
  const check = readV1(JSON.parse(text));
  if (!check.ok) throw new RangeError(`cannot save the project: ${check.error.replace(/^damaged project file: /, "")}`);
  return text;
}
