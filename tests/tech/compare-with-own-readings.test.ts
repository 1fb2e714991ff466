import { describe, expect, it } from "vitest";
import type { ReadingPayload, TechRecordOf } from "@/lib/scrutineer/records/record-schema";
import { compareWithOwnReadings } from "@/lib/tech/compare-with-own-readings";
import { uuid7 } from "../scrutineer/fixtures";

// Test values, not trade facts: a tape with stated standard uncertainty u = 0.5 mm, k = 2
// (JCGM 100:2008 §6.2: U = k·u_c). Two single readings on it may differ by at most
// k·√(u² + u²) = 2·√0.5 ≈ 1.414 mm before they disagree — the engine's own rule.
const TAPE = { id: "tape", name: "Steel tape", standardUncertainty: 0.5 };
const wingTop = (value: number): ReadingPayload => ({
  dimension: "wingTopFromGroundMm",
  value,
  instrument: TAPE,
});
let n = 0;
const nextId = () => {
  n += 1;
  return uuid7(n);
};
const earlier = (value: number, officialId = "sam", payload = wingTop(value)) =>
  ({
    id: nextId(),
    kind: "reading",
    entryId: "car-37",
    officialId,
    deviceId: "phone-1",
    deviceTime: "2026-05-16T10:00:00+01:00",
    payload,
  }) as TechRecordOf<"reading">;
const compare = (
  reading: ReadingPayload,
  list: TechRecordOf<"reading">[],
  voided: Set<string> = new Set(),
) => compareWithOwnReadings({ reading, officialId: "sam", earlier: list, voided, k: 2 });

describe("compareWithOwnReadings", () => {
  it("warns about a 0 mm wing top after a 1380 mm one, with the numbers", () => {
    const mismatch = compare(wingTop(0), [earlier(1380)]);
    expect(mismatch).not.toBeNull();
    expect(mismatch?.earlierMean).toBe(1380);
    expect(mismatch?.earlierCount).toBe(1);
    expect(mismatch?.difference).toBe(1380);
    expect(mismatch?.allowedDifference).toBeCloseTo(2 * Math.sqrt(0.5), 9);
  });

  it("stays quiet inside the combined expanded uncertainty and warns just beyond it", () => {
    expect(compare(wingTop(1381.4), [earlier(1380)])).toBeNull();
    expect(compare(wingTop(1381.42), [earlier(1380)])).not.toBeNull();
    expect(compare(wingTop(12.3456), [earlier(1380)])).not.toBeNull();
  });

  it("compares with the mean of several earlier readings, their spread included", () => {
    // 1380 and 1381: mean 1380.5, s = 0.707, u_A = 0.5, u_B = 0.5 → u_c = 0.707;
    // with the new reading's 0.5: allowed 2·√(0.5 + 0.25) ≈ 1.732 mm.
    const two = [earlier(1380), earlier(1381)];
    expect(compare(wingTop(1382.2), two)).toBeNull();
    const far = compare(wingTop(1382.3), two);
    expect(far?.earlierMean).toBe(1380.5);
    expect(far?.earlierCount).toBe(2);
    expect(far?.allowedDifference).toBeCloseTo(2 * Math.sqrt(0.75), 9);
  });

  it("ignores other officials' readings, voided ones, other dimensions and other corners", () => {
    expect(compare(wingTop(0), [earlier(1380, "alex")])).toBeNull();
    const typo = earlier(1380);
    expect(compare(wingTop(0), [typo], new Set([typo.id]))).toBeNull();
    expect(
      compare(wingTop(0), [
        earlier(0, "sam", { ...wingTop(1380), dimension: "roofPeakFromGroundMm" }),
      ]),
    ).toBeNull();
    const scales = { id: "scales", name: "Corner scales", standardUncertainty: 0.5 };
    const lf = earlier(0, "sam", {
      dimension: "cornerWeightKg",
      corner: "lf",
      value: 310,
      instrument: scales,
    });
    expect(
      compare({ dimension: "cornerWeightKg", corner: "rf", value: 290, instrument: scales }, [lf]),
    ).toBeNull();
    expect(
      compare({ dimension: "cornerWeightKg", corner: "lf", value: 290, instrument: scales }, [lf]),
    ).not.toBeNull();
  });

  it("has nothing to say about a first reading", () => {
    expect(compare(wingTop(0), [])).toBeNull();
  });
});
