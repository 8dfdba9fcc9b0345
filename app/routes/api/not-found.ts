import { httpError } from "~/http/errors.server";

// Unknown addresses under /api/ answer in the API's own JSON shape, not with the HTML page.
const notFound = () => httpError(404, "There is no such API address. See docs/api.md.");
export const loader = notFound;
export const action = notFound;
