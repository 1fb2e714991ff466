"use client";
import { AttentionIcon } from "@/components/icons/state-icons";
import { formatWhoAndWhen } from "@/lib/tech/format-who-and-when";
import { useTech } from "./tech-context";

type Who = { officialId: string; deviceTime: string };
type Decision = {
  override: Who | null | undefined;
  rejectedOverride: (Who & { problem: string }) | null | undefined;
};

const key = (d: Decision) =>
  [d.override, d.rejectedOverride].map((w) => (w ? `${w.officialId}@${w.deviceTime}` : "-")).join();

/**
 * Beside a verdict on the car card: who made the chief scrutineer's decision that stands and
 * when (their phone's clock, in the event's time zone), or, plainly, that the latest override
 * was not applied and why.
 */
export function ChiefDecisionNote({
  override,
  rejectedOverride,
  testId,
  unlessShownWith,
}: Decision & {
  testId: string;
  /** The server's verdict: the phone's preview repeats nothing the server already says. */
  unlessShownWith?: Decision | undefined;
}) {
  const { pack } = useTech();
  if (unlessShownWith && key(unlessShownWith) === key({ override, rejectedOverride })) return null;
  const whoAndWhen = (x: Who) =>
    formatWhoAndWhen({
      name: pack.officials.find((o) => o.userId === x.officialId)?.name ?? null,
      deviceTime: x.deviceTime,
      timeZone: pack.event.timeZone,
    });
  return (
    <>
      {override ? (
        <p className="text-base font-semibold" data-testid={`${testId}-decided-by`}>
          Decided by {whoAndWhen(override)}.
        </p>
      ) : null}
      {rejectedOverride ? (
        <div
          className="flex gap-2 rounded-lg border-2 border-stopped-line bg-stopped-soft p-3 text-stopped"
          role="alert"
          data-testid={`${testId}-override-invalid`}
        >
          <AttentionIcon className="mt-0.5 size-6 shrink-0" />
          <p className="text-base">
            <strong className="font-semibold">Override not applied.</strong> Saved by{" "}
            {whoAndWhen(rejectedOverride)}: {rejectedOverride.problem} The computed verdict above
            stands until the chief scrutineer saves an override that fits or voids this one.
          </p>
        </div>
      ) : null}
    </>
  );
}
