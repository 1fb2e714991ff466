import "server-only";
import { getLatestRunSheet } from "../../db/queries/run-sheets/get-latest-run-sheet";
import { insertSessionCall } from "../../db/queries/run-sheets/insert-session-call";
import { AppError } from "../errors";
import type { SessionCallState } from "../paddock/session-call";

/** Mark a session of the published run sheet (called, on track, red flag, finished, cut short). */
export async function callSession(args: {
  eventId: string;
  sessionKey: string;
  state: SessionCallState;
  note: string | null;
  calledAt: Date;
  calledBy: string;
}): Promise<{ groupName: string; round: number }> {
  const sheet = await getLatestRunSheet({ eventId: args.eventId });
  if (!sheet)
    throw new AppError("conflict", "Publish a run sheet first: there are no sessions yet.");
  const session = sheet.body.sessions.find((s) => s.key === args.sessionKey);
  const group = session ? sheet.body.groups[session.groupIndex - 1] : undefined;
  if (!session || !group) {
    throw new AppError("not_found", "That session is not on the published run sheet.");
  }
  await insertSessionCall({ ...args, groupName: group.name, round: session.round });
  return { groupName: group.name, round: session.round };
}
