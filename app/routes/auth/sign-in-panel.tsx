import { Form, href } from "react-router";
import { Wordmark } from "~/components/brand";

export function SignInPanel({ message, next }: { message?: string; next?: string }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-6 px-5">
      <Wordmark />
      <h1 className="text-2xl font-semibold">Sign in to your workshop</h1>
      {message ? (
        <p role="alert" className="rounded-lg border-2 border-stop bg-card p-4">
          {message}
        </p>
      ) : null}
      <Form method="post" action={href("/auth/github")}>
        {next ? <input type="hidden" name="next" value={next} /> : null}
        <button
          type="submit"
          className="inline-flex min-h-tap w-full items-center justify-center rounded-lg bg-uv-600 px-5 text-lg font-semibold text-white hover:bg-uv-700"
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
