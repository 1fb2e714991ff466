import { AppError } from "../errors";
import { describeBytes } from "./body-limits";

function tooLarge(maxBytes: number): AppError {
  return new AppError(
    "payload_too_large",
    `That is more than this address takes (${describeBytes(maxBytes)}). Send less at a time.`,
  );
}

/**
 * The request body as bytes, refused with 413 when it is larger than `maxBytes`: at once when
 * Content-Length says so (nothing is read), else as soon as the stream passes the limit (the
 * rest is never read). A body the client never finishes is the server's read timeout's business.
 */
export async function readCappedBody(request: Request, maxBytes: number): Promise<Uint8Array> {
  const declared = request.headers.get("content-length");
  if (declared !== null && /^\d+$/.test(declared) && Number(declared) > maxBytes) {
    await request.body?.cancel().catch(() => undefined);
    throw tooLarge(maxBytes);
  }
  if (request.body === null) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  const body = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    body.set(chunk, at);
    at += chunk.byteLength;
  }
  return body;
}
