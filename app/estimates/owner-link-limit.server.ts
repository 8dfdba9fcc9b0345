import type { Db } from "~/db/client.server";
import { clientIp, countSignIn, tryAgainAt } from "~/auth/rate-limit.server";
import { httpError, refusalMessage } from "~/http/errors.server";

// A link's token is 256 random bits, so guessing one is hopeless; the limit keeps a guesser from
// hammering the database and says so. Only dead links count, from one client address: 30 in
// 15 minutes is far beyond an owner retyping a link (common practice, no published source).
export const OWNER_LINK_MISSES = 30;
export const OWNER_LINK_WINDOW_S = 15 * 60;

/**
 * Runs an owner-link request. While the address is over its misses, every owner link from it is
 * refused with 429 and the time to try again; a dead link is counted as a miss.
 */
export async function withOwnerLinkLimit<T>(
  db: Db,
  request: Request,
  socketAddress: string | null,
  work: () => Promise<T>,
): Promise<T> {
  const bucket = `owner-link:${clientIp(request, socketAddress)}`;
  const blocked = await countSignIn(db, bucket, OWNER_LINK_MISSES, OWNER_LINK_WINDOW_S, new Date(), false);
  if (!blocked.ok) throw tooMany(blocked.retryAt);
  try {
    return await work();
  } catch (error) {
    const refused = await refusalMessage(error);
    if (refused?.status === 404) await countSignIn(db, bucket, OWNER_LINK_MISSES, OWNER_LINK_WINDOW_S);
    throw error;
  }
}

function tooMany(retryAt: Date) {
  const res = httpError(
    429,
    `Too many links that do not work came from this address. ${tryAgainAt(retryAt)}`,
  );
  res.headers.set("Retry-After", String(Math.max(1, Math.ceil((retryAt.getTime() - Date.now()) / 1000))));
  return res;
}
