import { data, Form, href, Link, redirect } from "react-router";
import { getAccount } from "~/auth/guards.server";
import { pendingEmail, sendCode, verifyCode } from "~/auth/code-sign-in.server";
import { Wordmark } from "~/components/brand";
import { describedBy, FieldError, FormMessages } from "~/components/ui/form-errors";
import { ROLE_HOME } from "~/domain/permissions";
import { clientAddressContext, dbContext } from "~/http/context";
import type { Route } from "./+types/code";

export async function loader({ request, context }: Route.LoaderArgs) {
  const account = await getAccount(request, context.get(dbContext));
  if (account) throw redirect(account.role ? ROLE_HOME[account.role] : href("/welcome"));
  const asked = new URL(request.url).searchParams.get("email");
  return { pending: pendingEmail(request), prefill: asked?.slice(0, 254) ?? "" };
}

export async function action({ request, context }: Route.ActionArgs) {
  const db = context.get(dbContext);
  const socket = context.get(clientAddressContext);
  const intent = (await request.clone().formData()).get("intent");
  if (intent === "send") return sendCode(db, request, socket);
  if (intent === "verify") return verifyCode(db, request, socket);
  return data({ errors: { form: ["Choose to ask for a code or to enter one."] } }, { status: 400 });
}

export function meta() {
  return [{ title: "Sign in with a code — Ramplight" }];
}

const field = "mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base";
const shape =
  "inline-flex min-h-tap w-full items-center justify-center rounded-lg px-5 text-lg font-semibold text-white";
const button = `${shape} bg-uv-600 hover:bg-uv-700`;
// Outlined, not filled: readable in both themes.
const secondary =
  "inline-flex min-h-tap w-full items-center justify-center rounded-lg border border-rule bg-card px-5 text-lg font-semibold hover:bg-paper";

export default function CodeSignIn({ loaderData, actionData }: Route.ComponentProps) {
  const errors = actionData && "errors" in actionData ? actionData.errors : undefined;
  const { pending, prefill } = loaderData;
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-5 px-5 py-10">
      <Wordmark />
      <h1 className="text-2xl font-semibold">{pending ? "Check your e-mail" : "Sign in with a code"}</h1>
      <FormMessages errors={errors} />
      {pending ? (
        <>
          <p>
            We sent a 6-digit code to <strong className="break-all">{pending}</strong>. Type it here, or open
            the link in the e-mail in this browser. The code works once.
          </p>
          <Form method="post" className="grid gap-3" noValidate>
            <input type="hidden" name="intent" value="verify" />
            <label className="font-medium">
              Code from the e-mail
              <input
                name="code"
                inputMode="numeric"
                autoComplete="one-time-code"
                className={field}
                {...describedBy(errors, "code")}
              />
              <FieldError errors={errors} name="code" />
            </label>
            <button type="submit" className={button}>
              Sign in
            </button>
          </Form>
        </>
      ) : null}
      <Form method="post" className="grid gap-3" noValidate>
        <input type="hidden" name="intent" value="send" />
        <label className="font-medium">
          {pending ? "Send a new code to" : "Your e-mail address"}
          <input
            name="email"
            type="email"
            autoComplete="email"
            defaultValue={pending ?? prefill}
            className={field}
            {...describedBy(errors, "email")}
          />
          <FieldError errors={errors} name="email" />
        </label>
        <button type="submit" className={pending ? secondary : button}>
          {pending ? "E-mail me a new code" : "E-mail me a code"}
        </button>
      </Form>
      <Link className="min-h-tap font-medium text-uv-700 underline" to={href("/sign-in")}>
        Other ways to sign in
      </Link>
    </main>
  );
}
