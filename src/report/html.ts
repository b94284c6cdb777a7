import { escapeHtml } from "./escapeHtml.ts";

/** Markup that is already safe to insert: built by `html` or `trustedHtml`, never from raw input. */
export class SafeHtml {
  constructor(readonly value: string) {}
  toString(): string {
    return this.value;
  }
}

/** What a template may interpolate: text (escaped), numbers, safe markup, lists of these, or nothing. */
export type HtmlValue = string | number | SafeHtml | null | undefined | false | readonly HtmlValue[];

function render(value: HtmlValue): string {
  if (value === null || value === undefined || value === false) return "";
  if (value instanceof SafeHtml) return value.value;
  if (typeof value === "number") return escapeHtml(String(value));
  if (typeof value === "string") return escapeHtml(value);
  return value.map(render).join("");
}

/**
 * Tagged template that escapes every interpolated string. The renderer builds all its markup
 * with it, so text from a part list cannot become markup by accident: only SafeHtml passes through.
 */
export function html(strings: TemplateStringsArray, ...values: HtmlValue[]): SafeHtml {
  let out = strings[0] ?? "";
  for (let i = 0; i < values.length; i++) out += render(values[i] as HtmlValue) + (strings[i + 1] ?? "");
  return new SafeHtml(out);
}

/** Marks fixed markup written in this module (the stylesheet) as safe; never call it on input. */
export function trustedHtml(markup: string): SafeHtml {
  return new SafeHtml(markup);
}
