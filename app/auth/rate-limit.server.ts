import { isIPv6 } from "node:net";
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
