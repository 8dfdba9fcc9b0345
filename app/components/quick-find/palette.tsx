// Quick find's palette: the dialog, its search and its list. Loaded the first time the palette
// opens (quick-find.tsx holds the button and the shortcut), so pages ship neither cmdk nor the
// index builder until someone wants them. cmdk draws the list and handles the arrow keys; ranking
// is ours (app/quick-find), so cmdk's own filter is off.
import { Command } from "cmdk";
import { type RefObject, useCallback, useEffect, useMemo, useRef, useState } from "react";
import {
  type Entry,
  type EntryKind,
  GROUP_HEADING,
  parseQuery,
  type ScoredEntry,
  search,
} from "~/quick-find";
import { itemValue, ResultRow } from "./result-row";
import { type EntrySource, useQuickFindIndex } from "./use-index";

/**
 * A symptom comes with present (as the query said it: "no grinding" is absent), and, when the
 * query named them, the trouble code typed and the conditions ("when braking" → braking).
 */
export type QuickFindPick = { present?: boolean; code?: string; conditions?: string[] };

export type QuickFindProps = {
  /** The entries, or a loader called the first time the palette opens. Keep the array stable
   *  across renders (or pass cacheKey): a new array means a new index. */
  entries: EntrySource;
  /** Shares the built index across mounts, e.g. quickFindKey(workshopId, kbVersion). */
  cacheKey?: string;
  recentIds?: readonly string[];
  kinds?: readonly EntryKind[];
  limit?: number;
  /** A symptom comes with present: true or false; anything else is a jump to that item. */
  onPick: (entry: Entry, pick: QuickFindPick) => void;
  placeholder?: string;
};

type PaletteProps = QuickFindProps & {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  inputRef: RefObject<HTMLInputElement | null>;
  /** Hands over (and forgets) what was typed while the palette's code was loading. */
  takeTypedAhead: () => string;
  onReady: () => void;
};

const KBD = "rounded border border-rule bg-paper px-1.5 font-sans text-base text-graphite-700";
const GROUP =
  "[&_[cmdk-group-heading]]:px-3 [&_[cmdk-group-heading]]:pt-3 [&_[cmdk-group-heading]]:pb-1 [&_[cmdk-group-heading]]:text-base [&_[cmdk-group-heading]]:font-semibold [&_[cmdk-group-heading]]:text-graphite-600";

