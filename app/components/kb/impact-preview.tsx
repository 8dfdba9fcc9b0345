// What a link's new strength would do to the workshop's cases with a confirmed cause, shown under
// the link's row before anything is saved.
import { href, Link } from "react-router";
import { describeStrength } from "~/domain/link-strength";
import type { Impact } from "~/kb/impact";

const ordinal = (n: number | null) =>
  n === null
    ? "not ranked"
    : `${n}${n % 10 === 1 && n % 100 !== 11 ? "st" : n % 10 === 2 && n % 100 !== 12 ? "nd" : n % 10 === 3 && n % 100 !== 13 ? "rd" : "th"}`;

/** The change's effect on the workshop's cases with a confirmed cause, before it is saved. */
export function ImpactPreview({ impact, p }: { impact: Impact; p: number }) {
  return (
    <div
      role="status"
      aria-label="Effect on cases with a confirmed cause"
      className="mt-2 rounded-lg border-2 border-uv-500 p-3 text-sm"
    >
      <p className="font-medium">{`At ${describeStrength(p)}, of ${impact.cases} cases with a confirmed cause:`}</p>
      <ul className="tabular mt-1 list-disc pl-6">
        <li>{`confirmed cause ranked first: ${impact.first.before} → ${impact.first.after}`}</li>
        <li>{`in the top three: ${impact.topThree.before} → ${impact.topThree.after}`}</li>
      </ul>
      {impact.moved.length ? (
        <ul className="mt-1 grid gap-1" aria-label="Cases that moved">
          {impact.moved.map((m) => (
            <li key={m.id}>
              <Link className="underline" to={href("/cases/:caseId", { caseId: m.id })}>
                {`case #${m.number}`}
              </Link>
              {` (${m.answerName}): ${ordinal(m.before)} → ${ordinal(m.after)}`}
            </li>
          ))}
        </ul>
      ) : (
        <p className="mt-1">No case would move. Nothing is saved until you press Save strength.</p>
      )}
    </div>
  );
}
