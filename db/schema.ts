/**
 * Plumbline's data model (Drizzle, MariaDB). Tables are plural snake_case; keys camelCase.
 * Every table that grows during a season carries `eventId` and an index that starts with it,
 * so a championship is many small event partitions. Most rows are append-only: only rows that
 * really change carry `updatedAt`.
 */
import {
  bigint,
  boolean,
  char,
  date,
  datetime,
  decimal,
  double,
  index,
  int,
  json,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  smallint,
  text,
  timestamp,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { v7 as uuidv7 } from "uuid";
import { eventRoles } from "../lib/auth/roles";
import { experienceLevels } from "../lib/paddock/drive";
import { sessionCallStates } from "../lib/paddock/session-call";

/**
 * Identifiers, tokens, slugs, keys and e-mail addresses compare byte for byte. The server's
 * default collation (utf8mb4_unicode_ci) ignores case and accents, so `brackenmöor` would find
 * the row of `brackenmoor`, and a user id or token in other letter case would find another's.
 * Drizzle has no collation option, so the column reports it as part of its SQL type (what
 * drizzle-kit writes into migrations); the column stays a plain varchar/char/text for the code.
 */
function binaryCollation<TBuilder extends object>(builder: TBuilder): TBuilder {
  const build = Reflect.get(builder, "build") as (table: unknown) => { getSQLType(): string };
  Reflect.set(builder, "build", (table: unknown) => {
    const column = build.call(builder, table);
    const sqlType = column.getSQLType();
    column.getSQLType = () => `${sqlType} CHARACTER SET utf8mb4 COLLATE utf8mb4_bin`;
    return column;
  });
  return builder;
}
/** A varchar that identifies something (an id, a token, a slug, an address). */
const key = <TName extends string>(name: TName, length: number) =>
  binaryCollation(varchar(name, { length }));
const uuid = <TName extends string>(name: TName) => key(name, 36);
/** A user id (Auth.js makes them varchar(255)). */
const userId = <TName extends string>(name: TName) => key(name, 255);
const createdAt = () => datetime("created_at", { mode: "date", fsp: 3 }).notNull();
const updatedAt = () => datetime("updated_at", { mode: "date", fsp: 3 }).notNull();

// ── Auth.js (next-auth v5) tables, column shapes as @auth/drizzle-adapter expects ─────────────
export const users = mysqlTable("users", {
  id: userId("id")
    .primaryKey()
    .$defaultFn(() => uuidv7()),
  name: varchar("name", { length: 255 }),
  email: key("email", 255).notNull().unique("users_email_unique"),
  emailVerified: timestamp("email_verified", { mode: "date", fsp: 3 }),
  image: varchar("image", { length: 255 }),
  passwordHash: varchar("password_hash", { length: 100 }),
  createdAt: datetime("created_at", { mode: "date", fsp: 3 }).$defaultFn(() => new Date()),
  // ── The entrant's profile (issue 11); `name` above is their full name as they give it. ──
  /** Calendar date of birth; a driver under 18 on an event's date is a minor there. */
  dateOfBirth: date("date_of_birth", { mode: "string" }),
  phone: varchar("phone", { length: 40 }),
  emergencyContactName: varchar("emergency_contact_name", { length: 160 }),
  emergencyContactPhone: varchar("emergency_contact_phone", { length: 40 }),
  /** Competition licence (grade and number, as the licence shows them), if any. */
  licence: varchar("licence", { length: 80 }),
  experienceLevel: mysqlEnum("experience_level", experienceLevels),
  profileUpdatedAt: datetime("profile_updated_at", { mode: "date", fsp: 3 }),
});

export const accounts = mysqlTable(
  "accounts",
  {
    userId: userId("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    type: varchar("type", { length: 255 })
      .$type<"email" | "oauth" | "oidc" | "webauthn">()
      .notNull(),
    provider: key("provider", 255).notNull(),
    providerAccountId: key("provider_account_id", 255).notNull(),
    refresh_token: varchar("refresh_token", { length: 255 }),
    access_token: varchar("access_token", { length: 255 }),
    expires_at: int("expires_at"),
    token_type: varchar("token_type", { length: 255 }),
    scope: varchar("scope", { length: 255 }),
    id_token: varchar("id_token", { length: 2048 }),
    session_state: varchar("session_state", { length: 255 }),
  },
  (t) => [primaryKey({ columns: [t.provider, t.providerAccountId], name: "accounts_pk" })],
);

export const sessions = mysqlTable("sessions", {
  sessionToken: key("session_token", 255).primaryKey(),
  userId: userId("user_id")
    .notNull()
    .references(() => users.id, { onDelete: "cascade" }),
  expires: timestamp("expires", { mode: "date" }).notNull(),
});

export const verificationTokens = mysqlTable(
  "verification_tokens",
  {
    identifier: key("identifier", 255).notNull(),
    token: key("token", 255).notNull(),
    expires: timestamp("expires", { mode: "date" }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token], name: "verification_tokens_pk" })],
);

