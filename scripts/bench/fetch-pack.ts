// P7b's probe: GET /api/events/<id>/pack as a phone asks for it (gzip accepted), counting the
// bytes as they cross the wire and the JSON they unpack to.
import { request } from "node:http";
import { gunzipSync, gzipSync } from "node:zlib";

export type PackFetch = {
  status: number;
  etag: string | null;
  /** The JSON's size unpacked, in bytes (0 for a 304). */
  rawBytes: number;
  /** Its size gzip-compressed: as sent when the server compressed it, else gzipped here. */
  gzipBytes: number;
  /** Whether the server sent it compressed (Next's `compress`, on by default). */
  compressedByServer: boolean;
  body: {
    generatedAt?: string;
    recordsCursor?: string;
    records?: unknown[];
    entriesTag?: string;
    ruleSetVersionId?: string;
  } | null;
};

/** One request; bounded by a 60 s timeout. */
export function fetchPack(opts: {
  appUrl: string;
  eventId: string;
  cookie: string;
  since?: string;
  ifNoneMatch?: string;
  /** What the phone's stored pack holds (from the whole pack before), sent with a refresh. */
  phoneHas?: { entriesTag?: string; ruleSetVersionId?: string };
}): Promise<PackFetch> {
  // As the tech line asks (lib/offline/fetch-event-pack.ts): format 2, and with a refresh the
  // entries and rule set it already holds.
  const url = new URL(`/api/events/${opts.eventId}/pack`, opts.appUrl);
  url.searchParams.set("format", "2");
  if (opts.since) url.searchParams.set("since", opts.since);
  if (opts.since && opts.phoneHas?.entriesTag)
    url.searchParams.set("entries", opts.phoneHas.entriesTag);
  if (opts.since && opts.phoneHas?.ruleSetVersionId)
    url.searchParams.set("rules", opts.phoneHas.ruleSetVersionId);
  const headers: Record<string, string> = { cookie: opts.cookie, "accept-encoding": "gzip" };
  if (opts.ifNoneMatch) headers["if-none-match"] = opts.ifNoneMatch;
  return new Promise((resolve, reject) => {
    const req = request(url, { method: "GET", headers, timeout: 60_000 }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("error", reject);
      res.on("end", () => {
        const wire = Buffer.concat(chunks);
        const compressedByServer = res.headers["content-encoding"] === "gzip";
        const raw = compressedByServer ? gunzipSync(wire) : wire;
        const status = res.statusCode ?? 0;
        resolve({
          status,
          etag: typeof res.headers.etag === "string" ? res.headers.etag : null,
          rawBytes: raw.length,
          gzipBytes: raw.length === 0 ? 0 : compressedByServer ? wire.length : gzipSync(raw).length,
          compressedByServer,
          body: status === 200 ? JSON.parse(raw.toString("utf8")) : null,
        });
      });
    });
    req.on("timeout", () => req.destroy(new Error("pack request timed out")));
    req.on("error", reject);
    req.end();
  });
}
