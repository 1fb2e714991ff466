"use client";
import { startTransition, useActionState, useEffect } from "react";
import { type Path, type UseFormRegisterReturn, useForm } from "react-hook-form";
import type { DeclarationsFormValues } from "@/lib/declarations/declarations-form-values";
import { toDeclarationsInput } from "@/lib/declarations/declarations-form-values";
import { declarationsResolver } from "@/lib/declarations/declarations-resolver";
import type { DeclarationAsk, DeclarationTopic } from "@/lib/scrutineer/classes/declaration-asks";
import { FieldError } from "../field-error";
import type { FormState } from "../form-state";

type Action = (state: FormState, form: FormData) => Promise<FormState>;

/** A typed number: blank is "not given", anything else is read as a number (NaN if it is not one,
 *  which the schema names). A comma is read as a decimal point. */
const asNumber = (v: unknown) =>
  v === "" || v === null || v === undefined ? undefined : Number(String(v).replace(",", "."));

const TITLES: Record<DeclarationTopic, string> = {
  weight: "Weight and driver",
  power: "Power (dyno sheet)",
  tyres: "Tyres",
  modifications: "Modification points",
  engine: "Engine",
  aero: "Aero devices",
};

/**
 * The entry's declarations, checked in the browser by the engine's own schema (react-hook-form +
 * zodResolver over `entryDeclarationsSchema`), so a dyno sheet whose air or vapour pressure cannot
 * be true is named at its field before anything is sent; the server action parses it again.
 */
