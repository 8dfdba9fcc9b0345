import { createHash } from "node:crypto";

// Seeded rows get ids derived from a stable name, so seeding twice finds the same rows
// and inserts nothing new: idempotence without lookups.
export function seedId(name: string): string {
  const h = createHash("sha256").update(`ramplight-seed:${name}`).digest("hex");
  // Shape it as an RFC 9562 version-8 (custom) UUID.
  const variant = ((parseInt(h[16], 16) & 0x3) | 0x8).toString(16);
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-8${h.slice(13, 16)}-${variant}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}
