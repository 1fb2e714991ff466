import { describe, expect, it } from "vitest";
import { roleHomePath, roleHomePaths } from "@/lib/auth/role-home-path";

describe("roleHomePath", () => {
  const id = "0190f0a0-0000-7000-8000-000000000001";
  it("sends each role to its own home", () => {
    expect(roleHomePath(id, ["scrutineer"])).toBe(`/tech/${id}`);
    expect(roleHomePath(id, ["chief-scrutineer"])).toBe(`/tech/${id}/chief`);
    expect(roleHomePath(id, ["clerk-of-course"])).toBe(`/clerk/${id}`);
    expect(roleHomePath(id, ["organizer"])).toBe(`/organizer/${id}`);
    expect(roleHomePath(id, ["registrar"])).toBe(`/registration/${id}`);
    expect(roleHomePath(id, ["entrant"])).toBe("/garage");
    expect(roleHomePath(id, [])).toBeNull();
  });
  it("prefers the most senior role and lists the rest", () => {
    expect(roleHomePath(id, ["entrant", "scrutineer"])).toBe(`/tech/${id}`);
    expect(roleHomePaths(id, ["entrant", "organizer"]).map((h) => h.role)).toEqual([
      "organizer",
      "entrant",
    ]);
  });
});
