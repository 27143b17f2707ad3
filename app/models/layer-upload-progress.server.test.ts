import { expect, test } from "vitest";
import { readUploadJob, startUploadJob, uploadJobIdOf } from "./layer-upload-progress.server";

const planner = { id: 41 };
const other = { id: 42 };

test("a job's progress is shown to the user who started it, in its project, and to no one else", () => {
  const job = startUploadJob("job-aaaa-0001", planner, 7);
  expect(readUploadJob("job-aaaa-0001", planner, 7)).toMatchObject({ stage: null, fraction: 0, finished: false });
  job.report!({ stage: "attributes", done: 50, total: 100 });
  // Reading counts 38 % and attributes 12 % (stage shares in fabric/upload/progress.ts): half of attributes is 44 %.
  expect(readUploadJob("job-aaaa-0001", planner, 7)).toMatchObject({ stage: "attributes", label: "Matching attributes", done: 50, total: 100 });
  expect(readUploadJob("job-aaaa-0001", planner, 7)!.fraction).toBeCloseTo(0.44, 12);
  expect(readUploadJob("job-aaaa-0001", other, 7)).toBeUndefined();
  expect(readUploadJob("job-aaaa-0001", planner, 8)).toBeUndefined();
  job.finish();
  expect(readUploadJob("job-aaaa-0001", planner, 7)).toMatchObject({ finished: true, fraction: 1 });
});

test("without a job id nothing is recorded; the header must be a plain 8-64 character id", () => {
  const job = startUploadJob(undefined, planner, 7);
  expect(job.report).toBeUndefined();
  job.finish();
  const req = (v: string) => new Request("http://x/", { headers: { "Upload-Job-Id": v } });
  expect(uploadJobIdOf(req("0123456789abcdef"))).toBe("0123456789abcdef");
  expect(uploadJobIdOf(req("short"))).toBeUndefined();
  expect(uploadJobIdOf(req("../../etc/passwd-xx"))).toBeUndefined();
  expect(uploadJobIdOf(new Request("http://x/"))).toBeUndefined();
});
