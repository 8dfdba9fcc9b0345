import { Fold } from "~/components/fold";
import { formatDate } from "~/domain/format";

type Line = {
  id: number;
  at: string | Date;
  actor: string | null;
  text: string;
  changes: { what: string; before: string; after: string }[];
};

/** An item's history: who changed what and when, each field's before and after in words. */
export function ItemHistory({ lines }: { lines: Line[] }) {
  return (
    <section aria-labelledby="item-history" className="rounded-card border border-rule bg-card p-4">
      <Fold
        summaryClassName="min-h-tap cursor-pointer content-center"
        summary={
          <span id="item-history" className="font-semibold">
            History{lines.length ? ` (${lines.length}${lines.length >= 30 ? "+" : ""})` : ": no changes yet"}
          </span>
        }
      >
        <ol className="mt-2 grid gap-3" aria-label="Changes, newest first">
          {lines.map((l) => (
            <li key={l.id} className="border-t border-rule pt-2 text-sm first:border-0 first:pt-0">
              <p>
                <span className="font-semibold">{l.actor ?? "Someone"}</span> {l.text}
              </p>
              <p className="text-graphite-600">{formatDate(l.at)}</p>
              {l.changes.length ? (
                <dl className="mt-1 grid gap-1">
                  {l.changes.map((c) => (
                    <div key={c.what} className="grid gap-x-2 sm:grid-cols-[12rem_1fr]">
                      <dt className="text-graphite-600">{c.what}</dt>
                      <dd className="break-words">
                        {c.before} <span aria-label="became">→</span> {c.after}
                      </dd>
                    </div>
                  ))}
                </dl>
              ) : null}
            </li>
          ))}
        </ol>
      </Fold>
    </section>
  );
}
