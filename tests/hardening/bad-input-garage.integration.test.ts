// Bad input for the garage's write routes (issue 11, part 4): generated malformed cars,
// retirements and file forms (fast-check) → a refusal a person can read (4xx), never a 5xx, and
// no row changed in any table and no object stored. The same contract as
// bad-input.integration.test.ts.
import fc from "fast-check";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, inject, it } from "vitest";
import { carInputSchemaFor } from "@/lib/cars/car-schema";
import { countCarObjects, removeCars } from "../garage/garage-support";
import { countAllRows } from "../support/count-all-rows";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { isReadable, junkBody, junkValue, mutate } from "../support/malformed";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const RUNS = 300;
const COUNTERS = ["rate_limits", "sign_in_limits"];
const schema = carInputSchemaFor({ thisYear: new Date().getUTCFullYear() });
const onTheWire = (value: unknown): unknown => {
  const text = JSON.stringify(value);
  return text === undefined ? undefined : JSON.parse(text);
};

let owner: HttpSession;
let carId: string;
let rowsBefore: Record<string, number>;
let objectsBefore: number;

beforeAll(async () => {
  owner = new HttpSession(appUrl);
  await owner.signInWithPassword(demo.codriver, demo.password);
  const made = await owner.fetch("/api/cars", {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify({ make: "Subaru", model: "Impreza GC8", year: 1998, colour: "Blue" }),
  });
  carId = ((await made.json()) as { car: { id: string } }).car.id;
});
afterAll(() => removeCars(databaseUrl, [carId]));
beforeEach(async () => {
  rowsBefore = await countAllRows(databaseUrl, COUNTERS);
  objectsBefore = await countCarObjects(carId);
});
afterEach(async () => {
  expect(await countAllRows(databaseUrl, COUNTERS)).toEqual(rowsBefore);
  expect(await countCarObjects(carId)).toBe(objectsBefore);
});

async function expectRefusal(response: Response) {
  const text = await response.text();
  expect(response.status, text.slice(0, 300)).toBeGreaterThanOrEqual(400);
  expect(response.status, text.slice(0, 300)).toBeLessThan(500);
  const body = JSON.parse(text) as { error?: { message?: string } };
  expect(isReadable(body.error?.message), text.slice(0, 300)).toBe(true);
}

describe("PATCH /api/cars/[carId]", () => {
  const car = {
    make: "Subaru",
    model: "Impreza GC8",
    year: 1998,
    colour: "Blue",
    notes: "",
    bodyWidth: "1690 mm",
    roofHeight: "55.5 in",
  };
  const malformed = fc
    .oneof(mutate(car, Object.keys(car)), junkValue)
    .filter((v) => !schema.safeParse(onTheWire(v)).success);

  it(`refuses ${RUNS} malformed changes with a readable 4xx and changes nothing`, async () => {
    await fc.assert(
      fc.asyncProperty(malformed, async (input) => {
        await expectRefusal(
          await owner.fetch(`/api/cars/${carId}`, {
            method: "PATCH",
            headers: { "content-type": "application/json" },
            body: JSON.stringify(input),
          }),
        );
      }),
      { numRuns: RUNS },
    );
  }, 240_000);
});

describe("POST /api/cars/[carId]/retirement", () => {
  it("refuses junk in place of true or false", async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(
          junkValue.filter((v) => typeof v !== "boolean").map((retired) => ({ retired })),
          junkBody,
        ),
        async (input) => {
          await expectRefusal(
            await owner.fetch(`/api/cars/${carId}/retirement`, {
              method: "POST",
              headers: { "content-type": "application/json" },
              body: typeof input === "string" ? input : JSON.stringify(input),
            }),
          );
        },
      ),
      { numRuns: 150 },
    );
  }, 120_000);
});

describe("POST /api/cars/[carId]/files", () => {
  it("refuses junk forms: a missing or unknown kind, no file, a file that is not a picture", async () => {
    const kinds = fc.oneof(
      fc.constantFrom("front", "side", "rear", "dyno-sheet"),
      fc.string({ maxLength: 30 }),
    );
    const contents = fc.oneof(
      fc
        .uint8Array({ maxLength: 2048 })
        .filter((b) => !(b[0] === 0xff || b[0] === 0x89 || b[0] === 0x25 || b[0] === 0x52)),
      fc.string({ maxLength: 200 }).map((s) => new TextEncoder().encode(s)),
    );
    await fc.assert(
      fc.asyncProperty(kinds, contents, fc.boolean(), async (kind, bytes, asFile) => {
        const form = new FormData();
        form.set("kind", kind);
        if (asFile)
          form.set(
            "file",
            new File([bytes as Uint8Array<ArrayBuffer>], "photo.jpg", { type: "image/jpeg" }),
          );
        else form.set("file", new TextDecoder().decode(bytes));
        await expectRefusal(
          await owner.fetch(`/api/cars/${carId}/files`, { method: "POST", body: form }),
        );
      }),
      { numRuns: 150 },
    );
  }, 120_000);

  it("refuses a body that is not a multipart form", async () => {
    await expectRefusal(
      await owner.fetch(`/api/cars/${carId}/files`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: "{}",
      }),
    );
  });
});
