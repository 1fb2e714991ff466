import { z } from "zod";

/** One run group: its name as read out at the briefing and its drives, in the rotation's order. */
export const runGroupSchema = z.object({
  name: z.string().min(1).max(40),
  driveIds: z.array(z.string().min(1).max(80)).max(1000),
});
export type RunGroup = z.infer<typeof runGroupSchema>;

/** Groups in the order they run in each round of the rotation (index 0 runs first). */
export const runGroupsSchema = z.array(runGroupSchema).min(1).max(60);
