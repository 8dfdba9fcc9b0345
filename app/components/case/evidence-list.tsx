import { lazy, Suspense } from "react";
import type { CaseView } from "~/cases/case-queries";
import { Fold } from "../fold";
import { FindingRow, RemoveButton } from "./finding-row";

// A long case keeps its latest findings in view; the earlier ones open on request.
// The view carries the latest findings; the earlier ones are read (and their code loaded) on opening.
const EarlierFindings = lazy(() => import("./earlier-findings"));

/** What has been noticed and found so far, newest last, each removable while the case is open. */
export function EvidenceList({
  c,
  canWork,
  remove,
}: {
  c: CaseView["case"];
  canWork: boolean;
  remove: (kind: "unobserve" | "unfind", id: string) => void;
}) {
  return (
    <section aria-labelledby="evidence" className="card">
      <h2 id="evidence" className="text-xl font-semibold">
        Evidence
      </h2>
      <h3 className="mt-3 font-semibold">Observations</h3>
      {c.observations.length === 0 ? (
        <p className="text-graphite-600">None yet. Press Ctrl+K (⌘K) to add what you notice.</p>
      ) : null}
      <ul className="mt-1 grid gap-1" aria-label="Observations">
        {c.observations.map((o) => (
          <li key={o.id} className="flex items-center justify-between gap-2">
            <span>
              <strong className={o.present ? "" : "text-graphite-600"}>
                {o.present ? "Present" : "Absent"}
              </strong>
              : {o.name}{" "}
              <span className="text-sm text-graphite-600">
                ({o.source === "owner" ? "owner says" : "confirmed"}
                {o.by ? `, ${o.by}` : ""})
              </span>
            </span>
            {canWork ? (
              <RemoveButton
                id={o.id}
                what={`observation ${o.name}`}
                onRemove={() => remove("unobserve", o.id)}
              />
            ) : null}
          </li>
        ))}
      </ul>
      <h3 className="mt-4 font-semibold">Findings</h3>
      {c.findings.length === 0 ? <p className="text-graphite-600">No checks done yet.</p> : null}
      {c.findingCount > c.findings.length ? (
        <Fold
          className="mt-1"
          summaryClassName="min-h-tap cursor-pointer content-center text-sm text-graphite-700"
          summary={`${c.findingCount - c.findings.length} earlier findings`}
        >
          <Suspense fallback={<p className="meta mt-1">Loading…</p>}>
            <EarlierFindings
              caseId={c.id}
              latestIds={c.findings.map((f) => f.id)}
              canWork={canWork}
              remove={remove}
            />
          </Suspense>
        </Fold>
      ) : null}
      <ol className="mt-1 grid gap-1" aria-label="Findings">
        {c.findings.map((f) => (
          <FindingRow key={f.id} f={f} canWork={canWork} remove={remove} />
        ))}
      </ol>
    </section>
  );
}
