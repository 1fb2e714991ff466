import { describe, expect, it } from "vitest";
import { checkRuleSetSuccessor } from "@/lib/scrutineer/rule-sets/check-rule-set-successor";
import {
  describeExpiryPolicy,
  describeRuleSet,
} from "@/lib/scrutineer/rule-sets/describe-rule-set";
import { parseRuleSetJson } from "@/lib/scrutineer/rule-sets/parse-rule-set-json";
import { type RuleSetInput, ruleSetSchema } from "@/lib/scrutineer/rule-sets/rule-set-schema";
import { displayUnits } from "@/lib/scrutineer/units/display-units";
import { clubRuleSet } from "./fixtures";

/**
 * A ladder with DOMAIN.md's published limits: wing top ≤ 200 mm above the roof and ≤ 200 mm
 * behind the bumper, splitter ≤ 200 mm (Source: Motorsport UK NCR 2026 Ch.14 App.4), and a class
 * with the 10 in (254 mm) roof limit and 4 in (101.6 mm) splitter (Source: a national time-attack
 * series' 2024 class rules 1.3; a marque club's racing rules, as quoted in DOMAIN.md).
 */
function publishedLimits(): RuleSetInput {
  const base = clubRuleSet();
  return {
    ...base,
    id: "published",
    classes: [
      {
        id: "national",
        name: "National",
        aero: {
          wing: {
            allowed: true,
            height: { reference: "roof-peak", maxMm: 200 },
            maxOverhangMm: 200,
            span: null,
            maxChordMm: null,
          },
          splitter: { allowed: true, maxProtrusionMm: 200, width: null },
        },
      },
      {
        id: "series",
        name: "Series",
        aero: {
          wing: {
            allowed: true,
            height: { reference: "roof-peak", maxMm: 254 },
            maxOverhangMm: null,
            span: null,
            maxChordMm: null,
          },
          splitter: { allowed: true, maxProtrusionMm: 101.6, width: null },
        },
      },
    ],
  };
}

const text = (v: unknown) => JSON.stringify(v, null, 2);

describe("parseRuleSetJson: a rule set as the organizer writes it", () => {
  it("accepts a valid rule set and fills the schema's defaults", () => {
    const result = parseRuleSetJson(text(publishedLimits()));
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.ruleSet.classes.map((c) => c.id)).toEqual(["national", "series"]);
    expect(result.ruleSet.safety.expiryWarningDays).toBe(30);
  });

  it("says where JSON syntax breaks, by line and column", () => {
    const result = parseRuleSetJson('{\n  "a": 1,\n  "b" 2\n}');
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues).toHaveLength(1);
    expect(result.issues[0]?.message).toMatch(/^This is not valid JSON: .* at line 3, column 7\.$/);
  });

  it("asks for the rule set when the box is empty, and refuses a huge paste", () => {
    const empty = parseRuleSetJson("   ");
    expect(empty.ok ? "" : empty.issues[0]?.message).toBe("Paste or upload the rule set (JSON).");
    const huge = parseRuleSetJson(" ".repeat(200_001));
    expect(huge.ok ? "" : huge.issues[0]?.message).toMatch(/over 200,000 characters/);
  });

  it("names the class and field of every schema problem", () => {
    const broken = publishedLimits() as unknown as {
      classes: Array<{ aero: { wing: { height: { maxMm: unknown } } } }>;
      decisionRule: unknown;
    };
    const series = broken.classes[1];
    if (series) series.aero.wing.height.maxMm = "ten inches";
    broken.decisionRule = { kind: "guarded" };
    const result = parseRuleSetJson(text(broken));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const where = result.issues.map((i) => `${i.where} | ${i.path}`);
    expect(where).toContain(
      "Class 2 (Series) › aero › wing › height › maxMm | classes.1.aero.wing.height.maxMm",
    );
    expect(where).toContain("decisionRule › k | decisionRule.k");
    const messages = Object.fromEntries(result.issues.map((i) => [i.path, i.message]));
    expect(messages["classes.1.aero.wing.height.maxMm"]).toBe("Expected a number, found text.");
    expect(messages["decisionRule.k"]).toBe("Missing: give a number.");
  });

  it("reports the schema's own cross-checks (a class id used twice) at the class", () => {
    const twice = publishedLimits();
    const first = twice.classes[0];
    if (first) twice.classes.push({ ...first, name: "Again" });
    const result = parseRuleSetJson(text(twice));
    expect(result.ok ? [] : result.issues.map((i) => [i.where, i.message])).toContainEqual([
      "Class 3 (Again) › id",
      'Class id "national" is used twice',
    ]);
  });
});

