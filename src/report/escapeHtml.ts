const ENTITIES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

/**
 * Text as HTML that shows it literally, in element content and in quoted attribute values alike.
 * Part lists are untrusted: a part number such as `<img src=x onerror=alert(1)>` must read as text.
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ENTITIES[c] as string);
}
