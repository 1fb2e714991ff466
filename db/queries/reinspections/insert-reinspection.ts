import "server-only";
import { v7 as uuidv7 } from "uuid";
import type { Tx } from "../../run-transaction";
import { reinspections } from "../../schema";

/** Record that a car is sent back to the tech line (inside the caller's transaction). */
export async function insertReinspection(
  tx: Tx,
  row: {
    eventId: string;
    entryId: string;
    cause: "incident" | "protest" | "other";
    askedBy: string;
    askedAt: Date;
    reason: string;
    createdBy: string;
    createdAt: Date;
  },
): Promise<string> {
  const id = uuidv7();
  await tx.insert(reinspections).values({ id, ...row });
  return id;
}
