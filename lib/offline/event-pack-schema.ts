import { z } from "zod";

/** A record as the server stored it (the phone merges these with its own). */
export const packRecordSchema = z
  .object({
    id: z.string(),
    entryId: z.string(),
    kind: z.enum(["reading", "checklist", "photo", "note", "void", "override"]),
    payload: z.unknown(),
    officialId: z.string(),
    deviceId: z.string(),
    deviceTime: z.string(),
    receivedAt: z.string(),
  })
  .loose();

export const packVerdictSchema = z.object({
  entryId: z.string(),
  status: z.enum(["waiting", "cleared", "moved-up", "re-measure", "held"]),
  classId: z.string().nullable(),
  reason: z.string(),
  flags: z.array(z.string()),
  needsChief: z.boolean(),
  /** Who made the chief scrutineer's decision that stands, on their device's clock. */
  override: z.object({ officialId: z.string(), deviceTime: z.string() }).nullable().default(null),
  /** The latest override when the engine could not apply it, and why (flag "override-invalid"). */
  rejectedOverride: z
    .object({ officialId: z.string(), deviceTime: z.string(), problem: z.string() })
    .nullable()
    .default(null),
  /** Why each reading flagged "implausible-reading" cannot be true, in words. */
  implausibleReadings: z.array(z.string()).default([]),
  computedAt: z.string(),
});

/**
 * Everything the tech line needs with no signal, fetched once per event day ("Prepare for
 * offline") and refreshed when there is signal. Stored in IndexedDB by lib/offline.
 */
export const eventPackSchema = z.object({
  /** 2: in a partial pack, verdicts are partial too (the phone asks with `format=2`); 1: a
   *  partial pack carries every verdict. The phone merges verdicts by entry either way. */
  packFormat: z.union([z.literal(1), z.literal(2)]),
  etag: z.string(),
  generatedAt: z.string(),
  /** Pass to `?since=` to get only the records received (and, format 2, the verdicts computed)
   *  after this pack; it is the pack's own time stepped back, so nothing committed late is missed. */
  recordsCursor: z.string().nullable(),
  /** true when `records` (and, format 2, `verdicts`) hold only what changed since the cursor the
   *  phone sent; every other part is always whole. */
  partial: z.boolean(),
  event: z.object({
    id: z.string(),
    name: z.string(),
    eventDate: z.string(),
    timeZone: z.string(),
    unitSystem: z.enum(["mm", "in"]),
    venueName: z.string(),
  }),
  /** The event's pinned rule set (JSON as stored; the phone validates it with ruleSetSchema). */
  ruleSet: z.unknown(),
  ruleSetVersionId: z.string(),
  entries: z.array(
    z.object({
      entryId: z.string(),
      carNumber: z.number().int(),
      declaredClassId: z.string(),
      car: z.string(),
      colour: z.string(),
      drivers: z.string(),
      declarations: z.unknown(),
    }),
  ),
  officials: z.array(z.object({ userId: z.string(), name: z.string() })),
  /** Public halves of the event's pass-signing keys (Ed25519, base64url `x`). */
  passKeys: z.array(z.object({ kid: z.string(), x: z.string() })),
  revokedPassIds: z.array(z.string()),
  verdicts: z.array(packVerdictSchema),
  records: z.array(packRecordSchema),
  /** A digest of `entries`: a phone that sends it back (`?entries=`) with a partial request gets
   *  no entries when they are unchanged (`keptEntries`), only what changed. */
  entriesTag: z.string().optional(),
  /** In a partial pack: the entries the phone has are current (sent empty here; keep yours). */
  keptEntries: z.boolean().optional(),
  /** In a partial pack: the phone has this rule-set version already (sent null here; keep it). */
  keptRuleSet: z.boolean().optional(),
  /** Cars whose verdict the server is re-deriving now (records arrived that it may not count
   *  yet), as of just before this pack's verdicts were read. Always whole. */
  pendingVerdicts: z.array(z.string()).optional(),
});

export type EventPack = z.infer<typeof eventPackSchema>;
export type PackRecord = z.infer<typeof packRecordSchema>;
export type PackVerdict = z.infer<typeof packVerdictSchema>;
