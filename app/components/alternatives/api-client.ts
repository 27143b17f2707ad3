import type { AlternativeDraft, AlternativeJson, ApiErrorBody, PreviewResult, SweepRequest, SweepResult } from "./api-types";

/** An API answer read into success or the envelope's message (the session cookie authenticates). */
export type ApiOutcome<T> = { ok: true; value: T } | { ok: false; status: number; code: string; message: string; details?: unknown };

async function callApi<T>(method: string, path: string, body: unknown, signal?: AbortSignal): Promise<ApiOutcome<T>> {
  const res = await fetch(path, {
    method,
    headers: { "content-type": "application/json", accept: "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
    signal,
  });
  const json = (await res.json().catch(() => null)) as T | ApiErrorBody | null;
  if (res.ok) return { ok: true, value: json as T };
  const error = (json as ApiErrorBody | null)?.error;
  return { ok: false, status: res.status, code: error?.code ?? "http_error", message: error?.message ?? `The server answered ${res.status}.`, details: error?.details };
}

/**
 * An unsaved what-if of the draft: corridor, rules and design fields ride along, so the takes,
 * costs and checks follow what is being edited.
 */
export function requestPreview(alternativeId: number, draft: AlternativeDraft, signal?: AbortSignal) {
  const { alignment, corridor, rules, designSpeed, speedUnit, emaxPercent, acceptedChecks } = draft;
  return callApi<PreviewResult>("POST", `/api/v1/alternatives/${alternativeId}/preview`, { alignment, corridor, rules, designSpeed, speedUnit, emaxPercent, acceptedChecks }, signal);
}

/** Saves the draft made from `version`: 200 with the new version, 409 when someone saved since. */
export function saveDraft(alternativeId: number, version: number, draft: AlternativeDraft) {
  return callApi<AlternativeJson>("PUT", `/api/v1/alternatives/${alternativeId}`, { version, ...draft });
}

export function requestSweep(alternativeId: number, request: SweepRequest, signal?: AbortSignal) {
  return callApi<SweepResult>("POST", `/api/v1/alternatives/${alternativeId}/sweep`, request, signal);
}

export function createAlternativeRequest(projectId: number, body: Pick<AlternativeJson, "name" | "alignment" | "corridor"> & Partial<AlternativeDraft> & { description?: string }) {
  return callApi<AlternativeJson>("POST", `/api/v1/projects/${projectId}/alternatives`, body);
}

/** True for a fetch that was cancelled because a newer request replaced it. */
export function isAbort(error: unknown): boolean {
  return error instanceof DOMException && error.name === "AbortError";
}
