import { StoppedIcon } from "@/components/icons/state-icons";
import { verdictLook } from "@/components/verdict-look";
import type { BoardDrive } from "@/lib/board/board-schema";
import { verdictLabels } from "@/lib/verdict-word";
import { StateTile } from "./state-tile";

const withdrawnLook = {
  className: "bg-stopped-soft text-stopped border-stopped-line",
  icon: <StoppedIcon />,
  word: "Withdrawn",
};

/** One car of a run group: its number, class and state on the tile (colour, icon and word);
 *  a shared car's drive says which driver ("driver 1/2"), never who. */
export function DriveTile({ drive, size }: { drive: BoardDrive; size: "large" | "small" }) {
  const look = drive.status
    ? { ...verdictLook[drive.status], word: verdictLabels[drive.status] }
    : withdrawnLook;
  return (
    <StateTile
      carNumber={drive.carNumber}
      className={drive.className}
      look={look}
      extra={drive.shared ? `driver ${drive.slot}/2` : undefined}
      size={size}
      testId="drive-tile"
      state={drive.status ?? "withdrawn"}
      title={drive.flag?.words}
      strong={drive.flag !== null}
    />
  );
}
