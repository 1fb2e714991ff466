import { createElement } from "react";
import { v7 as uuidv7 } from "uuid";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { PhotosNotesPanel } from "@/components/tech/photos-notes-panel";
import { TechContext, type TechContextValue } from "@/components/tech/tech-context";
import { demoRuleSet } from "@/db/seed/demo-rule-set";
import type { EventPack } from "@/lib/offline/event-pack-schema";
import { mergeEntryRecords } from "@/lib/offline/merge-entry-records";
import type { StoredPack } from "@/lib/offline/save-event-pack";
import { partByTestId, render, textOf } from "../diagrams/render-markup";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { postSync } from "../support/post-sync";
import { queryTestDb } from "../support/query-test-db";
import { techFixtures } from "../support/tech-fixtures";
import { waitForQueueIdle } from "../support/wait-for-queue-idle";

// Issue 8, item 15: the void rule is written once. A void of a void undoes the first void (our
// own product rule, no outside source), and the car card, fed the server's own event pack, shows
// what the server's verdict counts.

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

let fx: Awaited<ReturnType<typeof techFixtures>>;
let sam: HttpSession;
let chief: HttpSession;
let samId: string;
let chiefId: string;
let entryId: string;
let clock = Date.now();

const record = (kind: string, officialId: string, payload: unknown) => {
  clock += 5;
  const at = new Date(clock);
  return {
    id: uuidv7({ msecs: at.getTime() }),
    kind,
    entryId,
    officialId,
    deviceId: "phone-void-rule",
    deviceTime: at.toISOString(),
    payload,
  };
};

beforeAll(async () => {
  fx = await techFixtures(databaseUrl);
  sam = new HttpSession(appUrl);
  await sam.signInWithPassword(demo.scrutineer, demo.password);
  chief = new HttpSession(appUrl);
  await chief.signInWithPassword(demo.chief, demo.password);
  samId = await fx.userId(demo.scrutineer);
  chiefId = await fx.userId(demo.chief);
  entryId = (await fx.entryNumbers())[26]?.id ?? "";
});

describe("a void the chief scrutineer undid", () => {
  it("is not in force on the car card, as it is not in the server's verdict", async () => {
    const note = record("note", samId, { text: "Battery clamp loose" });
    const take = record("void", samId, { targetRecordId: note.id, reason: "wrong car" });
    const sent = await postSync(sam, fx.eventId, "phone-void-rule", [note, take]);
    expect(sent.status).toBe(200);
    const undo = record("void", chiefId, {
      targetRecordId: take.id,
      reason: "it was this car after all",
    });
    expect((await postSync(chief, fx.eventId, "phone-void-rule", [undo])).status).toBe(200);
    await waitForQueueIdle(databaseUrl); // the worker has re-derived the verdict

    // The server: of the three records only the first void is cancelled.
    const [row] = await queryTestDb<{ result: unknown }>(
      databaseUrl,
      "select result from verdicts where entry_id = ?",
      [entryId],
    );
    const result = (typeof row?.result === "string" ? JSON.parse(row.result) : row?.result) as {
      records: { voided: number };
    };
    const voidedBefore = result.records.voided;

    // The phone: the pack the server hands out, merged as the car card merges it.
    const pack = (await (await sam.fetch(`/api/events/${fx.eventId}/pack`)).json()) as EventPack;
    const records = mergeEntryRecords(entryId, pack.records, []);
    expect(records.map((r) => r.id)).toEqual(expect.arrayContaining([note.id, take.id, undo.id]));
    const value: TechContextValue = {
      eventId: fx.eventId,
      official: { id: samId, name: "Sam" },
      deviceId: "phone-void-rule",
      canWrite: true,
      canChief: false,
      pack: pack as unknown as StoredPack,
      ruleSet: demoRuleSet,
      local: [],
      record: async () => {},
    };
    const markup = render(
      createElement(
        TechContext.Provider,
        { value },
        createElement(PhotosNotesPanel, { entryId, records }),
      ),
    );
    const notes = textOf(partByTestId(markup, "note-list"));
    expect(notes).toMatch(/Battery clamp loose/);
    expect(notes).not.toMatch(/void:/);
    // Nothing else of this car was voided before this test, so the one void the verdict counts
    // is the undone void itself.
    expect(voidedBefore).toBe(1);
  });
});
