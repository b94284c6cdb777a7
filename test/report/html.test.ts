import { describe, expect, it } from "vitest";
import { escapeHtml } from "../../src/report/escapeHtml.ts";
import { html, trustedHtml } from "../../src/report/html.ts";

describe("escapeHtml", () => {
  it("escapeHtml(text) escapes the five characters that can end text or an attribute", () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe("&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;");
  });

  it("escapeHtml(text) leaves other text, including non-ASCII, as it is", () => {
    expect(escapeHtml("4.7 µH ±20 % − 30 °C")).toBe("4.7 µH ±20 % − 30 °C");
  });
});

describe("html", () => {
  it("html`…` escapes interpolated strings and numbers", () => {
    const pn = "<img src=x onerror=alert(1)>";
    expect(html`<td>${pn}</td><td>${3}</td>`.value).toBe("<td>&lt;img src=x onerror=alert(1)&gt;</td><td>3</td>");
  });

  it("html`…` inserts nested SafeHtml and arrays as markup and drops null, undefined and false", () => {
    const rows = ["a", "<b>"].map((x) => html`<li>${x}</li>`);
    expect(html`<ul>${rows}${null}${undefined}${false}</ul>`.value).toBe("<ul><li>a</li><li>&lt;b&gt;</li></ul>");
  });

  it("html`…` escapes quotes inside attribute values", () => {
    const title = `" onmouseover="alert(1)`;
    expect(html`<p title="${title}">x</p>`.value).toBe('<p title="&quot; onmouseover=&quot;alert(1)">x</p>');
  });

  it("trustedHtml(markup) passes fixed markup through unchanged", () => {
    expect(html`<style>${trustedHtml("a > b { }")}</style>`.value).toBe("<style>a > b { }</style>");
  });
});
