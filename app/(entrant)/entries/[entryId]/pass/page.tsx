import type { Metadata } from "next";
import Link from "next/link";
import { Caution } from "@/components/caution";
import { ClassLine } from "@/components/class-line";
import { AttentionIcon } from "@/components/icons/state-icons";
import { KeepPassOffline } from "@/components/keep-pass-offline";
import { PassQr } from "@/components/pass-qr";
import { PassCarLine, PassFacts } from "@/components/pass-summary";
import { PrintPassButton } from "@/components/print-pass-button";
import "@/components/pass-print.css";
import { getEntryDriverNames } from "@/db/queries/get-entry-driver-names";
import { formatPassTime } from "@/lib/passes/format-pass-time";
import { loadOwnPassPage } from "@/lib/passes/load-own-pass-page";
import { passClassMove } from "@/lib/passes/pass-class-move";

export const metadata: Metadata = { title: "Your pass", robots: { index: false } };

// GET /entries/[entryId]/pass — the entrant's signed pass for one entry, QR drawn inline so the
// page still shows it with no signal once it has been opened (it saves itself on the phone), and
// prints as an A6 card (components/pass-print.css).
export default async function EntryPassPage({ params }: { params: Promise<{ entryId: string }> }) {
  const { entryId } = await params;
  const { entry, blockers, pass } = await loadOwnPassPage({
    entryId,
    returnTo: `/entries/${entryId}/pass`,
  });
  const move = passClassMove(entry);
  const drivers = pass ? await getEntryDriverNames({ entryId }) : [];
  return (
    <div className="pass-page mx-auto max-w-md space-y-5">
      <div className="pass-no-print">
        <p className="text-base font-semibold uppercase tracking-wider text-accent">Entrant</p>
        <h1 className="text-3xl font-bold">Your pass</h1>
        <p className="text-lg text-asphalt-800">
          {entry.eventName} · {entry.venueName}
        </p>
      </div>
      {pass ? (
        <section
          className="pass-card card -mx-4 space-y-4 rounded-none border-x-0 sm:mx-0 sm:rounded-xl sm:border-x"
          aria-label={`Pass for car ${pass.claims.car}`}
          data-testid="pass-card"
          data-pass-label={`Car ${pass.claims.car} · ${entry.eventName}`}
        >
          <p className="text-center text-2xl font-bold" data-testid="pass-instruction">
            Show this at the tech line
          </p>
          <PassCarLine carNumber={pass.claims.car} move={move} />
          {/* On a phone the card spans the screen and the QR its padding too (the bigger the
              modules, the better it scans), but never past the card's edge: the white quiet zone
              is inside the SVG. */}
          <div className="pass-qr-frame -mx-4 sm:-mx-[calc(1rem-1px)]">
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
          {drivers.length > 0 ? (
            <dl className="text-lg" data-testid="pass-drivers">
              <dt className="text-base font-semibold text-asphalt-700">
                {drivers.length > 1 ? "Drivers" : "Driver"}
              </dt>
              {drivers.map((name) => (
                <dd key={name} className="font-semibold break-words">
                  {name}
                </dd>
              ))}
            </dl>
          ) : null}
          <p className="text-base text-asphalt-800 print:hidden">
            Turn your screen brightness up for the scan.
          </p>
          <KeepPassOffline path={`/entries/${entryId}/pass`} />
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
      {pass ? <PrintPassButton /> : null}
      <div className="pass-no-print">
        <Caution title="A pass is not a clearance">
          It only identifies your entry. Scrutineering and the chief scrutineer decide whether the
          car runs.
        </Caution>
      </div>
      <Link href="/garage" className="btn-secondary pass-no-print w-full">
        Back to your garage
      </Link>
    </div>
  );
}
