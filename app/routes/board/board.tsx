import { memberContext } from "~/auth/guards.server";
import { listCases } from "~/cases/list.server";
import { CaseCard } from "~/components/case-card";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/board";

export async function loader({ context }: Route.LoaderArgs) {
  const member = context.get(memberContext);
  const rows = await listCases(context.get(dbContext), member.workshopId, { limit: 200 });
  const live = rows.filter((c) => c.state !== "closed");
  return {
    columns: [
      {
        key: "bench",
        title: "On the bench",
        cases: live.filter((c) => c.state === "open" && !c.needsSenior),
      },
      {
        key: "senior",
        title: "Needs a senior",
        cases: live.filter((c) => c.state === "awaiting_signoff" || (c.state === "open" && c.needsSenior)),
      },
      { key: "advisor", title: "Ready for the advisor", cases: live.filter((c) => c.state === "concluded") },
    ],
  };
}

export function meta() {
  return [{ title: "Board — Ramplight" }];
}

export default function Board({ loaderData }: Route.ComponentProps) {
  return (
    <div>
      <h1 className="text-2xl font-semibold">Board</h1>
      <p className="text-graphite-700">Every vehicle in the workshop and where its diagnosis stands.</p>
      <div className="mt-6 grid gap-6 lg:grid-cols-3">
        {loaderData.columns.map((col) => (
          <section key={col.key} aria-labelledby={`col-${col.key}`}>
            <h2 id={`col-${col.key}`} className="mb-3 text-lg font-semibold">
              {col.title} <span className="tabular text-graphite-600">({col.cases.length})</span>
            </h2>
            <div className="grid gap-3">
              {col.cases.length === 0 ? <p className="text-graphite-600">Nothing here right now.</p> : null}
              {col.cases.map((c) => (
                <CaseCard key={c.id} c={c} />
              ))}
            </div>
          </section>
        ))}
      </div>
    </div>
  );
}
