import type { ReactNode } from "react";

/**
 * A car's tile: its number large with the state's icon beside it, then its class, the state's
 * word and any extra line, all on the state's colours (DESIGN.md: never colour alone). The icon
 * rides with the number, so the word has the tile's width; a word longer than that (Re-measure on
 * a phone) breaks at its hyphen rather than running past the edge.
 */
export function StateTile({
  carNumber,
  className,
  look,
  extra,
  size,
  testId,
  state,
  title,
  strong,
}: {
  carNumber: number;
  className: string;
  look: { className: string; icon: ReactNode; word: string };
  extra?: string;
  size: "large" | "small";
  testId?: string;
  state: string;
  title?: string;
  strong?: boolean;
}) {
  const large = size === "large";
  return (
    <li
      className={`flex min-w-0 flex-col overflow-hidden rounded-lg px-2 py-1 ${strong ? "border-4" : "border-2"} ${look.className}`}
      data-testid={testId}
      data-car-number={carNumber}
      data-state={state}
      title={title}
    >
      <span className="flex items-start justify-between gap-1">
        <span
          className={`tabular font-narrow font-bold leading-none ${large ? "text-4xl 2xl:text-6xl" : "text-3xl 2xl:text-4xl"}`}
        >
          {carNumber}
        </span>
        <span
          className={`shrink-0 ${large ? "[&>svg]:size-6 2xl:[&>svg]:size-8" : "[&>svg]:size-5"}`}
        >
          {look.icon}
        </span>
      </span>
      {extra ? (
        <span className="break-words text-base font-semibold leading-tight">{extra}</span>
      ) : null}
      <span
        className={`break-words font-semibold leading-tight text-asphalt-900 ${large ? "text-base 2xl:text-xl" : "text-base"}`}
      >
        {className}
      </span>
      <span
        className={`break-words font-semibold leading-tight ${large ? "text-base 2xl:text-xl" : "text-base"}`}
      >
        {look.word}
      </span>
    </li>
  );
}
