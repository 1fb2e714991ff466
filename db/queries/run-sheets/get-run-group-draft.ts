import "server-only";
import { eq } from "drizzle-orm";
import { runGroupsSchema } from "../../../lib/paddock/run-group-plan";
import { scheduleSettingsSchema } from "../../../lib/paddock/schedule-settings";
import { getDb } from "../../client";
import { runGroupDrafts } from "../../schema";

/** The clerk of course's working copy of the groups and the day, or null before the first build. */
export async function getRunGroupDraft({ eventId }: { eventId: string }) {
  const [row] = await getDb()
    .select()
    .from(runGroupDrafts)
    .where(eq(runGroupDrafts.eventId, eventId))
    .limit(1);
  if (!row) return null;
  return {
    groups: runGroupsSchema.parse(row.groups),
    settings: scheduleSettingsSchema.parse(row.settings),
    capCars: row.capCars,
    revision: row.revision,
    updatedAt: row.updatedAt.toISOString(),
  };
}
export type RunGroupDraft = NonNullable<Awaited<ReturnType<typeof getRunGroupDraft>>>;
