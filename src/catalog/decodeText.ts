/**
 * Bytes of a part list to text: UTF-8 with or without BOM, UTF-16 LE/BE with BOM (and without,
 * when every other byte of the start is zero), and Windows-1252 when the bytes are not valid
 * UTF-8 (spreadsheets on Windows write "µH" as the single byte 0xB5). Never throws.
 */
export function decodeText(bytes: Uint8Array): string {
  if (bytes.length >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) {
    return new TextDecoder("utf-8").decode(bytes.subarray(3));
  }
  if (bytes.length >= 2 && bytes[0] === 0xff && bytes[1] === 0xfe) return new TextDecoder("utf-16le").decode(bytes.subarray(2));
  if (bytes.length >= 2 && bytes[0] === 0xfe && bytes[1] === 0xff) return new TextDecoder("utf-16be").decode(bytes.subarray(2));
  const probe = Math.min(bytes.length, 512) & ~1;
  if (probe >= 4) {
    let evenZero = 0;
    let oddZero = 0;
    for (let i = 0; i < probe; i += 2) {
      if (bytes[i] === 0) evenZero++;
      if (bytes[i + 1] === 0) oddZero++;
    }
    const pairs = probe / 2;
    // ASCII text in UTF-16 has a zero in every pair; real UTF-8 text has none.
    if (oddZero > 0.9 * pairs && evenZero < 0.1 * pairs) return new TextDecoder("utf-16le").decode(bytes);
    if (evenZero > 0.9 * pairs && oddZero < 0.1 * pairs) return new TextDecoder("utf-16be").decode(bytes);
  }
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    return new TextDecoder("windows-1252").decode(bytes);
  }
}
