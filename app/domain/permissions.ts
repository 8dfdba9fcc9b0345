import type { Role } from "./people";

// Typed permissions, checked on the server by guards and mirrored in the UI (hidden, not disabled).
// docs/permissions.md is the same matrix in words; the authorization test reads this table.
export const PERMISSIONS = [
  "case:read",
  "case:open",
  "case:work", // add observations and findings
  "case:work-assigned", // the apprentice's narrower right: only on cases assigned to them, within skill
  "case:conclude",
  "case:signoff",
  "case:reopen", // a concluded or closed case back to open, with a reason
  "case:close", // a concluded case done with
  "case:ask-senior",
  "kb:read",
  "kb:propose",
  "kb:edit",
  "kb:approve",
  "owner:manage", // owners, vehicles, bookings
  "estimate:manage",
  "payment:take",
  "payment:refund",
  "mail:read", // the mail the app has sent and queued
  "member:manage",
  "settings:manage",
  "audit:read",
  "data:export",
] as const;
export type Permission = (typeof PERMISSIONS)[number];

const TECHNICIAN: Permission[] = [
  "case:read",
  "case:open",
  "case:work",
  "case:conclude",
  "case:ask-senior",
  "kb:read",
  "kb:propose",
];

export const ROLE_PERMISSIONS: Record<Role, readonly Permission[]> = {
  apprentice: ["case:read", "case:work-assigned", "case:ask-senior", "kb:read"],
  technician: TECHNICIAN,
  senior: [...TECHNICIAN, "case:signoff", "case:reopen", "case:close", "kb:edit", "kb:approve", "audit:read"],
  advisor: [
    "case:read",
    "case:open",
    "case:close",
    "kb:read",
    "owner:manage",
    "estimate:manage",
    "payment:take",
  ],
  admin: [
    "case:read",
    "kb:read",
    "kb:edit",
    "member:manage",
    "settings:manage",
    "audit:read",
    "data:export",
    "owner:manage",
    "payment:refund",
    "mail:read",
  ],
};

export function can(role: Role, permission: Permission): boolean {
  return ROLE_PERMISSIONS[role].includes(permission);
}

// Where each role lands after signing in: the screen its day starts on.
export const ROLE_HOME: Record<Role, string> = {
  apprentice: "/board",
  technician: "/board",
  senior: "/board",
  advisor: "/desk",
  admin: "/settings",
};
