import { Form, href, redirect } from "react-router";
import { getAccount } from "~/auth/guards.server";
import { ROLE_HOME } from "~/domain/permissions";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/landing";
import { Wordmark } from "~/components/brand";
import { PriorityMark } from "~/components/priority";

// A signed-in member goes straight to where their day starts.
export async function loader({ request, context }: Route.LoaderArgs) {
  const account = await getAccount(request, context.get(dbContext));
  if (account?.role && account.status === "active") throw redirect(ROLE_HOME[account.role]);
  return null;
}

export function meta() {
  return [
    { title: "Ramplight — from complaint to confirmed cause" },
    {
      name: "description",
      content: "The workbench for independent vehicle workshops: diagnose, estimate, explain, get approval.",
    },
  ];
}

const STEPS = [
  {
    title: "Hear the complaint",
    body: "Record what the driver says in their own words, then what you find on the road test and the ramp.",
  },
  {
    title: "See the likely causes",
    body: "Every observation re-ranks the causes, with the evidence for and against each one in plain view.",
  },
  {
    title: "Check in the best order",
    body: "The check plan puts the cheapest way to find the fault first, with tools, time, skill and cautions.",
  },
  {
    title: "Explain and get approval",
    body: "The owner gets a plain summary with evidence and an estimate, approves the work and pays.",
  },
];

export default function Landing() {
  return (
    <div className="min-h-dvh">
      <header className="mx-auto flex max-w-5xl items-center justify-between px-5 py-5">
        <Wordmark />
        {/* Straight to the provider: the demo's sign-in is two clicks, this one and the person. */}
        <Form method="post" action={href("/auth/github")}>
          <button
            type="submit"
            className="inline-flex min-h-tap items-center rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
          >
            Sign in
          </button>
        </Form>
      </header>
      <main className="mx-auto max-w-5xl px-5 pb-16">
        <section className="py-10 sm:py-16">
          <h1 className="max-w-3xl text-2xl leading-tight font-semibold sm:text-3xl">
            From a driver's vague complaint to a confirmed cause, a fair estimate and an owner who says yes.
          </h1>
          <p className="mt-5 max-w-2xl text-lg text-graphite-700">
            Ramplight is the shared workbench of an independent workshop: technicians and apprentices diagnose
            with a ranked list of likely causes and a check plan, seniors keep the shop's knowledge, and
            service advisors turn the finding into words and numbers the owner understands.
          </p>
        </section>
        <ol className="grid gap-4 sm:grid-cols-2">
          {STEPS.map((s, i) => (
            <li key={s.title} className="rounded-card border border-rule bg-card p-5">
              <p className="tabular text-sm font-semibold text-uv-700">Step {i + 1}</p>
              <h2 className="mt-1 text-lg font-semibold">{s.title}</h2>
              <p className="mt-2 text-graphite-700">{s.body}</p>
            </li>
          ))}
        </ol>
        <section className="mt-10 rounded-card border border-rule bg-card p-5" aria-labelledby="priorities">
          <h2 id="priorities" className="text-lg font-semibold">
            Four words for the owner
          </h2>
          <p className="mt-1 text-graphite-700">
            Every item on an owner summary carries one of them, with its own shape as well as its colour.
          </p>
          <ul className="mt-4 grid gap-3 sm:grid-cols-4">
            {(["stop", "soon", "watch", "sound"] as const).map((p) => (
              <li key={p}>
                <PriorityMark priority={p} showDescription />
              </li>
            ))}
          </ul>
        </section>
        <p className="mt-10 text-sm text-graphite-600">
          Ramplight suggests; a qualified person decides. Work on brakes, fuel, airbags, lifting and
          high-voltage systems follows the vehicle maker's procedures, local regulations and licensed
          practice.
        </p>
      </main>
    </div>
  );
}
