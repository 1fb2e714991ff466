import { Caution } from "../caution";

/** The caution every waiver page shows. */
export function WaiverCaution() {
  return (
    <Caution title="Before you accept">
      Motorsport is dangerous and can cause serious injury or death. This waiver is the club&apos;s;
      the sanctioning body&apos;s rulebook and the law where the event is held come first, and
      nothing here replaces them. If you do not understand it, ask the organizer before you accept.
    </Caution>
  );
}
