// @vitest-environment jsdom
import { cleanup, render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, describe, expect, it } from "vitest";
import { DeclarationsForm } from "@/components/declarations/declarations-form";
import type { FormState } from "@/components/form-state";
import { toDeclarationsFormValues } from "@/lib/declarations/declarations-form-values";
import { storedEntryDeclarationsSchema } from "@/lib/scrutineer/classes/entry-declarations-schema";

afterEach(cleanup);

const asks = [
  { topic: "power" as const, asked: true, why: "Needs a dyno sheet." },
  { topic: "tyres" as const, asked: true, why: "Needs treadwear." },
  { topic: "aero" as const, asked: true, why: "Say which." },
];

function renderForm() {
  const sent: FormData[] = [];
  const action = async (_: FormState, form: FormData): Promise<FormState> => {
    sent.push(form);
    return { status: "done", message: "Saved." };
  };
  render(
    <DeclarationsForm
      entryId="0193a4b2-1c00-7000-8000-000000000001"
      className="Kestrel"
      asks={asks}
      initial={toDeclarationsFormValues(storedEntryDeclarationsSchema.parse({}))}
      canEdit
      action={action}
    />,
  );
  return sent;
}

async function fillDyno(pressure: string, unit: string) {
  const user = userEvent.setup();
  await user.click(screen.getByLabelText("I have a dyno sheet for this car"));
  await user.type(screen.getByLabelText("Power printed on the sheet"), "180");
  await user.type(screen.getByLabelText("Date of the run"), "2027-04-01");
  await user.type(screen.getByLabelText("Air pressure"), pressure);
  await user.selectOptions(screen.getByLabelText("Air pressure: unit"), unit);
  await user.type(screen.getByLabelText("Air temperature"), "20");
  return user;
}

// userEvent types one key at a time through react-hook-form: slow in jsdom on a shared machine.
describe("the declarations form", { timeout: 20_000 }, () => {
  it("names an impossible air pressure at the ambient figures and sends nothing", async () => {
    const sent = renderForm();
    const user = await fillDyno("2000", "mbar");
    await user.click(screen.getByRole("button", { name: "Save declarations" }));
    // Source: WMO archive — highest sea-level pressure on record 1,083.8 hPa (1 mbar = 1 hPa,
    // NIST SP 811), so 2,000 mbar cannot be an air pressure (the engine's limit is 1,100 hPa).
    const within = await screen.findByText(
      /The dyno sheet cannot be true: its air pressure 2,000 mbar/,
    );
    expect(within.closest("[data-testid=dyno-ambient]")).not.toBeNull();
    expect(sent).toHaveLength(0);
  });

  it("asks for a number where the treadwear is not one", async () => {
    const sent = renderForm();
    const user = userEvent.setup();
    await user.selectOptions(screen.getByLabelText("Tyres fitted"), "graded");
    await user.type(screen.getByLabelText("Treadwear grade (on the sidewall)"), "lots");
    await user.click(screen.getByRole("button", { name: "Save declarations" }));
    expect(await screen.findByText("Enter a number")).toBeTruthy();
    expect(sent).toHaveLength(0);
  });

  it("sends plausible declarations as the engine's shape", async () => {
    const sent = renderForm();
    // Source: ISO 2533:1975 — standard sea-level pressure 1,013.25 hPa: a plausible dyno cell.
    const user = await fillDyno("1013", "hPa");
    await user.selectOptions(screen.getByLabelText("Tyres fitted"), "graded");
    await user.type(screen.getByLabelText("Treadwear grade (on the sidewall)"), "200");
    await user.click(screen.getByRole("button", { name: "Save declarations" }));
    await waitFor(() => expect(sent).toHaveLength(1));
    const body = JSON.parse(String(sent[0]?.get("declarations")));
    expect(body.dynoSheet).toMatchObject({
      power: { value: 180, unit: "hp" },
      date: "2027-04-01",
      ambient: { pressure: { value: 1013, unit: "hPa" }, temperature: { value: 20, unit: "C" } },
    });
    expect(body.dynoSheet.ambient).not.toHaveProperty("vapourPressure");
    expect(body.tyres).toEqual({ kind: "graded", treadwear: 200 });
    expect(await screen.findByText("Saved.")).toBeTruthy();
  });
});
