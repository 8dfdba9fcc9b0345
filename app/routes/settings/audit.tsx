import { memberContext, requirePermission } from "~/auth/guards.server";
import { formatDate } from "~/components/format";
import { dbContext } from "~/context";
import { readAuditLog } from "~/workshop/audit-log.server";
import type { Route } from "./+types/audit";

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "audit:read");
  return { entries: await readAuditLog(context.get(dbContext), member.workshopId) };
}

export function meta() {
  return [{ title: "Audit log — Ramplight" }];
}

const show = (v: unknown) => (v == null ? "" : JSON.stringify(v));

export default function AuditLog({ loaderData }: Route.ComponentProps) {
  return (
    <div>
      <h1 className="text-2xl font-semibold">Audit log</h1>
      <p className="text-graphite-700">Who changed what, newest first.</p>
      <ol className="mt-4 grid gap-2">
        {loaderData.entries.map((e) => (
          <li key={e.id} className="rounded-lg border border-rule bg-card p-3">
            <p>
              <span className="tabular text-sm text-graphite-600">{formatDate(e.at)}</span> · <strong>{e.actor ?? "system"}</strong> · <code>{e.action}</code>
            </p>
            {e.before != null || e.after != null ? (
              <p className="mt-1 text-sm break-all text-graphite-700">
                {e.before != null ? <>before {show(e.before)} · </> : null}after {show(e.after)}
              </p>
            ) : null}
          </li>
        ))}
      </ol>
    </div>
  );
}
