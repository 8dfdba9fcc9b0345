// What a change would do before anything is saved: the workshop's cases with a confirmed cause and
// its kept test cases, each ranked again under the base as it is and as it would be.
import { href, Link } from "react-router";
import { ordinal } from "~/domain/format";
import { describeStrength } from "~/domain/link-strength";
import type { Impact, ImpactWithTests } from "~/kb/impact";

function Counts({ impact, answer }: { impact: Impact; answer: string }) {
  return (
    <ul className="tabular mt-1 list-disc pl-6">
      <li>{`${answer} ranked first: ${impact.first.before} → ${impact.first.after}`}</li>
      <li>{`in the top three: ${impact.topThree.before} → ${impact.topThree.after}`}</li>
    </ul>
  );
}

/** The change's effect on the cases, before it is saved (or, for a proposal, accepted). */
export function ImpactPreview({
  impact,
  p,
  saveWord = "Save strength",
}: {
  impact: ImpactWithTests;
  p: number;
  saveWord?: string;
}) {
  const tests = impact.tests;
  const nothing = impact.moved.length === 0 && (!tests || tests.moved.length === 0);
  return (
    <div
      role="status"
      aria-label="Effect on cases with a confirmed cause"
      className="mt-2 rounded-lg border-2 border-uv-500 p-3 text-sm"
    >
      <p className="font-medium">{`At ${describeStrength(p)}, of ${impact.cases} cases with a confirmed cause:`}</p>
      <Counts impact={impact} answer="confirmed cause" />
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
      ) : null}
      {tests ? (
        <>
          <p className="mt-2 font-medium">
            {`Of the workshop's ${tests.cases} `}
            <Link className="underline" to={href("/kb/test-cases")}>
              test cases
            </Link>
            :
          </p>
          <Counts impact={tests} answer="known answer" />
          {tests.moved.length ? (
            <ul className="mt-1 grid gap-1" aria-label="Test cases that moved">
              {tests.moved.map((m) => (
                <li
                  key={m.id}
                >{`${m.label} (${m.answerName}): ${ordinal(m.before)} → ${ordinal(m.after)}`}</li>
              ))}
            </ul>
          ) : null}
        </>
      ) : null}
      {nothing ? (
        <p className="mt-1">{`No case would move. Nothing is saved until you press ${saveWord}.`}</p>
      ) : null}
    </div>
  );
}
