// One way to refuse a request: a JSON body with a message a person can act on, and a 4xx.
// API routes return it as it is; pages show it in their error boundary.
export function httpError(status: number, message: string, extra: Record<string, unknown> = {}): Response {
  return Response.json({ error: message, ...extra }, { status });
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A malformed id names nothing: answer 404 before PostgreSQL refuses the cast with a 500. */
export function requireId(id: string, notFound: string): string {
  if (!UUID.test(id)) refuse(404, notFound);
  return id;
}

export function refuse(status: number, message: string, extra?: Record<string, unknown>): never {
  throw httpError(status, message, extra);
}

/** The message inside a refusal, for pages that show it on the form instead of an error page. */
export async function refusalMessage(
  error: unknown,
): Promise<{ status: number; message: string; errors?: Record<string, string[]> } | null> {
  if (!(error instanceof Response) || error.status >= 500 || error.status < 400) return null;
  const text = await error.clone().text();
  try {
    const body = JSON.parse(text) as { error?: string; errors?: Record<string, string[]> };
    return {
      status: error.status,
      message: body.error ?? text,
      ...(body.errors ? { errors: body.errors } : {}),
    };
  } catch {
    return { status: error.status, message: text };
  }
}

/** For a resource route's other method: 405 in our JSON shape, with the Allow header (RFC 9110 §15.5.6). */
export function methodNotAllowed(allow: string, hint: string) {
  return () => {
    const res = httpError(405, hint);
    res.headers.set("Allow", allow);
    return res;
  };
}
