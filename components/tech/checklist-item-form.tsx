"use client";
import { useEffect, useState } from "react";
import { makeRecord } from "@/lib/offline/make-record";
import {
  type ChecklistPayload,
  RECORD_TEXT_LIMITS,
  type TechRecordOf,
} from "@/lib/scrutineer/records/record-schema";
import type { EquipmentLabel } from "@/lib/scrutineer/safety/equipment-label-schema";
import type { ChecklistItem } from "@/lib/scrutineer/safety/safety-rules-schema";
import type { SafetyItemResult } from "@/lib/scrutineer/verdicts/verdict-schema";
import { AnswerButton } from "./answer-button";
import { CharacterCount } from "./character-count";
import { checklistItemState } from "./checklist-item-state";
import { type LabelFields, labelFieldsFromAnswer } from "./label-fields-from-answer";
import { recordByline } from "./record-byline";
import { StateMark } from "./state-mark";
import { useTech } from "./tech-context";
import { VoidOwnRecord } from "./void-own-record";

const border = {
  cleared: "border-cleared-line",
  attention: "border-attention-line",
  stopped: "border-stopped-line",
  waiting: "border-asphalt-300",
  neutral: "border-asphalt-300",
} as const;

/**
 * One line of the safety checklist: how it stands (word, icon, colour), pass / fail / not fitted
 * (offered only where the rule set accepts "not applicable"), the equipment label filled in from
 * the latest answer, and the answer chosen shown pressed.
 */
export function ChecklistItemForm({
  entryId,
  item,
  result,
  answer,
}: {
  entryId: string;
  item: ChecklistItem;
  result: SafetyItemResult | undefined;
  /** The answer the verdict rests on (the latest one not void), if any. */
  answer: TechRecordOf<"checklist"> | undefined;
}) {
  const { ruleSet, pack, official, deviceId, record, canWrite } = useTech();
  const accepted = item.equipment?.acceptedStandardIds ?? [];
  const standards = ruleSet.safety.standards.filter((s) => accepted.includes(s.id));
  const [fields, setFields] = useState<LabelFields>(() =>
    labelFieldsFromAnswer(answer?.payload, accepted),
  );
  const answerId = answer?.id ?? null;
  // A newer answer (saved here, or arriving from the server) refills the label fields.
  // biome-ignore lint/correctness/useExhaustiveDependencies: refill only when the answer changes
  useEffect(() => {
    setFields(labelFieldsFromAnswer(answer?.payload, accepted));
  }, [answerId]);
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string | null>(null);
  const { standardId, year, month, date } = fields;
  const set = (patch: Partial<LabelFields>) => setFields((f) => ({ ...f, ...patch }));
  const standard = standards.find((s) => s.id === standardId);
  const state = checklistItemState(result);
  const chosen = answer?.payload.result ?? null;
  const commentMax = RECORD_TEXT_LIMITS.checklistComment;

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

  const save = async (outcome: ChecklistPayload["result"]) => {
    if (comment.trim().length > commentMax) {
      return setError(`Shorten the comment to ${commentMax} characters.`);
    }
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
    setComment("");
  };

  const counterId = `comment-count-${item.id}`;
  return (
    <li
      className={`space-y-2 rounded-lg border-2 bg-white p-3 ${border[state.tone]}`}
      data-testid={`checklist-${item.id}`}
      data-outcome={result?.outcome ?? "waiting"}
      data-state={state.tone}
    >
      <div>
        <p className="text-lg font-semibold">
          {item.label}
          {item.notApplicableAllowed ? " (if fitted)" : item.required ? "" : " (optional)"}
        </p>
        {item.guidance ? <p className="text-base text-asphalt-800">{item.guidance}</p> : null}
        <p
          className="mt-1 flex flex-wrap items-center gap-x-2 text-base"
          data-testid="checklist-state"
        >
          <StateMark tone={state.tone} word={state.word} />
          {answer ? (
            <span className="text-asphalt-800">
              {recordByline({
                officialId: answer.officialId,
                deviceTime: answer.deviceTime,
                me: official.id,
                officials: pack.officials,
                timeZone: pack.event.timeZone,
              })}
            </span>
          ) : null}
        </p>
        {result && result.recordId !== null ? (
          <p className="text-base" data-testid="checklist-reason">
            {result.reason}
          </p>
        ) : null}
        {answer?.payload.comment ? (
          <p className="text-base text-asphalt-800">Comment: {answer.payload.comment}</p>
        ) : null}
      </div>
      {item.equipment ? (
        <div className="grid gap-2 sm:grid-cols-3">
          <label className="block sm:col-span-3">
            <span className="field-label">Standard on the label</span>
            <select
              className="field-input"
              value={standardId}
              onChange={(e) => set({ standardId: e.target.value })}
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
                onChange={(e) => set({ date: e.target.value })}
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
                    onChange={(e) => set({ month: e.target.value })}
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
                  onChange={(e) => set({ year: e.target.value })}
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
          maxLength={commentMax}
          aria-describedby={counterId}
          onChange={(e) => setComment(e.target.value)}
        />
      </label>
      <CharacterCount id={counterId} length={comment.length} max={commentMax} />
      {error ? (
        <p className="field-error" role="alert">
          {error}
        </p>
      ) : null}
      <div className="flex flex-wrap items-start gap-2">
        <AnswerButton
          tone="cleared"
          pressed={chosen === "pass"}
          onClick={() => void save("pass")}
          disabled={!canWrite}
        >
          Pass
        </AnswerButton>
        <AnswerButton
          tone="stopped"
          pressed={chosen === "fail"}
          onClick={() => void save("fail")}
          disabled={!canWrite}
        >
          Fail
        </AnswerButton>
        {item.notApplicableAllowed ? (
          <AnswerButton
            tone="neutral"
            pressed={chosen === "not-applicable"}
            onClick={() => void save("not-applicable")}
            disabled={!canWrite}
          >
            Not fitted
          </AnswerButton>
        ) : null}
        {answer ? <VoidOwnRecord target={answer} what={`your ${item.label} answer`} /> : null}
      </div>
    </li>
  );
}
