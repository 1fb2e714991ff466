import { describe, expect, it } from "vitest";
import { incomingRecordSchema, recordSchema } from "@/lib/scrutineer/records/record-schema";

// A record as the phone makes it (test data for the shape, not a trade value).
const record = {
  id: "0190f0a0-0000-7000-8000-000000000001",
  kind: "note",
  entryId: "0190f0a0-0000-7000-8000-0000000000e1",
  officialId: "u1",
  deviceId: "phone-1",
  deviceTime: "2026-05-16T09:00:00.000Z",
  payload: { text: "Left rear tyre at the cords" },
};

describe("record shapes", () => {
  it("reads a stored record back with the server's own fields (receive time) dropped", () => {
    const stored = { ...record, receivedAt: "2026-05-16T09:00:01.000Z" };
    const parsed = recordSchema.safeParse(stored);
    expect(parsed.success).toBe(true);
    expect(parsed.data).not.toHaveProperty("receivedAt");
  });

  it("reads back a void stored before reasons had a maximum, which a phone may no longer send", () => {
    const longVoid = {
      ...record,
      kind: "void",
      payload: { targetRecordId: "0190f0a0-0000-7000-8000-000000000002", reason: "r".repeat(1500) },
    };
    expect(recordSchema.safeParse(longVoid).success).toBe(true);
    expect(incomingRecordSchema.safeParse(longVoid).success).toBe(false);
  });

  it("refuses a record from a phone that carries a field the server does not know", () => {
    expect(incomingRecordSchema.safeParse(record).success).toBe(true);
    const parsed = incomingRecordSchema.safeParse({ ...record, priority: "high" });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.code).toBe("unrecognized_keys");
  });
});
