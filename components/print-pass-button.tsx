"use client";

/** Prints the pass as a card (A6 on A4, cut along the dashed line); the page's print style
 *  leaves everything else out. */
export function PrintPassButton() {
  return (
    <button
      type="button"
      className="btn-secondary w-full print:hidden"
      onClick={() => window.print()}
      data-testid="print-pass"
    >
      Print the pass
    </button>
  );
}
