import { Form, href, Link } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { can } from "~/domain/permissions";
import { formatMoney, formatPercent } from "~/domain/format";
import { dbContext } from "~/http/context";
import { parseDecimal } from "~/measure";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { UNIT_SYSTEM_LABEL, UNIT_SYSTEMS } from "~/domain/vehicles";
import { onForm, readForm } from "~/http/forms.server";
import { getWorkshop, updateWorkshop } from "~/workshop/settings.server";
import type { Route } from "./+types/workshop";

// A number as people type it in a form: "1,250.50" is 1250.5 (thousands separators allowed).
const decimal = (message: string) =>
  z.string().transform((v, ctx) => parseDecimal(v) ?? (ctx.addIssue({ code: "custom", message }), z.NEVER));

const SettingsSchema = z.object({
  name: z.string().trim().min(2, "The name needs at least 2 characters").max(80),
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{3}$/, "Currency is a three-letter ISO 4217 code, such as GBP or EUR"),
  taxRatePercent: decimal("Tax rate is a number, such as 20").pipe(
    z.number().min(0, "Tax rate cannot be negative").max(99, "Tax rate must be under 100%"),
  ),
  units: z.enum(UNIT_SYSTEMS, { message: "Choose metric or imperial" }),
  labourRatePerHour: decimal("Labour rate is a number, such as 84 or 1,250.50").pipe(
    z.number().min(0, "Labour rate cannot be negative").max(10_000, "Labour rate is at most 10,000 per hour"),
  ),
  // A checkbox sends "on" when ticked and nothing when not.
  pricesIncludeTax: z
    .literal("on")
    .optional()
    .transform((v) => v === "on"),
});

export async function loader({ context }: Route.LoaderArgs) {
  const member = context.get(memberContext);
  return {
    workshop: await getWorkshop(context.get(dbContext), member.workshopId),
    canEdit: can(member.role, "settings:manage"),
    canRefund: can(member.role, "payment:refund"),
    role: member.role,
    canReadMail: can(member.role, "mail:read"),
  };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "settings:manage");
  const form = await readForm(request, SettingsSchema);
  if (!form.ok) return form.answer;
  const { taxRatePercent, ...rest } = form.value;
  return onForm(async () => {
    await updateWorkshop(context.get(dbContext), member, {
      ...rest,
      taxRate: Math.round(taxRatePercent * 100) / 10_000,
    });
    return "Settings saved.";
  });
}

export function meta() {
  return [{ title: "Settings — Ramplight" }];
}

const field = "mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base";

export default function WorkshopSettings({ loaderData, actionData }: Route.ComponentProps) {
  const w = loaderData.workshop;
  const errors = actionData?.errors;
  const err = (k: string) => <FieldError errors={errors} name={k} />;
  const links = (
    <nav aria-label="Settings" className="mt-3 flex flex-wrap items-center gap-3">
      {loaderData.canEdit ? (
        <Link
          className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
          to={href("/settings/members")}
        >
          Members
        </Link>
      ) : null}
      {loaderData.canRefund ? (
        <Link
          className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
          to={href("/settings/payments")}
        >
          Payments
        </Link>
      ) : null}
      {loaderData.role === "admin" || loaderData.role === "senior" ? (
        <Link
          className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
          to={href("/settings/audit")}
        >
          Audit log
        </Link>
      ) : null}
      {loaderData.canReadMail ? (
        <Link
          className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
          to={href("/settings/mail")}
        >
          Mail
        </Link>
      ) : null}
      <Link
        className="inline-flex min-h-tap items-center font-medium text-uv-700 underline"
        to={href("/settings/sessions")}
      >
        Signed-in devices
      </Link>
      <Form method="post" action={href("/sign-out")} className="ml-auto">
        <input type="hidden" name="scope" value="everywhere" />
        <button
          type="submit"
          className="min-h-tap rounded-lg border border-rule px-3 font-medium hover:bg-paper"
        >
          Sign out on every device
        </button>
      </Form>
    </nav>
  );
  if (!loaderData.canEdit) {
    const rows: [string, string][] = [
      ["Name", w.name],
      ["Country", w.country],
      ["Currency", w.currency],
      ["Tax rate", formatPercent(w.taxRate, 1)],
      ["Units", UNIT_SYSTEM_LABEL[w.units]],
      ["Labour rate", `${formatMoney(w.labourRatePerHour, w.currency)} per hour`],
      ["Prices are typed", w.pricesIncludeTax ? "with tax included" : "before tax"],
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
      <FormMessages errors={errors} notice={actionData?.notice} className="mt-3" />
      <Form method="post" className="mt-4 grid max-w-xl gap-4" noValidate>
        <label className="font-medium">
          Name
          <input name="name" defaultValue={w.name} className={field} {...describedBy(errors, "name")} />
          {err("name")}
        </label>
        <p className="text-graphite-600">Country: {w.country}</p>
        <label className="font-medium">
          Currency
          <input
            name="currency"
            defaultValue={w.currency}
            className={field}
            {...describedBy(errors, "currency")}
          />
          {err("currency")}
        </label>
        <label className="font-medium">
          Tax rate (%)
          <input
            name="taxRatePercent"
            inputMode="decimal"
            defaultValue={String(Math.round(w.taxRate * 10_000) / 100)}
            className={field}
            {...describedBy(errors, "taxRatePercent")}
          />
          {err("taxRatePercent")}
        </label>
        <label className="font-medium">
          Units
          <select name="units" defaultValue={w.units} className={field}>
            {UNIT_SYSTEMS.map((u) => (
              <option key={u} value={u}>
                {UNIT_SYSTEM_LABEL[u]}
              </option>
            ))}
          </select>
          {err("units")}
        </label>
        <label className="font-medium">
          Labour rate per hour
          <input
            name="labourRatePerHour"
            inputMode="decimal"
            defaultValue={String(w.labourRatePerHour)}
            className={field}
            {...describedBy(errors, "labourRatePerHour")}
          />
          {err("labourRatePerHour")}
        </label>
        <label className="flex min-h-tap items-center gap-3 font-medium">
          <input
            type="checkbox"
            name="pricesIncludeTax"
            defaultChecked={w.pricesIncludeTax}
            className="size-5"
          />
          Estimate prices are typed with tax included
        </label>
        <button
          type="submit"
          className="min-h-tap rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
        >
          Save settings
        </button>
      </Form>
    </div>
  );
}
