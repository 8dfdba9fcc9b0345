import { PRIORITY_COPY, type Priority } from "~/domain/knowledge";

export { PRIORITY_COPY };

// ISO 3864 in spirit: prohibition circle with a bar, warning triangle, mandatory-style filled
// circle, safe-condition square. The shape carries the meaning for anyone who cannot tell the
// colours apart. Each shape is drawn once per page (MarkSprite, in the document's body) and used by
// reference, so a page with many marks does not carry many copies.
const SHAPES: Record<Priority, () => React.ReactNode> = {
  stop: () => (
    <>
      <circle cx="12" cy="12" r="9.5" fill="none" stroke="var(--color-stop)" strokeWidth="3" />
      <line x1="5.5" y1="18.5" x2="18.5" y2="5.5" stroke="var(--color-stop)" strokeWidth="3" />
    </>
  ),
  soon: () => (
    <>
      <path
        d="M12 2.5 L22.5 21 H1.5 Z"
        fill="var(--color-soon)"
        stroke="#16181b"
        strokeWidth="1.5"
        strokeLinejoin="round"
      />
      <rect x="11" y="9" width="2" height="6.5" fill="#16181b" />
      <rect x="11" y="17" width="2" height="2" fill="#16181b" />
    </>
  ),
  watch: () => (
    <>
      <circle cx="12" cy="12" r="10" fill="var(--color-watch)" />
      <circle cx="12" cy="12" r="3.5" fill="#fff" />
    </>
  ),
  sound: () => (
    <>
      <rect x="2.5" y="2.5" width="19" height="19" rx="2" fill="var(--color-sound)" />
      <path d="M7 12.5 L10.5 16 L17 8.5" fill="none" stroke="#fff" strokeWidth="2.5" />
    </>
  ),
};

/** The four shapes as symbols, once per document (app/root.tsx). */
export function MarkSprite() {
  return (
    <svg aria-hidden="true" width="0" height="0" className="absolute" focusable="false">
      {(Object.keys(SHAPES) as Priority[]).map((p) => (
        <symbol key={p} id={`mark-${p}`} viewBox="0 0 24 24">
          {SHAPES[p]()}
        </symbol>
      ))}
    </svg>
  );
}

function Shape({ priority, className = "h-6 w-6" }: { priority: Priority; className?: string }) {
  return (
    <svg className={`${className} shrink-0`} aria-hidden="true">
      <use href={`#mark-${priority}`} />
    </svg>
  );
}

/** The warning triangle: the "Soon" priority, and the mark beside a check's cautions. */
export function WarningTriangle({ className = "h-6 w-6" }: { className?: string }) {
  return <Shape priority="soon" className={className} />;
}

export function PriorityMark({
  priority,
  showDescription = false,
}: {
  priority: Priority;
  showDescription?: boolean;
}) {
  const copy = PRIORITY_COPY[priority];
  return (
    <span className="inline-flex items-start gap-2" data-priority={priority}>
      <Shape priority={priority} />
      <span>
        <span className="font-semibold">{copy.label}</span>
        {showDescription ? <span className="block text-sm text-graphite-700">{copy.description}</span> : null}
      </span>
    </span>
  );
}
