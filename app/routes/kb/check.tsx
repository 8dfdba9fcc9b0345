import { href, Link } from "react-router";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { itemHistory } from "~/audit/item-history.server";
import { Cautions } from "~/components/case/cautions";
import { CheckEditor } from "~/components/kb/check-editor";
import { BackToKb } from "~/components/kb/editor";
import { ItemHistory } from "~/components/kb/item-history";
import { FormMessages } from "~/components/ui/form-errors";
import { CHECK_ACCESS_LABEL } from "~/domain/knowledge";
import { describeStrength } from "~/domain/link-strength";
import { can } from "~/domain/permissions";
import { dbContext } from "~/http/context";
import { onForm } from "~/http/forms.server";
import { checkWithLinks, updateCheck } from "~/kb/check-edit.server";
import { readCheckForm } from "~/kb/check-form.server";
import type { Route } from "./+types/check";

export async function loader({ params, context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  const db = context.get(dbContext);
  const found = await checkWithLinks(db, member.workshopId, params.checkId);
  return {
    ...found,
    history: await itemHistory(db, member.workshopId, found.check.id),
    mayEdit: can(member.role, "kb:edit"),
  };
}

export async function action({ request, params, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  // Another workshop's check does not exist for this member, whatever their role.
  const { check } = await checkWithLinks(db, context.get(memberContext).workshopId, params.checkId);
  const member = requirePermission(context.get(memberContext), "kb:edit");
  const read = readCheckForm(await request.formData(), check.resultKind === "measurement");
  if (!read.ok) return read.answer;
  const edit = read.edit;
  return onForm(async () => {
    const done = await updateCheck(db, member, params.checkId, edit);
    return done.changed.length
      ? `Saved. Knowledge base now at version ${done.kbVersion}.`
      : "Nothing had changed.";
  });
}

export function meta({ loaderData }: Route.MetaArgs) {
  return [
    {
      title: loaderData
        ? `${loaderData.check.name} — Knowledge base — Ramplight`
        : "Knowledge base — Ramplight",
    },
  ];
}

export default function CheckPage({ loaderData, actionData }: Route.ComponentProps) {
  const { check, finds, mayEdit } = loaderData;
  const errors = actionData?.errors;
  return (
    <div className="grid max-w-3xl gap-5">
      <BackToKb />
      <div>
        <p className="meta">Check</p>
        <h1 className="text-2xl font-semibold">{check.name}</h1>
        <p className="meta tabular">{`${check.minutes} min · ${check.skill} · ${check.access.map((a) => CHECK_ACCESS_LABEL[a as keyof typeof CHECK_ACCESS_LABEL] ?? a).join(", ") || "no special access"}`}</p>
      </div>
      <Cautions cautions={check.cautions} />
      <section aria-labelledby="steps" className="card">
        <h2 id="steps" className="text-xl font-semibold">
          How to do it
        </h2>
        <ol className="mt-2 list-decimal pl-6">
          {check.instructions.map((l, i) => (
            <li key={i}>{l}</li>
          ))}
        </ol>
        {check.rule ? <p className="mt-2 font-mono text-sm">{`Passes when: ${check.rule}`}</p> : null}
        {check.failMeans ? <p className="meta mt-1">{`A fail means: ${check.failMeans}`}</p> : null}
      </section>
      <section aria-labelledby="finds" className="card">
        <h2 id="finds" className="text-xl font-semibold">
          Causes it finds
        </h2>
        <ul className="mt-2 grid gap-1">
          {finds.map((f) => (
            <li key={f.id} className="flex flex-wrap justify-between gap-2">
              <Link className="underline" to={href("/kb/causes/:causeId", { causeId: f.id })}>
                {f.name}
              </Link>
              <span className="tabular">{`fails ${describeStrength(f.pFail)}`}</span>
            </li>
          ))}
        </ul>
      </section>
      <FormMessages errors={errors} notice={actionData?.notice} />
      {mayEdit ? <CheckEditor check={check} errors={errors} /> : null}
      <ItemHistory lines={loaderData.history} />
    </div>
  );
}
