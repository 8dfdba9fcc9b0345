import { Form, href, Link, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { PriorityMark } from "~/components/priority";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { formatMoney } from "~/domain/format";
import { CAUSE_LEVEL_LABEL } from "~/domain/knowledge";
import { describeStrength, readStrength, STRENGTHS } from "~/domain/link-strength";
import { can } from "~/domain/permissions";
import type { FormErrors } from "~/http/forms";
import { dbContext } from "~/http/context";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { causeWithLinks, setLinkStrength } from "~/kb/cause-links.server";
import type { Impact } from "~/kb/impact";
import { previewChange } from "~/kb/impact.server";
import { getWorkshop } from "~/workshop/settings.server";
import type { Route } from "./+types/cause";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const db = context.get(dbContext);
  return {
    ...(await causeWithLinks(db, member.workshopId, params.causeId)),
    currency: (await getWorkshop(db, member.workshopId)).currency,
    mayEdit: can(member.role, "kb:edit"),
  };
}

// The field of one link's strength: its own name, so the message lands beside that link.
const fieldOf = (link: string, otherId: string) => `strength-${link}-${otherId}`;

const StrengthForm = z.object({
  intent: z.enum(["strength", "preview"]),
  link: z.enum(["symptom", "check"], { message: "Say which kind of link this is." }),
  otherId: z.string().uuid("That link is not in this knowledge base."),
  strength: z.string().max(40, "Say it in a word or a figure."),
});

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  // Another workshop's cause does not exist for this member, whatever their role.
  await causeWithLinks(db, context.get(memberContext).workshopId, params.causeId);
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const parsed = StrengthForm.safeParse(Object.fromEntries(await request.formData()));
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const { intent, link, otherId, strength } = parsed.data;
  const read = readStrength(strength);
  if ("error" in read) return invalid({ [fieldOf(link, otherId)]: [read.error] });
  if (intent === "preview") {
    const change =
      link === "symptom"
        ? { link, symptomId: otherId, causeId: params.causeId, p: read.p }
        : { link, checkId: otherId, causeId: params.causeId, p: read.p };
    const impact = await previewChange(db, member.workshopId, change);
    return { errors: {} as FormErrors, notice: null, preview: { link, otherId, p: read.p, impact } };
  }
  return onForm(async () => {
    const done = await setLinkStrength(db, member, {
      link,
      causeId: params.causeId,
      otherId,
      p: read.p,
    });
    return `“${done.otherName}”: ${describeStrength(done.before)} → ${describeStrength(done.after)}. Knowledge base now at version ${done.kbVersion}.`;
  });
}

export function meta({ loaderData }: Route.MetaArgs) {
  return [
    {
      title: loaderData
        ? `${loaderData.cause.name} — Knowledge base — Ramplight`
        : "Knowledge base — Ramplight",
    },
  ];
}

type Row = { id: string; name: string; p: number; note?: string };
type Preview = { link: "symptom" | "check"; otherId: string; p: number; impact: Impact };

const ordinal = (n: number | null) =>
  n === null
    ? "not ranked"
    : `${n}${n % 10 === 1 && n % 100 !== 11 ? "st" : n % 10 === 2 && n % 100 !== 12 ? "nd" : n % 10 === 3 && n % 100 !== 13 ? "rd" : "th"}`;

