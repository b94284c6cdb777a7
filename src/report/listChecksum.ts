/**
 * FNV-1a, 32 bits, over the UTF-16 code units of a list's text, as 8 hex digits. Not a security
 * measure: it lets a reviewer confirm that a list file is the one a report was made from.
 */
export function listChecksum(text: string): string {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193);
  }
  return (hash >>> 0).toString(16).padStart(8, "0");
}
