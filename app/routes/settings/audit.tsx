import { Link } from "react-router";
import { describeAudit } from "~/audit/describe";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { RouteErrorPage } from "~/components/error-page";
import { formatDate } from "~/domain/format";
import { dbContext } from "~/http/context";
import { readAuditLog } from "~/audit/read.server";
import type { Route } from "./+types/audit";

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "audit:read");
  return { entries: await readAuditLog(context.get(dbContext), member.workshopId) };
}

export function meta() {
  return [{ title: "Audit log — Ramplight" }];
}

export default function AuditLog({ loaderData }: Route.ComponentProps) {
  return (
    <div>
      <h1 className="text-2xl font-semibold">Audit log</h1>
      <p className="text-graphite-700">Who changed what, newest first.</p>
      <ol className="mt-4 grid gap-2" aria-label="Audit entries">
        {loaderData.entries.map((e) => {
          const d = describeAudit(e);
          return (
            <li key={e.id} className="rounded-lg border border-rule bg-card p-3">
              <p className="tabular text-sm text-graphite-600">{formatDate(e.at)}</p>
              <p>
                <strong>{e.actor ?? "Ramplight"}</strong> {d.text}
                {d.href ? (
                  <>
                    {" "}
                    ·{" "}
                    <Link to={d.href} className="font-medium text-uv-700 underline">
                      {d.linkText}
                    </Link>
                  </>
                ) : null}
              </p>
            </li>
          );
        })}
      </ol>
    </div>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
