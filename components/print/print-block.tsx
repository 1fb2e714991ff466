import type { ReactNode } from "react";

/** One block of a print layout (a class, a run group, a car): kept on one page where it fits. */
export function PrintBlock({
  id,
  heading,
  children,
}: {
  id: string;
  heading: ReactNode;
  children: ReactNode;
}) {
  return (
    <section
      className="print-block rounded-lg border-2 border-asphalt-950 bg-white p-3"
      aria-labelledby={`${id}-heading`}
      data-testid="print-block"
      data-block={id}
    >
      <h2
        id={`${id}-heading`}
        className="mb-2 flex flex-wrap items-center gap-3 text-2xl font-bold"
      >
        {heading}
      </h2>
      {children}
    </section>
  );
}
