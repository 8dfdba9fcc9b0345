import { Form, href, Link, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { ImpactPreview } from "~/components/kb/impact-preview";
import { PrioritySelect } from "~/components/kb/editor";
import { formatDate } from "~/domain/format";
import { PRIORITIES, SYMPTOM_KIND_LABEL, SYMPTOM_KINDS } from "~/domain/knowledge";
import { describeStrength, readStrength } from "~/domain/link-strength";
import { can } from "~/domain/permissions";
import { PROPOSAL_KINDS, PROPOSAL_STATE_LABEL } from "~/domain/proposals";
import { dbContext } from "~/http/context";
import { invalid, onForm, zodErrors } from "~/http/forms.server";
import { listProposals, previewProposal, propose, reviewProposal } from "~/kb/proposals.server";
import type { FormErrors } from "~/http/forms";
import type { Route } from "./+types/proposals";

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "kb:read");
  return {
    proposals: await listProposals(context.get(dbContext), member.workshopId),
    mayReview: can(member.role, "kb:approve"),
  };
}

const uuid = (message: string) => z.string().uuid(message);
const ProposeForm = z
  .object({
    intent: z.literal("propose"),
    caseId: uuid("Propose from a case."),
    kind: z.enum(PROPOSAL_KINDS, { message: "Say what the knowledge base is missing." }),
    symptomId: uuid("Choose one of the case's symptoms.").optional(),
    symptomName: z.string().trim().max(200, "Name it in at most 200 characters.").optional(),
    causeId: uuid("Choose one of the likely causes."),
    causeName: z.string().trim().max(200, "Name it in at most 200 characters.").optional(),
    strength: z.string().max(40, "Say it in a word or a figure."),
    note: z.string().trim().min(5, "Say in a sentence what you saw.").max(2000),
  })
  .refine((f) => f.kind !== "cause" || (f.causeName?.length ?? 0) >= 3, {
    path: ["causeName"],
    message: "Name the missing cause as a technician would say it.",
  })
  .refine((f) => f.kind !== "symptom" || (f.symptomName?.length ?? 0) >= 3, {
    path: ["symptomName"],
    message: "Name the symptom as a technician would say it.",
  })
  .refine((f) => f.kind === "symptom" || f.symptomId, {
    path: ["symptomId"],
    message: "Choose one of the case's symptoms.",
  });
const ReviewForm = z.object({
  intent: z.enum(["accept", "reject"]),
  id: uuid("No such proposal."),
  comment: z.string().trim().max(1000),
  priority: z.enum(PRIORITIES).optional(),
  symptomKind: z.enum(SYMPTOM_KINDS).optional(),
});

export async function action({ request, context }: Route.ActionArgs) {
  const member = context.get(memberContext);
  const db = context.get(dbContext);
  const form = Object.fromEntries(await request.formData());
  if (form.intent === "propose") {
    requirePermission(member, "kb:propose");
    const parsed = ProposeForm.safeParse(form);
    if (!parsed.success) return invalid(zodErrors(parsed.error));
    const strength = readStrength(parsed.data.strength);
    if ("error" in strength) return invalid({ strength: [strength.error] });
    const { intent: _i, strength: _s, ...input } = parsed.data;
    return onForm(async () => {
      await propose(db, member, { ...input, p: strength.p });
      return "Proposal sent: a senior sees it under Knowledge base → Proposals.";
    });
  }
  requirePermission(member, "kb:approve");
  if (form.intent === "preview") {
    const id = z.string().uuid().safeParse(form.id);
    if (!id.success) return invalid({ form: ["No such proposal."] });
    const impact = await previewProposal(db, member.workshopId, id.data);
    return { errors: {} as FormErrors, notice: null, preview: { id: id.data, impact } };
  }
  const parsed = ReviewForm.safeParse(form);
  if (!parsed.success) return invalid(zodErrors(parsed.error));
  const { intent, id, comment, priority, symptomKind } = parsed.data;
  if (intent === "reject" && comment.length < 3)
    return invalid({ [`comment-${id}`]: ["Say why, so the technician learns from it."] });
  return onForm(async () => {
    const done = await reviewProposal(db, member, id, { decision: intent, comment, priority, symptomKind });
    return done.decision === "accept"
      ? `Accepted: “${done.cause}” now shows as “${done.symptom}”. The knowledge base has a new version.`
      : "Rejected; the technician sees your comment.";
  });
}

export function meta() {
  return [{ title: "Proposals — Knowledge base — Ramplight" }];
}

