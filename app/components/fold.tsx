import { useEffect, useRef, useState, type ReactNode } from "react";

/**
 * A disclosure whose contents are rendered only once it has been opened. The workbench holds many
 * of these (the why of every cause, the instructions of every check); rendering them all on every
 * page view would cost more than everything the technician actually reads. Native <details>, so
 * it opens with Enter or Space and announces its state without extra ARIA.
 */
export function Fold({
  summary,
  open = false,
  className = "",
  summaryClassName = "cursor-pointer",
  children,
}: {
  summary: ReactNode;
  open?: boolean;
  className?: string;
  summaryClassName?: string;
  children: ReactNode;
}) {
  const ref = useRef<HTMLDetailsElement>(null);
  const [opened, setOpened] = useState(open);
  // Opened before the page's script had loaded: React never saw that toggle.
  useEffect(() => {
    if (ref.current?.open) setOpened(true);
  }, []);
  // A fold told to open (a step that became next) shows at once; once shown, contents stay.
  if (open && !opened) setOpened(true);
  const shown = opened || open;
  return (
    <details
      ref={ref}
      open={open}
      className={className}
      onToggle={(e) => e.currentTarget.open && setOpened(true)}
    >
      <summary className={summaryClassName}>{summary}</summary>
      {shown ? children : null}
    </details>
  );
}
