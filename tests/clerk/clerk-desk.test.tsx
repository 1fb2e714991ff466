// @vitest-environment jsdom
import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import type { ClerkAction, ClerkActions } from "@/components/clerk/clerk-actions";
import { ClerkDeskView } from "@/components/clerk/clerk-desk";
import { previewRunSheet } from "@/components/clerk/preview-run-sheet";
import type { ClerkActionState } from "@/lib/run-sheet/clerk-action-state";
import type { ClerkView } from "@/lib/run-sheet/clerk-view";
import { groups } from "./clerk-fixtures";
import { clerkView } from "./clerk-view-fixture";

afterEach(cleanup);

// The server side is the lead's (e2e covers it); here each action answers as its contract says.
function fakeActions(): ClerkActions & { saved: FormData[] } {
  const saved: FormData[] = [];
  let revision = 1;
  const done: ClerkAction = async () => ({ status: "done", message: "Done." });
  return {
    saved,
    build: done,
    save: async (_: ClerkActionState, form: FormData) => {
      saved.push(form);
      revision += 1;
      return { status: "saved", revision, message: "Draft saved." };
    },
    publish: done,
    callSession: done,
    askReinspection: done,
  };
}

function renderDesk(view: ClerkView, actions = fakeActions()) {
  render(<ClerkDeskView view={view} actions={actions} refresh={vi.fn()} />);
  return actions;
}

async function tapMove(carLabel: RegExp, groupName: string) {
  await userEvent.click(screen.getByRole("button", { name: carLabel }));
  await userEvent.click(
    within(screen.getByTestId("move-choices")).getByRole("button", {
      name: `Move to ${groupName}`,
    }),
  );
}

