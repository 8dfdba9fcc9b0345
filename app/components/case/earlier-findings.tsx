import { useQuery } from "@tanstack/react-query";
import { findingsQuery } from "~/cases/case-queries";
import { FindingRow } from "./finding-row";

/** The findings before the latest ones, read when their fold is opened. */
export default function EarlierFindings({
  caseId,
  latestIds,
  canWork,
  remove,
}: {
  caseId: string;
  latestIds: string[];
  canWork: boolean;
  remove: (kind: "unfind", id: string) => void;
}) {
  const all = useQuery(findingsQuery(caseId));
  if (all.isPending) return <p className="meta mt-1">Loading the earlier findings…</p>;
  if (all.isError)
    return (
      <p role="alert" className="mt-1">
        {all.error.message}
      </p>
    );
  const latest = new Set(latestIds);
  return (
    <ol className="grid gap-1" aria-label="Earlier findings">
      {all.data.findings
        .filter((f) => !latest.has(f.id))
        .map((f) => (
          <FindingRow key={f.id} f={f} canWork={canWork} remove={remove} />
        ))}
    </ol>
  );
}
