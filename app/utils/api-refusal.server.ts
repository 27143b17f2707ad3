import { data } from "react-router";

/**
 * Model functions refuse with the API's error envelope (a thrown Response). A page action turns
 * that into data for its form — the status and the message — instead of an error page; anything
 * else is rethrown.
 */
export async function refusalAsFormData(error: unknown) {
  if (!(error instanceof Response) || error.headers.get("content-type")?.includes("json") !== true) throw error;
  const body = (await error.json()) as { error?: { message?: string; details?: unknown } };
  return data({ ok: false as const, error: body.error?.message ?? "That could not be done.", details: body.error?.details ?? null }, { status: error.status });
}