export function DeclarationsForm({
  entryId,
  className,
  asks,
  initial,
  canEdit,
  action,
}: {
  entryId: string;
  className: string;
  asks: DeclarationAsk[];
  initial: DeclarationsFormValues;
  canEdit: boolean;
  action: Action;
}) {
  const [state, dispatch, pending] = useActionState(action, { status: "idle" });
  const form = useForm<DeclarationsFormValues>({
    resolver: declarationsResolver,
    defaultValues: initial,
    mode: "onSubmit",
    reValidateMode: "onChange",
  });
  const { register, watch, formState, setError } = form;
  const errors = formState.errors;
  const hasDyno = watch("hasDynoSheet");
  const tyreKind = watch("tyres.kind");

  useEffect(() => {
    if (state.status !== "error" || !state.fields) return;
    for (const [path, messages] of Object.entries(state.fields)) {
      const name = path.replace(/^declarations\./, "") as Path<DeclarationsFormValues>;
      setError(name, { message: messages.join(" ") });
    }
  }, [state, setError]);

  const message = (path: string): string[] | undefined => {
    let node: unknown = errors;
    for (const key of path.split(".")) node = (node as Record<string, unknown> | undefined)?.[key];
    const text = (node as { message?: unknown } | undefined)?.message;
    return typeof text === "string" ? [text] : undefined;
  };
  const numberField = (
    path: Path<DeclarationsFormValues>,
    label: string,
    extra?: { unit?: UseFormRegisterReturn; units?: readonly string[]; hint?: string },
  ) => {
    const id = `decl-${path.replaceAll(".", "-")}`;
    const unitPath = path.replace(/\.value$/, ".unit");
    return (
      <div>
        <label htmlFor={id} className="field-label">
          {label}
        </label>
        <div className="flex gap-2">
          <input
            id={id}
            className="field-input tabular"
            inputMode="decimal"
            disabled={!canEdit}
            aria-invalid={message(path) ? true : undefined}
            aria-describedby={`${id}-error`}
            {...register(path, { setValueAs: asNumber })}
          />
          {extra?.units ? (
            <select
              className="field-input w-28"
              aria-label={`${label}: unit`}
              disabled={!canEdit}
              {...register(unitPath as Path<DeclarationsFormValues>)}
            >
              {extra.units.map((u) => (
                <option key={u} value={u}>
                  {u === "C" ? "°C" : u === "F" ? "°F" : u}
                </option>
              ))}
            </select>
          ) : null}
        </div>
        {extra?.hint ? <p className="mt-1 text-sm text-asphalt-700">{extra.hint}</p> : null}
        <FieldError id={`${id}-error`} messages={message(path)} />
      </div>
    );
  };
  const ask = (topic: DeclarationTopic) => asks.find((a) => a.topic === topic);
  const section = (topic: DeclarationTopic, body: React.ReactNode) => {
    const a = ask(topic);
    return (
      <fieldset className="card space-y-3" data-testid={`declare-${topic}`}>
        <legend className="sr-only">{TITLES[topic]}</legend>
        <h2 className="text-xl font-bold">
          {TITLES[topic]}{" "}
          <span className={a?.asked ? "text-accent" : "text-asphalt-700"}>
            · {a?.asked ? `${className} asks for this` : "optional"}
          </span>
        </h2>
        {a ? <p className="text-base text-asphalt-800">{a.why}</p> : null}
        {body}
      </fieldset>
    );
  };

  const onValid = (values: DeclarationsFormValues) => {
    const data = new FormData();
    data.set("entryId", entryId);
    data.set("declarations", JSON.stringify(toDeclarationsInput(values)));
    startTransition(() => dispatch(data));
  };

  const order = [...asks].sort((a, b) => Number(b.asked) - Number(a.asked)).map((a) => a.topic);
  const bodies: Record<DeclarationTopic, React.ReactNode> = {
    weight: (
      <div className="grid gap-4 sm:grid-cols-2">
        {numberField("driverWeightKg", "Driver's weight in kit (kg)")}
        {numberField("ballastKg", "Ballast fitted (kg)")}
      </div>
    ),
    power: (
      <div className="space-y-3">
        <label className="flex min-h-12 items-center gap-3 text-base">
          <input
            type="checkbox"
            className="size-6"
            disabled={!canEdit}
            {...register("hasDynoSheet")}
          />
          I have a dyno sheet for this car
        </label>
        {hasDyno ? (
          <div className="space-y-3" data-testid="dyno-sheet-fields">
            {numberField("dynoSheet.power.value", "Power printed on the sheet", {
              units: ["hp", "PS", "kW"],
            })}
            <div className="grid gap-4 sm:grid-cols-2">
              <div>
                <label htmlFor="decl-measured-at" className="field-label">
                  Measured at
                </label>
                <select
                  id="decl-measured-at"
                  className="field-input"
                  disabled={!canEdit}
                  {...register("dynoSheet.measuredAt")}
                >
                  <option value="wheel">the wheels (rolling road)</option>
                  <option value="crank">the crank (engine dyno)</option>
                </select>
              </div>
              <div>
                <label htmlFor="decl-correction" className="field-label">
                  Correction printed on the sheet
                </label>
                <select
                  id="decl-correction"
                  className="field-input"
                  disabled={!canEdit}
                  {...register("dynoSheet.correction")}
                >
                  <option value="sae-j1349">SAE J1349</option>
                  <option value="std">STD (29.92 inHg, 60 °F)</option>
                  <option value="uncorrected">Uncorrected (observed)</option>
                </select>
              </div>
            </div>
            <div>
              <label htmlFor="decl-dyno-date" className="field-label">
                Date of the run
              </label>
              <input
                id="decl-dyno-date"
                type="date"
                className="field-input"
                disabled={!canEdit}
                aria-invalid={message("dynoSheet.date") ? true : undefined}
                aria-describedby="decl-dyno-date-error"
                {...register("dynoSheet.date")}
              />
              <FieldError id="decl-dyno-date-error" messages={message("dynoSheet.date")} />
            </div>
            <fieldset
              className="space-y-3 rounded-lg border border-asphalt-300 p-3"
              data-testid="dyno-ambient"
            >
              <legend className="px-1 text-base font-semibold">
                Ambient conditions printed on the sheet
              </legend>
              <div className="grid gap-4 sm:grid-cols-2">
                {numberField("dynoSheet.ambient.pressure.value", "Air pressure", {
                  units: ["hPa", "mbar", "kPa", "inHg"],
                  hint: "The cell's absolute (station) pressure.",
                })}
                {numberField("dynoSheet.ambient.temperature.value", "Air temperature", {
                  units: ["C", "F"],
                })}
                {numberField(
                  "dynoSheet.ambient.vapourPressure.value",
                  "Vapour pressure (if printed)",
                  {
                    units: ["hPa", "mbar", "kPa", "inHg"],
                    hint: "Leave blank if the sheet does not print it: the air is then taken as dry.",
                  },
                )}
              </div>
              <FieldError id="decl-ambient-error" messages={message("dynoSheet.ambient")} />
            </fieldset>
          </div>
        ) : null}
      </div>
    ),
    tyres: (
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="decl-tyres-kind" className="field-label">
            Tyres fitted
          </label>
          <select
            id="decl-tyres-kind"
            className="field-input"
            disabled={!canEdit}
            {...register("tyres.kind")}
          >
            <option value="">Not declared yet</option>
            <option value="graded">Road tyres with a treadwear grade</option>
            <option value="no-grade">Tyres with no treadwear grade (race tyres)</option>
          </select>
        </div>
        {tyreKind === "graded"
          ? numberField("tyres.treadwear", "Treadwear grade (on the sidewall)")
          : null}
      </div>
    ),
    modifications: numberField("modificationPoints", "Modification points"),
    engine: (
      <div className="grid gap-4 sm:grid-cols-2">
        {numberField("engine.displacementCc", "Displacement (cc)")}
        <label className="flex min-h-12 items-center gap-3 text-base">
          <input
            type="checkbox"
            className="size-6"
            disabled={!canEdit}
            {...register("engine.forcedInduction")}
          />
          Turbo or supercharger fitted
        </label>
      </div>
    ),
    aero: (
      <div className="flex flex-wrap gap-x-6">
        {(["wing", "splitter", "diffuser"] as const).map((d) => (
          <label key={d} className="flex min-h-12 items-center gap-3 text-base">
            <input
              type="checkbox"
              className="size-6"
              disabled={!canEdit}
              {...register(`aero.${d}`)}
            />
            {d === "wing" ? "Rear wing" : d === "splitter" ? "Front splitter" : "Rear diffuser"}
          </label>
        ))}
      </div>
    ),
  };

  return (
    <form
      className="space-y-4"
      noValidate
      onSubmit={form.handleSubmit(onValid)}
      data-testid="declarations-form"
    >
      {order.map((topic) => (
        <div key={topic}>{section(topic, bodies[topic])}</div>
      ))}
      {state.status === "error" && !state.fields ? (
        <p className="field-error" role="alert">
          {state.message}
        </p>
      ) : null}
      {Object.keys(errors).length > 0 ? (
        <p className="field-error" role="alert" data-testid="declarations-invalid">
          Some figures need attention before they can be saved.
        </p>
      ) : null}
      {state.status === "done" ? (
        <p className="font-semibold text-cleared" role="status" data-testid="declarations-saved">
          {state.message}
        </p>
      ) : null}
      {canEdit ? (
        <button type="submit" className="btn-primary w-full sm:w-auto" disabled={pending}>
          {pending ? "Saving…" : "Save declarations"}
        </button>
      ) : (
        <p className="card">Only the driver or the car&apos;s owner changes these.</p>
      )}
    </form>
  );
}
