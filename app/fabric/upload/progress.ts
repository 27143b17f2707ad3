/**
 * Processing stages of an upload, in order, with their share of the time a large fabric takes
 * (measured on the 200,000-parcel Shapefile of scripts/bench-fabric.ts: reading and checking
 * about 38 %, attributes 12 %, coordinates 13 %, overlaps 5 %, storing 32 %).
 */
export const UPLOAD_STAGES = [
  { stage: "reading", label: "Reading and checking the file", share: 0.38 },
  { stage: "attributes", label: "Matching attributes", share: 0.12 },
  { stage: "coordinates", label: "Converting coordinates", share: 0.13 },
  { stage: "overlaps", label: "Looking for overlapping parcels", share: 0.05 },
  { stage: "storing", label: "Storing the features", share: 0.32 },
] as const;

export type UploadStage = (typeof UPLOAD_STAGES)[number]["stage"];

/** Where processing is: `done` of `total` items of the current stage. */
export interface UploadProgress { stage: UploadStage; done: number; total: number }

/** Receives progress; called often, so it should be cheap. */
export type ProgressSink = (progress: UploadProgress) => void;

/** The share of all processing done at a progress report, 0..1 (stages before it count whole). */
export function progressFraction(p: UploadProgress): number {
  let before = 0;
  for (const s of UPLOAD_STAGES) {
    if (s.stage === p.stage) return Math.min(1, before + s.share * (p.total > 0 ? Math.min(1, p.done / p.total) : 0));
    before += s.share;
  }
  throw new RangeError(`unknown upload stage "${String(p.stage)}"`);
}

/** The label of a stage, for the progress bar. */
export function stageLabel(stage: UploadStage): string {
  return UPLOAD_STAGES.find((s) => s.stage === stage)!.label;
}
