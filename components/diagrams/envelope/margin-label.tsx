import { DiagramLabel } from "../parts/diagram-label";
import type { OutcomeLook } from "./outcome-look";
import { wrapWords } from "./wrap-words";

const CHIP_FILL: Record<OutcomeLook["state"], string> = {
  inside: "fill-cleared",
  over: "fill-stopped",
  unsure: "fill-attention",
  waiting: "fill-asphalt-700",
  unlimited: "fill-asphalt-700",
};

/** Rough width of semibold Barlow text, per character, as a share of the font size. */
const CHAR_WIDTH = 0.56;
const SIZE = 19;

/**
 * Which limit ("Height"), the word for where the car stands ("over", "inside", "unsure") on a
 * chip in its state colour, and the margin in the event's unit on the lines below, wrapped to
 * `maxChars`, then any notes in ink. Starts at (x, y), the top-left corner.
 */
export function MarginLabel({
  x,
  y,
  title,
  look,
  text,
  notes = [],
  maxChars = 20,
}: {
  x: number;
  y: number;
  title: string;
  look: OutcomeLook;
  text: string;
  /** Further lines in ink under the margin: the limit, the widths. */
  notes?: ReadonlyArray<string>;
  maxChars?: number;
}) {
  const chipX = x + Math.round(title.length * SIZE * CHAR_WIDTH) + 8;
  const chipWidth = Math.round(look.word.length * SIZE * CHAR_WIDTH + 18);
  const chipHeight = SIZE + 9;
  const lines = text === look.word ? [] : wrapWords(text, maxChars);
  return (
    <g data-word={look.word}>
      <DiagramLabel x={x} y={y + chipHeight - 8} size={SIZE} bold>
        {title}
      </DiagramLabel>
      <rect
        x={chipX}
        y={y}
        width={chipWidth}
        height={chipHeight}
        rx={chipHeight / 2}
        className={CHIP_FILL[look.state]}
      />
      <text
        x={chipX + chipWidth / 2}
        y={y + chipHeight - 8}
        textAnchor="middle"
        fontSize={SIZE}
        fontWeight={700}
        className="fill-white"
      >
        {look.word}
      </text>
      {lines.map((line, i) => (
        <DiagramLabel
          key={line}
          x={x}
          y={y + chipHeight + 4 + (i + 1) * (SIZE + 2)}
          tone={look.tone}
          size={SIZE}
          bold
        >
          {line}
        </DiagramLabel>
      ))}
      {notes.map((note, i) => (
        <DiagramLabel
          key={note}
          x={x}
          y={y + chipHeight + 4 + (lines.length + i + 1) * (SIZE + 2)}
          size={SIZE - 2}
        >
          {note}
        </DiagramLabel>
      ))}
    </g>
  );
}
