import { data } from "react-router";

/** Plain forms (no uploads) are small; anything larger is refused before it is parsed. */
export const MAX_FORM_BYTES = 64 * 1024;

/** The form fields of a request as an object, or a thrown 413 with a message for the page. */
export async function readForm(request: Request, maxBytes = MAX_FORM_BYTES): Promise<Record<string, string>> {
  const tooLarge = () => data({ error: `The form is larger than ${Math.round(maxBytes / 1024)} KB; nothing was saved.` }, { status: 413, headers: { Connection: "close" } });
  if (Number(request.headers.get("content-length") ?? "0") > maxBytes) throw tooLarge();
  const body = await request.text();
  if (Buffer.byteLength(body) > maxBytes) throw tooLarge();
  const fields: Record<string, string> = {};
  for (const [key, value] of new URLSearchParams(body)) fields[key] = value;
  return fields;
}
