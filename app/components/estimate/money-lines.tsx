// An estimate's items and their lines with the sums under them, for the advisor's page and the
// owner's: the same words and figures on both. Rows stack on a phone.
import type { ReactNode } from "react";
import type { SentItem } from "~/domain/estimate-document";
import { ESTIMATE_LINE_LABEL } from "~/domain/owner-side";
import { formatMinor, formatQuantity, rateWords, type Totals } from "~/money";
import { PriorityMark } from "../priority";

export function ItemCard({
  item,
  currency,
  actions,
  lineAction,
}: {
  item: Pick<SentItem, "title" | "priority" | "required" | "lines" | "amountMinor">;
  currency: string;
  actions?: ReactNode;
  lineAction?: (index: number) => ReactNode;
}) {
  return (
    <div className="break-inside-avoid rounded-card border border-rule bg-card p-4">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <h3 className="text-lg font-semibold">{item.title}</h3>
        {item.required ? (
          <span className="text-sm text-graphite-700">Owed in any case</span>
        ) : (
          <PriorityMark priority={item.priority} />
        )}
      </div>
      {item.lines.length === 0 ? (
        <p className="mt-2 text-graphite-700">No lines yet.</p>
      ) : (
        <ul className="mt-2 divide-y divide-rule">
          {item.lines.map((l, i) => (
            <li key={i} className="grid gap-1 py-2 sm:grid-cols-[1fr_auto] sm:items-center">
              <span className="min-w-0 break-words">
                <span className="text-sm text-graphite-700">{ESTIMATE_LINE_LABEL[l.kind]}: </span>
                {l.description}
                {l.partNumber ? (
                  <span className="text-sm text-graphite-700"> (part {l.partNumber})</span>
                ) : null}
                <span className="block text-sm text-graphite-700 tabular">
                  {formatQuantity(l.quantityMilli)}
                  {l.kind === "labour" || l.kind === "diagnostic_fee" ? " h" : ""} ×{" "}
                  {formatMinor(l.unitMinor, currency)}
                  {l.taxRateBp === 0 ? ", no VAT" : `, VAT ${rateWords(l.taxRateBp)}`}
                </span>
              </span>
              <span className="flex items-center justify-between gap-3 sm:justify-end">
                <span className="tabular font-medium">{formatMinor(l.amountMinor, currency)}</span>
                {lineAction?.(i)}
              </span>
            </li>
          ))}
        </ul>
      )}
      <p className="mt-2 flex justify-between border-t border-rule pt-2 font-semibold">
        <span>For this item</span>
        <span className="tabular">{formatMinor(item.amountMinor, currency)}</span>
      </p>
      {actions}
    </div>
  );
}

export function TotalsTable({
  totals,
  currency,
  pricesIncludeTax,
  caption,
}: {
  totals: Totals;
  currency: string;
  pricesIncludeTax: boolean;
  caption: string;
}) {
  const row = (label: string, minor: number, strong = false) => (
    <div
      key={label}
      className={`flex justify-between gap-4 py-1 ${strong ? "border-t border-rule pt-2 text-lg font-semibold" : ""}`}
    >
      <dt>{label}</dt>
      <dd className="tabular">{formatMinor(minor, currency)}</dd>
    </div>
  );
  return (
    <section aria-label={caption} className="break-inside-avoid rounded-card border border-rule bg-card p-4">
      <h3 className="font-semibold">{caption}</h3>
      <dl className="mt-2">
        {row("Before VAT", totals.net)}
        {totals.bands.map((b) =>
          row(`VAT at ${rateWords(b.rateBp)} on ${formatMinor(b.net, currency)}`, b.tax),
        )}
        {row("Total", totals.gross, true)}
      </dl>
      <p className="mt-2 text-sm text-graphite-700">
        {pricesIncludeTax ? "Prices include VAT; " : "Prices are before VAT; "}
        VAT is worked out once per rate on the total of that rate, to the nearest penny.
      </p>
    </section>
  );
}
