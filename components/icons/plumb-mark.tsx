// The Plumbline mark: a plumb bob hanging from its line over a level mark.
export function PlumbMark({ className = "size-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <path d="M16 2v11" stroke="currentColor" strokeWidth="2.4" strokeLinecap="round" />
      <path d="M11 14h10l-5 12z" fill="currentColor" />
      <path d="M5 29.5h22" stroke="currentColor" strokeWidth="2.4" strokeLinecap="round" />
    </svg>
  );
}
