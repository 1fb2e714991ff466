import { describe, expect, it } from "vitest";
import { clientAddress } from "@/lib/auth/client-address";

const from = (forwardedFor?: string) =>
  new Headers(forwardedFor === undefined ? {} : { "x-forwarded-for": forwardedFor });

describe("clientAddress", () => {
  it("takes the address Next.js wrote from the connection when no proxy is trusted", () => {
    expect(clientAddress(from("127.0.0.1"), 0)).toBe("127.0.0.1");
    expect(clientAddress(from("::ffff:127.0.0.1"), 0)).toBe("127.0.0.1");
  });
  it("takes the entry the last trusted proxy appended, never one the client wrote before it", () => {
    // Source: MDN, X-Forwarded-For — each proxy appends the address it received the request
    // from; only entries added by trusted proxies can be relied on (count from the right).
    expect(clientAddress(from("6.6.6.6, 203.0.113.7"), 1)).toBe("203.0.113.7");
    expect(clientAddress(from("6.6.6.6, 203.0.113.7, 10.0.0.2"), 2)).toBe("203.0.113.7");
  });
  it("calls a request with fewer entries than trusted hops, or none, unknown", () => {
    expect(clientAddress(from("203.0.113.7"), 2)).toBe("unknown");
    expect(clientAddress(from(), 0)).toBe("unknown");
    expect(clientAddress(from(" , "), 1)).toBe("unknown");
  });
});
