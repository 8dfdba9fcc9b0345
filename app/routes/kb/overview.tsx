import { memberContext } from "~/auth/guards.server";
import { CauseTree } from "~/components/kb/cause-tree";
import { dbContext } from "~/http/context";
import { kbOverview } from "~/kb/overview.server";
import { listVersions } from "~/kb/version.server";
import { kbVersion } from "~/kb/knowledge.server";
import { VersionList } from "~/components/kb/version-list";
import { can } from "~/domain/permissions";
import { href, Link } from "react-router";
import type { Route } from "./+types/overview";

export async function loader({ context }: Route.LoaderArgs) {
  const member = context.get(memberContext);
  const db = context.get(dbContext);
  const [overview, versions, current] = await Promise.all([
    kbOverview(db, member.workshopId),
    listVersions(db, member.workshopId, 12),
    kbVersion(db, member.workshopId),
  ]);
  return { ...overview, versions, current, mayEdit: can(member.role, "kb:edit") };
}

export function meta() {
  return [{ title: "Knowledge base — Ramplight" }];
}

export default function KnowledgeBase({ loaderData }: Route.ComponentProps) {
  const { counts, tree, symptoms } = loaderData;
  return (
    <div>
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h1 className="text-2xl font-semibold">Knowledge base</h1>
        <nav aria-label="Knowledge-base files and proposals" className="flex flex-wrap gap-3">
          <Link
            className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
            to={href("/kb/proposals")}
          >
            Proposals
          </Link>
          <Link
            className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
            to={href("/kb/test-cases")}
          >
            Test cases
          </Link>
          {loaderData.mayEdit ? (
            <>
              <Link
                className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
                to={href("/kb/symptoms/new")}
              >
                New symptom
              </Link>
              <Link
                className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
                to={href("/kb/checks/new")}
              >
                New check
              </Link>
            </>
          ) : null}
          {loaderData.mayEdit ? (
            <Link
              className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
              to={href("/kb/transfer")}
            >
              Import or export a file
            </Link>
          ) : (
            <a
              className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
              href={href("/kb/export")}
              download
            >
              Download as a file
            </a>
          )}
        </nav>
      </div>
      <dl className="mt-4 grid grid-cols-2 gap-3 sm:grid-cols-5">
        {[
          ["Symptoms", counts.symptoms],
          ["Causes", counts.causes],
          ["Checks", counts.checks],
          ["Symptom links", counts.symptomLinks],
          ["Check links", counts.checkLinks],
        ].map(([label, n]) => (
          <div key={label} className="rounded-card border border-rule bg-card p-3">
            <dt className="text-sm text-graphite-600">{label}</dt>
            <dd className="tabular text-xl font-semibold">{n}</dd>
          </div>
        ))}
      </dl>
      <VersionList versions={loaderData.versions} current={loaderData.current} />
      <div className="mt-8 grid gap-8 lg:grid-cols-2">
        <section aria-labelledby="tree">
          <h2 id="tree" className="text-xl font-semibold">
            Cause tree
          </h2>
          <CauseTree tree={tree} mayEdit={loaderData.mayEdit} />
        </section>
        <section aria-labelledby="symptoms">
          <h2 id="symptoms" className="text-xl font-semibold">
            Symptoms
          </h2>
          <ul className="mt-3 grid gap-2">
            {symptoms.map((s) => (
              <li key={s.id} id={`symptom-${s.id}`} className="rounded-lg border border-rule bg-card p-3">
                <Link
                  className="inline-flex min-h-tap items-center font-medium underline decoration-rule underline-offset-2"
                  to={href("/kb/symptoms/:symptomId", { symptomId: s.id })}
                >
                  {s.name}
                </Link>
                {s.synonyms.length ? (
                  <p className="text-sm text-graphite-600">Also: {s.synonyms.join(", ")}</p>
                ) : null}
              </li>
            ))}
          </ul>
        </section>
      </div>
    </div>
  );
}
