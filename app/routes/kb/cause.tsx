import { href, Link } from "react-router";
import { CauseEditor } from "~/components/kb/cause-editor";
import { LinkList, strengthField } from "~/components/kb/link-list";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { PriorityMark } from "~/components/priority";
import { FormMessages } from "~/components/ui/form-errors";
import { formatMoney } from "~/domain/format";
import { CAUSE_LEVEL_LABEL, PRIORITIES } from "~/domain/knowledge";
import { describeStrength, readStrength, STRENGTHS } from "~/domain/link-strength";
import { can } from "~/domain/permissions";
import type { FormErrors } from "~/http/forms";
import { dbContext } from "~/http/context";
import { figureBetween, invalid, onForm, zodErrors } from "~/http/forms.server";
import { causeWithLinks, findCause, setLinkStrength } from "~/kb/cause-links.server";
import { possibleParents, retireCause, updateCause } from "~/kb/cause-edit.server";
import { previewChange } from "~/kb/impact.server";
import { getWorkshop } from "~/workshop/settings.server";
import { itemHistory } from "~/audit/item-history.server";
import { ItemHistory } from "~/components/kb/item-history";
import { treeChoices, treeIntent } from "~/kb/tree-forms.server";
import { AddChildForm, AddLinkForms, MergeForm } from "~/components/kb/tree-forms";
import type { Route } from "./+types/cause";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const db = context.get(dbContext);
  const found = await causeWithLinks(db, member.workshopId, params.causeId);
  const mayEdit = can(member.role, "kb:edit");
  const editable = mayEdit && !found.cause.retiredAt;
  const [workshop, history, parents, choices] = await Promise.all([
    getWorkshop(db, member.workshopId),
    itemHistory(db, member.workshopId, found.cause.id),
    mayEdit ? possibleParents(db, member.workshopId, found.cause.level) : [],
    editable ? treeChoices(db, member.workshopId, found.cause) : null,
  ]);
  const mergedInto = found.cause.mergedIntoId
    ? await findCause(db, member.workshopId, found.cause.mergedIntoId).then((c) => ({
        id: c.id,
        name: c.name,
      }))
    : null;
  return { ...found, currency: workshop.currency, mayEdit, history, parents, choices, mergedInto };
}

// The field of one link's strength: its own name, so the message lands beside that link.
const fieldOf = strengthField;

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
  const cause = await findCause(db, context.get(memberContext).workshopId, params.causeId);
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const form = Object.fromEntries(await request.formData());
  const tree = await treeIntent(db, member, cause, form);
  if (tree) return tree;
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
          {loaderData.mergedInto ? (
            <>
              Merged into{" "}
              <Link
                className="underline"
                to={href("/kb/causes/:causeId", { causeId: loaderData.mergedInto.id })}
              >
                {loaderData.mergedInto.name}
              </Link>
              : no longer ranked. Cases that name it still show it.
            </>
          ) : (
            "Retired: no longer ranked. Cases that name it still show it."
          )}
        </p>
      ) : null}
      <FormMessages errors={errors} notice={actionData?.notice} />
      {mayEdit && !cause.retiredAt ? <CauseEditor cause={cause} parents={parents} errors={errors} /> : null}
      {loaderData.choices ? (
        <>
          <AddChildForm level={cause.level} errors={errors} />
          {leaf ? (
            <AddLinkForms
              symptoms={loaderData.choices.symptoms}
              checks={loaderData.choices.checks}
              errors={errors}
            />
          ) : null}
          <MergeForm level={cause.level} into={loaderData.choices.mergeInto} errors={errors} />
        </>
      ) : null}
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
      <ItemHistory lines={loaderData.history} />
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
