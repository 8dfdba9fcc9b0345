import { useMemo } from "react";
import { href, Link } from "react-router";
import { CauseEditor } from "~/components/kb/cause-editor";
import { LinkTable } from "~/components/kb/link-table";
import { StrengthWords } from "~/components/kb/strength-words";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { PriorityMark } from "~/components/priority";
import { FormMessages } from "~/components/ui/form-errors";
import { formatMoney } from "~/domain/format";
import { CAUSE_LEVEL_LABEL, PRIORITIES } from "~/domain/knowledge";
import { can } from "~/domain/permissions";
import { dbContext } from "~/http/context";
import { figureBetween, invalid, onForm, zodErrors } from "~/http/forms.server";
import { causeWithLinks, findCause } from "~/kb/cause-links.server";
import { possibleParents, retireCause, updateCause } from "~/kb/cause-edit.server";
import { type LinkRow, previewIn } from "~/kb/link-rows";
import { answerStrengthForm } from "~/kb/link-strength-form.server";
import { getWorkshop } from "~/workshop/settings.server";
import { itemHistory } from "~/audit/item-history.server";
import { ItemHistory } from "~/components/kb/item-history";
import { treeChoices, treeIntent } from "~/kb/tree-forms.server";
import { AddChildForm, AddLinkForms, MergeForm } from "~/components/kb/tree-forms";
import { describeApplicability, readApplicability } from "~/kb/applicability";
import type { Route } from "./+types/cause";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const db = context.get(dbContext);
  const found = await causeWithLinks(db, member.workshopId, params.causeId);
  const mayEdit = can(member.role, "kb:edit");
  const editable = mayEdit && !found.cause.retiredAt;
  const merged = found.cause.mergedIntoId;
  const [workshop, history, parents, choices, mergedInto] = await Promise.all([
    getWorkshop(db, member.workshopId),
    itemHistory(db, member.workshopId, found.cause.id),
    mayEdit ? possibleParents(db, member.workshopId, found.cause.level) : [],
    editable ? treeChoices(db, member.workshopId, found.cause) : null,
    merged ? findCause(db, member.workshopId, merged).then((c) => ({ id: c.id, name: c.name })) : null,
  ]);
  return {
    ...found,
    currency: workshop.currency,
    units: workshop.units,
    mayEdit,
    history,
    parents,
    choices,
    mergedInto,
  };
}

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
  const data = await request.formData();
  const form = Object.fromEntries(data);
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
    const leaf = cause.level === "failure_mode";
    if (leaf && (fields.baseRate === undefined || fields.priority === undefined))
      return invalid({ baseRate: ["A failure mode needs a base rate and a priority."] });
    const { units } = await getWorkshop(db, member.workshopId);
    const applies = leaf ? readApplicability(data, units, cause.applicability) : null;
    if (applies && !applies.ok) return invalid(applies.errors);
    return onForm(async () => {
      const done = await updateCause(db, member, params.causeId, {
        ...fields,
        ...(applies?.ok ? { applicability: applies.value } : {}),
        parentId: fields.parentId || null,
        repairMinutes: fields.repairMinutes === undefined ? undefined : Math.round(fields.repairMinutes),
      });
      return done.changed.length
        ? `Saved${done.movedUnder ? `, now under “${done.movedUnder}”` : ""}. Knowledge base now at version ${done.kbVersion}.`
        : "Nothing had changed.";
    });
  }
  // Anything else is a link's strength (intents strength and preview), read as on a symptom's page.
  return answerStrengthForm(db, member, form, { causeId: params.causeId });
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
  const rows = useMemo<LinkRow[]>(
    () => [
      ...symptoms.map((s) => ({
        link: "symptom" as const,
        id: s.id,
        name: s.name,
        p: s.p,
        note: s.when.length ? `only ${s.when.join(", ")}` : undefined,
        to: href("/kb/symptoms/:symptomId", { symptomId: s.id }),
      })),
      ...checks.map((k) => ({
        link: "check" as const,
        id: k.id,
        name: k.name,
        p: k.pFail,
        note: `${k.minutes} min${k.graded ? " · a measurement graded in four bands, kept in proportion when the strength changes" : ""}`,
        to: href("/kb/checks/:checkId", { checkId: k.id }),
      })),
    ],
    [symptoms, checks],
  );
  const facts: [string, string][] = [
    ["For the technician", cause.description],
    ["For the owner", cause.ownerDescription],
    ["If it is left", cause.ifLeft],
    ...(leaf
      ? ([
          ["Base rate", `${cause.baseRate} (relative frequency among workshop visits)`],
          ["Applies to", describeApplicability(cause.applicability, loaderData.units)],
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
      {mayEdit && !cause.retiredAt ? (
        <CauseEditor cause={cause} parents={parents} errors={errors} units={loaderData.units} />
      ) : null}
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
      <section aria-labelledby="links" className="card">
        <h2 id="links" className="text-xl font-semibold">
          Its links
        </h2>
        <p className="meta">
          A symptom link says how often this cause shows the symptom; a check link, how often the check fails,
          when this is the cause.
        </p>
        <LinkTable
          rows={rows}
          labelledBy="links"
          showKind
          mayEdit={mayEdit}
          errors={errors}
          preview={previewIn(actionData)}
          empty="Nothing is linked to it."
        />
      </section>
      <ItemHistory lines={loaderData.history} />
      <StrengthWords />
    </div>
  );
}
