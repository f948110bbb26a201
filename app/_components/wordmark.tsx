/** Heftwise's wordmark: a load on a hook, drawn as three strokes, then the name. */
export function Wordmark({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 font-bold tracking-wide ${className}`}>
      <svg
        aria-hidden="true"
        viewBox="0 0 24 24"
        className="h-6 w-6"
        fill="none"
        stroke="currentColor"
        strokeWidth="2.2"
      >
        <path d="M12 2v6" />
        <path d="M12 8a3 3 0 1 1-3 3" />
        <rect x="5" y="14" width="14" height="8" rx="1.5" />
      </svg>
      Heftwise
    </span>
  );
}
