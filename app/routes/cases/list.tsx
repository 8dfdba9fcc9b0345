import { Form, href, Link, useSearchParams } from "react-router";
import { can } from "~/domain/permissions";
import { z } from "zod";
import { memberContext } from "~/auth/guards.server";
import { listCases } from "~/cases/list.server";
import { CASE_STATES } from "~/domain/cases";
import { CaseCard } from "~/components/case-card";
import { STATE_LABEL } from "~/domain/format";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/list";

const FilterSchema = z.object({
  state: z
    .enum(CASE_STATES)
    .optional()
    .or(z.literal("").transform(() => undefined)),
  q: z.string().trim().max(80, "Search at most 80 characters").optional(),
});

export async function loader({ request, context }: Route.LoaderArgs) {
  const member = context.get(memberContext);
  const parsed = FilterSchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) throw new Response(parsed.error.issues[0]?.message ?? "Bad filter", { status: 400 });
  const cases = await listCases(context.get(dbContext), member.workshopId, {
    state: parsed.data.state,
    q: parsed.data.q || undefined,
  });
  return { cases, canOpen: can(member.role, "case:open") };
}

export function meta() {
  return [{ title: "Cases — Ramplight" }];
}

export default function CaseList({ loaderData }: Route.ComponentProps) {
  const [params] = useSearchParams();
  return (
    <div>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-semibold">Cases</h1>
        {loaderData.canOpen ? (
          <Link
            to={href("/cases/new")}
            className="inline-flex min-h-tap items-center rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
          >
            Open a case
          </Link>
        ) : null}
      </div>
      <Form method="get" className="mt-4 flex flex-wrap items-end gap-3" role="search">
        <label className="flex flex-col text-sm font-medium">
          Find
          <input
            name="q"
            defaultValue={params.get("q") ?? ""}
            placeholder="Plate, VIN, model or words"
            className="mt-1 min-h-tap w-64 rounded-lg border border-rule bg-card px-3 text-base"
          />
        </label>
        <label className="flex flex-col text-sm font-medium">
          State
          <select
            name="state"
            defaultValue={params.get("state") ?? ""}
            className="mt-1 min-h-tap rounded-lg border border-rule bg-card px-3 text-base"
          >
            <option value="">Any</option>
            {CASE_STATES.map((s) => (
              <option key={s} value={s}>
                {STATE_LABEL[s]}
              </option>
            ))}
          </select>
        </label>
        <button
          type="submit"
          className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
        >
          Show
        </button>
      </Form>
      <p className="mt-4 text-sm text-graphite-600 tabular">{loaderData.cases.length} cases</p>
      <div className="mt-2 grid gap-3 md:grid-cols-2">
        {loaderData.cases.map((c) => (
          <CaseCard key={c.id} c={c} />
        ))}
      </div>
    </div>
  );
}
