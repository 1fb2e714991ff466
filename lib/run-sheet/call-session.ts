import "server-only";
import { getLatestRunSheet } from "../../db/queries/run-sheets/get-latest-run-sheet";
import { insertSessionCall } from "../../db/queries/run-sheets/insert-session-call";
import { listSessionCalls } from "../../db/queries/run-sheets/list-session-calls";
import { AppError } from "../errors";
import { callsOnSheet } from "../paddock/calls-on-sheet";
import type { SessionCallState } from "../paddock/session-call";
import { sessionCallProblem } from "../paddock/session-call-problem";

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
  const marks = callsOnSheet(await listSessionCalls({ eventId: args.eventId }), sheet.body).filter(
    (c) => c.sessionKey === args.sessionKey,
  );
  const problem = sessionCallProblem({
    current: marks.at(-1)?.state ?? "planned",
    next: args.state,
  });
  if (problem) throw new AppError("conflict", problem);
  await insertSessionCall({ ...args, groupName: group.name, round: session.round });
  return { groupName: group.name, round: session.round };
}
