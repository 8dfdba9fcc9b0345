import { useQuery } from "@tanstack/react-query";
import { describeAudit } from "~/audit/describe";
import { historyQuery } from "~/cases/case-queries";
import { formatDate } from "~/domain/format";

/** The entries of a case's history, in the audit log's words: fetched when History is opened. */
export default function CaseHistoryList({ caseId }: { caseId: string }) {
  const history = useQuery(historyQuery(caseId));
  if (history.isPending) return <p className="mt-2 text-sm text-graphite-600">Loading the history…</p>;
  if (history.isError)
    return (
      <p role="alert" className="mt-2 text-sm">
        {history.error.message}
      </p>
    );
  return (
    <ol className="mt-2 grid gap-1 text-sm" aria-label="Case history">
      {history.data.history.map((e) => (
        <li key={e.id}>
          <span className="tabular text-graphite-600">{formatDate(e.at)}</span> ·{" "}
          <strong>{e.actor ?? "someone"}</strong> {describeAudit(e).text}
        </li>
      ))}
    </ol>
  );
}
