import type { ProgressSink, UploadStage } from "./progress";

/** Items handled between two yields: about 20 ms of work for the heaviest per-feature step. */
const CHUNK = 5000;

/** Lets the event loop run (other requests, progress polls) before the next chunk. */
export const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

/**
 * `items.map(fn)` in chunks, reporting `stage` progress and yielding to the event loop between
 * chunks, so a long upload neither stalls the server nor leaves its progress unanswered.
 */
export async function mapInChunks<T, U>(items: T[], fn: (item: T, index: number) => U, stage: UploadStage, report?: ProgressSink): Promise<U[]> {
  const out: U[] = new Array(items.length);
  for (let start = 0; start < items.length; start += CHUNK) {
    const end = Math.min(items.length, start + CHUNK);
    for (let i = start; i < end; i++) out[i] = fn(items[i]!, i);
    report?.({ stage, done: end, total: items.length });
    if (end < items.length) await yieldToEventLoop();
  }
  return out;
}