// ── Clubs, venues, rule sets ───────────────────────────────────────────────────────────────
export const clubs = mysqlTable("clubs", {
  id: uuid("id").primaryKey(),
  name: varchar("name", { length: 120 }).notNull(),
  slug: key("slug", 60).notNull().unique("clubs_slug_unique"),
  createdAt: createdAt(),
});

export const venues = mysqlTable("venues", {
  id: uuid("id").primaryKey(),
  clubId: uuid("club_id")
    .notNull()
    .references(() => clubs.id),
  name: varchar("name", { length: 120 }).notNull(),
  trackLengthM: int("track_length_m").notNull(),
  timeZone: varchar("time_zone", { length: 64 }).notNull(),
  /** Cars allowed on track at once: an explicit number, or track length × density. */
  maxCarsOnTrack: smallint("max_cars_on_track"),
  carsPerKm: decimal("cars_per_km", { precision: 4, scale: 1 }),
  createdAt: createdAt(),
});

export const ruleSets = mysqlTable("rule_sets", {
  id: uuid("id").primaryKey(),
  clubId: uuid("club_id")
    .notNull()
    .references(() => clubs.id),
  name: varchar("name", { length: 120 }).notNull(),
  createdAt: createdAt(),
});

/** One version of a rule set. `body` is validated by lib/scrutineer's rule-set schema on save;
 *  a version is locked (never changed again) once an event pins it. */
export const ruleSetVersions = mysqlTable(
  "rule_set_versions",
  {
    id: uuid("id").primaryKey(),
    ruleSetId: uuid("rule_set_id")
      .notNull()
      .references(() => ruleSets.id),
    version: int("version").notNull(),
    body: json("body").notNull(),
    notes: varchar("notes", { length: 500 }),
    createdBy: userId("created_by").references(() => users.id),
    createdAt: createdAt(),
    lockedAt: datetime("locked_at", { mode: "date", fsp: 3 }),
  },
  (t) => [uniqueIndex("rule_set_versions_set_version_unique").on(t.ruleSetId, t.version)],
);

