// The forms on a cause's page that grow and prune the tree: add a component or failure mode under
// it, link it to a symptom or check it does not have yet, merge it into another of its level.
import { Form, useNavigation } from "react-router";
import { SYSTEM_LABEL } from "~/domain/knowledge";
import type { FormErrors } from "~/http/forms";
import { describedBy, FieldError } from "../ui/form-errors";
import { ConfirmBox, EditorFold, PrioritySelect, TextField } from "./editor";
import { STRENGTH_WORDS_LIST } from "./strength-editor";

type Level = "system" | "component" | "failure_mode";
type Choice = { id: string; name: string; system?: string };

const systemOf = (s?: string) => (s ? (SYSTEM_LABEL[s as keyof typeof SYSTEM_LABEL] ?? s) : "");

export function AddChildForm({ level, errors }: { level: Level; errors: FormErrors | undefined }) {
  const busy = useNavigation().state === "submitting";
  if (level === "failure_mode") return null;
  const leaf = level === "component";
  const field = (name: string, label: string, rows = 0, inputMode?: "decimal" | "numeric") => (
    <TextField
      prefix="add"
      name={name}
      label={label}
      value=""
      errors={errors}
      rows={rows}
      inputMode={inputMode}
    />
  );
  return (
    <EditorFold
      id="add-child"
      title={leaf ? "Add a failure mode here" : "Add a component here"}
      errors={errors}
      fields={[
        "newName",
        "newDescription",
        "newOwnerDescription",
        "newBaseRate",
        "newRepairMinutes",
        "newPartsCost",
        "newPriority",
      ]}
    >
      <Form method="post" className="mt-2 grid gap-3">
        <input type="hidden" name="intent" value="add-child" />
        {field("newName", "Name")}
        {field("newDescription", "For the technician", 2)}
        {leaf ? field("newOwnerDescription", "For the owner, in plain words", 2) : null}
        {leaf ? (
          <div className="grid gap-3 sm:grid-cols-2">
            {field("newBaseRate", "Base rate (relative frequency)", 0, "decimal")}
            {field("newRepairMinutes", "Repair, minutes of labour", 0, "numeric")}
            {field("newPartsCost", "Parts, typical cost", 0, "decimal")}
            <PrioritySelect id="add-newPriority" name="newPriority" value="soon" />
          </div>
        ) : null}
        <div>
          <button type="submit" className="btn-primary" disabled={busy}>
            {leaf ? "Add the failure mode" : "Add the component"}
          </button>
        </div>
      </Form>
    </EditorFold>
  );
}

function LinkForm({
  kind,
  choices,
  errors,
}: {
  kind: "symptom" | "check";
  choices: Choice[];
  errors: FormErrors | undefined;
}) {
  const busy = useNavigation().state === "submitting";
  const [select, strength] = [`${kind}Id`, `${kind}Strength`];
  return (
    <Form method="post" className="grid gap-2 sm:grid-cols-[1fr_10rem_auto] sm:items-end">
      <input type="hidden" name="intent" value="add-link" />
      <input type="hidden" name="link" value={kind} />
      <label className="grid gap-1 text-sm font-medium" htmlFor={`link-${select}`}>
        {kind === "symptom" ? "A symptom it shows" : "A check that finds it"}
        <select
          id={`link-${select}`}
          name="otherId"
          className="field w-full"
          defaultValue=""
          {...describedBy(errors, select)}
        >
          <option value="" disabled>
            Choose…
          </option>
          {choices.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
        <FieldError errors={errors} name={select} />
      </label>
      <label className="grid gap-1 text-sm font-medium" htmlFor={`link-${strength}`}>
        {kind === "symptom" ? "How often it shows" : "How often it fails"}
        <input
          id={`link-${strength}`}
          name="strength"
          list={STRENGTH_WORDS_LIST}
          className="field"
          autoComplete="off"
          {...describedBy(errors, strength)}
        />
        <FieldError errors={errors} name={strength} />
      </label>
      <button type="submit" className="btn min-h-tap" disabled={busy}>
        {kind === "symptom" ? "Link the symptom" : "Link the check"}
      </button>
    </Form>
  );
}

export function AddLinkForms(props: {
  symptoms: Choice[];
  checks: Choice[];
  errors: FormErrors | undefined;
}) {
  return (
    <EditorFold
      id="add-link"
      title="Link a symptom or a check"
      errors={props.errors}
      fields={["symptomId", "symptomStrength", "checkId", "checkStrength"]}
    >
      <p className="mt-1 text-sm text-graphite-700">
        Say how strongly in one of the words for strength below, or as a percentage.
      </p>
      <div className="mt-2 grid gap-4">
        <LinkForm kind="symptom" choices={props.symptoms} errors={props.errors} />
        <LinkForm kind="check" choices={props.checks} errors={props.errors} />
      </div>
    </EditorFold>
  );
}

export function MergeForm({
  level,
  into,
  errors,
}: {
  level: Level;
  into: Choice[];
  errors: FormErrors | undefined;
}) {
  const busy = useNavigation().state === "submitting";
  if (level === "system") return null;
  return (
    <EditorFold id="merge" title="Merge into another" errors={errors} fields={["intoId", "confirm-merge"]}>
      <Form method="post" className="mt-2 grid gap-3">
        <input type="hidden" name="intent" value="merge" />
        <p className="text-sm text-graphite-700">
          {level === "component"
            ? "Its failure modes move under the other component; this one is retired."
            : "Its links move to the other where the other has none of its own to the same symptom or check; this one is retired. Cases that name it keep showing it."}
        </p>
        <label className="grid gap-1 text-sm font-medium" htmlFor="merge-intoId">
          Merge it into
          <select
            id="merge-intoId"
            name="intoId"
            defaultValue=""
            className="field w-full"
            {...describedBy(errors, "intoId")}
          >
            <option value="" disabled>
              Choose…
            </option>
            {into.map((c) => (
              <option key={c.id} value={c.id}>
                {`${systemOf(c.system)} › ${c.name}`}
              </option>
            ))}
          </select>
          <FieldError errors={errors} name="intoId" />
        </label>
        <ConfirmBox id="merge-confirm" field="confirm-merge" label="Yes, merge it" errors={errors} />
        <div>
          <button type="submit" className="btn" disabled={busy}>
            Merge into it
          </button>
        </div>
      </Form>
    </EditorFold>
  );
}
