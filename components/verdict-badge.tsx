import { type VerdictWord, verdictLabels } from "@/lib/verdict-word";
import { verdictLook } from "./verdict-look";

/** A verdict as word + icon + colour (never colour alone). */
export function VerdictBadge({
  status,
  toClass,
}: {
  status: VerdictWord;
  toClass?: string | null;
}) {
  const { className, icon } = verdictLook[status];
  const label = verdictLabels[status];
  return (
    <span
      className={`inline-flex flex-wrap items-center gap-x-1.5 rounded-full border-2 px-3 py-1 text-base font-semibold ${className}`}
      data-testid="verdict-badge"
      data-status={status}
    >
      {icon}
      {/* Each part stays whole: "Moved up" / "→ Merlin" may go on two lines, never three. */}
      <span className="whitespace-nowrap">{label}</span>
      {status === "moved-up" && toClass ? (
        <span className="whitespace-nowrap">→ {toClass}</span>
      ) : null}
    </span>
  );
}
