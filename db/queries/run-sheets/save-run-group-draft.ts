import "server-only";
import { and, eq } from "drizzle-orm";
import { AppError } from "../../../lib/errors";
import type { RunGroup } from "../../../lib/paddock/run-group-plan";
import type { ScheduleSettings } from "../../../lib/paddock/schedule-settings";
import { getDb } from "../../client";
import { runGroupDrafts } from "../../schema";

/**
 * Save the working copy. `revision` is the one the desk started from (null: none yet); when another
 * desk saved in between, nothing is written and the clerk is told to reload.
 * @returns the new revision
 */
export async function saveRunGroupDraft({
  eventId,
  groups,
  settings,
  capCars,
  revision,
  updatedBy,
  now,
}: {
  eventId: string;
  groups: RunGroup[];
  settings: ScheduleSettings;
  capCars: number;
  revision: number | null;
  updatedBy: string;
  now: Date;
}): Promise<number> {
  const db = getDb();
  const values = { groups, settings, capCars, updatedBy, updatedAt: now };
  if (revision === null) {
    try {
      await db.insert(runGroupDrafts).values({ eventId, ...values, revision: 1 });
    } catch (error) {
      if (isDuplicateKey(error)) throw staleDraft();
      throw error;
    }
    return 1;
  }
  const [result] = await db
    .update(runGroupDrafts)
    .set({ ...values, revision: revision + 1 })
    .where(and(eq(runGroupDrafts.eventId, eventId), eq(runGroupDrafts.revision, revision)));
  if (result.affectedRows !== 1) throw staleDraft();
  return revision + 1;
}

function staleDraft(): AppError {
  return new AppError(
    "conflict",
    "Someone else changed these run groups a moment ago. Reload to see their changes.",
  );
}

function isDuplicateKey(error: unknown): boolean {
  const cause = (error as { cause?: { code?: string } }).cause ?? error;
  return (cause as { code?: string }).code === "ER_DUP_ENTRY";
}
