import { CheckBeforeSaving } from "./check-before-saving";

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
    <CheckBeforeSaving
      testId="reading-implausible"
      heading="Check this reading"
      onFix={props.onFix}
      onSaveAnyway={props.onSaveAnyway}
    >
      <p className="text-base text-asphalt-900">{props.why}.</p>
      <p className="text-base text-asphalt-900">
        Saved anyway, it is kept as you typed it and the chief scrutineer is asked to look at it.
      </p>
    </CheckBeforeSaving>
  );
}
