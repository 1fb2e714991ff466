// Saving a pre-check plan against a car: the owner may, for their own car; anyone else's car is
// refused and nothing is stored. The owner lists and deletes their own plans only.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { callServerAction } from "../support/call-server-action";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const ACTIONS = "app/pre-check/actions.ts";

const inch = (value: number) => ({ value, unit: "in" });
/** Two 32 in halves + two ¼ in end plates (common practice (no source): 64.5 in). */
const plan = {
  car: { bodyWidth: inch(64), roofHeight: inch(52), rearmostBodywork: inch(36) },
  wing: {
    span: { kind: "parts", half: inch(32) },
    endPlate: inch(0.25),
    chord: inch(10),
    height: inch(58),
    mount: { distance: inch(3), direction: "behind" },
  },
};

let owner: HttpSession;
let ownCarId: string;
let otherCarId: string;
let ownerId: string;

async function plansNamed(name: string) {
  return queryTestDb<{ id: string; car_id: string; owner_id: string; plan: unknown }>(
    databaseUrl,
    "select id, car_id, owner_id, plan from aero_plans where name = ?",
    [name],
  );
}

function save(session: HttpSession, fields: Record<string, string>) {
  return callServerAction(session, {
    action: `${ACTIONS}#saveAeroPlanAction`,
    page: "/pre-check",
    fields,
    state: { status: "idle" },
  });
}

beforeAll(async () => {
  const [me] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from users where email = ?",
    [demo.entrant],
  );
  if (!me) throw new Error("no demo entrant");
  ownerId = me.id;
  const [own] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from cars where owner_id = ? and retired_at is null order by id limit 1",
    [ownerId],
  );
  const [other] = await queryTestDb<{ id: string }>(
    databaseUrl,
    "select id from cars where owner_id <> ? order by id limit 1",
    [ownerId],
  );
  if (!own || !other) throw new Error("no cars");
  ownCarId = own.id;
  otherCarId = other.id;
  owner = new HttpSession(appUrl);
  await owner.signInWithPassword(demo.entrant, demo.password);
});
afterAll(async () => {
  await queryTestDb(databaseUrl, "delete from aero_plans where name like 'precheck-test %'");
});

describe("saving a pre-check plan", () => {
  it("saves against one's own car, and the page lists it", async () => {
    const answer = await save(owner, {
      carId: ownCarId,
      name: "precheck-test own",
      plan: JSON.stringify(plan),
    });
    expect(answer.status).toBe(200);
    expect(answer.text).toContain('Saved \\"precheck-test own\\"');
    const rows = await plansNamed("precheck-test own");
    expect(rows).toHaveLength(1);
    expect(rows[0]?.car_id).toBe(ownCarId);
    expect(rows[0]?.owner_id).toBe(ownerId);
    const page = await (await owner.fetch("/pre-check")).text();
    expect(page).toContain("precheck-test own");
  });

  it("refuses someone else's car and stores nothing", async () => {
    const answer = await save(owner, {
      carId: otherCarId,
      name: "precheck-test other",
      plan: JSON.stringify(plan),
    });
    expect(answer.status).toBe(200);
    expect(answer.text).toMatch(/"status":"error"/);
    expect(answer.text).toContain("Choose one of your own cars still in use.");
    expect(await plansNamed("precheck-test other")).toHaveLength(0);
  });

  it("refuses a signed-out caller", async () => {
    const answer = await save(new HttpSession(appUrl), {
      carId: ownCarId,
      name: "precheck-test anonymous",
      plan: JSON.stringify(plan),
    });
    expect(answer.text).toContain("Sign in first.");
    expect(await plansNamed("precheck-test anonymous")).toHaveLength(0);
  });

  it("deletes one's own plan, and leaves someone else's alone", async () => {
    await save(owner, {
      carId: ownCarId,
      name: "precheck-test delete",
      plan: JSON.stringify(plan),
    });
    const [row] = await plansNamed("precheck-test delete");
    if (!row) throw new Error("not saved");
    const other = new HttpSession(appUrl);
    await other.signInWithPassword(demo.scrutineer, demo.password);
    const refused = await callServerAction(other, {
      action: `${ACTIONS}#deleteAeroPlanAction`,
      page: "/pre-check",
      fields: { planId: row.id },
      state: { status: "idle" },
    });
    expect(refused.text).toContain("No such plan of yours.");
    expect(await plansNamed("precheck-test delete")).toHaveLength(1);
    const done = await callServerAction(owner, {
      action: `${ACTIONS}#deleteAeroPlanAction`,
      page: "/pre-check",
      fields: { planId: row.id },
      state: { status: "idle" },
    });
    expect(done.text).toContain("Deleted.");
    expect(await plansNamed("precheck-test delete")).toHaveLength(0);
  });

  it("serves the page signed out, with the upcoming events' rule sets in it", async () => {
    const response = await new HttpSession(appUrl).fetch("/pre-check");
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toContain("Will your wing fit?");
    expect(html).toContain("Cinder Vale Winter Sprint");
  });
});
