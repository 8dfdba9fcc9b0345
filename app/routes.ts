import { type RouteConfig, index, layout, route } from "@react-router/dev/routes";

export default [
  index("routes/landing.tsx"),
  route("sign-in", "routes/auth/sign-in.tsx"),
  route("sign-out", "routes/auth/sign-out.tsx"),
  route("auth/github", "routes/auth/github.tsx"),
  route("auth/github/callback", "routes/auth/callback.tsx"),
  route("welcome", "routes/auth/welcome.tsx"),
  layout("routes/app/layout.tsx", [
    route("board", "routes/board/board.tsx"),
    route("cases", "routes/cases/list.tsx"),
    route("cases/new", "routes/cases/new.tsx"),
    route("cases/:caseId", "routes/cases/workbench.tsx"),
    route("kb", "routes/kb/overview.tsx"),
    route("settings", "routes/settings/workshop.tsx"),
    route("settings/members", "routes/settings/members.tsx"),
    route("settings/audit", "routes/settings/audit.tsx"),
  ]),
  route("api/search", "routes/api/search.ts"),
  route("api/quick-find", "routes/api/quick-find.ts"),
  route("api/what-if", "routes/api/what-if.ts"),
  route("api/cases/:caseId", "routes/api/case.ts"),
  route("api/cases/:caseId/diagnosis", "routes/api/diagnosis.ts"),
  route("api/cases/:caseId/observations/:itemId?", "routes/api/observations.ts"),
  route("api/cases/:caseId/findings/:itemId?", "routes/api/findings.ts"),
  route("api/*", "routes/api/not-found.ts"),
  route("*", "routes/not-found.tsx"),
] satisfies RouteConfig;
