import { ZodError, type ZodType } from "zod";
import { getAccount, asMember, type CurrentMember } from "~/auth/guards.server";
import { can, type Permission } from "~/domain/permissions";
import type { Db } from "~/db/client.server";
import { httpError, refuse } from "~/http/errors.server";
import { MeasureError } from "~/measure";
import { ReasoningError } from "~/reasoning";

/**
 * Runs one JSON API handler (the root middleware has already checked the origin of writes, the
 * body's size, kind and text: app/http/request-guard.server.ts): the member from the session cookie
 * (401 JSON, not a redirect), the permission, and every refusal as `{ error }` with a 4xx.
 * Unexpected failures answer 500 with a plain message and never a stack trace.
 */
export async function api(
  request: Request,
  db: Db,
  permission: Permission | null,
  handler: (member: CurrentMember) => Promise<unknown>,
) {
  try {
    const account = await getAccount(request, db);
    if (!account) refuse(401, "Sign in first.");
    let member: CurrentMember;
    try {
      member = asMember(account);
    } catch {
      refuse(
        403,
        account.memberId
          ? "Your membership of this workshop is suspended."
          : "You are not a member of a workshop yet.",
      );
    }
    if (permission && !can(member.role, permission))
      refuse(403, `Your role (${member.role}) cannot do this.`);
    const body = await handler(member);
    return body instanceof Response ? body : Response.json(body);
  } catch (error) {
    if (error instanceof Response) {
      if (error.headers.get("content-type")?.includes("application/json")) return error;
      return httpError(error.status, (await error.text()) || "Refused.");
    }
    if (error instanceof ZodError)
      return httpError(400, error.issues[0]?.message ?? "The request body is not valid.", {
        issues: error.issues.map((i) => ({ path: i.path.join("."), message: i.message })),
      });
    if (error instanceof ReasoningError || error instanceof MeasureError)
      return httpError(400, error.message, { code: error.code });
    console.error("api error:", error);
    return httpError(500, "Something broke on our side. Nothing was changed.");
  }
}

export async function jsonBody<T>(request: Request, schema: ZodType<T>): Promise<T> {
  let raw: unknown;
  try {
    raw = await request.json();
  } catch {
    refuse(400, "The request body must be JSON.");
  }
  return schema.parse(raw);
}
