import { useMemo } from "react";
import { GeometryInputError } from "~/geometry/errors";

export type Calculation<T> = { result: T; error: null } | { result: null; error: string | null };

/**
 * Runs an engine calculation as the user types. Incomplete input shows nothing; bad input
 * shows the engine's own message — never a number from input it could not check.
 */
export function useCalculation<T>(compute: () => T | null, deps: unknown[]): Calculation<T> {
  return useMemo(() => {
    try {
      const result = compute();
      return result === null ? { result: null, error: null } : { result, error: null };
    } catch (error) {
      return { result: null, error: error instanceof GeometryInputError ? error.message : String(error) };
    }
  }, deps);
}

/** A text field's number, or undefined when empty; a non-number is a clear error. */
export function optionalNumber(text: string, label: string): number | undefined {
  const t = text.trim();
  if (t === "") return undefined;
  const n = Number(t);
  if (!Number.isFinite(n)) throw new GeometryInputError("invalid_number", `${label} is not a number: "${t}"`, { field: label });
  return n;
}
