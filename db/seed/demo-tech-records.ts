// Invented tech-line records for the demo: most cars measured and checked by the two demo
// scrutineers, a few of them over their class, one with an expired harness, one too close to call
// and one whose readings disagree — so every screen has something to show.
import { v7 as uuidv7 } from "uuid";
import type { ClassRules } from "../../lib/scrutineer/classes/class-rules-schema";
import type { EntryDeclarationsInput } from "../../lib/scrutineer/classes/entry-declarations-schema";
import type { LengthDimension, TechRecord } from "../../lib/scrutineer/records/record-schema";
import type { RuleSet } from "../../lib/scrutineer/rule-sets/rule-set-schema";
import { createPrng } from "./prng";

export type DemoTwist = "none" | "over-height" | "expired-harness" | "too-close" | "disagree";

type Ctx = {
  entryId: string;
  cls: ClassRules;
  declarations: EntryDeclarationsInput;
  officials: [string, string];
  eventDate: string;
  twist: DemoTwist;
  seed: number;
};

const LB_PER_KG = 1 / 0.45359237;

/** The records two scrutineers would make for one car on the demo day. */
export function demoTechRecords(ctx: Ctx, ruleSet: RuleSet): TechRecord[] {
  const rnd = createPrng(ctx.seed);
  const year = Number(ctx.eventDate.slice(0, 4));
  let minute = 0;
  const at = () => {
    minute += 1;
    return new Date(`${ctx.eventDate}T08:30:00Z`).getTime() + minute * 60_000 + rnd.int(0, 50_000);
  };
  const [first, second] = ctx.officials;
  const base = (officialId: string) => {
    const t = at();
    return {
      id: uuidv7({ msecs: t }),
      entryId: ctx.entryId,
      officialId,
      deviceId: `demo-phone-${officialId.slice(-4)}`,
      deviceTime: new Date(t).toISOString(),
    };
  };
  const tape = { id: "tape-class-2", name: "Steel tape (class II)", standardUncertainty: 0.5 };
  const gauge = { id: "height-gauge", name: "Height gauge", standardUncertainty: 0.3 };
  const plumb = {
    id: "plumb-and-tape",
    name: "Plumb bob, floor marks and tape",
    standardUncertainty: 1.5,
  };
  const conditions = { levelPad: true, driverAboard: false };
  const records: TechRecord[] = [];
  const read = (
    officialId: string,
    dimension: LengthDimension,
    value: number,
    instrument = tape,
  ) => {
    records.push({
      ...base(officialId),
      kind: "reading",
      payload: { dimension, value: Math.round(value * 10) / 10, instrument, conditions },
    });
  };

  const roof = 1300 + rnd.int(0, 100);
  const body = 1700 + rnd.int(0, 100);
  const wing = ctx.cls.aero.wing;
  if (ctx.declarations.aero?.wing && wing.allowed) {
    const heightLimit = wing.height?.maxMm ?? 250;
    const above =
      ctx.twist === "over-height"
        ? heightLimit + 30 + rnd.int(0, 20)
        : ctx.twist === "too-close"
          ? heightLimit - 0.6
          : heightLimit - 25 - rnd.int(0, 30);
    const gaugeFor = ctx.twist === "too-close" ? plumb : gauge;
    read(first, "roofPeakFromGroundMm", roof, gaugeFor);
    read(first, "wingTopFromGroundMm", roof + above, gaugeFor);
    read(second, "wingTopFromGroundMm", roof + above + (rnd.next() - 0.5) * 0.6, gaugeFor);
    read(first, "wingOverhangMm", (wing.maxOverhangMm ?? 150) - 20 - rnd.int(0, 40), plumb);
    const spanLimit = body + (wing.span?.allowanceOverBodyMm ?? 40);
    const span = spanLimit - 15 - rnd.int(0, 30);
    read(first, "bodyWidthMm", body);
    read(first, "wingSpanMm", span);
    read(
      second,
      "wingSpanMm",
      ctx.twist === "disagree" ? span + 16 : span + (rnd.next() - 0.5) * 0.8,
    );
    read(first, "wingChordMm", (wing.maxChordMm ?? 300) - 30 - rnd.int(0, 40));
  } else {
    read(first, "bodyWidthMm", body);
  }
  const splitter = ctx.cls.aero.splitter;
  if (ctx.declarations.aero?.splitter && splitter.allowed) {
    read(
      second,
      "splitterProtrusionMm",
      (splitter.maxProtrusionMm ?? 100) - 10 - rnd.int(0, 20),
      plumb,
    );
    read(
      second,
      "splitterWidthMm",
      body + (splitter.width?.allowanceOverBodyMm ?? 0) - 10 - rnd.int(0, 20),
    );
  }

  // Weighed heavy enough for the class's power-to-weight floor (with the declared driver).
  const power = ctx.declarations.dynoSheet?.power.value ?? 180;
  const floorLbPerHp = ctx.cls.minPowerToWeight ?? 0;
  const driver = ctx.declarations.driverWeightKg ?? 80;
  const totalKg =
    Math.max(1050, (floorLbPerHp * power) / LB_PER_KG - driver) * (1.06 + rnd.next() * 0.05);
  const scales = { id: "corner-scales", name: "Corner scales", standardUncertainty: 0.5 };
  for (const [corner, share] of [
    ["lf", 0.27],
    ["rf", 0.27],
    ["lr", 0.23],
    ["rr", 0.23],
  ] as const) {
    records.push({
      ...base(second),
      kind: "reading",
      payload: {
        dimension: "cornerWeightKg",
        corner,
        value: Math.round(totalKg * share * 2) / 2,
        instrument: scales,
        conditions,
      },
    });
  }
  records.push({
    ...base(second),
    kind: "reading",
    payload: {
      dimension: "noiseDbA",
      value: 95 + rnd.int(0, 70) / 10,
      instrument: {
        id: "sound-meter-class-1",
        name: "Sound level meter (class 1)",
        standardUncertainty: 0.7,
      },
      conditions,
    },
  });

  // The tech sheet, every label read off the item and in date on the event day (but one).
  const labels: Record<
    string,
    {
      standardId: string;
      label: NonNullable<(TechRecord & { kind: "checklist" })["payload"]["equipment"]>["label"];
    }
  > = {
    harness:
      ctx.twist === "expired-harness"
        ? { standardId: "fia-8853-98", label: { form: "not-valid-after-year", year: year - 1 } }
        : { standardId: "fia-8853-2016", label: { form: "manufacture-year", year: year - 2 } },
    seat: { standardId: "fia-8862-2009", label: { form: "manufacture-year", year: year - 3 } },
    helmet: { standardId: "snell-sa2020", label: { form: "standard-only" } },
    "head-restraint": {
      standardId: "sfi-38-1",
      label: { form: "manufacture-month", year: year - 1, month: 3 },
    },
    suit: { standardId: "fia-8856-2018", label: { form: "not-valid-after-year", year: year + 6 } },
    extinguisher: {
      standardId: "extinguisher-service",
      label: { form: "date", date: `${year - 1}-09-14` },
    },
  };
  for (const item of ruleSet.safety.checklist) {
    const equipment = labels[item.id];
    const expired = ctx.twist === "expired-harness" && item.id === "harness";
    // Equipment the demo reads a label off is fitted; other optional kit is fitted at random.
    const fitted = equipment !== undefined || !item.notApplicableAllowed || rnd.next() > 0.5;
    records.push({
      ...base(first),
      kind: "checklist",
      payload: {
        itemId: item.id,
        result: fitted ? "pass" : "not-applicable",
        ...(equipment && fitted ? { equipment } : {}),
        ...(expired ? { comment: "Label says not valid after last year." } : {}),
      },
    });
  }
  return records;
}
