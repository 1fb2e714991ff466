import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import type { RuleSet } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import type { Verdict } from "@/lib/scrutineer/verdicts/verdict-schema";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

type Lib = {
  checkRuleSetDraft: typeof import("@/lib/rule-sets/check-rule-set-draft").checkRuleSetDraft;
  previewRuleSetChange: typeof import("@/lib/rule-sets/preview-rule-set-change").previewRuleSetChange;
  insertRuleSetVersion: typeof import("@/db/queries/insert-rule-set-version").insertRuleSetVersion;
  pinRuleSet: typeof import("@/lib/rule-sets/pin-rule-set").pinRuleSet;
  closeDb: () => Promise<void>;
};
let lib: Lib;
let eventId = "";
let organizerId = "";
let v1Id = "";
let v1: RuleSet;

async function signedIn(email: string): Promise<HttpSession> {
  const session = new HttpSession(appUrl);
  await session.signInWithPassword(email, demo.password);
  return session;
}

beforeAll(async () => {
  const [event] = await queryTestDb<{ id: string; rule_set_version_id: string; body: string }>(
    databaseUrl,
    `select e.id, e.rule_set_version_id, v.body from events e
     join rule_set_versions v on v.id = e.rule_set_version_id order by e.event_date limit 1`,
  );
  eventId = event?.id ?? "";
  v1Id = event?.rule_set_version_id ?? "";
  v1 = ruleSetSchema.parse(typeof event?.body === "string" ? JSON.parse(event.body) : event?.body);
  const [organizer] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from users where email = ?",
    [demo.organizer],
  );
  organizerId = organizer?.id ?? "";
  // The query functions read DATABASE_URL when first imported; point them at this run's database.
  process.env.DATABASE_URL = databaseUrl;
  lib = {
    checkRuleSetDraft: (await import("@/lib/rule-sets/check-rule-set-draft")).checkRuleSetDraft,
    previewRuleSetChange: (await import("@/lib/rule-sets/preview-rule-set-change"))
      .previewRuleSetChange,
    insertRuleSetVersion: (await import("@/db/queries/insert-rule-set-version"))
      .insertRuleSetVersion,
    pinRuleSet: (await import("@/lib/rule-sets/pin-rule-set")).pinRuleSet,
    closeDb: (await import("@/db/client")).closeDb,
  };
});

afterAll(async () => {
  // Leave the event judged by version 1 again, so other test files see the seeded verdicts.
  if (v1Id !== "") await lib.pinRuleSet({ eventId, versionId: v1Id, userId: organizerId });
  await lib.closeDb();
});

describe("the organizer's class-rules page", () => {
  it("opens for the organizer and is refused to a scrutineer and an entrant", async () => {
    const page = await (await signedIn(demo.organizer)).fetch(`/organizer/${eventId}/rules`);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("The class ladder, low to high");
    expect(html).toMatch(new RegExp(`Draft version (<!-- -->)?${v1.version + 1}<`));
    expect(
      (await (await signedIn(demo.scrutineer)).fetch(`/organizer/${eventId}/rules`)).status,
    ).toBe(403);
    expect((await (await signedIn(demo.entrant)).fetch(`/organizer/${eventId}/rules`)).status).toBe(
      403,
    );
  });

  it("lets an official download a version as JSON that the schema reads back", async () => {
    const scrutineer = await signedIn(demo.scrutineer);
    const response = await scrutineer.fetch(`/api/events/${eventId}/rule-sets/${v1Id}`);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-disposition")).toContain("rule-set-v1.json");
    expect(ruleSetSchema.parse(await response.json())).toEqual(v1);
    const entrant = await signedIn(demo.entrant);
    expect((await entrant.fetch(`/api/events/${eventId}/rule-sets/${v1Id}`)).status).toBe(403);
    const other = "01900000-0000-7000-8000-000000000000";
    expect((await scrutineer.fetch(`/api/events/${eventId}/rule-sets/${other}`)).status).toBe(404);
  });
});

