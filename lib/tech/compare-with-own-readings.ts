import { findDisagreements } from "../scrutineer/measurement/find-disagreements";
import type { ReadingPayload, TechRecordOf } from "../scrutineer/records/record-schema";

/** A new reading that does not agree with the scrutineer's own earlier ones. */
export type OwnReadingMismatch = {
  /** Mean of the earlier readings, in the dimension's unit. */
  earlierMean: number;
  earlierCount: number;
  /** |new − earlier mean|. */
  difference: number;
  /** k·√(u_earlier² + u_new²): how far apart they may be. */
  allowedDifference: number;
};

/**
 * Before a reading is saved: does it disagree with the same scrutineer's earlier, non-void
 * readings of the same dimension (and corner) on this car? The test is the engine's own
 * disagreement rule (findDisagreements: each side combined per JCGM 100:2008 §4, then
 * |x₁ − x₂| > k·√(u₁² + u₂²)), with the earlier readings as one side and the new one as the
 * other. A warning, never a block: the scrutineer may save anyway.
 * @param earlier the car's readings as the phone knows them (others' and voided ones are skipped)
 * @param voided ids of voided records
 * @param k the rule set's coverage factor
 * @returns null when there is nothing to compare or the readings agree
 */
export function compareWithOwnReadings(args: {
  reading: ReadingPayload;
  officialId: string;
  earlier: ReadonlyArray<TechRecordOf<"reading">>;
  voided: ReadonlySet<string>;
  k: number;
}): OwnReadingMismatch | null {
  const { reading, officialId, k } = args;
  const corner = "corner" in reading ? reading.corner : null;
  const own = args.earlier.filter(
    (r) =>
      r.officialId === officialId &&
      !args.voided.has(r.id) &&
      r.payload.dimension === reading.dimension &&
      ("corner" in r.payload ? r.payload.corner : null) === corner,
  );
  if (own.length === 0) return null;
  const asOfficial = (group: string, payload: ReadingPayload, recordId: string) => ({
    recordId,
    officialId: group,
    value: payload.value,
    standardUncertainty: payload.instrument.standardUncertainty,
    instrumentId: payload.instrument.id,
  });
  const [found] = findDisagreements(
    [...own.map((r) => asOfficial("earlier", r.payload, r.id)), asOfficial("new", reading, "new")],
    k,
  );
  if (found === undefined) return null;
  const earlier = found.first.officialId === "earlier" ? found.first : found.second;
  return {
    earlierMean: earlier.mean,
    earlierCount: earlier.n,
    difference: found.difference,
    allowedDifference: found.allowedDifference,
  };
}
