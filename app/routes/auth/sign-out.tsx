import { href, redirect } from "react-router";
import { z } from "zod";
import { audit } from "~/audit/write.server";
import { getSession } from "~/auth/guards.server";
import { revokeAllSessions, revokeSession, sessionCookie } from "~/auth/session.server";
import { dbContext } from "~/http/context";
import { env, isSecure } from "~/config/env.server";
import type { Route } from "./+types/sign-out";

const SignOutSchema = z.object({ scope: z.enum(["this", "everywhere"]).default("this") });

export async function action({ request, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  const secure = isSecure(env());
  const parsed = SignOutSchema.safeParse(Object.fromEntries(await request.formData()));
  if (!parsed.success) throw new Response("Unknown sign-out choice.", { status: 400 });
  const session = await getSession(request, db);
  if (session) {
    const { account, token } = session;
    if (parsed.data.scope === "everywhere") await revokeAllSessions(db, account.userId);
    else await revokeSession(db, token);
    await audit(db, {
      workshopId: account.workshopId,
      actorUserId: account.userId,
      action: `auth.sign_out.${parsed.data.scope}`,
      entity: "user",
      entityId: account.userId,
    });
  }
  return redirect(href("/"), { headers: { "Set-Cookie": sessionCookie(null, secure) } });
}

export function loader() {
  throw new Response("Sign out with the button in the menu.", { status: 405 });
}
