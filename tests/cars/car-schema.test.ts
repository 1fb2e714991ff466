import { describe, expect, it } from "vitest";
import { carInputSchemaFor } from "@/lib/cars/car-schema";

const schema = carInputSchemaFor({ thisYear: 2026 });
const base = { make: "Mazda", model: "MX-5 NB", year: "2001", colour: "Silver" };
const issues = (input: unknown) => {
  const r = schema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
};
const mm = (field: "bodyWidth" | "roofHeight", text: string) => {
  const r = schema.safeParse({ ...base, [field]: text });
  if (!r.success) throw new Error(r.error.issues.map((i) => i.message).join("; "));
  return r.data[field];
};

describe("the garage's car schema", () => {
  it("takes a car and trims its text", () => {
    const r = schema.parse({ ...base, make: "  Mazda ", model: " MX-5 NB  ", colour: " Silver " });
    expect(r).toMatchObject({ make: "Mazda", model: "MX-5 NB", colour: "Silver", year: 2001 });
    expect(r.bodyWidth).toBeNull();
    expect(r.roofHeight).toBeNull();
  });

  it("runs the model year from 1900 to next year's model year", () => {
    // Source: 40 CFR 85.2302 (from memory) — a model year may begin on 2 January of the calendar
    // year before, so next year's model can be on sale now; nothing later exists yet.
    expect(issues({ ...base, year: "2027" })).toEqual([]);
    expect(issues({ ...base, year: "2028" })).toEqual([
      "year: Enter a model year no later than 2027 (next year's models are on sale)",
    ]);
    expect(issues({ ...base, year: "1900" })).toEqual([]);
    expect(issues({ ...base, year: "1899" })).toEqual(["year: Enter a model year from 1900 on"]);
    expect(issues({ ...base, year: "2001.5" })).toEqual(["year: Enter a whole year, e.g. 2004"]);
    expect(issues({ ...base, year: "" })[0]).toMatch(/^year: /);
  });

  it("wants make 1–60, model 1–80 and colour 1–40 characters after trimming", () => {
    expect(issues({ ...base, make: "   " })).toEqual(["make: Enter the make, e.g. Mazda"]);
    expect(issues({ ...base, make: "M".repeat(60) })).toEqual([]);
    expect(issues({ ...base, make: "M".repeat(61) })).toEqual([
      "make: Keep the make to 60 characters",
    ]);
    expect(issues({ ...base, model: "m".repeat(80) })).toEqual([]);
    expect(issues({ ...base, model: "m".repeat(81) })).toEqual([
      "model: Keep the model to 80 characters",
    ]);
    expect(issues({ ...base, colour: "" })).toEqual([
      "colour: Enter the colour, so the tech line can spot it",
    ]);
  });

  it("refuses a field it does not know, never dropping it", () => {
    expect(issues({ ...base, ownerId: "someone-else" })[0]).toMatch(/ownerId/);
  });

  it("reads body width and roof height in mm or in and stores millimetres", () => {
    // Source: NIST SP 811 App. B.8 — 1 in = 25.4 mm exactly (the international inch, 1959).
    expect(mm("bodyWidth", "1640")).toBe(1640);
    expect(mm("bodyWidth", "1640 mm")).toBe(1640);
    expect(mm("bodyWidth", "64.5 in")).toBe(1638.3); // 64.5 × 25.4 = 1638.3
    expect(mm("bodyWidth", '64.5"')).toBe(1638.3);
    expect(mm("bodyWidth", "64 1/2 in")).toBe(1638.3);
    expect(mm("roofHeight", "48 in")).toBe(1219.2); // 48 × 25.4 = 1219.2
    expect(mm("roofHeight", "  ")).toBeNull();
  });

  it("refuses a figure no car has, and guesses inches for a bare number that fits in inches", () => {
    expect(issues({ ...base, bodyWidth: "64.5" })).toEqual([
      'bodyWidth: A car\'s body width is between 1200 mm (47.2 in) and 2550 mm (100.4 in); 64.5 reads as 65 mm (2.5 in). Did you mean 64.5 in? Add "in" after the number.',
    ]);
    // Source: Council Directive 96/53/EC Annex I 1.1 — 2.55 m the widest road vehicle allowed.
    expect(issues({ ...base, bodyWidth: "2551 mm" })[0]).toMatch(/between 1200 mm/);
    expect(issues({ ...base, bodyWidth: "2550 mm" })).toEqual([]);
    expect(issues({ ...base, roofHeight: "12 ft" })[0]).toMatch(/^roofHeight: A car's roof height/);
    expect(issues({ ...base, bodyWidth: "sixty in" })[0]).toMatch(/^bodyWidth: /);
    expect(issues({ ...base, bodyWidth: "1,640 mm" })[0]).toMatch(/no thousands separator/);
  });
});
