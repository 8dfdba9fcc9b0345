import { useNavigate } from "react-router";
import type { Entry } from "~/quick-find";
import { entryHref, loadAllEntries } from "../global-quick-find";
import { QuickFind } from "../quick-find/quick-find";

/**
 * Quick find on a case: a symptom becomes evidence (Enter present, Shift+Enter absent); anything
 * else — another case, a plate, a cause, a check — is a jump, as in the rest of the app.
 */
export function CaseQuickFind({
  recent,
  onAdd,
  cacheKey,
}: {
  recent: string[];
  onAdd: (entry: Entry, present: boolean) => void;
  cacheKey?: string;
}) {
  const navigate = useNavigate();
  return (
    <QuickFind
      entries={loadAllEntries}
      cacheKey={cacheKey}
      recentIds={recent}
      placeholder="What did you notice? e.g. judder when braking"
      onPick={(entry, pick) => {
        if (entry.kind === "symptom") onAdd(entry, pick.present ?? true);
        else navigate(entryHref(entry));
      }}
    />
  );
}
