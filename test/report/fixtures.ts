import { readFileSync } from "node:fs";
import { parseSpec } from "../../src/engine/parseSpec.ts";
import type { Spec } from "../../src/engine/types.ts";
import type { ReportWorkspace } from "../../src/report/types.ts";

export const DEMO_SPEC_FILE = "sample-parts/demo-spec.json";
export const DEMO_PARTS_FILE = "sample-parts/demo-parts.csv";
export const DEMO_NAME = "Demo: 12 V to 3.3 V point-of-load buck";
/** Three passing parts of the demo catalog, of three makers and both saturation characters. */
export const DEMO_SHORTLIST = ["HV-DRS12060-6U8", "QC-PIR6035-6U8", "BF-MCX7040-6U8"];
export const FIXED_TIME = "2026-03-01T09:30:00.000Z";

export function demoSpec(): Spec {
  const parsed = parseSpec(JSON.parse(readFileSync(DEMO_SPEC_FILE, "utf8")));
  if (!parsed.ok) throw new Error("demo spec invalid");
  return parsed.spec;
}

/** The demo as the browser holds it after loading the sample catalog and shortlisting three parts. */
export function demoWorkspace(shortlist: string[] = DEMO_SHORTLIST): ReportWorkspace {
  return {
    name: DEMO_NAME,
    notes: "",
    spec: demoSpec(),
    lists: [{ id: "demo-parts", name: "demo-parts.csv", text: readFileSync(DEMO_PARTS_FILE, "utf8"), mapping: [], seriesSaturation: {}, addedAt: "2026-01-01T00:00:00.000Z" }],
    shortlist,
  };
}

export const HOSTILE_PN = "<img src=x onerror=alert(1)>";

/** A list whose every text cell tries to become markup; one row is broken on purpose to be rejected. */
export const HOSTILE_LIST = [
  "Part Number,Maker,Series,Material,Inductance (uH),Tolerance (%),DCR max (mOhm),Isat (A),Irms (A),SRF (MHz),Length (mm),Width (mm),Height (mm)",
  `${HOSTILE_PN},<script>alert('maker')</script>,"S""><b>x</b>","Ferrite ""><svg onload=alert(2)>",6.8,20,20,8,6,40,10,10,5`,
  `SAFE-6U8,Plain & Co,PL,ferrite,6.8,20,25,7,5,40,8,8,4`,
  `"<iframe src=javascript:alert(3)>",Evil,EV,powder,not-a-number,20,25,7,5,40,8,8,4`,
].join("\n");

export function hostileWorkspace(): ReportWorkspace {
  return {
    name: "<h1>Design</h1> & \"quotes\"",
    notes: "</p><script>alert('notes')</script>",
    spec: demoSpec(),
    lists: [{ id: "evil", name: "<b>evil</b>.csv", text: HOSTILE_LIST, mapping: [], seriesSaturation: { '<i>S"><b>x</b></i>': "soft" }, addedAt: "2026-01-01T00:00:00.000Z" }],
    shortlist: [HOSTILE_PN, "SAFE-6U8"],
  };
}

/** The report with its one timestamp blanked, for comparing two runs made at different times. */
export function withoutTimestamp(html: string): string {
  return html.replace(/<time class="generated" datetime="[^"]*">[^<]*<\/time>/, '<time class="generated"></time>');
}