// ── Events and who runs them ───────────────────────────────────────────────────────────────
export const events = mysqlTable("events", {
  id: uuid("id").primaryKey(),
  clubId: uuid("club_id")
    .notNull()
    .references(() => clubs.id),
  venueId: uuid("venue_id")
    .notNull()
    .references(() => venues.id),
  name: varchar("name", { length: 160 }).notNull(),
  slug: key("slug", 80).notNull().unique("events_slug_unique"),
  /** The event's calendar date at the venue. */
  eventDate: date("event_date", { mode: "string" }).notNull(),
  timeZone: varchar("time_zone", { length: 64 }).notNull(),
  unitSystem: mysqlEnum("unit_system", ["mm", "in"]).notNull(),
  status: mysqlEnum("status", ["draft", "entries-open", "entries-closed", "running", "finished"])
    .notNull()
    .default("draft"),
  ruleSetVersionId: uuid("rule_set_version_id")
    .notNull()
    .references(() => ruleSetVersions.id),
  entryFeeMinor: int("entry_fee_minor").notNull(),
  currency: char("currency", { length: 3 }).notNull(),
  capacity: smallint("capacity").notNull(),
  /** When entries open and close (instants); null = open while the status says entries-open. */
  entriesOpenAt: datetime("entries_open_at", { mode: "date", fsp: 3 }),
  entriesCloseAt: datetime("entries_close_at", { mode: "date", fsp: 3 }),
  /** The waiver every driver accepts, and the version its acceptances record. */
  waiverText: text("waiver_text"),
  waiverVersion: varchar("waiver_version", { length: 40 }),
  /** What a withdrawal gets back (lib/entries/refund-policy-schema.ts); null = no refunds. */
  refundPolicy: json("refund_policy"),
  /** Minutes after provisional results are issued during which a protest may be lodged. */
  protestWindowMinutes: smallint("protest_window_minutes").notNull().default(30),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

export const eventOfficials = mysqlTable(
  "event_officials",
  {
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    userId: userId("user_id")
      .notNull()
      .references(() => users.id),
    role: mysqlEnum("role", eventRoles).notNull(),
    createdAt: createdAt(),
  },
  (t) => [
    primaryKey({ columns: [t.eventId, t.userId, t.role], name: "event_officials_pk" }),
    index("event_officials_user_idx").on(t.userId),
  ],
);

/** The event's Ed25519 key pair for signing passes. The private key never leaves the server. */
export const eventPassKeys = mysqlTable(
  "event_pass_keys",
  {
    kid: key("kid", 64).primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    publicKeyX: key("public_key_x", 64).notNull(),
    privateKeyPkcs8: text("private_key_pkcs8").notNull(),
    createdAt: createdAt(),
    retiredAt: datetime("retired_at", { mode: "date", fsp: 3 }),
  },
  (t) => [index("event_pass_keys_event_idx").on(t.eventId)],
);

// ── Garage and entries ─────────────────────────────────────────────────────────────────────
export const cars = mysqlTable(
  "cars",
  {
    id: uuid("id").primaryKey(),
    ownerId: userId("owner_id")
      .notNull()
      .references(() => users.id),
    make: varchar("make", { length: 60 }).notNull(),
    model: varchar("model", { length: 80 }).notNull(),
    year: smallint("year").notNull(),
    colour: varchar("colour", { length: 40 }).notNull(),
    notes: varchar("notes", { length: 500 }),
    /** The entrant's own figures, in millimetres whatever unit they were typed in. */
    bodyWidthMm: double("body_width_mm"),
    roofHeightMm: double("roof_height_mm"),
    /** A retired car stays for its past entries but is no longer offered. */
    retiredAt: datetime("retired_at", { mode: "date", fsp: 3 }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("cars_owner_idx").on(t.ownerId)],
);

export const carFileKinds = ["front", "side", "rear", "dyno-sheet"] as const;
/** Photos of a car and its dyno sheet, in object storage; a replaced file gets `removedAt`. */
export const carFiles = mysqlTable(
  "car_files",
  {
    id: uuid("id").primaryKey(),
    carId: uuid("car_id")
      .notNull()
      .references(() => cars.id),
    kind: mysqlEnum("kind", carFileKinds).notNull(),
    bucket: key("bucket", 63).notNull(),
    objectKey: key("object_key", 300).notNull(),
    contentType: varchar("content_type", { length: 100 }).notNull(),
    byteSize: int("byte_size").notNull(),
    widthPx: smallint("width_px"),
    heightPx: smallint("height_px"),
    sha256: binaryCollation(char("sha256", { length: 64 })).notNull(),
    uploadedBy: userId("uploaded_by")
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    removedAt: datetime("removed_at", { mode: "date", fsp: 3 }),
  },
  (t) => [
    index("car_files_car_idx").on(t.carId),
    uniqueIndex("car_files_object_unique").on(t.bucket, t.objectKey),
  ],
);

/** A wing planned before it is built (the aero pre-check), saved against one of the owner's cars. */
export const aeroPlans = mysqlTable(
  "aero_plans",
  {
    id: uuid("id").primaryKey(),
    ownerId: userId("owner_id")
      .notNull()
      .references(() => users.id),
    carId: uuid("car_id")
      .notNull()
      .references(() => cars.id),
    name: varchar("name", { length: 80 }).notNull(),
    /** The plan as lib/scrutineer/aero/wing-plan-schema.ts shapes it. */
    plan: json("plan").notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("aero_plans_car_idx").on(t.carId), index("aero_plans_owner_idx").on(t.ownerId)],
);

export const entries = mysqlTable(
  "entries",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    carId: uuid("car_id")
      .notNull()
      .references(() => cars.id),
    carNumber: smallint("car_number").notNull(),
    declaredClass: key("declared_class", 40).notNull(),
    driverId: userId("driver_id")
      .notNull()
      .references(() => users.id),
    coDriverId: userId("co_driver_id").references(() => users.id),
    lapTimeEstimateMs: int("lap_time_estimate_ms"),
    /** Each driver's declared experience (lib/paddock/drive.ts); null = not said (run as novice). */
    driverExperience: mysqlEnum("driver_experience", experienceLevels),
    coDriverExperience: mysqlEnum("co_driver_experience", experienceLevels),
    coDriverLapTimeEstimateMs: int("co_driver_lap_time_estimate_ms"),
    /** Entrant declarations (dyno sheet, tyres, modification points), shaped by lib/scrutineer. */
    declarations: json("declarations").notNull(),
    /** "waiting": on the waiting list (not in the field); moves up to "entered" in `waitingSeq`
     *  order when a place frees. */
    status: mysqlEnum("status", ["entered", "waiting", "withdrawn"]).notNull().default("entered"),
    /** Place in the waiting list, given under the event's row lock (lower moves up first). */
    waitingSeq: int("waiting_seq"),
    withdrawnAt: datetime("withdrawn_at", { mode: "date", fsp: 3 }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    uniqueIndex("entries_event_car_number_unique").on(t.eventId, t.carNumber),
    index("entries_event_driver_idx").on(t.eventId, t.driverId),
    index("entries_driver_idx").on(t.driverId),
    index("entries_co_driver_idx").on(t.coDriverId),
  ],
);

/** A co-driver asked by e-mail to share an entry's car; they accept from their own account. Only
 *  the SHA-256 of the link's token is kept. */
export const coDriverInvites = mysqlTable(
  "co_driver_invites",
  {
    id: uuid("id").primaryKey(),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id),
    email: key("email", 255).notNull(),
    tokenHash: binaryCollation(char("token_hash", { length: 64 }))
      .notNull()
      .unique("co_driver_invites_token_unique"),
    invitedBy: userId("invited_by")
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    expiresAt: datetime("expires_at", { mode: "date", fsp: 3 }).notNull(),
    acceptedAt: datetime("accepted_at", { mode: "date", fsp: 3 }),
    acceptedBy: userId("accepted_by").references(() => users.id),
    /** Declined by the invitee, or cancelled by the entrant (a new invitation cancels the old). */
    closedAt: datetime("closed_at", { mode: "date", fsp: 3 }),
  },
  (t) => [index("co_driver_invites_entry_idx").on(t.entryId)],
);

export const passes = mysqlTable(
  "passes",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id),
    kid: key("kid", 64).notNull(),
    token: binaryCollation(text("token")).notNull(),
    issuedAt: datetime("issued_at", { mode: "date", fsp: 3 }).notNull(),
    expiresAt: datetime("expires_at", { mode: "date", fsp: 3 }).notNull(),
    revokedAt: datetime("revoked_at", { mode: "date", fsp: 3 }),
    revokedReason: varchar("revoked_reason", { length: 300 }),
    revokedBy: userId("revoked_by").references(() => users.id),
  },
  (t) => [index("passes_event_entry_idx").on(t.eventId, t.entryId)],
);

