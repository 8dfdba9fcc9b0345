import { data, Form, Link } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { can } from "~/auth/permissions";
import { formatMoney, formatPercent } from "~/components/format";
import { dbContext } from "~/context";
import { parseDecimal } from "~/measure";
import { getWorkshop, updateWorkshop } from "~/workshop/settings.server";
import type { Route } from "./+types/workshop";

// A number as people type it in a form: "1,250.50" is 1250.5 (thousands separators allowed).
const decimal = (message: string) => z.string().transform((v, ctx) => parseDecimal(v) ?? (ctx.addIssue({ code: "custom", message }), z.NEVER));

const SettingsSchema = z.object({
  name: z.string().trim().min(2, "The name needs at least 2 characters").max(80),
  currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, "Currency is a three-letter ISO 4217 code, such as GBP or EUR"),
  taxRatePercent: decimal("Tax rate is a number, such as 20").pipe(z.number().min(0, "Tax rate cannot be negative").max(99, "Tax rate must be under 100%")),
  units: z.enum(["metric", "imperial"], { message: "Choose metric or imperial" }),
  labourRatePerHour: decimal("Labour rate is a number, such as 84 or 1,250.50").pipe(z.number().min(0, "Labour rate cannot be negative").max(10_000, "Labour rate is at most 10,000 per hour")),
});

export async function loader({ context }: Route.LoaderArgs) {
  const member = context.get(memberContext);
  return { workshop: await getWorkshop(context.get(dbContext), member.workshopId), canEdit: can(member.role, "settings:manage"), role: member.role };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "settings:manage");
  const parsed = SettingsSchema.safeParse(Object.fromEntries(await request.formData()));
  if (!parsed.success) return data({ errors: z.flattenError(parsed.error).fieldErrors, saved: false }, { status: 400 });
  const { taxRatePercent, ...rest } = parsed.data;
  await updateWorkshop(context.get(dbContext), member, { ...rest, taxRate: Math.round(taxRatePercent * 100) / 10_000 });
  return { errors: {}, saved: true };
}

export function meta() {
  return [{ title: "Settings — Ramplight" }];
}

const field = "mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base";

export default function WorkshopSettings({ loaderData, actionData }: Route.ComponentProps) {
  const w = loaderData.workshop;
  const errors: Partial<Record<string, string[]>> = actionData?.errors ?? {};
  const err = (k: string) => (errors[k] ? <span className="block text-sm text-stop">{errors[k]![0]}</span> : null);
  const links = (
    <nav aria-label="Settings" className="mt-3 flex flex-wrap items-center gap-3">
      {loaderData.canEdit ? <Link className="font-medium text-uv-700 underline" to="/settings/members">Members</Link> : null}
      {loaderData.role === "admin" || loaderData.role === "senior" ? <Link className="font-medium text-uv-700 underline" to="/settings/audit">Audit log</Link> : null}
      <Form method="post" action="/sign-out" className="ml-auto">
        <input type="hidden" name="scope" value="everywhere" />
        <button type="submit" className="min-h-tap rounded-lg border border-rule px-3 font-medium hover:bg-paper">Sign out on every device</button>
      </Form>
    </nav>
  );
  if (!loaderData.canEdit) {
    const rows: [string, string][] = [
      ["Name", w.name],
      ["Country", w.country],
      ["Currency", w.currency],
      ["Tax rate", formatPercent(w.taxRate, 1)],
      ["Units", w.units === "metric" ? "Metric (km, kPa, mm, L/100 km)" : "Imperial (miles, psi, inches, mpg)"],
      ["Labour rate", `${formatMoney(w.labourRatePerHour, w.currency)} per hour`],
    ];
    return (
      <div>
        <h1 className="text-2xl font-semibold">Workshop settings</h1>
        {links}
        <dl className="mt-4 grid max-w-xl gap-2">
          {rows.map(([k, v]) => (
            <div key={k} className="flex justify-between gap-4 border-b border-rule py-2">
              <dt className="text-graphite-600">{k}</dt>
              <dd className="tabular font-medium">{v}</dd>
            </div>
          ))}
        </dl>
      </div>
    );
  }
  return (
    <div>
      <h1 className="text-2xl font-semibold">Workshop settings</h1>
      {links}
      {actionData?.saved ? <p role="status" className="mt-3 rounded-lg border border-sound bg-card p-3">Settings saved.</p> : null}
      <Form method="post" className="mt-4 grid max-w-xl gap-4" noValidate>
        <label className="font-medium">Name<input name="name" defaultValue={w.name} className={field} />{err("name")}</label>
        <p className="text-graphite-600">Country: {w.country}</p>
        <label className="font-medium">Currency<input name="currency" defaultValue={w.currency} className={field} />{err("currency")}</label>
        <label className="font-medium">Tax rate (%)<input name="taxRatePercent" inputMode="decimal" defaultValue={String(Math.round(w.taxRate * 10_000) / 100)} className={field} />{err("taxRatePercent")}</label>
        <label className="font-medium">
          Units
          <select name="units" defaultValue={w.units} className={field}>
            <option value="metric">Metric (km, kPa, mm, L/100 km)</option>
            <option value="imperial">Imperial (miles, psi, inches, mpg)</option>
          </select>
          {err("units")}
        </label>
        <label className="font-medium">Labour rate per hour<input name="labourRatePerHour" inputMode="decimal" defaultValue={String(w.labourRatePerHour)} className={field} />{err("labourRatePerHour")}</label>
        <button type="submit" className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700">Save settings</button>
      </Form>
    </div>
  );
}
