import { Form, useNavigation } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { ROLE_LABEL, ROLES } from "~/domain/people";
import { dbContext } from "~/http/context";
import { onForm, readForm } from "~/http/forms.server";
import {
  invite,
  listMembers,
  listPendingInvitations,
  revokeInvitation,
  updateMember,
} from "~/workshop/members.server";
import type { Route } from "./+types/members";

const Role = z.enum(ROLES, { message: "Choose a role from the list" });
const ActionSchema = z.discriminatedUnion("intent", [
  z.object({
    intent: z.literal("invite"),
    target: z.string().trim().min(1, "Enter an e-mail address or a GitHub login").max(120),
    role: Role,
  }),
  z.object({ intent: z.literal("role"), memberId: z.uuid({ message: "Unknown member" }), role: Role }),
  z.object({ intent: z.enum(["suspend", "reactivate"]), memberId: z.uuid({ message: "Unknown member" }) }),
  z.object({ intent: z.literal("revoke-invite"), invitationId: z.uuid({ message: "Unknown invitation" }) }),
]);

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "member:manage");
  const db = context.get(dbContext);
  const [people, pending] = await Promise.all([
    listMembers(db, member.workshopId),
    listPendingInvitations(db, member.workshopId),
  ]);
  return { people, pending, selfId: member.memberId };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "member:manage");
  const db = context.get(dbContext);
  const form = await readForm(request, ActionSchema);
  if (!form.ok) return form.answer;
  const input = form.value;
  switch (input.intent) {
    case "invite":
      return onForm(() => invite(db, member, input), "target");
    case "role":
      return onForm(
        async () => (await updateMember(db, member, input.memberId, { role: input.role }), "Role changed."),
      );
    case "suspend":
    case "reactivate":
      return onForm(async () => {
        await updateMember(db, member, input.memberId, {
          status: input.intent === "suspend" ? "suspended" : "active",
        });
        return input.intent === "suspend"
          ? "Member suspended; they can no longer open the workshop."
          : "Member reactivated.";
      });
    case "revoke-invite":
      return onForm(
        async () => (await revokeInvitation(db, member, input.invitationId), "Invitation withdrawn."),
      );
  }
}

export function meta() {
  return [{ title: "Members — Ramplight" }];
}

const control = "min-h-tap rounded-lg border border-rule bg-card px-3 text-base";
const button = "min-h-tap rounded-lg border border-rule px-4 font-medium hover:bg-paper";

export default function Members({ loaderData, actionData }: Route.ComponentProps) {
  const busy = useNavigation().state !== "idle";
  return (
    <div className="grid gap-8">
      <div>
        <h1 className="text-2xl font-semibold">Members</h1>
        <FormMessages errors={actionData?.errors} notice={actionData?.notice} className="mt-3" />
      </div>
      <section aria-labelledby="invite">
        <h2 id="invite" className="text-xl font-semibold">
          Invite someone
        </h2>
        <Form method="post" className="mt-3 flex flex-wrap items-end gap-3">
          <input type="hidden" name="intent" value="invite" />
          <label className="flex flex-col text-sm font-medium">
            E-mail or GitHub login
            <input
              name="target"
              className={`${control} mt-1 w-72 max-w-full`}
              autoComplete="off"
              {...describedBy(actionData?.errors, "target")}
            />
            <FieldError errors={actionData?.errors} name="target" />
          </label>
          <div className="flex flex-col text-sm font-medium">
            <label htmlFor="invite-role">Role</label>
            <select id="invite-role" name="role" defaultValue="technician" className={`${control} mt-1`}>
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABEL[r]}
                </option>
              ))}
            </select>
          </div>
          <button
            type="submit"
            disabled={busy}
            className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
          >
            Send invitation
          </button>
        </Form>
      </section>
      <section aria-labelledby="people">
        <h2 id="people" className="text-xl font-semibold">
          People in this workshop
        </h2>
        <ul className="mt-3 grid gap-3">
          {loaderData.people.map((p) => (
            <li
              key={p.id}
              className="flex flex-wrap items-center gap-3 rounded-card border border-rule bg-card p-3"
              aria-label={p.name}
            >
              <div className="min-w-48 flex-1">
                <p className="font-semibold">
                  {p.name} {p.status === "suspended" ? <span className="text-stop">(suspended)</span> : null}
                </p>
                <p className="text-sm text-graphite-600">
                  {[p.login && `@${p.login}`, p.email].filter(Boolean).join(" · ")}
                </p>
              </div>
              <Form method="post" className="flex items-center gap-2">
                <input type="hidden" name="intent" value="role" />
                <input type="hidden" name="memberId" value={p.id} />
                <select
                  name="role"
                  defaultValue={p.role}
                  aria-label={`Role of ${p.name}`}
                  className={control}
                >
                  {ROLES.map((r) => (
                    <option key={r} value={r}>
                      {ROLE_LABEL[r]}
                    </option>
                  ))}
                </select>
                <button type="submit" className={button}>
                  Change role
                </button>
              </Form>
              {p.id !== loaderData.selfId ? (
                <Form method="post">
                  <input
                    type="hidden"
                    name="intent"
                    value={p.status === "active" ? "suspend" : "reactivate"}
                  />
                  <input type="hidden" name="memberId" value={p.id} />
                  <button type="submit" className={button}>
                    {p.status === "active" ? "Suspend" : "Reactivate"}
                  </button>
                </Form>
              ) : null}
            </li>
          ))}
        </ul>
      </section>
      {loaderData.pending.length ? (
        <section aria-labelledby="pending">
          <h2 id="pending" className="text-xl font-semibold">
            Waiting to join
          </h2>
          <ul className="mt-3 grid gap-2">
            {loaderData.pending.map((i) => (
              <li
                key={i.id}
                className="flex items-center justify-between gap-3 rounded-lg border border-rule bg-card p-3"
              >
                <span>
                  {i.email ?? `@${i.githubLogin}`} as {i.role}
                </span>
                <Form method="post">
                  <input type="hidden" name="intent" value="revoke-invite" />
                  <input type="hidden" name="invitationId" value={i.id} />
                  <button type="submit" className={button}>
                    Withdraw
                  </button>
                </Form>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
