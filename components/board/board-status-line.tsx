import { AttentionIcon, ClearedIcon } from "@/components/icons/state-icons";
import { lastHeardWords } from "@/lib/board/last-heard-words";

/** Whether the board is current and how old it is: "Last heard from the server 4 min ago",
 *  in the attention look with words when the server cannot be reached. */
export function BoardStatusLine({ ageMs, unreachable }: { ageMs: number; unreachable: boolean }) {
  const words = lastHeardWords(ageMs);
  return (
    <p
      className={`flex w-fit items-center gap-2 rounded-lg border-2 px-3 py-1 text-lg font-semibold 2xl:text-2xl ${unreachable ? "border-attention-line bg-attention-soft text-attention" : "border-cleared-line bg-cleared-soft text-cleared"}`}
      data-testid="board-heard"
      data-unreachable={unreachable}
    >
      {unreachable ? (
        <AttentionIcon className="size-6 shrink-0" />
      ) : (
        <ClearedIcon className="size-6 shrink-0" />
      )}
      <span>
        <span aria-live="polite">
          {unreachable ? "No signal: showing the board as last heard. " : "Live. "}
        </span>
        {words}
      </span>
    </p>
  );
}
