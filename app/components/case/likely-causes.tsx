import { useState } from "react";
import type { ShownCause } from "~/cases/present-diagnosis";
import { WHY_CAUSES } from "~/cases/shown";
import { Fold } from "../fold";
import { formatPercent } from "~/domain/format";
import { PriorityMark } from "../priority";

// The causes shown with their "why" are exactly those the server sends it for.
const SHOWN = WHY_CAUSES;

function movedBetween(before: ShownCause[], after: ShownCause[]): Set<string> {
  const was = new Map(before.map((c) => [c.id, c.probability]));
  return new Set(
    after.filter((c) => Math.abs((was.get(c.id) ?? c.probability) - c.probability) > 0.005).map((c) => c.id),
  );
}

/** Likely causes as bars of their share; "not in the knowledge base" always has its own bar. */
export function LikelyCauses({ causes, unlisted }: { causes: ShownCause[]; unlisted: number }) {
  // Compare with the shares of the last ranking so a bar that moved can pulse: the user sees what
  // changed. Kept in state and updated while rendering (React's pattern for "the previous value").
  const [seen, setSeen] = useState({ causes, moved: new Set<string>(), round: 0 });
  if (seen.causes !== causes)
    setSeen({ causes, moved: movedBetween(seen.causes, causes), round: seen.round + 1 });
  const moved = seen.moved;
  const top = causes.slice(0, SHOWN);
  const rest = causes.slice(SHOWN).filter((c) => c.probability >= 0.001);
  return (
    <section aria-labelledby="likely" className="card">
      <h2 id="likely" className="text-xl font-semibold">
        Likely causes
      </h2>
      <ol className="mt-3 grid gap-3" aria-label="Likely causes, most likely first">
        {top.map((c, i) => (
          <CauseRow
            key={c.id}
            cause={c}
            rank={i + 1}
            moved={moved.has(c.id) ? seen.round : 0}
            open={i === 0}
          />
        ))}
      </ol>
      {rest.length ? (
        <Fold
          className="mt-3"
          summaryClassName="min-h-tap cursor-pointer content-center text-graphite-700"
          summary={`${rest.length} less likely causes`}
        >
          <ol className="mt-2 grid gap-1 text-graphite-700" start={SHOWN + 1}>
            {rest.map((c) => (
              <li key={c.id} className="flex justify-between gap-3">
                <span>{c.name}</span>
                <span className="tabular">{formatPercent(c.probability, 1)}</span>
              </li>
            ))}
          </ol>
        </Fold>
      ) : null}
      <div className="mt-4 border-t border-rule pt-3" data-testid="unlisted">
        <Bar label="Not in the knowledge base" value={unlisted} muted />
        <p className="text-sm text-graphite-600">
          When this grows, the evidence fits none of the causes we know well: ask a senior.
        </p>
      </div>
    </section>
  );
}

function Bar({
  label,
  value,
  muted = false,
  moved = 0,
}: {
  label: string;
  value: number;
  muted?: boolean;
  /** The ranking round in which this bar's share changed, 0 if it did not: a new round replays the pulse. */
  moved?: number;
}) {
  return (
    <div>
      <div className="flex items-baseline justify-between gap-3">
        <span className={muted ? "text-graphite-700" : "font-medium"}>{label}</span>
        <span className="tabular font-semibold">{formatPercent(value)}</span>
      </div>
      <div
        key={moved}
        className={`mt-1 h-3 rounded-full bg-data-soft ${moved ? "motion-safe:animate-moved" : ""}`}
        aria-hidden="true"
      >
        <div
          className={`h-3 rounded-full ${muted ? "bg-graphite-500" : "bg-data"}`}
          style={{ width: `${Math.max(0.5, value * 100).toFixed(1)}%` }}
        />
      </div>
    </div>
  );
}

function CauseRow({
  cause,
  rank,
  moved,
  open,
}: {
  cause: ShownCause;
  rank: number;
  moved: number;
  open: boolean;
}) {
  const max = Math.max(1, ...cause.why.map((w) => Math.abs(w.weight)));
  return (
    <li data-cause={cause.name} data-moved={moved ? true : undefined}>
      <Bar label={`${rank}. ${cause.name}`} value={cause.probability} moved={moved} />
      <Fold
        open={open}
        className="mt-1"
        summaryClassName="inline-flex min-h-tap cursor-pointer items-center gap-2 text-graphite-700"
        summary={<>Why {cause.priority ? <PriorityMark priority={cause.priority as "stop"} /> : null}</>}
      >
        {cause.why.length === 0 ? (
          <p className="text-sm text-graphite-600">
            No evidence bears on it yet: its share is its usual frequency.
          </p>
        ) : (
          <ul className="mt-1 grid gap-2 text-sm" aria-label="Evidence for and against it">
            {cause.why.map((w) => (
              <li
                key={w.label}
                className="grid grid-cols-[1fr_6rem] items-center gap-2"
                data-why={w.weight > 0 ? "up" : "down"}
              >
                <span>
                  {w.label}
                  {w.recorded ? <span className="text-graphite-700">{`: ${w.recorded}`}</span> : null}
                  <span className={`block font-medium ${w.weight > 0 ? "text-data" : "text-graphite-700"}`}>
                    {w.weight > 0 ? "▲ makes it more likely" : "▼ makes it less likely"}
                  </span>
                </span>
                <span className="relative h-2 rounded bg-data-soft" aria-hidden="true">
                  <span
                    className={`absolute top-0 h-2 rounded ${w.weight > 0 ? "left-1/2 bg-data" : "right-1/2 bg-graphite-500"}`}
                    style={{ width: `${((Math.abs(w.weight) / max) * 50).toFixed(1)}%` }}
                  />
                </span>
              </li>
            ))}
          </ul>
        )}
      </Fold>
    </li>
  );
}
