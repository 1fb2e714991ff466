import "server-only";
import { getEventRuleSet } from "../../db/queries/get-event-rule-set";
import { getEventSummary } from "../../db/queries/get-event-summary";
import { listEventEntries } from "../../db/queries/list-event-entries";
import { AppError } from "../errors";
import type { Board } from "./board-schema";

/** The public paddock board of an event: every car's number, class and verdict state. */
export async function getPaddockBoard({
  eventId,
  now,
}: {
  eventId: string;
  now: Date;
}): Promise<Board> {
  const [summary, context, rows] = await Promise.all([
    getEventSummary({ eventId }),
    getEventRuleSet({ eventId }),
    listEventEntries({ eventId }),
  ]);
  if (!summary || !context) throw new AppError("not_found", "No such event.");
  const name = (id: string | null) =>
    id ? (context.ruleSet.classes.find((c) => c.id === id)?.name ?? id) : null;
  return {
    eventName: summary.name,
    updatedAt: now.toISOString(),
    cars: rows.map((r) => ({
      carNumber: r.carNumber,
      declaredClass: name(r.declaredClass) ?? r.declaredClass,
      finalClass: r.status === "moved-up" || r.status === "cleared" ? name(r.finalClass) : null,
      status: r.status,
    })),
  };
}
