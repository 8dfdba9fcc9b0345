import { Outlet } from "react-router";
import { memberContext, requireMember } from "~/auth/guards.server";
import { ROLE_PERMISSIONS } from "~/domain/permissions";
import { AppShell } from "~/components/app-shell";
import { RouteErrorPage } from "~/components/error-page";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/layout";

// One guard for the whole signed-in section: every route below gets the member from the context.
export const middleware: Route.MiddlewareFunction[] = [
  async ({ request, context }, next) => {
    context.set(memberContext, await requireMember(request, context.get(dbContext)));
    return next();
  },
];

export function loader({ context }: Route.LoaderArgs) {
  const m = context.get(memberContext);
  return {
    member: { name: m.name, role: m.role, skill: m.skill, workshopName: m.workshopName },
    permissions: ROLE_PERMISSIONS[m.role],
  };
}

export default function SignedInLayout({ loaderData }: Route.ComponentProps) {
  return (
    <AppShell member={loaderData.member} permissions={loaderData.permissions}>
      <Outlet />
    </AppShell>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
