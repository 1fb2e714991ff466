import { describe, expect, it } from "vitest";
import { personName } from "@/lib/auth/person-name";

// Our own rule (issue 11): a person is shown by their name; the address only when there is none.
describe("personName", () => {
  it("shows the name as given", () => {
    expect(personName({ name: " Priya Raman ", email: "p@example.test" })).toBe("Priya Raman");
  });
  it("falls back to the whole address when no name was given", () => {
    expect(personName({ name: null, email: "p.raman@example.test" })).toBe("p.raman@example.test");
    expect(personName({ name: "   ", email: "p.raman@example.test" })).toBe("p.raman@example.test");
  });
});
