import { performance } from "node:perf_hooks";
import { gzipSync } from "node:zlib";

/** A signed-in request: `fetch` with the session's cookie, or a test helper's own fetch. */
export type SignedInFetch = (url: string, init?: RequestInit) => Promise<Response>;

/** One pack request as measured: its answer, its JSON size, and that JSON gzipped. */
export type PackSizeSample = {
  status: number;
  /** Bytes of the JSON body as the app serves it, before any transfer encoding (0 for a 304). */
  rawBytes: number;
  /** The same body gzipped with node:zlib at its default level (what `next start` compresses with). */
  gzipBytes: number;
  records: number;
  verdicts: number;
  entries: number;
  /** Raw JSON bytes of each part of the pack (the rest — event, keys, cursor — is small). */
  partBytes: { records: number; verdicts: number; entries: number; ruleSet: number };
  ms: number;
};

export type PackSizes = { full: PackSizeSample; partial: PackSizeSample };

/**
 * Measure the event pack a scrutineer's phone downloads: the whole pack (the first download),
 * then the refresh a phone makes with that pack's cursor and ETag (`?since=…&format=2`,
 * If-None-Match), after `between` — e.g. a sync batch — has run. Without a change in between the
 * refresh is a 304 with no body. Talks only to `baseUrl`; send it a signed-in official's cookie
 * (`cookie`) or a fetch that signs in itself (`fetchAs`).
 */
export async function measurePackSize({
  baseUrl,
  eventId,
  cookie,
  fetchAs,
  between,
}: {
  baseUrl: string;
  eventId: string;
  cookie?: string;
  fetchAs?: SignedInFetch;
  between?: () => Promise<void>;
}): Promise<PackSizes> {
  const get: SignedInFetch =
    fetchAs ??
    ((url, init) => {
      const headers = new Headers(init?.headers);
      if (cookie) headers.set("cookie", cookie);
      return fetch(url, { ...init, headers, redirect: "manual" });
    });
  const packUrl = new URL(`/api/events/${eventId}/pack`, baseUrl);

  packUrl.searchParams.set("format", "2");
  const whole = await sample(get, packUrl.toString(), {});
  if (whole.sample.status !== 200 || !whole.pack)
    throw new Error(`the whole pack answered ${whole.sample.status}: sign in as an official`);
  await between?.();
  packUrl.searchParams.set("since", whole.pack.recordsCursor ?? "");
  // As the phone asks (lib/offline/fetch-event-pack.ts): it says which entries and rule set it has.
  if (whole.pack.entriesTag) packUrl.searchParams.set("entries", whole.pack.entriesTag);
  packUrl.searchParams.set("rules", whole.pack.ruleSetVersionId);
  const refresh = await sample(get, packUrl.toString(), { "if-none-match": whole.pack.etag });
  return { full: whole.sample, partial: refresh.sample };
}

type PackCounts = {
  etag: string;
  recordsCursor: string | null;
  records: unknown[];
  verdicts: unknown[];
  entries: unknown[];
  ruleSet: unknown;
  entriesTag?: string;
  ruleSetVersionId: string;
};

const jsonBytes = (value: unknown) =>
  value === undefined ? 0 : Buffer.byteLength(JSON.stringify(value), "utf8");

async function sample(
  get: SignedInFetch,
  url: string,
  headers: Record<string, string>,
): Promise<{ sample: PackSizeSample; pack: PackCounts | null }> {
  const started = performance.now();
  const response = await get(url, { headers });
  // fetch undoes any Content-Encoding, so these are the JSON's own bytes.
  const body = Buffer.from(await response.arrayBuffer());
  const ms = performance.now() - started;
  const pack = response.status === 200 ? (JSON.parse(body.toString("utf8")) as PackCounts) : null;
  return {
    pack,
    sample: {
      status: response.status,
      rawBytes: body.byteLength,
      gzipBytes: body.byteLength === 0 ? 0 : gzipSync(body).byteLength,
      records: pack?.records.length ?? 0,
      verdicts: pack?.verdicts.length ?? 0,
      entries: pack?.entries.length ?? 0,
      partBytes: {
        records: jsonBytes(pack?.records),
        verdicts: jsonBytes(pack?.verdicts),
        entries: jsonBytes(pack?.entries),
        ruleSet: jsonBytes(pack?.ruleSet),
      },
      ms: Math.round(ms),
    },
  };
}