// ── The tech line: immutable records and derived verdicts ──────────────────────────────────
export const recordKinds = ["reading", "checklist", "photo", "note", "void", "override"] as const;

/** Immutable: a reading, checklist answer, photo, note, void or override. The id is made on the
 *  device (UUID v7), so storing is idempotent. Never updated; corrections are new records. */
export const records = mysqlTable(
  "records",
  {
    id: binaryCollation(char("id", { length: 36 })).primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id),
    kind: mysqlEnum("kind", recordKinds).notNull(),
    payload: json("payload").notNull(),
    officialId: userId("official_id")
      .notNull()
      .references(() => users.id),
    deviceId: key("device_id", 64).notNull(),
    deviceTime: datetime("device_time", { mode: "date", fsp: 3 }).notNull(),
    receivedAt: datetime("received_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (t) => [
    index("records_event_entry_idx").on(t.eventId, t.entryId),
    index("records_event_received_idx").on(t.eventId, t.receivedAt),
  ],
);

export const verdictStatuses = ["waiting", "cleared", "moved-up", "re-measure", "held"] as const;

/** The stored result of evaluating an entry; always re-derivable from its records and the
 *  event's pinned rule-set version. */
export const verdicts = mysqlTable(
  "verdicts",
  {
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id),
    status: mysqlEnum("status", verdictStatuses).notNull(),
    finalClass: key("final_class", 40),
    needsChief: boolean("needs_chief").notNull().default(false),
    reason: varchar("reason", { length: 500 }).notNull(),
    ruleSetVersionId: uuid("rule_set_version_id")
      .notNull()
      .references(() => ruleSetVersions.id),
    result: json("result").notNull(),
    recordCount: int("record_count").notNull(),
    /** SHA-256 of the stored `result`: a recompute that derives the same result writes no JSON. */
    resultHash: key("result_hash", 64),
    computedAt: datetime("computed_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.eventId, t.entryId], name: "verdicts_pk" }),
    index("verdicts_event_status_idx").on(t.eventId, t.status),
  ],
);