export default function QuickFindPalette(props: PaletteProps) {
  const { entries, cacheKey, recentIds, kinds, limit, onPick, placeholder, open, inputRef } = props;
  const { onOpenChange, onReady, takeTypedAhead } = props;
  const [query, setQuery] = useState("");
  // The keys pressed between Ctrl+K and this code arriving belong in the box, not on the page. They
  // are taken once the dialog's input is on the page (after its portal mounts); the holder lets go
  // only once the box has the focus and its caret is after them, and keys pressed meanwhile are
  // added too, so under load nothing is lost and nothing replaces what was handed over.
  const handed = useRef("");
  const settled = useRef(false);
  const settle = useCallback(() => {
    if (settled.current) return;
    settled.current = true;
    const more = takeTypedAhead();
    if (more) {
      handed.current += more;
      setQuery(handed.current);
    }
    onReady();
  }, [takeTypedAhead, onReady]);
  useEffect(() => {
    const held = takeTypedAhead();
    handed.current = held;
    // Keys held by a window listener, outside React, handed over once: an effect is the place.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    if (held) setQuery(held);
    inputRef.current?.focus();
    // Should the box never take the focus, the keys are let go all the same.
    const late = setTimeout(settle, 1000);
    return () => clearTimeout(late);
  }, [takeTypedAhead, inputRef, settle]);
  // The dialog's focus handling selects the box's text as it takes the focus; the next key would
  // replace the handed-over text. While the box holds exactly that text, a selection of all of it
  // collapses to the end.
  const caretToEnd = (box: HTMLInputElement) => {
    if (handed.current && box.value === handed.current && box.selectionStart === 0)
      box.setSelectionRange(box.value.length, box.value.length);
  };
  const [selection, setSelection] = useState<{ query: string; value: string } | null>(null);
  const [arrowed, setArrowed] = useState<string | null>(null); // the query the user moved the highlight in
  const [added, setAdded] = useState<string | null>(null);
  const setOpen = useCallback(
    (next: boolean) => {
      if (!next) {
        setQuery("");
        setAdded(null);
      }
      onOpenChange(next);
    },
    [onOpenChange],
  );

  // Mounted only once wanted: the index is built from the first open on.
  const { index, loading, error } = useQuickFindIndex(entries, cacheKey, true);
  const groups = useMemo(
    () => (index ? search(index, query, { recentIds, kinds, limit }) : []),
    [index, query, recentIds, kinds, limit],
  );
  const items = useMemo(() => groups.flatMap((g) => g.items), [groups]);
  const conditions = useMemo(() => (query.trim() ? parseQuery(query).conditions : []), [query]);
  // The highlight follows the user's arrows within one query and returns to the first real match
  // on a new one; a weak match is never highlighted by default, so Enter cannot record it unseen.
  const moved =
    selection?.query === query &&
    (arrowed === query || !items.find((i) => itemValue(i.entry) === selection.value)?.weak);
  const picked = moved ? items.find((i) => itemValue(i.entry) === selection!.value) : undefined;
  const current: ScoredEntry | undefined = picked ?? items.find((i) => !i.weak);
  const onlyWeak = items.length > 0 && items.every((i) => i.weak);

  const choose = (entry: Entry, present: boolean | undefined) => {
    if (entry.kind === "symptom") {
      const item = items.find((i) => i.entry === entry);
      const pick: QuickFindPick = { present: present ?? item?.present ?? true };
      if (item?.code) pick.code = item.code;
      if (conditions.length) pick.conditions = conditions;
      onPick(entry, pick);
      // Stay open: a technician usually adds several symptoms in a row.
      setAdded(`Added “${entry.title}” as ${present === false ? "absent" : "present"}.`);
      setQuery("");
      return;
    }
    onPick(entry, {});
    setOpen(false);
  };

  return (
    <>
      <Command.Dialog
        open={open}
        onOpenChange={setOpen}
        label="Quick find"
        shouldFilter={false}
        vimBindings={false}
        loop
        value={current ? itemValue(current.entry) : ""}
        onValueChange={(value) => setSelection({ query, value })}
        onKeyDown={(e) => {
          if (e.key === "ArrowDown" || e.key === "ArrowUp") setArrowed(query);
          if (e.key !== "Enter") return;
          // Only weak matches and none chosen with the arrows: Enter records nothing (cmdk leaves
          // prevented keys alone), so a wrong symptom is never added unseen.
          if (!current) return e.preventDefault();
          // Shift+Enter adds the highlighted symptom as absent.
          if (!e.shiftKey) return;
          e.preventDefault();
          choose(current.entry, current.entry.kind === "symptom" ? false : undefined);
        }}
        overlayClassName="fixed inset-0 bg-graphite-950/40"
        contentClassName="fixed left-1/2 top-[8vh] w-[min(42rem,calc(100vw-1.5rem))] -translate-x-1/2 overflow-hidden rounded-card border border-rule bg-card text-base text-graphite-900 shadow-xl"
      >
        {/* cmdk names the input after the dialog's label ("Quick find") through its own hidden label. */}
        <Command.Input
          ref={inputRef}
          value={query}
          onValueChange={setQuery}
          onSelect={(e) => caretToEnd(e.currentTarget)}
          onFocus={(e) => {
            const box = e.currentTarget;
            requestAnimationFrame(() => {
              caretToEnd(box);
              settle();
            });
          }}
          placeholder={placeholder ?? "Symptom, cause, check, registration, VIN or #case"}
          className="min-h-tap w-full border-b border-rule bg-transparent px-4 py-3 text-lg outline-none placeholder:text-graphite-600"
        />
        <Command.List className="max-h-[60vh] overflow-y-auto p-2" aria-describedby="quick-find-keys">
          {loading ? <Command.Loading label="Loading Quick find">Loading…</Command.Loading> : null}
          {error ? <p className="px-3 py-2 text-stop">{error}</p> : null}
          {index && query.trim() ? (
            <Command.Empty className="px-3 py-2 text-graphite-600">
              Nothing found. Try another word, a registration or a case number.
            </Command.Empty>
          ) : null}
          {onlyWeak ? (
            <p className="px-3 py-2 text-graphite-700">No good match: note it, or propose a new symptom.</p>
          ) : null}
          {groups.map((g) => (
            <Command.Group key={g.kind} heading={GROUP_HEADING[g.kind]} className={GROUP}>
              {g.items.map((item) => (
                <ResultRow
                  key={itemValue(item.entry)}
                  entry={item.entry}
                  weak={item.weak}
                  absent={item.present === false}
                  onChoose={choose}
                />
              ))}
            </Command.Group>
          ))}
        </Command.List>
        <footer
          id="quick-find-keys"
          className="flex flex-wrap items-center gap-x-4 gap-y-1 border-t border-rule px-4 py-2 text-base text-graphite-600"
        >
          <span>
            <kbd className={KBD}>Enter</kbd> add as present / open
          </span>
          <span>
            <kbd className={KBD}>Shift</kbd>+<kbd className={KBD}>Enter</kbd> add as absent
          </span>
          <span>
            <kbd className={KBD}>Esc</kbd> close
          </span>
        </footer>
        <p role="status" className="px-4 pb-2 text-base text-graphite-700 empty:hidden">
          {added}
        </p>
      </Command.Dialog>
    </>
  );
}
