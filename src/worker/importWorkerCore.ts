import { decodeText } from "../catalog/decodeText.ts";
import { importPartList } from "../catalog/importPartList.ts";
import { headerSignature } from "./headerSignature.ts";
import { PART_CHUNK, type ImportReply, type ImportRequest } from "./protocol.ts";

/** One import, start to finish, reporting through `post` (the worker's postMessage, or a test's). */
export function runImport(request: ImportRequest, post: (reply: ImportReply) => void): void {
  try {
    let text = request.text;
    let decoded: string | null = null;
    if (text === null) {
      const bytes = new Uint8Array(request.bytes ?? new ArrayBuffer(0));
      post({ type: "phase", phase: "decoding", done: 0, total: bytes.length });
      decoded = decodeText(bytes);
      text = decoded;
    }
    post({ type: "phase", phase: "reading", done: 0, total: text.length });
    const signature = headerSignature(text);
    const remembered = request.mapping === null && signature !== null ? request.remembered[signature] : undefined;
    const mapping = request.mapping ?? remembered ?? [];
    const result = importPartList(text, { name: request.name, mapping, seriesSaturation: request.seriesSaturation });
    const { parts, ...summary } = result;
    post({ type: "summary", text: decoded, signature, mapping, rememberedApplied: remembered !== undefined, summary, partCount: parts.length });
    for (let at = 0; at < parts.length; at += PART_CHUNK) {
      post({ type: "phase", phase: "delivering", done: at, total: parts.length });
      post({ type: "parts", parts: parts.slice(at, at + PART_CHUNK) });
    }
    post({ type: "done" });
  } catch (error) {
    post({ type: "failed", message: error instanceof Error ? error.message : String(error) });
  }
}
