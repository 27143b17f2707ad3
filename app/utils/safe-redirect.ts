/** Only same-site paths are followed after sign-in, so a link cannot send users elsewhere. */
export function safeRedirect(to: FormDataEntryValue | string | null | undefined, fallback: string): string {
  if (typeof to !== "string" || !to.startsWith("/") || to.startsWith("//") || to.startsWith("/\\")) return fallback;
  return to;
}
