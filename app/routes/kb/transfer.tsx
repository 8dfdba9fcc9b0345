import { data, Form, href, Link, useNavigation } from "react-router";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import type { Problem } from "~/domain/knowledge-integrity";
import { dbContext } from "~/http/context";
import type { FormErrors } from "~/http/forms";
import { invalid } from "~/http/forms.server";
import { kbCounts } from "~/kb/overview.server";
import { importKnowledge, readDocumentText } from "~/kb/transfer.server";
import type { Route } from "./+types/transfer";

// The problems listed on the page; a file with more says how many were left out.
const SHOWN_PROBLEMS = 50;

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:edit");
  return { counts: await kbCounts(context.get(dbContext), member.workshopId) };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const file = (await request.formData()).get("document");
  if (!(file instanceof File) || file.size === 0)
    return invalid({ document: ["Choose a knowledge-base file (.json) to import."] });
  const read = readDocumentText(await file.text());
  const answer =
    "problem" in read
      ? { ok: false as const, problems: [read.problem] }
      : await importKnowledge(context.get(dbContext), member, read.raw);
  if (!answer.ok) {
    const n = answer.problems.length;
    const errors: FormErrors = {
      document: [
        `${file.name} was not imported and nothing changed: ${n === 1 ? "one problem" : `${n} problems`} to put right first.`,
      ],
    };
    return data(
      {
        errors,
        notice: null,
        problems: answer.problems.slice(0, SHOWN_PROBLEMS),
        more: Math.max(0, n - SHOWN_PROBLEMS),
      },
      { status: 400 },
    );
  }
  const c = answer.counts;
  const part = (x: { added: number; updated: number }, word: string) =>
    `${x.added} ${word} added, ${x.updated} updated`;
  return {
    errors: {} as FormErrors,
    notice: `Imported “${answer.name}” as version ${answer.kbVersion}: ${part(c.symptoms, "symptoms")}; ${part(c.causes, "causes")}; ${part(c.checks, "checks")}; ${c.symptomLinks + c.checkLinks} links.`,
    problems: [] as Problem[],
    more: 0,
  };
}

export function meta() {
  return [{ title: "Knowledge-base files — Ramplight" }];
}

export default function KnowledgeTransfer({ loaderData, actionData }: Route.ComponentProps) {
  const { counts } = loaderData;
  const errors = actionData?.errors;
  const problems = actionData && "problems" in actionData ? actionData.problems : [];
  const more = actionData && "more" in actionData ? actionData.more : 0;
  const busy = useNavigation().state === "submitting";
  return (
    <div className="grid max-w-3xl gap-6">
      <div>
        <p>
          <Link className="inline-flex min-h-tap items-center text-uv-700 underline" to={href("/kb")}>
            Knowledge base
          </Link>
        </p>
        <h1 className="text-2xl font-semibold">Knowledge-base files</h1>
        <p className="mt-1 text-graphite-700">
          Take a copy of this workshop&apos;s knowledge base, or bring in one from a file of the same format:
          another workshop&apos;s, or this one&apos;s edited elsewhere.
        </p>
      </div>
      <section aria-labelledby="copy" className="card">
        <h2 id="copy" className="text-xl font-semibold">
          Take a copy
        </h2>
        <p className="tabular mt-1">
          Version {counts.kbVersion}: {counts.symptoms} symptoms, {counts.causes} causes, {counts.checks}{" "}
          checks, {counts.symptomLinks + counts.checkLinks} links.
        </p>
        <a className="btn mt-3 inline-flex items-center" href={href("/kb/export")} download>
          Download as a file (JSON)
        </a>
      </section>
      <section aria-labelledby="bring" className="card">
        <h2 id="bring" className="text-xl font-semibold">
          Bring one in
        </h2>
        <ul className="mt-1 list-disc pl-6 text-sm text-graphite-700">
          <li>
            The whole file is checked before anything is written; a file with any problem changes nothing.
          </li>
          <li>
            An item with a key this workshop already has replaces it in place: cases that refer to it keep
            their link. Nothing is deleted.
          </li>
          <li>The import makes a new knowledge-base version and is recorded in the audit log.</li>
        </ul>
        <FormMessages errors={errors} notice={actionData?.notice} className="mt-3" />
        <Form method="post" encType="multipart/form-data" className="mt-3 grid gap-3">
          <label className="grid gap-1 font-medium" htmlFor="document">
            Knowledge-base file
            <input
              id="document"
              name="document"
              type="file"
              accept="application/json,.json"
              className="field min-h-tap py-2"
              {...describedBy(errors, "document")}
            />
            <FieldError errors={errors} name="document" />
          </label>
          {problems.length ? (
            <ol
              aria-label="Problems in the file"
              className="grid gap-1 rounded-lg border-2 border-stop bg-card p-3 text-sm"
            >
              {problems.map((p, i) => (
                <li key={i}>
                  <span className="font-mono">{p.where}</span>: {p.message}
                </li>
              ))}
              {more ? <li>… and {more} more.</li> : null}
            </ol>
          ) : null}
          <div>
            <button type="submit" className="btn-primary" disabled={busy}>
              {busy ? "Checking…" : "Check and import"}
            </button>
          </div>
        </Form>
      </section>
    </div>
  );
}
