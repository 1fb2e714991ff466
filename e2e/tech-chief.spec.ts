import { expect, test } from "@playwright/test";
import { v7 as uuidv7 } from "uuid";
import { demo } from "../tests/support/demo-accounts";
import { SignInPage } from "./pages/sign-in-page";
import { localRecordIds } from "./support/local-record-ids";
import { serverVerdictTimes } from "./support/server-verdict-times";

// The demo's class ladder, low → high, as README.md describes the invented event.
const LADDER = ["Kestrel", "Merlin", "Harrier", "Peregrine"];

test("the chief scrutineer's queue opens each car; an override is checked, kept with a name and shown", async ({
  page,
}, testInfo) => {
  testInfo.setTimeout(120_000);
  await new SignInPage(page).open();
  await new SignInPage(page).withPassword(demo.chief, demo.password);
  await expect(page).toHaveURL(/\/tech\/[0-9a-f-]{36}\/chief$/);
  const eventId = new URL(page.url()).pathname.split("/")[2] ?? "";
  const session = (await (await page.request.get("/api/auth/session")).json()) as {
    user: { id: string; name: string };
  };

  // Every car in the queue says in words why it waits for the chief.
  const rows = page.getByTestId("chief-queue").getByTestId("chief-queue-row");
  await expect(rows.filter({ hasText: "Readings disagree" })).toHaveCount(1);
  await expect(rows.filter({ hasText: "Held:" }).first()).toBeVisible();
  const tooClose = rows
    .filter({ hasText: "Too close to call" })
    .filter({ hasNotText: "Readings disagree" });
  await expect(tooClose).toHaveCount(1);
  for (const row of await rows.all()) {
    await expect(row.getByTestId("chief-attention").locator("li").first()).toBeVisible();
  }

  // A card opens that car's card on the tech line.
  const carNumber = (await tooClose.getAttribute("data-car-number")) ?? "";
  await tooClose.getByRole("link").click();
  await expect(page).toHaveURL(new RegExp(`/tech/${eventId}\\?entry=[0-9a-f-]{36}$`));
  await expect(page.getByTestId("car-card-number")).toHaveText(carNumber);
  const entryId = new URL(page.url()).searchParams.get("entry") ?? "";
  const declared = (await page.getByText("Entered in").locator("strong").textContent()) ?? "";
  const above = LADDER.slice(LADDER.indexOf(declared) + 1);
  expect(LADDER).toContain(declared);

  // The override form starts from the car's computed class, and offers only classes that fit.
  const panel = page.getByTestId("chief-panel");
  const decision = panel.getByTestId("override-status");
  const classList = panel.getByTestId("override-class");
  await expect(decision).toHaveValue("cleared");
  await expect(classList.locator("option")).toHaveText([declared]);
  await decision.selectOption("moved-up");
  if (above.length > 0) await expect(classList.locator("option")).toHaveText(above);
  else await expect(panel).toContainText("is the highest class");

  // Saving with no reason says so at the field and records nothing.
  await panel.getByRole("button", { name: "Save override" }).click();
  await expect(panel.locator("#override-reason-error")).toHaveText(
    "Write the reason for the override",
  );
  await expect(panel.getByTestId("override-message")).toHaveText(
    "Not saved yet: see the messages above.",
  );
  expect(await localRecordIds(page, entryId)).toEqual([]);

  // The void list: grouped by kind, each with who and when; its reason field has a label.
  const groups = panel.getByTestId("void-target").locator("optgroup");
  expect(await groups.count()).toBeGreaterThan(1);
  const firstChoice = (await groups.first().locator("option").first().textContent()) ?? "";
  expect(firstChoice).toMatch(/ — .+, \d\d:\d\d:\d\d$/);
  await expect(panel.getByLabel("Why it is void")).toBeVisible();

  // A decision that fits: saved, sent, and the verdict says who decided and when.
  await decision.selectOption("cleared");
  await panel.getByLabel("Reason (kept with your name)").fill("Re-measured by me with the gauge");
  await panel.getByRole("button", { name: "Save override" }).click();
  await expect(panel.getByTestId("override-message")).toContainText("Override saved");
  await expect(page.getByTestId("server-verdict")).toHaveAttribute("data-status", "cleared", {
    timeout: 30_000,
  });
  await expect(page.getByTestId("server-verdict-decided-by")).toHaveText(
    new RegExp(`^Decided by ${session.user.name} at \\d\\d:\\d\\d on \\w{3} \\d{1,2} \\w{3}\\.$`),
  );
  await page.screenshot({ path: testInfo.outputPath("car-card-decided.png"), fullPage: true });

  // The decision settles the car: it leaves "cars wait for you" for "Decided by the chief
  // scrutineer", with who and when, and stays there on a reload.
  await page.goto(`/tech/${eventId}/chief`);
  for (let load = 0; load < 2; load += 1) {
    if (load > 0) await page.reload();
    const row = (id: string) =>
      page.getByTestId(id).locator(`[data-testid=chief-queue-row][data-car-number="${carNumber}"]`);
    await expect(row("chief-queue")).toHaveCount(0);
    await expect(row("chief-decided")).toBeVisible();
    await expect(row("chief-decided").getByTestId("chief-decided-by")).toHaveText(
      new RegExp(`^Decided by ${session.user.name} at \\d\\d:\\d\\d on \\w{3} \\d{1,2} \\w{3}$`),
    );
    await expect(row("chief-decided")).not.toContainText("Too close to call");
    await expect(page.getByText("No overrides yet.")).toHaveCount(0);
  }
  await page.screenshot({ path: testInfo.outputPath("chief-page-decided.png"), fullPage: true });

  // The entry page shows the same: the decision, by name.
  await page.goto(`/entries/${entryId}`);
  await expect(page.getByTestId("entry-result-reason")).toContainText(
    "Chief scrutineer's decision: cleared in",
  );
  await expect(page.getByTestId("entry-result-decided-by")).toContainText(
    `Decided by ${session.user.name} at`,
  );

  // An override that does not fit (sent by another phone): not applied, and plainly said so.
  const at = new Date(Date.now() + 2000);
  const sent = await page.request.post(`/api/events/${eventId}/sync`, {
    data: {
      deviceId: "other-phone",
      records: [
        {
          id: uuidv7({ msecs: at.getTime() }),
          kind: "override",
          entryId,
          officialId: session.user.id,
          deviceId: "other-phone",
          deviceTime: at.toISOString(),
          payload: { status: "moved-up", classId: "kestrel", reason: "Moved at the entrant's ask" },
        },
      ],
    },
  });
  expect(sent.status()).toBe(200);
  // The server's worker re-derives the verdict after the answer (the answer says it is pending).
  // This phone did not send the record, so it learns the new verdict only from the pack it loads
  // on opening: open the car once the server has it, as the chief would a moment later. Opening
  // at once raced the worker (the card kept the earlier verdict when the pack came first).
  const answer = (await sent.json()) as { receivedAt: string; verdictsPending: string[] };
  expect(answer.verdictsPending).toEqual([entryId]);
  await expect
    .poll(async () => (await serverVerdictTimes([entryId]))[entryId]?.computedAt ?? 0)
    .toBeGreaterThanOrEqual(Date.parse(answer.receivedAt));
  await page.goto(`/tech/${eventId}?entry=${entryId}`);
  const invalid = page.getByTestId("server-verdict-override-invalid");
  await expect(invalid).toContainText("Override not applied.");
  await expect(invalid).toContainText(`Saved by ${session.user.name} at`);
  await expect(invalid).toContainText("Kestrel");
  await page.goto(`/tech/${eventId}/chief`);
  await expect(
    page.locator(`[data-testid=chief-queue-row][data-car-number="${carNumber}"]`),
  ).toContainText("Override not applied — saved by");
});
