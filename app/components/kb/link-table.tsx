// The links of a cause or of a symptom as one table: sorted by a column header, narrowed by the
// filter box, and for seniors each row's strength changed in its own cell. Each row keeps a real
// form of its own inside its strength cell (a form may sit in a cell, never around a row), so the
// page works as plain forms before its script loads. On a narrow screen the rows stack into cards
// rather than push the page sideways.
import {
  columnFilteringFeature,
  createColumnHelper,
  createFilteredRowModel,
  createSortedRowModel,
  type FilterFn,
  globalFilteringFeature,
  rowSortingFeature,
  sortFn_alphanumeric,
  sortFn_basic,
  tableFeatures,
  useTable,
} from "@tanstack/react-table";
import { Link, useNavigation } from "react-router";
import { describeStrength, STRENGTHS } from "~/domain/link-strength";
import type { FormErrors } from "~/http/forms";
import { LINK_KIND_LABEL, type LinkPreview, type LinkRow, matchesFilter } from "~/kb/link-rows";
import { ImpactPreview } from "./impact-preview";
import { STRENGTH_WORDS_LIST, StrengthEditor } from "./strength-editor";

const features = tableFeatures({
  rowSortingFeature,
  columnFilteringFeature,
  globalFilteringFeature,
  sortedRowModel: createSortedRowModel(),
  filteredRowModel: createFilteredRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic },
});
type Features = typeof features;

const column = createColumnHelper<Features, LinkRow>();
const NAME = column.accessor("name", { id: "name", sortFn: "alphanumeric" });
const KIND = column.accessor((r) => LINK_KIND_LABEL[r.link], { id: "kind", sortFn: "alphanumeric" });
// Strongest first on the first press: the order a senior reads links in.
const STRENGTH = column.accessor("p", {
  id: "strength",
  sortFn: "basic",
  sortDescFirst: true,
  enableGlobalFilter: false,
});
const WITH_KIND = column.columns([NAME, KIND, STRENGTH]);
const WITHOUT_KIND = column.columns([NAME, STRENGTH]);

const byWords: FilterFn<Features, LinkRow> = (row, columnId, typed: string) =>
  matchesFilter(row.getValue(columnId), typed);

const ARROW = { asc: "▲", desc: "▼", none: "↕" } as const;

export function LinkTable({
  rows,
  labelledBy,
  nameHeader = "Name",
  showKind,
  mayEdit,
  errors,
  preview,
  empty,
}: {
  rows: LinkRow[];
  labelledBy: string; // the id of the heading that names the table
  nameHeader?: string;
  showKind: boolean; // a cause's page mixes symptom and check links; a symptom's has causes only
  mayEdit: boolean;
  errors: FormErrors | undefined;
  preview: LinkPreview | null;
  empty: string;
}) {
  const busy = useNavigation().state === "submitting";
  const table = useTable({
    features,
    columns: showKind ? WITH_KIND : WITHOUT_KIND,
    data: rows,
    getRowId: (r) => `${r.link}-${r.id}`,
    globalFilterFn: byWords,
    enableSortingRemoval: false,
    enableMultiSort: false,
  });
  if (rows.length === 0) return <p className="mt-2 text-graphite-700">{empty}</p>;
  const typed: string = table.state.globalFilter ?? "";
  const shown = table.getRowModel().rows;
  const headerLabel: Record<string, string> = { name: nameHeader, kind: "Kind", strength: "Strength" };
  const width = showKind ? 3 : 2;
  return (
    <div className="mt-2 grid gap-2">
      <label className="grid gap-1 text-sm font-medium sm:max-w-sm">
        Filter links
        <input
          type="search"
          className="field"
          value={typed}
          onChange={(e) => table.setGlobalFilter(e.target.value)}
          placeholder={showKind ? "a name, or symptom / check" : "a name"}
          autoComplete="off"
        />
      </label>
      <p aria-live="polite" className="meta min-h-5">
        {typed.trim() ? `${shown.length} of ${rows.length} links shown` : ""}
      </p>
      <table aria-labelledby={labelledBy} className="w-full border-collapse text-left max-sm:block">
        <thead className="max-sm:block">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-rule max-sm:flex max-sm:flex-wrap max-sm:gap-2">
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    className={`py-1 pr-2 align-bottom max-sm:block ${header.column.id === "kind" ? "w-28" : ""} ${header.column.id === "strength" ? "sm:w-[22rem]" : ""}`}
                  >
                    <button
                      type="button"
                      className="btn-small inline-flex items-center gap-1 font-semibold text-graphite-800"
                      onClick={header.column.getToggleSortingHandler()}
                    >
                      {headerLabel[header.column.id]}
                      <span aria-hidden="true">{ARROW[sorted || "none"]}</span>
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="max-sm:block">
          {shown.length === 0 ? (
            <tr className="max-sm:block">
              <td colSpan={width} className="py-2 max-sm:block">
                {`No link matches “${typed.trim()}”.`}
              </td>
            </tr>
          ) : null}
          {shown.map(({ original: r, id }) => (
            <LinkTableRow
              key={id}
              row={r}
              showKind={showKind}
              width={width}
              mayEdit={mayEdit}
              errors={errors}
              busy={busy}
              preview={preview && preview.link === r.link && preview.otherId === r.id ? preview : null}
            />
          ))}
        </tbody>
      </table>
      {mayEdit ? (
        <datalist id={STRENGTH_WORDS_LIST}>
          {STRENGTHS.map((s) => (
            <option key={s.word} value={s.word} />
          ))}
        </datalist>
      ) : null}
    </div>
  );
}

const CELL = "py-2 pr-2 align-top max-sm:block max-sm:py-1";

function LinkTableRow({
  row,
  showKind,
  width,
  mayEdit,
  errors,
  busy,
  preview,
}: {
  row: LinkRow;
  showKind: boolean;
  width: number;
  mayEdit: boolean;
  errors: FormErrors | undefined;
  busy: boolean;
  preview: LinkPreview | null;
}) {
  return (
    <>
      <tr className="border-b border-rule max-sm:mt-2 max-sm:block max-sm:rounded-lg max-sm:border max-sm:p-3">
        <th scope="row" className={`${CELL} font-medium`}>
          {row.to ? (
            <Link className="underline" to={row.to}>
              {row.name}
            </Link>
          ) : (
            row.name
          )}
          {row.note ? <span className="meta block font-normal">{row.note}</span> : null}
        </th>
        {showKind ? <td className={`${CELL} text-graphite-700`}>{LINK_KIND_LABEL[row.link]}</td> : null}
        <td className={CELL}>
          <span className="tabular" data-strength>
            {describeStrength(row.p)}
          </span>
          {mayEdit ? <StrengthEditor row={row} errors={errors} busy={busy} /> : null}
        </td>
      </tr>
      {preview ? (
        <tr className="max-sm:block">
          <td colSpan={width} className="pb-3 max-sm:block">
            <ImpactPreview impact={preview.impact} p={preview.p} />
          </td>
        </tr>
      ) : null}
    </>
  );
}
