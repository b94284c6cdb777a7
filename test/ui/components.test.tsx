import { describe, expect, it } from "vitest";
import { renderToStaticMarkup } from "react-dom/server";
import { evaluatePart } from "../../src/engine/evaluatePart.ts";
import { CheckMark, StatusMark } from "../../src/ui/common/StatusMark.tsx";
import { CompareTable } from "../../src/ui/compare/CompareTable.tsx";
import { CheckList } from "../../src/ui/detail/CheckList.tsx";
import { demoSpec, part } from "./fixtures.ts";

const text = (html: string) => html.replace(/<[^>]+>/g, "");

describe("status marks", () => {
  it("StatusMark says pass, incomplete or fail in words beside the symbol, not by colour alone", () => {
    expect(text(renderToStaticMarkup(<StatusMark status="pass" />))).toBe("✓ pass");
    expect(text(renderToStaticMarkup(<StatusMark status="incomplete" />))).toBe("? incomplete");
    expect(text(renderToStaticMarkup(<StatusMark status="fail" detail="(3)" />))).toBe("✗ fail (3)");
  });

  it("CheckMark names a check that could not run", () => {
    expect(text(renderToStaticMarkup(<CheckMark status="unchecked" />))).toBe("– not checked");
  });
});

describe("CompareTable", () => {
  it("CompareTable marks the best value of a row with ★ and the word best, and lists a missing part", () => {
    const items = ["HV-DRS12060-6U8", "QC-PIR6035-6U8"].map((pn) => ({ part: part(pn), e: evaluatePart(demoSpec, part(pn)), score: null }));
    const html = renderToStaticMarkup(<CompareTable items={items} missing={["GONE-1"]} />);
    expect(html).toContain("★ best");
    expect(text(html)).toContain("GONE-1not in the loaded lists");
    expect(html).toContain('aria-label="Remove QC-PIR6035-6U8 from the shortlist"');
  });
});

describe("CheckList", () => {
  it("CheckList shows each check's verdict in words with its reason", () => {
    const e = evaluatePart(demoSpec, part("QC-PIR6035-6U8"));
    const html = text(renderToStaticMarkup(<CheckList checks={e.checks} />));
    expect(html).toContain("Saturation✓ pass");
    expect(html).toContain("at Vin");
  });
});
