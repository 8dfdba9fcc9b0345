import { useEffect } from "react";

/** How long a recording can be taken back from the notice (the evidence list can always remove it). */
export const UNDO_MS = 10_000;

/**
 * "Recorded … Undo": shown after every piece of evidence is recorded or removed, so a slip of the
 * finger (or of a key) costs one tap to put right.
 */
export function UndoNotice({
  said,
  onUndo,
  onDone,
  busy,
}: {
  said: string;
  onUndo: (() => void) | null;
  onDone: () => void;
  busy: boolean;
}) {
  useEffect(() => {
    const t = setTimeout(onDone, UNDO_MS);
    return () => clearTimeout(t);
  }, [said, onDone]);
  return (
    <div
      role="status"
      className="fixed inset-x-3 bottom-3 z-20 mx-auto flex max-w-xl items-center justify-between gap-3 rounded-card border border-rule bg-graphite-900 p-3 text-paper shadow-xl"
    >
      <span>{said}</span>
      <span className="flex shrink-0 gap-2">
        {onUndo ? (
          <button
            type="button"
            disabled={busy}
            onClick={onUndo}
            className="min-h-tap rounded-lg bg-paper px-4 font-semibold text-graphite-900"
          >
            Undo
          </button>
        ) : null}
        <button
          type="button"
          onClick={onDone}
          className="min-h-tap rounded-lg px-3 text-paper underline"
          aria-label="Dismiss"
        >
          ✕
        </button>
      </span>
    </div>
  );
}
