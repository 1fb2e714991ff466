import type { EntryDeclarationsInput } from "../scrutineer/classes/entry-declarations-schema";

type PressureUnit = "kPa" | "hPa" | "mbar" | "inHg";
type Figure<U extends string> = { value?: number | undefined; unit: U };

/**
 * The declarations form's values: the schema's shape, with every number possibly blank and a
 * switch for "I have a dyno sheet", so an error's path in `entryDeclarationsSchema` is the name of
 * the field it belongs to.
 */
export type DeclarationsFormValues = {
  aero: { wing: boolean; splitter: boolean; diffuser: boolean };
  hasDynoSheet: boolean;
  dynoSheet: {
    power: Figure<"hp" | "PS" | "kW">;
    measuredAt: "wheel" | "crank";
    correction: "sae-j1349" | "std" | "uncorrected";
    ambient: {
      pressure: Figure<PressureUnit>;
      vapourPressure: Figure<PressureUnit>;
      temperature: Figure<"C" | "F">;
    };
    date: string;
  };
  tyres: { kind: "" | "graded" | "no-grade"; treadwear?: number | undefined };
  modificationPoints?: number | undefined;
  driverWeightKg?: number | undefined;
  ballastKg?: number | undefined;
  engine: { displacementCc?: number | undefined; forcedInduction: boolean };
};

const blank = (n: number | undefined): boolean => n === undefined;

/** The form's values as the engine's declarations (before its defaults): blanks become "not
 *  declared" (null), a dyno sheet with no ambient figures has none, a blank vapour pressure is
 *  left out (dry air). Numbers typed wrong stay NaN so the schema names the field. Pure. */
export function toDeclarationsInput(v: DeclarationsFormValues): EntryDeclarationsInput {
  const a = v.dynoSheet.ambient;
  const noAmbient =
    blank(a.pressure.value) && blank(a.temperature.value) && blank(a.vapourPressure.value);
  return {
    aero: { ...v.aero },
    dynoSheet: v.hasDynoSheet
      ? {
          power: v.dynoSheet.power as { value: number; unit: "hp" | "PS" | "kW" },
          measuredAt: v.dynoSheet.measuredAt,
          correction: v.dynoSheet.correction,
          ambient: noAmbient
            ? null
            : {
                pressure: a.pressure as { value: number; unit: PressureUnit },
                temperature: a.temperature as { value: number; unit: "C" | "F" },
                ...(blank(a.vapourPressure.value)
                  ? {}
                  : { vapourPressure: a.vapourPressure as { value: number; unit: PressureUnit } }),
              },
          date: v.dynoSheet.date,
        }
      : null,
    tyres:
      v.tyres.kind === ""
        ? null
        : v.tyres.kind === "no-grade"
          ? { kind: "no-grade" }
          : { kind: "graded", treadwear: v.tyres.treadwear as number },
    modificationPoints: v.modificationPoints ?? null,
    driverWeightKg: v.driverWeightKg ?? null,
    ballastKg: v.ballastKg ?? 0,
    engine: blank(v.engine.displacementCc)
      ? null
      : {
          displacementCc: v.engine.displacementCc as number,
          forcedInduction: v.engine.forcedInduction,
        },
  };
}

/** Stored declarations (after the schema's defaults) as the form's starting values. Pure. */
export function toDeclarationsFormValues(d: {
  aero: { wing: boolean; splitter: boolean; diffuser: boolean };
  dynoSheet: {
    power: { value: number; unit: "hp" | "PS" | "kW" };
    measuredAt: "wheel" | "crank";
    correction: "sae-j1349" | "std" | "uncorrected";
    ambient: {
      pressure: { value: number; unit: PressureUnit };
      vapourPressure?: { value: number; unit: PressureUnit } | undefined;
      temperature: { value: number; unit: "C" | "F" };
    } | null;
    date: string;
  } | null;
  tyres: { kind: "graded"; treadwear: number } | { kind: "no-grade" } | null;
  modificationPoints: number | null;
  driverWeightKg: number | null;
  ballastKg: number;
  engine: { displacementCc: number; forcedInduction: boolean } | null;
}): DeclarationsFormValues {
  const sheet = d.dynoSheet;
  return {
    aero: { ...d.aero },
    hasDynoSheet: sheet !== null,
    dynoSheet: {
      power: { value: sheet?.power.value, unit: sheet?.power.unit ?? "hp" },
      measuredAt: sheet?.measuredAt ?? "wheel",
      correction: sheet?.correction ?? "sae-j1349",
      ambient: {
        pressure: {
          value: sheet?.ambient?.pressure.value,
          unit: sheet?.ambient?.pressure.unit ?? "hPa",
        },
        vapourPressure: {
          value: sheet?.ambient?.vapourPressure?.value,
          unit: sheet?.ambient?.vapourPressure?.unit ?? "hPa",
        },
        temperature: {
          value: sheet?.ambient?.temperature.value,
          unit: sheet?.ambient?.temperature.unit ?? "C",
        },
      },
      date: sheet?.date ?? "",
    },
    tyres:
      d.tyres === null
        ? { kind: "" }
        : d.tyres.kind === "graded"
          ? { kind: "graded", treadwear: d.tyres.treadwear }
          : { kind: "no-grade" },
    modificationPoints: d.modificationPoints ?? undefined,
    driverWeightKg: d.driverWeightKg ?? undefined,
    ballastKg: d.ballastKg === 0 ? undefined : d.ballastKg,
    engine: {
      displacementCc: d.engine?.displacementCc,
      forcedInduction: d.engine?.forcedInduction ?? false,
    },
  };
}