export const runGroupPublications = mysqlTable(
  "run_group_publications",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    version: int("version").notNull(),
    body: json("body").notNull(),
    publishedBy: userId("published_by")
      .notNull()
      .references(() => users.id),
    publishedAt: datetime("published_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (t) => [uniqueIndex("run_group_publications_event_version_unique").on(t.eventId, t.version)],
);

/** The clerk of course's working copy of the run groups and the day's layout: one per event,
 *  changed in place (a draft is not a record); `revision` stops two desks overwriting each other. */
export const runGroupDrafts = mysqlTable("run_group_drafts", {
  eventId: uuid("event_id")
    .primaryKey()
    .references(() => events.id),
  groups: json("groups").notNull(),
  settings: json("settings").notNull(),
  capCars: smallint("cap_cars").notNull(),
  revision: int("revision").notNull(),
  updatedBy: userId("updated_by")
    .notNull()
    .references(() => users.id),
  updatedAt: updatedAt(),
});

/** What the clerk of course marks on a session during the day (append-only; latest wins). */
export const sessionCalls = mysqlTable(
  "session_calls",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    /** The session as it was on the sheet when marked (`round-groupIndex`), and the group's name
     *  and round, by which a mark follows its group when a later version reorders the groups. */
    sessionKey: key("session_key", 8).notNull(),
    groupName: varchar("group_name", { length: 40 }).notNull(),
    round: smallint("round").notNull(),
    state: mysqlEnum("state", sessionCallStates).notNull(),
    note: varchar("note", { length: 500 }),
    calledAt: datetime("called_at", { mode: "date", fsp: 3 }).notNull(),
    calledBy: userId("called_by")
      .notNull()
      .references(() => users.id),
  },
  (t) => [index("session_calls_event_idx").on(t.eventId, t.calledAt)],
);

/** A car sent back to the tech line after an incident or a protest: its verdict waits until a
 *  scrutineer has looked at it again and the chief scrutineer closes the re-inspection. */