describe("the clerk of course's page", () => {
  it("starts with every hard rule met for groups that keep the shared car's drivers apart", () => {
    renderDesk(clerkView());
    expect(screen.getByTestId("constraints-ok")).toBeTruthy();
    const hard = screen
      .queryAllByTestId("constraint-warning")
      .filter((w) => w.dataset.kind !== "soft");
    expect(hard).toEqual([]);
  });

  it("a tap-to-move that puts both drivers of one car in one group shows a blocking warning and saves", async () => {
    // Source: DOMAIN.md run groups — two drivers sharing a car never share a group
    // [S: HPDE run-group guidance; common practice (no source)].
    const actions = renderDesk(clerkView());
    await tapMove(/Car 3, Driver 3b/, "Group 1");
    const warnings = await screen.findAllByTestId("constraint-warning");
    const blocking = warnings.filter((w) => w.dataset.kind === "blocks");
    expect(blocking.map((w) => w.textContent).join(" ")).toMatch(/both in Group 1/);
    const group1 = screen
      .getAllByTestId("run-group")
      .find((g) => g.dataset.groupName === "Group 1");
    expect(
      within(group1 as HTMLElement).getByRole("button", { name: /Car 3, Driver 3b/ }),
    ).toBeTruthy();
    const car3 = within(group1 as HTMLElement)
      .getAllByTestId("drive-tile")
      .filter((tile) => tile.dataset.carNumber === "3");
    expect(car3.map((tile) => /Breaks a rule/.test(tile.textContent ?? ""))).toEqual([true, true]);
    await waitFor(() => expect(actions.saved).toHaveLength(1));
    const form = actions.saved[0] as FormData;
    expect(form.get("revision")).toBe("1");
    expect(JSON.parse(String(form.get("groups")))[0].driveIds).toEqual([
      "e1:1",
      "e2:1",
      "e3:1",
      "e3:2",
    ]);
    expect(screen.getByTestId("publish-blockers").textContent).toMatch(/block publishing/);
  });

  it("a move over the cap blocks publishing too", async () => {
    // The cap on cars per group is the organizer's number (DOMAIN.md "Cars on track").
    renderDesk(clerkView());
    await tapMove(/Car 5, Driver 5/, "Group 1");
    const text = (await screen.findAllByTestId("constraint-warning"))
      .map((w) => w.textContent)
      .join(" ");
    expect(text).toMatch(/Group 1 has 4 cars; no more than 3/);
  });

  it("shows a stale-revision refusal in the server's words with a way to reload", async () => {
    const actions = fakeActions();
    actions.save = async () => ({
      status: "error",
      message: "Another desk saved these groups since you opened them: reload to see theirs.",
    });
    renderDesk(clerkView(), actions);
    await tapMove(/Car 2, Driver 2/, "Group 3");
    expect((await screen.findByTestId("save-message")).textContent).toMatch(/Another desk saved/);
    expect(screen.getByRole("button", { name: "Reload the groups as saved" })).toBeTruthy();
  });

  it("publishing again first shows who moved and which times changed, then asks to confirm", async () => {
    const first = clerkView();
    // Version 1 was published with 10 minutes between sessions; the draft now has 5.
    const sheet = previewRunSheet({
      view: first,
      groups,
      settings: { ...first.defaultSettings, gapMinutes: 10 },
      capCars: 3,
    }).sheet;
    if (!sheet) throw new Error("no sheet");
    const view = clerkView({
      published: {
        id: "p1",
        eventId: "event-1",
        version: 1,
        publishedAt: "2026-05-15T18:30:00.000Z",
        publishedBy: "Clerk",
        body: sheet,
      },
      versions: [{ version: 1, publishedAt: "2026-05-15T18:30:00.000Z", publishedBy: "Clerk" }],
    });
    const publish = vi.fn<ClerkAction>(async () => ({ status: "done", message: "x" }));
    const actions = { ...fakeActions(), publish };
    renderDesk(view, actions);
    await tapMove(/Car 2, Driver 2/, "Group 3");
    await waitFor(() => expect(screen.queryByText("Saving the draft…")).toBeNull());
    await userEvent.click(
      screen.getByRole("button", { name: /Review changes and publish version 2/ }),
    );
    const confirm = screen.getByTestId("publish-confirm");
    expect(within(confirm).getByTestId("diff-moved").textContent).toMatch(
      /Driver 2\s*Group 1 → Group 3/,
    );
    // Sessions from 08:45 (after the 08:00–08:30 briefing), 20 minutes each, in the venue's
    // summer time (UTC+1 on 16 May in Europe/London; tz database). Group 1 keeps its slot.
    const times = within(confirm).getByTestId("diff-times").textContent ?? "";
    expect(times).toMatch(/Group 2, round 1: 09:15–09:35 → 09:10–09:30/);
    expect(times).toMatch(/Group 3, round 1: 09:45–10:05 → 09:35–09:55/);
    expect(times).not.toMatch(/Group 1, round 1/);
    const button = within(confirm).getByRole("button", { name: "Publish version 2" });
    expect(button).toHaveProperty("disabled", true);
    await userEvent.click(within(confirm).getByRole("checkbox"));
    await userEvent.click(button);
    expect(publish).toHaveBeenCalledTimes(1);
    expect(publish.mock.calls[0]?.[1].get("revision")).toBe("2");
  });

  it("during the day: a late start shifts the sessions behind it, and a red flag needs a note", async () => {
    const first = clerkView();
    const sheet = previewRunSheet({
      view: first,
      groups,
      settings: first.defaultSettings,
      capCars: 3,
    }).sheet;
    if (!sheet) throw new Error("no sheet");
    // Group 1, round 1 is planned 08:45–09:05 local (07:45 UTC); it went on track 10 minutes late.
    const view = clerkView({
      published: {
        id: "p1",
        eventId: "event-1",
        version: 1,
        publishedAt: "2026-05-16T06:00:00.000Z",
        publishedBy: "Clerk",
        body: sheet,
      },
      versions: [{ version: 1, publishedAt: "2026-05-16T06:00:00.000Z", publishedBy: "Clerk" }],
      calls: [{ sessionKey: "1-1", state: "on-track", at: "2026-05-16T07:55:00.000Z", note: null }],
      now: "2026-05-16T08:00:00.000Z",
    });
    const callSession = vi.fn<ClerkAction>(async () => ({ status: "done", message: "Marked." }));
    renderDesk(view, { ...fakeActions(), callSession });
    const rows = screen.getAllByTestId("session-call");
    expect(rows[0]?.textContent).toMatch(/On track/);
    // Group 2 was planned 09:10–09:30; Group 1 now ends 09:15, so Group 2 starts 10 minutes later.
    expect(rows[1]?.textContent).toMatch(/Planned 09:10–09:30 · now 09:20–09:40 \(\+10 min\)/);
    const row = within(rows[0] as HTMLElement);
    await userEvent.click(row.getByRole("button", { name: "Red flag" }));
    expect(row.getByRole("alert").textContent).toMatch(/needs a note/);
    expect(callSession).not.toHaveBeenCalled();
    await userEvent.type(row.getByRole("textbox"), "Car off at turn 3");
    await userEvent.click(row.getByRole("button", { name: "Red flag" }));
    const form = callSession.mock.calls[0]?.[1];
    expect([
      form?.get("eventId"),
      form?.get("sessionKey"),
      form?.get("state"),
      form?.get("note"),
    ]).toEqual(["event-1", "1-1", "red-flag", "Car off at turn 3"]);
  });
});
