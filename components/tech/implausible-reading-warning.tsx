import { AttentionIcon } from "@/components/icons/state-icons";

/**
 * Shown before saving a reading that cannot plausibly be true (`implausibleReading`): why, in
 * words, and a choice, never a refusal. Saved anyway, it goes to the chief scrutineer's queue.
 */
export function ImplausibleReadingWarning(props: {
  why: string;
  onSaveAnyway: () => void;
  onFix: () => void;
}) {
  return (
    <div
      className="space-y-3 rounded-lg border-2 border-attention-line bg-attention-soft p-3 text-attention"
      role="alert"
      data-testid="reading-implausible"
    >
      <p className="flex gap-2 text-lg font-semibold">
        <AttentionIcon className="mt-0.5 size-6 shrink-0" />
        Check this reading
      </p>
      <p className="text-base text-asphalt-900">{props.why}.</p>
      <p className="text-base text-asphalt-900">
        Saved anyway, it is kept as you typed it and the chief scrutineer is asked to look at it.
      </p>
      <div className="flex flex-wrap gap-2">
        <button type="button" className="btn-primary" onClick={props.onFix}>
          Fix it
        </button>
        <button type="button" className="btn-secondary" onClick={props.onSaveAnyway}>
          Save anyway
        </button>
      </div>
    </div>
  );
}
