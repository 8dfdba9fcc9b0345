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
      {canWork ? (
        <RemoveButton id={f.id} what={`finding ${f.name}`} onRemove={() => remove("unfind", f.id)} />
      ) : null}
    </li>
  );
}

/** Takes a piece of evidence back; none for one still being recorded (its id is not the server's yet). */
export function RemoveButton({ id, what, onRemove }: { id: string; what: string; onRemove: () => void }) {
  if (id.startsWith("pending")) return null;
  return (
    <button type="button" onClick={onRemove} className="btn-small" aria-label={`Remove ${what}`}>
      Remove
    </button>
  );
}
