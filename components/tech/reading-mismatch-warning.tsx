import { CheckBeforeSaving } from "./check-before-saving";

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
    <CheckBeforeSaving
      testId="reading-mismatch"
      heading={`Check this reading: ${props.value} does not agree with ${earlier}.`}
      onFix={props.onFix}
      onSaveAnyway={props.onSaveAnyway}
    >
      <p className="text-base text-asphalt-900">
        Readings of the {props.label} with these instruments should agree within {props.allowed}.
        Check the number and the unit before you save it.
      </p>
    </CheckBeforeSaving>
  );
}
