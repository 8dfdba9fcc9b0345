import { memberContext, requirePermission } from "~/auth/guards.server";
import { listCases } from "~/cases/list.server";
import { CaseCard } from "~/components/case-card";
import { OWNER_STATE_LABEL, type OwnerState } from "~/domain/owner-side";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/desk";

// The advisor's day, in the order the work moves: cases with a confirmed cause waiting for an
// estimate, then those with the owner, then the answered ones to act on, then the paid.
const SECTIONS: { key: string; title: string; states: OwnerState[] }[] = [
  { key: "estimate", title: "Waiting for an estimate", states: ["not_sent"] },
  { key: "with-owner", title: "With the owner", states: ["sent", "opened"] },
  { key: "answered", title: "Answered", states: ["approved_all", "approved_some", "declined"] },
  { key: "paid", title: OWNER_STATE_LABEL.paid, states: ["paid"] },
];

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "case:read");
  const rows = await listCases(context.get(dbContext), member.workshopId, { limit: 200 });
  // A concluded case is the advisor's; a closed one only while its owner side is still moving.
  const mine = rows.filter(
    (c) => c.state === "concluded" || (c.state === "closed" && c.ownerState !== "not_sent"),
  );
  return {
    sections: SECTIONS.map((s) => ({ ...s, cases: mine.filter((c) => s.states.includes(c.ownerState)) })),
  };
}

export function meta() {
  return [{ title: "Front desk — Ramplight" }];
}

export default function Desk({ loaderData }: Route.ComponentProps) {
  return (
    <div>
      <h1 className="text-2xl font-semibold">Front desk</h1>
      <p className="text-graphite-700">
        Cases with a confirmed cause, from the estimate to the owner&apos;s answer and payment.
      </p>
      <div className="mt-6 grid gap-6 lg:grid-cols-2 xl:grid-cols-4">
        {loaderData.sections.map((s) => (
          <section key={s.key} aria-labelledby={`desk-${s.key}`}>
            <h2 id={`desk-${s.key}`} className="mb-3 text-lg font-semibold">
              {s.title} <span className="tabular text-graphite-600">({s.cases.length})</span>
            </h2>
            <div className="grid gap-3">
              {s.cases.length === 0 ? <p className="text-graphite-600">Nothing here right now.</p> : null}
              {s.cases.map((c) => (
                <CaseCard key={c.id} c={c} />
              ))}
            </div>
          </section>
        ))}
      </div>
    </div>
  );
}
