import { Form, href, redirect } from "react-router";
import { z } from "zod";
import { memberContext, requirePermission } from "~/auth/guards.server";
import { openCase } from "~/cases/open-case.server";
import { dbContext } from "~/http/context";
import { RouteErrorPage } from "~/components/error-page";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { invalid, readForm, refusedOnForm } from "~/http/forms.server";
import { listVehicles } from "~/vehicles/vehicles.server";
import { DRIVETRAIN_LABEL, DRIVETRAINS, FUEL_LABEL, FUEL_TYPES } from "~/domain/vehicles";
import { validateVin } from "~/measure";
import { mileageUnit, parseMileage } from "~/measure/mileage";
import { getWorkshop } from "~/workshop/settings.server";
import type { Route } from "./+types/new";

const Known = z.object({ mode: z.literal("known"), vehicleId: z.uuid({ message: "Pick a vehicle" }) });
const Fresh = z.object({
  mode: z.literal("new"),
  ownerName: z.string().trim().min(2, "The owner's name is needed"),
  ownerPhone: z.string().trim().max(40).optional(),
  // Where the estimate and its link go; optional at the desk, needed before anything is sent.
  ownerEmail: z
    .union([z.literal(""), z.email({ message: "That e-mail address looks wrong" }).max(200)])
    .optional()
    .transform((v) => v || undefined),
  registration: z.string().trim().toUpperCase().min(2, "The registration is needed").max(15),
  vin: z
    .string()
    .trim()
    .toUpperCase()
    .optional()
    .transform((v) => v || undefined),
  make: z.string().trim().min(1, "Make is needed"),
  model: z.string().trim().min(1, "Model is needed"),
  year: z.coerce
    .number()
    .int()
    .min(1950, "Year looks wrong")
    .max(new Date().getFullYear() + 1, "Year looks wrong"),
  fuelType: z.enum(FUEL_TYPES),
  drivetrain: z.enum(DRIVETRAINS),
});
const OpenSchema = z.intersection(
  z.discriminatedUnion("mode", [Known, Fresh]),
  z.object({
    // Read in the workshop's units, thousands separators allowed (parseMileage, in the action).
    mileage: z.string().trim().min(1, "Mileage is needed").max(20),
    complaint: z.string().trim().min(3, "Write the complaint in the owner's words").max(2000),
  }),
);

export async function loader({ context }: Route.LoaderArgs) {
  const member = requirePermission(context.get(memberContext), "case:open");
  const db = context.get(dbContext);
  const [list, workshop] = await Promise.all([
    listVehicles(db, member.workshopId),
    getWorkshop(db, member.workshopId),
  ]);
  return { vehicles: list, units: workshop.units };
}

export async function action({ request, context }: Route.ActionArgs) {
  const member = requirePermission(context.get(memberContext), "case:open");
  const db = context.get(dbContext);
  const form = await readForm(request, OpenSchema);
  if (!form.ok) return form.answer;
  const input = form.value;
  const mileage = parseMileage(input.mileage, (await getWorkshop(db, member.workshopId)).units);
  if (!mileage.ok) return invalid({ mileage: [mileage.message] });
  if (input.mode === "new" && input.vin) {
    const vin = validateVin(input.vin, { requireCheckDigit: false });
    if (!vin.valid) return invalid({ vin: [vin.message] });
  }
  let created: { id: string };
  try {
    created = await openCase(db, member, {
      vehicleId: input.mode === "known" ? input.vehicleId : undefined,
      newVehicle: input.mode === "new" ? input : undefined,
      mileageKm: mileage.value,
      complaint: input.complaint,
    });
  } catch (error) {
    return refusedOnForm(error);
  }
  throw redirect(href("/cases/:caseId", { caseId: created.id }));
}

export function meta() {
  return [{ title: "Open a case — Ramplight" }];
}

const field = "mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base";

const NEW_FIELDS = [
  ["ownerName", "Owner's name"],
  ["ownerPhone", "Owner's phone"],
  ["ownerEmail", "Owner's e-mail (for the estimate)"],
  ["registration", "Registration"],
  ["vin", "VIN (optional)"],
  ["make", "Make"],
  ["model", "Model"],
  ["year", "Year"],
] as const;

export default function NewCase({ loaderData, actionData }: Route.ComponentProps) {
  const errors = actionData?.errors;
  const err = (k: string) => <FieldError errors={errors} name={k} />;
  const described = (k: string) => describedBy(errors, k);
  return (
    <div className="max-w-2xl">
      <h1 className="text-2xl font-semibold">Open a case</h1>
      <FormMessages errors={errors} className="mt-3" />
      <Form method="post" className="mt-4 grid gap-4" noValidate>
        <fieldset className="grid gap-2 rounded-card border border-rule bg-card p-4">
          <legend className="px-1 font-semibold">Vehicle on file</legend>
          <label className="flex min-h-tap items-center gap-2">
            <input type="radio" name="mode" value="known" defaultChecked /> Pick from the list
          </label>
          <select name="vehicleId" aria-label="Vehicle" className={field} {...described("vehicleId")}>
            {loaderData.vehicles.map((v) => (
              <option key={v.id} value={v.id}>
                {v.registration} — {v.make} {v.model} ({v.owner})
              </option>
            ))}
          </select>
          {err("vehicleId")}
          <label className="mt-2 flex min-h-tap items-center gap-2">
            <input type="radio" name="mode" value="new" /> A new owner and vehicle
          </label>
          <div className="grid gap-2 sm:grid-cols-2">
            {NEW_FIELDS.map(([name, label]) => (
              <label key={name} className="text-sm font-medium">
                {label}
                <input name={name} className={field} {...described(name)} />
                {err(name)}
              </label>
            ))}
            <label className="text-sm font-medium">
              Fuel
              <select name="fuelType" className={field}>
                {FUEL_TYPES.map((f) => (
                  <option key={f} value={f}>
                    {FUEL_LABEL[f]}
                  </option>
                ))}
              </select>
            </label>
            <label className="text-sm font-medium">
              Drive
              <select name="drivetrain" className={field}>
                {DRIVETRAINS.map((f) => (
                  <option key={f} value={f}>
                    {DRIVETRAIN_LABEL[f]}
                  </option>
                ))}
              </select>
            </label>
          </div>
        </fieldset>
        <label className="font-medium">
          Mileage ({mileageUnit(loaderData.units)})
          <input
            name="mileage"
            inputMode="numeric"
            placeholder={loaderData.units === "imperial" ? "e.g. 84,000" : "e.g. 135,000"}
            className={field}
            {...described("mileage")}
          />
          {err("mileage")}
        </label>
        <label className="font-medium">
          Complaint, in the owner's words
          <textarea name="complaint" rows={3} className={`${field} py-2`} {...described("complaint")} />
          {err("complaint")}
        </label>
        <button
          type="submit"
          className="min-h-tap rounded-lg bg-uv-600 px-5 text-lg font-semibold text-white hover:bg-uv-700"
        >
          Open the case
        </button>
      </Form>
    </div>
  );
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  return <RouteErrorPage error={error} />;
}
