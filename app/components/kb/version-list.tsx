import { Fold } from "~/components/fold";
import { formatDate } from "~/domain/format";

type Version = { version: number; summary: string; madeBy: string | null; createdAt: string | Date };

/** The newest versions of the knowledge base: each one kept whole, so cases ranked with it stay as they were. */
export function VersionList({ versions, current }: { versions: Version[]; current: number }) {
  return (
    <section aria-labelledby="versions" className="mt-6 rounded-card border border-rule bg-card p-3">
      <Fold
        summaryClassName="min-h-tap cursor-pointer content-center"
        summary={
          <span id="versions" className="font-semibold">
            Versions: now at {current}
          </span>
        }
      >
        <p className="mt-1 text-sm text-graphite-600">
          Every change makes a new version. A case keeps the version it was ranked with until someone working
          on it asks for the newest.
        </p>
        <ol className="mt-2 grid gap-1" data-testid="kb-versions">
          {versions.map((v) => (
            <li key={v.version} className="grid grid-cols-[4rem_1fr] gap-2 text-sm">
              <span className="tabular font-semibold">v{v.version}</span>
              <span>
                {v.summary}
                <span className="block text-graphite-600">
                  {formatDate(v.createdAt)}
                  {v.madeBy ? ` · ${v.madeBy}` : ""}
                </span>
              </span>
            </li>
          ))}
        </ol>
      </Fold>
    </section>
  );
}
