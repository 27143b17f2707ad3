import busboy from "busboy";
import { createWriteStream } from "node:fs";
import { mkdtemp, readFile, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { basename, join } from "node:path";
import { Readable } from "node:stream";
import type { ReadableStream as NodeWebStream } from "node:stream/web";
import { apiError } from "./api-error.server";
import { uploadTooLarge } from "./upload-limits.server";

/** Room for the text fields and part headers on top of the file itself. */
const FIELD_ALLOWANCE = 1024 * 1024;

export interface MultipartUpload {
  fields: Record<string, string>;
  /** The `file` part, written to a temporary file; absent when the form had none. */
  file?: { path: string; fileName: string; size: number };
  /** Reads the file part's bytes (the fabric reader works on bytes). */
  readFileBytes(): Promise<Uint8Array>;
  /** Removes the temporary folder; call in `finally`. */
  cleanup(): Promise<void>;
}

/**
 * Streams a multipart/form-data body through busboy: the `file` part goes to a temporary
 * file, never into memory, and stops at `maxBytes` (413); other parts are short text fields.
 */
export async function readMultipartUpload(request: Request, maxBytes: number): Promise<MultipartUpload> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data/i.test(type)) throw apiError("bad_request", "Send the upload as multipart/form-data with a `file` part.");
  if (Number(request.headers.get("content-length") ?? "0") > maxBytes + FIELD_ALLOWANCE) throw uploadTooLarge(maxBytes);
  if (!request.body) throw apiError("bad_request", "The request has no body.");
  const dir = await mkdtemp(join(tmpdir(), "takeline-upload-"));
  const cleanup = () => rm(dir, { recursive: true, force: true });
  try {
    const parsed = await parseInto(dir, request.body as unknown as NodeWebStream<Uint8Array>, type, maxBytes);
    const file = parsed.file;
    return { ...parsed, cleanup, readFileBytes: async () => (file ? new Uint8Array(await readFile(file.path)) : new Uint8Array()) };
  } catch (error) {
    await cleanup();
    throw error;
  }
}

function parseInto(dir: string, body: NodeWebStream<Uint8Array>, contentType: string, maxBytes: number): Promise<Pick<MultipartUpload, "fields" | "file">> {
  return new Promise((resolve, reject) => {
    const fields: Record<string, string> = {};
    let file: MultipartUpload["file"];
    let written: Promise<void> = Promise.resolve();
    let settled = false;
    const fail = (response: Response) => {
      if (settled) return;
      settled = true;
      // Stop reading: the rest of an oversized body is left on the socket, which the answer closes.
      source.unpipe(bb);
      source.pause();
      reject(response);
    };
    const bb = busboy({ headers: { "content-type": contentType }, limits: { fileSize: maxBytes, files: 1, fields: 20, fieldSize: 64 * 1024, parts: 25 } });
    bb.on("file", (name, stream, info) => {
      if (name !== "file" || file) return void stream.resume();
      const path = join(dir, "upload.bin");
      const current = { path, fileName: basename(info.filename ?? "upload"), size: 0 };
      file = current;
      const out = createWriteStream(path);
      stream.on("data", (chunk: Buffer) => (current.size += chunk.length));
      stream.on("limit", () => {
        // Unpipe before closing the temp file, or a write already in flight lands on a destroyed stream.
        stream.unpipe(out);
        out.end();
        fail(uploadTooLarge(maxBytes));
      });
      written = new Promise((res, rej) => {
        out.on("finish", res);
        out.on("error", (e) => (settled ? res() : rej(e)));
      });
      stream.pipe(out);
    });
    bb.on("field", (name, value, info) => {
      if (info.valueTruncated) return fail(apiError("unprocessable", `The field "${name}" is too long.`, [{ path: name, message: "too long" }]));
      fields[name] = value;
    });
    bb.on("partsLimit", () => fail(apiError("bad_request", "The form has too many parts.")));
    bb.on("error", () => fail(apiError("bad_request", "The multipart body is malformed.")));
    bb.on("close", () => {
      written.then(
        () => !settled && ((settled = true), resolve(file ? { fields, file } : { fields })),
        () => fail(apiError("internal", "The upload could not be saved on the server.")),
      );
    });
    const source = Readable.fromWeb(body);
    source.on("error", () => fail(apiError("bad_request", "The upload was interrupted.")));
    source.pipe(bb);
  });
}
