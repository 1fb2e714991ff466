import { env } from "@/lib/env";

/**
 * The address a request came from, for the per-address sign-in limits.
 *
 * `next start` has no API for the connection's address: it writes it into X-Forwarded-For, but
 * only when the request did not bring that header itself. So the address is the X-Forwarded-For
 * entry that the last trusted hop wrote: with TRUSTED_PROXY_HOPS = 0 (the app reached directly,
 * as on 127.0.0.1) or 1 (one proxy in front) that is the last entry; with 2 proxies that each
 * append, the second from the end. Entries before it were written by whoever sent the request
 * and are never used. A request without the header (not through Next.js's server) counts as
 * "unknown". Public live deployments put a proxy in front that sets the header itself
 * (nginx: `proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;`), because Next.js
 * keeps a header a client sent straight to it.
 */
export function clientAddress(headers: Headers, hops = env.TRUSTED_PROXY_HOPS): string {
  const entries = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((entry) => entry.trim())
    .filter((entry) => entry !== "");
  const index = entries.length - Math.max(hops, 1);
  const entry = index >= 0 ? entries[index] : undefined;
  if (!entry || entry.length > 64) return "unknown";
  // One client, one key: "::ffff:127.0.0.1" and "127.0.0.1" are the same IPv4 client.
  return entry.toLowerCase().replace(/^::ffff:(?=\d+\.\d+\.\d+\.\d+$)/, "");
}
