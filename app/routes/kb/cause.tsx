import { Form, href, Link, useNavigation } from "react-router";
import { Fold } from "~/components/fold";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { PriorityMark } from "~/components/priority";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { formatMoney } from "~/domain/format";
import { CAUSE_LEVEL_LABEL, PRIORITIES, PRIORITY_COPY, SYSTEM_LABEL } from "~/domain/knowledge";
import { describeStrength, readStrength, STRENGTHS } from "~/domain/link-strength";
import { can } from "~/domain/permissions";
import type { FormErrors } from "~/http/forms";
import { dbContext } from "~/http/context";
import { figureBetween, invalid, onForm, zodErrors } from "~/http/forms.server";
import { causeWithLinks, setLinkStrength } from "~/kb/cause-links.server";
import { possibleParents, retireCause, updateCause } from "~/kb/cause-edit.server";
import type { Impact } from "~/kb/impact";
import { previewChange } from "~/kb/impact.server";
import { getWorkshop } from "~/workshop/settings.server";
import type { Route } from "./+types/cause";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const db = context.get(dbContext);
  const found = await causeWithLinks(db, member.workshopId, params.causeId);
  const mayEdit = can(member.role, "kb:edit");
  return {
    ...found,
    currency: (await getWorkshop(db, member.workshopId)).currency,
    mayEdit,
    parents: mayEdit ? await possibleParents(db, member.workshopId, found.cause.level) : [],
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

const number = figureBetween;
const EditForm = z.object({
  intent: z.literal("edit"),
  name: z.string().trim().min(3, "Name it in at least 3 characters.").max(200),
  parentId: z.string().optional(),
  description: z.string().trim().max(2000),
  ownerDescription: z.string().trim().max(1000),
  ifLeft: z.string().trim().max(1000),
  baseRate: number("A base rate is a number above 0, such as 2 or 0.5.", 0.0001, 1000).optional(),
  repairMinutes: number("Repair minutes are a whole number from 0 to 10,000.", 0, 10_000).optional(),
  partsCost: number("The parts cost is a number, such as 110 or 1,250.", 0, 1_000_000).optional(),
  priority: z.enum(PRIORITIES, { message: "Choose a priority." }).optional(),
});

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  // Another workshop's cause does not exist for this member, whatever their role.
  const { cause } = await causeWithLinks(db, context.get(memberContext).workshopId, params.causeId);
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const form = Object.fromEntries(await request.formData());
  if (form.intent === "retire") {
    if (form.confirm !== "yes") return invalid({ confirm: ["Tick the box to say you mean to retire it."] });
    return onForm(async () => {
      const done = await retireCause(db, member, params.causeId);
      return `“${done.name}” is retired: it is no longer ranked. Cases that name it still show it.`;
    });
  }
  if (form.intent === "edit") {
    const edit = EditForm.safeParse(form);
    if (!edit.success) return invalid(zodErrors(edit.error));
    const { intent: _i, ...fields } = edit.data;
    if (cause.level === "failure_mode" && (fields.baseRate === undefined || fields.priority === undefined))
      return invalid({ baseRate: ["A failure mode needs a base rate and a priority."] });
    return onForm(async () => {
      const done = await updateCause(db, member, params.causeId, {
        ...fields,
        parentId: fields.parentId || null,
        repairMinutes: fields.repairMinutes === undefined ? undefined : Math.round(fields.repairMinutes),
      });
      return done.changed.length
        ? `Saved${done.movedUnder ? `, now under “${done.movedUnder}”` : ""}. Knowledge base now at version ${done.kbVersion}.`
        : "Nothing had changed.";
    });
  }
  const parsed = StrengthForm.safeParse(form);
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
              {link === "check" ? (
                <Link className="font-medium underline" to={href("/kb/checks/:checkId", { checkId: r.id })}>
                  {r.name}
                </Link>
              ) : (
                <span className="font-medium">{r.name}</span>
              )}
              <span className="tabular" data-strength>
                {describeStrength(r.p)}
              </span>
            </div>
            {r.note ? <p className="meta">{r.note}</p> : null}
            {mayEdit ? (
              <Form method="post" className="mt-2 grid gap-1">
                <input type="hidden" name="link" value={link} />
                <input type="hidden" name="otherId" value={r.id} />
                <label className="text-sm font-medium" htmlFor={field}>
                  {`New strength for ${r.name}`}
                </label>
                <div className="flex flex-wrap items-center gap-2">
                  <input
                    id={field}
                    name="strength"
                    list="strength-words"
                    placeholder="a word, or 40%"
                    className="field w-44 max-w-full"
                    {...describedBy(errors, field)}
                  />
                  <button type="submit" name="intent" value="preview" className="btn" disabled={busy}>
                    Preview the effect
                  </button>
                  <button type="submit" name="intent" value="strength" className="btn" disabled={busy}>
                    Save strength
                  </button>
                </div>
                <FieldError errors={errors} name={field} />
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
  const { cause, parent, symptoms, checks, currency, mayEdit, parents } = loaderData;
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
      {cause.retiredAt ? (
        <p className="rounded-lg border-2 border-rule bg-card p-3 font-medium">
          Retired: no longer ranked. Cases that name it still show it.
        </p>
      ) : null}
      <FormMessages errors={errors} notice={actionData?.notice} />
      {mayEdit && !cause.retiredAt ? <CauseEditor cause={cause} parents={parents} errors={errors} /> : null}
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

type CauseRow = Route.ComponentProps["loaderData"]["cause"];
type Parent = Route.ComponentProps["loaderData"]["parents"][number];

/** A senior's editor of the cause's words, figures and place; folded, so the page reads first. */
function CauseEditor({
  cause,
  parents,
  errors,
}: {
  cause: CauseRow;
  parents: Parent[];
  errors: FormErrors | undefined;
}) {
  const busy = useNavigation().state === "submitting";
  const leaf = cause.level === "failure_mode";
  const text = (name: "name" | "description" | "ownerDescription" | "ifLeft", label: string, rows = 0) => (
    <label className="grid gap-1 text-sm font-medium" htmlFor={`edit-${name}`}>
      {label}
      {rows ? (
        <textarea
          id={`edit-${name}`}
          name={name}
          rows={rows}
          defaultValue={cause[name]}
          className="field py-2"
          {...describedBy(errors, name)}
        />
      ) : (
        <input
          id={`edit-${name}`}
          name={name}
          defaultValue={cause[name]}
          className="field"
          {...describedBy(errors, name)}
        />
      )}
      <FieldError errors={errors} name={name} />
    </label>
  );
  const figure = (name: "baseRate" | "repairMinutes" | "partsCost", label: string) => (
    <label className="grid gap-1 text-sm font-medium" htmlFor={`edit-${name}`}>
      {label}
      <input
        id={`edit-${name}`}
        name={name}
        inputMode="decimal"
        defaultValue={cause[name] ?? ""}
        className="field"
        {...describedBy(errors, name)}
      />
      <FieldError errors={errors} name={name} />
    </label>
  );
  return (
    <section aria-labelledby="edit" className="rounded-card border border-rule bg-card p-4">
      <Fold
        summaryClassName="min-h-tap cursor-pointer content-center font-semibold"
        summary={<span id="edit">Edit this cause</span>}
      >
        <Form method="post" className="mt-2 grid gap-3">
          {text("name", "Name")}
          {cause.level !== "system" ? (
            <label className="grid gap-1 text-sm font-medium" htmlFor="edit-parentId">
              Belongs under
              <select
                id="edit-parentId"
                name="parentId"
                defaultValue={cause.parentId ?? ""}
                className="field"
                {...describedBy(errors, "parentId")}
              >
                {parents.map((p) => (
                  <option key={p.id} value={p.id}>
                    {`${SYSTEM_LABEL[p.system as keyof typeof SYSTEM_LABEL] ?? p.system} › ${p.name}`}
                  </option>
                ))}
              </select>
              <FieldError errors={errors} name="parentId" />
            </label>
          ) : null}
          {text("description", "For the technician", 3)}
          {text("ownerDescription", "For the owner, in plain words", 2)}
          {text("ifLeft", "If it is left", 2)}
          {leaf ? (
            <div className="grid gap-3 sm:grid-cols-2">
              {figure("baseRate", "Base rate (relative frequency)")}
              {figure("repairMinutes", "Repair, minutes of labour")}
              {figure("partsCost", "Parts, typical cost")}
              <label className="grid gap-1 text-sm font-medium" htmlFor="edit-priority">
                Priority for the owner
                <select
                  id="edit-priority"
                  name="priority"
                  defaultValue={cause.priority ?? "soon"}
                  className="field"
                >
                  {PRIORITIES.map((x) => (
                    <option key={x} value={x}>
                      {PRIORITY_COPY[x].label}
                    </option>
                  ))}
                </select>
              </label>
            </div>
          ) : null}
          <div className="flex flex-wrap gap-2">
            <button type="submit" name="intent" value="edit" className="btn-primary" disabled={busy}>
              Save the cause
            </button>
          </div>
        </Form>
        <Form method="post" className="mt-4 border-t border-rule pt-3">
          <p className="text-sm text-graphite-700">
            Retiring takes it out of every ranking from the next version on; cases that name it keep showing
            it.
          </p>
          <label
            className="mt-2 flex min-h-tap items-center gap-2 text-sm font-medium"
            htmlFor="retire-confirm"
          >
            <input
              id="retire-confirm"
              type="checkbox"
              name="confirm"
              value="yes"
              {...describedBy(errors, "confirm")}
            />
            Yes, retire it
          </label>
          <FieldError errors={errors} name="confirm" />
          <button type="submit" name="intent" value="retire" className="btn mt-2" disabled={busy}>
            Retire this cause
          </button>
        </Form>
      </Fold>
    </section>
  );
}
