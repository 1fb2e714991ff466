import type { ClassEnvelopeProps } from "@/components/diagrams/envelope/envelope-types";

/** One sample car against one class, in mm; the page shows it in both display units. */
export type SampleEnvelope = {
  title: string;
  note: string;
  props: Omit<ClassEnvelopeProps, "unit">;
};

/**
 * Example numbers only, for reviewing the drawings: invented cars against the demo's invented
 * classes (limits as in db/seed/demo-rule-set.ts). Chosen to be round in inches too
 * (1 in = 25.4 mm), so both versions are easy to check by eye.
 */
export const SAMPLE_ENVELOPES: SampleEnvelope[] = [
  {
    title: "Inside every limit",
    note: "Example: wing 8 in above the roof under a 10 in limit, 4 in behind under 5 in, and 1/2 in narrower than the body.",
    props: {
      classLabel: "Harrier (example)",
      height: { reference: "roof-peak", limitMm: 254, measuredMm: 203.2, outcome: "pass" },
      overhang: { limitMm: 127, measuredMm: 101.6, outcome: "pass" },
      span: {
        limitMm: 0,
        measuredMm: -12.7,
        outcome: "pass",
        wingSpanMm: 1638.3,
        bodyWidthMm: 1651,
        endPlatesCounted: true,
      },
      chord: { limitMm: 355.6, measuredMm: 304.8, outcome: "pass" },
    },
  },
  {
    title: "Over two limits",
    note: "Example: wing 1/2 in over the height limit and 1/2 in wider than the body; overhang inside.",
    props: {
      classLabel: "Merlin (example)",
      height: { reference: "roof-peak", limitMm: 254, measuredMm: 266.7, outcome: "fail" },
      overhang: { limitMm: 127, measuredMm: 114.3, outcome: "pass" },
      span: {
        limitMm: 0,
        measuredMm: 12.7,
        outcome: "fail",
        wingSpanMm: 1663.7,
        bodyWidthMm: 1651,
        endPlatesCounted: true,
      },
      chord: { limitMm: 355.6, measuredMm: 330.2, outcome: "pass" },
    },
  },
  {
    title: "Unsure, and a reading still to take",
    note: "Example: wing top 0.1 in over the limit with ± 0.16 in uncertainty (guarded acceptance), overhang not measured yet, body width not measured yet.",
    props: {
      classLabel: "Merlin (example)",
      height: {
        reference: "roof-peak",
        limitMm: 254,
        measuredMm: 256.54,
        outcome: "inconclusive",
        uncertaintyMm: 4.064,
      },
      overhang: { limitMm: 127, measuredMm: null, outcome: "waiting" },
      span: {
        limitMm: 0,
        measuredMm: null,
        outcome: "waiting",
        wingSpanMm: 1638.3,
        bodyWidthMm: null,
        endPlatesCounted: true,
      },
      chord: null,
    },
  },
];