export const reinspections = mysqlTable(
  "reinspections",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id),
    cause: mysqlEnum("cause", ["incident", "protest", "other"]).notNull(),
    askedBy: varchar("asked_by", { length: 160 }).notNull(),
    askedAt: datetime("asked_at", { mode: "date", fsp: 3 }).notNull(),
    reason: varchar("reason", { length: 1000 }).notNull(),
    createdBy: userId("created_by")
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    closedAt: datetime("closed_at", { mode: "date", fsp: 3 }),
    closedBy: userId("closed_by").references(() => users.id),
    closingNote: varchar("closing_note", { length: 1000 }),
  },
  (t) => [index("reinspections_event_entry_idx").on(t.eventId, t.entryId)],
);

// ── Money, waivers, uploads ────────────────────────────────────────────────────────────────
export const payments = mysqlTable(
  "payments",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id),
    provider: key("provider", 30).notNull(),
    providerRef: key("provider_ref", 120).notNull(),
    amountMinor: int("amount_minor").notNull(),
    currency: char("currency", { length: 3 }).notNull(),
    status: mysqlEnum("status", ["pending", "paid", "failed", "cancelled", "refunded"]).notNull(),
    /** The provider's payment (intent) id once paid: refunds name it. */
    paymentRef: key("payment_ref", 120),
    paidAt: datetime("paid_at", { mode: "date", fsp: 3 }),
    /** Refunded so far, in the payment's minor units. */
    refundedMinor: int("refunded_minor").notNull().default(0),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("payments_event_entry_idx").on(t.eventId, t.entryId),
    uniqueIndex("payments_provider_ref_unique").on(t.provider, t.providerRef),
  ],
);

export const waivers = mysqlTable(
  "waivers",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    entryId: uuid("entry_id")
      .notNull()
      .references(() => entries.id),
    signerId: userId("signer_id")
      .notNull()
      .references(() => users.id),
    signedName: varchar("signed_name", { length: 160 }).notNull(),
    signedAt: datetime("signed_at", { mode: "date", fsp: 3 }).notNull(),
    isMinor: boolean("is_minor").notNull().default(false),
    guardianName: varchar("guardian_name", { length: 160 }),
    guardianSignedAt: datetime("guardian_signed_at", { mode: "date", fsp: 3 }),
    textVersion: varchar("text_version", { length: 40 }).notNull(),
    /** The address the acceptance came from (lib/auth/client-address.ts). */
    signerIp: varchar("signer_ip", { length: 45 }),
    /** A minor's parent or guardian, asked by e-mail; only the SHA-256 of the link's token is kept. */
    guardianEmail: key("guardian_email", 255),
    guardianTokenHash: binaryCollation(char("guardian_token_hash", { length: 64 })).unique(
      "waivers_guardian_token_unique",
    ),
    guardianRequestedAt: datetime("guardian_requested_at", { mode: "date", fsp: 3 }),
    guardianIp: varchar("guardian_ip", { length: 45 }),
  },
  (t) => [index("waivers_event_entry_idx").on(t.eventId, t.entryId)],
);

