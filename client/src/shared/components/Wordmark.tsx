/** The Seedwake mark: three horizons cut as a core, one seed in the loam, a seedling on top. */
export function Glyph({ className = '' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <path
        d="M16 9 Q15.4 5.6 16.6 3"
        className="fill-none stroke-sprout-500"
        strokeWidth="1.8"
        strokeLinecap="round"
      />
      <ellipse
        cx="19.2"
        cy="3.6"
        rx="3"
        ry="1.5"
        transform="rotate(-20 19.2 3.6)"
        className="fill-sprout-500"
      />
      <rect x="4" y="9" width="24" height="6" rx="1.5" className="fill-humus-800" />
      <rect x="4" y="16" width="24" height="7" rx="1.5" className="fill-loam-600" />
      <rect x="4" y="24" width="24" height="5" rx="1.5" className="fill-clay-500" />
      <ellipse
        cx="12"
        cy="19.5"
        rx="2.6"
        ry="1.6"
        transform="rotate(-18 12 19.5)"
        className="fill-russet-500 stroke-russet-200"
        strokeWidth="0.6"
      />
    </svg>
  );
}

export function Wordmark({ tone = 'dark' }: { tone?: 'dark' | 'light' }) {
  return (
    <span className="inline-flex items-center gap-2">
      <Glyph className="size-8 shrink-0" />
      <span
        className={`font-display text-2xl font-semibold tracking-tight ${tone === 'dark' ? 'text-humus-900' : 'text-silt-50'}`}
      >
        Seedwake
      </span>
    </span>
  );
}
