import type { Corner, Dimension } from "@/lib/scrutineer/records/record-schema";

export type ReadingTarget = {
  key: string;
  dimension: Dimension;
  corner: Corner | null;
  group: string;
};

/** What the tech sheet asks a scrutineer to read, in the order they walk round the car. */
export const readingTargets: ReadingTarget[] = [
  { key: "wingTopFromGroundMm", dimension: "wingTopFromGroundMm", corner: null, group: "Wing" },
  { key: "roofPeakFromGroundMm", dimension: "roofPeakFromGroundMm", corner: null, group: "Wing" },
  { key: "wingOverhangMm", dimension: "wingOverhangMm", corner: null, group: "Wing" },
  { key: "wingSpanMm", dimension: "wingSpanMm", corner: null, group: "Wing" },
  { key: "bodyWidthMm", dimension: "bodyWidthMm", corner: null, group: "Wing" },
  { key: "wingChordMm", dimension: "wingChordMm", corner: null, group: "Wing" },
  { key: "endPlateThicknessMm", dimension: "endPlateThicknessMm", corner: null, group: "Wing" },
  {
    key: "splitterProtrusionMm",
    dimension: "splitterProtrusionMm",
    corner: null,
    group: "Splitter",
  },
  { key: "splitterWidthMm", dimension: "splitterWidthMm", corner: null, group: "Splitter" },
  { key: "cornerWeightKg-lf", dimension: "cornerWeightKg", corner: "lf", group: "Scales" },
  { key: "cornerWeightKg-rf", dimension: "cornerWeightKg", corner: "rf", group: "Scales" },
  { key: "cornerWeightKg-lr", dimension: "cornerWeightKg", corner: "lr", group: "Scales" },
  { key: "cornerWeightKg-rr", dimension: "cornerWeightKg", corner: "rr", group: "Scales" },
  { key: "noiseDbA", dimension: "noiseDbA", corner: null, group: "Noise" },
];
