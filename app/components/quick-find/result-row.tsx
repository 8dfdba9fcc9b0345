// One row of the palette. Symptom rows carry both actions: the row itself adds the symptom as the
// query said it (Enter, click, tap: present, or absent for "no grinding") and the "Absent" chip adds
// it as absent (Shift+Enter, tap). A weak match says so, so it is not taken for a real one.
import { Command } from "cmdk";
import type { Entry } from "~/quick-find";

export const itemValue = (e: Entry) => `${e.kind}:${e.id}`;

const ROW =
  "group flex min-h-tap cursor-pointer items-center gap-3 rounded-lg px-3 py-2 text-base text-graphite-700 " +
  "data-[selected=true]:bg-uv-100 data-[selected=true]:text-uv-700";

type RowProps = {
  entry: Entry;
  weak?: boolean;
  absent?: boolean;
  onChoose: (entry: Entry, present: boolean | undefined) => void;
};

export function ResultRow({ entry, weak, absent, onChoose }: RowProps) {
  const symptom = entry.kind === "symptom";
  return (
    <Command.Item
      value={itemValue(entry)}
      onSelect={() => onChoose(entry, symptom ? !absent : undefined)}
      className={ROW}
    >
      <span className="min-w-0 flex-1">
        <span className="block font-medium">{entry.title}</span>
        {weak ? <span className="block text-graphite-600">Weak match</span> : null}
        {symptom && absent && !weak ? (
          <span className="block text-graphite-600">Enter adds it as absent</span>
        ) : null}
        {entry.subtitle ? (
          <span className="block truncate text-graphite-600 group-data-[selected=true]:text-uv-700">
            {entry.subtitle}
          </span>
        ) : null}
      </span>
      {symptom ? (
        // Not a button: a control inside an option confuses screen readers, who have Shift+Enter.
        <span
          aria-hidden="true"
          className="inline-flex min-h-tap shrink-0 items-center rounded-lg border border-rule bg-card px-3 font-medium text-graphite-700"
          onClick={(e) => {
            e.stopPropagation(); // keep the row's own click (add as present) from firing as well
            onChoose(entry, false);
          }}
        >
          Absent
        </span>
      ) : null}
    </Command.Item>
  );
}
