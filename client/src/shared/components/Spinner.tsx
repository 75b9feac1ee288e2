/** A small turning seed, for work in progress. Decorative: the text beside it says what is happening. */
export function Spinner({ className = '' }: { className?: string }) {
  return (
    <svg viewBox="0 0 16 16" className={`size-4 animate-spin ${className}`} aria-hidden="true">
      <circle cx="8" cy="8" r="6" fill="none" stroke="currentColor" strokeOpacity="0.3" strokeWidth="2" />
      <ellipse cx="8" cy="2.5" rx="2.4" ry="1.6" fill="currentColor" />
    </svg>
  );
}
