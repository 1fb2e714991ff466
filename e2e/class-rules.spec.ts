import { expect, test } from "@playwright/test";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";

type Draft = {
  version: number;
  classes: Array<{ id: string; name: string; aero: { wing: Record<string, unknown> } }>;
};

test("the organizer checks, saves and pins a new class-rules version, then goes back to version 1", async ({
  page,
}) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(demo.organizer, demo.password);
  await page.getByRole("link", { name: "Class rules" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Class rules" })).toBeVisible();
  await expect(page.getByRole("heading", { name: "The class ladder, low to high" })).toBeVisible();

  const box = page.getByLabel("Rule set (JSON)");
  const original = await box.inputValue();
  const draft = JSON.parse(original) as Draft;
  expect(draft.version).toBe(2);

  // Nonsense is refused with the place of the problem, and nothing is saved.
  await box.fill("{ this is not json");
  await page.getByRole("button", { name: "Check" }).click();
  await expect(page.getByTestId("rule-set-issues")).toContainText("This is not valid JSON");
  const merlin = draft.classes.findIndex((c) => c.id === "merlin");
  const broken = structuredClone(draft);
  const wing = broken.classes[merlin]?.aero.wing;
  if (wing) wing.maxOverhangMm = "a bit";
  await box.fill(JSON.stringify(broken, null, 2));
  await page.getByRole("button", { name: "Check" }).click();
  await expect(page.getByTestId("rule-set-issues")).toContainText(
    `Class ${merlin + 1} (Merlin) › aero › wing › maxOverhangMm`,
  );

  // A real change: no wing at all in Merlin. Checking shows what it would do before saving.
  const noWing = structuredClone(draft);
  const target = noWing.classes[merlin];
  if (target) target.aero.wing = { allowed: false };
  await box.fill(JSON.stringify(noWing, null, 2));
  await page.getByRole("button", { name: "Check" }).click();
  await expect(page.getByText("No problems found.")).toBeVisible();
  const summary = page.getByTestId("re-evaluation").getByRole("heading", { level: 3 });
  await expect(summary).toContainText(/Version 1 → 2: \d+ verdicts? changes?/);
  const changed = Number(/: (\d+) verdict/.exec((await summary.textContent()) ?? "")?.[1]);
  expect(changed).toBeGreaterThan(0);

  // Saving needs a note; then the saved draft is reviewed before it judges anyone.
  await page.getByRole("button", { name: "Save as version 2" }).click();
  await expect(page.getByText("Say what changed and why (at least 3 characters).")).toBeVisible();
  await page.getByLabel("What changed and why").fill("No wing in Merlin (rehearsal)");
  await page.getByRole("button", { name: "Save as version 2" }).click();
  await expect(page).toHaveURL(/\/rules\?version=/);
  const review = page.getByTestId("rule-set-review");
  await expect(review.getByRole("heading", { level: 2 })).toHaveText(
    "Version 2, saved, not pinned",
  );
  await expect(review.getByTestId("re-evaluation")).toContainText(`2: ${changed} verdict`);

  const pin = review.getByTestId("pin-rule-set-form");
  await pin.getByRole("button", { name: "Pin version 2" }).click();
  await expect(pin.getByText("Tick the box to confirm.")).toBeVisible();
  await pin.getByRole("checkbox").check();
  await pin.getByRole("button", { name: "Pin version 2" }).click();
  await expect(page.getByRole("status").filter({ hasText: "is pinned" })).toContainText(
    `Version 2 is pinned. ${changed} ${changed === 1 ? "verdict" : "verdicts"} changed`,
  );
  await expect(page.getByText(/^Judged by/)).toContainText("version 2");

  // Back to version 1: it is locked, but it can be pinned again.
  const versions = page.getByTestId("rule-set-versions");
  await expect(versions).toContainText("Version 1 · locked (was pinned)");
  await versions
    .getByRole("listitem")
    .filter({ hasText: "Version 1" })
    .getByRole("link", { name: "Review" })
    .click();
  const back = page.getByTestId("pin-rule-set-form");
  await back.getByRole("checkbox").check();
  await back.getByRole("button", { name: "Pin version 1" }).click();
  await expect(page.getByRole("status").filter({ hasText: "is pinned" })).toContainText(
    `Version 1 is pinned. ${changed} ${changed === 1 ? "verdict" : "verdicts"} changed`,
  );
});
