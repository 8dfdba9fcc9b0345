import { data, Form, redirect } from "react-router";
import { z } from "zod";
import { audit } from "~/audit/write.server";
import { getSession, memberContext } from "~/auth/guards.server";
import { listSessions, revokeAllSessions, revokeSessionById, sessionCookie } from "~/auth/session.server";
import { FormMessages } from "~/components/ui/form-errors";
import { env, isSecure } from "~/config/env.server";
import { dbContext } from "~/http/context";
import { describeDevice } from "~/auth/device";
import type { Route } from "./+types/sessions";

export async function loader({ request, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  const member = context.get(memberContext);
  const session = await getSession(request, db);
  return { sessions: await listSessions(db, member.userId, session?.token ?? "") };
}

const Schema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("sign-out-one"), id: z.string().regex(/^[0-9a-f]{64}$/) }),
  // Named twice on purpose: a stray post of the intent alone must not sign a person out everywhere.
  z.object({ intent: z.literal("sign-out-everywhere"), confirm: z.literal("everywhere") }),
]);

export async function action({ request, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  const member = context.get(memberContext);
  const parsed = Schema.safeParse(Object.fromEntries(await request.formData()));
  if (!parsed.success)
    return data(
      { errors: { form: ["Choose a device from the list, or sign out everywhere."] } },
      { status: 400 },
    );
  const session = await getSession(request, db);
  const current = (await listSessions(db, member.userId, session?.token ?? "")).find((s) => s.current);
  const signOutHere = { headers: { "Set-Cookie": sessionCookie(null, isSecure(env())) } };
  if (parsed.data.intent === "sign-out-everywhere") {
    await revokeAllSessions(db, member.userId);
  } else if (!(await revokeSessionById(db, member.userId, parsed.data.id))) {
    return data({ errors: { form: ["That device is signed out already."] } }, { status: 404 });
  }
  const scope = parsed.data.intent === "sign-out-everywhere" ? "everywhere" : "this";
  await audit(db, {
    workshopId: member.workshopId,
    actorUserId: member.userId,
    action: `auth.sign_out.${scope}`,
    entity: "user",
    entityId: member.userId,
  });
  if (scope === "everywhere" || (parsed.data.intent === "sign-out-one" && parsed.data.id === current?.id))
    throw redirect("/", signOutHere);
  return { errors: {}, notice: "That device is signed out." };
}

export function meta() {
  return [{ title: "Signed-in devices — Ramplight" }];
}

const when = (d: Date | string) => new Date(d).toISOString().slice(0, 16).replace("T", " ") + " UTC";

export default function Sessions({ loaderData, actionData }: Route.ComponentProps) {
  return (
    <main className="mx-auto max-w-2xl px-4 py-6">
      <h1 className="text-2xl font-semibold">Signed-in devices</h1>
      <p className="mt-2 text-graphite-700">
        Where you are signed in now. Sign out a device you do not know.
      </p>
      <FormMessages
        errors={actionData?.errors}
        notice={actionData && "notice" in actionData ? actionData.notice : null}
      />
      <ul className="mt-4 grid gap-3">
        {loaderData.sessions.map((s) => (
          <li
            key={s.id}
            aria-label={describeDevice(s.userAgent)}
            className="rounded-lg border border-rule bg-card p-4"
          >
            <p className="font-medium break-words">
              {describeDevice(s.userAgent)}
              {s.current ? " — this device" : ""}
            </p>
            <p className="text-sm text-graphite-700">Signed in {when(s.createdAt)}</p>
            <Form method="post" className="mt-2">
              <input type="hidden" name="intent" value="sign-out-one" />
              <input type="hidden" name="id" value={s.id} />
              <button
                type="submit"
                className="min-h-tap rounded-lg border border-rule px-3 font-medium hover:bg-paper"
              >
                Sign out this one
              </button>
            </Form>
          </li>
        ))}
      </ul>
      <Form method="post" className="mt-6">
        <input type="hidden" name="intent" value="sign-out-everywhere" />
        <input type="hidden" name="confirm" value="everywhere" />
        <button
          type="submit"
          className="min-h-tap rounded-lg border-2 border-stop bg-card px-4 font-semibold hover:bg-paper"
        >
          Sign out everywhere
        </button>
      </Form>
    </main>
  );
}
