// A senior's editor of one cause: its words, figures and place in the tree, and its retirement.
// Folded, so the page reads first.
import { Form, useNavigation } from "react-router";
import { type Applicability, type CAUSE_LEVELS, type Priority, SYSTEM_LABEL } from "~/domain/knowledge";
import { DRIVETRAIN_LABEL, DRIVETRAINS, FUEL_LABEL, FUEL_TYPES, type UnitSystem } from "~/domain/vehicles";
import type { FormErrors } from "~/http/forms";
import { KM_PER_MILE, mileageUnit } from "~/measure/mileage";
import { describedBy, FieldError } from "../ui/form-errors";
import { ConfirmBox, EditorFold, PrioritySelect, TextField } from "./editor";

type CauseRow = {
  level: (typeof CAUSE_LEVELS)[number];
  name: string;
  parentId: string | null;
  description: string;
  ownerDescription: string;
  ifLeft: string;
  baseRate: number | null;
  repairMinutes: number | null;
  partsCost: number | null;
  priority: Priority | null;
  applicability: Applicability;
};
type Parent = { id: string; name: string; system: string };

/** A senior's editor of the cause's words, figures and place; folded, so the page reads first. */
export function CauseEditor({
  cause,
  parents,
  errors,
  units,
}: {
  cause: CauseRow;
  parents: Parent[];
  errors: FormErrors | undefined;
  units: UnitSystem;
}) {
  const busy = useNavigation().state === "submitting";
  const leaf = cause.level === "failure_mode";
  const text = (name: "name" | "description" | "ownerDescription" | "ifLeft", label: string, rows = 0) => (
    <TextField prefix="edit" name={name} label={label} value={cause[name]} errors={errors} rows={rows} />
  );
  const figure = (name: "baseRate" | "repairMinutes" | "partsCost", label: string) => (
    <TextField
      prefix="edit"
      name={name}
      label={label}
      value={cause[name] ?? ""}
      errors={errors}
      inputMode="decimal"
    />
  );
  return (
    <EditorFold
      id="edit"
      title="Edit this cause"
      errors={errors}
      fields={[
        "minAgeYears",
        "minMileage",
        "name",
        "parentId",
        "description",
        "ownerDescription",
        "ifLeft",
        "baseRate",
        "repairMinutes",
        "partsCost",
        "priority",
        "confirm",
      ]}
    >
      <Form method="post" className="mt-2 grid gap-3">
        {text("name", "Name")}
        {cause.level !== "system" ? (
          <label className="grid gap-1 text-sm font-medium" htmlFor="edit-parentId">
            Belongs under
            <select
              id="edit-parentId"
              name="parentId"
              defaultValue={cause.parentId ?? ""}
              className="field w-full"
              {...describedBy(errors, "parentId")}
            >
              {parents.map((p) => (
                <option key={p.id} value={p.id}>
                  {`${SYSTEM_LABEL[p.system as keyof typeof SYSTEM_LABEL] ?? p.system} › ${p.name}`}
                </option>
              ))}
            </select>
            <FieldError errors={errors} name="parentId" />
          </label>
        ) : null}
        {text("description", "For the technician", 3)}
        {text("ownerDescription", "For the owner, in plain words", 2)}
        {text("ifLeft", "If it is left", 2)}
        {leaf ? (
          <div className="grid gap-3 sm:grid-cols-2">
            {figure("baseRate", "Base rate (relative frequency)")}
            {figure("repairMinutes", "Repair, minutes of labour")}
            {figure("partsCost", "Parts, typical cost")}
            <PrioritySelect id="edit-priority" name="priority" value={cause.priority ?? "soon"} />
          </div>
        ) : null}
        {leaf ? <ApplicabilityFields applies={cause.applicability} errors={errors} units={units} /> : null}
        <div className="flex flex-wrap gap-2">
          <button type="submit" name="intent" value="edit" className="btn-primary" disabled={busy}>
            Save the cause
          </button>
        </div>
      </Form>
      <Form method="post" className="mt-4 border-t border-rule pt-3">
        <p className="text-sm text-graphite-700">
          Retiring takes it out of every ranking from the next version on; cases that name it keep showing it.
        </p>
        <ConfirmBox id="retire-confirm" field="confirm" label="Yes, retire it" errors={errors} />
        <button type="submit" name="intent" value="retire" className="btn mt-2" disabled={busy}>
          Retire this cause
        </button>
      </Form>
    </EditorFold>
  );
}

/** Which vehicles it applies to: none ticked means any; below the age or mileage it is rarer. */
function ApplicabilityFields({
  applies,
  errors,
  units,
}: {
  applies: Applicability;
  errors: FormErrors | undefined;
  units: UnitSystem;
}) {
  const boxes = <T extends string>(
    name: string,
    values: readonly T[],
    labels: Record<T, string>,
    on?: T[],
  ) => (
    <div className="flex flex-wrap gap-x-4">
      {values.map((v) => (
        <label key={v} className="flex min-h-tap items-center gap-2">
          <input type="checkbox" name={name} value={v} defaultChecked={on?.includes(v)} />
          {labels[v]}
        </label>
      ))}
    </div>
  );
  const miles = units === "imperial";
  return (
    <fieldset className="grid gap-2">
      <legend className="text-sm font-medium">Which vehicles it applies to (none ticked: any)</legend>
      {boxes("fuel", FUEL_TYPES, FUEL_LABEL, applies.fuel)}
      {boxes("drivetrain", DRIVETRAINS, DRIVETRAIN_LABEL, applies.drivetrain)}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          prefix="edit"
          name="minAgeYears"
          label="Rarer before this age, years"
          value={applies.minAgeYears ?? ""}
          errors={errors}
          inputMode="decimal"
        />
        <TextField
          prefix="edit"
          name="minMileage"
          label={`Rarer before this mileage, ${mileageUnit(units)}`}
          value={applies.minKm ? Math.round(miles ? applies.minKm / KM_PER_MILE : applies.minKm) : ""}
          errors={errors}
          inputMode="numeric"
        />
      </div>
    </fieldset>
  );
}
