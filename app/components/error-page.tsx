import { href, isRouteErrorResponse, Link } from "react-router";

const COPY: Record<number, { title: string; body: string }> = {
  400: {
    title: "That request did not make sense",
    body: "Something in it was missing or malformed. Go back and check what you entered.",
  },
  403: {
    title: "Not for your role",
    body: "Your role in this workshop does not cover this. Ask your workshop admin if you need it.",
  },
  404: {
    title: "Nothing here",
    body: "We could not find that page or record. It may have moved, or belong to another workshop.",
  },
  429: { title: "Too many tries", body: "Wait a minute, then try again." },
  500: {
    title: "Something broke on our side",
    body: "It is not something you did. Try again; if it keeps happening, tell your workshop admin.",
  },
};

export function ErrorPage({ status, message }: { status: number; message?: string }) {
  const copy = COPY[status] ?? (status >= 500 ? COPY[500] : COPY[400]);
  return (
    <main
      className="mx-auto flex min-h-[70dvh] max-w-xl flex-col justify-center gap-4 px-5 py-12"
      role="alert"
    >
      <p className="tabular text-sm font-semibold tracking-widest text-graphite-600 uppercase">
        Error {status}
      </p>
      <h1 className="text-2xl font-semibold">{copy.title}</h1>
      <p className="text-graphite-700">{message ?? copy.body}</p>
      <div className="flex flex-wrap gap-3 pt-2">
        <Link
          to={href("/")}
          className="inline-flex min-h-tap items-center rounded-lg bg-uv-600 px-5 font-semibold text-white hover:bg-uv-700"
        >
          Back to the start
        </Link>
      </div>
    </main>
  );
}

/** What every route's ErrorBoundary shows: the status, and the refusal's own words when it has them. */
export function RouteErrorPage({ error }: { error: unknown }) {
  if (!isRouteErrorResponse(error)) return <ErrorPage status={500} />;
  const data = error.data as unknown;
  const message = typeof data === "string" ? data : (data as { error?: string } | null)?.error;
  return <ErrorPage status={error.status} message={message || undefined} />;
}
