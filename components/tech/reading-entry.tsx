"use client";
import { useRef, useState } from "react";
import { Caution } from "@/components/caution";
import { ReadingDiagram } from "@/components/diagrams/reading-diagram";
import { makeRecord } from "@/lib/offline/make-record";
import { dimensionLabel } from "@/lib/scrutineer/measurement/dimension-labels";
import { implausibleReading } from "@/lib/scrutineer/measurement/implausible-reading";
import type { ReadingContext } from "@/lib/scrutineer/measurement/reading-context";
import {
  type Corner,
  type Dimension,
  type ReadingPayload,
  SIGNED_DIMENSIONS,
  type TechRecordOf,
} from "@/lib/scrutineer/records/record-schema";
import { convertMass } from "@/lib/scrutineer/units/convert-mass";
import { parseLength } from "@/lib/scrutineer/units/parse-length";
import {
  compareWithOwnReadings,
  type OwnReadingMismatch,
} from "@/lib/tech/compare-with-own-readings";
import { defaultInstruments } from "@/lib/tech/default-instruments";
import { formatReadingValue } from "./format-reading-value";
import { ImplausibleReadingWarning } from "./implausible-reading-warning";
import { readingExample } from "./reading-example";
import { ReadingMismatchWarning } from "./reading-mismatch-warning";
import { sentenceCase } from "./sentence-case";
import { useTech } from "./tech-context";

const unitOf = (d: Dimension) =>
  d === "cornerWeightKg" ? "kg" : d === "noiseDbA" ? "dB(A)" : "mm";

/**
 * Record one reading of one dimension: where it is taken (drawing), the value in the event's unit
 * (or any unit written with it), the instrument, and the conditions the rule set asks for.
 * A reading that cannot plausibly be true (the rule set's range, the car's other readings), or
 * that disagrees with the scrutineer's own earlier ones, is held for a second look ("Check this
 * reading": "Save anyway" / "Fix it"), never refused.
 */
