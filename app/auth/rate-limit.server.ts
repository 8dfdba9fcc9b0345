import { and, count, eq, gt, lt } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { signInAttempts } from "~/db/schema";

/**
 * Counts sign-in attempts per bucket in a sliding window, in the database so that every app
 * server shares the count. Throws a 429 once the bucket is full; the attempt is not recorded then,
 * so a blocked caller does not extend its own block.
 */
export async function limitSignIn(db: Db, bucket: string, limit: number, windowS: number, now = new Date()) {
  const since = new Date(now.getTime() - windowS * 1000);
  const [{ n }] = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.bucket, bucket), gt(signInAttempts.at, since)));
  if (n >= limit) {
    throw new Response("Too many sign-in attempts. Wait a few minutes, then try again.", {
      status: 429,
      headers: { "Retry-After": String(windowS) },
    });
  }
  await db.insert(signInAttempts).values({ bucket, at: now });
  // Old rows are of no use to any window; clear them as we go.
  if (Math.random() < 0.05) await db.delete(signInAttempts).where(lt(signInAttempts.at, since));
}

/**
 * The address a sign-in attempt is counted against. X-Forwarded-For is only believed behind our own
 * proxy (TRUST_PROXY=1): anyone can send it. Otherwise the socket's address, as the production
 * server reports it; where no server reports one (the dev server), every caller shares one bucket,
 * which errs on the side of refusing.
 */
export function clientIp(request: Request, socketAddress: string | null): string {
  if (process.env.TRUST_PROXY === "1") return request.headers.get("x-forwarded-for")?.split(",")[0]?.trim() || "unknown";
  return socketAddress ?? "direct";
}
