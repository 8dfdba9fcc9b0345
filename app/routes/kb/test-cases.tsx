import { Form, href, Link, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { BackToKb } from "~/components/kb/editor";
import { FormMessages } from "~/components/ui/form-errors";
import { ordinal } from "~/domain/format";
import { can } from "~/domain/permissions";
import { dbContext } from "~/http/context";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { listTestCases, removeTestCase } from "~/kb/test-cases.server";
import type { Route } from "./+types/test-cases";

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  return {
    ...(await listTestCases(context.get(dbContext), member.workshopId)),
    mayEdit: can(member.role, "kb:edit"),
  };
}

const RemoveForm = z.object({ intent: z.literal("remove"), id: z.string().uuid("No such test case.") });

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const parsed = RemoveForm.safeParse(Object.fromEntries(await request.formData()));
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  return onForm(async () => {
    const name = await removeTestCase(context.get(dbContext), member, parsed.data.id);
    return `“${name}” is no longer a test case.`;
  });
}

export function meta() {
  return [{ title: "Test cases — Knowledge base — Ramplight" }];
}

export default function TestCases({ loaderData, actionData }: Route.ComponentProps) {
  const { tests, kbVersion, mayEdit } = loaderData;
  const busy = useNavigation().state === "submitting";
  const first = tests.filter((t) => t.place === 1).length;
  const topThree = tests.filter((t) => t.place !== null && t.place <= 3).length;
  return (
    <div className="grid max-w-3xl gap-5">
      <BackToKb />
      <div>
        <h1 className="text-2xl font-semibold">Test cases</h1>
        <p className="mt-1 text-graphite-700">
          Cases the workshop keeps with their known answer. Every preview of a change ranks them again, before
          and after, beside the workshop&apos;s concluded cases. Keep one from a concluded case&apos;s page.
        </p>
      </div>
      <FormMessages errors={actionData?.errors} notice={actionData?.notice} />
      <p className="card tabular" data-testid="test-case-summary">
        {tests.length
          ? `With version ${kbVersion}: the known answer ranks first in ${first} of ${tests.length}, in the top three in ${topThree}.`
          : "No test cases yet."}
      </p>
      <ul className="grid gap-3" aria-label="Test cases">
        {tests.map((t) => (
          <li key={t.id} className="card grid gap-1" aria-label={t.name}>
            <p className="font-semibold">{t.name}</p>
            <p className="text-sm text-graphite-700">{`“${t.complaint}”`}</p>
            <p className="text-sm">
              {`Known answer: ${t.answerName} · ranked ${ordinal(t.place)} now · ${t.evidence} pieces of evidence`}
              {t.fromCase ? (
                <>
                  {" · kept from "}
                  <Link className="underline" to={href("/cases/:caseId", { caseId: t.fromCase.id })}>
                    {`case #${t.fromCase.number}`}
                  </Link>
                </>
              ) : null}
            </p>
            {mayEdit ? (
              <Form method="post">
                <input type="hidden" name="intent" value="remove" />
                <input type="hidden" name="id" value={t.id} />
                <button
                  type="submit"
                  className="btn min-h-tap text-sm"
                  disabled={busy}
                  aria-label={`Remove ${t.name}`}
                >
                  Remove
                </button>
              </Form>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