export function ReadingEntry({
  entryId,
  dimension,
  corner,
  earlier,
  voided,
  context,
}: {
  entryId: string;
  dimension: Dimension;
  corner: Corner | null;
  /** This car's readings of this dimension (and corner) as the phone knows them. */
  earlier: ReadonlyArray<TechRecordOf<"reading">>;
  voided: ReadonlySet<string>;
  /** The car's other readings (means, non-void), to check this one against. */
  context: ReadingContext;
}) {
  const { ruleSet, pack, official, deviceId, record, canWrite } = useTech();
  const unitSystem = pack.event.unitSystem;
  const massUnit = unitSystem === "mm" ? "kg" : "lb";
  const kind = unitOf(dimension);
  const instruments = defaultInstruments.filter((i) => i.unit === kind);
  const [instrumentId, setInstrumentId] = useState<string>(instruments[0]?.id ?? "");
  const [text, setText] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [held, setHeld] = useState<
    | { payload: ReadingPayload; mismatch: OwnReadingMismatch }
    | { payload: ReadingPayload; implausible: string }
    | null
  >(null);
  const input = useRef<HTMLInputElement>(null);
  const conditions =
    dimension === "cornerWeightKg" ? ruleSet.measurement.weighing : ruleSet.measurement.aero;
  const [driverAboard, setDriverAboard] = useState(conditions.driverAboard);
  const [levelPad, setLevelPad] = useState(true);
  const label = dimensionLabel(dimension, corner);

  const save = async () => {
    setSaved(null);
    let value: number;
    if (kind === "mm") {
      const parsed = parseLength(text, {
        defaultUnit: unitSystem,
        allowNegative: (SIGNED_DIMENSIONS as readonly Dimension[]).includes(dimension),
      });
      if (!parsed.ok) return setError(parsed.message);
      value = parsed.mm;
    } else {
      const n = Number(text.replace(",", ".").trim());
      if (!text.trim() || !Number.isFinite(n) || n < 0)
        return setError(
          `Write the ${kind === "kg" ? "weight" : "level"} as a number, e.g. ${kind === "kg" ? "312.5" : "98.5"}`,
        );
      value = kind === "kg" ? convertMass(n, massUnit, "kg") : n;
    }
    const instrument = instruments.find((i) => i.id === instrumentId);
    if (!instrument) return setError("Pick the instrument you used");
    setError(null);
    const base = {
      value,
      instrument: {
        id: instrument.id,
        name: instrument.name,
        standardUncertainty: instrument.standardUncertainty,
      },
      conditions: { driverAboard, levelPad },
    };
    const payload =
      dimension === "cornerWeightKg"
        ? { ...base, dimension, corner: corner ?? "lf" }
        : ({ ...base, dimension } as ReadingPayload);
    // First: can the number be true at all (range, and the car's other readings)?
    const implausible = implausibleReading({ reading: payload, ruleSet, context, unitSystem });
    if (implausible) {
      setHeld({ payload, implausible });
      return;
    }
    const mismatch = compareWithOwnReadings({
      reading: payload,
      officialId: official.id,
      earlier,
      voided,
      k: ruleSet.decisionRule.k,
    });
    if (mismatch) {
      setHeld({ payload, mismatch });
      return;
    }
    await keep(payload);
  };

  /** Back to the number: the hold goes, the field is focused with its text selected. */
  const fixHeld = () => {
    setHeld(null);
    input.current?.focus();
    input.current?.select();
  };

  const keep = async (payload: ReadingPayload) => {
    setHeld(null);
    await record(
      makeRecord({
        kind: "reading",
        payload,
        entryId,
        officialId: official.id,
        deviceId,
        now: new Date(),
      }),
    );
    setText("");
    setSaved(
      `Saved on this phone: ${label} ${formatReadingValue(dimension, payload.value, unitSystem)}`,
    );
  };

  return (
    <div
      className="space-y-3"
      data-testid={`reading-entry-${dimension}${corner ? `-${corner}` : ""}`}
    >
      {dimension === "noiseDbA" ? (
        <Caution title="Noise test: engine running">
          This reading is taken with the engine running (
          {ruleSet.noise?.method ?? "¾ of maximum engine speed"}). Car secured (handbrake on, wheels
          chocked, in neutral or park), nobody in front of or behind the car, hearing protection on,
          and the chief scrutineer decides how the test is run.
        </Caution>
      ) : null}
      <div className="mx-auto max-w-xs">
        <ReadingDiagram dimension={dimension} {...(corner ? { corner } : {})} />
      </div>
      <form
        className="space-y-3"
        noValidate
        onSubmit={(e) => {
          e.preventDefault();
          void save();
        }}
      >
        <label className="block">
          <span className="field-label">{sentenceCase(label)}</span>
          <input
            className="field-input tabular text-2xl"
            inputMode={kind === "mm" && unitSystem === "in" ? "text" : "decimal"}
            placeholder={readingExample(dimension, unitSystem)}
            value={text}
            onChange={(e) => {
              setText(e.target.value);
              setHeld(null);
            }}
            ref={input}
            aria-invalid={error ? true : undefined}
            data-testid="reading-value"
            disabled={!canWrite}
          />
        </label>
        {error ? (
          <p className="field-error" role="alert">
            {error}
          </p>
        ) : null}
        <label className="block">
          <span className="field-label">Instrument</span>
          <select
            className="field-input"
            value={instrumentId}
            onChange={(e) => setInstrumentId(e.target.value)}
          >
            {instruments.map((i) => (
              <option key={i.id} value={i.id}>
                {i.name} (u = {i.standardUncertainty} {i.unit})
              </option>
            ))}
          </select>
        </label>
        <fieldset className="flex flex-wrap gap-4">
          <legend className="field-label">Measured with</legend>
          <label className="flex min-h-touch items-center gap-2">
            <input
              type="checkbox"
              className="size-6"
              checked={levelPad}
              onChange={(e) => setLevelPad(e.target.checked)}
            />
            car on the level pad
          </label>
          <label className="flex min-h-touch items-center gap-2">
            <input
              type="checkbox"
              className="size-6"
              checked={driverAboard}
              onChange={(e) => setDriverAboard(e.target.checked)}
            />
            driver aboard {conditions.driverAboard ? "(the rule says yes)" : "(the rule says no)"}
          </label>
        </fieldset>
        {held && "implausible" in held ? (
          <ImplausibleReadingWarning
            why={held.implausible}
            onSaveAnyway={() => void keep(held.payload)}
            onFix={fixHeld}
          />
        ) : held ? (
          <ReadingMismatchWarning
            label={label}
            value={formatReadingValue(dimension, held.payload.value, unitSystem)}
            earlierMean={formatReadingValue(dimension, held.mismatch.earlierMean, unitSystem)}
            earlierCount={held.mismatch.earlierCount}
            allowed={formatReadingValue(dimension, held.mismatch.allowedDifference, unitSystem)}
            onSaveAnyway={() => void keep(held.payload)}
            onFix={fixHeld}
          />
        ) : (
          <button type="submit" className="btn-primary w-full" disabled={!canWrite}>
            Save reading
          </button>
        )}
        {saved ? (
          <p className="text-base font-semibold text-cleared" role="status">
            {saved}
          </p>
        ) : null}
      </form>
    </div>
  );
}
