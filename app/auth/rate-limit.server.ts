import { isIPv6 } from "node:net";
import { and, count, eq, gt, lt, min } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { signInAttempts } from "~/db/schema";

// Long enough for every window in use (the longest is the code's 15 minutes), so clearing old rows
// never shortens another bucket's window.
const KEEP_MS = 24 * 3600 * 1000;

export type LimitAnswer = { ok: true } | { ok: false; retryAt: Date };

/**
 * Counts sign-in attempts per bucket in a sliding window, in the database so that every app
 * server shares the count. Once the bucket is full the answer says when its oldest attempt leaves
 * the window; the attempt is not recorded then, so a blocked caller does not extend its own block.
 */
export async function countSignIn(
  db: Db,
  bucket: string,
  limit: number,
  windowS: number,
  now = new Date(),
  record = true, // false: only ask whether the bucket is full, counting nothing
): Promise<LimitAnswer> {
  const since = new Date(now.getTime() - windowS * 1000);
  const [{ n, oldest }] = await db
    .select({ n: count(), oldest: min(signInAttempts.at) })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.bucket, bucket), gt(signInAttempts.at, since)));
  if (n >= limit) {
    const first = oldest ? new Date(oldest) : now;
    return { ok: false, retryAt: new Date(first.getTime() + windowS * 1000) };
  }
  if (!record) return { ok: true };
  await db.insert(signInAttempts).values({ bucket, at: now });
  if (Math.random() < 0.05)
    await db.delete(signInAttempts).where(lt(signInAttempts.at, new Date(now.getTime() - KEEP_MS)));
  return { ok: true };
}

/** When to try again, in words a person can act on: the clock time (UTC) and the minutes to wait. */
export function tryAgainAt(retryAt: Date, now = new Date()): string {
  const minutes = Math.max(1, Math.ceil((retryAt.getTime() - now.getTime()) / 60_000));
  const clock = retryAt.toISOString().slice(11, 16);
  return `Try again after ${clock} UTC (in about ${minutes} minute${minutes === 1 ? "" : "s"}).`;
}

/** countSignIn for callers that answer with a status: a full bucket is a 429 with Retry-After. */
export async function limitSignIn(db: Db, bucket: string, limit: number, windowS: number, now = new Date()) {
  const answer = await countSignIn(db, bucket, limit, windowS, now);
  if (!answer.ok) {
    const waitS = Math.max(1, Math.ceil((answer.retryAt.getTime() - now.getTime()) / 1000));
    throw new Response(`Too many sign-in attempts. ${tryAgainAt(answer.retryAt, now)}`, {
      status: 429,
      headers: { "Retry-After": String(waitS), "X-Retry-At": answer.retryAt.toISOString() },
    });
  }
}

/**
 * The bucket a sign-in attempt is counted against. Behind our own proxies (TRUST_PROXY = how many
 * of them) the client is the address the outermost one appended to X-Forwarded-For, counted from
 * the right: entries further left were written by the client and prove nothing. Without a proxy,
 * the socket's address as the production server reports it; where no server reports one (the dev
 * server), every caller shares one bucket, which errs on the side of refusing.
 */
export function clientIp(request: Request, socketAddress: string | null): string {
  const proxies = Number(process.env.TRUST_PROXY ?? 0) || 0;
  if (proxies > 0) {
    const hops = (request.headers.get("x-forwarded-for") ?? "")
      .split(",")
      .map((h) => h.trim())
      .filter(Boolean);
    const client = hops[hops.length - proxies];
    return client ? addressBucket(client) : socketAddress ? addressBucket(socketAddress) : "unknown";
  }
  return socketAddress ? addressBucket(socketAddress) : "direct";
}

/**
 * One bucket per IPv4 address, and per /64 for IPv6: a single IPv6 host usually holds a whole /64
 * (RFC 4291 §2.5.4 interface identifiers) and could otherwise rotate through it. IPv4-mapped IPv6
 * addresses (RFC 4291 §2.5.5.2) count as the IPv4 address.
 */
export function addressBucket(address: string): string {
  const plain = address.replace(/%.*$/, ""); // a zone index names the local interface, not the caller
  const mapped = /^::ffff:(\d{1,3}(?:\.\d{1,3}){3})$/i.exec(plain);
  if (mapped) return mapped[1];
  if (!isIPv6(plain)) return plain;
  const [head, tail] = plain.split("::");
  const groups = (part: string | undefined) =>
    part ? part.split(":").flatMap((g) => (g.includes(".") ? ["0", "0"] : [g])) : [];
  const h = groups(head);
  const t = plain.includes("::") ? groups(tail) : [];
  const full = [...h, ...Array(8 - h.length - t.length).fill("0"), ...t];
  return `${full
    .slice(0, 4)
    .map((g) => parseInt(g, 16).toString(16))
    .join(":")}::/64`;
}
