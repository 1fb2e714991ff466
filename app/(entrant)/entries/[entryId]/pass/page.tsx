import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { ClassLine } from "@/components/class-line";
import { AttentionIcon } from "@/components/icons/state-icons";
import { PassQr } from "@/components/pass-qr";
import { PassCarLine, PassFacts } from "@/components/pass-summary";
import { formatPassTime } from "@/lib/passes/format-pass-time";
import { loadOwnPassPage } from "@/lib/passes/load-own-pass-page";
import { passClassMove } from "@/lib/passes/pass-class-move";

export const metadata: Metadata = { title: "Your pass", robots: { index: false } };

// GET /entries/[entryId]/pass — the entrant's signed pass for one entry, QR drawn inline so the
// page still shows it with no signal once it has been opened.
export default async function EntryPassPage({ params }: { params: Promise<{ entryId: string }> }) {
  const { entryId } = await params;
  const { entry, blockers, pass } = await loadOwnPassPage({
    entryId,
    returnTo: `/entries/${entryId}/pass`,
  });
  const move = passClassMove(entry);
  return (
    <div className="mx-auto max-w-md space-y-5">
      <div>
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Entrant</p>
        <h1 className="text-3xl font-bold">Your pass</h1>
        <p className="text-lg text-asphalt-800">
          {entry.eventName} · {entry.venueName}
        </p>
      </div>
      {pass ? (
        <section className="card space-y-4" aria-label={`Pass for car ${pass.claims.car}`}>
          <p className="text-center text-2xl font-bold" data-testid="pass-instruction">
            Show this at the tech line
          </p>
          <PassCarLine carNumber={pass.claims.car} move={move} />
          {/* Out to the screen's edges on a phone: the bigger the modules, the better it scans. */}
          <div className="-mx-[calc(2rem+1px)] sm:-mx-[calc(1rem+1px)]">
            <PassQr
              svg={pass.qrSvg}
              url={pass.url}
              label={`Pass QR code for car ${pass.claims.car}`}
            />
          </div>
          <PassFacts
            eventName={entry.eventName}
            eventDate={entry.eventDate}
            validUntil={formatPassTime(pass.claims.exp, entry.timeZone)}
          />
          <p className="text-base text-asphalt-800">
            Turn your screen brightness up for the scan. This page keeps working without signal once
            it has opened.
          </p>
        </section>
      ) : (
        <section
          className="flex gap-3 rounded-xl border-2 border-attention-line bg-attention-soft p-4 text-attention"
          data-testid="pass-blockers"
        >
          <AttentionIcon className="mt-1 size-7 shrink-0" />
          <div className="space-y-2">
            <p className="text-xl font-bold">No pass yet for car {entry.carNumber}</p>
            <ul className="list-disc space-y-1 pl-5 text-lg">
              {blockers.map((b) => (
                <li key={b}>{b}</li>
              ))}
            </ul>
            <ClassLine move={move} />
          </div>
        </section>
      )}
      <Caution title="A pass is not a clearance">
        It only identifies your entry. Scrutineering and the chief scrutineer decide whether the car
        runs.
      </Caution>
      <Link href="/garage" className="btn-secondary w-full">
        Back to your garage
      </Link>
    </div>
  );
}
