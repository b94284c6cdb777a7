import { describe, expectTypeOf, it } from "vitest";
import type { Workspace } from "../../src/state/workspace.ts";
import type { ReportWorkspace } from "../../src/report/types.ts";

describe("ReportWorkspace", () => {
  it("a state Workspace is accepted wherever the report wants a ReportWorkspace", () => {
    expectTypeOf<Workspace>().toExtend<ReportWorkspace>();
  });
});
