import { describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");

const countCars = async () =>
  Number((await queryTestDb<{ n: number }>(databaseUrl, "select count(*) as n from cars"))[0]?.n);

describe("POST /api/cars", () => {
  it("answers 422 with a message per bad field and writes no row", async () => {
    const entrant = new HttpSession(appUrl);
    await entrant.signInWithPassword(demo.entrant, demo.password);
    const before = await countCars();
    const response = await entrant.fetch("/api/cars", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ make: "", model: "MX-5", year: "nineteen", colour: "x".repeat(90) }),
    });
    expect(response.status).toBe(422);
    const body = (await response.json()) as {
      error: { code: string; fields: Record<string, string[]> };
    };
    expect(body.error.code).toBe("invalid_input");
    expect(Object.keys(body.error.fields).sort()).toEqual(["colour", "make", "year"]);
    expect(body.error.fields.make?.[0]).toMatch(/make/i);
    expect(await countCars()).toBe(before);
  });

  it("answers 422 to a body that is not JSON at all, and writes no row", async () => {
    const entrant = new HttpSession(appUrl);
    await entrant.signInWithPassword(demo.entrant, demo.password);
    const before = await countCars();
    const response = await entrant.fetch("/api/cars", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: "{not json",
    });
    expect(response.status).toBe(422);
    // Sent as text (fetch's default type for a string), it is refused by its type: 415.
    const asText = await entrant.fetch("/api/cars", { method: "POST", body: "{not json" });
    expect(asText.status).toBe(415);
    expect(await countCars()).toBe(before);
  });

  it("stores a good car for the signed-in entrant", async () => {
    const entrant = new HttpSession(appUrl);
    await entrant.signInWithPassword(demo.entrant, demo.password);
    const before = await countCars();
    const response = await entrant.fetch("/api/cars", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({
        make: "Honda",
        model: "Integra DC2",
        year: 1998,
        colour: "Championship White",
      }),
    });
    expect(response.status).toBe(201);
    expect(await countCars()).toBe(before + 1);
  });
});
