import { Form, href } from "react-router";
import { Wordmark } from "~/components/brand";

const button =
  "inline-flex min-h-tap w-full items-center justify-center rounded-lg px-5 text-lg font-semibold text-white";

export function SignInPanel({ message, next }: { message?: string; next?: string }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-6 px-5 py-10">
      <Wordmark />
      <h1 className="text-2xl font-semibold">Sign in to your workshop</h1>
      {message ? (
        <p role="alert" className="rounded-lg border-2 border-stop bg-card p-4">
          {message}
        </p>
      ) : null}
      <Form method="post" action={href("/sign-in/code")} className="grid gap-3" noValidate>
        <input type="hidden" name="intent" value="send" />
        <label className="font-medium">
          Your e-mail address
          <input
            name="email"
            type="email"
            autoComplete="email"
            className="mt-1 min-h-tap w-full rounded-lg border border-rule bg-card px-3 text-base"
          />
        </label>
        <button type="submit" className={`${button} bg-uv-600 hover:bg-uv-700`}>
          E-mail me a code
        </button>
      </Form>
      <Form method="post" action={href("/auth/github")}>
        {next ? <input type="hidden" name="next" value={next} /> : null}
        <button
          type="submit"
          className="inline-flex min-h-tap w-full items-center justify-center rounded-lg border border-rule bg-card px-5 text-lg font-semibold hover:bg-paper"
        >
          Continue with GitHub
        </button>
      </Form>
      <p className="text-sm text-graphite-600">
        New here? Sign in and Ramplight will help you set up your workshop, or join the one that invited you.
      </p>
    </main>
  );
}
