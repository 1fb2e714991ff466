import { describe, expect, it } from "vitest";
import { can, rolePermissions } from "@/lib/auth/permissions";
import { eventRoles } from "@/lib/auth/roles";

describe("the permission table", () => {
  it("lets only the chief scrutineer override a verdict or void a record", () => {
    // Source: Motorsport UK National Competition Rules 2026, Ch.5 Part A App.6 Arts 2.14–2.16 —
    // final approval and the report of rejections rest with the (chief) scrutineer.
    const overriders = eventRoles.filter((r) => can([r], "verdicts.override"));
    expect(overriders).toEqual(["chief-scrutineer"]);
    expect(eventRoles.filter((r) => can([r], "records.void"))).toEqual(["chief-scrutineer"]);
  });

  it("gives the chief scrutineer's report to the chief scrutineer and the clerk of course only", () => {
    // Source: Motorsport UK National Competition Rules 2026, Ch.5 Part A App.6 Art.3.1 — the chief
    // scrutineer reports all cars examined, with reasons for each rejection, to the clerk of the course.
    expect(eventRoles.filter((r) => can([r], "tech-report.read"))).toEqual([
      "chief-scrutineer",
      "clerk-of-course",
    ]);
    expect(can(["entrant"], "tech-report.read")).toBe(false);
  });

  it("lets scrutineers record readings but not publish run groups", () => {
    // common practice (no source): scrutineers measure; the clerk of course runs the groups.
    expect(can(["scrutineer"], "readings.write")).toBe(true);
    expect(can(["scrutineer"], "run-groups.publish")).toBe(false);
    expect(can(["clerk-of-course"], "run-groups.publish")).toBe(true);
    expect(can(["clerk-of-course"], "readings.write")).toBe(false);
  });

  it("gives an entrant only their own entries", () => {
    expect(can(["entrant"], "own-entries.read")).toBe(true);
    expect(can(["entrant"], "entries.read")).toBe(false);
    expect(can(["entrant"], "tech.read")).toBe(false);
    expect(can([], "event.read")).toBe(false);
  });

  it("combines roles: a person with two roles has both sets", () => {
    expect(can(["registrar", "scrutineer"], "readings.write")).toBe(true);
    expect(can(["registrar", "scrutineer"], "registration.check")).toBe(true);
  });

  it("names every permission at most once per role", () => {
    for (const perms of Object.values(rolePermissions))
      expect(new Set(perms).size).toBe(perms.length);
  });
});
