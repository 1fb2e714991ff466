/** An event's waiver in full, as the organizer wrote it (line breaks kept), with its version. */
export function WaiverText({ text, version }: { text: string; version: string }) {
  return (
    <section className="card space-y-2" aria-label="The waiver">
      <p className="text-sm text-asphalt-700">Version {version}</p>
      <div
        className="max-h-[60vh] overflow-y-auto whitespace-pre-wrap break-words text-base leading-relaxed"
        data-testid="waiver-text"
        // The text scrolls inside its card on a phone; keyboard users can scroll it too.
        // biome-ignore lint/a11y/noNoninteractiveTabindex: a scrolling region must take focus
        tabIndex={0}
      >
        {text}
      </div>
    </section>
  );
}
