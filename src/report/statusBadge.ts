import type { CheckStatus, ResultStatus } from "../engine/types.ts";
import { html, type SafeHtml } from "./html.ts";

/** A verdict as a word as well as a colour, so that it survives black-and-white printing. */
export function statusBadge(status: ResultStatus | CheckStatus): SafeHtml {
  const word = status === "unchecked" ? "not checked" : status;
  const tone = status === "unchecked" ? "incomplete" : status;
  return html`<span class="status status-${tone}">${word}</span>`;
}
