import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { tempDir } from "~/fabric/test-support/reference-tools.server";

/** A zip written by Python's zipfile with entries named exactly as given (paths kept, not flattened). */
export function zipWithNames(entries: Record<string, Uint8Array | string>): Buffer {
  const { dir, cleanup } = tempDir();
  try {
    const out = join(dir, "crafted.zip");
    const script = "import sys, json, zipfile, base64\nwith zipfile.ZipFile(sys.argv[1], 'w', zipfile.ZIP_DEFLATED) as z:\n    for n, b in json.load(sys.stdin).items(): z.writestr(n, base64.b64decode(b))";
    const input = JSON.stringify(Object.fromEntries(Object.entries(entries).map(([n, b]) => [n, Buffer.from(b).toString("base64")])));
    execFileSync("/usr/bin/python3", ["-c", script, out], { input });
    return readFileSync(out);
  } finally {
    cleanup();
  }
}

/** A zip bomb: a one-byte .shp beside a .dbf of `mib` MiB of zeros, deflated to about a thousandth. */
export function zeroBomb(mib: number): Buffer {
  const { dir, cleanup } = tempDir();
  try {
    const out = join(dir, "bomb.zip");
    const script = "import sys, zipfile\nwith zipfile.ZipFile(sys.argv[1], 'w', zipfile.ZIP_DEFLATED) as z:\n    z.writestr('parcels.shp', b'x')\n    with z.open('parcels.dbf', 'w') as f:\n        c = bytes(1 << 20)\n        for i in range(int(sys.argv[2])): f.write(c)";
    execFileSync("/usr/bin/python3", ["-c", script, out, String(mib)]);
    return readFileSync(out);
  } finally {
    cleanup();
  }
}

/**
 * The same bomb lying about its sizes: every declared uncompressed size (local header offset 22,
 * central directory offset 24; PKWARE APPNOTE.TXT 4.3.7 and 4.3.12) is set to 1000 bytes.
 */
export function lyingBomb(bomb: Buffer): Buffer {
  const out = Buffer.from(bomb);
  for (let i = 0; i + 4 <= out.length; i++) {
    const sig = out.readUInt32LE(i);
    if (sig === 0x04034b50 && i + 30 <= out.length) out.writeUInt32LE(1000, i + 22);
    if (sig === 0x02014b50 && i + 46 <= out.length) out.writeUInt32LE(1000, i + 24);
  }
  return out;
}
