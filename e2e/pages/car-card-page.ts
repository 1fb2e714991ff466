import { expect, type Locator, type Page } from "@playwright/test";

/** One car card at the tech line, as a scrutineer works through it. */
export class CarCardPage {
  constructor(readonly page: Page) {}

  async open(carNumber: number) {
    await this.page.getByTestId("find-car-input").fill(String(carNumber));
    await this.page.getByRole("button", { name: "Open", exact: true }).click();
    await expect(this.page.getByTestId("car-card-number")).toHaveText(String(carNumber));
  }

  item(itemId: string): Locator {
    return this.page.getByTestId(`checklist-${itemId}`);
  }

  answer(itemId: string, name: "Pass" | "Fail" | "Not fitted"): Locator {
    return this.item(itemId).getByRole("button", { name, exact: true });
  }

  /** Open a reading's entry form (if closed) and return it. */
  async reading(targetKey: string): Promise<Locator> {
    const target = this.page.getByTestId(`reading-target-${targetKey}`);
    if ((await target.getAttribute("aria-expanded")) !== "true") await target.click();
    return this.page.getByTestId(`reading-entry-${targetKey}`);
  }

  async typeReading(targetKey: string, value: string): Promise<Locator> {
    const entry = await this.reading(targetKey);
    await entry.getByTestId("reading-value").fill(value);
    await entry.getByRole("button", { name: "Save reading" }).click();
    return entry;
  }

  outboxSummary(): Locator {
    return this.page.getByTestId("outbox-summary");
  }
}
