import { Form, redirect } from "react-router";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { readForm, refusedOnForm } from "~/http/forms.server";
import { parseDecimal } from "~/measure";
import { z } from "zod";
import { requireAccount } from "~/auth/guards.server";
import { ROLE_HOME } from "~/domain/permissions";
import { Wordmark } from "~/components/brand";
import { dbContext } from "~/http/context";
import { COUNTRIES } from "~/domain/countries";
import { createWorkshop } from "~/workshop/create.server";
import type { Route } from "./+types/welcome";

const NewWorkshopSchema = z.object({
  name: z
    .string()
    .trim()
    .min(2, "Give the workshop a name of at least 2 characters")
    .max(80, "Keep the name under 80 characters"),
  country: z.enum(COUNTRIES.map((c) => c.code) as [string, ...string[]], {
    message: "Choose a country from the list",
  }),
  labourRatePerHour: z
    .string()
    .transform(
      (v, ctx) =>
        parseDecimal(v) ??
        (ctx.addIssue({ code: "custom", message: "The labour rate is a number, such as 84" }), z.NEVER),
    )
    .pipe(
      z.number().min(0, "The labour rate cannot be negative").max(10_000, "That labour rate looks too high"),
    ),
});

export async function loader({ request, context }: Route.LoaderArgs) {
  const account = await requireAccount(request, context.get(dbContext));
  if (account.role) throw redirect(ROLE_HOME[account.role]);
  return { name: account.name };
}

export async function action({ request, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  const account = await requireAccount(request, db);
  if (account.role) throw new Response("You are already a member of a workshop.", { status: 409 });
  const form = await readForm(request, NewWorkshopSchema);
  if (!form.ok) return form.answer;
  try {
    await createWorkshop(db, account.userId, form.value);
  } catch (error) {
    return refusedOnForm(error);
  }
  throw redirect(ROLE_HOME.admin);
}

export function meta() {
  return [{ title: "Set up your workshop — Ramplight" }];
}

const field = "mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base";

export default function Welcome({ loaderData, actionData }: Route.ComponentProps) {
  const errors = actionData?.errors;
  return (
    <main className="mx-auto flex min-h-dvh max-w-lg flex-col justify-center gap-5 px-5 py-10">
      <Wordmark />
      <h1 className="text-2xl font-semibold">Welcome, {loaderData.name}</h1>
      <p className="text-graphite-700">
        No workshop has invited you yet. Set up your own and you become its admin; the starter knowledge base
        comes with it. If you expected an invitation, ask your workshop admin to invite the e-mail address you
        signed in with.
      </p>
      <FormMessages errors={errors} />
      <Form method="post" className="grid gap-4" noValidate>
        <label className="font-medium">
          Workshop name
          <input name="name" required className={field} {...describedBy(errors, "name")} />
          <FieldError errors={errors} name="name" />
        </label>
        <label className="font-medium">
          Country
          <select name="country" className={field} defaultValue="GB">
            {COUNTRIES.map((c) => (
              <option key={c.code} value={c.code}>
                {c.name} — {c.currency}, tax {Math.round(c.taxRate * 1000) / 10}%
              </option>
            ))}
          </select>
          <FieldError errors={errors} name="country" />
        </label>
        <label className="font-medium">
          Labour rate per hour
          <input
            name="labourRatePerHour"
            inputMode="decimal"
            defaultValue="80"
            className={field}
            {...describedBy(errors, "labourRatePerHour")}
          />
          <FieldError errors={errors} name="labourRatePerHour" />
        </label>
        <button
          type="submit"
          className="min-h-tap rounded-lg bg-uv-600 px-5 text-lg font-semibold text-white hover:bg-uv-700"
        >
          Create the workshop
        </button>
      </Form>
    </main>
  );
}
