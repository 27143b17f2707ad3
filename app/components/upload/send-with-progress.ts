export type UploadPhase = { phase: "uploading"; fraction: number } | { phase: "processing" };
export type UploadAnswer = { status: number; body: unknown };

/**
 * POSTs a multipart form with XMLHttpRequest, because fetch cannot report upload progress.
 * Reports the bytes sent, then "processing" while the server reads and checks the file.
 */
export function sendWithProgress(url: string, form: FormData, onPhase: (p: UploadPhase) => void): Promise<UploadAnswer> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onPhase({ phase: "uploading", fraction: e.loaded / e.total });
    };
    xhr.upload.onload = () => onPhase({ phase: "processing" });
    xhr.onload = () => resolve({ status: xhr.status, body: xhr.response });
    xhr.onerror = () => reject(new Error("The upload was interrupted. Check the connection and try again."));
    xhr.send(form);
  });
}