/** The change's effect on the workshop's cases with a confirmed cause, before it is saved. */
function ImpactPreview({ impact, p }: { impact: Impact; p: number }) {
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

function LinkList({
  label,
  link,
  rows,
  mayEdit,
  errors,
  empty,
  preview,
}: {
  label: string;
  link: "symptom" | "check";
  rows: Row[];
  mayEdit: boolean;
  errors: FormErrors | undefined;
  empty: string;
  preview: Preview | null;
}) {
  const busy = useNavigation().state === "submitting";
  if (rows.length === 0) return <p className="mt-2 text-graphite-700">{empty}</p>;
  return (
    <ul className="mt-2 grid gap-2" aria-label={label}>
      {rows.map((r) => {
        const field = fieldOf(link, r.id);
        return (
          <li key={r.id} aria-label={r.name} className="rounded-lg border border-rule p-3">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <span className="font-medium">{r.name}</span>
              <span className="tabular" data-strength>
                {describeStrength(r.p)}
              </span>
            </div>
            {r.note ? <p className="meta">{r.note}</p> : null}
            {mayEdit ? (
              <Form method="post" className="mt-2 flex flex-wrap items-end gap-2">
                <input type="hidden" name="link" value={link} />
                <input type="hidden" name="otherId" value={r.id} />
                <label className="flex flex-col text-sm font-medium" htmlFor={field}>
                  {`New strength for ${r.name}`}
                  <input
                    id={field}
                    name="strength"
                    list="strength-words"
                    placeholder="a word, or 40%"
                    className="field mt-1 w-56 max-w-full"
                    {...describedBy(errors, field)}
                  />
                </label>
                <button type="submit" name="intent" value="preview" className="btn" disabled={busy}>
                  Preview the effect
                </button>
                <button type="submit" name="intent" value="strength" className="btn" disabled={busy}>
                  Save strength
                </button>
                <span className="w-full">
                  <FieldError errors={errors} name={field} />
                </span>
              </Form>
            ) : null}
            {preview && preview.link === link && preview.otherId === r.id ? (
              <ImpactPreview impact={preview.impact} p={preview.p} />
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}

export default function CausePage({ loaderData, actionData }: Route.ComponentProps) {
  const { cause, parent, symptoms, checks, currency, mayEdit } = loaderData;
  const errors = actionData?.errors;
  const leaf = cause.level === "failure_mode";
  const facts: [string, string][] = [
    ["For the technician", cause.description],
    ["For the owner", cause.ownerDescription],
    ["If it is left", cause.ifLeft],
    ...(leaf
      ? ([
          ["Base rate", `${cause.baseRate} (relative frequency among workshop visits)`],
          [
            "Typical repair",
            `${cause.repairMinutes ?? 0} min labour, parts about ${formatMoney(cause.partsCost ?? 0, currency)}`,
          ],
        ] as [string, string][])
      : []),
  ];
  return (
    <div className="grid max-w-3xl gap-5">
      <nav aria-label="Where this is" className="flex flex-wrap gap-2 text-sm">
        <Link className="inline-flex min-h-tap items-center text-uv-700 underline" to={href("/kb")}>
          Knowledge base
        </Link>
        {parent ? (
          <>
            <span aria-hidden="true" className="content-center">
              ›
            </span>
            <Link
              className="inline-flex min-h-tap items-center text-uv-700 underline"
              to={href("/kb/causes/:causeId", { causeId: parent.id })}
            >
              {parent.name}
            </Link>
          </>
        ) : null}
      </nav>
      <div>
        <p className="meta">{CAUSE_LEVEL_LABEL[cause.level]}</p>
        <h1 className="flex flex-wrap items-center gap-2 text-2xl font-semibold">
          {cause.name} {cause.priority ? <PriorityMark priority={cause.priority} showDescription /> : null}
        </h1>
      </div>
      <dl className="card grid gap-2">
        {facts
          .filter(([, v]) => v)
          .map(([k, v]) => (
            <div key={k}>
              <dt className="text-sm text-graphite-600">{k}</dt>
              <dd>{v}</dd>
            </div>
          ))}
      </dl>
      <FormMessages errors={errors} notice={actionData?.notice} />
      <section aria-labelledby="shows" className="card">
        <h2 id="shows" className="text-xl font-semibold">
          Symptoms it shows
        </h2>
        <p className="meta">How often this cause shows each symptom, when it is the cause.</p>
        <LinkList
          label="Symptoms it shows"
          link="symptom"
          rows={symptoms.map((s) => ({
            ...s,
            note: s.when.length ? `only ${s.when.join(", ")}` : undefined,
          }))}
          mayEdit={mayEdit}
          errors={errors}
          preview={actionData && "preview" in actionData ? actionData.preview : null}
          empty="No symptom is linked to it."
        />
      </section>
      <section aria-labelledby="found-by" className="card">
        <h2 id="found-by" className="text-xl font-semibold">
          Checks that find it
        </h2>
        <p className="meta">How often each check fails when this is the cause.</p>
        <LinkList
          label="Checks that find it"
          link="check"
          rows={checks.map((k) => ({
            id: k.id,
            name: k.name,
            p: k.pFail,
            note: `${k.minutes} min${k.graded ? " · a measurement graded in four bands, kept in proportion when the strength changes" : ""}`,
          }))}
          mayEdit={mayEdit}
          errors={errors}
          preview={actionData && "preview" in actionData ? actionData.preview : null}
          empty="No check is linked to it."
        />
      </section>
      <section aria-labelledby="words" className="card">
        <h2 id="words" className="text-lg font-semibold">
          The words for strength
        </h2>
        <ul className="tabular mt-1 grid grid-cols-2 gap-1 text-sm sm:grid-cols-3">
          {STRENGTHS.map((s) => (
            <li key={s.word}>
              {s.word}: {Math.round(s.p * 100)}%
            </li>
          ))}
        </ul>
        <datalist id="strength-words">
          {STRENGTHS.map((s) => (
            <option key={s.word} value={s.word} />
          ))}
        </datalist>
      </section>
    </div>
  );
}
