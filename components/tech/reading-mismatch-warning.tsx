import { AttentionIcon } from "@/components/icons/state-icons";

/**
 * Shown before saving a reading that disagrees with the scrutineer's own earlier readings by
 * more than their combined expanded uncertainty: a warning with a choice, never a refusal.
 */
export function ReadingMismatchWarning(props: {
  label: string;
  value: string;
  earlierMean: string;
  earlierCount: number;
  allowed: string;
  onSaveAnyway: () => void;
  onFix: () => void;
}) {
  const earlier =
    props.earlierCount === 1
      ? `your earlier reading, ${props.earlierMean}`
      : `the mean of your ${props.earlierCount} earlier readings, ${props.earlierMean}`;
  return (
    <div
      className="space-y-3 rounded-lg border-2 border-attention-line bg-attention-soft p-3 text-attention"
      role="alert"
      data-testid="reading-mismatch"
    >
      <p className="flex gap-2 text-lg font-semibold">
        <AttentionIcon className="mt-0.5 size-6 shrink-0" />
        Check this reading: {props.value} does not agree with {earlier}.
      </p>
      <p className="text-base text-asphalt-900">
        Readings of the {props.label} with these instruments should agree within {props.allowed}.
        Check the number and the unit before you save it.
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
