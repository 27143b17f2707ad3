import { iter } from "but-unzip";
import { FabricInputError } from "../errors";

/** Files of a zip archive by name (folders and macOS resource forks left out). */
export type ZipEntries = Map<string, Uint8Array>;

/** Unzips an archive held in memory; FabricInputError `corrupt_file` if it is not one. */
export async function readZipEntries(bytes: Uint8Array): Promise<ZipEntries> {
  const entries: ZipEntries = new Map();
  try {
    for (const item of iter(bytes)) {
      if (item.filename.endsWith("/") || item.filename.includes("__MACOSX")) continue;
      entries.set(item.filename, await item.read());
    }
  } catch (e) {
    throw new FabricInputError("corrupt_file", `The zip archive could not be opened: ${(e as Error).message}`, {});
  }
  return entries;
}

/** The entry whose name is `base` plus `ext` (extension compared case-insensitively). */
export function sidecar(entries: ZipEntries, base: string, ext: string): Uint8Array | undefined {
  for (const [name, data] of entries) {
    if (name.length === base.length + ext.length && name.startsWith(base) && name.slice(base.length).toLowerCase() === ext) return data;
  }
  return undefined;
}
