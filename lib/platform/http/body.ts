import "server-only";
import type { NextRequest } from "next/server";
import { HttpError } from "./errors";

/**
 * The raw request body, refused with 413 as soon as it passes `maxBytes` — by the declared
 * length before reading, or while streaming when no length was declared. Never buffers more.
 */
export async function readCappedBytes(
  req: NextRequest,
  maxBytes: number,
  tooBigMessage = `The file is larger than ${Math.round(maxBytes / 1024 / 1024)} MB. Split the catalog into smaller files.`,
): Promise<Uint8Array> {
  const tooBig = () => new HttpError(413, tooBigMessage);
  const declared = Number(req.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw tooBig();
  if (!req.body) return new Uint8Array();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel().catch(() => {});
      throw tooBig();
    }
    chunks.push(value);
  }
  const out = new Uint8Array(size);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}
