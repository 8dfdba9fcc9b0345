// Ramplight's mark: a ramp under a lamp, drawn inline so it needs no request.
export function BrandMark({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="7" fill="var(--color-uv-600)" />
      <rect x="9" y="7" width="14" height="3" rx="1.5" fill="#ffd84d" />
      <path d="M5 25 L27 25 L27 20 Z" fill="#fff" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="inline-flex items-center gap-2 text-lg font-semibold tracking-tight">
      <BrandMark />
      Ramplight
    </span>
  );
}
