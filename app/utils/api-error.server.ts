import { ZodError } from "zod";

export type ApiErrorCode =
  | "bad_request"
  | "unauthorized"
  | "forbidden"
  | "not_found"
  | "method_not_allowed"
  | "conflict"
  | "payload_too_large"
  | "unprocessable"
  | "too_many_requests"
  | "internal";

const STATUS: Record<ApiErrorCode, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  method_not_allowed: 405,
  conflict: 409,
  payload_too_large: 413,
  unprocessable: 422,
  too_many_requests: 429,
  internal: 500,
};

/** The one shape every API error takes: `{error: {code, message, details?}}`. */
export function apiError(code: ApiErrorCode, message: string, details?: unknown, headers?: HeadersInit): Response {
  const body = { error: { code, message, ...(details === undefined ? {} : { details }) } };
  return Response.json(body, { status: STATUS[code], headers });
}

/** Zod issues as a list of `{path, message}` a client can show beside its fields. */
export function zodDetails(error: ZodError) {
  return error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
}

/** Whether a request is for the JSON API (errors must then be JSON, never HTML). */
export function isApiRequest(request: Request): boolean {
  return new URL(request.url).pathname.startsWith("/api/");
}
