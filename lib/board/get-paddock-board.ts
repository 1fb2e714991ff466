import "server-only";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { getEventSummary } from "../../db/queries/get-event-summary";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { getLatestRunSheet } from "../../db/queries/run-sheets/get-latest-run-sheet";
import { listSessionCalls } from "../../db/queries/run-sheets/list-session-calls";
import { AppError } from "../errors";
import { callsOnSheet } from "../paddock/calls-on-sheet";
import type { Board } from "./board-schema";
import { shapeBoardRunSheet } from "./shape-board-run-sheet";

/** The public paddock board of an event: every car's number, class and verdict state, the
 *  latest published run sheet (car numbers and classes, flagged where a car may no longer run)
 *  and the clerk of course's marks on the sessions. No names. */
export async function getPaddockBoard({
  eventId,
  now,
}: {
  eventId: string;
  now: Date;
}): Promise<Board> {
  const [summary, context, rows, publication, calls] = await Promise.all([
    getEventSummary({ eventId }),
    getEventRuleSet({ eventId }),
    listEventEntries({ eventId }),
    getLatestRunSheet({ eventId }),
    listSessionCalls({ eventId }),
  ]);
  if (!summary || !context) throw new AppError("not_found", "No such event.");
  const name = (id: string | null) =>
    id ? (context.ruleSet.classes.find((c) => c.id === id)?.name ?? id) : null;
  return {
    eventName: summary.name,
    timeZone: summary.timeZone,
    eventDate: summary.eventDate,
    updatedAt: now.toISOString(),
    cars: rows.map((r) => ({
      carNumber: r.carNumber,
      declaredClass: name(r.declaredClass) ?? r.declaredClass,
      finalClass: r.status === "moved-up" || r.status === "cleared" ? name(r.finalClass) : null,
      status: r.status,
    })),
    runSheet: publication
      ? shapeBoardRunSheet({
          publication,
          entries: rows.map((r) => ({ entryId: r.entryId, status: r.status })),
        })
      : null,
    calls: publication ? callsOnSheet(calls, publication.body) : [],
  };
}
