import type { ReactNode } from "react";
import { DIAGRAM_WIDTH } from "./diagram-view";

/**
 * A drawing as one accessible image (role="img", label and <title> say what is measured) with
 * its one-line caption underneath as real text, so it wraps and reads at any width.
 */
export function DiagramFigure({
  label,
  caption,
  height,
  width = DIAGRAM_WIDTH,
  className = "w-full max-w-80",
  hideCaption = false,
  testId,
  children,
}: {
  label: string;
  caption: string;
  height: number;
  width?: number;
  className?: string;
  hideCaption?: boolean;
  testId?: string;
  children: ReactNode;
}) {
  return (
    <figure
      className={`rounded-lg border border-asphalt-300 bg-white p-2 ${className}`}
      data-testid={testId}
    >
      <svg
        viewBox={`0 0 ${width} ${height}`}
        role="img"
        aria-label={label}
        className="block h-auto w-full font-sans"
      >
        <title>{label}</title>
        {children}
      </svg>
      {hideCaption ? null : (
        <figcaption className="mt-1 text-base leading-snug text-asphalt-800">{caption}</figcaption>
      )}
    </figure>
  );
}
