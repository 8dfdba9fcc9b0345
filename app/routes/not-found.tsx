import { ErrorPage } from "~/components/error-page";

// Unknown URLs answer a real 404 status, not a 200 with an error picture.
export function loader() {
  throw new Response("Not found", { status: 404 });
}

export function meta() {
  return [{ title: "Nothing here — Ramplight" }];
}

export default function NotFound() {
  return <ErrorPage status={404} />;
}

export function ErrorBoundary() {
  return <ErrorPage status={404} />;
}
