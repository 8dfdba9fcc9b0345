// Quick find: the keyboard palette for adding symptoms to a case and jumping to causes, checks,
// vehicles and cases. Opens with ⌘K / Ctrl+K or its button. This module is the button and the
// shortcut only; the palette itself (cmdk, the index builder) loads on first use.
import { lazy, Suspense, useCallback, useEffect, useRef, useState } from "react";
import type { QuickFindProps } from "./palette";
import { useQuickFindShortcut, useShortcutLabel } from "./use-shortcut";

export type { QuickFindPick, QuickFindProps } from "./palette";

const Palette = lazy(() => import("./palette"));
/** Fetches the palette's code ahead of the first open, when the pointer or focus comes near. */
const preload = () => void import("./palette");

const KBD = "rounded border border-rule bg-paper px-1.5 font-sans text-base text-graphite-700";

export function QuickFind(props: QuickFindProps) {
  const [open, setOpen] = useState(false);
  const [wanted, setWanted] = useState(false); // mount (and load) nothing until first opened
  const input = useRef<HTMLInputElement | null>(null);
  const shortcut = useShortcutLabel();
  const show = useCallback(() => {
    setWanted(true);
    setOpen(true);
  }, []);
  // Until the palette's code has loaded, the keys typed after Ctrl+K are kept here and handed to it,
  // so a fast typist loses nothing and nothing reaches the page.
  const typedAhead = useRef("");
  const takeTypedAhead = useCallback(() => {
    const held = typedAhead.current;
    typedAhead.current = "";
    return held;
  }, []);
  const [ready, setReady] = useState(false);
  // Set at once when the palette takes over, so no key falls between the last hand-over and the
  // holder's removal on the next render.
  const released = useRef(false);
  const onReady = useCallback(() => {
    released.current = true;
    setReady(true);
  }, []);
  useEffect(() => {
    if (!wanted || ready) return;
    const hold = (e: KeyboardEvent) => {
      if (released.current || e.ctrlKey || e.metaKey || e.altKey) return;
      if (e.key.length === 1) typedAhead.current += e.key;
      else if (e.key === "Backspace") typedAhead.current = typedAhead.current.slice(0, -1);
      else return;
      e.preventDefault();
      e.stopPropagation();
    };
    window.addEventListener("keydown", hold, { capture: true });
    return () => window.removeEventListener("keydown", hold, { capture: true });
  }, [wanted, ready]);
  // Ctrl+K opens the palette; pressed again while it is open it keeps the typing there (closing
  // it would send the next words to the page). Esc closes.
  useQuickFindShortcut(useCallback(() => (open ? input.current?.focus() : show()), [open, show]));
  return (
    <>
      <button
        type="button"
        onClick={show}
        onPointerEnter={preload}
        onFocus={preload}
        aria-keyshortcuts="Control+K Meta+K"
        className="inline-flex min-h-tap items-center gap-3 rounded-lg border border-rule bg-card px-3 text-base font-medium text-graphite-700 hover:bg-paper"
      >
        Quick find <kbd className={`${KBD} hidden sm:pointer-fine:inline`}>{shortcut}</kbd>
      </button>
      {wanted ? (
        <Suspense fallback={null}>
          <Palette
            {...props}
            open={open}
            onOpenChange={setOpen}
            inputRef={input}
            takeTypedAhead={takeTypedAhead}
            onReady={onReady}
          />
        </Suspense>
      ) : null}
    </>
  );
}
