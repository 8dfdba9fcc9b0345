// The global ⌘K / Ctrl+K listener, and the label to show for it on this device.
import { useEffect, useState } from "react";

/** True for the chord that opens Quick find: ⌘K on a Mac, Ctrl+K elsewhere (either works anywhere). */
export const isQuickFindChord = (e: KeyboardEvent) =>
  (e.metaKey || e.ctrlKey) && !e.altKey && !e.shiftKey && e.key.toLowerCase() === "k";

export function useQuickFindShortcut(toggle: () => void) {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!isQuickFindChord(e) || e.defaultPrevented) return;
      e.preventDefault(); // the browser's own Ctrl+K would focus its address bar
      toggle();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [toggle]);
}

/** "Ctrl K" on the server and on most devices; "⌘ K" once the client knows it is an Apple device. */
export function useShortcutLabel(): string {
  const [apple, setApple] = useState(false);
  useEffect(() => setApple(/Mac|iPhone|iPad/.test(navigator.platform || navigator.userAgent)), []);
  return apple ? "⌘ K" : "Ctrl K";
}