export default function Proposals({ loaderData, actionData }: Route.ComponentProps) {
  const { proposals, mayReview } = loaderData;
  const errors = actionData?.errors;
  const preview = actionData && "preview" in actionData ? actionData.preview : null;
  const busy = useNavigation().state === "submitting";
  return (
    <div className="grid max-w-3xl gap-4">
      <p>
        <Link className="inline-flex min-h-tap items-center text-uv-700 underline" to={href("/kb")}>
          Knowledge base
        </Link>
      </p>
      <h1 className="text-2xl font-semibold">Proposals</h1>
      <p className="text-graphite-700">
        What technicians met on cases and the knowledge base did not have. Accepting makes the change at once,
        with a new knowledge-base version.
      </p>
      <FormMessages errors={errors} notice={actionData?.notice} />
      {proposals.length === 0 ? <p>No proposals yet.</p> : null}
      <ol className="grid gap-3" aria-label="Proposals, open ones first">
        {proposals.map((p) => {
          const comment = `comment-${p.id}`;
          const title =
            p.kind === "cause"
              ? `A new cause “${p.causeName}” under ${p.targetName}`
              : p.kind === "symptom"
                ? `A new symptom “${p.symptomName}”, shown by “${p.targetName}”`
                : `“${p.targetName}” shows as “${p.symptomName}”`;
          return (
            <li key={p.id} aria-label={title} className="card">
              <p className="meta">
                {p.proposedBy ?? "Someone"} · {formatDate(p.createdAt)}
                {p.caseId ? (
                  <>
                    {" · "}
                    <Link className="underline" to={href("/cases/:caseId", { caseId: p.caseId })}>
                      case #{p.caseNumber}
                    </Link>
                  </>
                ) : null}{" "}
                · <strong>{PROPOSAL_STATE_LABEL[p.state]}</strong>
              </p>
              <h2 className="mt-1 text-lg font-semibold">{title}</h2>
              <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
                <dt className="text-graphite-600">Now</dt>
                <dd data-before>
                  {p.kind !== "link"
                    ? "not in the knowledge base"
                    : p.currentP === null
                      ? `“${p.symptomName}” does not point to it`
                      : describeStrength(p.currentP)}
                </dd>
                <dt className="text-graphite-600">Proposed</dt>
                <dd
                  data-after
                >{`${p.kind === "cause" ? `shown as “${p.symptomName}” ` : ""}${describeStrength(p.p)}`}</dd>
                <dt className="text-graphite-600">Why</dt>
                <dd>{p.note}</dd>
                {p.reviewComment ? (
                  <>
                    <dt className="text-graphite-600">Senior</dt>
                    <dd>{p.reviewComment}</dd>
                  </>
                ) : null}
              </dl>
              {mayReview && p.state === "open" ? (
                <Form method="post" className="mt-3 grid gap-2">
                  <input type="hidden" name="id" value={p.id} />
                  <label className="grid gap-1 text-sm font-medium" htmlFor={comment}>
                    Comment for the technician
                    <input id={comment} name="comment" className="field" {...describedBy(errors, comment)} />
                    <FieldError errors={errors} name={comment} />
                  </label>
                  {p.kind === "cause" ? (
                    <PrioritySelect id={`priority-${p.id}`} name="priority" value="soon" />
                  ) : null}
                  {p.kind === "symptom" ? (
                    <label className="grid gap-1 text-sm font-medium" htmlFor={`symptom-kind-${p.id}`}>
                      Kind of symptom
                      <select
                        id={`symptom-kind-${p.id}`}
                        name="symptomKind"
                        defaultValue="noise"
                        className="field"
                      >
                        {SYMPTOM_KINDS.map((k) => (
                          <option key={k} value={k}>
                            {SYMPTOM_KIND_LABEL[k]}
                          </option>
                        ))}
                      </select>
                    </label>
                  ) : null}
                  <div className="flex flex-wrap gap-2">
                    <button
                      type="submit"
                      name="intent"
                      value="accept"
                      className="btn-primary"
                      disabled={busy}
                    >
                      Accept
                    </button>
                    <button type="submit" name="intent" value="reject" className="btn" disabled={busy}>
                      Reject
                    </button>
                    <button type="submit" name="intent" value="preview" className="btn" disabled={busy}>
                      Preview the effect
                    </button>
                  </div>
                  {preview?.id === p.id ? (
                    <ImpactPreview impact={preview.impact} p={p.p} saveWord="Accept" />
                  ) : null}
                </Form>
              ) : null}
            </li>
          );
        })}
      </ol>
    </div>
  );
}
