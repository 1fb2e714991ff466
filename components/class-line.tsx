import type { ClassMove } from "@/lib/entries/class-move";

/** An entry's class in words: "Class Kestrel", or "Declared Kestrel → runs in Merlin (moved up)"
 *  when the verdict moved it up. `size` picks the pass's large type or a list's body type. */
export function ClassLine({ move, size = "body" }: { move: ClassMove; size?: "pass" | "body" }) {
  const strong = size === "pass" ? "text-3xl font-bold" : "font-semibold";
  return (
    <p
      className={size === "pass" ? "text-lg" : "text-base"}
      data-testid="class-line"
      data-moved={move.runsIn ? "true" : "false"}
    >
      {move.runsIn ? (
        <>
          Declared {move.declared} → runs in{" "}
          <strong className={`${strong} whitespace-nowrap`}>{move.runsIn}</strong> (moved up)
        </>
      ) : (
        <>
          Class <strong className={strong}>{move.declared}</strong>
        </>
      )}
    </p>
  );
}
