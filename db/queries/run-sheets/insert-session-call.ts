import "server-only";
import { v7 as uuidv7 } from "uuid";
import type { SessionCallState } from "../../../lib/paddock/session-call";
import { getDb } from "../../client";
import { sessionCalls } from "../../schema";

/** Store one mark on a session (append-only: the latest mark of a session is its state). */
export async function insertSessionCall({
  eventId,
  sessionKey,
  groupName,
  round,
  state,
  note,
  calledAt,
  calledBy,
}: {
  eventId: string;
  sessionKey: string;
  groupName: string;
  round: number;
  state: SessionCallState;
  note: string | null;
  calledAt: Date;
  calledBy: string;
}): Promise<void> {
  await getDb().insert(sessionCalls).values({
    id: uuidv7(),
    eventId,
    sessionKey,
    groupName,
    round,
    state,
    note,
    calledAt,
    calledBy,
  });
}
