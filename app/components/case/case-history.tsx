import { lazy, Suspense } from "react";
import { Fold } from "../fold";

// Most visits never open the history: its words and their code load when it is opened.
const CaseHistoryList = lazy(() => import("./case-history-list"));

/** The case's own trail, newest first, in the same words as the workshop's audit log. */
export function CaseHistory({ caseId }: { caseId: string }) {
  return (
    <section aria-labelledby="history" className="rounded-card border border-rule bg-card p-4">
      <Fold
        summaryClassName="min-h-tap cursor-pointer content-center text-xl font-semibold"
        summary={<span id="history">History</span>}
      >
        <Suspense fallback={<p className="mt-2 text-sm text-graphite-600">Loading…</p>}>
          <CaseHistoryList caseId={caseId} />
        </Suspense>
      </Fold>
    </section>
  );
}
