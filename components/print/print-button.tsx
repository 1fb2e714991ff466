"use client";

/** Opens the browser's print dialog (choose A4; "Save as PDF" makes a file). Not printed itself. */
export function PrintButton({ label = "Print" }: { label?: string }) {
  return (
    <button type="button" className="btn-primary" onClick={() => window.print()}>
      {label}
    </button>
  );
}
