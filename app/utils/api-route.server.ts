import type { z } from "zod";
import { GeometryInputError } from "~/geometry/errors";
import { apiError, zodDetails } from "./api-error.server";

/** Largest JSON body the API accepts; uploads have their own limit. */
export const MAX_JSON_BYTES = 1024 * 1024;

/**
 * Wraps an API loader or action so that any failure becomes the JSON error envelope:
 * thrown Responses pass through, geometry input errors become 422, anything else is logged and
 * answered with a bare 500.
 */
export function apiHandler<A extends { request: Request }>(fn: (args: A) => Promise<Response> | Response) {
  return async (args: A): Promise<Response> => {
    try {
      return await fn(args);
    } catch (error) {
      if (error instanceof Response) return error;
      // Bad survey input is the client's to fix: say exactly what, with the engine's own code.
      if (error instanceof GeometryInputError) return Response.json({ error: error.toJSON() }, { status: 422 });
      console.error("API error", error);
      return apiError("internal", "Something went wrong on the server; the request was not completed.");
    }
  };
}

/** Reads and validates a JSON body; throws the envelope for a missing, oversized, malformed or invalid body. */
export async function readJsonBody<S extends z.ZodType>(request: Request, schema: S, maxBytes = MAX_JSON_BYTES): Promise<z.infer<S>> {
  // Answering before the body is read leaves its bytes on the socket: close the connection with the answer.
  const tooLarge = () => apiError("payload_too_large", `The body is over ${maxBytes} bytes.`, undefined, { Connection: "close" });
  if (Number(request.headers.get("content-length") ?? "0") > maxBytes) throw tooLarge();
  const text = await request.text();
  if (Buffer.byteLength(text) > maxBytes) throw tooLarge();
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    throw apiError("bad_request", "The body is not valid JSON.");
  }
  const parsed = schema.safeParse(raw);
  if (!parsed.success) throw apiError("unprocessable", "The request has invalid fields.", zodDetails(parsed.error));
  return parsed.data;
}

/** Only the listed methods are allowed on an action. */
export function requireMethod(request: Request, ...methods: string[]): void {
  if (!methods.includes(request.method.toUpperCase())) {
    throw apiError("method_not_allowed", `Use ${methods.join(" or ")} on this path.`, undefined, { Allow: methods.join(", ") });
  }
}
