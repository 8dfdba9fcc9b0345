import type { Permission } from "~/domain/permissions";

// Who may use each route, by method (and form intent). The authorization test walks app/routes.ts
// and fails for any route missing here, then tries every cell against the running server.
//   public       anyone, signed in or not
//   account      signed in, with or without a workshop
//   no-workshop  signed in and not yet a member anywhere
//   member       any active member of a workshop
//   Permission   a member whose role has it
//   owner-link   whoever holds a live owner link (its token is the permission; no session opens it)
export type RouteAccessLevel = "public" | "account" | "no-workshop" | "member" | "owner-link" | Permission;

export type RouteAccess = {
  path: string; // a concrete URL to try; {case} is an open demo case of the Bramblegate workshop, {check} one of its checks, {cause} one of its failure modes, {symptom} one of its symptoms
  api?: true; // JSON route: 401/403 answers instead of redirects
  record?: true; // the URL names a record of one workshop: members of another get 404
  GET?: RouteAccessLevel;
  POST?: RouteAccessLevel | Record<string, RouteAccessLevel>; // by intent when one route has several forms
};

export const ROUTE_ACCESS: Record<string, RouteAccess> = {
  "routes/landing.tsx": { path: "/", GET: "public" },
  "routes/auth/sign-in.tsx": { path: "/sign-in", GET: "public" },
  "routes/auth/sign-out.tsx": { path: "/sign-out", POST: "public" },
  "routes/auth/code.tsx": {
    path: "/sign-in/code",
    GET: "public",
    POST: { send: "public", verify: "public" },
  },
  "routes/auth/code-link.tsx": { path: "/sign-in/link", GET: "public" },
  "routes/auth/github.tsx": { path: "/auth/github", POST: "public" },
  "routes/auth/callback.tsx": { path: "/auth/github/callback", GET: "public" },
  "routes/owner/estimate.tsx": { path: "/o/not-a-live-token", GET: "owner-link", POST: "owner-link" },
  "routes/auth/welcome.tsx": { path: "/welcome", GET: "no-workshop", POST: "no-workshop" },
  "routes/app/layout.tsx": { path: "/board", GET: "member" },
  "routes/board/board.tsx": { path: "/board", GET: "case:read" },
  "routes/desk/desk.tsx": { path: "/desk", GET: "case:read" },
  "routes/cases/list.tsx": { path: "/cases", GET: "case:read" },
  "routes/cases/estimate.tsx": {
    path: "/cases/{case}/estimate",
    record: true,
    GET: "case:read",
    POST: "estimate:manage",
  },
  "routes/kb/overview.tsx": { path: "/kb", GET: "kb:read" },
  "routes/kb/export.ts": { path: "/kb/export", GET: "kb:read" },
  "routes/kb/symptom-new.tsx": { path: "/kb/symptoms/new", GET: "kb:edit", POST: "kb:edit" },
  "routes/kb/symptom.tsx": {
    path: "/kb/symptoms/{symptom}",
    record: true,
    GET: "kb:read",
    POST: { edit: "kb:edit", strength: "kb:edit", preview: "kb:edit" },
  },
  "routes/kb/check-new.tsx": { path: "/kb/checks/new", GET: "kb:edit", POST: "kb:edit" },
  "routes/kb/check.tsx": { path: "/kb/checks/{check}", record: true, GET: "kb:read", POST: "kb:edit" },
  "routes/kb/proposals.tsx": {
    path: "/kb/proposals",
    GET: "kb:read",
    POST: { propose: "kb:propose", accept: "kb:approve", reject: "kb:approve", preview: "kb:approve" },
  },
  "routes/kb/cause.tsx": {
    path: "/kb/causes/{cause}",
    record: true,
    GET: "kb:read",
    POST: {
      strength: "kb:edit",
      preview: "kb:edit",
      edit: "kb:edit",
      retire: "kb:edit",
      "add-child": "kb:edit",
      "add-link": "kb:edit",
      merge: "kb:edit",
      move: "kb:edit",
    },
  },
  "routes/kb/test-cases.tsx": { path: "/kb/test-cases", GET: "kb:read", POST: "kb:edit" },
  "routes/kb/transfer.tsx": { path: "/kb/transfer", GET: "kb:edit", POST: "kb:edit" },
  "routes/settings/workshop.tsx": { path: "/settings", GET: "member", POST: "settings:manage" },
  "routes/settings/members.tsx": {
    path: "/settings/members",
    GET: "member:manage",
    POST: {
      invite: "member:manage",
      role: "member:manage",
      suspend: "member:manage",
      reactivate: "member:manage",
      "revoke-invite": "member:manage",
    },
  },
  "routes/settings/audit.tsx": { path: "/settings/audit", GET: "audit:read" },
  "routes/settings/payments.tsx": {
    path: "/settings/payments",
    GET: "payment:refund",
    POST: { refund: "payment:refund" },
  },
  "routes/settings/sessions.tsx": {
    path: "/settings/sessions",
    GET: "member",
    POST: { "sign-out-one": "member", "sign-out-everywhere": "member" },
  },
  "routes/settings/mail.tsx": { path: "/settings/mail", GET: "mail:read", POST: { resend: "mail:read" } },
  "routes/cases/new.tsx": { path: "/cases/new", GET: "case:open", POST: "case:open" },
  "routes/cases/workbench.tsx": {
    path: "/cases/{case}",
    record: true,
    GET: "case:read",
    POST: {
      conclude: "case:conclude",
      signoff: "case:signoff",
      "send-back": "case:signoff",
      "ask-senior": "case:ask-senior",
      complaint: "case:open",
      reopen: "case:reopen",
      close: "case:close",
      "newest-knowledge": "case:work",
      "keep-test-case": "kb:edit",
    },
  },
  "routes/api/search.ts": { path: "/api/search?q=brake", api: true, GET: "case:read" },
  "routes/api/quick-find.ts": { path: "/api/quick-find?kinds=symptom", api: true, GET: "case:read" },
  "routes/api/what-if.ts": { path: "/api/what-if", api: true, POST: "case:read" },
  "routes/api/case.ts": { path: "/api/cases/{case}", api: true, record: true, GET: "case:read" },
  "routes/api/diagnosis.ts": {
    path: "/api/cases/{case}/diagnosis",
    api: true,
    record: true,
    GET: "case:read",
  },
  "routes/api/history.ts": { path: "/api/cases/{case}/history", api: true, record: true, GET: "case:read" },
  "routes/api/observations.ts": {
    path: "/api/cases/{case}/observations",
    api: true,
    record: true,
    POST: "case:work",
  },
  "routes/api/findings.ts": {
    path: "/api/cases/{case}/findings",
    api: true,
    record: true,
    GET: "case:read",
    POST: "case:work",
  },
  "routes/api/kb-check.ts": { path: "/api/kb/checks/{check}", api: true, record: true, GET: "kb:read" },
  // Signed by the payments service, not signed in: a bad or missing signature is a 400 for anyone.
  "routes/api/payments-webhook.ts": { path: "/api/payments/webhook", api: true, POST: "public" },
  "routes/api/not-found.ts": { path: "/api/no-such-thing", GET: "public" },
  "routes/not-found.tsx": { path: "/no-such-page", GET: "public" },
};
