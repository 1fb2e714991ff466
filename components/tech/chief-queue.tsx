import Link from "next/link";
import { CarAndDrivers } from "@/components/car-and-drivers";
import { CarNumberChip } from "@/components/car-number-chip";
import { AttentionIcon } from "@/components/icons/state-icons";
import { VerdictBadge } from "@/components/verdict-badge";
import type { ChiefQueueRow } from "@/lib/tech/load-chief-queue";

/**
 * Cars on the chief scrutineer's page, each a link to its car card on the tech line, with why it
 * needs the chief in words and, once decided by override, who decided and when.
 */
export function ChiefQueue({
  eventId,
  rows,
  emptyText,
  testId,
}: {
  eventId: string;
  rows: ChiefQueueRow[];
  emptyText: string;
  testId: string;
}) {
  if (rows.length === 0) return <p className="card">{emptyText}</p>;
  return (
    <ul className="space-y-3" data-testid={testId}>
      {rows.map((row) => (
        <li key={row.entryId} data-testid="chief-queue-row" data-car-number={row.carNumber}>
          <Link
            href={`/tech/${eventId}?entry=${row.entryId}`}
            className="card block min-h-touch hover:border-asphalt-600"
            aria-label={`Car ${row.carNumber}, ${row.car}: open the car card`}
          >
            <div className="flex items-start gap-3">
              <CarNumberChip carNumber={row.carNumber} />
              <div className="min-w-0 flex-1 space-y-1">
                <CarAndDrivers
                  car={row.car}
                  declaredClass={row.declaredClass}
                  drivers={row.drivers}
                />
                <VerdictBadge status={row.status} toClass={row.finalClass} />
                {row.attention.length > 0 ? (
                  <ul className="space-y-1" data-testid="chief-attention">
                    {row.attention.map((words) => (
                      <li key={words} className="flex gap-2 text-base font-semibold text-attention">
                        <AttentionIcon className="mt-0.5 size-5 shrink-0" />
                        <span>{words}</span>
                      </li>
                    ))}
                  </ul>
                ) : null}
                {row.reason ? <p className="text-base text-asphalt-800">{row.reason}</p> : null}
                {row.decidedBy ? (
                  <p className="text-base font-semibold" data-testid="chief-decided-by">
                    Decided by {row.decidedBy}
                  </p>
                ) : null}
                <p className="text-base font-semibold text-accent">Open the car card →</p>
              </div>
            </div>
          </Link>
        </li>
      ))}
    </ul>
  );
}
