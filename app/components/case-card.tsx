import { href, Link } from "react-router";
import type { CaseListItem } from "~/cases/list.server";
import { formatDate, STATE_LABEL } from "~/domain/format";
import { OWNER_STATE_LABEL } from "~/domain/owner-side";

export function CaseCard({
  c,
}: {
  c: Pick<
    CaseListItem,
    | "id"
    | "number"
    | "state"
    | "complaint"
    | "registration"
    | "vehicle"
    | "assignedName"
    | "openedAt"
    | "needsSenior"
    | "conclusion"
  > & { question?: CaseListItem["question"]; ownerState?: CaseListItem["ownerState"] };
}) {
  return (
    <article className="rounded-card border border-rule bg-card p-4" aria-labelledby={`case-${c.id}`}>
      <div className="flex items-baseline justify-between gap-3">
        <h3 id={`case-${c.id}`} className="font-semibold">
          <Link to={href("/cases/:caseId", { caseId: c.id })} className="hover:underline">
            <span className="tabular">#{c.number}</span> · {c.registration}
          </Link>
        </h3>
        <span className="text-sm text-graphite-600">{STATE_LABEL[c.state]}</span>
      </div>
      <p className="text-sm text-graphite-600">{c.vehicle}</p>
      <p className="mt-2">“{c.complaint}”</p>
      {c.conclusion ? (
        <p className="mt-2 text-sm">
          Cause: <strong>{c.conclusion}</strong>
        </p>
      ) : null}
      {c.ownerState && (c.state === "concluded" || c.ownerState !== "not_sent") ? (
        <p className="mt-2 flex flex-wrap items-center justify-between gap-2 text-sm">
          <span data-owner-state={c.ownerState}>{OWNER_STATE_LABEL[c.ownerState]}</span>
          <Link
            to={href("/cases/:caseId/estimate", { caseId: c.id })}
            className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
          >
            {c.ownerState === "not_sent" ? "Build the estimate" : "Estimate"}
            <span className="sr-only"> for case {c.number}</span>
          </Link>
        </p>
      ) : null}
      {c.question ? (
        <p className="mt-2 rounded-lg border-l-4 border-uv-500 bg-uv-50 p-2 text-sm">
          <strong>{c.question.by ?? "The apprentice"} asks:</strong> “{c.question.note}”
        </p>
      ) : null}
      <p className="mt-2 flex flex-wrap gap-x-3 text-sm text-graphite-600">
        <span>{c.assignedName ? `With ${c.assignedName}` : "Not assigned"}</span>
        <span className="tabular">Opened {formatDate(c.openedAt)}</span>
        {c.needsSenior ? <strong className="text-uv-700">Senior asked for</strong> : null}
      </p>
    </article>
  );
}
