// The Plumbline mark: a plumb bob hanging from its line over a level mark.
export function PlumbMark({ className = "size-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <path d="M16 2.5v9" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      <rect x="13.5" y="11.5" width="5" height="2.6" rx="0.8" fill="currentColor" />
      <path d="M12 15h8c0 2.8-2.2 6.8-4 10.5-1.8-3.7-4-7.7-4-10.5z" fill="currentColor" />
      <path d="M5 29.5h22" stroke="#5b7fe0" strokeWidth="2.4" strokeLinecap="round" />
    </svg>
  );
}
