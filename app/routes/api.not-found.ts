import { apiError } from "~/utils/api-error.server";

/** Any unknown /api path answers in the JSON envelope, never with the HTML 404 page. */
export function loader() {
  return apiError("not_found", "There is no API route at this path.");
}

export function action() {
  return apiError("not_found", "There is no API route at this path.");
}
