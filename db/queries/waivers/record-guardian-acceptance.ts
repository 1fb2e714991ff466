import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "../../run-transaction";
import { waivers } from "../../schema";

/** Record a guardian's acceptance on a minor's waiver row, once: false when it was already
 *  accepted (the link works once). In the caller's transaction. */
export async function recordGuardianAcceptance(
  {
    waiverId,
    guardianName,
    guardianIp,
    at,
  }: { waiverId: string; guardianName: string; guardianIp: string; at: Date },
  tx: Tx,
): Promise<boolean> {
  const [result] = await tx
    .update(waivers)
    .set({ guardianName, guardianIp, guardianSignedAt: at })
    .where(and(eq(waivers.id, waiverId), isNull(waivers.guardianSignedAt)));
  return result.affectedRows === 1;
}
