import { describe, expect, it } from "vitest";
import { sessionCallProblem } from "@/lib/paddock/session-call-problem";

// A session's life on the day: called to the assembly area, on track, stopped by a red flag and
// restarted, finished or cut short — common practice (no source).
describe("marks follow a session's life", () => {
  it("lets a session be called, go out, be red-flagged, go out again and finish", () => {
    const life = [
      ["planned", "called"],
      ["called", "on-track"],
      ["on-track", "red-flag"],
      ["red-flag", "on-track"],
      ["on-track", "finished"],
    ] as const;
    for (const [current, next] of life) expect(sessionCallProblem({ current, next })).toBeNull();
  });

  it("refuses a finish or a cut short on a session that never went out, and a red flag twice", () => {
    expect(sessionCallProblem({ current: "planned", next: "finished" })).toMatch(
      /not called yet: it cannot be marked finished/,
    );
    expect(sessionCallProblem({ current: "planned", next: "cut-short" })).not.toBeNull();
    expect(sessionCallProblem({ current: "red-flag", next: "red-flag" })).not.toBeNull();
  });

  it("puts a session marked finished by mistake back on track", () => {
    expect(sessionCallProblem({ current: "finished", next: "on-track" })).toBeNull();
    expect(sessionCallProblem({ current: "finished", next: "called" })).not.toBeNull();
  });
});
