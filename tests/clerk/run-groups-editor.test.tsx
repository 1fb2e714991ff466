// @vitest-environment jsdom
import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it, vi } from "vitest";
import { RunGroupsEditor } from "@/components/clerk/run-groups-editor";
import type { RunGroup } from "@/lib/paddock/run-group-plan";
import { drives, groups } from "./clerk-fixtures";

afterEach(cleanup);

function renderEditor(
  onChange: (next: RunGroup[], what: string) => void,
  withGroups: RunGroup[] = groups,
  notReady = new Map<string, { carNumber: number; why: string }>(),
) {
  return render(
    <RunGroupsEditor
      groups={withGroups}
      drives={drives}
      capCars={3}
      timeZone="Europe/London"
      sessionsByGroup={[]}
      explanations={{}}
      notes={[]}
      flagged={new Map()}
      notReady={notReady}
      onChange={onChange}
    />,
  );
}

const groupNamed = (name: string) =>
  screen.getAllByTestId("run-group").find((g) => g.dataset.groupName === name) as HTMLElement;

describe("the clerk moves cars and groups without dragging", () => {
  it("shows a car that is no longer ready by number and why, and takes it out in one tap", async () => {
    const onChange = vi.fn();
    const withGone = groups.map((g, i) =>
      i === 0 ? { ...g, driveIds: [...g.driveIds, "gone:1"] } : g,
    );
    renderEditor(
      onChange,
      withGone,
      new Map([["gone:1", { carNumber: 50, why: "Re-inspection asked by the clerk (incident)." }]]),
    );
    const tile = screen.getByTestId("not-ready-tile");
    expect(tile.textContent).toContain("Car 50 may not run now");
    expect(tile.textContent).toContain("Re-inspection asked");
    await userEvent.click(
      within(tile).getByRole("button", { name: "Take car 50 out of the run groups" }),
    );
    const [next, what] = onChange.mock.calls[0] as [RunGroup[], string];
    expect(next.flatMap((g) => g.driveIds)).not.toContain("gone:1");
    expect(what).toBe("Car 50 taken out of the run groups");
  });

  it("taps a car, then Move to Group 3: the car leaves Group 1 for Group 3", async () => {
    const onChange = vi.fn();
    renderEditor(onChange);
    await userEvent.click(screen.getByRole("button", { name: /Car 2, Driver 2/ }));
    const choices = screen.getByTestId("move-choices");
    expect(within(choices).queryByRole("button", { name: "Move to Group 1" })).toBeNull();
    await userEvent.click(within(choices).getByRole("button", { name: "Move to Group 3" }));
    expect(onChange).toHaveBeenCalledTimes(1);
    const [next, what] = onChange.mock.calls[0] as [RunGroup[], string];
    expect(next.map((g) => g.driveIds)).toEqual([
      ["e1:1", "e3:1"],
      ["e4:1", "e5:1"],
      ["e3:2", "e6:1", "e2:1"],
    ]);
    expect(what).toBe("Car 2 moved to Group 3");
    expect(screen.queryByTestId("move-choices")).toBeNull();
  });

  it("works from the keyboard alone (Tab to a car, Enter, Tab to a group, Enter)", async () => {
    const onChange = vi.fn();
    renderEditor(onChange);
    const car = within(groupNamed("Group 2")).getByRole("button", { name: /Car 4/ });
    car.focus();
    await userEvent.keyboard("{Enter}");
    screen.getByRole("button", { name: "Move to Group 1" }).focus();
    await userEvent.keyboard("{Enter}");
    const [next] = onChange.mock.calls[0] as [RunGroup[]];
    expect(next[0]?.driveIds).toEqual(["e1:1", "e2:1", "e3:1", "e4:1"]);
  });

  it("reorders groups with Earlier / Later; names stay with their cars", async () => {
    const onChange = vi.fn();
    renderEditor(onChange);
    expect(screen.getByRole("button", { name: "Run Group 1 earlier" })).toHaveProperty(
      "disabled",
      true,
    );
    await userEvent.click(screen.getByRole("button", { name: "Run Group 3 earlier" }));
    const [next, what] = onChange.mock.calls[0] as [RunGroup[], string];
    expect(next.map((g) => g.name)).toEqual(["Group 1", "Group 3", "Group 2"]);
    expect(next[1]?.driveIds).toEqual(["e3:2", "e6:1"]);
    expect(what).toBe("Group 3 now runs earlier");
  });
});
