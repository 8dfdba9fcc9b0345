import { createHash, randomBytes } from "node:crypto";
import { and, desc, eq, gt } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { sessions } from "~/db/schema";

export const SESSION_TTL_MS = 1000 * 60 * 60 * 24 * 14; // two weeks, then sign in again

export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export function sessionCookieName(secure: boolean) {
  // __Host- binds the cookie to this exact origin over HTTPS (no Domain, Path=/).
  return secure ? "__Host-rl_session" : "rl_session";
}

/**
 * The session tokens the request carries under our cookie's name, well-formed ones only, at most
 * three. A browser can hold two cookies of one name (one set for a parent path or domain by
 * something else): a stale or foreign first one must not hide a good second one.
 */
export function readSessionTokens(request: Request, secure: boolean): string[] {
  const name = sessionCookieName(secure);
  const header = request.headers.get("cookie") ?? "";
  const found: string[] = [];
  for (const part of header.split(";")) {
    const [k, ...rest] = part.trim().split("=");
    if (k !== name) continue;
    const v = rest.join("=");
    // 32 random bytes in base64url: anything else is tampered or foreign.
    if (/^[A-Za-z0-9_-]{43}$/.test(v) && !found.includes(v)) found.push(v);
    if (found.length === 3) break;
  }
  return found;
}

export function readSessionToken(request: Request, secure: boolean): string | null {
  return readSessionTokens(request, secure)[0] ?? null;
}

export function sessionCookie(
  token: string | null,
  secure: boolean,
  maxAgeS = SESSION_TTL_MS / 1000,
): string {
  const attrs = [`${sessionCookieName(secure)}=${token ?? ""}`, "Path=/", "HttpOnly", "SameSite=Lax"];
  if (secure) attrs.push("Secure");
  attrs.push(token ? `Max-Age=${Math.floor(maxAgeS)}` : "Max-Age=0");
  return attrs.join("; ");
}

/** A fresh session: 256 random bits, only the hash stored. Called at every sign-in, so ids rotate. */
export async function createSession(db: Db, userId: string, userAgent: string | null, now = new Date()) {
  const token = randomBytes(32).toString("base64url");
  await db.insert(sessions).values({
    tokenHash: hashToken(token),
    userId,
    userAgent: userAgent?.slice(0, 300) ?? null,
    createdAt: now,
    lastSeenAt: now,
    expiresAt: new Date(now.getTime() + SESSION_TTL_MS),
  });
  return token;
}

export async function findSessionUser(db: Db, token: string, now = new Date()) {
  const [row] = await db
    .select({ userId: sessions.userId, expiresAt: sessions.expiresAt })
    .from(sessions)
    .where(and(eq(sessions.tokenHash, hashToken(token)), gt(sessions.expiresAt, now)))
    .limit(1);
  return row ?? null;
}

export async function revokeSession(db: Db, token: string) {
  await db.delete(sessions).where(eq(sessions.tokenHash, hashToken(token)));
}

export async function revokeAllSessions(db: Db, userId: string) {
  await db.delete(sessions).where(eq(sessions.userId, userId));
}

// Only the start is shown: last_seen_at is written when a session opens and not on each request.
/** The person's live sessions, newest first, each marked when it is the one asking. */
export async function listSessions(db: Db, userId: string, currentToken: string, now = new Date()) {
  const current = hashToken(currentToken);
  const rows = await db
    .select({
      id: sessions.tokenHash,
      createdAt: sessions.createdAt,
      userAgent: sessions.userAgent,
    })
    .from(sessions)
    .where(and(eq(sessions.userId, userId), gt(sessions.expiresAt, now)))
    .orderBy(desc(sessions.createdAt));
  // The stored hash names the row in the form: it cannot be turned back into a token.
  return rows.map((r) => ({ ...r, current: r.id === current }));
}

/** Ends one of the person's own sessions by its stored hash; another person's is never touched. */
export async function revokeSessionById(db: Db, userId: string, id: string) {
  const gone = await db
    .delete(sessions)
    .where(and(eq(sessions.tokenHash, id), eq(sessions.userId, userId)))
    .returning({ id: sessions.tokenHash });
  return gone.length > 0;
}
