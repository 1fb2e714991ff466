"use client";
import { useQuery } from "@tanstack/react-query";
import { VerdictBadge } from "@/components/verdict-badge";
import { entryResultQuery } from "@/lib/query/entry-queries";

const outcomeWord: Record<string, string> = {
  pass: "Inside",
  fail: "Over / failed",
  inconclusive: "Unsure",
  waiting: "To check",
};
const outcomeClass: Record<string, string> = {
  pass: "text-cleared",
  fail: "text-stopped",
  inconclusive: "text-attention",
  waiting: "text-asphalt-700",
};

/** The entrant's view of their scrutineering result, refreshing by itself. */
export function EntryResultView({ entryId }: { entryId: string }) {
  const { data, isError } = useQuery(entryResultQuery(entryId));
  if (!data)
    return (
      <p className="card">{isError ? "The result cannot be reached right now." : "Loading…"}</p>
    );
  return (
    <section
      className="card space-y-3"
      aria-label="Scrutineering result"
      data-testid="entry-result"
      data-status={data.status}
    >
      <VerdictBadge
        status={data.status}
        toClass={data.status === "moved-up" ? data.className : null}
      />
      <p className="text-xl font-semibold" data-testid="entry-result-reason">
        {data.reason}
      </p>
      {data.decidedBy ? (
        <p className="text-base font-semibold" data-testid="entry-result-decided-by">
          Decided by {data.decidedBy}.
        </p>
      ) : null}
      {data.computedAt ? (
        <p className="text-base text-asphalt-700">
          As of{" "}
          {new Date(data.computedAt).toLocaleString("en-GB", {
            dateStyle: "medium",
            timeStyle: "short",
          })}
          . Provisional until protest time has passed.
        </p>
      ) : null}
      {data.recomputing ? (
        <p className="text-base font-semibold" role="status" data-testid="entry-result-recomputing">
          New readings from the tech line are being checked; this result may change in a moment.
        </p>
      ) : null}
      {data.lines.length > 0 ? (
        <ul className="space-y-1">
          {data.lines.map((line) => (
            <li key={`${line.outcome}-${line.reason}`} className="text-base">
              <span className={`font-semibold ${outcomeClass[line.outcome] ?? ""}`}>
                {outcomeWord[line.outcome] ?? line.outcome}:
              </span>{" "}
              {line.reason}
            </li>
          ))}
        </ul>
      ) : null}
      {data.notice ? <p className="text-base text-asphalt-700">{data.notice}</p> : null}
    </section>
  );
}
