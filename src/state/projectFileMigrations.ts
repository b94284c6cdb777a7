import { z } from "zod";
import { parseSpec } from "../engine/parseSpec.ts";
import { mappingV1, PROJECT_FORMAT } from "./projectFileSchema.ts";

/**
 * Version 0, the first project shape: the workspace's fields at the top level, a spec as written
 * in spec files (defaults may be left out), lists without id, series choices or time, and no
 * notes or view. Kept frozen: a migration must read old files the same way forever.
 */
export const projectV0 = z.strictObject({
  format: z.literal(PROJECT_FORMAT),
  version: z.literal(0),
  name: z.string({ error: "must be text" }),
  spec: z.unknown(),
  lists: z.array(z.strictObject({ name: z.string({ error: "must be text" }), text: z.string({ error: "must be text" }), mapping: z.array(mappingV1) })),
  shortlist: z.array(z.string({ error: "must be text" })),
});

/** The view a version-0 project opens on (that shape had none); frozen like the schema. */
const V0_VIEW = {
  screen: "ranking",
  selectedPart: null,
  rankingSort: null,
  rankingFilter: { passOnly: false, text: "", maker: null, material: null },
  cautionsAcknowledged: false,
} as const;

/** Lists of a version-0 file had no time; these keep their order (the later list still wins a duplicate). */
const V0_EPOCH = Date.UTC(2000, 0, 1);

export type Migration = { ok: true; file: unknown } | { ok: false; error: string };

/** Version 0 → 1: wraps the fields in `workspace`, completes the spec and adds what v0 lacked. */
export function migrateV0(data: z.infer<typeof projectV0>): Migration {
  const spec = parseSpec(data.spec);
  if (!spec.ok) return { ok: false, error: spec.errors.map((e) => `spec.${e.key}: ${e.message}`).join("; ") };
  return {
    ok: true,
    file: {
      format: PROJECT_FORMAT,
      version: 1,
      workspace: {
        name: data.name,
        notes: "",
        spec: spec.spec,
        lists: data.lists.map((list, i) => ({
          id: `list-${i + 1}`,
          name: list.name,
          text: list.text,
          mapping: list.mapping,
          seriesSaturation: {},
          addedAt: new Date(V0_EPOCH + i * 1000).toISOString(),
        })),
        shortlist: data.shortlist,
        view: { ...V0_VIEW, rankingFilter: { ...V0_VIEW.rankingFilter } },
      },
    },
  };
}
