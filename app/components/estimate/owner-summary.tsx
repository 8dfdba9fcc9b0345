// The owner's page and its printed copy: what we found in plain words, what the case measured,
// what happens if it is left, then the items to approve or decline.
import type { SentEstimateDocument, SentFinding } from "~/domain/estimate-document";
import { PRIORITY_COPY } from "~/domain/knowledge";
import { PriorityMark } from "../priority";

export function OwnerHeader({ doc }: { doc: SentEstimateDocument }) {
  return (
    <header className="grid gap-1">
      <p className="text-sm font-semibold uppercase tracking-wide text-graphite-700">{doc.workshopName}</p>
      <h1 className="text-2xl font-semibold">
        Your {doc.vehicle} ({doc.registration})
      </h1>
      <p className="text-graphite-700">
        For {doc.ownerName} · case {doc.caseNumber} · you told us: “{doc.complaint}”
      </p>
      {doc.message ? (
        <p className="mt-2 whitespace-pre-line rounded-card border border-rule bg-card p-3">{doc.message}</p>
      ) : null}
    </header>
  );
}

export function FindingCard({ finding }: { finding: SentFinding }) {
  return (
    <article className="break-inside-avoid rounded-card border border-rule bg-card p-4">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h3 className="text-lg font-semibold">{finding.causeName}</h3>
        <PriorityMark priority={finding.priority} showDescription />
      </div>
      <p className="mt-2">{finding.ownerWords}</p>
      {finding.evidence.length ? (
        <>
          <h4 className="mt-3 font-semibold">How we know</h4>
          <ul className="mt-1 list-disc pl-5">
            {finding.evidence.map((e) => (
              <li key={e}>{e}</li>
            ))}
          </ul>
        </>
      ) : null}
      {finding.ifLeft ? (
        <>
          <h4 className="mt-3 font-semibold">If it is left</h4>
          <p>{finding.ifLeft}</p>
        </>
      ) : null}
      {finding.priority === "stop" ? (
        <p role="note" className="mt-3 rounded-lg border-2 border-stop p-3 font-medium">
          {PRIORITY_COPY.stop.description} If you must move it, ask us: we can collect it.
        </p>
      ) : null}
      {finding.photos.length ? (
        <div className="mt-3 grid grid-cols-2 gap-2">
          {finding.photos.map((p) => (
            <figure key={p.url}>
              <img src={p.url} alt={p.caption} className="w-full rounded-lg" loading="lazy" />
              <figcaption className="text-sm text-graphite-700">{p.caption}</figcaption>
            </figure>
          ))}
        </div>
      ) : null}
    </article>
  );
}
