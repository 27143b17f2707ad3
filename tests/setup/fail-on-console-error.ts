import { afterEach, vi } from "vitest";

// A console.error during a test means something went wrong that the test did not assert on.
const errors: unknown[][] = [];
vi.spyOn(console, "error").mockImplementation((...args: unknown[]) => {
  errors.push(args);
});

afterEach(() => {
  if (errors.length > 0) {
    const first = errors.splice(0).map((a) => a.map(String).join(" ")).join("\n");
    throw new Error(`console.error was called during the test:\n${first}`);
  }
});
