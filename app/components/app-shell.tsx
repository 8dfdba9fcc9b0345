import { Form, NavLink } from "react-router";
import type { Permission } from "~/auth/permissions";
import { Wordmark } from "./brand";
import { GlobalQuickFind } from "./global-quick-find";

type Area = { to: string; label: string; needs: Permission };
// The areas of the workbench; an area a role cannot use is not shown at all.
const AREAS: Area[] = [
  { to: "/board", label: "Board", needs: "case:read" },
  { to: "/cases", label: "Cases", needs: "case:read" },
  { to: "/kb", label: "Knowledge base", needs: "kb:read" },
  { to: "/settings", label: "Settings", needs: "case:read" },
];

export function AppShell({
  member,
  permissions,
  children,
}: {
  member: { name: string; role: string; workshopName: string };
  permissions: readonly Permission[];
  children: React.ReactNode;
}) {
  const areas = AREAS.filter((a) => permissions.includes(a.needs) || a.to === "/settings");
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-rule bg-card">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2">
          <Wordmark />
          <nav aria-label="Areas" className="order-3 -mx-1 flex w-full gap-1 overflow-x-auto sm:order-none sm:w-auto">
            {areas.map((a) => (
              <NavLink
                key={a.to}
                to={a.to}
                className={({ isActive }) =>
                  `inline-flex min-h-tap items-center rounded-lg px-3 font-medium whitespace-nowrap ${
                    isActive ? "bg-uv-100 text-uv-700" : "text-graphite-700 hover:bg-paper"
                  }`
                }
              >
                {a.label}
              </NavLink>
            ))}
          </nav>
          <div className="ml-auto flex items-center gap-3">
            {permissions.includes("case:read") ? <GlobalQuickFind /> : null}
            <p className="text-right text-sm leading-tight">
              <span className="block font-semibold">{member.name}</span>
              <span className="text-graphite-600">
                {member.role} · {member.workshopName}
              </span>
            </p>
            <Form method="post" action="/sign-out">
              <button type="submit" className="min-h-tap rounded-lg border border-rule px-3 font-medium hover:bg-paper">
                Sign out
              </button>
            </Form>
          </div>
        </div>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-6">{children}</main>
    </div>
  );
}