describe("checkRuleSetSuccessor: what a new version keeps", () => {
  const pinned = ruleSetSchema.parse(publishedLimits());
  const next = (change: Partial<RuleSetInput>) =>
    ruleSetSchema.parse({ ...publishedLimits(), version: 2, ...change });

  it("passes the same rule set at the next version", () => {
    expect(
      checkRuleSetSuccessor({
        pinned,
        next: next({}),
        latestVersion: 1,
        declaredClassIds: new Map([["national", 3]]),
      }),
    ).toEqual([]);
  });

  it("refuses another id, a version that is not the next, and a dropped class entries declare", () => {
    const issues = checkRuleSetSuccessor({
      pinned,
      next: next({ id: "other", version: 5, classes: publishedLimits().classes.slice(1) }),
      latestVersion: 2,
      declaredClassIds: new Map([
        ["national", 3],
        ["series", 1],
      ]),
    });
    expect(issues.map((i) => [i.path, i.message])).toEqual([
      ["id", 'This event\'s rule set is "published"; a new version keeps that id.'],
      ["version", "The next version of this rule set is 3."],
      ["classes", '3 entries declare National ("national"); keep that class.'],
    ]);
  });
});

describe("describeRuleSet: the ladder in words, in the event's units", () => {
  it("writes the published limits in millimetres and in inches", () => {
    const ruleSet = ruleSetSchema.parse(publishedLimits());
    const mm = describeRuleSet(ruleSet, displayUnits({ length: "mm" }));
    expect(mm.classes[0]?.lines[0]).toEqual({
      label: "Wing",
      value:
        "top at most 200 mm above the roof's highest point; at most 200 mm behind the rearmost bodywork",
    });
    // Source: NIST SP 811 App. B.8 — 254 mm = 10 in and 101.6 mm = 4 in exactly
    const inches = describeRuleSet(ruleSet, displayUnits({ length: "in" }));
    expect(inches.classes[1]?.lines.slice(0, 2)).toEqual([
      { label: "Wing", value: "top at most 10 in above the roof's highest point" },
      { label: "Splitter", value: "at most 4 in ahead of the bumper" },
    ]);
  });

  it("words the club rule's span and the decision rule", () => {
    // Source: common practice (no source) — span no wider than the body, end plates counted
    const guarded = ruleSetSchema.parse(clubRuleSet({ kind: "guarded", k: 2 }));
    const d = describeRuleSet(guarded, displayUnits({ length: "in" }));
    expect(d.classes[0]?.lines[0]?.value).toBe(
      "top at most 8 in above the roof's highest point; at most 5 in behind the rearmost bodywork; no wider than the body (end plates counted)",
    );
    expect(d.general[0]?.value).toMatch(/^guarded acceptance: .*k = 2\)/);
  });

  it("words each expiry policy", () => {
    // Source: Motorsport UK NCR 2026 Ch.7 App.7 Arts 10.4–10.7 — up to 5 years after the label year
    expect(describeExpiryPolicy({ kind: "years-after-label-year", years: 5 })).toBe(
      "valid through 31 December, 5 years after the label year",
    );
    expect(describeExpiryPolicy({ kind: "end-of-label-year" })).toBe(
      "valid through 31 December of the label year",
    );
  });
});
