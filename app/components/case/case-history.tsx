import { describeAudit } from "~/audit/describe";
import { Fold } from "../fold";
import { formatDate } from "~/domain/format";

/** The case's own trail, newest first, in the same words as the workshop's audit log. */
export function CaseHistory({ entries }: { entries: { id: number; at: string | Date; action: string; before: unknown; after: unknown; actor: string | null }[] }) {
  return (
    <section aria-labelledby="history" className="rounded-card border border-rule bg-card p-4">
      <Fold summaryClassName="min-h-tap cursor-pointer content-center text-xl font-semibold" summary={<span id="history">History</span>}>
        <ol className="mt-2 grid gap-1 text-sm" aria-label="Case history">
          {entries.map((e) => (
            <li key={e.id}>
              <span className="tabular text-graphite-600">{formatDate(e.at)}</span> · <strong>{e.actor ?? "someone"}</strong> {describeAudit(e).text}
            </li>
          ))}
        </ol>
      </Fold>
    </section>
  );
}
