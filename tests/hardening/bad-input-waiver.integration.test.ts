// Bad input for the declarations and waiver actions (issue 11, part 5): generated malformed
// forms (fast-check) → an error state in words, never a 5xx, and no row added or changed. The
// same contract as bad-input.integration.test.ts. Each entry and person here is this file's own.
import fc from "fast-check";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import { entryDeclarationsSchema } from "@/lib/scrutineer/classes/entry-declarations-schema";
import { callServerAction } from "../support/call-server-action";
import { countAllRows } from "../support/count-all-rows";
import { HttpSession } from "../support/http-session";
import { isReadable, junkValue, mutate } from "../support/malformed";
import { queryTestDb } from "../support/query-test-db";
import { removeScratchEntries } from "../support/scratch-entries";
import {
  demoEvent,
  makeEntry,
  makePerson,
  removePeople,
  signedIn,
  sixteenOn,
} from "../waiver/waiver-fixtures";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const RUNS = 150;
const COUNTERS = ["rate_limits", "sign_in_limits"];

let entryId = "";
let driver: HttpSession;
const people: string[] = [];
let rowsBefore: Record<string, number>;
let declarationsBefore = "";

const declarationsOf = async () =>
  JSON.stringify(
    (await queryTestDb(databaseUrl, "select declarations from entries where id = ?", [entryId]))[0],
  );

beforeAll(async () => {
  const event = await demoEvent(databaseUrl);
  // A minor, so a guardian's name and e-mail are asked too.
  const person = await makePerson(databaseUrl, {
    name: "Quill Abernethy",
    dateOfBirth: sixteenOn(event.event_date),
  });
  people.push(person.id);
  entryId = await makeEntry(databaseUrl, event.id, { driverId: person.id });
  driver = await signedIn(appUrl, person.email);
});
afterAll(async () => {
  await removeScratchEntries(databaseUrl, [entryId]);
  await removePeople(databaseUrl, people);
});
beforeEach(async () => {
  rowsBefore = await countAllRows(databaseUrl, COUNTERS);
  declarationsBefore = await declarationsOf();
});
afterEach(async () => {
  expect(await countAllRows(databaseUrl, COUNTERS)).toEqual(rowsBefore);
  expect(await declarationsOf()).toBe(declarationsBefore);
});

const junkText = junkValue.map((v) => (typeof v === "string" ? v : (JSON.stringify(v) ?? "")));

async function expectRefusal(answer: { status: number; text: string }) {
  // A form over the page's body limit is refused before it is read (proxy.ts), in words.
  if (answer.status === 413) {
    expect(isReadable(answer.text), answer.text.slice(0, 300)).toBe(true);
    return;
  }
  expect(answer.status, answer.text.slice(0, 300)).toBe(200);
  expect(answer.text).toMatch(/"status":"error"/);
  const message = /"message":"((?:[^"\\]|\\.)*)"/.exec(answer.text)?.[1];
  expect(isReadable(message), answer.text.slice(0, 300)).toBe(true);
}

const validDeclarations = {
  aero: { wing: true, splitter: false, diffuser: false },
  dynoSheet: {
    power: { value: 150, unit: "hp" },
    measuredAt: "wheel",
    correction: "sae-j1349",
    ambient: { pressure: { value: 1013, unit: "hPa" }, temperature: { value: 20, unit: "C" } },
    date: "2026-04-01",
  },
  tyres: { kind: "graded", treadwear: 200 },
  modificationPoints: 4,
  driverWeightKg: 82,
  ballastKg: 0,
  engine: null,
};

describe("the declarations action", () => {
  it(`refuses ${RUNS} malformed declarations in words and saves nothing`, async () => {
    const paths = [
      "aero",
      "aero.wing",
      "dynoSheet",
      "dynoSheet.power.value",
      "dynoSheet.power.unit",
      "dynoSheet.ambient.pressure.value",
      "dynoSheet.ambient.pressure.unit",
      "dynoSheet.ambient.temperature.value",
      "dynoSheet.date",
      "tyres",
      "tyres.treadwear",
      "modificationPoints",
      "driverWeightKg",
      "ballastKg",
      "engine",
    ];
    // Junk text that happens to be a JSON object the engine takes ({"a":["deep"]}: unknown keys
    // dropped, every field defaulted) is a valid declaration, and is saved: keep it out.
    const refusedByEngine = (text: string) => {
      try {
        return !entryDeclarationsSchema.safeParse(JSON.parse(text)).success;
      } catch {
        return true;
      }
    };
    const malformed = fc.oneof(
      junkText.filter(refusedByEngine),
      mutate(validDeclarations, paths)
        // Only what the engine refuses: a mutation that is still valid would be saved.
        .filter((d) => !entryDeclarationsSchema.safeParse(d).success)
        .map((d) => JSON.stringify(d) ?? "null"),
    );
    await fc.assert(
      fc.asyncProperty(malformed, fc.option(junkText, { nil: undefined }), async (text, id) => {
        const answer = await callServerAction(driver, {
          action: "app/(entrant)/entries/[entryId]/declare/actions.ts#saveDeclarationsAction",
          page: `/entries/${entryId}/declare`,
          fields: { entryId: id ?? entryId, declarations: text },
          state: { status: "idle" },
        });
        await expectRefusal(answer);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);
});

describe("the waiver actions", () => {
  it(`signing refuses ${RUNS} malformed forms in words and stores nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.record({ signedName: junkText, guardianName: junkText, guardianEmail: junkText }),
        fc.option(junkText, { nil: undefined }),
        async (fields, id) => {
          const answer = await callServerAction(driver, {
            action: "app/(entrant)/entries/[entryId]/waiver/actions.ts#signWaiverAction",
            page: `/entries/${entryId}/waiver`,
            fields: { entryId: id ?? entryId, ...fields },
            state: { status: "idle" },
          });
          await expectRefusal(answer);
        },
      ),
      { numRuns: RUNS },
    );
  }, 300_000);

  it(`the guardian's acceptance refuses ${RUNS} malformed forms in words, signed out`, async () => {
    const anonymous = new HttpSession(appUrl);
    await fc.assert(
      fc.asyncProperty(junkText, junkText, async (token, guardianName) => {
        const answer = await callServerAction(anonymous, {
          action: "app/guardian/[token]/actions.ts#acceptGuardianWaiverAction",
          page: "/guardian/not-a-token",
          fields: { token, guardianName },
          state: { status: "idle" },
        });
        await expectRefusal(answer);
      }),
      { numRuns: RUNS },
    );
  }, 300_000);
});
