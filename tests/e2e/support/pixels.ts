import { PNG } from "pngjs";

/** How many pixels differ noticeably between two same-sized PNG screenshots. */
export function countDifferentPixels(a: Buffer, b: Buffer, threshold = 24): number {
  const pa = PNG.sync.read(a);
  const pb = PNG.sync.read(b);
  if (pa.width !== pb.width || pa.height !== pb.height) throw new Error("screenshots differ in size");
  let different = 0;
  for (let i = 0; i < pa.data.length; i += 4) {
    const d = Math.abs(pa.data[i]! - pb.data[i]!) + Math.abs(pa.data[i + 1]! - pb.data[i + 1]!) + Math.abs(pa.data[i + 2]! - pb.data[i + 2]!);
    if (d > threshold) different += 1;
  }
  return different;
}
