import type { Entry } from "~/quick-find";
import { QuickFind } from "../quick-find/quick-find";

/** Quick find on a case: symptoms only, Enter adds as present, Shift+Enter as absent. */
export function CaseQuickFind({ entries, recent, onAdd, cacheKey }: { entries: Entry[]; recent: string[]; onAdd: (entry: Entry, present: boolean) => void; cacheKey?: string }) {
  return (
    <QuickFind
      entries={entries}
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
