import type { Entry } from "~/quick-find";
import { QuickFind } from "../quick-find/quick-find";

// Stable across renders, so the palette fetches once per page and reuses the built index.
async function loadSymptoms(): Promise<Entry[]> {
  const res = await fetch("/api/quick-find?kinds=symptom");
  if (!res.ok) throw new Error(`Quick find list: ${res.status}`);
  return ((await res.json()) as { entries: Entry[] }).entries;
}

/** Quick find on a case: symptoms only, Enter adds as present, Shift+Enter as absent. */
export function CaseQuickFind({ recent, onAdd, cacheKey }: { recent: string[]; onAdd: (entry: Entry, present: boolean) => void; cacheKey?: string }) {
  return (
    <QuickFind
      entries={loadSymptoms}
      cacheKey={cacheKey}
      recentIds={recent}
      kinds={["symptom"]}
      placeholder="What did you notice? e.g. judder when braking"
      onPick={(entry, pick) => {
        if (entry.kind === "symptom") onAdd(entry, pick.present ?? true);
      }}
    />
  );
}
