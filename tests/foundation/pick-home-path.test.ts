import { describe, expect, it } from "vitest";
import { pickHomePath } from "../../lib/auth/pick-home-path";

// Source: common practice (no source) — on an event day officials open the app to that day's
// job; the choice of other events is one tap away.
describe("pickHomePath", () => {
  it("sends someone with no event to the garage and someone with one place there", () => {
    expect(pickHomePath([])).toBe("/garage");
    expect(pickHomePath([{ path: "/tech/a", eventStatus: "running" }])).toBe("/tech/a");
    expect(
      pickHomePath([
        { path: "/garage", eventStatus: "running" },
        { path: "/garage", eventStatus: "entries-open" },
      ]),
    ).toBe("/garage");
  });

  it("goes to the running event's most senior home when there are several", () => {
    expect(
      pickHomePath([
        { path: "/tech/a/chief", eventStatus: "running" },
        { path: "/tech/a", eventStatus: "running" },
        { path: "/tech/b/chief", eventStatus: "entries-open" },
      ]),
    ).toBe("/tech/a/chief");
    expect(
      pickHomePath([
        { path: "/registration/b", eventStatus: "entries-open" },
        { path: "/registration/a", eventStatus: "running" },
      ]),
    ).toBe("/registration/a");
  });

  it("lets them choose when no event is running", () => {
    expect(
      pickHomePath([
        { path: "/registration/a", eventStatus: "entries-open" },
        { path: "/registration/b", eventStatus: "entries-closed" },
      ]),
    ).toBeNull();
  });
});
