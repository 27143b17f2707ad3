export type UploadPhase =
  | { phase: "uploading"; fraction: number }
  | { phase: "processing"; fraction: number | null; label: string | null };
export type UploadAnswer = { status: number; body: unknown };

/** How often the processing progress is asked for, in ms. */
const POLL_MS = 400;

type JobProgress = { fraction: number; label: string; finished: boolean };

/** 128 random bits as hex; getRandomValues, unlike randomUUID, also works on plain-http hosts. */
function newJobId(): string {
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, "0")).join("");
}

/**
 * Asks the server how far it is with job `jobId` every POLL_MS until `stop` is called; each
 * answer is reported. Failed polls are ignored: the upload's own answer is what counts.
 */
function pollProgress(url: string, onProgress: (p: JobProgress) => void): () => void {
  let stopped = false;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const tick = async () => {
    try {
      const res = await fetch(url, { headers: { Accept: "application/json" } });
      if (!stopped && res.ok) onProgress((await res.json()) as JobProgress);
    } catch {
      // a dropped poll is retried on the next tick
    }
    if (!stopped) timer = setTimeout(tick, POLL_MS);
  };
  timer = setTimeout(tick, POLL_MS);
  return () => { stopped = true; clearTimeout(timer); };
}

/**
 * POSTs a multipart form with XMLHttpRequest, because fetch cannot report upload progress.
 * Reports the bytes sent, then the server's own processing progress, which it publishes under
 * the `Upload-Job-Id` this request carries (`<url base>/progress/<id>`, polled).
 */
export function sendWithProgress(url: string, progressBase: string, form: FormData, onPhase: (p: UploadPhase) => void): Promise<UploadAnswer> {
  const jobId = newJobId();
  let stopPolling = () => {};
  return new Promise<UploadAnswer>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.responseType = "json";
    xhr.setRequestHeader("Upload-Job-Id", jobId);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onPhase({ phase: "uploading", fraction: e.loaded / e.total });
    };
    xhr.upload.onload = () => {
      onPhase({ phase: "processing", fraction: null, label: null });
      stopPolling = pollProgress(`${progressBase}/progress/${jobId}`, (p) => {
        if (!p.finished) onPhase({ phase: "processing", fraction: p.fraction, label: p.label });
      });
    };
    xhr.onload = () => resolve({ status: xhr.status, body: xhr.response });
    xhr.onerror = () => reject(new Error("The upload was interrupted. Check the connection and try again."));
    xhr.send(form);
  }).finally(() => stopPolling());
}
