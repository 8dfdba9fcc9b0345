import { redirect } from "react-router";
import { z } from "zod";
import { audit } from "~/audit.server";
import { getAccount } from "~/auth/guards.server";
import { findSessionUser, readSessionToken, revokeAllSessions, revokeSession, sessionCookie } from "~/auth/session.server";
import { dbContext } from "~/context";
import { env, isSecure } from "~/env.server";
import type { Route } from "./+types/sign-out";

const SignOutSchema = z.object({ scope: z.enum(["this", "everywhere"]).default("this") });

export async function action({ request, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  const secure = isSecure(env());
  const parsed = SignOutSchema.safeParse(Object.fromEntries(await request.formData()));
  if (!parsed.success) throw new Response("Unknown sign-out choice.", { status: 400 });
  const token = readSessionToken(request, secure);
  if (token) {
    const account = await getAccount(request, db);
    const session = await findSessionUser(db, token);
    if (parsed.data.scope === "everywhere" && session) await revokeAllSessions(db, session.userId);
    else await revokeSession(db, token);
    if (account) await audit(db, { workshopId: account.workshopId, actorUserId: account.userId, action: `auth.sign_out.${parsed.data.scope}`, entity: "user", entityId: account.userId });
  }
  return redirect("/", { headers: { "Set-Cookie": sessionCookie(null, secure) } });
}

export function loader() {
  throw new Response("Sign out with the button in the menu.", { status: 405 });
}
