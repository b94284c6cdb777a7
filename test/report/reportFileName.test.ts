import { describe, expect, it } from "vitest";
import { reportFileName } from "../../src/report/reportFileName.ts";

describe("reportFileName", () => {
  it("reportFileName(design, time) reduces the design to safe ASCII and appends the UTC date", () => {
    expect(reportFileName("Demo: 12 V to 3.3 V point-of-load buck", "2026-03-01T09:30:00.000Z")).toBe(
      "coilsift-report-demo-12-v-to-3-3-v-point-of-load-buck-2026-03-01.html",
    );
    expect(reportFileName("Régulateur «5 V»", "2026-03-01T00:00:00.000Z")).toBe("coilsift-report-regulateur-5-v-2026-03-01.html");
    expect(reportFileName("<>/\\", "2026-03-01T00:00:00.000Z")).toBe("coilsift-report-design-2026-03-01.html");
  });
});