describe("a new rule-set version: check, save, preview, pin", () => {
  it("refuses broken JSON and a wrong version number with their places, and stores nothing", async () => {
    const before = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from rule_set_versions",
    );
    const syntax = await lib.checkRuleSetDraft({ eventId, text: '{"schemaVersion": 1,' });
    expect(syntax.ok ? [] : syntax.issues.map((i) => i.path)).toEqual([""]);
    const wrongVersion = await lib.checkRuleSetDraft({
      eventId,
      text: JSON.stringify({ ...v1, version: 7 }),
    });
    expect(wrongVersion.ok ? [] : wrongVersion.issues.map((i) => i.message)).toEqual([
      "The next version of this rule set is 2.",
    ]);
    const after = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from rule_set_versions",
    );
    expect(Number(after[0]?.n)).toBe(Number(before[0]?.n));
  });

  it("previews exactly the verdicts that pinning then stores, and locks the version", async () => {
    // A cleared car with a wing-height reading, below the top class.
    const rows = await queryTestDb<{ entry_id: string; driver_email: string; result: unknown }>(
      databaseUrl,
      `select v.entry_id, u.email as driver_email, v.result from verdicts v
       join entries e on e.id = v.entry_id join users u on u.id = e.driver_id
       where v.event_id = ? and v.status = 'cleared' order by e.car_number`,
      [eventId],
    );
    const candidates = rows.map((r) => ({
      ...r,
      verdict: (typeof r.result === "string" ? JSON.parse(r.result) : r.result) as Verdict,
    }));
    const top = v1.classes[v1.classes.length - 1]?.id;
    const chosen = candidates.find(
      (c) =>
        c.verdict.classId !== top &&
        c.verdict.classChecks
          .find((k) => k.classId === c.verdict.classId)
          ?.rules.some((r) => r.ruleId === "wing-height" && r.reading !== null),
    );
    expect(chosen, "a cleared car with a wing-height reading").toBeDefined();
    if (!chosen) return;
    const classId = chosen.verdict.classId ?? "";
    const rule = chosen.verdict.classChecks
      .find((k) => k.classId === classId)
      ?.rules.find((r) => r.ruleId === "wing-height");
    const reading = rule?.reading;
    if (!reading) throw new Error("no reading");
    // Source: JCGM 106:2012 §8 — under guarded acceptance a value with value − U > limit is over.
    const newLimit = Math.floor(reading.value - reading.expandedUncertainty - 5);
    const v2: RuleSet = {
      ...v1,
      version: 2,
      classes: v1.classes.map((c) =>
        c.id === classId && c.aero.wing.allowed && c.aero.wing.height
          ? {
              ...c,
              aero: {
                ...c.aero,
                wing: { ...c.aero.wing, height: { ...c.aero.wing.height, maxMm: newLimit } },
              },
            }
          : c,
      ),
    };
    const checked = await lib.checkRuleSetDraft({ eventId, text: JSON.stringify(v2) });
    expect(checked.ok).toBe(true);
    if (!checked.ok) return;
    const preview = await lib.previewRuleSetChange({ eventId, candidate: checked.ruleSet });
    const mine = preview.changed.find((c) => c.entryId === chosen.entry_id);
    expect(mine?.before.status).toBe("cleared");
    expect(mine?.after.status).not.toBe("cleared");
    expect(mine?.why.join(" ")).toMatch(/wing height: limit .* → .*; pass → fail/);
    expect(preview.ruleSetChanges.map((c) => c.path)).toEqual([
      `classes[${classId}].aero.wing.height.maxMm`,
    ]);

    const saved = await lib.insertRuleSetVersion({
      eventId,
      ruleSet: checked.ruleSet,
      notes: "integration test: lower one wing height",
      createdBy: organizerId,
    });
    expect(saved.version).toBe(2);
    // A second save of "version 2" is refused: versions are append-only and numbered once.
    await expect(
      lib.insertRuleSetVersion({
        eventId,
        ruleSet: checked.ruleSet,
        notes: "again",
        createdBy: organizerId,
      }),
    ).rejects.toThrow(/Version 2 is taken; save it as 3/);

    const pinnedAt = new Date(Date.now() - 1000);
    const result = await lib.pinRuleSet({ eventId, versionId: saved.id, userId: organizerId });
    expect(result).toMatchObject({ version: 2, previousVersion: 1 });
    expect(result.changed).toBe(preview.changed.length);

    const stored = await queryTestDb<{
      entry_id: string;
      status: string;
      final_class: string | null;
    }>(databaseUrl, "select entry_id, status, final_class from verdicts where event_id = ?", [
      eventId,
    ]);
    const byEntry = new Map(stored.map((s) => [s.entry_id, s]));
    for (const change of preview.changed) {
      expect(byEntry.get(change.entryId)?.status).toBe(change.after.status);
      expect(byEntry.get(change.entryId)?.final_class ?? null).toBe(change.after.classId);
    }
    const [version] = await queryTestDb<{ locked_at: Date | null }>(
      databaseUrl,
      "select locked_at from rule_set_versions where id = ?",
      [saved.id],
    );
    expect(version?.locked_at).not.toBeNull();
    const audit = await queryTestDb<{ action: string }>(
      databaseUrl,
      "select action from audit_log where subject_id = ? order by id",
      [saved.id],
    );
    expect(audit.map((a) => a.action)).toEqual(["rule-set.save", "rule-set.pin"]);
    await waitForQueueIdle(databaseUrl); // the worker sends the e-mails the pin queued
    const mails = await queryTestDb<{ n: number }>(
      databaseUrl,
      "select count(*) as n from mail_log where kind = 'verdict' and to_address = ? and created_at >= ?",
      [chosen.driver_email, pinnedAt],
    );
    expect(Number(mails[0]?.n)).toBeGreaterThanOrEqual(1);
  });
});
