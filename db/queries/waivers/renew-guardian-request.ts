import "server-only";
import { and, eq, isNull } from "drizzle-orm";
import type { Tx } from "../../run-transaction";
import { waivers } from "../../schema";

/** Point a minor's waiver at a new guardian link (name, address, token hash, time), while the
 *  guardian has not accepted; the old link stops working. In the caller's transaction. */
export async function renewGuardianRequest(
  {
    waiverId,
    guardianName,
    guardianEmail,
    guardianTokenHash,
    at,
  }: {
    waiverId: string;
    guardianName: string;
    guardianEmail: string;
    guardianTokenHash: string;
    at: Date;
  },
  tx: Tx,
): Promise<boolean> {
  const [result] = await tx
    .update(waivers)
    .set({ guardianName, guardianEmail, guardianTokenHash, guardianRequestedAt: at })
    .where(and(eq(waivers.id, waiverId), isNull(waivers.guardianSignedAt)));
  return result.affectedRows === 1;
}