export const uploads = mysqlTable(
  "uploads",
  {
    id: uuid("id").primaryKey(),
    eventId: uuid("event_id")
      .notNull()
      .references(() => events.id),
    entryId: uuid("entry_id").references(() => entries.id),
    recordId: binaryCollation(char("record_id", { length: 36 })),
    kind: mysqlEnum("kind", ["photo", "dyno-sheet", "other"]).notNull(),
    bucket: key("bucket", 63).notNull(),
    objectKey: key("object_key", 300).notNull(),
    contentType: varchar("content_type", { length: 100 }).notNull(),
    byteSize: int("byte_size").notNull(),
    sha256: binaryCollation(char("sha256", { length: 64 })),
    uploadedBy: userId("uploaded_by")
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [
    index("uploads_event_entry_idx").on(t.eventId, t.entryId),
    uniqueIndex("uploads_object_unique").on(t.bucket, t.objectKey),
  ],
);

/** Each webhook event the payments provider delivered, by its id: a redelivery finds its row and
 *  changes nothing. */
export const paymentWebhookEvents = mysqlTable("payment_webhook_events", {
  providerEventId: key("provider_event_id", 120).primaryKey(),
  provider: key("provider", 30).notNull(),
  type: varchar("type", { length: 80 }).notNull(),
  receivedAt: datetime("received_at", { mode: "date", fsp: 3 }).notNull(),
});

// ── Logs ───────────────────────────────────────────────────────────────────────────────────
export const mailLog = mysqlTable(
  "mail_log",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    eventId: uuid("event_id").references(() => events.id),
    toAddress: key("to_address", 255).notNull(),
    subject: varchar("subject", { length: 255 }).notNull(),
    kind: varchar("kind", { length: 40 }).notNull(),
    messageId: key("message_id", 255),
    status: mysqlEnum("status", ["sent", "failed"]).notNull(),
    error: varchar("error", { length: 500 }),
    /** The job that sent it (lib/jobs): a job run again finds its mail already sent. */
    jobId: bigint("job_id", { mode: "number", unsigned: true }),
    createdAt: createdAt(),
  },
  (t) => [
    index("mail_log_event_idx").on(t.eventId, t.createdAt),
    uniqueIndex("mail_log_job_sent_idx").on(t.jobId),
  ],
);

export const jobStatuses = ["queued", "running", "done", "failed"] as const;

/**
 * The durable job queue (lib/jobs, scripts/worker.ts): work taken off the request path —
 * re-deriving verdicts after a sync, sending e-mail. A worker claims due jobs with
 * `FOR UPDATE SKIP LOCKED` and holds each for a lease it renews while working; a job whose worker
 * died is taken again when its lease runs out. Times are the database's own (UTC_TIMESTAMP), so
 * every worker and app process agrees on them.
 */
export const jobs = mysqlTable(
  "jobs",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    kind: key("kind", 40).notNull(),
    /** Enqueuing the same key twice adds one job (e.g. one e-mail per verdict change and person). */
    dedupeKey: key("dedupe_key", 255),
    payload: json("payload").notNull(),
    status: mysqlEnum("status", jobStatuses).notNull().default("queued"),
    attempts: int("attempts").notNull().default(0),
    runAfter: datetime("run_after", { mode: "date", fsp: 3 }).notNull(),
    lockedUntil: datetime("locked_until", { mode: "date", fsp: 3 }),
    /** Which claim holds the job: finishing, retrying and renewing need it (a worker whose lease
     *  ran out cannot touch a job another has taken since). */
    leaseToken: key("lease_token", 36),
    lastError: varchar("last_error", { length: 1000 }),
    createdAt: createdAt(),
    doneAt: datetime("done_at", { mode: "date", fsp: 3 }),
  },
  (t) => [
    uniqueIndex("jobs_dedupe_idx").on(t.dedupeKey),
    index("jobs_due_idx").on(t.status, t.kind, t.runAfter),
  ],
);

export const auditLog = mysqlTable(
  "audit_log",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    eventId: uuid("event_id").references(() => events.id),
    actorId: userId("actor_id").references(() => users.id),
    action: varchar("action", { length: 64 }).notNull(),
    subjectType: varchar("subject_type", { length: 40 }).notNull(),
    subjectId: key("subject_id", 64).notNull(),
    detail: json("detail"),
    createdAt: createdAt(),
  },
  (t) => [index("audit_log_event_idx").on(t.eventId, t.createdAt)],
);

/** Counters of rate-limiter-flexible's MySQL store (lib/auth/sign-in-limits.ts): sign-in attempts
 *  and sign-in e-mails per account and per client address. Kept in MariaDB so a restart does not
 *  reset them and several app servers share them. Column order and types are the store's own
 *  (it inserts `VALUES (key, points, expire)`); `expire` is milliseconds since the epoch. */
export const rateLimits = mysqlTable("rate_limits", {
  key: key("key", 255).primaryKey(),
  points: int("points").notNull().default(0),
  expire: bigint("expire", { mode: "number", unsigned: true }),
});
