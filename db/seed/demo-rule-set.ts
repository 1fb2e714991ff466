import {
  type RuleSet,
  type RuleSetInput,
  ruleSetSchema,
} from "../../lib/scrutineer/rule-sets/rule-set-schema";

/**
 * Invented demo data for the demo event: the made-up Brackenmoor club's time-attack ladder,
 * Kestrel (street, little or no wing) → Merlin → Harrier → Peregrine (aero essentially unlimited).
 * Limits are in the range of published club rules but belong to no real series; tests use
 * sourced values, never these.
 */
const demoRuleSetInput = {
  schemaVersion: 1,
  id: "brackenmoor-time-attack",
  version: 1,
  name: "Brackenmoor time attack 2026",
  sanctioningBody: "Demo sanctioning body (invented)",
  notes: "Demo data. The chief scrutineer's decision is final on the day.",
  classes: [
    {
      id: "kestrel",
      name: "Kestrel",
      description:
        "Road-going cars on road tyres; a wing no higher than the roof and inside the bodywork.",
      aero: {
        wing: {
          allowed: true,
          height: { reference: "roof-peak", maxMm: 0 },
          maxOverhangMm: 0,
          span: { allowanceOverBodyMm: 0, endPlatesCounted: true },
          maxChordMm: 250,
        },
        splitter: { allowed: true, maxProtrusionMm: 50, width: { allowanceOverBodyMm: 0 } },
        diffuserAllowed: false,
      },
      minPowerToWeight: 14,
      minTreadwear: 200,
      maxModificationPoints: 10,
      maxEffectiveDisplacementCc: null,
    },
    {
      id: "merlin",
      name: "Merlin",
      description: "Modified road cars; a modest wing and splitter.",
      aero: {
        wing: {
          allowed: true,
          height: { reference: "roof-peak", maxMm: 100 },
          maxOverhangMm: 100,
          span: { allowanceOverBodyMm: 0, endPlatesCounted: true },
          maxChordMm: 300,
        },
        splitter: { allowed: true, maxProtrusionMm: 75, width: { allowanceOverBodyMm: 0 } },
        diffuserAllowed: true,
      },
      minPowerToWeight: 10,
      minTreadwear: 100,
      maxModificationPoints: 25,
      maxEffectiveDisplacementCc: null,
    },
    {
      id: "harrier",
      name: "Harrier",
      description: "Track-prepared cars on any tyre; a full wing within the club envelope.",
      aero: {
        wing: {
          allowed: true,
          height: { reference: "roof-peak", maxMm: 200 },
          maxOverhangMm: 200,
          span: { allowanceOverBodyMm: 50, endPlatesCounted: true },
          maxChordMm: 355.6,
        },
        splitter: { allowed: true, maxProtrusionMm: 127, width: { allowanceOverBodyMm: 25 } },
        diffuserAllowed: true,
      },
      minPowerToWeight: 7,
      minTreadwear: null,
      maxModificationPoints: 50,
      maxEffectiveDisplacementCc: null,
    },
    {
      id: "peregrine",
      name: "Peregrine",
      description: "Anything that passes safety scrutineering; aero unlimited.",
      aero: {
        wing: { allowed: true, height: null, maxOverhangMm: null, span: null, maxChordMm: null },
        splitter: { allowed: true, maxProtrusionMm: null, width: null },
        diffuserAllowed: true,
      },
      minPowerToWeight: null,
      minTreadwear: null,
      maxModificationPoints: null,
      maxEffectiveDisplacementCc: null,
    },
  ],
  decisionRule: { kind: "guarded", k: 2 },
  measurement: {
    aero: {
      driverAboard: false,
      levelPad: true,
      tyrePressureKpa: { min: 180, max: 260 },
      notes:
        "Engine off, car on the level pad, no driver aboard, tyres at the pressure the car will run.",
    },
    weighing: {
      driverAboard: false,
      levelPad: true,
      tyrePressureKpa: null,
      notes: "On the four corner scales, no driver; fuel as it arrives.",
    },
    references: {
      roofPeak: "The roof's highest point, found with a straight-edge across the roof.",
      rearmostBodywork: "The rearmost point of the bodywork or bumper, excluding the tow eye.",
      bodyWidth: "The body at its widest point, mirrors excluded.",
      splitterFront: "The foremost point of the front bumper.",
    },
    // What a reading can plausibly be on a car at the tech line; outside it the phone asks the
    // scrutineer to check, and the chief scrutineer sees the car. Wide on purpose: they catch a
    // slip of the finger or the unit, not an unusual car.
    plausible: {
      wingTopFromGroundMm: {
        min: 700,
        max: 2000,
        source:
          "Common practice (no source): no car's rear deck is below 700 mm; a time-attack wing rarely stands 2 m tall.",
      },
      roofPeakFromGroundMm: {
        min: 950,
        max: 2100,
        source:
          "From memory: the lowest road cars are about 1,000 mm tall (the GT40 was named for its 40 in); large vans about 2,000 mm.",
      },
      wingOverhangMm: {
        min: -1500,
        max: 700,
        source:
          "Common practice (no source): club rules allow 200 mm behind the bodywork (Motorsport UK NCR 2026 Ch.14 App.4); unlimited cars rarely reach 700 mm.",
      },
      wingSpanMm: {
        min: 500,
        max: 2400,
        source: "Common practice (no source): about as wide as the body or narrower.",
      },
      endPlateThicknessMm: {
        min: 0.5,
        max: 100,
        source: "Common practice (no source): end plates are sheet or a few centimetres of box.",
      },
      bodyWidthMm: {
        min: 1300,
        max: 2400,
        source:
          "From memory: Japanese kei cars are at most 1,480 mm wide; the widest road cars about 2,100 mm, wide-body kits a little more.",
      },
      splitterProtrusionMm: {
        min: -200,
        max: 600,
        source:
          "Common practice (no source): club rules allow 100–200 mm ahead of the bumper (DOMAIN.md table); unlimited cars rarely 600 mm.",
      },
      splitterWidthMm: {
        min: 800,
        max: 2400,
        source: "Common practice (no source): about as wide as the body or narrower.",
      },
      wingChordMm: {
        min: 50,
        max: 700,
        source:
          "Common practice (no source): club rules cap the chord at 355.6 mm (14 in) in some classes; unlimited wings rarely reach 700 mm.",
      },
      cornerWeightKg: {
        min: 40,
        max: 1000,
        source:
          "Common practice (no source): the lightest club cars weigh about 500 kg, the heaviest road cars about 2,500 kg, over four corners.",
      },
      noiseDbA: {
        min: 60,
        max: 140,
        source:
          "Common practice (no source): club static-test limits are about 105 dB(A) (Motorsport UK NCR 2026 Ch.7 App.8).",
      },
    },
  },
  onViolation: {},
  powerToWeight: {
    unit: "lb/hp",
    weightBasis: "with-driver",
    driverMass: { kind: "declared" },
    ballastCounts: true,
    powerMeasuredAt: "wheel",
    crankToWheelFactor: null,
    correction: "sae-j1349",
    dynoSheetValidYears: 3,
  },
  forcedInductionMultiplier: null,
  noise: {
    maxDbA: 105,
    method: "static test, 0.5 m from the outlet at 45°, ¾ of maximum engine speed",
  },
  safety: {
    expiryWarningDays: 30,
    standards: [
      {
        id: "fia-8853-98",
        name: "FIA 8853/98",
        item: "harness",
        labelForm: "not-valid-after-year",
        policy: { kind: "end-of-label-year" },
      },
      {
        id: "fia-8853-2016",
        name: "FIA 8853-2016",
        item: "harness",
        labelForm: "manufacture-year",
        policy: { kind: "years-after-label-year", years: 5 },
      },
      {
        id: "sfi-16-1",
        name: "SFI 16.1",
        item: "harness",
        labelForm: "manufacture-month",
        policy: { kind: "years-from-label-month", years: 2 },
      },
      {
        id: "fia-8855-1999",
        name: "FIA 8855-1999",
        item: "seat",
        labelForm: "manufacture-month",
        policy: { kind: "years-from-label-month", years: 5 },
      },
      {
        id: "fia-8862-2009",
        name: "FIA 8862-2009",
        item: "seat",
        labelForm: "manufacture-year",
        policy: { kind: "years-after-label-year", years: 10 },
      },
      {
        id: "sfi-38-1",
        name: "SFI 38.1",
        item: "head restraint",
        labelForm: "manufacture-month",
        policy: { kind: "years-from-label-month", years: 5 },
      },
      {
        id: "fia-8856-2018",
        name: "FIA 8856-2018",
        item: "suit",
        labelForm: "not-valid-after-year",
        policy: { kind: "end-of-label-year" },
      },
      {
        id: "snell-sa2015",
        name: "Snell SA2015",
        item: "helmet",
        labelForm: "standard-only",
        policy: { kind: "valid-through-date", date: "2026-12-31" },
      },
      {
        id: "snell-sa2020",
        name: "Snell SA2020",
        item: "helmet",
        labelForm: "standard-only",
        policy: { kind: "valid-through-date", date: "2031-12-31" },
      },
      {
        id: "extinguisher-service",
        name: "Extinguisher service check",
        item: "extinguisher",
        labelForm: "date",
        policy: { kind: "years-from-label-date", years: 2 },
      },
    ],
    checklist: [
      {
        id: "harness",
        label: "Harness",
        guidance: "Mounts tight, webbing unfrayed, label readable.",
        equipment: { acceptedStandardIds: ["fia-8853-98", "fia-8853-2016", "sfi-16-1"] },
      },
      {
        id: "seat",
        label: "Seat",
        guidance: "Mounted on approved brackets; label readable.",
        equipment: { acceptedStandardIds: ["fia-8855-1999", "fia-8862-2009"] },
      },
      {
        id: "helmet",
        label: "Helmet",
        equipment: { acceptedStandardIds: ["snell-sa2015", "snell-sa2020"] },
      },
      {
        id: "head-restraint",
        label: "Head restraint",
        required: false,
        notApplicableAllowed: true,
        equipment: { acceptedStandardIds: ["sfi-38-1"] },
      },
      {
        id: "suit",
        label: "Race suit",
        required: false,
        notApplicableAllowed: true,
        equipment: { acceptedStandardIds: ["fia-8856-2018"] },
      },
      {
        id: "extinguisher",
        label: "Fire extinguisher",
        guidance: "AFFF at least 2.4 L or gas/powder at least 2.0 kg; securely mounted.",
        equipment: { acceptedStandardIds: ["extinguisher-service"] },
      },
      { id: "battery", label: "Battery secured", guidance: "Clamped down; live terminal covered." },
      {
        id: "kill-switch",
        label: "Kill switch",
        guidance:
          "Works; marked with the red spark in a white-edged blue triangle, base at least 120 mm.",
      },
      {
        id: "towing-eyes",
        label: "Towing eyes",
        guidance: "Front and rear, at least 60 mm inside, contrasting colour, arrow and TOW.",
      },
      { id: "catch-tank", label: "Catch tank", notApplicableAllowed: true },
      { id: "roll-cage", label: "Roll cage", notApplicableAllowed: true },
      { id: "window-net", label: "Window net", notApplicableAllowed: true },
      { id: "transponder", label: "Transponder fitted" },
    ],
  },
} satisfies RuleSetInput;

/** The demo event's rule set, validated (defaults filled in). */
export const demoRuleSet: RuleSet = ruleSetSchema.parse(demoRuleSetInput);
