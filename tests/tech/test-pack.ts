import type { EventPack } from "@/lib/offline/event-pack-schema";

/**
 * An event pack for the phone-side tests (invented event, cars and times — test data, not trade
 * values): the given cars, empty lists elsewhere, and the parts a test sets.
 */
export function testPack(
  eventId: string,
  {
    entryIds,
    generatedAt,
    recordsCursor,
    ...parts
  }: {
    entryIds: string[];
    generatedAt: string;
    recordsCursor: string | null;
  } & Partial<EventPack> &
    Pick<EventPack, "verdicts">,
): EventPack {
  return {
    packFormat: 2,
    etag: '"e"',
    generatedAt,
    recordsCursor,
    partial: false,
    event: {
      id: eventId,
      name: "Test day",
      eventDate: "2027-06-05",
      timeZone: "UTC",
      unitSystem: "mm",
      venueName: "Pad",
    },
    ruleSet: {},
    ruleSetVersionId: "v1",
    entries: entryIds.map((entryId, i) => ({
      entryId,
      carNumber: i + 1,
      declaredClassId: "k1",
      car: "2001 Test Car",
      colour: "Blue",
      drivers: "Driver",
      declarations: {},
    })),
    officials: [],
    passKeys: [],
    revokedPassIds: [],
    records: [],
    ...parts,
  };
}
