import type { Metadata } from "next";
import { EventHeading } from "@/components/event-heading";
import { listEventEntries } from "@/db/queries/list-event-entries";
import { listRegistrationStatus } from "@/db/queries/list-registration-status";
import { loadEventPage } from "@/lib/auth/load-event-page";

export const metadata: Metadata = { title: "Registration" };

export default async function RegistrationPage({
  params,
}: {
  params: Promise<{ eventId: string }>;
}) {
  const { eventId } = await params;
  const { event } = await loadEventPage({
    eventId,
    permission: "registration.check",
    returnTo: `/registration/${eventId}`,
  });
  const [entries, status] = await Promise.all([
    listEventEntries({ eventId }),
    listRegistrationStatus({ eventId }),
  ]);
  const ready = entries.filter(
    (e) => status.get(e.entryId)?.paid && status.get(e.entryId)?.waiver === "signed",
  );
  return (
    <div>
      <EventHeading roleLabel="Registration" title="Sign-on desk" event={event}>
        <p className="text-lg">
          <strong className="tabular">{ready.length}</strong> of{" "}
          <span className="tabular">{entries.length}</span> entries have a signed waiver and a paid
          fee.
        </p>
      </EventHeading>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-left text-base">
          <thead>
            <tr className="border-b-2 border-asphalt-800">
              <th className="p-2">Car</th>
              <th className="p-2">Driver(s)</th>
              <th className="p-2">Waiver</th>
              <th className="p-2">Fee</th>
            </tr>
          </thead>
          <tbody>
            {entries.map((e) => {
              const s = status.get(e.entryId);
              const waiver = s?.waiver ?? "missing";
              return (
                <tr
                  key={e.entryId}
                  className="border-b border-asphalt-300"
                  data-testid="registration-row"
                >
                  <td className="tabular p-2 text-xl font-bold">{e.carNumber}</td>
                  <td className="p-2">
                    {[e.driverName, e.coDriverName].filter(Boolean).join(" & ")}
                  </td>
                  <td
                    className={`p-2 font-semibold ${waiver === "signed" ? "text-cleared" : "text-stopped"}`}
                  >
                    {waiver === "signed"
                      ? "Signed"
                      : waiver === "needs-guardian"
                        ? "Needs guardian"
                        : "Not signed"}
                  </td>
                  <td className={`p-2 font-semibold ${s?.paid ? "text-cleared" : "text-stopped"}`}>
                    {s?.paid ? "Paid" : "Not paid"}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
