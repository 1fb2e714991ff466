import { expect, type Page } from "@playwright/test";

/** The scrutineer's tech line and car card, as a scrutineer uses them. */
export class TechLinePage {
  constructor(readonly page: Page) {}

  async prepareForOffline() {
    await this.page.getByRole("button", { name: "Prepare for offline" }).click();
    await expect(this.page.getByTestId("prepare-message")).toContainText("Ready for offline");
  }

  async openByNumber(carNumber: number) {
    await this.page.getByTestId("find-car-input").fill(String(carNumber));
    await this.page.getByRole("button", { name: "Open", exact: true }).click();
    await expect(this.page.getByTestId("car-card-number")).toHaveText(String(carNumber));
  }

  async back() {
    await this.page.getByRole("button", { name: "← All cars" }).click();
  }

  async recordReading(targetKey: string, value: string) {
    const target = this.page.getByTestId(`reading-target-${targetKey}`);
    if ((await target.getAttribute("aria-expanded")) !== "true") await target.click();
    const entry = this.page.getByTestId(`reading-entry-${targetKey}`);
    await entry.getByTestId("reading-value").fill(value);
    await entry.getByRole("button", { name: "Save reading" }).click();
    await expect(entry.getByRole("status")).toContainText("Saved on this phone");
  }

  async answerChecklist(itemId: string, answer: "Pass" | "Fail") {
    await this.page
      .getByTestId(`checklist-${itemId}`)
      .getByRole("button", { name: answer, exact: true })
      .click();
  }

  outboxSummary() {
    return this.page.getByTestId("outbox-summary");
  }
}
