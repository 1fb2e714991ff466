import { StoppedIcon } from "@/components/icons/state-icons";
import { verdictLook } from "@/components/verdict-look";
import type { BoardDrive } from "@/lib/board/board-schema";
import { verdictLabels } from "@/lib/verdict-word";

const withdrawnLook = {
  className: "bg-stopped-soft text-stopped border-stopped-line",
  icon: <StoppedIcon className="size-[1em]" />,
  word: "Withdrawn",
};

/** One car of a run group: its number large, its class, and its state on the tile itself as
 *  colour, icon and word (never colour alone). A shared car's drive says which driver. */
export function DriveTile({ drive, size }: { drive: BoardDrive; size: "large" | "small" }) {
  const look = drive.status
    ? {
        className: verdictLook[drive.status].className,
        icon: verdictLook[drive.status].icon,
        word: verdictLabels[drive.status],
      }
    : withdrawnLook;
  const large = size === "large";
  return (
    <li
      className={`flex min-w-0 flex-col rounded-lg border-2 px-2 py-1 ${look.className} ${drive.flag ? "border-4" : ""}`}
      data-testid="drive-tile"
      data-car-number={drive.carNumber}
      data-state={drive.status ?? "withdrawn"}
      title={drive.flag?.words}
    >
      <span className="flex items-baseline gap-1.5">
        <span
          className={`tabular font-narrow font-bold leading-none ${large ? "text-4xl 2xl:text-6xl" : "text-3xl 2xl:text-4xl"}`}
        >
          {drive.carNumber}
        </span>
        {drive.shared ? (
          <span className="whitespace-nowrap text-base font-semibold 2xl:text-lg">
            · driver {drive.slot}/2
          </span>
        ) : null}
      </span>
      <span
        className={`truncate font-semibold text-asphalt-900 ${large ? "text-base 2xl:text-xl" : "text-base"}`}
      >
        {drive.className}
      </span>
      <span
        className={`flex items-center gap-1 font-semibold ${large ? "text-base 2xl:text-lg" : "text-base"}`}
      >
        <span className="[&>svg]:size-[1.1em]">{look.icon}</span>
        <span className="whitespace-nowrap">{look.word}</span>
      </span>
    </li>
  );
}
