import { z } from "zod";
import { progressFraction, stageLabel, type ProgressSink, type UploadProgress } from "~/fabric/index.server";

/** The id a client picks for one upload (sent as the `Upload-Job-Id` header) to poll its progress. */
export const UploadJobIdSchema = z.string().regex(/^[A-Za-z0-9_-]{8,64}$/, "An upload job id is 8-64 letters, digits, - or _.");

export const UPLOAD_JOB_HEADER = "Upload-Job-Id";

interface Job { userId: number; projectId: number; progress: UploadProgress | null; finished: boolean; updatedAt: number }

/** Jobs live in this process's memory (one server process serves an upload and its polls), dropped after 10 minutes. */
const jobs = new Map<string, Job>();
const TTL_MS = 10 * 60_000;
const MAX_JOBS = 1000;

function dropStale(now: number): void {
  for (const [id, job] of jobs) if (now - job.updatedAt > TTL_MS || jobs.size > MAX_JOBS) jobs.delete(id);
}

/** The job id a request names in its `Upload-Job-Id` header, if it names a valid one. */
export function uploadJobIdOf(request: Request): string | undefined {
  const parsed = UploadJobIdSchema.safeParse(request.headers.get(UPLOAD_JOB_HEADER) ?? undefined);
  return parsed.success ? parsed.data : undefined;
}

/**
 * Registers an upload's job and returns the sink its processing reports to, plus `finish` for
 * when the answer is ready. Without a job id both do nothing.
 */
export function startUploadJob(jobId: string | undefined, user: { id: number }, projectId: number): { report: ProgressSink | undefined; finish: () => void } {
  if (jobId === undefined) return { report: undefined, finish: () => {} };
  const now = Date.now();
  dropStale(now);
  const job: Job = { userId: user.id, projectId, progress: null, finished: false, updatedAt: now };
  jobs.set(jobId, job);
  return {
    report: (progress) => { job.progress = progress; job.updatedAt = Date.now(); },
    finish: () => { job.finished = true; job.updatedAt = Date.now(); },
  };
}

/** An upload job's progress as the API shows it, for the user who started it in that project only. */
export function readUploadJob(jobId: string, user: { id: number }, projectId: number) {
  const job = jobs.get(jobId);
  if (!job || job.userId !== user.id || job.projectId !== projectId) return undefined;
  const p = job.progress;
  return {
    jobId,
    stage: p?.stage ?? null,
    label: p ? stageLabel(p.stage) : "Waiting for the file",
    done: p?.done ?? 0,
    total: p?.total ?? 0,
    fraction: job.finished ? 1 : p ? progressFraction(p) : 0,
    finished: job.finished,
  };
}
