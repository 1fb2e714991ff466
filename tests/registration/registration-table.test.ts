import { describe, expect, it } from "vitest";
import { filterRegistrationRows } from "@/lib/registration/filter-registration-rows";
import { registrationCsv } from "@/lib/registration/registration-csv";
import type { RegistrationRow } from "@/lib/registration/registration-row";
import { registrationViewSchema } from "@/lib/registration/registration-view-schema";
import { sortRegistrationRows } from "@/lib/registration/sort-registration-rows";

// Invented rows (names, cars, classes are made up).
const row = (carNumber: number, drivers: string, extra: Partial<RegistrationRow> = {}) =>
  ({
    entryId: `e${carNumber}`,
    carNumber,
    drivers,
    car: "2004 Mazda MX-5",
    declaredClass: "Wren",
    waiver: "signed",
    paid: true,
    ...extra,
  }) satisfies RegistrationRow;

const rows = [
  row(7, "Jo Whitfield & Alex Whitfield"),
  row(14, "Zoë Brennan", { waiver: "needs-guardian" }),
  row(1, "Ben Ashdown", { paid: false }),
  row(21, "Carys Dunmore", { waiver: "missing", car: "1999 Honda Civic" }),
  row(140, "Émile Garside"),
];

const cars = (list: RegistrationRow[]) => list.map((r) => r.carNumber);

describe("the sign-on desk's search", () => {
  it("finds car numbers first: digits match numbers that start with them", () => {
    // DESIGN.md: long lists are searchable by car number first.
    expect(cars(filterRegistrationRows(rows, "14"))).toEqual([14, 140]);
    expect(cars(filterRegistrationRows(rows, " 7 "))).toEqual([7]);
    expect(cars(filterRegistrationRows(rows, "3"))).toEqual([]);
  });

  it("finds names, the car and the class, ignoring case and accents", () => {
    expect(cars(filterRegistrationRows(rows, "whitfield"))).toEqual([7]);
    expect(cars(filterRegistrationRows(rows, "zoe"))).toEqual([14]);
    expect(cars(filterRegistrationRows(rows, "EMILE"))).toEqual([140]);
    expect(cars(filterRegistrationRows(rows, "civic"))).toEqual([21]);
    expect(filterRegistrationRows(rows, "")).toHaveLength(rows.length);
  });
});

describe("the sign-on desk's sort", () => {
  it("sorts by car number, name, waiver or fee, either way, ties by car number", () => {
    expect(cars(sortRegistrationRows(rows, { sort: "car", dir: "asc" }))).toEqual([
      1, 7, 14, 21, 140,
    ]);
    expect(cars(sortRegistrationRows(rows, { sort: "car", dir: "desc" }))).toEqual([
      140, 21, 14, 7, 1,
    ]);
    expect(cars(sortRegistrationRows(rows, { sort: "drivers", dir: "asc" }))).toEqual([
      1, 21, 140, 7, 14,
    ]);
    // What still needs doing comes first: not signed, then needs guardian, then signed.
    expect(cars(sortRegistrationRows(rows, { sort: "waiver", dir: "asc" }))).toEqual([
      21, 14, 1, 7, 140,
    ]);
    expect(cars(sortRegistrationRows(rows, { sort: "fee", dir: "asc" }))).toEqual([
      1, 7, 14, 21, 140,
    ]);
  });

  it("reads the view from a query string with defaults, and refuses a column it does not have", () => {
    expect(registrationViewSchema.parse({})).toEqual({ q: "", sort: "car", dir: "asc" });
    expect(registrationViewSchema.safeParse({ sort: "password" }).success).toBe(false);
  });
});

describe("the sign-on desk's CSV", () => {
  it("follows RFC 4180: header line, CRLF line ends, quoted fields with commas, quotes or breaks", () => {
    // Source: RFC 4180 §2 — rule 1 (CRLF), 3 (optional header line), 6 (fields containing line
    // breaks, double quotes or commas are enclosed in double quotes), 7 (a double quote inside a
    // quoted field is written twice).
    const csv = registrationCsv([
      row(7, "Jo Whitfield & Alex Whitfield"),
      row(8, 'Sam "Sideways" Brennan, Jr', { paid: false }),
      row(9, "Line\nBreak", { waiver: "needs-guardian" }),
    ]);
    expect(csv).toBe(
      [
        "Car,Driver(s),Car make and model,Class,Waiver,Fee",
        "7,Jo Whitfield & Alex Whitfield,2004 Mazda MX-5,Wren,Signed,Paid",
        '8,"Sam ""Sideways"" Brennan, Jr",2004 Mazda MX-5,Wren,Signed,Not paid',
        '9,"Line\nBreak",2004 Mazda MX-5,Wren,Needs guardian,Paid',
        "",
      ].join("\r\n"),
    );
  });

  it("defuses text a spreadsheet would run as a formula", () => {
    // Source: OWASP, "CSV Injection" — cells starting with =, +, -, @, tab or CR are prefixed
    // with a single quote so they are read as text.
    const csv = registrationCsv([row(5, '=HYPERLINK("http://x")'), row(6, "@SUM(A1)")]);
    const lines = csv.split("\r\n");
    expect(lines[1]).toBe(`5,"'=HYPERLINK(""http://x"")",2004 Mazda MX-5,Wren,Signed,Paid`);
    expect(lines[2]).toBe("6,'@SUM(A1),2004 Mazda MX-5,Wren,Signed,Paid");
  });
});
