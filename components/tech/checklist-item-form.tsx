"use client";
import { useState } from "react";
import { makeRecord } from "@/lib/offline/make-record";
import type { EquipmentLabel } from "@/lib/scrutineer/equipment-label-schema";
import type { ChecklistPayload } from "@/lib/scrutineer/record-schema";
import type { ChecklistItem } from "@/lib/scrutineer/safety-rules-schema";
import type { SafetyItemResult } from "@/lib/scrutineer/verdict-schema";
import { useTech } from "./tech-context";

/** One line of the safety checklist: pass / fail / not applicable, with the equipment label. */
export function ChecklistItemForm({
  entryId,
  item,
  result,
}: {
  entryId: string;
  item: ChecklistItem;
  result: SafetyItemResult | undefined;
}) {
  const { ruleSet, official, deviceId, record, canWrite } = useTech();
  const standards = ruleSet.safety.standards.filter((s) =>
    item.equipment?.acceptedStandardIds.includes(s.id),
  );
  const [standardId, setStandardId] = useState(standards[0]?.id ?? "");
  const [year, setYear] = useState("");
  const [month, setMonth] = useState("");
  const [date, setDate] = useState("");
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string | null>(null);
  const standard = standards.find((s) => s.id === standardId);

  const label = (): EquipmentLabel | string => {
    if (!standard) return "Pick the standard on the label";
    const y = Number(year);
    const yearOk = /^\d{4}$/.test(year) && y >= 1950 && y <= 2200;
    switch (standard.labelForm) {
      case "standard-only":
        return { form: "standard-only" };
      case "date":
        return /^\d{4}-\d{2}-\d{2}$/.test(date)
          ? { form: "date", date }
          : "Enter the date on the label";
      case "manufacture-month": {
        const m = Number(month);
        if (!yearOk || !(m >= 1 && m <= 12)) return "Enter the month and year on the label";
        return { form: "manufacture-month", year: y, month: m };
      }
      default:
        return yearOk
          ? { form: standard.labelForm, year: y }
          : "Enter the four-digit year on the label";
    }
  };

  const answer = async (outcome: ChecklistPayload["result"]) => {
    let payload: ChecklistPayload = {
      itemId: item.id,
      result: outcome,
      ...(comment.trim() ? { comment: comment.trim() } : {}),
    };
    if (item.equipment && outcome === "pass") {
      const l = label();
      if (typeof l === "string") return setError(l);
      payload = {
        ...payload,
        equipment: { standardId, ...(standard ? { standardName: standard.name } : {}), label: l },
      };
    }
    setError(null);
    await record(
      makeRecord({
        kind: "checklist",
        payload,
        entryId,
        officialId: official.id,
        deviceId,
        now: new Date(),
      }),
    );
  };

  const tone =
    result?.outcome === "pass"
      ? "border-cleared-line"
      : result?.outcome === "fail"
        ? "border-stopped-line"
        : "border-asphalt-300";
  return (
    <li
      className={`space-y-2 rounded-lg border-2 bg-white p-3 ${tone}`}
      data-testid={`checklist-${item.id}`}
      data-outcome={result?.outcome ?? "waiting"}
    >
      <div>
        <p className="text-lg font-semibold">
          {item.label}
          {item.required ? "" : " (if fitted)"}
        </p>
        {item.guidance ? <p className="text-base text-asphalt-800">{item.guidance}</p> : null}
        {result && (result.outcome !== "waiting" || result.recordId !== null) ? (
          <p className="text-base font-semibold">{result.reason}</p>
        ) : null}
      </div>
      {item.equipment ? (
        <div className="grid gap-2 sm:grid-cols-3">
          <label className="block sm:col-span-3">
            <span className="field-label">Standard on the label</span>
            <select
              className="field-input"
              value={standardId}
              onChange={(e) => setStandardId(e.target.value)}
            >
              {standards.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
            </select>
          </label>
          {standard?.labelForm === "date" ? (
            <label className="block">
              <span className="field-label">Date on the label</span>
              <input
                type="date"
                className="field-input"
                value={date}
                onChange={(e) => setDate(e.target.value)}
              />
            </label>
          ) : standard && standard.labelForm !== "standard-only" ? (
            <>
              {standard.labelForm === "manufacture-month" ? (
                <label className="block">
                  <span className="field-label">Month</span>
                  <input
                    className="field-input tabular"
                    inputMode="numeric"
                    placeholder="MM"
                    value={month}
                    onChange={(e) => setMonth(e.target.value)}
                  />
                </label>
              ) : null}
              <label className="block">
                <span className="field-label">
                  {standard.labelForm === "not-valid-after-year"
                    ? "Not valid after (year)"
                    : "Year on the label"}
                </span>
                <input
                  className="field-input tabular"
                  inputMode="numeric"
                  placeholder="YYYY"
                  value={year}
                  onChange={(e) => setYear(e.target.value)}
                />
              </label>
            </>
          ) : null}
        </div>
      ) : null}
      <label className="block">
        <span className="sr-only">Comment on {item.label}</span>
        <input
          className="field-input"
          placeholder="Comment (optional)"
          value={comment}
          onChange={(e) => setComment(e.target.value)}
        />
      </label>
      {error ? (
        <p className="field-error" role="alert">
          {error}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className="btn border-2 border-cleared bg-cleared-soft text-cleared"
          onClick={() => void answer("pass")}
          disabled={!canWrite}
        >
          Pass
        </button>
        <button
          type="button"
          className="btn border-2 border-stopped bg-stopped-soft text-stopped"
          onClick={() => void answer("fail")}
          disabled={!canWrite}
        >
          Fail
        </button>
        {item.notApplicableAllowed || !item.required ? (
          <button
            type="button"
            className="btn-secondary"
            onClick={() => void answer("not-applicable")}
            disabled={!canWrite}
          >
            Not fitted
          </button>
        ) : null}
      </div>
    </li>
  );
}
