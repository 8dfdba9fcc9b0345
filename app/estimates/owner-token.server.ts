import { createHash, randomBytes, timingSafeEqual } from "node:crypto";

// An owner's link carries 32 random bytes (256 bits, base64url): unguessable. The database keeps
// only their SHA-256, so a copy of it opens nothing; the look-up is by that hash.
export const OWNER_LINK_DAYS = 14;

export function newOwnerToken() {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashOwnerToken(token) };
}

export function hashOwnerToken(token: string) {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** A token of the right shape; anything else is refused before the database is asked. */
export function wellFormedToken(token: string) {
  return /^[A-Za-z0-9_-]{43}$/.test(token);
}

export function sameHash(a: string, b: string) {
  return a.length === b.length && timingSafeEqual(Buffer.from(a), Buffer.from(b));
}
