// The garage through its real routes: add, change, retire and bring back a car; lengths in mm
// or in stored in millimetres; another person's car refused; bad input refused with words.
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demo } from "../support/demo-accounts";
import { HttpSession } from "../support/http-session";
import { queryTestDb } from "../support/query-test-db";
import { removeCars, sendJson } from "./garage-support";

const appUrl = inject("appUrl");
const databaseUrl = inject("databaseUrl");
const made: string[] = [];
let owner: HttpSession;
let stranger: HttpSession;

type CarAnswer = {
  car: {
    id: string;
    make: string;
    year: number;
    bodyWidthMm: number | null;
    roofHeightMm: number | null;
    retiredAt: string | null;
  };
};

beforeAll(async () => {
  owner = new HttpSession(appUrl);
  await owner.signInWithPassword(demo.codriver, demo.password);
  stranger = new HttpSession(appUrl);
  await stranger.signInWithPassword(demo.entrant, demo.password);
});
afterAll(() => removeCars(databaseUrl, made));

async function addCar(body: Record<string, unknown>) {
  const response = await sendJson(owner, "POST", "/api/cars", body);
  expect(response.status).toBe(201);
  const { car } = (await response.json()) as CarAnswer;
  made.push(car.id);
  return car;
}
const stored = async (carId: string) =>
  (
    await queryTestDb<{
      make: string;
      model: string;
      body_width_mm: number | null;
      roof_height_mm: number | null;
      retired_at: Date | null;
    }>(
      databaseUrl,
      "select make, model, body_width_mm, roof_height_mm, retired_at from cars where id = ?",
      [carId],
    )
  )[0];

describe("the garage's cars", () => {
  it("adds a car with its width in inches and stores millimetres", async () => {
    const car = await addCar({
      make: " Honda ",
      model: "S2000 AP2",
      year: "2006",
      colour: "Berlina Black",
      bodyWidth: '68.9"',
      roofHeight: "1270 mm",
    });
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly: 68.9 in = 1750.06 mm (to 0.1 mm).
    expect(car).toMatchObject({ make: "Honda", bodyWidthMm: 1750.1, roofHeightMm: 1270 });
    expect(await stored(car.id)).toMatchObject({
      make: "Honda",
      body_width_mm: 1750.1,
      roof_height_mm: 1270,
    });
  });

  it("changes a car: every field sent again, lengths in either unit", async () => {
    const car = await addCar({ make: "Mazda", model: "MX-5", year: 1999, colour: "Red" });
    const response = await sendJson(owner, "PATCH", `/api/cars/${car.id}`, {
      make: "Mazda",
      model: "MX-5 NB",
      year: "2001",
      colour: "Silver",
      bodyWidth: "64.5 in",
      roofHeight: "",
    });
    expect(response.status).toBe(200);
    // Source: NIST SP 811 App. B.8 — 64.5 in × 25.4 mm/in = 1638.3 mm.
    expect(((await response.json()) as CarAnswer).car).toMatchObject({
      year: 2001,
      bodyWidthMm: 1638.3,
      roofHeightMm: null,
    });
    expect(await stored(car.id)).toMatchObject({ model: "MX-5 NB", body_width_mm: 1638.3 });
  });

  it("retires a car (kept, marked) and brings it back", async () => {
    const car = await addCar({ make: "Toyota", model: "GT86", year: 2014, colour: "White" });
    const retire = await sendJson(owner, "POST", `/api/cars/${car.id}/retirement`, {
      retired: true,
    });
    expect(retire.status).toBe(200);
    expect((await stored(car.id))?.retired_at).toBeInstanceOf(Date);
    const listed = (await (await owner.fetch("/api/cars")).json()) as {
      cars: { id: string; retiredAt: string | null }[];
    };
    expect(listed.cars.find((c) => c.id === car.id)?.retiredAt).toMatch(/^\d{4}-/);
    const back = await sendJson(owner, "POST", `/api/cars/${car.id}/retirement`, {
      retired: false,
    });
    expect(await back.json()).toEqual({ retiredAt: null });
    expect((await stored(car.id))?.retired_at).toBeNull();
  });

  it("refuses another person's car and changes nothing", async () => {
    const car = await addCar({ make: "BMW", model: "E36 M3", year: 1996, colour: "Blue" });
    const edit = await sendJson(stranger, "PATCH", `/api/cars/${car.id}`, {
      make: "Stolen",
      model: "Car",
      year: 2000,
      colour: "Black",
    });
    expect(edit.status).toBe(403);
    const retire = await sendJson(stranger, "POST", `/api/cars/${car.id}/retirement`, {
      retired: true,
    });
    expect(retire.status).toBe(403);
    expect(await stored(car.id)).toMatchObject({ make: "BMW", retired_at: null });
    const missing = await sendJson(owner, "PATCH", `/api/cars/${crypto.randomUUID()}`, {});
    expect(missing.status).toBe(404);
  });

  it("refuses bad input with field messages a person can act on", async () => {
    const car = await addCar({ make: "Lotus", model: "Elise S1", year: 1998, colour: "Yellow" });
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [{ year: "2999" }, "year", /no later than/],
      [{ year: "1850" }, "year", /from 1900/],
      [{ make: "x".repeat(61) }, "make", /60 characters/],
      [{ model: "   " }, "model", /Enter the model/],
      [{ bodyWidth: "64.5" }, "bodyWidth", /Did you mean 64.5 in\?/],
      [{ roofHeight: "4 m" }, "roofHeight", /roof height is between/],
      [{ owner_id: "x" }, "", /./],
    ];
    for (const [change, field, message] of cases) {
      const body = { make: "Lotus", model: "Elise S1", year: 1998, colour: "Yellow", ...change };
      const response = await sendJson(owner, "PATCH", `/api/cars/${car.id}`, body);
      expect(response.status, JSON.stringify(change)).toBe(422);
      const { error } = (await response.json()) as {
        error: { fields: Record<string, string[]> };
      };
      const messages = field ? error.fields[field] : Object.values(error.fields).flat();
      expect(messages?.join(" "), JSON.stringify(change)).toMatch(message);
    }
    const notJson = await owner.fetch(`/api/cars/${car.id}`, {
      method: "PATCH",
      headers: { "content-type": "text/plain" },
      body: "make=x",
    });
    expect(notJson.status).toBe(415);
    const retireJunk = await sendJson(owner, "POST", `/api/cars/${car.id}/retirement`, {
      retired: "yes",
    });
    expect(retireJunk.status).toBe(422);
    expect(await stored(car.id)).toMatchObject({ make: "Lotus", model: "Elise S1" });
  });
});
