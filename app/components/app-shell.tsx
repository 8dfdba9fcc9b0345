import { useEffect, useRef } from "react";
import { Form, href, NavLink, useLocation } from "react-router";
import type { Permission } from "~/domain/permissions";
import { BrandMark } from "./brand";
import { GlobalQuickFind } from "./global-quick-find";

type Area = { to: string; label: string; needs: Permission | null };
// The areas of the workbench; an area a role cannot use is not shown at all.
const AREAS: Area[] = [
  { to: href("/desk"), label: "Front desk", needs: "estimate:manage" },
  { to: href("/board"), label: "Board", needs: "case:read" },
  { to: href("/cases"), label: "Cases", needs: "case:read" },
  { to: href("/kb"), label: "Knowledge base", needs: "kb:read" },
  { to: href("/settings"), label: "Settings", needs: null },
];

const initials = (name: string) =>
  name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((w) => w[0]!.toUpperCase())
    .join("");

/**
 * The signed-in frame. On a phone it is two short rows (mark, Quick find and the person; then the
 * areas, scrolling sideways), so the work starts within the first 110 px of the screen.
 */
export function AppShell({
  member,
  permissions,
  children,
}: {
  member: { name: string; role: string; workshopName: string };
  permissions: readonly Permission[];
  children: React.ReactNode;
}) {
  const areas = AREAS.filter((a) => a.needs === null || permissions.includes(a.needs));
  // The person's menu closes when the page changes or a click lands outside it.
  const menu = useRef<HTMLDetailsElement>(null);
  const { pathname } = useLocation();
  useEffect(() => menu.current?.removeAttribute("open"), [pathname]);
  useEffect(() => {
    const away = (e: PointerEvent) => {
      if (menu.current?.open && !menu.current.contains(e.target as Node))
        menu.current.removeAttribute("open");
    };
    document.addEventListener("pointerdown", away);
    return () => document.removeEventListener("pointerdown", away);
  }, []);
  const nav = (className: string) => (
    <nav aria-label="Areas" className={className}>
      {areas.map((a) => (
        <NavLink
          key={a.to}
          to={a.to}
          className={({ isActive }) =>
            `inline-flex min-h-tap items-center rounded-lg px-3 font-medium whitespace-nowrap ${isActive ? "bg-uv-100 text-uv-700" : "text-graphite-700 hover:bg-paper"}`
          }
        >
          {a.label}
        </NavLink>
      ))}
    </nav>
  );
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-rule bg-card">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 px-3 pt-1.5 pb-1 sm:px-4 md:pb-1.5">
          <span className="inline-flex items-center gap-2 text-lg font-semibold tracking-tight">
            <BrandMark />
            <span className="hidden sm:inline">Ramplight</span>
          </span>
          {/* One list of areas: a second row that scrolls sideways on a phone, inline from tablet width. */}
          {nav("order-last -mx-1 flex w-full gap-1 overflow-x-auto md:order-none md:mx-0 md:w-auto")}
          <div className="ml-auto flex items-center gap-2">
            {permissions.includes("case:read") ? <GlobalQuickFind /> : null}
            <details ref={menu} className="relative">
              <summary className="flex min-h-tap cursor-pointer list-none items-center gap-2 rounded-lg border border-rule px-2 font-medium hover:bg-paper">
                <span
                  aria-hidden="true"
                  className="grid h-8 w-8 place-items-center rounded-full bg-uv-100 text-sm font-semibold text-uv-700"
                >
                  {initials(member.name)}
                </span>
                {/* The name is the menu's name for everyone; on a narrow screen only the initials show. */}
                <span className="sr-only lg:not-sr-only">{member.name}</span>
              </summary>
              <div className="absolute right-0 z-30 mt-1 w-64 rounded-card border border-rule bg-card p-3 shadow-xl">
                <p className="leading-tight font-semibold">{member.name}</p>
                <p className="text-sm text-graphite-600">
                  {member.role} · {member.workshopName}
                </p>
                <Form method="post" action={href("/sign-out")} className="mt-2">
                  <button
                    type="submit"
                    className="min-h-tap w-full rounded-lg border border-rule px-3 font-medium hover:bg-paper"
                  >
                    Sign out
                  </button>
                </Form>
              </div>
            </details>
          </div>
        </div>
      </header>
      <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-4 sm:py-6">{children}</main>
    </div>
  );
}
