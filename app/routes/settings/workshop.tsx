import { memberContext } from "~/auth/guards.server";
import { formatMoney, formatPercent } from "~/components/format";
import { dbContext } from "~/context";
import { getWorkshop } from "~/workshop/settings.server";
import type { Route } from "./+types/workshop";

export async function loader({ context }: Route.LoaderArgs) {
  const member = context.get(memberContext);
  return { workshop: await getWorkshop(context.get(dbContext), member.workshopId) };
}

export function meta() {
  return [{ title: "Settings — Ramplight" }];
}

export default function WorkshopSettings({ loaderData }: Route.ComponentProps) {
  const w = loaderData.workshop;
  const rows: [string, string][] = [
    ["Name", w.name],
    ["Country", w.country],
    ["Currency", w.currency],
    ["Tax rate", formatPercent(w.taxRate, 1)],
    ["Units", w.units === "metric" ? "Metric (km, bar, L/100 km)" : "Imperial (miles, psi, mpg)"],
    ["Labour rate", `${formatMoney(w.labourRatePerHour, w.currency)} per hour`],
  ];
  return (
    <div>
      <h1 className="text-2xl font-semibold">Workshop settings</h1>
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
