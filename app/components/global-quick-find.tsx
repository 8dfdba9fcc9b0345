import { href, useMatches, useNavigate } from "react-router";
import type { Entry } from "~/quick-find";
import { QuickFind } from "./quick-find/quick-find";

// Everything Quick find can jump to, fetched when the palette first opens.
export async function loadAllEntries(): Promise<Entry[]> {
  const res = await fetch("/api/quick-find");
  if (!res.ok) throw new Error(`Quick find list: ${res.status}`);
  return ((await res.json()) as { entries: Entry[] }).entries;
}

export function entryHref(entry: Entry): string {
  switch (entry.kind) {
    case "case":
      return href("/cases/:caseId", { caseId: entry.id });
    case "vehicle":
      return `/cases?q=${encodeURIComponent(entry.title.split(" · ")[0])}`;
    default:
      return `/kb#${entry.kind}-${entry.id}`;
  }
}

/**
 * The shell's Quick find: jump to a case, a vehicle's cases, or a knowledge-base item. A page with
 * its own palette (the case workbench, where symptoms become evidence) says so in its handle, and
 * this one steps aside so Ctrl+K opens exactly one.
 */
export function GlobalQuickFind() {
  const navigate = useNavigate();
  const ownPalette = useMatches().some(
    (m) => (m.handle as { quickFind?: string } | undefined)?.quickFind === "own",
  );
  if (ownPalette) return null;
  return (
    <QuickFind
      entries={loadAllEntries}
      onPick={(entry) => navigate(entryHref(entry))}
      placeholder="Find a case, plate, VIN, symptom, cause or check"
    />
  );
}
