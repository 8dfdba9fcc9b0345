import { data, href, Link } from "react-router";
import { verifyCode } from "~/auth/code-sign-in.server";
import { Wordmark } from "~/components/brand";
import { clientAddressContext, dbContext } from "~/http/context";
import type { Route } from "./+types/code-link";

// The magic link from the e-mail: it signs in only in the browser that asked for the code.
export async function loader({ request, context }: Route.LoaderArgs) {
  const answer = await verifyCode(context.get(dbContext), request, context.get(clientAddressContext));
  if (answer instanceof Response) throw answer;
  const message = Object.values(answer.data.errors).flat()[0] ?? "The link did not work.";
  return data({ message }, { status: answer.init?.status ?? 400, headers: answer.init?.headers });
}

export function meta() {
  return [{ title: "Sign-in link — Ramplight" }];
}

export default function CodeLink({ loaderData }: Route.ComponentProps) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-5 px-5 py-10">
      <Wordmark />
      <h1 className="text-2xl font-semibold">This link did not sign you in</h1>
      <p role="alert" className="rounded-lg border-2 border-stop bg-card p-4">
        {loaderData.message}
      </p>
      <p>A sign-in link works once, in the browser where the code was asked for.</p>
      <Link className="min-h-tap font-medium text-uv-700 underline" to={href("/sign-in/code")}>
        Ask for a new code
      </Link>
    </main>
  );
}
