import type { CaseView } from "~/cases/case-queries";
import { formatDate } from "~/domain/format";

type Finding = CaseView["case"]["findings"][number];

/** One finding: what was found, by whom and when, removable while the case is open. */
export function FindingRow({
  f,
  canWork,
  remove,
}: {
  f: Finding;
  canWork: boolean;
  remove: (kind: "unfind", id: string) => void;
}) {
  return (
    <li className="flex items-center justify-between gap-2">
      <span>
        <strong className={f.result === "fail" ? "text-stop" : ""}>
          {f.id.startsWith("pending") ? "Recording…" : f.result === "fail" ? "Fault found" : "Passed"}
        </strong>
        {`: ${f.name}${f.reading ? ` — ${f.reading}` : ""} `}
        <span className="meta tabular">{`${f.by ? `${f.by}, ` : ""}${formatDate(f.recordedAt)}`}</span>
      </span>
      {canWork && !f.id.startsWith("pending") ? (
        <button
          type="button"
          onClick={() => remove("unfind", f.id)}
          className="btn-small"
          aria-label={`Remove finding ${f.name}`}
        >
          Remove
        </button>
      ) : null}
    </li>
  );
}
