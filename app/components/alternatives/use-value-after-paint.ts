import { useEffect, useState } from "react";

/**
 * `value`, but only from the frame after the one that shows the render it arrived in. The editor
 * passes the map's overlay through this so that new take totals reach the screen in a frame of
 * their own: without a GPU, the map's redraw costs tens of milliseconds of a frame, and the
 * figures should not wait for it. (Two animation frames: the first is the frame being painted.)
 */
export function useValueAfterPaint<T>(value: T): T {
  const [shown, setShown] = useState(value);
  useEffect(() => {
    if (Object.is(shown, value)) return;
    let second = 0;
    const first = requestAnimationFrame(() => {
      second = requestAnimationFrame(() => setShown(() => value));
    });
    return () => {
      cancelAnimationFrame(first);
      cancelAnimationFrame(second);
    };
  }, [value]); // eslint-disable-line react-hooks/exhaustive-deps
  return shown;
}
